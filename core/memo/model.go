package memo

// Memo is a forecast memo: a header and sections in reading order.
type Memo struct {
	Title      string // "Candle orders: twelve-month forecast"
	PreparedBy string // who wrote it; empty leaves the line out
	Client     string // for whom; empty leaves the line out
	Date       string // as the caller wants it shown; empty leaves the line out
	// Version is the program version, written at the end of the memo
	// ("Written with Quillcast 0.4.1."); empty leaves the line out.
	Version  string
	Sections []Section
}

// Kind says which part of the memo a section is. A complete memo has one
// section of each kind from [Summary] to [Appendix]; [Other] sections may
// stand anywhere.
type Kind int

const (
	// Other is any further section; its Heading should be set.
	Other Kind = iota
	// Summary: recommended method, headline forecast with its interval,
	// holdout accuracy against the naive benchmark.
	Summary
	// Data: file name, periods, counts, cleaning log, data fingerprint.
	Data
	// Partition: the training and holdout periods.
	Partition
	// Comparison: the method comparison table.
	Comparison
	// Charts: the charts.
	Charts
	// Forecasts: the forecast table with 80% and 95% intervals.
	Forecasts
	// Cautions: assumptions and cautions, generated from the checks, and
	// the standing caution. Required by every renderer.
	Cautions
	// Notes: the analyst's own prose.
	Notes
	// Appendix: the steps to reproduce, the settings and the version.
	Appendix
)

// DefaultHeading returns the heading a section of kind k gets when its
// Heading is empty; "" for [Other].
func DefaultHeading(k Kind) string {
	switch k {
	case Summary:
		return "Summary"
	case Data:
		return "The data"
	case Partition:
		return "Training and holdout periods"
	case Comparison:
		return "How the methods compare"
	case Charts:
		return "Charts"
	case Forecasts:
		return "Forecasts"
	case Cautions:
		return "Assumptions and cautions"
	case Notes:
		return "Analyst's notes"
	case Appendix:
		return "Appendix: steps, settings and version"
	}
	return ""
}

// Section is one headed part of the memo.
type Section struct {
	Kind Kind
	// Heading is shown as the section title; empty takes
	// [DefaultHeading] of Kind.
	Heading string
	Blocks  []Block
}

// heading returns the shown heading of s.
func (s Section) heading() string {
	if s.Heading != "" {
		return s.Heading
	}
	if h := DefaultHeading(s.Kind); h != "" {
		return h
	}
	return "More"
}

// Block is one piece of a section: [Paragraph], [List], [Table], [Chart]
// or [Steps].
type Block interface {
	isBlock()
}

// Paragraph is Markdown text, written by the user or generated. It may hold
// several paragraphs, emphasis, links and lists. Raw HTML in it is left out
// of every output; links other than http, https, mailto and relative ones
// are shown as plain text in HTML, and images as their description.
type Paragraph struct {
	Text string
}

// List is a bullet list; each item is one line of Markdown inline text
// (line breaks in an item become spaces).
type List struct {
	Items []string
}

// Table is an exhibit of already formatted cells, shown as plain text.
type Table struct {
	// Number is the exhibit number to show, such as the number the table
	// has on screen under its step; 0 numbers it in reading order after the
	// highest number given (see [Memo.Exhibits]).
	Number int
	// Caption follows "Exhibit N — " in the exhibit's title.
	Caption string
	Columns []Column
	// Rows hold one string per column; renderers refuse a row of another
	// length.
	Rows [][]string
	// Note is an optional line of Markdown shown under the table
	// (sources, units, what a dash means).
	Note string
}

// Column is a table column.
type Column struct {
	Header string
	// Numeric right-aligns the column.
	Numeric bool
}

// Chart is an exhibit holding an SVG document drawn by package
// quillcast/core/chart. HTML inlines the SVG; Markdown links to the file
// charts/NN-stem.svg, NN being the exhibit number.
type Chart struct {
	// Number is the exhibit number to show, as for [Table.Number].
	Number  int
	Caption string
	SVG     string
	// Stem names the chart's file, for example "actual-vs-forecast";
	// letters other than a-z and 0-9 become hyphens, and empty gives
	// "chart".
	Stem string
}

// Steps is a code block holding steps to reproduce the analysis.
type Steps struct {
	// Info is the fence's info word naming the step language; empty writes
	// none.
	Info string
	Text string
}

func (Paragraph) isBlock() {}
func (List) isBlock()      {}
func (Table) isBlock()     {}
func (Chart) isBlock()     {}
func (Steps) isBlock()     {}
