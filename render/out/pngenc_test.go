package out

import (
	"bytes"
	"image"
	"image/color"
	"image/png"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
)

// TestOpaquePNGDecodes: the PNG written by encodeOpaquePNG decodes with
// the standard library's decoder (image/png, a general reader of the PNG
// specification) to the very pixels rasterised, and ImageMagick's
// identify, where installed, reads it as an 8-bit sRGB image of the
// right size.
func TestOpaquePNGDecodes(t *testing.T) {
	img := image.NewRGBA(image.Rect(0, 0, 301, 97))
	for y := 0; y < 97; y++ {
		for x := 0; x < 301; x++ {
			img.SetRGBA(x, y, color.RGBA{uint8(x * 7), uint8(y * 13), uint8(x ^ y), 255})
		}
	}
	b, ok := encodeOpaquePNG(img)
	if !ok {
		t.Fatal("an opaque image was refused")
	}
	back, err := png.Decode(bytes.NewReader(b))
	if err != nil {
		t.Fatal(err)
	}
	if back.Bounds() != img.Bounds() {
		t.Fatalf("bounds %v, want %v", back.Bounds(), img.Bounds())
	}
	for y := 0; y < 97; y++ {
		for x := 0; x < 301; x++ {
			if got, want := color.RGBAModel.Convert(back.At(x, y)), img.At(x, y); got != want {
				t.Fatalf("pixel %d,%d: %v, want %v", x, y, got, want)
			}
		}
	}
	if _, err := exec.LookPath("identify"); err == nil {
		f := filepath.Join(t.TempDir(), "a.png")
		if err := os.WriteFile(f, b, 0o644); err != nil {
			t.Fatal(err)
		}
		out, err := exec.Command("identify", f).CombinedOutput()
		if err != nil || !strings.Contains(string(out), "PNG 301x97") || !strings.Contains(string(out), "8-bit") {
			t.Errorf("identify: %s %v", out, err)
		}
	}
}

// TestOpaquePNGRefusesAlpha: a raster with a see-through pixel is left
// to image/png, which keeps the alpha channel.
func TestOpaquePNGRefusesAlpha(t *testing.T) {
	img := image.NewRGBA(image.Rect(0, 0, 4, 4))
	for i := range img.Pix {
		img.Pix[i] = 255
	}
	img.Pix[4*5+3] = 128
	if _, ok := encodeOpaquePNG(img); ok {
		t.Error("a raster with alpha was written without it")
	}
}
