package quantity

import (
	"testing"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"github.com/tremie-dev/tremie/schema"
)

// typical is a monitoring well in feet: 8.25-in hole to 40 ft, 2-in Sch 40
// PVC riser to 30 ft and screen to 40 ft; pack 28-40 ft, chips 25-28 ft,
// neat-cement grout 0-25 ft.
func typical() *schema.Well {
	w := imperial()
	w.TotalDepth = ft(40)
	hole(w, 0, ft(40), in(8.25))
	str(w, "main", ft(-2.5), ft(30), ft(40), sch40Two)
	pack := fill(ft(28), ft(40), schema.FilterPack)
	pack.Bags = 5
	pack.Tags = []schema.Tag{{AfterBags: 3, Depth: ft(35)}, {AfterBags: 5, Depth: ft(33)}}
	chips := fill(ft(25), ft(28), schema.BentoniteChips)
	chips.Bags = 2
	grout := fill(0, ft(25), schema.NeatCement)
	grout.Placed = schema.VolumeFrom(9, schema.CubicFeet)
	w.Fills = []schema.Fill{pack, chips, grout}
	return w
}

// By hand, with the worked annulus 0.34046 ft2/ft (pi/4 (8.25^2 -
// 2.375^2) / 144):
//
//	pack 12 ft: 4.0855 ft3 / 0.5 ft3 per bag = 8.17 -> 9 bags; 5 placed =
//	  2.5 ft3, ratio 0.612; after 3 bags (1.5 ft3) the top should be at
//	  40 - 1.5 / 0.34046 = 35.594 ft; after 5, 40 - 2.5 / 0.34046 = 32.657 ft
//	chips 3 ft: 1.0214 ft3 / (50/72 = 0.6944) = 1.471 -> 2 bags; 2 placed
//	  = 1.3889 ft3, ratio 1.360
//	grout 25 ft: 8.5115 ft3 / 1.18 = 7.213 -> 8 sacks; 9 ft3 placed, 1.057
func TestComputeTypical(t *testing.T) {
	r := Compute(typical(), nil)
	if len(r.Rows) != 3 {
		t.Fatalf("%d rows", len(r.Rows))
	}
	pack, chips, grout := r.Rows[0], r.Rows[1], r.Rows[2]
	for _, row := range r.Rows {
		if row.Err != nil {
			t.Fatal(row.Err)
		}
	}
	near(t, "pack ft3", pack.Calculated.In(schema.CubicFeet), 4.0855, 1e-4)
	if pack.BagsNeeded != 9 || chips.BagsNeeded != 2 || grout.BagsNeeded != 8 {
		t.Errorf("bags needed %d %d %d, want 9 2 8", pack.BagsNeeded, chips.BagsNeeded, grout.BagsNeeded)
	}
	near(t, "pack placed ft3", pack.Placed.In(schema.CubicFeet), 2.5, 1e-12)
	near(t, "pack ratio", pack.Ratio, 0.612, 1e-3)
	near(t, "chips ratio", chips.Ratio, 1.360, 1e-3)
	near(t, "grout ratio", grout.Ratio, 1.057, 1e-3)
	if len(pack.Tags) != 2 {
		t.Fatalf("%d tag checks", len(pack.Tags))
	}
	near(t, "expected after 3", pack.Tags[0].Expected.Feet(), 35.594, 1e-4)
	near(t, "expected after 5", pack.Tags[1].Expected.Feet(), 32.657, 1e-4)
	near(t, "tag 1 off ft", pack.Tags[0].Off().Feet(), 35-35.594, 1e-3)
	if grout.BagsPlaced != 0 || !grout.Recorded {
		t.Errorf("grout recorded as volume: %+v", grout)
	}
	// casing volume of the 2-in Sch 40 (ID 2.067 in, ASTM D1785): USGS NFM
	// A4, 0.0408 x 2.067^2 = 0.1743 gal/ft
	if len(r.Pipes) != 2 {
		t.Fatalf("%d pipes", len(r.Pipes))
	}
	near(t, "riser gal/ft", r.Pipes[0].Inside.GallonsPerFoot(), 0.1743, 3e-4)
}

// A planned well has no amounts: every row is an order line.
func TestComputePlanned(t *testing.T) {
	w := typical()
	for i := range w.Fills {
		w.Fills[i].Bags, w.Fills[i].Placed, w.Fills[i].Tags = 0, 0, nil
	}
	for _, row := range Compute(w, nil).Rows {
		if row.Recorded || row.Placed != 0 || row.Ratio != 0 || row.BagsNeeded == 0 {
			t.Errorf("planned row %d: %+v", row.Index, row)
		}
	}
}

// A bad interval carries its error and the others still compute.
func TestComputeBadRow(t *testing.T) {
	w := typical()
	w.Fills = append(w.Fills, fill(ft(40), ft(45), schema.CaveIn))
	r := Compute(w, nil)
	if r.Rows[3].Err == nil || r.Rows[3].Calculated != 0 {
		t.Errorf("fill below the hole: %+v", r.Rows[3])
	}
	if r.Rows[0].Err != nil || r.Rows[0].BagsNeeded != 9 {
		t.Errorf("good row spoiled: %+v", r.Rows[0])
	}
	// an empty well computes to nothing, without a panic
	if e := Compute(&schema.Well{}, nil); len(e.Rows) != 0 {
		t.Errorf("empty well rows %d", len(e.Rows))
	}
}

func TestBagsUp(t *testing.T) {
	for _, c := range []struct {
		n    float64
		want int
	}{{0, 0}, {0.1, 1}, {8.17, 9}, {10, 10}, {10.0000000001, 10}, {10.01, 11}} {
		if got := bagsUp(c.n); got != c.want {
			t.Errorf("bagsUp(%v) = %d, want %d", c.n, got, c.want)
		}
	}
}

func TestFormat(t *testing.T) {
	w := imperial()
	v := schema.VolumeFrom(1, schema.CubicFeet)
	// 1 ft3 = 7.48052 US gal (NIST Handbook 44)
	if got := FormatVolume(v, w.Units); got != "1.000 ft³ (7.481 gal)" {
		t.Errorf("imperial: %q", got)
	}
	// 1 ft3 = 0.3048^3 m3 = 28.317 L
	if got := FormatVolume(v, metric().Units); got != "28.32 L (0.028 m³)" {
		t.Errorf("metric: %q", got)
	}
	if got := FormatBag(schema.MassFrom(50, schema.Pounds), w.Units); got != "50-lb bag" {
		t.Errorf("bag: %q", got)
	}
}

// TestUnitTypography: what a person reads writes units as a drafter does,
// powers as superscripts (ft³, m³) and a count of bags with the
// multiplication cross, never "ft3" or "5 x 50-lb bag" (NIST SP 811,
// Guide for the Use of the SI, 2008: unit symbols with exponents, and the
// cross for multiplying numbers; from memory for the section numbers).
func TestUnitTypography(t *testing.T) {
	w, m := imperial(), metric()
	y := Yield{Volume: schema.VolumeFrom(0.5, schema.CubicFeet), BagMass: schema.MassFrom(50, schema.Pounds), Basis: CommonPractice}
	for _, c := range []struct{ got, want string }{
		{FormatYield(y, w.Units), "0.500 ft³ per 50-lb bag (common practice)"},
		// 1 m3 = 1000 L (SI definition of the litre)
		{FormatVolume(schema.VolumeFrom(1, schema.CubicMetres), m.Units), "1000.0 L (1.000 m³)"},
		{FormatBags(5, schema.MassFrom(50, schema.Pounds), w.Units), "5 × 50-lb bags"},
		{FormatBags(1, schema.MassFrom(25, schema.Kilograms), m.Units), "1 × 25-kg bag"},
		{FormatBags(2.5, 0, w.Units), "2.5 bags"},
		{schema.CubicFeet.Symbol() + " " + schema.CubicMetres.Symbol() + " " + schema.Litres.Symbol() + " " + schema.USGallons.Symbol(), "ft³ m³ L gal"},
	} {
		if c.got != c.want {
			t.Errorf("got %q, want %q", c.got, c.want)
		}
	}
}

// BenchmarkCompute: one typical well, the demo's MW-1 (five fills, two
// tags, a riser and a screen in an 8.25-in hole).
func BenchmarkCompute(b *testing.B) {
	data, err := demo.FS.ReadFile("wells/MW-1.toml")
	if err != nil {
		b.Fatal(err)
	}
	w, err := schema.Load("MW-1.toml", data)
	if err != nil {
		b.Fatal(err)
	}
	y := DefaultYields()
	b.ReportAllocs()
	for b.Loop() {
		Compute(w, y)
	}
}
