package rules

import (
	"fmt"
	"path/filepath"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// A profile with three mistakes reports all three, sorted, each with
// file:line:col (an unknown name at its own column); a slip of the
// keyboard gets "did you mean", and an unknown key a hint of what its
// table takes, as in a well file.
func TestProfileReportsEveryError(t *testing.T) {
	name := filepath.Join("site", "county.profile.toml")
	src := "[profile]\nunits = \"yd\"\n\n[rule.SEAL-THICKNES]\nmin = 3\n\n[rule.ANNULAR-SPACE]\nmn = 2\n"
	_, err := ParseProfile(name, []byte(src))
	list := schema.Errors("", err)
	want := []string{
		name + `:2:9: units = "yd" is not one of: ft, m`,
		name + `:4:7: unknown rule "SEAL-THICKNES" in [rule] (did you mean "SEAL-THICKNESS"?)`,
		name + `:8:1: unknown key "mn" in [rule.ANNULAR-SPACE] (did you mean "min"?)`,
	}
	hints := []string{
		"",
		"[rule.RULE-ID] takes the ID of a rule: tremie rules lists them",
		"[rule.ANNULAR-SPACE] takes: severity, min, min_pack; and [rule.ANNULAR-SPACE.PURPOSE] or [rule.ANNULAR-SPACE.GROUP] for some wells only",
	}
	if len(list) != len(want) {
		t.Fatalf("%d errors, want %d:\n%v", len(list), len(want), err)
	}
	for i, e := range list {
		if e.Error() != want[i] || e.Hint != hints[i] {
			t.Errorf("error %d:\n got %s\n\t%s\nwant %s\n\t%s", i, e, e.Hint, want[i], hints[i])
		}
	}
}

// The rule, purpose, group and sanitary-seal tables are read by the shared
// reader too: every mistake of testdata/mistakes.profile.toml is named,
// sorted, at its line and column (a key at its name, a value at its
// value), an unknown name with the closest known one and a hint of what
// its table takes.
func TestProfileTablesOnTheSharedReader(t *testing.T) {
	name := filepath.Join("testdata", "mistakes.profile.toml")
	_, err := LoadProfile(name)
	type want struct{ pos, msg, hint string }
	wants := []want{
		{"5:1", `unknown key "nmae" in [profile] (did you mean "name"?)`, "[profile] takes: name, source, units"},
		{"8:8", `unknown purpose "irigation" in group farm (one of: monitoring, piezometer, recovery, domestic, public-supply, industrial, irrigation, injection) (did you mean "irrigation"?)`, ""},
		{"10:14", `group "monitoring" has the name of a purpose`, ""},
		{"13:12", `severity = "fatal" is not one of: error, warning, off`, ""},
		{"15:1", `unknown key "rnach" in [rule.SEAL-THICKNESS] (did you mean "ranch"?)`,
			"[rule.SEAL-THICKNESS] takes: severity, min; and [rule.SEAL-THICKNESS.PURPOSE] or [rule.SEAL-THICKNESS.GROUP] for some wells only"},
		{"18:1", `unknown key "mni" in [rule.SEAL-THICKNESS.supply] (did you mean "min"?)`, "[rule.SEAL-THICKNESS.supply] takes: min, severity"},
		{"21:1", `unknown key "public-suply" in [rule.SANITARY-SEAL-DEPTH] (did you mean "public-supply"?)`,
			"[rule.SANITARY-SEAL-DEPTH] takes: severity, depth; and [rule.SANITARY-SEAL-DEPTH.PURPOSE] or [rule.SANITARY-SEAL-DEPTH.GROUP] for some wells only"},
		{"24:14", `monitoring must be a table ([rule.ANNULAR-SPACE.monitoring]), not an integer`, ""},
		{"28:1", `unknown purpose "domestik" in [sanitary_seal] (did you mean "domestic"?)`,
			"[sanitary_seal] takes: domestic, industrial, injection, irrigation, monitoring, piezometer, public-supply, recovery"},
		{"31:16", `min_retained is a fraction from 0 to 1 (0.9 = 90 %), not 90`, ""},
	}
	list := schema.Errors("", err)
	if len(list) != len(wants) {
		t.Errorf("%d errors, want %d:\n%v", len(list), len(wants), err)
	}
	for i, e := range list[:min(len(list), len(wants))] {
		w := wants[i]
		if got := fmt.Sprintf("%d:%d", e.Line, e.Col); got != w.pos || e.Msg != w.msg || e.Hint != w.hint || e.File != name {
			t.Errorf("error %d:\n got %s %s\n\t%s\nwant %s %s\n\t%s", i, got, e.Msg, e.Hint, w.pos, w.msg, w.hint)
		}
	}
}
