package stereonet

import (
	"math"
	"testing"
)

func near(t *testing.T, what string, got, want, tol float64) {
	t.Helper()
	if math.Abs(got-want) > tol {
		t.Errorf("%s = %.6f, want %.6f", what, got, want)
	}
}

// The equal-area net's radii: a vertical pole at the centre, a horizontal
// one on the primitive, a 45° plunge at √2·sin 22.5° = 0.5412 of the
// radius (trigonometric-table value of sin 22.5° = 0.382683).
func TestEqualAreaRadii(t *testing.T) {
	x, y := EqualArea(Axis{Trend: 123, Plunge: 90})
	near(t, "vertical", math.Hypot(x, y), 0, 1e-12)
	x, y = EqualArea(Axis{Trend: 123, Plunge: 0})
	near(t, "horizontal", math.Hypot(x, y), 1, 1e-12)
	x, y = EqualArea(Axis{Trend: 90, Plunge: 45})
	near(t, "45° plunge", math.Hypot(x, y), 1.414214*0.382683, 1e-5)
	near(t, "45° plunge (0.5412)", math.Hypot(x, y), 0.5412, 5e-5)
	near(t, "east is +x", x, 0.5412, 5e-5)
	near(t, "east has no y", y, 0, 1e-12)
}

// The reference computation: Snyder's general (oblique) Lambert azimuthal
// equal-area formulas (J. P. Snyder, Map Projections: A Working Manual,
// USGS Professional Paper 1395, 1987, eqs. 24-2 to 24-4), centred on the
// nadir (φ1 = −90°), with the axis's latitude −plunge and longitude its
// trend; the sphere's radius 1/√2 makes the primitive radius 1. Its x is
// east and its y north after turning longitude to a compass azimuth.
func TestEqualAreaAgainstSnyder(t *testing.T) {
	snyder := func(a Axis) (x, y float64) {
		R := 1 / math.Sqrt2
		phi1, lam0 := -math.Pi/2, 0.0
		phi := -a.Plunge * math.Pi / 180
		// Compass azimuth θ clockwise from north, seen from above; looking
		// down through the sphere to the lower hemisphere keeps east at +x
		// when longitude is taken as 90° − θ.
		lam := (90 - a.Trend) * math.Pi / 180
		k := math.Sqrt(2 / (1 + math.Sin(phi1)*math.Sin(phi) + math.Cos(phi1)*math.Cos(phi)*math.Cos(lam-lam0)))
		x = R * k * math.Cos(phi) * math.Sin(lam-lam0)
		y = R * k * (math.Cos(phi1)*math.Sin(phi) - math.Sin(phi1)*math.Cos(phi)*math.Cos(lam-lam0))
		// Snyder's x, y for the south-polar aspect: x along λ = 90°, y
		// along λ = 180°; turn them to east and north.
		return y, x
	}
	for _, a := range []Axis{{0, 10}, {30, 20}, {95, 45}, {181, 60}, {270, 5}, {333, 80}, {12.5, 89}} {
		x, y := EqualArea(a)
		sx, sy := snyder(a)
		if math.Hypot(x-sx, y-sy) > 1e-9 {
			t.Errorf("%v: ours (%.6f, %.6f), Snyder (%.6f, %.6f)", a, x, y, sx, sy)
		}
		back := Inverse(x, y)
		near(t, "inverse trend", back.Trend, a.Trend, 1e-9)
		near(t, "inverse plunge", back.Plunge, a.Plunge, 1e-9)
	}
}

// Kamb's counting cone makes the expected count three standard deviations
// (Kamb 1959: E = 3σ for any number of poles), and so do Vollmer's
// smoothed counts. The cone and σ are those of the general-purpose
// mplstereonet library's Kamb counting (its _kamb_radius, 1 − k²/(n + k²),
// and _kamb_units, √(n·r·(1 − r))), and its exponential kernel's
// σ = √(n(f/2 − 1)/f²).
func TestKambCone(t *testing.T) {
	for _, n := range []int{10, 50, 100, 1000} {
		poles := make([]Axis, n)
		for i := range poles {
			poles[i] = Axis{Trend: float64(i * 37 % 360), Plunge: float64(10 + i*13%80)}
		}
		d := Kamb(poles, 4, false)
		near(t, "E/σ", d.Expected/d.Sigma, KambK, 1e-9)
		k2, fn := 9.0, float64(n)
		near(t, "cone (mplstereonet)", d.CosCone, 1-k2/(fn+k2), 1e-12)
		near(t, "σ (mplstereonet)", d.Sigma, math.Sqrt(fn*d.CosCone*(1-d.CosCone)), 1e-12)
		s := Kamb(poles, 4, true)
		f := 2 * (1 + fn/k2)
		near(t, "smoothed E/σ", s.Expected/s.Sigma, KambK, 1e-9)
		near(t, "smoothed σ (mplstereonet)", s.Sigma, math.Sqrt(fn*(f/2-1)/(f*f)), 1e-12)
	}
	// 100 poles: A = 9/109, the cone's half-angle arccos(0.917431) = 23.45°
	// (by calculator).
	d := Kamb(make([]Axis, 100), 2, false)
	near(t, "cone half-angle", math.Acos(d.CosCone)*180/math.Pi, 23.45, 0.005)
}

// A tight cluster is counted whole at its centre and a contour parts it
// from the rest of the net; its antipodal twin on the primitive counts as the same axis.
func TestKambCluster(t *testing.T) {
	var poles []Axis
	for i := range 12 {
		poles = append(poles, Axis{Trend: 300 + float64(i%3), Plunge: 40 + float64(i%4)})
	}
	poles = append(poles, Axis{Trend: 100, Plunge: 0}, Axis{Trend: 280, Plunge: 0}, Axis{Trend: 10, Plunge: 70})
	d := Kamb(poles, 40, true)
	x, y := EqualArea(Axis{Trend: 301, Plunge: 41.5})
	i, j := int(math.Round((x+1)/2*40)), int(math.Round((y+1)/2*40))
	if d.Count[i][j] < 12 {
		t.Errorf("count at the cluster %v, want at least 12", d.Count[i][j])
	}
	lv := d.Levels()
	if len(lv) == 0 {
		t.Fatal("no contour levels for a cluster")
	}
	segs := d.Contour(lv[0])
	if len(segs) < 4 {
		t.Fatalf("%d segments", len(segs))
	}
	// The contour separates the cluster from a direction 90° from it.
	fx, fy := EqualArea(Axis{Trend: 31, Plunge: 0})
	fi, fj := int(math.Round((fx+1)/2*40)), int(math.Round((fy+1)/2*40))
	if !(d.Count[i][j] > lv[0] && d.Count[fi][fj] < lv[0]) {
		t.Errorf("counts %v at the cluster and %v away from it do not straddle the level %v", d.Count[i][j], d.Count[fi][fj], lv[0])
	}
	// A horizontal axis and its opposite are one line.
	e := Kamb([]Axis{{100, 0}, {280, 0}}, 20, false)
	x, y = EqualArea(Axis{100, 0})
	if c := e.Count[int(math.Round((x+1)/2*20))][int(math.Round((y+1)/2*20))]; c != 2 {
		t.Errorf("antipodal axes counted %v times, want 2", c)
	}
}

func TestRoseBins(t *testing.T) {
	b := RoseBins([]float64{0, 9.99, 10, 355, 359.999, 360, -5, 185}, 10)
	if len(b) != 36 || b[0] != 3 || b[1] != 1 || b[35] != 3 || b[18] != 1 {
		t.Errorf("bins %v", b)
	}
}
