package rules

import (
	"bufio"
	"bytes"
	"fmt"
	"os"
	"path/filepath"
	"regexp"
	"sort"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// The fixture harness, after golang.org/x/tools/go/analysis/analysistest:
// each rule has testdata/<RULE-ID>/pass.toml, which it must not flag, and
// fail.toml, whose "# want RULE-ID" comments mark every line it must flag
// and no other. Findings of other rules in a fixture are not compared.

var wantRE = regexp.MustCompile(`#\s*want\s+(.+)$`)

// wants reads the "# want" comments of a fixture: rule ID -> lines.
func wants(data []byte) map[string][]int {
	out := map[string][]int{}
	sc := bufio.NewScanner(bytes.NewReader(data))
	for n := 1; sc.Scan(); n++ {
		m := wantRE.FindStringSubmatch(sc.Text())
		if m == nil {
			continue
		}
		for _, id := range strings.Fields(m[1]) {
			out[id] = append(out[id], n)
		}
	}
	return out
}

// flagged runs the check on a fixture and returns the lines one rule
// flagged, with the messages for failure output.
func flagged(t *testing.T, path, id string) ([]int, []string) {
	t.Helper()
	w, err := schema.LoadFile(path)
	if err != nil {
		t.Fatalf("%s does not load: %v", path, err)
	}
	var lines []int
	var msgs []string
	for _, f := range Check(w, nil) {
		if f.Rule == id {
			lines = append(lines, f.Line)
			msgs = append(msgs, fmt.Sprintf("%d: %s %s", f.Line, f.Label(), f.Message))
		}
	}
	sort.Ints(lines)
	return lines, msgs
}

func TestRuleFixtures(t *testing.T) {
	for _, r := range All() {
		t.Run(r.ID, func(t *testing.T) {
			dir := filepath.Join("testdata", r.ID)
			for _, name := range []string{"pass.toml", "fail.toml"} {
				path := filepath.Join(dir, name)
				data, err := os.ReadFile(path)
				if err != nil {
					t.Errorf("rule %s needs a fixture: %v", r.ID, err)
					continue
				}
				want := wants(data)[r.ID]
				if name == "pass.toml" && len(want) > 0 {
					t.Errorf("%s: a pass fixture has no # want %s lines", path, r.ID)
				}
				if name == "fail.toml" && len(want) == 0 {
					t.Errorf("%s: a fail fixture needs at least one # want %s line", path, r.ID)
				}
				got, msgs := flagged(t, path, r.ID)
				if fmt.Sprint(got) != fmt.Sprint(want) {
					t.Errorf("%s: %s flagged lines %v, want %v\n  %s", path, r.ID, got, want, strings.Join(msgs, "\n  "))
				}
			}
		})
	}
}

// Every fixture directory belongs to a registered rule, so that a renamed
// rule does not leave fixtures that test nothing.
func TestFixtureDirectoriesNameRules(t *testing.T) {
	entries, err := os.ReadDir("testdata")
	if err != nil {
		t.Fatal(err)
	}
	for _, e := range entries {
		if !e.IsDir() || !idRE.MatchString(e.Name()) {
			continue
		}
		if _, ok := Lookup(e.Name()); !ok {
			t.Errorf("testdata/%s names no registered rule", e.Name())
		}
	}
}

var idRE = regexp.MustCompile(`^[A-Z][A-Z0-9]*(-[A-Z0-9]+)+$`)

// Every rule documents itself: an ID of ours in the house form, a title,
// a doc paragraph, a default severity, a source, and a source and doc for
// each parameter with a usable default.
func TestRulesDocumented(t *testing.T) {
	seen := map[string]bool{}
	for _, r := range All() {
		if seen[r.ID] {
			t.Errorf("rule %s registered twice", r.ID)
		}
		seen[r.ID] = true
		if !idRE.MatchString(r.ID) {
			t.Errorf("rule ID %q is not upper-case and hyphenated", r.ID)
		}
		if r.Title == "" || strings.TrimSpace(r.Doc) == "" || r.Source == "" || r.Run == nil {
			t.Errorf("rule %s lacks a title, doc, source or run function", r.ID)
		}
		if r.Severity != Error && r.Severity != Warning {
			t.Errorf("rule %s has no default severity", r.ID)
		}
		names := map[string]bool{}
		for _, p := range r.Params {
			if names[p.Name] {
				t.Errorf("rule %s: parameter %s twice", r.ID, p.Name)
			}
			names[p.Name] = true
			if p.Doc == "" || p.Source == "" {
				t.Errorf("rule %s: parameter %s lacks a doc or source", r.ID, p.Name)
			}
			if _, ok := r.param(p.Fallback); p.Default <= 0 && len(p.ByPurpose) < len(schema.Purposes) && !ok {
				t.Errorf("rule %s: parameter %s has no default", r.ID, p.Name)
			}
			for _, d := range p.ByPurpose {
				if d.Source == "" || d.Default <= 0 || len(d.Purposes) == 0 {
					t.Errorf("rule %s: parameter %s has a purpose default without purposes, value or source", r.ID, p.Name)
				}
			}
			if p.Kind == RatioParam && p.DefaultFt != 0 {
				t.Errorf("rule %s: ratio parameter %s cannot have a feet default", r.ID, p.Name)
			}
		}
	}
}
