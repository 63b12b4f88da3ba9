package sheet

import (
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// boreholePart is one drilled interval: white ground, so fills and pipes
// stand on paper, and its label. Its walls are the walls part's.
type boreholePart struct{ i int }

func (boreholePart) stack() stack { return on(layerHole) }

func (boreholePart) legend(*layout, window) []symbol { return nil }

func (bp boreholePart) extent(l *layout) (schema.Interval, bool) {
	return l.w.Boreholes[bp.i].Interval, true
}

func (bp boreholePart) paint(p *painter) []draw.Item {
	b := p.l.w.Boreholes[bp.i]
	y0, y1, ok := p.vis(b.Top, b.Bottom)
	if !ok {
		return nil
	}
	h := p.l.hz
	r := float64(b.Diameter) / 2 * h.ppmm
	return []draw.Item{box(draw.Rect{X: h.cx - r, Y: y0, W: 2 * r, H: y1 - y0}, draw.Color{}, 0, draw.White, "borehole:"+pathOr(b.Path, "borehole", bp.i))}
}

func (bp boreholePart) callouts(l *layout) []callout {
	w := l.w
	b := w.Boreholes[bp.i]
	r := float64(b.Diameter) / 2 * l.hz.ppmm
	lines := []string{l.diameter(b.Diameter) + " diameter", l.interval(b.Interval)}
	if b.Method != "" {
		lines = append(lines, b.Method)
	} else if w.Drilling.Method != "" {
		lines = append(lines, w.Drilling.Method)
	}
	return []callout{{key: "borehole:" + pathOr(b.Path, "borehole", bp.i), iv: b.Interval, anchorX: fixed(l.hz.cx + r), title: "Borehole", lines: lines, minor: map[int]bool{2: true}, where: 1, rank: 7}}
}
