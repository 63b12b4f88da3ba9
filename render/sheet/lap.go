package sheet

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// lapPart is a liner's lap inside the casing it hangs in: the packer or
// hanger at the liner's top, painted above the pipes, and a callout
// naming them; lapSealPart is the seal in the lap's gap.
type lapPart struct {
	si       int // the liner's string
	host     schema.Casing
	hostRank int // the host's place among the casings, outermost first
	lap      schema.Interval
	liner    *schema.Liner
	hostID   schema.Diameter
}

// newLapPart is the lap of string si, when it is a liner hung in one of
// the casings; rank is each casing's place, outermost first.
func newLapPart(l *layout, si int, rank []int) (lapPart, bool) {
	s := l.w.Strings[si]
	lap, ok := l.w.Lap(s)
	if !ok {
		return lapPart{}, false
	}
	for ci, c := range l.w.Casings {
		if c.Name == s.Liner.HungIn {
			return lapPart{si: si, host: c, hostRank: rank[ci], lap: lap, liner: s.Liner, hostID: id(c.Pipe)}, true
		}
	}
	return lapPart{}, false
}

func (lapPart) stack() stack { return on(layerMark) }

func (lp lapPart) extent(*layout) (schema.Interval, bool) { return lp.lap, true }

func (lp lapPart) hangerSymbol() symbol {
	if lp.liner.Hanger == schema.Packer {
		return partSymbol(symbols.Packer)
	}
	return partSymbol(symbols.Hanger)
}

func (lp lapPart) legend(_ *layout, v window) []symbol {
	if !v.showsAt(lp.lap.Top) {
		return nil
	}
	return []symbol{lp.hangerSymbol()}
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

// lapSealPart is the seal placed in a lap's gap, painted with its host
// casing's bore, under the liner. The lap's label names it.
type lapSealPart struct{ lapPart }

func (sp lapSealPart) stack() stack { return stack{layer: layerCasing, sub: 3*sp.hostRank + 2} }

func (lapSealPart) callouts(*layout) []callout { return nil }

func (sp lapSealPart) legend(_ *layout, v window) []symbol {
	if !v.shows(sp.lap.Top, sp.lap.Bottom) {
		return nil
	}
	return []symbol{materialSymbol(sp.liner.LapSeal)}
}

func (sp lapSealPart) paint(p *painter) []draw.Item {
	lp := sp.lapPart
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
	sym := lp.hangerSymbol()
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
