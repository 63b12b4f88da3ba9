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
		Source: "US EPA, RCRA Ground-Water Monitoring: Draft Technical Guidance (1992): the packed length is the monitored zone; " +
			"UFGS 02525N (monitoring wells): the filter pack extends a limited height above the screen; the 5 ft (1.5 m) figure: common practice. " +
			"Monitoring wells and piezometers only by default: a supply well's pack is meant to rise well above its screen (TM 5-813-1: at least 10 ft)",
		Purposes: observationWells,
		Params: []Param{{
			Name: "max", Kind: LengthParam, Default: 1.5, DefaultFt: 5,
			Doc:    "maximum height of pack and fine sand above the top of the screen",
			Source: "common practice: 5 ft (1.5 m); US EPA 1992 and UFGS 02525N ask for a limited height without one number",
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
