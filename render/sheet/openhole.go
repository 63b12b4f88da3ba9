package sheet

import (
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// openHolePart is an uncased interval: paper inside, and its label; the
// walls part draws its rough walls.
type openHolePart struct{ i int }

func (openHolePart) stack() stack { return on(layerOpenHole) }

func (openHolePart) legend(*layout, window) []symbol { return nil }

func (op openHolePart) extent(l *layout) (schema.Interval, bool) {
	return l.w.OpenHoles[op.i].Interval, true
}

func (op openHolePart) paint(p *painter) []draw.Item {
	o := p.l.w.OpenHoles[op.i]
	y0, y1, ok := p.vis(o.Top, o.Bottom)
	if !ok {
		return nil
	}
	d := p.l.holeAt((o.Top + o.Bottom) / 2)
	r := float64(d) / 2 * p.l.hz.ppmm
	return []draw.Item{box(draw.Rect{X: p.l.hz.cx - r, Y: y0, W: 2 * r, H: y1 - y0}, draw.Color{}, 0, draw.White, "openhole:"+pathOr(o.Path, "open_hole", op.i))}
}

func (op openHolePart) callouts(l *layout) []callout {
	o := l.w.OpenHoles[op.i]
	d := l.holeAt((o.Top + o.Bottom) / 2)
	r := float64(d) / 2 * l.hz.ppmm
	return []callout{{key: "openhole:" + pathOr(o.Path, "open_hole", op.i), iv: o.Interval, anchorX: fixed(l.hz.cx + r + 1.6), title: "Open hole",
		lines: []string{l.diameter(d) + " diameter, uncased", l.interval(o.Interval)}, where: 1, rank: 7}}
}
