package pipeline

import (
	"fmt"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/sheet"
)

// The 1,200-ft gallery well drawn with --scale fit on Letter: one
// drawing sheet, and 148 of its 150 description notes on notes sheets
// (the drawing's free room keeps 2), which the run reports as data (the
// command prints it, exit 0) with the figures and what Tabloid would do.
// On Tabloid the drawing's free room keeps 26 of them and one notes sheet
// is left (docs/gallery.md states the same counts).
func TestFitReportsNotesSheets(t *testing.T) {
	fit := sheet.Fitted
	for _, c := range []struct {
		page          string
		notes, larger int
		largerName    string
		described     int // description notes on the notes sheets
	}{{"letter", 3, 1, "tabloid", 148}, {"tabloid", 1, 0, "", 124}} {
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
		for _, want := range []string{"DS-1200: drawn on 1 sheet at 1 in = ", fmt.Sprintf("%d description notes", c.described), "notes sheet"} {
			if !strings.Contains(msg, want) {
				t.Errorf("%s: message %q lacks %q", c.page, msg, want)
			}
		}
		t.Log(msg)
	}
}
