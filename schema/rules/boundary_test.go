package rules

import (
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// At a casing's foot the rules see what the quantities and the sheet see
// (schema.Sections, half-open): at 12 ft, where the surface casing ends
// and the chips begin, the string stands in the borehole annulus.
func TestAnnulusAtCasingFoot(t *testing.T) {
	w, err := schema.LoadFile("../../testdata/good/casing-foot-at-fill.toml")
	if err != nil {
		t.Fatal(err)
	}
	p := &Pass{Well: w, shared: &shared{}}
	ft := func(v float64) schema.Length { return schema.LengthFrom(v, schema.Feet) }
	if got := p.annulusAt(ft(11.99)); got != "surface" {
		t.Errorf("annulus above the foot: %q, want the surface casing's", got)
	}
	if got := p.annulusAt(ft(12)); got != boreholeAnnulus {
		t.Errorf("annulus at the foot: %q, want the borehole annulus", got)
	}
	segs, cs := p.segments()
	for i, seg := range segs {
		if seg.Top == ft(12) && len(cs[i].Casings) != 0 {
			t.Errorf("the segment from the foot down holds the casing: %+v", cs[i])
		}
	}
	if fs := Check(w, nil); len(fs) != 0 {
		t.Errorf("the well is sound, yet: %v", fs)
	}
}
