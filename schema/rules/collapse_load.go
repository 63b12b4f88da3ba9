package rules

import (
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

func init() {
	register(&Rule{
		ID:    "COLLAPSE-LOAD",
		Title: "A grout column does not load PVC casing beyond its collapse rating",
		Doc: "While a grout sets, its column presses on the casing like a heavy fluid. Where a column of " +
			"grout (contiguous neat cement, cement-bentonite, sand-cement or bentonite grout in one annulus) " +
			"reaches below the set depth against PVC casing, its pressure (each slurry's density, the " +
			"mud-balance reading else its mix's, times its height) less the water standing inside the " +
			"casing where the fill states its level (water_inside; else the casing is taken as empty, the " +
			"worst case) must not exceed the set fraction of the casing's rated collapse pressure, worked " +
			"from its dimension ratio by the formula of ASTM F480. Cement's heat of hydration weakens PVC " +
			"further, and slots weaken a screen; the rating, for blank pipe at room temperature, includes neither. " +
			"Steel casing is not rated here.",
		Severity: Warning,
		Source:   quantity.CollapseRatingSource + "; COMAR 26.04.04.17 Table 1 (PVC depth limits by SDR and schedule) agrees with it",
		Params: []Param{{
			Name: "depth", Kind: LengthParam, Default: 3, DefaultFt: 10,
			Doc: "columns reaching deeper than this are checked",
			Source: "ours: 10 ft (3 m); 10 ft of neat cement (8.1 psi) is under the rating of the thinnest F480 casing, " +
				"SDR 41 (14.6 psi by the formula); set the depth below which the local code asks for the check",
		}, {
			Name: "max_fraction", Kind: RatioParam, Default: 1,
			Doc:    "largest differential pressure as a fraction of the rated collapse pressure",
			Source: "common practice: 1, the rating itself (ASTM F480's rating carries no safety factor); set less for a margin",
		}},
		Run: runCollapseLoad,
	})
}

func runCollapseLoad(p *Pass) {
	depth, frac := p.Length("depth"), p.Param("max_fraction")
	for _, c := range quantity.CollapseLoads(p.Well, p.Profile().Yields) {
		if c.Bottom <= depth+eps || c.Differential() <= frac*c.Rating*(1+roundOff) {
			continue
		}
		low := c.Fills[len(c.Fills)-1]
		limit := "its rating"
		if frac != 1 {
			limit = fractionText(frac) + " of its rating"
		}
		p.Reportf(key(low.Path, "bottom"), []schema.Length{c.Top, c.At},
			"the grout column puts %s on %s at %s, %s times %s (%s): %s", quantity.FormatPressure(c.Differential(), p.Well.Units),
			c.Pipe.Label(), p.D(c.At), schema.TrimFloat(c.Fraction(), 2), limit, quantity.FormatPressure(c.Rating, p.Well.Units), c.Describe(p.Well.Units))
	}
}
