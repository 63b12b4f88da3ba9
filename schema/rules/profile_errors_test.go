package rules

import (
	"path/filepath"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// A profile with three mistakes reports all three, sorted, each with
// file:line:col; a slip of the keyboard gets "did you mean".
func TestProfileReportsEveryError(t *testing.T) {
	name := filepath.Join("site", "county.profile.toml")
	src := "[profile]\nunits = \"yd\"\n\n[rule.SEAL-THICKNES]\nmin = 3\n\n[rule.ANNULAR-SPACE]\nmn = 2\n"
	_, err := ParseProfile(name, []byte(src))
	list := schema.Errors("", err)
	want := []string{
		name + `:2:9: units must be "ft" or "m" (got yd)`,
		name + `:4:1: unknown rule "SEAL-THICKNES" (tremie rules lists them) (did you mean "SEAL-THICKNESS"?)`,
		name + `:8:6: rule ANNULAR-SPACE has no parameter "mn" (it takes severity, min, min_pack) (did you mean "min"?)`,
	}
	if len(list) != len(want) {
		t.Fatalf("%d errors, want %d:\n%v", len(list), len(want), err)
	}
	for i, e := range list {
		if e.Error() != want[i] {
			t.Errorf("error %d:\n got %s\nwant %s", i, e, want[i])
		}
	}
}
