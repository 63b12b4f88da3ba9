package sheet

import (
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// painter draws the depth-scaled columns of one sheet. It maps depth to
// page y and knows which depths the sheet shows.
type painter struct {
	l           *layout
	sp          span
	first, last bool
	y0, ppm     float64
	dlo, dhi    schema.Length // depths visible, pads included at the ends
}

func (l *layout) painter(sp span, first, last bool) *painter {
	p := &painter{l: l, sp: sp, first: first, last: last, y0: l.plot.Y + plotPadTop, ppm: l.scale.PointsPerMetre(), dlo: sp.Top, dhi: sp.Bottom}
	if first {
		p.dlo -= schema.Length(plotPadTop / p.ppm)
	}
	if last {
		p.dhi += schema.Length(plotPadBottom / p.ppm)
	}
	return p
}

// y is the page y of a depth.
func (p *painter) y(d schema.Length) float64 { return p.y0 + float64(d-p.sp.Top)*p.ppm }

// vis clips an interval to the sheet and returns its page y range.
func (p *painter) vis(top, bot schema.Length) (y0, y1 float64, ok bool) {
	t, b := max(top, p.dlo), min(bot, p.dhi)
	if !(b > t) {
		return 0, 0, false
	}
	return p.y(t), p.y(b), true
}

// visible reports whether a depth is on the sheet.
func (p *painter) visible(d schema.Length) bool { return d >= p.dlo && d <= p.dhi }

// clipY is the y range the sheet draws in: the scaled area, cut exactly
// at a match line so no depth is drawn on two sheets.
func (p *painter) clipY() (y0, y1 float64) {
	y0, y1 = p.l.plot.Y, p.l.plot.Bottom()
	if !p.first {
		y0 = p.y(p.sp.Top)
	}
	if !p.last {
		y1 = p.y(p.sp.Bottom)
	}
	return y0, y1
}

// window is the depths the sheet shows.
func (p *painter) window() window { return window{p.dlo, p.dhi} }

// paint fills a rectangle with a symbol under a box naming the part.
func (p *painter) paint(s symbol, r draw.Rect, role string) []draw.Item {
	out := []draw.Item{draw.Box{Rect: r, Role: role}}
	return append(out, s.paint(r)...)
}
