package rules

func init() {
	register(&Rule{
		ID:    "SEAL-THICKNESS",
		Title: "The bentonite seal above the pack is thick enough",
		Doc: "Where a bentonite seal (chips, pellets or granular bentonite) lies on the filter pack or fine " +
			"sand, its thickness, counting every bentonite fill stacked without a break, must reach the " +
			"minimum: a thin seal can be bypassed and lets grout reach the pack.",
		Severity: Error,
		Source:   "US Army Corps of Engineers TI 814-01 (1998): at least 2 ft of bentonite seal above the filter pack",
		Params: []Param{{
			Name: "min", Kind: LengthParam, Default: 0.6, DefaultFt: 2,
			Doc:    "minimum thickness of the bentonite seal directly above the pack",
			Source: "US Army Corps of Engineers TI 814-01 (1998): 2 ft (0.6 m)",
		}},
		Run: runSealThickness,
	})
}

func runSealThickness(p *Pass) {
	minSeal := p.Length("min")
	for _, name := range annulusNames(p.Well) {
		fs := p.annulusFills(name)
		seals := runs(fs, isBentoniteSeal)
		for _, st := range runs(fs, isPack) {
			for _, s := range seals {
				if s.Bottom < st.Top-eps || s.Bottom > st.Top+eps {
					continue
				}
				if s.Thickness() < minSeal-eps {
					p.Reportf(key(s.Fills[0].Path, "top"), depths(s.Interval), "the bentonite seal above the pack is %s thick (%s); at least %s is needed",
						p.D(s.Thickness()), p.span(s.Interval), p.D(minSeal))
				}
			}
		}
	}
}
