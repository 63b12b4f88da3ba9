package pipeline

import (
	"os"
	"runtime/debug"
)

// batchGCPercent is the garbage collector's target while a batch of wells
// is checked or drawn. Parsing and drawing make garbage fast (about 110 KB
// per well to parse, several MB per sheet to draw) while the live heap
// stays small, so at the default (100) the collector runs constantly. At
// 400, 1,000 wells checked in about 13 % less CPU, and 100 wells drew
// about 1.5 times faster (BENCHMARKS.md).
const batchGCPercent = 400

// batchMemoryLimit is the soft heap limit that keeps the less eager
// collector within the memory budget of a 1,000-well run (200 MB RSS):
// near it the runtime collects as often as it must.
const batchMemoryLimit = 120 << 20

// lessEagerGC sets batchGCPercent and batchMemoryLimit, unless the user
// chose GOGC or GOMEMLIMIT, and returns the function that restores the
// previous settings.
func lessEagerGC() (restore func()) {
	if os.Getenv("GOGC") != "" || os.Getenv("GOMEMLIMIT") != "" {
		return func() {}
	}
	prevPercent := debug.SetGCPercent(batchGCPercent)
	prevLimit := debug.SetMemoryLimit(batchMemoryLimit)
	return func() {
		debug.SetGCPercent(prevPercent)
		debug.SetMemoryLimit(prevLimit)
	}
}
