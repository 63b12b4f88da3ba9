package quantity

import (
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// The screen-flow report's units: the entrance-velocity limit reads 0.1
// ft/s in a file in feet and 3 cm/s in one in metres (Driscoll 1986, ch.
// 13); 1 m2 is 10.7639 ft2 (NIST SP 811: 1 ft2 = 0.092 903 04 m2).
func TestScreenFlowUnits(t *testing.T) {
	ft, m := schema.Units{Depth: schema.Feet}, schema.Units{Depth: schema.Metres}
	if v, unit := VelocityIn(EntranceLimit(ft), ft); schema.TrimFloat(v, 2)+" "+unit != "0.1 ft/s" {
		t.Errorf("feet limit = %v %s", v, unit)
	}
	if v, unit := VelocityIn(EntranceLimit(m), m); schema.TrimFloat(v, 2)+" "+unit != "3 cm/s" {
		t.Errorf("metre limit = %v %s", v, unit)
	}
	a, unit := OpenAreaIn(1, ft)
	near(t, "1 m2 in ft2", a, 10.76391, 1e-6)
	if unit != "ft²" {
		t.Errorf("unit %q", unit)
	}
}
