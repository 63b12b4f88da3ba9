package sheet

import (
	"math"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// wallsPart is the borehole's walls: straight where drilled and cased or
// filled, rough along open hole, with steps where the diameter changes.
// They are painted over the fills, so every fill ends on a clean edge.
type wallsPart struct{}

func (wallsPart) stack() stack { return on(layerWalls) }

func (wallsPart) callouts(*layout) []callout { return nil }

// The walls stand where the boreholes do.
func (wallsPart) extent(*layout) (schema.Interval, bool) { return schema.Interval{}, false }

func (wallsPart) legend(l *layout, v window) []symbol {
	for _, b := range l.w.Boreholes {
		for _, seg := range l.wallSegments(b.Interval) {
			if seg.open && v.shows(seg.iv.Top, seg.iv.Bottom) {
				return []symbol{partSymbol(symbols.OpenHole)}
			}
		}
	}
	return nil
}

// roughWall is the table's open-hole wall in a strip centred on x.
func roughWall(x, y0, y1 float64) []draw.Item {
	return partSymbol(symbols.OpenHole).paint(draw.Rect{X: x - 1.8, Y: y0, W: 3.6, H: y1 - y0})
}

func (wallsPart) paint(p *painter) []draw.Item {
	w := p.l.w
	h := p.l.hz
	var items []draw.Item
	wallStyle := draw.Style{Stroke: ink, StrokeWidth: 0.7}
	prevR := 0.0
	prevBottom := schema.Length(math.Inf(-1))
	for _, b := range w.Boreholes {
		r := float64(b.Diameter) / 2 * h.ppmm
		for _, seg := range p.l.wallSegments(b.Interval) {
			y0, y1, ok := p.vis(seg.iv.Top, seg.iv.Bottom)
			if !ok {
				continue
			}
			if seg.open {
				items = append(items, roughWall(h.cx-r, y0, y1)...)
				items = append(items, roughWall(h.cx+r, y0, y1)...)
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

// wallSegments cuts a borehole interval where open hole begins or ends,
// as the shared cross-section has it.
func (l *layout) wallSegments(iv schema.Interval) []wallSeg {
	var out []wallSeg
	for _, cs := range l.secs.Within(iv.Top, iv.Bottom) {
		if n := len(out); n > 0 && out[n-1].open == cs.OpenHole && out[n-1].iv.Bottom == cs.Top {
			out[n-1].iv.Bottom = cs.Bottom
			continue
		}
		out = append(out, wallSeg{cs.Interval, cs.OpenHole})
	}
	return out
}
