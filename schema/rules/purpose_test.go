package rules

import (
	"os"
	"strings"
	"testing"
)

// withPurpose rewrites the purpose of a well made by monitoringWell.
func withPurpose(src, purpose string) string {
	return strings.Replace(src, `purpose = "monitoring"`, `purpose = "`+purpose+`"`, 1)
}

// A public-supply well is not judged by monitoring-well thresholds. Same
// well, two purposes:
//   - pack 8 ft above the screen: more than the 5 ft (common practice) a
//     monitoring well allows, since its packed length is the monitored zone
//     (US EPA 1992); a supply well's pack is meant to rise at least 10 ft
//     above the screen (TM 5-813-1), so PACK-ABOVE-MAX does not run on it
//     and PACK-ABOVE-SCREEN asks 10 ft of it;
//   - a 20-slot screen in 20/40 sand retains about 74 % (worked in
//     TestSlotAgainstPack): under the 90 % of US EPA 1992 and under the
//     85 % of TI 814-01 alike; a 0.019-in slot (0.4826 mm) retains
//     1 - ln(0.4826/0.425)/ln 2 = 0.8167: still short of 85 %.
func TestSupplyWellNotJudgedAsMonitoringWell(t *testing.T) {
	fills := fill("17.0", "36.0", "filter-pack") + fill("15.0", "17.0", "bentonite-chips") + fill("0.0", "15.0", "neat-cement")
	mw := monitoringWell("ft", "8.25", "36.0", fills)
	mw = strings.Replace(mw, "material = \"filter-pack\"", "material = \"filter-pack\"\ngradation = \"20/40\"", 1)
	if n := len(findings(load(t, mw), nil, "PACK-ABOVE-MAX")); n != 1 {
		t.Errorf("monitoring well, pack 8 ft above the screen: %d PACK-ABOVE-MAX findings, want 1", n)
	}
	pw := withPurpose(mw, "public-supply")
	if fs := findings(load(t, pw), nil, "PACK-ABOVE-MAX"); len(fs) != 0 {
		t.Errorf("public-supply well judged by the monitoring-well pack maximum: %v", fs[0].Message)
	}
	fs := findings(load(t, pw), nil, "PACK-ABOVE-SCREEN")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "at least 10 ft") {
		t.Errorf("public-supply well, pack 8 ft above the screen: %+v, want one finding asking 10 ft (TM 5-813-1)", fs)
	}
	if n := len(findings(load(t, mw), nil, "PACK-ABOVE-SCREEN")); n != 0 {
		t.Errorf("monitoring well, pack 8 ft above the screen: %d PACK-ABOVE-SCREEN findings, want 0 (2 ft, US EPA 1992)", n)
	}
	// SLOT-RETAINS-PACK: 85 % for supply wells, 90 % for monitoring wells.
	slot19 := strings.Replace(mw, "slot_number = 10", "slot = 0.019", 1)
	fs = findings(load(t, withPurpose(slot19, "public-supply")), nil, "SLOT-RETAINS-PACK")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "82 %") || !strings.Contains(fs[0].Message, "at least 85 %") {
		t.Errorf("public-supply, 0.019-in slot in 20/40: %+v, want one finding 82 %% against 85 %%", fs)
	}
	fs = findings(load(t, slot19), nil, "SLOT-RETAINS-PACK")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "at least 90 %") {
		t.Errorf("monitoring, 0.019-in slot in 20/40: %+v, want one finding against 90 %%", fs)
	}
	// ANNULAR-SPACE around the pack: a 7.5-in hole leaves (7.5 - 2.375)/2
	// = 2.5625 in: enough for a monitoring well (2 in, DWR 74-90), short of
	// the 3 in of pack of TI 814-01 for a supply well; the seal above
	// needs only 2 in in both.
	narrow := strings.Replace(mw, "diameter = 8.25", "diameter = 7.5", 1)
	if n := len(findings(load(t, narrow), nil, "ANNULAR-SPACE")); n != 0 {
		t.Errorf("monitoring well, 2.56 in of space: %d findings, want 0", n)
	}
	fs = findings(load(t, withPurpose(narrow, "public-supply")), nil, "ANNULAR-SPACE")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "2.563 in") || !strings.Contains(fs[0].Message, "at least 3 in") || !strings.Contains(fs[0].Message, "filter pack") {
		t.Errorf("public-supply well, 2.56 in of pack space: %+v, want one finding on the pack only", fs)
	}
}

// A profile that sets a threshold for one purpose changes only wells of
// that purpose; a group sets several; a purpose's own value beats its
// group's; a rule off by default for a purpose can be switched on.
func TestProfileByPurpose(t *testing.T) {
	src := `[profile]
name = "two-purpose code"
units = "ft"

[groups]
farm = ["domestic", "irrigation"]

[rule.SEAL-THICKNESS.domestic]
min = 1

[rule.SEAL-THICKNESS.farm]
min = 4

[rule.ANNULAR-SPACE.monitoring]
min = 1.8

[rule.PACK-ABOVE-MAX.public-supply]
severity = "warning"
max = 20

[rule.FINE-SAND-THICKNESS.observation]
severity = "off"
`
	prof, err := ParseProfile("two.profile.toml", []byte(src))
	if err != nil {
		t.Fatal(err)
	}
	// 1.5 ft of chips: under the 2 ft default (TI 814-01).
	w := monitoringWell("ft", "6.0", "36.0", fill("23.0", "36.0", "filter-pack")+fill("21.5", "23.0", "bentonite-chips")+fill("0.0", "21.5", "neat-cement"))
	for _, c := range []struct {
		purpose string
		want    int
	}{
		{"monitoring", 1},    // not set for monitoring: 2 ft default
		{"domestic", 0},      // its own table: 1 ft, beats the group's 4 ft
		{"irrigation", 1},    // the group: 4 ft
		{"public-supply", 1}, // untouched
	} {
		if n := len(findings(load(t, withPurpose(w, c.purpose)), prof, "SEAL-THICKNESS")); n != c.want {
			t.Errorf("%s well, 1.5 ft seal under the profile: %d findings, want %d", c.purpose, n, c.want)
		}
	}
	// A 6-in hole leaves (6 - 2.375)/2 = 1.8125 in: accepted at 1.8 in for
	// monitoring wells only.
	if n := len(findings(load(t, w), prof, "ANNULAR-SPACE")); n != 0 {
		t.Errorf("monitoring well, 1.81 in under a 1.8 in profile: %d findings", n)
	}
	if n := len(findings(load(t, withPurpose(w, "domestic")), prof, "ANNULAR-SPACE")); n == 0 {
		t.Error("domestic well, 1.81 in: the monitoring-well value leaked to another purpose")
	}
	// PACK-ABOVE-MAX switched on for public supply with its own maximum:
	// a pack 8 ft above the screen passes 20 ft, one 23 ft above fails.
	high := monitoringWell("ft", "8.25", "60.0", fill("2.0", "60.0", "filter-pack")+fill("0.0", "2.0", "bentonite-chips"))
	fs := findings(load(t, withPurpose(high, "public-supply")), prof, "PACK-ABOVE-MAX")
	if len(fs) != 1 || fs[0].Severity != Warning || !strings.Contains(fs[0].Message, "20 ft") {
		t.Errorf("public-supply well, pack 23 ft above the screen, rule switched on: %+v", fs)
	}
	if n := len(findings(load(t, withPurpose(high, "industrial")), prof, "PACK-ABOVE-MAX")); n != 0 {
		t.Errorf("industrial well: PACK-ABOVE-MAX ran %d times, off by default for supply wells", n)
	}
	fine := monitoringWell("ft", "8.25", "36.0", fill("23.0", "36.0", "filter-pack")+fill("17.0", "23.0", "fine-sand")+fill("15.0", "17.0", "bentonite-chips")+fill("0.0", "15.0", "neat-cement"))
	if n := len(findings(load(t, fine), nil, "FINE-SAND-THICKNESS")); n != 1 {
		t.Errorf("6 ft of fine sand by default: %d findings, want 1 (US EPA 1992: 1 to 2 ft)", n)
	}
	if n := len(findings(load(t, fine), prof, "FINE-SAND-THICKNESS")); n != 0 {
		t.Errorf("FINE-SAND-THICKNESS off for observation wells still reported %d", n)
	}
	if n := len(findings(load(t, withPurpose(fine, "recovery")), prof, "FINE-SAND-THICKNESS")); n != 1 {
		t.Errorf("recovery well is not in the observation group: %d findings, want 1", n)
	}
}

func TestProfileByPurposeErrors(t *testing.T) {
	cases := []struct{ src, want string }{
		{"[profile]\nunits = \"ft\"\n[rule.SEAL-THICKNESS.supply]\nmin = 2\n[rule.SEAL-THICKNESS.production]\nmin = 3\n", "set twice"},
		{"[profile]\nunits = \"ft\"\n[rule.SEAL-THICKNESS.domestik]\nmin = 2\n", `unknown key "domestik" in [rule.SEAL-THICKNESS] (did you mean "domestic"?)`},
		{"[profile]\nunits = \"ft\"\n[groups]\nfarm = [\"domestic\", \"orchard\"]\n", `unknown purpose "orchard" in group farm`},
		{"[profile]\nunits = \"ft\"\n[groups]\ndomestic = [\"irrigation\"]\n", `name of a purpose`},
		{"[rule.SEAL-THICKNESS.domestic]\nmin = 2\n", "give units"},
		{"[profile]\nunits = \"ft\"\n[rule.SLOT-RETAINS-PACK.supply]\nmin_retained = 85\n", "fraction"},
	}
	for _, c := range cases {
		_, err := ParseProfile("bad.profile.toml", []byte(c.src))
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%q: got %v, want %q", c.src, err, c.want)
		}
	}
}

// DWR Bulletin 74-90 §9.E: 2 in between every casing and the wall and
// between casings in one hole. Two 2-in strings (OD 2.375 in, ASTM D1785)
// side by side need 2 x 2.375 + 3 x 2 = 10.75 in of hole; a 10-in hole
// leaves (10 - 4.75) / 3 = 1.75 in per gap.
func TestAnnularSpaceBetweenStrings(t *testing.T) {
	nested := func(hole string) string {
		return `[units]
depth = "ft"
[well]
id = "NX"
purpose = "monitoring"
total_depth = 50.0
[[borehole]]
top = 0.0
bottom = 50.0
diameter = ` + hole + `
[[string]]
name = "S"
[[string.section]]
kind = "riser"
top = 0.0
bottom = 20.0
size = "2"
schedule = "40"
[[string.section]]
kind = "screen"
top = 20.0
bottom = 25.0
slot_number = 10
[[string]]
name = "D"
[[string.section]]
kind = "riser"
top = 0.0
bottom = 40.0
size = "2"
schedule = "80"
[[string.section]]
kind = "screen"
top = 40.0
bottom = 45.0
slot_number = 10
` + fill("38.0", "50.0", "filter-pack") + fill("28.0", "38.0", "bentonite-chips") + fill("18.0", "28.0", "filter-pack") +
			fill("0.0", "18.0", "bentonite-chips")
	}
	fs := findings(load(t, nested("10.0")), nil, "ANNULAR-SPACE")
	if len(fs) == 0 {
		t.Fatal("two 2-in strings in a 10-in hole: no finding")
	}
	for _, f := range fs {
		for _, want := range []string{`string "S"`, `string "D"`, "1.75 in", "10.75 in"} {
			if !strings.Contains(f.Message, want) {
				t.Errorf("finding %q lacks %q", f.Message, want)
			}
		}
		if _, _, ok := f.Span(); !ok {
			t.Errorf("finding %q names no depth", f.Message)
		}
	}
	// Both strings stand from 0 to 25 ft: the chips at 0-18 ft and the pack
	// at 18-25 ft are flagged there; below 25 ft only string D stands, in
	// (10 - 2.375)/2 = 3.8 in.
	top, bottom := 1e9, -1e9
	for _, f := range fs {
		a, b, _ := f.Span()
		top, bottom = min(top, a), max(bottom, b)
	}
	if top != 0 || bottom != 25 {
		t.Errorf("flagged %v–%v ft, want 0–25 ft", top, bottom)
	}
	if n := len(findings(load(t, nested("10.75")), nil, "ANNULAR-SPACE")); n != 0 {
		t.Errorf("10.75-in hole: %d findings, want 0", n)
	}
}

// The profile in force, named for the reports.
func TestProfileName(t *testing.T) {
	if DefaultProfile().Name != "defaults" {
		t.Error("default profile name")
	}
	p, err := ParseProfile("dir/county.profile.toml", []byte("[rule.PACK-ABOVE-MAX]\nseverity = \"off\"\n"))
	if err != nil || p.Name != "county" {
		t.Errorf("unnamed profile from county.profile.toml: %v %v", p, err)
	}
}

// A bentonite seal whose interval overlaps the top of the pack is still a
// seal on the pack: SEAL-ABOVE-PACK must not say none is recorded (the
// overlap itself is FILL-OVERLAP's finding).
func TestSealOverlappingPackIsASeal(t *testing.T) {
	w := load(t, monitoringWell("ft", "8.25", "36.0", fill("23.0", "36.0", "filter-pack")+fill("20.0", "24.0", "bentonite-chips")+fill("0.0", "20.0", "neat-cement")))
	if fs := findings(w, nil, "SEAL-ABOVE-PACK"); len(fs) != 0 {
		t.Errorf("seal 20–24 ft over a pack from 23 ft: %q", fs[0].Message)
	}
	if n := len(findings(w, nil, "FILL-OVERLAP")); n != 1 {
		t.Errorf("FILL-OVERLAP: %d findings, want 1", n)
	}
}

// The footer says which thresholds were in force: the defaults, or the
// profile by name, file (base name only) and the code it follows.
func TestCautionNamesProfile(t *testing.T) {
	if c := Caution(nil); !strings.Contains(c, "thresholds are defaults") || !strings.Contains(c, "licensed professional") {
		t.Errorf("defaults caution: %q", c)
	}
	if c := Caution(DefaultProfile()); strings.Contains(c, "profile") {
		t.Errorf("the defaults named as a profile: %q", c)
	}
	prof, err := ParseProfile("/somewhere/county.profile.toml", []byte("[profile]\nname = \"County code\"\nsource = \"Code ch. 9\"\n[rule.PACK-ABOVE-MAX]\nseverity = \"off\"\n"))
	if err != nil {
		t.Fatal(err)
	}
	c := Caution(prof)
	for _, want := range []string{`profile "County code" (county.profile.toml)`, "following Code ch. 9", "licensed professional"} {
		if !strings.Contains(c, want) {
			t.Errorf("caution %q lacks %q", c, want)
		}
	}
	if strings.Contains(c, "defaults") || strings.Contains(c, "/somewhere") {
		t.Errorf("caution under a profile: %q", c)
	}
}

// PROFILE.md lists the built-in groups as the code defines them.
func TestPurposeGroupsDocumented(t *testing.T) {
	doc, err := os.ReadFile("PROFILE.md")
	if err != nil {
		t.Fatal(err)
	}
	for _, g := range PurposeGroups {
		row := "| `" + g.Name + "` | " + PurposeList(g.Purposes) + " |"
		if !strings.Contains(string(doc), row) {
			t.Errorf("PROFILE.md lacks the row %q", row)
		}
	}
}
