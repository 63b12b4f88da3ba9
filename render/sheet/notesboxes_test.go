package sheet

import (
	"regexp"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema/rules"
)

// componentHeads are the plain headings of component and description
// notes: one name for the box that begins them and for the one that
// continues them (common practice: a drafted sheet calls one thing by
// one name).
var componentHeads = regexp.MustCompile(`^(COMPONENT|DESCRIPTION|DESCRIPTION AND COMPONENT) NOTES( FOR SHEET \d+)?(, CONTINUED)?$`)

// On every sheet of the corpus a notes box holds notes, never only the
// line saying where they continue; a sheet shows at most one box titled
// plainly NOTES, any other saying that its notes continue; and the
// component notes' headings are the plain ones (common practice: an
// empty box pointing elsewhere, or two boxes both titled NOTES with one
// numbering running through them, is not a sheet a drafter hands over).
func TestNotesBoxesReadAsOneRun(t *testing.T) {
	wells := demoAndGallery(t)
	cw, cin := crowdedWell()
	wells = append(wells, corpusWell{"crowded", cw, cin})
	eachSetup(t, wells, true, func(s setup) {
		doc := layoutOf(t, s.well.w, s.well.in, s.opt)
		for i, p := range doc.Pages {
			var all []draw.Text
			p.Walk(func(it draw.Item) {
				if tx, ok := it.(draw.Text); ok {
					all = append(all, tx)
				}
			})
			plain := 0
			for _, b := range boxes(p, "band:notes") {
				var title string
				var body []string
				for _, tx := range all {
					if !within(textRect(tx), b.Rect) {
						continue
					}
					switch {
					case tx.Role == "" && strings.HasPrefix(tx.S, "NOTES") && title == "":
						title = tx.S
					case tx.Role != "notes-continued":
						body = append(body, tx.S)
					}
				}
				if len(body) == 0 {
					t.Errorf("%s sheet %d: the notes box %+v holds only its title %q and where the notes continue", s.tag, i+1, b.Rect, title)
				}
				if title == "NOTES" {
					plain++
				}
			}
			if plain > 1 {
				t.Errorf("%s sheet %d: %d boxes titled NOTES; all but the first say CONTINUED", s.tag, i+1, plain)
			}
			for _, h := range headings(all) {
				if !componentHeads.MatchString(h) {
					t.Errorf("%s sheet %d: component notes headed %q", s.tag, i+1, h)
				}
			}
		}
	})
}

// headings are the component notes' headings, each joined from the lines
// it was wrapped to.
func headings(all []draw.Text) []string {
	var out []string
	var prev draw.Text
	for _, tx := range all {
		if tx.Role != "callout-note-head" {
			continue
		}
		if len(out) > 0 && tx.At.X == prev.At.X && tx.At.Y > prev.At.Y && tx.At.Y-prev.At.Y <= lineGap(sizeSmall)+0.5 {
			out[len(out)-1] += " " + tx.S
		} else {
			out = append(out, tx.S)
		}
		prev = tx
	}
	return out
}

// TestNotesSheetSubtitleSaysWhatItHolds: a notes sheet of a well without
// findings is titled "Notes, continued"; it once announced "Notes and
// check findings" on the 1,200-ft gallery well, which has none.
func TestNotesSheetSubtitleSaysWhatItHolds(t *testing.T) {
	for _, c := range galleryWells(t) {
		if c.name != "DS-1200.toml" {
			continue
		}
		subtitleOfLast := func(in Inputs) string {
			doc := layoutOf(t, c.w, in, Options{})
			var all []string
			doc.Pages[len(doc.Pages)-1].Walk(func(it draw.Item) {
				if tx, ok := it.(draw.Text); ok && strings.HasSuffix(tx.S, ", continued") {
					all = append(all, tx.S)
				}
			})
			return strings.Join(all, " | ")
		}
		if len(c.in.Findings) != 0 {
			t.Fatalf("DS-1200 has %d findings; the test wants a clean well", len(c.in.Findings))
		}
		if got := subtitleOfLast(c.in); !strings.Contains(got, "Notes, continued") || strings.Contains(got, "findings") {
			t.Errorf("clean well's notes sheet: %q, want \"Notes, continued\"", got)
		}
		with := c.in
		with.Findings = []rules.Finding{{Rule: "BOTTOM-CAP", Severity: rules.Warning, Line: 1, WellID: c.w.ID, Message: "no bottom cap recorded"}}
		if got := subtitleOfLast(with); !strings.Contains(got, "Notes and check findings, continued") {
			t.Errorf("notes sheet of a well with a finding: %q", got)
		}
		return
	}
	t.Fatal("no DS-1200 in the gallery")
}
