package out

import (
	"bytes"
	"image"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
	"time"

	"github.com/pdfcpu/pdfcpu/pkg/api"

	"github.com/tremie-dev/tremie/render/draw"
)

// testTiles are two small patterns whose marks reach past their cell:
// a line across the cell, a dot on a corner, a filled triangle on an
// edge, a ring.
var testTiles = func() [2]*draw.Tile {
	ink := draw.RGB(20, 20, 20)
	a := &draw.Tile{ID: "soil:T1", W: 6, H: 5, Items: []draw.Item{
		draw.Path{Style: draw.Style{Stroke: ink, StrokeWidth: 0.5}, Subpaths: []draw.Subpath{{Points: []draw.Point{{X: 0, Y: 1}, {X: 6, Y: 3}}}}},
		draw.Path{Style: draw.Style{Fill: ink}, Circles: []draw.Disc{{Center: draw.Point{X: 5.8, Y: 4.8}, R: 0.7}},
			Subpaths: []draw.Subpath{{Closed: true, Points: []draw.Point{{X: 2, Y: 4.5}, {X: 3.5, Y: 5.8}, {X: 1, Y: 5.6}}}}},
	}}
	b := &draw.Tile{ID: "fill:T/2", W: 4, H: 4, Items: []draw.Item{
		draw.Circle{Style: draw.Style{Stroke: ink, StrokeWidth: 0.4}, Center: draw.Point{X: 2, Y: 2}, R: 1.2},
		draw.Box{Style: draw.Style{Fill: ink}, Rect: draw.Rect{X: 3.5, Y: -0.3, W: 1, H: 0.6}},
	}}
	return [2]*draw.Tile{a, b}
}()

func tileDoc() *draw.Document {
	a, b := testTiles[0], testTiles[1]
	p := &draw.Page{Width: 200, Height: 150}
	p.Add(
		draw.Box{Rect: draw.Rect{X: 10, Y: 10, W: 80, H: 60}, Style: draw.Style{Fill: draw.RGB(240, 220, 150)}},
		draw.Pattern{Rect: draw.Rect{X: 10, Y: 10, W: 80, H: 60}, Tile: a, Role: "pattern a"},
		draw.Clip{Rect: draw.Rect{X: 100, Y: 0, W: 50, H: 100}, Items: []draw.Item{
			draw.Pattern{Rect: draw.Rect{X: 90.5, Y: 20.25, W: 80, H: 60}, Tile: a, Role: "pattern a, clipped"},
		}},
		draw.Pattern{Rect: draw.Rect{X: 20, Y: 80, W: 170, H: 60}, Tile: b, Role: "pattern b"},
		draw.Box{Rect: draw.Rect{X: 60, Y: 100, W: 40, H: 20}, Style: draw.Style{Fill: draw.White}},
	)
	return &draw.Document{Title: "tiles", Pages: []*draw.Page{p}}
}

// TestSVGPatternsDefinedOnce: each tile is one <pattern> in <defs>, in
// user space, and each fill one path referring to it, cut to its clip,
// in painting order.
func TestSVGPatternsDefinedOnce(t *testing.T) {
	b, err := SVG(tileDoc(), 0)
	if err != nil {
		t.Fatal(err)
	}
	_, elements := svgText(t, b)
	if elements["pattern"] != 2 || elements["defs"] != 1 {
		t.Fatalf("%d patterns in %d defs, want 2 in 1", elements["pattern"], elements["defs"])
	}
	s := string(b)
	for _, want := range []string{
		`<pattern id="tile-soil-T1" patternUnits="userSpaceOnUse" width="2.1166666666666667" height="1.763888888888889" viewBox="0 0 6 5">`,
		`<pattern id="tile-fill-T-2" patternUnits="userSpaceOnUse"`,
		// The first fill, then the clipped one (x 100–150 pt, y 20.25–80.25 pt, in mm).
		`<path d="M3.528 3.528H31.75V24.694H3.528z" fill="url(#tile-soil-T1)"/>`,
		`<path d="M35.278 7.144H52.917V28.31H35.278z" fill="url(#tile-soil-T1)"/>`,
	} {
		if !strings.Contains(s, want) {
			t.Errorf("no %s", want)
		}
	}
	if n := strings.Count(s, `fill="url(#tile-soil-T1)"`); n != 2 {
		t.Errorf("%d fills with tile 1, want 2", n)
	}
	if strings.Index(s, "tile-fill-T-2)") < strings.Index(s, "M35.278") || strings.Index(s, "tile-fill-T-2)") > strings.LastIndex(s, `fill="#fff"`) {
		t.Error("fills are not in painting order")
	}
	// The dot on the corner (5.8, 4.8), r 0.7, shows in all four corners
	// of the cell; the line and the triangle in one cell and the next.
	def := s[strings.Index(s, `<pattern id="tile-soil-T1"`):]
	def = def[:strings.Index(def, "</pattern>")]
	for _, want := range []string{"M6.5 4.8A", "M0.5 4.8A", "M6.5 -0.2A", "M0.5 -0.2A", "M0 1L6 3", "M2 4.5L", "M2 -0.5L"} {
		if !strings.Contains(def, want) {
			t.Errorf("tile 1 has no %s: %s", want, def)
		}
	}
	again, _ := SVG(tileDoc(), 0)
	if !bytes.Equal(b, again) {
		t.Error("two writes of one document differ")
	}
}

// TestPatternSVGMatchesPNG: the SVG's patterns, as librsvg (an SVG
// renderer outside the project) draws them, look like tremie's own
// raster of the same page: every cell joined without seams, every mark
// where it belongs.
func TestPatternSVGMatchesPNG(t *testing.T) {
	rsvg, err := exec.LookPath("rsvg-convert")
	if err != nil {
		t.Skip("rsvg-convert not installed")
	}
	doc := tileDoc()
	b, err := SVG(doc, 0)
	if err != nil {
		t.Fatal(err)
	}
	dir := t.TempDir()
	in, outPNG := filepath.Join(dir, "t.svg"), filepath.Join(dir, "t.png")
	if err := os.WriteFile(in, b, 0o644); err != nil {
		t.Fatal(err)
	}
	if out, err := exec.Command(rsvg, "-d", "144", "-p", "144", "-b", "white", "-o", outPNG, in).CombinedOutput(); err != nil {
		t.Fatalf("rsvg-convert: %v\n%s", err, out)
	}
	rb, err := os.ReadFile(outPNG)
	if err != nil {
		t.Fatal(err)
	}
	theirs := decodePNG(t, rb)
	ours := decodePNG(t, must(PNG(doc, 0, 144)))
	compareRasters(t, "rsvg", theirs, ours, 0.03)
}

// compareRasters fails when two rasters of one page differ by more than
// anti-aliasing and resampling (librsvg draws a pattern's cell offscreen
// and resamples it, softening the marks): a mean luma difference over
// maxMean, or any 3 × 3 block whose mean differs by over half of full luma,
// as a missing, extra or shifted mark does.
func compareRasters(t *testing.T, name string, a, b image.Image, maxMean float64) {
	t.Helper()
	// A renderer may round the page up to a whole pixel more.
	w, h := min(a.Bounds().Dx(), b.Bounds().Dx()), min(a.Bounds().Dy(), b.Bounds().Dy())
	if max(a.Bounds().Dx(), b.Bounds().Dx())-w > 1 || max(a.Bounds().Dy(), b.Bounds().Dy())-h > 1 {
		t.Fatalf("%s: %v against %v pixels", name, a.Bounds().Size(), b.Bounds().Size())
	}
	d := make([]float64, w*h)
	sum := 0.0
	for y := 0; y < h; y++ {
		for x := 0; x < w; x++ {
			v := lumaAt(a, x, y) - lumaAt(b, x, y)
			d[y*w+x] = v
			sum += math.Abs(v)
		}
	}
	if mean := sum / float64(w*h); mean > maxMean {
		t.Errorf("%s: mean luma difference %.4f", name, mean)
	}
	for y := 1; y < h-1; y++ {
		for x := 1; x < w-1; x++ {
			s := 0.0
			for k := -1; k <= 1; k++ {
				s += d[(y+k)*w+x-1] + d[(y+k)*w+x] + d[(y+k)*w+x+1]
			}
			if math.Abs(s/9) > 0.5 {
				t.Errorf("%s: the rasters differ around pixel (%d, %d)", name, x, y)
				return
			}
		}
	}
}

func lumaAt(img image.Image, x, y int) float64 {
	b := img.Bounds()
	r, g, bl, _ := img.At(b.Min.X+x, b.Min.Y+y).RGBA()
	return (0.2126*float64(r) + 0.7152*float64(g) + 0.0722*float64(bl)) / 0xffff
}

// TestPatternBoundedByThePage: a pattern region a million points wide
// (an absurd diameter) costs what the page costs: one path in SVG, the
// page's cells in the raster.
func TestPatternBoundedByThePage(t *testing.T) {
	p := &draw.Page{Width: 300, Height: 300, Items: []draw.Item{
		draw.Pattern{Rect: draw.Rect{X: -5e5, Y: -5e5, W: 1e6, H: 1e6}, Tile: testTiles[0]},
	}}
	doc := &draw.Document{Pages: []*draw.Page{p}}
	start := time.Now()
	b, err := SVG(doc, 0)
	if err != nil {
		t.Fatal(err)
	}
	if !regexp.MustCompile(`<path d="M0 0H105.833V105.833H0z" fill="url\(#tile-soil-T1\)"/>`).Match(b) {
		t.Errorf("the fill is not cut to the page: %s", b)
	}
	if _, err := PNG(doc, 0, 72); err != nil {
		t.Fatal(err)
	}
	if d := time.Since(start); d > 5*time.Second {
		t.Errorf("a huge pattern took %v", d)
	}
}

// TestAbsurdFillsStayBounded: a 1 pt tile of 20 marks over a page 3,000
// pt square would lay 180 million mark copies on the raster; the raster
// reports it (maxFillCopies) where SVG and PDF fill it with one path, and
// a mark reaching 5,000 pt past its 1 pt cell (which every vector tile
// would copy 20,000 times) is reported by all three (maxTileCopies), each
// at once. A fill near the bound still draws, within seconds.
func TestAbsurdFillsStayBounded(t *testing.T) {
	fine := &draw.Tile{ID: "fine", W: 1, H: 1}
	for k := 0; k < 20; k++ {
		fine.Items = append(fine.Items, draw.Circle{Style: draw.Style{Fill: draw.Black}, Center: draw.Point{X: float64(k) / 20, Y: 0.5}, R: 0.02})
	}
	long := &draw.Tile{ID: "long", W: 1, H: 1, Items: []draw.Item{
		draw.Shape{Style: draw.Style{Stroke: draw.Black, StrokeWidth: 0.1}, Points: []draw.Point{{X: -5000, Y: 0.5}, {X: 5000, Y: 0.5}}},
	}}
	page := func(side float64, tile *draw.Tile) *draw.Document {
		return &draw.Document{Pages: []*draw.Page{{Width: side, Height: side, Items: []draw.Item{
			draw.Pattern{Rect: draw.Rect{W: side, H: side}, Tile: tile},
		}}}}
	}
	start := time.Now()
	huge := page(3000, fine)
	if _, err := PNG(huge, 0, 10); err == nil || !strings.Contains(err.Error(), "copies of its marks") {
		t.Errorf("PNG of 180 million mark copies: %v", err)
	}
	if _, err := SVG(huge, 0); err != nil {
		t.Errorf("SVG: %v", err)
	}
	if _, err := PDF(huge); err != nil {
		t.Errorf("PDF: %v", err)
	}
	wide := page(100, long)
	if _, err := PNG(wide, 0, 10); err == nil || !strings.Contains(err.Error(), "copies of them") {
		t.Errorf("PNG of a mark reaching 5,000 cells: %v", err)
	}
	if _, err := SVG(wide, 0); err == nil || !strings.Contains(err.Error(), "copies of them") {
		t.Errorf("SVG of a mark reaching 5,000 cells: %v", err)
	}
	if _, err := PDF(wide); err == nil || !strings.Contains(err.Error(), "copies of them") {
		t.Errorf("PDF of a mark reaching 5,000 cells: %v", err)
	}
	t.Logf("refused in %v", time.Since(start))
	if d := time.Since(start); d > 5*time.Second {
		t.Errorf("absurd fills took %v", d)
	}
	start = time.Now()
	// 150 × 150 cells of 20 marks: 450,000 copies, under the bound.
	if _, err := PNG(page(149, fine), 0, 10); err != nil {
		t.Errorf("a fill under the bound: %v", err)
	}
	if d := time.Since(start); d > 10*time.Second {
		t.Errorf("a fill under the bound took %v", d)
	}
}

// TestBadTiles: a tile too small, not finite, or holding what cannot be
// a mark is reported, not drawn.
func TestBadTiles(t *testing.T) {
	for _, tile := range []*draw.Tile{
		nil,
		{ID: "tiny", W: 0.01, H: 5},
		{ID: "nan", W: math.NaN(), H: 5},
		{ID: "text", W: 5, H: 5, Items: []draw.Item{draw.Text{S: "x", Size: 5}}},
		{ID: "glass", W: 5, H: 5, Items: []draw.Item{draw.Box{Style: draw.Style{Fill: draw.Color{R: 9, A: 100}}, Rect: draw.Rect{W: 1, H: 1}}}},
		{ID: "inf", W: 5, H: 5, Items: []draw.Item{draw.Path{Style: draw.Style{Fill: draw.Black}, Circles: []draw.Disc{{R: math.Inf(1)}}}}},
	} {
		doc := &draw.Document{Pages: []*draw.Page{{Width: 50, Height: 50, Items: []draw.Item{draw.Pattern{Rect: draw.Rect{W: 20, H: 20}, Tile: tile}}}}}
		if _, err := SVG(doc, 0); err == nil {
			t.Errorf("SVG drew a bad tile %v", tile)
		}
		if _, err := PNG(doc, 0, 72); err == nil {
			t.Errorf("PNG drew a bad tile %v", tile)
		}
		if _, err := PDF(doc); err == nil {
			t.Errorf("PDF drew a bad tile %v", tile)
		}
	}
}

// TestPatternPDFMatchesPNG: the PDF's tiling patterns, as poppler (a PDF
// renderer outside the project) draws them, look like tremie's own
// raster of the same page.
func TestPatternPDFMatchesPNG(t *testing.T) {
	pdftoppm, err := exec.LookPath("pdftoppm")
	if err != nil {
		t.Skip("pdftoppm not installed")
	}
	doc := tileDoc()
	b, err := PDF(doc)
	if err != nil {
		t.Fatal(err)
	}
	dir := t.TempDir()
	in := filepath.Join(dir, "t.pdf")
	if err := os.WriteFile(in, b, 0o644); err != nil {
		t.Fatal(err)
	}
	if out, err := exec.Command(pdftoppm, "-r", "576", "-png", "-singlefile", in, filepath.Join(dir, "t")).CombinedOutput(); err != nil {
		t.Fatalf("pdftoppm: %v\n%s", err, out)
	}
	rb, err := os.ReadFile(filepath.Join(dir, "t.png"))
	if err != nil {
		t.Fatal(err)
	}
	// Poppler paints a pattern from a bitmap of its cell laid at whole
	// pixels, so its marks may lie a pixel (1/8 pt) off and differ at
	// their edges: the rasters are compared point by point (8 × 8 pixel
	// blocks), where a mark lost or moved shows and edge noise averages
	// out, and the marks must sit where tremie puts them to a pixel.
	theirs, ours := decodePNG(t, rb), decodePNG(t, must(PNG(doc, 0, 576)))
	mean, worst := blockDiff(theirs, ours, 8)
	t.Logf("poppler against tremie, per point: mean luma difference %.4f, worst %.3f", mean, worst)
	if mean > pdfMaxMean || worst > pdfMaxBlock {
		t.Errorf("poppler's raster differs per point by %.4f on average (max %.3f), %.3f at worst (max %.2f)", mean, pdfMaxMean, worst, pdfMaxBlock)
	}
	if dx, dy := bestShift(theirs, ours, 3); dx < -1 || dx > 1 || dy < -1 || dy > 1 {
		t.Errorf("poppler's marks lie %d, %d pixels from tremie's", dx, dy)
	}
	if again, _ := PDF(doc); !bytes.Equal(b, again) {
		t.Error("two writes of one document differ")
	}
	// pdfcpu, an independent PDF reader, validates the pattern objects
	// (ISO 32000-1, 8.7.3.1) in strict mode.
	if err := api.Validate(bytes.NewReader(b), pdfcpuConf()); err != nil {
		t.Errorf("pdfcpu strict validation: %v", err)
	}
	// One pattern object per tile, referred to from the page.
	if n := bytes.Count(b, []byte("/PatternType 1/PaintType 1/TilingType 1")); n != 2 {
		t.Errorf("%d tiling patterns, want 2", n)
	}
}

// bestShift is the offset (pixels, within ±r) of b against a at which
// their luma agrees best.
func bestShift(a, b image.Image, r int) (bx, by int) {
	w, h := min(a.Bounds().Dx(), b.Bounds().Dx()), min(a.Bounds().Dy(), b.Bounds().Dy())
	best := math.Inf(1)
	for dy := -r; dy <= r; dy++ {
		for dx := -r; dx <= r; dx++ {
			s := 0.0
			for y := r; y < h-r; y++ {
				for x := r; x < w-r; x++ {
					s += math.Abs(lumaAt(a, x, y) - lumaAt(b, x+dx, y+dy))
				}
			}
			if s < best {
				best, bx, by = s, dx, dy
			}
		}
	}
	return bx, by
}

// Tolerances of poppler's raster of tileDoc against tremie's, per point
// at 576 dpi. Measured: mean 0.035, worst point 0.20; with the copies of
// marks that cross a cell's edge left out of the patterns, 0.049 and
// 0.59.
const (
	pdfMaxMean  = 0.042
	pdfMaxBlock = 0.35
)

// blockDiff compares two rasters in k × k pixel blocks of mean luma:
// the mean and the largest difference of a block.
func blockDiff(a, b image.Image, k int) (mean, worst float64) {
	w, h := min(a.Bounds().Dx(), b.Bounds().Dx())/k, min(a.Bounds().Dy(), b.Bounds().Dy())/k
	for by := 0; by < h; by++ {
		for bx := 0; bx < w; bx++ {
			s := 0.0
			for y := by * k; y < (by+1)*k; y++ {
				for x := bx * k; x < (bx+1)*k; x++ {
					s += lumaAt(a, x, y) - lumaAt(b, x, y)
				}
			}
			d := math.Abs(s) / float64(k*k)
			mean += d
			worst = max(worst, d)
		}
	}
	return mean / float64(w*h), worst
}
