package rules

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// annularSpaceSource is where the 2-in figure comes from.
const annularSpaceSource = "California DWR Bulletin 74-90 §9.E (monitoring wells) and 74-81 §9 (water wells): at least 2 in " +
	"of seal between every casing and the borehole wall and between casings in one hole. For monitoring wells in soil " +
	"US Army TM 5-814-7 (as reproduced in UFC 3-280-02A) and Wisconsin NR 141.19(1) ask for a boring at least 4 in " +
	"wider than the casing's inside diameter. Local codes differ (some accept about 1.8 in for 2-in " +
	"monitoring wells, 1.5 in for domestic wells in rock): set min per purpose in the profile"

func init() {
	register(&Rule{
		ID:    "ANNULAR-SPACE",
		Title: "Enough annular space where pack or seal is placed",
		Doc: "Filter pack, bentonite and grout need room to fall or be tremied into place around each pipe " +
			"without bridging, and a seal must be thick enough all round. Where one of them is placed, the radial " +
			"space between the borehole wall (or an outer casing's bore) and the pipe inside must be at least the " +
			"minimum. Several strings in one hole (a nested well) stand side by side: at best the pipes and the " +
			"gaps between them and the wall line up along one diameter with every gap equal, so each gap is " +
			"(hole - sum of the ODs) / (strings + 1); that gap must also reach the minimum, which names the two " +
			"strings and the depth. Around a screen the pack may need more room than a seal (min_pack).",
		Severity: Error,
		Source:   annularSpaceSource,
		Params: []Param{{
			Name: "min", Kind: DiameterParam, Default: 50, DefaultFt: 2,
			Doc:    "minimum radial space between a pipe and the wall or outer casing, and between pipes in one hole",
			Source: "DWR Bulletin 74-90 §9.E and 74-81 §9: 2 in (50 mm for wells in metres)",
		}, {
			Name: "min_pack", Kind: DiameterParam, Fallback: "min",
			Doc:    "minimum radial space where filter pack or fine sand is placed (where not set: min)",
			Source: "as min, except for supply wells",
			ByPurpose: []PurposeDefault{{
				Purposes: supplyWells, Default: 75, DefaultFt: 3,
				Source: "US EPA, Private Water Systems (gravel-pack design): a pack three inches thick is practical to place all round a screen, more than 8 in no better (75 mm for wells in metres)",
			}},
		}},
		Run: runAnnularSpace,
	})
}

func runAnnularSpace(p *Pass) {
	w := p.Well
	minSeal := schema.Diameter(p.Param("min"))
	minPack := schema.Diameter(p.Param("min_pack"))
	type fault struct {
		fill  *schema.Fill
		space schema.Diameter
		need  schema.Diameter
		outer string // "the 8 in hole" or `casing "surface" (ID 9.9 in)`
		bore  schema.Diameter
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
			need := minSeal
			if isPack(f) {
				need = minPack
			}
			space := (outerD - sumOD(inner)) / schema.Diameter(len(inner)+1)
			if space <= 0 || space >= need-roundOff {
				continue // a pipe that does not fit is PIPE-FITS-HOLE's or CASING-CLEARANCE's finding
			}
			outer := "the " + p.Dia(cs.Hole) + " hole"
			if name != boreholeAnnulus {
				outer = casing.Label() + " (ID " + p.Dia(casing.ID) + ")"
			}
			k := fmt.Sprintf("%s|%.4f", f.Path, float64(space))
			faults[k] = fault{f, space, need, outer, outerD, inner}
			t.add(k, seg)
		}
	}
	t.each(func(k string, iv schema.Interval) {
		f := faults[k]
		var ods []string
		for _, q := range f.inner {
			ods = append(ods, q.Owner()+" (OD "+p.Dia(q.OD)+")")
		}
		if len(f.inner) == 1 {
			p.Reportf(f.fill.Path, depths(iv), "annular space for %s at %s is %s: %s in %s; at least %s is needed",
				material(f.fill.Material), p.span(iv), p.Dia(f.space), ods[0], f.outer, p.Dia(f.need))
			return
		}
		n := schema.Diameter(len(f.inner) + 1)
		p.Reportf(f.fill.Path, depths(iv), "%s at %s: %s side by side in %s leave at best %s between them and to the wall; at least %s is needed (a bore of at least %s)",
			material(f.fill.Material), p.span(iv), strings.Join(ods, " and "), f.outer, p.Dia(f.space), p.Dia(f.need), p.Dia(sumOD(f.inner)+n*f.need))
	})
}
