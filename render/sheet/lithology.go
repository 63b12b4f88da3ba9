package sheet

import (
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// lithology paints the pattern column, the USCS column and the wrapped
// descriptions, each description placed level with its layer (or as near
// as the layers above and below allow, with a leader).
func (p *painter) lithology() []draw.Item {
	l := p.l
	lc, uc, dc := l.cols.lith, l.cols.uscs, l.cols.desc
	y0c, y1c := p.clipY()
	var clipped, items []draw.Item

	type desc struct {
		block  textBlock
		mid    float64 // layer's visible middle
		y0, y1 float64 // layer's visible extent
	}
	var descs []desc
	textX := dc.X + 9
	textW := dc.W - 12
	for i, ly := range l.w.Lithology {
		y0, y1, ok := p.vis(ly.Top, ly.Bottom)
		if !ok {
			continue
		}
		role := "lith:" + pathOr(ly.Path, "lithology", i)
		clipped = append(clipped, p.paint(layerSymbol(ly), draw.Rect{X: lc.X, Y: y0, W: lc.W, H: y1 - y0}, role)...)
		for _, y := range []float64{y0, y1} {
			clipped = append(clipped, line(lc.X, y, uc.Right(), y, 0.5, ink, ""), line(dc.X, y, dc.X+5, y, 0.5, ink, ""))
		}
		sym := ly.USCS
		if sym == "" {
			sym = rockAbbrev(ly.Rock)
		}
		h := y1 - y0
		label := describe(ly)
		size := sizeSmall
		if draw.TextWidth(draw.Bold, size, sym) > uc.W-2 {
			size = sizeTiny
		}
		if sym != "" && h >= 8 && draw.TextWidth(draw.Bold, size, sym) <= uc.W-2 {
			clipped = append(clipped, text(uc.Center(), (y0+y1)/2+draw.CapHeight(draw.Bold, size)/2, sym, draw.Bold, size, draw.Middle, ink, "uscs:"+pathOr(ly.Path, "lithology", i)))
		} else if ly.USCS != "" {
			label = ly.USCS + ": " + label
		}
		var b textBlock
		b.add(label, draw.Regular, sizeSmall, textW)
		descs = append(descs, desc{block: b, mid: (y0 + y1) / 2, y0: y0, y1: y1})
	}
	// Place the descriptions: each wants its top just below its layer's
	// top, or centred on a layer too thin to hold it.
	targets := make([]float64, len(descs))
	heights := make([]float64, len(descs))
	for i, d := range descs {
		heights[i] = d.block.height()
		if d.y1-d.y0 >= heights[i]+2 {
			targets[i] = d.y0 + 1
		} else {
			targets[i] = d.mid - heights[i]/2
		}
	}
	tops, _ := place(targets, heights, 1.5, y0c+1, y1c-1)
	for i, d := range descs {
		t := tops[i]
		items = append(items, d.block.items(textX, t, ink, "description")...)
		// A leader when the text no longer sits beside its layer.
		if c := t + heights[i]/2; c < d.y0 || c > d.y1 {
			ty := t + lineGap(sizeSmall)/2
			items = append(items, draw.Shape{Style: draw.Style{Stroke: grey, StrokeWidth: 0.4},
				Points: []draw.Point{{X: dc.X, Y: d.mid}, {X: dc.X + 3, Y: d.mid}, {X: textX - 2, Y: ty}}, Role: "leader:description"})
		}
	}
	out := []draw.Item{draw.Clip{Rect: draw.Rect{X: lc.X, Y: y0c, W: dc.Right() - lc.X, H: y1c - y0c}, Items: clipped}}
	// Ground line across the log columns.
	if p.visible(0) {
		y := p.y(0)
		out = append(out, line(lc.X, y, dc.X+5, y, 1.1, ink, "ground"))
	}
	return append(out, items...)
}

// describe is a layer's description, led by its rock type when the
// description does not already name it.
func describe(ly schema.Layer) string {
	d := strings.TrimSpace(ly.Description)
	if ly.Rock != "" && !strings.Contains(strings.ToLower(d), strings.ToLower(ly.Rock)) {
		r := strings.ToUpper(ly.Rock)
		if d == "" {
			return r
		}
		return r + ": " + d
	}
	if d == "" {
		if ly.USCS != "" {
			return ly.USCS
		}
		return "(no description)"
	}
	return d
}

// rockAbbrev is a short rock label for the USCS column: the first word
// of the rock type, when short enough.
func rockAbbrev(rock string) string {
	f := strings.Fields(rock)
	if len(f) == 0 {
		return ""
	}
	w := f[len(f)-1]
	if len(w) > 5 {
		w = w[:4] + "."
	}
	return strings.ToUpper(w[:1]) + w[1:]
}
