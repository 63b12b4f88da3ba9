package rules

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&Rule{
		ID:    "ANNULAR-SPACE",
		Title: "Enough annular space where pack or seal is placed",
		Doc: "Filter pack, bentonite and grout need room to fall or be tremied into place around the pipe " +
			"without bridging. Where one of them is placed, the radial space between the borehole wall (or an " +
			"outer casing's bore) and the pipe inside must be at least the minimum. Nested strings count as one " +
			"bundle of pipes side by side, centred: the space is (hole - sum of their ODs) / 2; the space between " +
			"the strings themselves is not checked.",
		Severity: Error,
		Source: "common practice; many monitoring-well codes ask for a hole at least 4 in larger than the casing " +
			"OD, i.e. 2 in of annular space (e.g. ASTM D5092, from memory)",
		Params: []Param{{
			Name: "min", Kind: DiameterParam, Default: 50, DefaultFt: 2,
			Doc:    "minimum radial annular space",
			Source: "common practice (2 in / 50 mm)",
		}},
		Run: runAnnularSpace,
	})
}

func runAnnularSpace(p *Pass) {
	w := p.Well
	minSpace := schema.Diameter(p.Param("min"))
	type fault struct {
		fill  *schema.Fill
		space schema.Diameter
		outer string
		inner []schema.HolePipe
	}
	faults := map[string]fault{}
	var t spanTracker
	names := annulusNames(w)
	segs, sections := p.segments()
	for i, seg := range segs {
		d := mid(seg)
		cs := sections[i]
		for _, name := range names {
			var f *schema.Fill
			for _, g := range p.annulusFills(name) {
				if g.Contains(d) && (isPack(g) || g.Material.IsSeal()) {
					f = g
				}
			}
			if f == nil {
				continue
			}
			var outerD schema.Diameter
			var casing schema.HolePipe // the outer casing, unless name is the borehole annulus
			var inner []schema.HolePipe
			if name == boreholeAnnulus {
				if !cs.HasHole {
					continue
				}
				outerD, inner = cs.Hole, cs.Outermost()
			} else {
				c, in, ok := cs.Inside(name)
				if !ok {
					continue
				}
				outerD, casing, inner = c.ID, c, in
			}
			if len(inner) == 0 {
				continue // no pipe inside: the fill fills the hole, not an annulus
			}
			space := (outerD - sumOD(inner)) / 2
			if space <= 0 || space >= minSpace-1e-9 {
				continue // a pipe that does not fit is PIPE-FITS-HOLE's or CASING-CLEARANCE's finding
			}
			outer := "the " + p.Dia(cs.Hole) + " hole"
			if name != boreholeAnnulus {
				outer = casing.Label() + " (ID " + p.Dia(casing.ID) + ")"
			}
			k := fmt.Sprintf("%s|%.4f", f.Path, float64(space))
			faults[k] = fault{f, space, outer, inner}
			t.add(k, seg)
		}
	}
	t.each(func(k string, iv schema.Interval) {
		f := faults[k]
		var ods []string
		for _, q := range f.inner {
			ods = append(ods, q.Owner()+" (OD "+p.Dia(q.OD)+")")
		}
		p.Reportf(f.fill.Path, depths(iv), "annular space for %s at %s is %s: %s in %s; at least %s is needed",
			material(f.fill.Material), p.span(iv), p.Dia(f.space), strings.Join(ods, " and "), f.outer, p.Dia(minSpace))
	})
}
