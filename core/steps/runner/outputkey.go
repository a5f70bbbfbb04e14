package runner

import (
	"crypto/sha256"
	"encoding/binary"
	"encoding/hex"
	"hash"
	"strconv"
)

// contentKey returns the [Output.Key] of out: a digest of everything a
// reader of the output sees (step number, verb, status, error, the step it
// waits on and every block), leaving out the document line and the step's
// text, which an edit elsewhere may move or reword without changing the
// result. Two outputs with the same key show the same thing, so a step
// recomputed to the same result keeps its key.
func contentKey(out Output) string {
	h := sha256.New()
	field := func(s string) {
		var n [binary.MaxVarintLen64]byte
		h.Write(n[:binary.PutUvarint(n[:], uint64(len(s)))])
		h.Write([]byte(s))
	}
	field(strconv.Itoa(out.Step))
	field(out.Verb)
	field(string(out.Status))
	field(strconv.Itoa(out.WaitsOn))
	if e := out.Error; e != nil {
		field("error")
		field(strconv.Itoa(e.Step))
		field(strconv.Itoa(e.Column))
		field(e.Msg)
	}
	for _, b := range out.Blocks {
		blockDigest(h, field, b)
	}
	return hex.EncodeToString(h.Sum(nil)[:16])
}

// blockDigest adds one block, field by field, to h.
func blockDigest(h hash.Hash, field func(string), b Block) {
	field("block")
	field(b.Kind)
	field(strconv.Itoa(b.Exhibit))
	field(b.Title)
	field(b.SVG)
	field(b.File)
	field(b.Level)
	field(b.Text)
	if t := b.Table; t != nil {
		field("table")
		for _, s := range t.Headers {
			field(s)
		}
		for _, r := range t.Rows {
			field("row")
			for _, s := range r {
				field(s)
			}
		}
		for _, right := range t.Right {
			field(strconv.FormatBool(right))
		}
	}
}
