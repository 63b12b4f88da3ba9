package out

import (
	"image"
	stddraw "image/draw"
	"testing"

	"github.com/tdewolff/canvas"
	"github.com/tdewolff/canvas/renderers/rasterizer"

	"github.com/tremie-dev/tremie/render/draw"
)

// rasterBoth draws with fn on canvas's rasterizer and on pngRenderer, 60 ×
// 40 mm at 10 px/mm on white.
func rasterBoth(fn func(r canvas.Renderer, png *pngRenderer)) (want, got *image.RGBA) {
	res := canvas.DPMM(10)
	make := func() *image.RGBA {
		img := image.NewRGBA(image.Rect(0, 0, 600, 400))
		stddraw.Draw(img, img.Bounds(), image.White, image.Point{}, stddraw.Src)
		return img
	}
	want, got = make(), make()
	ref := rasterizer.FromImage(want, res, canvas.DefaultColorSpace)
	fn(ref, nil)
	ref.Close()
	ours := newPNGRenderer(got, res)
	fn(ours, ours)
	ours.Close()
	return want, got
}

// maxDiff is the largest difference of any channel of any pixel, and how
// many pixels differ at all.
func maxDiff(a, b *image.RGBA) (most, n int) {
	for i := 0; i < len(a.Pix); i += 4 {
		d := 0
		for k := 0; k < 3; k++ {
			e := int(a.Pix[i+k]) - int(b.Pix[i+k])
			d = max(d, e, -e)
		}
		if d > 0 {
			n++
		}
		most = max(most, d)
	}
	return most, n
}

// Fed right to left, canvas's rasterizer paints the same pixels: its
// scanner sums each cell's coverage in integers, whatever the order.
// canvas's own rasterizer drawing the same paths is the reference.
func TestPNGRendererPaintsLikeCanvas(t *testing.T) {
	fonts := takeFonts()
	defer fonts.giveBack()
	line, err := fonts.line(0, 9, rgba(draw.Black), "A line of text, set left to right — 1,200 ft")
	if err != nil {
		t.Fatal(err)
	}
	want, got := rasterBoth(func(r canvas.Renderer, _ *pngRenderer) {
		marks := &canvas.Path{}
		for i := 0; i < 40; i++ {
			x := 2 + float64(i)*1.4
			marks.MoveTo(x, 30)
			marks.LineTo(x+3, 38)
			addCircle(marks, canvas.Point{X: x, Y: 25}, 0.6, false)
		}
		st := canvas.DefaultStyle
		st.Fill = canvas.Paint{Color: rgba(draw.Black)}
		st.Stroke = canvas.Paint{Color: rgba(draw.Black)}
		st.StrokeWidth = 0.2
		r.RenderPath(marks, st, canvas.Identity)
		dashed := st
		dashed.Fill = canvas.Paint{}
		dashed.Dashes = []float64{3, 1}
		r.RenderPath(canvas.Rectangle(50, 10).Translate(4, 2), dashed, canvas.Identity)
		r.RenderText(line, canvas.Identity.Translate(3, 16))
	})
	if most, n := maxDiff(want, got); n > 0 {
		t.Errorf("%d pixels differ from canvas's rasterizer, by up to %d/255", n, most)
	}
}

// A mark's stroke given as area (rasterStrokeArea, ringArea) paints what
// canvas's general stroker paints: triangles with mitred corners, one
// sharp enough to be bevelled (miter limit 4, SVG 1.1 §11.4
// stroke-miterlimit), one too small to keep a hole, a square, straight
// segments and rings, all in one colour as a pattern's marks are.
func TestStrokeAreaPaintsLikeCanvasStroker(t *testing.T) {
	const w = 0.5
	polys := [][]canvas.Point{
		{{X: 5, Y: 5}, {X: 15, Y: 5}, {X: 10, Y: 13}},     // mitred
		{{X: 20, Y: 5}, {X: 40, Y: 7}, {X: 20, Y: 9}},     // one corner past the limit
		{{X: 45, Y: 5}, {X: 46, Y: 5}, {X: 45.5, Y: 5.8}}, // the stroke fills it
		{{X: 5, Y: 20}, {X: 5, Y: 30}, {X: 15, Y: 30}, {X: 15, Y: 20}},
	}
	segs := [][2]canvas.Point{{{X: 20, Y: 20}, {X: 35, Y: 32}}, {{X: 22, Y: 20}, {X: 37, Y: 32}}}
	rings := []struct {
		c canvas.Point
		r float64
	}{{canvas.Point{X: 45, Y: 25}, 3}, {canvas.Point{X: 52, Y: 25}, 0.2}}
	st := canvas.DefaultStyle
	st.Fill = canvas.Paint{}
	st.Stroke = canvas.Paint{Color: rgba(draw.Black)}
	st.StrokeWidth = w
	want, got := rasterBoth(func(r canvas.Renderer, png *pngRenderer) {
		whole, area := &canvas.Path{}, &canvas.Path{}
		for _, pts := range polys {
			a := rasterStrokeArea(pts, true, w/2)
			if png != nil && a == nil {
				t.Fatalf("polygon %v: no stroke area", pts)
			}
			area = area.Append(a)
			whole.MoveTo(pts[0].X, pts[0].Y)
			for _, q := range pts[1:] {
				whole.LineTo(q.X, q.Y)
			}
			whole.Close()
		}
		for _, s := range segs {
			area = area.Append(rasterStrokeArea(s[:], false, w/2))
			whole.MoveTo(s[0].X, s[0].Y)
			whole.LineTo(s[1].X, s[1].Y)
		}
		for _, c := range rings {
			if png != nil {
				area = area.Append(png.ringArea(c.c, c.r, w/2))
			}
			addCircle(whole, c.c, c.r, false)
		}
		if png == nil {
			r.RenderPath(whole, st, canvas.Identity)
			return
		}
		png.renderPath(&canvas.Path{}, st, canvas.Identity, nil, area)
	})
	// Same outlines to rounding: a pixel may differ where a coordinate
	// rounds to the scanner's 1/64 px the other way.
	most, n := maxDiff(want, got)
	t.Logf("%d pixels differ, by up to %d/255", n, most)
	if most > 4 || n > 40 {
		t.Errorf("%d pixels differ from canvas's stroker, by up to %d/255", n, most)
	}
}

// A concave polygon, or one with a repeated point, is left to canvas.
func TestStrokeAreaLeavesOtherShapes(t *testing.T) {
	concave := []canvas.Point{{X: 0, Y: 0}, {X: 10, Y: 0}, {X: 5, Y: 2}, {X: 5, Y: 10}}
	if rasterStrokeArea(concave, true, 0.5) != nil {
		t.Error("a concave polygon got a stroke area")
	}
	repeated := []canvas.Point{{X: 0, Y: 0}, {X: 10, Y: 0}, {X: 10, Y: 0}, {X: 5, Y: 8}}
	if rasterStrokeArea(repeated, true, 0.5) != nil {
		t.Error("a polygon with a repeated point got a stroke area")
	}
	if rasterStrokeArea(concave[:3], false, 0.5) != nil {
		t.Error("an open polyline got a stroke area")
	}
}
