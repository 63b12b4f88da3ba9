package out

import (
	"bytes"
	"fmt"
	"image"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
)

// maskTolerance is the largest difference, in 8-bit levels of a channel,
// that drawing a glyph from its mask may make against drawing it from its
// outline: a pen position kept to 1/16 pixel moves an edge by at most
// 1/32 pixel, so an edge pixel's coverage by at most 1/32 of full (8
// levels), twice where a pixel holds two edges (common practice: 1/16
// pixel positioning is finer than the quarter pixel text engines use).
const maskTolerance = 16

// textPage is a Letter page of labels in the three faces, several sizes
// and colours, anchors and tight pairs (AV, ff, 1,1), the kind and mix of
// text a sheet draws.
func textPage() *draw.Page {
	p := &draw.Page{Width: 612, Height: 792}
	faces := []draw.FontStyle{draw.Regular, draw.Bold, draw.Italic}
	colours := []draw.Color{draw.Black, draw.RGB(200, 90, 10), draw.RGB(90, 90, 90)}
	anchors := []draw.Anchor{draw.Start, draw.Middle, draw.End}
	y := 30.0
	for i, size := range []float64{5.5, 6, 7, 8, 9.5, 12, 16} {
		for k := 0; k < 9; k++ {
			p.Add(draw.Text{
				At:     draw.Point{X: 40 + 61.3*float64(k) + 0.37*float64(i), Y: y},
				S:      fmt.Sprintf("AVff %d,1%d.5 ft — silty SAND", 100+k*i, k),
				Size:   size,
				Font:   faces[(i+k)%3],
				Color:  colours[k%3],
				Anchor: anchors[(i*k)%3],
			})
			y += size * 1.15
		}
	}
	return p
}

// The raster's text from glyph masks against canvas's rasteriser drawing
// every glyph from its outline (the reference): each pixel within the
// stated tolerance, and the ink of the page the same to 0.2 %.
func TestGlyphMasksDrawLikeOutlines(t *testing.T) {
	for _, dpi := range []float64{96, 150, 300} {
		p := textPage()
		want, err := raster(p, dpi, false)
		if err != nil {
			t.Fatal(err)
		}
		got, err := raster(p, dpi, true)
		if err != nil {
			t.Fatal(err)
		}
		most, n := maxDiff(want, got)
		wantInk, gotInk := ink(want), ink(got)
		t.Logf("%g dpi: %d pixels differ, at most by %d; ink %d and %d", dpi, n, most, wantInk, gotInk)
		if most > maskTolerance {
			t.Errorf("%g dpi: a pixel differs by %d levels, more than %d", dpi, most, maskTolerance)
		}
		if d := float64(gotInk-wantInk) / float64(wantInk); d > 0.002 || d < -0.002 {
			t.Errorf("%g dpi: ink %d from masks, %d from outlines (%+.2f %%)", dpi, gotInk, wantInk, 100*d)
		}
		if wantInk == 0 {
			t.Errorf("%g dpi: no text drawn", dpi)
		}
	}
}

// ink is the darkness a raster holds: the sum over pixels and channels of
// 255 less the level.
func ink(img *image.RGBA) int {
	s := 0
	for i := 0; i < len(img.Pix); i += 4 {
		s += 3*255 - int(img.Pix[i]) - int(img.Pix[i+1]) - int(img.Pix[i+2])
	}
	return s
}

// Turned text, and glyphs too large for a mask, are drawn from their
// outlines as before: the same bytes with masks on or off.
func TestGlyphMasksLeaveOutlinesWhereNeeded(t *testing.T) {
	for name, c := range map[string]struct {
		text draw.Text
		dpi  float64
	}{
		"turned":    {draw.Text{At: draw.Point{X: 100, Y: 300}, S: "Depth below ground, ft", Size: 8, Rotate: 90}, 150},
		"too large": {draw.Text{At: draw.Point{X: 40, Y: 100}, S: "DS-1200", Size: 40}, 300},
	} {
		p := &draw.Page{Width: 612, Height: 792}
		p.Add(c.text)
		want, err := raster(p, c.dpi, false)
		if err != nil {
			t.Fatal(err)
		}
		got, err := raster(p, c.dpi, true)
		if err != nil {
			t.Fatal(err)
		}
		if !bytes.Equal(want.Pix, got.Pix) {
			most, n := maxDiff(want, got)
			t.Errorf("%s: %d pixels differ, by up to %d", name, n, most)
		}
		if ink(got) == 0 {
			t.Errorf("%s: nothing drawn", name)
		}
	}
}
