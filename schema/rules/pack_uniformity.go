package rules

import (
	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&Rule{
		ID:    "PACK-UNIFORMITY",
		Title: "The filter pack is uniformly graded",
		Doc: "A filter pack should be of nearly one grain size: its uniformity coefficient Cu = d60 / d10 (ASTM " +
			"D2487's definition) small. A widely graded pack packs densely, its fine grains fill the pores " +
			"between the coarse ones, and it segregates as it falls through the annulus. Packs that give both " +
			"d10 and d60 are checked.",
		Severity: Warning,
		Source: "UFGS 02525N (monitoring wells): filter pack uniformity coefficient less than 2.5; Cu = D60/D10 as defined in ASTM D2487. " +
			"Monitoring wells and piezometers only by default, the scope of that specification",
		Purposes: observationWells,
		Params: []Param{{
			Name: "max_cu", Kind: RatioParam, Default: 2.5,
			Doc:    "greatest uniformity coefficient d60/d10 of the pack",
			Source: "UFGS 02525N: below 2.5",
		}},
		Run: runPackUniformity,
	})
}

func runPackUniformity(p *Pass) {
	limit := p.Param("max_cu")
	for i := range p.Well.Fills {
		f := &p.Well.Fills[i]
		if !isFilterPack(f) {
			continue
		}
		cu := schema.UniformityCoefficient(f.D10, f.D60)
		if cu == 0 || cu < limit {
			continue
		}
		p.Reportf(key(f.Path, "d60"), depths(f.Interval),
			"the filter pack at %s has a uniformity coefficient d60/d10 = %s/%s = %s; it should be below %s",
			p.span(f.Interval), schema.TrimFloat(float64(f.D60), 3), schema.TrimFloat(float64(f.D10), 3),
			schema.TrimFloat(cu, 2), schema.TrimFloat(limit, 2))
	}
}
