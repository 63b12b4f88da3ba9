package sheet

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// lapPart is a liner's lap inside the casing it hangs in: the lap seal
// painted in the gap, the packer or hanger at the liner's top, and a
// callout naming them.
type lapPart struct {
	si     int // the liner's string
	host   schema.Casing
	lap    schema.Interval
	liner  *schema.Liner
	hostID schema.Diameter
}

func newLapPart(l *layout, si int) (lapPart, bool) {
	s := l.w.Strings[si]
	lap, ok := l.w.Lap(s)
	if !ok {
		return lapPart{}, false
	}
	for _, c := range l.w.Casings {
		if c.Name == s.Liner.HungIn {
			return lapPart{si: si, host: c, lap: lap, liner: s.Liner, hostID: id(c.Pipe)}, true
		}
	}
	return lapPart{}, false
}

func (lp lapPart) hangerSymbol() symbol {
	if lp.liner.Hanger == schema.Packer {
		return partSymbol(symbols.Packer)
	}
	return partSymbol(symbols.Hanger)
}

func (lp lapPart) legend() []symbol {
	out := []symbol{lp.hangerSymbol()}
	if lp.liner.LapSeal != "" {
		out = append(out, materialSymbol(lp.liner.LapSeal))
	}
	return out
}

// gaps are the two rectangles between the liner's outside and the host
// casing's bore, from page y0 to y1.
func (lp lapPart) gaps(p *painter, y0, y1 float64) (left, right draw.Rect) {
	h := p.l.hz
	x := h.strX[lp.si]
	ro := float64(stringOD(p.l.w.Strings[lp.si])) / 2 * h.ppmm
	rc := float64(lp.hostID) / 2 * h.ppmm
	return draw.Rect{X: h.cx - rc, Y: y0, W: (x - ro) - (h.cx - rc), H: y1 - y0},
		draw.Rect{X: x + ro, Y: y0, W: (h.cx + rc) - (x + ro), H: y1 - y0}
}

// paintSeal fills the lap's gap with its seal; it goes under the liner.
func (lp lapPart) paintSeal(p *painter) []draw.Item {
	if lp.liner.LapSeal == "" {
		return nil
	}
	y0, y1, ok := p.vis(lp.lap.Top, lp.lap.Bottom)
	if !ok {
		return nil
	}
	sym := materialSymbol(lp.liner.LapSeal)
	a, b := lp.gaps(p, y0, y1)
	role := "lapseal:" + p.l.w.Strings[lp.si].Label()
	return append(p.paint(sym, a, role), p.paint(sym, b, role)...)
}

// paint draws the packer or hanger at the liner's top, closing the gap.
func (lp lapPart) paint(p *painter) []draw.Item {
	if !p.visible(lp.lap.Top) {
		return nil
	}
	y := p.y(lp.lap.Top)
	// A packer's element is drawn at least 6 pt tall, to scale when longer
	// (about 3 ft, common practice for a lead or rubber packer).
	hgt := max(6, float64(schema.LengthFrom(3, schema.Feet))*p.ppm)
	if lp.liner.Hanger != schema.Packer {
		hgt = 5
	}
	a, b := lp.gaps(p, y, y+hgt)
	sym := p.use(lp.hangerSymbol())
	role := "hanger:" + p.l.w.Strings[lp.si].Label()
	items := []draw.Item{draw.Box{Rect: draw.Rect{X: a.X, Y: a.Y, W: b.Right() - a.X, H: hgt}, Role: role}}
	items = append(items, sym.paint(a)...)
	return append(items, sym.paint(b)...)
}

func (lp lapPart) callouts(l *layout) []callout {
	s := l.w.Strings[lp.si]
	title := "Liner hanger"
	if lp.liner.Hanger == schema.Packer {
		title = "Liner packer"
	}
	lines := []string{}
	if lp.liner.Product != "" {
		lines = append(lines, lp.liner.Product)
	}
	lines = append(lines, fmt.Sprintf("liner top at %s, in the %s", l.depth(lp.lap.Top), lp.host.Called()))
	where := len(lines) - 1
	lines = append(lines, fmt.Sprintf("lap %s (%s)", l.interval(lp.lap), l.depth(lp.lap.Thickness())))
	switch {
	case lp.liner.LapSeal != "":
		lines = append(lines, "lap sealed with "+strings.ToLower(materialName(lp.liner.LapSeal)))
	case lp.liner.Hanger == schema.Packer:
		lines = append(lines, "the packer seals the lap")
	default:
		lines = append(lines, "lap not sealed")
	}
	x := l.hz.cx + float64(lp.hostID)/2*l.hz.ppmm
	return []callout{{key: "hanger:" + s.Label(), iv: schema.Interval{Top: lp.lap.Top, Bottom: lp.lap.Top}, anchorX: fixed(x - 1), title: title, lines: lines, where: where, rank: 3}}
}
