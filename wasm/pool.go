//go:build js && wasm

package main

import (
	"context"
	"encoding/json"
	"errors"
	"syscall/js"

	"quillcast/core/bakeoff"
)

// This file lets a session's bake-off use more than one core. Go compiled
// to WebAssembly runs on one thread, so the engine worker asks the page for
// further workers: worker.js sets globalThis.quillcastPool to
//
//	{size, why, run(request string) → Promise of the envelope text}
//
// where size is how many further workers the page may start (0 when it
// may start none, why then saying why) and run hands a part of the
// bake-off to one of them, which answers it with bakeoffPart. The page only
// moves the text; splitting and merging happen here (see [bakeoff.Pool]).

// poolGlobal is the global the engine worker finds the page's pool under.
const poolGlobal = "quillcastPool"

// pagePool is the page's further workers as a [bakeoff.Pool].
type pagePool struct {
	offer js.Value
}

// pagePoolOf returns the page's pool, or nil where the host offers none
// (Node, or an engine started without worker.js).
func pagePoolOf() bakeoff.Pool {
	h := js.Global().Get(poolGlobal)
	if h.Type() != js.TypeObject || h.Get("size").Type() != js.TypeNumber {
		return nil
	}
	return pagePool{offer: h}
}

func (p pagePool) Size() int { return p.offer.Get("size").Int() }

func (p pagePool) Why() string {
	if w := p.offer.Get("why"); w.Type() == js.TypeString && w.String() != "" {
		return w.String()
	}
	return "no further worker could start"
}

// Do hands request to a further worker and waits for its answer.
func (p pagePool) Do(ctx context.Context, request []byte) ([]byte, error) {
	v, err := await(p.offer.Call("run", string(request)))
	if be := (*browserError)(nil); errors.As(err, &be) {
		return nil, errors.New(be.Message) // the page's words, without the kind of error
	}
	if err != nil {
		return nil, err
	}
	if v.Type() != js.TypeString {
		return nil, errors.New("the worker sent no answer")
	}
	return answerOf(v.String())
}

// answerOf reads the envelope text of bakeoffPart: its value, or its
// error.
func answerOf(text string) ([]byte, error) {
	var env struct {
		OK    bool            `json:"ok"`
		Value json.RawMessage `json:"value"`
		Error *Failure        `json:"error"`
	}
	if err := json.Unmarshal([]byte(text), &env); err != nil {
		return nil, errors.New("the worker's answer could not be read")
	}
	if !env.OK {
		if env.Error != nil && env.Error.Message != "" {
			return nil, errors.New(env.Error.Message)
		}
		return nil, errors.New("the worker failed without saying why")
	}
	return env.Value, nil
}

// bakeoffPart(request string) forecasts a part of a bake-off that another
// engine's session sent through the page (see [bakeoff.RunPart]) and
// answers with what each method made of each series.
func (a *app) bakeoffPart(args []js.Value) (any, error) {
	req, err := stringArg(args, 0, "the part of the bake-off")
	if err != nil {
		return nil, err
	}
	answer, err := bakeoff.RunPart(context.Background(), []byte(req))
	if err != nil {
		return nil, err
	}
	return json.RawMessage(answer), nil
}
