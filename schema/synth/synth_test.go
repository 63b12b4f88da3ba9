package synth

import (
	"bytes"
	"os"
	"path/filepath"
	"testing"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/rules"
)

func TestWellsLoadAndAreRealistic(t *testing.T) {
	seen := map[string]bool{}
	for i := 0; i < 400; i++ {
		text := Well(i)
		w, err := schema.Load(FileName(i), text)
		if err != nil {
			t.Fatalf("well %d does not load:\n%v", i, err)
		}
		if w.ID != ID(i) || seen[w.ID] {
			t.Fatalf("well %d: id %q (duplicate %v)", i, w.ID, seen[w.ID])
		}
		seen[w.ID] = true
		// The demo's hand-written wells run 150 to 250 lines; synthetic
		// ones should be of that order, not toy files (common practice).
		if n := bytes.Count(text, []byte("\n")); n < 150 || n > 400 {
			t.Errorf("well %d has %d lines", i, n)
		}
		if len(w.Fills) < 5 || len(w.Lithology) < 6 || len(w.WaterLevels) < 4 || len(w.Screens()) != 1 {
			t.Errorf("well %d: %d fills, %d layers, %d levels, %d screens", i, len(w.Fills), len(w.Lithology), len(w.WaterLevels), len(w.Screens()))
		}
		if !bytes.Equal(text, Well(i)) {
			t.Fatalf("well %d differs between calls", i)
		}
	}
}

func TestWellsCheckWithoutErrors(t *testing.T) {
	for i := 0; i < 1000; i++ {
		w, err := schema.Load(FileName(i), Well(i))
		if err != nil {
			t.Fatal(err)
		}
		for _, f := range rules.Check(w, nil) {
			if f.Blocking() {
				t.Errorf("%s:%d: %s: %s", f.File, f.Line, f.Rule, f.Message)
			}
		}
	}
}

func TestProjectLoads(t *testing.T) {
	dir := t.TempDir()
	if err := Project(dir, 12); err != nil {
		t.Fatal(err)
	}
	p, err := project.Load(dir)
	if err != nil {
		t.Fatal(err)
	}
	files, err := p.WellFiles()
	if err != nil || len(files) != 12 || filepath.Base(files[0]) != "SW-0001.toml" {
		t.Fatalf("%v %v", files, err)
	}
	if _, err := os.Stat(filepath.Join(dir, "project.toml")); err != nil {
		t.Fatal(err)
	}
}

func BenchmarkLoadOneWell(b *testing.B) {
	text := Well(1)
	b.SetBytes(int64(len(text)))
	for b.Loop() {
		if _, err := schema.Load("w.toml", text); err != nil {
			b.Fatal(err)
		}
	}
}
