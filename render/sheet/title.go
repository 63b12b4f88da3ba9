package sheet

import (
	"bytes"
	"fmt"
	"image"
	_ "image/jpeg" // logo formats the project accepts
	_ "image/png"
	"math"
	"sort"
	"strconv"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// field is one title-block cell.
type field struct {
	label, value string
	scaleBar     bool // draw the vertical scale bar beside the value
	// table, when given, is the value as rows of columns under their
	// heads (table[0]), the heads written where the label goes: the
	// revision block. minW and minH reserve room (the seal's space).
	table      [][]string
	minW, minH float64
}

// titleBlock is the grid of fields under the title row.
type titleBlock struct {
	rows [][]field
	// sealW is the width of the column kept at the grid's right for the
	// professional's seal and signature (issued sets), 0 for none.
	sealW float64
}

const (
	titleRowH    = 28.0
	fieldLabelH  = 8.0
	fieldMaxLine = 3
)

func (l *layout) titleFields() titleBlock {
	w := l.w
	tb := l.in.TitleBlock
	dash := func(s string) string {
		if strings.TrimSpace(s) == "" {
			return "—"
		}
		return s
	}
	purpose := upperFirst(w.Purpose.Words())
	if w.Status != "" {
		purpose += " (" + w.Status + ")"
	}
	elev := func(v *schema.Length) string {
		if v == nil {
			return "not surveyed"
		}
		s := l.depth(*v)
		if w.Elevation.Datum != "" {
			s += " " + w.Elevation.Datum
		}
		return s
	}
	ground := elev(w.Elevation.Ground)
	if !w.Elevation.Surveyed.IsZero() && w.Elevation.Ground != nil {
		ground += ", surveyed " + w.Elevation.Surveyed.String()
	}
	contractor := w.Drilling.Contractor
	if w.Drilling.Licence != "" {
		contractor = joinNonEmpty(", ", contractor, "licence "+w.Drilling.Licence)
	}
	volUnit, _ := quantity.VolumeUnits(l.u)
	units := fmt.Sprintf("depth %s below ground; diameter %s; volume %s", l.u.Depth, l.u.Diameter, volUnit.Symbol())
	rows := [][]field{
		{{label: "Project", value: dash(w.Project)}, {label: "Client", value: dash(w.Client)}, {label: "Site", value: dash(w.Site)}, {label: "Purpose", value: dash(purpose)}, {label: "Permit", value: dash(w.Permit)}},
		{{label: "Location", value: dash(w.Location.Description)}, {label: "Coordinates", value: l.coordinates()}, {label: "Ground elevation", value: ground}, {label: "Measuring point elevation", value: elev(w.Elevation.MeasuringPoint)}, {label: "Total depth", value: l.depth(w.TotalDepth)}},
		{{label: "Drilled", value: dash(w.Drilled.String())}, {label: "Completed", value: dash(w.Completed.String())}, {label: "Drilling contractor", value: dash(contractor)}, {label: "Drilling method", value: dash(w.Drilling.Method)}, {label: "Driller", value: dash(w.Drilling.Driller)}},
		{{label: "Logged by", value: dash(w.LoggedBy)}, {label: "Checked by", value: dash(w.CheckedBy)}, {label: "Vertical scale", value: "", scaleBar: true}, {label: "Horizontal exaggeration", value: ""}, {label: "Units", value: units}},
	}
	if tb.Consultant != "" || tb.ReportNumber != "" || tb.JobNumber != "" || tb.Revision != "" || !tb.Issued.IsZero() || tb.PreparedBy != "" || tb.ApprovedBy != "" {
		rows = append(rows, []field{{label: "Prepared by", value: dash(joinNonEmpty(", ", tb.Consultant, tb.PreparedBy))}, {label: "Approved by", value: dash(tb.ApprovedBy)},
			{label: "Report", value: dash(joinNonEmpty(" · job ", tb.ReportNumber, tb.JobNumber))}, {label: "Revision", value: dash(tb.Revision)}, {label: "Issued", value: dash(tb.Issued.String())}})
	}
	if l.opt.Issue {
		rows = append(rows, l.issueRow())
		return titleBlock{rows: rows, sealW: sealSpace + 6}
	}
	return titleBlock{rows: rows}
}

// sealSpace is the side of the square left for the professional's seal
// and signature on an issued sheet: 1.5 in (common practice for a stamp
// of 1.5 to 2 in across).
const sealSpace = 108.0

// issueRow is the revision block of an issued set: a table of revision,
// date, description and by, one row per revision, its columns aligned
// (a field left out stays an empty cell, so no value moves into the
// next column's place).
func (l *layout) issueRow() []field {
	tb := l.in.TitleBlock
	revs := [][]string{{"Rev", "Date", "Revision description", "By"}}
	for _, r := range tb.Revisions {
		revs = append(revs, []string{r.Rev, r.Date.String(), r.Description, r.By})
	}
	if len(tb.Revisions) == 0 {
		revs = append(revs, []string{tb.Revision, tb.Issued.String(), "Issued", tb.ApprovedBy})
	}
	return []field{{label: "Revisions", table: revs}}
}

// revisionColumns gives the widths of a revision table's columns in a
// cell of width cw: revision, date and by as wide as their widest entry,
// the description the rest (at least a third of the cell).
func revisionColumns(table [][]string, cw float64) []float64 {
	if len(table) == 0 {
		return nil
	}
	ws := make([]float64, len(table[0]))
	for c := range ws {
		for k, row := range table {
			if c >= len(row) {
				continue
			}
			if k == 0 {
				ws[c] = max(ws[c], draw.TextWidth(draw.Regular, sizeTiny, strings.ToUpper(row[c]))+8)
			} else {
				ws[c] = max(ws[c], draw.TextWidth(draw.Regular, sizeBody, row[c])+8)
			}
		}
	}
	const desc = 2
	fixed := 0.0
	for c, w := range ws {
		if c != desc {
			fixed += w
		}
	}
	inner := cw - 3
	if fixed > inner*2/3 { // shrink the narrow columns alike
		k := inner * 2 / 3 / fixed
		for c := range ws {
			if c != desc {
				ws[c] *= k
			}
		}
		fixed = inner * 2 / 3
	}
	ws[desc] = inner - fixed
	return ws
}

// revisionCells wraps each cell of a revision row to its column.
func revisionCells(row []string, ws []float64) ([][]string, int) {
	cells := make([][]string, len(ws))
	n := 1
	for c := range ws {
		s := ""
		if c < len(row) {
			s = row[c]
		}
		cells[c] = draw.Wrap(draw.Regular, sizeBody, s, ws[c]-4)
		n = max(n, len(cells[c]))
	}
	return cells, n
}

// coordinates writes the location's coordinates with their system.
func (l *layout) coordinates() string {
	loc := l.w.Location
	var parts []string
	if loc.Easting != nil && loc.Northing != nil {
		parts = append(parts, fmt.Sprintf("E %s, N %s", schema.TrimFloat(*loc.Easting, 3), schema.TrimFloat(*loc.Northing, 3)))
	}
	if loc.Latitude != nil && loc.Longitude != nil {
		parts = append(parts, fmt.Sprintf("%s°, %s°", schema.TrimFloat(*loc.Latitude, 6), schema.TrimFloat(*loc.Longitude, 6)))
	}
	if len(parts) == 0 {
		return "not recorded"
	}
	s := strings.Join(parts, "; ")
	switch {
	case strings.ContainsAny(loc.System, "()"):
		s += "; " + loc.System // never "(WGS 84 (invented location))"
	case loc.System != "":
		s += " (" + loc.System + ")"
	}
	return s
}

// exaggerationSized is the longest horizontal exaggeration the title
// block makes room for in one line.
const exaggerationSized = "×100 (diameters at 1:100)"

// fill completes the fields known only once the scale is fixed.
func (l *layout) scaleFields() {
	for r := range l.title.rows {
		for c := range l.title.rows[r] {
			f := &l.title.rows[r][c]
			switch f.label {
			case "Vertical scale":
				f.value = l.scale.String()
			case "Horizontal exaggeration":
				x, r := figure(l.hz.exaggerationFor(l.scale)), figure(l.hz.ratio)
				f.value = fmt.Sprintf("×%s (diameters at 1:%s)", x, r)
				if draw.TextWidth(draw.Regular, sizeBody, f.value) > draw.TextWidth(draw.Regular, sizeBody, exaggerationSized) {
					f.value = fmt.Sprintf("×%s (1:%s)", x, r) // within the width the cell was given
				}
			}
		}
	}
}

// cellWidths shares a row's width among its cells: a cell that needs
// less than an equal share gets what it needs, and the others share the
// rest equally (max-min fair), so short values leave room for long ones.
func (tb titleBlock) cellWidths(row []field, w float64) []float64 {
	need := make([]float64, len(row))
	idx := make([]int, len(row))
	for i, f := range row {
		// The scale fields are filled in once the scale is chosen; size
		// them for their longest values so the block's height is known
		// before.
		v := f.value
		switch f.label {
		case "Vertical scale":
			v = "1 in = 100 ft  0 ——— 100 ft"
		case "Horizontal exaggeration":
			v = exaggerationSized
		}
		need[i] = max(draw.TextWidth(draw.Regular, sizeTiny, strings.ToUpper(f.label)), draw.TextWidth(draw.Regular, sizeBody, v), f.minW) + 10
		if f.table != nil {
			need[i] = w // a revision block takes its row
		}
		idx[i] = i
	}
	// Every cell first gets room for its label and for its value in as
	// few lines as the row allows (a label never runs across the next
	// cell's rule; no value is cut while another cell has room to spare),
	// then the rest goes to the cells by need, the least first.
	floor, sum := tb.floors(row, need, w)
	sort.SliceStable(idx, func(a, b int) bool { return need[idx[a]]-floor[idx[a]] < need[idx[b]]-floor[idx[b]] })
	out := make([]float64, len(row))
	rest, k := w-sum, float64(len(row))
	for _, i := range idx {
		extra := min(need[i]-floor[i], rest/k)
		out[i] = floor[i] + extra
		rest -= extra
		k--
	}
	// Hand what is left over to every cell alike, but a reserved space
	// (the seal's) keeps its size.
	flex := 0
	for _, f := range row {
		if f.minW == 0 {
			flex++
		}
	}
	for i, f := range row {
		if f.minW == 0 || flex == 0 {
			out[i] += rest / float64(max(flex, 1))
		}
	}
	return out
}

// floors are the least widths of a row's cells: for the fewest lines
// (up to fieldMaxLine) in which every value fits within w, each cell as
// narrow as its value's wrapping in that many lines and its label allow;
// else room for the labels alone; else nothing.
func (tb titleBlock) floors(row []field, need []float64, w float64) ([]float64, float64) {
	floor := make([]float64, len(row))
	labelW := func(f field) float64 { return draw.TextWidth(draw.Regular, sizeTiny, strings.ToUpper(f.label)) + 8 }
	for n := 1; n <= fieldMaxLine; n++ {
		sum := 0.0
		for i, f := range row {
			switch {
			case f.scaleBar || f.table != nil || f.label == "Horizontal exaggeration":
				floor[i] = need[i] // one line, sized for its longest value
			default:
				floor[i] = min(need[i], max(labelW(f), f.minW+10, wrapWidth(f.value, n)+6))
			}
			sum += floor[i]
		}
		if sum <= w {
			return floor, sum
		}
	}
	sum := 0.0
	for i, f := range row {
		floor[i] = min(need[i], labelW(f))
		sum += floor[i]
	}
	if sum <= w {
		return floor, sum
	}
	return make([]float64, len(row)), 0
}

// wrapWidth is the least width in which a title-block value wraps into
// at most n lines (to half a point).
func wrapWidth(s string, n int) float64 {
	hi := draw.TextWidth(draw.Regular, sizeBody, s)
	if n <= 1 || hi == 0 {
		return hi
	}
	lo := 0.0
	for _, word := range strings.Fields(s) {
		lo = max(lo, draw.TextWidth(draw.Regular, sizeBody, word))
	}
	for hi-lo > 0.5 {
		mid := (lo + hi) / 2
		if len(draw.Wrap(draw.Regular, sizeBody, s, mid)) <= n {
			hi = mid
		} else {
			lo = mid
		}
	}
	return hi
}

func (tb titleBlock) cellLines(f field, cw float64) []string {
	if f.table != nil {
		ws := revisionColumns(f.table, cw)
		var out []string
		for _, row := range f.table[1:] {
			_, n := revisionCells(row, ws)
			for range n {
				out = append(out, "")
			}
		}
		return out
	}
	ls := draw.Wrap(draw.Regular, sizeBody, f.value, cw-6)
	if len(ls) > fieldMaxLine {
		ls = ls[:fieldMaxLine]
		ls[fieldMaxLine-1] = fit(ls[fieldMaxLine-1]+" …", draw.Regular, sizeBody, cw-6)
	}
	if len(ls) == 0 {
		ls = []string{""}
	}
	return ls
}

// rowHeight is the height of a row of cells in a block of width w: room
// for the tallest wrapped value (the scale values are short).
func (tb titleBlock) rowHeight(row []field, w float64) float64 {
	cws := tb.cellWidths(row, w)
	n := 1
	minH := 0.0
	for i, f := range row {
		minH = max(minH, f.minH)
		if f.scaleBar {
			continue
		}
		n = max(n, len(tb.cellLines(f, cws[i])))
	}
	return max(fieldLabelH+float64(n)*lineGap(sizeBody)+3, fieldLabelH+minH)
}

func (tb titleBlock) height(w float64) float64 {
	return titleRowH + tb.gridHeight(w)
}

// gridHeight is the height of the rows under the title row: their own,
// or the seal's space when that is taller (the last row takes the rest).
func (tb titleBlock) gridHeight(w float64) float64 {
	h := 0.0
	for _, r := range tb.rows {
		h += tb.rowHeight(r, w-tb.sealW)
	}
	if tb.sealW > 0 {
		h = max(h, fieldLabelH+sealSpace)
	}
	return h
}

// header draws the title block of sheet n (1-based) of m.
func (l *layout) headerItems(n, m int, subtitle string) []draw.Item {
	r := l.header
	var items []draw.Item
	items = append(items, box(r, ink, 0.9, draw.Color{}, "titleblock"))
	x := r.X + 6
	// Logo, fitted into the title row keeping its aspect.
	if len(l.in.Logo) > 0 {
		if cfg, _, err := image.DecodeConfig(bytes.NewReader(l.in.Logo)); err == nil && cfg.Width > 0 && cfg.Height > 0 {
			hgt := titleRowH - 8
			wid := hgt * float64(cfg.Width) / float64(cfg.Height)
			if wid > 90 {
				wid, hgt = 90, 90*float64(cfg.Height)/float64(cfg.Width)
			}
			items = append(items, draw.Image{Rect: draw.Rect{X: x, Y: r.Y + (titleRowH-hgt)/2, W: wid, H: hgt}, Data: l.in.Logo, Role: "logo"})
			x += wid + 8
		}
	}
	id := l.w.ID
	if id == "" {
		id = "(no well ID)"
	}
	idW := min(draw.TextWidth(draw.Bold, sizeTitle, id), r.W*0.4)
	items = append(items, text(x, r.Y+20, fit(id, draw.Bold, sizeTitle, r.W*0.4), draw.Bold, sizeTitle, draw.Start, ink, "well-id"))
	items = append(items, text(x+idW+8, r.Y+13, l.sheetTitle(), draw.Bold, sizeHeading, draw.Start, ink, "sheet-title"),
		text(x+idW+8, r.Y+22, fit(subtitle, draw.Regular, sizeSmall, r.W*0.35), draw.Regular, sizeSmall, draw.Start, grey, ""))
	// Sheet number, boxed at the right.
	sheetW := 74.0
	sb := draw.Rect{X: r.Right() - sheetW, Y: r.Y, W: sheetW, H: titleRowH}
	items = append(items, box(sb, ink, 0.6, draw.Color{}, ""),
		text(sb.X+sheetW/2, sb.Y+9, "SHEET", draw.Regular, sizeTiny, draw.Middle, grey, ""),
		text(sb.X+sheetW/2, sb.Y+23, fmt.Sprintf("%d of %d", n, m), draw.Bold, 11, draw.Middle, ink, "sheet-number"))
	if l.blocking {
		st := draw.Rect{X: sb.X - 170, Y: r.Y + 4, W: 162, H: titleRowH - 8}
		items = append(items, box(st, alarm, 1.6, draw.RGB(253, 238, 228), "stamp:not-final"),
			text(st.X+st.W/2, st.Y+st.H/2+draw.CapHeight(draw.Bold, 10)/2, NotFinal, draw.Bold, 10, draw.Middle, alarm, "stamp-text"))
	}
	// The grid, beside the seal's column on an issued sheet.
	y := r.Y + titleRowH
	gw := r.W - l.title.sealW
	if l.title.sealW > 0 {
		sx := r.X + gw
		items = append(items, line(sx, y, r.Right(), y, 0.5, ink, ""), line(sx, y, sx, r.Bottom(), 0.5, ink, ""),
			box(draw.Rect{X: sx, Y: y, W: l.title.sealW, H: r.Bottom() - y}, draw.Color{}, 0, draw.Color{}, "seal"),
			text(sx+3, y+6.6, "SEAL AND SIGNATURE", draw.Regular, sizeTiny, draw.Start, grey, "field:seal"))
	}
	rest := l.title.gridHeight(r.W)
	for k, row := range l.title.rows {
		rh := l.title.rowHeight(row, gw)
		if k == len(l.title.rows)-1 {
			rh = rest
		}
		rest -= rh
		cws := l.title.cellWidths(row, gw)
		items = append(items, line(r.X, y, r.X+gw, y, 0.5, ink, ""))
		cx := r.X
		for c, f := range row {
			cw := cws[c]
			if c > 0 {
				cx += cws[c-1]
			}
			if c > 0 {
				items = append(items, line(cx, y, cx, y+rh, 0.4, ink, ""))
			}
			if f.table != nil {
				items = append(items, revisionItems(f.table, cx, y, cw, rh)...)
				continue
			}
			items = append(items, text(cx+3, y+6.6, fieldLabel(f.label, cw-6), draw.Regular, sizeTiny, draw.Start, grey, "label:"+f.label))
			ty := y + fieldLabelH + draw.Ascent(draw.Regular, sizeBody)
			for _, s := range l.title.cellLines(f, cw) {
				items = append(items, text(cx+3, ty, s, draw.Regular, sizeBody, draw.Start, ink, "field:"+f.label))
				ty += lineGap(sizeBody)
			}
			if f.scaleBar {
				items = append(items, l.scaleBar(cx+3+draw.TextWidth(draw.Regular, sizeBody, f.value)+8, y+fieldLabelH+draw.Ascent(draw.Regular, sizeBody), cx+cw-4)...)
			}
		}
		y += rh
	}
	return items
}

// shortLabels are the short forms of the longer field labels, for a
// cell too narrow for the whole label (an issued sheet's grid beside the
// seal).
var shortLabels = map[string]string{
	"Measuring point elevation": "MP elevation",
	"Horizontal exaggeration":   "Horiz. exaggeration",
	"Drilling contractor":       "Contractor",
	"Drilling method":           "Method",
	"Ground elevation":          "Ground elev.",
}

// fieldLabel is a field's label as printed in a cell of inner width w:
// whole, else its short form, else cut to the width.
func fieldLabel(label string, w float64) string {
	s := strings.ToUpper(label)
	if draw.TextWidth(draw.Regular, sizeTiny, s) <= w {
		return s
	}
	if short, ok := shortLabels[label]; ok {
		s = strings.ToUpper(short)
	}
	return fit(s, draw.Regular, sizeTiny, w)
}

// revisionItems draws a revision table in the cell at (x, y) of width cw
// and height rh: the column heads where a label goes, each row's cells
// below, a thin rule between columns.
func revisionItems(table [][]string, x, y, cw, rh float64) []draw.Item {
	ws := revisionColumns(table, cw)
	var items []draw.Item
	cx := x
	for c, w := range ws {
		if c > 0 {
			items = append(items, line(cx, y+1.5, cx, y+rh-1.5, 0.3, lightGrey, ""))
		}
		items = append(items, text(cx+3, y+6.6, fit(strings.ToUpper(table[0][c]), draw.Regular, sizeTiny, w-4), draw.Regular, sizeTiny, draw.Start, grey, "field:Revisions"))
		cx += w
	}
	ty := y + fieldLabelH + draw.Ascent(draw.Regular, sizeBody)
	for _, row := range table[1:] {
		cells, n := revisionCells(row, ws)
		cx := x
		for c, cell := range cells {
			for k, s := range cell {
				items = append(items, text(cx+3, ty+float64(k)*lineGap(sizeBody), s, draw.Regular, sizeBody, draw.Start, ink, "field:Revisions"))
			}
			cx += ws[c]
		}
		ty += float64(n) * lineGap(sizeBody)
	}
	return items
}

// sheetTitle names the kind of sheet: the log of a well as built, or the
// design of a planned one.
func (l *layout) sheetTitle() string {
	if l.w.IsPlanned() {
		return "PROPOSED WELL DESIGN"
	}
	return "WELL CONSTRUCTION LOG"
}

// scaleBar draws a bar of a round length at the vertical scale, in
// alternate black and white halves, on the baseline y between x0 and at
// most x1: "0 ▬▭ 10 ft".
func (l *layout) scaleBar(x0, y, x1 float64) []draw.Item {
	perUnit := l.scale.Points(schema.LengthFrom(1, l.u.Depth))
	zeroW := draw.TextWidth(draw.Regular, sizeTiny, "0") + 2
	room := min(x1-x0-zeroW-draw.TextWidth(draw.Regular, sizeTiny, " 1000 ft"), 100)
	if room < 12 {
		return nil
	}
	length := niceFloor(room / perUnit)
	w := length * perUnit
	bx := x0 + zeroW
	half := w / 2
	by := y - 4.2
	return []draw.Item{
		text(x0, y, "0", draw.Regular, sizeTiny, draw.Start, ink, ""),
		box(draw.Rect{X: bx, Y: by, W: half, H: 3.4}, ink, 0.4, ink, "scalebar"),
		box(draw.Rect{X: bx + half, Y: by, W: half, H: 3.4}, ink, 0.4, draw.White, "scalebar"),
		text(bx+w+2, y, schema.TrimFloat(length, 2)+" "+string(l.u.Depth), draw.Regular, sizeTiny, draw.Start, ink, "scalebar-length"),
	}
}

// figure writes a ratio short enough for its cell whatever its size: 1.5
// or 0.06 as such, and one past 10⁵ or below 10⁻³ (a diameter off by a
// slip of units) as a power of ten, "2 × 10¹⁴".
func figure(v float64) string {
	switch {
	case !(v > 0) || math.IsInf(v, 0):
		return schema.TrimFloat(v, 1)
	case v >= 1e5 || v < 1e-3:
		e := math.Floor(math.Log10(v))
		m := v / math.Pow(10, e)
		if m >= 9.95 { // rounding up to the next power
			m, e = 1, e+1
		}
		sup := strings.NewReplacer("-", "⁻", "0", "⁰", "1", "¹", "2", "²", "3", "³", "4", "⁴", "5", "⁵", "6", "⁶", "7", "⁷", "8", "⁸", "9", "⁹").Replace(strconv.Itoa(int(e)))
		if ms := schema.TrimFloat(m, 1); ms != "1" {
			return ms + " × 10" + sup
		}
		return "10" + sup
	case v < 1:
		return strconv.FormatFloat(v, 'g', 2, 64)
	}
	return schema.TrimFloat(v, 1)
}
