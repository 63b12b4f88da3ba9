package sheet

import (
	"fmt"
	"sort"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// thinWell has many thin fill and lithology intervals, all crowding the
// callout column: 24 fills of 0.4 ft and 30 layers of 0.5 ft.
func thinWell() *schema.Well {
	w := simpleWell(30)
	w.Fills = nil
	mats := []schema.Material{schema.FilterPack, schema.FineSand, schema.BentoniteChips, schema.BentonitePellets}
	for i := 0; i < 24; i++ {
		top := 12 + 0.4*float64(i)
		w.Fills = append(w.Fills, schema.Fill{Interval: schema.Interval{Top: ft(top), Bottom: ft(top + 0.4)}, Material: mats[i%len(mats)],
			Product: "a product name long enough to wrap onto a second line of the label", Path: fmt.Sprintf("fill[%d]", i)})
	}
	w.Lithology = nil
	for i := 0; i < 30; i++ {
		top := 10 + 0.5*float64(i)
		w.Lithology = append(w.Lithology, schema.Layer{Interval: schema.Interval{Top: ft(top), Bottom: ft(top + 0.5)}, USCS: "SM",
			Description: "Silty SAND, fine, grey, wet, with thin laminae of clay", Path: fmt.Sprintf("lithology[%d]", i)})
	}
	return w
}

type label struct {
	key     string
	box     draw.Rect
	anchorY float64
}

// labels reads each callout's box and its leader's anchor from a page.
func labels(t *testing.T, p *draw.Page) []label {
	t.Helper()
	anchor := map[string]float64{}
	for _, s := range shapes(p, "leader:") {
		anchor[strings.TrimPrefix(s.Role, "leader:")] = s.Points[0].Y
	}
	var out []label
	for _, b := range boxes(p, "callout:") {
		k := strings.TrimPrefix(b.Role, "callout:")
		a, ok := anchor[k]
		if !ok {
			t.Fatalf("callout %s has no leader", k)
		}
		out = append(out, label{k, b.Rect, a})
	}
	return out
}

func TestCalloutsDoNotOverlapAndKeepDepthOrder(t *testing.T) {
	for _, s := range []Scale{Imperial(2), Imperial(5), Imperial(10)} {
		doc := layoutOf(t, thinWell(), Inputs{}, Options{Scale: &s})
		n := 0
		for pi, p := range doc.Pages {
			ls := labels(t, p)
			n += len(ls)
			for i := range ls {
				for j := i + 1; j < len(ls); j++ {
					if ls[i].box.Intersects(ls[j].box) {
						t.Errorf("%v sheet %d: callouts %s and %s overlap: %v %v", s, pi+1, ls[i].key, ls[j].key, ls[i].box, ls[j].box)
					}
				}
			}
			// Depth order: sorted by anchor, the labels run top to bottom.
			sort.SliceStable(ls, func(i, j int) bool { return ls[i].anchorY < ls[j].anchorY })
			for i := 1; i < len(ls); i++ {
				if ls[i].box.Y < ls[i-1].box.Y {
					t.Errorf("%v sheet %d: %s (anchor %.1f) above %s (anchor %.1f)", s, pi+1, ls[i].key, ls[i].anchorY, ls[i-1].key, ls[i-1].anchorY)
				}
			}
			// Within the body (a notes sheet has none, and no labels).
			bodies := boxes(p, "body")
			if len(bodies) == 0 {
				if len(ls) > 0 {
					t.Errorf("%v sheet %d: %d callouts on a sheet without a drawing", s, pi+1, len(ls))
				}
				continue
			}
			body := bodies[0]
			for _, l := range ls {
				if l.box.Y < body.Y || l.box.Bottom() > body.Bottom() {
					t.Errorf("%v sheet %d: callout %s at %v outside the body %v", s, pi+1, l.key, l.box, body.Rect)
				}
			}
		}
		if n < 24 {
			t.Errorf("%v: %d callouts in all, want one per fill at least", s, n)
		}
	}
}

// Description blocks in the lithology column never overlap either.
func TestDescriptionsDoNotOverlap(t *testing.T) {
	s := Imperial(5)
	doc := layoutOf(t, thinWell(), Inputs{}, Options{Scale: &s})
	p := doc.Pages[0]
	type line struct{ y0, y1 float64 }
	var ls []line
	p.Walk(func(it draw.Item) {
		if tx, ok := it.(draw.Text); ok && tx.Role == "description" {
			ls = append(ls, line{tx.At.Y - draw.Ascent(tx.Font, tx.Size), tx.At.Y + draw.Descent(tx.Font, tx.Size)})
		}
	})
	if len(ls) < 30 {
		t.Fatalf("%d description lines, want at least one per layer", len(ls))
	}
	sort.Slice(ls, func(i, j int) bool { return ls[i].y0 < ls[j].y0 })
	for i := 1; i < len(ls); i++ {
		if ls[i].y0 < ls[i-1].y1-0.01 {
			t.Fatalf("description lines overlap at y %.2f and %.2f", ls[i-1].y0, ls[i].y0)
		}
	}
}

// With room to spare each label sits level with what it names: its first
// line's leader end is at the anchor height.
func TestCalloutsStayLevelWhenThereIsRoom(t *testing.T) {
	s := Imperial(1)
	w := simpleWell(8)
	w.Fills = w.Fills[:1]
	w.Strings = nil
	w.Boreholes[0].Method = "hand auger"
	doc := layoutOf(t, w, Inputs{}, Options{Scale: &s})
	ls := labels(t, doc.Pages[0])
	if len(ls) != 2 {
		t.Fatalf("%d callouts, want 2 (the pack, the borehole)", len(ls))
	}
	for _, l := range ls {
		mid := l.box.Y + lineGap(sizeSmall)/2
		if d := mid - l.anchorY; d > 1.5 || d < -1.5 {
			t.Errorf("callout %s displaced %.2f pt with the column empty", l.key, d)
		}
	}
}

// pageWords is every word printed on a document, punctuation trimmed.
func pageWords(doc *draw.Document) map[string]bool {
	words := map[string]bool{}
	for _, p := range doc.Pages {
		p.Walk(func(it draw.Item) {
			if tx, ok := it.(draw.Text); ok {
				for _, w := range strings.Fields(tx.S) {
					words[strings.Trim(w, ",;:()")] = true
				}
			}
		})
	}
	return words
}

// A crowded sheet compacts its labels but loses no word of them: every
// word of every component's description is on the sheets, on its label
// or in the notes its mark points to, and no label is cut with an
// ellipsis (common practice: a drafted log states each item in full).
func TestCrowdedCalloutsLoseNoWords(t *testing.T) {
	type well struct {
		name  string
		w     *schema.Well
		in    Inputs
		opt   Options
		notes bool // the sheet is crowded enough to need component notes
	}
	var cases []well
	for _, s := range []Scale{Imperial(2), Imperial(5), Imperial(10)} {
		s := s
		cases = append(cases, well{fmt.Sprintf("thin %v", s), thinWell(), Inputs{}, Options{Scale: &s}, true})
	}
	nw := demoWells(t)["NW-1.toml"]
	cases = append(cases, well{"NW-1", nw.w, nw.in, nw.opt, true})
	for _, c := range cases {
		doc := layoutOf(t, c.w, c.in, c.opt)
		words := pageWords(doc)
		pg := c.opt.Page
		if pg.Width == 0 {
			pg = Letter
		}
		l := newLayout(c.w, c.in, c.opt, pg)
		if err := l.plan(); err != nil {
			t.Fatal(err)
		}
		check := func(what, s string) {
			for _, w := range strings.Fields(s) {
				if w = strings.Trim(w, ",;:()"); w != "" && w != "—" && !words[w] {
					t.Errorf("%s: %q of %s %q is on no sheet", c.name, w, what, s)
				}
			}
		}
		for _, co := range l.rawCallouts() {
			for _, s := range co.lines {
				check(co.key, s)
			}
			for _, n := range co.of {
				check(co.key, n)
			}
		}
		for _, co := range l.callouts() {
			check(co.key, co.title)
		}
		marks := 0
		for _, p := range doc.Pages {
			for _, s := range texts(p, "callout-text") {
				if strings.Contains(s, "…") {
					t.Errorf("%s: a label is cut: %q", c.name, s)
				}
			}
			marks += len(texts(p, "callout-note"))
		}
		if c.notes && marks == 0 {
			t.Errorf("%s: crowded, yet no component notes", c.name)
		}
	}
}
