// Package wallimage reads unwrapped images of a borehole wall (PNG, JPEG,
// TIFF) with their size and format checked before anything is decoded,
// keeps them at a bounded working resolution, cuts and resamples strips
// of them for a sheet, and makes the demo's image from its picks.
package wallimage

import (
	"bytes"
	"errors"
	"fmt"
	"image"
	"image/draw"
	"image/jpeg"
	"image/png"
	"os"
	"path/filepath"

	"github.com/tremie-dev/tremie/schema"

	xdraw "golang.org/x/image/draw"
	_ "golang.org/x/image/tiff" // or TIFF
)

// Limits: a file is refused before decoding when it breaks one, so no
// image can exhaust memory. An optical log 100 m long at 1 mm per row and
// 360 columns is 36 megapixels: such a log is split into several images.
const (
	MaxFileBytes = 64 << 20   // 64 MiB
	MaxPixels    = 24_000_000 // width × height: 96 MiB decoded as 8-bit RGBA
	MaxSide      = 60_000     // pixels, either side
	MinSide      = 8
	// The working copy kept after decoding: 720 columns (half a degree)
	// by 16384 rows at most, 47 MiB of RGBA at worst.
	workWidth  = 720
	workHeight = 16384
	// StripJPEGQuality is the quality a photographic strip is embedded
	// at: at 200 dpi as printed its artefacts are below what a sheet
	// shows (compared by eye with the lossless strip on the demo's BR-1),
	// and it brings that sheet within issue 15's size targets. canvas's
	// PDF writer encodes the decoded pixels again at its fixed quality
	// 75, finer than this.
	StripJPEGQuality = 65
	// lineArtColours: an image of at most this many colours is line art
	// or a flat palette, kept lossless (PNG) where JPEG would smear it.
	lineArtColours = 16
)

// Image is a decoded wall image at working resolution.
type Image struct {
	Pix           *image.RGBA
	Format        string // png, jpeg or tiff
	Width, Height int    // of the file, as decoded
	// LineArt: a palette image or one of few colours, whose strips are
	// PNG; a photographic (continuous-tone) image's strips are JPEG.
	LineArt bool
}

// ErrFormat is returned for a file that is not a PNG, JPEG or TIFF.
var ErrFormat = errors.New("not a PNG, JPEG or TIFF image")

// Load reads and checks an image file.
func Load(path string) (*Image, error) {
	// Only a regular file, within the limit: a FIFO named as the image
	// would block the render for ever, /dev/zero would never end.
	data, err := schema.ReadInput(path, MaxFileBytes)
	if err != nil {
		return nil, err
	}
	im, err := Decode(data)
	if err != nil {
		return nil, fmt.Errorf("%s: %w", path, err)
	}
	return im, nil
}

// Decode checks and decodes image bytes: the header's format and size
// first, then the pixels, whose real size must match the header's.
func Decode(data []byte) (*Image, error) {
	if len(data) > MaxFileBytes {
		return nil, fmt.Errorf("%d bytes; the limit is %d (64 MiB)", len(data), MaxFileBytes)
	}
	cfg, format, err := image.DecodeConfig(bytes.NewReader(data))
	if err != nil {
		if errors.Is(err, image.ErrFormat) {
			return nil, ErrFormat
		}
		return nil, fmt.Errorf("unreadable image header: %w", err)
	}
	switch format {
	case "png", "jpeg", "tiff":
	default:
		return nil, fmt.Errorf("%s image: %w", format, ErrFormat)
	}
	if err := checkSize(cfg.Width, cfg.Height); err != nil {
		return nil, err
	}
	src, _, err := image.Decode(bytes.NewReader(data))
	if err != nil {
		return nil, fmt.Errorf("%s image: %w", format, err)
	}
	b := src.Bounds()
	if b.Dx() != cfg.Width || b.Dy() != cfg.Height {
		return nil, fmt.Errorf("%s image decodes to %d×%d pixels but its header says %d×%d", format, b.Dx(), b.Dy(), cfg.Width, cfg.Height)
	}
	pix := working(src)
	_, paletted := src.(*image.Paletted)
	return &Image{Pix: pix, Format: format, Width: b.Dx(), Height: b.Dy(), LineArt: paletted || fewColours(pix, lineArtColours)}, nil
}

// fewColours says whether im has at most n distinct colours; it stops
// counting at n+1, so the set stays small whatever the image.
func fewColours(im *image.RGBA, n int) bool {
	seen := make(map[[4]uint8]struct{}, n+1)
	b := im.Bounds()
	for y := b.Min.Y; y < b.Max.Y; y++ {
		row := im.Pix[im.PixOffset(b.Min.X, y):im.PixOffset(b.Max.X, y)]
		for i := 0; i+3 < len(row); i += 4 {
			seen[[4]uint8{row[i], row[i+1], row[i+2], row[i+3]}] = struct{}{}
			if len(seen) > n {
				return false
			}
		}
	}
	return true
}

func checkSize(w, h int) error {
	switch {
	case w < MinSide || h < MinSide:
		return fmt.Errorf("image of %d×%d pixels is too small (at least %d on a side)", w, h, MinSide)
	case w > MaxSide || h > MaxSide:
		return fmt.Errorf("image of %d×%d pixels is too large (at most %d on a side)", w, h, MaxSide)
	case int64(w)*int64(h) > MaxPixels:
		return fmt.Errorf("image of %d×%d pixels is too large (at most %d megapixels)", w, h, MaxPixels/1_000_000)
	}
	return nil
}

// working copies the image to RGBA, shrunk to the working size if larger.
func working(src image.Image) *image.RGBA {
	b := src.Bounds()
	w, h := min(b.Dx(), workWidth), min(b.Dy(), workHeight)
	dst := image.NewRGBA(image.Rect(0, 0, w, h))
	if w == b.Dx() && h == b.Dy() {
		draw.Draw(dst, dst.Bounds(), src, b.Min, draw.Src)
		return dst
	}
	xdraw.ApproxBiLinear.Scale(dst, dst.Bounds(), src, b, xdraw.Src, nil)
	return dst
}

// Strip cuts the rows between fractions top and bottom of the image's
// height (0 top, 1 bottom) and resamples them to w × h pixels: as JPEG
// at StripJPEGQuality for a photographic image, as PNG for line art (see
// Image.LineArt). The caller sizes w × h to the strip as printed, so the
// bytes embedded in every format are the ones drawn.
func (im *Image) Strip(top, bottom float64, w, h int) ([]byte, error) {
	if im == nil || im.Pix == nil {
		return nil, errors.New("no image")
	}
	if !(bottom > top) || w < 1 || h < 1 || w > 4096 || h > 16384 {
		return nil, fmt.Errorf("strip %v–%v at %d×%d pixels is not drawable", top, bottom, w, h)
	}
	H := float64(im.Pix.Bounds().Dy())
	y0, y1 := int(max(0, top)*H), int(min(1, bottom)*H+0.999)
	if y1 <= y0 {
		y1 = y0 + 1
	}
	src := im.Pix.Bounds()
	src.Min.Y, src.Max.Y = y0, min(y1, src.Max.Y)
	dst := image.NewRGBA(image.Rect(0, 0, w, h))
	xdraw.CatmullRom.Scale(dst, dst.Bounds(), im.Pix, src, xdraw.Src, nil)
	var buf bytes.Buffer
	if !im.LineArt && opaque(dst) {
		var pic image.Image = dst
		if g := grey(dst); g != nil {
			pic = g // one component, not three
		}
		if err := jpeg.Encode(&buf, pic, &jpeg.Options{Quality: StripJPEGQuality}); err != nil {
			return nil, err
		}
		return buf.Bytes(), nil
	}
	if err := (&png.Encoder{CompressionLevel: png.BestCompression}).Encode(&buf, dst); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}

// grey is im as one channel when every pixel is a grey (R = G = B), else nil.
func grey(im *image.RGBA) *image.Gray {
	g := image.NewGray(im.Bounds())
	for i, j := 0, 0; i+3 < len(im.Pix); i, j = i+4, j+1 {
		if im.Pix[i] != im.Pix[i+1] || im.Pix[i] != im.Pix[i+2] {
			return nil
		}
		g.Pix[j] = im.Pix[i]
	}
	return g
}

// opaque says whether every pixel is fully opaque: JPEG has no alpha.
func opaque(im *image.RGBA) bool {
	for i := 3; i < len(im.Pix); i += 4 {
		if im.Pix[i] != 0xff {
			return false
		}
	}
	return true
}

// LoadAll reads every [[wall_image]] of a well, the files named relative
// to the well file. An image that cannot be read is left out and its
// error, naming the file and line, returned with the others.
func LoadAll(wellFile string, w *schema.Well) (map[string]*Image, []error) {
	out := map[string]*Image{}
	var errs []error
	for i, p := range Paths(wellFile, w) {
		wi := w.WallImages[i]
		im, err := Load(p)
		if err != nil {
			errs = append(errs, &schema.Error{File: w.Pos.File, Line: w.Line(wi.Path + ".file"), Key: wi.Path + ".file", Msg: "wall image: " + err.Error()})
			continue
		}
		out[wi.Name] = im
	}
	return out, errs
}

// Fingerprint names the state of a well's image files (path, size and
// modification time of each), for a cache key: a changed image redraws
// the well without being read twice.
func Fingerprint(wellFile string, w *schema.Well) []byte {
	return FingerprintOf(Paths(wellFile, w))
}

// Paths are the files of a well's [[wall_image]] tables, named relative
// to the well file.
func Paths(wellFile string, w *schema.Well) []string {
	var out []string
	for _, wi := range w.WallImages {
		p := wi.File
		if !filepath.IsAbs(p) {
			p = filepath.Join(filepath.Dir(wellFile), filepath.FromSlash(p))
		}
		out = append(out, p)
	}
	return out
}

// FingerprintOf is Fingerprint of image files already named.
func FingerprintOf(paths []string) []byte {
	var b bytes.Buffer
	for _, p := range paths {
		fmt.Fprintf(&b, "\nwall_image %q", p)
		if st, err := os.Stat(p); err == nil {
			fmt.Fprintf(&b, " %d %d", st.Size(), st.ModTime().UnixNano())
		}
	}
	return b.Bytes()
}
