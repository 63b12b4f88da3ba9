package pipeline

import (
	"io"

	"github.com/tremie-dev/tremie/render/pipeline/batch"
)

// progress is where batch progress is drawn: the terminal, unless quiet.
func (r *Run) progress() io.Writer {
	if r.opts.Quiet {
		return nil
	}
	return batch.Terminal()
}

// LoadAll reads and parses every well of the run in parallel, in input
// order, and marks wells sharing an ID as input errors.
func (r *Run) LoadAll() []*Well {
	res, _ := batch.Run(r.Inputs, batch.Options{}, func(_ int, in Input) (*Well, batch.Outcome, error) {
		return Load(in), batch.Done, nil
	})
	wells := make([]*Well, len(res))
	for i, x := range res {
		wells[i] = x.Value
		if x.Err != nil { // a panic caught by the runner
			wells[i] = &Well{Input: r.Inputs[i], Err: x.Err}
		}
	}
	markDuplicateIDs(wells)
	return wells
}

// PrepareAll loads every well of the run and prepares each (project
// defaults, check, quantities) in parallel; results come in input order,
// so reports are the same on every run.
func (r *Run) PrepareAll(checks Checks, label string) []*Well {
	defer lessEagerGC()()
	wells := r.LoadAll()
	res, _ := batch.Run(wells, batch.Options{Progress: r.progress(), Label: label}, func(_ int, w *Well) (*Well, batch.Outcome, error) {
		w.Prepare(checks)
		return w, batch.Done, nil
	})
	for i, x := range res {
		if x.Err != nil { // a panic caught by the runner
			wells[i].Err, wells[i].Well = x.Err, nil
		}
	}
	return wells
}
