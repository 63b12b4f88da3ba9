package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "PACK-ABOVE-MAX",
		Title: "Filter pack does not rise too far above the screen",
		Doc: "The whole packed length is the monitored zone. A pack (with the fine sand on it) that rises " +
			"much more than needed above the screen draws water from layers above the screened zone and can " +
			"connect them. Measured from the screen top to the top of the pack and fine sand around it.",
		Severity: Warning,
		Source:   "US EPA, RCRA Ground-Water Monitoring: Draft Technical Guidance (1992): the packed length is the monitored zone; 5 ft (1.5 m) limit: common practice",
		Params: []Param{{
			Name: "max", Kind: LengthParam, Default: 1.5, DefaultFt: 5,
			Doc:    "maximum height of pack and fine sand above the top of the screen",
			Source: "common practice: 5 ft (1.5 m)",
		}},
		Run: runPackAboveMax,
	})
}

func runPackAboveMax(p *Pass) {
	maxAbove := p.Length("max")
	forEachTopScreen(p, isPack, func(sc schema.StringSection, pack run) {
		h := sc.Section.Top - pack.Top
		if h > maxAbove+eps {
			p.Reportf(key(pack.Fills[0].Path, "top"), []schema.Length{pack.Top, sc.Section.Top},
				"the pack rises %s above the screen of string %q (pack top %s, screen top %s); more than %s widens the monitored zone",
				p.D(h), sc.String.Name, p.D(pack.Top), p.D(sc.Section.Top), p.D(maxAbove))
		}
	})
}
