package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "OPEN-HOLE-BELOW-CASING",
		Title: "Open hole begins below a grouted casing",
		Doc: "An open-hole (uncased) completion is only sealed from the water above it if it begins at or " +
			"below the bottom of a casing whose annulus is grouted or sealed down to its bottom. An open hole " +
			"that starts above the casing bottom overlaps it; one with no casing above it, or below a casing " +
			"left ungrouted at its foot, is open to every zone above.",
		Severity: Error,
		Source:   "California DWR Bulletin 74-81, section 9 (from memory): the annular seal of a cased well extends into the formation the casing is set in; common practice for rock completions",
		Run:      runOpenHoleBelowCasing,
	})
}

func runOpenHoleBelowCasing(p *Pass) {
	w := p.Well
	for _, o := range w.OpenHoles {
		above, overlapping := pipeAbove(w, o.Interval)
		switch {
		case overlapping != nil:
			p.Reportf(key(o.Path, "top"), []schema.Length{o.Top, overlapping.Bottom}, "the open hole at %s overlaps %s, which reaches %s: an open hole begins at or below the casing bottom",
				p.span(o.Interval), overlapping.Label(), p.D(overlapping.Bottom))
		case above == nil:
			p.Reportf(key(o.Path, "top"), []schema.Length{o.Top}, "no casing stands above the open hole at %s", p.span(o.Interval))
		case !groutedAtFoot(p, *above):
			p.Reportf(key(o.Path, "top"), []schema.Length{above.Bottom, o.Top}, "%s above the open hole at %s is not grouted or sealed at its foot (%s)",
				above.Label(), p.span(o.Interval), p.D(above.Bottom))
		}
	}
}

// pipeAbove returns the deepest pipe ending at or above the top of an open
// hole, or else a pipe reaching into it.
func pipeAbove(w *schema.Well, open schema.Interval) (above, overlapping *schema.HolePipe) {
	for _, q := range w.HolePipes() {
		q := q
		if q.Bottom > open.Top+eps && q.Top < open.Bottom-eps {
			return nil, &q
		}
		if q.Bottom <= open.Top+eps && (above == nil || q.Bottom > above.Bottom) {
			above = &q
		}
	}
	return above, nil
}

// groutedAtFoot reports whether the annulus outside a pipe holds grout,
// bentonite or concrete just above the pipe's bottom.
func groutedAtFoot(p *Pass, q schema.HolePipe) bool {
	d := q.Bottom - 0.01 // 1 cm above the foot
	if d <= q.Top {
		d = mid(q.Interval)
	}
	cs := p.crossSections().At(d)
	outside := boreholeAnnulus
	for i, c := range cs.Casings {
		if c.Path == q.Path && i > 0 {
			outside = cs.Casings[i-1].Casing.Label()
		}
	}
	if q.Casing == nil {
		outside = cs.Annulus()
	}
	for _, f := range cs.Fills {
		if f.Within == outside && f.Material.IsSeal() {
			return true
		}
	}
	return false
}
