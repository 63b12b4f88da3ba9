package sheet

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/rules"
)

// sheetCount is the number of pages: the drawings, and the notes sheets
// holding what did not fit the band.
func (l *layout) sheetCount() int { return len(l.sheets) + len(l.notesPages) }

// number is the printed number of page i (0-based) and the set's total.
func (l *layout) number(i int) (n, m int) {
	m = l.opt.SheetTotal
	if m <= 0 {
		m = l.opt.SheetOffset + l.sheetCount()
	}
	return l.opt.SheetOffset + i + 1, m
}

// page draws page i.
func (l *layout) page(i int) *draw.Page {
	pg := &draw.Page{Width: l.pg.Width, Height: l.pg.Height}
	n, m := l.number(i)
	if i >= len(l.sheets) {
		l.notesSheet(pg, i-len(l.sheets), n, m)
		return pg
	}
	sp := l.sheets[i]
	first, last := i == 0, i == len(l.sheets)-1
	sub := fmt.Sprintf("%s to %s", l.depth(max(sp.Top, 0)), l.depth(sp.Bottom))
	if len(l.sheets) == 1 {
		sub = "0 to " + l.depth(sp.Bottom) + " below ground"
	}
	pg.Add(l.headerItems(n, m, joinNonEmpty(" · ", upperFirst(strings.ReplaceAll(string(l.w.Purpose), "-", " "))+" well", sub))...)

	p := l.painter(sp, first, last)
	pg.Add(l.bodyFrame()...)
	pg.Add(p.paintLayers(layerLog, layerLog)...)
	pg.Add(p.depthAxis()...)
	pg.Add(p.elevationAxis()...)
	pg.Add(p.well()...)
	pg.Add(p.totalDepth()...)
	pg.Add(p.calloutItems(l.sheetCallouts[i])...)
	pg.Add(l.matchLines(p, i)...)

	pg.Add(l.bandItems(p, i)...)
	pg.Add(l.boxItems(l.stripBoxes, l.bandHoldsNotes())...)
	if last {
		pg.Add(l.freeItems()...)
	}
	pg.Add(l.cautionItems()...)
	return pg
}

// continuesWhere says, on drawing sheet i, where the band's amounts rows
// (amounts) or notes go on: below, in the strip; at the foot of the log
// of the last drawing sheet (named by its number on the others); or on
// the first notes sheet holding them.
func (l *layout) continuesWhere(i int, amounts bool) string {
	if l.stripBoxes != nil {
		return "below"
	}
	for _, b := range l.freeBoxes {
		if (b.amounts != nil) != amounts {
			continue
		}
		if i == len(l.sheets)-1 {
			return "at the foot of the log"
		}
		n, _ := l.number(len(l.sheets) - 1)
		return fmt.Sprintf("on sheet %d", n) // at the foot of its log: short, to fit a side band
	}
	k := 0
	if !amounts {
		k = l.firstNotesPage()
	}
	n, _ := l.number(len(l.sheets) + k)
	return fmt.Sprintf("on sheet %d", n)
}

func (l *layout) cautionItems() []draw.Item {
	var b textBlock
	b.add(rules.Caution(l.in.Profile), draw.Italic, sizeTiny, l.caution.W)
	return b.items(l.caution.X, l.caution.Y+2, ink, "caution")
}

// bodyFrame draws the body's frame, column separators and heads.
func (l *layout) bodyFrame() []draw.Item {
	b := l.body
	c := l.cols
	items := []draw.Item{box(b, ink, 0.8, draw.Color{}, "body"), line(b.X, l.plot.Y, b.Right(), l.plot.Y, 0.6, ink, "")}
	for _, x := range []float64{c.elev.X, c.lith.X, c.uscs.X, c.desc.X, c.well.X, c.call.X} {
		items = append(items, line(x, b.Y, x, b.Bottom(), 0.4, ink, ""))
	}
	datum := l.w.Elevation.Datum
	heads := []struct {
		col  xRange
		a, b string
	}{
		{c.depth, "DEPTH", string(l.u.Depth) + " bgs"},
		{c.elev, "ELEV.", strings.TrimSpace(string(l.u.Depth) + " " + datum)},
		{c.lith, "LITH.", ""},
		{c.uscs, "USCS", ""},
		{c.desc, "DESCRIPTION", ""},
		{c.well, "WELL CONSTRUCTION", fmt.Sprintf("widths ×%s", figure(l.hz.exaggerationFor(l.scale)))},
		{c.call, "COMPONENTS", ""},
	}
	for _, h := range heads {
		y := b.Y + 9
		if h.b == "" {
			y = b.Y + 13
		}
		// A sub-head too wide for its column ("m DHHN2016") takes two
		// lines rather than losing its end.
		sub := []string{h.b}
		if draw.TextWidth(draw.Regular, sizeTiny, h.b) > h.col.W-3 {
			if u, rest, ok := strings.Cut(h.b, " "); ok {
				sub = []string{u, rest}
				y = b.Y + 7.5
			}
		}
		items = append(items, text(h.col.Center(), y, fit(h.a, draw.Bold, sizeTiny, h.col.W-3), draw.Bold, sizeTiny, draw.Middle, ink, "column-head"))
		for k, line := range sub {
			if line == "" {
				continue
			}
			sy := b.Y + 17 - float64(len(sub)-1-k)*lineGap(sizeTiny)*0.95 + float64(len(sub)-1)*2.5
			size := sizeTiny
			if w := draw.TextWidth(draw.Regular, size, line); w > h.col.W-3 {
				size = max(size*(h.col.W-3)/w, 3.5)
			}
			items = append(items, text(h.col.Center(), sy, fit(line, draw.Regular, size, h.col.W-3), draw.Regular, size, draw.Middle, grey, "column-head"))
		}
	}
	return items
}

// totalDepth labels the bottom of the hole in the depth column.
func (p *painter) totalDepth() []draw.Item {
	td := p.l.w.TotalDepth
	if !p.visible(td) || td <= 0 {
		return nil
	}
	y := p.y(td)
	col := p.l.cols.well
	return []draw.Item{
		line(col.X+3, y, col.X+12, y, 0.8, ink, ""),
		text(col.X+3, y+8, "TD "+p.l.depth(td), draw.Bold, sizeSmall, draw.Start, ink, "total-depth"),
	}
}

// matchLines mark where a sheet continues: the depth, repeated on both
// sheets, and the sheet it continues on or from.
func (l *layout) matchLines(p *painter, i int) []draw.Item {
	var items []draw.Item
	st := draw.Style{Stroke: ink, StrokeWidth: 0.8, Dash: []float64{6, 2, 1.5, 2}}
	if i > 0 {
		y := p.y(p.sp.Top)
		prev, _ := l.number(i - 1)
		items = append(items, l.matchLine(st, y, "matchline:top")...)
		items = append(items, l.matchText(y-4, p.sp.Top, "continued from", prev))
	}
	if i < len(l.sheets)-1 {
		y := p.y(p.sp.Bottom)
		next, _ := l.number(i + 1)
		items = append(items, l.matchLine(st, y, "matchline:bottom")...)
		items = append(items, l.matchText(y+9, p.sp.Bottom, "continued on", next))
	}
	return items
}

// matchLine runs across the body at y, broken where the depth column
// writes its labels: match lines fall on major ticks, and the depth there
// is labelled beside its tick like every other, not struck through.
func (l *layout) matchLine(st draw.Style, y float64, role string) []draw.Item {
	b, col := l.body, l.cols.depth
	gapL, gapR := col.X, col.Right()-7 // a major tick's left end; its label ends 2 pt short of it (depthAxis)
	var items []draw.Item
	if gapL > b.X {
		items = append(items, draw.Shape{Style: st, Points: []draw.Point{{X: b.X, Y: y}, {X: gapL, Y: y}}, Role: role})
	}
	return append(items, draw.Shape{Style: st, Points: []draw.Point{{X: max(b.X, gapR), Y: y}, {X: b.Right(), Y: y}}, Role: role})
}

// matchText names a match line in the components column, shortened when
// the column is narrow, so it crosses no column rule.
func (l *layout) matchText(y float64, d schema.Length, how string, sheet int) draw.Text {
	col := l.cols.call
	s := fmt.Sprintf("MATCH LINE %s — %s sheet %d", l.depth(d), how, sheet)
	if draw.TextWidth(draw.Bold, sizeSmall, s) > col.W-8 {
		s = fmt.Sprintf("MATCH LINE %s · sheet %d", l.depth(d), sheet)
	}
	return text(col.X+4, y, s, draw.Bold, sizeSmall, draw.Start, ink, "matchline-text")
}
