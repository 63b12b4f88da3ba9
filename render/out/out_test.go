package out

import (
	"bytes"
	"encoding/base64"
	"encoding/xml"
	"errors"
	"image"
	"image/color"
	"image/png"
	"io"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"github.com/pdfcpu/pdfcpu/pkg/api"
	"github.com/pdfcpu/pdfcpu/pkg/pdfcpu/model"
	"github.com/pdfcpu/pdfcpu/pkg/pdfcpu/types"
	"golang.org/x/image/font"
	"golang.org/x/image/font/sfnt"
	"golang.org/x/image/math/fixed"

	"github.com/tremie-dev/tremie/render/draw"
)

// drawnStrings are texts of sampleDoc drawn whole (not cut by a clip).
var drawnStrings = []string{
	"MW-7 construction log",
	"Screen 12.0–22.0 ft, slot 0.010 in; 12 °C ± 0.5, 250 µm",
	"Logged by Zoë Ångström-Núñez <script>alert(1)</script> & co",
	"right-aligned mono 0123",
	"reads upward",
	"inside clip",
	"Sheet 2 of 2 — match line 50.0 ft",
}

// svgText parses an SVG with encoding/xml, failing on any syntax error,
// and returns the character data of its text elements and every element
// name seen.
func svgText(t *testing.T, b []byte) (texts []string, elements map[string]int) {
	t.Helper()
	dec := xml.NewDecoder(bytes.NewReader(b))
	elements = map[string]int{}
	depth := 0
	var cur strings.Builder
	for {
		tok, err := dec.Token()
		if err == io.EOF {
			break
		}
		if err != nil {
			t.Fatalf("SVG does not parse as XML: %v", err)
		}
		switch tok := tok.(type) {
		case xml.StartElement:
			elements[tok.Name.Local]++
			if tok.Name.Local == "text" {
				depth++
				cur.Reset()
			}
		case xml.EndElement:
			if tok.Name.Local == "text" {
				depth--
				texts = append(texts, cur.String())
			}
		case xml.CharData:
			if depth > 0 {
				cur.Write(tok)
			}
		}
	}
	return texts, elements
}

func TestSVGIsXMLWithEscapedText(t *testing.T) {
	doc := sampleDoc()
	for i := range doc.Pages {
		b, err := SVG(doc, i)
		if err != nil {
			t.Fatal(err)
		}
		texts, elements := svgText(t, b)
		if elements["svg"] != 1 {
			t.Errorf("page %d: %d svg elements", i+1, elements["svg"])
		}
		if elements["script"] != 0 {
			t.Errorf("page %d: input text became a <script> element", i+1)
		}
		if i == 0 {
			all := strings.Join(texts, "\n")
			for _, s := range drawnStrings[:6] {
				if !strings.Contains(all, s) {
					t.Errorf("SVG text lacks %q", s)
				}
			}
		}
	}
}

var fontFaceRE = regexp.MustCompile(`@font-face\{font-family:'([^']+)'[^}]*?;src:url\('data:type/opentype;base64,([A-Za-z0-9+/=]+)'\);\}`)

// TestSVGFontsCoverTheirText checks the self-contained SVG: each embedded
// (subset) face, parsed by golang.org/x/image/font/sfnt, maps every
// character the SVG sets in it to a real glyph with the advance the
// original face gives, so a viewer needs nothing outside the file.
func TestSVGFontsCoverTheirText(t *testing.T) {
	b, err := SVG(sampleDoc(), 0)
	if err != nil {
		t.Fatal(err)
	}
	faces := map[string]*sfnt.Font{}
	for _, m := range fontFaceRE.FindAllSubmatch(b, -1) {
		data, err := base64.StdEncoding.DecodeString(string(m[2]))
		if err != nil {
			t.Fatalf("font %s: %v", m[1], err)
		}
		f, err := sfnt.Parse(data)
		if err != nil {
			t.Fatalf("embedded font %s does not parse: %v", m[1], err)
		}
		faces[string(m[1])] = f
	}
	if len(faces) != 4 {
		t.Fatalf("embedded %d faces, want the 4 the page uses", len(faces))
	}
	originals := map[string]draw.FontStyle{}
	for _, fs := range draw.FontStyles {
		orig, _ := sfnt.Parse(draw.FontData(fs))
		name, _ := orig.Name(nil, sfnt.NameIDPostScript)
		originals[name] = fs
	}
	// <text ... style="font: ... NAME"><tspan ...>TEXT</tspan></text>, or
	// with the style as a class (compactSVG) and the text without a tspan.
	classes := map[string]string{}
	for _, m := range regexp.MustCompile(`\.([a-z0-9]+)\{([^}]*)\}`).FindAllSubmatch(b, -1) {
		classes[string(m[1])] = string(m[2])
	}
	textRE := regexp.MustCompile(`<text[^>]*(?:style="([^"]*)"|class="([^"]*)")>(?:<tspan[^>]*>)?([^<]*)(?:</tspan>)?</text>`)
	fontRE := regexp.MustCompile(`^font:[^;]*?px ([A-Za-z-]+)`)
	var buf sfnt.Buffer
	checked := 0
	for _, m := range textRE.FindAllSubmatch(b, -1) {
		st := string(m[1])
		if len(m[2]) > 0 {
			st = classes[string(m[2])]
		}
		fm := fontRE.FindStringSubmatch(st)
		if fm == nil {
			t.Errorf("text %q has no font in its style %q", m[3], st)
			continue
		}
		m = [][]byte{m[0], []byte(fm[1]), m[3]}
		name := string(m[1])
		f, ok := faces[name]
		if !ok {
			t.Errorf("text set in %s, which is not embedded", name)
			continue
		}
		style, ok := originals[name]
		if !ok {
			t.Errorf("embedded face %s is not one of ours", name)
			continue
		}
		var s string
		if err := xml.Unmarshal([]byte("<a>"+string(m[2])+"</a>"), &s); err != nil {
			t.Fatal(err)
		}
		for _, r := range s {
			g, err := f.GlyphIndex(&buf, r)
			if err != nil || g == 0 {
				t.Errorf("%s lacks %q in the SVG", name, r)
				continue
			}
			adv, err := f.GlyphAdvance(&buf, g, fixed.I(int(f.UnitsPerEm())), font.HintingNone)
			if err != nil {
				t.Fatal(err)
			}
			want := draw.TextWidth(style, float64(f.UnitsPerEm()), string(r))
			if math.Abs(float64(adv)/64-want) > 1e-9 {
				t.Errorf("%s %q advance %v, original %v", name, r, float64(adv)/64, want)
			}
			checked++
		}
	}
	if checked < 100 {
		t.Errorf("checked only %d characters", checked)
	}
}

func pdfcpuConf() *model.Configuration {
	api.DisableConfigDir()
	conf := model.NewDefaultConfiguration()
	conf.ValidationMode = model.ValidationStrict
	return conf
}

// TestPDFValidates runs pdfcpu's strict validation (ISO 32000-1) and reads
// back the page count, page sizes and information dictionary.
func TestPDFValidates(t *testing.T) {
	doc := sampleDoc()
	b, err := PDF(doc)
	if err != nil {
		t.Fatal(err)
	}
	conf := pdfcpuConf()
	if err := api.Validate(bytes.NewReader(b), conf); err != nil {
		t.Fatalf("pdfcpu strict validation: %v", err)
	}
	info, err := api.PDFInfo(bytes.NewReader(b), "sample.pdf", nil, true, conf)
	if err != nil {
		t.Fatal(err)
	}
	if info.PageCount != len(doc.Pages) {
		t.Errorf("pdfcpu counts %d pages, want %d", info.PageCount, len(doc.Pages))
	}
	for i, pb := range info.PageBoundaries {
		r := pb.MediaBox()
		if p := doc.Pages[i]; math.Abs(r.Width()-p.Width) > 0.01 || math.Abs(r.Height()-p.Height) > 0.01 {
			t.Errorf("page %d media box %.2f × %.2f pt, want %g × %g", i+1, r.Width(), r.Height(), p.Width, p.Height)
		}
	}
	if info.Title != doc.Title || info.Author != doc.Author {
		t.Errorf("info title %q author %q, want %q %q", info.Title, info.Author, doc.Title, doc.Author)
	}
	// 2024-05-17T09:30:00-07:00 in the PDF date form (ISO 32000-1, 7.9.4).
	if !strings.Contains(string(b), "/CreationDate (D:20240517093000-07'00')") {
		t.Errorf("creation date not taken from Document.Date")
	}
	embedded := 0
	for _, f := range info.Fonts {
		if f.Embedded {
			embedded++
		}
	}
	if embedded != 4 {
		t.Errorf("%d embedded fonts, want the 4 faces used: %+v", embedded, info.Fonts)
	}
}

// TestPDFTextIsSearchable extracts the text with poppler's pdftotext, an
// independent reader, through the fonts' ToUnicode maps.
func TestPDFTextIsSearchable(t *testing.T) {
	tool, err := exec.LookPath("pdftotext")
	if err != nil {
		t.Skip("pdftotext (poppler-utils) not installed")
	}
	b, err := PDF(sampleDoc())
	if err != nil {
		t.Fatal(err)
	}
	path := filepath.Join(t.TempDir(), "sample.pdf")
	if err := os.WriteFile(path, b, 0o644); err != nil {
		t.Fatal(err)
	}
	txt, err := exec.Command(tool, "-enc", "UTF-8", path, "-").Output()
	if err != nil {
		t.Fatalf("pdftotext: %v", err)
	}
	for _, s := range drawnStrings {
		if !strings.Contains(string(txt), s) {
			t.Errorf("extracted text lacks %q:\n%s", s, txt)
		}
	}
}

func decodePNG(t *testing.T, b []byte) image.Image {
	t.Helper()
	img, err := png.Decode(bytes.NewReader(b))
	if err != nil {
		t.Fatalf("PNG does not decode: %v", err)
	}
	return img
}

func TestPNGSize(t *testing.T) {
	doc := sampleDoc()
	cases := []struct {
		page int
		dpi  float64
		w, h int
	}{
		{0, 72, 612, 792},    // Letter 8.5 × 11 in at 72 dpi
		{0, 150, 1275, 1650}, // 8.5 × 150, 11 × 150
		{1, 100, 1169, 826},  // A4 landscape 842 × 595 pt: 11.694 × 8.264 in
	}
	for _, c := range cases {
		b, err := PNG(doc, c.page, c.dpi)
		if err != nil {
			t.Fatal(err)
		}
		img := decodePNG(t, b)
		if got := img.Bounds().Size(); got.X != c.w || got.Y != c.h {
			t.Errorf("page %d at %g dpi: %v px, want %d × %d", c.page+1, c.dpi, got, c.w, c.h)
		}
	}
}

func near(c color.Color, want draw.Color, tol int) bool {
	r, g, b, _ := c.RGBA()
	d := func(v uint32, w uint8) bool { return math.Abs(float64(v>>8)-float64(w)) <= float64(tol) }
	return d(r, want.R) && d(g, want.G) && d(b, want.B)
}

// TestPNGGeometry reads pixels back: positions convert from top-left
// points at dpi/72 pixels per point, and a clip cuts exactly.
func TestPNGGeometry(t *testing.T) {
	blue, red := draw.RGB(0, 0, 200), draw.RGB(200, 0, 0)
	p := &draw.Page{Width: 200, Height: 100}
	p.Add(
		draw.Box{Rect: draw.Rect{X: 10, Y: 20, W: 30, H: 40}, Style: draw.Style{Fill: blue}},
		draw.Clip{Rect: draw.Rect{X: 100, Y: 10, W: 50, H: 50}, Items: []draw.Item{
			draw.Box{Rect: draw.Rect{X: 80, Y: 0, W: 100, H: 100}, Style: draw.Style{Fill: red}},
			draw.Circle{Center: draw.Point{X: 150, Y: 60}, R: 30, Style: draw.Style{Fill: blue}},
		}},
		draw.Image{Rect: draw.Rect{X: 160, Y: 70, W: 40, H: 20}, Data: testImage4()},
	)
	doc := &draw.Document{Pages: []*draw.Page{p}}
	img := decodePNG(t, must(PNG(doc, 0, 144))) // 2 px per point
	at := func(x, y float64) color.Color { return img.At(int(x*2), int(y*2)) }
	checks := []struct {
		x, y float64
		want draw.Color
		what string
	}{
		{25, 40, blue, "inside the box"},
		{11, 21, blue, "just inside the box's top-left corner"},
		{9, 40, draw.White, "left of the box"},
		{25, 61, draw.White, "below the box"},
		{105, 15, red, "clipped box inside the clip"},
		{95, 15, draw.White, "clipped box left of the clip"},
		{105, 61, draw.White, "clipped box below the clip"},
		{151, 30, draw.White, "clipped box right of the clip"},
		{140, 55, blue, "circle quarter inside the clip"},
		{155, 62, draw.White, "circle outside the clip"},
		// Rows of 5 pt; sampled at row centres, where the renderer's
		// Catmull-Rom resampling returns the source value.
		{182.5, 72.5, draw.RGB(220, 0, 0), "image top row at the top"},
		{182.5, 87.5, draw.RGB(0, 0, 220), "image bottom row at the bottom"},
	}
	for _, c := range checks {
		if got := at(c.x, c.y); !near(got, c.want, 8) {
			t.Errorf("(%g, %g) pt, %s: %v, want %v", c.x, c.y, c.what, got, c.want)
		}
	}
}

// TestTextAnchors checks that Middle and End place the ink where layout
// measured it: the inked span of a centred word is centred on At.
func TestTextAnchors(t *testing.T) {
	for _, a := range []draw.Anchor{draw.Start, draw.Middle, draw.End} {
		p := &draw.Page{Width: 300, Height: 60}
		s := "HIMH"
		p.Add(draw.Text{At: draw.Point{X: 150, Y: 40}, S: s, Size: 24, Anchor: a})
		img := decodePNG(t, must(PNG(&draw.Document{Pages: []*draw.Page{p}}, 0, 72)))
		minX, maxX := 1000, -1
		for y := 0; y < 60; y++ {
			for x := 0; x < 300; x++ {
				if r, _, _, _ := img.At(x, y).RGBA(); r < 0x8000 {
					minX, maxX = min(minX, x), max(maxX, x)
				}
			}
		}
		w := draw.TextWidth(draw.Regular, 24, s)
		start := map[draw.Anchor]float64{draw.Start: 150, draw.Middle: 150 - w/2, draw.End: 150 - w}[a]
		// H and M have side bearings of a few points; ink lies within the
		// advance box and covers most of it.
		if float64(minX) < start-1 || float64(maxX) > start+w+1 || float64(maxX-minX) < 0.8*w {
			t.Errorf("anchor %d: ink %d..%d px, advance box %.1f..%.1f", a, minX, maxX, start, start+w)
		}
	}
}

// testImage4 is a 4 × 4 PNG, two red rows over two blue.
func testImage4() []byte {
	img := image.NewRGBA(image.Rect(0, 0, 4, 4))
	for x := 0; x < 4; x++ {
		for y := 0; y < 4; y++ {
			c := color.RGBA{220, 0, 0, 255}
			if y >= 2 {
				c = color.RGBA{0, 0, 220, 255}
			}
			img.Set(x, y, c)
		}
	}
	var b bytes.Buffer
	png.Encode(&b, img)
	return b.Bytes()
}

func must(b []byte, err error) []byte {
	if err != nil {
		panic(err)
	}
	return b
}

// TestDeterministic renders each format several times: the SVG font
// rules and PDF objects come from maps inside canvas, so one repeat would
// not be enough to catch an order change.
func TestDeterministic(t *testing.T) {
	first := map[string][]byte{}
	for run := 0; run < 5; run++ {
		doc := sampleDoc()
		got := map[string][]byte{
			"svg": must(SVG(doc, 0)),
			"pdf": must(PDF(doc)),
			"png": must(PNG(doc, 0, 96)),
		}
		for k, v := range got {
			if run == 0 {
				first[k] = v
			} else if !bytes.Equal(first[k], v) {
				t.Errorf("%s differs between run 1 and run %d", k, run+1)
			}
		}
	}
	// Without a date the PDF has none, rather than the clock's.
	doc := sampleDoc()
	doc.Date = ""
	if b := must(PDF(doc)); bytes.Contains(b, []byte("CreationDate")) {
		t.Error("a PDF without Document.Date carries a creation date")
	}
}

// headDates reads the created and modified dates of a font program
// (OpenType head table, offsets 20 and 28). PDF font programs keep only
// the tables a PDF needs (no cmap), so no full font parser reads them.
func headDates(t *testing.T, ttf []byte) (created, modified uint64) {
	t.Helper()
	if len(ttf) < 12 || string(ttf[:4]) != "\x00\x01\x00\x00" {
		t.Fatalf("not a TrueType program: % x", ttf[:min(len(ttf), 4)])
	}
	n := int(ttf[4])<<8 | int(ttf[5])
	for i := 0; i < n; i++ {
		rec := ttf[12+16*i:]
		if string(rec[:4]) == "head" {
			off := int(rec[8])<<24 | int(rec[9])<<16 | int(rec[10])<<8 | int(rec[11])
			be := func(b []byte) uint64 {
				var v uint64
				for _, c := range b[:8] {
					v = v<<8 | uint64(c)
				}
				return v
			}
			return be(ttf[off+20:]), be(ttf[off+28:])
		}
	}
	t.Fatal("no head table")
	return 0, 0
}

// TestFontsCarryNoClock: canvas's font writer stamps the time of writing
// into each font; the output must carry the font's own date instead, or
// two runs a second apart differ.
func TestFontsCarryNoClock(t *testing.T) {
	doc := sampleDoc()
	svgb := must(SVG(doc, 0))
	fonts := 0
	for _, m := range fontFaceRE.FindAllSubmatch(svgb, -1) {
		ttf, _ := base64.StdEncoding.DecodeString(string(m[2]))
		if c, mod := headDates(t, ttf); c != mod {
			t.Errorf("SVG font %s modified %d, created %d", m[1], mod, c)
		}
		fonts++
	}
	// pdfcpu parses the PDF and inflates every FontFile2 stream.
	ctx, err := api.ReadContext(bytes.NewReader(must(PDF(doc))), pdfcpuConf())
	if err != nil {
		t.Fatal(err)
	}
	var refs []types.IndirectRef
	var find func(o types.Object)
	find = func(o types.Object) {
		switch o := o.(type) {
		case types.Dict:
			for k, v := range o {
				if r, ok := v.(types.IndirectRef); ok && k == "FontFile2" {
					refs = append(refs, r)
				}
				find(v)
			}
		case types.Array:
			for _, v := range o {
				find(v)
			}
		}
	}
	for _, e := range ctx.XRefTable.Table {
		find(e.Object)
	}
	for _, ref := range refs {
		sd, _, err := ctx.DereferenceStreamDict(ref)
		if err != nil || sd == nil {
			t.Fatalf("font file %v: %v", ref, err)
		}
		if err := sd.Decode(); err != nil {
			t.Fatal(err)
		}
		if c, mod := headDates(t, sd.Content); c != mod {
			t.Errorf("PDF font %v modified %d, created %d", ref, mod, c)
		}
		fonts++
	}
	if fonts != 8 {
		t.Errorf("checked %d fonts, want 4 in the SVG and 4 in the PDF", fonts)
	}
}

func TestBadInput(t *testing.T) {
	nan := math.NaN()
	bad := []struct {
		name string
		page *draw.Page
	}{
		{"NaN box", &draw.Page{Width: 100, Height: 100, Items: []draw.Item{draw.Box{Rect: draw.Rect{X: nan, W: 10, H: 10}, Style: draw.Style{Fill: draw.Black}}}}},
		{"infinite text", &draw.Page{Width: 100, Height: 100, Items: []draw.Item{draw.Text{At: draw.Point{X: math.Inf(1)}, S: "x", Size: 9}}}},
		{"NaN in clip", &draw.Page{Width: 100, Height: 100, Items: []draw.Item{draw.Clip{Rect: draw.Rect{W: 50, H: 50}, Items: []draw.Item{draw.Circle{R: nan}}}}}},
		{"bad image", &draw.Page{Width: 100, Height: 100, Items: []draw.Item{draw.Image{Rect: draw.Rect{W: 10, H: 10}, Data: []byte("not an image")}}}},
		{"zero page", &draw.Page{}},
		{"huge page", &draw.Page{Width: 1e6, Height: 100}},
	}
	for _, c := range bad {
		doc := &draw.Document{Pages: []*draw.Page{c.page}}
		if _, err := SVG(doc, 0); err == nil {
			t.Errorf("%s: SVG gave no error", c.name)
		}
		if _, err := PDF(doc); err == nil {
			t.Errorf("%s: PDF gave no error", c.name)
		}
		if _, err := PNG(doc, 0, 72); err == nil {
			t.Errorf("%s: PNG gave no error", c.name)
		}
	}
	doc := sampleDoc()
	if _, err := SVG(doc, 2); err == nil {
		t.Error("page out of range: no error")
	}
	if _, err := PNG(doc, 0, 0); err == nil {
		t.Error("0 dpi: no error")
	}
	if _, err := PNG(doc, 0, 100000); err == nil {
		t.Error("100000 dpi: no error")
	}
	if _, err := PDF(nil); err == nil {
		t.Error("nil document: no error")
	}
	doc.Date = "last Tuesday"
	if _, err := PDF(doc); err == nil {
		t.Error("bad date: no error")
	}
	// Degenerate but drawable items are skipped, not errors.
	odd := &draw.Page{Width: 100, Height: 100, Items: []draw.Item{
		draw.Shape{Points: []draw.Point{{X: 1, Y: 1}}, Style: draw.Style{Stroke: draw.Black}},
		draw.Circle{R: -3, Style: draw.Style{Fill: draw.Black}},
		draw.Text{S: "   ", Size: 9},
		draw.Text{S: "ctrl\x00\x07chars\nand\u2028breaks", Size: 9, At: draw.Point{X: 5, Y: 50}},
		draw.Box{Rect: draw.Rect{X: 50, Y: 50, W: -20, H: -20}, Style: draw.Style{Fill: draw.Black, Dash: []float64{0, 0}}},
		draw.Clip{Rect: draw.Rect{W: -5, H: 5}, Items: []draw.Item{draw.Box{Rect: draw.Rect{W: 5, H: 5}}}},
		nil,
	}}
	oddDoc := &draw.Document{Pages: []*draw.Page{odd}}
	if _, err := SVG(oddDoc, 0); err != nil {
		t.Errorf("odd items: %v", err)
	}
	if b, err := PDF(oddDoc); err != nil {
		t.Errorf("odd items: %v", err)
	} else if err := api.Validate(bytes.NewReader(b), pdfcpuConf()); err != nil {
		t.Errorf("odd items PDF invalid: %v", err)
	}
	svgb, _ := SVG(oddDoc, 0)
	svgText(t, svgb) // control characters must not break the XML
}

func TestWriteFileAtomic(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "MW-1.svg")
	if err := WriteFileAtomic(path, []byte("first")); err != nil {
		t.Fatal(err)
	}
	if err := WriteFileAtomic(path, []byte("second")); err != nil {
		t.Fatal(err)
	}
	if b, _ := os.ReadFile(path); string(b) != "second" {
		t.Errorf("content %q", b)
	}
	entries, _ := os.ReadDir(dir)
	if len(entries) != 1 {
		t.Errorf("directory holds %d entries, want 1 (no temp left)", len(entries))
	}
	if fi, _ := os.Stat(path); fi.Mode().Perm() != 0o644 {
		t.Errorf("mode %v", fi.Mode().Perm())
	}
	// A target that cannot be replaced (a directory) fails and leaves no
	// temporary file behind.
	sub := filepath.Join(dir, "sub")
	os.Mkdir(sub, 0o755)
	os.WriteFile(filepath.Join(sub, "keep"), nil, 0o644)
	if err := WriteFileAtomic(sub, []byte("x")); err == nil {
		t.Error("writing over a non-empty directory succeeded")
	}
	entries, _ = os.ReadDir(dir)
	if len(entries) != 2 {
		t.Errorf("after a failed write the directory holds %d entries, want 2", len(entries))
	}
	if err := WriteFileAtomic(filepath.Join(dir, "missing", "x.pdf"), nil); err == nil || !errors.Is(err, os.ErrNotExist) {
		t.Errorf("missing directory: %v", err)
	}
}

// TestPDFDate checks the PDF date form of ISO 32000-1, 7.9.4:
// D:YYYYMMDDHHmmSS then the offset from UT as +HH'mm' or -HH'mm'.
func TestPDFDate(t *testing.T) {
	for in, want := range map[string]string{
		"2024-05-17T09:30:00Z":      "D:20240517093000+00'00'",
		"2024-05-17T09:30:00+05:30": "D:20240517093000+05'30'",
		"2024-12-31T23:59:59-03:00": "D:20241231235959-03'00'",
		"2024-05-17":                "D:20240517000000+00'00'",
	} {
		got, err := pdfDate(in)
		if err != nil || got != want {
			t.Errorf("pdfDate(%q) = %q, %v; want %q", in, got, err, want)
		}
	}
	if _, err := pdfDate("17/05/2024"); err == nil {
		t.Error("a non-RFC 3339 date was accepted")
	}
}
