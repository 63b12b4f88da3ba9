package quantities

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// mixLine is a grout row's water per bag and expected density, with the
// mud-balance reading when one is recorded: "5.2 gal water per 94-lb
// sack, expected 15.56 lb/gal; measured 15.2 lb/gal (-2.3 %)".
func mixLine(row quantity.Row, u schema.Units) string {
	d, ok := row.Yield.Density()
	if !ok || !row.HasYield || row.Fill.Yield > 0 {
		return ""
	}
	want, unit := schema.SlurryDensityIn(d, u)
	s := fmt.Sprintf("expected %.2f %s", want, unit)
	if row.Yield.Water > 0 {
		water, wunit := quantity.WaterPerBagIn(row.Yield, u)
		s = fmt.Sprintf("%s %s water per %s, %s", quantity.Number(water), wunit, quantity.FormatBag(row.Yield.BagMass, u), s)
	}
	if row.Yield.Stated > 0 {
		s += " (stated in the yields file)"
	}
	if row.Fill.Density > 0 {
		got, _ := schema.SlurryDensityIn(row.Fill.Density, u)
		s += fmt.Sprintf("; measured %s %s (%+.1f %%)", schema.TrimFloat(got, 2), unit, (row.Fill.Density/d-1)*100)
	}
	return s
}

// screenFlowLine is a supply well's screen arithmetic at its pumping
// rate and its specific capacity, or "".
func screenFlowLine(wl *schema.Well) string {
	u := wl.Units
	var parts []string
	if f, ok := quantity.Entrance(wl); ok {
		area, aunit := quantity.OpenAreaIn(f.OpenArea, u)
		vel, vunit := quantity.VelocityIn(f.Velocity, u)
		capacity, qunit := schema.FlowIn(f.Capacity, u)
		rate, _ := schema.FlowIn(f.Rate, u)
		which := "tested"
		if f.Design {
			which = "design"
		}
		lim, _ := quantity.VelocityIn(quantity.EntranceLimit(u), u)
		limit := schema.TrimFloat(lim, 2) + " " + vunit
		parts = append(parts, fmt.Sprintf("open area %s %s (half of it effective), transmitting %s %s at %s (Driscoll 1986); entrance velocity %s %s at the %s rate of %s %s",
			quantity.Number(area), aunit, quantity.Number(capacity), qunit, limit, quantity.Number(vel), vunit, which, schema.TrimFloat(rate, 1), qunit))
	}
	if pt := wl.PumpingTest; pt != nil && pt.SpecificCapacity > 0 {
		sc, qunit := schema.FlowIn(pt.SpecificCapacity*float64(schema.LengthFrom(1, u.Depth)), u)
		parts = append(parts, fmt.Sprintf("specific capacity %s %s per %s of drawdown", quantity.Number(sc), qunit, u.Depth))
	}
	return strings.Join(parts, "; ")
}

// packDesignLine is a filter pack's uniformity coefficient and its d30
// against the formation samples in its screens: "Cu = d60/d10 = 1.56
// (rule PACK-UNIFORMITY); d30 5.0 times that of the sample at 28 ft
// (rule PACK-FORMATION-RATIO)"; the thresholds are the rules'.
func packDesignLine(d quantity.PackDesign, u schema.Units) string {
	var parts []string
	if d.Cu > 0 {
		parts = append(parts, "Cu = d60/d10 = "+schema.TrimFloat(d.Cu, 2)+" (rule PACK-UNIFORMITY)")
	}
	for _, sr := range d.Ratios {
		parts = append(parts, fmt.Sprintf("d30 %s times that of the sample at %s", schema.TrimFloat(sr.Ratio, 2), u.FormatDepth(sr.Sample.Depth)))
	}
	if len(d.Ratios) > 0 {
		parts[len(parts)-1] += " (rule PACK-FORMATION-RATIO)"
	}
	return strings.Join(parts, "; ")
}

// wellVolumeLine is one string's well and purge volumes.
func wellVolumeLine(v quantity.WellVolume, u schema.Units) string {
	s := fmt.Sprintf("static level %s to the bottom at %s: %s of water in the well", u.FormatDepth(v.Level), u.FormatDepth(v.Bottom), quantity.FormatVolume(v.Casing, u))
	if v.Pack > 0 {
		s += fmt.Sprintf(" + %s in the saturated pack (porosity %s)", quantity.FormatVolume(v.Pack, u), schema.TrimFloat(v.Porosity, 2))
	}
	return s + fmt.Sprintf("; purge %d well volumes = %s (USGS National Field Manual A4)", quantity.PurgeWellVolumes, quantity.FormatVolume(v.Purge(), u))
}

// yieldNotes lists each yield used in a well once, with its basis.
func yieldNotes(r *quantity.Report) []string {
	u := r.Well.Units
	seen := map[string]bool{}
	var out []string
	for _, row := range r.AllRows() {
		if !row.HasYield || row.Err != nil {
			continue
		}
		s := fmt.Sprintf("%s %s", row.Fill.Material, quantity.FormatYield(row.Yield, u))
		if row.Yield.Note != "" {
			s += ": " + row.Yield.Note
		}
		if !seen[s] {
			seen[s] = true
			out = append(out, s)
		}
	}
	return out
}

// fillNumber is a fill's number in its well, from 1, as the reports count.
func fillNumber(w *schema.Well, f *schema.Fill) int {
	for i := range w.Fills {
		if &w.Fills[i] == f {
			return i + 1
		}
	}
	return 0
}
