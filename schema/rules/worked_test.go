package rules

import (
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/schematest"
)

// Worked numbers against the sources the rules name.

func load(t *testing.T, src string) *schema.Well {
	t.Helper()
	w, err := schema.Load("worked.toml", []byte(src))
	if err != nil {
		t.Fatalf("fixture does not load: %v\n%s", err, src)
	}
	return w
}

// findings returns the findings of one rule.
func findings(w *schema.Well, prof *Profile, id string) []Finding {
	var out []Finding
	for _, f := range Check(w, prof) {
		if f.Rule == id {
			out = append(out, f)
		}
	}
	return out
}

// monitoringWell is schematest's standard 2-in PVC monitoring well (OD
// 2.375 in, ASTM D1785), well "W", whose fills are given; depths in the
// unit named.
func monitoringWell(unit, hole, td, fills string) string {
	return schematest.MonitoringWell("W", unit, hole, td, fills)
}

var fill = schematest.Fill

// Defaults that read "2 ft / 0.6 m" stay round in each unit: a well in
// feet gets 2 ft = 0.6096 m exactly (NIST SP 811: 1 ft = 0.3048 m), a
// well in metres 0.6 m.
func TestDefaultsPerUnit(t *testing.T) {
	r, _ := Lookup("SEAL-THICKNESS")
	prof := DefaultProfile()
	ft := prof.value(r, "min", schema.DefaultUnits(schema.Feet))
	if math.Abs(ft-0.6096) > 1e-12 {
		t.Errorf("2 ft default = %v m, want 0.6096", ft)
	}
	if m := prof.value(r, "min", schema.DefaultUnits(schema.Metres)); m != 0.6 {
		t.Errorf("metric default = %v m, want 0.6", m)
	}
	a, _ := Lookup("ANNULAR-SPACE")
	if in := prof.value(a, "min", schema.DefaultUnits(schema.Feet)); math.Abs(in-50.8) > 1e-9 {
		t.Errorf("2 in default = %v mm, want 50.8 (1 in = 25.4 mm)", in)
	}
}

// TI 814-01: at least 2 ft of bentonite above the pack. 2.0 ft passes,
// 1.9 ft fails; in metres 0.6 m passes and 0.55 m fails.
func TestSealThicknessTI81401(t *testing.T) {
	cases := []struct {
		unit, hole, td, chipsTop string
		want                     int
	}{
		{"ft", "8.25", "36.0", "21.0", 0},
		{"ft", "8.25", "36.0", "21.1", 1},
		{"m", "210", "11.0", "6.3", 0},  // pack top 6.9 m: 0.6 m of chips
		{"m", "210", "11.0", "6.35", 1}, // 0.55 m
	}
	for _, c := range cases {
		packTop, grout := "23.0", ""
		if c.unit == "m" {
			packTop = "6.9"
		}
		grout = fill("0.0", c.chipsTop, "neat-cement")
		src := monitoringWell(c.unit, c.hole, c.td, fill(packTop, c.td, "filter-pack")+fill(c.chipsTop, packTop, "bentonite-chips")+grout)
		if got := len(findings(load(t, src), nil, "SEAL-THICKNESS")); got != c.want {
			t.Errorf("%s chips from %s to %s: %d findings, want %d", c.unit, c.chipsTop, packTop, got, c.want)
		}
	}
}

// DWR Bulletin 74-81 §9.A: 50 ft (15 m) for community supply, 20 ft
// (6.1 m) for monitoring; a well in metres takes the bulletin's metres.
func TestSanitarySealDWR7481(t *testing.T) {
	supply := func(sealFt string) string {
		return `[units]
depth = "ft"
[well]
id = "PW"
purpose = "public-supply"
total_depth = 120.0
[[borehole]]
top = 0.0
bottom = 120.0
diameter = 14.0
[[string]]
bottom_cap = "plate"
[[string.section]]
kind = "riser"
top = -1.5
bottom = 80.0
size = "8"
schedule = "40"
[[string.section]]
kind = "screen"
top = 80.0
bottom = 110.0
slot_number = 40
` + fill("75.0", "120.0", "filter-pack") + fill("72.0", "75.0", "bentonite-pellets") +
			fill(sealFt, "72.0", "native-backfill") + fill("0.0", sealFt, "cement-bentonite")
	}
	if n := len(findings(load(t, supply("50.0")), nil, "SANITARY-SEAL-DEPTH")); n != 0 {
		t.Errorf("public-supply well sealed to 50 ft: %d findings, want 0", n)
	}
	fs := findings(load(t, supply("49.0")), nil, "SANITARY-SEAL-DEPTH")
	if len(fs) != 1 || fs[0].Severity != Error || !strings.Contains(fs[0].Message, "49 ft") || !strings.Contains(fs[0].Message, "50 ft") {
		t.Errorf("public-supply well sealed to 49 ft: %+v, want one error naming 49 and 50 ft", fs)
	}
	if top, bottom, ok := fs[0].Span(); !ok || top != 49 || bottom != 50 || fs[0].Units != schema.Feet {
		t.Errorf("finding depths %v–%v %s, want 49–50 ft", top, bottom, fs[0].Units)
	}

	// A metric monitoring well: 6.1 m needed. Grout to 6.1 m, then
	// backfill, passes; grout to 6.0 m falls short.
	metric := func(groutBottom string) string {
		return monitoringWell("m", "210", "11.0", fill("6.9", "11.0", "filter-pack")+fill("6.3", "6.9", "bentonite-chips")+
			fill(groutBottom, "6.3", "native-backfill")+fill("0.0", groutBottom, "neat-cement"))
	}
	if n := len(findings(load(t, metric("6.1")), nil, "SANITARY-SEAL-DEPTH")); n != 0 {
		t.Errorf("metric seal to 6.1 m: %d findings, want 0 (6.1 m needed)", n)
	}
	fs = findings(load(t, metric("6.0")), nil, "SANITARY-SEAL-DEPTH")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "6.1 m") {
		t.Errorf("metric seal to 6.0 m: %+v, want one finding naming 6.1 m (20 ft = 6.096 m)", fs)
	}

	// A shallow well whose pack starts at 12 ft cannot be sealed to 20 ft:
	// the seal reaches the pack, so it is a warning that a variance is due.
	shallow := monitoringWell("ft", "8.25", "36.0", fill("12.0", "36.0", "filter-pack")+fill("10.0", "12.0", "bentonite-chips")+fill("0.0", "10.0", "neat-cement"))
	fs = findings(load(t, shallow), nil, "SANITARY-SEAL-DEPTH")
	if len(fs) != 1 || fs[0].Severity != Warning || !strings.Contains(fs[0].Message, "variance") {
		t.Errorf("shallow well: %+v, want one variance warning", fs)
	}
}

// The profile's [sanitary_seal] table replaces the DWR defaults.
func TestSanitarySealFromProfile(t *testing.T) {
	prof, err := ParseProfile("p.profile.toml", []byte("[profile]\nname = \"county\"\nunits = \"ft\"\n[sanitary_seal]\nmonitoring = 10\n"))
	if err != nil {
		t.Fatal(err)
	}
	w := load(t, monitoringWell("ft", "8.25", "36.0", fill("23.0", "36.0", "filter-pack")+fill("20.0", "23.0", "bentonite-chips")+
		fill("12.0", "20.0", "native-backfill")+fill("0.0", "12.0", "neat-cement")))
	if n := len(findings(w, nil, "SANITARY-SEAL-DEPTH")); n != 1 {
		t.Errorf("seal to 12 ft under DWR's 20 ft: %d findings, want 1", n)
	}
	if n := len(findings(w, prof, "SANITARY-SEAL-DEPTH")); n != 0 {
		t.Errorf("seal to 12 ft under a 10 ft profile: %d findings, want 0", n)
	}
}

// A pack given by its grading curve. By the definition of d10 (ASTM
// D2487 §3, ASTM D6913: the size 10 % of the mass is finer than), a slot no
// wider than d10 holds back 90 % of the pack, the minimum of US EPA 1992,
// and a slot wider than d10 less than that. Slot numbers are thousandths
// of an inch (common practice): 10-slot = 0.254 mm, 20-slot = 0.508 mm
// (NIST SP 811: 1 in = 25.4 mm).
func TestSlotAgainstPack(t *testing.T) {
	packD := func(slot string, d10, d60 string) string {
		pack := "[[fill]]\ntop = 23.0\nbottom = 36.0\nmaterial = \"filter-pack\"\nd10 = " + d10 + "\n"
		if d60 != "" {
			pack += "d60 = " + d60 + "\n"
		}
		w := monitoringWell("ft", "8.25", "36.0", pack+fill("20.0", "23.0", "bentonite-chips")+fill("0.0", "20.0", "neat-cement"))
		return strings.Replace(w, "slot_number = 10", "slot_number = "+slot, 1)
	}
	// d10 = 0.45 mm: a 10-slot (0.254 mm) retains at least 90 %.
	if fs := findings(load(t, packD("10", "0.45", "")), nil, "SLOT-RETAINS-PACK"); len(fs) != 0 {
		t.Errorf("10-slot, d10 0.45 mm: %s", fs[0].Message)
	}
	// A 20-slot (0.508 mm) is wider than d10 = 0.45 mm: less than 90 %.
	fs := findings(load(t, packD("20", "0.45", "")), nil, "SLOT-RETAINS-PACK")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "wider than the d10 (0.45 mm)") || !strings.Contains(fs[0].Message, "less than 90 %") {
		t.Errorf("20-slot, d10 0.45 mm: %+v", fs)
	}
	// The same slot on a pack with d10 = 0.52 mm (coarser than the slot)
	// passes, whatever the sieve range would have said.
	if fs := findings(load(t, packD("20", "0.52", "")), nil, "SLOT-RETAINS-PACK"); len(fs) != 0 {
		t.Errorf("20-slot, d10 0.52 mm: %s", fs[0].Message)
	}
	// With d60 = 0.70 mm the share finer than 0.508 mm is read on the
	// straight line in log size between (0.45, 10 %) and (0.70, 60 %):
	// 10 + 50 x ln(0.508/0.45)/ln(0.70/0.45) = 10 + 50 x 0.12124/0.44183 =
	// 23.7 %, so 76 % is retained (arithmetic on the grading plot).
	fs = findings(load(t, packD("20", "0.45", "0.70")), nil, "SLOT-RETAINS-PACK")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "about 76 %") {
		t.Errorf("20-slot, d10 0.45, d60 0.70 mm: %+v, want about 76 %%", fs)
	}
}

// The sieve-range model (ours, documented in the rule): grains spread
// evenly on a log scale between the two ASTM E11 openings of the range
// (20/40: No. 40 = 0.425 mm to No. 20 = 0.850 mm). The bounds are the
// model's definition: a slot at or below the fine sieve retains all, one
// at the coarse sieve none, and a slot half-way in log size (the
// geometric mean, 0.601 mm) half.
func TestSlotAgainstSieveRange(t *testing.T) {
	lo, hi, err := schema.ParseGradation("20/40")
	if err != nil {
		t.Fatal(err)
	}
	if got := retainedFraction(lo, lo, hi); got != 1 {
		t.Errorf("slot at the fine sieve retains %v, want 1", got)
	}
	if got := retainedFraction(hi, lo, hi); got != 0 {
		t.Errorf("slot at the coarse sieve retains %v, want 0", got)
	}
	if got := retainedFraction(schema.Diameter(math.Sqrt(0.425*0.850)), lo, hi); math.Abs(got-0.5) > 1e-12 {
		t.Errorf("slot at the geometric mean retains %v, want 0.5", got)
	}
	// 10/20 sand (0.850-2.00 mm) with a 20-slot (0.508 mm) screen, the
	// usual pairing (common practice): all retained.
	lo, hi, _ = schema.ParseGradation("10/20")
	if got := retainedFraction(schema.DiameterFrom(0.020, schema.Inches), lo, hi); got != 1 {
		t.Errorf("20-slot in 10/20 retains %v, want 1", got)
	}
}

// Annular space: 2-in Sch 40 PVC is 2.375 in OD (ASTM D1785). In a
// 6.375-in hole the space is (6.375 - 2.375)/2 = 2.000 in: passes; in a
// 6.25-in hole 1.9375 in: fails. In metres, 60.3 mm OD (2.375 in = 60.325
// mm) in a 160 mm hole leaves 49.84 mm, under 50 mm.
func TestAnnularSpaceWorked(t *testing.T) {
	fills := fill("23.0", "36.0", "filter-pack") + fill("20.0", "23.0", "bentonite-chips") + fill("0.0", "20.0", "neat-cement")
	if n := len(findings(load(t, monitoringWell("ft", "6.375", "36.0", fills)), nil, "ANNULAR-SPACE")); n != 0 {
		t.Errorf("6.375-in hole: %d findings, want 0", n)
	}
	fs := findings(load(t, monitoringWell("ft", "6.25", "36.0", fills)), nil, "ANNULAR-SPACE")
	if len(fs) != 3 || !strings.Contains(fs[0].Message, "1.938 in") {
		t.Errorf("6.25-in hole: %+v, want 3 findings naming 1.938 in", fs)
	}
	mfills := fill("6.9", "11.0", "filter-pack") + fill("6.3", "6.9", "bentonite-chips") + fill("0.0", "6.3", "neat-cement")
	fs = findings(load(t, monitoringWell("m", "160", "11.0", mfills)), nil, "ANNULAR-SPACE")
	if len(fs) != 3 || !strings.Contains(fs[0].Message, "49.8 mm") {
		t.Errorf("160-mm hole: %+v, want 3 findings naming 49.8 mm", fs)
	}
}

// A rule profile in feet sets thresholds in feet and inches, severities
// and rules off; values are held in model units.
func TestProfileOverrides(t *testing.T) {
	src := `[profile]
name = "county code"
units = "ft"
source = "invented county well ordinance"

[rule.SEAL-THICKNESS]
min = 3

[rule.ANNULAR-SPACE]
min = 1.5
severity = "warning"

[rule.LITHOLOGY-CONTINUOUS]
severity = "off"
`
	prof, err := ParseProfile("county.profile.toml", []byte(src))
	if err != nil {
		t.Fatal(err)
	}
	if got := prof.Values["SEAL-THICKNESS"]["min"]; math.Abs(got-0.9144) > 1e-12 {
		t.Errorf("3 ft = %v m, want 0.9144", got)
	}
	if got := prof.Values["ANNULAR-SPACE"]["min"]; math.Abs(got-38.1) > 1e-12 {
		t.Errorf("1.5 in = %v mm, want 38.1", got)
	}
	// 2.5 ft of chips: enough by default, too thin for this profile.
	w := load(t, monitoringWell("ft", "6.0", "36.0", fill("23.0", "36.0", "filter-pack")+fill("20.5", "23.0", "bentonite-chips")+fill("0.0", "20.5", "neat-cement")))
	if n := len(findings(w, nil, "SEAL-THICKNESS")); n != 0 {
		t.Errorf("2.5 ft seal by default: %d findings, want 0", n)
	}
	if n := len(findings(w, prof, "SEAL-THICKNESS")); n != 1 {
		t.Errorf("2.5 ft seal under a 3 ft profile: %d findings, want 1", n)
	}
	// A 6-in hole leaves 1.81 in: an error by default, a warning here.
	for _, f := range findings(w, prof, "ANNULAR-SPACE") {
		t.Errorf("1.81 in of space under a 1.5 in profile: %s", f.Message)
	}
	if fs := findings(w, nil, "ANNULAR-SPACE"); len(fs) == 0 || fs[0].Severity != Error {
		t.Errorf("1.81 in of space by default: %+v, want errors", fs)
	}
	noLith := load(t, monitoringWell("ft", "8.25", "36.0", ""))
	if n := len(findings(noLith, prof, "LITHOLOGY-CONTINUOUS")); n != 0 {
		t.Errorf("a rule turned off still reported %d findings", n)
	}
}

// A metric profile writes diameters in millimetres.
func TestProfileMetric(t *testing.T) {
	prof, err := ParseProfile("m.profile.toml", []byte("[profile]\nunits = \"m\"\n[rule.ANNULAR-SPACE]\nmin = 40\n[rule.PACK-ABOVE-SCREEN]\nmin = 0.5\n"))
	if err != nil {
		t.Fatal(err)
	}
	if prof.Values["ANNULAR-SPACE"]["min"] != 40 || prof.Values["PACK-ABOVE-SCREEN"]["min"] != 0.5 {
		t.Errorf("metric values changed on loading: %v", prof.Values)
	}
}

// The profile loader is strict: each mistake is named with its line.
func TestProfileErrors(t *testing.T) {
	cases := []struct {
		src, want string
		line      int
	}{
		{"[profile]\nunits = \"ft\"\n[rule.SEAL-THICKNES]\nmin = 2\n", `unknown rule "SEAL-THICKNES"`, 3},
		{"[profile]\nunits = \"ft\"\n[rule.SEAL-THICKNESS]\nminimum = 2\n", `unknown key "minimum" in [rule.SEAL-THICKNESS]`, 4},
		{"[profile]\nunits = \"ft\"\n[rule.SEAL-THICKNESS]\nseverity = \"fatal\"\n", `severity = "fatal" is not one of: error, warning, off`, 4},
		{"[profile]\nunits = \"ft\"\n[rule.SEAL-THICKNESS]\nmin = \"2\"\n", `must be a number`, 4},
		{"[profile]\nunits = \"ft\"\n[rule.SEAL-THICKNESS]\nmin = -1\n", `must not be negative`, 4},
		{"[profile]\nunits = \"ft\"\n[rule.SEAL-THICKNESS]\nmin = nan\n", `finite`, 4},
		{"[profile]\nunits = \"yd\"\n", `units = "yd" is not one of: ft, m`, 2},
		{"[rule.SEAL-THICKNESS]\nmin = 2\n", `give units`, 2},
		{"[profile]\nunits = \"ft\"\n[sanitary_seal]\nmonitoring = 20\nsupply = 50\n", `unknown purpose "supply"`, 5},
		{"[profile]\nunits = \"ft\"\nnmae = \"x\"\n", `unknown key "nmae"`, 3},
		{"[profile]\nunits = \"ft\"\n[rules]\n", `unknown key "rules"`, 3},
		{"[profile]\nunits = \"ft\"\n[rule.SLOT-RETAINS-PACK]\nmin_retained = 90\n", `fraction`, 4},
		{"[profile]\nunits = \"ft\"\n[rule.SANITARY-SEAL-DEPTH]\nmonitoring = 20\n[sanitary_seal]\nmonitoring = 25\n", `set twice`, 6},
		{"[profile]\nunits = \"ft\"\nname = \n", `TOML syntax`, 3},
	}
	for _, c := range cases {
		_, err := ParseProfile("bad.profile.toml", []byte(c.src))
		if err == nil {
			t.Errorf("profile accepted:\n%s", c.src)
			continue
		}
		list, ok := err.(schema.ErrorList)
		if !ok || len(list) == 0 {
			t.Errorf("error is %T, want a schema.ErrorList", err)
			continue
		}
		e := list[0]
		if !strings.Contains(e.Msg, c.want) || (c.line > 0 && e.Line != c.line) {
			t.Errorf("got %q at line %d, want %q at line %d", e.Error(), e.Line, c.want, c.line)
		}
		if !strings.HasPrefix(e.Error(), "bad.profile.toml") {
			t.Errorf("error %q does not name the file", e.Error())
		}
	}
	if _, err := LoadProfile(filepath.Join(t.TempDir(), "missing.profile.toml")); err == nil || !strings.Contains(err.Error(), "cannot read") {
		t.Errorf("missing profile: %v", err)
	}
}

// The example profile in PROFILE.md loads as written.
func TestProfileDocExample(t *testing.T) {
	doc, err := os.ReadFile("PROFILE.md")
	if err != nil {
		t.Fatal(err)
	}
	s := string(doc)
	i := strings.Index(s, "```toml\n")
	j := strings.Index(s[i+8:], "```")
	if i < 0 || j < 0 {
		t.Fatal("PROFILE.md has no ```toml example")
	}
	if _, err := ParseProfile("PROFILE.md", []byte(s[i+8:i+8+j])); err != nil {
		t.Errorf("PROFILE.md example: %v", err)
	}
}

// A waiver keeps the finding, marked waived, and it no longer blocks.
func TestWaiver(t *testing.T) {
	src := monitoringWell("ft", "8.25", "36.0", fill("23.0", "36.0", "filter-pack")+fill("0.0", "23.0", "neat-cement")) +
		"[[waiver]]\nrule = \"SEAL-ABOVE-PACK\"\nreason = \"variance granted\"\napproved_by = \"county\"\n"
	fs := findings(load(t, src), nil, "SEAL-ABOVE-PACK")
	if len(fs) != 1 || !fs[0].Waived || fs[0].Blocking() || fs[0].Label() != "waived" {
		t.Errorf("waived finding: %+v", fs)
	}
}

// The annulus inside an outer casing is checked like the borehole's:
// here nothing fills it from 5 to 10 ft.
func TestAnnulusGapInsideCasing(t *testing.T) {
	well := monitoringWell("ft", "8.25", "36.0", fill("23.0", "36.0", "filter-pack")+fill("20.0", "23.0", "bentonite-chips")+fill("0.0", "20.0", "neat-cement")+
		"[[fill]]\ntop = 0.0\nbottom = 5.0\nmaterial = \"neat-cement\"\nwithin = \"conductor\"\n")
	src := strings.Replace(well, "[[borehole]]\ntop = 0.0\nbottom = 36.0\ndiameter = 8.25\n", `[[borehole]]
top = 0.0
bottom = 10.0
diameter = 14.0
[[borehole]]
top = 10.0
bottom = 36.0
diameter = 8.25
[[casing]]
name = "conductor"
top = 0.0
bottom = 10.0
size = "8"
schedule = "40"
`, 1)
	fs := findings(load(t, src), nil, "ANNULUS-GAP")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "inside casing \"conductor\" at 5–10 ft") {
		t.Errorf("gap inside the conductor: %+v", fs)
	}
}

// The open-hole rule also names a missing and an ungrouted casing.
func TestOpenHoleCasingCases(t *testing.T) {
	head := "[units]\ndepth = \"ft\"\n[well]\nid = \"B\"\npurpose = \"domestic\"\ntotal_depth = 100.0\n[[borehole]]\ntop = 0.0\nbottom = 100.0\ndiameter = 12.0\n"
	casing := "[[casing]]\nname = \"surface\"\ntop = -1.0\nbottom = 40.0\nsize = \"6\"\nschedule = \"40\"\n"
	open := "[[open_hole]]\ntop = 40.0\nbottom = 100.0\n"
	for _, c := range []struct{ src, want string }{
		{head + open, "no casing stands above"},
		{head + casing + fill("0.0", "40.0", "native-backfill") + open, "not grouted or sealed at its foot (40 ft)"},
		{head + casing + fill("0.0", "40.0", "neat-cement") + open, ""},
	} {
		fs := findings(load(t, c.src), nil, "OPEN-HOLE-BELOW-CASING")
		switch {
		case c.want == "" && len(fs) != 0:
			t.Errorf("grouted casing: %v", fs)
		case c.want != "" && (len(fs) != 1 || !strings.Contains(fs[0].Message, c.want)):
			t.Errorf("got %+v, want %q", fs, c.want)
		}
	}
}

// No input makes a rule panic: every fixture, the demo wells and an
// almost empty well run without an internal-error finding.
func FuzzCheck(f *testing.F) {
	paths, _ := filepath.Glob("testdata/*/*.toml")
	for _, p := range paths {
		if data, err := os.ReadFile(p); err == nil {
			f.Add(data)
		}
	}
	f.Add([]byte("[units]\ndepth = \"m\"\n[well]\nid = \"x\"\npurpose = \"monitoring\"\ntotal_depth = 1.0\n[[borehole]]\ntop = 0.0\nbottom = 1.0\ndiameter = 100.0\n"))
	f.Fuzz(func(t *testing.T, data []byte) {
		w, err := schema.Load("fuzz.toml", data)
		if err != nil {
			return
		}
		for _, fd := range Check(w, nil) {
			if strings.Contains(fd.Message, "internal error") {
				t.Fatalf("%s", fd.Message)
			}
		}
	})
}

// BenchmarkCheck runs every rule on the nested-well fixture, the
// busiest geometry (two strings, six fills).
func BenchmarkCheck(b *testing.B) {
	w, err := schema.LoadFile(filepath.Join("testdata", "NESTED-SEAL", "pass.toml"))
	if err != nil {
		b.Fatal(err)
	}
	for b.Loop() {
		Check(w, nil)
	}
}

// Filter-pack design against the formation's sieve analysis (ASTM D5092-04
// §6.3.3.1 as its text is reproduced: the pack's d-30 about 4 to 6 times
// the formation's d-30). By hand: 1.2 mm / 0.25 mm = 4.8, inside 4 to 6;
// 1.2 mm / 0.15 mm = 8.0, above 6, so the pack is too coarse for it.
func TestPackFormationRatioWorked(t *testing.T) {
	well := func(formationD30 string) *schema.Well {
		pack := "[[fill]]\ntop = 23.0\nbottom = 36.0\nmaterial = \"filter-pack\"\nd30 = 1.2\n"
		sample := "[[sample]]\ndepth = 30.0\nd30 = " + formationD30 + "\n"
		return load(t, monitoringWell("ft", "8.25", "36.0", pack+fill("20.0", "23.0", "bentonite-chips")+fill("0.0", "20.0", "neat-cement")+sample))
	}
	w := well("0.25")
	if got := schema.PackFormationRatio(&w.Fills[0], w.Samples[0]); math.Abs(got-4.8) > 1e-9 {
		t.Errorf("1.2/0.25 = %v, want 4.8", got)
	}
	if fs := findings(w, nil, "PACK-FORMATION-RATIO"); len(fs) != 0 {
		t.Errorf("ratio 4.8 flagged: %s", fs[0].Message)
	}
	w = well("0.15")
	if got := schema.PackFormationRatio(&w.Fills[0], w.Samples[0]); math.Abs(got-8.0) > 1e-9 {
		t.Errorf("1.2/0.15 = %v, want 8.0", got)
	}
	fs := findings(w, nil, "PACK-FORMATION-RATIO")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "8 times") || !strings.Contains(fs[0].Message, "too coarse") {
		t.Errorf("ratio 8.0: %+v", fs)
	}
	// A supply well is not judged by the monitoring-well standard.
	w = well("0.15")
	w.Purpose = schema.PublicSupply
	if fs := findings(w, nil, "PACK-FORMATION-RATIO"); len(fs) != 0 {
		t.Errorf("public-supply well judged by ASTM D5092: %s", fs[0].Message)
	}
}

// The pack's uniformity coefficient Cu = d60/d10 (ASTM D2487) below 2.5
// (UFGS 02525N). By hand: 1.1/0.45 = 2.444 passes; 1.4/0.45 = 3.111 is
// flagged.
func TestPackUniformityWorked(t *testing.T) {
	well := func(d60 string) *schema.Well {
		pack := "[[fill]]\ntop = 23.0\nbottom = 36.0\nmaterial = \"filter-pack\"\nd10 = 0.45\nd60 = " + d60 + "\n"
		return load(t, monitoringWell("ft", "8.25", "36.0", pack+fill("20.0", "23.0", "bentonite-chips")+fill("0.0", "20.0", "neat-cement")))
	}
	w := well("1.1")
	if got := schema.UniformityCoefficient(w.Fills[0].D10, w.Fills[0].D60); math.Abs(got-2.444) > 5e-4 {
		t.Errorf("Cu 1.1/0.45 = %v, want 2.444", got)
	}
	if fs := findings(w, nil, "PACK-UNIFORMITY"); len(fs) != 0 {
		t.Errorf("Cu 2.44 flagged: %s", fs[0].Message)
	}
	w = well("1.4")
	if got := schema.UniformityCoefficient(w.Fills[0].D10, w.Fills[0].D60); math.Abs(got-3.111) > 5e-4 {
		t.Errorf("Cu 1.4/0.45 = %v, want 3.111", got)
	}
	fs := findings(w, nil, "PACK-UNIFORMITY")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "= 3.11;") {
		t.Errorf("Cu 3.11: %+v", fs)
	}
}
