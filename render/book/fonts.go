package book

import (
	"strings"
	"sync"
	"unicode"
	"unicode/utf8"

	"github.com/go-pdf/fpdf"
	"golang.org/x/image/font/gofont/gobold"
	"golang.org/x/image/font/gofont/goitalic"
	"golang.org/x/image/font/gofont/goregular"
	"golang.org/x/image/font/sfnt"
)

// family is the embedded UTF-8 face: the Go fonts cover Latin-1 and more,
// so °, ±, µ, – and accented names print as written.
const family = "go"

// newDoc starts an fpdf document in millimetres with the Go fonts and
// the fixed metadata that keeps its bytes repeatable.
func newDoc(in Input, landscape bool) *doc {
	w, h := in.PageWidth*25.4/72, in.PageHeight*25.4/72
	orient := "P"
	if landscape {
		orient = "L"
	}
	f := &doc{fpdf.NewCustom(&fpdf.InitType{OrientationStr: orient, UnitStr: "mm", Size: fpdf.SizeType{Wd: w, Ht: h}})}
	f.AddUTF8FontFromBytes(family, "", goregular.TTF)
	f.AddUTF8FontFromBytes(family, "B", gobold.TTF)
	f.AddUTF8FontFromBytes(family, "I", goitalic.TTF)
	f.SetCreationDate(in.Date)
	f.SetModificationDate(in.Date)
	f.SetCatalogSort(true)
	f.SetCompression(true)
	f.SetProducer("tremie", true)
	f.SetCreator("tremie", true)
	f.SetTitle(in.Project.Name, true)
	f.SetMargins(14, 14, 14)
	f.SetAutoPageBreak(false, 14)
	return f
}

// doc is an fpdf document whose text methods print only what the
// embedded face can: fpdf's UTF-8 fonts index a 65,536-entry table by
// rune and fail on anything above U+FFFF (an emoji in a project name),
// and a rune the face lacks would print as nothing at all. Each such
// rune is replaced by U+FFFD, the replacement character, so that the
// reader sees something was there.
type doc struct{ *fpdf.Fpdf }

func (d *doc) CellFormat(w, h float64, txt, border string, ln int, align string, fill bool, link int, linkStr string) {
	d.Fpdf.CellFormat(w, h, printable(txt), border, ln, align, fill, link, linkStr)
}

func (d *doc) MultiCell(w, h float64, txt, border, align string, fill bool) {
	d.Fpdf.MultiCell(w, h, printable(txt), border, align, fill)
}

func (d *doc) SplitText(txt string, w float64) []string { return d.Fpdf.SplitText(printable(txt), w) }

func (d *doc) GetStringWidth(s string) float64 { return d.Fpdf.GetStringWidth(printable(s)) }

func (d *doc) SetTitle(title string, isUTF8 bool) { d.Fpdf.SetTitle(printable(title), isUTF8) }

// printable replaces the runes the Go faces cannot print.
func printable(s string) string {
	ok := utf8.ValidString(s) // fpdf's UTF-16 conversion fails on stray bytes too
	for _, r := range s {
		if !faceHas(r) {
			ok = false
			break
		}
	}
	if ok {
		return s
	}
	return strings.Map(func(r rune) rune {
		if faceHas(r) {
			return r
		}
		return unicode.ReplacementChar
	}, s)
}

// faceHas reports whether the regular Go face has a glyph for r (the
// bold and italic faces cover the same set); control characters count
// as printable, since fpdf handles line breaks itself.
func faceHas(r rune) bool {
	if r < 0x20 || r == 0x7f {
		return true
	}
	if r > 0xFFFF {
		return false
	}
	return regularGlyphs.has(r)
}

// glyphSet answers glyph look-ups in one parsed face; sfnt's buffer is
// not safe for concurrent use, so a mutex guards it.
type glyphSet struct {
	once sync.Once
	face *sfnt.Font
	mu   sync.Mutex
	buf  sfnt.Buffer
}

var regularGlyphs glyphSet

func (g *glyphSet) has(r rune) bool {
	g.once.Do(func() { g.face, _ = sfnt.Parse(goregular.TTF) })
	if g.face == nil {
		return r < 0x80
	}
	g.mu.Lock()
	defer g.mu.Unlock()
	i, err := g.face.GlyphIndex(&g.buf, r)
	return err == nil && i != 0
}
