package sheet

import (
	"fmt"
	"os"
	"path/filepath"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
)

// TestLook writes the synthetic wells' sheets as PNG into $TREMIE_LOOK
// for a person to look at; without it the test is skipped.
func TestLook(t *testing.T) {
	dir := os.Getenv("TREMIE_LOOK")
	if dir == "" {
		t.Skip("set TREMIE_LOOK=DIR to write the test wells' sheets as PNG")
	}
	s := Imperial(5)
	docs := map[string]Options{"thin": {Scale: &s}, "deep": {}}
	for name, opt := range docs {
		w := thinWell()
		if name == "deep" {
			w = deepWell()
		}
		doc := layoutOf(t, w, Inputs{}, opt)
		write(t, dir, name, doc)
	}
	// notes kept on the drawing in a strip (fitstrip_test.go)
	fit := Fitted
	for name, c := range map[string]struct {
		td  float64
		k   int
		opt Options
	}{"noted": {70, 12, Options{}}, "noted-fit": {30, 14, Options{Scale: &fit}}} {
		w, in := notedWell(c.td, c.k)
		write(t, dir, name, layoutOf(t, w, in, c.opt))
	}
}

// write keeps every page of doc as name-N.png in dir.
func write(t *testing.T, dir, name string, doc *draw.Document) {
	for i := range doc.Pages {
		b, err := out.PNG(doc, i, 100)
		if err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(filepath.Join(dir, fmt.Sprintf("%s-%d.png", name, i+1)), b, 0o644); err != nil {
			t.Fatal(err)
		}
	}
}
