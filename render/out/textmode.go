package out

import (
	"fmt"
	"sort"
	"strings"
)

// TextMode says how a vector file writes the sheet's words.
type TextMode string

const (
	// TextAsText writes real text in the embedded faces: searchable and
	// copyable, and set exactly where layout measured it in every viewer
	// that loads the faces (browsers, PDF readers).
	TextAsText TextMode = "text"
	// TextAsOutlines writes each word as its glyph outlines, filled: the
	// file then looks the same in a viewer that ignores embedded faces and
	// would substitute a wider one (rsvg-convert, some editors), at the
	// cost of search and copy.
	TextAsOutlines TextMode = "outlines"
)

// textModes are the modes --text accepts, with what each is for.
var textModes = map[TextMode]string{
	TextAsText:     "searchable text in the embedded fonts (default)",
	TextAsOutlines: "glyph outlines, for viewers that ignore embedded fonts",
}

// TextModeNames lists the modes, sorted.
func TextModeNames() []string {
	names := make([]string, 0, len(textModes))
	for m := range textModes {
		names = append(names, string(m))
	}
	sort.Strings(names)
	return names
}

// ParseTextMode reads a mode by name (any case); "" is the default.
func ParseTextMode(name string) (TextMode, error) {
	m := TextMode(strings.ToLower(strings.TrimSpace(name)))
	if m == "" {
		return TextAsText, nil
	}
	if _, ok := textModes[m]; !ok {
		return "", fmt.Errorf("unknown text mode %q (%s)", name, strings.Join(TextModeNames(), ", "))
	}
	return m, nil
}

// outlines says whether the mode draws glyph outlines ("" is text).
func (m TextMode) outlines() bool { return m == TextAsOutlines }
