// Package schematest holds well-file text that the tests of several
// packages share (schema/rules, schema/quantity, render/quantities,
// cmd/tremie): one standard monitoring well, which each test varies with
// its own fills and tables, and one planned well worked by hand.
// It builds text only, so that any package's tests, schema's too, may use
// it without an import cycle.
package schematest

import "strings"

// MonitoringWell is a 2-in Sch 40 PVC monitoring well (OD 2.375 in, ASTM
// D1785) with a plugged bottom, in one borehole of diameter hole to total
// depth td, whose fills (and any tables after them) are given; depths in
// the unit named ("ft" or "m"). The riser runs from 2.5 ft above ground to
// 25 ft and the screen 25-35 ft (in metres 0.75 m above ground to 7.5 m
// and 7.5-10.5 m). Lines are fixed: a test may name them in findings
// (the first fill's header is line 24).
func MonitoringWell(id, unit, hole, td, fills string) string {
	riser, screen := "-0.75, 7.5", "7.5, 10.5"
	if unit == "ft" {
		riser, screen = "-2.5, 25.0", "25.0, 35.0"
	}
	r := strings.Split(riser, ", ")
	s := strings.Split(screen, ", ")
	return `[units]
depth = "` + unit + `"
[well]
id = "` + id + `"
purpose = "monitoring"
total_depth = ` + td + `
[[borehole]]
top = 0.0
bottom = ` + td + `
diameter = ` + hole + `
[[string]]
bottom_cap = "plug"
[[string.section]]
kind = "riser"
top = ` + r[0] + `
bottom = ` + r[1] + `
size = "2"
schedule = "40"
[[string.section]]
kind = "screen"
top = ` + s[0] + `
bottom = ` + s[1] + `
slot_number = 10
` + fills
}

// Fill is one [[fill]] table of a material between two depths; keys
// written after it (gradation = "20/40") belong to it.
func Fill(top, bottom, material string) string {
	return "[[fill]]\ntop = " + top + "\nbottom = " + bottom + "\nmaterial = \"" + material + "\"\n"
}

// PlannedWell is a planned well in feet, PL-1: an 8.25-in hole to 30 ft around
// 2-in Sch 40 PVC (OD 2.375 in, ASTM D1785) to 30 ft; pack 20-30 ft,
// chips 17-20 ft, neat cement 0-17 ft. By hand, the annulus is pi/4
// (8.25^2 - 2.375^2) / 144 = 0.34046 ft2/ft = 2.547 US gal/ft:
//
//	pack  10 ft: 3.4046 ft3 (25.47 gal) / 0.5 ft3 per 50-lb bag = 6.81 -> 7
//	chips  3 ft: 1.0214 ft3 / 0.6944 ft3 per 50-lb bag = 1.47 -> 2
//	grout 17 ft: 5.7878 ft3 / 1.18 ft3 per 94-lb sack = 4.90 -> 5
//
// Its lines are fixed: tests name them (the first [[fill]] is line 32).
const PlannedWell = `[units]
depth = "ft"

[well]
id = "PL-1"
purpose = "monitoring"
status = "planned"
total_depth = 30.0

[[borehole]]
top = 0.0
bottom = 30.0
diameter = 8.25

[[string]]
name = "PL-1"

[[string.section]]
kind = "riser"
top = -2.5
bottom = 20.0
material = "PVC"
size = "2"
schedule = "40"

[[string.section]]
kind = "screen"
top = 20.0
bottom = 30.0
slot_number = 10

[[fill]]
top = 20.0
bottom = 30.0
material = "filter-pack"

[[fill]]
top = 17.0
bottom = 20.0
material = "bentonite-chips"

[[fill]]
top = 0.0
bottom = 17.0
material = "neat-cement"
`
