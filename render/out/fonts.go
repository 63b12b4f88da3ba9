package out

import (
	"fmt"
	"image/color"
	"sync"

	"github.com/tdewolff/canvas"

	"github.com/tremie-dev/tremie/render/draw"
)

// fontSet loads the embedded faces into canvas on first use and keeps the
// lines of text it has shaped. A document takes a set and gives it back
// when written: canvas fonts carry shaping state, so one set serves one
// document at a time, and parsing the faces, planning their shaping and
// shaping a label seen before (a legend entry, a column heading, a depth
// figure, the caution) are done once per set, not per document. What a
// file embeds is decided by its renderer from the glyphs its own pages
// use, so reuse changes no output byte.
type fontSet struct {
	fonts [4]*canvas.Font
	lines map[lineKey]*canvas.Text
	masks glyphMasks // the glyphs' coverage on rasters (rasterglyph.go)
}

// lineKey names a shaped line: the same string in the same face, size and
// colour shapes to the same glyphs.
type lineKey struct {
	font  draw.FontStyle
	size  float64
	color color.RGBA
	s     string
}

// maxLines bounds a set's shaped lines; past it the set starts afresh, so
// a batch of any size holds a bounded number (a sheet has a few hundred
// labels, most of them shared with the well's other sheets and the
// batch's other wells).
const maxLines = 4096

// maxIdleSets bounds the sets kept between documents: one per document
// drawn at once is enough.
const maxIdleSets = 8

// idleSets holds the sets no document is using. A sync.Pool would drop
// them, and their shaped lines, at every garbage collection.
var idleSets struct {
	sync.Mutex
	sets []*fontSet
}

func takeFonts() *fontSet {
	idleSets.Lock()
	defer idleSets.Unlock()
	if n := len(idleSets.sets); n > 0 {
		fs := idleSets.sets[n-1]
		idleSets.sets = idleSets.sets[:n-1]
		return fs
	}
	return &fontSet{}
}

func (fs *fontSet) giveBack() {
	idleSets.Lock()
	defer idleSets.Unlock()
	if len(idleSets.sets) < maxIdleSets {
		idleSets.sets = append(idleSets.sets, fs)
	}
}

func (fs *fontSet) font(f draw.FontStyle) (*canvas.Font, error) {
	if f < 0 || int(f) >= len(fs.fonts) {
		f = draw.Regular
	}
	if fs.fonts[f] != nil {
		return fs.fonts[f], nil
	}
	style := canvas.FontRegular
	switch f {
	case draw.Bold:
		style = canvas.FontBold
	case draw.Italic:
		style = canvas.FontItalic
	}
	cf, err := canvas.LoadFont(draw.FontData(f), 0, style)
	if err != nil {
		return nil, fmt.Errorf("load font %s: %w", draw.FontName(f), err)
	}
	fs.fonts[f] = cf
	return cf, nil
}

// line returns s shaped as one left-aligned line in face f at size and
// colour col, shaping it only the first time the set sees it. Renderers
// only read a shaped line, so one serves every sheet that draws it.
func (fs *fontSet) line(f draw.FontStyle, size float64, col color.RGBA, s string) (*canvas.Text, error) {
	key := lineKey{f, size, col, s}
	if t, ok := fs.lines[key]; ok {
		return t, nil
	}
	cf, err := fs.font(f)
	if err != nil {
		return nil, err
	}
	t := canvas.NewTextLine(cf.Face(size, col), s, canvas.Left)
	if fs.lines == nil || len(fs.lines) >= maxLines {
		fs.lines = make(map[lineKey]*canvas.Text)
	}
	fs.lines[key] = t
	return t, nil
}
