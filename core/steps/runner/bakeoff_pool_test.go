package runner

import (
	"context"
	"errors"
	"reflect"
	"strings"
	"sync"
	"testing"

	"quillcast/core/bakeoff"
	"quillcast/core/memo"
)

// partPool answers the parts of a bake-off in this process, as the
// page's further workers do; size 0 stands for a page whose workers could
// not start, refuse for workers that fail. The first calls wait until
// size calls are in flight, as the places of a page's pool do (each waits
// for its worker), so that every place answers a part.
type partPool struct {
	size   int
	refuse bool
	mu     *sync.Mutex
	calls  *int
	open   chan struct{}
}

func newPartPool(size int, refuse bool) partPool {
	return partPool{size: size, refuse: refuse, mu: &sync.Mutex{}, calls: new(int), open: make(chan struct{})}
}

func (p partPool) Size() int { return p.size }

func (p partPool) Why() string { return "the page was opened from a file" }

func (p partPool) Do(ctx context.Context, req []byte) ([]byte, error) {
	if p.refuse {
		return nil, errors.New("the worker stopped")
	}
	p.mu.Lock()
	if *p.calls++; *p.calls == p.size {
		close(p.open)
	}
	p.mu.Unlock()
	<-p.open
	return bakeoff.RunPart(ctx, req)
}

// withoutSpread is an output with the message on where the bake-off ran
// left out, for comparison with a run without a pool.
func withoutSpread(o Output) Output {
	o.Key = ""
	var kept []Block
	for _, b := range o.Blocks {
		if b.Kind == "message" && strings.Contains(b.Text, "bake-off") {
			continue
		}
		kept = append(kept, b)
	}
	o.Blocks = kept
	return o
}

// TestBakeoffPool runs the shops session (testdata/sessions/shops-bakeoff.md
// on the demo data) with a pool in the context and checks that every step
// shows what it shows without one, that the memo is the same, and that
// the bake-off says where it ran.
func TestBakeoffPool(t *testing.T) {
	t.Parallel()
	doc, data := sessionFile(t, "shops-bakeoff.md"), demoData(t)
	want := New().Run(context.Background(), doc, data)
	wantMemo, err := memo.Markdown(want.Memo("test"))
	if err != nil {
		t.Fatal(err)
	}
	tests := []struct {
		name string
		pool partPool
		note string
	}{
		{"three workers", newPartPool(3, false), "The bake-off was shared among 3 workers."},
		{"no workers", newPartPool(0, false), "The bake-off ran in one worker: the page was opened from a file."},
		{"workers fail", newPartPool(2, true), "Part of the bake-off ran in one worker because another worker could not run it: the worker stopped."},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			t.Parallel()
			got := New().Run(bakeoff.WithPool(context.Background(), tc.pool), doc, data)
			if len(got.Outputs) != len(want.Outputs) {
				t.Fatalf("%d outputs, want %d", len(got.Outputs), len(want.Outputs))
			}
			for i := range got.Outputs {
				if g, w := withoutSpread(got.Outputs[i]), withoutSpread(want.Outputs[i]); !reflect.DeepEqual(g, w) {
					t.Errorf("step %d (%s) differs from the run without a pool", w.Step, w.Verb)
				}
				if got.Outputs[i].Verb == "bakeoff" && !strings.Contains(blockTexts(got.Outputs[i]), tc.note) {
					t.Errorf("bake-off output lacks %q:\n%s", tc.note, blockTexts(got.Outputs[i]))
				}
			}
			gotMemo, err := memo.Markdown(got.Memo("test"))
			if err != nil {
				t.Fatal(err)
			}
			if gotMemo != wantMemo {
				t.Error("the memo differs from the one of the run without a pool")
			}
		})
	}
}
