package sheet

import (
	"errors"

	"github.com/tremie-dev/tremie/render/draw"
)

// Notes never open a sheet of their own when they fit on the drawing:
// on a one-sheet drawing, what would continue on a notes sheet
// (descriptions and component notes, notes, findings, amounts) is flowed
// instead, in columns as wide as the band's boxes, into a strip kept
// between the band and the caution. The drawing gives up the strip's
// height where it has room to spare at its scale (with --scale fit, it
// takes the round scale that still holds the well); the strip is the
// lowest that holds every box, so the drawing stays as large as it can.

// errStripFull says the strip cannot hold what it was given.
var errStripFull = errors.New("the notes do not fit the strip")

// stripArea is the strip under the band.
func (l *layout) stripArea() draw.Rect {
	return draw.Rect{X: l.content.X, Y: l.band.Bottom() + 4, W: l.content.W, H: l.strip}
}

// flowIntoStrip moves the notes sheets' boxes into the strip, when there
// is one; the strip then counts as part of the band.
func (l *layout) flowIntoStrip() error {
	if l.strip <= 0 {
		return nil
	}
	var rows [][]string
	if l.amountsOverflow() {
		rows = l.amountRows()[l.bandPlan.amountsIn:]
	}
	notes := append(append([]noteBlock(nil), l.bandPlan.overflow...), l.calloutOverflow...)
	area := l.stripArea()
	pages := l.flowNotes(area, rows, notes)
	if len(pages) > 1 {
		return errStripFull
	}
	for _, b := range append([]sheetBox(nil), firstPage(pages)...) {
		if b.r.Bottom() > area.Bottom()+1e-9 { // a block taller than the strip
			return errStripFull
		}
	}
	l.stripBoxes, l.notesPages = nil, nil
	if len(pages) == 1 {
		l.stripBoxes = pages[0]
	}
	l.band.H = area.Bottom() - l.band.Y
	return nil
}

// notesOnTheSheet gives a one-sheet drawing (portrait) the lowest strip
// that holds what would go on notes sheets, with every label still on
// the drawing, at the same scale, or with --scale fit at any round scale
// that keeps the well on the sheet; where none does, the notes sheets
// stay.
func (l *layout) notesOnTheSheet() {
	if l.pg.LegendRight > 0 || len(l.notesPages) == 0 || len(l.sheets) != 1 {
		return
	}
	fit := l.opt.Scale != nil && l.opt.Scale.Fit
	// In steps of 2.5 lines, from the lowest: a taller strip leaves a
	// smaller drawing (and so, at a coarser scale, more to hold).
	for h := 2 * continueLineH; h < l.content.H; h += 2.5 * lineGap(sizeSmall) {
		alt := newLayout(l.w, l.in, l.opt, l.pg)
		alt.strip = h
		err := alt.planOnce()
		if errors.Is(err, errStripFull) {
			continue
		}
		if err != nil || len(alt.sheets) != 1 || (alt.scale != l.scale && !fit) {
			return // the drawing no longer holds the well as it did
		}
		if len(alt.notesPages) == 0 && alt.textFits() {
			*l = *alt
			return
		}
	}
}

func firstPage(pages [][]sheetBox) []sheetBox {
	if len(pages) == 0 {
		return nil
	}
	return pages[0]
}
