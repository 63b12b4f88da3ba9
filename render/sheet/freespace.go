package sheet

import (
	"github.com/tremie-dev/tremie/render/draw"
)

// The last drawing sheet of a well usually ends above the foot of its
// body: below the total depth the columns stand empty. What would go on
// a notes sheet (amounts rows, notes, findings, description and
// component notes) is flowed first into that free room, in columns as
// wide as the band's boxes, so that notes never open a sheet of their
// own when they fit on the drawing. The drawing is not changed for it.

// freeGap keeps the notes clear of the drawing and the body's frame.
const freeGap = 3.0

// tdLabelH is the height the total-depth label takes under its depth
// (totalDepth: a 6.5-pt line whose baseline is 8 pt down).
const tdLabelH = 10.0

// freeArea is the free room of the body on the last drawing sheet: under
// everything drawn at depth, the descriptions and the total-depth label,
// across the columns left of the labels, or across the whole body when
// the labels end higher. ok is false when there is no such room.
func (l *layout) freeArea() (draw.Rect, bool) {
	if len(l.sheets) == 0 || len(l.sheetDescs) != len(l.sheets) || len(l.sheetCallouts) != len(l.sheets) {
		return draw.Rect{}, false
	}
	i := len(l.sheets) - 1
	p := l.painter(l.sheets[i], i == 0, true)
	top := p.y(l.bot) + tdLabelH
	for _, e := range l.sheetDescs[i] {
		if e.form != descNoted {
			top = max(top, e.top+e.block.height())
		}
	}
	bottom := l.plot.Bottom() - freeGap
	left, right := l.body.X+freeGap, l.cols.call.X-freeGap
	labels := top
	for _, pc := range l.sheetCallouts[i] {
		labels = max(labels, pc.box.Bottom())
	}
	// The whole width when the labels leave as much height as the
	// narrower room would have.
	if labels <= top+1e-9 {
		right = l.body.Right() - freeGap
	}
	r := draw.Rect{X: left, Y: top + freeGap, W: right - left, H: bottom - (top + freeGap)}
	if r.W < 2*bandPad+60 || r.H < bandHeadH+bandPad+continueLineH+bandPad {
		return draw.Rect{}, false
	}
	return r, true
}

// notesInTheBody moves what the notes sheets carry into the free room of
// the last drawing sheet: all of it when it fits, else as much as fits
// when that spares a notes sheet (or the scale was chosen to draw one
// sheet, --scale fit, where every note kept on it counts). Notes alone
// stand in one box of as many columns as the room holds, each note
// wrapped again to its column; amounts rows flow in the band's widths.
func (l *layout) notesInTheBody() {
	if len(l.notesPages) == 0 || l.strip > 0 {
		return
	}
	area, ok := l.freeArea()
	if !ok {
		return
	}
	fit := l.opt.Scale != nil && l.opt.Scale.Fit
	rows, notes := l.overflow()
	var here []sheetBox
	var pages [][]sheetBox
	if len(rows) > 0 {
		all := l.flowNotesInto([]draw.Rect{area}, l.notesArea(), rows, notes)
		here, pages = all[0], all[1:]
	} else {
		box, rest := l.columnsIn(area, notes)
		if box == nil {
			return
		}
		if len(rest) > 0 {
			pages = l.flowNotes(l.notesArea(), nil, rest)
			box.cont = 0
		} else {
			box.last = true
		}
		here = []sheetBox{*box}
	}
	if len(here) == 0 || (len(pages) >= len(l.notesPages) && !fit) {
		return // no sheet spared: the notes stay together on their sheets
	}
	// The boxes stand on the foot of the body, clear of the drawing.
	low := area.Y
	for _, b := range here {
		low = max(low, b.r.Bottom())
	}
	for i := range here {
		here[i].r.Y += area.Bottom() - low
	}
	l.freeBoxes, l.freeR, l.notesPages = here, area, pages
}

// columnsIn sets the first of notes in one box at the foot of area, in
// as many columns as the area holds at the band's note width or wider
// (fewer when that is lower), each note wrapped again to its column and
// the columns balanced. It returns the box, nil when not one note fits,
// and the notes left over, as they were.
func (l *layout) columnsIn(area draw.Rect, notes []noteBlock) (*sheetBox, []noteBlock) {
	// A box opening with a heading of its own ("COMPONENTS ON SHEET 1,
	// CONTINUED") needs no title above it.
	head := bandHeadH
	if len(notes) > 0 && notes[0].heading {
		head = 0
	}
	most := max(1, int((area.W-2*bandPad+sheetColGap)/(l.bandPlan.noteW-2*bandPad+sheetColGap)+1e-9))
	var best *sheetBox
	placed := 0
	for k := most; k >= 1; k-- {
		cw := (area.W - 2*bandPad - float64(k-1)*sheetColGap) / float64(k)
		wrapped := make([]noteBlock, len(notes))
		for i, n := range notes {
			wrapped[i] = n
			wrapped[i].block = n.block.rewrapped(cw)
		}
		text := area.H - head - 2*bandPad
		cols, n, h := balance(wrapped, k, text)
		if n < len(notes) {
			cols, n, h = balance(wrapped, k, text-continueLineH)
			h += continueLineH
		}
		if n == 0 {
			continue
		}
		b := &sheetBox{r: draw.Rect{X: area.X, W: area.W, H: head + bandPad + h + bandPad}, columns: cols, colW: cw, untitled: head == 0, cont: -1}
		b.r.Y = area.Bottom() - b.r.H
		if n > placed || (n == placed && best != nil && b.r.H < best.r.H-1e-9) {
			best, placed = b, n
		}
	}
	return best, notes[placed:]
}

// balance fills up to k columns with the first blocks, each column at
// most height h, as low as they can be: it returns the columns, the
// number of blocks set and the fullest column's height. A heading never
// ends a column.
func balance(blocks []noteBlock, k int, h float64) ([][]noteBlock, int, float64) {
	fill := func(limit float64) ([][]noteBlock, int, float64) {
		var cols [][]noteBlock
		i, tallest := 0, 0.0
		for c := 0; c < k && i < len(blocks); c++ {
			j := i
			for j < len(blocks) && notesHeight(blocks[i:j+1]) <= limit {
				j++
			}
			for j > i+1 && blocks[j-1].heading && j < len(blocks) {
				j--
			}
			if j == i {
				break
			}
			cols = append(cols, blocks[i:j])
			tallest = max(tallest, notesHeight(blocks[i:j]))
			i = j
		}
		return cols, i, tallest
	}
	cols, n, tallest := fill(h)
	if n < len(blocks) {
		return cols, n, tallest
	}
	// All fit: lower the limit while they still do.
	for limit := notesHeight(blocks) / float64(k); limit < h; limit += 1 {
		if c, m, t := fill(limit); m == len(blocks) {
			return c, m, t
		}
	}
	return cols, n, tallest
}

// freeItems draws the notes in the body's free room, on a white ground
// that hides the columns' rules under them.
func (l *layout) freeItems() []draw.Item {
	if len(l.freeBoxes) == 0 {
		return nil
	}
	u := l.freeBoxes[0].r
	for _, b := range l.freeBoxes[1:] {
		x0, y0 := min(u.X, b.r.X), min(u.Y, b.r.Y)
		x1, y1 := max(u.Right(), b.r.Right()), max(u.Bottom(), b.r.Bottom())
		u = draw.Rect{X: x0, Y: y0, W: x1 - x0, H: y1 - y0}
	}
	// The ground reaches down to the body's frame (and to its left side
	// when the boxes start there), so the rules under the notes end at
	// their top.
	g := 2.0
	x0, y0 := u.X-g, u.Y-g
	if u.X <= l.body.X+freeGap+1e-9 {
		x0 = l.body.X + 0.5
	}
	ground := draw.Rect{X: x0, Y: y0, W: u.Right() + g - x0, H: l.body.Bottom() - 0.5 - y0}
	items := []draw.Item{box(ground, draw.Color{}, 0, draw.White, "ground:notes")}
	return append(items, l.boxItems(l.freeBoxes)...)
}

// columnItems draws a box of notes set in columns.
func (l *layout) columnItems(b sheetBox, more string) []draw.Item {
	r := b.r
	items := []draw.Item{box(r, ink, 0.6, draw.Color{}, "band:notes")}
	top := r.Y + bandPad
	if !b.untitled {
		items = append(items, text(r.X+bandPad, r.Y+9, "NOTES", draw.Bold, sizeHeading, draw.Start, ink, ""))
		top += bandHeadH
	}
	low := top
	for c, col := range b.columns {
		its, y := noteBlockItems(col, r.X+bandPad+float64(c)*(b.colW+sheetColGap), top)
		items = append(items, its...)
		low = max(low, y)
	}
	if more != "" {
		by := min(low+lineGap(sizeSmall)-2, r.Bottom()-bandPad/2-draw.Descent(draw.Italic, sizeSmall))
		items = append(items, text(r.X+bandPad, by, more, draw.Italic, sizeSmall, draw.Start, alarm, "notes-continued"))
	}
	return items
}
