package section

import (
	"math"
	"slices"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// waterLine is the day whose static levels are joined across the
// section.
type waterLine struct {
	date  schema.Date
	given bool // the project named the day
	// unit is the unit (lower case) the line follows, where wells with one
	// head are screened: a nested well joins it with the level of its
	// string screened there, its other strings' heads being marked apart.
	unit string
}

func dayOf(wl schema.WaterLevel) schema.Date {
	t := wl.Measured
	return schema.Date{Year: t.Year(), Month: t.Month(), Day: t.Day()}
}

// chooseWater picks the day: the one the project names, else the day on
// which the most wells have a static level, the latest on a tie.
func chooseWater(given schema.Date, ws []*placed) waterLine {
	if !given.IsZero() {
		return waterLine{date: given, given: true}
	}
	count := map[schema.Date]int{}
	for _, p := range ws {
		seen := map[schema.Date]bool{}
		for _, wl := range p.w.WaterLevels {
			if wl.Kind != schema.Static || wl.Measured.IsZero() {
				continue
			}
			d := dayOf(wl)
			if !seen[d] {
				seen[d] = true
				count[d]++
			}
		}
	}
	var best schema.Date
	for d, n := range count {
		if n > count[best] || (n == count[best] && d.Time().After(best.Time())) {
			best = d
		}
	}
	return waterLine{date: best, unit: lineUnit(best, ws)}
}

// lineUnit is the unit most of the wells with one head on the day (no
// level named to a string) are screened in, "" when they name none; ties
// go to the first name in order, for the same bytes every time.
func lineUnit(day schema.Date, ws []*placed) string {
	count := map[string]int{}
	for _, p := range ws {
		named, onDay := false, false
		for _, r := range p.w.WaterLevels {
			named = named || r.String != ""
			onDay = onDay || isOn(r, day)
		}
		if named || !onDay {
			continue
		}
		for _, u := range screenUnits(p.w, nil) {
			count[u]++
		}
	}
	best := ""
	for u, n := range count {
		if n > count[best] || n == count[best] && u < best {
			best = u
		}
	}
	return best
}

// screenUnits are the units (lower case) the screens of a well, or of
// one string of it, lie in.
func screenUnits(w *schema.Well, only *schema.String) []string {
	var out []string
	for _, s := range w.Strings {
		if only != nil && s.Name != only.Name {
			continue
		}
		for _, sec := range s.Screens() {
			for _, u := range unitsAt(w, sec.Interval) {
				out = append(out, strings.ToLower(u))
			}
		}
	}
	return out
}

func isOn(r schema.WaterLevel, day schema.Date) bool {
	return r.Kind == schema.Static && !r.Measured.IsZero() && dayOf(r) == day
}

// levelOn is a well's static level on the day, as an elevation in
// metres (the last reading of the day); ok false when there is none.
func (wl waterLine) levelOn(p *placed) (float64, bool) {
	got := wl.reading(p)
	if got == nil {
		return 0, false
	}
	return float64(p.ground - got.Depth), true
}

// reading is the well's reading the line joins: the last static one of
// the day. In a nested well whose strings have their own heads, it is
// that of the string screened in the line's unit; with none there, the
// hole's, else the shallowest string's (the water table's).
func (wl waterLine) reading(p *placed) *schema.WaterLevel {
	last := func(keep func(schema.WaterLevel) bool) *schema.WaterLevel {
		var got *schema.WaterLevel
		for i, r := range p.w.WaterLevels {
			if isOn(r, wl.date) && keep(r) && (got == nil || r.Measured.After(got.Measured)) {
				got = &p.w.WaterLevels[i]
			}
		}
		return got
	}
	named := last(func(r schema.WaterLevel) bool { return r.String != "" })
	if named == nil {
		return last(func(schema.WaterLevel) bool { return true })
	}
	var shallowest *schema.WaterLevel
	top := schema.Length(math.Inf(1))
	for i := range p.w.Strings {
		s := &p.w.Strings[i]
		r := last(func(r schema.WaterLevel) bool { return r.String == s.Name })
		if r == nil {
			continue
		}
		if wl.unit != "" && slices.Contains(screenUnits(p.w, s), wl.unit) {
			return r
		}
		for _, sec := range s.Screens() {
			if sec.Top < top {
				top, shallowest = sec.Top, r
			}
		}
	}
	if hole := last(func(r schema.WaterLevel) bool { return r.String == "" }); hole != nil {
		return hole
	}
	return shallowest
}

// waterItems draws the day's levels as the water mark joined by a line
// between neighbours that both have one, and every other static level as
// a small open mark.
func (l *layout) waterItems() []draw.Item {
	var items []draw.Item
	ws := l.ordered
	mark := symbols.MustPart(symbols.WaterLevel)
	var prev *placed
	for _, p := range ws {
		z, ok := l.water.levelOn(p)
		if ok {
			y := l.y(z)
			// The mark and its elevation stand left of the column; the
			// line from the neighbour stops short of them, never through
			// the figures.
			left := p.x - colWidth/2 - unitBarWidth
			if from, to, ok := l.waterSegment(prev, p); ok {
				items = append(items, draw.Shape{Points: []draw.Point{from, to},
					Style: draw.Style{Stroke: waterInk, StrokeWidth: 0.9, Dash: []float64{5, 2}}, Role: "section-water-line"})
			}
			items = append(items, l.paint(mark, draw.Rect{X: left - 10, Y: y - 5, W: 9, H: 10})...)
			items = append(items, draw.Text{At: draw.Point{X: left - 11, Y: y - 1}, S: l.elev(z), Size: sizeSmall, Anchor: draw.End, Color: waterInk, Role: "section-water:" + p.w.ID})
			prev = p
			l.used.waterLine = true
		} else {
			prev = nil
		}
		joined := l.water.reading(p)
		for _, r := range p.w.WaterLevels {
			// Another day's level, or another string's head that day.
			if r.Kind != schema.Static || isOn(r, l.water.date) && (joined == nil || r.String == joined.String) {
				continue
			}
			y := l.y(float64(p.ground - r.Depth))
			x := p.x + colWidth/2 + 1.5
			for _, lb := range l.screenLabelPlaces(p) { // past a screen label beside the column
				if lb.x > p.x && y+4 >= lb.y0-1 && y-4 <= lb.y1+1 {
					x = math.Max(x, lb.x+0.3*sizeSmall+1.5)
				}
			}
			items = append(items, otherLevelMark(x, y, "section-water-other:"+p.w.ID))
			l.used.otherLevels = true
		}
	}
	return items
}

// waterSegment is the dashed line joining two neighbours' levels on the
// day: from the right edge of a's column to short of b's mark and
// elevation, left of b's column. ok is false when either has no level
// that day, or no room is left between them.
func (l *layout) waterSegment(a, b *placed) (from, to draw.Point, ok bool) {
	if a == nil || b == nil {
		return from, to, false
	}
	za, okA := l.water.levelOn(a)
	zb, okB := l.water.levelOn(b)
	if !okA || !okB {
		return from, to, false
	}
	labelLeft := b.x - colWidth/2 - unitBarWidth - 11 - draw.TextWidth(draw.Regular, sizeSmall, l.elev(zb))
	from, to = draw.Point{X: a.x + colWidth/2, Y: l.y(za)}, draw.Point{X: labelLeft - 5, Y: l.y(zb)} // a gap, lest a dash read as a decimal point
	// Past a's screen labels on its right that the level crosses: the
	// text reads up the page, its letters left of the baseline x and the
	// descenders right of it.
	for _, lb := range l.screenLabelPlaces(a) {
		if lb.x > a.x && from.Y >= lb.y0-1 && from.Y <= lb.y1+1 {
			from.X = math.Max(from.X, lb.x+0.3*sizeSmall+1.5)
		}
	}
	return from, to, to.X > from.X
}

// otherLevelMark is a small open triangle, apex on the level: a static
// level of another day, or another string's head on the day.
func otherLevelMark(x, y float64, role string) draw.Item {
	return draw.Shape{Points: []draw.Point{{X: x, Y: y}, {X: x + 5, Y: y - 4}, {X: x + 5, Y: y + 4}}, Closed: true,
		Style: draw.Style{Stroke: waterInk, StrokeWidth: 0.6, Fill: draw.White}, Role: role}
}
