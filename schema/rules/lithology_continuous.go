package rules

import (
	"sort"

	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&Rule{
		ID:    "LITHOLOGY-CONTINUOUS",
		Title: "Lithology is logged from ground to total depth",
		Doc: "The log should describe every depth of the hole, from ground surface to the total depth, with " +
			"no gap and no overlap: a gap is material nobody described (no sample, or a lost record), an overlap " +
			"two descriptions of one depth.",
		Severity: Warning,
		Source:   "completeness of the boring log (common practice)",
		Run:      runLithologyContinuous,
	})
}

func runLithologyContinuous(p *Pass) {
	w := p.Well
	if len(w.Lithology) == 0 {
		p.Reportf("well.total_depth", []schema.Length{0, w.TotalDepth}, "no lithology is logged (0 to %s)", p.D(w.TotalDepth))
		return
	}
	ls := append([]schema.Layer(nil), w.Lithology...)
	sort.SliceStable(ls, func(i, j int) bool { return ls[i].Top < ls[j].Top })
	if ls[0].Top > eps {
		p.Reportf(key(ls[0].Path, "top"), []schema.Length{0, ls[0].Top}, "no lithology is logged at %s", p.Iv(0, ls[0].Top))
	}
	reach, last := ls[0].Bottom, ls[0]
	for _, l := range ls[1:] {
		switch {
		case l.Top > reach+eps:
			p.Reportf(key(l.Path, "top"), []schema.Length{reach, l.Top}, "no lithology is logged at %s", p.Iv(reach, l.Top))
		case l.Top < reach-eps:
			iv, _ := overlap(last.Interval, l.Interval)
			p.Reportf(key(l.Path, "top"), depths(iv), "lithology layers overlap at %s", p.span(iv))
		}
		if l.Bottom > reach {
			reach, last = l.Bottom, l
		}
	}
	if reach < w.TotalDepth-eps {
		p.Reportf(key(last.Path, "bottom"), []schema.Length{reach, w.TotalDepth}, "no lithology is logged at %s", p.Iv(reach, w.TotalDepth))
	}
}
