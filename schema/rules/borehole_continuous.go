package rules

import (
	"sort"

	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&Rule{
		ID:    "BOREHOLE-CONTINUOUS",
		Title: "Borehole sections run from ground to total depth",
		Doc: "The drilled hole is described by its sections (a hole that steps down has several). Together they " +
			"must run from ground surface to the total depth without a gap, or no diameter is known there and " +
			"neither the fit of the pipe nor the annular volumes can be worked out; two sections that overlap " +
			"give two diameters at one depth.",
		Severity: Error,
		Source:   "completeness of the as-built record (common practice)",
		Run:      runBoreholeContinuous,
	})
}

func runBoreholeContinuous(p *Pass) {
	w := p.Well
	bs := append([]schema.BoreholeSection(nil), w.Boreholes...)
	if len(bs) == 0 {
		p.Reportf("well.total_depth", nil, "no borehole section is recorded")
		return
	}
	sort.SliceStable(bs, func(i, j int) bool { return bs[i].Top < bs[j].Top })
	if bs[0].Top > eps {
		p.Reportf(key(bs[0].Path, "top"), []schema.Length{0, bs[0].Top}, "no borehole section covers %s: the first one starts at %s, not at ground surface", p.Iv(0, bs[0].Top), p.D(bs[0].Top))
	}
	for i := 1; i < len(bs); i++ {
		prev, cur := bs[i-1], bs[i]
		switch {
		case cur.Top > prev.Bottom+eps:
			p.Reportf(key(cur.Path, "top"), []schema.Length{prev.Bottom, cur.Top}, "no borehole section covers %s, between the section ending at %s and the one starting at %s", p.Iv(prev.Bottom, cur.Top), p.D(prev.Bottom), p.D(cur.Top))
		case cur.Top < prev.Bottom-eps:
			iv, _ := overlap(prev.Interval, cur.Interval)
			p.Reportf(key(cur.Path, "top"), depths(iv), "borehole sections overlap at %s (%s and %s diameters)", p.span(iv), p.Dia(prev.Diameter), p.Dia(cur.Diameter))
		}
	}
	deepest := bs[0].Bottom
	last := bs[0]
	for _, b := range bs {
		if b.Bottom > deepest {
			deepest, last = b.Bottom, b
		}
	}
	if deepest < w.TotalDepth-eps {
		p.Reportf(key(last.Path, "bottom"), []schema.Length{deepest, w.TotalDepth}, "no borehole section covers %s: the deepest ends at %s, above the total depth of %s", p.Iv(deepest, w.TotalDepth), p.D(deepest), p.D(w.TotalDepth))
	}
}
