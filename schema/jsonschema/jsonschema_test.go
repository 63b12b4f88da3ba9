package jsonschema

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"image"
	"image/png"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

// The checks below validate with santhosh-tekuri/jsonschema, a
// general-purpose JSON Schema validator that passes the official JSON
// Schema test suite, so the schemas are tested by an implementation that
// is not ours.

func validate(t *testing.T, kind string, src string) error {
	t.Helper()
	if _, err := Instance([]byte(src)); err != nil {
		t.Fatalf("not TOML: %v", err)
	}
	return Validate(kind, []byte(src))
}

func wellFiles(t *testing.T) []string {
	var files []string
	for _, g := range []string{"../../cmd/tremie/demo/wells/*.toml", "../../testdata/good/*.toml", "../rules/testdata/*/*.toml"} {
		m, err := filepath.Glob(g)
		if err != nil {
			t.Fatal(err)
		}
		files = append(files, m...)
	}
	if len(files) < 20 {
		t.Fatalf("found only %d well files", len(files))
	}
	return files
}

// TestFilesTheLoaderAcceptsValidate: every demo, good and rule-fixture
// well the loader accepts is valid against the well schema.
func TestFilesTheLoaderAcceptsValidate(t *testing.T) {
	n := 0
	for _, f := range wellFiles(t) {
		if _, err := schema.LoadFile(f); err != nil {
			continue // a fixture of a loader error
		}
		data, _ := os.ReadFile(f)
		if err := validate(t, "well", string(data)); err != nil {
			t.Errorf("%s loads but fails the schema: %v", f, err)
		}
		n++
	}
	if n < 20 {
		t.Errorf("validated only %d files", n)
	}
	data, err := os.ReadFile("../../cmd/tremie/demo/project.toml")
	if err != nil {
		t.Fatal(err)
	}
	if err := validate(t, "project", string(data)); err != nil {
		t.Errorf("demo project.toml fails the schema: %v", err)
	}
}

var expectLine = regexp.MustCompile(`^# expect: \S+ (.*)`)

// TestBadFilesRejected: each file of testdata/bad that the loader rejects
// for a type, an allowed value or an unknown key is rejected by the schema
// too. (Errors between keys, such as an inverted interval, and numbers
// JSON cannot hold, NaN and infinity, are the loader's alone.)
func TestBadFilesRejected(t *testing.T) {
	files, _ := filepath.Glob("../../testdata/bad/*.toml")
	checked := 0
	for _, f := range files {
		data, _ := os.ReadFile(f)
		m := expectLine.FindStringSubmatch(strings.SplitN(string(data), "\n", 2)[0])
		if m == nil {
			continue
		}
		msg := m[1]
		if !(strings.Contains(msg, "must be a") && !strings.Contains(msg, "finite") || strings.Contains(msg, "is not one of") || strings.Contains(msg, "unknown key") || strings.Contains(msg, "must be positive") || strings.Contains(msg, "missing required")) {
			continue
		}
		checked++
		if err := validate(t, "well", string(data)); err == nil {
			t.Errorf("%s: the loader rejects it (%s), the schema accepts it", f, msg)
		}
	}
	if checked < 5 {
		t.Errorf("checked only %d bad files", checked)
	}
}

// wrongValues are values of another type than each key's, and for
// enumerations a value not allowed.
func wrongValues(k *schema.KeySpec) []string {
	switch k.Type {
	case schema.TypeString:
		out := []string{"12", "true"}
		if len(k.Enum) > 0 {
			out = append(out, `"not-a-value"`)
		}
		return out
	case schema.TypeNumber:
		out := []string{`"12"`, "[1.0]"}
		if k.Bound != schema.AnyNumber {
			out = append(out, "-1.0")
		}
		if k.Bound == schema.Positive {
			out = append(out, "0.0")
		}
		return out
	case schema.TypeInteger:
		return []string{`"3"`, "2.5", "-1"}
	case schema.TypeBool:
		return []string{`"yes"`, "1"}
	case schema.TypeDate, schema.TypeDateTime:
		return []string{"12", "true"}
	case schema.TypeStrings:
		return []string{"12", "[1, 2]"}
	case schema.TypeNumbers:
		return []string{"12.0", `["a"]`}
	case schema.TypeNumberPairs:
		return []string{"12.0", `[["a", 1.0], [2.0, 3.0], [4.0, 5.0]]`, "[[1.0], [2.0], [3.0]]"}
	}
	return nil
}

// replaceValue sets key name of table path in an example document.
func replaceValue(src, path, name, value string) (string, bool) {
	var out []string
	current, done := "", false
	for _, line := range strings.Split(src, "\n") {
		trim := strings.TrimSpace(line)
		if strings.HasPrefix(trim, "[") {
			current = strings.Trim(trim, "[]")
		}
		if !done && current == path && strings.HasPrefix(trim, name+" = ") {
			line = name + " = " + value
			done = true
		}
		out = append(out, line)
	}
	return strings.Join(out, "\n"), done
}

type loader func(src string) error

func eachKey(t *schema.TableSpec, path string, visit func(path string, k *schema.KeySpec)) {
	for i := range t.Keys {
		k := &t.Keys[i]
		if k.Table != nil {
			p := k.Name
			if path != "" {
				p = path + "." + k.Name
			}
			eachKey(k.Table, p, visit)
			continue
		}
		visit(path, k)
	}
}

// checkRejections sets every key of a valid document to each wrong value
// and adds an unknown key to every table: where the loader rejects the
// result, the schema must too, and the loader must reject every one.
func checkRejections(t *testing.T, kind, valid string, load loader) {
	t.Helper()
	spec, _ := Spec(kind)
	if err := load(valid); err != nil {
		t.Fatalf("%s: the valid document is rejected: %v\n%s", kind, err, valid)
	}
	if err := validate(t, kind, valid); err != nil {
		t.Fatalf("%s: the valid document fails the schema: %v", kind, err)
	}
	n := 0
	eachKey(spec, "", func(path string, k *schema.KeySpec) {
		for _, v := range wrongValues(k) {
			src, ok := replaceValue(valid, path, k.Name, v)
			if !ok {
				continue
			}
			n++
			lerr := load(src)
			if lerr == nil {
				t.Errorf("%s: loader accepts %s.%s = %s", kind, path, k.Name, v)
				continue
			}
			if err := validate(t, kind, src); err == nil {
				t.Errorf("%s: loader rejects %s.%s = %s (%v), the schema accepts it", kind, path, k.Name, v, lerr)
			}
		}
	})
	if n < 10 {
		t.Errorf("%s: tried only %d wrong values", kind, n)
	}
}

func loadWell(src string) error { _, err := schema.Load("w.toml", []byte(src)); return err }

// consistentWell is a well file that loads: the key catalogue less one of
// each pair of alternatives.
func consistentWell(t *testing.T) string {
	src := schema.WellFile.ExampleTOML()
	for _, drop := range [][2]string{{"string.section", "slot_number"}, {"fill", "volume"}, {"lithology", "uscs"},
		{"casing", "sdr"}, {"casing", "od"}, {"casing", "id"}, {"string.section", "sdr"}, {"string.section", "od"}, {"string.section", "id"}, {"feature", "points"},
		{"string", "hung_in"}, {"string", "hanger"}, {"string", "hanger_product"}, {"string", "lap_seal"}, {"measuring_point", "height"}} {
		src = dropKey(src, drop[0], drop[1])
	}
	return dropTable(src, "surface.vault")
}

// dropKey removes the lines setting key name in tables named table.
func dropKey(src, table, name string) string {
	var out []string
	current := ""
	for _, line := range strings.Split(src, "\n") {
		trim := strings.TrimSpace(line)
		if strings.HasPrefix(trim, "[") {
			current = strings.Trim(trim, "[]")
		}
		if current == table && strings.HasPrefix(trim, name+" = ") {
			continue
		}
		out = append(out, line)
	}
	return strings.Join(out, "\n")
}

func TestWellRejections(t *testing.T) {
	src := consistentWell(t)
	// surface.kind is flush-mount in the catalogue; with the vault dropped
	// the protective casing needs stick-up.
	src, _ = replaceValue(src, "surface", "kind", `"stick-up"`)
	checkRejections(t, "well", src, loadWell)
}

func TestProfileRejections(t *testing.T) {
	src := profileCatalogue()
	checkRejections(t, "profile", src, func(src string) error { _, err := rules.ParseProfile("p.toml", []byte(src)); return err })
}

// profileCatalogue is the profile key catalogue less what a profile may
// set only once: purposes in several groups, and seal depths also given
// in [sanitary_seal].
func profileCatalogue() string {
	var out []string
	skipping := false
	for _, line := range strings.Split(rules.ProfileFile().ExampleTOML(), "\n") {
		trim := strings.TrimSpace(line)
		if strings.HasPrefix(trim, "[") {
			h := strings.Split(strings.Trim(trim, "[]"), ".")
			skipping = len(h) >= 3 || (len(h) == 2 && h[1] == "SANITARY-SEAL-DEPTH")
		}
		if !skipping {
			out = append(out, line)
		}
	}
	return strings.Join(out, "\n")
}

func TestYieldsRejections(t *testing.T) {
	dir := t.TempDir()
	checkRejections(t, "yields", quantity.YieldsFile().ExampleTOML(), func(src string) error {
		p := filepath.Join(dir, "y.toml")
		if err := os.WriteFile(p, []byte(src), 0o644); err != nil {
			return err
		}
		_, err := quantity.LoadYields(p)
		return err
	})
}

func TestProjectRejections(t *testing.T) {
	dir := t.TempDir()
	img := image.NewGray(image.Rect(0, 0, 32, 32))
	var logo bytes.Buffer
	if err := png.Encode(&logo, img); err != nil {
		t.Fatal(err)
	}
	for name, data := range map[string][]byte{"logo.png": logo.Bytes(), "site.profile.toml": nil, "site.yields.toml": []byte("[yields]\n")} {
		if err := os.WriteFile(filepath.Join(dir, name), data, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	checkRejections(t, "project", project.File.ExampleTOML(), func(src string) error {
		_, err := project.Parse(dir, filepath.Join(dir, "project.toml"), []byte(src))
		return err
	})
}

func dropTable(src, name string) string {
	var out []string
	skipping := false
	for _, line := range strings.Split(src, "\n") {
		trim := strings.TrimSpace(line)
		if strings.HasPrefix(trim, "[") {
			skipping = strings.Trim(trim, "[]") == name
		}
		if !skipping {
			out = append(out, line)
		}
	}
	return strings.Join(out, "\n")
}

// TestUnknownKeysRejected: a key no table declares is rejected by the
// loader and by the schema, in every table of every kind.
func TestUnknownKeysRejected(t *testing.T) {
	for _, kind := range Kinds {
		spec, _ := Spec(kind)
		var tables []string
		var walk func(t *schema.TableSpec, path string)
		walk = func(ts *schema.TableSpec, path string) {
			if ts.Other != nil {
				return // keys of the user's naming: any name is allowed there
			}
			tables = append(tables, path)
			for _, k := range ts.Keys {
				if k.Table != nil {
					p := k.Name
					if path != "" {
						p = path + "." + k.Name
					}
					walk(k.Table, p)
				}
			}
		}
		walk(spec, "")
		for _, tbl := range tables {
			src := insertKey(spec.ExampleTOML(), tbl, "bogus_key = 1")
			if err := validate(t, kind, src); err == nil {
				t.Errorf("%s: schema accepts an unknown key in [%s]", kind, tbl)
			}
		}
	}
	// and the well loader too, table by table
	for _, tbl := range []string{"", "units", "well", "borehole", "string.section", "fill.tag", "surface.pad"} {
		src := insertKey(consistentWell(t), tbl, "bogus_key = 1")
		var el schema.ErrorList
		if err := loadWell(src); !errors.As(err, &el) || !strings.Contains(el.Error(), `unknown key "bogus_key"`) {
			t.Errorf("well loader: no unknown-key error in [%s]: %v", tbl, err)
		}
	}
}

// insertKey adds a line right after the header of table path ("" = top).
func insertKey(src, path, line string) string {
	if path == "" {
		return line + "\n" + src
	}
	lines := strings.Split(src, "\n")
	for i, l := range lines {
		h := strings.Trim(strings.TrimSpace(l), "[]")
		if strings.HasPrefix(strings.TrimSpace(l), "[") && h == path {
			return strings.Join(append(lines[:i+1], append([]string{line}, lines[i+1:]...)...), "\n")
		}
	}
	// a table the example writes only through its sub-tables
	return src + fmt.Sprintf("\n[%s]\n%s\n", path, line)
}

// TestGenerateDeterministic: the same tables give the same bytes, and
// every kind is JSON with a title and the draft.
func TestGenerateDeterministic(t *testing.T) {
	for _, kind := range Kinds {
		a, _ := Generate(kind)
		b, _ := Generate(kind)
		if !bytes.Equal(a, b) {
			t.Errorf("%s: two runs differ", kind)
		}
		var doc map[string]any
		if err := json.Unmarshal(a, &doc); err != nil || doc["$schema"] != Draft || doc["title"] == "" {
			t.Errorf("%s: bad header: %v", kind, err)
		}
	}
	if _, err := Generate("nope"); err == nil {
		t.Error("Generate accepts an unknown kind")
	}
}
