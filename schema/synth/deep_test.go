package synth

import (
	"flag"
	"os"
	"testing"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/rules"
)

var writeGallery = flag.Bool("gallery", false, "rewrite testdata/gallery/DS-1200.toml from Deep")

// The gallery's deep well is Deep(1200, 150), kept as a file so the
// sheets' tests and a user can read it; this test keeps the two equal.
func TestDeepGalleryWell(t *testing.T) {
	const path = "../../testdata/gallery/DS-1200.toml"
	data := Deep(1200, 150)
	if *writeGallery {
		if err := os.WriteFile(path, data, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	got, err := os.ReadFile(path)
	if err != nil || string(got) != string(data) {
		t.Fatalf("%s is not Deep(1200, 150); rewrite it with go test ./schema/synth -run DeepGallery -gallery (%v)", path, err)
	}
	w, err := schema.Load(path, data)
	if err != nil {
		t.Fatal(err)
	}
	if len(w.Lithology) < 140 || w.TotalDepth != schema.LengthFrom(1200, schema.Feet) {
		t.Errorf("%d intervals, total depth %v", len(w.Lithology), w.TotalDepth)
	}
	for _, f := range rules.Check(w, nil) {
		if !f.Waived {
			t.Errorf("%d: %s %s", f.Line, f.Rule, f.Message)
		}
	}
}
