package pipeline

import (
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
	"time"

	"github.com/tremie-dev/tremie/render/sheet"
)

// TestSheetsPerWellBounded: a well within every count and text limit
// whose notes would still fill more than MaxNotesSheets (30 notes of
// 3,900 bytes on a 36-ft well), and the 1,200-ft gallery well at
// 1in=5ft (about 50 log sheets), are refused at layout, quickly and naming the
// file, instead of drawn on dozens of sheets; the gallery well at
// 1in=10ft (25 sheets) is drawn.
func TestSheetsPerWellBounded(t *testing.T) {
	mw1, err := os.ReadFile("../../cmd/tremie/demo/wells/MW-1.toml")
	if err != nil {
		t.Fatal(err)
	}
	notes := make([]string, 30)
	for i := range notes {
		notes[i] = `"` + strings.Repeat("x", 3900) + `"`
	}
	text := regexp.MustCompile(`(?m)^notes = \[.*\]$`).ReplaceAllString(string(mw1), "notes = ["+strings.Join(notes, ", ")+"]")
	wordy := filepath.Join(t.TempDir(), "MW-1.toml")
	if err := os.WriteFile(wordy, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	scale := func(s string) *sheet.Scale {
		sc, err := sheet.ParseScale(s)
		if err != nil {
			t.Fatal(err)
		}
		return &sc
	}
	for _, c := range []struct {
		file  string
		scale *sheet.Scale
		want  string // "" when drawn
	}{
		{wordy, nil, "notes sheets, more than the 10 one well may have"},
		// The scale suggested is the most detailed that draws: 1 in = 8 ft
		// would take 31 sheets, 1 in = 10 ft draws (the next case).
		{"../../testdata/gallery/DS-1200.toml", scale("1in=5ft"), "sheets (more than 30); choose a smaller scale, with more depth to the inch, such as 1 in = 10 ft"},
		{"../../testdata/gallery/DS-1200.toml", scale("1in=8ft"), "31 sheets"},
		{"../../testdata/gallery/DS-1200.toml", scale("1in=10ft"), ""},
	} {
		run, err := Resolve([]string{c.file}, Options{Quiet: true})
		if err != nil {
			t.Fatal(err)
		}
		w := Prepare(run.Inputs[0], AllRules)
		if w.Err != nil {
			t.Fatal(w.Err)
		}
		start := time.Now()
		doc, _, err := w.LayoutReport(LayoutOptions{Scale: c.scale})
		took := time.Since(start)
		switch {
		case c.want == "" && (err != nil || len(doc.Pages) > MaxSheets):
			t.Errorf("%s: %v", c.file, err)
		case c.want != "" && (err == nil || !strings.HasPrefix(err.Error(), c.file+": ") || !strings.Contains(err.Error(), c.want)):
			t.Errorf("%s: %v, want %q", c.file, err, c.want)
		case took > 30*time.Second: // about 1 s alone; minutes before the limits; room for a loaded machine
			t.Errorf("%s: %v to lay out", c.file, took)
		}
	}
}
