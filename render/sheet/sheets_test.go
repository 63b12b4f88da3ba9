package sheet

import (
	"bytes"
	"encoding/xml"
	"fmt"
	"io"
	"math"
	"os"
	"regexp"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/rules"
)

// deepWell is a 1,000-ft supply well with 100 lithology intervals of
// 10 ft each.
func deepWell() *schema.Well {
	w := simpleWell(1000)
	w.ID = "DW-1"
	w.Lithology = nil
	for i := 0; i < 100; i++ {
		u := []string{"SP", "SM", "ML", "CL", "GW"}[i%5]
		w.Lithology = append(w.Lithology, schema.Layer{Interval: schema.Interval{Top: ft(10 * float64(i)), Bottom: ft(10 * float64(i+1))}, USCS: u,
			Description: fmt.Sprintf("layer %d, %s", i+1, u), Path: fmt.Sprintf("lithology[%d]", i)})
	}
	return w
}

func TestDeepWellSheetsCoverEveryDepth(t *testing.T) {
	w := deepWell()
	l := newLayout(w, Inputs{}, Options{}, Letter)
	if err := l.plan(); err != nil {
		t.Fatal(err)
	}
	if len(l.sheets) < 2 { // at least one match line to check
		t.Fatalf("a 1,000-ft well on %d sheets at %v", len(l.sheets), l.scale)
	}
	// Contiguous from the top of the drawing (the stick-up) to TD.
	if l.sheets[0].Top > ft(-2.5) || l.sheets[len(l.sheets)-1].Bottom < ft(1000) {
		t.Errorf("sheets cover %v to %v", l.sheets[0].Top, l.sheets[len(l.sheets)-1].Bottom)
	}
	for i := 1; i < len(l.sheets); i++ {
		if l.sheets[i].Top != l.sheets[i-1].Bottom {
			t.Errorf("sheet %d starts at %v, sheet %d ends at %v", i+1, l.sheets[i].Top, i, l.sheets[i-1].Bottom)
		}
	}
	// Each drawn at the one scale: no sheet compresses depth.
	usable := l.plot.H - plotPadTop - plotPadBottom
	for i, sp := range l.sheets {
		if h := l.scale.Points(sp.Bottom - sp.Top); h > usable+1e-6 {
			t.Errorf("sheet %d holds %.1f pt of depth in %.1f pt", i+1, h, usable)
		}
	}

	// On the pages: every layer is drawn, and the heights it is drawn
	// with on all sheets add up to its thickness at the scale.
	doc := layoutOf(t, w, Inputs{}, Options{})
	if len(doc.Pages) != len(l.sheets) {
		t.Fatalf("%d pages for %d sheets", len(doc.Pages), len(l.sheets))
	}
	for k, ly := range w.Lithology {
		h := 0.0
		for _, p := range doc.Pages {
			for _, b := range boxes(p, fmt.Sprintf("lith:lithology[%d]", k)) {
				if !strings.HasSuffix(b.Role, "]") || b.Role != fmt.Sprintf("lith:lithology[%d]", k) {
					continue
				}
				h += b.H
			}
		}
		if want := l.scale.Points(ly.Thickness()); math.Abs(h-want) > 0.01 {
			t.Errorf("layer %d drawn %.2f pt tall in all, want %.2f", k, h, want)
		}
	}
	// The match lines repeat the depth on both sheets and name the sheet.
	for i := 0; i+1 < len(doc.Pages); i++ {
		below := strings.Join(texts(doc.Pages[i], "matchline-text"), "|")
		above := strings.Join(texts(doc.Pages[i+1], "matchline-text"), "|")
		d := l.depth(l.sheets[i].Bottom)
		if !strings.Contains(below, fmt.Sprintf("MATCH LINE %s — continued on sheet %d", d, i+2)) {
			t.Errorf("sheet %d: match text %q", i+1, below)
		}
		if !strings.Contains(above, fmt.Sprintf("MATCH LINE %s — continued from sheet %d", d, i+1)) {
			t.Errorf("sheet %d: match text %q", i+2, above)
		}
	}
	// The header on every sheet, numbered n of m.
	for i, p := range doc.Pages {
		if got := texts(p, "sheet-number"); len(got) != 1 || got[0] != fmt.Sprintf("%d of %d", i+1, len(doc.Pages)) {
			t.Errorf("page %d: sheet number %q", i+1, got)
		}
		if got := texts(p, "well-id"); len(got) != 1 || got[0] != "DW-1" {
			t.Errorf("page %d: well id %q", i+1, got)
		}
		if got := strings.Join(texts(p, "caution"), " "); got != Caution {
			t.Errorf("page %d: caution %q", i+1, got)
		}
	}
}

func TestSheetNumberingOffset(t *testing.T) {
	doc := layoutOf(t, simpleWell(30), Inputs{}, Options{SheetOffset: 4, SheetTotal: 9})
	if got := texts(doc.Pages[0], "sheet-number"); len(got) != 1 || got[0] != "5 of 9" {
		t.Errorf("sheet number %q, want 5 of 9", got)
	}
}

// Text from the input is text: a description holding markup comes out
// of the SVG backend as characters, never as an element.
func TestMarkupInInputIsEscaped(t *testing.T) {
	w := simpleWell(30)
	w.ID = `<script>alert("x")</script>`
	w.Lithology[0].Description = `<script>alert(1)</script> & "quotes" ±2 °C µm Zoë`
	doc := layoutOf(t, w, Inputs{}, Options{})
	svg, err := out.SVG(doc, 0)
	if err != nil {
		t.Fatal(err)
	}
	dec := xml.NewDecoder(bytes.NewReader(svg))
	for {
		tok, err := dec.Token()
		if err == io.EOF {
			break
		}
		if err != nil {
			t.Fatalf("SVG does not parse as XML (encoding/xml): %v", err)
		}
		if se, ok := tok.(xml.StartElement); ok && strings.EqualFold(se.Name.Local, "script") {
			t.Fatal("input text became a <script> element")
		}
	}
	found := false
	for _, s := range texts(doc.Pages[0], "description") {
		found = found || strings.Contains(s, "<script>")
	}
	if !found {
		t.Error("the description's text was lost")
	}
}

// Same input, same bytes: the layout and the SVG and PDF written from it.
func TestDeterministic(t *testing.T) {
	w := thinWell()
	fs := []rules.Finding{{Rule: "X-1", Severity: rules.Error, Line: 3, Message: "a finding"}}
	var prev [][]byte
	for run := 0; run < 2; run++ {
		doc := layoutOf(t, w, Inputs{Findings: fs}, Options{})
		svg, err := out.SVG(doc, 0)
		if err != nil {
			t.Fatal(err)
		}
		pdf, err := out.PDF(doc)
		if err != nil {
			t.Fatal(err)
		}
		cur := [][]byte{svg, pdf}
		if prev != nil {
			for i := range cur {
				if !bytes.Equal(prev[i], cur[i]) {
					t.Errorf("output %d differs between runs", i)
				}
			}
		}
		prev = cur
	}
}

// A well with an unwaived error is stamped not final and lists the
// finding; a waived one is listed as waived and not stamped.
func TestFindingsOnSheet(t *testing.T) {
	w := simpleWell(30)
	errF := rules.Finding{Rule: "SEAL-ABOVE-PACK", Severity: rules.Error, Line: 40, Message: "no seal above the pack"}
	doc := layoutOf(t, w, Inputs{Findings: []rules.Finding{errF}}, Options{})
	p := doc.Pages[0]
	if len(boxes(p, "stamp:not-final")) != 1 || !strings.Contains(strings.Join(texts(p, "stamp-text"), ""), "NOT FINAL") {
		t.Error("no NOT FINAL stamp on a well with an error finding")
	}
	if f := strings.Join(texts(p, "finding"), " "); !strings.Contains(f, "SEAL-ABOVE-PACK") || !strings.Contains(f, "no seal above the pack") {
		t.Errorf("findings text %q", f)
	}
	waived := errF
	waived.Waived = true
	waived.Waiver = &rules.Waiver{Reason: "approved variance", ApprovedBy: "A. Reviewer"}
	doc = layoutOf(t, w, Inputs{Findings: []rules.Finding{waived}}, Options{})
	p = doc.Pages[0]
	if len(boxes(p, "stamp:")) != 0 {
		t.Error("a waived finding stamped the sheet not final")
	}
	if f := strings.Join(texts(p, "finding"), " "); !regexp.MustCompile(`WAIVED SEAL-ABOVE-PACK.*approved variance`).MatchString(f) {
		t.Errorf("waived finding text %q", f)
	}
}

// Findings too many for the band continue on a notes sheet, counted in
// "sheet n of m" and announced on the drawing.
func TestManyFindingsContinueOnNotesSheet(t *testing.T) {
	var fs []rules.Finding
	for i := 0; i < 60; i++ {
		fs = append(fs, rules.Finding{Rule: fmt.Sprintf("R-%02d", i), Severity: rules.Warning, Line: i + 1,
			Message: "a warning long enough to take two lines of the notes area on a letter sheet, or so"})
	}
	doc := layoutOf(t, simpleWell(30), Inputs{Findings: fs}, Options{})
	if len(doc.Pages) != 2 {
		t.Fatalf("%d pages, want the drawing and a notes sheet", len(doc.Pages))
	}
	all := strings.Join(texts(doc.Pages[0], "finding"), " ") + strings.Join(texts(doc.Pages[1], "finding"), " ")
	for _, f := range fs {
		if !strings.Contains(all, f.Rule+" ") {
			t.Errorf("finding %s on neither sheet", f.Rule)
		}
	}
	if got := strings.Join(texts(doc.Pages[0], "notes-continued"), ""); !strings.Contains(got, "sheet 2") {
		t.Errorf("continuation note %q", got)
	}
}

// Odd or incomplete wells lay out or fail with an error; none panics.
func TestOddWellsDoNotPanic(t *testing.T) {
	odd := map[string]func(w *schema.Well){
		"no borehole":          func(w *schema.Well) { w.Boreholes = nil },
		"no string":            func(w *schema.Well) { w.Strings = nil },
		"empty string":         func(w *schema.Well) { w.Strings[0].Sections = nil },
		"no diameters":         func(w *schema.Well) { w.Strings[0].Sections[0].Pipe = schema.Pipe{} },
		"fill within nothing":  func(w *schema.Well) { w.Fills[0].Within = "nowhere" },
		"zero total depth":     func(w *schema.Well) { *w = schema.Well{ID: "Z"} },
		"centralizer off hole": func(w *schema.Well) { w.Strings[0].Centralizers = []schema.Length{ft(500)} },
		"huge depth":           func(w *schema.Well) { w.TotalDepth = ft(1e7) },
		"nested three":         func(w *schema.Well) { w.Strings = append(w.Strings, w.Strings[0], w.Strings[0]) },
		"surface everything": func(w *schema.Well) {
			w.Surface = schema.Surface{Kind: schema.StickUp, Protective: &schema.Protective{Interval: schema.Interval{Top: ft(-3), Bottom: ft(2)}, Diameter: in(6)},
				Vault: &schema.Vault{Diameter: in(8), Depth: ft(1)}, Pad: &schema.Pad{Length: ft(40), Width: ft(4), Thickness: ft(0.5)}}
		},
		"open hole no borehole": func(w *schema.Well) {
			w.OpenHoles = []schema.OpenHole{{Interval: schema.Interval{Top: ft(5), Bottom: ft(50)}}}
		},
	}
	for name, mutate := range odd {
		t.Run(name, func(t *testing.T) {
			w := simpleWell(30)
			mutate(w)
			doc, err := Layout(w, Inputs{}, Options{})
			if err == nil && (doc == nil || len(doc.Pages) == 0) {
				t.Error("no error and no pages")
			}
		})
	}
	if _, err := Layout(nil, Inputs{}, Options{}); err == nil {
		t.Error("a nil well laid out")
	}
	bad := Page{Name: "stamp", Width: 100, Height: 100}
	if _, err := Layout(simpleWell(30), Inputs{}, Options{Page: bad}); err == nil {
		t.Error("a 100-pt page accepted")
	}
}

func BenchmarkLayoutDeepWell(b *testing.B) {
	w := deepWell()
	for b.Loop() {
		if _, err := Layout(w, Inputs{}, Options{}); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkLayoutDemo loads, checks, quantifies and lays out the seven
// demo wells.
func BenchmarkLayoutDemo(b *testing.B) {
	for b.Loop() {
		demoDocs(b)
	}
}

// Water first met while drilling and a later static level get their own
// marks, and the legend names exactly the kinds drawn (common practice:
// a log tells a strike from a settled level).
func TestWaterLevelKindsHaveTheirOwnMarks(t *testing.T) {
	legendOf := func(kinds ...schema.LevelKind) map[string]bool {
		w := simpleWell(30)
		for i, k := range kinds {
			w.WaterLevels = append(w.WaterLevels, schema.WaterLevel{Depth: ft(12 + 4*float64(i)), Kind: k, Path: fmt.Sprintf("water_level[%d]", i)})
		}
		doc := layoutOf(t, w, Inputs{}, Options{})
		got := map[string]bool{}
		for _, b := range boxes(doc.Pages[0], "legend:") {
			got[strings.TrimPrefix(b.Role, "legend:")] = true
		}
		return got
	}
	both := legendOf(schema.FirstEncountered, schema.Static)
	if !both[symbols.FirstWater] || !both[symbols.WaterLevel] {
		t.Errorf("both kinds drawn, legend %v", both)
	}
	first := legendOf(schema.FirstEncountered)
	if !first[symbols.FirstWater] || first[symbols.WaterLevel] {
		t.Errorf("first water only, legend %v", first)
	}
	static := legendOf(schema.Static)
	if static[symbols.FirstWater] || !static[symbols.WaterLevel] {
		t.Errorf("static only, legend %v", static)
	}
}

// In a nested well each string has its own head, so a level measured in
// one string is drawn inside that string's pipe and its callout names the
// string (common practice: a nested well's levels are read per
// piezometer). The gallery's NW-3 has levels in S (21.4 ft), I (23.9 ft)
// and D (27.2 ft), three 1-in strings side by side.
func TestNestedLevelsDrawnInTheirStrings(t *testing.T) {
	data, err := os.ReadFile("../../testdata/gallery/NW-3.toml")
	if err != nil {
		t.Fatal(err)
	}
	w, err := schema.Load("NW-3.toml", data)
	if err != nil {
		t.Fatal(err)
	}
	doc := layoutOf(t, w, Inputs{}, Options{})
	pg := doc.Pages[0]
	var all []string
	pg.Walk(func(it draw.Item) {
		if tx, ok := it.(draw.Text); ok {
			all = append(all, tx.S)
		}
	})
	text := strings.Join(all, "\n")
	for i, name := range []string{"S", "I", "D"} {
		marks := boxes(pg, fmt.Sprintf("water:water_level[%d]", i))
		bores := boxes(pg, "bore:riser:"+name+"[")
		if len(marks) != 1 || len(bores) == 0 {
			t.Fatalf("%s: %d marks, %d bores", name, len(marks), len(bores))
		}
		cx := marks[0].X + marks[0].W/2
		if b := bores[0]; cx < b.X || cx > b.X+b.W {
			t.Errorf("level of %s drawn at x=%.1f, outside its bore %.1f–%.1f", name, cx, b.X, b.X+b.W)
		}
		if !strings.Contains(text, "Static water level — "+name) {
			t.Errorf("no callout names %s's level", name)
		}
	}
}
