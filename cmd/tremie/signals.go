package main

import (
	"fmt"
	"io"
	"os"
	"os/signal"
	"syscall"

	"github.com/tremie-dev/tremie/render/pipeline/batch"
)

// exitInterrupted is the conventional status of a run stopped by
// SIGINT (128 + 2).
const exitInterrupted = 130

// stopOnSignal lets Ctrl-C or SIGTERM end a run cleanly: the first
// finishes the wells under way, starts no more and lets the command save
// what was done (outputs are staged and renamed, so none is half
// written); a second stops at once, and the next run sweeps any
// temporary file left behind.
func stopOnSignal(stderr io.Writer) {
	ch := make(chan os.Signal, 2)
	signal.Notify(ch, os.Interrupt, syscall.SIGTERM)
	go func() {
		<-ch
		batch.Interrupt()
		fmt.Fprintln(stderr, "tremie: stopping after the wells under way (press Ctrl-C again to stop at once)")
		<-ch
		os.Exit(exitInterrupted)
	}()
}

// exitStatus is the command's status, or exitInterrupted when a signal
// cut the run short.
func exitStatus(code int) int {
	if batch.Interrupted() {
		return exitInterrupted
	}
	return code
}
