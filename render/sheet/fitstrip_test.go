package sheet

import (
	"fmt"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
	"github.com/tremie-dev/tremie/templates"
)

// notedWell is a well of depth td ft with k field notes, each three
// lines long: with a dozen, the band's notes box overflows.
func notedWell(td float64, k int) (*schema.Well, Inputs) {
	w := simpleWell(td)
	for i := 0; i < k; i++ {
		w.Notes = append(w.Notes, fmt.Sprintf("Note %d: a remark from the field long enough to wrap onto a second and a third line of the notes box.", i+1))
	}
	return w, Inputs{Findings: rules.Check(w, nil), Quantities: quantity.Compute(w, nil)}
}

// Notes that overflow the band of a one-sheet drawing go in a strip on
// the drawing, not on a notes sheet of their own, when the drawing keeps
// its scale (a 70-ft well drawn at 1 in = 20 ft fills 71 % of its body,
// room for the strip), or with --scale fit at a less detailed scale (a
// 30-ft well); every note is on the sheet, and every text in its region.
func TestNotesStayOnTheSheet(t *testing.T) {
	fit := Fitted
	for _, c := range []struct {
		td    float64
		k     int
		scale *Scale
	}{{70, 12, nil}, {30, 14, &fit}} {
		w, in := notedWell(c.td, c.k)
		opt := Options{Page: Letter, Scale: c.scale}
		alone := newLayout(w, in, opt, Letter)
		if err := alone.planOnce(); err != nil {
			t.Fatal(err)
		}
		if len(alone.notesPages) == 0 {
			t.Fatalf("%d notes: the band holds them all; the test needs an overflow", c.k)
		}
		l := newLayout(w, in, opt, Letter)
		if err := l.plan(); err != nil {
			t.Fatal(err)
		}
		doc := layoutOf(t, w, in, opt)
		if len(doc.Pages) != 1 {
			t.Errorf("%d notes: %d pages, want the drawing alone", c.k, len(doc.Pages))
			continue
		}
		if c.scale == nil && l.scale != alone.scale {
			t.Errorf("%d notes: the scale moved from %v to %v", c.k, alone.scale, l.scale)
		}
		all := strings.Join(texts(doc.Pages[0], ""), " ")
		for i := 1; i <= c.k; i++ {
			if !strings.Contains(all, fmt.Sprintf("Note %d:", i)) {
				t.Errorf("%d notes: note %d is not on the sheet", c.k, i)
			}
		}
		if !strings.Contains(all, "continue below") && !strings.Contains(all, "continue at the foot of the log") {
			t.Errorf("%d notes: the band does not say where its notes continue", c.k)
		}
		doc.Pages[0].Walk(func(it draw.Item) {
			if tx, ok := it.(draw.Text); ok {
				if r, known := l.textRegion(tx.Role); known && !within(textRect(tx), r) && !(isBandRole(tx.Role) && l.keptOnDrawing(0, textRect(tx))) {
					t.Errorf("%d notes: %s %q outside %+v", c.k, tx.Role, tx.S, r)
				}
			}
		})
		t.Logf("%d notes: one sheet at %v, strip %.0f pt, %d boxes in the free room", c.k, l.scale, l.strip, len(l.freeBoxes))
	}
}

// The 1,200-ft well's 150 descriptions cannot join its --scale fit
// drawing on a Letter or Tabloid sheet: at 1 in = 300 ft (150 ft on
// Tabloid) a layer is 2-4 pt high, so each description stands beside it
// as a mark and goes whole to the notes, several hundred lines at the
// sheets' 6.5-pt text, more than a page can hold beside the drawing
// (the strip is tried and refused; the numbers are logged).
func TestDeepWellFitKeepsItsNotesSheets(t *testing.T) {
	var deep *corpusWell
	for _, c := range galleryWells(t) {
		if c.name == "DS-1200.toml" {
			deep = &c
		}
	}
	fit := Fitted
	for _, pg := range []Page{Letter, Tabloid} {
		opt := Options{Page: pg, Scale: &fit}
		l := newLayout(deep.w, deep.in, opt, pg)
		if err := l.plan(); err != nil {
			t.Fatal(err)
		}
		if len(l.sheets) != 1 || len(l.notesPages) == 0 {
			t.Errorf("%s: %d drawing and %d notes sheets", pg.Name, len(l.sheets), len(l.notesPages))
		}
		column := 0.0
		for _, boxes := range l.notesPages {
			for _, b := range boxes {
				column += b.r.H
			}
		}
		colW := max(l.bandPlan.noteW, l.bandPlan.amountW)
		perRow := int((l.content.W + sheetColGap) / (colW + sheetColGap))
		t.Logf("%s at %v: %d notes sheets, %.0f pt of %0.f-pt columns, %d abreast: a strip %.0f pt high beside a page of %.0f pt", pg.Name, l.scale, len(l.notesPages), column, colW, perRow, column/float64(perRow), l.content.H)
	}
}

// On a Letter landscape page the side band of BR-1, MW-2 and MW-3 of the
// demo overflows by a few notes: they go in the strip under the drawing,
// which keeps its scale or takes the next readable one, and each well
// stays on one sheet with every note and finding on it.
func TestLandscapeNotesStayOnTheSheet(t *testing.T) {
	tpl, err := templates.Load("letter", true)
	if err != nil {
		t.Fatal(err)
	}
	pg := FromTemplate(tpl)
	demo := demoWells(t)
	for _, name := range []string{"BR-1.toml", "MW-2.toml", "MW-3.toml"} {
		d := demo[name]
		opt := Options{Page: pg}
		alone := newLayout(d.w, d.in, opt, pg)
		if err := alone.planOnce(); err != nil {
			t.Fatal(err)
		}
		l := newLayout(d.w, d.in, opt, pg)
		if err := l.plan(); err != nil {
			t.Fatal(err)
		}
		if len(alone.notesPages) == 0 || l.sheetCount() != 1 || (l.strip == 0 && len(l.freeBoxes) == 0) {
			t.Errorf("%s: %d notes sheets alone; with the strip (%.0f pt) or the free room (%d boxes) %d pages", name, len(alone.notesPages), l.strip, len(l.freeBoxes), l.sheetCount())
			continue
		}
		doc := layoutOf(t, d.w, d.in, opt)
		all := strings.Join(strings.Fields(strings.Join(texts(doc.Pages[0], ""), " ")), " ")
		for _, f := range d.in.Findings {
			if words := strings.Fields(f.Message); !strings.Contains(all, strings.Join(words[:min(4, len(words))], " ")) {
				t.Errorf("%s: finding %s is not on the sheet", name, f.Rule)
			}
		}
		t.Logf("%s: one sheet at %v (alone %v and a notes sheet), strip %.0f pt, %d boxes in the free room", name, l.scale, alone.scale, l.strip, len(l.freeBoxes))
	}
}

// PW-1 of the demo on a Letter landscape page: its own notes fill the
// side band and the standing note (depths below ground, datum, diameters
// to their own scale) is left over, facts the title block's units and
// horizontal-exaggeration cells already give. The sheet never opens a
// notes sheet for it, and keeps the well's own notes (since the amounts
// name the conductor a fill is in, the band keeps one note and the rest,
// the standing note with it, go to the foot of the log).
func TestStandingNoteOpensNoSheetAlone(t *testing.T) {
	tpl, err := templates.Load("letter", true)
	if err != nil {
		t.Fatal(err)
	}
	pg := FromTemplate(tpl)
	d := demoWells(t)["PW-1.toml"]
	opt := Options{Page: pg}
	doc := layoutOf(t, d.w, d.in, opt)
	if len(doc.Pages) != 1 {
		t.Fatalf("PW-1 landscape: %d pages, want 1", len(doc.Pages))
	}
	all := strings.Join(strings.Fields(strings.Join(texts(doc.Pages[0], ""), " ")), " ")
	for i, n := range d.w.Notes {
		words := strings.Fields(n)
		if !strings.Contains(all, strings.Join(words[:min(4, len(words))], " ")) {
			t.Errorf("note %d is not on the sheet", i+1)
		}
	}
	if strings.Contains(all, "continue on sheet") || strings.Contains(all, "findings continue") {
		t.Errorf("the sheet points to a notes sheet, or announces findings PW-1 has none of")
	}
	// In portrait the band has room: the standing note stays.
	port, err := templates.Load("letter", false)
	if err != nil {
		t.Fatal(err)
	}
	pdoc := layoutOf(t, d.w, d.in, Options{Page: FromTemplate(port)})
	if got := strings.Join(texts(pdoc.Pages[0], ""), " "); !strings.Contains(got, "Depths are below ground surface") {
		t.Errorf("portrait PW-1 lost its standing note")
	}
}
