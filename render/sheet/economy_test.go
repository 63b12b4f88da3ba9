package sheet

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/templates"
)

// economyKnown are the setups of the sweep below that still keep a notes
// sheet or a mostly blank last sheet, each with the reason it stays;
// any other setup doing so is a regression, and a setup that no longer
// does must leave the list.
var economyKnown = map[string]string{
	// 150 descriptions at the automatic scale: their notes fill whole
	// notes sheets (4,194 pt of 6.5-pt text in 158-pt columns on Letter,
	// a notes sheet holding 1,756); the last drawing sheet's free room
	// (under 20 % of a body) holds a fraction of one, and no less
	// detailed scale within twice the readable limit keeps the
	// descriptions beside their layers. Drafts and issued sets alike.
}

func init() {
	for _, page := range []string{"letter", "tabloid", "a4", "a3"} {
		for _, land := range []string{"false", "true"} {
			for _, issued := range []string{"", " issued"} {
				economyKnown["DS-1200.toml "+page+" landscape="+land+issued] = "notes"
			}
		}
	}
	// Issued on Tabloid landscape its notes fit on the drawings (4 at 1 in = 50 ft).
	delete(economyKnown, "DS-1200.toml tabloid landscape=true issued")
}

// Sheet economy over the demo and the gallery on Letter, Tabloid, A4 and
// A3, portrait and landscape (common practice: a drafter hands over no
// sheet holding only notes that fit on the drawing, and no last sheet
// a third blank, issue 10's bar): every setup opens a notes sheet or
// leaves its last drawing sheet (drawing and notes at its foot) less
// than two thirds used only where economyKnown says why.
// NW-1 of the demo on Letter portrait is one sheet, its component notes
// under the log; TW-7 on Letter landscape is two, its notes at the foot
// of the second; TW-7 on A4 portrait is two sheets at 1 in = 80 ft, not
// four at 1 in = 50 ft with 25 ft on the last (match lines rounded to
// the axis ticks had left it 11 % used).
func TestSheetEconomy(t *testing.T) {
	seen := map[string]bool{}
	eachSetup(t, demoAndGallery(t), true, func(s setup) {
		l, tag := s.l, s.tag
		used := l.lastUsed()
		got := ""
		switch {
		case len(l.notesPages) > 0:
			got = "notes"
		case len(l.sheets) > 1 && used < 2.0/3:
			got = "blank"
		}
		if got != "" {
			seen[tag] = true
			t.Logf("%s: %d drawing and %d notes sheets at %v, the last drawing %.0f %% used", tag, len(l.sheets), len(l.notesPages), l.scale, 100*used)
		}
		if want := economyKnown[tag]; got != want {
			t.Errorf("%s: %q, want %q (%d drawing and %d notes sheets at %v, last %.0f %% used)", tag, got, want, len(l.sheets), len(l.notesPages), l.scale, 100*used)
		}
		switch tag {
		case "NW-1.toml letter landscape=false":
			if l.sheetCount() != 1 || len(l.freeBoxes) == 0 {
				t.Errorf("%s: %d sheets, %d boxes in the free room; want one sheet with its notes under the log", tag, l.sheetCount(), len(l.freeBoxes))
			}
		case "TW-7.toml a4 landscape=false":
			if len(l.sheets) != 2 || l.scale != Imperial(80) {
				t.Errorf("%s: %d sheets at %v; want two at 1 in = 80 ft", tag, len(l.sheets), l.scale)
			}
		case "TW-7.toml letter landscape=false":
			// 1 in = 60 ft since the band lost a false finding's waiver
			// (1 in = 80 ft before): still two sheets, parted at 300 ft
			if len(l.sheets) != 2 || l.scale != Imperial(60) || math.Abs(float64(l.sheets[0].Bottom-ft(300))) > 1e-9 {
				t.Errorf("%s: %d sheets at %v, %v; want two at 1 in = 60 ft sharing the depth at 300 ft", tag, len(l.sheets), l.scale, l.sheets)
			}
		case "TW-7.toml letter landscape=true":
			if l.sheetCount() != 2 || len(l.freeBoxes) == 0 {
				t.Errorf("%s: %d sheets, %d boxes in the free room; want two drawing sheets and no notes sheet", tag, l.sheetCount(), len(l.freeBoxes))
			}
		}
	})
	for tag := range economyKnown {
		if !seen[tag] {
			t.Errorf("%s: listed in economyKnown but keeps no notes sheet and no blank sheet now: take it off the list", tag)
		}
	}
}

// A note too tall for the foot of a column goes on in the next: its
// first lines stay, the rest opens with its mark and "continued", and
// no word is lost or doubled (common practice: a continued paragraph is
// marked where it resumes).
func TestSplitNoteKeepsEveryWord(t *testing.T) {
	text := "Well-graded SAND with gravel, fine to coarse, subrounded, light brown, dense, wet; thin clay partings at the base, driller notes a loss of circulation near the bottom of the interval"
	var b textBlock
	b.addLead("D3.", text, sizeSmall, 100)
	n := noteBlock{block: b, color: ink, role: "description-note"}
	if len(b.lines) < 5 {
		t.Fatalf("the note wraps into %d lines; want at least 5", len(b.lines))
	}
	cols, rest, _ := fillColumns([]noteBlock{n}, 4, 3*lineGap(sizeSmall)+1.5, 100, true)
	if len(cols) < 2 || len(rest) != 0 {
		t.Fatalf("%d columns, %d left; want the note over two columns or more", len(cols), len(rest))
	}
	var words []string
	for i, col := range cols {
		part := col[0]
		if len(col) != 1 || len(part.block.lines) > 3 {
			t.Errorf("column %d: %d blocks, %d lines; want one block of at most 3", i+1, len(col), len(part.block.lines))
		}
		if lead := part.block.lines[0].lead; i > 0 && (lead != "D3, continued:" || !part.tail) {
			t.Errorf("column %d opens with %q", i+1, lead)
		}
		for _, ln := range part.block.lines {
			words = append(words, strings.Fields(ln.s)...)
		}
	}
	if got := strings.Join(words, " "); got != text {
		t.Errorf("split note reads %q, want %q", got, text)
	}
	// Notes kept on the drawing: DS-1200 with --scale fit on Letter sets
	// the first of its notes under the log, the findings split over the
	// rooms under the lithology and the well columns; on Tabloid too;
	// every text stays in its region and box.
	for _, c := range galleryWells(t) {
		if c.name != "DS-1200.toml" {
			continue
		}
		fit := Fitted
		for _, pg := range []Page{Letter, Tabloid} {
			opt := Options{Page: pg, Scale: &fit}
			l := newLayout(c.w, c.in, opt, pg)
			if err := l.plan(); err != nil {
				t.Fatal(err)
			}
			if len(l.sheets) != 1 || len(l.freeBoxes) < 2 {
				t.Errorf("DS-1200 fit on %s: %d drawing sheets, %d boxes of notes on it; want 1 and 2", pg.Name, len(l.sheets), len(l.freeBoxes))
			}
			checkRegions(t, "DS-1200 fit on "+pg.Name, l, layoutOf(t, c.w, c.in, opt))
		}
	}
}

// A numbered note of the well (plain text "3. Depths are ...", no bold
// mark) split over two columns resumes as "3, continued:", as a marked
// note does: BR-1 in landscape resumed it as a bare "Continued:" beside
// note 4, so that it read as part of no note.
func TestSplitNumberedNoteKeepsItsNumber(t *testing.T) {
	var b textBlock
	b.add("3. Depths are below ground surface; elevations above NAVD88. Diameters are drawn to their own scale, wider than the depth scale (see horizontal exaggeration).", draw.Regular, sizeSmall, 150)
	if len(b.lines) < 3 {
		t.Fatalf("the note wraps into %d lines; want at least 3", len(b.lines))
	}
	_, rest, ok := splitNote(noteBlock{block: b, color: ink}, 2*lineGap(sizeSmall)+1.5, 150)
	if !ok || rest.block.lines[0].lead != "3, continued:" {
		t.Errorf("split %v; the rest opens with %q, want \"3, continued:\"", ok, rest.block.lines[0].lead)
	}
	for s, want := range map[string]string{"12. Casing seated": "12", "3.5 ft of sand": "", "Note 3. x": "", "": ""} {
		if got := noteNumber(s); got != want {
			t.Errorf("noteNumber(%q) = %q, want %q", s, got, want)
		}
	}
}

// A note taller than a whole column of a notes sheet goes on in the
// next column rather than past the sheet's foot (common practice: a
// drafted sheet writes nothing off its frame).
func TestTallNoteSplitsOnNotesSheet(t *testing.T) {
	w, in := crowdedWell()
	w.Notes = append([]string{strings.Repeat("A remark from the field that runs on and on, as a driller's daily log pasted whole may. ", 60)}, w.Notes...)
	for _, land := range []bool{false, true} {
		tpl, err := templates.Load("letter", land)
		if err != nil {
			t.Fatal(err)
		}
		opt := Options{Page: FromTemplate(tpl)}
		l := newLayout(w, in, opt, opt.Page)
		if err := l.plan(); err != nil {
			t.Fatal(err)
		}
		checkRegions(t, fmt.Sprintf("a long note, landscape=%v", land), l, layoutOf(t, w, in, opt))
		a := l.notesArea()
		for p, boxes := range l.notesPages {
			for _, b := range boxes {
				if !within(b.r, a) {
					t.Errorf("landscape=%v notes sheet %d: box %+v past the notes area %+v", land, p+1, b.r, a)
				}
			}
		}
	}
}
