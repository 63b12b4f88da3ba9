package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "STRING-CONTINUOUS",
		Title: "A well string's sections meet without gap or overlap",
		Doc: "A well string is one column of pipe: riser, screen(s), blank and sump joined end to end. Each " +
			"section must start where the one above it ends. A gap would be an open hole in the string, an " +
			"overlap two pipes at one depth; either way the record is wrong.",
		Severity: Error,
		Source:   "definition of a well string (common practice)",
		Run:      runStringContinuous,
	})
}

func runStringContinuous(p *Pass) {
	for _, s := range p.Well.Strings {
		for i := 1; i < len(s.Sections); i++ {
			prev, cur := s.Sections[i-1], s.Sections[i]
			switch {
			case cur.Top > prev.Bottom+eps:
				p.Reportf(key(cur.Path, "top"), []schema.Length{prev.Bottom, cur.Top}, "string %q has a gap at %s between its %s and %s", s.Name, p.Iv(prev.Bottom, cur.Top), prev.Kind, cur.Kind)
			case cur.Top < prev.Bottom-eps:
				iv := schema.Interval{Top: cur.Top, Bottom: min(prev.Bottom, cur.Bottom)}
				p.Reportf(key(cur.Path, "top"), depths(iv), "string %q: its %s starting at %s overlaps the %s above, which ends at %s", s.Name, cur.Kind, p.D(cur.Top), prev.Kind, p.D(prev.Bottom))
			}
		}
	}
}
