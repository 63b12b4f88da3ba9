package pipeline

import (
	"fmt"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/pipeline/batch"
	"github.com/tremie-dev/tremie/render/sheet"
)

// The 1,200-ft gallery well drawn with --scale fit on Letter: one
// drawing sheet, and 147 of its 150 description notes on notes sheets
// (the drawing's free room keeps 3), which the run reports as data (the
// command prints it, exit 0) with the figures and what Tabloid would do.
// On Tabloid the drawing's free room keeps 26 of them and one notes sheet
// is left (docs/gallery.md states the same counts). On Letter the notes
// need more than a whole sheet holds (3,986 pt against 1,756 pt), and the message says that no scale
// would keep them on the drawing.
func TestFitReportsNotesSheets(t *testing.T) {
	fit := sheet.Fitted
	for _, c := range []struct {
		page          string
		notes, larger int
		largerName    string
		described     int // description notes on the notes sheets
	}{{"letter", 3, 1, "tabloid", 147}, {"tabloid", 1, 0, "", 124}} {
		run, err := Resolve([]string{"../../testdata/gallery/DS-1200.toml"}, Options{Quiet: true, Page: c.page, PageSet: true})
		if err != nil {
			t.Fatal(err)
		}
		w := Prepare(run.Inputs[0], AllRules)
		if w.Err != nil {
			t.Fatal(w.Err)
		}
		lo := LayoutOptions{Scale: &fit}
		doc, econ, err := w.LayoutReport(lo)
		if err != nil {
			t.Fatal(err)
		}
		f := w.fitNotes(lo, econ)
		if f == nil {
			t.Fatalf("%s: no report of the notes sheets (%d pages)", c.page, len(doc.Pages))
		}
		e := f.Economy
		if e.Drawings != 1 || e.NotesSheets != c.notes || len(doc.Pages) != 1+c.notes || e.DescriptionNotes != c.described {
			t.Errorf("%s: %d drawing and %d notes sheets (%d pages), %d description notes; want 1, %d, %d", c.page, e.Drawings, e.NotesSheets, len(doc.Pages), e.DescriptionNotes, c.notes, c.described)
		}
		if f.Larger != c.largerName || (c.largerName != "" && f.LargerNotes != c.larger) {
			t.Errorf("%s: larger page %q with %d notes sheets, want %q with %d", c.page, f.Larger, f.LargerNotes, c.largerName, c.larger)
		}
		// The notes sheets are what the figures say: no fewer would do.
		if e.Need <= float64(e.NotesSheets-1)*e.Holds || e.Need > float64(e.NotesSheets)*e.Holds {
			t.Errorf("%s: %.0f pt of notes for %d sheets of %.0f pt", c.page, e.Need, e.NotesSheets, e.Holds)
		}
		msg := f.String()
		wants := []string{"DS-1200: drawn on 1 sheet at 1 in = ", fmt.Sprintf("%d description notes", c.described), "notes sheet"}
		if c.page == "letter" {
			wants = append(wants, "more than a whole sheet holds, so no scale keeps them", "a larger page (tabloid) holds them on 1 notes sheet")
		}
		for _, want := range wants {
			if !strings.Contains(msg, want) {
				t.Errorf("%s: message %q lacks %q", c.page, msg, want)
			}
		}
		t.Log(msg)
	}
}

// A well the render cache finds unchanged is not drawn again, yet
// --scale fit still says what went on notes sheets.
func TestFitNotesWhenUnchanged(t *testing.T) {
	fit := sheet.Fitted
	svg, ok := out.LookupFormat("svg")
	if !ok {
		t.Fatal("no svg format")
	}
	dir := t.TempDir()
	for i, want := range []batch.Outcome{batch.Done, batch.Skipped} {
		run, err := Resolve([]string{"../../testdata/gallery/DS-1200.toml"}, Options{Quiet: true, OutDir: dir})
		if err != nil {
			t.Fatal(err)
		}
		rep, err := run.Render(RenderOptions{Formats: []out.Format{svg}, Scale: &fit, Version: "test"})
		if err != nil {
			t.Fatal(err)
		}
		w := rep.Wells[0]
		if w.Outcome != want || w.Err != nil {
			t.Fatalf("run %d: outcome %v (%v), want %v", i+1, w.Outcome, w.Err, want)
		}
		if w.FitNotes == nil || w.FitNotes.Economy.NotesSheets != 3 {
			t.Errorf("run %d (%v): fit notes %v, want the 3 notes sheets reported", i+1, want, w.FitNotes)
		}
	}
}
