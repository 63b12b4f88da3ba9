package draw

import (
	"fmt"
	"strings"
	"sync"
	"unicode"
	"unicode/utf8"

	"golang.org/x/image/font"
	"golang.org/x/image/font/gofont/gobold"
	"golang.org/x/image/font/gofont/goitalic"
	"golang.org/x/image/font/gofont/gomono"
	"golang.org/x/image/font/gofont/goregular"
	"golang.org/x/image/font/sfnt"
	"golang.org/x/image/math/fixed"
)

// The faces are the Go fonts (BSD licence), compiled into the binary so a
// sheet looks the same on every machine and no system font is consulted.
// Layout measures text here; backends embed the same bytes, so a width
// measured here is the width drawn.

// FontData returns the TrueType bytes of a face.
func FontData(f FontStyle) []byte {
	switch f {
	case Bold:
		return gobold.TTF
	case Italic:
		return goitalic.TTF
	case Mono:
		return gomono.TTF
	default:
		return goregular.TTF
	}
}

// FontName is the family name a backend may give the face.
func FontName(f FontStyle) string {
	switch f {
	case Bold:
		return "Go Bold"
	case Italic:
		return "Go Italic"
	case Mono:
		return "Go Mono"
	default:
		return "Go Regular"
	}
}

// FontStyles lists every embedded face.
var FontStyles = []FontStyle{Regular, Bold, Italic, Mono}

// face holds one parsed font and its metrics in font units.
type face struct {
	font       *sfnt.Font
	unitsPerEm float64
	ascent     float64
	descent    float64
	lineHeight float64
	capHeight  float64
	xHeight    float64

	latin   [256]glyph // runes below U+0100, looked up at parse: most of every label
	mu      sync.Mutex
	advance map[rune]glyph // other runes, as first measured
}

type glyph struct {
	index   sfnt.GlyphIndex
	advance float64 // font units
}

var (
	facesOnce sync.Once
	faces     [4]*face
)

func faceOf(f FontStyle) *face {
	facesOnce.Do(func() {
		for _, s := range FontStyles {
			fc, err := parseFace(FontData(s))
			if err != nil {
				// The bytes are compiled in; failing here is a build defect.
				panic(fmt.Sprintf("draw: embedded font %s: %v", FontName(s), err))
			}
			faces[s] = fc
		}
	})
	if f < 0 || int(f) >= len(faces) {
		f = Regular
	}
	return faces[f]
}

func parseFace(data []byte) (*face, error) {
	f, err := sfnt.Parse(data)
	if err != nil {
		return nil, fmt.Errorf("parse: %w", err)
	}
	upem := f.UnitsPerEm()
	var b sfnt.Buffer
	// At ppem = units per em, 26.6 values are exact font units.
	m, err := f.Metrics(&b, fixed.I(int(upem)), font.HintingNone)
	if err != nil {
		return nil, fmt.Errorf("metrics: %w", err)
	}
	fc := &face{
		font:       f,
		unitsPerEm: float64(upem),
		ascent:     units(m.Ascent),
		descent:    units(m.Descent),
		lineHeight: units(m.Height),
		capHeight:  units(m.CapHeight),
		xHeight:    units(m.XHeight),
		advance:    map[rune]glyph{},
	}
	for r := range fc.latin {
		fc.latin[r] = fc.lookUp(&b, rune(r))
	}
	return fc, nil
}

func units(v fixed.Int26_6) float64 { return float64(v) / 64 }

// glyphOf returns the glyph and advance for a rune; a rune the font lacks
// maps to glyph 0 (.notdef), which is also what the backends draw.
func (fc *face) glyphOf(r rune) glyph {
	if r >= 0 && r < rune(len(fc.latin)) {
		return fc.latin[r]
	}
	fc.mu.Lock()
	g, ok := fc.advance[r]
	fc.mu.Unlock()
	if ok {
		return g
	}
	var b sfnt.Buffer
	g = fc.lookUp(&b, r)
	fc.mu.Lock()
	fc.advance[r] = g
	fc.mu.Unlock()
	return g
}

// lookUp reads a rune's glyph and advance from the font.
func (fc *face) lookUp(b *sfnt.Buffer, r rune) glyph {
	ppem := fixed.I(int(fc.unitsPerEm))
	idx, err := fc.font.GlyphIndex(b, r)
	if err != nil {
		idx = 0
	}
	adv, err := fc.font.GlyphAdvance(b, idx, ppem, font.HintingNone)
	if err != nil {
		adv = 0
	}
	return glyph{index: idx, advance: units(adv)}
}

// width is the advance of s in font units, with pair kerning where the
// font has a kern table.
func (fc *face) width(s string) float64 {
	ppem := fixed.I(int(fc.unitsPerEm))
	w := 0.0
	prev := sfnt.GlyphIndex(0)
	first := true
	for _, r := range s {
		g := fc.glyphOf(r)
		if !first {
			// No buffer: sfnt makes one only for a font with a kern
			// table, and a Buffer made here for every call was most
			// of the time measuring took.
			if k, err := fc.font.Kern(nil, prev, g.index, ppem, font.HintingNone); err == nil {
				w += units(k)
			}
		}
		w += g.advance
		prev, first = g.index, false
	}
	return w
}

// TextWidth is the advance width of s set in font at size, in points.
func TextWidth(f FontStyle, size float64, s string) float64 {
	fc := faceOf(f)
	return fc.width(s) * size / fc.unitsPerEm
}

// Ascent is the height of the face above the baseline, in points.
func Ascent(f FontStyle, size float64) float64 {
	fc := faceOf(f)
	return fc.ascent * size / fc.unitsPerEm
}

// Descent is the depth of the face below the baseline (positive), in points.
func Descent(f FontStyle, size float64) float64 {
	fc := faceOf(f)
	return fc.descent * size / fc.unitsPerEm
}

// LineHeight is the font's recommended baseline-to-baseline distance, in
// points.
func LineHeight(f FontStyle, size float64) float64 {
	fc := faceOf(f)
	return fc.lineHeight * size / fc.unitsPerEm
}

// CapHeight is the height of capital letters above the baseline, in
// points; handy for centring a label on a line.
func CapHeight(f FontStyle, size float64) float64 {
	fc := faceOf(f)
	return fc.capHeight * size / fc.unitsPerEm
}

// XHeight is the height of lower-case letters such as x, in points.
func XHeight(f FontStyle, size float64) float64 {
	fc := faceOf(f)
	return fc.xHeight * size / fc.unitsPerEm
}

// Wrap breaks s into lines no wider than width points when set in font at
// size: greedy, word by word, with runs of white space collapsed to one
// space. A newline in s forces a break. A word wider than width is broken
// between characters; every line holds at least one character, so the
// result is finite for any width. Blank input gives no lines.
func Wrap(f FontStyle, size float64, s string, width float64) []string {
	var lines []string
	for _, para := range strings.Split(s, "\n") {
		lines = append(lines, wrapParagraph(f, size, para, width)...)
	}
	return lines
}

func wrapParagraph(f FontStyle, size float64, s string, width float64) []string {
	var lines []string
	line := ""
	for _, word := range strings.FieldsFunc(s, unicode.IsSpace) {
		if line != "" {
			if try := line + " " + word; TextWidth(f, size, try) <= width {
				line = try
				continue
			}
			lines = append(lines, line)
			line = ""
		}
		if TextWidth(f, size, word) <= width {
			line = word
			continue
		}
		pieces := breakWord(f, size, word, width)
		lines = append(lines, pieces[:len(pieces)-1]...)
		line = pieces[len(pieces)-1]
	}
	if line != "" {
		lines = append(lines, line)
	}
	return lines
}

// breakWord splits a word into pieces that each fit width, except a piece
// of a single character wider than width on its own.
func breakWord(f FontStyle, size float64, word string, width float64) []string {
	var pieces []string
	for word != "" {
		end := 0
		for end < len(word) {
			_, n := utf8.DecodeRuneInString(word[end:])
			if end > 0 && TextWidth(f, size, word[:end+n]) > width {
				break
			}
			end += n
		}
		pieces = append(pieces, word[:end])
		word = word[end:]
	}
	return pieces
}
