package rules

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&Rule{
		ID:    "PIPE-FITS-HOLE",
		Title: "Casing and screen fit inside the hole",
		Doc: "At every depth below ground the outermost pipe (an outer casing, or else the well string, or " +
			"the strings of a nested completion side by side) must be narrower than the borehole there. A pipe " +
			"as wide as the hole cannot have been set in it, so either a diameter or a depth is wrong.",
		Severity: Error,
		Source:   "geometry (a pipe cannot be wider than the hole it stands in)",
		Run:      runPipeFitsHole,
	})
}

func runPipeFitsHole(p *Pass) {
	var t spanTracker
	type fault struct {
		pipes []schema.HolePipe
		hole  schema.Diameter
	}
	faults := map[string]fault{}
	segs, sections := p.segments()
	for i, seg := range segs {
		cs := sections[i]
		out := cs.Outermost()
		if !cs.HasHole || len(out) == 0 || sumOD(out) == 0 || sumOD(out) < cs.Hole {
			continue
		}
		var paths []string
		for _, q := range out {
			paths = append(paths, q.Path)
		}
		k := strings.Join(paths, "+") + fmt.Sprintf("|%g", float64(cs.Hole))
		faults[k] = fault{out, cs.Hole}
		t.add(k, seg)
	}
	t.each(func(k string, iv schema.Interval) {
		f := faults[k]
		if len(f.pipes) == 1 {
			q := f.pipes[0]
			p.Reportf(q.Path, depths(iv), "%s (OD %s) does not fit the %s hole at %s", q.Label(), p.Dia(q.OD), p.Dia(f.hole), p.span(iv))
			return
		}
		var names, ods []string
		for _, q := range f.pipes {
			names = append(names, q.Label())
			ods = append(ods, p.Dia(q.OD))
		}
		p.Reportf(f.pipes[0].Path, depths(iv), "%s side by side (OD %s) do not fit the %s hole at %s", strings.Join(names, " and "), strings.Join(ods, " + "), p.Dia(f.hole), p.span(iv))
	})
}
