package schema_test

import (
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
	"time"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
	"github.com/tremie-dev/tremie/templates"
)

// TestEveryReaderRefusesDeepNesting: issue 15's reproducer, a value
// nested 10,000 or 100,000 deep (a 30-300 KB file on which the TOML
// library spent minutes and gigabytes, or ran out of memory), is refused
// by every reader of an input file at once, at the line and column where
// the nesting passes the limit, in inline tables and in arrays.
func TestEveryReaderRefusesDeepNesting(t *testing.T) {
	readers := []struct {
		name, file, head string // a subtest, its file name, the lines before the deep value
		load             func(path string) error
	}{
		{"well", "MW-1.toml", "[well]\nid = \"MW-1\"\n", func(p string) error { _, err := schema.LoadFile(p); return err }},
		{"project", project.FileName, "[project]\nname = \"x\"\n", func(p string) error { _, err := project.Load(p); return err }},
		{"profile", "county.toml", "[profile]\nname = \"county\"\n", func(p string) error { _, err := rules.LoadProfile(p); return err }},
		{"yields", "site.yields.toml", "[yields.neat-cement]\nyield = 1.2\n", func(p string) error { _, err := quantity.LoadYields(p); return err }},
		{"template", "page.toml", "[page]\nwidth = \"8.5in\"\n", func(p string) error {
			data, err := os.ReadFile(p)
			if err != nil {
				return err
			}
			_, err = templates.Parse(strings.TrimSuffix(p, ".toml"), data, false) // names it NAME.toml
			return err
		}},
	}
	for _, r := range readers {
		t.Run(r.name, func(t *testing.T) {
			for _, deep := range []int{10000, 100000} {
				// col is that of the 65th opening, after "x = " and 64 openings.
				for v, col := range map[string]int{
					strings.Repeat("{a=", deep) + "1" + strings.Repeat("}", deep): 4 + 64*3 + 1,
					strings.Repeat("[", deep) + strings.Repeat("]", deep):         4 + 64 + 1,
				} {
					path := filepath.Join(t.TempDir(), r.file)
					if err := os.WriteFile(path, []byte(r.head+"x = "+v+"\n"), 0o644); err != nil {
						t.Fatal(err)
					}
					start := time.Now()
					err := r.load(path)
					if took := time.Since(start); took > 2*time.Second {
						t.Errorf("%d deep %.3q: %v to refuse", deep, v, took)
					}
					want := path + ":3:" + strconv.Itoa(col) + ": arrays and inline tables nest more than 64 deep"
					if err == nil || !strings.HasPrefix(err.Error(), want) {
						t.Errorf("%d deep %.3q: %v\nwant %s", deep, v, err, want)
					}
				}
			}
		})
	}
}
