package main

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
)

// wellTOML is a planned well in feet: an 8.25-in hole to 30 ft around
// 2-in Sch 40 PVC (OD 2.375 in, ASTM D1785) to 30 ft; pack 20-30 ft,
// chips 17-20 ft, neat cement 0-17 ft. By hand, the annulus is pi/4
// (8.25^2 - 2.375^2) / 144 = 0.34046 ft2/ft = 2.547 US gal/ft:
//
//	pack  10 ft: 3.4046 ft3 (25.47 gal) / 0.5 ft3 per 50-lb bag = 6.81 -> 7
//	chips  3 ft: 1.0214 ft3 / 0.6944 ft3 per 50-lb bag = 1.47 -> 2
//	grout 17 ft: 5.7878 ft3 / 1.18 ft3 per 94-lb sack = 4.90 -> 5
const wellTOML = `[units]
depth = "ft"

[well]
id = "PL-1"
purpose = "monitoring"
status = "planned"
total_depth = 30.0

[[borehole]]
top = 0.0
bottom = 30.0
diameter = 8.25

[[string]]
name = "PL-1"

[[string.section]]
kind = "riser"
top = -2.5
bottom = 20.0
material = "PVC"
size = "2"
schedule = "40"

[[string.section]]
kind = "screen"
top = 20.0
bottom = 30.0
slot_number = 10

[[fill]]
top = 20.0
bottom = 30.0
material = "filter-pack"

[[fill]]
top = 17.0
bottom = 20.0
material = "bentonite-chips"

[[fill]]
top = 0.0
bottom = 17.0
material = "neat-cement"
`

func writeFile(t *testing.T, dir, name, body string) string {
	t.Helper()
	p := filepath.Join(dir, name)
	if err := os.WriteFile(p, []byte(body), 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}

func runQ(args ...string) (int, string, string) {
	var out, errb bytes.Buffer
	code := run(append([]string{"quantities"}, args...), &out, &errb)
	return code, out.String(), errb.String()
}

type qJSON struct {
	Caution string `json:"caution"`
	Wells   []struct {
		Well       string `json:"well"`
		VolumeUnit string `json:"volume_unit"`
		Unit2      string `json:"volume_unit_2"`
		Fills      []struct {
			Material    string   `json:"material"`
			Calculated  float64  `json:"calculated"`
			Calculated2 float64  `json:"calculated_2"`
			BagsNeeded  *int     `json:"bags_needed"`
			Ratio       *float64 `json:"ratio"`
		} `json:"fills"`
		Pipes []struct {
			Inside float64 `json:"inside"`
			Unit   string  `json:"unit"`
		} `json:"pipes"`
	} `json:"wells"`
	Totals []struct {
		Material   string `json:"material"`
		BagsNeeded *int   `json:"bags_needed"`
		BagsOrder  *int   `json:"bags_to_order"`
	} `json:"totals"`
}

func TestQuantitiesPlannedJSON(t *testing.T) {
	dir := t.TempDir()
	writeFile(t, dir, "PL-1.toml", wellTOML)
	writeFile(t, dir, "PL-2.toml", strings.Replace(wellTOML, `"PL-1"`, `"PL-2"`, 1))
	code, out, errs := runQ("--format", "json", "--contingency", "10", dir)
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var q qJSON
	if err := json.Unmarshal([]byte(out), &q); err != nil {
		t.Fatal(err)
	}
	if len(q.Wells) != 2 || q.Caution == "" {
		t.Fatalf("wells %d, caution %q", len(q.Wells), q.Caution)
	}
	w := q.Wells[0]
	if w.VolumeUnit != "ft3" || w.Unit2 != "gal" {
		t.Errorf("units %s %s, want ft3 gal for a file in feet", w.VolumeUnit, w.Unit2)
	}
	pack := w.Fills[0]
	// 0.3405 ft2/ft and 2.547 gal/ft over 10 ft (worked annulus above)
	if math.Abs(pack.Calculated-3.405) > 0.001 || math.Abs(pack.Calculated2-25.47) > 0.01 {
		t.Errorf("pack %.4f ft3 %.3f gal, want 3.405 ft3 25.47 gal", pack.Calculated, pack.Calculated2)
	}
	for i, want := range []int{7, 2, 5} {
		if f := w.Fills[i]; f.BagsNeeded == nil || *f.BagsNeeded != want || f.Ratio != nil {
			t.Errorf("fill %d (%s): bags %v ratio %v, want %d and no ratio", i, f.Material, f.BagsNeeded, f.Ratio, want)
		}
	}
	// ID 2.067 in (ASTM D1785): pi/4 2.067^2 / 144 x 7.48052 = 0.1743 gal/ft
	if p := w.Pipes[0]; p.Unit != "gal/ft" || math.Abs(p.Inside-0.1743) > 0.0001 {
		t.Errorf("riser inside %v %s", p.Inside, p.Unit)
	}
	// totals: two wells x (7, 2, 5) = 14, 4, 10 bags needed. To order, 10 %
	// goes on each volume before rounding (Kuo, Practical Design
	// Calculations for Groundwater and Soil Remediation, ex. 2.21-2.22):
	// pack 3.4046 x 1.1 / 0.5 = 7.49 -> 8, chips 1.0214 x 1.1 / 0.6944 =
	// 1.62 -> 2, grout 5.7878 x 1.1 / 1.18 = 5.40 -> 6; twice: 16, 4, 12
	want := map[string][2]int{"filter-pack": {14, 16}, "bentonite-chips": {4, 4}, "neat-cement": {10, 12}}
	if len(q.Totals) != 3 {
		t.Fatalf("%d totals", len(q.Totals))
	}
	for _, tot := range q.Totals {
		w := want[tot.Material]
		if tot.BagsNeeded == nil || *tot.BagsNeeded != w[0] || *tot.BagsOrder != w[1] {
			t.Errorf("%s: needed %v order %v, want %v", tot.Material, tot.BagsNeeded, tot.BagsOrder, w)
		}
	}
}

// The demo project's bridged pack (MW-3: 5 bags in a 28-41 ft pack that
// should take 4.457 ft3 = 12 x 0.34046 + 1 x 0.37122, 8.9 bags) is called
// out, with its tags.
func TestQuantitiesDemo(t *testing.T) {
	code, out, errs := runQ(filepath.Join("demo", "wells"))
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	for _, s := range []string{"MW-3", "4.457", "0.56", "PLACED-VOLUME-LOW", "possible bridge", "expected 36.68 ft", "As built, to reconcile", "licensed professional"} {
		if !strings.Contains(out, s) {
			t.Errorf("output lacks %q", s)
		}
	}
	// same input, same bytes
	_, again, _ := runQ(filepath.Join("demo", "wells"))
	if again != out {
		t.Error("two runs differ")
	}
}

func TestQuantitiesCSVMetric(t *testing.T) {
	dir := t.TempDir()
	// 200-mm hole, 60.325-mm OD pipe: pi/4 (0.2^2 - 0.060325^2) = 28.558 L/m;
	// a pack over 3 m is 85.673 L = 0.0857 m3
	metric := strings.NewReplacer(`depth = "ft"`, `depth = "m"`, "diameter = 8.25", "diameter = 200",
		"bottom = 30.0", "bottom = 10.0", "top = 20.0", "top = 7.0", "bottom = 20.0", "bottom = 7.0",
		"top = 17.0", "top = 5.0", "bottom = 17.0", "bottom = 5.0", "total_depth = 30.0", "total_depth = 10.0",
		"top = -2.5", "top = -0.5").Replace(wellTOML)
	writeFile(t, dir, "M-1.toml", metric)
	code, out, errs := runQ(filepath.Join(dir, "M-1.toml"), "--format", "csv")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	recs, err := csv.NewReader(strings.NewReader(out)).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if len(recs) != 1+3+3+2 { // header, intervals, totals, profile and caution
		t.Fatalf("%d records", len(recs))
	}
	head := recs[0]
	col := func(name string) int {
		for i, h := range head {
			if h == name {
				return i
			}
		}
		t.Fatalf("no column %s", name)
		return -1
	}
	pack := recs[1]
	if pack[col("volume_unit")] != "L" || pack[col("calculated")] != "85.6733" {
		t.Errorf("pack row %v", pack)
	}
	// no bag mass is given, so a metric well counts 25-kg bags: 0.5 ft3
	// per 50 lb (22.680 kg) is 14.158 L x 25 / 22.680 = 15.607 L per bag,
	// 85.673 / 15.607 = 5.49 -> 6 bags
	if pack[col("bags_needed")] != "6" || pack[col("bag_mass")] != "25" {
		t.Errorf("pack bags %s of %s kg, want 6 of 25", pack[col("bags_needed")], pack[col("bag_mass")])
	}
	if last := recs[len(recs)-1]; last[0] != "caution" {
		t.Errorf("last record %v", last)
	}
}

// A bad file is reported with its position and the others still come out.
func TestQuantitiesBadFile(t *testing.T) {
	dir := t.TempDir()
	writeFile(t, dir, "A.toml", wellTOML)
	writeFile(t, dir, "B.toml", strings.Replace(wellTOML, "bottom = 17.0", "botom = 17.0", 1))
	code, out, errs := runQ(dir, filepath.Join(dir, "missing.toml"))
	if code != exitInput {
		t.Errorf("exit %d, want %d", code, exitInput)
	}
	if !strings.Contains(errs, "B.toml:") || !strings.Contains(errs, "botom") || !strings.Contains(errs, "missing.toml") {
		t.Errorf("stderr: %s", errs)
	}
	if !strings.Contains(out, "PL-1") {
		t.Errorf("good well missing from output:\n%s", out)
	}
}

func TestQuantitiesYieldsFile(t *testing.T) {
	dir := t.TempDir()
	w := writeFile(t, dir, "PL-1.toml", wellTOML)
	// 3.4046 ft3 / 0.45 = 7.57 -> 8 bags
	y := writeFile(t, dir, "site.yields.toml", "[yields.filter-pack]\nyield = 0.45\nbag_mass = 50\n")
	code, out, errs := runQ("--yields", y, w, "--format", "json")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var q qJSON
	json.Unmarshal([]byte(out), &q)
	if n := q.Wells[0].Fills[0].BagsNeeded; n == nil || *n != 8 {
		t.Errorf("bags with 0.45 ft3 yield: %v, want 8", n)
	}
	bad := writeFile(t, dir, "bad.yields.toml", "[yields.filter-pack]\nyeild = 0.45\n")
	if code, _, errs := runQ("--yields", bad, w); code != exitInput || !strings.Contains(errs, "bad.yields.toml:2") {
		t.Errorf("bad yields: exit %d, %s", code, errs)
	}
}

func TestQuantitiesUsage(t *testing.T) {
	for _, args := range [][]string{{}, {"--format", "xml", "x"}, {"--contingency", "-5", "x"}, {"--nope", "x"}} {
		if code, _, _ := runQ(args...); code != exitUsage {
			t.Errorf("%v: exit %d, want %d", args, code, exitUsage)
		}
	}
}

// An interval whose geometry fails (a fill below the recorded hole) is
// reported with its file and line, exit 1, and the rest is still
// computed.
func TestQuantitiesGeometryError(t *testing.T) {
	dir := t.TempDir()
	body := strings.Replace(wellTOML, "[[fill]]\ntop = 20.0\nbottom = 30.0", "[[fill]]\ntop = 20.0\nbottom = 35.0", 1)
	body = strings.Replace(body, "total_depth = 30.0", "total_depth = 35.0", 1)
	p := writeFile(t, dir, "G.toml", body)
	code, out, errs := runQ(p)
	if code != exitFindings {
		t.Errorf("exit %d, want %d", code, exitFindings)
	}
	// the pack is the first [[fill]], on line 32 of wellTOML
	if !strings.Contains(errs, "G.toml:32: fill[0]: at 30–35 ft: no borehole section") {
		t.Errorf("stderr: %s", errs)
	}
	if !strings.Contains(out, "bentonite-chips") || !strings.Contains(out, "cannot be computed") {
		t.Errorf("output:\n%s", out)
	}
}

// A profile sets the reconciliation thresholds: with min_ratio 0.5 the
// MW-3 pack (56 %) is no longer low; its tags still are.
func TestQuantitiesProfile(t *testing.T) {
	dir := t.TempDir()
	prof := writeFile(t, dir, "site.profile.toml", "[profile]\nname = \"lenient\"\nunits = \"ft\"\n\n[rule.PLACED-VOLUME-LOW]\nmin_ratio = 0.5\n")
	code, out, errs := runQ("--profile", prof, filepath.Join("demo", "wells", "MW-3.toml"))
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	if strings.Contains(out, "PLACED-VOLUME-LOW") || !strings.Contains(out, "TAG-EXPECTED-TOP") {
		t.Errorf("output:\n%s", out)
	}
	if code, _, _ := runQ("--profile", filepath.Join(dir, "none.toml"), dir); code != exitInput {
		t.Errorf("missing profile: exit %d", code)
	}
}

// The demo's surface completions, by hand (8.25-in hole; 2-in Sch 40 PVC,
// OD 2.375 in per ASTM D1785; pi/4 d^2/144 ft2 for d in inches):
//
//	MW-1, flush-mount, 8-in vault to 1.0 ft, riser top at 0.32 ft:
//	  concrete 0-1.0 ft beside the vault  pi/4 (68.0625 - 64)     /144 x 1.0 = 0.02216
//	           1.0-1.5 ft around the riser pi/4 (68.0625 - 5.6406) /144 x 0.5 = 0.17023
//	                                                                 0.19238 ft3
//	  pad, flush: 2 x 2 x 0.5 less the hole pi/4 68.0625/144 x 0.5 = 2 - 0.18561 = 1.81439 ft3
//	MW-2, stick-up, 6-in protective casing to 2.0 ft:
//	  concrete 0-1 ft beside the casing pi/4 (68.0625 - 36)/144 x 1 = 0.17487 ft3
//	  neat cement 1-2 ft 0.17487 + 2-4 ft 2 x 0.34045 = 0.85578 ft3;
//	    1 sack x 1.18 ft3 placed: ratio 1.18 / 0.85578 = 1.379
//	  pad on grade: 3 x 3 x 0.33 less the casing pi/4 36/144 x 0.33
//	    = 2.97 - 0.06480 = 2.90520 ft3
func TestQuantitiesDemoSurface(t *testing.T) {
	code, out, errs := runQ("--format", "json", filepath.Join("demo", "wells", "MW-1.toml"), filepath.Join("demo", "wells", "MW-2.toml"))
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var q struct {
		Wells []struct {
			Well  string `json:"well"`
			Fills []struct {
				Path       string   `json:"path"`
				Material   string   `json:"material"`
				Calculated float64  `json:"calculated"`
				Ratio      *float64 `json:"ratio"`
				BagsNeeded *int     `json:"bags_needed"`
			} `json:"fills"`
		} `json:"wells"`
		Totals []struct {
			Material   string  `json:"material"`
			Calculated float64 `json:"calculated"`
		} `json:"totals"`
	}
	if err := json.Unmarshal([]byte(out), &q); err != nil {
		t.Fatal(err)
	}
	type fig struct {
		well, path  string
		calc, ratio float64
	}
	for _, c := range []fig{
		{"MW-1", "fill[4]", 0.1924, 0},
		{"MW-1", "surface.pad", 1.8144, 0},
		{"MW-2", "fill[2]", 0.8558, 1.379},
		{"MW-2", "fill[3]", 0.1749, 0},
		{"MW-2", "surface.pad", 2.9052, 0},
	} {
		found := false
		for _, w := range q.Wells {
			for _, f := range w.Fills {
				if w.Well != c.well || f.Path != c.path {
					continue
				}
				found = true
				if math.Abs(f.Calculated-c.calc) > 1.5e-4 {
					t.Errorf("%s %s: %.4f ft3, by hand %.4f", c.well, c.path, f.Calculated, c.calc)
				}
				if c.ratio > 0 && (f.Ratio == nil || math.Abs(*f.Ratio-c.ratio) > 1e-3) {
					t.Errorf("%s %s: ratio %v, by hand %.3f", c.well, c.path, f.Ratio, c.ratio)
				}
			}
		}
		if !found {
			t.Errorf("%s %s not reported", c.well, c.path)
		}
	}
	// the order counts the concrete of both fills and both pads:
	// 0.19238 + 1.81439 + 0.17487 + 2.90520 = 5.08684 ft3
	for _, tot := range q.Totals {
		if tot.Material == "concrete" && math.Abs(tot.Calculated-5.0868) > 2e-4 {
			t.Errorf("concrete to order %.4f ft3, by hand 5.0868", tot.Calculated)
		}
	}
}

// Every demo well with a static level gets its well and purge volumes,
// and every grout its water per sack and expected density. MW-1 by hand
// (USGS NFM A4, V = 0.0408 H D^2): level 25.53 ft below ground (25.21 ft
// below the MP, 0.32 ft below ground), bottom 35 ft, 2.067-in ID: 0.0408 x
// 9.47 x 2.067^2 = 1.651 gal, purge 4.952 gal. MW-2's neat cement: 5.2
// gal per sack, about 15.6 lb/gal expected, 15.3 measured. BR-1, open
// below its 6-in Sch 40 casing (ID 6.065 in, ASTM A53 / B36.10): level
// 39.8 ft, 0.2 ft in the casing (0.0408 x 6.065^2 x 0.2 = 0.300 gal) and
// 110 ft of 6-in hole (0.0408 x 36 x 110 = 161.57 gal): 161.87 gal.
func TestQuantitiesPurgeAndMix(t *testing.T) {
	code, out, errs := runQ(filepath.Join("demo", "wells"))
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	for _, id := range []string{"BR-1", "MW-1", "MW-2", "MW-3", "NW-1S", "NW-1D", "PW-1"} {
		if !strings.Contains(out, "well volume, "+id+": static level") {
			t.Errorf("no well volume for %s", id)
		}
	}
	for _, s := range []string{"1.651 gal) of water in the well; purge 3 well volumes = 0.662 ft³ (4.952 gal)",
		"5.200 gal water per 94-lb bag, expected 15.5", "measured 15.3 lb/gal", "(161.87 gal) of water in the well",
		// PW-1: 94 ft of 10.75-in OD screen, 28 % open: pi x 10.75/12 x 94 x
		// 0.28 = 74.07 ft2; half effective x 0.1 ft/s = 3.704 ft3/s = 1662.3
		// gal/min (Driscoll 1986); 350 gal/min / 448.83 / 37.04 = 0.021
		// ft/s; 400 gal/min over 192 - 161.5 = 30.5 ft: 13.11 gal/min/ft
		"open area 74.07 ft² (half of it effective), transmitting 1662.3 gal/min", "entrance velocity 0.021 ft/s at the design rate of 350",
		"specific capacity 13.11 gal/min per ft"} {
		if !strings.Contains(out, s) {
			t.Errorf("output lacks %q", s)
		}
	}
}

// The filter-pack figures on the fixture of PACK-FORMATION-RATIO: pack
// d10 0.45, d30 0.55, d60 0.70 mm, samples in the screen with d30 0.25,
// 0.11 and 0.08 mm. By hand: Cu = 0.70/0.45 = 1.556 (ASTM D2487's
// definition); d30 ratios 0.55/0.25 = 2.2, 0.55/0.11 = 5, 0.55/0.08 =
// 6.875 (ASTM D5092's design ratio).
func TestQuantitiesPackDesign(t *testing.T) {
	file := filepath.Join("..", "..", "schema", "rules", "testdata", "PACK-FORMATION-RATIO", "fail.toml")
	code, out, errs := runQ(file)
	if code != exitOK && code != exitFindings {
		t.Fatalf("exit %d: %s", code, errs)
	}
	want := "filter pack, fill 1: Cu = d60/d10 = 1.56 (rule PACK-UNIFORMITY); d30 2.2 times that of the sample at 26 ft; d30 5 times that of the sample at 30 ft; d30 6.88 times that of the sample at 34 ft (rule PACK-FORMATION-RATIO)"
	if !strings.Contains(out, want) {
		t.Errorf("output lacks %q:\n%s", want, out)
	}
	_, js, _ := runQ("--format", "json", file)
	for _, s := range []string{`"uniformity_coefficient":1.5556`, `"ratio":6.875`, `"sample":"sample[0]","depth":26,"ratio":2.2`} {
		if !strings.Contains(strings.Join(strings.Fields(js), ""), s) {
			t.Errorf("JSON lacks %s", s)
		}
	}
}

// The collapse load of the COLLAPSE-LOAD fixture (worked in its comment:
// 95.4 psi of neat cement on SDR 26 PVC rated 59.8 psi by ASTM F480),
// and of the passing one, whose casing was kept full of water (120 ft x
// 0.4333 psi/ft = 52.0 psi inside).
func TestQuantitiesCollapseLoad(t *testing.T) {
	dir := filepath.Join("..", "..", "schema", "rules", "testdata", "COLLAPSE-LOAD")
	_, out, errs := runQ(filepath.Join(dir, "fail.toml"))
	if !strings.Contains(out, "collapse load, fill 3: neat cement 2–120 ft at 15.56 lb/gal (its mix), on string \"FX-1\" riser (PVC, rated 59.8 psi) at 120 ft: 95.4 psi outside, the casing taken as empty") ||
		!strings.Contains(out, "net 95.4 psi, 1.59 of the rating") {
		t.Errorf("output:\n%s%s", out, errs)
	}
	_, out, _ = runQ(filepath.Join(dir, "pass.toml"))
	if !strings.Contains(out, "less 52 psi of water inside from 0 ft; net 43.4 psi, 0.73 of the rating") {
		t.Errorf("output:\n%s", out)
	}
}

// A planned metric well with a 2000 mm hole for 50 mm pipe (DN50, OD
// 60.3 mm, ASTM D1785) is reported as a likely unit slip (33.2 times the
// OD, above the common-practice 10) and left out of the order, which
// would otherwise buy some 800 bags of sand for it; the other planned
// well (wellTOML) is still ordered for.
func TestQuantitiesHoldBackUnitSlip(t *testing.T) {
	dir := t.TempDir()
	code, out, errs := runTremie("new", "SL-1", "--kind", "planned", "--units", "m", "-o", dir)
	if code != exitOK {
		t.Fatalf("new: %d %s %s", code, out, errs)
	}
	p := filepath.Join(dir, "SL-1.toml")
	b, _ := os.ReadFile(p)
	if !strings.Contains(string(b), "diameter = 210.0") {
		t.Fatal("the starter's hole is not 210 mm")
	}
	writeFile(t, dir, "SL-1.toml", strings.Replace(string(b), "diameter = 210.0", "diameter = 2000.0", 1))
	writeFile(t, dir, "PL-1.toml", wellTOML)
	_, out, errs = runQ(dir)
	for _, s := range []string{"error SIZE-PLAUSIBLE", "33.2 times the 60.3 mm OD", "Order for the planned wells PL-1\n",
		"Left out of both lists: SL-1, whose sizes are likely a unit slip (rule SIZE-PLAUSIBLE)"} {
		if !strings.Contains(out, s) {
			t.Errorf("output lacks %q:\n%s%s", s, out, errs)
		}
	}
}

// The demo's order list (the planned MW-4) carries its pad. By hand (8.25-in
// hole, 6-in protective casing to 2 ft; pi/4 d^2/144 ft2 for d in inches):
// concrete 0-1 ft beside the casing pi/4 (68.0625 - 36)/144 x 1 = 0.17487
// ft3; pad 3 x 3 x 0.33 less the casing pi/4 x 36/144 x 0.33 = 2.97 -
// 0.06480 = 2.90520 ft3; together 3.08007 ft3. At 0.6 ft3 per 80-lb bag,
// each interval rounded up: 1 + 5 = 6 bags; with the 10 % contingency
// before rounding: ceil(0.19236/0.6) + ceil(3.19572/0.6) = 1 + 6 = 7.
func TestQuantitiesDemoOrderHasPad(t *testing.T) {
	code, out, errs := runQ(filepath.Join("demo", "wells"))
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	order := out[strings.Index(out, "Order for the planned wells MW-4"):]
	order = order[:strings.Index(order, "\n\n")]
	if !regexp.MustCompile(`concrete\s+0\.600 ft³ per 80-lb bag \(from memory\)\s+2\s+3\.080 ft³ \(23\.04 gal\)\s+6\s+7`).MatchString(order) {
		t.Errorf("the order's concrete line lacks MW-4's pad:\n%s", order)
	}
}
