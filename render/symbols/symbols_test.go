package symbols

import (
	"bytes"
	"fmt"
	"image"
	"image/png"
	"math"
	"os"
	"reflect"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/schema"
)

// uscsGroups are the fifteen group symbols of ASTM D2487 (Table 1).
var uscsGroups = []string{"GW", "GP", "GM", "GC", "SW", "SP", "SM", "SC", "ML", "CL", "OL", "MH", "CH", "OH", "PT"}

func TestEveryMaterialHasItsOwnSymbol(t *testing.T) {
	seen := map[string]schema.Material{}
	for _, m := range schema.Materials {
		s := ForMaterial(m)
		if s.ID == unknownMaterial.ID || s.Kind != Material {
			t.Errorf("%s has no symbol of its own", m)
		}
		if prev, dup := seen[s.ID]; dup {
			t.Errorf("%s and %s share %s", m, prev, s.ID)
		}
		seen[s.ID] = m
		if s.Name == "" || s.marks == nil {
			t.Errorf("%s: no name or no pattern", m)
		}
	}
	if ForMaterial("unobtainium").ID != unknownMaterial.ID {
		t.Error("an unknown material does not get the fallback")
	}
}

func TestEveryUSCSGroupHasItsOwnSymbol(t *testing.T) {
	for _, g := range uscsGroups {
		s := ForLayer(schema.Layer{USCS: g})
		if s.Code != g || s.ID != "soil:"+g {
			t.Errorf("%s maps to %s (%s)", g, s.ID, s.Code)
		}
	}
	// Dual and borderline symbols (ASTM D2487 4.x; ASTM D2488 borderline
	// "CL/ML") get their own banded symbol, in the order written.
	for _, c := range []struct{ in, id string }{
		{"SP-SM", "soil:SP-SM"}, {"gw-gc", "soil:GW-GC"}, {"CL-ML", "soil:CL-ML"}, {"CL/ML", "soil:CL-ML"}, {" sc-sm ", "soil:SC-SM"},
	} {
		s := ForLayer(schema.Layer{USCS: c.in})
		if s.ID != c.id {
			t.Errorf("%q maps to %s, want %s", c.in, s.ID, c.id)
		}
		if s.Kind != Lithology || !strings.Contains(s.Name, "/") {
			t.Errorf("%q: kind %v name %q", c.in, s.Kind, s.Name)
		}
	}
	for _, bad := range []string{"XX", "SP-XX", "SP-SP", "SP-SM-ML", "-"} {
		if s := ForLayer(schema.Layer{USCS: bad}); s.ID != unclassifiedRow.ID {
			t.Errorf("%q maps to %s, want the unclassified symbol", bad, s.ID)
		}
	}
}

func TestRockWords(t *testing.T) {
	// Rock names as a driller writes them (common practice).
	cases := map[string]string{
		"granite":                   "rock:crystalline",
		"Biotite GNEISS, fractured": "rock:crystalline",
		"basalt":                    "rock:crystalline",
		"quartzite":                 "rock:crystalline",
		"sandstone, fine grained":   "rock:sandstone",
		"conglomerate":              "rock:sandstone",
		"shale":                     "rock:shale",
		"grey mudstone":             "rock:shale",
		"siltstone":                 "rock:shale",
		"limestone":                 "rock:limestone",
		"dolomite":                  "rock:limestone",
		"weathered shale":           "rock:weathered",
		"saprolite":                 "rock:weathered",
		"fill":                      "rock:fill",
		"unknown":                   "rock:unclassified",
		"":                          "rock:unclassified",
	}
	for rock, want := range cases {
		if got := ForLayer(schema.Layer{Rock: rock}).ID; got != want {
			t.Errorf("rock %q maps to %s, want %s", rock, got, want)
		}
	}
}

// classes are every symbol the sheet can put in a lithology or fill
// column: the table's soils, rocks and materials, both fallbacks, and a
// set of dual soils.
func classes(t *testing.T) []Symbol {
	var list []Symbol
	for _, s := range All() {
		if s.Kind != WellPart {
			list = append(list, s)
		}
	}
	for _, code := range []string{"SP-SM", "SM-SP", "GW-GC", "CL-ML", "SC-SM", "GP-GM", "SW-SC"} {
		s, ok := ForUSCS(code)
		if !ok {
			t.Fatalf("dual %s not made", code)
		}
		list = append(list, s)
	}
	return list
}

// raster paints items on a w × h pt page and reads it back through the
// PNG backend at dpi.
func raster(t *testing.T, w, h, dpi float64, items []draw.Item) image.Image {
	t.Helper()
	p := &draw.Page{Width: w, Height: h, Items: items}
	b, err := out.PNG(&draw.Document{Pages: []*draw.Page{p}}, 0, dpi)
	if err != nil {
		t.Fatal(err)
	}
	img, err := png.Decode(bytes.NewReader(b))
	if err != nil {
		t.Fatal(err)
	}
	return img
}

// luma is ITU-R BT.709 luma of a pixel, 0..1: what a greyscale printer
// or copier keeps.
func luma(img image.Image, x, y int) float64 {
	r, g, b, _ := img.At(x, y).RGBA()
	return (0.2126*float64(r) + 0.7152*float64(g) + 0.0722*float64(b)) / 0xffff
}

// inkMask thresholds a raster to black and white at mid-grey, the way a
// photocopier does, keeping only the pattern's marks (ink is near-black;
// every ground is light).
func inkMask(img image.Image) []bool {
	b := img.Bounds()
	m := make([]bool, 0, b.Dx()*b.Dy())
	for y := b.Min.Y; y < b.Max.Y; y++ {
		for x := b.Min.X; x < b.Max.X; x++ {
			m = append(m, luma(img, x, y) < 0.5)
		}
	}
	return m
}

// TestPatternsDifferInBlackAndWhite rasterises every class and compares
// the black-and-white masks: the marks alone must tell any two apart,
// and each must put enough ink down to read but not so much that it
// drowns a line drawn over it.
func TestPatternsDifferInBlackAndWhite(t *testing.T) {
	const w, h = 48.0, 36.0
	list := classes(t)
	masks := make([][]bool, len(list))
	for i, s := range list {
		// Drawn at a page position that is not a multiple of any tile, so
		// no pattern is flattered by its phase.
		img := raster(t, w+10, h+10, 288, s.Paint(draw.Rect{X: 5.3, Y: 4.7, W: w, H: h}))
		masks[i] = inkMask(img)
		ink := 0
		for _, v := range masks[i] {
			if v {
				ink++
			}
		}
		frac := float64(ink) / float64(len(masks[i])) * (w + 10) * (h + 10) / (w * h)
		if frac < 0.015 || frac > 0.40 {
			t.Errorf("%s inks %.1f %% of its area, want 1.5–40 %%", s.ID, frac*100)
		}
	}
	for i := range list {
		for j := i + 1; j < len(list); j++ {
			diff := 0
			for k := range masks[i] {
				if masks[i][k] != masks[j][k] {
					diff++
				}
			}
			if f := float64(diff) / float64(len(masks[i])); f < 0.02 {
				t.Errorf("%s and %s differ in only %.2f %% of pixels in black and white", list[i].ID, list[j].ID, f*100)
			}
		}
	}
}

// TestPaintStaysInside paints each symbol into a rectangle on a larger
// page: no ink or colour may land outside the rectangle (half a pixel of
// anti-aliasing allowed), and every item is inside it or a clip to it.
func TestPaintStaysInside(t *testing.T) {
	r := draw.Rect{X: 20.4, Y: 15.6, W: 31.3, H: 22.9}
	for _, s := range append(classes(t), partSymbols...) {
		items := s.Paint(r)
		for _, it := range items {
			switch it := it.(type) {
			case draw.Box:
				if it.X < r.X-1e-9 || it.Y < r.Y-1e-9 || it.Right() > r.Right()+1e-9 || it.Bottom() > r.Bottom()+1e-9 {
					t.Errorf("%s: box %v outside %v", s.ID, it.Rect, r)
				}
			case draw.Pattern:
				if it.Rect.X < r.X-1e-9 || it.Rect.Y < r.Y-1e-9 || it.Rect.Right() > r.Right()+1e-9 || it.Rect.Bottom() > r.Bottom()+1e-9 || it.Tile == nil {
					t.Errorf("%s: pattern over %v, want %v", s.ID, it.Rect, r)
				}
			case draw.Clip:
				if it.Rect.X < r.X-1e-9 || it.Rect.Y < r.Y-1e-9 || it.Rect.Right() > r.Right()+1e-9 || it.Rect.Bottom() > r.Bottom()+1e-9 {
					t.Errorf("%s: clip %v outside %v", s.ID, it.Rect, r)
				}
			default:
				t.Errorf("%s: unclipped %T", s.ID, it)
			}
		}
		img := raster(t, 72, 54, 288, items) // 4 px per point
		b := img.Bounds()
		for y := b.Min.Y; y < b.Max.Y; y++ {
			for x := b.Min.X; x < b.Max.X; x++ {
				px, py := float64(x)/4, float64(y)/4
				inside := px >= r.X-0.5 && px <= r.Right()+0.5 && py >= r.Y-0.5 && py <= r.Bottom()+0.5
				if !inside && luma(img, x, y) < 0.99 {
					t.Errorf("%s paints outside its rectangle at (%.2f, %.2f) pt", s.ID, px, py)
					y = b.Max.Y
					break
				}
			}
		}
	}
}

// TestPaintJoinsSeamlessly paints a symbol into two touching rectangles
// and into their union: the marks lie on the page grid, so the two
// pictures match away from the seam's anti-aliasing.
func TestPaintJoinsSeamlessly(t *testing.T) {
	top := draw.Rect{X: 10, Y: 10, W: 40, H: 17.3}
	bottom := draw.Rect{X: 10, Y: 27.3, W: 40, H: 20.7}
	whole := draw.Rect{X: 10, Y: 10, W: 40, H: 38}
	for _, s := range classes(t) {
		split := raster(t, 60, 58, 144, append(s.Paint(top), s.Paint(bottom)...))
		one := raster(t, 60, 58, 144, s.Paint(whole))
		bad := 0
		b := one.Bounds()
		for y := b.Min.Y; y < b.Max.Y; y++ {
			if math.Abs(float64(y)/2-27.3) < 1.5 {
				continue // the seam row itself
			}
			for x := b.Min.X; x < b.Max.X; x++ {
				// 0.15: a mark cut at one region's edge meets its uncut
				// continuation, two anti-aliased edges on one line, which
				// may differ from the whole picture by an eighth of full
				// luma in a pixel; a seam or a shifted mark is a full step.
				if math.Abs(luma(split, x, y)-luma(one, x, y)) > 0.15 {
					bad++
				}
			}
		}
		if bad > 0 {
			t.Errorf("%s: %d pixels differ between split and whole painting", s.ID, bad)
		}
	}
}

func TestPaintIsDeterministic(t *testing.T) {
	r := draw.Rect{X: 3.3, Y: 7.7, W: 25, H: 40}
	for _, s := range append(classes(t), partSymbols...) {
		if a, b := s.Paint(r), s.Paint(r); !reflect.DeepEqual(a, b) {
			t.Errorf("%s paints differently twice", s.ID)
		}
		if a, b := s.Swatch(r), s.Swatch(r); !reflect.DeepEqual(a, b) {
			t.Errorf("%s swatch differs twice", s.ID)
		}
	}
	for _, bad := range []draw.Rect{{W: 0, H: 5}, {W: 5, H: -1}, {W: math.NaN(), H: 4}, {W: math.Inf(1), H: 4}} {
		if items := ForMaterial(schema.FilterPack).Paint(bad); len(items) != 0 {
			t.Errorf("Paint(%v) gave %d items", bad, len(items))
		}
	}
}

// TestScreensDifferWhenNarrow: slotted and wire-wrapped screens must read
// apart even as a 3-point wall strip, in black and white.
func TestScreensDifferWhenNarrow(t *testing.T) {
	r := draw.Rect{X: 10, Y: 10, W: 3, H: 40}
	a := inkMask(raster(t, 23, 60, 288, MustPart(ScreenSlotted).Paint(r)))
	b := inkMask(raster(t, 23, 60, 288, MustPart(ScreenWrap).Paint(r)))
	c := inkMask(raster(t, 23, 60, 288, MustPart(Casing).Paint(r)))
	count := func(m1, m2 []bool) (d int) {
		for k := range m1 {
			if m1[k] != m2[k] {
				d++
			}
		}
		return d
	}
	area := 3 * 40 * 16 // strip pixels at 4 px per point
	for _, pair := range []struct {
		name string
		d    int
	}{{"slotted/wrap", count(a, b)}, {"slotted/casing", count(a, c)}, {"wrap/casing", count(b, c)}} {
		if float64(pair.d) < 0.15*float64(area) {
			t.Errorf("%s differ in %d of %d strip pixels", pair.name, pair.d, area)
		}
	}
}

// TestWaterMarksDiffer: a first-encountered level and a static one must
// read apart at the size drawn on a sheet (8 pt), in black and white, and
// each must differ from every other part's mark.
func TestWaterMarksDiffer(t *testing.T) {
	r := draw.Rect{X: 10, Y: 10, W: 8, H: 8}
	mask := func(id string) []bool { return inkMask(raster(t, 28, 28, 288, MustPart(id).Paint(r))) }
	first, static := mask(FirstWater), mask(WaterLevel)
	diff := func(a, b []bool) (d int) {
		for k := range a {
			if a[k] != b[k] {
				d++
			}
		}
		return d
	}
	area := 8 * 8 * 16 // mark pixels at 4 px per point
	if d := diff(first, static); float64(d) < 0.08*float64(area) {
		t.Errorf("first-encountered and static water marks differ in %d of %d pixels", d, area)
	}
	for _, id := range []string{Casing, ScreenSlotted, ScreenWrap, OpenHole, Centralizer, Cap} {
		other := mask(id)
		for _, w := range []string{FirstWater, WaterLevel} {
			if d := diff(mask(w), other); float64(d) < 0.08*float64(area) {
				t.Errorf("%s and %s differ in %d of %d pixels", w, id, d, area)
			}
		}
	}
}

// ---- colour ----

// srgbToLinear is the sRGB transfer function (IEC 61966-2-1).
func srgbToLinear(v uint8) float64 {
	c := float64(v) / 255
	if c <= 0.04045 {
		return c / 12.92
	}
	return math.Pow((c+0.055)/1.055, 2.4)
}

// relLuminance is WCAG 2's relative luminance.
func relLuminance(c draw.Color) float64 {
	return 0.2126*srgbToLinear(c.R) + 0.7152*srgbToLinear(c.G) + 0.0722*srgbToLinear(c.B)
}

// TestGroundsCarryBlackText: WCAG 2.1 success criterion 1.4.6 asks a
// contrast ratio of 7:1 for text; black labels and pattern ink on every
// ground must reach it.
func TestGroundsCarryBlackText(t *testing.T) {
	for _, g := range Grounds {
		if ratio := (relLuminance(g) + 0.05) / (relLuminance(draw.Black) + 0.05); ratio < 7 {
			t.Errorf("black on %v: contrast %.1f:1, want 7:1", g, ratio)
		}
		if ratio := (relLuminance(g) + 0.05) / (relLuminance(ink) + 0.05); ratio < 7 {
			t.Errorf("ink on %v: contrast %.1f:1, want 7:1", g, ratio)
		}
	}
}

// machado holds the colour-vision-deficiency simulation matrices of
// Machado, Oliveira & Fernandes (2009), "A physiologically-based model
// for simulation of color vision deficiency", IEEE TVCG 15(6), for
// severity 1.0, applied to linear RGB. Values from memory of the paper's
// table; each row sums to one (grey stays grey), checked below.
var machado = map[string][3][3]float64{
	"protanopia":   {{0.152286, 1.052583, -0.204868}, {0.114503, 0.786281, 0.099216}, {-0.003882, -0.048116, 1.051998}},
	"deuteranopia": {{0.367322, 0.860646, -0.227968}, {0.280085, 0.672501, 0.047413}, {-0.011820, 0.042940, 0.968881}},
	"tritanopia":   {{1.255528, -0.076749, -0.178779}, {-0.078411, 0.930809, 0.147602}, {0.004733, 0.691367, 0.303900}},
	"normal":       {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}},
}

// lab converts linear sRGB to CIE L*a*b* (D65 white).
func lab(l [3]float64) [3]float64 {
	x := 0.4124*l[0] + 0.3576*l[1] + 0.1805*l[2]
	y := 0.2126*l[0] + 0.7152*l[1] + 0.0722*l[2]
	z := 0.0193*l[0] + 0.1192*l[1] + 0.9505*l[2]
	f := func(t float64) float64 {
		if t > 216.0/24389 {
			return math.Cbrt(t)
		}
		return (24389.0/27*t + 16) / 116
	}
	fx, fy, fz := f(x/0.95047), f(y), f(z/1.08883)
	return [3]float64{116*fy - 16, 500 * (fx - fy), 200 * (fy - fz)}
}

func simulate(m [3][3]float64, c draw.Color) [3]float64 {
	in := [3]float64{srgbToLinear(c.R), srgbToLinear(c.G), srgbToLinear(c.B)}
	var o [3]float64
	for i := range 3 {
		o[i] = math.Max(0, math.Min(1, m[i][0]*in[0]+m[i][1]*in[1]+m[i][2]*in[2]))
	}
	return lab(o)
}

// TestGroundsApartUnderColourBlindness: every two family grounds stay at
// least ΔE*ab 7 apart (about three just-noticeable differences of 2.3)
// for normal vision and under full protanopia, deuteranopia and
// tritanopia as Machado et al. simulate them.
func TestGroundsApartUnderColourBlindness(t *testing.T) {
	for name, m := range machado {
		for i, row := range m {
			if s := row[0] + row[1] + row[2]; math.Abs(s-1) > 1e-5 {
				t.Errorf("%s row %d sums to %.6f", name, i, s)
			}
		}
	}
	const minDE = 7
	for name, m := range machado {
		for i := range Grounds {
			for j := i + 1; j < len(Grounds); j++ {
				a, b := simulate(m, Grounds[i]), simulate(m, Grounds[j])
				d := math.Sqrt((a[0]-b[0])*(a[0]-b[0]) + (a[1]-b[1])*(a[1]-b[1]) + (a[2]-b[2])*(a[2]-b[2]))
				if d < minDE {
					t.Errorf("%s: grounds %v and %v only ΔE %.1f apart", name, Grounds[i], Grounds[j], d)
				}
			}
		}
	}
}

// TestGroundFamilies: symbols of one family share a ground, different
// families do not, so colour groups and pattern identifies.
func TestGroundFamilies(t *testing.T) {
	family := func(s Symbol) string {
		switch {
		case s.Code != "" && !strings.Contains(s.Code, "-"):
			return "soil-" + s.Code[:1]
		case strings.HasPrefix(s.ID, "fill:bentonite"):
			return "bentonite"
		case s.ID == "fill:filter-pack" || s.ID == "fill:fine-sand":
			return "soil-S" // packs are sand
		}
		return ""
	}
	ground := map[string]draw.Color{}
	for _, s := range All() {
		f := family(s)
		if f == "" {
			continue
		}
		if f == "soil-M" || f == "soil-C" || f == "soil-O" || f == "soil-P" {
			f = map[string]string{"soil-M": "silt", "soil-C": "clay", "soil-O": "organic", "soil-P": "organic"}[f]
		}
		if g, ok := ground[f]; ok && g != s.Fill {
			t.Errorf("%s ground %v differs from its family %s (%v)", s.ID, s.Fill, f, g)
		}
		ground[f] = s.Fill
	}
	seen := map[draw.Color]string{}
	for f, g := range ground {
		if other, ok := seen[g]; ok {
			t.Errorf("families %s and %s share ground %v", f, other, g)
		}
		seen[g] = f
	}
}

func TestAllIsCompleteAndUnique(t *testing.T) {
	ids := map[string]bool{}
	for _, s := range All() {
		if ids[s.ID] {
			t.Errorf("%s listed twice", s.ID)
		}
		ids[s.ID] = true
		if s.Name == "" {
			t.Errorf("%s has no name", s.ID)
		}
		if got, ok := ByID(s.ID); !ok || got.ID != s.ID {
			t.Errorf("ByID(%s) = %s, %v", s.ID, got.ID, ok)
		}
		if len(s.Swatch(draw.Rect{W: 40, H: 20})) == 0 {
			t.Errorf("%s has an empty swatch", s.ID)
		}
	}
	want := len(schema.Materials) + len(uscsGroups) + 6 + 13 + 2 // materials, soils, rocks, parts, fallbacks
	if len(ids) != want {
		t.Errorf("All lists %d symbols, want %d", len(ids), want)
	}
	if s, ok := ByID("soil:SP-SM"); !ok || s.Code != "SP-SM" {
		t.Errorf("ByID of a dual soil: %v %v", s.ID, ok)
	}
	for _, id := range []string{Casing, ScreenSlotted, ScreenWrap, OpenHole, WaterLevel, FirstWater, Centralizer, Cap, Packer, Hanger, DriveShoe, Pump, Tag} {
		if _, ok := Part(id); !ok {
			t.Errorf("part %s missing", id)
		}
	}
	if _, ok := Part("soil:SP"); ok {
		t.Error("Part accepts a soil")
	}
}

func ExampleForMaterial() {
	s := ForMaterial(schema.BentoniteChips)
	fmt.Println(s.ID, "—", s.Name)
	// Output: fill:bentonite-chips — Bentonite chips
}

func BenchmarkPaint(b *testing.B) {
	r := draw.Rect{X: 100, Y: 100, W: 30, H: 400}
	list := All()
	for b.Loop() {
		for _, s := range list {
			s.Paint(r)
		}
	}
}

// TestPaintBoundedByPage: a fill far wider than any sheet (a diameter
// typed a million times too big) costs no more marks than one the size
// of the drawable area.
func TestPaintBoundedByPage(t *testing.T) {
	for _, s := range All() {
		huge := countMarks(s.Paint(draw.Rect{X: -1e9, Y: 0, W: 2e9, H: 50}))
		page := countMarks(s.Paint(draw.Rect{X: drawable.X, Y: 0, W: drawable.W, H: 50}))
		if huge != page {
			t.Errorf("%s: %d marks for a 2e9-pt fill, %d for the drawable width", s.ID, huge, page)
		}
	}
}

func countMarks(items []draw.Item) int {
	n := 0
	pg := &draw.Page{Items: items}
	pg.Walk(func(it draw.Item) {
		if p, ok := it.(draw.Path); ok {
			n += len(p.Subpaths) + len(p.Circles)
		}
	})
	return n
}

// TestTilesRepeatThePageGrid: a periodic symbol is written as one tile
// filled by reference; drawn through its tile it must look as its marks
// drawn straight onto the page grid, cell by cell (the tile is one
// period of the grid: whole cells, hash and stagger wrapped), anywhere
// on the page.
func TestTilesRepeatThePageGrid(t *testing.T) {
	for _, m := range tileMisfits {
		t.Error(m)
	}
	for _, r := range []draw.Rect{{X: 5.3, Y: 4.7, W: 48, H: 36}, {X: 203.1, Y: 611.7, W: 31, H: 29.3}} {
		for _, s := range All() {
			if s.tile == nil {
				if s.Kind != WellPart {
					t.Errorf("%s has no tile", s.ID)
				}
				continue
			}
			if len(s.tile.Items) == 0 {
				t.Errorf("%s: empty tile", s.ID)
			}
			page := draw.Rect{X: r.X - 5, Y: r.Y - 5, W: r.W + 10, H: r.H + 10}
			tiled := rasterAt(t, page, s.Paint(r))
			direct := rasterAt(t, page, append([]draw.Item{draw.Box{Rect: r, Style: draw.Style{Fill: s.Fill}}}, s.direct(r)...))
			// Anti-aliasing differs where marks cross or meet end to end
			// (a hatch line is one segment per cell in a tile, one per
			// region on the page), by up to about a third of full luma in
			// a pixel; a missing, added or shifted mark differs by more,
			// along its whole length.
			bad, sum := 0, 0.0
			b := tiled.Bounds()
			for y := b.Min.Y; y < b.Max.Y; y++ {
				for x := b.Min.X; x < b.Max.X; x++ {
					d := math.Abs(luma(tiled, x, y) - luma(direct, x, y))
					sum += d
					if d > 0.4 {
						bad++
					}
				}
			}
			mean := sum / float64(b.Dx()*b.Dy())
			if bad > 0 || mean > 0.005 {
				t.Logf("%s: mean luma difference %.4f", s.ID, mean)
				if dir := os.Getenv("TREMIE_TILEDIFF"); dir != "" {
					for name, img := range map[string]image.Image{"tiled": tiled, "direct": direct} {
						var buf bytes.Buffer
						png.Encode(&buf, img)
						os.WriteFile(fmt.Sprintf("%s/%s-%d-%s.png", dir, strings.ReplaceAll(s.ID, ":", "-"), int(r.X), name), buf.Bytes(), 0o644)
					}
				}
				t.Errorf("%s at %v: %d pixels differ between the tile and the marks drawn on the page", s.ID, r, bad)
			}
		}
	}
}

// rasterAt rasterises items lying in the page rectangle pg at 144 dpi,
// through the PNG backend: the page is moved, not the items, by a
// document whose page starts at pg's corner.
func rasterAt(t *testing.T, pg draw.Rect, items []draw.Item) image.Image {
	t.Helper()
	full := raster(t, pg.Right(), pg.Bottom(), 144, items)
	x0, y0 := int(pg.X*2), int(pg.Y*2)
	return full.(interface {
		SubImage(image.Rectangle) image.Image
	}).SubImage(image.Rect(x0, y0, int(pg.Right()*2), int(pg.Bottom()*2)))
}
