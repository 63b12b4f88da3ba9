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
const freeGap = 5.0

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
	top := p.y(l.bot) + plotPadBottom // the total-depth label stands in the pad
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
// sheet, --scale fit, where every note kept on it counts).
func (l *layout) notesInTheBody() {
	if len(l.notesPages) == 0 || l.strip > 0 {
		return
	}
	area, ok := l.freeArea()
	if !ok {
		return
	}
	rows, notes := l.overflow()
	pages := l.flowNotesInto([]draw.Rect{area}, l.notesArea(), rows, notes)
	if len(pages[0]) == 0 {
		return
	}
	fit := l.opt.Scale != nil && l.opt.Scale.Fit
	if len(pages)-1 >= len(l.notesPages) && !fit {
		return // no sheet spared: the notes stay together on their sheets
	}
	// The boxes stand on the foot of the body, clear of the drawing.
	low := area.Y
	for _, b := range pages[0] {
		low = max(low, b.r.Bottom())
	}
	for i := range pages[0] {
		pages[0][i].r.Y += area.Bottom() - low
	}
	l.freeBoxes, l.freeR, l.notesPages = pages[0], area, pages[1:]
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
