package sheet

import (
	"fmt"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// tagPart marks each weighted-tape tag of one fill's top at its depth, in
// the annulus at the hole wall, with "after n bags" and, when the tag is
// off, the depth the bags should have reached.
type tagPart struct{ fi int }

func (tagPart) stack() stack { return on(layerMark) }

func (t tagPart) extent(l *layout) (schema.Interval, bool) {
	var ivs []schema.Interval
	for _, tg := range l.w.Fills[t.fi].Tags {
		ivs = append(ivs, at(tg.Depth))
	}
	return hull(ivs...)
}

func (t tagPart) legend(l *layout, v window) []symbol {
	for _, tg := range l.w.Fills[t.fi].Tags {
		if v.showsAt(tg.Depth) {
			return []symbol{partSymbol(symbols.Tag)}
		}
	}
	return nil
}

func (t tagPart) paint(p *painter) []draw.Item {
	f := p.l.w.Fills[t.fi]
	var items []draw.Item
	sym := partSymbol(symbols.Tag)
	for k, tg := range f.Tags {
		if !p.visible(tg.Depth) {
			continue
		}
		x := p.l.tagX(f, tg.Depth)
		y := p.y(tg.Depth)
		r := draw.Rect{X: x - 3, Y: y - 8, W: 6, H: 8}
		items = append(items, draw.Box{Rect: r, Role: fmt.Sprintf("tag:%s[%d]", pathOr(f.Path, "fill", t.fi), k)})
		items = append(items, sym.paint(r)...)
	}
	return items
}

// tagX is the x of a tag mark: in the fill's annulus, just inside the
// hole wall (or the casing's bore, for a fill placed within a casing).
func (l *layout) tagX(f schema.Fill, d schema.Length) float64 {
	cs := l.secs.At(d)
	wall := cs.Hole
	if c, _, ok := cs.Inside(f.Within); ok && f.Within != "" {
		wall = id(c.Casing.Pipe)
	}
	return l.hz.cx + float64(wall)/2*l.hz.ppmm - 3.5
}

func (t tagPart) callouts(l *layout) []callout {
	f := l.w.Fills[t.fi]
	var cs []callout
	for k, tg := range f.Tags {
		lines := []string{fmt.Sprintf("%s after %s %s", l.depth(tg.Depth), schema.TrimFloat(tg.AfterBags, 1), plural(int(tg.AfterBags+0.5), "bag", "bags"))}
		if exp, ok := l.tagOff(t.fi, tg); ok {
			lines = append(lines, "expected "+l.depth(exp))
		}
		x := l.tagX(f, tg.Depth)
		cs = append(cs, callout{key: fmt.Sprintf("tag:%s[%d]", pathOr(f.Path, "fill", t.fi), k), iv: schema.Interval{Top: tg.Depth, Bottom: tg.Depth},
			anchorX: fixed(x), title: "Tag", lines: lines, rank: 6})
	}
	return cs
}

// tagOff returns the depth a tag should have found, when the check found
// the tag off by more than the profile's tolerance (TAG-EXPECTED-TOP).
func (l *layout) tagOff(fi int, tg schema.Tag) (schema.Length, bool) {
	line := l.w.Line(tg.Path + ".depth")
	off := false
	for _, f := range l.in.Findings {
		off = off || (f.Rule == "TAG-EXPECTED-TOP" && f.Line == line)
	}
	r, ok := l.amountRow(fi)
	if !off || !ok {
		return 0, false
	}
	for _, tc := range r.Tags {
		if tc.Tag.Path == tg.Path && tc.Err == nil {
			return tc.Expected, true
		}
	}
	return 0, false
}
