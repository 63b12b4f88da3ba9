package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "CHIP-SIZE",
		Title: "Bentonite chips and pellets are small enough for the annulus",
		Doc: "Chips or pellets poured down an annulus bridge where they are large against the gap: a fill " +
			"whose recorded size (the fill's size key) exceeds the set fraction of the narrowest radial " +
			"annular space it is placed in is reported. The radial space is the annulus's width less the " +
			"pipes in it, shared by the gaps beside them, as ANNULAR-SPACE measures it.",
		Severity: Warning,
		Source:   "California DWR Bulletin 74-90, Part III §9.D.3: chips and pellets no larger than one-fifth of the radial annular space",
		Params: []Param{{Name: "fraction", Kind: RatioParam, Default: 0.2,
			Doc: "largest chip or pellet size as a fraction of the radial annular space", Source: "DWR 74-90 §9.D.3: 1/5"}},
		Run: runChipSize,
	})
}

func runChipSize(p *Pass) {
	frac := p.Param("fraction")
	segs, sections := p.segments()
	for i := range p.Well.Fills {
		f := &p.Well.Fills[i]
		if f.Size <= 0 || (f.Material != schema.BentoniteChips && f.Material != schema.BentonitePellets) {
			continue
		}
		var narrowest schema.Diameter
		var at schema.Interval
		for k, seg := range segs {
			if !f.Overlaps(seg) {
				continue
			}
			space, ok := radialSpace(sections[k], f.Within)
			if ok && (narrowest == 0 || space < narrowest) {
				narrowest, at = space, seg
			}
		}
		if narrowest <= 0 || float64(f.Size) <= frac*float64(narrowest)+roundOff {
			continue
		}
		p.Reportf(key(f.Path, "size"), depths(at), "%s of %s are larger than %s of the %s radial annular space at %s (at most %s)",
			material(f.Material), p.Dia(f.Size), fractionText(frac), p.Dia(narrowest), p.span(at), p.Dia(schema.Diameter(frac*float64(narrowest))))
	}
}

// radialSpace is the gap beside the pipes in an annulus (the borehole's
// for within = "", else the named casing's bore): its width less the
// pipes' outside diameters, shared by the gaps between them.
func radialSpace(cs schema.CrossSection, within string) (schema.Diameter, bool) {
	outer, inner := cs.Hole, cs.Outermost()
	if within != "" {
		c, in, ok := cs.Inside(within)
		if !ok {
			return 0, false
		}
		outer, inner = c.ID, in
	} else if !cs.HasHole {
		return 0, false
	}
	if len(inner) == 0 || outer <= 0 {
		return 0, false
	}
	space := (outer - sumOD(inner)) / schema.Diameter(len(inner)+1)
	return space, space > 0
}

// fractionText writes 0.2 as "1/5" and other fractions as a percentage.
func fractionText(f float64) string {
	if f > 0 && 1/f == float64(int(1/f+0.5)) {
		return "1/" + schema.TrimFloat(1/f, 0)
	}
	return schema.TrimFloat(f*100, 1) + " %"
}
