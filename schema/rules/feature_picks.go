package rules

import (
	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&Rule{
		ID:    "FEATURE-DIP-STEEP",
		Title: "Picked traces imply a believable dip",
		Doc: "A trace's height grows as the tangent of the dip: at 80° it is nearly six hole diameters tall " +
			"and a small error in picking its ends moves the dip little but its depth a lot, while a very " +
			"tall pick is more often two features joined. Picks implying a dip steeper than the limit are " +
			"flagged for a second look.",
		Severity: Warning,
		Source:   "common practice",
		Params: []Param{{Name: "max_dip", Kind: RatioParam, Default: 80,
			Doc: "steepest dip, degrees, that picks may imply unflagged", Source: "common practice"}},
		Run: runFeatureDipSteep,
	})
	register(&Rule{
		ID:    "FEATURE-PICKS-DISAGREE",
		Title: "A given dip agrees with its picks",
		Doc: "Where a feature has both a written dip and dip direction and picks on the image, the two " +
			"planes must agree within a tolerance (the angle between them), or one of them is mistyped.",
		Severity: Warning,
		Source:   "common practice",
		Params: []Param{{Name: "tolerance", Kind: RatioParam, Default: 10,
			Doc: "largest angle, degrees, between the given and the picked plane", Source: "common practice"}},
		Run: runFeaturePicksDisagree,
	})
	register(&Rule{
		ID:    "FEATURE-IMAGE-COVERAGE",
		Title: "The image covers the depths picked on it",
		Doc: "Picks made on a wall image must lie within the depths the image covers; a pick outside " +
			"them has a wrong depth or names the wrong image.",
		Severity: Error,
		Source:   "common practice",
		Run:      runFeatureImageCoverage,
	})
}

func runFeatureDipSteep(p *Pass) {
	w := p.Well
	limit := p.Param("max_dip")
	for i := range w.Features {
		f := &w.Features[i]
		pt := f.Orient.Picked
		if pt == nil || pt.Dip <= limit {
			continue
		}
		p.Reportf(featureKey(w, f), []schema.Length{f.Depth}, "the picks of the %s rise and fall %s on a %s hole: a dip of %.1f°, steeper than %.0f°",
			p.featureName(f), p.D(pt.Height), p.Dia(pt.HoleDiameter), pt.Dip, limit)
	}
}

func runFeaturePicksDisagree(p *Pass) {
	w := p.Well
	tol := p.Param("tolerance")
	for i := range w.Features {
		f := &w.Features[i]
		o := f.Orient
		if o.Given == nil || o.Picked == nil || o.Disagree <= tol {
			continue
		}
		k := key(f.Path, "dip")
		p.Reportf(k, []schema.Length{f.Depth}, "the %s is given as %.0f° toward %03.0f but its picks give %.1f° toward %03.0f: %.1f° apart (tolerance %.0f°)",
			p.featureName(f), o.Given.Dip, o.Given.DipDirection, o.Picked.Dip, o.Picked.DipDirection, o.Disagree, tol)
	}
}

func runFeatureImageCoverage(p *Pass) {
	w := p.Well
	for i := range w.Features {
		f := &w.Features[i]
		if f.Picks == nil || f.Image == "" {
			continue
		}
		im, ok := w.WallImageNamed(f.Image)
		if !ok {
			continue
		}
		top, bot := f.Picks.Span()
		if top >= im.Top && bot <= im.Bottom {
			continue
		}
		p.Reportf(featureKey(w, f), []schema.Length{top, bot}, "the picks of the %s span %s, outside image %q (%s)",
			p.featureName(f), p.Iv(top, bot), im.Name, p.span(im.Interval))
	}
}
