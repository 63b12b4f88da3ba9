package sheet

import (
	"fmt"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/templates"
)

// ft and in make model lengths from the units a test is written in.
func ft(v float64) schema.Length   { return schema.LengthFrom(v, schema.Feet) }
func in(v float64) schema.Diameter { return schema.DiameterFrom(v, schema.Inches) }

// pvc2 is 2-in Sch 40 PVC (ASTM D1785: OD 2.375 in, wall 0.154 in).
var pvc2 = schema.Pipe{Material: "PVC", Size: "2", Schedule: "40", OD: in(2.375), ID: in(2.375 - 2*0.154), Joint: "flush-threaded"}

// simpleWell is a monitoring well in feet: an 8.25-in hole to td, a
// 2-in riser to screenTop and a 10-ft slotted screen, pack, seal, grout.
func simpleWell(td float64) *schema.Well {
	screenTop := td - 11
	return &schema.Well{
		Units: schema.DefaultUnits(schema.Feet), ID: "TW-1", Purpose: schema.Monitoring, TotalDepth: ft(td),
		Boreholes: []schema.BoreholeSection{{Interval: schema.Interval{Top: 0, Bottom: ft(td)}, Diameter: in(8.25), Path: "borehole[0]"}},
		Strings: []schema.String{{Name: "main", TopCap: "expansion plug", BottomCap: "end plug", Sections: []schema.Section{
			{Interval: schema.Interval{Top: ft(-2.5), Bottom: ft(screenTop)}, Kind: schema.RiserSection, Pipe: pvc2},
			{Interval: schema.Interval{Top: ft(screenTop), Bottom: ft(screenTop + 10)}, Kind: schema.ScreenSection, Pipe: pvc2, Slot: in(0.010), ScreenType: schema.Slotted},
		}}},
		Fills: []schema.Fill{
			{Interval: schema.Interval{Top: ft(screenTop - 2), Bottom: ft(td)}, Material: schema.FilterPack, Gradation: "20/40", Path: "fill[0]"},
			{Interval: schema.Interval{Top: ft(screenTop - 5), Bottom: ft(screenTop - 2)}, Material: schema.BentoniteChips, Path: "fill[1]"},
			{Interval: schema.Interval{Top: 0, Bottom: ft(screenTop - 5)}, Material: schema.CementBentonite, Path: "fill[2]"},
		},
		Lithology: []schema.Layer{{Interval: schema.Interval{Top: 0, Bottom: ft(td)}, USCS: "SP", Description: "SAND, fine", Path: "lithology[0]"}},
	}
}

func layoutOf(t *testing.T, w *schema.Well, in Inputs, opt Options) *draw.Document {
	t.Helper()
	doc, err := Layout(w, in, opt)
	if err != nil {
		t.Fatalf("Layout: %v", err)
	}
	return doc
}

// boxes returns the boxes of a page whose role has the prefix.
func boxes(p *draw.Page, prefix string) []draw.Box {
	var out []draw.Box
	p.Walk(func(it draw.Item) {
		if b, ok := it.(draw.Box); ok && strings.HasPrefix(b.Role, prefix) {
			out = append(out, b)
		}
	})
	return out
}

// texts returns the strings of a page's texts whose role has the prefix.
func texts(p *draw.Page, prefix string) []string {
	var out []string
	p.Walk(func(it draw.Item) {
		if t, ok := it.(draw.Text); ok && strings.HasPrefix(t.Role, prefix) {
			out = append(out, t.S)
		}
	})
	return out
}

func shapes(p *draw.Page, prefix string) []draw.Shape {
	var out []draw.Shape
	p.Walk(func(it draw.Item) {
		if s, ok := it.(draw.Shape); ok && strings.HasPrefix(s.Role, prefix) {
			out = append(out, s)
		}
	})
	return out
}

// eachPage calls f with every page template, each size in portrait and
// landscape, named "a4 landscape=true".
func eachPage(t *testing.T, f func(name string, pg Page)) {
	t.Helper()
	for _, name := range []string{"letter", "tabloid", "a4", "a3"} {
		for _, land := range []bool{false, true} {
			tpl, err := templates.Load(name, land)
			if err != nil {
				t.Fatal(err)
			}
			f(fmt.Sprintf("%s landscape=%v", name, land), FromTemplate(tpl))
		}
	}
}
