package memo

import (
	"encoding/xml"
	"errors"
	"fmt"
	"io"
	"strings"
)

// svgElements are the elements a chart may use: those package chart draws
// and a few plain shapes. Anything else (script, foreignObject, image, use,
// links, animation) is refused, since the HTML form inlines the SVG as is.
var svgElements = map[string]bool{
	"svg": true, "title": true, "desc": true, "style": true, "g": true,
	"rect": true, "line": true, "path": true, "circle": true, "ellipse": true,
	"polyline": true, "polygon": true, "text": true, "tspan": true,
}

// checkSVG returns an error unless doc is one well-formed svg element built
// only from svgElements, with no event-handler or link attributes and no
// style that loads anything.
func checkSVG(doc string) error {
	d := xml.NewDecoder(strings.NewReader(doc))
	d.Strict = true
	depth, roots := 0, 0
	inStyle := false
	for {
		tok, err := d.Token()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			return fmt.Errorf("the chart is not a well-formed SVG drawing (%v)", err)
		}
		switch t := tok.(type) {
		case xml.StartElement:
			if depth == 0 {
				roots++
				if t.Name.Local != "svg" || roots > 1 {
					return errors.New("the chart must be one svg element")
				}
			}
			if !svgElements[t.Name.Local] {
				return fmt.Errorf("the chart holds a %q element, which a memo does not allow", t.Name.Local)
			}
			for _, a := range t.Attr {
				name := strings.ToLower(a.Name.Local)
				if strings.HasPrefix(name, "on") || strings.Contains(name, "href") || a.Name.Space == "xlink" ||
					strings.Contains(strings.ToLower(a.Value), "url(") {
					return fmt.Errorf("the chart has a %q attribute, which a memo does not allow", a.Name.Local)
				}
			}
			inStyle = t.Name.Local == "style"
			depth++
		case xml.EndElement:
			depth--
			inStyle = false
		case xml.CharData:
			if depth == 0 && strings.TrimSpace(string(t)) != "" {
				return errors.New("the chart has text outside its svg element")
			}
			low := strings.ToLower(string(t))
			if inStyle && (strings.Contains(low, "url(") || strings.Contains(low, "@import")) {
				return errors.New("the chart's style loads an outside resource, which a memo does not allow")
			}
		case xml.Directive, xml.ProcInst:
			return errors.New("the chart holds a declaration or processing instruction, which a memo does not allow")
		}
	}
	if roots != 1 {
		return errors.New("the chart is empty; it must be one svg element")
	}
	return nil
}
