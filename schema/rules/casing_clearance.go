package rules

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&Rule{
		ID:    "CASING-CLEARANCE",
		Title: "An outer casing is wider than what runs inside it",
		Doc: "Where an outer casing and another pipe stand at the same depth, the other pipe runs inside the " +
			"casing: its outside diameter (or, for nested strings, the sum of theirs) must be smaller than the " +
			"casing's inside diameter. Telescoped casings are checked pair by pair, outermost in.",
		Severity: Error,
		Source:   "geometry (a pipe cannot pass through a smaller bore)",
		Run:      runCasingClearance,
	})
}

func runCasingClearance(p *Pass) {
	var t spanTracker
	type fault struct {
		outer schema.HolePipe
		inner []schema.HolePipe
	}
	faults := map[string]fault{}
	segs, sections := p.segments()
	for i, seg := range segs {
		cs := sections[i]
		for _, c := range cs.Casings {
			outer, inner, _ := cs.Inside(c.Casing.Name)
			if len(inner) == 0 || outer.ID == 0 || sumOD(inner) < outer.ID {
				continue
			}
			k := outer.Path
			for _, q := range inner {
				k += "+" + q.Path
			}
			faults[k] = fault{outer, inner}
			t.add(k, seg)
		}
	}
	t.each(func(k string, iv schema.Interval) {
		f := faults[k]
		var names, ods []string
		for _, q := range f.inner {
			names = append(names, q.Label())
			ods = append(ods, p.Dia(q.OD))
		}
		what := fmt.Sprintf("%s (OD %s)", strings.Join(names, " and "), strings.Join(ods, " + "))
		p.Reportf(f.inner[0].Path, depths(iv), "%s does not fit inside %s (ID %s) at %s", what, f.outer.Label(), p.Dia(f.outer.ID), p.span(iv))
	})
}
