package out

import (
	"fmt"
	"sync"

	"github.com/tdewolff/canvas"

	"github.com/tremie-dev/tremie/render/draw"
)

// fontSet loads the embedded faces into canvas on first use. A document
// takes a set from the pool and gives it back when written: canvas fonts
// carry shaping state, so one set serves one document at a time, and
// parsing the faces and planning their shaping is done once per set, not
// per document. What a file embeds is decided by its renderer from the
// glyphs its own pages use, so reuse changes no output byte.
type fontSet struct {
	fonts [4]*canvas.Font
}

var fontSets = sync.Pool{New: func() any { return &fontSet{} }}

func takeFonts() *fontSet     { return fontSets.Get().(*fontSet) }
func (fs *fontSet) giveBack() { fontSets.Put(fs) }

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
