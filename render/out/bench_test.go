package out

import (
	"fmt"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
)

// benchDoc is one Tabloid page of about 4,000 items, in the mix a deep
// well's sheet holds: pattern strokes and dots, boxes, labels, and a
// clipped column.
func benchDoc() *draw.Document {
	p := &draw.Page{Width: 792, Height: 1224}
	thin := draw.Style{Stroke: draw.Black, StrokeWidth: 0.4}
	var clipped []draw.Item
	for i := 0; i < 1000; i++ {
		y := 40 + float64(i)*1.1
		p.Add(draw.Shape{Points: []draw.Point{{X: 40, Y: y}, {X: 90, Y: y + 6}}, Style: thin})
		p.Add(draw.Circle{Center: draw.Point{X: 100 + float64(i%40), Y: y}, R: 0.6, Style: draw.Style{Fill: draw.Black}})
		if i%4 == 0 {
			p.Add(draw.Box{Rect: draw.Rect{X: 150, Y: y, W: 60, H: 4}, Style: draw.Style{Fill: draw.RGB(230, 220, 180), Stroke: draw.Black}})
			p.Add(draw.Text{At: draw.Point{X: 220, Y: y + 4}, S: fmt.Sprintf("%.1f ft — silty SAND, fine, brown", float64(i)/4), Size: 6})
		}
		clipped = append(clipped, draw.Shape{Points: []draw.Point{{X: 290, Y: y - 10}, {X: 330, Y: y + 10}}, Style: thin})
	}
	p.Add(draw.Clip{Rect: draw.Rect{X: 300, Y: 40, W: 20, H: 1100}, Items: clipped})
	return &draw.Document{Title: "bench", Date: "2024-01-01T00:00:00Z", Pages: []*draw.Page{p}}
}

func BenchmarkSVG(b *testing.B) {
	doc := benchDoc()
	for b.Loop() {
		if _, err := SVG(doc, 0); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkPDF(b *testing.B) {
	doc := benchDoc()
	for b.Loop() {
		if _, err := PDF(doc); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkPNG(b *testing.B) {
	doc := benchDoc()
	for b.Loop() {
		if _, err := PNG(doc, 0, 150); err != nil {
			b.Fatal(err)
		}
	}
}
