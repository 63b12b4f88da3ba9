package out_test

import (
	"fmt"
	"image"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"sort"
	"strings"
	"testing"

	"golang.org/x/image/font"
	"golang.org/x/image/font/sfnt"
	"golang.org/x/image/math/fixed"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
)

// rsvgDPI is the resolution of the rsvg-convert rasters: a 6-pt label's
// stems are then two or more pixels wide, so every glyph has fully
// covered pixels whose colour is exactly its own text's.
const rsvgDPI = 200

// TestRsvgTextStaysInItsBox opens every demo sheet and the gallery's
// (viewerSheets: DS-1200's first sheet of eight) in rsvg-convert (librsvg: an independent SVG renderer; version 2.54
// ignores @font-face and looks each text's font-family up among the
// system's fonts through Pango and fontconfig) and checks that no text
// leaves the box layout measured for it, and that no text lies on
// another element or runs into another text (overlap_test.go says
// precisely what may lie under a text). With text written as outlines
// (--text outlines) that must hold everywhere. With text written as text
// (the default) it must hold where the Go fonts are installed (Debian:
// fonts-go), since the SVG's font stack names them after the embedded
// face (svgfontstack.go); without them the text falls back to a wider
// face, and the counts are printed and the text part skipped. To bound
// the time (one rsvg-convert run a raster, three a sheet), every sheet
// is checked in the mode that must hold, text where the Go fonts are
// installed, else outlines, and the demo's BR-1 and MW-1 in both.
func TestRsvgTextStaysInItsBox(t *testing.T) {
	// Run beside the other viewer test: each mostly waits on its
	// renderer's processes.
	t.Parallel()
	rsvg := tool(t, "rsvg-convert text-box test", "librsvg2-bin", "rsvg-convert")
	sheets := viewerSheets(t)
	installed, why := installedGoFonts(t, sheets)
	type count struct{ sheets, texts, escaped, overlapping int }
	counts := map[out.TextMode]*count{out.TextAsOutlines: {}, out.TextAsText: {}}
	for _, s := range sheets {
		inked := inkTexts(t, s.page())
		bareImg := bareRaster(t, rsvg, s.page())
		look(t, s.name+" bare", "rsvg", bareImg.png)
		bare := inkMaskOf(bareImg.img)
		// every sheet in the mode that must hold; for time, the other
		// on the demo's first two wells only
		modes := []out.TextMode{out.TextAsOutlines}
		if installed {
			modes = []out.TextMode{out.TextAsText}
		}
		if !s.gallery && (strings.HasPrefix(s.name, "BR-1.") || strings.HasPrefix(s.name, "MW-1.")) {
			modes = []out.TextMode{out.TextAsOutlines, out.TextAsText}
		}
		for _, mode := range modes {
			name := fmt.Sprintf("%s (%s)", s.name, mode)
			r := rsvgRasterImage(t, rsvg, inked.page, mode)
			look(t, name, "rsvg", r.png)
			escapes := inked.escapes(r.img)
			overlaps := inked.overlaps(r.img, bare)
			c := counts[mode]
			c.sheets++
			c.texts += len(inked.boxes)
			c.escaped += len(escapes)
			c.overlapping += len(overlaps)
			if mode == out.TextAsText && !installed {
				continue
			}
			for _, e := range append(escapes, overlaps...) {
				t.Errorf("%s: %s", name, e)
			}
		}
	}
	for _, mode := range []out.TextMode{out.TextAsOutlines, out.TextAsText} {
		c := counts[mode]
		t.Logf("rsvg-convert, text as %s, %d sheets: %d of %d texts leave their box, %d overlaps with another element or text", mode, c.sheets, c.escaped, c.texts, c.overlapping)
	}
	if !installed {
		msg := fmt.Sprintf("rsvg-convert text-box test of text as text skipped: %s (Debian: apt-get install fonts-go; .ci/run installs it); --text outlines is the remedy where they cannot be", why)
		fmt.Println(msg)
		t.Log(msg)
	}
}

// installedGoFonts says whether fontconfig, which rsvg-convert asks (via
// Pango) for the families an SVG names, resolves the installed family
// of every face, in its weight and style, to a Go font whose advance
// widths are those of the embedded face for every character the demo
// sheets print, or narrower (Debian's fonts-go is version 2.008 of the
// Go fonts, the embedded faces 2.010: 2.008 sets ¹ ² ³ ⁿ narrower and
// lacks the other super- and subscript digits, which the sheets do not
// print). why says what is missing.
func installedGoFonts(t *testing.T, sheets []viewerSheet) (ok bool, why string) {
	t.Helper()
	fcMatch, err := exec.LookPath("fc-match")
	if err != nil {
		return false, "no fc-match on PATH to ask fontconfig for the Go fonts (Debian: fontconfig)"
	}
	printed := printedRunes(sheets)
	for _, f := range draw.FontStyles {
		family, _ := out.SystemFamily(f)
		pattern, style := family, "Regular"
		switch f {
		case draw.Bold:
			pattern, style = family+":bold", "Bold"
		case draw.Italic:
			pattern, style = family+":italic", "Italic"
		}
		res, err := exec.Command(fcMatch, "-f", "%{family[0]}\t%{style[0]}\t%{file}", pattern).Output()
		if err != nil {
			return false, fmt.Sprintf("fc-match %q: %v", pattern, err)
		}
		got := strings.Split(string(res), "\t")
		if len(got) != 3 || got[0] != family || got[1] != style {
			return false, fmt.Sprintf("the Go fonts are not installed: fontconfig gives %q for %q", res, pattern)
		}
		if diff := advanceDiffs(t, f, got[2], printed); diff != "" {
			return false, fmt.Sprintf("the installed %s (%s) is not the embedded face: %s", draw.FontName(f), got[2], diff)
		}
	}
	return true, ""
}

// printedRunes is every character the sheets print.
func printedRunes(sheets []viewerSheet) map[rune]bool {
	seen := map[rune]bool{}
	var walk func(items []draw.Item)
	walk = func(items []draw.Item) {
		for _, it := range items {
			switch it := it.(type) {
			case draw.Text:
				for _, r := range it.S {
					seen[r] = true
				}
			case draw.Clip:
				walk(it.Items)
			}
		}
	}
	for _, s := range sheets {
		walk(s.page().Items)
	}
	return seen
}

// advanceDiffs names the printed characters an installed font file lacks
// or sets wider than the embedded face f: they would push a text past
// the box layout measured with the embedded face. Characters it sets
// narrower only end a text early, inside its box; they are logged.
func advanceDiffs(t *testing.T, f draw.FontStyle, file string, printed map[rune]bool) string {
	t.Helper()
	b, err := os.ReadFile(file)
	if err != nil {
		return err.Error()
	}
	sys, err := sfnt.Parse(b)
	if err != nil {
		return err.Error()
	}
	emb, err := sfnt.Parse(draw.FontData(f))
	if err != nil {
		t.Fatal(err)
	}
	var buf sfnt.Buffer
	width := func(fnt *sfnt.Font, r rune) (fixed.Int26_6, bool) {
		g, err := fnt.GlyphIndex(&buf, r)
		if err != nil || g == 0 {
			return 0, false
		}
		a, err := fnt.GlyphAdvance(&buf, g, fixed.I(int(fnt.UnitsPerEm())), font.HintingNone)
		return a, err == nil
	}
	var wider, narrower []string
	for r := range printed {
		want, inEmb := width(emb, r)
		got, inSys := width(sys, r)
		switch {
		case !inEmb:
		case !inSys || got > want:
			wider = append(wider, fmt.Sprintf("%q", r))
		case got < want:
			narrower = append(narrower, fmt.Sprintf("%q (%d of %d units)", r, got.Round(), want.Round()))
		}
	}
	sort.Strings(wider)
	sort.Strings(narrower)
	if len(narrower) > 0 {
		t.Logf("the installed %s sets narrower than the embedded face: %s", draw.FontName(f), strings.Join(narrower, ", "))
	}
	if len(wider) == 0 {
		return ""
	}
	return "it lacks or sets wider " + strings.Join(wider, " ")
}

// TestRsvgCheckSeesATextOutOfItsBox shows the check has teeth: one label
// moved 12 pt right of where its box says is reported, and only it.
func TestRsvgCheckSeesATextOutOfItsBox(t *testing.T) {
	rsvg := tool(t, "rsvg-convert text-box test", "librsvg2-bin", "rsvg-convert")
	p := demoDocs(t)[1].doc.Pages[0] // MW-1
	inked := inkTexts(t, p)
	moved := -1
	for i, it := range inked.page.Items {
		if tx, ok := it.(draw.Text); ok && tx.Rotate == 0 && len(tx.S) > 10 {
			tx.At.X += 12
			inked.page.Items[i] = tx
			moved = i
			break
		}
	}
	if moved < 0 {
		t.Fatal("no text to move")
	}
	escapes := inked.escapes(decodePNG(t, rsvgRaster(t, rsvg, inked.page, out.TextAsOutlines)))
	if len(escapes) != 1 {
		t.Fatalf("%d texts reported out of their box, want the 1 moved: %v", len(escapes), escapes)
	}
	t.Logf("reported: %s", escapes[0])
}

// inkedPage is a sheet's text alone, each text in a colour of its own,
// with the box layout measured for it.
type inkedPage struct {
	page  *draw.Page
	boxes []textBox
}

type textBox struct {
	s string
	r draw.Rect // page points: the text's extent, cut by its clip
}

// inkLevels is the step between the colour levels that name a text: 16
// levels a channel, 4,095 texts a sheet. A pixel blended from two texts
// seldom lands on the grid in all three channels.
const inkStep = 17

func inkOf(k int) draw.Color {
	return draw.Color{R: uint8(inkStep * (k % 16)), G: uint8(inkStep * (k / 16 % 16)), B: uint8(inkStep * (k / 256 % 16)), A: 255}
}

// indexOf reads a text's number back from a fully covered pixel.
func indexOf(r, g, b uint8) (int, bool) {
	if r%inkStep != 0 || g%inkStep != 0 || b%inkStep != 0 {
		return 0, false
	}
	k := int(r/inkStep) + 16*int(g/inkStep) + 256*int(b/inkStep)
	return k, k > 0
}

// inkTexts keeps a page's texts, under their clips, in their colours.
func inkTexts(t *testing.T, p *draw.Page) *inkedPage {
	t.Helper()
	ip := &inkedPage{page: &draw.Page{Width: p.Width, Height: p.Height}}
	ip.page.Items = ip.keep(p.Items, nil)
	if len(ip.boxes) >= 16*16*16 {
		t.Fatalf("%d texts on one sheet: more than the colours that name them", len(ip.boxes))
	}
	return ip
}

func (ip *inkedPage) keep(items []draw.Item, clip *draw.Rect) []draw.Item {
	var kept []draw.Item
	for _, it := range items {
		switch it := it.(type) {
		case draw.Text:
			if strings.TrimSpace(it.S) == "" || it.Size <= 0 {
				continue
			}
			r := textExtent(it)
			if clip != nil {
				r = out.Intersect(r, *clip)
			}
			ip.boxes = append(ip.boxes, textBox{s: it.S, r: r})
			it.Color = inkOf(len(ip.boxes))
			kept = append(kept, it)
		case draw.Clip:
			c := it.Rect
			if clip != nil {
				c = out.Intersect(c, *clip)
			}
			if inner := ip.keep(it.Items, &c); len(inner) > 0 {
				kept = append(kept, draw.Clip{Rect: it.Rect, Items: inner})
			}
		}
	}
	return kept
}

// textExtent is the rectangle layout gives a text: its measured width
// from the anchor, ascent above and descent below the baseline, turned
// by its rotation (degrees, counter-clockwise on the page).
func textExtent(tx draw.Text) draw.Rect {
	w := draw.TextWidth(tx.Font, tx.Size, tx.S)
	x0 := 0.0
	switch tx.Anchor {
	case draw.Middle:
		x0 = -w / 2
	case draw.End:
		x0 = -w
	}
	asc, desc := draw.Ascent(tx.Font, tx.Size), draw.Descent(tx.Font, tx.Size)
	sin, cos := math.Sincos(tx.Rotate * math.Pi / 180)
	minX, minY, maxX, maxY := math.Inf(1), math.Inf(1), math.Inf(-1), math.Inf(-1)
	for _, c := range [][2]float64{{x0, -asc}, {x0 + w, -asc}, {x0, desc}, {x0 + w, desc}} {
		// local y points down the page; a turn counter-clockwise on the
		// page is clockwise in these coordinates
		x := tx.At.X + c[0]*cos + c[1]*sin
		y := tx.At.Y - c[0]*sin + c[1]*cos
		minX, maxX = math.Min(minX, x), math.Max(maxX, x)
		minY, maxY = math.Min(minY, y), math.Max(maxY, y)
	}
	return draw.Rect{X: minX, Y: minY, W: maxX - minX, H: maxY - minY}
}

// slackPt is how far a fully covered pixel's centre may lie outside its
// text's box: one pixel of rounding and a quarter point for glyphs that
// reach past the face's ascent (accents) or the advance (italics).
const slackPt = 72.0/rsvgDPI + 0.25

// escapes names each text with fully covered pixels outside its box,
// with how far the furthest lies.
func (ip *inkedPage) escapes(img image.Image) []string {
	far := make([]float64, len(ip.boxes)+1)
	count := make([]int, len(ip.boxes)+1)
	eachTextPixel(img, len(ip.boxes), func(x, y, k int) {
		box := ip.boxes[k-1].r
		px := (float64(x) + 0.5) * 72 / rsvgDPI
		py := (float64(y) + 0.5) * 72 / rsvgDPI
		d := math.Max(math.Max(box.X-px, px-box.Right()), math.Max(box.Y-py, py-box.Bottom()))
		if d > slackPt {
			count[k]++
			far[k] = math.Max(far[k], d)
		}
	})
	var out []string
	for k := 1; k < len(count); k++ {
		if count[k] >= 3 { // a stray pixel or two is rounding
			out = append(out, fmt.Sprintf("%q leaves its box by %.1f pt (%d pixels)", ip.boxes[k-1].s, far[k], count[k]))
		}
	}
	return out
}

// raster is a PNG with its decoded image.
type raster struct {
	png []byte
	img image.Image
}

func rsvgRasterImage(t *testing.T, rsvg string, p *draw.Page, mode out.TextMode) raster {
	t.Helper()
	b := rsvgRaster(t, rsvg, p, mode)
	return raster{png: b, img: decodePNG(t, b)}
}

// rsvgRaster writes the page as SVG and rasterises it with rsvg-convert
// on a transparent ground.
func rsvgRaster(t *testing.T, rsvg string, p *draw.Page, mode out.TextMode) []byte {
	t.Helper()
	svg, err := out.SVGWith(&draw.Document{Pages: []*draw.Page{p}}, 0, out.EncodeOptions{Text: mode})
	if err != nil {
		t.Fatal(err)
	}
	dir := t.TempDir()
	in, res := filepath.Join(dir, "sheet.svg"), filepath.Join(dir, "sheet.png")
	if err := os.WriteFile(in, svg, 0o644); err != nil {
		t.Fatal(err)
	}
	dpi := fmt.Sprint(rsvgDPI)
	if msg, err := exec.Command(rsvg, "--dpi-x", dpi, "--dpi-y", dpi, "-o", res, in).CombinedOutput(); err != nil {
		t.Fatalf("rsvg-convert: %v: %s", err, msg)
	}
	b, err := os.ReadFile(res)
	if err != nil {
		t.Fatal(err)
	}
	return b
}
