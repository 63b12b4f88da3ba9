package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "FEATURE-WATER-BELOW-SHOE",
		Title: "No water-bearing feature just below the casing shoe",
		Doc: "A water-bearing fracture a short way below the casing shoe can join the open hole to the " +
			"shallow water the casing and its grout were set to shut off: the water may run along the " +
			"fracture around the foot of the seal. Such a well wants its casing set deeper or the zone " +
			"grouted; the distance is set per project.",
		Severity: Warning,
		Source:   "common practice: casing is seated in competent rock below the water-bearing weathered zone",
		Params: []Param{{Name: "distance", Kind: LengthParam, Default: 3, DefaultFt: 10,
			Doc: "water-bearing features this far below the casing shoe are flagged", Source: "common practice"}},
		Run: runFeatureWaterBelowShoe,
	})
}

func runFeatureWaterBelowShoe(p *Pass) {
	w := p.Well
	limit := p.Length("distance")
	for i := range w.Features {
		f := &w.Features[i]
		if !f.IsWaterBearing() {
			continue
		}
		var shoe *schema.HolePipe
		for _, q := range w.HolePipes() {
			if q.Bottom <= f.Depth+eps && (shoe == nil || q.Bottom > shoe.Bottom) {
				q := q
				shoe = &q
			}
		}
		if shoe == nil {
			continue
		}
		if gap := f.Depth - shoe.Bottom; gap <= limit+eps {
			p.Reportf(featureKey(w, f), []schema.Length{shoe.Bottom, f.Depth}, "the %s is %s below the foot of %s (%s); water there can reach the seal's foot (limit %s)",
				p.featureName(f), p.D(gap), shoe.Label(), p.D(shoe.Bottom), p.D(limit))
		}
	}
}
