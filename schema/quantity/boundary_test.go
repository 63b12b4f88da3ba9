package quantity

import (
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// At a casing's foot the quantities see what the rules and the sheet see
// (schema.Sections, half-open): the casing is gone at its bottom depth.
// Worked by hand, 13-in hole, 8-in Sch 40 casing OD 8.625 in (ASME
// B36.10M), 2-in Sch 40 PVC riser OD 2.375 in (ASTM D1785):
//
//	above the foot  pi/4 (13^2 - 8.625^2) = 74.31 in2
//	at the foot     pi/4 (13^2 - 2.375^2) = 128.30 in2
//	chips 12-22 ft  128.30 in2 x 120 in / 1728 = 8.910 ft3
func TestAreaAtCasingFoot(t *testing.T) {
	w, err := schema.LoadFile("../../testdata/good/casing-foot-at-fill.toml")
	if err != nil {
		t.Fatal(err)
	}
	secs := w.CrossSections()
	const in2 = 0.0254 * 0.0254
	above, err := Area(secs.At(ft(11.99)), Region{}, w.Units)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "borehole annulus above the foot, in2", above/in2, 74.31, 1e-4)
	at, err := Area(secs.At(ft(12)), Region{}, w.Units)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "borehole annulus at the foot, in2", at/in2, 128.30, 1e-4)
	if _, err := Area(secs.At(ft(12)), Region{Within: "surface"}, w.Units); err == nil {
		t.Error("the casing's bore at its own foot: want an error, the casing is not there")
	}
	v, err := AnnularVolume(w, w.Fills[2])
	if err != nil {
		t.Fatal(err)
	}
	near(t, "chips 12-22 ft, ft3", v.In(schema.CubicFeet), 8.910, 1e-4)
}

// A pad on grade (0.5 ft thick: -0.5 <= z < 0) surrounds only what stands
// in it, read from the cross-sections with their half-open depths: the
// 4-in steel casing (OD 4.5 in, ASME B36.10M) from 3 ft above ground is in
// it; a 6-in stub (OD 6.625 in) ending at the pad's top (-0.5 ft) and an
// 8-in surface casing (OD 8.625 in) starting at ground level (0) are not.
// Worked by hand:
//
//	slab       3 ft x 3 ft x 0.5 ft              = 4.5 ft3
//	footprint  pi/4 x 4.5^2 in2 / 144 x 0.5 ft   = 0.055223 ft3
//	pad        4.5 - 0.055223                    = 4.444777 ft3
func TestPadFootprintAtItsBoundaries(t *testing.T) {
	w := imperial()
	w.TotalDepth = ft(20)
	hole(w, 0, ft(20), in(12))
	steel := func(od, id float64) schema.Pipe { return pipe(in(od), in(id)) }
	w.Casings = []schema.Casing{
		{Name: "stub", Interval: iv(ft(-3), ft(-0.5)), Pipe: steel(6.625, 6.065)},
		{Name: "surface", Interval: iv(0, ft(20)), Pipe: steel(8.625, 7.981)},
		{Name: "inner", Interval: iv(ft(-3), ft(20)), Pipe: steel(4.5, 4.026)},
	}
	w.Surface = schema.Surface{Kind: schema.StickUp, Pad: &schema.Pad{Length: ft(3), Width: ft(3), Thickness: ft(0.5)}}
	v, err := PadVolume(w, w.CrossSections())
	if err != nil {
		t.Fatal(err)
	}
	near(t, "pad concrete, ft3", v.In(schema.CubicFeet), 4.444777, 1e-6)
}
