package book

import (
	"github.com/go-pdf/fpdf"
)

// gridCol is one column of a typeset table; width is relative.
type gridCol struct {
	title string
	width float64
	right bool // right-aligned (numbers)
}

// grid typesets rows that wrap within their cells, breaking pages and
// repeating the header on each.
type grid struct {
	f       *fpdf.Fpdf
	cols    []gridCol
	widths  []float64 // mm
	size    float64   // font size, pt
	lineH   float64   // mm
	heading string    // printed above the header on every page
	intro   string    // printed under the heading on the first page
	bottom  float64   // lowest y a row may reach
	shade   bool
}

func newGrid(f *fpdf.Fpdf, heading string, cols []gridCol, size float64) *grid {
	pw, ph := f.GetPageSize()
	l, _, r, b := f.GetMargins()
	total := 0.0
	for _, c := range cols {
		total += c.width
	}
	g := &grid{f: f, cols: cols, size: size, lineH: size * 0.3528 * 1.25, heading: heading, bottom: ph - b - 8}
	for _, c := range cols {
		g.widths = append(g.widths, c.width/total*(pw-l-r))
	}
	return g
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
		if n := len(g.f.SplitText(s, g.widths[i]-1.6)); n > lines {
			lines = n
		}
	}
	return float64(lines)*g.lineH + 1.2
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
		for j, line := range f.SplitText(s, g.widths[i]-1.6) {
			f.SetXY(x+0.8, y0+0.6+float64(j)*g.lineH)
			f.CellFormat(g.widths[i]-1.6, g.lineH, line, "", 0, align, false, 0, "")
		}
		x += g.widths[i]
	}
	f.SetXY(x0, y0+h)
}
