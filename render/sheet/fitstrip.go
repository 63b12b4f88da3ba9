package sheet

import (
	"errors"

	"github.com/tremie-dev/tremie/render/draw"
)

// Notes never open a sheet of their own when they fit on the drawing:
// on a one-sheet drawing, what would continue on a notes sheet
// (descriptions and component notes, notes, findings, amounts) is flowed
// instead, in columns as wide as the band's boxes, into a strip kept
// above the caution: under the band (portrait), or under the drawing
// beside the side band (landscape). The drawing gives up the strip's
// height where it has room to spare at its scale or the next readable
// one (with --scale fit, any round scale that holds the well); the strip is the
// lowest that holds every box, so the drawing stays as large as it can.

// errStripFull says the strip cannot hold what it was given.
var errStripFull = errors.New("the notes do not fit the strip")

// bandFoot is where a bottom band ends: above the caution, or above the
// strip. A side band (landscape) always reaches the caution.
func (l *layout) bandFoot() float64 {
	if l.strip > 0 && l.pg.LegendRight == 0 {
		return l.caution.Y - 4 - l.strip - 4
	}
	return l.caution.Y - 4
}

// stripArea is the strip under the band, or on a landscape page under
// the drawing, beside the side band.
func (l *layout) stripArea() draw.Rect {
	r := draw.Rect{X: l.content.X, Y: l.caution.Y - 4 - l.strip, W: l.content.W, H: l.strip}
	if l.pg.LegendRight > 0 {
		r.W -= l.pg.LegendRight + 6
	}
	return r
}

// flowIntoStrip moves the notes sheets' boxes into the strip, when there
// is one; the strip then counts as part of the band.
func (l *layout) flowIntoStrip() error {
	if l.strip <= 0 {
		return nil
	}
	rows, notes := l.overflow()
	area := l.stripArea()
	pages := l.flowNotes(area, rows, notes)
	if len(pages) > 1 {
		return errStripFull
	}
	l.stripBoxes, l.notesPages = nil, nil
	if len(pages) == 1 {
		for _, b := range pages[0] {
			if b.r.Bottom() > area.Bottom()+1e-9 { // a block taller than the strip
				return errStripFull
			}
		}
		l.stripBoxes = pages[0]
	}
	l.band.H = area.Bottom() - l.band.Y
	return nil
}

// notesOnTheSheet gives a one-sheet drawing the lowest strip
// that holds what would go on notes sheets, with every label still on
// the drawing, at the same scale or the next less detailed readable one,
// or with --scale fit at any round scale that keeps the well on the
// sheet; where none does, the notes sheets stay.
func (l *layout) notesOnTheSheet() {
	if len(l.notesPages) == 0 || len(l.sheets) != 1 {
		return
	}
	fit := l.opt.Scale != nil && l.opt.Scale.Fit
	// The drawing may go one round step less detailed, within the readable
	// limit, rather than leave a few notes a sheet of their own; a scale
	// given on the command line stays.
	coarsest := l.scale
	if l.opt.Scale == nil {
		if next, ok := lessDetailed(candidates(l.u.Imperial()), l.scale); ok {
			coarsest = next
		}
	}
	// In steps of 2.5 lines, from the lowest, so the drawing stays as
	// large as it can.
	for h := 2 * continueLineH; h < l.content.H; h += 2.5 * lineGap(sizeSmall) {
		alt := newLayout(l.w, l.in, l.opt, l.pg)
		alt.strip = h
		err := alt.planOnce()
		if errors.Is(err, errStripFull) {
			continue
		}
		if err != nil {
			return // no room left for the drawing
		}
		// The scale is not monotonic in the strip (the text may ask for a
		// more detailed one over two sheets), so the walk goes on past a
		// height that does not do.
		if len(alt.sheets) == 1 && (fit || alt.scale.Ratio <= coarsest.Ratio) && len(alt.notesPages) == 0 && alt.textFits() {
			*l = *alt
			return
		}
	}
}
