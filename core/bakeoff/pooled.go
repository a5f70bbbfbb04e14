package bakeoff

import (
	"context"
	"encoding/json"
	"fmt"
)

// partsPerSlot is how many parts each place of a pool gets on average:
// small parts keep every engine busy to the end when series differ in
// cost, and let progress advance often.
const partsPerSlot = 4

// pooled is the outcome of the series shared among a pool.
type pooled struct {
	outcomes []seriesOutcome
	engines  int    // places of the pool that answered at least one part
	note     string // why a part ran here instead, the first time it did
}

// runPooled forecasts data in parts on p, forecasting here any part p
// could not run, and reports progress after each part.
func runPooled(ctx context.Context, data []Series, methods []namedMethod, o Options, p Pool) (pooled, error) {
	parts := min(len(data), p.Size()*partsPerSlot)
	slots := min(p.Size(), parts)
	out := pooled{outcomes: make([]seriesOutcome, len(data))}
	type finished struct {
		series int
		note   string
	}
	jobs := make(chan [2]int)
	done := make(chan finished)
	answered := make(chan bool, slots)
	for range slots {
		go func() {
			remote := false
			for r := range jobs {
				seg := data[r[0]:r[1]]
				oc, err := remotePart(ctx, p, seg, methods, o)
				note := ""
				if err != nil {
					note = err.Error()
					oc = make([]seriesOutcome, len(seg))
					for i, s := range seg {
						oc[i] = forecastSeries(s, methods, o)
					}
				} else {
					remote = true
				}
				copy(out.outcomes[r[0]:r[1]], oc)
				done <- finished{series: len(seg), note: note}
			}
			answered <- remote
		}()
	}
	go func() {
		defer close(jobs)
		for k := range parts {
			select {
			case jobs <- [2]int{k * len(data) / parts, (k + 1) * len(data) / parts}:
			case <-ctx.Done():
				return
			}
		}
	}()
	go func() {
		for range slots {
			if <-answered {
				out.engines++
			}
		}
		close(done)
	}()
	series := 0
	for f := range done {
		series += f.series
		if f.note != "" && out.note == "" {
			out.note = f.note
		}
		if o.Progress != nil {
			o.Progress(series, len(data))
		}
	}
	if err := ctx.Err(); err != nil {
		return pooled{}, fmt.Errorf("bake-off stopped after %d of %d series: %w", series, len(data), err)
	}
	return out, nil
}

// remotePart runs the series seg on p and reads the answer.
func remotePart(ctx context.Context, p Pool, seg []Series, methods []namedMethod, o Options) ([]seriesOutcome, error) {
	labels := make([]string, len(methods))
	for i, m := range methods {
		labels[i] = m.label
	}
	req, err := json.Marshal(partRequest{Season: o.Season, Methods: labels, Series: seg})
	if err != nil {
		return nil, err
	}
	answer, err := p.Do(ctx, req)
	if err != nil {
		return nil, err
	}
	return outcomesOf(answer, seg, len(methods))
}
