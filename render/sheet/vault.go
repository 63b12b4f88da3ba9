package sheet

import (
	"fmt"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// vaultPart is a flush-mount road box: walls from the ground to its
// depth and a lid flush with the ground.
type vaultPart struct{}

func (vaultPart) stack() stack { return on(layerSurface) }

func (vaultPart) extent(l *layout) (schema.Interval, bool) {
	return schema.Interval{Top: 0, Bottom: l.w.Surface.Vault.Depth}, true
}

func (vaultPart) legend(l *layout, v window) []symbol {
	if !v.shows(0, max(l.w.Surface.Vault.Depth, 0.01)) {
		return nil
	}
	return []symbol{partSymbol(symbols.Casing), partSymbol(symbols.Cap)}
}

func (vaultPart) callouts(l *layout) []callout {
	w := l.w
	v := w.Surface.Vault
	lines := []string{fmt.Sprintf("%s diameter, %s deep", l.diameter(v.Diameter), l.depth(v.Depth))}
	if v.Cover != "" {
		lines = append(lines, v.Cover)
	}
	if w.Surface.Lock != "" {
		lines = append(lines, "lock: "+w.Surface.Lock)
	}
	if w.Surface.Drainage != "" {
		lines = append(lines, "drainage: "+w.Surface.Drainage)
	}
	r := float64(v.Diameter) / 2 * l.hz.ppmm
	return []callout{{key: "vault", iv: schema.Interval{Top: 0, Bottom: v.Depth}, anchorX: fixed(l.hz.cx + r), title: "Flush-mount vault", lines: lines, rank: 0}}
}

func (vaultPart) paint(p *painter) []draw.Item {
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
	sym := partSymbol(symbols.Casing)
	items := []draw.Item{box(draw.Rect{X: h.cx - r + 2, Y: y0, W: 2*r - 4, H: y1 - y0}, draw.Color{}, 0, draw.White, "")}
	items = append(items, sym.paint(draw.Rect{X: h.cx - r, Y: y0, W: 2, H: y1 - y0})...)
	items = append(items, sym.paint(draw.Rect{X: h.cx + r - 2, Y: y0, W: 2, H: y1 - y0})...)
	lid := draw.Rect{X: h.cx - r - 1, Y: y0, W: 2*r + 2, H: 2}
	items = append(items, box(draw.Rect{X: h.cx - r, Y: y0, W: 2 * r, H: y1 - y0}, draw.Color{}, 0, draw.Color{}, "vault"), box(lid, draw.Color{}, 0, draw.Color{}, "vault-lid"))
	return append(items, partSymbol(symbols.Cap).paint(lid)...)
}
