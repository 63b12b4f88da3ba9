package main

import (
	"fmt"
	"io"
	"os"
	"os/signal"
	"sync/atomic"
	"syscall"

	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/pipeline/batch"
)

// stoppedBy is the signal that cut the run short, 0 if none.
var stoppedBy atomic.Int32

// stopNote is what the first signal prints; a command that stops at once
// and cleanly on its own (serve) sets it to "".
var stopNote = "tremie: stopping after the wells under way (press Ctrl-C again to stop at once)"

// stopOnSignal lets Ctrl-C (SIGINT) or SIGTERM end a run cleanly: the
// first finishes the wells under way, starts no more and lets the command
// save what was done (outputs are staged and renamed, so none is half
// written, and the temporary files are removed as each well is put in
// place or given up); a second stops at once, removing the temporary
// files being written (out.RemoveStaged; anything a kill -9 leaves is
// swept by the next run).
func stopOnSignal(stderr io.Writer) {
	ch := make(chan os.Signal, 2)
	signal.Notify(ch, os.Interrupt, syscall.SIGTERM)
	go func() {
		sig := <-ch
		if s, ok := sig.(syscall.Signal); ok {
			stoppedBy.Store(int32(s))
		}
		batch.Interrupt()
		if stopNote != "" {
			fmt.Fprintln(stderr, stopNote)
		}
		<-ch
		out.RemoveStaged()
		os.Exit(exitStatus(exitInput))
	}()
}

// exitStatus is the command's status, or, when a signal cut the run
// short, the shells' convention for it: 128 + the signal's number, so
// 130 for SIGINT and 143 for SIGTERM.
func exitStatus(code int) int {
	if s := stoppedBy.Load(); s != 0 {
		return 128 + int(s)
	}
	return code
}
