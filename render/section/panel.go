package section

import (
	"math"
	"sort"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// legendSet records what the sheet drew, so the legend lists exactly
// that.
type legendSet struct {
	symbols     map[string]symbols.Symbol
	waterLine   bool
	otherLevels bool
}

func (s *legendSet) add(sym symbols.Symbol) {
	if s.symbols == nil {
		s.symbols = map[string]symbols.Symbol{}
	}
	s.symbols[sym.ID] = sym
}

// panelItems draws the side panel: the plan inset on top, the legend
// below it.
func (l *layout) panelItems() []draw.Item {
	x := l.panel.X + gap
	w := l.panel.W - gap
	planH := math.Min(w, l.panel.H*0.45)
	plan := draw.Rect{X: x, Y: l.panel.Y + gap, W: w - gap, H: planH}
	items := l.planInset(plan)
	legend := draw.Rect{X: x, Y: plan.Bottom() + gap, W: w - gap, H: l.panel.Bottom() - plan.Bottom() - 2*gap}
	return append(items, l.legend(legend)...)
}

// planInset draws the wells and the section line in plan, north up, at
// one scale on both axes, with a scale bar.
func (l *layout) planInset(r draw.Rect) []draw.Item {
	items := []draw.Item{
		draw.Box{Rect: r, Style: draw.Style{Stroke: ink, StrokeWidth: 0.5}, Role: "section-plan"},
		draw.Text{At: draw.Point{X: r.X + 4, Y: r.Y + 10}, S: "Plan", Size: sizeLabel, Font: draw.Bold, Color: ink},
	}
	pts := append([]XY{}, l.extendedLine()...)
	for _, p := range l.wells {
		pts = append(pts, p.plan)
	}
	minE, maxE, minN, maxN := math.Inf(1), math.Inf(-1), math.Inf(1), math.Inf(-1)
	for _, p := range pts {
		minE, maxE = math.Min(minE, p.E), math.Max(maxE, p.E)
		minN, maxN = math.Min(minN, p.N), math.Max(maxN, p.N)
	}
	inner := draw.Rect{X: r.X + 18, Y: r.Y + 20, W: r.W - 36, H: r.H - 40}
	spanE, spanN := math.Max(maxE-minE, 1e-6), math.Max(maxN-minN, 1e-6)
	k := math.Min(inner.W/spanE, inner.H/spanN)
	cx, cy := inner.X+inner.W/2, inner.Y+inner.H/2
	at := func(p XY) draw.Point {
		return draw.Point{X: cx + (p.E-(minE+maxE)/2)*k, Y: cy - (p.N-(minN+maxN)/2)*k}
	}
	var line []draw.Point
	for _, p := range l.extendedLine() {
		line = append(line, at(p))
	}
	items = append(items, draw.Shape{Points: line, Style: draw.Style{Stroke: ink, StrokeWidth: 0.8, Dash: []float64{4, 2}}, Role: "section-plan-line"})
	if a, b, ok := endLetters(l.in.Section.Name); ok && len(line) >= 2 {
		items = append(items,
			draw.Text{At: offsetFrom(line[0], line[1], 9), S: a, Size: sizeLabel, Font: draw.Bold, Anchor: draw.Middle, Color: ink},
			draw.Text{At: offsetFrom(line[len(line)-1], line[len(line)-2], 9), S: b, Size: sizeLabel, Font: draw.Bold, Anchor: draw.Middle, Color: ink},
		)
	}
	for _, p := range l.wells {
		q := at(p.plan)
		items = append(items,
			draw.Circle{Center: q, R: 2.2, Style: draw.Style{Fill: ink}, Role: "section-plan-well:" + p.w.ID},
			draw.Text{At: draw.Point{X: q.X + 3.5, Y: q.Y - 3}, S: p.w.ID, Size: sizeSmall, Color: ink},
		)
	}
	// North arrow.
	nx, ny := r.Right()-12, r.Y+8
	items = append(items,
		draw.Shape{Points: []draw.Point{{X: nx, Y: ny}, {X: nx + 4, Y: ny + 12}, {X: nx, Y: ny + 9}, {X: nx - 4, Y: ny + 12}}, Closed: true, Style: draw.Style{Fill: ink}},
		draw.Text{At: draw.Point{X: nx, Y: ny + 20}, S: "N", Size: sizeSmall, Font: draw.Bold, Anchor: draw.Middle, Color: ink},
	)
	// Scale bar: a round length near a third of the inset.
	unit := float64(schema.LengthFrom(1, l.u))
	length := niceFloor(inner.W / 3 / (k * unit))
	bw := length * unit * k
	by := r.Bottom() - 8
	items = append(items,
		draw.Box{Rect: draw.Rect{X: r.X + 6, Y: by - 3, W: bw / 2, H: 3}, Style: draw.Style{Fill: ink, Stroke: ink, StrokeWidth: 0.4}},
		draw.Box{Rect: draw.Rect{X: r.X + 6 + bw/2, Y: by - 3, W: bw / 2, H: 3}, Style: draw.Style{Fill: draw.White, Stroke: ink, StrokeWidth: 0.4}},
		draw.Text{At: draw.Point{X: r.X + 8 + bw, Y: by}, S: schema.TrimFloat(length, 0) + " " + string(l.u), Size: sizeSmall, Color: ink, Role: "section-plan-scale"},
	)
	return items
}

// offsetFrom is a point d beyond a, away from b.
func offsetFrom(a, b draw.Point, d float64) draw.Point {
	dx, dy := a.X-b.X, a.Y-b.Y
	n := math.Hypot(dx, dy)
	if n == 0 {
		return draw.Point{X: a.X, Y: a.Y - d}
	}
	return draw.Point{X: a.X + dx/n*d, Y: a.Y + dy/n*d + 2.5}
}

// niceFloor is the round length (1, 2 or 5 times a power of ten) at or
// below v.
func niceFloor(v float64) float64 {
	if !(v > 0) || math.IsInf(v, 0) {
		return 1
	}
	p := math.Pow(10, math.Floor(math.Log10(v)))
	for _, m := range []float64{5, 2, 1} {
		if m*p <= v {
			return m * p
		}
	}
	return p
}

// legendEntry is one line of the legend.
type legendEntry struct {
	label  string
	swatch func(r draw.Rect) []draw.Item
}

// legend lists what the sheet drew: lithology, fills, parts, water
// marks and units; in two columns, then smaller, when it would not fit.
func (l *layout) legend(r draw.Rect) []draw.Item {
	var ents []legendEntry
	syms := make([]symbols.Symbol, 0, len(l.used.symbols))
	for _, s := range l.used.symbols {
		syms = append(syms, s)
	}
	order := map[string]int{}
	for i, s := range symbols.All() {
		order[s.ID] = i
	}
	sort.Slice(syms, func(i, j int) bool {
		if syms[i].Kind != syms[j].Kind {
			return syms[i].Kind < syms[j].Kind
		}
		oi, oki := order[syms[i].ID]
		oj, okj := order[syms[j].ID]
		if oki != okj {
			return oki
		}
		if oi != oj {
			return oi < oj
		}
		return syms[i].ID < syms[j].ID
	})
	for _, s := range syms {
		if s.ID == symbols.WaterLevel {
			continue // the water line's own entry says what it is
		}
		label := s.Name
		if s.Code != "" {
			label = s.Code + " " + s.Name
		}
		ents = append(ents, legendEntry{label, s.Swatch})
	}
	if l.used.waterLine {
		lbl := "Static water level, " + l.water.date.String()
		ents = append(ents, legendEntry{lbl, func(r draw.Rect) []draw.Item {
			mark := symbols.MustPart(symbols.WaterLevel).Swatch(r)
			return append(mark, draw.Shape{Points: []draw.Point{{X: r.X, Y: r.Y + r.H/2}, {X: r.Right(), Y: r.Y + r.H/2}}, Style: draw.Style{Stroke: waterInk, StrokeWidth: 0.9, Dash: []float64{5, 2}}})
		}})
	}
	if l.used.otherLevels {
		ents = append(ents, legendEntry{"Static water level, another day or string", func(r draw.Rect) []draw.Item {
			return []draw.Item{otherLevelMark(r.X+r.W/2-2.5, r.Y+r.H/2, "")}
		}})
	}
	ents = append(ents, legendEntry{"Ground surface (joined between wells)", func(r draw.Rect) []draw.Item {
		return []draw.Item{draw.Shape{Points: []draw.Point{{X: r.X, Y: r.Y + r.H/2}, {X: r.Right(), Y: r.Y + r.H/2}}, Style: draw.Style{Stroke: groundInk, StrokeWidth: 1.2}}}
	}})
	for _, n := range l.units {
		tint := tintOf(l.units, n)
		ents = append(ents, legendEntry{"Unit: " + n, func(r draw.Rect) []draw.Item {
			return []draw.Item{draw.Box{Rect: r, Style: draw.Style{Fill: tint, Stroke: ink, StrokeWidth: 0.4, Dash: []float64{3, 1.5}}}}
		}})
	}
	items := []draw.Item{draw.Text{At: draw.Point{X: r.X, Y: r.Y + 9}, S: "Legend", Size: sizeLabel, Font: draw.Bold, Color: ink, Role: "section-legend"}}
	top := r.Y + 14
	for _, size := range []float64{sizeSmall, 5.5, 5, 4.5} {
		for cols := 1; cols <= 2; cols++ {
			placed, ok := legendGrid(ents, draw.Rect{X: r.X, Y: top, W: r.W, H: r.Bottom() - top}, cols, size)
			if ok {
				return append(items, placed...)
			}
		}
	}
	placed, _ := legendGrid(ents, draw.Rect{X: r.X, Y: top, W: r.W, H: r.Bottom() - top}, 2, 4.5)
	return append(items, placed...)
}

// legendGrid sets entries in cols columns; ok is false when they do not
// fit r.
func legendGrid(ents []legendEntry, r draw.Rect, cols int, size float64) ([]draw.Item, bool) {
	sw, sh := 16.0, 9.0
	colW := (r.W - float64(cols-1)*6) / float64(cols)
	textW := colW - sw - 4
	var items []draw.Item
	y := r.Y
	col := 0
	for _, e := range ents {
		lines := draw.Wrap(draw.Regular, size, e.label, textW)
		h := math.Max(sh, float64(len(lines))*size*1.2) + 3
		if y+h > r.Bottom() {
			col++
			y = r.Y
			if col >= cols {
				return nil, false
			}
		}
		x := r.X + float64(col)*(colW+6)
		items = append(items, e.swatch(draw.Rect{X: x, Y: y, W: sw, H: sh})...)
		for i, ln := range lines {
			items = append(items, draw.Text{At: draw.Point{X: x + sw + 4, Y: y + size + float64(i)*size*1.2}, S: ln, Size: size, Color: ink, Role: "section-legend-entry"})
		}
		y += h
	}
	return items, true
}

// extendedLine is the section line run on past its ends to the wells
// that project beyond them, as the distance axis draws them.
func (l *layout) extendedLine() []XY {
	pl := append([]XY{}, l.line...)
	cmin, cmax := 0.0, l.line.length()
	for _, p := range l.wells {
		cmin, cmax = math.Min(cmin, p.chainage), math.Max(cmax, p.chainage)
	}
	n := len(pl)
	along := func(a, b XY, d float64) XY {
		len := math.Hypot(b.E-a.E, b.N-a.N)
		if len == 0 {
			return a
		}
		return XY{E: a.E + (b.E-a.E)/len*d, N: a.N + (b.N-a.N)/len*d}
	}
	if cmin < 0 {
		pl[0] = along(l.line[0], l.line[1], cmin)
	}
	if over := cmax - l.line.length(); over > 0 {
		pl[n-1] = along(l.line[n-1], l.line[n-2], -over)
	}
	return pl
}
