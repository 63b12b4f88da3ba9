package wallimage

import (
	"bytes"
	"encoding/binary"
	"errors"
	"hash/crc32"
	"image"
	"image/color"
	"image/jpeg"
	"image/png"
	"os"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
	"time"

	"github.com/tremie-dev/tremie/schema"
	"golang.org/x/image/tiff"
)

func demoWell(t *testing.T) *schema.Well {
	t.Helper()
	w, err := schema.LoadFile("../../cmd/tremie/demo/wells/BR-1.toml")
	if err != nil {
		t.Fatal(err)
	}
	return w
}

// The demo image is made the same each time, and reads back at its size.
func TestSynthesizeDeterministic(t *testing.T) {
	w := demoWell(t)
	a, err := Synthesize(w, w.WallImages[0], 360, 10)
	if err != nil {
		t.Fatal(err)
	}
	b, _ := Synthesize(w, w.WallImages[0], 360, 10)
	if !bytes.Equal(a, b) {
		t.Fatal("two runs differ")
	}
	im, err := Decode(a)
	if err != nil {
		t.Fatal(err)
	}
	if im.Width != 360 || im.Height != 1100 || im.Format != "png" {
		t.Errorf("decoded %d×%d %s", im.Width, im.Height, im.Format)
	}
	if dir := os.Getenv("TREMIE_LOOK"); dir != "" {
		os.WriteFile(filepath.Join(dir, "BR-1-wall.png"), a, 0o644)
	}
}

// The trace of a picked feature is dark where its sinusoid runs: the
// water-bearing fracture at 97 ft, lowest (97.36 ft) at magnetic 292°.
func TestSynthesizeDrawsTraces(t *testing.T) {
	w := demoWell(t)
	data, _ := Synthesize(w, w.WallImages[0], 360, 10)
	img, _ := png.Decode(bytes.NewReader(data))
	g := img.(*image.Gray)
	for _, f := range w.Features {
		if f.Kind != schema.WaterBearingFracture {
			continue
		}
		p := f.Orient.Picked
		for _, az := range []float64{0, 90, 180, 292} {
			y := int((p.Fit.DepthAt(az) - w.WallImages[0].Top).In(schema.Feet) * 10)
			if v := g.GrayAt(int(az), y).Y; v > 60 {
				t.Errorf("at %v° row %d the trace is %d, not dark", az, y, v)
			}
		}
	}
}

func pngOf(w, h int) []byte {
	var buf bytes.Buffer
	png.Encode(&buf, image.NewGray(image.Rect(0, 0, w, h)))
	return buf.Bytes()
}

func TestDecodeChecks(t *testing.T) {
	if _, err := Decode([]byte("GIF89a....")); err == nil {
		t.Error("GIF accepted")
	}
	if _, err := Decode([]byte("not an image at all")); err == nil || !strings.Contains(err.Error(), "not a PNG, JPEG or TIFF") {
		t.Errorf("text: %v", err)
	}
	if _, err := Decode(pngOf(4, 100)); err == nil || !strings.Contains(err.Error(), "too small") {
		t.Errorf("4 px wide: %v", err)
	}
	// A header claiming 60 001 × 10 rows is refused before decoding.
	big := pngOf(10, 10)
	binary.BigEndian.PutUint32(big[16:], 60001)
	binary.BigEndian.PutUint32(big[29:], crc32.ChecksumIEEE(big[12:29]))
	if _, err := Decode(big); err == nil || !strings.Contains(err.Error(), "too large") {
		t.Errorf("60001 px: %v", err)
	}
	// 5000 × 5000 is 25 megapixels, over the limit, though each side is fine.
	huge := pngOf(10, 10)
	binary.BigEndian.PutUint32(huge[16:], 5000)
	binary.BigEndian.PutUint32(huge[20:], 5000)
	binary.BigEndian.PutUint32(huge[29:], crc32.ChecksumIEEE(huge[12:29]))
	if _, err := Decode(huge); err == nil || !strings.Contains(err.Error(), "megapixels") {
		t.Errorf("25 Mpx: %v", err)
	}
	// A header that lies about its size: the pixels do not follow.
	lie := pngOf(10, 10)
	binary.BigEndian.PutUint32(lie[16:], 20)
	binary.BigEndian.PutUint32(lie[29:], crc32.ChecksumIEEE(lie[12:29]))
	if _, err := Decode(lie); err == nil {
		t.Error("a PNG whose header lies was accepted")
	}
}

// A strip is cut from the right rows and comes out at the size asked.
func TestStrip(t *testing.T) {
	src := image.NewGray(image.Rect(0, 0, 40, 100))
	for y := 50; y < 100; y++ {
		for x := range 40 {
			src.SetGray(x, y, color.Gray{Y: 255})
		}
	}
	var buf bytes.Buffer
	png.Encode(&buf, src)
	im, err := Decode(buf.Bytes())
	if err != nil {
		t.Fatal(err)
	}
	data, err := im.Strip(0.6, 1, 20, 30) // all white rows
	if err != nil {
		t.Fatal(err)
	}
	out, _ := png.Decode(bytes.NewReader(data))
	if b := out.Bounds(); b.Dx() != 20 || b.Dy() != 30 {
		t.Fatalf("strip %v", b)
	}
	if r, _, _, _ := out.At(10, 15).RGBA(); r>>8 != 255 {
		t.Errorf("strip of white rows is %d", r>>8)
	}
	if _, err := im.Strip(0.5, 0.4, 20, 30); err == nil {
		t.Error("inverted strip accepted")
	}
}

// TIFF and JPEG read as well as PNG, each at its own size.
func TestDecodeTIFFAndJPEG(t *testing.T) {
	src := image.NewRGBA(image.Rect(0, 0, 36, 20))
	var tb, jb bytes.Buffer
	if err := tiff.Encode(&tb, src, nil); err != nil {
		t.Fatal(err)
	}
	if err := jpeg.Encode(&jb, src, nil); err != nil {
		t.Fatal(err)
	}
	for name, data := range map[string][]byte{"tiff": tb.Bytes(), "jpeg": jb.Bytes()} {
		im, err := Decode(data)
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		if im.Format != name || im.Width != 36 || im.Height != 20 {
			t.Errorf("%s read as %s %d×%d", name, im.Format, im.Width, im.Height)
		}
	}
}

// A continuous-tone image's strip is JPEG at the stated quality, a
// few-colour one's PNG: JPEG's own header (SOI marker FF D8, from the
// JFIF/ITU T.81 standard) and PNG's signature (RFC 2083) tell them apart.
func TestStripEncoding(t *testing.T) {
	photo := image.NewRGBA(image.Rect(0, 0, 64, 64))
	for y := range 64 {
		for x := range 64 {
			photo.Set(x, y, color.RGBA{uint8(x * 4), uint8(y * 4), uint8((x + y) * 2), 255})
		}
	}
	lines := image.NewGray(image.Rect(0, 0, 64, 64))
	for x := range 64 {
		lines.SetGray(x, 32, color.Gray{Y: 255})
	}
	for _, c := range []struct {
		name string
		im   image.Image
		head []byte
	}{{"photographic", photo, []byte{0xff, 0xd8}}, {"line art", lines, []byte("\x89PNG")}} {
		var buf bytes.Buffer
		png.Encode(&buf, c.im)
		im, err := Decode(buf.Bytes())
		if err != nil {
			t.Fatal(err)
		}
		data, err := im.Strip(0, 1, 16, 16)
		if err != nil {
			t.Fatal(err)
		}
		if !bytes.HasPrefix(data, c.head) {
			t.Errorf("%s strip starts % x", c.name, data[:4])
		}
		again, _ := im.Strip(0, 1, 16, 16)
		if !bytes.Equal(data, again) {
			t.Errorf("%s strip differs between runs", c.name)
		}
	}
}

// TestLoadRefusesWhatNeverEnds: a FIFO or a device named as a wall image
// is refused at once (issue 15's reproducer: a FIFO blocked render for
// ever), and a directory gets a message naming it.
func TestLoadRefusesWhatNeverEnds(t *testing.T) {
	dir := t.TempDir()
	fifo := filepath.Join(dir, "wall.png")
	if err := syscall.Mkfifo(fifo, 0o644); err != nil {
		t.Skipf("no FIFOs here: %v", err)
	}
	done := make(chan error, 1)
	go func() { _, err := Load(fifo); done <- err }()
	select {
	case err := <-done:
		if !errors.Is(err, schema.ErrNotRegular) || !strings.Contains(err.Error(), "named pipe") {
			t.Errorf("FIFO: err = %v, want a named pipe refused", err)
		}
	case <-time.After(5 * time.Second):
		t.Fatal("loading a FIFO as a wall image blocked")
	}
	link := filepath.Join(dir, "zero.png")
	if err := os.Symlink("/dev/zero", link); err == nil {
		if _, err := Load(link); !errors.Is(err, schema.ErrNotRegular) {
			t.Errorf("/dev/zero: err = %v, want it refused", err)
		}
	}
	if _, err := Load(dir); !errors.Is(err, schema.ErrNotRegular) || !strings.Contains(err.Error(), dir) {
		t.Errorf("directory: err = %v, want it refused by name", err)
	}
}
