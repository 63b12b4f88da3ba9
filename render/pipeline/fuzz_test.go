package pipeline

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/out"
)

// tenFootWell is a small valid well the reproducers below vary.
const tenFootWell = `[units]
depth = "ft"
diameter = "in"

[well]
id = "%ID%"
purpose = "monitoring"
total_depth = 10.0

[[borehole]]
top = 0.0
bottom = 10.0
diameter = %DIA%
`

func tenFoot(id, dia, extra string) []byte {
	s := strings.NewReplacer("%ID%", id, "%DIA%", dia).Replace(tenFootWell)
	return []byte(s + extra)
}

// FuzzWellToSVG carries any bytes, written as a well file, through the
// whole pipeline as render does (resolve, load, check, quantities,
// layout) and encodes every sheet as SVG. Whatever the bytes, it must
// not panic; an error is an acceptable answer.
func FuzzWellToSVG(f *testing.F) {
	demo, _ := filepath.Glob(filepath.Join("..", "..", "cmd", "tremie", "demo", "wells", "*.toml"))
	for _, p := range demo {
		data, err := os.ReadFile(p)
		if err != nil {
			f.Fatal(err)
		}
		f.Add(data)
	}
	// Reproducers of the bad-input campaign (issue 15).
	f.Add(tenFoot("HUGE", "1e6", ""))
	var levels strings.Builder
	for i := 0; i < 2500; i++ {
		levels.WriteString("\n[[water_level]]\ndepth = 5.0\nkind = \"static\"\n")
	}
	f.Add(tenFoot("LEVELS", "8.0", levels.String()))
	f.Add(tenFoot("MW-\U0001F4A7", "8.0", ""))
	// The escape as TOML spells it, so that the ID reaches the sheet.
	f.Add(tenFoot(`MW-\u001b]0;x\u0007`, "8.0", ""))
	f.Add(tenFoot("MW-\x1b]0;x\x07", "8.0", ""))
	f.Add(tenFoot("DEEP", "8.0", "\n[extra]\nx = "+strings.Repeat("[", 10000)+strings.Repeat("]", 10000)+"\n"))
	f.Add([]byte("x = " + strings.Repeat("[", 10000) + strings.Repeat("]", 10000) + "\n"))
	for _, deep := range []int{10000, 100000} {
		f.Add(tenFoot("NEST", "8.0", "\nx = "+strings.Repeat("{a=", deep)+"1"+strings.Repeat("}", deep)+"\n"))
	}
	f.Add(tenFoot("TWO-sheet1", "8.0", ""))
	f.Add(tenFoot("=HYPERLINK(1)", "8.0", ""))
	f.Add(tenFoot(strings.Repeat("W", 10000), "8.0", ""))
	f.Add(tenFoot("X", "8.0", "\n[[lithology]]\ntop = 0.0\nbottom = 10.0\nuscs = \"SM\"\nextra.thing = 1\n"))
	var tags strings.Builder
	for fill := 0; fill < 3; fill++ { // 2,100 tags over three fills: refused
		tags.WriteString("\n[[fill]]\ntop = 0.0\nbottom = 10.0\nmaterial = \"filter-pack\"\n")
		for i := 0; i < 700; i++ {
			tags.WriteString("[[fill.tag]]\nafter_bags = 1\ndepth = 1.0\n")
		}
	}
	f.Add(tenFoot("TAGS", "8.0", tags.String()))
	f.Add([]byte{})
	f.Add([]byte("[well]\nid = \"A\"\n"))

	svg, ok := out.LookupFormat("svg")
	if !ok {
		f.Fatal("svg format is not registered")
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		dir := t.TempDir()
		path := filepath.Join(dir, "W.toml")
		if err := os.WriteFile(path, data, 0o644); err != nil {
			t.Fatal(err)
		}
		run, err := Resolve([]string{path}, Options{Quiet: true})
		if err != nil {
			return
		}
		for _, in := range run.Inputs {
			w := Prepare(in, AllRules)
			if w.Err != nil {
				continue
			}
			doc, err := w.Layout(LayoutOptions{})
			if err != nil {
				continue
			}
			if _, err := svg.Encode(doc, out.EncodeOptions{}); err != nil {
				continue
			}
		}
	})
}
