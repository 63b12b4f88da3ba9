package quantity

import (
	"math"

	"github.com/tremie-dev/tremie/schema"
)

// EntranceVelocityLimit is the largest velocity at which water should
// enter a supply well's screen, in m/s: 0.1 ft/s (3 cm/s), F. G. Driscoll,
// Groundwater and Wells (2nd ed., 1986), chapter 13 (screen selection);
// British Columbia's Guidelines for Minimum Standards in Water Well
// Construction (1982), appendix 2, give the same 0.1 ft/s.
const EntranceVelocityLimit = 0.1 * schema.MetresPerFoot

// EntranceVelocityLimitMetric is the limit's round metric figure, 3 cm/s
// (1.6 % under 0.1 ft/s), in m/s: the default of a well in metres.
const EntranceVelocityLimitMetric = 0.03

// EntranceLimit is the entrance-velocity limit for a well's units, m/s.
func EntranceLimit(u schema.Units) float64 {
	if u.Imperial() {
		return EntranceVelocityLimit
	}
	return EntranceVelocityLimitMetric
}

// OpenAreaIn is a screen open area (m2) in the unit a well's reports give
// it in, with the unit's name: ft² for a file in feet, m² for one in
// metres.
func OpenAreaIn(a float64, u schema.Units) (float64, string) {
	if u.Imperial() {
		return a / (schema.MetresPerFoot * schema.MetresPerFoot), "ft²"
	}
	return a, "m²"
}

// VelocityIn is an entrance velocity (m/s) in the unit a well's reports
// give it in, with the unit's name: ft/s for a file in feet, cm/s (the
// unit of the 3 cm/s limit) for one in metres.
func VelocityIn(v float64, u schema.Units) (float64, string) {
	if u.Imperial() {
		return v / schema.MetresPerFoot, "ft/s"
	}
	return v * 100, "cm/s"
}

// EffectiveOpenFraction is the share of a screen's open area that passes
// water once the pack grains lie against it: about half (Driscoll,
// Groundwater and Wells, chapter 13; from memory).
const EffectiveOpenFraction = 0.5

// ScreenFlow is the arithmetic of a supply well's screens at its pumping
// rate, SI units.
type ScreenFlow struct {
	OpenArea  float64 // m2: outer surface x open fraction, every screen
	Effective float64 // m2: OpenArea x EffectiveOpenFraction
	// Capacity is the rate the screens transmit at EntranceLimit
	// through the effective open area, m3/s.
	Capacity float64
	Rate     float64 // m3/s: the design rate, else the tested one
	Design   bool    // Rate is the design rate
	Velocity float64 // m/s: Rate / Effective
}

// Entrance works out the screens' open area, transmitting capacity and
// entrance velocity; false unless the well records a pumping rate and
// every screen its open area.
func Entrance(w *schema.Well) (ScreenFlow, bool) {
	pt := w.PumpingTest
	if pt == nil || (pt.Rate <= 0 && pt.DesignRate <= 0) {
		return ScreenFlow{}, false
	}
	var f ScreenFlow
	scr := w.Screens()
	if len(scr) == 0 {
		return ScreenFlow{}, false
	}
	for _, s := range scr {
		sec := s.Section
		if sec.OpenArea <= 0 || sec.Pipe.OD <= 0 {
			return ScreenFlow{}, false
		}
		f.OpenArea += math.Pi * sec.Pipe.OD.Metres() * float64(sec.Thickness()) * sec.OpenArea
	}
	f.Effective = f.OpenArea * EffectiveOpenFraction
	f.Capacity = f.Effective * EntranceLimit(w.Units)
	f.Rate, f.Design = pt.DesignRate, true
	if f.Rate <= 0 {
		f.Rate, f.Design = pt.Rate, false
	}
	if f.Effective > 0 {
		f.Velocity = f.Rate / f.Effective
	}
	return f, true
}
