package schema

import "fmt"

// Exact conversion factors (NIST SP 811, appendix B: the international foot
// and inch are defined exactly).
const (
	MetresPerFoot      = 0.3048
	MillimetresPerInch = 25.4
	// LitresPerUSGallon: 1 US gal = 231 in^3 exactly = 3.785411784 L
	// (NIST Handbook 44, appendix C).
	LitresPerUSGallon = 3.785411784
	// KilogramsPerPound: the avoirdupois pound, exactly 0.45359237 kg
	// (NIST SP 811, appendix B).
	KilogramsPerPound = 0.45359237
)

// Length is a depth, height or thickness along the well, always in metres
// inside the model. Depths are positive below ground surface; a negative
// depth is a height above ground (a casing's stick-up).
type Length float64

// Diameter is a diameter, wall thickness or slot width, always in
// millimetres inside the model.
type Diameter float64

// Volume is always in cubic metres inside the model.
type Volume float64

// Mass is always in kilograms inside the model.
type Mass float64

// DepthUnit is the unit a well file writes depths, elevations and lengths in.
type DepthUnit string

// DiameterUnit is the unit a well file writes diameters and slot widths in.
type DiameterUnit string

// MassUnit is the unit a well file writes bag masses in.
type MassUnit string

// VolumeUnit is the unit a well file writes placed volumes and yields in.
type VolumeUnit string

const (
	Feet   DepthUnit = "ft"
	Metres DepthUnit = "m"

	Inches      DiameterUnit = "in"
	Millimetres DiameterUnit = "mm"

	Pounds    MassUnit = "lb"
	Kilograms MassUnit = "kg"

	CubicFeet   VolumeUnit = "ft3"
	USGallons   VolumeUnit = "gal"
	Litres      VolumeUnit = "L"
	CubicMetres VolumeUnit = "m3"
)

// Units are declared once per file in its [units] table.
type Units struct {
	Depth    DepthUnit
	Diameter DiameterUnit
	Mass     MassUnit
	Volume   VolumeUnit
}

// Imperial reports whether depths are in feet (the report and the
// quantities then use feet, US gallons and pounds).
func (u Units) Imperial() bool { return u.Depth == Feet }

// DefaultUnits completes a partial [units] table from its depth unit: a
// file in feet defaults to inches, pounds and cubic feet; one in metres to
// millimetres, kilograms and litres.
func DefaultUnits(depth DepthUnit) Units {
	if depth == Metres {
		return Units{Depth: Metres, Diameter: Millimetres, Mass: Kilograms, Volume: Litres}
	}
	return Units{Depth: Feet, Diameter: Inches, Mass: Pounds, Volume: CubicFeet}
}

// LengthFrom converts a value written in u to metres.
func LengthFrom(v float64, u DepthUnit) Length {
	if u == Feet {
		return Length(v * MetresPerFoot)
	}
	return Length(v)
}

// In converts a length to u.
func (l Length) In(u DepthUnit) float64 {
	if u == Feet {
		return float64(l) / MetresPerFoot
	}
	return float64(l)
}

// Feet is the length in feet.
func (l Length) Feet() float64 { return float64(l) / MetresPerFoot }

// DiameterFrom converts a value written in u to millimetres.
func DiameterFrom(v float64, u DiameterUnit) Diameter {
	if u == Inches {
		return Diameter(v * MillimetresPerInch)
	}
	return Diameter(v)
}

// In converts a diameter to u.
func (d Diameter) In(u DiameterUnit) float64 {
	if u == Inches {
		return float64(d) / MillimetresPerInch
	}
	return float64(d)
}

// Inches is the diameter in inches.
func (d Diameter) Inches() float64 { return float64(d) / MillimetresPerInch }

// Metres is the diameter in metres, for area and volume arithmetic.
func (d Diameter) Metres() float64 { return float64(d) / 1000 }

// VolumeFrom converts a value written in u to cubic metres.
func VolumeFrom(v float64, u VolumeUnit) Volume {
	switch u {
	case CubicFeet:
		return Volume(v * MetresPerFoot * MetresPerFoot * MetresPerFoot)
	case USGallons:
		return Volume(v * LitresPerUSGallon / 1000)
	case Litres:
		return Volume(v / 1000)
	default:
		return Volume(v)
	}
}

// Symbol is the unit as a reader sees it: "ft³" and "m³" with their
// superscript (the well file and the machine outputs write "ft3", "m3").
func (u VolumeUnit) Symbol() string {
	switch u {
	case CubicFeet:
		return "ft³"
	case CubicMetres:
		return "m³"
	}
	return string(u)
}

// In converts a volume to u.
func (v Volume) In(u VolumeUnit) float64 {
	switch u {
	case CubicFeet:
		return float64(v) / (MetresPerFoot * MetresPerFoot * MetresPerFoot)
	case USGallons:
		return float64(v) * 1000 / LitresPerUSGallon
	case Litres:
		return float64(v) * 1000
	default:
		return float64(v)
	}
}

// MassFrom converts a value written in u to kilograms.
func MassFrom(v float64, u MassUnit) Mass {
	if u == Pounds {
		return Mass(v * KilogramsPerPound)
	}
	return Mass(v)
}

// In converts a mass to u.
func (m Mass) In(u MassUnit) float64 {
	if u == Pounds {
		return float64(m) / KilogramsPerPound
	}
	return float64(m)
}

// FormatDepth writes a depth in the file's unit, for messages and labels.
func (u Units) FormatDepth(l Length) string {
	return fmt.Sprintf("%s %s", trimFloat(l.In(u.Depth), 2), u.Depth)
}

// FormatDiameter writes a diameter in the file's unit.
func (u Units) FormatDiameter(d Diameter) string {
	digits := 3
	if u.Diameter == Millimetres {
		digits = 1
	}
	return fmt.Sprintf("%s %s", trimFloat(d.In(u.Diameter), digits), u.Diameter)
}

// FormatInterval writes "top–bottom unit".
func (u Units) FormatInterval(top, bottom Length) string {
	return fmt.Sprintf("%s–%s %s", trimFloat(top.In(u.Depth), 2), trimFloat(bottom.In(u.Depth), 2), u.Depth)
}

// trimFloat formats v with at most digits decimals and no trailing zeros.
func trimFloat(v float64, digits int) string {
	s := fmt.Sprintf("%.*f", digits, v)
	if digits == 0 {
		return s
	}
	for s[len(s)-1] == '0' {
		s = s[:len(s)-1]
	}
	if s[len(s)-1] == '.' {
		s = s[:len(s)-1]
	}
	if s == "-0" {
		s = "0"
	}
	return s
}

// TrimFloat is trimFloat for other packages: v with at most digits
// decimals and no trailing zeros.
func TrimFloat(v float64, digits int) string { return trimFloat(v, digits) }
