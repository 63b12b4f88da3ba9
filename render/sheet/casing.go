package sheet

import (
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// casingPart is an outer casing: its pipe on the well's axis, its label,
// and the measuring point's when the point is on its top. Casings paint
// outermost first, each followed by what fills its bore.
type casingPart struct {
	ci   int
	rank int  // its place among the casings, outermost first
	mp   bool // the measuring point is on its top
}

func (cp casingPart) stack() stack { return stack{layer: layerCasing, sub: 3 * cp.rank} }

func (cp casingPart) extent(l *layout) (schema.Interval, bool) {
	return l.w.Casings[cp.ci].Interval, true
}

func (cp casingPart) legend(l *layout, v window) []symbol {
	if c := l.w.Casings[cp.ci]; v.shows(c.Top, c.Bottom) {
		return pipeSymbols(nil)
	}
	return nil
}

func (cp casingPart) paint(p *painter) []draw.Item {
	c := p.l.w.Casings[cp.ci]
	return p.pipe("casing:"+pathOr(c.Path, "casing", cp.ci), p.l.hz.cx, c.Interval, c.Pipe, nil)
}

func (cp casingPart) callouts(l *layout) []callout {
	i, c := cp.ci, l.w.Casings[cp.ci]
	r := float64(od(c.Pipe)) / 2 * l.hz.ppmm
	var cs []callout
	if cp.mp {
		cs = append(cs, callout{key: "mp:" + pathOr(c.Path, "casing", i), iv: schema.Interval{Top: c.Top, Bottom: c.Top}, anchorX: fixed(l.hz.cx + r), title: "Measuring point",
			lines: l.mpLines(c.Called(), c.Top, ""), rank: 3})
	}
	title := c.Called() // one name per part: the casing's own
	return append(cs, callout{key: "casing:" + pathOr(c.Path, "casing", i), iv: c.Interval, anchorX: fixed(l.hz.cx + r), title: upperFirst(title),
		lines: []string{l.pipeLine(c.Pipe), l.pipeSizes(c.Pipe), l.interval(c.Interval)}, minor: map[int]bool{1: true}, where: 2, rank: 2})
}
