package rules

func init() {
	register(&Rule{
		ID:    "FILL-OVERLAP",
		Title: "Annular fills do not overlap",
		Doc: "Two fills of one annulus cannot occupy the same depth. An overlap is a typing error that hides " +
			"which material is really there (is the seal 2 ft thick or 1?), and it double-counts volumes.",
		Severity: Error,
		Source:   "completeness of the as-built record (common practice)",
		Run:      runFillOverlap,
	})
}

func runFillOverlap(p *Pass) {
	for _, name := range annulusNames(p.Well) {
		fs := p.annulusFills(name)
		for i := 0; i < len(fs); i++ {
			for j := i + 1; j < len(fs); j++ {
				iv, ok := overlap(fs[i].Interval, fs[j].Interval)
				if !ok {
					continue
				}
				p.Reportf(key(fs[j].Path, "top"), depths(iv), "%s overlaps %s at %s in %s", p.fillLabel(fs[j]), p.fillLabel(fs[i]), p.span(iv), annulusLabel(name))
			}
		}
	}
}
