package rules

import (
	"bufio"
	"bytes"
	"os"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// The fixture harness, after golang.org/x/tools/go/analysis/analysistest:
// each rule has testdata/<RULE-ID>/pass.toml, which it must not flag, and
// fail.toml, whose comments # want RULE-ID "regexp" mark every line it
// must flag, each with a regular expression its message must match, and
// no other. A line flagged twice carries two entries. Findings of other
// rules in a fixture are not compared.

var wantRE = regexp.MustCompile(`#\s*want\s+(.+)$`)

// wantEntryRE is one entry of a want comment: a rule ID and a regular
// expression written as a Go string, "quoted" or `raw`.
var wantEntryRE = regexp.MustCompile(`^\s*([A-Z][A-Z0-9-]*)\s+("(?:[^"\\]|\\.)*"|` + "`[^`]*`)")

// want is one expected finding of a fixture.
type want struct {
	line int
	re   *regexp.Regexp
}

// wants reads the "# want" comments of a fixture: rule ID -> expected
// findings, in line order. A malformed comment fails the test.
func wants(t *testing.T, path string, data []byte) map[string][]want {
	t.Helper()
	out := map[string][]want{}
	sc := bufio.NewScanner(bytes.NewReader(data))
	for n := 1; sc.Scan(); n++ {
		m := wantRE.FindStringSubmatch(sc.Text())
		if m == nil {
			continue
		}
		rest := m[1]
		for strings.TrimSpace(rest) != "" {
			e := wantEntryRE.FindStringSubmatchIndex(rest)
			if e == nil {
				t.Fatalf("%s:%d: want entries are RULE-ID \"regexp\", not %q", path, n, rest)
			}
			id := rest[e[2]:e[3]]
			pat, err := strconv.Unquote(rest[e[4]:e[5]])
			if err != nil {
				t.Fatalf("%s:%d: %v", path, n, err)
			}
			re, err := regexp.Compile(pat)
			if err != nil {
				t.Fatalf("%s:%d: %v", path, n, err)
			}
			out[id] = append(out[id], want{line: n, re: re})
			rest = rest[e[1]:]
		}
	}
	return out
}

// flagged runs the check on a fixture and returns the findings of one rule.
func flagged(t *testing.T, path, id string) []Finding {
	t.Helper()
	w, err := schema.LoadFile(path)
	if err != nil {
		t.Fatalf("%s does not load: %v", path, err)
	}
	var out []Finding
	for _, f := range Check(w, nil) {
		if f.Rule == id {
			out = append(out, f)
		}
	}
	return out
}

// match pairs findings with wants on the same line whose regexp the
// message matches, and returns what is left of each.
func match(got []Finding, want []want) (extra []Finding, missing []want) {
	used := make([]bool, len(got))
	for _, w := range want {
		found := false
		for i, f := range got {
			if !used[i] && f.Line == w.line && w.re.MatchString(f.Message) {
				used[i], found = true, true
				break
			}
		}
		if !found {
			missing = append(missing, w)
		}
	}
	for i, f := range got {
		if !used[i] {
			extra = append(extra, f)
		}
	}
	return extra, missing
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
				want := wants(t, path, data)[r.ID]
				if name == "pass.toml" && len(want) > 0 {
					t.Errorf("%s: a pass fixture has no # want %s lines", path, r.ID)
				}
				if name == "fail.toml" && len(want) == 0 {
					t.Errorf("%s: a fail fixture needs at least one # want %s line", path, r.ID)
				}
				extra, missing := match(flagged(t, path, r.ID), want)
				for _, f := range extra {
					t.Errorf("%s:%d: unexpected %s finding: %s", path, f.Line, r.ID, f.Message)
				}
				for _, w := range missing {
					t.Errorf("%s:%d: no %s finding matching %q", path, w.line, r.ID, w.re)
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
