package sheet_test

import (
	"path/filepath"
	"testing"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"github.com/tremie-dev/tremie/render/pipeline"
	"github.com/tremie-dev/tremie/render/sheet"
)

func init() { sheet.PrepareDemo = prepareDemo }

// prepareDemo writes the demo project to disk and takes every well
// through the pipeline as tremie render does, up to the layout.
func prepareDemo(t testing.TB) map[string]sheet.DemoWell {
	t.Helper()
	dir := t.TempDir()
	if err := demo.Write(dir, false); err != nil {
		t.Fatal(err)
	}
	run, err := pipeline.Resolve([]string{dir}, pipeline.Options{Quiet: true})
	if err != nil {
		t.Fatal(err)
	}
	if len(run.Problems) > 0 || len(run.Inputs) < 6 {
		t.Fatalf("demo project: %v (%d wells)", run.Problems, len(run.Inputs))
	}
	out := map[string]sheet.DemoWell{}
	for _, w := range run.PrepareAll(pipeline.AllRules, "") {
		if w.Err != nil {
			t.Fatalf("%s: %v", w.Path, w.Err)
		}
		in, err := w.SheetInputs()
		if err != nil {
			t.Fatal(err)
		}
		out[filepath.Base(w.Path)] = sheet.DemoWell{Well: w.Well, In: in, Opt: w.SheetOptions(pipeline.LayoutOptions{Date: run.SourceDate})}
	}
	return out
}
