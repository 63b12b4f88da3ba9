package quantities

import (
	"regexp"
	"strings"
	"testing"
)

// The demo project's bridged pack (MW-3: 5 bags in a 28-41 ft pack that
// should take 4.457 ft3 = 12 x 0.34046 + 1 x 0.37122, 8.9 bags) is called
// out, with its tags.
func TestTextDemo(t *testing.T) {
	out := report(t, "text", demoWells)
	for _, s := range []string{"MW-3", "4.457", "0.56", "PLACED-VOLUME-LOW", "possible bridge", "expected 36.68 ft", "As built, to reconcile", "licensed professional"} {
		if !strings.Contains(out, s) {
			t.Errorf("output lacks %q", s)
		}
	}
	// same input, same bytes
	if again := report(t, "text", demoWells); again != out {
		t.Error("two runs differ")
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
func TestTextPurgeAndMix(t *testing.T) {
	out := report(t, "text", demoWells)
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
// 6.875 (ASTM D5092's design ratio). TestJSONPackDesign reads them as JSON.
func TestTextPackDesign(t *testing.T) {
	out := report(t, "text", fixture("PACK-FORMATION-RATIO", "fail.toml"))
	want := "filter pack, fill 1: Cu = d60/d10 = 1.56 (rule PACK-UNIFORMITY); d30 2.2 times that of the sample at 26 ft; d30 5 times that of the sample at 30 ft; d30 6.88 times that of the sample at 34 ft (rule PACK-FORMATION-RATIO)"
	if !strings.Contains(out, want) {
		t.Errorf("output lacks %q:\n%s", want, out)
	}
}

// The collapse load of the COLLAPSE-LOAD fixture (worked in its comment:
// 95.4 psi of neat cement on SDR 26 PVC rated 59.8 psi by ASTM F480),
// and of the passing one, whose casing was kept full of water (120 ft x
// 0.4333 psi/ft = 52.0 psi inside).
func TestTextCollapseLoad(t *testing.T) {
	out := report(t, "text", fixture("COLLAPSE-LOAD", "fail.toml"))
	if !strings.Contains(out, "collapse load, fill 3: neat cement 2–120 ft at 15.56 lb/gal (its mix), on string \"FX-1\" riser (PVC, rated 59.8 psi) at 120 ft: 95.4 psi outside, the casing taken as empty") ||
		!strings.Contains(out, "net 95.4 psi, 1.59 of the rating") {
		t.Errorf("output:\n%s", out)
	}
	out = report(t, "text", fixture("COLLAPSE-LOAD", "pass.toml"))
	if !strings.Contains(out, "less 52 psi of water inside from 0 ft; net 43.4 psi, 0.73 of the rating") {
		t.Errorf("output:\n%s", out)
	}
}

// The demo's order list (the planned MW-4) carries its pad. By hand (8.25-in
// hole, 6-in protective casing to 2 ft; pi/4 d^2/144 ft2 for d in inches):
// concrete 0-1 ft beside the casing pi/4 (68.0625 - 36)/144 x 1 = 0.17487
// ft3; pad 3 x 3 x 0.33 less the casing pi/4 x 36/144 x 0.33 = 2.97 -
// 0.06480 = 2.90520 ft3; together 3.08007 ft3. At 0.6 ft3 per 80-lb bag,
// each interval rounded up: 1 + 5 = 6 bags; with the 10 % contingency
// before rounding: ceil(0.19236/0.6) + ceil(3.19572/0.6) = 1 + 6 = 7.
func TestTextDemoOrderHasPad(t *testing.T) {
	out := report(t, "text", demoWells)
	order := out[strings.Index(out, "Order for the planned wells MW-4"):]
	order = order[:strings.Index(order, "\n\n")]
	if !regexp.MustCompile(`concrete\s+0\.600 ft³ per 80-lb bag \(from memory\)\s+2\s+3\.080 ft³ \(23\.04 gal\)\s+6\s+7`).MatchString(order) {
		t.Errorf("the order's concrete line lacks MW-4's pad:\n%s", order)
	}
}

// TestOrderHeadlineCountsInWords: an order for wells none of which is
// planned says how many it covers in words that agree with the count.
func TestOrderHeadlineCountsInWords(t *testing.T) {
	for n, want := range map[int]string{1: "the one well (not a planned well)", 2: "both wells (neither is planned)", 7: "all 7 wells (none is planned)"} {
		if got := unplannedWells(n); got != want {
			t.Errorf("%d wells: %q, want %q", n, got, want)
		}
	}
}
