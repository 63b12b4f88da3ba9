// Package batch runs one function over many items (wells, usually) in
// parallel, one worker per CPU, and hands the results back in input order
// so that whatever is printed from them is the same on every run. One
// item's failure, or panic, never stops the others.
package batch

import (
	"errors"
	"fmt"
	"io"
	"runtime"
	"runtime/debug"
	"strings"
	"sync"
	"sync/atomic"
)

// Outcome is what became of one item.
type Outcome int

const (
	Done    Outcome = iota // processed (rendered, checked, ...)
	Skipped                // nothing to do, e.g. unchanged since the last run
	Failed                 // the function returned an error or panicked
)

func (o Outcome) String() string {
	switch o {
	case Done:
		return "done"
	case Skipped:
		return "skipped"
	case Failed:
		return "failed"
	}
	return "unknown"
}

// Result is one item's result, at the item's index in the results.
type Result[T any] struct {
	Value   T
	Outcome Outcome
	Err     error // non-nil exactly when Outcome is Failed
}

// Options tune a run. The zero value runs on every CPU without progress.
type Options struct {
	// Workers is the number of items processed at once; 0 means
	// runtime.NumCPU().
	Workers int
	// Progress is where a progress bar is drawn, or nil for none; see
	// Terminal for the usual choice.
	Progress io.Writer
	// Label prefixes the progress bar, e.g. "rendering".
	Label string
}

// Func processes item i. It reports Done or Skipped; a non-nil error
// makes the item Failed whatever outcome it returned.
type Func[I, T any] func(i int, item I) (T, Outcome, error)

// PanicError is the error of an item whose function panicked.
type PanicError struct {
	Value any
	Stack string
}

func (e *PanicError) Error() string {
	return fmt.Sprintf("internal error: %v (please report)", e.Value)
}

// Run calls fn on every item and returns the results in input order with
// their summary.
func Run[I, T any](items []I, opts Options, fn Func[I, T]) ([]Result[T], Summary) {
	results := make([]Result[T], len(items))
	workers := opts.Workers
	if workers <= 0 {
		workers = runtime.NumCPU()
	}
	if workers > len(items) {
		workers = len(items)
	}
	bar := newProgress(opts.Progress, opts.Label, len(items))
	var next atomic.Int64
	var wg sync.WaitGroup
	for range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			if tryTakeCPU() {
				defer giveCPU()
			}
			for {
				i := int(next.Add(1) - 1)
				if i >= len(items) {
					return
				}
				if interrupted.Load() {
					var zero T
					results[i] = Result[T]{Value: zero, Outcome: Failed, Err: ErrInterrupted}
					continue
				}
				results[i] = call(fn, i, items[i])
				bar.add()
			}
		}()
	}
	wg.Wait()
	bar.finish()
	var s Summary
	for _, r := range results {
		s.count(r.Outcome)
	}
	return results, s
}

// call runs fn on one item, turning a panic into its error.
func call[I, T any](fn Func[I, T], i int, item I) (r Result[T]) {
	defer func() {
		if e := recover(); e != nil {
			var zero T
			pe, ok := e.(*PanicError) // raised again by Each, with the part's stack
			if !ok {
				pe = &PanicError{Value: e, Stack: string(debug.Stack())}
			}
			r = Result[T]{Value: zero, Outcome: Failed, Err: pe}
		}
	}()
	v, o, err := fn(i, item)
	if err != nil {
		return Result[T]{Value: v, Outcome: Failed, Err: err}
	}
	if o != Skipped {
		o = Done
	}
	return Result[T]{Value: v, Outcome: o}
}

// Summary counts the outcomes of a run.
type Summary struct {
	Done, Skipped, Failed int
}

func (s *Summary) count(o Outcome) {
	switch o {
	case Done:
		s.Done++
	case Skipped:
		s.Skipped++
	case Failed:
		s.Failed++
	}
}

// Total is the number of items.
func (s Summary) Total() int { return s.Done + s.Skipped + s.Failed }

// Format writes the summary with the caller's verb for Done, e.g.
// Format("rendered") gives "12 rendered, 3 skipped, 1 failed".
func (s Summary) Format(done string) string {
	parts := []string{fmt.Sprintf("%d %s", s.Done, done)}
	parts = append(parts, fmt.Sprintf("%d skipped", s.Skipped))
	parts = append(parts, fmt.Sprintf("%d failed", s.Failed))
	return strings.Join(parts, ", ")
}

func (s Summary) String() string { return s.Format("done") }

// ErrInterrupted is the error of every item a run did not start because
// it was interrupted (Ctrl-C or SIGTERM).
var ErrInterrupted = errors.New("not started: the run was interrupted")

var interrupted atomic.Bool

// Interrupt makes every running batch finish the items under way and
// start no more; their callers then save what was done (the render
// cache, for one) and return. Called from the command's signal handler.
func Interrupt() { interrupted.Store(true) }

// Interrupted reports whether Interrupt was called.
func Interrupted() bool { return interrupted.Load() }
