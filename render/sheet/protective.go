package sheet

import (
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// protectivePart is a stick-up's protective casing with its lid.
type protectivePart struct{}

func (protectivePart) stack() stack { return on(layerSurface) }

func (protectivePart) extent(l *layout) (schema.Interval, bool) {
	return l.w.Surface.Protective.Interval, true
}

func (protectivePart) legend(l *layout, v window) []symbol {
	pc := l.w.Surface.Protective
	if !v.shows(pc.Top, pc.Bottom) {
		return nil
	}
	out := []symbol{partSymbol(symbols.Casing)}
	if v.showsAt(pc.Top) {
		out = append(out, partSymbol(symbols.Cap))
	}
	return out
}

func (protectivePart) callouts(l *layout) []callout {
	w := l.w
	pc := w.Surface.Protective
	lines := []string{joinNonEmpty(" ", l.diameter(pc.Diameter), pc.Material), l.interval(pc.Interval)}
	if w.Surface.Lock != "" {
		lines = append(lines, "lock: "+w.Surface.Lock)
	}
	r := float64(pc.Diameter) / 2 * l.hz.ppmm
	return []callout{{key: "protective", iv: schema.Interval{Top: pc.Top, Bottom: min(pc.Bottom, 0)}, anchorX: fixed(l.hz.cx + r), title: "Protective casing", lines: lines, where: 1, rank: 0}}
}

func (protectivePart) paint(p *painter) []draw.Item {
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
	sym := partSymbol(symbols.Casing)
	items := append(sym.paint(draw.Rect{X: h.cx - r, Y: y0, W: wall, H: y1 - y0}), sym.paint(draw.Rect{X: h.cx + r - wall, Y: y0, W: wall, H: y1 - y0})...)
	items = append(items, box(draw.Rect{X: h.cx - r, Y: y0, W: 2 * r, H: y1 - y0}, draw.Color{}, 0, draw.Color{}, "protective"))
	if p.visible(pc.Top) {
		lid := draw.Rect{X: h.cx - r - 1.2, Y: y0 - 2.4, W: 2*r + 2.4, H: 2.4}
		items = append(items, box(lid, draw.Color{}, 0, draw.Color{}, "protective-lid"))
		items = append(items, partSymbol(symbols.Cap).paint(lid)...)
	}
	return items
}
