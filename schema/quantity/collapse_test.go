package quantity

import (
	"math"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// Maryland's well code, COMAR 26.04.04.17 Table 1, limits the depth of PVC
// well casing (cell class 12454) by SDR and schedule. Each limit is a
// collapse rating over one pressure gradient, so every rating of ours over
// the table's depth must come to the same psi per ft: 0.44 to within 1.5 %
// in every cell but 4-in Sch 40 (400 ft in the table, 364 ft by the
// others' gradient: left out, noted here). Walls are ASTM D1785's
// minimums; SDR pipe has wall OD/SDR.
func TestCollapseRatingAgainstCOMAR(t *testing.T) {
	od := map[string]float64{"2": 2.375, "3": 3.5, "4": 4.5, "5": 5.563, "6": 6.625, "8": 8.625, "10": 10.75, "12": 12.75}
	cells := []struct {
		size   string
		wall   float64 // in; 0 for an SDR cell
		sdr    float64
		limitF float64 // COMAR Table 1, ft
	}{
		{"2", 0, 26, 136}, {"2", 0, 21, 265}, {"2", 0, 17, 517}, {"2", 0, 13.5, 1085},
		// Sch 40 (ASTM D1785 walls)
		{"2", 0.154, 0, 708}, {"3", 0.216, 0, 604}, {"5", 0.258, 0, 242}, {"6", 0.280, 0, 180},
		{"8", 0.322, 0, 125}, {"10", 0.365, 0, 92}, {"12", 0.406, 0, 76},
		// Sch 80
		{"2", 0.218, 0, 2185}, {"3", 0.300, 0, 1730}, {"4", 0.337, 0, 1139}, {"5", 0.375, 0, 807},
		{"6", 0.432, 0, 724}, {"8", 0.500, 0, 498}, {"10", 0.593, 0, 424}, {"12", 0.687, 0, 387},
	}
	for _, c := range cells {
		wall := c.wall
		if c.sdr > 0 {
			wall = od[c.size] / c.sdr
		}
		p, ok := CollapseRating("PVC", in(od[c.size]), in(od[c.size]-2*wall))
		if !ok {
			t.Fatalf("%s in: no rating", c.size)
		}
		if g := p / PsiPa / c.limitF; math.Abs(g/0.44-1) > 0.015 {
			t.Errorf("%s in (wall %.3f in, SDR %v): %.1f psi over COMAR's %.0f ft = %.4f psi/ft, not 0.44", c.size, wall, c.sdr, p/PsiPa, c.limitF, g)
		}
	}
	// SDR 26 by the formula: 2 x 400,000 / (1 - 0.38^2) / 25^3 = 59.84 psi
	p, _ := CollapseRating("PVC", in(4.5), in(4.5-2*4.5/26))
	near(t, "SDR 26 psi", p/PsiPa, 59.84, 5e-4)
	if _, ok := CollapseRating("carbon steel", in(4.5), in(4.0)); ok {
		t.Error("steel rated by the PVC formula")
	}
}

// A stacked column by hand: 2-in Sch 40 PVC (OD 2.375, wall 0.154 in,
// ASTM D1785; rated 311.7 psi) in an 8-in hole, bentonite grout 0-100 ft
// at a measured 9.4 lb/gal over neat cement 100-400 ft at 15.6 lb/gal,
// water inside from 50 ft. One ft of 1 lb/gal slurry presses 12/231 =
// 0.051948 psi (a US gallon is 231 in3, NIST HB 44); water at 62.4
// lb/ft3, 62.4/144 = 0.43333 psi/ft. At 400 ft: outside 0.051948 x (9.4
// x 100 + 15.6 x 300) = 291.95 psi; inside 0.43333 x 350 = 151.67 psi;
// differential 140.28 psi, 0.450 of the rating.
func TestCollapseLoadStacked(t *testing.T) {
	w := imperial()
	hole(w, 0, ft(410), in(8))
	p := sch40Two
	p.Material = "PVC"
	str(w, "main", ft(-2), ft(400), ft(410), p)
	grout := fill(0, ft(100), schema.BentoniteGrout)
	grout.Density = schema.SlurryDensityFrom(9.4, w.Units)
	neat := fill(ft(100), ft(400), schema.NeatCement)
	neat.Density = schema.SlurryDensityFrom(15.6, w.Units)
	neat.WaterInside, neat.HasWaterInside = ft(50), true
	w.Fills = []schema.Fill{grout, neat, fill(ft(400), ft(410), schema.FilterPack)}
	loads := CollapseLoads(w, nil)
	if len(loads) != 1 {
		t.Fatalf("%d loads", len(loads))
	}
	c := loads[0]
	near(t, "outside psi", c.Outside/PsiPa, 291.95, 1e-4)
	near(t, "inside psi", c.Inside/PsiPa, 151.67, 1e-4)
	near(t, "differential psi", c.Differential()/PsiPa, 140.28, 1e-4)
	near(t, "rating psi", c.Rating/PsiPa, 311.7, 5e-4)
	if c.At != ft(400) || len(c.Fills) != 2 || !c.Measured {
		t.Errorf("load at %v of %d fills, measured %v", c.At, len(c.Fills), c.Measured)
	}
	// without the water stated the casing is taken as empty
	w.Fills[1].HasWaterInside = false
	near(t, "empty casing psi", CollapseLoads(w, nil)[0].Differential()/PsiPa, 291.95, 1e-4)
	// steel casing: no rating, no load
	w.Strings[0].Sections[0].Pipe.Material = "carbon steel"
	w.Strings[0].Sections[1].Pipe.Material = "carbon steel"
	if n := len(CollapseLoads(w, nil)); n != 0 {
		t.Errorf("steel casing: %d loads", n)
	}
}

// Reports give pressures in the well's units. One standard atmosphere,
// 101 325 Pa, is 14.695 95 psi and 101.325 kPa (NIST SP 811, appendix B).
func TestPressureIn(t *testing.T) {
	psi, unit := PressureIn(101325, schema.Units{Depth: schema.Feet})
	if unit != "psi" {
		t.Errorf("feet: unit %q, want psi", unit)
	}
	near(t, "1 atm in psi", psi, 14.69595, 1e-6)
	kpa, unit := PressureIn(101325, schema.Units{Depth: schema.Metres})
	if unit != "kPa" {
		t.Errorf("metres: unit %q, want kPa", unit)
	}
	near(t, "1 atm in kPa", kpa, 101.325, 1e-9)
	if got := FormatPressure(101325, schema.Units{Depth: schema.Feet}); got != "14.7 psi" {
		t.Errorf("FormatPressure feet = %q", got)
	}
	if got := FormatPressure(101325, schema.Units{Depth: schema.Metres}); got != "101 kPa" {
		t.Errorf("FormatPressure metres = %q", got)
	}
}
