package out

import (
	"bytes"
	"image"
	"image/png"
	"testing"

	"github.com/tdewolff/canvas"

	"github.com/tremie-dev/tremie/render/draw"
)

// recorder keeps the paths a painter sends.
type recorder struct{ paths []*canvas.Path }

func (r *recorder) Size() (float64, float64) { return 100, 100 }
func (r *recorder) RenderPath(p *canvas.Path, _ canvas.Style, _ canvas.Matrix) {
	r.paths = append(r.paths, p)
}
func (r *recorder) RenderText(*canvas.Text, canvas.Matrix) {}
func (r *recorder) RenderImage(image.Image, canvas.Matrix) {}

// Filled subpaths of one compound path all turn the same way, so under
// the non-zero rule (SVG's and PDF's default fill rule) overlapping marks
// never cancel into holes, whichever way each was given.
func TestPathFillsTurnAlike(t *testing.T) {
	cw := draw.Subpath{Closed: true, Points: []draw.Point{{X: 10, Y: 10}, {X: 30, Y: 10}, {X: 30, Y: 30}, {X: 10, Y: 30}}}
	ccw := draw.Subpath{Closed: true, Points: []draw.Point{{X: 20, Y: 20}, {X: 20, Y: 40}, {X: 40, Y: 40}, {X: 40, Y: 20}}}
	for _, clip := range []*draw.Rect{nil, {X: 0, Y: 0, W: 35, H: 100}} {
		rec := &recorder{}
		pt := &painter{r: rec, height: 100, fonts: &fontSet{}}
		pt.compound(draw.Path{Style: draw.Style{Fill: draw.Black}, Subpaths: []draw.Subpath{cw, ccw}, Circles: []draw.Disc{{Center: draw.Point{X: 25, Y: 25}, R: 3}}}, clip, "0")
		n := 0
		for _, p := range rec.paths {
			for _, sub := range p.Split() {
				n++
				if sub.CCW() != circleCCW {
					t.Errorf("clip %v: a filled subpath turns against the others", clip)
				}
			}
		}
		if n != 3 {
			t.Errorf("clip %v: %d filled subpaths, want 3", clip, n)
		}
	}
}

func rasterPage(t *testing.T, items ...draw.Item) image.Image {
	t.Helper()
	p := &draw.Page{Width: 60, Height: 60, Items: items}
	b, err := PNG(&draw.Document{Pages: []*draw.Page{p}}, 0, 288)
	if err != nil {
		t.Fatal(err)
	}
	img, err := png.Decode(bytes.NewReader(b))
	if err != nil {
		t.Fatal(err)
	}
	return img
}

func darkAt(img image.Image, xPt, yPt float64) bool {
	r, g, b, _ := img.At(int(xPt*4), int(yPt*4)).RGBA()
	return (r+g+b)/3 < 0x4000
}

// A compound path paints what its marks paint one by one: overlapping
// filled polygons of opposite turning stay filled (non-zero rule, as SVG
// and PDF fill), and what the clip cuts off stays unpainted.
func TestPathPaintsLikeItsMarks(t *testing.T) {
	ink := draw.Style{Fill: draw.Black}
	cw := draw.Subpath{Closed: true, Points: []draw.Point{{X: 10, Y: 10}, {X: 30, Y: 10}, {X: 30, Y: 30}, {X: 10, Y: 30}}}
	ccw := draw.Subpath{Closed: true, Points: []draw.Point{{X: 20, Y: 20}, {X: 20, Y: 40}, {X: 40, Y: 40}, {X: 40, Y: 20}}}
	line := draw.Subpath{Points: []draw.Point{{X: 5, Y: 50}, {X: 55, Y: 50}}}
	clip := draw.Rect{X: 0, Y: 0, W: 35, H: 60}
	img := rasterPage(t,
		draw.Clip{Rect: clip, Items: []draw.Item{
			draw.Path{Style: ink, Subpaths: []draw.Subpath{cw, ccw}, Circles: []draw.Disc{{Center: draw.Point{X: 25, Y: 25}, R: 3}}},
			draw.Path{Style: draw.Style{Stroke: draw.Black, StrokeWidth: 2}, Subpaths: []draw.Subpath{line}},
		}},
	)
	for _, c := range []struct {
		x, y float64
		dark bool
		what string
	}{
		{15, 15, true, "first square"},
		{21, 28, true, "overlap of the squares"},
		{25, 25, true, "disc"},
		{32, 32, true, "second square inside the clip"},
		{38, 38, false, "second square beyond the clip"},
		{5, 5, false, "outside every mark"},
		{20, 50, true, "stroked line inside the clip"},
		{45, 50, false, "stroked line beyond the clip"},
	} {
		if got := darkAt(img, c.x, c.y); got != c.dark {
			t.Errorf("%s at (%g, %g): dark = %v, want %v", c.what, c.x, c.y, got, c.dark)
		}
	}
}

// Each backend accepts a compound path and stays deterministic.
func TestPathInEveryBackend(t *testing.T) {
	p := &draw.Page{Width: 100, Height: 100, Items: []draw.Item{
		draw.Clip{Rect: draw.Rect{X: 10, Y: 10, W: 50, H: 50}, Items: []draw.Item{
			draw.Path{Style: draw.Style{Fill: draw.Black}, Circles: []draw.Disc{{Center: draw.Point{X: 12, Y: 12}, R: 4}, {Center: draw.Point{X: 30, Y: 30}, R: 1}}},
			draw.Path{Style: draw.Style{Stroke: draw.Black, Dash: []float64{2, 1}}, Subpaths: []draw.Subpath{{Points: []draw.Point{{X: 0, Y: 20}, {X: 90, Y: 25}, {X: 40, Y: 70}}}}},
		}},
	}}
	doc := &draw.Document{Date: "2024-01-01T00:00:00Z", Pages: []*draw.Page{p}}
	for name, f := range map[string]func() ([]byte, error){
		"svg": func() ([]byte, error) { return SVG(doc, 0) },
		"pdf": func() ([]byte, error) { return PDF(doc) },
		"png": func() ([]byte, error) { return PNG(doc, 0, 72) },
	} {
		a, err := f()
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		b, _ := f()
		if !bytes.Equal(a, b) {
			t.Errorf("%s: two runs differ", name)
		}
	}
}

// A dashed polyline whose stroke stays inside its clip (though within
// the miter reach of the edge) is written as one stroked path with its
// dash array, in the page's own lengths: SVG 1.1 §11.4 reads
// stroke-dasharray in user units, here millimetres, so a dash of 4 pt is
// 4 × 25.4/72 = 1.41111 mm whatever the stroke's width.
func TestDashedStrokeKeptAsStroke(t *testing.T) {
	p := &draw.Page{Width: 100, Height: 100, Items: []draw.Item{
		draw.Clip{Rect: draw.Rect{X: 10, Y: 10, W: 50, H: 50}, Items: []draw.Item{
			draw.Path{Style: draw.Style{Stroke: draw.Black, StrokeWidth: 2, Dash: []float64{4, 2}},
				Subpaths: []draw.Subpath{{Points: []draw.Point{{X: 12, Y: 20}, {X: 30, Y: 24}, {X: 58, Y: 20}}}}},
		}},
	}}
	b, err := SVG(&draw.Document{Date: "2024-01-01T00:00:00Z", Pages: []*draw.Page{p}}, 0)
	if err != nil {
		t.Fatal(err)
	}
	if !bytes.Contains(b, []byte("stroke-dasharray:1.41111 .705556")) {
		t.Errorf("no stroked path with a 4-pt, 2-pt dash array in\n%s", b)
	}
	if bytes.Count(b, []byte("<path")) != 1 {
		t.Errorf("want the polyline as one path, got %d", bytes.Count(b, []byte("<path")))
	}
}
