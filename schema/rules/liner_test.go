package rules

import (
	"os"
	"regexp"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// The telescoped municipal well of the gallery: a 16-in production casing
// to 360 ft and a screen liner hung inside it from 350 ft on a packer.
// Neither the lap (liner inside casing, 350-360 ft) nor the liner's top
// 350 ft down may be mistaken for an unfilled annulus or for the
// measuring point.
func TestTelescopedWellWithLiner(t *testing.T) {
	data, err := os.ReadFile("../../testdata/gallery/TW-7.toml")
	if err != nil {
		t.Fatal(err)
	}
	check := func(t *testing.T, src string) map[string][]Finding {
		t.Helper()
		w, err := schema.Load("TW-7.toml", []byte(src))
		if err != nil {
			t.Fatal(err)
		}
		out := map[string][]Finding{}
		for _, f := range Check(w, nil) {
			out[f.Rule] = append(out[f.Rule], f)
		}
		return out
	}
	src := string(data)
	t.Run("pack under the production casing's shoe", func(t *testing.T) {
		// The cement stands in the 22-in hole outside the 16-in casing
		// down to its shoe at 360 ft; below, the hole was drilled out at
		// 15 in, narrower than the casing's outside, and packed. The
		// cement's ring (8 to 11 in from the axis) lies over the
		// formation's shelf, not over the pack's (4.3 to 7.5 in): no
		// grout rests on the pack, so no waiver is needed
		// (geometry of the file; common practice for a telescoped well).
		nowaiver := regexp.MustCompile(`(?s)\[\[waiver\]\]\nrule = "SEAL-ABOVE-PACK".*?\n\n`).ReplaceAllString(src, "")
		if f := check(t, nowaiver)["SEAL-ABOVE-PACK"]; len(f) > 0 {
			t.Errorf("SEAL-ABOVE-PACK: %s", f[0].Message)
		}
		// Reamed to 18 in below the shoe, the pack's ring reaches out to
		// 9 in, under the cement: the cement then rests on the pack.
		reamed := strings.Replace(nowaiver, "diameter = 15.0", "diameter = 18.0", 1)
		f := check(t, reamed)["SEAL-ABOVE-PACK"]
		if len(f) != 1 || !strings.Contains(f[0].Message, "rests directly on the pack (top at 360 ft)") {
			t.Errorf("want the cement on the pack at 360 ft reported, got %v", f)
		}
	})
	t.Run("as built", func(t *testing.T) {
		got := check(t, src)
		for _, id := range []string{"ANNULUS-GAP", "ELEVATION-STICKUP"} {
			if len(got[id]) > 0 {
				t.Errorf("%s: %s", id, got[id][0].Message)
			}
		}
	})
	t.Run("no measuring point named", func(t *testing.T) {
		// The production casing is then the highest pipe top reaching the
		// surface: the liner, 350 ft down, is never the measuring point.
		got := check(t, strings.Replace(src, "[measuring_point]\npipe = \"production\"\n", "", 1))
		if f := got["ELEVATION-STICKUP"]; len(f) > 0 {
			t.Errorf("ELEVATION-STICKUP: %s", f[0].Message)
		}
	})
	t.Run("measuring point elevation off", func(t *testing.T) {
		// 514.30 - 512.30 = 2.0 ft against the casing top 1.5 ft above
		// ground: 0.5 ft apart, beyond the 0.1 ft tolerance.
		got := check(t, strings.Replace(src, "measuring_point = 513.80", "measuring_point = 514.30", 1))
		f := got["ELEVATION-STICKUP"]
		if len(f) != 1 || !strings.Contains(f[0].Message, "differ by 0.5 ft") || !strings.Contains(f[0].Message, "production casing") {
			t.Errorf("want one finding of 0.5 ft naming the production casing, got %v", f)
		}
	})
	t.Run("hanger without a seal", func(t *testing.T) {
		// A hanger holds the liner but leaves the 10-ft lap open.
		got := check(t, strings.Replace(src, `hanger = "packer"`, `hanger = "hanger"`, 1))
		f := got["ANNULUS-GAP"]
		if len(f) != 1 || !strings.Contains(f[0].Message, "350–360 ft") {
			t.Errorf("want the lap 350–360 ft reported, got %v", f)
		}
	})
	t.Run("hanger with a lap seal", func(t *testing.T) {
		got := check(t, strings.Replace(src, `hanger = "packer"`, "hanger = \"hanger\"\nlap_seal = \"bentonite-grout\"", 1))
		if f := got["ANNULUS-GAP"]; len(f) > 0 {
			t.Errorf("ANNULUS-GAP: %s", f[0].Message)
		}
	})
}
