package exchange

import (
	"fmt"
	"os"
	"path/filepath"
	"reflect"
	"slices"
	"strings"
	"testing"
	"time"

	"github.com/tremie-dev/tremie/schema"
)

// TestEveryArrayTableHasAKind: every array table of the well format
// (schema.WellFile) has a row kind on the Intervals sheet, so that what
// Layout writes, Import reads back.
func TestEveryArrayTableHasAKind(t *testing.T) {
	var walk func(path string, spec *schema.TableSpec)
	walk = func(path string, spec *schema.TableSpec) {
		for _, k := range spec.Keys {
			if k.Table == nil {
				continue
			}
			p := k.Name
			if path != "" {
				p = path + "." + k.Name
			}
			if k.Type == schema.TypeTables {
				kind := kindOfTable(p)
				if p == "string.section" {
					kind = "screen" // and riser, sump: the section's own kind
				}
				if table, ok := tableOfKind(kind); !ok || table != p {
					t.Errorf("[[%s]] has no row kind on the Intervals sheet", p)
				}
			}
			walk(p, k.Table)
		}
	}
	walk("", schema.WellFile)
}

// TestFixturesRoundTrip: every rule fixture, the gallery and the good
// wells go out through Layout and back through Import with the same keys
// and values (numbers compared as numbers; an empty text is no value).
func TestFixturesRoundTrip(t *testing.T) {
	var files []string
	for _, pat := range []string{"../rules/testdata/*/*.toml", "../../testdata/gallery/*.toml", "../../testdata/good/*.toml"} {
		m, _ := filepath.Glob(pat)
		files = append(files, m...)
	}
	if len(files) < 50 {
		t.Fatalf("%d fixtures found", len(files))
	}
	for _, f := range files {
		wb, err := Layout([]string{f})
		if err != nil {
			t.Errorf("%s: %v", f, err)
			continue
		}
		data, err := wb.XLSX(day)
		if err != nil {
			t.Fatal(err)
		}
		got, errs := Import(writeTemp(t, "round.xlsx", data))
		if len(errs) > 0 || len(got) != 1 {
			t.Errorf("%s does not import back: %v", f, errs)
			continue
		}
		want := decodeFile(t, f)
		back, err := schema.DecodeTOML(f, got[0].Data)
		if err != nil {
			t.Fatal(err)
		}
		if w, g := comparable(want), comparable(back); !reflect.DeepEqual(w, g) {
			t.Errorf("%s differs after the round trip:\n%v\n%v", f, w, g)
		}
	}
}

func decodeFile(t *testing.T, f string) map[string]any {
	t.Helper()
	data, err := schema.ReadInput(f, schema.MaxTextFile)
	if err != nil {
		t.Fatal(err)
	}
	tree, err := schema.DecodeTOML(f, data)
	if err != nil {
		t.Fatal(err)
	}
	return tree
}

// comparable is a decoded TOML value with numbers as float64, arrays of
// tables as lists, times as text and empty texts left out.
func comparable(v any) any {
	switch x := v.(type) {
	case int64:
		return float64(x)
	case map[string]any:
		out := map[string]any{}
		for k, e := range x {
			if s, ok := e.(string); ok && s == "" {
				continue
			}
			out[k] = comparable(e)
		}
		return out
	case []map[string]any:
		out := make([]any, len(x))
		for i, e := range x {
			out[i] = comparable(e)
		}
		return out
	case []any:
		return slices.Collect(func(yield func(any) bool) {
			for _, e := range x {
				if !yield(comparable(e)) {
					return
				}
			}
		})
	case time.Time:
		return fmt.Sprint(x.Location(), x.Format(time.RFC3339))
	}
	return v
}

// TestDocsListTheLayout: docs/import.md lists every column and row kind
// of the layout with the note the template's header carries.
func TestDocsListTheLayout(t *testing.T) {
	data, err := os.ReadFile(filepath.Join("..", "..", "docs", "import.md"))
	if err != nil {
		t.Fatal(err)
	}
	doc := string(data)
	want := func(line string) {
		if !strings.Contains(doc, "\n"+line+"\n") {
			t.Errorf("docs/import.md lacks the line\n%s", line)
		}
	}
	for _, c := range wellColumns {
		key := "[" + c.table + "] " + c.key
		want(fmt.Sprintf("| `%s` | `%s` | %s |", c.name, key, c.note))
	}
	for _, k := range intervalKinds {
		want(fmt.Sprintf("| `%s` | `[[%s]]` | %s |", k.kind, k.table, k.note))
	}
	for _, c := range intervalColumns {
		want(fmt.Sprintf("| `%s` | %s |", c.name, c.note))
	}
}

// TestTakenIDs: importing into a folder where another file already has
// one of the imported IDs (in other case too) names that file and line;
// the file the import replaces is not counted, nor is a new folder.
func TestTakenIDs(t *testing.T) {
	dir := t.TempDir()
	src, err := os.ReadFile(filepath.Join("..", "..", "testdata", "gallery", "BR-3.toml"))
	if err != nil {
		t.Fatal(err)
	}
	os.MkdirAll(filepath.Join(dir, "old"), 0o755)
	os.WriteFile(filepath.Join(dir, "old", "br3-final.toml"), src, 0o644)
	os.WriteFile(filepath.Join(dir, "BR-3.toml"), src, 0o644)
	files := []WellFile{{ID: "br-3", Name: "BR-3.toml"}, {ID: "X-1", Name: "X-1.toml"}}
	paths, _ := Destinations(dir, files)
	errs := Taken(dir, files, paths)
	want := filepath.Join(dir, "old", "br3-final.toml") + `:9: well ID "BR-3" is already this file's: importing BR-3.toml beside it`
	if len(errs) != 1 || !strings.HasPrefix(errs[0].Error(), want) {
		t.Errorf("%v, want one error starting %s", errs, want)
	}
	if errs := Taken(filepath.Join(dir, "new"), files, nil); errs != nil {
		t.Errorf("a new folder: %v", errs)
	}
}
