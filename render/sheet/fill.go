package sheet

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// fillPart is one annular fill: painted across the borehole, piece by
// piece where the hole changes diameter (pipes painted later cover their
// part), or inside the bore of the outer casing it was placed in.
type fillPart struct {
	fi   int
	host int // the casing whose bore holds it, or -1 for the hole
	rank int // the host's place among the casings, outermost first
}

func (fp fillPart) stack() stack {
	if fp.host >= 0 {
		return stack{layer: layerCasing, sub: 3*fp.rank + 1}
	}
	return on(layerFill)
}

func (fp fillPart) extent(l *layout) (schema.Interval, bool) { return l.w.Fills[fp.fi].Interval, true }

type fillPiece struct {
	iv schema.Interval
	d  schema.Diameter
}

// pieces are the intervals the fill is painted in, each with the
// diameter it fills: the boreholes it crosses, or its host's bore.
func (fp fillPart) pieces(l *layout) []fillPiece {
	f := l.w.Fills[fp.fi]
	if fp.host >= 0 {
		c := l.w.Casings[fp.host]
		return []fillPiece{{schema.Interval{Top: max(f.Top, c.Top), Bottom: min(f.Bottom, c.Bottom)}, id(c.Pipe)}}
	}
	if f.Within != "" {
		return nil // within a casing the well does not have: the check reports it
	}
	var out []fillPiece
	for _, b := range l.w.Boreholes {
		out = append(out, fillPiece{schema.Interval{Top: max(f.Top, b.Top), Bottom: min(f.Bottom, b.Bottom)}, b.Diameter})
	}
	return out
}

func (fp fillPart) legend(l *layout, v window) []symbol {
	for _, pc := range fp.pieces(l) {
		if v.shows(pc.iv.Top, pc.iv.Bottom) {
			return []symbol{materialSymbol(l.w.Fills[fp.fi].Material)}
		}
	}
	return nil
}

func (fp fillPart) paint(p *painter) []draw.Item {
	f := p.l.w.Fills[fp.fi]
	var items []draw.Item
	sym := materialSymbol(f.Material)
	role := "interval:" + pathOr(f.Path, "fill", fp.fi)
	for _, pc := range fp.pieces(p.l) {
		y0, y1, ok := p.vis(pc.iv.Top, pc.iv.Bottom)
		if !ok {
			continue
		}
		r := float64(pc.d) / 2 * p.l.hz.ppmm
		items = append(items, p.paint(sym, draw.Rect{X: p.l.hz.cx - r, Y: y0, W: 2 * r, H: y1 - y0}, role)...)
	}
	return items
}

func (fp fillPart) callouts(l *layout) []callout {
	i := fp.fi
	f := l.w.Fills[i]
	title := materialName(f.Material)
	switch {
	case f.Gradation != "":
		title += " " + f.Gradation
	case f.GrainMin > 0 && f.GrainMax > 0:
		title += fmt.Sprintf(" %s–%s mm", schema.TrimFloat(float64(f.GrainMin), 2), schema.TrimFloat(float64(f.GrainMax), 2))
	}
	var lines []string
	minor := map[int]bool{}
	if f.Product != "" {
		lines = append(lines, f.Product)
		minor[0] = true
	}
	where := l.interval(f.Interval)
	if f.Method != "" {
		where += ", " + string(f.Method)
	}
	if f.Within != "" {
		where += ", inside " + casingPhrase(f.Within)
	}
	whereAt := len(lines)
	lines = append(lines, where)
	if r, ok := l.amountRow(i); ok {
		lines = append(lines, "calc. "+l.calculated(r))
		switch {
		case r.Recorded:
			lines = append(lines, "placed "+l.placed(r)+ratioSuffix(ratio(r)))
		case l.w.IsPlanned():
			lines = append(lines, "to order "+l.toOrder(r))
		}
	}
	return []callout{{key: "interval:" + pathOr(f.Path, "fill", i), iv: f.Interval, anchorX: func(d schema.Length) float64 { return l.annulusX(f, d) }, title: title, lines: lines, minor: minor, where: whereAt, rank: 6}}
}

// annulusX is the middle of a fill's annulus on the right of the well at
// a depth: between the outermost pipe standing in its region and the
// hole wall (or the casing bore it was placed in).
func (l *layout) annulusX(f schema.Fill, d schema.Length) float64 {
	h := l.hz
	cs := l.secs.At(d)
	outer := float64(cs.Hole) / 2 * h.ppmm
	limit := schema.Diameter(1e9)
	if c, _, ok := cs.Inside(f.Within); ok && f.Within != "" {
		outer = float64(id(c.Casing.Pipe)) / 2 * h.ppmm
		limit = id(c.Casing.Pipe)
	}
	inner := 0.0
	for _, c := range cs.Casings {
		if od(c.Casing.Pipe) < limit {
			inner = max(inner, float64(od(c.Casing.Pipe))/2*h.ppmm)
		}
	}
	for _, s := range cs.Strings {
		inner = max(inner, h.strX[s.Index]-h.cx+float64(od(s.Section.Pipe))/2*h.ppmm)
	}
	if outer <= inner {
		return h.cx + inner
	}
	return h.cx + (inner+outer)/2
}

// casingPhrase names the casing a fill is in as a reader says it: a
// casing named after its kind reads "surface casing", not "surface"; a
// name that already says what the pipe is ("conductor", "14-in casing")
// stays as written.
func casingPhrase(name string) string {
	low := strings.ToLower(name)
	for _, w := range []string{"casing", "conductor", "liner", "pipe", "sleeve"} {
		if strings.Contains(low, w) {
			return name
		}
	}
	return name + " casing"
}
