package pipeline

import (
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

func TestSafeName(t *testing.T) {
	cases := map[string]string{
		"MW-1":                   "MW-1",
		"../../x":                "x",
		"..":                     "well",
		"":                       "well",
		".hidden":                "hidden",
		"a/b\\c":                 "a-b-c",
		"MW 3 (deep)":            "MW-3-deep",
		"PZ-2.5":                 "PZ-2.5",
		"a..b":                   "a.b",
		"日本":                     "well",
		"/etc/passwd":            "etc-passwd",
		"C:\\x\\..\\y":           "C-x-y",
		"x\x00y":                 "x-y",
		strings.Repeat("a", 200): strings.Repeat("a", 80),
	}
	for in, want := range cases {
		got := SafeName(in)
		if got != want {
			t.Errorf("SafeName(%q) = %q, want %q", in, got, want)
		}
		if got != filepath.Base(got) || strings.HasPrefix(got, ".") || strings.Contains(got, "..") {
			t.Errorf("SafeName(%q) = %q is not a plain file name", in, got)
		}
	}
}

func TestAssignNamesDedupes(t *testing.T) {
	var wells []*Well
	for i, id := range []string{"MW 1", "MW/1", "mw-1", "PZ-1"} {
		wells = append(wells, &Well{Input: Input{Path: string(rune('a'+i)) + ".toml"}, Well: &schema.Well{ID: id}})
	}
	got := AssignNames(wells)
	want := []string{"MW-1", "MW-1-2", "mw-1-3", "PZ-1"}
	for i, w := range want {
		if got[wells[i]] != w {
			t.Errorf("%s: %q, want %q", wells[i].Path, got[wells[i]], w)
		}
	}
}

// TestAssignNamesReservesSheetNames: a well named like another well's
// second sheet or feature summary gets a name of its own, in whichever
// order the two come.
func TestAssignNamesReservesSheetNames(t *testing.T) {
	for _, ids := range [][]string{{"TWO", "TWO-sheet1"}, {"TWO-sheet1", "TWO"}, {"BR", "BR-features-page2"}} {
		var wells []*Well
		for i, id := range ids {
			wells = append(wells, &Well{Input: Input{Path: string(rune('a'+i)) + ".toml"}, Well: &schema.Well{ID: id}})
		}
		got := AssignNames(wells)
		short, long := wells[0], wells[1]
		if len(ids[0]) > len(ids[1]) {
			short, long = long, short
		}
		if got[short] != short.Well.ID {
			t.Errorf("%v: %s renamed to %q", ids, short.Well.ID, got[short])
		}
		if got[long] != long.Well.ID+"-2" {
			t.Errorf("%v: %s named %q, want %q", ids, long.Well.ID, got[long], long.Well.ID+"-2")
		}
	}
}
