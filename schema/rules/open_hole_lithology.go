package rules

func init() {
	register(&Rule{
		ID:    "OPEN-HOLE-LITHOLOGY",
		Title: "Open hole stands in rock",
		Doc: "An uncased hole stays open only in competent rock. Where the lithology logged over an open-hole " +
			"interval is a soil (a USCS group), made ground, saprolite or residual soil, or rock weathered to grade " +
			"IV or worse (more than half decomposed to soil; also \"weathered\" written without a grade), the hole " +
			"can cave or slough into the well: it should be cased and screened instead.",
		Severity: Warning,
		Source: "common practice: open-hole completions are made in consolidated rock; weathering grades after ISRM (1981), " +
			"Suggested Methods for the Description of Discontinuities in Rock Masses, and BS 5930:1999 (grades I to VI)",
		Run: runOpenHoleLithology,
	})
}

func runOpenHoleLithology(p *Pass) {
	for _, o := range p.Well.OpenHoles {
		for _, l := range p.Well.Lithology {
			iv, ok := overlap(o.Interval, l.Interval)
			if !ok || !l.Unconsolidated() {
				continue
			}
			p.Reportf(l.Path, depths(iv), "the open hole at %s passes through unconsolidated %s at %s: it may cave; case and screen it", p.span(o.Interval), l.Material(), p.span(iv))
		}
	}
}
