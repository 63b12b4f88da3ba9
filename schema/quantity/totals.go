package quantity

import (
	"math"
	"sort"

	"github.com/tremie-dev/tremie/schema"
)

// Total is one material line of a project's order: one material with one
// bag (the same yield per bag and bag mass) across the wells.
type Total struct {
	Material   schema.Material
	Yield      Yield
	HasYield   bool
	Units      schema.Units // the first well's, for display
	Calculated schema.Volume
	BagsNeeded int // the sum of each interval's bags, each rounded up
	BagsOrder  int // ceil(BagsNeeded x (1 + contingency/100))
	BagsPlaced float64
	Intervals  int
}

// Totals sums each material over the reports, one line per material and
// bag, in the order of schema.Materials, then bag mass, then yield. Bags
// to order are the sum of each interval's bags (each rounded up, since an
// opened bag rarely travels to the next well) plus the contingency in
// percent, rounded up: never fewer than the intervals need. Rows whose
// volume could not be computed are left out.
func Totals(reports []*Report, contingency float64) []*Total {
	type key struct {
		m       schema.Material
		y, mass float64
	}
	byKey := map[key]*Total{}
	var order []*Total
	for _, rep := range reports {
		for _, r := range rep.Rows {
			if r.Err != nil {
				continue
			}
			k := key{m: r.Fill.Material}
			if r.HasYield {
				k.y, k.mass = float64(r.Yield.Volume), float64(r.Yield.BagMass)
			}
			t := byKey[k]
			if t == nil {
				t = &Total{Material: r.Fill.Material, Yield: r.Yield, HasYield: r.HasYield, Units: rep.Well.Units}
				byKey[k] = t
				order = append(order, t)
			}
			t.Calculated += r.Calculated
			t.BagsNeeded += r.BagsNeeded
			t.BagsPlaced += r.BagsPlaced
			t.Intervals++
		}
	}
	rank := map[schema.Material]int{}
	for i, m := range schema.Materials {
		rank[m] = i
	}
	sort.SliceStable(order, func(i, j int) bool {
		a, b := order[i], order[j]
		if a.Material != b.Material {
			return rank[a.Material] < rank[b.Material]
		}
		if a.Yield.BagMass != b.Yield.BagMass {
			return a.Yield.BagMass < b.Yield.BagMass
		}
		return a.Yield.Volume < b.Yield.Volume
	})
	for _, t := range order {
		if t.HasYield {
			t.BagsOrder = ceilBags(float64(t.BagsNeeded) * (1 + contingency/100))
		}
	}
	return order
}

// ceilBags rounds a bag count up, forgiving float noise on exact counts.
func ceilBags(n float64) int {
	if n <= 0 {
		return 0
	}
	return int(math.Ceil(n - 1e-6))
}
