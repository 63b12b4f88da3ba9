// Package schematest holds well-file text that the tests of several
// packages share (schema/rules, schema/quantity, cmd/tremie): one standard
// monitoring well, which each test varies with its own fills and tables.
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
