package quantity

import (
	"fmt"
	"math"

	"github.com/tremie-dev/tremie/schema"
)

// VolumeUnits are the units a well's quantities are reported in: cubic
// feet then US gallons for a file in feet, litres then cubic metres for
// one in metres.
func VolumeUnits(u schema.Units) (primary, secondary schema.VolumeUnit) {
	if u.Imperial() {
		return schema.CubicFeet, schema.USGallons
	}
	return schema.Litres, schema.CubicMetres
}

// Number writes a quantity with enough decimals to read a small volume
// and no false precision on a large one.
func Number(v float64) string {
	a := math.Abs(v)
	switch {
	case a < 10:
		return fmt.Sprintf("%.3f", v)
	case a < 1000:
		return fmt.Sprintf("%.2f", v)
	default:
		return fmt.Sprintf("%.1f", v)
	}
}

// FormatVolume writes a volume in the well's two report units:
// "6.228 ft³ (46.59 gal)" or "176.4 L (0.176 m³)".
func FormatVolume(v schema.Volume, u schema.Units) string {
	p, s := VolumeUnits(u)
	return fmt.Sprintf("%s %s (%s %s)", Number(v.In(p)), p.Symbol(), Number(v.In(s)), s.Symbol())
}

// PerLengthIn is a volume per length in the unit a well's reports give
// it in, with the unit's name: US gal/ft for a file in feet, L/m for one
// in metres.
func PerLengthIn(v VolumePerLength, u schema.Units) (float64, string) {
	if u.Imperial() {
		return v.GallonsPerFoot(), "gal/ft"
	}
	return v.LitresPerMetre(), "L/m"
}

// FormatPerLength writes a volume per length: "0.163 gal/ft" for a file
// in feet, "2.027 L/m" for one in metres.
func FormatPerLength(v VolumePerLength, u schema.Units) string {
	n, unit := PerLengthIn(v, u)
	return Number(n) + " " + unit
}

// WaterPerBagIn is a grout's mix water per bag in the unit a well's
// reports give it in, with the unit's name: US gallons for a file in
// feet, litres for one in metres.
func WaterPerBagIn(y Yield, u schema.Units) (float64, string) {
	if u.Imperial() {
		return y.Water.In(schema.USGallons), "gal"
	}
	return y.Water.In(schema.Litres), "L"
}

// MassUnit is the unit bag masses are reported in: the file's, or pounds
// for feet and kilograms for metres.
func MassUnit(u schema.Units) schema.MassUnit {
	if u.Mass != "" {
		return u.Mass
	}
	if u.Imperial() {
		return schema.Pounds
	}
	return schema.Kilograms
}

// FormatBag writes what one bag is: "50-lb bag", "25-kg bag", or "bag"
// when its mass is unknown.
func FormatBag(m schema.Mass, u schema.Units) string {
	if m <= 0 {
		return "bag"
	}
	mu := MassUnit(u)
	return fmt.Sprintf("%s-%s bag", schema.TrimFloat(m.In(mu), 1), mu)
}

// FormatBags writes a count of bags: "5 × 50-lb bags", "1 × 25-kg bag",
// "2.5 bags" when their mass is unknown.
func FormatBags(n float64, m schema.Mass, u schema.Units) string {
	count := schema.TrimFloat(n, 2)
	bag := "bag"
	if m > 0 {
		bag = FormatBag(m, u)
		count += " ×"
	}
	if n != 1 {
		bag += "s"
	}
	return count + " " + bag
}

// FormatYield writes a yield: "0.500 ft³ per 50-lb bag (common practice)".
func FormatYield(y Yield, u schema.Units) string {
	p, _ := VolumeUnits(u)
	return fmt.Sprintf("%s %s per %s (%s)", Number(y.Volume.In(p)), p.Symbol(), FormatBag(y.BagMass, u), y.Basis)
}
