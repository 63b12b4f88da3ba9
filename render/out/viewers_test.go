package out_test

// Helpers shared by the tests that open tremie's SVG in other programs'
// renderers (chromium_test.go, rsvg_test.go): the demo's sheets as the
// render command lays them out, and raster arithmetic.

import (
	"bytes"
	"fmt"
	"image"
	"image/png"
	"math"
	"os/exec"
	"path/filepath"
	"sort"
	"testing"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/pipeline"
)

// namedDoc is one well's laid-out document.
type namedDoc struct {
	name string
	doc  *draw.Document
}

// demoDocs lays out every well of the demo project as tremie render does.
func demoDocs(t testing.TB) []namedDoc {
	t.Helper()
	dir := t.TempDir()
	if err := demo.Write(dir, false); err != nil {
		t.Fatal(err)
	}
	return projectDocs(t, dir)
}

// projectDocs lays out every well under dir, sorted by file name.
func projectDocs(t testing.TB, dir string) []namedDoc {
	t.Helper()
	run, err := pipeline.Resolve([]string{dir}, pipeline.Options{Quiet: true})
	if err != nil {
		t.Fatal(err)
	}
	if len(run.Problems) > 0 {
		t.Fatalf("%s: %v", dir, run.Problems)
	}
	var docs []namedDoc
	for _, w := range run.PrepareAll(pipeline.AllRules, "") {
		if w.Err != nil {
			t.Fatalf("%s: %v", w.Path, w.Err)
		}
		doc, err := w.Layout(pipeline.LayoutOptions{Date: run.SourceDate})
		if err != nil {
			t.Fatalf("%s: %v", w.Path, err)
		}
		docs = append(docs, namedDoc{name: filepath.Base(w.Path), doc: doc})
	}
	sort.Slice(docs, func(i, j int) bool { return docs[i].name < docs[j].name })
	return docs
}

// tool finds a program on PATH or skips the test, saying why where the
// log shows it even without -v.
func tool(t *testing.T, why, install string, names ...string) string {
	t.Helper()
	for _, n := range names {
		if p, err := exec.LookPath(n); err == nil {
			return p
		}
	}
	msg := fmt.Sprintf("%s skipped: no %s on PATH (Debian: apt-get install %s; .ci/run installs it)", why, names[0], install)
	fmt.Println(msg)
	t.Skip(msg)
	return ""
}

func decodePNG(t *testing.T, b []byte) image.Image {
	t.Helper()
	img, err := png.Decode(bytes.NewReader(b))
	if err != nil {
		t.Fatalf("decode PNG: %v", err)
	}
	return img
}

// planes holds an image's red, green and blue planes as floats, 0-255.
type planes struct {
	w, h int
	c    [3][]float64
}

// planesOf reads an image's colour planes, composited on white.
func planesOf(img image.Image) planes {
	b := img.Bounds()
	p := planes{w: b.Dx(), h: b.Dy()}
	for k := range p.c {
		p.c[k] = make([]float64, p.w*p.h)
	}
	set := func(i int, r, g, bl, a float64) { // non-premultiplied, 0-255
		white := 255 - a
		p.c[0][i] = r*a/255 + white
		p.c[1][i] = g*a/255 + white
		p.c[2][i] = bl*a/255 + white
	}
	switch img := img.(type) {
	case *image.NRGBA:
		for y := 0; y < p.h; y++ {
			row := img.Pix[y*img.Stride:]
			for x := 0; x < p.w; x++ {
				q := row[4*x : 4*x+4]
				set(y*p.w+x, float64(q[0]), float64(q[1]), float64(q[2]), float64(q[3]))
			}
		}
	case *image.RGBA: // premultiplied
		for y := 0; y < p.h; y++ {
			row := img.Pix[y*img.Stride:]
			for x := 0; x < p.w; x++ {
				q := row[4*x : 4*x+4]
				white := 255 - float64(q[3])
				i := y*p.w + x
				p.c[0][i] = float64(q[0]) + white
				p.c[1][i] = float64(q[1]) + white
				p.c[2][i] = float64(q[2]) + white
			}
		}
	default:
		for y := 0; y < p.h; y++ {
			for x := 0; x < p.w; x++ {
				r, g, bl, a := img.At(b.Min.X+x, b.Min.Y+y).RGBA() // premultiplied, 16 bit
				white := float64(0xffff-a) / 257
				i := y*p.w + x
				p.c[0][i] = float64(r)/257 + white
				p.c[1][i] = float64(g)/257 + white
				p.c[2][i] = float64(bl)/257 + white
			}
		}
	}
	return p
}

// blur is a 3 × 3 box blur: it forgives a glyph edge or a hairline that
// two rasterisers put half a pixel apart. It sums rows, then columns; at
// the edges it averages the pixels that exist.
func (p planes) blur() planes {
	q := planes{w: p.w, h: p.h}
	rows := make([]float64, p.w*p.h)
	for k := range p.c {
		src, dst := p.c[k], make([]float64, len(p.c[k]))
		for y := 0; y < p.h; y++ {
			r := src[y*p.w : (y+1)*p.w]
			out := rows[y*p.w : (y+1)*p.w]
			for x := range r {
				sum := r[x]
				if x > 0 {
					sum += r[x-1]
				}
				if x+1 < p.w {
					sum += r[x+1]
				}
				out[x] = sum
			}
		}
		for y := 0; y < p.h; y++ {
			ny := 1.0
			if y > 0 {
				ny++
			}
			if y+1 < p.h {
				ny++
			}
			for x := 0; x < p.w; x++ {
				nx := 3.0
				if x == 0 || x+1 == p.w {
					nx = 2
				}
				sum := rows[y*p.w+x]
				if y > 0 {
					sum += rows[(y-1)*p.w+x]
				}
				if y+1 < p.h {
					sum += rows[(y+1)*p.w+x]
				}
				dst[y*p.w+x] = sum / (nx * ny)
			}
		}
		q.c[k] = dst
	}
	return q
}

// rasterDiff is how far two rasters of one page are apart.
type rasterDiff struct {
	meanAbs   float64 // mean absolute difference per channel, 0-255
	differ    float64 // share of pixels where some channel differs by more than diffLevel
	worstTile float64 // mean absolute difference of the worst tile, 0-255
	inkA      float64 // share of non-white pixels in each raster, a sanity check
	inkB      float64
	diffSeen  int
}

// tilePx is the side of the tiles compared on their own, in pixels: half
// an inch at 192 dpi, about one label. Edge noise spreads evenly over a
// sheet; a misplaced or re-set label piles up in its tile.
const tilePx = 96

// diffLevel is a difference in a channel that the eye sees plainly
// after the blur (common practice: about an eighth of the range).
const diffLevel = 32

func compareRasters(a, b planes) (rasterDiff, error) {
	if a.w != b.w || a.h != b.h {
		return rasterDiff{}, fmt.Errorf("rasters differ in size: %d × %d and %d × %d", a.w, a.h, b.w, b.h)
	}
	a, b = a.blur(), b.blur()
	var d rasterDiff
	n := a.w * a.h
	sum := 0.0
	for i := 0; i < n; i++ {
		worst := 0.0
		inkA, inkB := false, false
		for k := 0; k < 3; k++ {
			v := a.c[k][i] - b.c[k][i]
			if v < 0 {
				v = -v
			}
			sum += v
			worst = max(worst, v)
			inkA = inkA || a.c[k][i] < 250
			inkB = inkB || b.c[k][i] < 250
		}
		if worst > diffLevel {
			d.diffSeen++
		}
		if inkA {
			d.inkA++
		}
		if inkB {
			d.inkB++
		}
	}
	for ty := 0; ty+tilePx <= a.h; ty += tilePx {
		for tx := 0; tx+tilePx <= a.w; tx += tilePx {
			tsum := 0.0
			for y := ty; y < ty+tilePx; y++ {
				for x := tx; x < tx+tilePx; x++ {
					i := y*a.w + x
					for k := 0; k < 3; k++ {
						tsum += math.Abs(a.c[k][i] - b.c[k][i])
					}
				}
			}
			d.worstTile = max(d.worstTile, tsum/float64(3*tilePx*tilePx))
		}
	}
	d.meanAbs = sum / float64(3*n)
	d.differ = float64(d.diffSeen) / float64(n)
	d.inkA /= float64(n)
	d.inkB /= float64(n)
	return d, nil
}

// viewerSheet is one sheet the viewer tests open: page i of doc.
type viewerSheet struct {
	name    string
	doc     *draw.Document
	i       int
	gallery bool
}

func (s viewerSheet) page() *draw.Page { return s.doc.Pages[s.i] }

// galleryDir holds the gallery's invented wells, one of each kind.
const galleryDir = "../../testdata/gallery"

// galleryOpened bounds the time the viewer tests spend on the gallery:
// every sheet of each gallery well is opened except DS-1200's after the
// first, which repeat its layout down a deeper range (TW-7's two sheets
// have the match lines on both sides).
func galleryOpened(well string, i int) bool {
	return well != "DS-1200.toml" || i == 0
}

// viewerSheets lists every demo sheet, then the gallery's (galleryOpened).
func viewerSheets(t *testing.T) []viewerSheet {
	t.Helper()
	var sheets []viewerSheet
	for _, nd := range demoDocs(t) {
		for i := range nd.doc.Pages {
			sheets = append(sheets, viewerSheet{name: fmt.Sprintf("%s sheet %d", nd.name, i+1), doc: nd.doc, i: i})
		}
	}
	for _, nd := range projectDocs(t, galleryDir) {
		for i := range nd.doc.Pages {
			if galleryOpened(nd.name, i) {
				sheets = append(sheets, viewerSheet{name: fmt.Sprintf("gallery %s sheet %d", nd.name, i+1), doc: nd.doc, i: i, gallery: true})
			}
		}
	}
	return sheets
}

// nrgba gives an image's pixels as 8-bit non-premultiplied RGBA, the
// form png.Decode returns for rsvg-convert's rasters, for fast reading.
func nrgba(img image.Image) *image.NRGBA {
	if n, ok := img.(*image.NRGBA); ok {
		return n
	}
	b := img.Bounds()
	n := image.NewNRGBA(image.Rect(0, 0, b.Dx(), b.Dy()))
	for y := 0; y < b.Dy(); y++ {
		for x := 0; x < b.Dx(); x++ {
			n.Set(x, y, img.At(b.Min.X+x, b.Min.Y+y))
		}
	}
	return n
}

// eachTextPixel calls f with every fully covered pixel of an inked
// page's raster and the number (from 1) of the text whose colour it has.
func eachTextPixel(img image.Image, texts int, f func(x, y, k int)) {
	n := nrgba(img)
	w, h := n.Bounds().Dx(), n.Bounds().Dy()
	for y := 0; y < h; y++ {
		row := n.Pix[y*n.Stride:]
		for x := 0; x < w; x++ {
			p := row[4*x : 4*x+4]
			if p[3] != 255 {
				continue
			}
			if k, ok := indexOf(p[0], p[1], p[2]); ok && k <= texts {
				f(x, y, k)
			}
		}
	}
}
