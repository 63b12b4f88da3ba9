package rules

import (
	"math"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// Every length threshold a well in metres gets by default is a whole
// number of centimetres (a diameter of millimetres), never a bare
// conversion such as 6.096 m, and stays within 3 % of the figure its
// source gives in feet or inches (1 ft = 0.3048 m, 1 in = 25.4 mm, NIST
// SP 811), for every purpose.
func TestMetricThresholdsRound(t *testing.T) {
	prof := DefaultProfile()
	metres, feet := schema.DefaultUnits(schema.Metres), schema.DefaultUnits(schema.Feet)
	purposes := append([]schema.Purpose{""}, schema.Purposes...)
	for _, r := range All() {
		for _, prm := range r.Params {
			if prm.Kind == RatioParam || prm.Kind == VelocityParam {
				continue
			}
			for _, pu := range purposes {
				if _, ok := prm.defaultFor(pu); !ok && prm.Default == 0 && prm.Fallback == "" {
					continue // no default for this purpose
				}
				m := prof.valueFor(r, prm.Name, metres, pu)
				us := prof.valueFor(r, prm.Name, feet, pu) // in model units: the source's figure converted
				step := 0.01                               // m
				if prm.Kind == DiameterParam {
					step = 1 // mm
				}
				if k := m / step; math.Abs(k-math.Round(k)) > 1e-6 {
					t.Errorf("%s %s (%q): %v for wells in metres is not a whole %v", r.ID, prm.Name, pu, m, step)
				}
				if us > 0 && math.Abs(m/us-1) > 0.03 {
					t.Errorf("%s %s (%q): %v for wells in metres, %v from the source", r.ID, prm.Name, pu, m, us)
				}
			}
		}
	}
}

// A metric public-supply well gets the metres DWR Bulletin 74-81 §9.A
// gives beside its feet: 50 ft (15 m), so 14.9 m falls short of 15 m; a
// profile in metres that sets 14 m, a metric code's round figure, is used
// as written.
func TestMetricSanitarySealMessage(t *testing.T) {
	src := strings.Replace(monitoringWell("m", "210", "20.0", fill("16.0", "20.0", "filter-pack")+fill("15.2", "16.0", "bentonite-chips")+
		fill("14.9", "15.2", "native-backfill")+fill("0.0", "14.9", "neat-cement")), `purpose = "monitoring"`, `purpose = "public-supply"`, 1)
	src = strings.Replace(src, "top = 7.5\nbottom = 10.5", "top = 17.0\nbottom = 19.5", 1)
	src = strings.Replace(src, "bottom = 7.5\nsize", "bottom = 17.0\nsize", 1)
	w := load(t, src)
	fs := findings(w, nil, "SANITARY-SEAL-DEPTH")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "reaches 14.9 m; a public-supply well needs at least 15 m") {
		t.Fatalf("findings %+v", fs)
	}
	prof, err := ParseProfile("eu.profile.toml", []byte("[profile]\nname = \"metric code\"\nunits = \"m\"\n[sanitary_seal]\npublic-supply = 14\n"))
	if err != nil {
		t.Fatal(err)
	}
	if fs := findings(w, prof, "SANITARY-SEAL-DEPTH"); len(fs) != 0 {
		t.Errorf("14.9 m under a 14 m profile: %+v", fs)
	}
}

// Driscoll's limit (Groundwater and Wells, 1986, ch. 13: 0.1 ft/s) on a
// metric supply well is its round metric figure, 3 cm/s, never in ft/s. By hand: 3 m of
// 6-in screen (OD 168.275 mm) at 10 % open area has pi x 0.168275 x 3 x
// 0.10 = 0.15859 m2 open, 0.079297 m2 effective; 3 L/s enters at 0.003 /
// 0.079297 = 3.78 cm/s, and the area transmits 0.079297 x 0.03 = 2.4 L/s
// at the limit. A profile in feet sets the limit in ft/s, one in metres
// in m/s: 0.05 m/s (5 cm/s) lets the 3.78 cm/s pass.
func TestMetricEntranceVelocityMessage(t *testing.T) {
	src := `[units]
depth = "m"
[well]
id = "EU-9"
purpose = "domestic"
total_depth = 14.0
[[borehole]]
top = 0.0
bottom = 14.0
diameter = 320
[[string]]
bottom_cap = "welded plate"
[[string.section]]
kind = "riser"
top = -0.3
bottom = 9.0
material = "carbon steel"
size = "6"
schedule = "40"
[[string.section]]
kind = "screen"
top = 9.0
bottom = 12.0
material = "stainless steel"
size = "6"
schedule = "40"
slot_number = 40
open_area = 10.0
` + fill("8.5", "14.0", "filter-pack") + fill("7.5", "8.5", "bentonite-chips") + fill("0.0", "7.5", "neat-cement") + `
[pumping_test]
rate = 3.0
`
	w := load(t, src)
	fs := findings(w, nil, "ENTRANCE-VELOCITY")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "tested rate of 3 L/s water enters the screens at 3.78 cm/s, above 3 cm/s; their effective open area transmits 2.4 L/s") {
		t.Errorf("findings %+v", fs)
	}
	for _, c := range []struct {
		prof string
		n    int
	}{{"units = \"m\"\n[rule.ENTRANCE-VELOCITY]\nlimit = 0.05\n", 0}, {"units = \"ft\"\n[rule.ENTRANCE-VELOCITY]\nlimit = 0.1\n", 1}, {"units = \"ft\"\n[rule.ENTRANCE-VELOCITY]\nlimit = 0.15\n", 0}} {
		prof, err := ParseProfile("v.profile.toml", []byte("[profile]\nname = \"v\"\n"+c.prof))
		if err != nil {
			t.Fatal(err)
		}
		if got := len(findings(w, prof, "ENTRANCE-VELOCITY")); got != c.n {
			t.Errorf("profile %q: %d findings, want %d", c.prof, got, c.n)
		}
	}
}

// COLLAPSE-LOAD in a metric well speaks kPa. DN100 SDR 26 PVC (OD 114.3
// mm) is rated 59.84 psi = 412.6 kPa by ASTM F480's formula (1 psi =
// 6.894757 kPa, NIST SP 811); 35.4 m of neat cement at its mix's 1864.9
// kg/m3 (15.56 lb/gal) presses 1864.9 x 9.80665 x 35.4 = 647.4 kPa on
// the empty casing, 1.57 times the rating.
func TestMetricCollapseLoadMessage(t *testing.T) {
	src := strings.Replace(monitoringWell("m", "250", "40.0", fill("37.0", "40.0", "filter-pack")+fill("36.0", "37.0", "bentonite-chips")+
		fill("0.6", "36.0", "neat-cement")+fill("0.0", "0.6", "concrete")), "size = \"2\"\nschedule = \"40\"", "material = \"PVC\"\nsize = \"DN100\"\nsdr = 26", 1)
	src = strings.Replace(src, "top = 7.5\nbottom = 10.5", "top = 38.0\nbottom = 39.5", 1)
	src = strings.Replace(src, "bottom = 7.5\nmaterial", "bottom = 38.0\nmaterial", 1)
	fs := findings(load(t, src), nil, "COLLAPSE-LOAD")
	if len(fs) != 1 || !strings.Contains(fs[0].Message, "puts 647 kPa on string \"main\" riser at 36 m, 1.57 times its rating (413 kPa)") ||
		!strings.Contains(fs[0].Message, "at 1.86 kg/L (its mix)") {
		t.Errorf("findings %+v", fs)
	}
}
