package sheet

import (
	"github.com/tremie-dev/tremie/templates"
	"math"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

func TestParseScale(t *testing.T) {
	cases := []struct {
		in   string
		want Scale
	}{
		{"1in=5ft", Imperial(5)},
		{"1 in = 20 ft", Imperial(20)},
		{`1"=10'`, Imperial(10)},
		{"2in=10ft", Imperial(5)},
		{"1:50", Metric(50)},
		{"1:200", Metric(200)},
	}
	for _, c := range cases {
		got, err := ParseScale(c.in)
		if err != nil || got != c.want {
			t.Errorf("ParseScale(%q) = %v, %v; want %v", c.in, got, err, c.want)
		}
	}
	for _, bad := range []string{"", "1in", "5ft", "0in=5ft", "1in=-5ft", "2:50", "1:0", "1:x", "1in=Infft", "1:NaN"} {
		if _, err := ParseScale(bad); err == nil {
			t.Errorf("ParseScale(%q) accepted", bad)
		}
	}
}

// 1 in = 72 pt (PostScript point, as in PDF: ISO 32000-1, 8.3.2.3), so
// at 1 in = 5 ft a 10-ft interval is 2 in = 144 pt; at 1:50 one metre is
// 20 mm = 56.69 pt.
func TestScalePoints(t *testing.T) {
	if got := Imperial(5).Points(ft(10)); math.Abs(got-144) > 1e-9 {
		t.Errorf("10 ft at 1 in = 5 ft = %.4f pt, want 144", got)
	}
	if got := Metric(50).Points(1); math.Abs(got-20/25.4*72) > 1e-9 {
		t.Errorf("1 m at 1:50 = %.4f pt, want %.4f", got, 20/25.4*72)
	}
	if s := Imperial(5).String(); s != "1 in = 5 ft" {
		t.Errorf("String = %q", s)
	}
}

// The layout draws a 10-ft fill at 1 in = 5 ft 144 pt tall (within
// 0.5 pt), read from the page items themselves.
func TestLayoutDrawsToScale(t *testing.T) {
	w := simpleWell(30)
	s := Imperial(5)
	doc := layoutOf(t, w, Inputs{}, Options{Scale: &s})
	p := doc.Pages[0]
	// fill[0] is the pack, from screenTop-2 = 17 ft to 30 ft: 13 ft.
	total := 0.0
	for _, b := range boxes(p, "interval:fill[0]") {
		total += b.H
	}
	if want := 13.0 / 5 * 72; math.Abs(total-want) > 0.5 {
		t.Errorf("13-ft pack drawn %.2f pt tall, want %.2f", total, want)
	}
	// The screen, 10 ft long.
	sc := boxes(p, "screen:main[1]")
	if len(sc) != 1 || math.Abs(sc[0].H-144) > 0.5 {
		t.Fatalf("10-ft screen boxes %v, want one 144 pt tall", sc)
	}
}

// Widths are proportional among themselves: with a hole that steps from
// 10 in to 6 in around a 2-in riser (OD 2.375 in), the two annulus widths
// keep the ratio (10 - 2.375) / (6 - 2.375), and the holes 10 : 6.
func TestAnnulusWidthsKeepDiameterRatio(t *testing.T) {
	w := simpleWell(40)
	w.Boreholes = []schema.BoreholeSection{
		{Interval: schema.Interval{Top: 0, Bottom: ft(20)}, Diameter: in(10), Path: "borehole[0]"},
		{Interval: schema.Interval{Top: ft(20), Bottom: ft(40)}, Diameter: in(6), Path: "borehole[1]"},
	}
	doc := layoutOf(t, w, Inputs{}, Options{})
	p := doc.Pages[0]
	h0, h1 := boxes(p, "borehole:borehole[0]"), boxes(p, "borehole:borehole[1]")
	riser := boxes(p, "riser:main[0]")
	if len(h0) != 1 || len(h1) != 1 || len(riser) != 1 {
		t.Fatalf("found %d, %d hole boxes and %d riser boxes", len(h0), len(h1), len(riser))
	}
	if got, want := h0[0].W/h1[0].W, 10.0/6; math.Abs(got-want) > 1e-6 {
		t.Errorf("hole widths ratio %.6f, want %.6f", got, want)
	}
	a0 := (h0[0].W - riser[0].W) / 2
	a1 := (h1[0].W - riser[0].W) / 2
	if got, want := a0/a1, (10-2.375)/(6-2.375); math.Abs(got-want) > 1e-6 {
		t.Errorf("annulus ratio %.6f, want %.6f", got, want)
	}
	// And the riser is centred in the hole.
	if c0, cr := h0[0].X+h0[0].W/2, riser[0].X+riser[0].W/2; math.Abs(c0-cr) > 1e-9 {
		t.Errorf("riser centre %.3f, hole centre %.3f", cr, c0)
	}
}

// The automatic scale is the most detailed round scale at which the well
// fits one sheet: the layout's own body must hold the well at the chosen
// scale and must not at the next more detailed one.
func TestAutomaticScaleIsLargestThatFits(t *testing.T) {
	for _, td := range []float64{8, 25, 36, 60, 140} {
		w := simpleWell(td)
		l := newLayout(w, Inputs{}, Options{}, Letter)
		if err := l.plan(); err != nil {
			t.Fatal(err)
		}
		usable := l.plot.H - plotPadTop - plotPadBottom
		span := l.bot - l.top
		if len(l.sheets) != 1 || l.scale.Points(span) > usable {
			t.Errorf("%g-ft well: scale %v, %d sheets; span %.1f pt in %.1f pt", td, l.scale, len(l.sheets), l.scale.Points(span), usable)
			continue
		}
		cs := candidates(true)
		for i, c := range cs {
			if c == l.scale && i > 0 && cs[i-1].Points(span) <= usable {
				t.Errorf("%g-ft well: chose %v but %v fits", td, l.scale, cs[i-1])
			}
		}
	}
}

func TestMetricScaleNames(t *testing.T) {
	w := simpleWell(30)
	w.Units = schema.DefaultUnits(schema.Metres)
	l := newLayout(w, Inputs{}, Options{}, A4)
	if err := l.plan(); err != nil {
		t.Fatal(err)
	}
	if l.scale.Imperial {
		t.Fatalf("a well in metres got %v", l.scale)
	}
	ok := false
	for _, n := range metricSteps {
		ok = ok || l.scale.Ratio == n
	}
	if !ok {
		t.Errorf("scale %v is not a round metric scale", l.scale)
	}
}

// --scale fit draws the 1,200-ft gallery well on one sheet at the most
// detailed round scale that holds it, with every text inside its region
// (checked by TestEveryTextInsideItsRegion's rules on this layout too).
func TestFitScaleGivesOneSheet(t *testing.T) {
	if s, err := ParseScale("fit"); err != nil || !s.Fit {
		t.Fatalf("ParseScale(fit) = %v, %v", s, err)
	}
	for _, c := range galleryWells(t) {
		for _, land := range []bool{false, true} {
			tpl, _ := templates.Load("letter", land)
			fit := Fitted
			opt := Options{Page: FromTemplate(tpl), Scale: &fit}
			l := newLayout(c.w, c.in, opt, opt.Page)
			if err := l.plan(); err != nil {
				t.Fatal(err)
			}
			usable := l.plot.H - plotPadTop - plotPadBottom
			if len(l.sheets) != 1 {
				t.Errorf("%s landscape=%v: %d sheets at %v", c.name, land, len(l.sheets), l.scale)
			}
			if next, ok := moreDetailed(allSteps(true), l.scale); ok && next.Points(l.bot-l.top) <= usable {
				t.Errorf("%s landscape=%v: fit chose %v but %v holds the well", c.name, land, l.scale, next)
			}
		}
	}
}

// A well whose last sheet would stand more than half blank at the
// readable limit goes on fewer sheets at a less detailed round scale, up
// to twice the limit (common practice: no sheet is issued mostly empty);
// and a well on one sheet fills at least two thirds of its body, since
// neighbouring steps are at most 1.5 apart.
func TestNoMostlyBlankSheet(t *testing.T) {
	for _, td := range []float64{12, 30, 45, 70, 110, 170, 260, 300, 400, 625, 900, 1200} {
		w := simpleWell(td)
		l := newLayout(w, Inputs{}, Options{}, Letter)
		if err := l.plan(); err != nil {
			t.Fatal(err)
		}
		usable := l.plot.H - plotPadTop - plotPadBottom
		last := l.sheets[len(l.sheets)-1]
		fill := l.scale.Points(last.Bottom-last.Top) / usable
		switch {
		case len(l.sheets) == 1 && fill < 2.0/3 && l.scale.Ratio > Imperial(2).Ratio:
			t.Errorf("%g-ft well: one sheet at %v, %.0f %% of the body used", td, l.scale, 100*fill)
		case len(l.sheets) > 1 && fill < 0.5:
			for _, s := range allSteps(true) {
				if s.Ratio > l.scale.Ratio && s.Ratio <= Imperial(100).Ratio && len(l.sheetsAt(s, usable)) < len(l.sheets) {
					t.Errorf("%g-ft well: %d sheets at %v, the last %.0f %% used; %v needs fewer", td, len(l.sheets), l.scale, 100*fill, s)
				}
			}
		}
		t.Logf("%g ft: %v, %d sheets, last %.0f %% used", td, l.scale, len(l.sheets), 100*fill)
	}
	for i := 1; i < len(imperialSteps); i++ {
		if r := imperialSteps[i] / imperialSteps[i-1]; r > 1.5 && imperialSteps[i] > 2 {
			t.Errorf("1 in = %g ft follows 1 in = %g ft: a gap of %.2f", imperialSteps[i], imperialSteps[i-1], r)
		}
	}
}

// A ratio of any size writes short: powers of ten past 10⁵ (common
// practice: scientific notation for figures a slip of units makes huge).
func TestFigure(t *testing.T) {
	for v, want := range map[float64]string{1.5: "1.5", 24: "24", 0.06: "0.06", 2e14: "2 × 10¹⁴", 1e300: "10³⁰⁰", 9.96e5: "10⁶", 2.5e-7: "2.5 × 10⁻⁷"} {
		if got := figure(v); got != want {
			t.Errorf("figure(%g) = %q, want %q", v, got, want)
		}
	}
}

// A set of sheets shares its depth evenly, the match lines on ticks:
// TW-7's 625 ft at 400 ft a sheet and 50-ft ticks go 0-300 and 300-625
// (each 75 % and 81 % used), not 0-400 and 400-625 (the last 56 %).
// (common practice: no sheet of a set left a third blank)
func TestPaginateEven(t *testing.T) {
	got := paginateEven(0, ft(625), ft(400), ft(50), 2)
	want := []span{{0, ft(300)}, {ft(300), ft(625)}}
	if len(got) != 2 || math.Abs(float64(got[0].Bottom-want[0].Bottom)) > 1e-9 || got[1] != (span{got[0].Bottom, want[1].Bottom}) {
		t.Errorf("paginateEven: %v, want %v", got, want)
	}
	// Three sheets of 100 m for 250 m, 10-m ticks: 80, 80, 90.
	got = paginateEven(0, 250, 100, 10, 3)
	if len(got) != 3 || got[0].Bottom != 80 || got[1].Bottom != 170 || got[2].Bottom != 250 {
		t.Errorf("paginateEven: %v, want 0-80, 80-170, 170-250", got)
	}
}
