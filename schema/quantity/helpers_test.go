package quantity

import (
	"math"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// Builders for wells written in feet and inches, or metres and mm.

func ft(v float64) schema.Length   { return schema.LengthFrom(v, schema.Feet) }
func in(v float64) schema.Diameter { return schema.DiameterFrom(v, schema.Inches) }
func iv(top, bottom schema.Length) schema.Interval {
	return schema.Interval{Top: top, Bottom: bottom}
}

func imperial() *schema.Well {
	return &schema.Well{ID: "T-1", Units: schema.DefaultUnits(schema.Feet)}
}

func metric() *schema.Well {
	return &schema.Well{ID: "T-2", Units: schema.DefaultUnits(schema.Metres)}
}

func hole(w *schema.Well, top, bottom schema.Length, d schema.Diameter) {
	w.Boreholes = append(w.Boreholes, schema.BoreholeSection{Interval: iv(top, bottom), Diameter: d})
}

func pipe(od, id schema.Diameter) schema.Pipe { return schema.Pipe{OD: od, ID: id} }

// ASTM D1785: 2-in Sch 40 PVC OD 2.375 in, wall 0.154 in (ID 2.067 in).
var sch40Two = pipe(in(2.375), in(2.067))

// ASTM D1785: 1-in Sch 40 PVC OD 1.315 in, wall 0.133 in (ID 1.049 in).
var sch40One = pipe(in(1.315), in(1.049))

// str adds a string of riser over screen of one pipe.
func str(w *schema.Well, name string, top, screenTop, bottom schema.Length, p schema.Pipe) {
	w.Strings = append(w.Strings, schema.String{Name: name, Sections: []schema.Section{
		{Interval: iv(top, screenTop), Kind: schema.RiserSection, Pipe: p},
		{Interval: iv(screenTop, bottom), Kind: schema.ScreenSection, Pipe: p},
	}})
}

func fill(top, bottom schema.Length, m schema.Material) schema.Fill {
	return schema.Fill{Interval: iv(top, bottom), Material: m}
}

// near fails unless got is within rel (relative) of want.
func near(t *testing.T, what string, got, want, rel float64) {
	t.Helper()
	if math.Abs(got-want) > rel*math.Abs(want) {
		t.Errorf("%s = %.6g, want %.6g (within %g)", what, got, want, rel)
	}
}
