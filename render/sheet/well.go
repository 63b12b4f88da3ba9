package sheet

import (
	"fmt"
	"math"
	"sort"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// Drawn minimum wall thicknesses: a 2-in Sch 40 wall at 1:10 would be a
// hairline, so walls are thickened inward (outside diameters, and so the
// annulus, stay to scale).
const (
	minWall       = 1.6
	minScreenWall = 3.2
)

// well paints the well column of one sheet.
func (p *painter) well() []draw.Item {
	l := p.l
	w := l.w
	h := l.hz
	var items []draw.Item

	// 1. The hole: white ground, so fills and pipes stand on paper.
	for i, b := range w.Boreholes {
		y0, y1, ok := p.vis(b.Top, b.Bottom)
		if !ok {
			continue
		}
		r := float64(b.Diameter) / 2 * h.ppmm
		items = append(items, box(draw.Rect{X: h.cx - r, Y: y0, W: 2 * r, H: y1 - y0}, draw.Color{}, 0, draw.White, "borehole:"+pathOr(b.Path, "borehole", i)))
	}
	// 2. Concrete pad below the protective casing and vault.
	items = append(items, p.pad()...)
	// 3. Annular fills in the borehole annulus.
	for i, f := range w.Fills {
		if f.Within == "" {
			items = append(items, p.fillInHole(i, f)...)
		}
	}
	// 4. Outer casings, outermost first, each followed by what was placed
	// in its bore.
	order := make([]int, len(w.Casings))
	for i := range order {
		order[i] = i
	}
	sort.SliceStable(order, func(a, b int) bool { return od(w.Casings[order[a]].Pipe) > od(w.Casings[order[b]].Pipe) })
	for _, ci := range order {
		c := w.Casings[ci]
		items = append(items, p.pipe("casing:"+pathOr(c.Path, "casing", ci), h.cx, c.Interval, c.Pipe, nil)...)
		for i, f := range w.Fills {
			if f.Within != "" && f.Within == c.Label() {
				items = append(items, p.fillInCasing(i, f, c)...)
			}
		}
		for _, pt := range l.parts {
			if lp, ok := pt.(lapPart); ok && lp.host.Name == c.Name {
				items = append(items, lp.paintSeal(p)...)
			}
		}
	}
	// 5. Open hole: a rough wall.
	for i, o := range w.OpenHoles {
		items = append(items, p.openHole(i, o)...)
	}
	// 6. Well strings.
	for si, s := range w.Strings {
		x := h.strX[si]
		for k := range s.Sections {
			sec := &s.Sections[k]
			items = append(items, p.pipe(string(sec.Kind)+":"+s.Label()+fmt.Sprintf("[%d]", k), x, sec.Interval, sec.Pipe, sec)...)
		}
		items = append(items, p.caps(si, s, x)...)
		items = append(items, p.centralizers("centralizer:"+s.Label(), x, stringOD(s), s.Centralizers)...)
	}
	for ci, c := range w.Casings {
		items = append(items, p.centralizers("centralizer:"+pathOr(c.Path, "casing", ci), h.cx, od(c.Pipe), c.Centralizers)...)
	}
	// 7. Surface completion.
	items = append(items, p.protective()...)
	items = append(items, p.vault()...)
	// 8. Hole walls on top, so every fill ends on a clean edge.
	items = append(items, p.holeWalls()...)
	items = append(items, p.ground()...)
	for _, pt := range l.parts {
		items = append(items, pt.paint(p)...)
	}
	items = append(items, p.waterLevels()...)

	y0, y1 := p.clipY()
	col := l.cols.well
	return append([]draw.Item{draw.Clip{Rect: draw.Rect{X: col.X, Y: y0, W: col.W, H: y1 - y0}, Items: items}}, p.featureTrack()...)
}

func pathOr(path, kind string, i int) string {
	if path != "" {
		return path
	}
	return fmt.Sprintf("%s[%d]", kind, i)
}

// fillInHole paints a fill across the borehole, piece by piece where the
// hole changes diameter; pipes drawn later cover their part.
func (p *painter) fillInHole(i int, f schema.Fill) []draw.Item {
	var items []draw.Item
	sym := materialSymbol(f.Material)
	role := "interval:" + pathOr(f.Path, "fill", i)
	for _, b := range p.l.w.Boreholes {
		t, bt := max(f.Top, b.Top), min(f.Bottom, b.Bottom)
		y0, y1, ok := p.vis(t, bt)
		if !ok {
			continue
		}
		r := float64(b.Diameter) / 2 * p.l.hz.ppmm
		items = append(items, p.paint(sym, draw.Rect{X: p.l.hz.cx - r, Y: y0, W: 2 * r, H: y1 - y0}, role)...)
	}
	return items
}

// fillInCasing paints a fill inside an outer casing's bore.
func (p *painter) fillInCasing(i int, f schema.Fill, c schema.Casing) []draw.Item {
	t, b := max(f.Top, c.Top), min(f.Bottom, c.Bottom)
	y0, y1, ok := p.vis(t, b)
	if !ok {
		return nil
	}
	r := float64(id(c.Pipe)) / 2 * p.l.hz.ppmm
	return p.paint(materialSymbol(f.Material), draw.Rect{X: p.l.hz.cx - r, Y: y0, W: 2 * r, H: y1 - y0}, "interval:"+pathOr(f.Path, "fill", i))
}

// pipe paints one casing or string section: its bore cleared, its walls,
// and for a screen its openings. The role box is the outside diameter.
func (p *painter) pipe(role string, x float64, iv schema.Interval, pp schema.Pipe, sec *schema.Section) []draw.Item {
	y0, y1, ok := p.vis(iv.Top, iv.Bottom)
	if !ok {
		return nil
	}
	h := p.l.hz
	ro := float64(od(pp)) / 2 * h.ppmm
	wall := float64(od(pp)-id(pp)) / 2 * h.ppmm
	screen := sec != nil && sec.Kind == schema.ScreenSection
	if screen {
		wall = max(wall, minScreenWall)
	} else {
		wall = max(wall, minWall)
	}
	wall = min(wall, ro*0.45)
	ht := y1 - y0
	left := draw.Rect{X: x - ro, Y: y0, W: wall, H: ht}
	right := draw.Rect{X: x + ro - wall, Y: y0, W: wall, H: ht}
	items := []draw.Item{box(draw.Rect{X: x - ro + wall, Y: y0, W: 2 * (ro - wall), H: ht}, draw.Color{}, 0, draw.White, "bore:"+role)}
	part := symbols.Casing
	if screen {
		part = symbols.ScreenSlotted
		if sec.ScreenType == schema.ContinuousWrap {
			part = symbols.ScreenWrap
		}
	}
	sym := p.use(partSymbol(part))
	items = append(items, sym.paint(left)...)
	items = append(items, sym.paint(right)...)
	if screen && sec.ScreenType == schema.Prepacked {
		p.use(prepackSymbol())
		items = append(items, prepackSleeve(left, right)...)
	}
	// Outline: the outside diameter, and the bore's edges.
	items = append(items,
		box(draw.Rect{X: x - ro, Y: y0, W: 2 * ro, H: ht}, ink, 0.5, draw.Color{}, role),
		line(left.Right(), y0, left.Right(), y1, 0.3, ink, ""),
		line(right.X, y0, right.X, y1, 0.3, ink, ""))
	return items
}

// prepackSymbol is the sleeve of a prepacked screen, which the shared
// table has no entry for: slotted walls inside a dashed sleeve.
func prepackSymbol() symbol {
	sw := func(r draw.Rect) []draw.Item {
		slotted := partSymbol(symbols.ScreenSlotted)
		a := draw.Rect{X: r.X + 3, Y: r.Y, W: 2.5, H: r.H}
		b := draw.Rect{X: r.Right() - 5.5, Y: r.Y, W: 2.5, H: r.H}
		items := append(slotted.paint(a), slotted.paint(b)...)
		return append(items, prepackSleeve(a, b)...)
	}
	return symbol{key: "sheet:prepacked", label: "Prepacked screen sleeve", order: 30000, paint: sw, swatch: sw}
}

// prepackSleeve is the pack sleeve around a prepacked screen, drawn as a
// dashed outline outside the walls.
func prepackSleeve(left, right draw.Rect) []draw.Item {
	st := draw.Style{Stroke: ink, StrokeWidth: 0.5, Dash: []float64{1.2, 1.2}}
	return []draw.Item{
		draw.Shape{Style: st, Points: []draw.Point{{X: left.X - 1.5, Y: left.Y}, {X: left.X - 1.5, Y: left.Bottom()}}},
		draw.Shape{Style: st, Points: []draw.Point{{X: right.Right() + 1.5, Y: right.Y}, {X: right.Right() + 1.5, Y: right.Bottom()}}},
	}
}

// caps paints a string's top cap and bottom cap.
func (p *painter) caps(si int, s schema.String, x float64) []draw.Item {
	if len(s.Sections) == 0 {
		return nil
	}
	var items []draw.Item
	h := p.l.hz
	top, bot := s.Sections[0], s.Sections[len(s.Sections)-1]
	capSym := partSymbol(symbols.Cap)
	rt := float64(od(top.Pipe)) / 2 * h.ppmm
	if s.TopCap != "" && p.visible(top.Top) {
		y := p.y(top.Top)
		r := draw.Rect{X: x - rt - 0.8, Y: y - 2.8, W: 2*rt + 1.6, H: 2.8}
		items = append(items, box(r, draw.Color{}, 0, draw.Color{}, "topcap:"+s.Label()))
		items = append(items, p.use(capSym).paint(r)...)
	}
	rb := float64(od(bot.Pipe)) / 2 * h.ppmm
	if s.BottomCap != "" && p.visible(bot.Bottom) {
		y := p.y(bot.Bottom)
		r := draw.Rect{X: x - rb, Y: y - 3, W: 2 * rb, H: 3}
		items = append(items, box(r, draw.Color{}, 0, draw.Color{}, "bottomcap:"+s.Label()))
		items = append(items, p.use(capSym).paint(r)...)
	}
	return items
}

// centralizers are the table's bow springs around the pipe, reaching to
// just inside the hole wall.
func (p *painter) centralizers(role string, x float64, d schema.Diameter, at []schema.Length) []draw.Item {
	var items []draw.Item
	r := float64(d) / 2 * p.l.hz.ppmm
	sym := partSymbol(symbols.Centralizer)
	for _, z := range at {
		if !p.visible(z) {
			continue
		}
		hole := float64(p.l.holeAt(z)) / 2 * p.l.hz.ppmm
		reach := max(hole-r-0.8, 2.0)
		y := p.y(z)
		// The collars span the box's inner 56 %, the bows bulge 22 % beyond:
		// size the box so the collars meet the pipe and the bows the reach.
		bw := max(2*(r+reach), 2*r/0.56)
		if hole > r {
			bw = min(bw, 2*hole-1.2) // the bows stay inside the hole wall
		}
		rect := draw.Rect{X: x - bw/2, Y: y - 5, W: bw, H: 10}
		items = append(items, box(rect, draw.Color{}, 0, draw.Color{}, role))
		items = append(items, p.use(sym).paint(rect)...)
	}
	return items
}

// holeAt is the borehole diameter at a depth, 0 if none.
func (l *layout) holeAt(z schema.Length) schema.Diameter { return l.secs.At(z).Hole }

// openHole paints an uncased interval: paper inside, rough walls drawn
// with the other hole walls.
func (p *painter) openHole(i int, o schema.OpenHole) []draw.Item {
	y0, y1, ok := p.vis(o.Top, o.Bottom)
	if !ok {
		return nil
	}
	d := p.l.holeAt((o.Top + o.Bottom) / 2)
	r := float64(d) / 2 * p.l.hz.ppmm
	return []draw.Item{box(draw.Rect{X: p.l.hz.cx - r, Y: y0, W: 2 * r, H: y1 - y0}, draw.Color{}, 0, draw.White, "openhole:"+pathOr(o.Path, "open_hole", i))}
}

// roughWall is the table's open-hole wall in a strip centred on x.
func (p *painter) roughWall(x, y0, y1 float64) []draw.Item {
	return p.use(partSymbol(symbols.OpenHole)).paint(draw.Rect{X: x - 1.8, Y: y0, W: 3.6, H: y1 - y0})
}

// holeWalls draws the borehole walls: straight where drilled and cased or
// filled, rough along open hole, with steps where the diameter changes.
func (p *painter) holeWalls() []draw.Item {
	w := p.l.w
	h := p.l.hz
	var items []draw.Item
	wallStyle := draw.Style{Stroke: ink, StrokeWidth: 0.7}
	prevR := 0.0
	prevBottom := schema.Length(math.Inf(-1))
	for _, b := range w.Boreholes {
		r := float64(b.Diameter) / 2 * h.ppmm
		for _, seg := range splitByOpenHole(w, b.Interval) {
			y0, y1, ok := p.vis(seg.iv.Top, seg.iv.Bottom)
			if !ok {
				continue
			}
			if seg.open {
				items = append(items, p.roughWall(h.cx-r, y0, y1)...)
				items = append(items, p.roughWall(h.cx+r, y0, y1)...)
				continue
			}
			for _, x := range []float64{h.cx - r, h.cx + r} {
				items = append(items, draw.Shape{Style: wallStyle, Points: []draw.Point{{X: x, Y: y0}, {X: x, Y: y1}}})
			}
		}
		// A step in diameter, or the hole's bottom.
		if b.Top == prevBottom && prevR != r && p.visible(b.Top) {
			y := p.y(b.Top)
			lo, hi := min(prevR, r), max(prevR, r)
			items = append(items, line(h.cx-hi, y, h.cx-lo, y, 0.7, ink, ""), line(h.cx+lo, y, h.cx+hi, y, 0.7, ink, ""))
		}
		prevR, prevBottom = r, b.Bottom
	}
	if n := len(w.Boreholes); n > 0 {
		b := w.Boreholes[n-1]
		if p.visible(b.Bottom) {
			r := float64(b.Diameter) / 2 * h.ppmm
			y := p.y(b.Bottom)
			items = append(items, line(h.cx-r, y, h.cx+r, y, 0.7, ink, "hole-bottom"))
		}
	}
	return items
}

type wallSeg struct {
	iv   schema.Interval
	open bool
}

// splitByOpenHole cuts an interval into the parts inside and outside the
// well's open-hole intervals.
func splitByOpenHole(w *schema.Well, iv schema.Interval) []wallSeg {
	cuts := []schema.Length{iv.Top, iv.Bottom}
	for _, o := range w.OpenHoles {
		for _, z := range []schema.Length{o.Top, o.Bottom} {
			if z > iv.Top && z < iv.Bottom {
				cuts = append(cuts, z)
			}
		}
	}
	sort.Slice(cuts, func(i, j int) bool { return cuts[i] < cuts[j] })
	var out []wallSeg
	for i := 0; i+1 < len(cuts); i++ {
		seg := schema.Interval{Top: cuts[i], Bottom: cuts[i+1]}
		if !(seg.Bottom > seg.Top) {
			continue
		}
		mid := (seg.Top + seg.Bottom) / 2
		open := false
		for _, o := range w.OpenHoles {
			if o.Contains(mid) {
				open = true
			}
		}
		out = append(out, wallSeg{seg, open})
	}
	return out
}

// padInterval is where the concrete pad stands, as the quantities count it.
func padInterval(s schema.Surface) (schema.Interval, bool) { return quantity.PadInterval(s) }

// pad paints the concrete pad to the horizontal scale, cut with break
// marks where it is wider than the column.
func (p *painter) pad() []draw.Item {
	s := p.l.w.Surface
	iv, ok := padInterval(s)
	if !ok {
		return nil
	}
	y0, y1, vis := p.vis(iv.Top, iv.Bottom)
	if !vis {
		return nil
	}
	h := p.l.hz
	col := p.l.cols.well
	half := float64(s.Pad.Length) * 1000 / 2 * h.ppmm
	limit := col.W/2 - 6
	broken := half > limit
	if broken {
		half = limit
	}
	r := draw.Rect{X: h.cx - half, Y: y0, W: 2 * half, H: y1 - y0}
	items := p.paint(materialSymbol(schema.Concrete), r, "pad")
	items = append(items, box(r, ink, 0.5, draw.Color{}, ""))
	if broken {
		for _, x := range []float64{r.X, r.Right()} {
			items = append(items, draw.Shape{Style: draw.Style{Stroke: ink, StrokeWidth: 0.6, Fill: draw.White}, Closed: true,
				Points: []draw.Point{{X: x - 1.5, Y: y0 - 2}, {X: x + 1.5, Y: y0 + (y1-y0)*0.4}, {X: x - 1.5, Y: y0 + (y1-y0)*0.6}, {X: x + 1.5, Y: y1 + 2}}, Role: "pad-break"})
		}
	}
	return items
}

// protective paints a stick-up's protective casing with its lid.
func (p *painter) protective() []draw.Item {
	pc := p.l.w.Surface.Protective
	if pc == nil {
		return nil
	}
	y0, y1, ok := p.vis(pc.Top, pc.Bottom)
	if !ok {
		return nil
	}
	h := p.l.hz
	r := float64(pc.Diameter) / 2 * h.ppmm
	wall := 2.0
	sym := p.use(partSymbol(symbols.Casing))
	items := append(sym.paint(draw.Rect{X: h.cx - r, Y: y0, W: wall, H: y1 - y0}), sym.paint(draw.Rect{X: h.cx + r - wall, Y: y0, W: wall, H: y1 - y0})...)
	items = append(items, box(draw.Rect{X: h.cx - r, Y: y0, W: 2 * r, H: y1 - y0}, draw.Color{}, 0, draw.Color{}, "protective"))
	if p.visible(pc.Top) {
		lid := draw.Rect{X: h.cx - r - 1.2, Y: y0 - 2.4, W: 2*r + 2.4, H: 2.4}
		items = append(items, box(lid, draw.Color{}, 0, draw.Color{}, "protective-lid"))
		items = append(items, p.use(partSymbol(symbols.Cap)).paint(lid)...)
	}
	return items
}

// vault paints a flush-mount road box: walls from the ground to its
// depth and a lid flush with the ground.
func (p *painter) vault() []draw.Item {
	v := p.l.w.Surface.Vault
	if v == nil || p.l.w.Surface.Kind == schema.StickUp {
		return nil
	}
	y0, y1, ok := p.vis(0, max(v.Depth, 0.01))
	if !ok {
		return nil
	}
	h := p.l.hz
	r := float64(v.Diameter) / 2 * h.ppmm
	sym := p.use(partSymbol(symbols.Casing))
	items := []draw.Item{box(draw.Rect{X: h.cx - r + 2, Y: y0, W: 2*r - 4, H: y1 - y0}, draw.Color{}, 0, draw.White, "")}
	items = append(items, sym.paint(draw.Rect{X: h.cx - r, Y: y0, W: 2, H: y1 - y0})...)
	items = append(items, sym.paint(draw.Rect{X: h.cx + r - 2, Y: y0, W: 2, H: y1 - y0})...)
	lid := draw.Rect{X: h.cx - r - 1, Y: y0, W: 2*r + 2, H: 2}
	items = append(items, box(draw.Rect{X: h.cx - r, Y: y0, W: 2 * r, H: y1 - y0}, draw.Color{}, 0, draw.Color{}, "vault"), box(lid, draw.Color{}, 0, draw.Color{}, "vault-lid"))
	return append(items, p.use(partSymbol(symbols.Cap)).paint(lid)...)
}

// ground draws the ground line across the well column, broken where the
// hole, pad or vault meets it, with short hatching below.
func (p *painter) ground() []draw.Item {
	if !p.visible(0) {
		return nil
	}
	l := p.l
	col := l.cols.well
	y := p.y(0)
	gap := float64(l.holeAt(0.001)) / 2 * l.hz.ppmm
	if v := l.w.Surface.Vault; v != nil {
		gap = max(gap, float64(v.Diameter)/2*l.hz.ppmm)
	}
	if pc := l.w.Surface.Protective; pc != nil {
		gap = max(gap, float64(pc.Diameter)/2*l.hz.ppmm)
	}
	if l.w.Surface.Pad != nil {
		half := float64(l.w.Surface.Pad.Length) * 1000 / 2 * l.hz.ppmm
		gap = max(gap, min(half, col.W/2-6))
	}
	xl, xr := l.hz.cx-gap, l.hz.cx+gap
	items := []draw.Item{
		line(col.X, y, xl, y, 1.1, ink, "ground"),
		line(xr, y, col.Right(), y, 1.1, ink, "ground"),
	}
	for x := col.X + 2; x < col.Right()-2; x += 4 {
		if x > xl-3 && x < xr {
			continue
		}
		items = append(items, line(x, y+0.6, x+2.6, y+3.2, 0.4, ink, ""))
	}
	return items
}

// waterLevels marks each reading with an inverted triangle in the bore:
// the first-encountered mark for water met while drilling, the level mark
// for static and pumping readings (the callout names which).
func (p *painter) waterLevels() []draw.Item {
	l := p.l
	var items []draw.Item
	x := l.hz.cx
	if len(l.hz.strX) > 0 {
		x = l.hz.strX[0]
	}
	for i, wl := range l.w.WaterLevels {
		if !p.visible(wl.Depth) {
			continue
		}
		y := p.y(wl.Depth)
		xi := x + float64(i%3-1)*3.5                       // readings close together stay apart
		mark := draw.Rect{X: xi - 4, Y: y - 4, W: 8, H: 8} // the table's mark has its apex at the box's centre
		items = append(items, box(mark, draw.Color{}, 0, draw.Color{}, "water:"+pathOr(wl.Path, "water_level", i)))
		id := symbols.WaterLevel
		if wl.Kind == schema.FirstEncountered {
			id = symbols.FirstWater
		}
		items = append(items, p.use(partSymbol(id)).paint(mark)...)
	}
	return items
}
