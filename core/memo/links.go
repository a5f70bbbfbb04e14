package memo

import (
	"strings"

	"github.com/yuin/goldmark/ast"
	"github.com/yuin/goldmark/parser"
	"github.com/yuin/goldmark/text"
	"github.com/yuin/goldmark/util"
)

// safeLinks is a goldmark AST transformer that keeps only links whose
// destination is safe to click in a memo and drops every image.
//
// A link stays when its destination is relative (no scheme) or uses http,
// https or mailto; any other link (javascript:, data:, file:, vbscript:, an
// unknown scheme) is replaced by its text. Images are replaced by their
// description, because a standalone memo must not fetch anything from the
// network when opened.
type safeLinks struct{}

// Transform rewrites doc in place.
func (safeLinks) Transform(doc *ast.Document, reader text.Reader, _ parser.Context) {
	var unwrap []ast.Node
	var autolinks []*ast.AutoLink
	_ = ast.Walk(doc, func(n ast.Node, entering bool) (ast.WalkStatus, error) {
		if !entering {
			return ast.WalkContinue, nil
		}
		switch t := n.(type) {
		case *ast.Image:
			unwrap = append(unwrap, t)
		case *ast.Link:
			// check the destination both as written and with character
			// references resolved, as the HTML writer will resolve them
			if !safeURL(string(t.Destination)) || !safeURL(string(util.URLEscape(t.Destination, true))) {
				unwrap = append(unwrap, t)
			}
		case *ast.AutoLink:
			if !safeURL(string(t.URL(reader.Source()))) {
				autolinks = append(autolinks, t)
			}
		}
		return ast.WalkContinue, nil
	})
	for _, n := range unwrap {
		parent := n.Parent()
		if parent == nil {
			continue
		}
		for c := n.FirstChild(); c != nil; {
			next := c.NextSibling()
			parent.InsertBefore(parent, n, c)
			c = next
		}
		parent.RemoveChild(parent, n)
	}
	for _, a := range autolinks {
		parent := a.Parent()
		if parent == nil {
			continue
		}
		parent.ReplaceChild(parent, a, ast.NewString(a.Label(reader.Source())))
	}
}

// safeURL reports whether a link destination is relative or uses http,
// https or mailto. Spaces and control characters, which browsers skip
// inside a scheme, are ignored while reading it.
func safeURL(u string) bool {
	var b strings.Builder
	for _, r := range u {
		if r > ' ' && r != 0x7f {
			b.WriteRune(r)
		}
	}
	s := strings.ToLower(b.String())
	colon := strings.IndexByte(s, ':')
	if colon < 0 {
		return true
	}
	if i := strings.IndexAny(s, "/?#"); i >= 0 && i < colon {
		return true // the colon is inside a path, query or fragment
	}
	switch s[:colon] {
	case "http", "https", "mailto":
		return true
	}
	return false
}
