package rules

import (
	"strings"
	"testing"
)

// supplyWellTagged: an 8-in Sch 40 steel string (OD 8.625 in, ASME
// B36.10M) in a 14-in hole, pack from 175 to 800 ft (625 ft), 2 ft of
// chips on it, each with a final tag at the given depth.
func supplyWellTagged(packTag, sealTag string) string {
	return `[units]
depth = "ft"
[well]
id = "PW-T"
purpose = "public-supply"
total_depth = 800.0
[[borehole]]
top = 0.0
bottom = 800.0
diameter = 14.0
[[string]]
name = "PW-T"
bottom_cap = "plate"
[[string.section]]
kind = "riser"
top = -1.5
bottom = 190.0
material = "carbon steel"
size = "8"
schedule = "40"
[[string.section]]
kind = "screen"
top = 190.0
bottom = 790.0
slot_number = 40
[[fill]]
top = 175.0
bottom = 800.0
material = "filter-pack"
bags = 830
bag_mass = 50
[[fill.tag]]
after_bags = 830
depth = ` + packTag + `
[[fill]]
top = 173.0
bottom = 175.0
material = "bentonite-chips"
bags = 2
bag_mass = 50
[[fill.tag]]
after_bags = 2
depth = ` + sealTag + `
` + fill("0.0", "173.0", "neat-cement")
}

// The annulus is pi/4 (14^2 - 8.625^2) in^2 = 95.51 in^2 = 0.66327 ft^2
// and the open hole below the string pi/4 14^2 in^2 = 1.06901 ft^2, so the
// 625-ft pack holds 615 x 0.66327 + 10 x 1.06901 = 418.60 ft^3
// (arithmetic). A final tag 1.24 ft deep on it is 0.82 ft^3, 0.2 % of the
// volume: within 2 % (8.372 ft^3 = 12.62 ft of annulus at its top, common
// practice) and not flagged. On the 2-ft seal the same 1.24 ft is 62 % of
// the interval: past the 0.5 ft tape floor, flagged.
func TestTagToleranceRelativeToInterval(t *testing.T) {
	w := load(t, supplyWellTagged("176.24", "173.0"))
	if fs := findings(w, nil, "TAG-FINAL-TOP"); len(fs) != 0 {
		t.Errorf("1.24 ft miss on a 625-ft pack flagged: %s", fs[0].Message)
	}
	fs := findings(load(t, supplyWellTagged("175.0", "174.24")), nil, "TAG-FINAL-TOP")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "1.24 ft deeper") || !strings.Contains(fs[0].Message, "accepted: 0.5 ft") {
		t.Errorf("1.24 ft miss on a 2-ft seal: %+v, want one finding, accepted 0.5 ft", fs)
	}
	// A 13-ft miss on the pack is past 12.62 ft: flagged, and says so.
	fs = findings(load(t, supplyWellTagged("188.0", "173.0")), nil, "TAG-FINAL-TOP")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "accepted: 12.62 ft") {
		t.Errorf("13 ft miss on the pack: %+v, want one finding, accepted 12.62 ft", fs)
	}
	// A profile may tighten the share.
	prof, err := ParseProfile("p.profile.toml", []byte("[profile]\nunits = \"ft\"\n[rule.TAG-FINAL-TOP]\nfraction = 0.001\n"))
	if err != nil {
		t.Fatal(err)
	}
	if n := len(findings(w, prof, "TAG-FINAL-TOP")); n != 1 {
		t.Errorf("0.1 %% profile, 1.24 ft on the pack (0.2 %%): %d findings, want 1", n)
	}
}
