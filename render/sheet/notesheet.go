package sheet

import (
	"fmt"

	"github.com/tremie-dev/tremie/render/draw"
)

// Notes sheets carry what the drawings' bands could not hold: amounts
// rows, notes, findings and component notes. They flow, in that order,
// down columns as wide as the band's boxes, and onto further notes
// sheets when a sheet is full, so nothing is drawn outside the page body.

// sheetBox is one box of a notes sheet: a run of amounts rows or of
// note blocks, and where it continues when it does not end its run.
type sheetBox struct {
	r       draw.Rect
	amounts [][]string // an amounts box's rows; nil for a notes box
	notes   []noteBlock
	foot    bool // the amounts table ends here
	cont    int  // the box's run continues on the notes sheet of this index (-1: here, or nowhere)
	// columns, when set, are the box's notes set in columns colW wide
	// (the free room of a drawing, freespace.go).
	columns  [][]noteBlock
	colW     float64
	untitled bool // no NOTES title: the first column opens with a heading
	last     bool // the run ends in this box
}

const sheetColGap = 6.0

// notesArea is the part of a notes sheet the boxes fill.
func (l *layout) notesArea() draw.Rect {
	y := l.header.Bottom() + 6
	return draw.Rect{X: l.content.X, Y: y, W: l.content.W, H: l.caution.Y - 6 - y}
}

// planNotesSheets flows the band's overflow onto notes sheets.
func (l *layout) planNotesSheets() {
	l.notesPages = nil
	rows, notes := l.overflow()
	if len(rows) == 0 && len(notes) == 0 {
		return
	}
	l.notesPages = l.flowNotes(l.notesArea(), rows, notes)
}

// overflow is what the band could not hold: its amounts rows, then its
// notes and the callouts' notes.
func (l *layout) overflow() (rows [][]string, notes []noteBlock) {
	if l.amountsOverflow() {
		rows = l.amountRows()[l.bandPlan.amountsIn:]
	}
	notes = append(append([]noteBlock(nil), l.bandPlan.overflow...), l.calloutOverflow...)
	return rows, notes
}

// flowNotes flows amounts rows and notes down columns of area, onto as
// many pages of that area as they need.
func (l *layout) flowNotes(area draw.Rect, rows [][]string, notes []noteBlock) [][]sheetBox {
	return l.flowNotesInto(nil, area, rows, notes)
}

// flowNotesInto flows amounts rows and notes down the columns of the
// areas first (one page each: the free room of a drawing), then of as
// many pages of area rest as they need. A box of a first area is never
// taller than its area: what does not fit goes on. A box's cont counts
// the pages after the first areas.
func (l *layout) flowNotesInto(first []draw.Rect, rest draw.Rect, rows [][]string, notes []noteBlock) [][]sheetBox {
	colW := l.bandPlan.noteW // the notes' wrapping width
	if len(rows) > 0 {
		colW = max(colW, l.bandPlan.amountW)
	}
	page, col := 0, 0
	areaOf := func(p int) draw.Rect {
		if p < len(first) {
			return first[p]
		}
		return rest
	}
	area := areaOf(0)
	perPage := func() int {
		return max(1, int((area.W+sheetColGap)/(min(colW, area.W)+sheetColGap)+1e-9))
	}
	// bounded: a first area holds no box taller than itself.
	bounded := func() bool { return page < len(first) }
	y := area.Y
	pages := [][]sheetBox{nil}
	nextCol := func() {
		col++
		if col >= perPage() {
			col, page = 0, page+1
			pages = append(pages, nil)
			area = areaOf(page)
		}
		y = area.Y
	}
	add := func(b sheetBox) {
		pages[page] = append(pages[page], b)
		y = b.r.Bottom() + sheetColGap
	}
	x := func() float64 { return area.X + float64(col)*(min(colW, area.W)+sheetColGap) }

	// Amounts rows: as many as fit each column, the foot under the last.
	aw := min(l.bandPlan.amountW, area.W)
	for len(rows) > 0 {
		aw = min(l.bandPlan.amountW, area.W)
		free := area.Bottom() - y
		if h := l.amountsBoxHeight(aw, rows, true, false); h <= free {
			add(sheetBox{r: draw.Rect{X: x(), Y: y, W: aw, H: h}, amounts: rows, foot: true, cont: -1, last: true})
			break
		}
		k := 0
		for k < len(rows) && l.amountsBoxHeight(aw, rows[:k+1], false, true) <= free {
			k++
		}
		if k == len(rows) {
			// Every row fits but not the table's foot: the last row goes
			// on with it, so the table ends where its foot note is.
			k--
		}
		if k == 0 && (y > area.Y || bounded()) {
			nextCol()
			continue
		}
		k = max(k, 1) // a row taller than a column: give it one anyway
		if k == len(rows) {
			add(sheetBox{r: draw.Rect{X: x(), Y: y, W: aw, H: l.amountsBoxHeight(aw, rows, true, false)}, amounts: rows, foot: true, cont: -1, last: true})
			break
		}
		add(sheetBox{r: draw.Rect{X: x(), Y: y, W: aw, H: l.amountsBoxHeight(aw, rows[:k], false, true)}, amounts: rows[:k], cont: -1})
		rows = rows[k:]
		nextCol()
	}

	// Notes and findings: the same, with a line for where they continue.
	for len(notes) > 0 {
		w := min(colW, area.W)
		free := area.Bottom() - y
		head := bandHeadH + bandPad + bandPad
		if h := head + notesHeight(notes); h <= free {
			add(sheetBox{r: draw.Rect{X: x(), Y: y, W: w, H: h}, notes: notes, cont: -1, last: true})
			break
		}
		k := 0
		for k < len(notes) && head+notesHeight(notes[:k+1])+continueLineH <= free {
			k++
		}
		for k > 1 && notes[k-1].heading { // a heading goes with the block under it
			k--
		}
		if k == 1 && len(notes) > 1 && notes[0].heading {
			k = 0
		}
		if k == 0 && (y > area.Y || bounded()) {
			nextCol()
			continue
		}
		if k == 0 {
			// A note taller than a whole column: its lines that fit
			// stand here, the rest opens the next column.
			if first, more, ok := splitNote(notes[0], free-head-continueLineH, w-2*bandPad); ok {
				notes = append([]noteBlock{first, more}, notes[1:]...)
			}
		}
		k = max(k, 1)
		add(sheetBox{r: draw.Rect{X: x(), Y: y, W: w, H: head + notesHeight(notes[:k]) + continueLineH}, notes: notes[:k], cont: -1})
		notes = notes[k:]
		nextCol()
	}
	for len(pages) > len(first) && len(pages[len(pages)-1]) == 0 {
		pages = pages[:len(pages)-1]
	}
	for len(pages) < len(first) { // one page for every first area, used or not
		pages = append(pages, nil)
	}
	// A box whose run goes on in a later sheet's box says which.
	for p, boxes := range pages {
		for i := range boxes {
			if boxes[i].last {
				continue
			}
			if i+1 == len(boxes) {
				boxes[i].cont = p + 1 - len(first)
			}
		}
	}
	return pages
}

// notesSheet draws notes sheet k (0-based) as page n of m.
func (l *layout) notesSheet(pg *draw.Page, k, n, m int) {
	subtitle := "Notes and check findings, continued"
	if len(l.in.Findings) == 0 { // a clean well's notes sheet holds no findings to announce
		subtitle = "Notes, continued"
	}
	pg.Add(l.headerItems(n, m, subtitle)...)
	opened := l.bandHoldsNotes() || hasNotesBox(l.freeBoxes) || hasNotesBox(l.stripBoxes)
	for _, page := range l.notesPages[:k] {
		opened = opened || hasNotesBox(page)
	}
	pg.Add(l.boxItems(l.notesPages[k], opened)...)
	pg.Add(l.cautionItems()...)
}

// hasNotesBox reports whether boxes hold a box of notes.
func hasNotesBox(boxes []sheetBox) bool {
	for _, b := range boxes {
		if b.amounts == nil {
			return true
		}
	}
	return false
}

// boxItems draws the boxes of a notes sheet, of a drawing's strip or of
// its free room. Opened tells that an earlier box (the band's, or one
// before these) began the notes: the titles of these then say that the
// notes continue, so that a sheet never shows two boxes both titled
// NOTES.
func (l *layout) boxItems(boxes []sheetBox, opened bool) []draw.Item {
	var items []draw.Item
	for _, b := range boxes {
		title := "NOTES"
		if opened {
			title = "NOTES, CONTINUED"
		}
		more := ""
		if b.cont >= 0 {
			next, _ := l.number(len(l.sheets) + b.cont)
			more = fmt.Sprintf("Continued on sheet %d.", next)
		} else if !b.last {
			more = "Continued in the next column."
		}
		if b.amounts != nil {
			items = append(items, l.amountBox(b.r, "AMOUNTS, CONTINUED", b.amounts, b.foot, more)...)
			continue
		}
		opened = true
		if b.columns != nil {
			items = append(items, l.columnItems(b, title, more)...)
			continue
		}
		items = append(items, l.noteItems(b.notes, b.r, title, more)...)
	}
	return items
}

// firstNotesPage is the index of the first notes sheet holding notes (not
// only amounts).
func (l *layout) firstNotesPage() int { return firstNotes(l.notesPages) }
