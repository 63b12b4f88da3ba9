package out

import (
	"bytes"
	"encoding/base64"
	"encoding/xml"
	"fmt"
	"sort"

	"github.com/tdewolff/canvas"
	"github.com/tdewolff/canvas/renderers/svg"

	"github.com/tremie-dev/tremie/render/draw"
)

// SVG writes page i (0-based) of doc as a self-contained SVG: text stays
// text, set in the embedded faces, which travel inside the file as
// base64 font data. Sizes are in millimetres.
func SVG(doc *draw.Document, i int) ([]byte, error) { return SVGWith(doc, i, EncodeOptions{}) }

// SVGWith writes page i as SVG with the text mode of opt.
func SVGWith(doc *draw.Document, i int, opt EncodeOptions) ([]byte, error) {
	p, err := pageOf(doc, i)
	if err != nil {
		return nil, fmt.Errorf("svg: %w", err)
	}
	var buf bytes.Buffer
	opts := svg.DefaultOptions
	// Whole faces: canvas's own SVG subsetting is off by default upstream
	// (its glyph tables are not yet rewritten fully), and a viewer must
	// find every glyph the text names.
	opts.EmbedFonts = true
	opts.SubsetFonts = true
	r := newSVGRenderer(&buf, p.Width*mmPerPt, p.Height*mmPerPt, &opts)
	fonts := takeFonts()
	defer fonts.giveBack()
	patterns := newSVGPatterns(&buf)
	if err := paintPage(r, p, fonts, opt.Text, patterns); err != nil {
		return nil, fmt.Errorf("svg page %d: %w", i+1, err)
	}
	if err := r.Close(); err != nil {
		return nil, fmt.Errorf("svg page %d: %w", i+1, err)
	}
	b, err := pinSVGFonts(buf.Bytes())
	if err != nil {
		return nil, fmt.Errorf("svg page %d: %w", i+1, err)
	}
	return addTitle(compactSVG(sortFontFaces(patterns.insertDefs(stackSVGFonts(b, fonts)))), doc.Title), nil
}

func init() {
	// canvas writes every number with 8 significant digits (a hundredth
	// of a micrometre on a sheet); 6 (a micrometre, 1/350 pt, on a
	// Tabloid sheet's 432 mm) is still far finer than any printer or
	// screen resolves, and makes SVG and PDF a tenth smaller.
	canvas.Precision = 6
}

// svgFontData opens and svgFontEnd closes each embedded font canvas writes.
var svgFontData, svgFontEnd = []byte("src:url('data:type/opentype;base64,"), []byte("')")

// pinSVGFonts pins the date inside each embedded font (see pinFontDate).
// It scans for the few font URLs directly: the document is mostly path
// data, which a pattern match would read character by character.
func pinSVGFonts(b []byte) ([]byte, error) {
	var out []byte
	rest := b
	for {
		at := bytes.Index(rest, svgFontData)
		if at < 0 {
			break
		}
		start := at + len(svgFontData)
		n := bytes.Index(rest[start:], svgFontEnd)
		if n < 0 {
			break
		}
		ttf, err := base64.StdEncoding.DecodeString(string(rest[start : start+n]))
		if err == nil {
			ttf, err = pinFontDate(ttf)
		}
		if err != nil {
			return nil, fmt.Errorf("embedded font: %w", err)
		}
		if out == nil {
			out = make([]byte, 0, len(b))
		}
		out = append(out, rest[:start]...)
		out = base64.StdEncoding.AppendEncode(out, ttf)
		rest = rest[start+n:]
	}
	if out == nil {
		return b, nil
	}
	return append(out, rest...), nil
}

// sortFontFaces puts the @font-face rules canvas writes in a fixed order:
// it emits them from a map, whose order changes from run to run.
func sortFontFaces(b []byte) []byte {
	const open, rule, closing = "<style>", "\n@font-face", "\n</style>"
	start := bytes.LastIndex(b, []byte(open+rule))
	if start < 0 {
		return b
	}
	body := b[start+len(open):]
	end := bytes.Index(body, []byte(closing))
	if end < 0 {
		return b
	}
	rules := bytes.Split(body[:end], []byte(rule))[1:]
	sort.Slice(rules, func(i, j int) bool { return bytes.Compare(rules[i], rules[j]) < 0 })
	var out bytes.Buffer
	out.Write(b[:start+len(open)])
	for _, r := range rules {
		out.WriteString(rule)
		out.Write(r)
	}
	out.Write(body[end:])
	return out.Bytes()
}

// addTitle puts the document title in a <title> element, the SVG way to
// name a drawing for viewers and screen readers.
func addTitle(b []byte, title string) []byte {
	if title == "" {
		return b
	}
	at := bytes.IndexByte(b, '>')
	if at < 0 {
		return b
	}
	var t bytes.Buffer
	t.WriteString("<title>")
	xml.EscapeText(&t, []byte(cleanText(title)))
	t.WriteString("</title>")
	out := make([]byte, 0, len(b)+t.Len())
	out = append(out, b[:at+1]...)
	out = append(out, t.Bytes()...)
	return append(out, b[at+1:]...)
}
