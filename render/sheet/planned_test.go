package sheet

import (
	"math"
	"strings"
	"testing"
)

// A planned well draws as a design: its own title, and in the amounts
// table the bags to order in place of the placed amounts: the calculated
// volume plus 10 % (Kuo, Practical Design Calculations for Groundwater and
// Soil Remediation, examples 2.21-2.22), rounded up to whole bags.
func TestPlannedWellIsADesign(t *testing.T) {
	var pl *corpusWell
	for _, c := range galleryWells(t) {
		if c.name == "PL-4.toml" {
			pl = &c
		}
	}
	if pl == nil {
		t.Fatal("no PL-4 in the gallery")
	}
	doc := layoutOf(t, pl.w, pl.in, Options{})
	p := doc.Pages[0]
	if got := texts(p, "sheet-title"); len(got) != 1 || got[0] != "PROPOSED WELL DESIGN" {
		t.Errorf("title %q", got)
	}
	head := strings.Join(texts(p, "amounts-head"), "|")
	if !strings.Contains(head, "To order") || strings.Contains(head, "Placed") {
		t.Errorf("amounts head %q", head)
	}
	// The filter pack, 24-42 ft: an 8.25-in hole round 2-in Sch 40 pipe
	// (OD 2.375 in, ASTM D1785) below 38 ft the open 8.25-in hole.
	area := func(d float64) float64 { return math.Pi / 4 * d * d / 144 } // ft2 for d in inches
	calc := (area(8.25)-area(2.375))*(38-24) + area(8.25)*(42-38)        // ft3
	bags := int(math.Ceil(calc * 1.10 / 0.5))                            // 0.5 ft3 per 50-lb bag of sand (common practice)
	rows := strings.Join(texts(p, "amounts-row"), "|")
	if want := "14 bags"; bags != 14 || !strings.Contains(rows, want) {
		t.Errorf("pack order: %d bags by hand (%.3f ft3), table %q", bags, calc, rows)
	}
	if strings.Contains(rows, "not recorded") {
		t.Errorf("a design's table says not recorded: %q", rows)
	}
}
