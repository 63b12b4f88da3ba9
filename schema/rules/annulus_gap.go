package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "ANNULUS-GAP",
		Title: "Annular fill is complete from the bottom of the hole to the surface",
		Doc: "Every depth of the borehole annulus, from the bottom of the hole to ground surface (or to the " +
			"bottom of a flush-mount vault), must hold a recorded fill: an unfilled stretch is a void that can " +
			"collapse or carry water between zones, and an unrecorded one cannot be shown to be sealed. Open-hole " +
			"intervals have no annulus and are skipped. The annulus inside an outer casing (fills with `within`) " +
			"must be filled wherever a pipe runs inside that casing, except over the lap of a liner whose packer or " +
			"`lap_seal` closes it.",
		Severity: Error,
		Source:   "US EPA, RCRA Ground-Water Monitoring: Draft Technical Guidance (1992): the annulus is filled and sealed from the pack to the surface (from memory)",
		Run:      runAnnulusGap,
	})
}

func runAnnulusGap(p *Pass) {
	w := p.Well
	top0 := schema.Length(0)
	if v := w.Surface.Vault; v != nil && v.Depth > 0 {
		top0 = v.Depth
	}
	var open []schema.Interval
	for _, o := range w.OpenHoles {
		open = append(open, o.Interval)
	}
	if w.TotalDepth > top0 {
		expected := subtract([]schema.Interval{{Top: top0, Bottom: w.TotalDepth}}, open)
		p.reportGaps(boreholeAnnulus, expected)
	}
	for _, c := range w.Casings {
		var expected []schema.Interval
		segs, sections := p.segments()
		for i, seg := range segs {
			if _, inner, ok := sections[i].Inside(c.Name); ok && len(inner) > 0 {
				expected = append(expected, seg)
			}
		}
		p.reportGaps(c.Name, subtract(expected, sealedLaps(w, c.Name)))
	}
}

// sealedLaps are the laps of the liners hung in the named casing whose
// packer or lap seal closes the annulus between liner and casing.
func sealedLaps(w *schema.Well, casing string) []schema.Interval {
	var out []schema.Interval
	for _, s := range w.Strings {
		if lap, ok := w.Lap(s); ok && s.Liner.HungIn == casing && s.Liner.LapSealed() {
			out = append(out, lap)
		}
	}
	return out
}

func (p *Pass) reportGaps(annulus string, expected []schema.Interval) {
	fs := p.annulusFills(annulus)
	for _, gap := range subtract(expected, intervalsOf(fs)) {
		path, between := "well.total_depth", ""
		above, onTop := fillAbove(fs, gap.Top, nil)
		below := fillBelow(fs, gap.Bottom)
		switch {
		case above != nil && onTop:
			path = key(above.Path, "bottom")
		case below != nil:
			path = key(below.Path, "top")
		}
		switch {
		case above != nil && onTop && below != nil:
			between = " between " + material(above.Material) + " above and " + material(below.Material) + " below"
		case below != nil:
			between = " above " + p.fillLabel(below)
		case above != nil && onTop:
			between = " below " + p.fillLabel(above)
		}
		p.Reportf(path, depths(gap), "no fill is recorded in %s at %s%s", annulusLabel(annulus), p.span(gap), between)
	}
}

// fillBelow returns the fill whose top is at depth d, or nil.
func fillBelow(fs []*schema.Fill, d schema.Length) *schema.Fill {
	for _, f := range fs {
		if f.Top >= d-eps && f.Top <= d+eps {
			return f
		}
	}
	return nil
}
