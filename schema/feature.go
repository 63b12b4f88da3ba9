package schema

import "strings"

// Features of the open-hole wall: fractures, bedding, foliation, veins and
// contacts logged from an unwrapped image of the borehole wall, with their
// orientation given directly or picked on the image as a sinusoid. The
// hole is taken as vertical. The arithmetic is in orient.go.

// FeatureKind is what a logged feature is.
type FeatureKind string

const (
	Fracture             FeatureKind = "fracture"
	OpenFracture         FeatureKind = "open-fracture"
	WaterBearingFracture FeatureKind = "water-bearing-fracture"
	Bedding              FeatureKind = "bedding"
	Foliation            FeatureKind = "foliation"
	Vein                 FeatureKind = "vein"
	Contact              FeatureKind = "contact"
	Cavity               FeatureKind = "cavity"
	BrokenZone           FeatureKind = "broken-zone"
)

// FeatureKinds lists every accepted kind, in the order the docs give them.
var FeatureKinds = []FeatureKind{Fracture, OpenFracture, WaterBearingFracture, Bedding, Foliation, Vein, Contact, Cavity, BrokenZone}

// Confidence is how sure the logger is of a feature.
type Confidence string

const (
	HighConfidence   Confidence = "high"
	MediumConfidence Confidence = "medium"
	LowConfidence    Confidence = "low"
)

// Feature is one planar (or zonal) feature of the wall.
type Feature struct {
	// Depth is the centre of the trace: as written, or, for picks with no
	// depth written, the mean depth of the fitted sinusoid.
	Depth      Length
	Kind       FeatureKind
	Aperture   Diameter // 0 if not recorded
	Inflow     Volume   // volume per minute; 0 if not recorded (see InflowUnit)
	HasInflow  bool
	Confidence Confidence // "" if not given
	Note       string

	// Given is the orientation as written (dip and dip direction in the
	// well's azimuth reference); nil when only picks are given.
	Given *Attitude
	// Picks are the trace as picked on the unwrapped wall image; nil when
	// the orientation is given directly.
	Picks *Picks
	// Caliper overrides the borehole section's diameter at the feature;
	// 0 takes the section's.
	Caliper Diameter
	// Image names the [[wall_image]] the picks were made on ("" for none).
	Image string
	// Orient is the orientation worked out from the above when the file
	// was loaded, azimuths from true north.
	Orient FeatureOrientation

	Pos  Pos
	Path string
}

// IsWaterBearing reports whether the feature yields water: its kind says
// so or an inflow was measured.
func (f Feature) IsWaterBearing() bool {
	return f.Kind == WaterBearingFracture || (f.HasInflow && f.Inflow > 0)
}

// Attitude is a plane's dip (degrees below horizontal, 0–90) and dip
// direction (azimuth of steepest descent, degrees clockwise from north,
// 0–360).
type Attitude struct {
	Dip, DipDirection float64
}

// Picks are a trace picked on the unwrapped image, in one of two forms:
// the depths of its highest and lowest points with the azimuth of the
// lowest (Points nil), or three or more points along it.
type Picks struct {
	High, Low    Length  // depths of the trace's highest and lowest points
	LowAzimuth   float64 // azimuth of the lowest point, degrees
	Points       []TracePoint
	HighLowGiven bool // the first form
}

// TracePoint is one point picked on a trace.
type TracePoint struct {
	Azimuth float64 // degrees clockwise from the hole's north
	Depth   Length
}

// NorthReference is what azimuths in the well file are measured from.
type NorthReference string

const (
	TrueNorth     NorthReference = "true"
	MagneticNorth NorthReference = "magnetic"
)

// Orientation is the azimuth reference of a well's features: true north,
// or magnetic north with the declination (degrees, east positive) that
// turns a magnetic azimuth into a true one.
type Orientation struct {
	North       NorthReference
	Declination float64
	Given       bool // an [orientation] table was written
	Pos         Pos
}

// ToTrue turns an azimuth in the well's reference into one from true
// north, in [0, 360).
func (o Orientation) ToTrue(az float64) float64 {
	if o.North == MagneticNorth {
		az += o.Declination
	}
	return NormAzimuth(az)
}

// WallImage is an unwrapped image of the borehole wall: the file, the
// depths of its top and bottom rows, the azimuth at its left edge and the
// way azimuth runs across it.
type WallImage struct {
	Name string
	File string // as written: relative to the well file
	Interval
	LeftAzimuth float64 // degrees, in the well's azimuth reference
	// Clockwise is true when azimuth grows to the right (N, E, S, W as
	// seen from inside the hole looking out).
	Clockwise bool
	Pos       Pos
	Path      string
}

// AzimuthAt is the azimuth (in the well's reference) at fraction u of
// the image's width, u in [0, 1].
func (im WallImage) AzimuthAt(u float64) float64 {
	if im.Clockwise {
		return NormAzimuth(im.LeftAzimuth + 360*u)
	}
	return NormAzimuth(im.LeftAzimuth - 360*u)
}

// ColumnOf is the fraction of the width at which an azimuth falls, in
// [0, 1).
func (im WallImage) ColumnOf(az float64) float64 {
	d := az - im.LeftAzimuth
	if !im.Clockwise {
		d = -d
	}
	return NormAzimuth(d) / 360
}

// WallImageNamed returns the wall image of that name, or false.
func (w *Well) WallImageNamed(name string) (WallImage, bool) {
	for _, im := range w.WallImages {
		if im.Name == name {
			return im, true
		}
	}
	return WallImage{}, false
}

// Label is the kind in words: "water-bearing fracture", "broken zone".
func (k FeatureKind) Label() string {
	return strings.Replace(strings.ReplaceAll(string(k), "-", " "), "water bearing", "water-bearing", 1)
}

// InflowUnit is the volume unit of an inflow per minute in a file: US
// gallons (gpm) with depths in feet, litres (L/min) with metres, the
// units drillers report yields in.
func InflowUnit(u Units) (VolumeUnit, string) {
	if u.Imperial() {
		return USGallons, "gpm"
	}
	return Litres, "L/min"
}

// Span is the depth range of the picked points.
func (pk *Picks) Span() (top, bot Length) {
	if pk.HighLowGiven || len(pk.Points) == 0 {
		return pk.High, pk.Low
	}
	top, bot = pk.Points[0].Depth, pk.Points[0].Depth
	for _, q := range pk.Points[1:] {
		top, bot = min(top, q.Depth), max(bot, q.Depth)
	}
	return top, bot
}
