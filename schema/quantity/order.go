package quantity

import (
	"sort"

	"github.com/tremie-dev/tremie/schema"
)

// DefaultContingency is the percentage added to each calculated volume
// before it is rounded up to whole bags: J. Kuo, Practical Design
// Calculations for Groundwater and Soil Remediation (2nd ed., CRC Press),
// examples 2.21 and 2.22 add 10 % to the sand and bentonite, since a
// borehole is never a perfect cylinder.
const DefaultContingency = 10.0

// DefaultContingencySource names where DefaultContingency comes from.
const DefaultContingencySource = "Kuo, Practical Design Calculations for Groundwater and Soil Remediation, examples 2.21-2.22"

// Planned reports whether a well is to be ordered for rather than
// reconciled: its status says planned, or none of its fills records an
// amount placed.
func Planned(w *schema.Well) bool {
	if w.IsPlanned() {
		return true
	}
	for _, f := range w.Fills {
		if f.Recorded() {
			return false
		}
	}
	return true
}

// BagsToOrder is the bags to order for the interval: its calculated
// volume with contingency percent added, rounded up to whole bags; 0 for
// a material without a yield per bag.
func (r Row) BagsToOrder(contingency float64) int {
	if r.Err != nil || !r.HasYield || r.Yield.Volume <= 0 {
		return 0
	}
	return bagsUp(float64(r.Calculated) * (1 + contingency/100) / float64(r.Yield.Volume))
}

// Line is one material of a list, with one bag (the same yield per bag
// and bag mass) across the wells.
type Line struct {
	Material   schema.Material
	Yield      Yield
	HasYield   bool
	Units      schema.Units // the first well's, for display
	Calculated schema.Volume
	// BagsNeeded is the sum of each interval's bags, each rounded up (an
	// opened bag rarely travels to the next well); BagsOrder the same with
	// the contingency added to each volume before rounding.
	BagsNeeded int
	BagsOrder  int
	BagsPlaced float64
	Placed     schema.Volume // recorded volumes and bags x yield
	Intervals  int           // fill intervals and pads counted
}

// Order is a project's materials: the order list for the wells it is
// ordering for, and the as-built list of the wells that record what went
// in, to reconcile.
type Order struct {
	Contingency float64 // percent
	// For names the wells ordered for. Planned is true when they are the
	// planned wells; false when no well is planned and the order covers
	// every well (a repeat of the as-built wells, say).
	For     []string
	Planned bool
	Lines   []*Line
	// AsBuilt names the wells that record amounts, and their materials.
	AsBuilt      []string
	AsBuiltLines []*Line
	// Held names the wells left out of both lists because a finding says
	// their sizes are likely a unit slip (rule SIZE-PLAUSIBLE): a 2000 mm
	// hole would order hundreds of bags. The caller sets it.
	Held []string
}

// Totals sums the reports into an order with contingency percent.
func Totals(reports []*Report, contingency float64) *Order {
	o := &Order{Contingency: contingency}
	var planned, built []*Report
	for _, r := range reports {
		if Planned(r.Well) {
			planned = append(planned, r)
		} else {
			built = append(built, r)
		}
	}
	order := planned
	o.Planned = len(planned) > 0
	if !o.Planned {
		order = reports
	}
	for _, r := range order {
		o.For = append(o.For, r.Well.ID)
	}
	for _, r := range built {
		o.AsBuilt = append(o.AsBuilt, r.Well.ID)
	}
	o.Lines = sumLines(order, contingency)
	o.AsBuiltLines = sumLines(built, contingency)
	return o
}

// sumLines sums each material over the reports' rows and pads, one line
// per material and bag, in schema.Materials order.
func sumLines(reports []*Report, contingency float64) []*Line {
	type key struct {
		m       schema.Material
		y, mass float64
	}
	byKey := map[key]*Line{}
	var out []*Line
	add := func(r *Report, row *Row) {
		if row.Err != nil {
			return
		}
		k := key{m: row.Fill.Material}
		if row.HasYield {
			k.y, k.mass = float64(row.Yield.Volume), float64(row.Yield.BagMass)
		}
		l := byKey[k]
		if l == nil {
			l = &Line{Material: row.Fill.Material, Yield: row.Yield, HasYield: row.HasYield, Units: r.Well.Units}
			byKey[k] = l
			out = append(out, l)
		}
		l.Calculated += row.Calculated
		l.BagsNeeded += row.BagsNeeded
		l.BagsOrder += row.BagsToOrder(contingency)
		l.BagsPlaced += row.BagsPlaced
		l.Placed += row.Placed
		l.Intervals++
	}
	for _, r := range reports {
		for i := range r.Rows {
			add(r, &r.Rows[i])
		}
		if r.Pad != nil {
			add(r, r.Pad)
		}
	}
	rank := map[schema.Material]int{}
	for i, m := range schema.Materials {
		rank[m] = i
	}
	sort.SliceStable(out, func(i, j int) bool {
		a, b := out[i], out[j]
		if a.Material != b.Material {
			return rank[a.Material] < rank[b.Material]
		}
		if a.Yield.BagMass != b.Yield.BagMass {
			return a.Yield.BagMass < b.Yield.BagMass
		}
		return a.Yield.Volume < b.Yield.Volume
	})
	return out
}
