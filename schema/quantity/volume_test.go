package quantity

import (
	"math"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// NIST Handbook 44, appendix C: 1 US gal = 231 in^3 exactly; 1 ft^3 =
// 7.48052 US gal.
func TestConversions(t *testing.T) {
	gal := schema.VolumeFrom(1, schema.USGallons)
	near(t, "1 gal in in^3", gal.In(schema.CubicFeet)*1728, 231, 1e-12)
	near(t, "1 gal in L", gal.In(schema.Litres), 3.785411784, 1e-12)
	ft3 := schema.VolumeFrom(1, schema.CubicFeet)
	if got := math.Round(ft3.In(schema.USGallons)*1e5) / 1e5; got != 7.48052 {
		t.Errorf("1 ft3 = %.6f gal, want 7.48052", ft3.In(schema.USGallons))
	}
	// A 12-in (0.3048-m) bore holds pi/4 ft3 per ft = 0.785398 ft3/ft =
	// 5.87519 gal/ft (x 7.48052), and pi/4 x 0.3048^2 m2 = 72.966 L/m.
	per := InsideVolumePerLength(pipe(in(12.75), in(12)))
	near(t, "12-in bore ft3/ft", per.CubicFeetPerFoot(), 0.785398, 1e-6)
	near(t, "12-in bore gal/ft", per.GallonsPerFoot(), 5.87519, 1e-5)
	near(t, "12-in bore L/m", per.LitresPerMetre(), 72.966, 1e-4)
}

// USGS National Field Manual for the Collection of Water-Quality Data,
// chapter A4: the casing volume is V = 0.0408 H D^2 US gal (D inches,
// H ft), so the casing-volume factors, US gal per ft by inside diameter,
// to three significant figures: 1-in 0.0408, 2-in 0.163, 4-in 0.653,
// 6-in 1.47, 8-in 2.61.
func TestCasingVolumeFactors(t *testing.T) {
	for _, c := range []struct {
		id   float64
		want float64
	}{{1, 0.0408}, {2, 0.163}, {4, 0.653}, {6, 1.47}, {8, 2.61}} {
		got := InsideVolumePerLength(pipe(in(c.id+0.5), in(c.id))).GallonsPerFoot()
		if sig3(got) != c.want {
			t.Errorf("%g-in casing: %.5f gal/ft, USGS %v to three figures", c.id, got, c.want)
		}
	}
	// Metric equivalent: a 2-in bore is 50.8 mm, pi/4 0.0508^2 m2 = 2.027 L/m.
	got := InsideVolumePerLength(pipe(60, 50.8)).LitresPerMetre()
	near(t, "50.8-mm bore L/m", got, math.Pi/4*0.0508*0.0508*1000, 1e-12)
	near(t, "50.8-mm bore L/m (hand)", got, 2.0268, 1e-4)
}

// Worked annulus: an 8.25-in hole around 2-in Sch 40 PVC (OD 2.375 in,
// ASTM D1785) holds pi/4 (8.25^2 - 2.375^2) / 144 = 0.3405 ft2 per ft =
// 2.547 US gal per ft.
func TestWorkedAnnulus(t *testing.T) {
	w := imperial()
	hole(w, 0, ft(30), in(8.25))
	str(w, "main", ft(-2.5), ft(20), ft(30), sch40Two)
	v, err := AnnularVolume(w, fill(ft(5), ft(15), schema.FilterPack))
	if err != nil {
		t.Fatal(err)
	}
	perFt := v.In(schema.CubicFeet) / 10
	near(t, "ft2 per ft", perFt, 0.3405, 2e-4)
	near(t, "gal per ft", v.In(schema.USGallons)/10, 2.547, 2e-4)

	// The same well written in metres: 8.25 in = 209.55 mm, 2.375 in =
	// 60.325 mm, 10 ft = 3.048 m; pi/4 (0.20955^2 - 0.060325^2) m2 x
	// 3.048 m = 0.09642 m3 = 96.42 L.
	m := metric()
	hole(m, 0, 9.144, 209.55)
	str(m, "main", -0.762, 6.096, 9.144, pipe(60.325, 52.502))
	mv, err := AnnularVolume(m, fill(1.524, 4.572, schema.FilterPack))
	if err != nil {
		t.Fatal(err)
	}
	near(t, "metric L", mv.In(schema.Litres), 96.42, 2e-4)
	near(t, "metric = imperial", float64(mv), float64(v), 1e-9)
}

// A stepped hole: 10-in to 20 ft, 8-in to 40 ft, 2-in Sch 40 riser and
// screen (OD 2.375 in) to 40 ft; a pack from 15 to 35 ft, worked by hand:
//
//	10-in: pi/4 (100 - 5.6406) / 144 = 0.51465 ft2, x  5 ft = 2.5733 ft3
//	 8-in: pi/4 ( 64 - 5.6406) / 144 = 0.31830 ft2, x 15 ft = 4.7745 ft3
//	                                                  total 7.3478 ft3
func TestSteppedHole(t *testing.T) {
	w := imperial()
	hole(w, 0, ft(20), in(10))
	hole(w, ft(20), ft(40), in(8))
	str(w, "main", ft(-2), ft(30), ft(40), sch40Two)
	f := fill(ft(15), ft(35), schema.FilterPack)
	v, err := AnnularVolume(w, f)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "stepped ft3", v.In(schema.CubicFeet), 7.3478, 1e-4)

	// Filling upward from 35 ft: 4 bags x 0.5 ft3 = 2 ft3 rise 2 / 0.31830
	// = 6.283 ft in the 8-in hole, to 28.717 ft. 12 bags = 6 ft3: 4.7745 ft3
	// fill the 8-in part to 20 ft, the other 1.2255 ft3 rise 1.2255 /
	// 0.51465 = 2.381 ft, to 17.619 ft.
	top, ok, err := RiseTop(w, f, schema.VolumeFrom(2, schema.CubicFeet))
	if err != nil || !ok {
		t.Fatal(ok, err)
	}
	near(t, "top after 4 bags", top.Feet(), 28.717, 1e-4)
	top, _, _ = RiseTop(w, f, schema.VolumeFrom(6, schema.CubicFeet))
	near(t, "top after 12 bags", top.Feet(), 17.619, 1e-4)
	// 20 ft3 overflows the interval: the top keeps rising through the 10-in
	// hole above 15 ft (2.5733 + 4.7745 = 7.3478 ft3 up to 15 ft, then 12.652
	// / 0.51465 = 24.58 ft more, past ground), so it stops at ground.
	top, ok, _ = RiseTop(w, f, schema.VolumeFrom(20, schema.CubicFeet))
	if ok || top != 0 {
		t.Errorf("20 ft3: top %.3f ft, reached %v; want ground, not reached", top.Feet(), ok)
	}
	// The rise of the whole calculated volume is the interval's top.
	top, ok, _ = RiseTop(w, f, v)
	if !ok {
		t.Fatal("calculated volume did not fit")
	}
	near(t, "top after calculated volume", top.Feet(), 15, 1e-9)
}

// A nested pair in one 10-in hole: 2-in Sch 40 (OD 2.375 in) to 50 ft and
// 1-in Sch 40 (OD 1.315 in, ASTM D1785) to 30 ft; a fill from 20 to 40 ft:
//
//	20-30 ft, both:  pi/4 (100 - 5.6406 - 1.7292) / 144 = 0.50522 ft2 x 10
//	30-40 ft, one:   pi/4 (100 - 5.6406) / 144          = 0.51465 ft2 x 10
//	                                                 total 10.1987 ft3
func TestNestedPair(t *testing.T) {
	w := imperial()
	hole(w, 0, ft(50), in(10))
	str(w, "deep", ft(-2), ft(45), ft(50), sch40Two)
	str(w, "shallow", ft(-2), ft(25), ft(30), sch40One)
	v, err := AnnularVolume(w, fill(ft(20), ft(40), schema.FilterPack))
	if err != nil {
		t.Fatal(err)
	}
	near(t, "nested ft3", v.In(schema.CubicFeet), 10.1987, 1e-4)
}

// An outer casing: 8-in Sch 40 steel (OD 8.625 in, ID 7.981 in, ASME
// B36.10) to 20 ft in a 12-in hole, then an 8-in hole to 40 ft with 2-in
// Sch 40 PVC inside to 40 ft.
func TestCasingAndWithin(t *testing.T) {
	w := imperial()
	hole(w, 0, ft(20), in(12))
	hole(w, ft(20), ft(40), in(8))
	w.Casings = []schema.Casing{{Interval: iv(ft(-1), ft(20)), Name: "conductor", Kind: schema.ConductorCasing, Pipe: pipe(in(8.625), in(7.981))}}
	str(w, "main", ft(-2), ft(30), ft(40), sch40Two)

	// Outside the casing the PVC does not count: pi/4 (144 - 74.39) / 144
	// = 0.37966 ft2 x 20 ft = 7.5932 ft3.
	out, err := AnnularVolume(w, fill(0, ft(20), schema.NeatCement))
	if err != nil {
		t.Fatal(err)
	}
	near(t, "outside casing", out.In(schema.CubicFeet), 7.5932, 1e-4)
	// Within the casing: pi/4 (63.696 - 5.6406) / 144 = 0.31664 ft2 x 10.
	in, err := AnnularVolume(w, schema.Fill{Interval: iv(ft(10), ft(20)), Material: schema.BentoniteChips, Within: "conductor"})
	if err != nil {
		t.Fatal(err)
	}
	near(t, "within casing", in.In(schema.CubicFeet), 3.1664, 1e-4)
	// Below the casing the borehole annulus is hole less PVC again.
	below, err := AnnularVolume(w, fill(ft(15), ft(25), schema.BentoniteChips))
	if err != nil {
		t.Fatal(err)
	}
	// 5 ft of pi/4 (144 - 74.3906)/144 = 0.37966 ft2 above the shoe and
	// 5 ft of pi/4 (64 - 5.6406)/144 = 0.31830 ft2 below: 3.4898 ft3
	near(t, "across the casing shoe", below.In(schema.CubicFeet), 3.4898, 1e-4)
	// A fill within the casing that runs past its shoe has no region there.
	_, err = AnnularVolume(w, schema.Fill{Interval: iv(ft(15), ft(25)), Material: schema.BentoniteChips, Within: "conductor"})
	if err == nil || !strings.Contains(err.Error(), "conductor") {
		t.Errorf("within past the shoe: err %v, want one naming the casing", err)
	}
}

// An open-hole interval with no pipe: the full hole, pi/4 6^2/144 =
// 0.19635 ft2 x 10 ft.
func TestOpenHole(t *testing.T) {
	w := imperial()
	hole(w, 0, ft(20), in(10))
	hole(w, ft(20), ft(60), in(6))
	w.Casings = []schema.Casing{{Interval: iv(ft(-2), ft(20)), Name: "surface", Kind: schema.SurfaceCasing, Pipe: pipe(in(6.625), in(6.065))}}
	w.OpenHoles = []schema.OpenHole{{Interval: iv(ft(20), ft(60))}}
	v, err := AnnularVolume(w, fill(ft(50), ft(60), schema.CaveIn))
	if err != nil {
		t.Fatal(err)
	}
	near(t, "open hole ft3", v.In(schema.CubicFeet), 1.9635, 1e-4)
}

// Metric stepped hole, by hand: 250 mm to 3 m, 200 mm to 9 m, 60.3-mm OD
// riser (DN50, ISO 1127 / ASME B36.10 2-in OD 60.3 mm) to 9 m; fill 2-6 m:
//
//	250: pi/4 (0.0625 - 0.003636) = 0.046231 m2 x 1 m = 46.23 L
//	200: pi/4 (0.04   - 0.003636) = 0.028560 m2 x 3 m = 85.68 L
//	                                            total 131.91 L
func TestMetricStepped(t *testing.T) {
	w := metric()
	hole(w, 0, 3, 250)
	hole(w, 3, 9, 200)
	str(w, "main", -0.5, 6, 9, pipe(60.3, 52.5))
	v, err := AnnularVolume(w, fill(2, 6, schema.FilterPack))
	if err != nil {
		t.Fatal(err)
	}
	near(t, "metric stepped L", v.In(schema.Litres), 131.91, 1e-4)
}

// Inconsistent geometry is an error, never a panic or a silent zero.
func TestGeometryErrors(t *testing.T) {
	w := imperial()
	hole(w, 0, ft(10), in(8))
	str(w, "main", ft(-2), ft(15), ft(20), sch40Two)
	cases := map[string]schema.Fill{
		"no borehole": fill(ft(5), ft(20), schema.FilterPack),
		"no casing":   {Interval: iv(0, ft(5)), Material: schema.BentoniteChips, Within: "surface"},
		"upside down": fill(ft(8), ft(2), schema.FilterPack),
	}
	for name, f := range cases {
		if _, err := AnnularVolume(w, f); err == nil {
			t.Errorf("%s: no error", name)
		}
	}
	// a pipe wider than the hole
	n := imperial()
	hole(n, 0, ft(10), in(2))
	str(n, "main", 0, ft(5), ft(10), sch40Two)
	if _, err := AnnularVolume(n, fill(0, ft(10), schema.FilterPack)); err == nil {
		t.Error("2.375-in pipe in a 2-in hole: no error")
	}
	// a pipe with no OD
	z := imperial()
	hole(z, 0, ft(10), in(8))
	str(z, "main", 0, ft(5), ft(10), schema.Pipe{})
	if _, err := AnnularVolume(z, fill(0, ft(10), schema.FilterPack)); err == nil {
		t.Error("pipe without OD: no error")
	}
}

// sig3 rounds to three significant figures.
func sig3(v float64) float64 {
	if v == 0 {
		return 0
	}
	p := math.Pow(10, 2-math.Floor(math.Log10(math.Abs(v))))
	return math.Round(v*p) / p
}
