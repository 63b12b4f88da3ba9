package rules

import (
	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&Rule{
		ID:    "PACK-FORMATION-RATIO",
		Title: "The filter pack is graded to the formation",
		Doc: "A filter pack is designed from the sieve analysis of the formation it screens: the pack's d30 (the " +
			"size 30 % of it by mass is finer than) about 4 to 6 times the formation's d30. A finer pack chokes " +
			"the well's yield; a coarser one lets the formation's fines through into the well. Each [[sample]] " +
			"with a d30 whose depth lies within a screen is compared with every filter pack beside that screen " +
			"that gives its d30. Wells without samples or without a pack d30 are skipped.",
		Severity: Warning,
		Source: "ASTM D5092-04 (Design and Installation of Ground Water Monitoring Wells), §6.3.3.1, filter pack design: the pack's d-30 " +
			"about 4 to 6 times the formation's d-30, 4 for a fine, uniform formation and 6 for a coarse, poorly sorted one " +
			"(as the standard's text is reproduced; TI 814-01 and Wisconsin NR 812.16 use 4 to 6 on the 70 % retained size). " +
			"Monitoring wells and piezometers only by default, as the standard is written for them",
		Purposes: observationWells,
		Params: []Param{{
			Name: "min_ratio", Kind: RatioParam, Default: 4,
			Doc:    "least ratio of the pack's d30 to the formation's d30",
			Source: "ASTM D5092-04 §6.3.3.1: 4, for fine, uniform formations",
		}, {
			Name: "max_ratio", Kind: RatioParam, Default: 6,
			Doc:    "greatest ratio of the pack's d30 to the formation's d30",
			Source: "ASTM D5092-04 §6.3.3.1: 6, for coarse, poorly sorted formations",
		}},
		Run: runPackFormationRatio,
	})
}

func runPackFormationRatio(p *Pass) {
	w := p.Well
	lo, hi := p.Param("min_ratio"), p.Param("max_ratio")
	for _, sc := range w.Screens() {
		sec := sc.Section
		samples := w.SamplesWithin(sec.Interval)
		if len(samples) == 0 {
			continue
		}
		for _, f := range p.annulusFills(p.annulusAt(mid(sec.Interval))) {
			if !isFilterPack(f) || f.D30 <= 0 {
				continue
			}
			if _, ok := overlap(f.Interval, sec.Interval); !ok {
				continue
			}
			for _, s := range samples {
				ratio := schema.PackFormationRatio(f, s)
				if ratio == 0 || (ratio >= lo-roundOff && ratio <= hi+roundOff) {
					continue
				}
				why := "too fine: it slows the water entering the well"
				if ratio > hi {
					why = "too coarse: the formation's fines pass through it into the well"
				}
				p.Reportf(key(s.Path, "d30"), []schema.Length{s.Depth, sec.Top, sec.Bottom},
					"the filter pack at %s beside the screen of string %q has d30 = %s mm, %s times the d30 = %s mm of the formation sampled at %s; %s to %s times is the design range, so the pack is %s",
					p.span(f.Interval), sc.String.Name, schema.TrimFloat(float64(f.D30), 3), schema.TrimFloat(ratio, 2),
					schema.TrimFloat(float64(s.D30), 3), p.D(s.Depth), schema.TrimFloat(lo, 2), schema.TrimFloat(hi, 2), why)
			}
		}
	}
}
