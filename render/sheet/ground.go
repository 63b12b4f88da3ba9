package sheet

import (
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// groundPart is the ground line across the well column, broken where the
// hole, pad or vault meets it, with short hatching below.
type groundPart struct{}

func (groundPart) stack() stack { return on(layerWalls) }

func (groundPart) callouts(*layout) []callout { return nil }

func (groundPart) legend(*layout, window) []symbol { return nil }

func (groundPart) extent(*layout) (schema.Interval, bool) { return at(0), true }

func (groundPart) paint(p *painter) []draw.Item {
	if !p.visible(0) {
		return nil
	}
	l := p.l
	col := l.cols.well
	y := p.y(0)
	gap := float64(l.holeAt(0.001)) / 2 * l.hz.ppmm
	if v := l.w.Surface.Vault; v != nil {
		gap = max(gap, float64(v.Diameter)/2*l.hz.ppmm)
	}
	if pc := l.w.Surface.Protective; pc != nil {
		gap = max(gap, float64(pc.Diameter)/2*l.hz.ppmm)
	}
	if l.w.Surface.Pad != nil {
		half := float64(l.w.Surface.Pad.Length) * 1000 / 2 * l.hz.ppmm
		gap = max(gap, min(half, col.W/2-6))
	}
	xl, xr := l.hz.cx-gap, l.hz.cx+gap
	items := []draw.Item{
		line(col.X, y, xl, y, 1.1, ink, "ground"),
		line(xr, y, col.Right(), y, 1.1, ink, "ground"),
	}
	for x := col.X + 2; x < col.Right()-2; x += 4 {
		if x > xl-3 && x < xr {
			continue
		}
		items = append(items, line(x, y+0.6, x+2.6, y+3.2, 0.4, ink, ""))
	}
	return items
}
