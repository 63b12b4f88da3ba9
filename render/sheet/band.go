package sheet

import (
	"fmt"
	"sort"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

// bandPlan sizes the strip under the drawing: the legend, the table of
// amounts and the notes with the check's findings.
type bandPlan struct {
	height                  float64
	legendW, amountW, noteW float64
	// The three boxes, placed once the band's position is known.
	legendR, amountR, noteR draw.Rect
	notes                   []noteBlock // what fits in the band
	overflow                []noteBlock // continued on a notes sheet
	// amountsIn is the number of amounts rows the band's table holds;
	// the rest continue on a notes sheet.
	amountsIn int
	amountH   float64 // the amounts box's height in a side band
}

// noteBlock is one note or finding, wrapped.
type noteBlock struct {
	heading bool
	block   textBlock
	color   draw.Color
	role    string // the items' role, when not told by the text
	// standard marks the sheet's standing note (depths below ground,
	// datum, diameters to their own scale): the title block states the
	// same facts, so it is the one note a sheet may leave off rather
	// than open a notes sheet for it alone (see notesWithout).
	standard bool
	// tail marks the rest of a note split at the foot of a column
	// (splitNote): it opens with the note's mark and "continued".
	tail bool
}

const (
	bandHeadH  = 12.0
	bandPad    = 4.0
	legendRowH = 11.0
	swatchW    = 18.0
	swatchH    = 9.0
	legendColW = 104.0
)

func (l *layout) hasAmounts() bool {
	return l.in.Quantities != nil && len(l.in.Quantities.AllRows()) > 0
}

func sortedSymbols(m map[string]symbol) []symbol {
	out := make([]symbol, 0, len(m))
	for _, s := range m {
		out = append(out, s)
	}
	sort.Slice(out, func(i, j int) bool {
		if out[i].order != out[j].order {
			return out[i].order < out[j].order
		}
		return out[i].label < out[j].label
	})
	return out
}

// planBand fixes the band's widths and height from its contents: it
// tries a few ways of sharing the width between the legend (one to three
// columns of symbols), the amounts table and the notes, and keeps the
// lowest band.
func (l *layout) planBand(legend []symbol) bandPlan {
	if l.pg.LegendRight > 0 {
		return l.planSideBand(legend)
	}
	W := l.content.W
	limit := l.content.H * 0.3
	var best bandPlan
	bestH := 0.0
	amountW := 0.0
	if l.hasAmounts() {
		amountW = min(max(W*0.31, 180), 230)
	}
	nRows := 0
	if l.hasAmounts() {
		nRows = len(l.in.Quantities.AllRows())
	}
	for cols := 1; cols <= 3; cols++ {
		lw := float64(cols)*legendColW + 2*bandPad
		nw := W - lw - amountW
		if nw < 150 {
			continue
		}
		bp := bandPlan{legendW: lw, amountW: amountW, noteW: nw, amountsIn: nRows}
		h := l.legendHeight(legend, lw)
		if amountW > 0 {
			// The table takes what it needs, but for a body of at
			// least amountsBodyMin above it.
			room := l.caution.Y - 4 - (l.header.Bottom() + 6) - 6 - amountsBodyMin
			bp.amountsIn, h = l.amountsWithin(amountW, max(h, limit, room), h)
		}
		notes := l.noteBlocks(nw - 2*bandPad)
		nh := bandHeadH + bandPad + notesHeight(notes)
		bp.height = max(h, min(nh, limit), 60)
		bp.notes, bp.overflow = notesInBox(notes, bp.height)
		score := bp.height
		if len(bp.overflow) > 0 {
			score += 1000 // a notes sheet only when nothing else fits
		}
		if bestH == 0 || score < bestH {
			best, bestH = bp, score
		}
	}
	return best
}

// amountsBodyMin is the body a bottom band's amounts table leaves at
// least (common practice: a third of a Letter page's height for the
// drawing).
const amountsBodyMin = 240.0

// amountsWithin is how many amounts rows a bottom band's table of width
// w shows, and the band's height with them beside a legend h high: all
// of them when the table is no taller than limit (or the legend), else
// as many as fit limit with the line saying where the rest continue, so
// that a well of many fills keeps a drawing above its band.
func (l *layout) amountsWithin(w, limit, h float64) (int, float64) {
	rows := l.amountRows()
	if full := l.amountsBoxHeight(w, rows, true, false); full <= limit {
		return len(rows), max(h, full)
	}
	k := len(rows) - 1
	for k > 0 && l.amountsBoxHeight(w, rows[:k], false, true) > limit {
		k--
	}
	return k, max(h, l.amountsBoxHeight(w, rows[:k], false, true))
}

// planSideBand stacks the legend, the amounts and the notes in a column
// on the right of the body (a landscape page), within the body's height:
// the amounts take what the legend leaves but room for a notes box, the
// notes what the other two leave, and what does not fit continues on a
// notes sheet.
func (l *layout) planSideBand(legend []symbol) bandPlan {
	w := l.pg.LegendRight
	bp := bandPlan{legendW: w, noteW: w}
	avail := l.bandFoot() - (l.header.Bottom() + 6)
	lh := l.legendHeight(legend, w)
	bp.height = lh
	// A notes box holds at least its heading and the line that says
	// where the rest continues.
	minNotes := bandHeadH + bandPad + continueLineH + bandPad
	rest := avail - lh - minNotes
	if l.hasAmounts() {
		bp.amountW = w
		rows := l.amountRows()
		bp.amountsIn = len(rows)
		bp.amountH = l.amountsBoxHeight(w, rows, true, false)
		if bp.amountH > rest {
			bp.amountsIn = 0
			for k := len(rows) - 1; k >= 0; k-- {
				if h := l.amountsBoxHeight(w, rows[:k], false, true); h <= rest {
					bp.amountsIn, bp.amountH = k, h
					break
				}
			}
			if bp.amountsIn == 0 {
				// Not even one row fits: the whole table goes on the
				// notes sheet, and the band keeps only its heading and
				// the pointer to it, when there is room for that.
				bp.amountH = l.amountsBoxHeight(w, nil, false, true)
				if bp.amountH > rest {
					bp.amountW, bp.amountH = 0, 0
				}
			}
		}
		bp.height += bp.amountH
	}
	notesAvail := avail - bp.height
	notes := l.noteBlocks(w - 2*bandPad)
	bp.notes, bp.overflow = notesInBox(notes, notesAvail)
	return bp
}

// notesInBox splits blocks into those a notes box of height h shows
// under its heading and those that continue on a notes sheet after the
// drawings (the box then says so on a line of its own).
func notesInBox(blocks []noteBlock, h float64) (fit, rest []noteBlock) {
	if bandHeadH+bandPad+notesHeight(blocks) <= h {
		return blocks, nil
	}
	fit, rest = notesThatFit(blocks, h-(bandHeadH+bandPad+continueLineH+bandPad))
	return notesWithout(fit, rest, h-(bandHeadH+bandPad))
}

// notesThatFit splits blocks into the first ones that fit height h and
// the rest.
func notesThatFit(blocks []noteBlock, h float64) (fit, rest []noteBlock) {
	for i := range blocks {
		if notesHeight(blocks[:i+1]) > h {
			// A heading goes with the first block under it.
			for i > 0 && blocks[i-1].heading {
				i--
			}
			return blocks[:i], blocks[i:]
		}
	}
	return blocks, nil
}

// notesWithout leaves the standing note off when it is all that would
// continue on a notes sheet and the rest fits height h without the
// "continue" line: a sheet of its own for facts the title block already
// gives (units, datum, horizontal exaggeration) is the waste a drafter
// would not hand over. The standing note comes after the well's own
// notes and before the rock key, so leaving it off alone leaves no gap
// in the numbering.
func notesWithout(fit, rest []noteBlock, h float64) ([]noteBlock, []noteBlock) {
	if len(rest) != 1 || !rest[0].standard || notesHeight(fit) > h {
		return fit, rest
	}
	return fit, nil
}

// amountsOverflow reports whether amounts rows continue on a notes sheet.
func (l *layout) amountsOverflow() bool {
	return l.hasAmounts() && l.bandPlan.amountsIn < len(l.in.Quantities.AllRows())
}

// placeBand fixes the boxes' rectangles within the band.
func (l *layout) placeBand() {
	bp := &l.bandPlan
	b := l.band
	if l.pg.LegendRight > 0 {
		lh := l.legendHeight(l.legendAll, b.W)
		bp.legendR = draw.Rect{X: b.X, Y: b.Y, W: b.W, H: lh}
		y := b.Y + lh
		if bp.amountW > 0 {
			ah := bp.amountH
			bp.amountR = draw.Rect{X: b.X, Y: y, W: b.W, H: ah}
			y += ah
		}
		bp.noteR = draw.Rect{X: b.X, Y: y, W: b.W, H: b.Bottom() - y}
		return
	}
	bp.legendR = draw.Rect{X: b.X, Y: b.Y, W: bp.legendW, H: b.H}
	bp.amountR = draw.Rect{X: b.X + bp.legendW, Y: b.Y, W: bp.amountW, H: b.H}
	bp.noteR = draw.Rect{X: b.X + bp.legendW + bp.amountW, Y: b.Y, W: bp.noteW, H: b.H}
}

// noteBlocks are the notes area's contents: the well's notes, then the
// check's findings, errors first.
func (l *layout) noteBlocks(width float64) []noteBlock {
	var out []noteBlock
	head := func(s string, c draw.Color) {
		var b textBlock
		b.add(s, draw.Bold, sizeSmall, width)
		out = append(out, noteBlock{heading: true, block: b, color: c})
	}
	body := func(s string, font draw.FontStyle, c draw.Color) {
		var b textBlock
		b.add(s, font, sizeSmall, width)
		out = append(out, noteBlock{block: b, color: c})
	}
	for i, n := range l.w.Notes {
		body(fmt.Sprintf("%d. %s", i+1, n), draw.Regular, ink)
	}
	body(fmt.Sprintf("%d. Depths are below ground surface; elevations above %s. Diameters are drawn to their own scale, wider than the depth scale (see horizontal exaggeration).", len(l.w.Notes)+1, datumOr(l.w.Elevation.Datum)), draw.Regular, ink)
	out[len(out)-1].standard = true
	if k := l.rockKey(); k != "" {
		body(fmt.Sprintf("%d. %s", len(l.w.Notes)+2, k), draw.Regular, ink)
	}
	fs := append([]rules.Finding(nil), l.in.Findings...)
	if len(fs) == 0 {
		return out
	}
	rank := func(f rules.Finding) int {
		switch {
		case f.Blocking():
			return 0
		case f.Waived:
			return 2
		}
		return 1
	}
	sort.SliceStable(fs, func(i, j int) bool { return rank(fs[i]) < rank(fs[j]) })
	if l.opt.Issue {
		return append(out, l.issuedFindings(fs, width)...)
	}
	t := rules.Count(fs)
	ne, nw, nv := t.Errors, t.Warnings, t.Waived
	c := ink
	if ne > 0 {
		c = alarm
	}
	head(fmt.Sprintf("CHECK FINDINGS: %d %s, %d %s, %d waived", ne, plural(ne, "error", "errors"), nw, plural(nw, "warning", "warnings"), nv), c)
	for _, f := range fs {
		label := strings.ToUpper(f.Label())
		s := fmt.Sprintf("%s %s (line %d): %s", label, f.Rule, f.Line, f.Message)
		if f.Waived && f.Waiver != nil {
			if !strings.HasSuffix(s, ".") {
				s += "."
			}
			s += fmt.Sprintf(" Waived: %s (%s", f.Waiver.Reason, f.Waiver.ApprovedBy)
			if f.Waiver.Date != "" {
				s += ", " + f.Waiver.Date
			}
			s += ")."
		}
		col := ink
		if f.Blocking() {
			col = alarm
		} else if f.Waived {
			col = grey
		}
		body(s, draw.Regular, col)
	}
	return out
}

// issuedFindings are the findings as an issued set states them: the
// accepted departures (waivers) and the review remarks (warnings) in plain
// words, with no rule IDs or file lines. An issued set has no errors.
func (l *layout) issuedFindings(fs []rules.Finding, width float64) []noteBlock {
	var out []noteBlock
	add := func(s string, font draw.FontStyle, heading bool) {
		var b textBlock
		b.add(s, font, sizeSmall, width)
		out = append(out, noteBlock{heading: heading, block: b, color: ink})
	}
	sentence := func(s string) string {
		s = upperFirst(strings.TrimSpace(s))
		if !strings.HasSuffix(s, ".") {
			s += "."
		}
		return s
	}
	var waived, remarks []rules.Finding
	for _, f := range fs {
		switch {
		case f.Waived:
			waived = append(waived, f)
		case !f.Blocking():
			remarks = append(remarks, f)
		}
	}
	if len(waived) > 0 {
		add("ACCEPTED DEPARTURES FROM PRACTICE", draw.Bold, true)
		for _, f := range waived {
			s := sentence(f.Message)
			if w := f.Waiver; w != nil {
				s += " Accepted by " + w.ApprovedBy
				if w.Date != "" {
					s += " on " + w.Date
				}
				s += ": " + sentence(w.Reason)
			}
			add(s, draw.Regular, false)
		}
	}
	if len(remarks) > 0 {
		add("REVIEW REMARKS", draw.Bold, true)
		for _, f := range remarks {
			add(sentence(f.Message), draw.Regular, false)
		}
	}
	return out
}

func datumOr(d string) string {
	if d == "" {
		return "the survey datum"
	}
	return d
}

// legendLayout places legend entries in columns of width w: each entry's
// label wrapped to at most two lines, column-major, rows as tall as their
// labels. It returns each entry's top-left offset and the total height.
func legendLayout(syms []symbol, w float64) (pos []draw.Point, labels [][]string, height float64) {
	cols := legendCols(w)
	cw := (w - 2*bandPad) / float64(cols)
	labels = make([][]string, len(syms))
	heights := make([]float64, len(syms))
	for i, s := range syms {
		ls := draw.Wrap(draw.Regular, sizeSmall, s.label, cw-swatchW-8)
		if len(ls) > 2 {
			ls = []string{ls[0], fit(strings.Join(ls[1:], " "), draw.Regular, sizeSmall, cw-swatchW-8)}
		}
		labels[i] = ls
		heights[i] = max(legendRowH, float64(len(ls))*lineGap(sizeSmall)+3)
	}
	// Fill columns top to bottom, moving on once a column holds its share
	// of the total height.
	total := 0.0
	for _, h := range heights {
		total += h
	}
	share := total / float64(cols)
	pos = make([]draw.Point, len(syms))
	c, y := 0, 0.0
	for i, h := range heights {
		if y > 0 && y+h/2 > share && c < cols-1 {
			c, y = c+1, 0
		}
		pos[i] = draw.Point{X: bandPad + float64(c)*cw, Y: bandHeadH + bandPad + y}
		y += h
		height = max(height, bandHeadH+bandPad+y+bandPad)
	}
	return pos, labels, max(height, bandHeadH+2*bandPad)
}

// legendHeight is the height of a legend of these symbols in width w.
func (l *layout) legendHeight(syms []symbol, w float64) float64 {
	_, _, h := legendLayout(syms, w)
	return h
}

func legendCols(w float64) int { return max(1, int((w-2*bandPad)/legendColW+1e-9)) }

// bandItems draws the band of drawing sheet i (p its painter): the
// legend, the amounts and the notes box. A notes box that would hold no
// note, only the line saying where they continue, is left out, and its
// room goes to the box beside or above it: an empty box pointing
// elsewhere is not what a drafter hands over.
func (l *layout) bandItems(p *painter, i int) []draw.Item {
	bp := l.bandPlan
	notes := append(append([]noteBlock(nil), bp.notes...), l.sheetNotes[i]...)
	legendR, amountR := bp.legendR, bp.amountR
	if len(notes) == 0 {
		grow := &legendR
		if bp.amountW > 0 {
			grow = &amountR
		}
		if l.pg.LegendRight > 0 {
			grow.H = bp.noteR.Bottom() - grow.Y
		} else {
			grow.W = bp.noteR.Right() - grow.X
		}
	}
	items := append(l.legendItems(legendR, l.legendOf(p.window())), l.amountItems(amountR, i)...)
	if len(notes) == 0 {
		return items
	}
	more := ""
	where := l.continuesWhere(i, false)
	switch {
	case len(bp.overflow) > 0 && len(l.in.Findings) > 0:
		more = fmt.Sprintf("Notes and findings continue %s.", where)
	case len(bp.overflow) > 0:
		more = fmt.Sprintf("Notes continue %s.", where) // no findings to announce
	case len(l.calloutOverflow) > 0:
		more = fmt.Sprintf("Notes continue %s.", where)
	}
	return append(items, l.noteItems(notes, bp.noteR, "NOTES", more)...)
}

// bandHoldsNotes reports whether the band's notes box holds notes on
// some drawing sheet: boxes elsewhere then continue its run.
func (l *layout) bandHoldsNotes() bool {
	if len(l.bandPlan.notes) > 0 {
		return true
	}
	for _, n := range l.sheetNotes {
		if len(n) > 0 {
			return true
		}
	}
	return false
}

// legendItems draws the symbols of one sheet in the band's box r.
func (l *layout) legendItems(r draw.Rect, syms []symbol) []draw.Item {
	items := []draw.Item{box(r, ink, 0.6, draw.Color{}, "band:legend"),
		text(r.X+bandPad, r.Y+9, "LEGEND", draw.Bold, sizeHeading, draw.Start, ink, "")}
	pos, labels, _ := legendLayout(syms, r.W)
	for i, s := range syms {
		x, y := r.X+pos[i].X, r.Y+pos[i].Y
		sw := draw.Rect{X: x, Y: y, W: swatchW, H: swatchH}
		items = append(items, draw.Clip{Rect: sw, Items: s.swatch(sw)}, box(sw, ink, 0.4, draw.Color{}, "legend:"+s.key))
		ty := y + swatchH/2 + draw.CapHeight(draw.Regular, sizeSmall)/2
		if len(labels[i]) > 1 {
			ty = y + draw.Ascent(draw.Regular, sizeSmall) - 0.5
		}
		for _, ln := range labels[i] {
			items = append(items, text(x+swatchW+4, ty, ln, draw.Regular, sizeSmall, draw.Start, ink, "legend-label"))
			ty += lineGap(sizeSmall)
		}
	}
	return items
}

// amount table columns, as fractions of the box.
var amountCols = []struct {
	head string
	frac float64
}{{"Interval", 0.19}, {"Material", 0.22}, {"Calculated", 0.23}, {"Placed", 0.24}, {"Ratio", 0.12}}

func (l *layout) amountRows() [][]string {
	var rows [][]string
	for _, r := range l.in.Quantities.AllRows() { // the pad's concrete too, as the order counts it
		name := materialName(r.Fill.Material)
		if r.IsPad() {
			name += " pad"
		}
		if r.Fill.Gradation != "" {
			name += " " + r.Fill.Gradation
		}
		if r.Fill.Within != "" {
			name += " in " + casingPhrase(r.Fill.Within) // else two rows may read "0–50 ft Neat cement"
		}
		if l.w.IsPlanned() {
			rows = append(rows, []string{l.interval(r.Fill.Interval), name, l.calculated(r), l.toOrder(r), l.yield(r)})
			continue
		}
		rows = append(rows, []string{l.interval(r.Fill.Interval), name, l.calculated(r), l.placed(r), ratio(r)})
	}
	return rows
}

func (l *layout) amountCells(row []string, w float64, font draw.FontStyle) ([][]string, float64) {
	cells := make([][]string, len(row))
	n := 1
	fracs := l.amountFracs(w)
	for i, s := range row {
		cw := fracs[i]*w - 3
		if draw.TextWidth(font, sizeTiny, s) > cw {
			// A range too wide for its cell breaks after its dash, never
			// inside a number ("12.6–" / "12.9 m").
			s = strings.ReplaceAll(s, "–", "– ")
		}
		cells[i] = wrapAmount(font, sizeTiny, s, cw)
		n = max(n, len(cells[i]))
	}
	return cells, float64(n)*lineGap(sizeTiny) + 2
}

func (l *layout) amountsHeight(w float64) float64 {
	return l.amountsBoxHeight(w, l.amountRows(), true, false)
}

// continueLineH is the height of a "continue on sheet" line.
var continueLineH = lineGap(sizeSmall) + 2

// amountsBoxHeight is the height amountBox gives these rows in width w,
// with the table's foot note or a continuation line.
func (l *layout) amountsBoxHeight(w float64, rows [][]string, foot, more bool) float64 {
	inner := w - 2*bandPad
	_, hh := l.amountCells(l.amountHead(), inner, draw.Bold)
	h := bandHeadH + bandPad + hh
	for _, r := range rows {
		_, rh := l.amountCells(r, inner, draw.Regular)
		h += rh
	}
	if foot {
		f := l.amountsFoot(inner)
		h += 1 + f.height()
	}
	if more {
		h += continueLineH
	}
	return h + bandPad
}

func (l *layout) amountsFoot(width float64) textBlock {
	var foot textBlock
	s := "Calculated: annulus between the recorded hole (or casing bore) and pipe outside diameters; bags at the yields in force."
	if l.w.IsPlanned() {
		s = fmt.Sprintf("Calculated: annulus between the design hole (or casing bore) and pipe outside diameters. To order: calculated plus %g %% (%s), rounded up to whole bags.", quantity.DefaultContingency, quantity.DefaultContingencySource)
	}
	foot.add(s, draw.Italic, sizeTiny, width)
	return foot
}

// amountHead is the amounts table's head: placed and ratio for a well as
// built, to order and the yield for a design.
func (l *layout) amountHead() []string {
	h := make([]string, len(amountCols))
	for i, c := range amountCols {
		h[i] = c.head
	}
	if l.w.IsPlanned() {
		h[3], h[4] = "To order", "Yield"
	}
	return h
}

// amountItems draws the band's table of calculated and placed amounts
// in its box r on drawing sheet i.
func (l *layout) amountItems(r draw.Rect, i int) []draw.Item {
	if l.bandPlan.amountW == 0 {
		return nil
	}
	rows := l.amountRows()
	more := ""
	if k := l.bandPlan.amountsIn; k < len(rows) {
		rows = rows[:k]
		more = fmt.Sprintf("Amounts continue %s.", l.continuesWhere(i, true))
	}
	return l.amountBox(r, "AMOUNTS PER FILL INTERVAL", rows, more == "", more)
}

// amountBox draws a table of amounts rows in r, ending with the table's
// foot note or with more, the line saying where the rows continue.
func (l *layout) amountBox(r draw.Rect, title string, rows [][]string, foot bool, more string) []draw.Item {
	items := []draw.Item{box(r, ink, 0.6, draw.Color{}, "band:amounts"),
		text(r.X+bandPad, r.Y+9, title, draw.Bold, sizeHeading, draw.Start, ink, "")}
	inner := r.W - 2*bandPad
	y := r.Y + bandHeadH + bandPad
	fracs := l.amountFracs(inner)
	drawRow := func(row []string, font draw.FontStyle, role string) {
		cells, rh := l.amountCells(row, inner, font)
		x := r.X + bandPad
		for i, c := range cells {
			ty := y + draw.Ascent(font, sizeTiny)
			for _, s := range c {
				items = append(items, text(x, ty, s, font, sizeTiny, draw.Start, ink, role))
				ty += lineGap(sizeTiny)
			}
			x += fracs[i] * inner
		}
		y += rh
		items = append(items, line(r.X+bandPad, y-1, r.Right()-bandPad, y-1, 0.3, lightGrey, ""))
	}
	drawRow(l.amountHead(), draw.Bold, "amounts-head")
	for _, row := range rows {
		drawRow(row, draw.Regular, "amounts-row")
	}
	if foot {
		f := l.amountsFoot(inner)
		items = append(items, f.items(r.X+bandPad, y+1, grey, "amounts-note")...)
		y += 1 + f.height()
	}
	if more != "" {
		items = append(items, text(r.X+bandPad, y+lineGap(sizeSmall)-2, more, draw.Italic, sizeSmall, draw.Start, alarm, "amounts-continued"))
	}
	return items
}

// noteBlockItems sets blocks one under the other from (x, y) and
// returns their items and the y under the last.
func noteBlockItems(blocks []noteBlock, x, y float64) ([]draw.Item, float64) {
	var items []draw.Item
	for _, n := range blocks {
		if n.heading {
			y += 2
		}
		role := "note"
		if n.color == alarm || n.heading {
			role = "finding"
		}
		if !n.heading && strings.Contains(n.block.lines[0].s, " (line ") {
			role = "finding"
		}
		if n.role != "" {
			role = n.role
		}
		items = append(items, n.block.items(x, y, n.color, role)...)
		y += n.block.height() + 1.5
	}
	return items, y
}

// noteItems draws a box of notes and findings under its title.
func (l *layout) noteItems(blocks []noteBlock, r draw.Rect, title, more string) []draw.Item {
	items := []draw.Item{box(r, ink, 0.6, draw.Color{}, "band:notes"),
		text(r.X+bandPad, r.Y+9, title, draw.Bold, sizeHeading, draw.Start, ink, "")}
	blockItems, y := noteBlockItems(blocks, r.X+bandPad, r.Y+bandHeadH+bandPad)
	items = append(items, blockItems...)
	if more != "" {
		// Within the box even when its notes fill it.
		by := min(y+lineGap(sizeSmall)-2, r.Bottom()-bandPad/2-draw.Descent(draw.Italic, sizeSmall))
		items = append(items, text(r.X+bandPad, by, more, draw.Italic, sizeSmall, draw.Start, alarm, "notes-continued"))
	}
	return items
}
