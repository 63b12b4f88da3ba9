package symbols

import (
	"fmt"

	"github.com/tremie-dev/tremie/render/draw"
)

// SheetExamples are dual soils shown on the symbol sheet beside the table.
var SheetExamples = []string{"SP-SM", "GW-GC", "CL-ML", "SC-SM"}

// SymbolSheet lays out every symbol of the table, and a few dual soils, as
// labelled swatches on pages of the given size (points): a reference
// card, and what the tests and a reviewer look at to judge the set.
func SymbolSheet(width, height float64) []*draw.Page {
	const margin, rowH, swW, swH, gap = 36.0, 30.0, 44.0, 24.0, 10.0
	colW := (width - 2*margin) / 2
	var pages []*draw.Page
	var page *draw.Page
	y, col := 0.0, 0
	newPage := func() {
		page = &draw.Page{Width: width, Height: height}
		pages = append(pages, page)
		page.Add(draw.Text{At: draw.Point{X: margin, Y: margin}, S: fmt.Sprintf("tremie symbol set — sheet %d", len(pages)), Size: 12, Font: draw.Bold, Color: draw.Black})
		y, col = margin+16, 0
	}
	// Dual soils follow the single groups.
	var list []Symbol
	for _, s := range All() {
		list = append(list, s)
		if s.ID == soilSymbols[len(soilSymbols)-1].ID {
			for _, code := range SheetExamples {
				if d, ok := ForUSCS(code); ok {
					list = append(list, d)
				}
			}
		}
	}
	newPage()
	last := Kind(-1)
	for _, s := range list {
		if s.Kind != last {
			if col != 0 {
				col, y = 0, y+rowH
			}
			if y+rowH*2 > height-margin {
				newPage()
			}
			page.Add(draw.Text{At: draw.Point{X: margin, Y: y + 14}, S: kindTitle(s.Kind), Size: 10, Font: draw.Bold, Color: draw.Black})
			y += 20
			last = s.Kind
		}
		if y+rowH > height-margin {
			newPage()
		}
		x := margin + float64(col)*colW
		page.Add(s.Swatch(draw.Rect{X: x, Y: y, W: swW, H: swH})...)
		label := s.Name
		if s.Code != "" {
			label = s.Code + " — " + s.Name
		}
		for k, line := range draw.Wrap(draw.Regular, 8, label, colW-swW-gap-4) {
			if k > 1 {
				break
			}
			page.Add(draw.Text{At: draw.Point{X: x + swW + gap, Y: y + 10 + float64(k)*9.5}, S: line, Size: 8, Color: draw.Black})
		}
		page.Add(draw.Text{At: draw.Point{X: x + swW + gap, Y: y + swH + 1}, S: s.ID, Size: 6, Font: draw.Mono, Color: draw.RGB(90, 90, 90)})
		col++
		if col == 2 {
			col, y = 0, y+rowH
		}
	}
	return pages
}

func kindTitle(k Kind) string {
	switch k {
	case Lithology:
		return "Lithology"
	case Material:
		return "Annular fill"
	default:
		return "Well parts"
	}
}
