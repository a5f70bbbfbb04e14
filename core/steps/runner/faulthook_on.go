//go:build faulthook

package runner

import "quillcast/core/steps"

// faultLabel is the forecast label that makes the step fault inside the
// engine in a build with the faulthook tag. The browser tests build such
// an engine to show that a fault in one step leaves the page and the other
// steps working; the shipped engine is built without the tag, where the
// label is an ordinary one (see faulthook_off.go).
const faultLabel = "engine-fault-drill"

// faultHook returns the hook [New] installs: a forecast step labelled
// [faultLabel] stops on a runtime fault (a write to a nil map) before it
// runs, as a bug in a method would.
func faultHook() func(s *steps.Step) {
	return func(s *steps.Step) {
		if s.Verb == "forecast" && steps.Label(s) == faultLabel {
			var m map[string]int
			m[s.Text]++
		}
	}
}
