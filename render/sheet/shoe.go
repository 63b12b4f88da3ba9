package sheet

import (
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// shoePart is the drive shoe on a driven casing's bottom: a band a little
// wider than the casing, and a line in the casing's callout.
type shoePart struct{ ci int }

func (shoePart) stack() stack { return on(layerMark) }

func (s shoePart) extent(l *layout) (schema.Interval, bool) {
	return at(l.w.Casings[s.ci].Bottom), true
}

func (s shoePart) legend(l *layout, v window) []symbol {
	if !v.showsAt(l.w.Casings[s.ci].Bottom) {
		return nil
	}
	return []symbol{partSymbol(symbols.DriveShoe)}
}

func (s shoePart) paint(p *painter) []draw.Item {
	c := p.l.w.Casings[s.ci]
	if !p.visible(c.Bottom) {
		return nil
	}
	h := p.l.hz
	ro := float64(od(c.Pipe)) / 2 * h.ppmm
	wall := max(float64(od(c.Pipe)-id(c.Pipe))/2*h.ppmm, minWall)
	y := p.y(c.Bottom)
	const ht, lip = 4.0, 1.2
	sym := partSymbol(symbols.DriveShoe)
	left := draw.Rect{X: h.cx - ro - lip, Y: y - ht, W: wall + lip, H: ht}
	right := draw.Rect{X: h.cx + ro - wall, Y: y - ht, W: wall + lip, H: ht}
	items := []draw.Item{draw.Box{Rect: draw.Rect{X: left.X, Y: left.Y, W: right.Right() - left.X, H: ht}, Role: "shoe:" + pathOr(c.Path, "casing", s.ci)}}
	items = append(items, sym.paint(left)...)
	return append(items, sym.paint(right)...)
}

func (s shoePart) callouts(l *layout) []callout {
	c := l.w.Casings[s.ci]
	x := l.hz.cx + float64(od(c.Pipe))/2*l.hz.ppmm + 1.2
	return []callout{{key: "shoe:" + pathOr(c.Path, "casing", s.ci), iv: schema.Interval{Top: c.Bottom, Bottom: c.Bottom}, anchorX: fixed(x),
		title: "Drive shoe", lines: []string{"on the " + c.Called() + " at " + l.depth(c.Bottom)}, rank: 2}}
}
