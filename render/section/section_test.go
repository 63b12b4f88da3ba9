package section

import (
	"bytes"
	"errors"
	"fmt"
	"math"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
)

// wellAt writes a small monitoring well at an easting/northing (ft) with
// a ground elevation, logged in the given units (one 10-ft interval each).
func wellAt(t *testing.T, id string, e, n, ground float64, units ...string) *schema.Well {
	t.Helper()
	var b strings.Builder
	fmt.Fprintf(&b, "[units]\ndepth = \"ft\"\ndiameter = \"in\"\n[well]\nid = %q\npurpose = \"monitoring\"\ntotal_depth = 50.0\n", id)
	fmt.Fprintf(&b, "[location]\neasting = %g\nnorthing = %g\n[elevation]\nground = %g\n", e, n, ground)
	b.WriteString("[[borehole]]\ntop = 0.0\nbottom = 50.0\ndiameter = 8.25\n")
	b.WriteString("[[string]]\nname = \"main\"\n[[string.section]]\nkind = \"riser\"\ntop = 0.0\nbottom = 40.0\nmaterial = \"PVC\"\nsize = \"2\"\nschedule = \"40\"\n")
	b.WriteString("[[string.section]]\nkind = \"screen\"\ntop = 40.0\nbottom = 50.0\nmaterial = \"PVC\"\nsize = \"2\"\nschedule = \"40\"\nslot_number = 10\n")
	for i := 0; i < 5; i++ {
		fmt.Fprintf(&b, "[[lithology]]\ntop = %d.0\nbottom = %d.0\nuscs = \"SP\"\n", i*10, i*10+10)
		if i < len(units) && units[i] != "" {
			fmt.Fprintf(&b, "unit = %q\n", units[i])
		}
	}
	w, err := schema.Load(id+".toml", []byte(b.String()))
	if err != nil {
		t.Fatalf("%s: %v", id, err)
	}
	return w
}

func layoutOf(t *testing.T, sec project.Section, ws ...*schema.Well) *draw.Document {
	t.Helper()
	sec.Wells = nil
	for _, w := range ws {
		sec.Wells = append(sec.Wells, w.ID)
	}
	if sec.CoordinateUnit == "" {
		sec.CoordinateUnit = "ft"
	}
	doc, err := Layout(Input{Section: sec, Wells: ws})
	if err != nil {
		t.Fatal(err)
	}
	return doc
}

// texts maps a role prefix to the texts that carry it.
func texts(pg *draw.Page, prefix string) []draw.Text {
	var out []draw.Text
	pg.Walk(func(it draw.Item) {
		if tx, ok := it.(draw.Text); ok && strings.HasPrefix(tx.Role, prefix) {
			out = append(out, tx)
		}
	})
	return out
}

func shapeY(t *testing.T, pg *draw.Page, role string) float64 {
	t.Helper()
	y := math.NaN()
	pg.Walk(func(it draw.Item) {
		if s, ok := it.(draw.Shape); ok && s.Role == role {
			y = s.Points[0].Y
		}
	})
	if math.IsNaN(y) {
		t.Fatalf("no shape %q", role)
	}
	return y
}

func textX(t *testing.T, pg *draw.Page, role string) float64 {
	t.Helper()
	ts := texts(pg, role)
	if len(ts) != 1 {
		t.Fatalf("%d texts %q", len(ts), role)
	}
	return ts[0].At.X
}

func titleText(pg *draw.Page) string {
	var b strings.Builder
	for _, tx := range texts(pg, "section-title") {
		b.WriteString(tx.S + " ")
	}
	return b.String()
}

// TestPositionsAgreeWithScales reads distances and elevations back from
// the layout and compares them with hand arithmetic at the scales the
// sheet states. Three wells on a line running 3-4-5 (a right triangle,
// so distances are whole): A at (0, 0), B at (300, 400): 500 ft along,
// C at (600, 800): 1000 ft along.
func TestPositionsAgreeWithScales(t *testing.T) {
	a := wellAt(t, "A", 0, 0, 100)
	b := wellAt(t, "B", 300, 400, 90)
	c := wellAt(t, "C", 600, 800, 95)
	doc := layoutOf(t, project.Section{Name: "A-A'"}, a, b, c)
	pg := doc.Pages[0]
	title := titleText(pg)
	// Tabloid landscape (17 x 11 in, ASME Y14.1 size B) with half-inch
	// margins: the plot is 1152 - 253 (side panel, 22 %) - 88 (axes) =
	// 811 pt wide, less 2 x 52 pt of end room: 707 pt = 9.82 in for
	// 1000 ft: 1 in = 100 ft needs 10 in, so 1 in = 200 ft.
	// Vertically 792 - 72 - 78 - 34 - 40 = 568 pt = 7.89 in for the span
	// from 100 ft down to 40 ft (B's bottom), 60 ft x 1.06 = 63.6 ft:
	// 1 in = 10 ft (6.36 in).
	for _, want := range []string{"Vertical scale 1 in = 10 ft", "horizontal scale 1 in = 200 ft", "vertical exaggeration 20×"} {
		if !strings.Contains(title, want) {
			t.Errorf("title block lacks %q: %s", want, title)
		}
	}
	const ptPerIn = 72
	xa, xb, xc := textX(t, pg, "section-well:A"), textX(t, pg, "section-well:B"), textX(t, pg, "section-well:C")
	if d := xb - xa; math.Abs(d-500.0/200*ptPerIn) > 1e-6 {
		t.Errorf("A to B drawn %.3f pt, want 500 ft at 1 in = 200 ft = 180 pt", d)
	}
	if d := xc - xa; math.Abs(d-1000.0/200*ptPerIn) > 1e-6 {
		t.Errorf("A to C drawn %.3f pt, want 360 pt", d)
	}
	ya, yb, yc := shapeY(t, pg, "section-ground:A"), shapeY(t, pg, "section-ground:B"), shapeY(t, pg, "section-ground:C")
	if d := yb - ya; math.Abs(d-10.0/10*ptPerIn) > 1e-6 {
		t.Errorf("ground A 100 ft to B 90 ft drawn %.3f pt apart, want 10 ft at 1 in = 10 ft = 72 pt", d)
	}
	if d := yc - ya; math.Abs(d-5.0/10*ptPerIn) > 1e-6 {
		t.Errorf("ground A to C (95 ft) drawn %.3f pt apart, want 36 pt", d)
	}
	// The elevation axis tick "100" sits level with A's ground.
	found := false
	for _, tx := range texts(pg, "section-elev-tick") {
		if tx.S == "100" && tx.Anchor == draw.End {
			found = true
			if math.Abs(tx.At.Y-2.5-ya) > 1e-6 {
				t.Errorf("tick 100 at y %.3f, A's ground at %.3f", tx.At.Y-2.5, ya)
			}
		}
	}
	if !found {
		t.Error("no elevation tick at 100 ft")
	}
	// Screen elevations: 40 to 50 ft below B's ground at 90 ft.
	var got []string
	for _, tx := range texts(pg, "section-screen-label:B") {
		got = append(got, tx.S)
	}
	if len(got) != 1 || got[0] != "screen 50.0 to 40.0" {
		t.Errorf("B's screen label = %q, want screen 50.0 to 40.0", got)
	}
}

// TestBentLineAndOffset: chainage along a polyline and the offset of a
// well beside it, worked by hand.
func TestBentLineAndOffset(t *testing.T) {
	pl := polyline{{0, 0}, {100, 0}, {100, 100}}
	c, off := pl.project(XY{110, 50})
	// Nearest is the second leg at (100, 50): 100 + 50 along, 10 off.
	if math.Abs(c-150) > 1e-9 || math.Abs(off-10) > 1e-9 {
		t.Errorf("project = %v, %v; want 150, 10", c, off)
	}
	// Before the start: the first leg runs on, 3 back and 4 off.
	c, off = pl.project(XY{-3, -4})
	if math.Abs(c+3) > 1e-9 || math.Abs(off-4) > 1e-9 {
		t.Errorf("project = %v, %v; want -3, 4", c, off)
	}
	// Inside the bend's corner, the nearer leg wins: (90, 5) is 5 off the
	// first leg at 90 along, 10 off the second.
	c, off = pl.project(XY{90, 5})
	if math.Abs(c-90) > 1e-9 || math.Abs(off-5) > 1e-9 {
		t.Errorf("project = %v, %v; want 90, 5", c, off)
	}
	// A well 100 ft off a 3-4-5 line is noted when the limit is 50 ft.
	a := wellAt(t, "A", 0, 0, 100)
	d := wellAt(t, "D", 300+80, 400-60, 95) // 100 ft along the normal (0.8, -0.6)
	c2 := wellAt(t, "C", 600, 800, 95)
	doc := layoutOf(t, project.Section{Name: "B-B'", MaxOffset: schema.LengthFrom(50, schema.Feet)}, a, d, c2)
	if title := titleText(doc.Pages[0]); !strings.Contains(title, "D lies 100 ft off the line") {
		t.Errorf("offset not noted: %s", title)
	}
}

// TestRefusesUnplaceableWells: no elevation or no coordinates is refused,
// naming every such well.
func TestRefusesUnplaceableWells(t *testing.T) {
	a := wellAt(t, "A", 0, 0, 100)
	b := wellAt(t, "B", 300, 400, 90)
	b.Elevation.Ground = nil
	c := wellAt(t, "C", 600, 800, 95)
	c.Location.Easting = nil
	_, err := Layout(Input{Section: project.Section{Name: "X", Wells: []string{"A", "B", "C"}, CoordinateUnit: "ft"}, Wells: []*schema.Well{a, b, c}})
	if !errors.Is(err, ErrUnplaceable) {
		t.Fatalf("err = %v, want ErrUnplaceable", err)
	}
	for _, want := range []string{"no ground elevation ([elevation] ground) for B", "no coordinates", "for C"} {
		if !strings.Contains(err.Error(), want) {
			t.Errorf("error %q lacks %q", err, want)
		}
	}
}

// TestUnitsJoinOnlyNeighbours: a unit is joined between two neighbours
// only when both log it; a unit in the first and last well but missing in
// the middle one is drawn nowhere between them.
func TestUnitsJoinOnlyNeighbours(t *testing.T) {
	a := wellAt(t, "A", 0, 0, 100, "Upper", "Upper", "Clay", "Lower", "Lower")
	b := wellAt(t, "B", 300, 400, 90, "Upper", "Upper", "Upper", "Lower", "Lower")
	c := wellAt(t, "C", 600, 800, 95, "Upper", "Clay", "Clay", "Lower", "Lower")
	doc := layoutOf(t, project.Section{Name: "C-C'"}, a, b, c)
	roles := map[string]bool{}
	doc.Pages[0].Walk(func(it draw.Item) {
		if s, ok := it.(draw.Shape); ok && strings.HasPrefix(s.Role, "section-unit:") {
			roles[s.Role] = true
		}
	})
	want := map[string]bool{
		"section-unit:Upper:A:B": true, "section-unit:Upper:B:C": true,
		"section-unit:Lower:A:B": true, "section-unit:Lower:B:C": true,
	}
	for r := range want {
		if !roles[r] {
			t.Errorf("missing %s", r)
		}
	}
	for r := range roles {
		if !want[r] {
			t.Errorf("drew %s, which joins wells that do not both log the unit", r)
		}
	}
	// The joined band spans each well's unit: Upper in A is 0-20 ft
	// (elev 100 to 80), in B 0-30 ft (90 to 60).
	joins, _ := correlate([]*placed{{w: a, ground: *a.Elevation.Ground}, {w: b, ground: *b.Elevation.Ground}})
	ft := func(v float64) float64 { return schema.Length(v).Feet() }
	for _, j := range joins {
		if j.name == "Upper" {
			if math.Abs(ft(j.a.top)-100) > 1e-9 || math.Abs(ft(j.a.bottom)-80) > 1e-9 || math.Abs(ft(j.b.bottom)-60) > 1e-9 {
				t.Errorf("Upper spans %v ft and %v ft", []float64{ft(j.a.top), ft(j.a.bottom)}, []float64{ft(j.b.top), ft(j.b.bottom)})
			}
		}
	}
}

// TestWaterDay picks the day with the most wells' static levels.
func TestWaterDay(t *testing.T) {
	a := wellAt(t, "A", 0, 0, 100)
	b := wellAt(t, "B", 300, 400, 90)
	level := func(w *schema.Well, day int, depth float64) {
		w.WaterLevels = append(w.WaterLevels, schema.WaterLevel{Kind: schema.Static, Depth: schema.LengthFrom(depth, schema.Feet), Measured: schema.Date{Year: 2026, Month: 3, Day: day}.Time()})
	}
	level(a, 10, 20)
	level(a, 20, 21)
	level(b, 20, 15)
	ws := []*placed{{w: a, ground: *a.Elevation.Ground}, {w: b, ground: *b.Elevation.Ground}}
	wl := chooseWater(schema.Date{}, ws)
	if wl.date.Day != 20 {
		t.Fatalf("day = %v, want 2026-03-20 (two wells)", wl.date)
	}
	if z, ok := wl.levelOn(ws[1]); !ok || math.Abs(schema.Length(z).Feet()-75) > 1e-9 {
		t.Errorf("B's level = %v ft, want 90 - 15 = 75 ft", schema.Length(z).Feet())
	}
}

// TestDeterministic: the same section gives the same SVG bytes.
func TestDeterministic(t *testing.T) {
	mk := func() []byte {
		doc := layoutOf(t, project.Section{Name: "A-A'"}, wellAt(t, "A", 0, 0, 100, "U"), wellAt(t, "B", 300, 400, 90, "U"))
		b, err := out.SVG(doc, 0)
		if err != nil {
			t.Fatal(err)
		}
		return b
	}
	if !bytes.Equal(mk(), mk()) {
		t.Error("two layouts of one section differ")
	}
}

// TestWaterLineStopsShortOfTheFigures: the dashed line joining the day's
// levels ends before the next well's mark and elevation, which once sat
// on the line and were struck through (the demo's 381.0 and 371.7).
func TestWaterLineStopsShortOfTheFigures(t *testing.T) {
	a := wellAt(t, "A", 0, 0, 100)
	b := wellAt(t, "B", 300, 400, 90)
	staticOn20March(a, 20)
	staticOn20March(b, 15)
	pg := layoutOf(t, project.Section{Name: "A-A'"}, a, b).Pages[0]
	line := shapeWithRole(t, pg, "section-water-line")
	label := texts(pg, "section-water:B")
	if len(label) != 1 || label[0].S != "75.0" {
		t.Fatalf("B's water label: %v, want 75.0 (90 - 15 ft)", label)
	}
	end := line.Points[len(line.Points)-1]
	if left := label[0].At.X - draw.TextWidth(draw.Regular, label[0].Size, label[0].S); end.X >= left {
		t.Errorf("the water line ends at x = %.1f, on B's label %q (from x = %.1f)", end.X, label[0].S, left)
	}
}

// TestRefusesMixedDatumsAndSystems: wells whose elevations stand on
// different vertical datums, or whose easting/northing are in different
// reference systems, are not hung on one axis or measured on one plan
// (a metric well on DHHN2016 was once drawn 100,000 ft from two on
// NAVD88, under the axis "Elevation, ft NAVD88"); one spelling of a
// datum in other case or spacing still agrees.
func TestRefusesMixedDatumsAndSystems(t *testing.T) {
	a := wellAt(t, "A", 0, 0, 100)
	b := wellAt(t, "B", 300, 400, 90)
	c := wellAt(t, "C", 600, 800, 95)
	a.Elevation.Datum, b.Elevation.Datum, c.Elevation.Datum = "NAVD88", "navd 88", "DHHN2016"
	a.Location.CRS, b.Location.CRS, c.Location.CRS = "EPSG:2227", "EPSG:2227", "EPSG:32611"
	_, err := Layout(Input{Section: project.Section{Name: "X", Wells: []string{"A", "B", "C"}, CoordinateUnit: "ft"}, Wells: []*schema.Well{a, b, c}})
	if !errors.Is(err, ErrUnplaceable) {
		t.Fatalf("err = %v, want ErrUnplaceable", err)
	}
	for _, want := range []string{"different datums (NAVD88: A, B; DHHN2016: C)", "different reference systems (EPSG:2227: A, B; EPSG:32611: C)"} {
		if !strings.Contains(err.Error(), want) {
			t.Errorf("error %q lacks %q", err, want)
		}
	}
	c.Elevation.Datum, c.Location.CRS = "", "epsg:2227"
	if _, err := Layout(Input{Section: project.Section{Name: "X", Wells: []string{"A", "B", "C"}, CoordinateUnit: "ft"}, Wells: []*schema.Well{a, b, c}}); err != nil {
		t.Errorf("one datum and one system: %v", err)
	}
}

// TestDistanceAxisWritesNoMinusZero: the first round distance of an axis
// starting just left of the first well, math.Ceil of a small negative
// number times the step, is a negative zero; it is written "0" (a
// section of the gallery's NW-3, PL-4 and EU-2 once showed "-0").
func TestDistanceAxisWritesNoMinusZero(t *testing.T) {
	negZero := math.Ceil(-0.4) * 10000
	if got := distanceLabel(negZero); got != "0" {
		t.Errorf("distanceLabel(%v) = %q, want \"0\"", negZero, got)
	}
	if got := distanceLabel(-1e-12); got != "0" {
		t.Errorf("distanceLabel(-1e-12) = %q", got)
	}
	if got := distanceLabel(2500); got != "2500" {
		t.Errorf("distanceLabel(2500) = %q", got)
	}
}

// TestUnitLabelStandsOffTheWaterLine: a joined unit's name moves off the
// day's water line that crosses its band (the demo's "Upper aquifer"
// between NW-1 and MW-3 was struck through), staying inside the band.
func TestUnitLabelStandsOffTheWaterLine(t *testing.T) {
	a := wellAt(t, "A", 0, 0, 100, "U", "U", "U")
	b := wellAt(t, "B", 300, 400, 90, "U", "U", "U")
	staticOn20March(a, 20)
	staticOn20March(b, 10) // both at elevation 80, the band's middle
	pg := layoutOf(t, project.Section{Name: "A-A'"}, a, b).Pages[0]
	labels := texts(pg, "section-unit-label:U")
	if len(labels) != 1 {
		t.Fatalf("%d labels of unit U", len(labels))
	}
	lb := labels[0]
	waterY := shapeY(t, pg, "section-water-line") // level: both ends at 80
	top, bottom := lb.At.Y-0.75*lb.Size, lb.At.Y+0.25*lb.Size
	if waterY >= top-0.5 && waterY <= bottom+0.5 {
		t.Errorf("the water line at y = %.1f crosses the unit label (%.1f to %.1f)", waterY, top, bottom)
	}
	var band *draw.Shape
	pg.Walk(func(it draw.Item) {
		if s, ok := it.(draw.Shape); ok && strings.HasPrefix(s.Role, "section-unit:U:") {
			band = &s
		}
	})
	if band == nil {
		t.Fatal("no band of unit U")
	}
	bandTop := (band.Points[0].Y + band.Points[1].Y) / 2
	bandBottom := (band.Points[2].Y + band.Points[3].Y) / 2
	if top < bandTop || bottom > bandBottom {
		t.Errorf("the label (%.1f to %.1f) left its band (%.1f to %.1f)", top, bottom, bandTop, bandBottom)
	}
}

// TestWaterLineStartsPastScreenLabels: a level within a well's screen
// meets that screen's label, turned beside the column; the line to the
// next well starts past the label instead of through its words (the
// demo's MW-1 and NW-1 labels were crossed).
func TestWaterLineStartsPastScreenLabels(t *testing.T) {
	a := wellAt(t, "A", 0, 0, 100)
	b := wellAt(t, "B", 300, 400, 90)
	staticOn20March(a, 45)
	staticOn20March(b, 40) // A's level in its screen, 40-50 ft
	pg := layoutOf(t, project.Section{Name: "A-A'"}, a, b).Pages[0]
	line := shapeWithRole(t, pg, "section-water-line")
	labels := texts(pg, "section-screen-label:A")
	if len(labels) != 1 {
		t.Fatalf("%d screen labels of A", len(labels))
	}
	lb := labels[0]
	// The label reads up the page: its letters stand left of the baseline
	// x, its descenders up to a third of its size right of it.
	if start := line.Points[0]; start.X <= lb.At.X+lb.Size/3 {
		t.Errorf("the water line starts at x = %.1f, within A's screen label (baseline x = %.1f)", start.X, lb.At.X)
	}
}

// staticOn20March gives a well a static level on 2026-03-20, depth in ft.
func staticOn20March(w *schema.Well, depth float64) {
	w.WaterLevels = append(w.WaterLevels, schema.WaterLevel{Kind: schema.Static, Depth: schema.LengthFrom(depth, schema.Feet), Measured: schema.Date{Year: 2026, Month: 3, Day: 20}.Time()})
}

// shapeWithRole is the page's last shape with the role.
func shapeWithRole(t *testing.T, pg *draw.Page, role string) draw.Shape {
	t.Helper()
	var got *draw.Shape
	pg.Walk(func(it draw.Item) {
		if s, ok := it.(draw.Shape); ok && s.Role == role {
			got = &s
		}
	})
	if got == nil {
		t.Fatalf("no shape %q", role)
	}
	return *got
}

// TestPlannedWellSaysSo: a planned well's column is headed "(planned)",
// so that a design standing among built wells is not read as built.
func TestPlannedWellSaysSo(t *testing.T) {
	a := wellAt(t, "A", 0, 0, 100)
	b := wellAt(t, "B", 300, 400, 90)
	b.Status = "planned"
	pg := layoutOf(t, project.Section{Name: "A-A'"}, a, b).Pages[0]
	if got := texts(pg, "section-well:B"); len(got) != 1 || got[0].S != "B (planned)" {
		t.Errorf("B's head: %v, want \"B (planned)\"", got)
	}
	if got := texts(pg, "section-well:A"); len(got) != 1 || got[0].S != "A" {
		t.Errorf("A's head: %v", got)
	}
}

// TestNestedWellJoinsTheStringInTheUnit: a nested well's strings each
// have their own head, and a section's water line is one unit's head
// (common practice: a potentiometric line is drawn for one aquifer). N's
// shallow string S (screen 10-20 ft) lies in Upper, its deep string D
// (40-50 ft) in Lower; S reads 12 ft, D 18 ft on 20 March, ground 100 ft.
// Beside A, screened 40-50 ft in Lower, the line joins D's head, 100 - 18
// = 82.0, and S's head (88) is marked apart; beside a well screened in
// Upper it joins S's, 88.0.
func TestNestedWellJoinsTheStringInTheUnit(t *testing.T) {
	nested := func() *schema.Well {
		var b strings.Builder
		b.WriteString("[units]\ndepth = \"ft\"\ndiameter = \"in\"\n[well]\nid = \"N\"\npurpose = \"monitoring\"\ntotal_depth = 50.0\n")
		b.WriteString("[location]\neasting = 300\nnorthing = 400\n[elevation]\nground = 100\n[[borehole]]\ntop = 0.0\nbottom = 50.0\ndiameter = 10\n")
		for _, s := range []struct {
			name     string
			top, bot int
		}{{"S", 10, 20}, {"D", 40, 50}} {
			fmt.Fprintf(&b, "[[string]]\nname = %q\n[[string.section]]\nkind = \"riser\"\ntop = 0.0\nbottom = %d.0\nsize = \"1\"\nschedule = \"40\"\n", s.name, s.top)
			fmt.Fprintf(&b, "[[string.section]]\nkind = \"screen\"\ntop = %d.0\nbottom = %d.0\nsize = \"1\"\nschedule = \"40\"\n", s.top, s.bot)
		}
		for i, u := range []string{"Upper", "Upper", "Aquitard", "Lower", "Lower"} {
			fmt.Fprintf(&b, "[[lithology]]\ntop = %d.0\nbottom = %d.0\nuscs = \"SP\"\nunit = %q\n", i*10, i*10+10, u)
		}
		b.WriteString("[[water_level]]\nstring = \"S\"\ndepth = 12.0\nmeasured = 2026-03-20\n[[water_level]]\nstring = \"D\"\ndepth = 18.0\nmeasured = 2026-03-20\n")
		w, err := schema.Load("N.toml", []byte(b.String()))
		if err != nil {
			t.Fatal(err)
		}
		return w
	}
	for _, c := range []struct {
		aUnit, want string
	}{{"Lower", "82.0"}, {"Upper", "88.0"}} {
		a := wellAt(t, "A", 0, 0, 100, "", "", "", "", c.aUnit) // screened 40-50 ft
		staticOn20March(a, 15)
		pg := layoutOf(t, project.Section{Name: "A-A'"}, a, nested()).Pages[0]
		if got := texts(pg, "section-water:N"); len(got) != 1 || got[0].S != c.want {
			t.Errorf("A in %s: N's joined level %v, want %s", c.aUnit, got, c.want)
		}
		others := 0
		pg.Walk(func(it draw.Item) {
			if s, ok := it.(draw.Shape); ok && s.Role == "section-water-other:N" {
				others++
			}
		})
		if others != 1 {
			t.Errorf("A in %s: %d other-head marks on N, want 1 (the other string's)", c.aUnit, others)
		}
	}
}
