package out

import (
	"bytes"
	"image"
	"image/color"
	"image/png"

	"github.com/tremie-dev/tremie/render/draw"
)

// testImage is a 4 × 2 PNG: top row red, bottom row blue, so orientation
// mistakes show.
func testImage() []byte {
	img := image.NewRGBA(image.Rect(0, 0, 4, 2))
	for x := 0; x < 4; x++ {
		img.Set(x, 0, color.RGBA{220, 0, 0, 255})
		img.Set(x, 1, color.RGBA{0, 0, 220, 255})
	}
	var b bytes.Buffer
	png.Encode(&b, img)
	return b.Bytes()
}

// sampleDoc exercises every item kind, a clip, and the text the checks
// look for. Page 1 is Letter portrait, page 2 A4 landscape.
func sampleDoc() *draw.Document {
	p := &draw.Page{Width: 612, Height: 792}
	thin := draw.Style{Stroke: draw.Black, StrokeWidth: 0.5}
	p.Add(
		draw.Box{Rect: draw.Rect{X: 36, Y: 36, W: 540, H: 720}, Style: thin, Role: "frame"},
		draw.Text{At: draw.Point{X: 306, Y: 70}, S: "MW-7 construction log", Size: 18, Font: draw.Bold, Anchor: draw.Middle},
		draw.Text{At: draw.Point{X: 54, Y: 100}, S: "Screen 12.0–22.0 ft, slot 0.010 in; 12 °C ± 0.5, 250 µm", Size: 10},
		draw.Text{At: draw.Point{X: 54, Y: 116}, S: "Logged by Zoë Ångström-Núñez <script>alert(1)</script> & co", Size: 10, Font: draw.Italic},
		draw.Text{At: draw.Point{X: 558, Y: 132}, S: "right-aligned mono 0123", Size: 9, Font: draw.Mono, Anchor: draw.End, Color: draw.RGB(0, 90, 160)},
		draw.Text{At: draw.Point{X: 60, Y: 400}, S: "reads upward", Size: 10, Rotate: 90},
		draw.Shape{Points: []draw.Point{{X: 100, Y: 200}, {X: 200, Y: 260}, {X: 300, Y: 200}}, Style: draw.Style{Stroke: draw.RGB(200, 0, 0), StrokeWidth: 2, Dash: []float64{6, 3}}},
		draw.Shape{Points: []draw.Point{{X: 350, Y: 200}, {X: 450, Y: 200}, {X: 400, Y: 280}}, Closed: true, Style: draw.Style{Fill: draw.RGB(240, 200, 60), Stroke: draw.Black}},
		draw.Circle{Center: draw.Point{X: 500, Y: 240}, R: 20, Style: draw.Style{Fill: draw.Color{R: 0, G: 150, B: 0, A: 128}}},
		draw.Image{Rect: draw.Rect{X: 400, Y: 300, W: 80, H: 40}, Data: testImage(), Role: "logo"},
		draw.Clip{Rect: draw.Rect{X: 100, Y: 300, W: 200, H: 100}, Items: []draw.Item{
			draw.Box{Rect: draw.Rect{X: 80, Y: 280, W: 100, H: 60}, Style: draw.Style{Fill: draw.RGB(120, 180, 230), Stroke: draw.Black, StrokeWidth: 3}},
			draw.Circle{Center: draw.Point{X: 300, Y: 400}, R: 40, Style: draw.Style{Fill: draw.RGB(230, 120, 120)}},
			draw.Shape{Points: []draw.Point{{X: 90, Y: 390}, {X: 320, Y: 310}}, Style: draw.Style{Stroke: draw.Black, StrokeWidth: 4}},
			draw.Text{At: draw.Point{X: 150, Y: 350}, S: "inside clip", Size: 12},
			draw.Text{At: draw.Point{X: 260, Y: 330}, S: "cut at edge", Size: 14},
			draw.Image{Rect: draw.Rect{X: 250, Y: 360, W: 80, H: 40}, Data: testImage()},
		}},
		draw.Box{Rect: draw.Rect{X: 100, Y: 300, W: 200, H: 100}, Style: draw.Style{Stroke: draw.RGB(0, 0, 255)}},
	)
	p2 := &draw.Page{Width: 842, Height: 595}
	p2.Add(draw.Text{At: draw.Point{X: 72, Y: 72}, S: "Sheet 2 of 2 — match line 50.0 ft", Size: 12})
	return &draw.Document{Title: "MW-7 ‹test›", Author: "Zoë", Date: "2024-05-17T09:30:00-07:00", Pages: []*draw.Page{p, p2}}
}
