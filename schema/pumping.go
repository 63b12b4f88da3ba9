package schema

// PumpingTest is a supply well's pumping test, and the rate it is
// designed for. Rates are in cubic metres per second, whatever the file
// wrote (US gal/min in a file in feet, L/s in one in metres).
type PumpingTest struct {
	Rate       float64 // tested rate, m3/s; 0 if not given
	DesignRate float64 // design pumping rate, m3/s; 0 if not given
	Hours      float64 // duration
	Static     Length  // static level before pumping, below ground; 0 if not given
	Pumping    Length  // pumping level at the end, below ground; 0 if not given
	// SpecificCapacity is the rate per unit of drawdown, m3/s per m, as
	// written or worked from the levels; 0 when neither is given.
	SpecificCapacity float64
	Pos              Pos
}

// CubicMetresPerSecondPerGPM is one US gallon per minute in m3/s.
const CubicMetresPerSecondPerGPM = LitresPerUSGallon / 1000 / 60

// FlowFrom converts a rate as written (gal/min in a file in feet, L/s in
// one in metres) to m3/s.
func FlowFrom(v float64, u Units) float64 {
	if u.Imperial() {
		return v * CubicMetresPerSecondPerGPM
	}
	return v / 1000
}

// FlowIn is a rate in m3/s as the file writes it, with the unit's name.
func FlowIn(q float64, u Units) (float64, string) {
	if u.Imperial() {
		return q / CubicMetresPerSecondPerGPM, "gal/min"
	}
	return q * 1000, "L/s"
}

func (r *reader) pumpingTest(t *table, w *Well) *PumpingTest {
	defer t.done()
	u := w.Units
	p := &PumpingTest{Pos: r.at(t.path)}
	if v, ok := t.positive("rate"); ok {
		p.Rate = FlowFrom(v, u)
	}
	if v, ok := t.positive("design_rate"); ok {
		p.DesignRate = FlowFrom(v, u)
	}
	if v, ok := t.positive("duration"); ok {
		p.Hours = v
	}
	if v, ok := t.nonNegative("static_level"); ok {
		p.Static = LengthFrom(v, u.Depth)
	}
	if v, ok := t.positive("pumping_level"); ok {
		p.Pumping = LengthFrom(v, u.Depth)
		if p.Pumping <= p.Static {
			r.errAt(t.keyPath("pumping_level"), "pumping_level = %v is not below the static level", v)
		}
	}
	if v, ok := t.positive("specific_capacity"); ok {
		// gal/min per ft, or L/s per m
		p.SpecificCapacity = FlowFrom(v, u) / float64(LengthFrom(1, u.Depth))
	} else if p.Rate > 0 && p.Pumping > p.Static {
		p.SpecificCapacity = p.Rate / float64(p.Pumping-p.Static)
	}
	return p
}
