package batch

import (
	"errors"
	"strings"
	"sync/atomic"
	"testing"
)

// TestEachCallsEveryPart: every part runs exactly once, and Each returns
// only when all have.
func TestEachCallsEveryPart(t *testing.T) {
	for _, n := range []int{0, 1, 2, 7, 100} {
		calls := make([]atomic.Int32, n)
		Each(n, func(i int) { calls[i].Add(1) })
		for i := range calls {
			if c := calls[i].Load(); c != 1 {
				t.Errorf("n=%d: part %d ran %d times", n, i, c)
			}
		}
	}
}

// TestEachUsesFreeCPUs: with every token free, parts run at once, at
// most one goroutine per token plus the caller; with every token held
// (all workers busy), they run one after another in the caller.
func TestEachUsesFreeCPUs(t *testing.T) {
	var inFlight, peak atomic.Int32
	part := func(int) {
		n := inFlight.Add(1)
		for {
			p := peak.Load()
			if n <= p || peak.CompareAndSwap(p, n) {
				break
			}
		}
		for i := 0; i < 1e6; i++ { // long enough to overlap
			_ = i * i
		}
		inFlight.Add(-1)
	}
	Each(50, part)
	if max := int32(cap(cpus) + 1); peak.Load() > max {
		t.Errorf("%d parts at once, at most %d allowed", peak.Load(), max)
	}
	for range cap(cpus) {
		cpus <- struct{}{}
	}
	peak.Store(0)
	Each(10, part)
	for range cap(cpus) {
		<-cpus
	}
	if peak.Load() != 1 {
		t.Errorf("with no free CPU, %d parts ran at once, want 1", peak.Load())
	}
}

// TestEachPanicBecomesItemError: a part that panics on a helper
// goroutine fails its item, not the process.
func TestEachPanicBecomesItemError(t *testing.T) {
	res, sum := Run([]int{0}, Options{Workers: 1}, func(int, int) (int, Outcome, error) {
		Each(4, func(i int) {
			if i == 1 {
				panic("part 1 broke")
			}
		})
		return 0, Done, nil
	})
	var pe *PanicError
	if sum.Failed != 1 || !errors.As(res[0].Err, &pe) || !strings.Contains(pe.Error(), "part 1 broke") {
		t.Fatalf("got %+v, %v; want the part's panic as the item's error", sum, res[0].Err)
	}
	if strings.Contains(pe.Error(), "internal error: internal error") {
		t.Errorf("panic wrapped twice: %v", pe)
	}
}
