package schema

import (
	"errors"
	"fmt"
	"math"
)

// The orientation of a plane crossing a vertical hole. Its trace on the
// unwrapped wall is one period of a sinusoid, depth growing downward:
//
//	z(θ) = a + b·cos θ + c·sin θ = a + A·cos(θ − θd)
//
// with θ the azimuth, A = √(b² + c²) half the peak-to-trough height h and
// θd = atan2(c, b) the azimuth of the deepest point, which is the dip
// direction. Over a hole of diameter d the plane falls h across it, so
// dip = arctan(h / d) (Crain's Petrophysical Handbook, "Finding formation
// dip from image logs").

// FeatureOrientation is what the well file's orientation of a feature
// comes to, azimuths from true north.
type FeatureOrientation struct {
	Attitude            // the given dip when written, else the picks'
	Strike      float64 // right-hand rule: the plane dips to the right looking along it
	PoleTrend   float64 // the lower-hemisphere pole
	PolePlunge  float64
	Given       *Attitude    // as written, turned to true north; nil without
	Picked      *PickedTrace // nil without picks
	Disagree    float64      // degrees between the given and the picked plane (both given)
	HasAttitude bool         // false only for a feature with no orientation at all
}

// PickedTrace is the orientation worked from picks.
type PickedTrace struct {
	Attitude              // true north
	Fit          Sinusoid // in the well's azimuth reference, depths in metres
	Height       Length   // peak to trough
	HoleDiameter Diameter // the d of arctan(h / d)
	DiameterFrom string   // "caliper" or the borehole section's key path
	Points       int      // 2 for the high/low form
}

// Sinusoid is z(θ) = A + B·cos θ + C·sin θ, depths in metres, θ in
// degrees of azimuth; Residual is the root-mean-square misfit of the
// points it was fitted to (0 for an exact fit or the high/low form).
type Sinusoid struct {
	A, B, C  float64
	Residual float64
}

// Amplitude is half the peak-to-trough height.
func (s Sinusoid) Amplitude() float64 { return math.Hypot(s.B, s.C) }

// TroughAzimuth is the azimuth of the deepest point, in [0, 360).
func (s Sinusoid) TroughAzimuth() float64 { return NormAzimuth(deg(math.Atan2(s.C, s.B))) }

// DepthAt is the trace's depth at an azimuth.
func (s Sinusoid) DepthAt(az float64) Length {
	t := rad(az)
	return Length(s.A + s.B*math.Cos(t) + s.C*math.Sin(t))
}

// SinusoidFromHighLow is the sinusoid through a highest and a lowest
// point, the lowest at azimuth lowAz.
func SinusoidFromHighLow(high, low Length, lowAz float64) Sinusoid {
	a := float64(high+low) / 2
	amp := float64(low-high) / 2
	t := rad(lowAz)
	return Sinusoid{A: a, B: amp * math.Cos(t), C: amp * math.Sin(t)}
}

// ErrFewAzimuths is returned by FitSinusoid when the points do not fix a
// sinusoid.
var ErrFewAzimuths = errors.New("the points must lie at three or more different azimuths, spread around the hole")

// FitSinusoid fits z(θ) = a + b·cos θ + c·sin θ to three or more points
// by least squares (the normal equations, solved by Cramer's rule: a 3×3
// system needs no more).
func FitSinusoid(pts []TracePoint) (Sinusoid, error) {
	if len(pts) < 3 {
		return Sinusoid{}, fmt.Errorf("%d points: %w", len(pts), ErrFewAzimuths)
	}
	// Centre depths on their mean so that the sums stay well scaled.
	var mean float64
	for _, p := range pts {
		mean += float64(p.Depth)
	}
	mean /= float64(len(pts))
	var m [3][3]float64
	var v [3]float64
	for _, p := range pts {
		t := rad(p.Azimuth)
		row := [3]float64{1, math.Cos(t), math.Sin(t)}
		z := float64(p.Depth) - mean
		for i := range 3 {
			for j := range 3 {
				m[i][j] += row[i] * row[j]
			}
			v[i] += row[i] * z
		}
	}
	det := det3(m)
	// The determinant of the normal matrix is n³/4 for points evenly
	// spread; far below that (a millionth of it: common practice for a
	// near-singular 3x3 system), the azimuths do not fix the curve.
	n := float64(len(pts))
	if !(math.Abs(det) > 1e-6*n*n*n) {
		return Sinusoid{}, ErrFewAzimuths
	}
	var sol [3]float64
	for k := range 3 {
		mk := m
		for i := range 3 {
			mk[i][k] = v[i]
		}
		sol[k] = det3(mk) / det
	}
	s := Sinusoid{A: sol[0] + mean, B: sol[1], C: sol[2]}
	var ss float64
	for _, p := range pts {
		r := float64(p.Depth - s.DepthAt(p.Azimuth))
		ss += r * r
	}
	s.Residual = math.Sqrt(ss / n)
	return s, nil
}

func det3(m [3][3]float64) float64 {
	return m[0][0]*(m[1][1]*m[2][2]-m[1][2]*m[2][1]) -
		m[0][1]*(m[1][0]*m[2][2]-m[1][2]*m[2][0]) +
		m[0][2]*(m[1][0]*m[2][1]-m[1][1]*m[2][0])
}

// DipFromTrace is arctan(h / d) in degrees: the dip of a plane whose
// trace rises and falls h across a hole of diameter d.
func DipFromTrace(h Length, d Diameter) float64 {
	return deg(math.Atan2(float64(h), d.Metres()))
}

// StrikeRHR is the strike by the right-hand rule: looking along the
// strike, the plane dips to the right, so strike = dip direction − 90°.
func StrikeRHR(dipDirection float64) float64 { return NormAzimuth(dipDirection - 90) }

// Pole is the trend and plunge of the lower-hemisphere normal of a plane:
// it points away from the dip direction and plunges 90° − dip.
func Pole(a Attitude) (trend, plunge float64) {
	return NormAzimuth(a.DipDirection + 180), 90 - a.Dip
}

// PlaneAngle is the angle between two planes, degrees in [0, 90]: the
// angle between their normals taken as axes.
func PlaneAngle(a, b Attitude) float64 {
	na, nb := normal(a), normal(b)
	dot := math.Abs(na[0]*nb[0] + na[1]*nb[1] + na[2]*nb[2])
	return deg(math.Acos(min(1, dot)))
}

// normal is the plane's unit upward normal (north, east, up).
func normal(a Attitude) [3]float64 {
	d, t := rad(a.Dip), rad(a.DipDirection)
	return [3]float64{math.Sin(d) * math.Cos(t), math.Sin(d) * math.Sin(t), math.Cos(d)}
}

// NormAzimuth brings an azimuth into [0, 360).
func NormAzimuth(az float64) float64 {
	az = math.Mod(az, 360)
	if az < 0 {
		az += 360
	}
	if az >= 360 { // -1e-17 + 360 rounds to 360
		az = 0
	}
	return az
}

func rad(d float64) float64 { return d * math.Pi / 180 }
func deg(r float64) float64 { return r * 180 / math.Pi }

// orient works out a feature's orientation from what the file gives; the
// loader calls it once the boreholes and the azimuth reference are read.
func (w *Well) orient(f *Feature) (FeatureOrientation, error) {
	var o FeatureOrientation
	if f.Given != nil {
		g := Attitude{Dip: f.Given.Dip, DipDirection: w.Orientation.ToTrue(f.Given.DipDirection)}
		o.Given = &g
		o.Attitude, o.HasAttitude = g, true
	}
	if f.Picks != nil {
		pt, err := w.pickedTrace(f)
		if err != nil {
			return o, err
		}
		o.Picked = pt
		if o.Given == nil {
			o.Attitude, o.HasAttitude = pt.Attitude, true
		} else {
			o.Disagree = PlaneAngle(*o.Given, pt.Attitude)
		}
	}
	if o.HasAttitude {
		o.Strike = StrikeRHR(o.DipDirection)
		o.PoleTrend, o.PolePlunge = Pole(o.Attitude)
	}
	return o, nil
}

func (w *Well) pickedTrace(f *Feature) (*PickedTrace, error) {
	p := f.Picks
	pt := &PickedTrace{}
	if p.HighLowGiven {
		pt.Fit = SinusoidFromHighLow(p.High, p.Low, p.LowAzimuth)
		pt.Points = 2
	} else {
		s, err := FitSinusoid(p.Points)
		if err != nil {
			return nil, err
		}
		pt.Fit, pt.Points = s, len(p.Points)
	}
	centre := Length(pt.Fit.A)
	if f.Caliper > 0 {
		pt.HoleDiameter, pt.DiameterFrom = f.Caliper, "caliper"
	} else if b, ok := w.BoreholeAt(centre); ok {
		pt.HoleDiameter, pt.DiameterFrom = b.Diameter, b.Path
	} else {
		return nil, fmt.Errorf("no [[borehole]] section at %s gives the hole diameter for the picks; add one or give caliper", w.Units.FormatDepth(centre))
	}
	pt.Height = Length(2 * pt.Fit.Amplitude())
	pt.Dip = DipFromTrace(pt.Height, pt.HoleDiameter)
	pt.DipDirection = w.Orientation.ToTrue(pt.Fit.TroughAzimuth())
	if pt.Height == 0 {
		pt.DipDirection = 0 // a level trace has no deepest point
	}
	return pt, nil
}

// SetOrientation gives a well whose file wrote no [orientation] its
// project's azimuth reference and works every feature's orientation out
// again (the picks were checked when the file was loaded).
func (w *Well) SetOrientation(o Orientation) {
	w.Orientation = o
	for i := range w.Features {
		if fo, err := w.orient(&w.Features[i]); err == nil {
			w.Features[i].Orient = fo
		}
	}
}
