package draw

import (
	"math"
	"strings"
	"testing"
	"unicode/utf8"

	"github.com/tdewolff/canvas"
)

const ptPerMM = 72 / 25.4

// canvasFace loads the same embedded bytes through tdewolff/canvas, whose
// text goes through a HarfBuzz port (go-text/typesetting): an independent
// reading of the font's advances and kerning to compare against.
func canvasFace(t testing.TB, f FontStyle, size float64) *canvas.FontFace {
	t.Helper()
	cf, err := canvas.LoadFont(FontData(f), 0, canvas.FontRegular)
	if err != nil {
		t.Fatalf("canvas.LoadFont(%s): %v", FontName(f), err)
	}
	return cf.Face(size, canvas.Black)
}

var sampleStrings = []string{
	"A",
	"MW-3",
	"Bentonite chips, 3/8 in, hydrated",
	"Depth 12.5 ft ± 0.1",
	"Temperature 12 °C",
	"Grain 250 µm",
	"Logged by Zoë Ångström-Núñez",
	"AVAWAT To Ty", // classic kerning pairs, if the face kerns them
	"<script>alert(1)</script>",
	"",
}

func TestTextWidthMatchesHarfBuzzShaping(t *testing.T) {
	for _, f := range FontStyles {
		for _, size := range []float64{6, 9, 14.5} {
			face := canvasFace(t, f, size)
			for _, s := range sampleStrings {
				got := TextWidth(f, size, s)
				want := face.TextWidth(s) * ptPerMM
				if math.Abs(got-want) > 1e-6 {
					t.Errorf("%s %gpt %q: TextWidth = %.6f pt, canvas shaping = %.6f pt", FontName(f), size, s, got, want)
				}
			}
		}
	}
}

func TestTextWidthIsHmtxAdvance(t *testing.T) {
	// tdewolff/font parses the hmtx table on its own; a single glyph's
	// width must be its advance scaled by size / unitsPerEm.
	for _, f := range FontStyles {
		face := canvasFace(t, f, 10)
		sf := face.Font.SFNT
		upem := float64(sf.Head.UnitsPerEm)
		for _, r := range "AgW°±µé" {
			id := sf.GlyphIndex(r)
			if id == 0 {
				t.Errorf("%s lacks %q", FontName(f), r)
				continue
			}
			want := float64(sf.GlyphAdvance(id)) * 10 / upem
			if got := TextWidth(f, 10, string(r)); math.Abs(got-want) > 1e-9 {
				t.Errorf("%s %q: %.6f pt, hmtx says %.6f pt", FontName(f), r, got, want)
			}
		}
	}
}

func TestMonoIsMonospaced(t *testing.T) {
	// Go Mono is a fixed-pitch face: every glyph has the same advance.
	w := TextWidth(Mono, 10, "i")
	for _, s := range []string{"W", "m", ".", "°"} {
		if got := TextWidth(Mono, 10, s); math.Abs(got-w) > 1e-9 {
			t.Errorf("Mono %q = %.4f, want %.4f like \"i\"", s, got, w)
		}
	}
	if got := TextWidth(Mono, 10, "abcde"); math.Abs(got-5*w) > 1e-9 {
		t.Errorf("Mono 5 chars = %.4f, want %.4f", got, 5*w)
	}
}

func TestVerticalMetricsMatchCanvas(t *testing.T) {
	for _, f := range FontStyles {
		m := canvasFace(t, f, 12).Metrics()
		checks := []struct {
			name      string
			got, want float64
		}{
			{"ascent", Ascent(f, 12), m.Ascent * ptPerMM},
			{"descent", Descent(f, 12), m.Descent * ptPerMM},
			{"cap height", CapHeight(f, 12), m.CapHeight * ptPerMM},
			{"x height", XHeight(f, 12), m.XHeight * ptPerMM},
		}
		for _, c := range checks {
			if math.Abs(c.got-c.want) > 1e-6 {
				t.Errorf("%s %s = %.5f pt, canvas says %.5f pt", FontName(f), c.name, c.got, c.want)
			}
		}
		if lh := LineHeight(f, 12); lh < Ascent(f, 12)+Descent(f, 12)-1e-9 {
			t.Errorf("%s line height %.3f below ascent+descent", FontName(f), lh)
		}
	}
}

func TestWrap(t *testing.T) {
	const size = 8
	text := "Silty SAND (SM), fine to medium grained, brown, moist, trace gravel to 1/2 in; " +
		"becomes wet at 14.2 ft ± 0.1 — noted by Zoë Ångström."
	for _, width := range []float64{40, 72, 150, 1000} {
		lines := Wrap(Regular, size, text, width)
		if len(lines) == 0 {
			t.Fatalf("width %g: no lines", width)
		}
		for i, l := range lines {
			if w := TextWidth(Regular, size, l); w > width+1e-9 && utf8.RuneCountInString(l) > 1 {
				t.Errorf("width %g line %d %q is %.2f pt wide", width, i, l, w)
			}
			if l == "" || strings.TrimSpace(l) != l {
				t.Errorf("width %g line %d %q is blank or padded", width, i, l)
			}
			// Greedy: the next line's first word would not have fitted.
			if i+1 < len(lines) {
				next := strings.Fields(lines[i+1])[0]
				if TextWidth(Regular, size, l+" "+next) <= width {
					t.Errorf("width %g: %q could have taken %q", width, l, next)
				}
			}
		}
		// No text is lost or invented once every word fits whole.
		if width >= 72 {
			if got, want := strings.Join(lines, " "), strings.Join(strings.Fields(text), " "); got != want {
				t.Errorf("width %g rejoined = %q, want %q", width, got, want)
			}
		}
	}
}

func TestWrapBreaksLongWords(t *testing.T) {
	word := "hydrogeologically-unremarkable-interval"
	lines := Wrap(Bold, 9, word, 30)
	if len(lines) < 2 {
		t.Fatalf("over-long word not broken: %q", lines)
	}
	if got := strings.Join(lines, ""); got != word {
		t.Errorf("pieces %q rejoin to %q", lines, got)
	}
	for _, l := range lines {
		if TextWidth(Bold, 9, l) > 30 && utf8.RuneCountInString(l) > 1 {
			t.Errorf("piece %q too wide", l)
		}
	}
	// A width smaller than any glyph still terminates, one rune a line.
	if got := Wrap(Regular, 9, "abc", 0.1); len(got) != 3 {
		t.Errorf("Wrap at 0.1 pt = %q, want one rune per line", got)
	}
}

func TestWrapNewlinesAndBlank(t *testing.T) {
	if got := Wrap(Regular, 9, "   \t ", 100); len(got) != 0 {
		t.Errorf("blank input gave %q", got)
	}
	got := Wrap(Regular, 9, "first\nsecond  line", 1000)
	if len(got) != 2 || got[0] != "first" || got[1] != "second line" {
		t.Errorf("newline handling = %q", got)
	}
	// Invalid UTF-8 does not hang or panic.
	_ = Wrap(Regular, 9, "ab\xffcd\xfe", 5)
}

func BenchmarkTextWidth(b *testing.B) {
	s := "Bentonite chips, 3/8 in, hydrated in lifts, 12.0–14.5 ft"
	for b.Loop() {
		TextWidth(Regular, 8, s)
	}
}

func BenchmarkWrap(b *testing.B) {
	s := strings.Repeat("Silty SAND, fine grained, brown, moist. ", 10)
	for b.Loop() {
		Wrap(Regular, 8, s, 120)
	}
}
