// Package runner runs the steps of a Quillcast session against attached
// data and returns what each step shows: tables, SVG charts and messages,
// numbered as exhibits, plus the memo written from the whole run.
//
// # Where to start
//
// [New] makes a [Runner]; [Runner.Run] runs a session document on the
// attached files and returns a [Result] with one [Output] per step. A
// Runner keeps the state after every step, keyed by the text of the steps
// so far (and the data they loaded), so that after an edit only the edited
// step and those after it run again; keep one Runner per open session.
//
// # Guarantees
//
// Run never panics: a fault inside a step becomes that step's error. A
// step that fails shows its error, and later steps that need what it would
// have made say which step they wait on. The same session and data give
// byte-identical results. Every type of the result is plain data with JSON
// field names, ready to send to the page.
package runner
