package bakeoff

import (
	"context"
	"encoding/json"
	"fmt"
)

// Pool runs parts of a bake-off on other engines, for a host where one
// engine cannot use more than one core (a page, whose engine runs in one
// Web Worker, lends the parts to further workers). A part travels as the
// bytes of a request made by [Run]; the other engine answers it with
// [RunPart]. Run merges the answers in series order, so the result is the
// same as a run without a pool.
type Pool interface {
	// Size is how many parts the pool runs at once; 0 or less means none.
	Size() int
	// Why says, when Size is 0 or less, why the pool has no places (for
	// example that no further worker could start), for a note to the user.
	Why() string
	// Do runs one part and returns the answer of [RunPart]. An error
	// means the part could not be run there; Run then forecasts it itself.
	Do(ctx context.Context, request []byte) ([]byte, error)
}

// poolKey is the context key of the pool a host supplies.
type poolKey struct{}

// WithPool returns ctx carrying p, for code that runs a bake-off deep in
// a call chain (a session's step) to find with [PoolFrom].
func WithPool(ctx context.Context, p Pool) context.Context {
	return context.WithValue(ctx, poolKey{}, p)
}

// PoolFrom returns the pool ctx carries, or nil.
func PoolFrom(ctx context.Context) Pool {
	p, _ := ctx.Value(poolKey{}).(Pool)
	return p
}

// partRequest is a part of a bake-off as it travels to another engine.
type partRequest struct {
	Season  int      `json:"season"`
	Methods []string `json:"methods"`
	Series  []Series `json:"series"`
}

// partOutcome is what every method made of one series, as it travels back.
type partOutcome struct {
	Forecasts [][]float64 `json:"forecasts"` // by method; null when skipped
	Skips     []string    `json:"skips"`     // by method; "" when it ran
}

// RunPart answers a request that [Run] sent to a [Pool]: it forecasts the
// series of the request with its methods and returns what each method
// made of each series, for Run to score. Floating-point values travel as
// the shortest decimal text that reads back to the same value, so the
// merged result does not depend on where a part ran.
func RunPart(ctx context.Context, request []byte) ([]byte, error) {
	var req partRequest
	if err := json.Unmarshal(request, &req); err != nil {
		return nil, fmt.Errorf("the part of the bake-off could not be read: %v", err)
	}
	o := Options{Season: req.Season, Methods: req.Methods}
	if req.Methods == nil {
		return nil, fmt.Errorf("the part of the bake-off names no methods")
	}
	methods, err := o.methods()
	if err != nil {
		return nil, err
	}
	out := make([]partOutcome, len(req.Series))
	for i, s := range req.Series {
		if err := ctx.Err(); err != nil {
			return nil, fmt.Errorf("part of the bake-off stopped after %d of %d series: %w", i, len(req.Series), err)
		}
		oc := forecastSeries(s, methods, o)
		out[i] = partOutcome{Forecasts: oc.forecasts, Skips: oc.skips}
	}
	return json.Marshal(out)
}

// outcomesOf reads the answer of [RunPart] to a request for series data,
// checking that it holds one outcome per series with one forecast of the
// right length or one reason per method.
func outcomesOf(answer []byte, data []Series, methods int) ([]seriesOutcome, error) {
	var got []partOutcome
	if err := json.Unmarshal(answer, &got); err != nil {
		return nil, fmt.Errorf("the answer could not be read: %v", err)
	}
	if len(got) != len(data) {
		return nil, fmt.Errorf("the answer holds %d series instead of %d", len(got), len(data))
	}
	out := make([]seriesOutcome, len(got))
	for i, g := range got {
		if len(g.Forecasts) != methods || len(g.Skips) != methods {
			return nil, fmt.Errorf("the answer for series %q holds %d forecasts and %d reasons instead of %d", data[i].Name, len(g.Forecasts), len(g.Skips), methods)
		}
		for j, f := range g.Forecasts {
			if (f == nil) == (g.Skips[j] == "") || (f != nil && len(f) != len(data[i].Test)) {
				return nil, fmt.Errorf("the answer for series %q has a malformed forecast of method %d", data[i].Name, j+1)
			}
		}
		out[i] = seriesOutcome{forecasts: g.Forecasts, skips: g.Skips}
	}
	return out, nil
}
