package sheet

import (
	"fmt"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/rules"
)

// The title block of every demo and gallery well, drafted and issued, on
// every page size and orientation: no label or value runs into another
// (a label stays within its cell), no value is cut while the block has
// room, and the revision block's entries stand in their columns (common
// practice: a title block is a grid of cells, each read on its own).
func TestTitleBlockCells(t *testing.T) {
	var wells []corpusWell
	for n, d := range demoWells(t) {
		in := d.in
		in.TitleBlock.Revisions = []project.Revision{
			{Rev: "A", Date: schema.Date{Year: 2026, Month: 3, Day: 2}, Description: "Issued for the client's review", By: "RO"},
			{Rev: "B", Date: schema.Date{Year: 2026, Month: 6, Day: 15}, Description: "Issued for the permit; the county's comments of 2026-05-30 taken in, screens moved to the logged water table"},
		}
		wells = append(wells, corpusWell{n, d.w, in})
	}
	wells = append(wells, galleryWells(t)...)
	eachPage(t, func(page string, pg Page) {
		for _, c := range wells {
			for _, issue := range []bool{false, true} {
				if issue && rules.Blocking(c.in.Findings) {
					continue
				}
				tag := fmt.Sprintf("%s on %s issue=%v", c.name, page, issue)
				doc := layoutOf(t, c.w, c.in, Options{Page: pg, Issue: issue})
				checkTitleBlock(t, tag, doc.Pages[0], issue)
			}
		}
	})
}

func checkTitleBlock(t *testing.T, tag string, p *draw.Page, issue bool) {
	t.Helper()
	var head []draw.Text
	p.Walk(func(it draw.Item) {
		if tx, ok := it.(draw.Text); ok && (strings.HasPrefix(tx.Role, "label:") || strings.HasPrefix(tx.Role, "field:")) {
			head = append(head, tx)
		}
	})
	if len(head) < 20 {
		t.Fatalf("%s: %d title-block texts", tag, len(head))
	}
	for i, a := range head {
		ra := textRect(a)
		if strings.HasSuffix(a.S, "…") {
			t.Errorf("%s: %s cut: %q", tag, a.Role, a.S)
		}
		for _, b := range head[i+1:] {
			rb := textRect(b)
			if ra.X < rb.Right()-0.5 && rb.X < ra.Right()-0.5 && ra.Y < rb.Bottom()-0.5 && rb.Y < ra.Bottom()-0.5 {
				t.Errorf("%s: %s %q runs into %s %q", tag, a.Role, a.S, b.Role, b.S)
			}
		}
	}
	if !issue {
		return
	}
	// The revision block: four column heads, every entry at one of their
	// left edges.
	var cols []float64
	var rev []draw.Text
	for _, tx := range head {
		if tx.Role != "field:Revisions" {
			continue
		}
		if tx.Size == sizeTiny {
			cols = append(cols, tx.At.X)
			continue
		}
		rev = append(rev, tx)
	}
	if len(cols) != 4 || len(rev) == 0 {
		t.Fatalf("%s: revision block with %d column heads and %d entries", tag, len(cols), len(rev))
	}
	for _, tx := range rev {
		in := false
		for _, x := range cols {
			in = in || tx.At.X == x
		}
		if !in {
			t.Errorf("%s: revision entry %q at x %.1f stands in no column (%v)", tag, tx.S, tx.At.X, cols)
		}
	}
}

// A coordinate system named with words in brackets is not bracketed
// again ("(WGS 84 geographic (invented location))"): BR-3 of the gallery.
func TestCoordinatesNoNestedBrackets(t *testing.T) {
	for _, c := range demoAndGallery(t) {
		l := newLayout(c.w, c.in, Options{}, Letter)
		if s := l.coordinates(); strings.Contains(s, "))") || strings.Count(s, "(") > 1 {
			t.Errorf("%s: coordinates %q", c.name, s)
		}
	}
}
