package symbols

import (
	"math"

	"github.com/tremie-dev/tremie/render/draw"
)

// Well parts. Paint draws the part into the rectangle the layout gives
// it: a wall strip for casing, screen and open-hole walls, the box around
// a water-level mark, a centralizer or a cap. Swatch draws a small pipe
// section showing the part, for the legend.
var partSymbols = []Symbol{
	{ID: "part:casing", Name: "Casing or riser wall (blank)", Kind: WellPart, Fill: partInk, swatch: pipeSwatch("part:casing")},
	{ID: "part:screen-slotted", Name: "Screen, slotted", Kind: WellPart, Fill: partInk, marks: slots, swatch: pipeSwatch("part:screen-slotted")},
	{ID: "part:screen-wrap", Name: "Screen, continuous wrap (wire-wound)", Kind: WellPart, Fill: draw.White, marks: wireWrap, swatch: pipeSwatch("part:screen-wrap")},
	{ID: "part:open-hole", Name: "Open hole (uncased borehole wall)", Kind: WellPart, marks: roughWall, swatch: pipeSwatch("part:open-hole")},
	{ID: "part:water-level", Name: "Static or pumping water level", Kind: WellPart, marks: waterMark, swatch: markSwatch("part:water-level")},
	{ID: "part:water-first", Name: "First water encountered", Kind: WellPart, marks: firstWaterMark, swatch: markSwatch("part:water-first")},
	{ID: "part:centralizer", Name: "Centralizer", Kind: WellPart, marks: bowSprings, swatch: centralizerSwatch},
	{ID: "part:cap", Name: "Cap or plug", Kind: WellPart, Fill: partInk, marks: capBand, swatch: capSwatch},
	{ID: "part:packer", Name: "Packer (holds the liner, seals the lap)", Kind: WellPart, Fill: packerGrey, marks: packerCross, swatch: lapSwatch("part:packer")},
	{ID: "part:hanger", Name: "Liner hanger (no seal)", Kind: WellPart, marks: hangerSlips, swatch: lapSwatch("part:hanger")},
	{ID: "part:drive-shoe", Name: "Drive shoe", Kind: WellPart, Fill: partInk, marks: shoeBevel, swatch: shoeSwatch},
	{ID: "part:pump", Name: "Pump intake", Kind: WellPart, marks: pumpBody, swatch: markSwatchPlain("part:pump")},
	{ID: "part:tag", Name: "Tagged top of fill (after n bags)", Kind: WellPart, marks: tagBob, swatch: markSwatchPlain("part:tag")},
}

// packerGrey is the packer's rubber: lighter than a wall, darker than paper.
var packerGrey = hex(0xA0A0A0)

// packerCross: a cross over the packer's element, as a sealing element is
// drawn across a gap.
func packerCross(p *pen) {
	r := p.r
	p.line(r.X, r.Y, r.Right(), r.Bottom(), 0.5)
	p.line(r.X, r.Bottom(), r.Right(), r.Y, 0.5)
}

// hangerSlips: downward-pointing slip wedges on either side of the gap,
// which hold the liner without closing the gap.
func hangerSlips(p *pen) {
	r := p.r
	w := r.W / 2
	p.poly(true, draw.Point{X: r.X, Y: r.Y}, draw.Point{X: r.X + w*0.9, Y: r.Y}, draw.Point{X: r.X, Y: r.Bottom()})
	p.poly(true, draw.Point{X: r.Right(), Y: r.Y}, draw.Point{X: r.Right() - w*0.9, Y: r.Y}, draw.Point{X: r.Right(), Y: r.Bottom()})
}

// shoeBevel: the bevelled cutting edge of a drive shoe, a pale line
// along its slope.
func shoeBevel(p *pen) {
	r := p.r
	p.lineStyled(r.X, r.Y+r.H*0.3, r.Right(), r.Y+r.H*0.3, draw.Style{Stroke: slotWhite, StrokeWidth: math.Min(0.6, r.H*0.15)})
}

// pumpBody: a pump's outline with its intake screen as short bars.
func pumpBody(p *pen) {
	r := p.r
	x0, x1 := r.X+r.W*0.3, r.Right()-r.W*0.3
	p.polyline(0.6, draw.Point{X: x0, Y: r.Y}, draw.Point{X: x0, Y: r.Bottom()}, draw.Point{X: x1, Y: r.Bottom()}, draw.Point{X: x1, Y: r.Y}, draw.Point{X: x0, Y: r.Y})
	for k := 1; k <= 3; k++ {
		y := r.Y + r.H*(0.55+0.1*float64(k))
		p.line(x0+0.6, y, x1-0.6, y, 0.4)
	}
}

// tagBob: a weighted tape's bob, a filled diamond hanging from its line,
// its lower point on the tagged depth (the box's bottom).
func tagBob(p *pen) {
	r := p.r
	cx := r.X + r.W/2
	p.line(cx, r.Y, cx, r.Y+r.H*0.4, 0.4)
	p.poly(true, draw.Point{X: cx, Y: r.Y + r.H*0.4}, draw.Point{X: cx + r.W*0.25, Y: r.Y + r.H*0.7}, draw.Point{X: cx, Y: r.Bottom()}, draw.Point{X: cx - r.W*0.25, Y: r.Y + r.H*0.7})
}

// Casing and the two screens are wall strips; the screen types must read
// differently even when a strip is two points wide.

// slots: white slots across a dark wall, leaving solid edges: slotted pipe.
func slots(p *pen) {
	const pitch, slot = 2.4, 0.8
	inset := math.Min(0.6, p.r.W*0.2)
	p.rows(pitch, func(y float64) {
		p.lineStyled(p.r.X+inset, y+pitch/2, p.r.Right()-inset, y+pitch/2, draw.Style{Stroke: slotWhite, StrokeWidth: slot})
	})
}

// wireWrap: close, slanting wire turns over a pale ground between two
// rods: a wound screen, where slotted pipe shows level slots in a solid
// wall.
func wireWrap(p *pen) {
	const pitch, slant, w = 1.2, 0.9, 0.4
	// Each turn climbs slant points across the strip's width. Its ends
	// stop short of the strip's edges by as much as the stroke's square
	// end leans out (under 0.1 pt, beneath the edge lines), so that a
	// turn lies inside the strip and is written as a stroked line, not
	// cut to an outline by the clip.
	dx := p.r.W
	inset := w/2*slant/math.Hypot(dx, slant) + 0.02
	p.rows(pitch, func(y float64) {
		p.line(p.r.X+inset, y+slant, p.r.Right()-inset, y, w)
	})
	p.line(p.r.X+0.3, p.r.Y, p.r.X+0.3, p.r.Bottom(), 0.6)
	p.line(p.r.Right()-0.3, p.r.Y, p.r.Right()-0.3, p.r.Bottom(), 0.6)
}

// roughWall: a jagged line down the strip: an uncased rock wall.
func roughWall(p *pen) {
	const tooth = 3.0
	var pts []draw.Point
	j0 := int(math.Floor(p.r.Y / tooth))
	for j := j0; float64(j-1)*tooth <= p.r.Bottom(); j++ {
		x := p.r.X + p.r.W*(0.2+0.6*hash(j, 0, 11))
		pts = append(pts, draw.Point{X: x, Y: float64(j) * tooth})
	}
	p.polyline(0.6, pts...)
}

// waterMark: a filled inverted triangle whose apex sits on the level, at
// the box's centre, with two shortening bars beneath: a level measured
// in the finished well.
func waterMark(p *pen) {
	cx, cy, s := waterTriangle(p, waterInk)
	bar := draw.Style{Stroke: waterInk, StrokeWidth: 0.6}
	p.lineStyled(cx-s*0.7, cy+s*0.35, cx+s*0.7, cy+s*0.35, bar)
	p.lineStyled(cx-s*0.4, cy+s*0.7, cx+s*0.4, cy+s*0.7, bar)
}

// firstWaterMark: the same triangle left open, with one dotted bar: water
// met while drilling, before the level settled. Open against filled and
// one broken bar against two solid ones tell the kinds apart in black and
// white.
func firstWaterMark(p *pen) {
	cx, cy, s := waterTriangle(p, draw.White)
	p.lineStyled(cx-s*0.7, cy+s*0.45, cx+s*0.7, cy+s*0.45, draw.Style{Stroke: waterInk, StrokeWidth: 0.6, Dash: []float64{0.8, 0.6}})
}

// waterTriangle draws the inverted triangle of the water marks, apex at
// the box's centre, and returns the centre and half-size.
func waterTriangle(p *pen, fill draw.Color) (cx, cy, s float64) {
	r := p.r
	s = math.Min(r.W, r.H) / 2
	cx, cy = r.X+r.W/2, r.Y+r.H/2
	st := draw.Style{Stroke: waterInk, StrokeWidth: 0.6, Fill: fill}
	p.items = append(p.items, draw.Shape{Style: st, Closed: true, Role: "water level mark", Points: []draw.Point{
		{X: cx - s*0.8, Y: cy - s*0.9}, {X: cx + s*0.8, Y: cy - s*0.9}, {X: cx, Y: cy},
	}})
	return cx, cy, s
}

// bowSprings: two bows bulging out from a collar at top and bottom.
func bowSprings(p *pen) {
	r := p.r
	const n = 8
	var left, right []draw.Point
	for k := 0; k <= n; k++ {
		t := float64(k) / n
		bulge := math.Sin(t*math.Pi) * r.W * 0.22
		y := r.Y + t*r.H
		left = append(left, draw.Point{X: r.X + r.W*0.22 - bulge, Y: y})
		right = append(right, draw.Point{X: r.Right() - r.W*0.22 + bulge, Y: y})
	}
	p.polyline(0.6, left...)
	p.polyline(0.6, right...)
	p.line(r.X+r.W*0.22, r.Y+0.3, r.Right()-r.W*0.22, r.Y+0.3, 0.6)
	p.line(r.X+r.W*0.22, r.Bottom()-0.3, r.Right()-r.W*0.22, r.Bottom()-0.3, 0.6)
}

// capBand: a pale band across the dark cap, so it reads as a fitting and
// not as more wall.
func capBand(p *pen) {
	y := p.r.Y + p.r.H*0.4
	p.lineStyled(p.r.X, y, p.r.Right(), y, draw.Style{Stroke: slotWhite, StrokeWidth: math.Min(0.8, p.r.H*0.2)})
}

// pipeWalls gives the two wall strips of a pipe drawn in a legend box.
func pipeWalls(r draw.Rect) (left, right draw.Rect) {
	wall := math.Max(2, r.W*0.16)
	inner := r.W * 0.18
	return draw.Rect{X: r.X + inner, Y: r.Y, W: wall, H: r.H}, draw.Rect{X: r.Right() - inner - wall, Y: r.Y, W: wall, H: r.H}
}

// pipeSwatch draws a pipe section whose walls are the part.
func pipeSwatch(id string) func(r draw.Rect) []draw.Item {
	return func(r draw.Rect) []draw.Item {
		s := byID[id]
		l, rt := pipeWalls(r)
		items := append(s.Paint(l), s.Paint(rt)...)
		return append(items, frame(r))
	}
}

// markSwatch draws the mark over a short water line.
func markSwatch(id string) func(r draw.Rect) []draw.Item {
	return func(r draw.Rect) []draw.Item {
		s := byID[id]
		h := math.Min(r.H, r.W) * 0.8
		box := draw.Rect{X: r.X + r.W/2 - h/2, Y: r.Y + r.H/2 - h/2, W: h, H: h}
		items := []draw.Item{draw.Shape{Style: draw.Style{Stroke: waterInk, StrokeWidth: 0.4, Dash: []float64{1.5, 1}}, Points: []draw.Point{{X: r.X + 1, Y: r.Y + r.H/2}, {X: r.Right() - 1, Y: r.Y + r.H/2}}}}
		items = append(items, s.Paint(box)...)
		return append(items, frame(r))
	}
}

// lapSwatch draws a casing with a liner inside it, the part closing the
// gap between them at mid-height.
func lapSwatch(id string) func(r draw.Rect) []draw.Item {
	return func(r draw.Rect) []draw.Item {
		casing := byID["part:casing"]
		l, rt := pipeWalls(r)
		items := append(casing.Paint(l), casing.Paint(rt)...)
		in := draw.Rect{X: l.Right() + 2, Y: r.Y + r.H*0.4, W: 1.2, H: r.H * 0.6}
		inR := draw.Rect{X: rt.X - 3.2, Y: in.Y, W: 1.2, H: in.H}
		items = append(items, casing.Paint(in)...)
		items = append(items, casing.Paint(inR)...)
		gapL := draw.Rect{X: l.Right(), Y: in.Y, W: 2, H: 2.4}
		gapR := draw.Rect{X: inR.Right(), Y: in.Y, W: 2, H: 2.4}
		items = append(items, byID[id].Paint(gapL)...)
		items = append(items, byID[id].Paint(gapR)...)
		return append(items, frame(r))
	}
}

// shoeSwatch draws a casing whose bottom carries a drive shoe.
func shoeSwatch(r draw.Rect) []draw.Item {
	casing := byID["part:casing"]
	l, rt := pipeWalls(r)
	l.H, rt.H = r.H*0.7, r.H*0.7
	items := append(casing.Paint(l), casing.Paint(rt)...)
	shoe := byID["part:drive-shoe"]
	items = append(items, shoe.Paint(draw.Rect{X: l.X - 0.8, Y: l.Bottom(), W: l.W + 0.8, H: 2.2})...)
	items = append(items, shoe.Paint(draw.Rect{X: rt.X, Y: rt.Bottom(), W: rt.W + 0.8, H: 2.2})...)
	return append(items, frame(r))
}

// markSwatchPlain draws a mark alone in the middle of its box.
func markSwatchPlain(id string) func(r draw.Rect) []draw.Item {
	return func(r draw.Rect) []draw.Item {
		h := math.Min(r.H, r.W) * 0.9
		box := draw.Rect{X: r.X + r.W/2 - h/2, Y: r.Y + r.H/2 - h/2, W: h, H: h}
		return append(byID[id].Paint(box), frame(r))
	}
}

// centralizerSwatch draws blank pipe walls with bow springs around them.
func centralizerSwatch(r draw.Rect) []draw.Item {
	casing := byID["part:casing"]
	l, rt := pipeWalls(r)
	items := append(casing.Paint(l), casing.Paint(rt)...)
	bows := draw.Rect{X: r.X + 1, Y: r.Y + r.H*0.15, W: r.W - 2, H: r.H * 0.7}
	items = append(items, byID["part:centralizer"].Paint(bows)...)
	return append(items, frame(r))
}

// capSwatch draws blank pipe walls closed by a cap at the top.
func capSwatch(r draw.Rect) []draw.Item {
	casing := byID["part:casing"]
	l, rt := pipeWalls(r)
	top := r.H * 0.3
	l.Y, l.H = l.Y+top, l.H-top
	rt.Y, rt.H = rt.Y+top, rt.H-top
	items := append(casing.Paint(l), casing.Paint(rt)...)
	capR := draw.Rect{X: l.X - 0.8, Y: r.Y + top - 3, W: rt.Right() - l.X + 1.6, H: 3}
	items = append(items, byID["part:cap"].Paint(capR)...)
	return append(items, frame(r))
}
