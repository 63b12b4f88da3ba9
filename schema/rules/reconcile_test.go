package rules

import (
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// A pack that took about half its volume is called a possible bridge,
// naming the interval, and each tag out of tolerance names the expected
// and the recorded depth (arithmetic in the fixtures' headers).
func TestReconcileMessages(t *testing.T) {
	msgs := func(id string) string {
		path := filepath.Join("testdata", id, "fail.toml")
		w, err := schema.LoadFile(path)
		if err != nil {
			t.Fatal(err)
		}
		var b strings.Builder
		for _, f := range Check(w, nil) {
			if f.Rule == id {
				b.WriteString(f.Message + "\n")
			}
		}
		return b.String()
	}
	low := msgs("PLACED-VOLUME-LOW")
	for _, s := range []string{"filter pack at 23–36 ft", "possible bridge", "56 %", "5 × 50-lb bags", "2.500 ft³", "4.457 ft³"} {
		if !strings.Contains(low, s) {
			t.Errorf("PLACED-VOLUME-LOW message lacks %q:\n%s", s, low)
		}
	}
	tag := msgs("TAG-EXPECTED-TOP")
	for _, s := range []string{"tagged at 31 ft after 5 bags", "top to 28.75 ft", "2.25 ft deeper", "tagged at 24.5 ft", "25.81 ft", "shallower"} {
		if !strings.Contains(tag, s) {
			t.Errorf("TAG-EXPECTED-TOP message lacks %q:\n%s", s, tag)
		}
	}
	final := msgs("TAG-FINAL-TOP")
	for _, s := range []string{"found the top at 24.2 ft", "recorded top is 23 ft", "1.2 ft deeper", "0.7 ft shallower"} {
		if !strings.Contains(final, s) {
			t.Errorf("TAG-FINAL-TOP message lacks %q:\n%s", s, final)
		}
	}
}

// The reconciliation rules run alone with the built-in yields find what
// Check finds for them; with a project's yields the ratio follows them: 5 bags at 0.9 ft3
// = 4.5 ft3 against 4.4568 ft3 is 101 %, no longer low (the grout, placed
// by volume, is still 73 %).
func TestReconcileRulesAlone(t *testing.T) {
	w, err := schema.LoadFile(filepath.Join("testdata", "PLACED-VOLUME-LOW", "fail.toml"))
	if err != nil {
		t.Fatal(err)
	}
	mine := map[string]bool{}
	for _, r := range Select(Reconciling) {
		mine[r.ID] = true
	}
	// the rules that compare placed amounts and tags, and the unit-slip
	// rule whose findings make the amounts wrong; no other
	for _, id := range []string{"PLACED-VOLUME-HIGH", "PLACED-VOLUME-LOW", "SIZE-PLAUSIBLE", "TAG-EXPECTED-TOP", "TAG-FINAL-TOP"} {
		if !mine[id] {
			t.Errorf("%s is not marked Reconcile", id)
		}
	}
	if len(mine) != 5 {
		t.Errorf("reconciliation rules: %v", mine)
	}
	var fromCheck []string
	for _, f := range Check(w, nil) {
		if mine[f.Rule] {
			fromCheck = append(fromCheck, f.Rule+" "+f.Message)
		}
	}
	var fromReconcile []string
	for _, f := range Run(w, Select(Reconciling), nil) {
		fromReconcile = append(fromReconcile, f.Rule+" "+f.Message)
	}
	if strings.Join(fromCheck, "\n") != strings.Join(fromReconcile, "\n") || len(fromCheck) != 2 {
		t.Errorf("Check:\n%s\nCheckReconcile:\n%s", strings.Join(fromCheck, "\n"), strings.Join(fromReconcile, "\n"))
	}
	y, err := quantity.ParseYields("y.toml", []byte("[yields.filter-pack]\nyield = 0.9\nbag_mass = 50\n"))
	if err != nil {
		t.Fatal(err)
	}
	got := Run(w, Select(Reconciling), &Profile{Yields: y})
	if len(got) != 1 || !strings.Contains(got[0].Message, "neat cement") {
		t.Errorf("with 0.9 ft3 sand: %v", got)
	}
}
