package batch

import (
	"bytes"
	"errors"
	"strings"
	"sync"
	"testing"
	"time"
)

func TestResultsInInputOrder(t *testing.T) {
	items := make([]int, 200)
	for i := range items {
		items[i] = i
	}
	res, sum := Run(items, Options{Workers: 8}, func(i, item int) (int, Outcome, error) {
		if item%7 == 0 {
			time.Sleep(time.Millisecond) // finish out of order
		}
		return item * item, Done, nil
	})
	if sum.Done != 200 || sum.Failed != 0 || sum.Skipped != 0 {
		t.Fatalf("summary %+v", sum)
	}
	for i, r := range res {
		if r.Value != i*i || r.Outcome != Done || r.Err != nil {
			t.Fatalf("result %d = %+v", i, r)
		}
	}
}

func TestWorkersRunAtOnce(t *testing.T) {
	const workers = 4
	var mu sync.Mutex
	inFlight, peak := 0, 0
	all := make(chan struct{})
	var once sync.Once
	Run(make([]int, workers), Options{Workers: workers}, func(i, _ int) (int, Outcome, error) {
		mu.Lock()
		inFlight++
		if inFlight > peak {
			peak = inFlight
		}
		if inFlight == workers {
			once.Do(func() { close(all) })
		}
		mu.Unlock()
		select {
		case <-all: // every worker reached here together
		case <-time.After(5 * time.Second):
		}
		mu.Lock()
		inFlight--
		mu.Unlock()
		return 0, Done, nil
	})
	if peak != workers {
		t.Errorf("at most %d items ran at once, want %d", peak, workers)
	}
}

func TestFailuresAndPanicsStayWithTheirItem(t *testing.T) {
	items := []string{"a", "bad", "c", "boom", "e", "skip"}
	res, sum := Run(items, Options{}, func(i int, s string) (string, Outcome, error) {
		switch s {
		case "bad":
			return "", Done, errors.New("unreadable")
		case "boom":
			var m map[string]int
			m["x"] = 1 // a nil-map write panics
		case "skip":
			return s, Skipped, nil
		}
		return strings.ToUpper(s), Done, nil
	})
	if sum != (Summary{Done: 3, Skipped: 1, Failed: 2}) {
		t.Errorf("summary %+v", sum)
	}
	if res[1].Outcome != Failed || res[1].Err.Error() != "unreadable" {
		t.Errorf("bad: %+v", res[1])
	}
	var pe *PanicError
	if res[3].Outcome != Failed || !errors.As(res[3].Err, &pe) || !strings.Contains(pe.Stack, "batch_test.go") {
		t.Errorf("boom: %+v", res[3])
	}
	if res[4].Value != "E" || res[5].Outcome != Skipped {
		t.Errorf("items after the failures: %+v %+v", res[4], res[5])
	}
	if got := sum.Format("rendered"); got != "3 rendered, 1 skipped, 2 failed" {
		t.Errorf("Format: %q", got)
	}
}

func TestEmptyInput(t *testing.T) {
	res, sum := Run([]int(nil), Options{Progress: &bytes.Buffer{}}, func(i, _ int) (int, Outcome, error) { return 0, Done, nil })
	if len(res) != 0 || sum.Total() != 0 {
		t.Errorf("%v %+v", res, sum)
	}
}

func TestProgressOnlyWhenAsked(t *testing.T) {
	var buf bytes.Buffer
	Run(make([]int, 5), Options{Progress: &buf, Label: "rendering"}, func(i, _ int) (int, Outcome, error) { return 0, Done, nil })
	if !strings.Contains(buf.String(), "rendering") {
		t.Errorf("progress output %q lacks the label", buf.String())
	}
	t.Setenv("CI", "true")
	if Terminal() != nil {
		t.Error("Terminal() must be nil in CI")
	}
}

func BenchmarkRunOverhead(b *testing.B) {
	items := make([]int, 1000)
	for b.Loop() {
		Run(items, Options{}, func(i, v int) (int, Outcome, error) { return v + i, Done, nil })
	}
}
