package symbols

import (
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
)

// BenchmarkColumnPDF draws a full-height well column's worth of each
// fill material (30 × 700 pt each) and writes it as PDF: the clipping
// cost of patterns at the column edges.
func BenchmarkColumnPDF(b *testing.B) {
	p := &draw.Page{Width: 792, Height: 1224}
	for i, s := range materialSymbols {
		p.Add(s.Paint(draw.Rect{X: 20 + float64(i)*40, Y: 40, W: 30, H: 700})...)
	}
	doc := &draw.Document{Pages: []*draw.Page{p}}
	for b.Loop() {
		if _, err := out.PDF(doc); err != nil {
			b.Fatal(err)
		}
	}
}
