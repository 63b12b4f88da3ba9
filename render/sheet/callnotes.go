package sheet

import (
	"fmt"

	"github.com/tremie-dev/tremie/render/draw"
)

// Component notes: the words a crowded sheet could not keep on its
// labels, numbered C1, C2, ... in depth order across the sheets, each
// label carrying its note's mark. They stand in the sheet's notes box
// after its notes and findings, and go on the notes sheet when the box
// is full, so no label ever loses words to an ellipsis.

// calloutText is the x of the labels' text and its width.
func (l *layout) calloutText() (x, width float64) {
	col := l.cols.call
	x = col.X + leaderLane
	return x, col.Right() - x - calloutPadX
}

// planCallouts places every sheet's labels, numbers their notes and
// shares the notes between each sheet's notes box and the notes sheet.
// It runs once the scale and the sheets are fixed; the notes take only
// the box's free room, so nothing already placed moves.
func (l *layout) planCallouts() {
	all := l.callouts()
	_, width := l.calloutText()
	r := l.bandPlan.noteR
	noteW := r.W - 2*bandPad
	used := bandHeadH + bandPad + notesHeight(l.bandPlan.notes)
	reserve := continueLineH + bandPad // the "continue on sheet" line, clear of the box's foot
	next := 1
	descNotes := l.planDescriptions(noteW)
	l.sheetCallouts = make([][]placedCallout, len(l.sheets))
	l.sheetNotes = make([][]noteBlock, len(l.sheets))
	for i, sp := range l.sheets {
		p := l.painter(sp, i == 0, i == len(l.sheets)-1)
		vis := p.calloutsFor(all)
		next = numberNotes(vis, width, next)
		l.sheetCallouts[i] = vis
		entries := descNotes[i]
		for _, pc := range vis {
			if pc.rest == "" {
				continue
			}
			var b textBlock
			b.addLead(pc.mark+".", pc.c.title+", continued: "+pc.rest, sizeSmall, noteW)
			entries = append(entries, noteBlock{block: b, color: ink, role: "callout-note"})
		}
		if len(entries) == 0 {
			continue
		}
		head := func(s string) noteBlock {
			var b textBlock
			b.add(s, draw.Bold, sizeSmall, noteW)
			return noteBlock{heading: true, block: b, color: ink, role: "callout-note-head"}
		}
		title := "COMPONENT NOTES"
		switch {
		case len(descNotes[i]) == len(entries):
			title = "DESCRIPTION NOTES"
		case len(descNotes[i]) > 0:
			title = "DESCRIPTION AND COMPONENT NOTES"
		}
		k := 0
		if len(l.bandPlan.overflow) == 0 {
			h := used + notesHeight([]noteBlock{head(title)})
			for k < len(entries) && h+notesHeight(entries[k:k+1]) <= r.H-reserve {
				h += notesHeight(entries[k : k+1])
				k++
			}
		}
		if k > 0 {
			l.sheetNotes[i] = append([]noteBlock{head(title)}, entries[:k]...)
		}
		if k < len(entries) {
			l.calloutOverflow = append(l.calloutOverflow, head(l.overflowTitle(i, title, k > 0)))
			l.calloutOverflow = append(l.calloutOverflow, entries[k:]...)
		}
	}
	if len(l.calloutOverflow) > 0 && len(l.bandPlan.overflow) == 0 && used+reserve > r.H {
		// The notes fill the box to its foot: the last of them join the
		// notes sheet, leaving room for the line that points to it.
		l.bandPlan.notes, l.bandPlan.overflow = notesThatFit(l.bandPlan.notes, r.H-bandHeadH-bandPad-reserve)
	}
}

// overflowTitle heads the notes of drawing sheet i that continue past
// its notes box (whose title is boxTitle, and which holds some of them
// when begun): the same plain title, naming the sheet on a set of
// several drawings, and saying CONTINUED only where the box began them.
func (l *layout) overflowTitle(i int, boxTitle string, begun bool) string {
	title := boxTitle
	if len(l.sheets) > 1 {
		n, _ := l.number(i)
		title = fmt.Sprintf("%s FOR SHEET %d", boxTitle, n)
	}
	if begun {
		title += ", CONTINUED"
	}
	return title
}

// notesHeight is the height noteItems gives blocks.
func notesHeight(blocks []noteBlock) float64 {
	h := 0.0
	for _, n := range blocks {
		if n.heading {
			h += 2
		}
		h += n.block.height() + 1.5
	}
	return h
}

// numberNotes gives each label that left words off a reference mark,
// C1, C2, ... from start in depth order, and resets its text with the
// mark; it returns the next number.
func numberNotes(vis []placedCallout, width float64, start int) int {
	for i := range vis {
		if vis[i].rest == "" {
			continue
		}
		vis[i].mark = fmt.Sprintf("C%d", start)
		start++
		vis[i].block = vis[i].c.block(vis[i].form, width, vis[i].mark)
	}
	return start
}
