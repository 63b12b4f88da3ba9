package sheet

import (
	"fmt"

	"github.com/tremie-dev/tremie/templates"
)

// Page is a sheet size with its margin, in points. Column fractions give
// the share of the body width each column takes.
type Page struct {
	Name          string
	Width, Height float64
	Margin        float64
	Columns       Columns
	// LegendRight, when above zero, is the width of a column on the right
	// holding the legend, amounts and notes (a landscape sheet); else they
	// take a band under the drawing.
	LegendRight float64
}

// Columns are the body's column widths as fractions of the content width;
// zero values take the defaults.
type Columns struct {
	Depth, Elevation, Lithology, USCS, Description, Well, Callouts float64
}

// Page sizes (ANSI and ISO 216), portrait.
var (
	Letter  = Page{Name: "letter", Width: 612, Height: 792, Margin: 28}
	Tabloid = Page{Name: "tabloid", Width: 792, Height: 1224, Margin: 32}
	A4      = Page{Name: "a4", Width: 595.28, Height: 841.89, Margin: 28}
	A3      = Page{Name: "a3", Width: 841.89, Height: 1190.55, Margin: 32}
)

// Landscape turns the page; the legend moves to a column on the right.
func (p Page) Landscape() Page {
	if p.Width < p.Height {
		p.Width, p.Height = p.Height, p.Width
	}
	if p.LegendRight == 0 {
		p.LegendRight = min(p.Width*0.27, 240)
	}
	p.Columns = Columns{}
	return p
}

// FromTemplate makes a page from a page template's size, margin, columns
// and legend side.
func FromTemplate(t *templates.Template) Page {
	p := Page{Name: t.Name, Width: t.Width, Height: t.Height, Margin: t.Margin,
		Columns: Columns{Depth: t.Columns.Depth, Elevation: t.Columns.Elevation, Lithology: t.Columns.Lithology, USCS: t.Columns.USCS,
			Description: t.Columns.Description, Well: t.Columns.Well, Callouts: t.Columns.Callouts}}
	if t.Legend.Side == "right" {
		p.LegendRight = t.Legend.Size
	}
	return p
}

func (p Page) check() error {
	if p.Width < 300 || p.Height < 300 || p.Margin < 0 || p.Margin > 72 || p.LegendRight < 0 || p.LegendRight > p.Width/2 {
		return fmt.Errorf("sheet: page %q of %.0f x %.0f pt with margin %.0f is not usable", p.Name, p.Width, p.Height, p.Margin)
	}
	return nil
}

// columns returns the fractions in force, normalised to sum to one.
func (p Page) columns() Columns {
	c := p.Columns
	if c == (Columns{}) {
		c = Columns{Depth: 0.058, Elevation: 0.058, Lithology: 0.052, USCS: 0.042, Description: 0.22, Well: 0.22, Callouts: 0.35}
		if p.Width > p.Height {
			c = Columns{Depth: 0.05, Elevation: 0.05, Lithology: 0.05, USCS: 0.035, Description: 0.24, Well: 0.21, Callouts: 0.365}
		}
	}
	sum := c.Depth + c.Elevation + c.Lithology + c.USCS + c.Description + c.Well + c.Callouts
	if sum <= 0 {
		return Letter.columns()
	}
	return Columns{c.Depth / sum, c.Elevation / sum, c.Lithology / sum, c.USCS / sum, c.Description / sum, c.Well / sum, c.Callouts / sum}
}
