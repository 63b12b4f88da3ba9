package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "FINE-SAND-THICKNESS",
		Title: "A fine-sand layer above the pack is 1 to 2 ft thick",
		Doc: "A layer of fine sand on the filter pack keeps the bentonite seal and grout from entering the " +
			"pack. It is optional; where one is placed it should be thick enough to do that (the minimum) and " +
			"not so thick that it lengthens the monitored zone (the maximum).",
		Severity: Warning,
		Source:   "US EPA, RCRA Ground-Water Monitoring: Draft Technical Guidance (1992): 1 to 2 ft of fine sand above the filter pack",
		Purposes: environmental,
		Params: []Param{
			{Name: "min", Kind: LengthParam, Default: 0.3, DefaultFt: 1, Doc: "minimum fine-sand thickness", Source: "US EPA 1992: 1 ft (0.3 m)"},
			{Name: "max", Kind: LengthParam, Default: 0.6, DefaultFt: 2, Doc: "maximum fine-sand thickness", Source: "US EPA 1992: 2 ft (0.6 m)"},
		},
		Run: runFineSandThickness,
	})
}

func runFineSandThickness(p *Pass) {
	lo, hi := p.Length("min"), p.Length("max")
	for _, name := range annulusNames(p.Well) {
		for _, r := range runs(p.annulusFills(name), func(f *schema.Fill) bool { return f.Material == schema.FineSand }) {
			t := r.Thickness()
			switch {
			case t < lo-eps:
				p.Reportf(key(r.Fills[0].Path, "top"), depths(r.Interval), "fine sand at %s is %s thick; at least %s keeps the seal out of the pack", p.span(r.Interval), p.D(t), p.D(lo))
			case t > hi+eps:
				p.Reportf(key(r.Fills[0].Path, "top"), depths(r.Interval), "fine sand at %s is %s thick; more than %s lengthens the monitored zone", p.span(r.Interval), p.D(t), p.D(hi))
			}
		}
	}
}
