package templates

import (
	"github.com/tremie-dev/tremie/schema"

	"math"
	"strings"
	"testing"
)

const (
	ptPerIn = 72.0        // PostScript/PDF point: 1/72 in
	ptPerMM = 72.0 / 25.4 // 1 in = 25.4 mm exactly
)

// Sheet sizes from their standards, portrait, in points.
var standardSizes = map[string][2]float64{
	"letter":  {8.5 * ptPerIn, 11 * ptPerIn},  // ANSI/ASME Y14.1 size A: 8.5 × 11 in
	"tabloid": {11 * ptPerIn, 17 * ptPerIn},   // ANSI/ASME Y14.1 size B: 11 × 17 in
	"a4":      {210 * ptPerMM, 297 * ptPerMM}, // ISO 216 A4: 210 × 297 mm
	"a3":      {297 * ptPerMM, 420 * ptPerMM}, // ISO 216 A3: 297 × 420 mm
}

func TestSizesMatchStandards(t *testing.T) {
	if got := strings.Join(Names(), ","); got != "a3,a4,letter,tabloid" {
		t.Errorf("Names() = %s", got)
	}
	for name, want := range standardSizes {
		for _, land := range []bool{false, true} {
			tp, err := Load(name, land)
			if err != nil {
				t.Fatal(err)
			}
			w, h := want[0], want[1]
			if land {
				w, h = h, w
			}
			if math.Abs(tp.Width-w) > 0.01 || math.Abs(tp.Height-h) > 0.01 {
				t.Errorf("%s landscape=%v: %.3f × %.3f pt, want %.3f × %.3f", name, land, tp.Width, tp.Height, w, h)
			}
			if tp.Name != name || tp.Landscape != land || tp.Title == "" {
				t.Errorf("%s: name %q landscape %v title %q", name, tp.Name, tp.Landscape, tp.Title)
			}
		}
	}
}

// TestISO216Series checks the A sizes against the series' defining
// properties (ISO 216): sides in the ratio √2, and A3 twice the area of
// A4, within the standard's rounding to whole millimetres.
func TestISO216Series(t *testing.T) {
	a4, _ := Load("a4", false)
	a3, _ := Load("a3", false)
	for _, p := range []*Template{a4, a3} {
		if r := p.Height / p.Width; math.Abs(r-math.Sqrt2) > 0.005 {
			t.Errorf("%s aspect %.4f, want √2", p.Name, r)
		}
	}
	if r := (a3.Width * a3.Height) / (a4.Width * a4.Height); math.Abs(r-2) > 0.01 {
		t.Errorf("A3/A4 area ratio %.4f, want 2", r)
	}
	if math.Abs(a3.Width-a4.Height) > 0.01 {
		t.Errorf("A3 short side %.2f should equal A4 long side %.2f", a3.Width, a4.Height)
	}
}

func TestLayoutsAreUsable(t *testing.T) {
	for _, name := range Names() {
		for _, land := range []bool{false, true} {
			tp, err := Load(name, land)
			if err != nil {
				t.Fatal(err)
			}
			if s := tp.Columns.Sum(); math.Abs(s-1) > 1e-6 {
				t.Errorf("%s: columns sum to %g", name, s)
			}
			_, _, bw, bh := tp.Body()
			_, _, cw, ch := tp.Content()
			// The body keeps most of the sheet for the well (common
			// practice: the log, not the frame, is the point).
			if bw*bh < 0.45*cw*ch {
				t.Errorf("%s landscape=%v: body %.0f × %.0f pt is under 45 %% of the content area", name, land, bw, bh)
			}
			want := "bottom"
			if land {
				want = "right"
			}
			if tp.Legend.Side != want {
				t.Errorf("%s landscape=%v: legend on %s", name, land, tp.Legend.Side)
			}
			// The narrowest column must still hold a 6-pt label of three
			// characters such as "SM" or "125" (about 12 pt).
			c := tp.Columns
			for _, f := range []float64{c.Depth, c.Elevation, c.Lithology, c.USCS} {
				if f*bw < 14 {
					t.Errorf("%s landscape=%v: a %.1f pt column is too narrow", name, land, f*bw)
				}
			}
		}
	}
}

func TestAliasesAndUnknownNames(t *testing.T) {
	for alias, name := range map[string]string{"LETTER": "letter", "ansi-b": "tabloid", "Ledger": "tabloid", " A4 ": "a4"} {
		tp, err := Load(alias, false)
		if err != nil || tp.Name != name {
			t.Errorf("Load(%q) = %v, %v; want %s", alias, tp, err, name)
		}
	}
	for _, bad := range []string{"a5", "", "../letter", "letter.toml", "a4/../a3"} {
		_, err := Load(bad, false)
		if err == nil {
			t.Errorf("Load(%q) accepted", bad)
			continue
		}
		for _, n := range Names() {
			if !strings.Contains(err.Error(), n) {
				t.Errorf("error for %q does not list %s: %v", bad, n, err)
			}
		}
	}
}

func TestParseErrors(t *testing.T) {
	base := `title = "x"
width = "8.5in"
height = "11in"
margin = "0.4in"
title_block = "1in"
[legend]
side = "bottom"
size = "1in"
[columns]
depth = 0.5
well = 0.5
`
	if _, err := Parse("ok", []byte(base), false); err != nil {
		t.Fatalf("base template rejected: %v", err)
	}
	cases := map[string]string{
		"no unit":      strings.Replace(base, `"8.5in"`, `"8.5"`, 1),
		"bad number":   strings.Replace(base, `"8.5in"`, `"eight in"`, 1),
		"sum":          strings.Replace(base, "well = 0.5", "well = 0.6", 1),
		"negative":     strings.Replace(base, "well = 0.5", "well = -0.5\ncallouts = 1.0", 1),
		"side":         strings.Replace(base, `side = "bottom"`, `side = "top"`, 1),
		"unknown key":  base + "colour = 1\n",
		"syntax":       base + "[[[\n",
		"huge margin":  strings.Replace(base, `margin = "0.4in"`, `margin = "5in"`, 1),
		"huge title":   strings.Replace(base, `title_block = "1in"`, `title_block = "20in"`, 1),
		"no title":     strings.Replace(base, `title = "x"`, ``, 1),
		"string width": strings.Replace(base, `width = "8.5in"`, `width = 8.5`, 1),
	}
	for what, src := range cases {
		if _, err := Parse("bad", []byte(src), false); err == nil {
			t.Errorf("%s: accepted", what)
		} else if !strings.HasPrefix(err.Error(), "bad.toml") {
			t.Errorf("%s: error %q does not name the file", what, err)
		}
	}
	if _, err := Parse("bad", []byte(base+"[[[\n"), false); err == nil || !strings.Contains(err.Error(), "bad.toml:12") {
		t.Errorf("syntax error without its line: %v", err)
	}
}

// A template with several mistakes reports each, with file:line:col, and
// "did you mean" for a slip of the keyboard.
func TestParseReportsEveryError(t *testing.T) {
	src := "title = \"x\"\nwidht = \"8.5in\"\nheight = \"11in\"\nmargin = \"0.4in\"\n[legend]\nside = \"bottom\"\nsize = \"1 furlong\"\n[columns]\nwell = 1.0\n"
	_, err := Parse("bad", []byte(src), false)
	list := schema.Errors("", err)
	want := []string{
		`bad.toml:2:1: unknown key "widht" at top level (did you mean "width"?)`,
		`bad.toml:7:8: size: length "1 furlong": give a unit (in, mm, cm, pt)`,
	}
	if len(list) != len(want) {
		t.Fatalf("%d errors, want %d:\n%v", len(list), len(want), err)
	}
	for i, e := range list {
		if e.Error() != want[i] {
			t.Errorf("error %d:\n got %s\nwant %s", i, e, want[i])
		}
	}
}

// A template is read by the shared strict reader: every mistake is named
// at name.toml:line:col, an unknown key with the closest known one and the
// keys its table takes.
func TestTemplateErrorsPositioned(t *testing.T) {
	src := "title = \"T\"\nwidth = \"8.5in\"\nheight = \"11 furlongs\"\nmargin = \"0.4in\"\n[legend]\nsied = \"bottom\"\nside = \"bottom\"\n[columns]\ndepth = 0.5\nwell = \"half\"\n"
	_, err := Parse("odd", []byte(src), false)
	list := schema.Errors("", err)
	want := []string{
		`odd.toml:3:10: height: length "11 furlongs": give a unit (in, mm, cm, pt)`,
		`odd.toml:6:1: unknown key "sied" in [legend] (did you mean "side"?)`,
		`odd.toml:10:8: well must be a number, not a string`,
	}
	if len(list) != len(want) {
		t.Fatalf("%d errors, want %d:\n%v", len(list), len(want), err)
	}
	for i, e := range list {
		if e.Error() != want[i] {
			t.Errorf("error %d:\n got %s\nwant %s", i, e, want[i])
		}
	}
	if list[1].Hint != "[legend] takes: side, size" {
		t.Errorf("hint %q", list[1].Hint)
	}
}
