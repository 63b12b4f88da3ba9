package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "PACK-ABOVE-SCREEN",
		Title: "Filter pack rises far enough above the screen",
		Doc: "The filter pack must reach at least the minimum above the top of the screen, so that the " +
			"pack settles, the seal above stays clear of the slots and grout cannot reach the screen. Measured " +
			"from the screen top to the top of the filter pack surrounding it (fine sand above is not counted). " +
			"For a string with several screens in one pack, the uppermost screen is measured.",
		Severity: Error,
		Source:   "US EPA, RCRA Ground-Water Monitoring: Draft Technical Guidance (1992): filter pack about 2 ft above the top of the screen",
		Params: []Param{{
			Name: "min", Kind: LengthParam, Default: 0.6, DefaultFt: 2,
			Doc:    "minimum height of filter pack above the top of the screen",
			Source: "US EPA 1992: 2 ft (0.6 m)",
			ByPurpose: []PurposeDefault{{
				Purposes: productionWells, Default: 3, DefaultFt: 10,
				Source: "TM 5-813-1 / TI 814-01 (water supply): gravel pack at least 10 ft above the top of the screen (3 m for wells in metres)",
			}},
		}},
		Run: runPackAboveScreen,
	})
}

func runPackAboveScreen(p *Pass) {
	minAbove := p.Length("min")
	forEachTopScreen(p, isFilterPack, func(sc schema.StringSection, pack run) {
		h := sc.Section.Top - pack.Top
		if h < minAbove-eps {
			p.Reportf(key(pack.Fills[0].Path, "top"), []schema.Length{pack.Top, sc.Section.Top},
				"the filter pack reaches %s above the screen of string %q (pack top %s, screen top %s); at least %s is needed",
				p.D(h), sc.String.Name, p.D(pack.Top), p.D(sc.Section.Top), p.D(minAbove))
		}
	})
}

// forEachTopScreen calls fn for each screen whose top lies in a run of the
// fills keep accepts, in the annulus around the screen, unless another
// screen above it lies in the same run (then that one is measured).
func forEachTopScreen(p *Pass, keep func(*schema.Fill) bool, fn func(schema.StringSection, run)) {
	w := p.Well
	screens := w.Screens()
	for _, sc := range screens {
		sec := sc.Section
		name := p.annulusAt(mid(sec.Interval))
		for _, r := range runs(p.annulusFills(name), keep) {
			if sec.Top < r.Top-eps || sec.Top > r.Bottom+eps {
				continue
			}
			covered := false
			for _, other := range screens {
				if other.Section.Top < sec.Top-eps && r.Contains(other.Section.Top) {
					covered = true
				}
			}
			if !covered {
				fn(sc, r)
			}
		}
	}
}
