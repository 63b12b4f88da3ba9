package starter

import (
	"bytes"
	"errors"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"github.com/BurntSushi/toml"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/jsonschema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/rules"
)

var markRE = regexp.MustCompile(`^[a-z_]+ = .*  # FILL`)

// markedLines lists, by plain text search, the lines a starter marks.
func markedLines(src string) map[int]bool {
	out := map[int]bool{}
	for i, l := range strings.Split(src, "\n") {
		if markRE.MatchString(l) {
			out[i+1] = true
		}
	}
	return out
}

func each(t *testing.T, f func(t *testing.T, o Options, src []byte)) {
	for _, kind := range Kinds {
		for _, u := range []schema.DepthUnit{schema.Feet, schema.Metres} {
			o := Options{ID: "MW-9", Kind: kind, Units: u, Schema: "../schemas/well.schema.json"}
			src, err := Well(o)
			if err != nil {
				t.Fatal(err)
			}
			t.Run(kind+"-"+string(u), func(t *testing.T) { f(t, o, src) })
		}
	}
}

// TestStartersCheckClean: every starter loads, and the check names exactly
// its marked values (rule FILL-IN, one per mark) and nothing else; with
// the marks deleted, as after filling in, it checks clean.
func TestStartersCheckClean(t *testing.T) {
	each(t, func(t *testing.T, o Options, src []byte) {
		w, err := schema.Load("MW-9.toml", src)
		if err != nil {
			t.Fatalf("starter does not load: %v", err)
		}
		marks := markedLines(string(src))
		if len(marks) < 20 {
			t.Fatalf("only %d marked values", len(marks))
		}
		got := map[int]bool{}
		for _, f := range rules.Check(w, nil) {
			if f.Rule != "FILL-IN" {
				t.Errorf("line %d: %s %s", f.Line, f.Rule, f.Message)
				continue
			}
			got[f.Line] = true
		}
		for l := range marks {
			if !got[l] {
				t.Errorf("line %d is marked but not reported", l)
			}
		}
		for l := range got {
			if !marks[l] {
				t.Errorf("line %d is reported but not marked", l)
			}
		}
		filled := strings.ReplaceAll(string(src), "  # FILL", "")
		w, err = schema.Load("MW-9.toml", []byte(filled))
		if err != nil {
			t.Fatal(err)
		}
		for _, f := range rules.Check(w, nil) {
			t.Errorf("filled in, line %d: %s %s", f.Line, f.Rule, f.Message)
		}
		if (w.Status == "planned") != (o.Kind == "planned") {
			t.Errorf("status %q for kind %s", w.Status, o.Kind)
		}
	})
}

// TestStarterCommentsEveryKey: each key line follows a comment that
// explains it, with the file's unit for a number with a unit.
func TestStarterCommentsEveryKey(t *testing.T) {
	each(t, func(t *testing.T, o Options, src []byte) {
		lines := strings.Split(string(src), "\n")
		if lines[0] != "#:schema ../schemas/well.schema.json" {
			t.Errorf("first line %q", lines[0])
		}
		for i, l := range lines {
			if l == "" || strings.HasPrefix(l, "#") || strings.HasPrefix(l, "[") {
				continue
			}
			if i == 0 || !strings.HasPrefix(lines[i-1], "#") {
				t.Errorf("line %d %q has no comment above it", i+1, l)
			}
			if strings.HasPrefix(l, "total_depth = ") && !strings.Contains(lines[i-1], "["+string(o.Units)+"]") {
				t.Errorf("total_depth's comment names no unit: %q", lines[i-1])
			}
		}
	})
}

// TestStartersValidate: every starter is valid against the well schema,
// checked by santhosh-tekuri/jsonschema, a general-purpose validator
// (jsonschema.Validate).
func TestStartersValidate(t *testing.T) {
	each(t, func(t *testing.T, o Options, src []byte) {
		if err := jsonschema.Validate("well", src); err != nil {
			t.Errorf("starter fails the schema: %v", err)
		}
	})
}

func TestWellOptions(t *testing.T) {
	for _, o := range []Options{{ID: ""}, {ID: "A", Kind: "spring"}, {ID: "A", Units: "yd"}, {ID: "A", Purpose: "drinking"}} {
		if _, err := Well(o); err == nil {
			t.Errorf("%+v accepted", o)
		}
	}
	src, err := Well(Options{ID: "PW-2", Kind: "supply", Purpose: schema.PublicSupply})
	if err != nil || !strings.Contains(string(src), `purpose = "public-supply"`) {
		t.Errorf("purpose not written: %v", err)
	}
	a, _ := Well(Options{ID: "A"})
	b, _ := Well(Options{ID: "A"})
	if !bytes.Equal(a, b) {
		t.Error("two runs differ")
	}
}

// TestInitAndNew: a skeleton's files load, validate and never get
// overwritten; a starter written into it points at its schema.
func TestInitAndNew(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "site")
	wrote, err := Init(dir, InitOptions{Units: schema.Metres})
	if err != nil {
		t.Fatal(err)
	}
	if len(wrote) != 7 {
		t.Errorf("wrote %d files: %v", len(wrote), wrote)
	}
	// A project's files are shared documents: readable by the group and
	// others, as os.WriteFile makes them (0644), not a temporary file's 0600.
	for _, f := range wrote {
		if st, err := os.Stat(f); err != nil || st.Mode().Perm() != 0o644 {
			t.Errorf("%s: mode %v %v, want -rw-r--r--", f, st.Mode().Perm(), err)
		}
	}
	p, err := project.Load(dir)
	if err != nil {
		t.Fatalf("project.toml does not load: %v", err)
	}
	if p.Name != "site" || p.Units != schema.Metres || p.ProfilePath() == "" {
		t.Errorf("project %+v", p)
	}
	if _, err := rules.LoadProfile(p.ProfilePath()); err != nil {
		t.Errorf("profile does not load: %v", err)
	}
	for file, kind := range map[string]string{"project.toml": "project", ProfileName: "profile"} {
		data, _ := os.ReadFile(filepath.Join(dir, file))
		if err := jsonschema.Validate(kind, data); err != nil {
			t.Errorf("%s fails its schema: %v", file, err)
		}
	}
	var taplo map[string]any
	if _, err := toml.DecodeFile(filepath.Join(dir, ".taplo.toml"), &taplo); err != nil {
		t.Errorf(".taplo.toml: %v", err)
	}
	before, _ := os.ReadFile(filepath.Join(dir, "project.toml"))
	if _, err := Init(dir, InitOptions{Name: "other"}); !errors.Is(err, ErrExists) {
		t.Errorf("second init: %v", err)
	}
	after, _ := os.ReadFile(filepath.Join(dir, "project.toml"))
	if !bytes.Equal(before, after) {
		t.Error("second init changed project.toml")
	}

	wells := filepath.Join(dir, "wells")
	got, err := WriteWell(wells, Options{ID: "MW-9", Units: schema.Metres})
	if err != nil || len(got) != 1 {
		t.Fatalf("new: %v %v", got, err)
	}
	if st, err := os.Stat(got[0]); err != nil || st.Mode().Perm() != 0o644 {
		t.Errorf("new well file: mode %v %v, want -rw-r--r--", st.Mode().Perm(), err)
	}
	src, _ := os.ReadFile(got[0])
	if !strings.HasPrefix(string(src), "#:schema ../schemas/well.schema.json\n") {
		t.Errorf("schema line: %q", strings.SplitN(string(src), "\n", 2)[0])
	}
	if _, err := WriteWell(wells, Options{ID: "MW-9", Kind: "rock"}); !errors.Is(err, ErrExists) {
		t.Errorf("second new: %v", err)
	}
	again, _ := os.ReadFile(got[0])
	if !bytes.Equal(src, again) {
		t.Error("second new changed the file")
	}

	// outside a project the schema is written beside the well, once
	loose := t.TempDir()
	got, err = WriteWell(loose, Options{ID: "A-1"})
	if err != nil || len(got) != 2 || filepath.Base(got[0]) != "well.schema.json" {
		t.Fatalf("loose new: %v %v", got, err)
	}
	got, err = WriteWell(loose, Options{ID: "A-2"})
	if err != nil || len(got) != 1 {
		t.Fatalf("second loose new: %v %v", got, err)
	}
	src, _ = os.ReadFile(got[0])
	if !strings.HasPrefix(string(src), "#:schema well.schema.json\n") {
		t.Errorf("loose schema line: %q", strings.SplitN(string(src), "\n", 2)[0])
	}
}

// TestOptionalTables: the starters of kinds that may record formation
// samples, a pumping test or wall features show them commented out; with
// the first "#" of each line of that section deleted, as its note asks,
// the file still loads, passes the well schema and checks with nothing
// but its FILL marks reported.
func TestOptionalTables(t *testing.T) {
	want := map[string][]string{
		"monitoring": {"# [[sample]]"}, "planned": {"# [[sample]]"}, "nested": {"# [[sample]]"},
		"supply": {"# [[sample]]", "# [pumping_test]"}, "rock": {"# [orientation]", "# [[feature]]", "# [pumping_test]"},
	}
	each(t, func(t *testing.T, o Options, src []byte) {
		s := string(src)
		i := strings.Index(s, "\n## "+OptionalMark)
		if i < 0 {
			t.Fatalf("no optional section")
		}
		for _, w := range want[o.Kind] {
			if !strings.Contains(s[i:], "\n"+w+"\n") {
				t.Errorf("optional section lacks %s", w)
			}
		}
		lines := strings.Split(s[i+1:], "\n")
		for j, l := range lines {
			if l != "" && !strings.HasPrefix(l, "#") {
				t.Fatalf("optional line %q is not commented out", l)
			}
			lines[j] = strings.TrimPrefix(l, "#")
		}
		used := s[:i+1] + strings.Join(lines, "\n")
		w, err := schema.Load("MW-9.toml", []byte(used))
		if err != nil {
			t.Fatalf("with the optional tables: %v\n%s", err, used[i:])
		}
		if err := jsonschema.Validate("well", []byte(used)); err != nil {
			t.Errorf("with the optional tables the schema fails: %v", err)
		}
		for _, f := range rules.Check(w, nil) {
			if f.Rule != "FILL-IN" {
				t.Errorf("with the optional tables, line %d: %s %s", f.Line, f.Rule, f.Message)
			}
		}
		if len(w.Samples)+len(w.Features) == 0 && w.PumpingTest == nil {
			t.Errorf("the optional tables were not read")
		}
	})
}

// TestMetricStartersSpeakMetres: the text values of a starter in metres
// give their distances in metres (the location once read "15 ft east of
// gate 2" in a file whose every number is metric).
func TestMetricStartersSpeakMetres(t *testing.T) {
	imperial := regexp.MustCompile(`^[a-z_]+ = "[^"]*\b\d+(\.\d+)?[ -]?(ft|feet|in|inch)\b`)
	each(t, func(t *testing.T, o Options, src []byte) {
		if o.Units != schema.Metres {
			return
		}
		for i, l := range strings.Split(string(src), "\n") {
			if imperial.MatchString(l) {
				t.Errorf("line %d gives feet or inches in a metric starter: %s", i+1, l)
			}
		}
	})
}
