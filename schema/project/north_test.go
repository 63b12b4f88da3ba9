package project

import (
	"math"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

const northWell = `[units]
depth = "ft"
[well]
id = "N-1"
purpose = "domestic"
total_depth = 100
[[borehole]]
top = 0
bottom = 100
diameter = 6
[[feature]]
kind = "fracture"
trace_high = 60
trace_low = 60.5
low_azimuth = 100
`

// A project's magnetic reference turns the azimuths of a well that gives
// none: low point at magnetic 100° with 10° west declination is true 090,
// strike 000 by the right-hand rule. A well's own [orientation] wins.
func TestProjectNorth(t *testing.T) {
	p, err := Parse(t.TempDir(), "project.toml", []byte("[project]\nname = \"N\"\nnorth = \"magnetic\"\ndeclination = -10\n"))
	if err != nil {
		t.Fatal(err)
	}
	w, err := schema.Load("n.toml", []byte(northWell))
	if err != nil {
		t.Fatal(err)
	}
	Apply(p, w)
	if o := w.Features[0].Orient; math.Abs(o.DipDirection-90) > 1e-9 || math.Abs(o.Strike) > 1e-9 {
		t.Errorf("dip direction %v strike %v, want 90 and 0", o.DipDirection, o.Strike)
	}
	own, _ := schema.Load("n.toml", []byte(strings.Replace(northWell, "[[borehole]]", "[orientation]\nnorth = \"true\"\n[[borehole]]", 1)))
	Apply(p, own)
	if o := own.Features[0].Orient; math.Abs(o.DipDirection-100) > 1e-9 {
		t.Errorf("the well's own reference: dip direction %v, want 100", o.DipDirection)
	}
	for _, bad := range []string{"north = \"grid\"", "north = \"magnetic\"", "declination = 5"} {
		if _, err := Parse(t.TempDir(), "project.toml", []byte("[project]\nname = \"N\"\n"+bad+"\n")); err == nil {
			t.Errorf("%s accepted", bad)
		}
	}
}
