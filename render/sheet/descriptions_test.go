package sheet

import (
	"regexp"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
)

// The 1,200-ft well on every page size: a layer shown on two sheets
// across a match line keeps one mark and one note (not two notes of the
// same words), and no one-line description ends on a word that leads
// into the next ("GRAVEL with (D81)") (common practice: a note is
// written once; a cut line reads as a whole phrase).
func TestDescriptionNotesOncePerLayer(t *testing.T) {
	lead := regexp.MustCompile(`^(D\d+)\.`)
	dangling := regexp.MustCompile(`(?i)\b(with|and|or|of|to|in|at|on|the|a|an|from|into)\s+\(D\d+\)$`)
	var deep *corpusWell
	for _, c := range galleryWells(t) {
		if c.name == "DS-1200.toml" {
			deep = &c
		}
	}
	if deep == nil {
		t.Fatal("no DS-1200 in the gallery")
	}
	eachPage(t, func(page string, pg Page) {
		doc := layoutOf(t, deep.w, deep.in, Options{Page: pg})
		seen := map[string]int{}
		for _, p := range doc.Pages {
			p.Walk(func(it draw.Item) {
				tx, ok := it.(draw.Text)
				if !ok {
					return
				}
				if m := lead.FindStringSubmatch(tx.S); m != nil && tx.Role == "description-note" {
					seen[m[1]]++
				}
				if tx.Role == "description" && dangling.MatchString(tx.S) {
					t.Errorf("%s: description cut after a leading word: %q", page, tx.S)
				}
			})
		}
		if len(seen) == 0 {
			t.Fatalf("%s: no description notes", page)
		}
		for m, n := range seen {
			if n > 1 {
				t.Errorf("%s: note %s written %d times", page, m, n)
			}
		}
	})
}

// A description cut to one line keeps whole clauses: the group name and
// its descriptors are separated by commas in the order of ASTM D2488
// (group name first), so the cut falls at a comma when the line holds one
// (common practice for abbreviated logs).
func TestOneLineCutsAtAClause(t *testing.T) {
	cases := []struct{ label, fits, head, rest string }{
		{"SANDSTONE, coarse grained, weakly cemented, tan; cuttings with shell fragments", "SANDSTONE, coarse",
			"SANDSTONE", "coarse grained, weakly cemented, tan; cuttings with shell fragments"},
		{"SP-SM: SAND with silt, fine to medium, grey, wet, dense; occasional thin interbeds", "SP-SM: SAND with silt, fine to",
			"SP-SM: SAND with silt", "fine to medium, grey, wet, dense; occasional thin interbeds"},
		// "in" here is inches, but a line ending "to 4 in (D21)" reads as unfinished.
		{"Poorly graded GRAVEL, wet, dense, cobbles to 4 in, subrounded", "Poorly graded GRAVEL, wet, dense, cobbles to 4 in,",
			"Poorly graded GRAVEL, wet, dense", "cobbles to 4 in, subrounded"},
		// No comma within the line: the cut stays at a word.
		{"Weathered granitic saprolite keeping relict structure grading downward", "Weathered granitic saprolite",
			"Weathered granitic saprolite", "keeping relict structure grading downward"},
	}
	for _, c := range cases {
		width := draw.TextWidth(draw.Regular, sizeSmall, c.fits+descMarkRoom) + 0.5
		head, rest := oneLine(c.label, width)
		if head != c.head || rest != c.rest {
			t.Errorf("%q:\n got head %q rest %q\nwant head %q rest %q", c.label, head, rest, c.head, c.rest)
		}
	}
}
