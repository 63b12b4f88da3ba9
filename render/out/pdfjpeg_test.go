package out

import (
	"bytes"
	"image"
	"image/color"
	"image/jpeg"
	"strconv"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
)

func testJPEG(t *testing.T, gray bool, w, h int) []byte {
	t.Helper()
	var img image.Image
	if gray {
		g := image.NewGray(image.Rect(0, 0, w, h))
		for i := range g.Pix {
			g.Pix[i] = byte(i * 7)
		}
		img = g
	} else {
		c := image.NewRGBA(image.Rect(0, 0, w, h))
		for y := 0; y < h; y++ {
			for x := 0; x < w; x++ {
				c.Set(x, y, color.RGBA{R: byte(x * 9), G: byte(y * 5), B: 90, A: 255})
			}
		}
		img = c
	}
	var b bytes.Buffer
	if err := jpeg.Encode(&b, img, &jpeg.Options{Quality: 60}); err != nil {
		t.Fatal(err)
	}
	return b.Bytes()
}

// A JPEG drawn whole goes into the PDF as its own bytes, a DCTDecode
// image of its size and colour space (ISO 32000-1, 7.4.8 and 8.9.5),
// not decoded and encoded again; one cut by a clip is still drawn (by
// canvas, from its pixels), and the file stays deterministic.
func TestPDFPassesJPEGThrough(t *testing.T) {
	gray, rgb, cut := testJPEG(t, true, 40, 90), testJPEG(t, false, 30, 20), testJPEG(t, false, 50, 50)
	p := &draw.Page{Width: 300, Height: 300, Items: []draw.Item{
		draw.Image{Rect: draw.Rect{X: 10, Y: 10, W: 40, H: 90}, Data: gray},
		draw.Clip{Rect: draw.Rect{X: 100, Y: 10, W: 100, H: 100}, Items: []draw.Item{
			draw.Image{Rect: draw.Rect{X: 100, Y: 10, W: 30, H: 20}, Data: rgb},
			draw.Image{Rect: draw.Rect{X: 180, Y: 90, W: 50, H: 50}, Data: cut},
		}},
	}}
	doc := &draw.Document{Date: "2024-01-01T00:00:00Z", Pages: []*draw.Page{p}}
	b, err := PDF(doc)
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		data  []byte
		w, h  int
		space string
	}{{gray, 40, 90, "DeviceGray"}, {rgb, 30, 20, "DeviceRGB"}} {
		dict := "<</BitsPerComponent 8/ColorSpace/" + c.space + "/Filter/DCTDecode/Height " + strconv.Itoa(c.h) +
			"/Interpolate true/Length " + strconv.Itoa(len(c.data)) + "/Subtype/Image/Type/XObject/Width " + strconv.Itoa(c.w) + ">>stream\n"
		if !bytes.Contains(b, append([]byte(dict), c.data...)) {
			t.Errorf("%d × %d %s JPEG not passed through as %q", c.w, c.h, c.space, dict)
		}
	}
	if bytes.Contains(b, cut) {
		t.Error("the JPEG cut by its clip went in whole")
	}
	if n := bytes.Count(b, []byte("/Subtype/Image")); n != 3 {
		t.Errorf("%d images in the PDF, want 3", n)
	}
	again, _ := PDF(doc)
	if !bytes.Equal(b, again) {
		t.Error("two runs differ")
	}
}
