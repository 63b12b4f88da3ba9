package sheet

import (
	"math"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// At a casing's foot the sheet places a fill's label where the quantities
// and the rules see the fill (schema.Sections, half-open): at 12 ft, where
// the surface casing ends and the chips begin, the chips' anchor is
// midway between the riser and the 13-in hole wall, not beside a casing
// that is no longer there.
func TestAnnulusAnchorAtCasingFoot(t *testing.T) {
	w, err := schema.LoadFile("../../testdata/good/casing-foot-at-fill.toml")
	if err != nil {
		t.Fatal(err)
	}
	l := newLayout(w, Inputs{}, Options{}, Letter)
	if err := l.plan(); err != nil {
		t.Fatal(err)
	}
	h := l.hz
	chips := w.Fills[2]
	riserEdge := h.strX[0] - h.cx + float64(in(2.375))/2*h.ppmm // ASTM D1785: 2-in Sch 40 OD
	wall := float64(in(13)) / 2 * h.ppmm
	if got, want := l.annulusX(chips, ft(12)), h.cx+(riserEdge+wall)/2; math.Abs(got-want) > 1e-9 {
		t.Errorf("chips anchor at the casing foot: x %.3f, want %.3f (between riser and hole wall)", got, want)
	}
	casingEdge := float64(in(8.625)) / 2 * h.ppmm // ASME B36.10M: 8-in Sch 40 OD
	cement := w.Fills[0]
	if got, want := l.annulusX(cement, ft(11.99)), h.cx+(casingEdge+wall)/2; math.Abs(got-want) > 1e-9 {
		t.Errorf("cement anchor above the foot: x %.3f, want %.3f (between casing and hole wall)", got, want)
	}
	if got := l.holeAt(ft(34)); got != 0 {
		t.Errorf("hole at total depth: %v, want none (the hole covers 0 <= z < 34 ft)", got)
	}
}
