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

// bandRoles are the roles of what the band draws: legend entries, the
// amounts table, notes, findings and component notes.
var bandRoles = []string{"legend:", "legend-label", "amounts-head", "amounts-row", "amounts-note", "amounts-continued",
	"note", "finding", "callout-note", "callout-note-head", "notes-continued"}

func isBandRole(role string) bool {
	for _, r := range bandRoles {
		if strings.HasPrefix(role, r) {
			return true
		}
	}
	return false
}

// crowdedWell has more fill intervals, notes and findings than any band
// holds: the amounts table and the notes must both continue.
func crowdedWell() (*schema.Well, Inputs) {
	w := thinWell()
	w.ID = "CR-1"
	for i := 0; i < 12; i++ {
		w.Notes = append(w.Notes, fmt.Sprintf("Note %d: a remark from the field long enough to wrap onto a second and a third line of the notes box.", i+1))
	}
	fs := rules.Check(w, nil)
	for i := 0; i < 40; i++ {
		fs = append(fs, rules.Finding{Rule: fmt.Sprintf("R-%02d", i), Severity: rules.Warning, Line: i + 1,
			Message: "a warning long enough to take two lines of the notes area on any sheet, or so"})
	}
	return w, Inputs{Findings: fs, Quantities: quantity.Compute(w, nil)}
}

// textRect is the box a text's glyphs take: its advance width and the
// font's ascent and descent about the baseline.
func textRect(t draw.Text) draw.Rect {
	w := draw.TextWidth(t.Font, t.Size, t.S)
	x := t.At.X
	switch t.Anchor {
	case draw.Middle:
		x -= w / 2
	case draw.End:
		x -= w
	}
	a, d := draw.Ascent(t.Font, t.Size), draw.Descent(t.Font, t.Size)
	if d < 0 {
		d = -d
	}
	return draw.Rect{X: x, Y: t.At.Y - a, W: w, H: a + d}
}

func itemRect(it draw.Item) (draw.Rect, string, bool) {
	switch v := it.(type) {
	case draw.Text:
		return textRect(v), v.Role, true
	case draw.Box:
		return v.Rect, v.Role, true
	}
	return draw.Rect{}, "", false
}

// On every page size and orientation the band's contents stay inside
// the band (on a drawing) or the notes area (on a notes sheet), inside
// one of its boxes, and the boxes do not overlap (common practice: a
// drafted sheet draws nothing over its frame or off its body).
func TestBandStaysInItsRegion(t *testing.T) {
	wells := demoAndGallery(t)
	cw, cin := crowdedWell()
	wells = append(wells, corpusWell{"crowded", cw, cin})
	eachSetup(t, wells, true, func(s setup) {
		l, tag := s.l, s.tag
		doc := layoutOf(t, s.well.w, s.well.in, s.opt)
		if len(doc.Pages) != l.sheetCount() {
			t.Fatalf("%s: %d pages, %d planned", tag, len(doc.Pages), l.sheetCount())
		}
		for i, p := range doc.Pages {
			region := l.band
			if i >= len(l.sheets) {
				region = draw.Rect{X: l.content.X, Y: l.header.Bottom(), W: l.content.W, H: l.caution.Y - l.header.Bottom()}
			}
			// notes kept on a drawing stand in its strip (fitstrip.go) or its free room (freespace.go)
			inRegion := func(r draw.Rect) bool {
				return within(r, region) || l.keptOnDrawing(i, r)
			}
			blocks := boxes(p, "band:")
			if len(blocks) == 0 {
				t.Errorf("%s sheet %d: no band boxes", tag, i+1)
			}
			for j, b := range blocks {
				if !inRegion(b.Rect) {
					t.Errorf("%s sheet %d: %s box %+v outside the region %+v", tag, i+1, b.Role, b.Rect, region)
				}
				for _, o := range blocks[j+1:] {
					if b.Rect.Intersects(o.Rect) {
						t.Errorf("%s sheet %d: %s %+v overlaps %s %+v", tag, i+1, b.Role, b.Rect, o.Role, o.Rect)
					}
				}
			}
			p.Walk(func(it draw.Item) {
				r, role, ok := itemRect(it)
				if !ok || !isBandRole(role) {
					return
				}
				if !inRegion(r) {
					t.Errorf("%s sheet %d: %s %v at %+v outside the region %+v", tag, i+1, role, it, r, region)
					return
				}
				in := false
				for _, b := range blocks {
					in = in || within(r, b.Rect)
				}
				if !in {
					t.Errorf("%s sheet %d: %s %v at %+v in no band box", tag, i+1, role, it, r)
				}
			})
		}
	})
}

// What the band cannot hold continues, and nothing is lost: every
// amounts row and every finding of the crowded well is on some sheet,
// each once, and the drawing says where the rest is.
func TestCrowdedBandContinues(t *testing.T) {
	w, in := crowdedWell()
	for _, land := range []bool{false, true} {
		tpl, err := templates.Load("letter", land)
		if err != nil {
			t.Fatal(err)
		}
		// One drawing sheet, so the amounts table is drawn once and
		// continues on the notes sheet.
		s := Imperial(30)
		opt := Options{Page: FromTemplate(tpl), Scale: &s}
		doc := layoutOf(t, w, in, opt)
		rows, findings := 0, map[string]int{}
		for _, p := range doc.Pages {
			// A row's first cell is its interval: count rows by the
			// interval texts at the row's left edge.
			rows += countRowStarts(p)
			for _, s := range texts(p, "finding") {
				if f := strings.Fields(s); len(f) > 1 && strings.HasPrefix(f[1], "R-") {
					findings[f[1]]++
				}
			}
		}
		if rows != len(in.Quantities.Rows) {
			t.Errorf("landscape=%v: %d amounts rows drawn, the report has %d", land, rows, len(in.Quantities.Rows))
		}
		for i := 0; i < 40; i++ {
			if n := findings[fmt.Sprintf("R-%02d", i)]; n != 1 {
				t.Errorf("landscape=%v: finding R-%02d drawn %d times", land, i, n)
			}
		}
		n := len(doc.Pages)
		for i, p := range doc.Pages {
			if got := texts(p, "sheet-number"); len(got) != 1 || got[0] != fmt.Sprintf("%d of %d", i+1, n) {
				t.Errorf("landscape=%v page %d: sheet number %q", land, i+1, got)
			}
		}
		if land {
			if got := strings.Join(texts(doc.Pages[0], "amounts-continued"), ""); !strings.Contains(got, "continue on sheet") {
				t.Errorf("landscape: amounts continuation %q", got)
			}
		}
	}
}

// countRowStarts counts amounts rows: the texts of role amounts-row at
// the smallest x on the page's amounts boxes, one per row.
func countRowStarts(p *draw.Page) int {
	n := 0
	for _, b := range boxes(p, "band:amounts") {
		p.Walk(func(it draw.Item) {
			if t, ok := it.(draw.Text); ok && t.Role == "amounts-row" && t.At.X == b.X+bandPad && within(textRect(t), b.Rect) && strings.Contains(t.S, "–") {
				n++
			}
		})
	}
	return n
}

// An amounts cell too narrow for a depth range breaks it after the dash,
// never inside a number (common practice: a figure is never split).
func TestAmountCellsKeepNumbersWhole(t *testing.T) {
	l := newLayout(simpleWell(30), Inputs{}, Options{}, Letter)
	// The interval column is 0.19 of the width: wide enough for "12.9 m"
	// but not for the whole range, as in a landscape band.
	w := (draw.TextWidth(draw.Regular, sizeTiny, "12.9 m") + 4) / 0.19
	cells, _ := l.amountCells([]string{"12.6–12.9 m", "Filter pack", "1.5 ft³", "2 bags", "1.00"}, w, draw.Regular)
	for _, line := range cells[0] {
		if strings.ContainsAny(strings.TrimSuffix(strings.TrimSuffix(line, "–"), " m"), "–") {
			t.Errorf("interval cell %q", cells[0])
		}
	}
	joined := strings.Join(cells[0], "|")
	if !strings.Contains(joined, "12.6–") && !strings.Contains(joined, "12.6") {
		t.Errorf("interval cell %q lost its first depth", cells[0])
	}
	for _, line := range cells[0] {
		for _, f := range strings.Fields(strings.NewReplacer("–", " ", "m", " ").Replace(line)) {
			if f != "12.6" && f != "12.9" {
				t.Errorf("interval cell %q splits a number (%q)", cells[0], f)
			}
		}
	}
}
