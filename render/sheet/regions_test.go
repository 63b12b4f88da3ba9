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

// textRegion is where a text of a role must lie on a drawing sheet: its
// column of the body, the title block, the band or the caution.
func (l *layout) textRegion(role string) (draw.Rect, bool) {
	body := l.body
	col := func(c xRange) draw.Rect { return draw.Rect{X: c.X, Y: body.Y, W: c.W, H: body.H} }
	switch {
	case role == "description":
		return col(l.cols.desc), true
	case role == "callout-text", role == "matchline-text":
		return col(l.cols.call), true
	case strings.HasPrefix(role, "uscs:"):
		return col(l.cols.uscs), true
	case role == "depth-label":
		return col(l.cols.depth), true
	case role == "elevation-label":
		return col(l.cols.elev), true
	case role == "total-depth", role == "column-head":
		return body, true
	case strings.HasPrefix(role, "field:"), role == "sheet-number", role == "well-id", role == "scalebar-length", role == "stamp-text":
		return l.header, true
	case role == "caution":
		return l.caution, true
	case isBandRole(role):
		return l.band, true
	}
	return l.content, false
}

// Every text of every sheet lies inside its region (its column of the
// body, the title block, the band, the caution line), on every page size
// and orientation, as a draft and as an issued set, for the demo wells,
// the gallery (a 1,200-ft well with 150 intervals among them) and a
// crowded well; a note kept on a drawing lies in its box, the box in its
// room or strip; a column head lies within
// one column (common practice: a drafted sheet writes nothing across its
// rules or off its frame).
func TestEveryTextInsideItsRegion(t *testing.T) {
	wells := demoAndGallery(t)
	cw, cin := crowdedWell()
	wells = append(wells, corpusWell{"crowded", cw, cin})
	wells = append(wells, absurdWells(t)...)
	eachSetup(t, wells, true, func(s setup) {
		checkRegions(t, s.tag, s.l, layoutOf(t, s.well.w, s.well.in, s.opt))
	})
}

// checkRegions reports every text of doc, planned as l, outside its
// region, and every continue line touching another text.
func checkRegions(t *testing.T, tag string, l *layout, doc *draw.Document) {
	t.Helper()
	bad := 0
	for i, p := range doc.Pages {
		notesSheet := i >= len(l.sheets)
		var placed []draw.Text
		p.Walk(func(it draw.Item) {
			tx, ok := it.(draw.Text)
			if !ok || bad > 5 {
				return
			}
			placed = append(placed, tx)
			r := textRect(tx)
			region, known := l.textRegion(tx.Role)
			if notesSheet && known && region != l.header && region != l.caution {
				region = draw.Rect{X: l.content.X, Y: l.header.Bottom(), W: l.content.W, H: l.caution.Y - l.header.Bottom()}
			}
			if isBandRole(tx.Role) {
				if b, ok := l.keptBox(i, r); ok {
					region = b // notes kept on the drawing (fitstrip.go, freespace.go), inside their box
				}
			}
			if !within(r, region) {
				bad++
				t.Errorf("%s sheet %d: %s %q at %+v outside %+v", tag, i+1, tx.Role, tx.S, r, region)
			}
			if tx.Role == "column-head" && !notesSheet {
				in := false
				for _, c := range []xRange{l.cols.depth, l.cols.elev, l.cols.lith, l.cols.uscs, l.cols.desc, l.cols.feat, l.cols.well, l.cols.call} {
					in = in || (r.X >= c.X-0.01 && r.Right() <= c.Right()+0.01)
				}
				if !in {
					bad++
					t.Errorf("%s sheet %d: column head %q at %+v crosses a column rule", tag, i+1, tx.S, r)
				}
			}
		})
		for _, o := range overlappingContinueLines(placed) {
			bad++
			t.Errorf("%s sheet %d: %s", tag, i+1, o)
		}
	}
}

// keptOnDrawing reports whether r lies where drawing sheet i keeps
// notes that would otherwise go on a notes sheet: the strip above the
// caution (fitstrip.go) or the free room of the last sheet's body
// (freespace.go).
func (l *layout) keptOnDrawing(i int, r draw.Rect) bool {
	if i >= len(l.sheets) {
		return false
	}
	if l.strip > 0 && within(r, l.stripArea()) {
		return true
	}
	for _, f := range l.freeRs {
		if len(l.freeBoxes) > 0 && i == len(l.sheets)-1 && within(r, f) {
			return true
		}
	}
	return false
}

// keptBox is the box of notes kept on drawing sheet i (the strip,
// fitstrip.go, or the free room of the last sheet, freespace.go) that
// holds r, when there is one and it lies in its strip or room.
func (l *layout) keptBox(i int, r draw.Rect) (draw.Rect, bool) {
	if i >= len(l.sheets) {
		return draw.Rect{}, false
	}
	for _, b := range l.stripBoxes {
		if within(r, b.r) && within(b.r, l.stripArea()) {
			return b.r, true
		}
	}
	if i != len(l.sheets)-1 {
		return draw.Rect{}, false
	}
	for _, b := range l.freeBoxes {
		for _, f := range l.freeRs {
			if within(r, b.r) && within(b.r, f) {
				return b.r, true
			}
		}
	}
	return draw.Rect{}, false
}

// absurdWells are the demo's MW-1 with a borehole diameter that a slip of
// units or a stray keystroke gives (the rules report it): the sheet
// still draws, and its long numbers stay in their columns.
func absurdWells(t *testing.T) []corpusWell {
	var out []corpusWell
	for _, d := range []float64{1.2345678901234525e14, 1e300} {
		w := *demoWells(t)["MW-1.toml"].w
		w.Boreholes = append([]schema.BoreholeSection(nil), w.Boreholes...)
		for i := range w.Boreholes {
			w.Boreholes[i].Diameter = schema.DiameterFrom(d, schema.Inches)
		}
		out = append(out, corpusWell{fmt.Sprintf("MW-1 with a %g-in hole", d), &w, Inputs{Findings: rules.Check(&w, nil), Quantities: quantity.Compute(&w, nil)}})
	}
	return out
}

// overlappingContinueLines names each "continue" line of a box whose
// text touches another text: it must stand clear below the last row.
func overlappingContinueLines(placed []draw.Text) []string {
	var out []string
	for _, c := range placed {
		if c.Role != "notes-continued" && c.Role != "amounts-continued" {
			continue
		}
		cr := textRect(c)
		for _, o := range placed {
			if o == c {
				continue
			}
			or := textRect(o)
			if or.X < cr.Right() && cr.X < or.Right() && or.Y < cr.Bottom()+0.5 && cr.Y < or.Bottom()+0.5 {
				out = append(out, fmt.Sprintf("%q touches %s %q", c.S, o.Role, o.S))
			}
		}
	}
	return out
}

// The 1,200-ft well's 150 descriptions are all readable at the automatic
// scale: each stands beside its layer whole, or as one line whose other
// words are in a numbered note on the same set of sheets; none is left
// off the drawing.
func TestDeepWellDescriptionsReadable(t *testing.T) {
	var deep *corpusWell
	for _, c := range galleryWells(t) {
		if c.name == "DS-1200.toml" {
			deep = &c
		}
	}
	if deep == nil {
		t.Fatal("no DS-1200 in the gallery")
	}
	for _, land := range []bool{false, true} {
		tpl, _ := templates.Load("letter", land)
		opt := Options{Page: FromTemplate(tpl)}
		l := newLayout(deep.w, deep.in, opt, opt.Page)
		if err := l.plan(); err != nil {
			t.Fatal(err)
		}
		doc := layoutOf(t, deep.w, deep.in, opt)
		var notes strings.Builder
		for _, p := range doc.Pages {
			for _, s := range texts(p, "") {
				notes.WriteString(s + " ")
			}
		}
		all := strings.Join(strings.Fields(notes.String()), " ")
		seen := map[int]bool{}
		for i, es := range l.sheetDescs {
			for _, e := range es {
				seen[e.layer] = true
				if e.form == descNoted {
					t.Errorf("landscape=%v sheet %d: layer %d has no description beside it", land, i+1, e.layer)
				}
				if w := strings.Fields(e.rest); len(w) > 0 && !strings.Contains(all, strings.Join(w[:min(3, len(w))], " ")) {
					t.Errorf("landscape=%v: the rest of %s (%q) is on no sheet", land, e.mark, e.rest)
				}
			}
		}
		if len(seen) != len(deep.w.Lithology) {
			t.Errorf("landscape=%v: %d of %d layers described", land, len(seen), len(deep.w.Lithology))
		}
	}
}
