package rules

func init() {
	register(&Rule{
		ID:    "FILL-IN",
		Title: "No starter value is left to fill",
		Doc: "A starter file (tremie new) gives realistic example values so that it loads and draws at once, " +
			"and marks each one \"# FILL\" until it is replaced with the measured or recorded value. A value " +
			"still marked is an example, not a record, and must not reach a report: replace it and delete the mark.",
		Severity: Error,
		Source:   "tremie's starter-file convention (tremie new); a record holds only observed values (common practice)",
		Run:      runFillIn,
	})
}

func runFillIn(p *Pass) {
	for _, ph := range p.Well.Placeholders {
		p.Reportf(ph.Path, nil, "%s is still the starter's example value, marked # FILL: replace it with the real one and delete the mark", ph.Path)
	}
}
