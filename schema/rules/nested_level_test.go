package rules

import (
	"os"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// A level measured in one string of a nested well is judged against that
// string alone (geometry of the measurement, common practice): the water
// stands in that pipe, so it lies between that riser's top and that
// string's bottom. The gallery's NW-3 has three 1-in strings in one hole
// to 95 ft: S to 34 ft, I to 60 ft, D to 90 ft, each riser 2.5 ft above
// ground.
func TestLevelInNestedString(t *testing.T) {
	data, err := os.ReadFile("../../testdata/gallery/NW-3.toml")
	if err != nil {
		t.Fatal(err)
	}
	levels := func(t *testing.T, extra string) []Finding {
		t.Helper()
		w, err := schema.Load("NW-3.toml", []byte(string(data)+"\n"+extra))
		if err != nil {
			t.Fatal(err)
		}
		var out []Finding
		for _, f := range Check(w, nil) {
			if f.Rule == "WATER-LEVEL-IN-WELL" {
				out = append(out, f)
			}
		}
		return out
	}
	if f := levels(t, ""); len(f) > 0 {
		t.Fatalf("the gallery's levels are flagged: %s", f[0].Message)
	}
	for _, c := range []struct {
		name, level string
		want        string // "" for no finding
		severity    Severity
	}{
		// 40 ft is inside the 95-ft hole but 6 ft below S's bottom (34 ft).
		{"below its string", "string = \"S\"\ndepth = 40.0", "the static water level in S at 40 ft below ground is below the bottom of that string (34 ft)", Error},
		// The same reading of the whole hole lies in the well.
		{"hole level", "depth = 40.0", "", 0},
		// In D (to 90 ft) 40 ft stands in the riser.
		{"in the deep string", "string = \"D\"\ndepth = 40.0", "", 0},
		// 3 ft above ground is 0.5 ft above S's riser top (2.5 ft up).
		{"above its riser", "string = \"S\"\ndepth = -3.0", "the static water level in S at 3 ft above ground is above the top of that string's riser (2.5 ft above ground)", Warning},
		// Measured from S's riser top (no [measuring_point]; the surveyed
		// MP elevation 393.7 ft is 2.5 ft above the 391.2-ft ground):
		// 36.6 ft below the MP is 34.1 ft below ground, 0.1 ft under S.
		{"from the measuring point", "string = \"S\"\nreference = \"measuring-point\"\ndepth = 36.6", "in S at 34.1 ft below ground is below the bottom of that string (34 ft)", Error},
	} {
		t.Run(c.name, func(t *testing.T) {
			got := levels(t, "[[water_level]]\n"+c.level+"\n")
			if c.want == "" {
				if len(got) > 0 {
					t.Errorf("unexpected finding: %s", got[0].Message)
				}
				return
			}
			if len(got) != 1 || !strings.Contains(got[0].Message, c.want) || got[0].Severity != c.severity {
				t.Errorf("want one %v containing %q, got %+v", c.severity, c.want, got)
			}
		})
	}
}
