package rules

import (
	"strings"
	"testing"
)

// metricWell is a planned metric well with a 50 mm (DN50, OD 60.3 mm)
// string in a hole of the given diameter, with a slot as written.
func metricWell(hole, slot string) string {
	return `[units]
depth = "m"
diameter = "mm"
[well]
id = "PL-1"
purpose = "monitoring"
status = "planned"
total_depth = 12.0
[[borehole]]
top = 0.0
bottom = 12.0
diameter = ` + hole + `
[[string]]
name = "PL-1"
[[string.section]]
kind = "riser"
top = -0.9
bottom = 9.0
size = "DN50"
schedule = "40"
[[string.section]]
kind = "screen"
top = 9.0
bottom = 11.0
slot = ` + slot + `
` + fill("8.5", "12.0", "filter-pack") + fill("7.9", "8.5", "bentonite-chips") + fill("0.0", "7.9", "bentonite-grout")
}

// A 2000 mm hole typed for 200 mm on a planned DN50 well (OD 2.375 in =
// 60.325 mm, ASTM D1785) is 2000 / 60.325 = 33.2 times the pipe: a likely
// slip, named as such; 200 mm (3.3 times) is plausible.
func TestUnitSlipMetricHole(t *testing.T) {
	fs := findings(load(t, metricWell("2000", "0.25")), nil, "SIZE-PLAUSIBLE")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "33.2 times") || !strings.Contains(fs[0].Message, "200 mm?") {
		t.Fatalf("2000 mm hole for DN50: %+v, want one finding, 33.2 times, suggesting 200 mm", fs)
	}
	if fs[0].Severity != Error {
		t.Errorf("severity %v", fs[0].Severity)
	}
	if n := len(findings(load(t, metricWell("200", "0.25")), nil, "SIZE-PLAUSIBLE")); n != 0 {
		t.Errorf("200 mm hole: %d findings, want 0", n)
	}
	// Inches typed in a mm file: an 8-in hole written as 8 (mm) is below
	// the smallest pipe made (NPS 1/8, OD 0.405 in = 10.287 mm; ASME
	// B36.10M).
	fs = findings(load(t, metricWell("8", "0.25")), nil, "SIZE-PLAUSIBLE")
	if len(fs) == 0 || !strings.Contains(fs[0].Message, "written in inches in a mm file? (8 in = 203.2 mm)") {
		t.Errorf("8 mm hole: %+v, want the inch slip named", fs)
	}
	// A 20-slot written as slot = 20 in a mm file: 20 mm; the slot number
	// 20 is 0.020 in = 0.508 mm.
	fs = findings(load(t, metricWell("200", "20")), nil, "SIZE-PLAUSIBLE")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "slot_number = 20 is 0.508 mm") {
		t.Errorf("slot = 20 in a mm file: %+v", fs)
	}
}

// A 254-in hole (254 mm = 10 in) on a 2-in well in an inch file.
func TestUnitSlipInchHole(t *testing.T) {
	fills := fill("23.0", "36.0", "filter-pack") + fill("20.0", "23.0", "bentonite-chips") + fill("0.0", "20.0", "neat-cement")
	fs := findings(load(t, monitoringWell("ft", "254", "36.0", fills)), nil, "SIZE-PLAUSIBLE")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "written in mm in an inch file? (254 mm = 10 in)") {
		t.Errorf("254-in hole: %+v, want one finding naming the mm slip", fs)
	}
	if n := len(findings(load(t, monitoringWell("ft", "10", "36.0", fills)), nil, "SIZE-PLAUSIBLE")); n != 0 {
		t.Errorf("10-in hole: %d findings", n)
	}
}

// The hole a ratio is reported against is the one the cross-section
// stands in (schema.Sections: the last borehole section written that
// covers a depth, each covering top <= z < bottom). A 150 mm pilot hole to
// 12 m reamed, as written after it, to "2000" mm (a slip for 200) down to
// 9 m: 2000 / 60.325 = 33.2 times the DN50 string (OD 60.325 mm, ASTM
// D1785) over 0-9 m, reported at the reamed section's diameter (line 16),
// not at the pilot's; below the boundary at 9 m the 150 mm pilot hole
// (2.5 times) is plausible.
func TestHoleRatioAtTheSectionInForce(t *testing.T) {
	src := strings.Replace(metricWell("150", "0.25"), "[[string]]\n", "[[borehole]]\ntop = 0.0\nbottom = 9.0\ndiameter = 2000\n[[string]]\n", 1)
	w := load(t, src)
	fs := findings(w, nil, "SIZE-PLAUSIBLE")
	if len(fs) != 1 {
		t.Fatalf("%d findings, want 1: %+v", len(fs), fs)
	}
	if fs[0].Line != 16 || !strings.Contains(fs[0].Message, "33.2 times") || !strings.Contains(fs[0].Message, "hole at 0–9 m") {
		t.Errorf("finding at line %d: %s; want line 16, 33.2 times, the hole at 0–9 m", fs[0].Line, fs[0].Message)
	}
}
