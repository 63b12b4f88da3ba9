package sheet

import (
	"math"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// depthAxis draws ticks and depths below ground in the depth column; the
// major interval leaves at least 36 pt between labels.
func (p *painter) depthAxis() []draw.Item {
	l := p.l
	col := l.cols.depth
	u := l.u.Depth
	major := l.majorStep()
	minor := minorStep(major)
	var items []draw.Item
	x := col.Right() - 2
	y0, y1 := p.clipY()
	items = append(items, line(x, y0, x, y1, 0.6, ink, "axis:depth"))
	lo, hi := p.dlo.In(u), p.dhi.In(u)
	if !p.first {
		lo = p.sp.Top.In(u)
	}
	if !p.last {
		hi = p.sp.Bottom.In(u)
	}
	for k := math.Ceil(lo/minor - 1e-9); k*minor <= hi+1e-9; k++ {
		v := k * minor
		y := p.y(schema.LengthFrom(v, u))
		isMajor := math.Abs(v/major-math.Round(v/major)) < 1e-6
		if isMajor {
			items = append(items, line(x-5, y, x, y, 0.6, ink, ""))
			if l.axisLabelFits(y) {
				items = append(items, text(x-7, y+draw.CapHeight(draw.Regular, sizeSmall)/2, schema.TrimFloat(v, 2), draw.Regular, sizeSmall, draw.End, ink, "depth-label"))
			}
		} else {
			items = append(items, line(x-2.5, y, x, y, 0.4, ink, ""))
		}
	}
	return items
}

// elevationAxis draws elevations at round values when the ground
// elevation was surveyed.
func (p *painter) elevationAxis() []draw.Item {
	l := p.l
	col := l.cols.elev
	g := l.w.Elevation.Ground
	y0, y1 := p.clipY()
	x := col.X + 2
	items := []draw.Item{line(x, y0, x, y1, 0.6, ink, "axis:elevation")}
	if g == nil {
		mid := (y0 + y1) / 2
		return append(items, draw.Text{At: draw.Point{X: col.Center() + 2, Y: mid}, S: "ground elevation not surveyed", Size: sizeTiny, Font: draw.Italic, Anchor: draw.Middle, Color: grey, Rotate: 90})
	}
	u := l.u.Depth
	major := l.majorStep()
	minor := minorStep(major)
	top, bot := p.dlo, p.dhi
	if !p.first {
		top = p.sp.Top
	}
	if !p.last {
		bot = p.sp.Bottom
	}
	ground := g.In(u)
	eHi, eLo := ground-top.In(u), ground-bot.In(u)
	for k := math.Ceil(eLo/minor - 1e-9); k*minor <= eHi+1e-9; k++ {
		e := k * minor
		y := p.y(schema.LengthFrom(ground-e, u))
		if math.Abs(e/major-math.Round(e/major)) < 1e-6 {
			items = append(items, line(x, y, x+5, y, 0.6, ink, ""))
			if l.axisLabelFits(y) {
				items = append(items, text(x+7, y+draw.CapHeight(draw.Regular, sizeSmall)/2, schema.TrimFloat(e, 2), draw.Regular, sizeSmall, draw.Start, ink, "elevation-label"))
			}
		} else {
			items = append(items, line(x, y, x+2.5, y, 0.4, ink, ""))
		}
	}
	return items
}

// axisLabelFits says whether an axis label centred on y stays within the
// scaled part of the body: a tick at its very foot, or at its top just
// under the column heads, goes unlabelled rather than cross the rule.
func (l *layout) axisLabelFits(y float64) bool {
	base := y + draw.CapHeight(draw.Regular, sizeSmall)/2
	return base-draw.Ascent(draw.Regular, sizeSmall) >= l.plot.Y && base+draw.Descent(draw.Regular, sizeSmall) <= l.body.Bottom()
}

// minorStep divides a major interval into fifths, or quarters of a 2.
func minorStep(major float64) float64 {
	m := major / math.Pow(10, math.Floor(math.Log10(major)+1e-9))
	if math.Abs(m-2) < 1e-6 {
		return major / 4
	}
	return major / 5
}
