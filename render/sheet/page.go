package sheet

import "fmt"

// Page is a sheet size with its margin, in points. Column fractions give
// the share of the body width each column takes.
type Page struct {
	Name          string
	Width, Height float64
	Margin        float64
	Columns       Columns
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

// Landscape turns the page.
func (p Page) Landscape() Page {
	if p.Width < p.Height {
		p.Width, p.Height = p.Height, p.Width
	}
	return p
}

func (p Page) check() error {
	if p.Width < 300 || p.Height < 300 || p.Margin < 0 || p.Margin > 72 {
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
