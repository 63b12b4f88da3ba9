package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "BOTTOM-CAP",
		Title: "Each well string is closed by a bottom cap",
		Doc: "The bottom of a well string is closed by a cap or plug, so that pack and formation cannot " +
			"enter the pipe from below. A string whose bottom cap is not recorded is reported so that the " +
			"record can be completed.",
		Severity: Warning,
		Source:   "US EPA, RCRA Ground-Water Monitoring: Draft Technical Guidance (1992): the bottom of the well is capped (from memory)",
		Run:      runBottomCap,
	})
}

func runBottomCap(p *Pass) {
	for _, s := range p.Well.Strings {
		if s.BottomCap == "" && len(s.Sections) > 0 {
			b := s.Bottom()
			p.Reportf(s.Path, []schema.Length{b}, "string %q has no bottom cap recorded (its bottom is at %s)", s.Name, p.D(b))
		}
	}
}
