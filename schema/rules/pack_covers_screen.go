package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "PACK-COVERS-SCREEN",
		Title: "Filter pack surrounds the whole screen",
		Doc: "Every depth of every screen must face filter pack in the annulus around it. Where a screen " +
			"faces fine sand, bentonite, grout or nothing, the screen draws that material in or is blinded, and " +
			"the water sampled does not come from the packed zone alone.",
		Severity: Error,
		Source:   "US EPA, RCRA Ground-Water Monitoring: Draft Technical Guidance (1992): the filter pack extends over the full screen length and above it",
		Run:      runPackCoversScreen,
	})
}

func runPackCoversScreen(p *Pass) {
	w := p.Well
	for _, sc := range w.Screens() {
		sec := sc.Section
		name := p.annulusAt(mid(sec.Interval))
		var packs []schema.Interval
		for _, f := range p.annulusFills(name) {
			if isFilterPack(f) {
				packs = append(packs, f.Interval)
			}
		}
		for _, bare := range subtract([]schema.Interval{sec.Interval}, packs) {
			p.Reportf(sec.Path, depths(bare), "the screen of string %q at %s has no filter pack around it at %s", sc.String.Name, p.span(sec.Interval), p.span(bare))
		}
	}
}
