package features

import (
	"fmt"
	"sort"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/stereonet"
	"github.com/tremie-dev/tremie/schema"
)

// RoseBin is the rose diagram's bin width, degrees.
const RoseBin = 10

// maxSummaryPages bounds the table's continuation pages.
const maxSummaryPages = 200

// SummaryInput is what a feature summary shows: one well's features, or
// a project's (then the table names each row's well).
type SummaryInput struct {
	Title    string // "BR-1" or the project's name
	Subtitle string // project and site, or ""
	Rows     []Row  // from Rows, in order
	Project  bool   // rows of several wells
	Width    float64
	Height   float64 // page size in points; 0: US Letter
	Date     string  // the document date (RFC 3339), never the clock
}

// Summary lays out the feature summary: a lower-hemisphere equal-area
// net of the poles with Kamb contours, a rose of dip directions and the
// feature table, continued on further pages as needed.
func Summary(in SummaryInput) *draw.Document {
	if in.Width == 0 {
		in.Width, in.Height = 612, 792
	}
	doc := &draw.Document{Title: in.Title + " open-hole wall features", Subject: in.Subtitle, Date: in.Date}
	s := &summary{in: in, margin: 36}
	pg := s.newPage(1)
	y := s.figures(pg)
	rows := in.Rows
	for {
		n := s.table(pg, y, rows)
		doc.Pages = append(doc.Pages, pg)
		rows = rows[n:]
		if len(rows) == 0 || len(doc.Pages) >= maxSummaryPages || n == 0 {
			break
		}
		pg = s.newPage(len(doc.Pages) + 1)
		y = s.margin + 52
	}
	return doc
}

type summary struct {
	in     SummaryInput
	margin float64
}

const (
	sizeTitle = 14.0
	sizeText  = 7.5
	sizeCell  = 6.5
	sizeHead  = 6.5
)

var (
	ink  = draw.RGB(25, 25, 25)
	grey = draw.RGB(105, 105, 105)
	rule = draw.RGB(200, 200, 200)
)

func txt(x, y float64, s string, f draw.FontStyle, size float64, a draw.Anchor, c draw.Color, role string) draw.Text {
	return draw.Text{At: draw.Point{X: x, Y: y}, S: s, Size: size, Font: f, Anchor: a, Color: c, Role: role}
}

// newPage starts a page with its heading and the caution at its foot.
func (s *summary) newPage(n int) *draw.Page {
	in := s.in
	pg := &draw.Page{Width: in.Width, Height: in.Height}
	m := s.margin
	head := in.Title + " — open-hole wall features"
	if n > 1 {
		head += fmt.Sprintf(" (continued, page %d)", n)
	}
	pg.Add(txt(m, m+12, head, draw.Bold, sizeTitle, draw.Start, ink, "summary:title"))
	sub := in.Subtitle
	wells := map[string]bool{}
	for _, r := range in.Rows {
		wells[r.File+"\x00"+r.WellID] = true
	}
	count := counted(len(in.Rows), "feature", "features")
	if in.Project {
		count += " in " + counted(len(wells), "well", "wells")
	}
	north := "azimuths from true north"
	if refs := norths(in.Rows); len(refs) == 1 && refs[0] != "true north" {
		north += " (read from " + refs[0] + ")"
	}
	width := in.Width - 2*m
	pg.Add(txt(m, m+24, fitText(sub, sizeText, width), draw.Regular, sizeText, draw.Start, grey, "summary:subtitle"))
	vertical := "the hole taken as vertical"
	if len(wells) > 1 {
		vertical = "each hole taken as vertical"
	}
	pg.Add(txt(m, m+33, fitText(joinNonEmpty(" · ", count, north, vertical), sizeText, width), draw.Regular, sizeText, draw.Start, grey, "summary:subtitle"))
	pg.Add(draw.Shape{Style: draw.Style{Stroke: ink, StrokeWidth: 0.8}, Points: []draw.Point{{X: m, Y: m + 38}, {X: in.Width - m, Y: m + 38}}})
	lines := draw.Wrap(draw.Italic, 6, Caution+" Figures and checks are from the well files as written.", in.Width-2*m)
	for i, l := range lines {
		pg.Add(txt(m, in.Height-m-float64(len(lines)-1-i)*7.2, l, draw.Italic, 6, draw.Start, ink, "caution"))
	}
	return pg
}

func (s *summary) footTop() float64 {
	lines := draw.Wrap(draw.Italic, 6, Caution+" Figures and checks are from the well files as written.", s.in.Width-2*s.margin)
	return s.in.Height - s.margin - float64(len(lines))*7.2 - 4
}

// figures draws the net, the rose and the legend on the first page and
// returns the y below them.
func (s *summary) figures(pg *draw.Page) float64 {
	in := s.in
	m := s.margin
	w := in.Width - 2*m
	top := m + 58
	r := min(w*0.27, 150.0)
	nc := draw.Point{X: m + 20 + r, Y: top + 14 + r}

	var poles []stereonet.Plotted
	var axes []stereonet.Axis
	var dirs []float64
	used := map[string]Mark{}
	for i := range in.Rows {
		row := &in.Rows[i]
		if row.Dip == nil {
			continue
		}
		mk := MarkFor(row.Feature)
		used[mk.Key] = mk
		ax := stereonet.Axis{Trend: *row.PoleTrend, Plunge: *row.PolePl}
		axes = append(axes, ax)
		dirs = append(dirs, *row.DipDir)
		paint := mk.Draw
		poles = append(poles, stereonet.Plotted{Axis: ax, Role: "stereonet:pole:" + row.WellID + ":" + row.Feature.Path, Mark: func(at draw.Point) []draw.Item { return paint(at, 6) }})
	}
	var dens *stereonet.Density
	contours := fmt.Sprintf("no density contours: fewer than %d poles", stereonet.MinKambPoles)
	if len(axes) >= stereonet.MinKambPoles {
		dens = stereonet.Kamb(axes, 90, true)
		contours = fmt.Sprintf("contours: Kamb (1959) counting with Vollmer's (1995) exponential smoothing, E = 3σ, at 2σ steps above the uniform density E = %.1f", dens.Expected)
	}
	pg.Add(txt(nc.X-r, top-4, "POLES TO PLANES", draw.Bold, sizeHead+1, draw.Start, ink, "summary:net-title"))
	pg.Add(stereonet.Net(nc, r, poles, dens)...)
	y := nc.Y + r + 24
	for _, l := range draw.Wrap(draw.Regular, sizeText-1, fmt.Sprintf("Lower hemisphere, equal-area (Lambert) net; %d poles; %s.", len(axes), contours), 2*r+40) {
		pg.Add(txt(nc.X, y, l, draw.Regular, sizeText-1, draw.Middle, grey, "summary:net-caption"))
		y += 8
	}

	rr := min(w*0.17, 95.0)
	rc := draw.Point{X: in.Width - m - 20 - rr, Y: top + 14 + rr}
	pg.Add(txt(rc.X-rr-20, top-4, "DIP DIRECTIONS", draw.Bold, sizeHead+1, draw.Start, ink, "summary:rose-title"))
	pg.Add(stereonet.Rose(rc, rr, stereonet.RoseBins(dirs, RoseBin), RoseBin)...)
	ry := rc.Y + rr + 22
	for _, l := range draw.Wrap(draw.Regular, sizeText-1, fmt.Sprintf("Rose of %d dip directions in %d° bins; petal area, not length, stands for the count (rings: counts).", len(dirs), RoseBin), 2*rr+50) {
		pg.Add(txt(rc.X, ry, l, draw.Regular, sizeText-1, draw.Middle, grey, "summary:rose-caption"))
		ry += 8
	}

	// Legend under the rose.
	keys := make([]string, 0, len(used))
	for k := range used {
		keys = append(keys, k)
	}
	sort.Slice(keys, func(i, j int) bool { return LegendOrder(keys[i]) < LegendOrder(keys[j]) })
	ly := ry + 10
	lx := rc.X - rr - 20
	pg.Add(txt(lx, ly, "LEGEND", draw.Bold, sizeHead, draw.Start, ink, "summary:legend-title"))
	ly += 11
	for _, k := range keys {
		mk := used[k]
		pg.Add(mk.Draw(draw.Point{X: lx + 4, Y: ly - 2.5}, 6)...)
		pg.Add(txt(lx+12, ly, mk.Label, draw.Regular, sizeText-1, draw.Start, ink, "legend:feature:"+k))
		ly += 10
	}
	return max(y, ly) + 10
}

// columns of the feature table.
type column struct {
	head  string
	w     float64 // share of the width
	right bool
	cell  func(r *Row) string
}

func (s *summary) columns() []column {
	cols := []column{}
	if s.in.Project {
		cols = append(cols, column{"Well", 0.08, false, func(r *Row) string { return r.WellID }})
	}
	cols = append(cols,
		column{"Depth", 0.07, true, func(r *Row) string { return num(&r.Depth, 2) + " " + string(r.Units.Depth) }},
		column{"Elev.", 0.07, true, func(r *Row) string { return dash(num(r.Elevation, 1)) }},
		column{"Kind", 0.16, false, func(r *Row) string { return r.Feature.Kind.Label() }},
		column{"Dip", 0.05, true, func(r *Row) string { return dash(num(r.Dip, 0)) + "°" }},
		column{"Dip dir.", 0.06, true, func(r *Row) string { return dash(azimuth(r.DipDir)) }},
		column{"Strike", 0.06, true, func(r *Row) string { return dash(azimuth(r.Strike)) }},
		column{"Pole", 0.08, true, func(r *Row) string {
			if r.PolePl == nil {
				return "-"
			}
			return num(r.PolePl, 0) + "→" + azimuth(r.PoleTrend)
		}},
		column{"Aperture", 0.07, true, func(r *Row) string {
			if r.Aperture == nil {
				return "-"
			}
			return num(r.Aperture, 3) + " " + string(r.Units.Diameter)
		}},
		column{"Inflow", 0.07, true, func(r *Row) string {
			if r.Inflow == nil {
				return "-"
			}
			return num(r.Inflow, 2) + " " + r.FlowUnit
		}},
		column{"Orientation from", 0.23, false, func(r *Row) string { return r.Method }},
	)
	sum := 0.0
	for _, c := range cols {
		sum += c.w
	}
	for i := range cols {
		cols[i].w /= sum
	}
	return cols
}

// table draws as many rows as fit from y and returns how many.
func (s *summary) table(pg *draw.Page, y float64, rows []Row) int {
	m := s.margin
	w := s.in.Width - 2*m
	cols := s.columns()
	bottom := s.footTop()
	const rowH = 10.0
	pg.Add(txt(m, y, "FEATURES", draw.Bold, sizeHead+1, draw.Start, ink, "summary:table-title"))
	y += 12
	x := m
	for _, c := range cols {
		cx, a := x+2, draw.Start
		if c.right {
			cx, a = x+c.w*w-3, draw.End
		}
		pg.Add(txt(cx, y, c.head, draw.Bold, sizeHead, a, ink, "summary:head"))
		x += c.w * w
	}
	y += 3
	pg.Add(draw.Shape{Style: draw.Style{Stroke: ink, StrokeWidth: 0.6}, Points: []draw.Point{{X: m, Y: y}, {X: m + w, Y: y}}})
	n := 0
	for i := range rows {
		if y+rowH > bottom {
			break
		}
		y += rowH
		r := &rows[i]
		x := m
		for k, c := range cols {
			cw := c.w * w
			s := fitText(c.cell(r), sizeCell, cw-5)
			cx, a := x+2, draw.Start
			if c.right {
				cx, a = x+cw-3, draw.End
			}
			role := ""
			if k == 0 {
				role = "summary:row:" + r.WellID + ":" + r.Feature.Path
			}
			pg.Add(txt(cx, y-2.5, s, draw.Regular, sizeCell, a, ink, role))
			x += cw
		}
		if r.Feature.IsWaterBearing() {
			pg.Add(MarkFor(r.Feature).Draw(draw.Point{X: m - 6, Y: y - 4.5}, 4)...)
		}
		pg.Add(draw.Shape{Style: draw.Style{Stroke: rule, StrokeWidth: 0.3}, Points: []draw.Point{{X: m, Y: y + 0.5}, {X: m + w, Y: y + 0.5}}})
		n++
	}
	if len(rows) == 0 {
		pg.Add(txt(m, y+12, "No features recorded.", draw.Italic, sizeText, draw.Start, grey, "summary:empty"))
	} else if n < len(rows) {
		pg.Add(txt(m+w, y+12, fmt.Sprintf("continued: %d more features", len(rows)-n), draw.Italic, sizeText, draw.End, grey, "summary:continued"))
	}
	return n
}

// fitText shortens s with an ellipsis to fit a width.
func fitText(s string, size, width float64) string {
	if draw.TextWidth(draw.Regular, size, s) <= width {
		return s
	}
	r := []rune(s)
	for len(r) > 1 && draw.TextWidth(draw.Regular, size, string(r)+"…") > width {
		r = r[:len(r)-1]
	}
	return strings.TrimSpace(string(r)) + "…"
}

// counted is n with its noun: "1 feature", "13 features".
func counted(n int, one, many string) string {
	if n == 1 {
		return "1 " + one
	}
	return fmt.Sprintf("%d %s", n, many)
}

func joinNonEmpty(sep string, parts ...string) string {
	var out []string
	for _, p := range parts {
		if p != "" {
			out = append(out, p)
		}
	}
	return strings.Join(out, sep)
}

// norths lists the azimuth references of the rows' files, once each.
func norths(rows []Row) []string {
	var out []string
	for _, r := range rows {
		if len(out) == 0 || out[len(out)-1] != r.North {
			out = append(out, r.North)
		}
	}
	return out
}

// WellSubtitle is the subtitle of one well's summary.
func WellSubtitle(w *schema.Well) string { return joinNonEmpty(" · ", w.Project, w.Site) }

// WellSummary is the summary of one well's features, nil when it has
// none; width and height are the portrait page size (0: US Letter).
func WellSummary(file string, w *schema.Well, width, height float64, date string) *draw.Document {
	if len(w.Features) == 0 {
		return nil
	}
	return Summary(SummaryInput{Title: w.ID, Subtitle: WellSubtitle(w), Rows: Rows(file, w), Width: width, Height: height, Date: date})
}

// ProjectSummary is the summary of every listed well's features, nil
// when fewer than two wells have any (one well's page says it all).
func ProjectSummary(name, site string, rows []Row, width, height float64, date string) *draw.Document {
	wells := map[string]bool{}
	for _, r := range rows {
		wells[r.File] = true
	}
	if len(wells) < 2 {
		return nil
	}
	return Summary(SummaryInput{Title: name, Subtitle: site, Rows: rows, Project: true, Width: width, Height: height, Date: date})
}
