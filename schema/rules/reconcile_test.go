package rules

import (
	"bufio"
	"bytes"
	"fmt"
	"os"
	"path/filepath"
	"sort"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// reconcileRules are the rules whose fixtures this file runs (a shared
// harness that runs every rule's fixtures checks them again; harmless).
var reconcileRules = []string{"PLACED-VOLUME-LOW", "PLACED-VOLUME-HIGH", "TAG-EXPECTED-TOP", "TAG-FINAL-TOP"}

// Each fixture's "# want RULE-ID" comments are the lines the rule must
// flag, and the only ones; the hand arithmetic is in each fixture's header.
func TestReconcileFixtures(t *testing.T) {
	for _, id := range reconcileRules {
		r, ok := Lookup(id)
		if !ok {
			t.Fatalf("rule %s not registered", id)
		}
		for _, name := range []string{"pass.toml", "fail.toml"} {
			path := filepath.Join("testdata", id, name)
			data, err := os.ReadFile(path)
			if err != nil {
				t.Fatal(err)
			}
			w, err := schema.Load(path, data)
			if err != nil {
				t.Fatalf("%s: %v", path, err)
			}
			want := reconcileWants(data, id)
			if name == "fail.toml" && len(want) == 0 {
				t.Errorf("%s: no # want line", path)
			}
			var got []int
			for _, f := range Check(w, nil) {
				if f.Rule == id {
					got = append(got, f.Line)
				}
			}
			sort.Ints(got)
			if fmt.Sprint(got) != fmt.Sprint(want) {
				t.Errorf("%s: %s flagged lines %v, want %v", path, r.ID, got, want)
				for _, f := range Check(w, nil) {
					if f.Rule == id {
						t.Logf("  %d: %s", f.Line, f.Message)
					}
				}
			}
		}
	}
}

func reconcileWants(data []byte, id string) []int {
	var out []int
	sc := bufio.NewScanner(bytes.NewReader(data))
	for n := 1; sc.Scan(); n++ {
		if i := strings.Index(sc.Text(), "# want "); i >= 0 {
			for _, w := range strings.Fields(sc.Text()[i+len("# want "):]) {
				if w == id {
					out = append(out, n)
				}
			}
		}
	}
	return out
}

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
	for _, s := range []string{"filter pack at 23–36 ft", "possible bridge", "56 %", "2.500 ft3", "4.457 ft3"} {
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
