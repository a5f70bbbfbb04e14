package memo

import (
	"html"
	"strings"

	"github.com/yuin/goldmark"
	"github.com/yuin/goldmark/extension"
	"github.com/yuin/goldmark/parser"
	"github.com/yuin/goldmark/util"
)

// newMarkdown returns the goldmark renderer of every piece of prose in a
// memo: CommonMark with tables, strikethrough and task lists; goldmark's
// default HTML renderer, which leaves raw HTML out; and [safeLinks], which
// turns unsafe links into their text and images into their description.
func newMarkdown() goldmark.Markdown {
	return goldmark.New(
		goldmark.WithExtensions(extension.Table, extension.Strikethrough, extension.TaskList),
		goldmark.WithParserOptions(parser.WithASTTransformers(util.Prioritized(safeLinks{}, 100))),
	)
}

// Note returns the HTML of one prose note written in Markdown, rendered as
// the memo renders its paragraphs ([HTML]): raw HTML left out, links other
// than http, https, mailto and relative ones shown as plain text, images
// shown as their description, so nothing in a note can run or load. The
// page shows notes with it, so a note reads the same on screen and in the
// memo. An empty note gives "".
func Note(markdown string) string {
	var b strings.Builder
	if err := convert(&b, newMarkdown(), guardProse(markdown)); err != nil {
		// goldmark writes to memory and does not fail; if it ever did, the
		// note is still shown, as escaped text.
		return "<p>" + html.EscapeString(markdown) + "</p>\n"
	}
	return b.String()
}
