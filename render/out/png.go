package out

import (
	"bytes"
	"fmt"
	"image"
	"image/png"
	"math"
	"sync"

	"github.com/tdewolff/canvas"

	"github.com/tremie-dev/tremie/render/draw"
)

// maxPixels bounds a raster so a mistaken dpi cannot exhaust memory:
// 100 megapixels is a Tabloid sheet at about 550 dpi.
const maxPixels = 100_000_000

// PixelSize is the size in pixels of a page rasterised at dpi: each side
// in inches times dpi, rounded to the nearest pixel.
func PixelSize(p *draw.Page, dpi float64) (w, h int) {
	return int(p.Width/72*dpi + 0.5), int(p.Height/72*dpi + 0.5)
}

// PNG rasterises page i (0-based) of doc at dpi on a white ground.
func PNG(doc *draw.Document, i int, dpi float64) ([]byte, error) {
	p, err := pageOf(doc, i)
	if err != nil {
		return nil, fmt.Errorf("png: %w", err)
	}
	if math.IsNaN(dpi) || dpi <= 0 || dpi > 2400 {
		return nil, fmt.Errorf("png: resolution %g dpi is outside 0–2400", dpi)
	}
	img, err := raster(p, dpi, true)
	if err != nil {
		return nil, fmt.Errorf("png page %d: %w", i+1, err)
	}
	defer giveRaster(img)
	if b, ok := encodeOpaquePNG(img); ok {
		return b, nil
	}
	var buf bytes.Buffer
	enc := png.Encoder{CompressionLevel: png.BestSpeed}
	if err := enc.Encode(&buf, img); err != nil {
		return nil, fmt.Errorf("png page %d: encode: %w", i+1, err)
	}
	return buf.Bytes(), nil
}

// raster paints page p at dpi on a white ground; masked draws text from
// glyph masks (rasterglyph.go), as PNG does, where false draws every
// glyph from its outline.
func raster(p *draw.Page, dpi float64, masked bool) (*image.RGBA, error) {
	w, h := PixelSize(p, dpi)
	if w < 1 || h < 1 || float64(w)*float64(h) > maxPixels {
		return nil, fmt.Errorf("%d × %d pixels at %g dpi is outside 1 pixel to %d megapixels", w, h, dpi, maxPixels/1_000_000)
	}
	img := takeRaster(w, h)
	r := newPNGRenderer(img, canvas.DPI(dpi))
	fonts := takeFonts()
	defer fonts.giveBack()
	if masked {
		r.masks = &fonts.masks
	}
	if err := paintPage(r, p, fonts, TextAsText, &rasterPatterns{}); err != nil {
		return nil, err
	}
	r.Close()
	return img, nil
}

// rasters keeps the pixels of sheets already written, for the next sheet
// to paint on: a sheet's raster is megabytes that would be zeroed by the
// allocator, then painted white, then left to the collector.
var rasters sync.Pool

// takeRaster returns a white w × h raster.
func takeRaster(w, h int) *image.RGBA {
	n := 4 * w * h
	var pix []byte
	if b, ok := rasters.Get().(*[]byte); ok && cap(*b) >= n {
		pix = (*b)[:n]
	} else {
		pix = make([]byte, n)
	}
	pix[0] = 0xff
	for k := 1; k < n; k *= 2 {
		copy(pix[k:], pix[:k]) // white, doubling the filled part each time
	}
	return &image.RGBA{Pix: pix, Stride: 4 * w, Rect: image.Rect(0, 0, w, h)}
}

// giveRaster hands img's pixels back once nothing refers to them.
func giveRaster(img *image.RGBA) {
	rasters.Put(&img.Pix)
}
