package out

import (
	"fmt"

	"github.com/tdewolff/canvas"

	"github.com/tremie-dev/tremie/render/draw"
)

// fontSet loads the embedded faces into canvas on first use. Each document
// gets its own set: canvas fonts carry shaping state, and a PDF or SVG
// embeds exactly the faces its pages used.
type fontSet struct {
	fonts [4]*canvas.Font
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
