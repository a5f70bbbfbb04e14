package memo

import (
	"archive/zip"
	"bytes"
	"io"
	"time"
)

// zipTime returns the modification time written for every file in the
// zip, so that the same memo always gives the same bytes (the clock is never
// read).
func zipTime() time.Time {
	return time.Date(2000, time.January, 1, 0, 0, 0, 0, time.UTC)
}

// Zip writes the memo as a zip archive to w: memo.md (as [Markdown]
// writes it), each chart as charts/NN-stem.svg, and forecasts.csv (as
// [WriteCSV] writes it; left out when forecasts has no header and no rows).
// Every file carries the same fixed time, so the bytes depend only on the
// memo. It returns the error of [Memo.Check] before writing anything.
func Zip(w io.Writer, m Memo, forecasts Sheet) error {
	md, err := Markdown(m)
	if err != nil {
		return err
	}
	zw := zip.NewWriter(w)
	add := func(name string, data []byte) error {
		f, err := zw.CreateHeader(&zip.FileHeader{Name: name, Method: zip.Deflate, Modified: zipTime()})
		if err != nil {
			return err
		}
		_, err = f.Write(data)
		return err
	}
	if err := add("memo.md", []byte(md)); err != nil {
		return err
	}
	for _, ex := range m.Exhibits() {
		if ex.File == "" {
			continue
		}
		c := m.Sections[ex.Section].Blocks[ex.Block].(Chart)
		if err := add(ex.File, []byte(c.SVG)); err != nil {
			return err
		}
	}
	if len(forecasts.Header) > 0 || len(forecasts.Rows) > 0 {
		var buf bytes.Buffer
		if err := WriteCSV(&buf, forecasts); err != nil {
			return err
		}
		if err := add("forecasts.csv", buf.Bytes()); err != nil {
			return err
		}
	}
	return zw.Close()
}
