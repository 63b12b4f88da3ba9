// Package stereonet is the geometry of the lower-hemisphere equal-area
// net (Lambert azimuthal equal-area, polar aspect), Kamb's counting-cone
// density of poles and the rose of directions. It draws nothing itself:
// Net and Rose return draw items for a page.
package stereonet

import "math"

// Axis is a line: trend (azimuth, degrees clockwise from north) and
// plunge (degrees below horizontal, 0–90), as a pole to a plane is given.
type Axis struct{ Trend, Plunge float64 }

// EqualArea projects an axis onto the net of radius 1, lower hemisphere:
// the distance from the centre is √2·sin((90° − plunge)/2), so a vertical
// axis plots at the centre, a horizontal one on the primitive circle and
// equal areas on the sphere stay equal on the net. x is east, y north.
func EqualArea(a Axis) (x, y float64) {
	if a.Plunge < 0 { // an upward axis is the same axis pointing down
		a = Axis{Trend: a.Trend + 180, Plunge: -a.Plunge}
	}
	r := math.Sqrt2 * math.Sin(rad(90-a.Plunge)/2)
	t := rad(a.Trend)
	return r * math.Sin(t), r * math.Cos(t)
}

// Inverse is the axis that projects to (x, y) inside the unit circle.
func Inverse(x, y float64) Axis {
	r := min(math.Hypot(x, y), 1)
	plunge := 90 - deg(2*math.Asin(r/math.Sqrt2))
	trend := deg(math.Atan2(x, y))
	if trend < 0 {
		trend += 360
	}
	return Axis{Trend: trend, Plunge: plunge}
}

// unit is the axis as a unit vector (north, east, down).
func (a Axis) unit() [3]float64 {
	t, p := rad(a.Trend), rad(a.Plunge)
	return [3]float64{math.Cos(p) * math.Cos(t), math.Cos(p) * math.Sin(t), math.Sin(p)}
}

func rad(d float64) float64 { return d * math.Pi / 180 }
func deg(r float64) float64 { return r * 180 / math.Pi }
