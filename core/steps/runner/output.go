package runner

import (
	"quillcast/core/session"
	"quillcast/core/steps"
)

// Status says how a step's run ended.
type Status string

// The statuses of a step.
const (
	Done    Status = "done"    // the step ran; its blocks show the result
	Failed  Status = "failed"  // the step has an error; Error says why
	Waiting Status = "waiting" // an earlier step it needs failed; WaitsOn names it
)

// Block kinds.
const (
	TableBlock   = "table"
	ChartBlock   = "chart"
	MessageBlock = "message"
)

// Message levels.
const (
	Info    = "info"
	Warning = "warning"
	Problem = "error"
)

// Output is what one step shows.
type Output struct {
	Step    int          `json:"step"`   // 1-based step number
	Line    int          `json:"line"`   // 1-based document line of the step
	Text    string       `json:"text"`   // the step line as written
	Verb    string       `json:"verb"`   // the verb
	Status  Status       `json:"status"` // done, failed or waiting
	Error   *steps.Error `json:"error,omitempty"`
	WaitsOn int          `json:"waitsOn,omitempty"` // the failed step this one waits on
	Blocks  []Block      `json:"blocks"`
	// Fault holds the runtime detail of an internal fault (a failure of the
	// engine, not of the input) for a bug report; the page does not show it,
	// since Error already says what happened in plain words. Empty otherwise.
	Fault string `json:"fault,omitempty"`
	// Key is a digest of what the output shows: two outputs with the same
	// Key have the same Step, Verb, Status, Error (but for its line),
	// WaitsOn and Blocks; Line and Text may differ, after an edit that moves
	// or rewords the step without changing its result. A step reused or
	// recomputed to the same result keeps its Key, which lets a caller keep
	// what it drew from the earlier output. It is 32 hexadecimal digits.
	Key string `json:"key,omitempty"`
}

// Block is one piece of a step's output: a table, a chart or a message.
// Tables and charts are exhibits, numbered from 1 through the session.
type Block struct {
	Kind    string `json:"kind"`              // "table", "chart" or "message"
	Exhibit int    `json:"exhibit,omitempty"` // exhibit number; 0 for messages
	Title   string `json:"title,omitempty"`   // exhibit title, without the number
	Table   *Table `json:"table,omitempty"`   // the table of a table block
	SVG     string `json:"svg,omitempty"`     // the SVG document of a chart block
	File    string `json:"file,omitempty"`    // the chart's file name in the memo's charts folder
	Level   string `json:"level,omitempty"`   // info, warning or error, for messages
	Text    string `json:"text,omitempty"`    // the message, or a note under an exhibit
}

// Table is a table of formatted cells, every number already written the
// way the page and the memo show it.
type Table struct {
	Headers []string   `json:"headers"`
	Rows    [][]string `json:"rows"`
	// Right says, per column, whether cells align right (numbers).
	Right []bool `json:"right"`
}

// Result is the outcome of running a whole session.
type Result struct {
	Outputs []Output       `json:"outputs"` // one per step, in order
	Errors  []*steps.Error `json:"errors"`  // every step error, in order (parse and run)
	// Computed and Reused count the steps run afresh and those whose
	// earlier result was reused.
	Computed int `json:"-"`
	Reused   int `json:"-"`

	final *state            // the state after the last step, for the memo
	doc   *session.Document // the session, for its prose and steps
}
