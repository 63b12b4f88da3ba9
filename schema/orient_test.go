package schema

import (
	"math"
	"strings"
	"testing"
)

func nearly(t *testing.T, what string, got, want, tol float64) {
	t.Helper()
	if math.Abs(got-want) > tol {
		t.Errorf("%s = %.6f, want %.6f (±%g)", what, got, want, tol)
	}
}

// Dip from the height of a trace: dip = arctan(h / d), Crain's
// Petrophysical Handbook, "Finding formation dip from image logs".
// arctan 0.5 = 26.5651° and arctan 1 = 45° are trigonometric-table values.
func TestDipFromTrace(t *testing.T) {
	in := func(v float64) Length { return LengthFrom(v/12, Feet) }
	nearly(t, "3-in trace on a 6-in hole", DipFromTrace(in(3), DiameterFrom(6, Inches)), 26.5651, 5e-5)
	nearly(t, "h = d", DipFromTrace(in(6), DiameterFrom(6, Inches)), 45, 1e-9)
	// The same trace measured in millimetres (76.2 mm on 152.4 mm).
	nearly(t, "metric", DipFromTrace(LengthFrom(0.0762, Metres), DiameterFrom(152.4, Millimetres)), 26.5651, 5e-5)
	nearly(t, "metric = imperial", DipFromTrace(LengthFrom(0.0762, Metres), DiameterFrom(152.4, Millimetres)), DipFromTrace(in(3), DiameterFrom(6, Inches)), 1e-9)
	nearly(t, "level trace", DipFromTrace(0, DiameterFrom(6, Inches)), 0, 0)
}

// A sinusoid sampled at known points comes back exactly; the curve
// z = 30 + 0.2·cos(θ − 135°) is written out here, not by the fit's code.
func TestFitSinusoidExact(t *testing.T) {
	var pts []TracePoint
	for az := 10.0; az < 360; az += 50 {
		z := 30 + 0.2*math.Cos((az-135)*math.Pi/180)
		pts = append(pts, TracePoint{Azimuth: az, Depth: Length(z)})
	}
	s, err := FitSinusoid(pts)
	if err != nil {
		t.Fatal(err)
	}
	nearly(t, "centre", s.A, 30, 1e-9)
	nearly(t, "amplitude", s.Amplitude(), 0.2, 1e-9)
	nearly(t, "trough azimuth", s.TroughAzimuth(), 135, 1e-7)
	nearly(t, "residual", s.Residual, 0, 1e-9)

	// Three points fix it too.
	s3, err := FitSinusoid([]TracePoint{{0, Length(30 + 0.2*math.Cos(-135*math.Pi/180))}, {135, 30.2}, {270, Length(30 + 0.2*math.Cos(135*math.Pi/180))}})
	if err != nil {
		t.Fatal(err)
	}
	nearly(t, "3-point amplitude", s3.Amplitude(), 0.2, 1e-9)
	nearly(t, "3-point trough", s3.TroughAzimuth(), 135, 1e-7)
}

// With noise of up to ±5 mm on a 0.2 m amplitude, 36 points recover the
// amplitude within 3 mm and the trough within 2° (our tolerance, about
// twice the standard error of a 36-point fit: σ·√(2/n) ≈ 1.4 mm).
func TestFitSinusoidNoise(t *testing.T) {
	var pts []TracePoint
	seed := uint32(12345)
	for i := range 36 {
		az := float64(i) * 10
		seed = seed*1664525 + 1013904223 // Numerical Recipes' quick generator
		noise := (float64(seed>>8)/float64(1<<24) - 0.5) * 0.010
		z := 12 + 0.2*math.Cos((az-300)*math.Pi/180) + noise
		pts = append(pts, TracePoint{Azimuth: az, Depth: Length(z)})
	}
	s, err := FitSinusoid(pts)
	if err != nil {
		t.Fatal(err)
	}
	nearly(t, "amplitude", s.Amplitude(), 0.2, 0.003)
	nearly(t, "trough azimuth", s.TroughAzimuth(), 300, 2)
	if s.Residual <= 0 || s.Residual > 0.005 {
		t.Errorf("residual %v: want the noise's RMS, between 0 and 5 mm", s.Residual)
	}
}

func TestFitSinusoidDegenerate(t *testing.T) {
	_, err := FitSinusoid([]TracePoint{{90, 1}, {90, 1.1}, {90, 1.2}, {90.000001, 1}})
	if err == nil {
		t.Fatal("points at one azimuth must not fit")
	}
	if _, err := FitSinusoid([]TracePoint{{0, 1}, {180, 1.2}}); err == nil {
		t.Fatal("two points must not fit")
	}
}

// Strike by the right-hand rule, worked examples: a plane dipping 45°
// toward 090 is 000/45 (structuralgeology.org, "Recording planes with
// strike or dip? The problem of the right-hand rules", 2009: "looking to
// the strike direction, the bed dips to the right ... 000/45"); the
// same rule in Ragan, Structural Geology: An Introduction to Geometrical
// Techniques, 4th ed., ch. 1 (from memory): a plane striking 030 dips to
// the south-east, toward 120; one dipping toward 315 strikes 225.
func TestStrikeRightHandRule(t *testing.T) {
	for _, c := range []struct{ dipDir, strike float64 }{{90, 0}, {120, 30}, {315, 225}, {0, 270}, {45, 315}} {
		nearly(t, "strike of dip direction "+TrimFloat(c.dipDir, 0), StrikeRHR(c.dipDir), c.strike, 1e-12)
	}
}

// The pole of a plane plunges 90° − dip, opposite the dip direction
// (Fossen, Structural Geology, 2nd ed., §3, from memory: a bed 30°→090
// has its pole at 60°→270).
func TestPole(t *testing.T) {
	tr, pl := Pole(Attitude{Dip: 30, DipDirection: 90})
	nearly(t, "trend", tr, 270, 1e-12)
	nearly(t, "plunge", pl, 60, 1e-12)
	tr, _ = Pole(Attitude{Dip: 80, DipDirection: 200})
	nearly(t, "trend wraps", tr, 20, 1e-12)
}

func TestPlaneAngle(t *testing.T) {
	nearly(t, "same plane", PlaneAngle(Attitude{40, 10}, Attitude{40, 10}), 0, 1e-6)
	// Two planes dipping 30° toward opposite azimuths meet at 60°.
	nearly(t, "opposite dips", PlaneAngle(Attitude{30, 0}, Attitude{30, 180}), 60, 1e-9)
	// A vertical plane is the same plane seen from either side.
	nearly(t, "vertical both ways", PlaneAngle(Attitude{90, 45}, Attitude{90, 225}), 0, 1e-6)
}

const featureWell = `[units]
depth = "ft"
diameter = "in"
[well]
id = "F-1"
purpose = "domestic"
total_depth = 100
[orientation]
north = "magnetic"
declination = -12
[[borehole]]
top = 0
bottom = 100
diameter = 6
[[wall_image]]
name = "optical"
file = "f1.png"
top = 40
bottom = 100
[[feature]]
kind = "fracture"
trace_high = 60.0
trace_low = 60.5
low_azimuth = 100
image = "optical"
[[feature]]
kind = "foliation"
depth = 70
dip = 20
dip_direction = 350
[[feature]]
kind = "vein"
points = [[0, 80.25], [90, 80.5], [180, 80.25], [270, 80.0]]
caliper = 6.2
`

func TestLoadFeatures(t *testing.T) {
	w, err := Load("f.toml", []byte(featureWell))
	if err != nil {
		t.Fatal(err)
	}
	if len(w.Features) != 3 || len(w.WallImages) != 1 {
		t.Fatalf("features %d images %d", len(w.Features), len(w.WallImages))
	}
	f := w.Features[0]
	// 0.5 ft = 6 in of rise and fall on a 6-in hole: 45°; the low point at
	// magnetic 100 with a declination of 12° west is true 088.
	nearly(t, "dip", f.Orient.Dip, 45, 1e-9)
	nearly(t, "dip direction", f.Orient.DipDirection, 88, 1e-9)
	nearly(t, "strike", f.Orient.Strike, 358, 1e-9)
	nearly(t, "depth", f.Depth.In(Feet), 60.25, 1e-9)
	nearly(t, "pole plunge", f.Orient.PolePlunge, 45, 1e-9)
	if f.Orient.Picked.DiameterFrom != "borehole[0]" {
		t.Errorf("diameter from %q", f.Orient.Picked.DiameterFrom)
	}
	g := w.Features[1]
	nearly(t, "given dip direction to true", g.Orient.DipDirection, 338, 1e-9)
	v := w.Features[2]
	// 0.5 ft (6 in) of rise and fall on the 6.2-in caliper, trough at
	// magnetic 090.
	nearly(t, "vein dip", v.Orient.Dip, math.Atan(6/6.2)*180/math.Pi, 1e-9)
	nearly(t, "vein dip direction", v.Orient.DipDirection, 78, 1e-7)
	if v.Orient.Picked.DiameterFrom != "caliper" {
		t.Errorf("vein diameter from %q", v.Orient.Picked.DiameterFrom)
	}
}

func TestLoadFeatureErrors(t *testing.T) {
	for _, c := range []struct{ add, want string }{
		{"[[feature]]\nkind = \"fracture\"\n", `missing required key "depth"`},
		{"[[feature]]\nkind = \"crack\"\ndepth = 5\n", `kind = "crack" is not one of`},
		{"[[feature]]\nkind = \"fracture\"\ndepth = 5\ndip = 95\ndip_direction = 10\n", "dip 95 is outside 0..90"},
		{"[[feature]]\nkind = \"fracture\"\ntrace_high = 5\ntrace_low = 4\nlow_azimuth = 10\n", "trace_low = 4 is above trace_high = 5"},
		{"[[feature]]\nkind = \"fracture\"\npoints = [[10, 5], [10, 5.1], [10, 5.2]]\n", "three or more different azimuths"},
		{"[[feature]]\nkind = \"fracture\"\npoints = [[10, 5], [100, 5.1]]\n", "give 3 to 360"},
		{"[[feature]]\nkind = \"fracture\"\ntrace_high = 150\ntrace_low = 151\nlow_azimuth = 10\n", "no [[borehole]] section at 150.5 ft"},
		{"[[feature]]\nkind = \"fracture\"\ndepth = 5\nimage = \"none\"\n", `image = "none" names no [[wall_image]]`},
		{"[[wall_image]]\nfile = \"a.bmp\"\ntop = 1\nbottom = 2\n", "is not a PNG, JPEG or TIFF"},
		{"[orientation]\nnorth = \"magnetic\"\n", "needs the declination"},
	} {
		src := strings.Replace(featureWell, "[orientation]\nnorth = \"magnetic\"\ndeclination = -12\n", "", 1) + c.add
		_, err := Load("f.toml", []byte(src))
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%q: got %v, want %q", c.add, err, c.want)
		}
	}
}
