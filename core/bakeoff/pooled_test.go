package bakeoff

import (
	"bytes"
	"context"
	"encoding/json"
	"errors"
	"reflect"
	"strings"
	"sync"
	"testing"
)

// localPool answers parts in this process with RunPart, as another
// engine would, counting the parts it ran; broken makes it fail or
// answer wrongly. Its first calls wait until wait calls are in flight,
// as the places of a page's pool do (each waits for its worker), so that
// every place answers a part.
type localPool struct {
	size   int
	wait   int
	broken string // "", "refuse" or "garble"
	mu     sync.Mutex
	parts  int
	open   chan struct{}
}

func (p *localPool) Size() int { return p.size }

func (p *localPool) Why() string { return "the pool is empty" }

func (p *localPool) Do(ctx context.Context, req []byte) ([]byte, error) {
	p.mu.Lock()
	p.parts++
	if p.open == nil {
		p.open = make(chan struct{})
	}
	if p.parts == p.wait {
		close(p.open)
	}
	open := p.open
	p.mu.Unlock()
	if p.wait > 0 {
		<-open
	}
	switch p.broken {
	case "refuse":
		return nil, errors.New("no worker could start")
	case "garble":
		return []byte(`[{"forecasts":[[1]],"skips":[""]}]`), nil
	}
	return RunPart(ctx, req)
}

// written is everything a result shows, as text: the table, the forecasts
// file and the skips.
func written(t *testing.T, r *Result) string {
	t.Helper()
	var b bytes.Buffer
	if err := r.WriteTable(&b); err != nil {
		t.Fatal(err)
	}
	if err := r.WriteForecasts(&b); err != nil {
		t.Fatal(err)
	}
	for _, s := range r.Skips {
		b.WriteString(s.Series + "|" + s.Method + "|" + s.Reason + "\n")
	}
	return b.String()
}

// TestPoolSameResult checks that a bake-off shared among a pool, or forecast
// here because the pool failed, gives byte for byte the result of one
// worker. Data: the 174 "other" series of the M3 competition
// (competition/m3-other.csv) and the hand-made series, on which
// holt-winters with season 4 cannot run (too short) and leaves skips.
func TestPoolSameResult(t *testing.T) {
	t.Parallel()
	other := readShared(t, "competition/m3-other.csv")
	tests := []struct {
		name       string
		data       []Series
		o          Options
		pool       *localPool
		wantRemote bool
	}{
		{"other, three places", other, Options{Methods: []string{"naive2", "ses", "theta"}}, &localPool{size: 3, wait: 3}, true},
		{"other, one place", other, Options{Methods: []string{"naive", "holt"}}, &localPool{size: 1, wait: 1}, true},
		{"hand, more places than series", handSeries(), Options{Season: 4, Methods: []string{"naive", "holt-winters", "auto"}}, &localPool{size: 4, wait: 2}, true},
		{"other, pool refuses", other, Options{Methods: []string{"naive2", "ses"}}, &localPool{size: 2, broken: "refuse"}, false},
		{"hand, pool answers wrongly", handSeries(), Options{Methods: []string{"naive", "mean"}}, &localPool{size: 2, broken: "garble"}, false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			one := tc.o
			one.Workers = 1
			want, err := Run(context.Background(), tc.data, one)
			if err != nil {
				t.Fatal(err)
			}
			shared := tc.o
			shared.Pool = tc.pool
			var calls, last int
			shared.Progress = func(done, total int) {
				calls++
				if done <= last || total != len(tc.data) {
					t.Errorf("progress %d of %d after %d", done, total, last)
				}
				last = done
			}
			got, err := Run(context.Background(), tc.data, shared)
			if err != nil {
				t.Fatal(err)
			}
			if w, g := written(t, want), written(t, got); w != g {
				t.Errorf("pooled result differs from one worker's:\n%s\nwant:\n%s", g, w)
			}
			if !reflect.DeepEqual(got.Forecasts, want.Forecasts) {
				t.Error("pooled forecasts differ from one worker's")
			}
			if last != len(tc.data) || calls != tc.pool.parts {
				t.Errorf("progress reached %d of %d in %d calls; want all in %d calls (one per part)", last, len(tc.data), calls, tc.pool.parts)
			}
			if tc.wantRemote {
				if got.Engines != min(tc.pool.size, len(tc.data)) || got.PoolNote != "" {
					t.Errorf("engines %d, note %q; want %d and none", got.Engines, got.PoolNote, min(tc.pool.size, len(tc.data)))
				}
			} else if got.Engines != 0 || got.PoolNote == "" {
				t.Errorf("engines %d, note %q; want 0 and a reason", got.Engines, got.PoolNote)
			}
		})
	}
}

func TestRunPartErrors(t *testing.T) {
	t.Parallel()
	tests := []struct {
		name, req, want string
	}{
		{"not JSON", `{"season":`, "could not be read"},
		{"no methods", `{"season":1,"series":[]}`, "names no methods"},
		{"unknown method", `{"season":1,"methods":["crystal-ball"],"series":[]}`, `"crystal-ball" is not a method`},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			_, err := RunPart(context.Background(), []byte(tc.req))
			if err == nil || !strings.Contains(err.Error(), tc.want) {
				t.Errorf("error %v, want one containing %q", err, tc.want)
			}
		})
	}
}

func TestPoolCancelled(t *testing.T) {
	t.Parallel()
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	_, err := Run(ctx, handSeries(), Options{Methods: []string{"naive"}, Pool: &localPool{size: 2}})
	if !errors.Is(err, context.Canceled) {
		t.Errorf("error %v, want one wrapping context.Canceled", err)
	}
}

// FuzzRunPart checks that any request text gives an error or an answer
// that reads back as one outcome per series and method, never a panic.
func FuzzRunPart(f *testing.F) {
	f.Add([]byte(`{"season":1,"methods":["naive","mean"],"series":[{"Name":"A","FitPeriods":["1","2","3"],"Fit":[10,12,14],"TestPeriods":["4","5"],"Test":[16,12]}]}`))
	f.Add([]byte(`{"season":4,"methods":["holt-winters"],"series":[{"Name":"B","Fit":[1],"Test":[2,3]}]}`))
	f.Add([]byte(`{"season":0,"methods":["ses"],"series":[{"Name":"C","FitPeriods":["2024-Q1"],"Fit":[],"Test":[]}]}`))
	f.Add([]byte(`{"methods":[]`))
	f.Fuzz(func(t *testing.T, req []byte) {
		if len(req) > 2048 {
			t.Skip("long requests only slow the search down")
		}
		answer, err := RunPart(context.Background(), req)
		if err != nil {
			return
		}
		var r partRequest
		if err := json.Unmarshal(req, &r); err != nil {
			t.Fatalf("RunPart accepted a request that does not read: %v", err)
		}
		if _, err := outcomesOf(answer, r.Series, len(r.Methods)); err != nil {
			t.Errorf("the answer to %q does not read back: %v", req, err)
		}
	})
}
