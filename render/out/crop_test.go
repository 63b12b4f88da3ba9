package out

import (
	"bytes"
	"encoding/base64"
	"image"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
)

// opaqueImage hides an *image.RGBA behind the image.Image interface, so
// cropImage takes its general path (At and Set, the standard library's
// colour model) for the same pixels.
type opaqueImage struct{ image.Image }

// TestCropImageDirectCopy: cropping an RGBA wall-image strip by copying
// its bytes gives exactly what cropping it colour by colour gives, for a
// coarse image that is enlarged and for a fine one that is not.
func TestCropImageDirectCopy(t *testing.T) {
	src := image.NewRGBA(image.Rect(0, 0, 37, 23))
	for i := range src.Pix {
		src.Pix[i] = uint8(i * 31)
	}
	cases := []struct{ r, v draw.Rect }{
		{draw.Rect{X: 10, Y: 20, W: 74, H: 46}, draw.Rect{X: 13.3, Y: 21.7, W: 50.2, H: 30.05}}, // 0.5 px/pt: enlarged
		{draw.Rect{X: 0, Y: 0, W: 3.7, H: 2.3}, draw.Rect{X: 0.5, Y: 0, W: 2, H: 2.3}},          // 10 px/pt
	}
	for i, c := range cases {
		fast, fr := cropImage(src, c.r, c.v)
		slow, sr := cropImage(opaqueImage{src}, c.r, c.v)
		if fr != sr || fast.Bounds() != slow.Bounds() {
			t.Fatalf("case %d: placed %v %v, want %v %v", i, fr, fast.Bounds(), sr, slow.Bounds())
		}
		if !bytes.Equal(fast.(*image.RGBA).Pix, slow.(*image.RGBA).Pix) {
			t.Errorf("case %d: the direct copy differs from the general path", i)
		}
	}
}

// TestNearlySameRect: a clip that meets an image's rectangle but for
// rounding (the demo's wall image: 51.66384 against 51.66383999999999 pt)
// leaves the image uncut; a real cut, however thin, does not.
func TestNearlySameRect(t *testing.T) {
	r := draw.Rect{X: 252.56, Y: 293.5, W: 51.66384, H: 198}
	v := intersect(r, draw.Rect{X: 252.56, Y: 293.5, W: 51.66383999999999, H: 198})
	if !nearlySame(v, r) {
		t.Errorf("%v and %v differ only by rounding", v, r)
	}
	if nearlySame(draw.Rect{X: 252.56, Y: 293.5, W: 51.6, H: 198}, r) {
		t.Error("a cut of 0.06 pt taken for rounding")
	}
}

// TestSVGEmbedsImageBytes: an image drawn whole goes into the SVG as its
// own bytes, not encoded again; one cut by its clip is encoded from the
// cut pixels.
func TestSVGEmbedsImageBytes(t *testing.T) {
	data := testImage()
	whole := &draw.Page{Width: 200, Height: 100, Items: []draw.Item{
		draw.Image{Rect: draw.Rect{X: 10, Y: 10, W: 40, H: 20}, Data: data},
	}}
	own := base64.StdEncoding.EncodeToString(data)
	b := must(SVG(&draw.Document{Pages: []*draw.Page{whole}}, 0))
	if !bytes.Contains(b, []byte(own)) {
		t.Error("the SVG does not carry the image's own bytes")
	}
	cut := &draw.Page{Width: 200, Height: 100, Items: []draw.Item{
		draw.Clip{Rect: draw.Rect{X: 0, Y: 0, W: 30, H: 100}, Items: []draw.Item{
			draw.Image{Rect: draw.Rect{X: 10, Y: 10, W: 40, H: 20}, Data: data},
		}},
	}}
	b = must(SVG(&draw.Document{Pages: []*draw.Page{cut}}, 0))
	if bytes.Contains(b, []byte(own)) || !bytes.Contains(b, []byte("data:image/png;base64,")) {
		t.Error("a cut image should be embedded from its cut pixels")
	}
}
