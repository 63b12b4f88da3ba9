package section

import (
	"math"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// unitSpan is a hydrostratigraphic unit in one well: from the top of its
// highest interval to the bottom of its lowest, as elevations in metres.
type unitSpan struct{ top, bottom float64 }

// unitsOf gathers a well's units by name (case-insensitive), keeping the
// first spelling.
func unitsOf(w *schema.Well, ground schema.Length) (map[string]unitSpan, []string) {
	spans := map[string]unitSpan{}
	var names []string
	for _, ly := range w.Lithology {
		if ly.Unit == "" {
			continue
		}
		k := strings.ToLower(ly.Unit)
		top, bot := float64(ground-ly.Top), float64(ground-ly.Bottom)
		if s, ok := spans[k]; ok {
			spans[k] = unitSpan{max(s.top, top), min(s.bottom, bot)}
			continue
		}
		spans[k] = unitSpan{top, bot}
		names = append(names, ly.Unit)
	}
	return spans, names
}

// unitJoin is one unit joined between two neighbouring wells.
type unitJoin struct {
	name        string
	left, right int // indexes of the wells, in drawn order
	a, b        unitSpan
}

// correlate joins each unit between neighbours (in drawn order) that both
// log it, and nowhere else: a unit missing from one of two neighbours is
// not drawn between them, since nothing says where it ends.
func correlate(ws []*placed) (joins []unitJoin, names []string) {
	seen := map[string]bool{}
	spans := make([]map[string]unitSpan, len(ws))
	for i, p := range ws {
		var ns []string
		spans[i], ns = unitsOf(p.w, p.ground)
		for _, n := range ns {
			if !seen[strings.ToLower(n)] {
				seen[strings.ToLower(n)] = true
				names = append(names, n)
			}
		}
	}
	for i := 1; i < len(ws); i++ {
		for _, n := range names {
			k := strings.ToLower(n)
			a, okA := spans[i-1][k]
			b, okB := spans[i][k]
			if okA && okB {
				joins = append(joins, unitJoin{name: n, left: i - 1, right: i, a: a, b: b})
			}
		}
	}
	return joins, names
}

// unitTints are the fills of the units, our own: pale washes of the
// sheet palette's hues, light enough that the columns' patterns and the
// labels read over them.
var unitTints = []draw.Color{
	draw.RGB(0xDC, 0xEA, 0xF7), draw.RGB(0xFA, 0xE0, 0xD2), draw.RGB(0xF3, 0xEB, 0xC4), draw.RGB(0xD7, 0xEF, 0xDF),
	draw.RGB(0xF8, 0xDC, 0xE6), draw.RGB(0xE5, 0xDE, 0xF3), draw.RGB(0xE8, 0xE8, 0xE8), draw.RGB(0xD5, 0xEE, 0xF0),
}

func tintOf(names []string, name string) draw.Color {
	for i, n := range names {
		if strings.EqualFold(n, name) {
			return unitTints[i%len(unitTints)]
		}
	}
	return unitTints[0]
}

// unitBands draws the joined units between the columns: a band from
// the right edge of one column to the left edge of the next, its top and
// bottom straight lines.
func (l *layout) unitBands() []draw.Item {
	ws, names := l.ordered, l.units
	var items []draw.Item
	for _, j := range l.joins {
		xa, xb := ws[j.left].x+colWidth/2, ws[j.right].x-colWidth/2
		if xb <= xa {
			continue
		}
		pts := []draw.Point{{X: xa, Y: l.y(j.a.top)}, {X: xb, Y: l.y(j.b.top)}, {X: xb, Y: l.y(j.b.bottom)}, {X: xa, Y: l.y(j.a.bottom)}}
		role := "section-unit:" + j.name + ":" + ws[j.left].w.ID + ":" + ws[j.right].w.ID
		items = append(items,
			draw.Shape{Points: pts, Closed: true, Style: draw.Style{Fill: tintOf(names, j.name)}, Role: role},
			draw.Shape{Points: pts[:2], Style: draw.Style{Stroke: ink, StrokeWidth: 0.5, Dash: []float64{3, 1.5}}},
			draw.Shape{Points: pts[2:], Style: draw.Style{Stroke: ink, StrokeWidth: 0.5, Dash: []float64{3, 1.5}}},
		)
		// The unit's name in the band when it has room.
		midY := (pts[0].Y + pts[1].Y + pts[2].Y + pts[3].Y) / 4
		thick := ((pts[3].Y - pts[0].Y) + (pts[2].Y - pts[1].Y)) / 2
		if tw := draw.TextWidth(draw.Italic, sizeSmall, j.name); tw < xb-xa-8 && thick > sizeSmall+3 {
			top, bottom := (pts[0].Y+pts[1].Y)/2, (pts[2].Y+pts[3].Y)/2
			midY = l.clearOfWater(ws[j.left], ws[j.right], (xa+xb)/2, tw, midY, top, bottom)
			items = append(items, draw.Text{At: draw.Point{X: (xa + xb) / 2, Y: midY + sizeSmall/3}, S: j.name, Size: sizeSmall, Font: draw.Italic, Anchor: draw.Middle, Color: ink, Role: "section-unit-label:" + j.name})
		}
	}
	return items
}

// clearOfWater moves a unit's label, centred at (cx, midY) and tw wide,
// off the water line the band's two wells join: to the middle of the
// band's larger part above or below the line, when that part holds the
// label; else, or when the line misses the label, midY stays.
func (l *layout) clearOfWater(a, b *placed, cx, tw, midY, top, bottom float64) float64 {
	from, to, ok := l.waterSegment(a, b)
	if !ok {
		return midY
	}
	at := func(x float64) float64 {
		t := math.Max(0, math.Min(1, (x-from.X)/(to.X-from.X)))
		return from.Y + t*(to.Y-from.Y)
	}
	x0, x1 := cx-tw/2-2, cx+tw/2+2
	if x1 < from.X || x0 > to.X {
		return midY
	}
	lo, hi := math.Min(at(x0), at(x1)), math.Max(at(x0), at(x1)) // the line's y under the label
	half := sizeSmall/2 + 2.5                                    // a line just under the descenders crowds them too
	if hi < midY-half || lo > midY+half {
		return midY
	}
	need := sizeSmall + 3
	switch above, below := lo-top, bottom-hi; {
	case above >= below && above > need:
		return (top + lo) / 2
	case below > need:
		return (hi + bottom) / 2
	}
	return midY
}

// unitBar marks a well's units in a strip along the left of its
// column, so that every unit a well logs shows, joined or not.
func (l *layout) unitBar(p *placed, yd func(schema.Length) float64) []draw.Item {
	var items []draw.Item
	for _, ly := range p.w.Lithology {
		if ly.Unit == "" {
			continue
		}
		r := draw.Rect{X: p.x - colWidth/2 - unitBarWidth, Y: yd(ly.Top), W: unitBarWidth, H: yd(ly.Bottom) - yd(ly.Top)}
		items = append(items, draw.Box{Rect: r, Style: draw.Style{Fill: tintOf(l.units, ly.Unit), Stroke: ink, StrokeWidth: 0.3}, Role: "section-unit-bar:" + p.w.ID + ":" + ly.Unit})
	}
	return items
}

// unitsAt names the units a depth interval of a well lies in.
func unitsAt(w *schema.Well, iv schema.Interval) []string {
	var out []string
	seen := map[string]bool{}
	for _, ly := range w.Lithology {
		if ly.Unit != "" && ly.Overlaps(iv) && !seen[strings.ToLower(ly.Unit)] {
			seen[strings.ToLower(ly.Unit)] = true
			out = append(out, ly.Unit)
		}
	}
	return out
}

// drawnOrder is the wells left to right.
func drawnOrder(ws []*placed) []*placed {
	out := make([]*placed, len(ws))
	copy(out, ws)
	sortByX(out)
	return out
}
