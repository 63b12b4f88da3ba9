package rules

import (
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// supplyPurposes are the wells pumped for supply: their screens are sized
// for a pumping rate and their water-well standard sets the pad
// (SURFACE-PAD); a monitoring well's pad is left to the local code.
var supplyPurposes = map[schema.Purpose]bool{
	schema.Domestic: true, schema.PublicSupply: true, schema.Industrial: true, schema.Irrigation: true,
}

func init() {
	register(&Rule{
		ID:    "ENTRANCE-VELOCITY",
		Title: "Water enters a supply well's screen slowly enough",
		Doc: "For a supply well (domestic, public-supply, industrial, irrigation) that records a pumping " +
			"rate ([pumping_test] design_rate, else rate) and the open area of every screen, the rate over " +
			"the effective open area (half the screens' open area, the rest blocked by pack grains) must not " +
			"exceed the limit: a faster entrance velocity brings sand, encrustation and head loss.",
		Severity: Warning,
		Source:   "F. G. Driscoll, Groundwater and Wells (2nd ed., 1986), chapter 13: entrance velocity at most 0.1 ft/s (3 cm/s) through the effective open area",
		Params: []Param{{Name: "limit", Kind: VelocityParam, Default: quantity.EntranceVelocityLimitMetric, DefaultFt: 0.1,
			Doc: "largest entrance velocity", Source: "Driscoll (1986), ch. 13, and BC Guidelines (1982): 0.1 ft/s; 3 cm/s for wells in metres (its round metric figure, 1.6 % under)"}},
		Run: runEntranceVelocity,
	})
}

func runEntranceVelocity(p *Pass) {
	w := p.Well
	if !supplyPurposes[w.Purpose] {
		return
	}
	f, ok := quantity.Entrance(w)
	if !ok {
		return
	}
	limit := p.Param("limit") // m/s
	if f.Velocity <= limit*(1+roundOff) {
		return
	}
	rate, unit := schema.FlowIn(f.Rate, w.Units)
	capacity, _ := schema.FlowIn(f.Effective*limit, w.Units)
	which := "tested"
	if f.Design {
		which = "design"
	}
	p.Reportf("pumping_test", nil, "at the %s rate of %s %s water enters the screens at %s, above %s; their effective open area transmits %s %s at that limit",
		which, schema.TrimFloat(rate, 1), unit, velocityText(f.Velocity, w.Units), velocityText(limit, w.Units), schema.TrimFloat(capacity, 1), unit)
}

// velocityText writes a velocity (m/s) in the well's units: ft/s to the
// thousandth in a file in feet, cm/s to the hundredth in one in metres
// (the limit of a well in metres is 3 cm/s).
func velocityText(v float64, u schema.Units) string {
	if u.Imperial() {
		return schema.TrimFloat(v/schema.MetresPerFoot, 3) + " ft/s"
	}
	return schema.TrimFloat(v*100, 2) + " cm/s"
}
