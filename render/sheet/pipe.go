package sheet

import (
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// A pipe is how the casing and string parts draw a length of casing,
// riser or screen: its bore cleared, its walls in the pipe's symbol,
// and for a prepacked screen the sleeve around it.

// pipeSymbols are the symbols a pipe section paints: the casing's, or
// the screen's with a prepacked screen's sleeve. sec is nil for an outer
// casing.
func pipeSymbols(sec *schema.Section) []symbol {
	if sec == nil || sec.Kind != schema.ScreenSection {
		return []symbol{partSymbol(symbols.Casing)}
	}
	switch sec.ScreenType {
	case schema.ContinuousWrap:
		return []symbol{partSymbol(symbols.ScreenWrap)}
	case schema.Prepacked:
		return []symbol{partSymbol(symbols.ScreenSlotted), prepackSymbol()}
	}
	return []symbol{partSymbol(symbols.ScreenSlotted)}
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
	syms := pipeSymbols(sec)
	items = append(items, syms[0].paint(left)...)
	items = append(items, syms[0].paint(right)...)
	if len(syms) > 1 {
		items = append(items, marked(syms[1].key, prepackSleeve(left.X, right.Right(), left.Y, left.Bottom()))...)
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
		return append(items, prepackSleeve(a.X, b.Right(), r.Y, r.Bottom())...)
	}
	return symbol{key: "sheet:prepacked", label: "Prepacked screen sleeve", order: 30000, paint: sw, swatch: sw}
}

// prepackSleeve is the pack sleeve around a prepacked screen whose walls
// run from x0 to x1, drawn as a dashed outline outside them.
func prepackSleeve(x0, x1, y0, y1 float64) []draw.Item {
	st := draw.Style{Stroke: ink, StrokeWidth: 0.5, Dash: []float64{1.2, 1.2}}
	return []draw.Item{
		draw.Shape{Style: st, Points: []draw.Point{{X: x0 - 1.5, Y: y0}, {X: x0 - 1.5, Y: y1}}},
		draw.Shape{Style: st, Points: []draw.Point{{X: x1 + 1.5, Y: y0}, {X: x1 + 1.5, Y: y1}}},
	}
}
