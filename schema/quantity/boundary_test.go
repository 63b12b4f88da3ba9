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
