package out

import (
	"bytes"

	"github.com/tremie-dev/tremie/render/draw"
)

// An SVG's text names its face by the family of the embedded @font-face
// rule (canvas uses the face's PostScript name, "GoRegular", "Go-Bold").
// A renderer that ignores @font-face (rsvg-convert, some editors and
// converters) looks that name up among the system's fonts, finds nothing,
// and sets the text in its default face, wider than the one layout
// measured. So each text style names a stack: the embedded face first,
// which browsers load and use; then the family under which the Go fonts
// are installed as system fonts (Debian's fonts-go and the fonts' own
// TTF files register "Go" with styles Regular, Bold and Italic, and "Go
// Mono"), which a renderer that ignores the embedded face resolves with
// the weight and style the text already states; then a generic family.
// Only a viewer that neither loads embedded fonts nor has the Go fonts
// installed falls back to a face of other widths: for it, --text
// outlines.

// systemFamily is the installed family of a face, and the generic family
// to fall back on after it.
func systemFamily(f draw.FontStyle) (family, generic string) {
	if f == draw.Mono {
		return "Go Mono", "monospace"
	}
	return "Go", "sans-serif"
}

// fontStack is the font-family list written for face f, whose embedded
// rule canvas names embedded.
func fontStack(embedded string, f draw.FontStyle) string {
	family, generic := systemFamily(f)
	return embedded + "," + family + "," + generic
}

// stackSVGFonts writes the stack in place of the bare embedded name in
// every text style of an SVG (canvas writes "font: [italic] [700] SIZEpx
// NAME", then ";" or the closing quote). The @font-face rules keep the
// bare name.
func stackSVGFonts(b []byte, fonts *fontSet) []byte {
	for _, f := range draw.FontStyles {
		cf := fonts.fonts[f]
		if cf == nil { // no text of the page uses it
			continue
		}
		stack := []byte("px " + fontStack(cf.Name(), f))
		for _, end := range []string{";", `"`} {
			bare := []byte("px " + cf.Name() + end)
			b = bytes.ReplaceAll(b, bare, append(stack[:len(stack):len(stack)], end...))
		}
	}
	return b
}
