//go:build !faulthook

package runner

import "quillcast/core/steps"

// faultLabel is an ordinary forecast label in the shipped engine; only a
// build with the faulthook tag makes a step with it fault (see
// faulthook_on.go).
const faultLabel = "engine-fault-drill"

// faultHook returns no hook: the shipped engine runs every step as written.
func faultHook() func(s *steps.Step) { return nil }
