package rules

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&Rule{
		ID:    "FEATURE-IN-CONSTRUCTION",
		Title: "A wall feature lies in the open hole",
		Doc: "Fractures and other wall features are logged on the open-hole wall. One recorded where the " +
			"well stands cased, screened or grouted cannot be seen there now: its depth is wrong, or it was " +
			"logged before the casing went in and the sheet should say so. One below the total depth is " +
			"not in the hole at all.",
		Severity: Warning,
		Source:   "common practice: a wall image sees only the uncased wall",
		Run:      runFeatureInConstruction,
	})
}

func runFeatureInConstruction(p *Pass) {
	w := p.Well
	for i := range w.Features {
		f := &w.Features[i]
		if f.Depth > w.TotalDepth+eps {
			p.Reportf(featureKey(w, f), []schema.Length{w.TotalDepth, f.Depth}, "the %s lies below the total depth (%s)", p.featureName(f), p.D(w.TotalDepth))
			continue
		}
		if what := constructionAt(p, f.Depth); len(what) > 0 {
			p.Reportf(featureKey(w, f), []schema.Length{f.Depth}, "the %s lies behind %s; a wall feature is logged in the open hole",
				p.featureName(f), strings.Join(what, " and "))
		}
	}
}

// constructionAt names the pipes and annular fills standing at a depth.
func constructionAt(p *Pass, d schema.Length) []string {
	var out []string
	for _, q := range p.Well.HolePipes() {
		if q.Top < d && d < q.Bottom {
			out = append(out, fmt.Sprintf("%s (%s)", q.Label(), p.span(q.Interval)))
		}
	}
	for i := range p.Well.Fills {
		f := &p.Well.Fills[i]
		if f.Top < d && d < f.Bottom {
			out = append(out, fmt.Sprintf("the %s (%s)", material(f.Material), p.span(f.Interval)))
		}
	}
	return out
}
