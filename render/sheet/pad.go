package sheet

import (
	"fmt"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// padPart is the concrete pad at the surface, drawn to the horizontal
// scale and cut with break marks where it is wider than the column.
type padPart struct{}

func (padPart) stack() stack { return on(layerPad) }

func (padPart) extent(l *layout) (schema.Interval, bool) { return padInterval(l.w.Surface) }

// padInterval is where the concrete pad stands, as the quantities count it.
func padInterval(s schema.Surface) (schema.Interval, bool) { return quantity.PadInterval(s) }

func (padPart) legend(l *layout, v window) []symbol {
	if iv, ok := padInterval(l.w.Surface); ok && v.shows(iv.Top, iv.Bottom) {
		return []symbol{materialSymbol(schema.Concrete)}
	}
	return nil
}

func (padPart) callouts(l *layout) []callout {
	w := l.w
	pd := w.Surface.Pad
	iv, ok := padInterval(w.Surface)
	if pd == nil || !ok {
		return nil
	}
	du := l.u.Depth
	lines := []string{fmt.Sprintf("%s × %s × %s %s thick", schema.TrimFloat(pd.Length.In(du), 2), schema.TrimFloat(pd.Width.In(du), 2), schema.TrimFloat(pd.Thickness.In(du), 2), du)}
	if w.Surface.Bollards > 0 {
		lines = append(lines, fmt.Sprintf("%d guard %s", w.Surface.Bollards, plural(w.Surface.Bollards, "post", "posts")))
	}
	half := min(float64(pd.Length)*1000/2*l.hz.ppmm, l.cols.well.W/2-6)
	return []callout{{key: "pad", iv: iv, anchorX: fixed(l.hz.cx + half), title: "Concrete pad", lines: lines, rank: 1}}
}

func (padPart) paint(p *painter) []draw.Item {
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
