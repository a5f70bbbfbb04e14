package series

// ReadOptions tells [Read] what to take as given instead of detecting it.
// The zero value detects everything and cleans nothing. Steps write these
// fields and sessions store them.
type ReadOptions struct {
	// Delimiter separates cells: ',', ';', '\t' or '|'; 0 detects it from
	// the first lines.
	Delimiter byte
	// Header says whether the first line holds column names; the zero value
	// detects it.
	Header HeaderMode
	// Date names the column holding periods (case and surrounding spaces do
	// not matter); "" finds it, and a file without one is read as positions
	// 1, 2, 3, ...
	Date string
	// Values names the columns to read as series; nil reads every column of
	// numbers that is not the period, series or a row counter.
	Values []string
	// Series names the column that tells series apart in the long layout
	// (series, period, value columns); setting it chooses the long layout.
	Series string
	// Layout forces the wide, long or across layout; the zero value
	// detects it.
	Layout Layout
	// DateOrder says how dates like 01/02/2024 are written; the zero value
	// decides from the column and asks when no value settles it.
	DateOrder DateOrder
	// DecimalMark is '.' or ','; 0 decides per column from all its cells
	// and asks when no cell settles it.
	DecimalMark byte
	// Frequency maps every date to a period of this frequency (a date with
	// a time, or a day in a monthly file, counts for its month); the zero
	// value infers it from the dates.
	Frequency Frequency
	// Missing lists more cell texts that mean "no value", beside the empty
	// cell, NA, N/A, NaN, null, none, - and the like.
	Missing []string
	// Only keeps the rows whose column Only.Column holds exactly Only.Value
	// (for example role = fit); the zero value keeps every row.
	Only Match
	// MaxBytes is the largest file read, in bytes; 0 means [DefaultMaxBytes].
	MaxBytes int

	// Sort places rows that are out of order at their periods and lists
	// each move; without it out-of-order rows are reported and the series
	// is not ready for use.
	Sort bool
	// Duplicates says how to combine several rows for one period; the zero
	// value reports them and leaves the period missing.
	Duplicates Aggregate
	// Fill says how to fill missing values inside a series; the zero value
	// leaves them missing (NaN) and reports them.
	Fill FillMethod
}

// DefaultMaxBytes is the largest file [Read] accepts when
// [ReadOptions.MaxBytes] is 0: 256 MiB, well above a million rows and
// below what a browser tab can hold comfortably.
const DefaultMaxBytes = 256 << 20

// Match selects rows by the text of one column.
type Match struct {
	Column string // column name; "" selects every row
	Value  string // the text the cell must hold, compared after trimming spaces
}

// HeaderMode says whether the first line holds column names.
type HeaderMode uint8

// Header modes.
const (
	DetectHeader HeaderMode = iota // decide from the first line
	WithHeader                     // the first line holds column names
	NoHeader                       // the first line holds data
)

// Layout is how a file arranges its series.
type Layout uint8

// Layouts.
const (
	DetectLayout Layout = iota // decide from the file
	Wide                       // one series per value column
	Long                       // series, period and value columns; one row per series and period
	Across                     // one row per series, one column per period named by the period
)

// String returns "wide", "long" or "across" ("" when not set).
func (l Layout) String() string {
	switch l {
	case Wide:
		return "wide"
	case Long:
		return "long"
	case Across:
		return "across"
	}
	return ""
}

// DateOrder is how dates with two leading numbers, like 01/02/2024, are
// written.
type DateOrder uint8

// Date orders.
const (
	DetectOrder DateOrder = iota // decide from the column's values
	DayFirst                     // 01/02/2024 is 1 February 2024
	MonthFirst                   // 01/02/2024 is 2 January 2024
)

// Aggregate combines the values of several rows for one period.
type Aggregate uint8

// Aggregates.
const (
	KeepDuplicates Aggregate = iota // report duplicates; leave the period missing
	Sum                             // add the values
	Mean                            // average the values
)

// String returns "sum" or "mean" ("" when not set).
func (a Aggregate) String() string {
	switch a {
	case Sum:
		return "sum"
	case Mean:
		return "mean"
	}
	return ""
}

// FillMethod fills missing values inside a series.
type FillMethod uint8

// Fill methods.
const (
	NoFill       FillMethod = iota // leave missing values as NaN
	CarryForward                   // repeat the last value before the gap
	Linear                         // straight line between the values on either side
	Seasonal                       // the value one season earlier (later at the start)
)

// String returns "carry forward", "linear" or "seasonal" ("" when not set).
func (f FillMethod) String() string {
	switch f {
	case CarryForward:
		return "carry forward"
	case Linear:
		return "linear"
	case Seasonal:
		return "seasonal"
	}
	return ""
}
