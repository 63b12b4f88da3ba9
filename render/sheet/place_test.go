package sheet

import (
	"math"
	"math/rand"
	"testing"
)

func cost(tops, targets []float64) float64 {
	c := 0.0
	for i := range tops {
		d := tops[i] - targets[i]
		c += d * d
	}
	return c
}

// Worked by hand: two 10-pt labels both wanting their top at 50 with no
// gap share the displacement equally, 45 and 55 (minimise (y-50)^2 +
// (y+10-50)^2: y = 45).
func TestPlaceTwoEqualTargets(t *testing.T) {
	tops, ok := place([]float64{50, 50}, []float64{10, 10}, 0, 0, 1000)
	if !ok || math.Abs(tops[0]-45) > 1e-9 || math.Abs(tops[1]-55) > 1e-9 {
		t.Fatalf("tops = %v ok=%v, want [45 55]", tops, ok)
	}
}

// Worked by hand: three 10-pt labels at targets 0, 0, 0 with a 2-pt gap
// against a top bound of 0: they stack from the bound, 0, 12, 24.
func TestPlaceClampedAtTop(t *testing.T) {
	tops, ok := place([]float64{0, 0, 0}, []float64{10, 10, 10}, 2, 0, 1000)
	want := []float64{0, 12, 24}
	for i := range want {
		if !ok || math.Abs(tops[i]-want[i]) > 1e-9 {
			t.Fatalf("tops = %v, want %v", tops, want)
		}
	}
}

// bruteForce finds the optimum by enumerating every partition of the
// labels into consecutive blocks (the optimum of an isotonic regression
// is constant on such blocks, each at its mean or at a bound) and keeping
// the cheapest partition whose values are non-decreasing.
func bruteForce(targets, heights []float64, gap, lo, hi float64) []float64 {
	n := len(targets)
	off := make([]float64, n)
	for i := 1; i < n; i++ {
		off[i] = off[i-1] + heights[i-1] + gap
	}
	zmax := hi - off[n-1] - heights[n-1]
	best, bestCost := []float64(nil), math.Inf(1)
	for mask := 0; mask < 1<<(n-1); mask++ {
		z := make([]float64, n)
		start := 0
		for i := 0; i < n; i++ {
			if i == n-1 || mask&(1<<i) != 0 {
				m := 0.0
				for k := start; k <= i; k++ {
					m += targets[k] - off[k]
				}
				m /= float64(i - start + 1)
				m = math.Max(lo, math.Min(zmax, m))
				for k := start; k <= i; k++ {
					z[k] = m
				}
				start = i + 1
			}
		}
		mono := true
		for i := 1; i < n; i++ {
			if z[i] < z[i-1]-1e-12 {
				mono = false
			}
		}
		if !mono {
			continue
		}
		y := make([]float64, n)
		for i := range z {
			y[i] = z[i] + off[i]
		}
		if c := cost(y, targets); c < bestCost {
			best, bestCost = y, c
		}
	}
	return best
}

func TestPlaceMatchesBruteForce(t *testing.T) {
	rng := rand.New(rand.NewSource(7))
	for trial := 0; trial < 500; trial++ {
		n := 1 + rng.Intn(8)
		targets := make([]float64, n)
		heights := make([]float64, n)
		for i := range targets {
			targets[i] = rng.Float64() * 200
			heights[i] = 5 + rng.Float64()*25
		}
		// depth order: the caller sorts by target
		for i := 1; i < n; i++ {
			for j := i; j > 0 && targets[j] < targets[j-1]; j-- {
				targets[j], targets[j-1] = targets[j-1], targets[j]
			}
		}
		gap, lo, hi := 2.0, 0.0, 240.0
		total := 0.0
		for _, h := range heights {
			total += h + gap
		}
		if total-gap > hi-lo {
			continue // the brute force assumes a feasible column
		}
		got, ok := place(targets, heights, gap, lo, hi)
		if !ok {
			t.Fatalf("trial %d: reported infeasible", trial)
		}
		want := bruteForce(targets, heights, gap, lo, hi)
		if c, w := cost(got, targets), cost(want, targets); c > w+1e-6 {
			t.Fatalf("trial %d: cost %.6f > optimum %.6f\ngot  %v\nwant %v", trial, c, w, got, want)
		}
		for i := range got {
			if got[i] < lo-1e-9 || got[i]+heights[i] > hi+1e-9 {
				t.Fatalf("trial %d: label %d at %.3f outside [%g,%g]", trial, i, got[i], lo, hi)
			}
			if i > 0 && got[i] < got[i-1]+heights[i-1]+gap-1e-9 {
				t.Fatalf("trial %d: labels %d and %d closer than the gap", trial, i-1, i)
			}
		}
	}
}

func TestPlaceReportsOverflow(t *testing.T) {
	_, ok := place([]float64{0, 0}, []float64{60, 60}, 0, 0, 100)
	if ok {
		t.Fatal("two 60-pt labels in a 100-pt column reported as fitting")
	}
}

func BenchmarkPlace1000(b *testing.B) {
	rng := rand.New(rand.NewSource(1))
	targets := make([]float64, 1000)
	heights := make([]float64, 1000)
	for i := range targets {
		targets[i] = float64(i) * 3
		heights[i] = 8 + rng.Float64()*10
	}
	for b.Loop() {
		place(targets, heights, 2, 0, 40000)
	}
}
