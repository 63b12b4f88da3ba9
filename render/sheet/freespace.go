package sheet

import (
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
)

// The last drawing sheet of a well usually ends above the foot of its
// body: below the total depth the columns stand empty. What would go on
// a notes sheet (amounts rows, notes, findings, description and
// component notes) is set first in that free room, so that notes never
// open a sheet of their own when they fit on the drawing. The drawing is
// not changed for it.

// freeGap keeps the notes clear of the drawing and the body's frame.
const freeGap = 3.0

// minNotesW is the narrowest room a column of notes is set in (common
// practice: some 28 characters of 6.5-pt text a line, a newspaper
// column's measure).
const minNotesW = 100.0

// underDepth is the height under the deepest depth drawn that its marks
// may still take: the total-depth label (a 6.5-pt line set 8 pt down),
// the axes' ticks in the sheet's bottom pad and a depth label there.
const underDepth = plotPadBottom + 3

// freeRooms are the ways of finding free room in the body of the last
// drawing sheet: the columns fall in four groups (axes, lithology and
// USCS; the descriptions; features and well; the labels), each free from
// the foot of what it shows on that sheet, and each way joins
// neighbouring groups differently into rooms (left to right) as tall as
// the shortest group's room. notesInTheBody takes the way that holds
// the most.
func (l *layout) freeRooms() [][]draw.Rect {
	if len(l.sheets) == 0 || len(l.sheetDescs) != len(l.sheets) || len(l.sheetCallouts) != len(l.sheets) {
		return nil
	}
	i := len(l.sheets) - 1
	p := l.painter(l.sheets[i], i == 0, true)
	deepest := p.y(l.bot)
	descs := deepest + 3 // the layers' boundary ticks
	for _, e := range l.sheetDescs[i] {
		if e.form != descNoted {
			descs = max(descs, e.top+e.block.height())
		}
	}
	labels := deepest
	for _, pc := range l.sheetCallouts[i] {
		labels = max(labels, pc.box.Bottom())
	}
	wellX := l.cols.well.X
	if l.cols.feat.W > 0 {
		wellX = min(wellX, l.cols.feat.X)
	}
	groups := []struct{ x0, x1, top float64 }{
		{l.body.X, l.cols.desc.X, deepest + underDepth},
		{l.cols.desc.X, l.cols.desc.Right(), descs},
		{wellX, l.cols.call.X, deepest + underDepth},
		{l.cols.call.X, l.body.Right(), labels},
	}
	bottom := l.plot.Bottom() - freeGap
	room := func(a, b int) (draw.Rect, bool) { // groups a..b joined
		top := 0.0
		for g := a; g <= b; g++ {
			top = max(top, groups[g].top)
		}
		x0, x1 := groups[a].x0+freeGap, groups[b].x1-freeGap
		r := draw.Rect{X: x0, Y: top + freeGap, W: x1 - x0, H: bottom - (top + freeGap)}
		return r, r.W >= minNotesW && r.H >= bandPad+2*continueLineH+bandPad
	}
	var ways [][]draw.Rect
	n := len(groups)
	for cuts := 0; cuts < 1<<(n-1); cuts++ { // bit g: a cut after group g
		var rooms []draw.Rect
		a := 0
		for b := 0; b < n; b++ {
			if b < n-1 && cuts&(1<<b) == 0 {
				continue
			}
			if r, ok := room(a, b); ok {
				rooms = append(rooms, r)
			}
			a = b + 1
		}
		if len(rooms) > 0 {
			ways = append(ways, rooms)
		}
	}
	return ways
}

// notesInTheBody moves what the notes sheets carry into the free rooms
// of the last drawing sheet: all of it when it fits, else as much as
// fits when that spares a notes sheet (or the scale was chosen to draw
// one sheet, --scale fit, where every note kept on it counts). Notes
// alone stand in one box per room, in as many columns as it holds, each
// note wrapped again to its column; amounts rows flow in the band's
// widths.
func (l *layout) notesInTheBody() {
	if len(l.notesPages) == 0 || l.strip > 0 {
		return
	}
	fit := l.opt.Scale != nil && l.opt.Scale.Fit
	rows, notes := l.overflow()
	var here []sheetBox
	var pages [][]sheetBox
	var areas []draw.Rect
	left := 0.0
	for _, way := range l.freeRooms() {
		h, p, n := l.setInRooms(way, rows, notes)
		if len(h) == 0 {
			continue
		}
		if here == nil || len(p) < len(pages) || (len(p) == len(pages) && (n < left-1e-9 || (n < left+1e-9 && len(h) < len(here)))) {
			here, pages, left, areas = h, p, n, way
		}
	}
	if len(here) == 0 || (len(pages) >= len(l.notesPages) && !fit) {
		return // no sheet spared: the notes stay together on their sheets
	}
	// The boxes of each room stand on the foot of the body.
	for _, a := range areas {
		low := a.Y
		for _, b := range here {
			if within(b.r, a) {
				low = max(low, b.r.Bottom())
			}
		}
		for i := range here {
			if within(here[i].r, a) {
				here[i].r.Y += a.Bottom() - low
			}
		}
	}
	l.freeBoxes, l.freeRs, l.notesPages = here, areas, pages
}

// roomForNotes spares notes sheets where the automatic scale leaves the
// drawing no room for the notes: a less detailed round scale, at most
// three times less detailed and within twice the readable limit
// (economicalScale's bound), frees the foot of the body for them. Of the
// scales that spare a sheet (no more drawing sheets, every description
// and label still fitting) it takes the one that gives the fewest
// sheets, the most detailed of those.
func (l *layout) roomForNotes() {
	if len(l.notesPages) == 0 || l.opt.Scale != nil || l.autoAt.Ratio > 0 {
		return
	}
	limit := imperialReadable * 12 * 2
	if !l.u.Imperial() {
		limit = metricReadable * 2
	}
	best := l
	for _, s := range allSteps(l.u.Imperial()) {
		if s.Ratio <= l.scale.Ratio || s.Ratio > min(limit, 3*l.scale.Ratio) {
			continue
		}
		alt := newLayout(l.w, l.in, l.opt, l.pg)
		alt.autoAt = s
		if alt.planOnce() != nil || len(alt.sheets) > len(l.sheets) || !alt.textFits() {
			continue
		}
		alt.notesInTheBody()
		if alt.sheetCount() < best.sheetCount() {
			best = alt
		}
	}
	*l = *best
}

// setInRooms sets rows and notes in the rooms, then on notes sheets: it
// returns the rooms' boxes, the notes sheets' and the height of the
// notes that did not find room. The amounts rows stand whole, at the band's table width, in
// the first room wide and tall enough, the notes beside them in what the
// room has left and in the other rooms; rows that find no room open the
// notes sheets, before the notes that find none.
func (l *layout) setInRooms(rooms []draw.Rect, rows [][]string, notes []noteBlock) ([]sheetBox, [][]sheetBox, float64) {
	var here []sheetBox
	rooms = append([]draw.Rect(nil), rooms...)
	if len(rows) > 0 {
		w := l.bandPlan.amountW
		for i, a := range rooms {
			h := l.amountsBoxHeight(w, rows, true, false)
			if a.W < w-1e-9 || h > a.H+1e-9 {
				continue
			}
			here = append(here, sheetBox{r: draw.Rect{X: a.X, Y: a.Bottom() - h, W: w, H: h}, amounts: rows, foot: true, cont: -1, last: true})
			rows = nil
			rest := draw.Rect{X: a.X + w + sheetColGap, Y: a.Y, W: a.Right() - (a.X + w + sheetColGap), H: a.H}
			if rest.W >= minNotesW {
				rooms[i] = rest
			} else {
				rooms = append(rooms[:i], rooms[i+1:]...)
			}
			break
		}
	}
	for _, a := range rooms {
		if len(notes) == 0 {
			break
		}
		box, rest := l.columnsIn(a, notes)
		if box == nil {
			continue
		}
		notes = rest
		here = append(here, *box)
	}
	if len(here) == 0 {
		return nil, nil, notesHeight(notes)
	}
	var pages [][]sheetBox
	if len(rows) > 0 || len(notes) > 0 {
		pages = l.flowNotes(l.notesArea(), rows, notes)
	}
	// The last box of notes says where they go on: the first notes
	// sheet holding notes, or nowhere.
	for i := len(here) - 1; i >= 0; i-- {
		if here[i].amounts != nil {
			continue
		}
		if len(notes) > 0 {
			here[i].cont = firstNotes(pages)
		} else {
			here[i].last = true
		}
		break
	}
	return here, pages, notesHeight(notes)
}

// firstNotes is the index of the first of pages holding notes (not only
// amounts).
func firstNotes(pages [][]sheetBox) int {
	for p, boxes := range pages {
		for _, b := range boxes {
			if b.amounts == nil {
				return p
			}
		}
	}
	return 0
}

// within reports whether r lies inside o.
func within(r, o draw.Rect) bool {
	const eps = 0.01
	return r.X >= o.X-eps && r.Y >= o.Y-eps && r.Right() <= o.Right()+eps && r.Bottom() <= o.Bottom()+eps
}

// columnsIn sets the first of notes in one box at the foot of area, in
// as many columns as the area holds at the band's note width or wider
// (fewer when that is lower), each note wrapped again to its column and
// the columns balanced; a note that does not fit the rest of the last
// column is split there, and continues after. It returns the box, nil
// when not one line fits, and the notes left over, as they were but for
// the rest of a split note.
func (l *layout) columnsIn(area draw.Rect, notes []noteBlock) (*sheetBox, []noteBlock) {
	// A box opening with a heading of its own ("COMPONENT NOTES") needs
	// no title above it.
	head := bandHeadH
	if len(notes) > 0 && (notes[0].heading || notes[0].tail) {
		head = 0 // nor does the rest of a note split before it
	}
	most := max(1, int((area.W-2*bandPad+sheetColGap)/(l.bandPlan.noteW-2*bandPad+sheetColGap)+1e-9))
	var best *sheetBox
	var left []noteBlock
	for k := most; k >= 1; k-- {
		cw := (area.W - 2*bandPad - float64(k-1)*sheetColGap) / float64(k)
		wrapped := make([]noteBlock, len(notes))
		for i, n := range notes {
			wrapped[i] = n
			wrapped[i].block = n.block.rewrapped(cw)
		}
		text := area.H - head - 2*bandPad
		cols, rest, h := balance(wrapped, k, text, cw)
		if len(rest) > 0 {
			cols, rest, h = balance(wrapped, k, text-continueLineH, cw)
			h += continueLineH
		}
		if len(cols) == 0 {
			continue
		}
		b := &sheetBox{r: draw.Rect{X: area.X, W: area.W, H: head + bandPad + h + bandPad}, columns: cols, colW: cw, untitled: head == 0, cont: -1}
		b.r.Y = area.Bottom() - b.r.H
		if best == nil || notesHeight(rest) < notesHeight(left)-1e-9 || (len(rest) == len(left) && b.r.H < best.r.H-1e-9) {
			best, left = b, rest
		}
	}
	if best == nil {
		return nil, notes
	}
	// What is left goes on as it was wrapped for the notes sheets; the
	// rest of a split note is wrapped again to their width.
	out := append([]noteBlock(nil), notes[len(notes)-len(left):]...)
	if len(left) > 0 && left[0].tail {
		out[0] = left[0]
		out[0].block = left[0].block.rewrapped(l.bandPlan.noteW - 2*bandPad)
	}
	return best, out
}

// balance fills up to k columns of width w with the first blocks, each
// column at most height h, as low as they can be: it returns the
// columns, the blocks left (the first of them the rest of a block split
// at the foot of the last column) and the fullest column's height.
func balance(blocks []noteBlock, k int, h, w float64) ([][]noteBlock, []noteBlock, float64) {
	cols, rest, tallest := fillColumns(blocks, k, h, w, true)
	if len(rest) > 0 {
		return cols, rest, tallest
	}
	// All fit: lower the limit while they still do, whole.
	for limit := notesHeight(blocks) / float64(k); limit < h; limit += 1 {
		if c, r, t := fillColumns(blocks, k, limit, w, false); len(r) == 0 {
			return c, r, t
		}
	}
	return cols, rest, tallest
}

// fillColumns sets blocks down up to k columns, each at most limit
// high. With split, a block that does not fit the rest of a column
// continues at the head of the next, cut after a whole line when two of
// its lines fit (splitNote). A heading never ends a column.
func fillColumns(blocks []noteBlock, k int, limit, w float64, split bool) ([][]noteBlock, []noteBlock, float64) {
	var cols [][]noteBlock
	rest := blocks
	tallest := 0.0
	for c := 0; c < k && len(rest) > 0; c++ {
		var col []noteBlock
		for len(rest) > 0 {
			if notesHeight(append(col, rest[0])) <= limit {
				col, rest = append(col, rest[0]), rest[1:]
				continue
			}
			if split {
				if first, more, ok := splitNote(rest[0], limit-notesHeight(col), w); ok {
					col = append(col, first)
					rest = append([]noteBlock{more}, rest[1:]...)
				}
			}
			break
		}
		for len(col) > 0 && col[len(col)-1].heading && len(rest) > 0 {
			rest = append([]noteBlock{col[len(col)-1]}, rest...)
			col = col[:len(col)-1]
		}
		if len(col) == 0 {
			break
		}
		cols = append(cols, col)
		tallest = max(tallest, notesHeight(col))
	}
	return cols, rest, tallest
}

// splitNote cuts a note after the lines that fit height h, when two of
// them do and one is left: the rest, wrapped again to width w, opens
// with its mark and "continued" in bold ("D12, continued:"), or with
// "Continued:" for a note without a mark.
func splitNote(n noteBlock, h, w float64) (first, rest noteBlock, ok bool) {
	lines := n.block.lines
	if n.heading || len(lines) < 3 {
		return n, n, false
	}
	k, used := 0, 1.5 // notesHeight's gap under a block
	for k < len(lines) && used+lineGap(lines[k].size) <= h {
		used += lineGap(lines[k].size)
		k++
	}
	if k < 2 || k >= len(lines) {
		return n, n, false
	}
	var words []string
	for _, ln := range lines[k:] {
		if ln.lead != "" || ln.font != lines[k].font || ln.size != lines[k].size {
			return n, n, false // not one paragraph
		}
		words = append(words, strings.TrimSpace(ln.s))
	}
	first, rest = n, n
	first.block = textBlock{lines: lines[:k]}
	for _, ln := range first.block.lines {
		first.block.width = max(first.block.width, draw.TextWidth(ln.font, ln.size, ln.lead+ln.s))
	}
	lead := "Continued:"
	switch m := strings.TrimSuffix(strings.TrimSpace(lines[0].lead), "."); {
	case n.tail:
		lead = lines[0].lead // a rest split again keeps its mark
	case m != "":
		lead = m + ", continued:"
	case lines[0].lead == "":
		if num := noteNumber(lines[0].s); num != "" {
			lead = num + ", continued:" // a numbered note of the well ("3. Depths are ...")
		}
	}
	rest.block = textBlock{}
	rest.block.addLead(lead, strings.Join(words, " "), lines[k].size, w)
	rest.tail = true
	return first, rest, true
}

// noteNumber is the number a well's note opens with ("3" of "3. Depths
// are below ..."), or "".
func noteNumber(s string) string {
	s = strings.TrimSpace(s)
	i := 0
	for i < len(s) && i < 4 && s[i] >= '0' && s[i] <= '9' {
		i++
	}
	if i == 0 || !strings.HasPrefix(s[i:], ". ") {
		return ""
	}
	return s[:i]
}

// freeItems draws the notes in the body's free rooms, each box on a
// white ground reaching down to the body's frame (and to its side when
// the box stands at it), so that the rules under it end at its top.
func (l *layout) freeItems() []draw.Item {
	var items []draw.Item
	const g = 2.0
	for _, b := range l.freeBoxes {
		x0, x1 := b.r.X-g, b.r.Right()+g
		if b.r.X <= l.body.X+freeGap+1e-9 {
			x0 = l.body.X + 0.5
		}
		if b.r.Right() >= l.body.Right()-freeGap-1e-9 {
			x1 = l.body.Right() - 0.5
		}
		y0 := b.r.Y - g
		items = append(items, box(draw.Rect{X: x0, Y: y0, W: x1 - x0, H: l.body.Bottom() - 0.5 - y0}, draw.Color{}, 0, draw.White, "ground:notes"))
	}
	return append(items, l.boxItems(l.freeBoxes, l.bandHoldsNotes() || hasNotesBox(l.stripBoxes))...)
}

// columnItems draws a box of notes set in columns, under its title.
func (l *layout) columnItems(b sheetBox, title, more string) []draw.Item {
	r := b.r
	items := []draw.Item{box(r, ink, 0.6, draw.Color{}, "band:notes")}
	top := r.Y + bandPad
	if !b.untitled {
		items = append(items, text(r.X+bandPad, r.Y+9, title, draw.Bold, sizeHeading, draw.Start, ink, ""))
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
