package quantities

import (
	"encoding/json"
	"math"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema/schematest"
)

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

// Two copies of schematest.PlannedWell, worked by hand there.
func TestJSONPlanned(t *testing.T) {
	dir := t.TempDir()
	writeFile(t, dir, "PL-1.toml", schematest.PlannedWell)
	writeFile(t, dir, "PL-2.toml", strings.Replace(schematest.PlannedWell, `"PL-1"`, `"PL-2"`, 1))
	rep, problems := build(t, Options{Contingency: 10}, dir)
	if len(problems) > 0 {
		t.Fatal(problems)
	}
	var q qJSON
	if err := json.Unmarshal([]byte(written(t, "json", rep)), &q); err != nil {
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
	// 0.3405 ft2/ft and 2.547 gal/ft over 10 ft (worked annulus in PlannedWell)
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
func TestJSONDemoSurface(t *testing.T) {
	out := report(t, "json", filepath.Join(demoWells, "MW-1.toml"), filepath.Join(demoWells, "MW-2.toml"))
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

// The filter-pack figures of the PACK-FORMATION-RATIO fixture, worked in
// TestTextPackDesign, as JSON.
func TestJSONPackDesign(t *testing.T) {
	js := report(t, "json", fixture("PACK-FORMATION-RATIO", "fail.toml"))
	for _, s := range []string{`"uniformity_coefficient":1.5556`, `"ratio":6.875`, `"sample":"sample[0]","depth":26,"ratio":2.2`} {
		if !strings.Contains(strings.Join(strings.Fields(js), ""), s) {
			t.Errorf("JSON lacks %s", s)
		}
	}
}
