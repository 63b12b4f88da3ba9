package sheet

import (
	"math"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// centralizerPart is the centralizers of one pipe, an outer casing's or
// a string's: the table's bow springs around the pipe, reaching to just
// inside the hole wall, and one label listing their depths.
type centralizerPart struct {
	ci, si int // the casing, or (ci < 0) the string, they stand on
}

func casingCentralizers(ci int) centralizerPart { return centralizerPart{ci: ci, si: -1} }

func stringCentralizers(si int) centralizerPart { return centralizerPart{ci: -1, si: si} }

// A string's centralizers paint with it; an outer casing's after the
// strings, as the casing's bore is painted over by what stands in it.
func (cp centralizerPart) stack() stack {
	if cp.ci >= 0 {
		return on(layerCentralizer)
	}
	return on(layerString)
}

// depths are where the centralizers stand.
func (cp centralizerPart) depths(l *layout) []schema.Length {
	if cp.ci >= 0 {
		return l.w.Casings[cp.ci].Centralizers
	}
	return l.w.Strings[cp.si].Centralizers
}

func (cp centralizerPart) extent(l *layout) (schema.Interval, bool) {
	var ivs []schema.Interval
	for _, z := range cp.depths(l) {
		ivs = append(ivs, at(z))
	}
	return hull(ivs...)
}

// pipe is where the centralizers stand: their role, the pipe's axis and
// outside diameter, their depths, and the title's suffix naming a string.
func (cp centralizerPart) pipe(l *layout) (role string, x float64, d schema.Diameter, at []schema.Length, of string) {
	if cp.ci >= 0 {
		c := l.w.Casings[cp.ci]
		return "centralizer:" + pathOr(c.Path, "casing", cp.ci), l.hz.cx, od(c.Pipe), c.Centralizers, ""
	}
	s := l.w.Strings[cp.si]
	return "centralizer:" + s.Label(), l.hz.strX[cp.si], stringOD(s), s.Centralizers, ofSuffix(l, s)
}

func (cp centralizerPart) legend(l *layout, v window) []symbol {
	for _, z := range cp.depths(l) {
		if v.showsAt(z) {
			return []symbol{partSymbol(symbols.Centralizer)}
		}
	}
	return nil
}

func (cp centralizerPart) paint(p *painter) []draw.Item {
	role, x, d, at, _ := cp.pipe(p.l)
	var items []draw.Item
	sym := partSymbol(symbols.Centralizer)
	for _, z := range at {
		if !p.visible(z) {
			continue
		}
		bw := bowSpan(p.l, x, d, z)
		y := p.y(z)
		rect := draw.Rect{X: x - bw/2, Y: y - 5, W: bw, H: 10}
		items = append(items, box(rect, draw.Color{}, 0, draw.Color{}, role))
		items = append(items, sym.paint(rect)...)
	}
	return items
}

// bowSpan is the width of the centralizer's box at depth z around a pipe
// of outside diameter d on the axis x: the collars span the box's inner
// 56 %, the bows bulge 22 % beyond, so the box is sized for the collars
// to meet the pipe and the bows to reach just inside the hole wall, the
// nearer wall for a string off the hole's axis (a nested well's), so
// that no bow crosses it.
func bowSpan(l *layout, x float64, d schema.Diameter, z schema.Length) float64 {
	r := float64(d) / 2 * l.hz.ppmm
	hole := float64(l.holeAt(z)) / 2 * l.hz.ppmm
	reach := max(hole-r-0.8, 2.0)
	bw := max(2*(r+reach), 2*r/0.56)
	if room := hole - math.Abs(x-l.hz.cx); room > r {
		bw = min(bw, 2*room-1.2)
	}
	return bw
}

func (cp centralizerPart) callouts(l *layout) []callout {
	key, x, d, at, of := cp.pipe(l)
	ds := make([]string, len(at))
	for i, z := range at {
		ds[i] = schema.TrimFloat(z.In(l.u.Depth), 2)
	}
	first := at[0]
	tip := x + bowSpan(l, x, d, first)/2
	title := "Centralizers"
	if len(at) == 1 {
		title = "Centralizer"
	}
	return []callout{{key: key, iv: schema.Interval{Top: first, Bottom: first}, anchorX: fixed(tip), title: title + of,
		lines: []string{"at " + strings.Join(ds, ", ") + " " + string(l.u.Depth)}, rank: 5}}
}
