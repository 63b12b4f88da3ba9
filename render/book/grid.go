package book

import (
	"strings"
)

// gridCol is one column of a typeset table; width is relative.
type gridCol struct {
	title string
	width float64
	right bool // right-aligned (numbers)
	// whole lists words of the column's cells that must not break, such
	// as "public-supply"; the column is made at least as wide as each.
	whole []string
}

// Cell geometry of a typeset table, in mm.
const (
	cellPadX    = 0.8 // text inset from a cell's left and right rules
	cellPadY    = 0.6 // text inset from a cell's top rule (and as much below)
	wordSlack   = 0.2 // a margin of safety beside a title's longest word, so that it never just fails to fit
	footerSpace = 8   // kept free above the bottom margin for the page footer
	// mmPerPt is a point in mm, 25.4/72 rounded to the four places the
	// tables have always been laid out with.
	mmPerPt = 0.3528
	// leading is the line pitch over the font size: 1.25, common practice
	// for small table text.
	leading = 1.25
)

// grid typesets rows that wrap within their cells, breaking pages and
// repeating the header on each.
type grid struct {
	f       *doc
	cols    []gridCol
	widths  []float64 // mm
	size    float64   // font size, pt
	lineH   float64   // mm
	heading string    // printed above the header on every page
	intro   string    // printed under the heading on the first page
	bottom  float64   // lowest y a row may reach
	shade   bool
	bare    bool // no rows to come: the page has no column header
}

func newGrid(f *doc, heading string, cols []gridCol, size float64) *grid {
	pw, ph := f.GetPageSize()
	l, _, r, b := f.GetMargins()
	g := &grid{f: f, cols: cols, size: size, lineH: size * mmPerPt * leading, heading: heading, bottom: ph - b - footerSpace}
	g.widths = fitWidths(f, cols, size, pw-l-r)
	return g
}

// fitWidths shares the text width among the columns by their relative
// widths, but gives every column at least the width of the longest word of
// its title, so that no header breaks inside a word ("Scree/n top").
func fitWidths(f *doc, cols []gridCol, size, avail float64) []float64 {
	f.SetFont(family, "B", size)
	minW := make([]float64, len(cols))
	total := 0.0
	for i, c := range cols {
		for _, word := range strings.Fields(c.title) {
			// SplitText, which breaks the cells, also keeps fpdf's cell
			// margin clear on both sides of the padding.
			if w := f.GetStringWidth(word) + 2*cellPadX + 2*f.GetCellMargin() + wordSlack; w > minW[i] {
				minW[i] = w
			}
		}
		total += c.width
	}
	f.SetFont(family, "", size)
	for i, c := range cols {
		for _, word := range c.whole {
			if w := f.GetStringWidth(word) + 2*cellPadX + 2*f.GetCellMargin() + wordSlack; w > minW[i] {
				minW[i] = w
			}
		}
	}
	widths := make([]float64, len(cols))
	// Columns whose share is below their minimum take the minimum; the rest
	// share what is left in proportion, repeated until stable.
	fixed := make([]bool, len(cols))
	for changed := true; changed; {
		changed = false
		left, weight := avail, 0.0
		for i, c := range cols {
			if fixed[i] {
				left -= minW[i]
			} else {
				weight += c.width
			}
		}
		for i, c := range cols {
			if fixed[i] {
				widths[i] = minW[i]
				continue
			}
			widths[i] = 0
			if weight > 0 {
				widths[i] = c.width / weight * left
			}
			if widths[i] < minW[i] {
				fixed[i], changed = true, true
			}
		}
	}
	return widths
}

// page starts a page with the heading and the column header.
func (g *grid) page(continued bool) {
	f := g.f
	f.AddPage()
	f.SetFont(family, "B", 12)
	h := g.heading
	if continued {
		h += " (continued)"
	}
	f.CellFormat(0, 7, h, "", 1, "L", false, 0, "")
	if g.intro != "" && !continued {
		f.SetFont(family, "", 8)
		f.MultiCell(0, 4, g.intro, "", "L", false)
	}
	f.Ln(1)
	if g.bare {
		return
	}
	f.SetFont(family, "B", g.size)
	f.SetFillColor(225, 230, 236)
	g.cells(titles(g.cols), true)
	f.SetFont(family, "", g.size)
	g.shade = false
}

func titles(cols []gridCol) []string {
	out := make([]string, len(cols))
	for i, c := range cols {
		out[i] = c.title
	}
	return out
}

// row adds one row, on a new page if it does not fit.
func (g *grid) row(cells []string) {
	if g.f.PageNo() == 0 {
		g.page(false)
	}
	if g.f.GetY()+g.height(cells) > g.bottom {
		g.page(true)
	}
	if g.shade {
		g.f.SetFillColor(244, 246, 248)
	}
	g.cells(cells, g.shade)
	g.shade = !g.shade
}

// height is the height of a row of cells.
func (g *grid) height(cells []string) float64 {
	lines := 1
	for i, s := range cells {
		if n := len(g.f.SplitText(s, g.widths[i]-2*cellPadX)); n > lines {
			lines = n
		}
	}
	return float64(lines)*g.lineH + 2*cellPadY
}

func (g *grid) cells(cells []string, fill bool) {
	f := g.f
	h := g.height(cells)
	x0, y0 := f.GetX(), f.GetY()
	x := x0
	for i, s := range cells {
		style := "D"
		if fill {
			style = "FD"
		}
		f.SetDrawColor(190, 196, 204)
		f.SetLineWidth(0.1)
		f.Rect(x, y0, g.widths[i], h, style)
		align := "L"
		if g.cols[i].right {
			align = "R"
		}
		for j, line := range f.SplitText(s, g.widths[i]-2*cellPadX) {
			f.SetXY(x+cellPadX, y0+cellPadY+float64(j)*g.lineH)
			f.CellFormat(g.widths[i]-2*cellPadX, g.lineH, line, "", 0, align, false, 0, "")
		}
		x += g.widths[i]
	}
	f.SetXY(x0, y0+h)
}
