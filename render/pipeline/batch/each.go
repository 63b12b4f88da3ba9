package batch

import (
	"runtime"
	"runtime/debug"
	"sync"
)

// cpus holds a token per CPU. Each worker of Run holds one while it
// works, when one is free; Each runs the parts of one item (a well's
// sheets and formats) on the tokens no worker holds. So the last items
// of a run, or a run of one well, keep every CPU busy, and while every
// worker is busy the parts run in the worker itself, as before, with no
// goroutine or memory added.
var cpus = make(chan struct{}, runtime.NumCPU())

func tryTakeCPU() bool {
	select {
	case cpus <- struct{}{}:
		return true
	default:
		return false
	}
}

func giveCPU() { <-cpus }

// Each calls fn(0) … fn(n-1), each part on a free CPU token if there is
// one and in the caller otherwise, and returns when all have returned.
// Parts must be independent of each other. A panic in a part is raised
// again in the caller as a *PanicError (the first in part order), once
// every part has returned; Run reports it as the item's error.
func Each(n int, fn func(i int)) {
	if n <= 0 {
		return
	}
	panics := make([]*PanicError, n)
	part := func(i int) {
		defer func() {
			if e := recover(); e != nil {
				panics[i] = &PanicError{Value: e, Stack: string(debug.Stack())}
			}
		}()
		fn(i)
	}
	var wg sync.WaitGroup
	for i := 0; i < n; i++ {
		// The last part always runs here: the caller waits anyway.
		if i < n-1 && tryTakeCPU() {
			wg.Add(1)
			go func() {
				defer wg.Done()
				defer giveCPU()
				part(i)
			}()
			continue
		}
		part(i)
	}
	wg.Wait()
	for _, p := range panics {
		if p != nil {
			panic(p)
		}
	}
}
