package schema

import (
	"testing"
)

// casingFoot is a well whose surface casing ends at 12 ft, exactly where
// the borehole annulus changes from neat cement to bentonite chips.
// Pipe sizes: 8-in Sch 40 steel, OD 8.625 in, ID 7.981 in (ASME
// B36.10M); 2-in Sch 40 PVC, OD 2.375 in (ASTM D1785).
func casingFoot(t *testing.T) *Well {
	t.Helper()
	w, err := LoadFile("../testdata/good/casing-foot-at-fill.toml")
	if err != nil {
		t.Fatal(err)
	}
	return w
}

func ft(v float64) Length   { return LengthFrom(v, Feet) }
func in(v float64) Diameter { return DiameterFrom(v, Inches) }

// Every part covers top <= z < bottom: at a boundary the part below is
// the one present.
func TestCrossSectionHalfOpen(t *testing.T) {
	w := casingFoot(t)
	secs := w.CrossSections()
	cases := []struct {
		z        float64
		hole     float64 // in; 0 for none
		casings  int
		strings  string // the kind of the string section present
		fills    []string
		annulus  string
		openHole bool
	}{
		{-1, 0, 0, "riser", nil, "", false},                                           // the stick-up: pipe, no hole
		{0, 13, 1, "riser", []string{"neat-cement", "neat-cement"}, "surface", false}, // the tops at ground are there
		{11.99, 13, 1, "riser", []string{"neat-cement", "neat-cement"}, "surface", false},
		{12, 13, 0, "riser", []string{"bentonite-chips"}, "", false}, // the casing's foot is gone, the chips' top is there
		{24, 13, 0, "screen", []string{"filter-pack"}, "", false},    // riser bottom = screen top: the screen
		{33.99, 13, 0, "screen", []string{"filter-pack"}, "", false},
		{34, 0, 0, "", nil, "", false}, // total depth: below the hole
	}
	for _, c := range cases {
		cs := secs.At(ft(c.z))
		if cs.Hole != in(c.hole) || cs.HasHole != (c.hole > 0) {
			t.Errorf("%g ft: hole %v (%v), want %g in", c.z, cs.Hole.In(Inches), cs.HasHole, c.hole)
		}
		if len(cs.Casings) != c.casings {
			t.Errorf("%g ft: %d casings, want %d", c.z, len(cs.Casings), c.casings)
		}
		kind := ""
		if len(cs.Strings) == 1 {
			kind = string(cs.Strings[0].Section.Kind)
		}
		if kind != c.strings || len(cs.Strings) > 1 {
			t.Errorf("%g ft: string sections %v, want one %q", c.z, cs.Strings, c.strings)
		}
		var fills []string
		for _, f := range cs.Fills {
			fills = append(fills, string(f.Material))
		}
		if len(fills) != len(c.fills) || (len(fills) > 0 && fills[0] != c.fills[0]) {
			t.Errorf("%g ft: fills %v, want %v", c.z, fills, c.fills)
		}
		if cs.Annulus() != c.annulus || cs.OpenHole != c.openHole {
			t.Errorf("%g ft: annulus %q, open hole %v", c.z, cs.Annulus(), cs.OpenHole)
		}
		if !(cs.Top <= ft(c.z) && (ft(c.z) < cs.Bottom || cs.Top == cs.Bottom)) {
			t.Errorf("%g ft: slab %v does not hold it", c.z, cs.Interval)
		}
	}
	// The casing's bore and what stands in it: the riser.
	c, inside, ok := secs.At(ft(6)).Inside("surface")
	if !ok || c.OD != in(8.625) || c.ID != in(7.981) || len(inside) != 1 || inside[0].OD != in(2.375) {
		t.Errorf("inside the casing at 6 ft: %v %v %v", c, inside, ok)
	}
}

// Within clips the slabs to a range and covers it whole, with empty
// cross-sections beyond the well's parts.
func TestCrossSectionsWithin(t *testing.T) {
	secs := casingFoot(t).CrossSections()
	got := secs.Within(ft(10), ft(14))
	if len(got) != 2 || got[0].Interval != (Interval{ft(10), ft(12)}) || got[1].Interval != (Interval{ft(12), ft(14)}) ||
		len(got[0].Casings) != 1 || len(got[1].Casings) != 0 {
		t.Errorf("10–14 ft: %+v", got)
	}
	got = secs.Within(ft(30), ft(40))
	if n := len(got); n != 2 || got[1].Interval != (Interval{ft(34), ft(40)}) || got[1].HasHole {
		t.Errorf("30–40 ft: %+v", got)
	}
	var sum Length
	for _, cs := range secs.All() {
		sum += cs.Thickness()
	}
	if d := sum - (ft(34) - ft(-2.5)); d > 1e-9 || d < -1e-9 {
		t.Errorf("slabs cover %v m, want the 36.5 ft from the riser top to total depth", sum)
	}
}

// BoreholeAt follows the same convention: a stepped hole's section below
// a step holds the step, and the hole ends above total depth.
func TestBoreholeAtHalfOpen(t *testing.T) {
	w := &Well{TotalDepth: ft(20), Boreholes: []BoreholeSection{
		{Interval: Interval{Top: 0, Bottom: ft(10)}, Diameter: in(10)},
		{Interval: Interval{Top: ft(10), Bottom: ft(20)}, Diameter: in(6)},
	}}
	secs := w.CrossSections()
	for _, z := range []float64{0, 5, 10, 19.99, 20} {
		b, ok := w.BoreholeAt(ft(z))
		cs := secs.At(ft(z))
		if ok != cs.HasHole || (ok && b.Diameter != cs.Hole) {
			t.Errorf("%g ft: BoreholeAt %v %v, cross-section %v %v", z, b.Diameter, ok, cs.Hole, cs.HasHole)
		}
	}
	if b, _ := w.BoreholeAt(ft(10)); b.Diameter != in(6) {
		t.Errorf("at the step: %v, want the 6-in section below", b.Diameter.In(Inches))
	}
}
