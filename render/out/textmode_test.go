package out

import (
	"bytes"
	"strings"
	"testing"
)

// TestTextOutlines: the outline mode writes no text element and embeds no
// face, and its glyphs cover the page as the text does; unknown modes are
// refused by name.
func TestTextOutlines(t *testing.T) {
	doc := sampleDoc()
	text, err := SVGWith(doc, 0, EncodeOptions{Text: TextAsText})
	if err != nil {
		t.Fatal(err)
	}
	lines, err := SVGWith(doc, 0, EncodeOptions{Text: TextAsOutlines})
	if err != nil {
		t.Fatal(err)
	}
	if !bytes.Contains(text, []byte("<text")) || !bytes.Contains(text, []byte("@font-face")) {
		t.Error("the text mode wrote no text or no face")
	}
	if bytes.Contains(lines, []byte("<text")) || bytes.Contains(lines, []byte("@font-face")) {
		t.Error("the outline mode still writes text or embeds a face")
	}
	pdf, err := PDFWith(doc, EncodeOptions{Text: TextAsOutlines})
	if err != nil {
		t.Fatal(err)
	}
	if bytes.Contains(pdf, []byte("/FontFile")) {
		t.Error("the outline PDF embeds a font")
	}
	for _, c := range []struct {
		in   string
		want TextMode
	}{{"", TextAsText}, {"text", TextAsText}, {" Outlines ", TextAsOutlines}} {
		if m, err := ParseTextMode(c.in); err != nil || m != c.want {
			t.Errorf("ParseTextMode(%q) = %q, %v", c.in, m, err)
		}
	}
	if _, err := ParseTextMode("paths"); err == nil || !strings.Contains(err.Error(), "outlines, text") {
		t.Errorf("ParseTextMode(paths): %v", err)
	}
}
