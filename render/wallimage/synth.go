package wallimage

import (
	"bytes"
	"fmt"
	"image"
	"image/color"
	"image/png"
	"math"

	"github.com/tremie-dev/tremie/schema"
)

// Synthesize makes an unwrapped wall image of our own for a well's
// [[wall_image]]: a granite-like texture (two scales of smooth noise, dark
// and light grains, faint banding) with the trace of every feature picked
// on that image drawn as a dark sinusoid, wider for a wider aperture. The
// same well gives the same bytes. It serves the demo and tests; width is
// the number of columns (360 is one a degree) and rowsPerUnit the rows per
// file depth unit.
func Synthesize(w *schema.Well, im schema.WallImage, width int, rowsPerUnit float64) ([]byte, error) {
	u := w.Units.Depth
	rows := int(math.Round((im.Bottom - im.Top).In(u) * rowsPerUnit))
	if width < MinSide || rows < MinSide || width > 4096 || rows > workHeight {
		return nil, fmt.Errorf("image %q: %d×%d pixels is outside %d–%d", im.Name, width, rows, MinSide, workHeight)
	}
	g := image.NewGray(image.Rect(0, 0, width, rows))
	for y := range rows {
		for x := range width {
			// Columns wrap around the hole: noise is periodic across.
			v := 0.55*valueNoise(x, y, 24, width) + 0.3*valueNoise(x+977, y+311, 6, width) + 0.15*valueNoise(x+31, y+57, 2, width)
			grain := hash01(x, y, 99)
			c := 120 + 70*v
			switch {
			case grain > 0.985: // dark mica
				c = 45 + 30*hash01(x, y, 5)
			case grain > 0.955: // light feldspar
				c = 205 + 30*hash01(x, y, 6)
			}
			c += 6 * math.Sin(float64(y)/rowsPerUnit*2.1) // faint banding
			// Levels of 8 keep the file small; the eye sees no steps in
			// a noisy texture.
			g.SetGray(x, y, color.Gray{Y: uint8(max(0, min(255, math.Round(c/8)*8)))})
		}
	}
	for i := range w.Features {
		f := &w.Features[i]
		p := f.Orient.Picked
		if p == nil || f.Image != im.Name {
			continue
		}
		half := 1.2
		if f.Aperture > 0 {
			half = max(half, f.Aperture.Inches()*6)
		}
		ink := 30.0
		if f.IsWaterBearing() {
			ink = 10
		}
		for x := range width {
			az := im.AzimuthAt((float64(x) + 0.5) / float64(width))
			z := p.Fit.DepthAt(az)
			yc := (z - im.Top).In(u) * rowsPerUnit
			for y := int(yc - half - 1); y <= int(yc+half+1); y++ {
				if y < 0 || y >= rows {
					continue
				}
				d := math.Abs(float64(y) + 0.5 - yc)
				if d > half+0.5 {
					continue
				}
				a := min(1, half+0.5-d) // antialiased edge
				old := float64(g.GrayAt(x, y).Y)
				g.SetGray(x, y, color.Gray{Y: uint8(old*(1-a) + ink*a)})
			}
		}
	}
	var buf bytes.Buffer
	if err := (&png.Encoder{CompressionLevel: png.BestCompression}).Encode(&buf, g); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}

// hash01 is a deterministic pseudo-random value in [0, 1) for a lattice
// point and a seed (an integer mix after the splitmix64 finaliser).
func hash01(x, y, seed int) float64 {
	h := uint64(x)*0x9E3779B97F4A7C15 ^ uint64(y)*0xC2B2AE3D27D4EB4F ^ uint64(seed)*0x165667B19E3779F9
	h ^= h >> 30
	h *= 0xBF58476D1CE4E5B9
	h ^= h >> 27
	h *= 0x94D049BB133111EB
	h ^= h >> 31
	return float64(h>>11) / float64(1<<53)
}

// valueNoise is smooth noise with lattice spacing cell, periodic in x
// with period width.
func valueNoise(x, y, cell, width int) float64 {
	period := max(1, width/cell)
	fx, fy := float64(x)/float64(cell), float64(y)/float64(cell)
	x0, y0 := int(math.Floor(fx)), int(math.Floor(fy))
	tx, ty := smooth(fx-float64(x0)), smooth(fy-float64(y0))
	at := func(i, j int) float64 { return hash01(((i%period)+period)%period, j, cell) }
	a := at(x0, y0)*(1-tx) + at(x0+1, y0)*tx
	b := at(x0, y0+1)*(1-tx) + at(x0+1, y0+1)*tx
	return a*(1-ty) + b*ty
}

func smooth(t float64) float64 { return t * t * (3 - 2*t) }

// DemoImages makes every [[wall_image]] of a well with Synthesize: 360
// columns (one a degree) and 15 rows a foot (or 50 a metre), PNG bytes
// by the image's file name as written.
func DemoImages(w *schema.Well) (map[string][]byte, error) {
	rows := 15.0
	if !w.Units.Imperial() {
		rows = 50
	}
	out := map[string][]byte{}
	for _, im := range w.WallImages {
		data, err := Synthesize(w, im, 360, rows)
		if err != nil {
			return nil, err
		}
		out[im.File] = data
	}
	return out, nil
}
