package quantity

import (
	stdslices "slices"

	"github.com/tremie-dev/tremie/schema"
)

// The surface completion stands in the top of the hole: a flush-mount
// vault down to its depth, a stick-up protective casing down to its
// bottom. Each is taken as thin-walled (the file gives one diameter) and
// everything else in the hole there stands inside it, so the borehole
// annulus beside it is the hole less its footprint.

// surfaceIntervals are the depth ranges of the surface parts below ground.
func surfaceIntervals(w *schema.Well) []schema.Interval {
	var out []schema.Interval
	if v := w.Surface.Vault; v != nil && v.Diameter > 0 && v.Depth > 0 {
		out = append(out, schema.Interval{Top: 0, Bottom: v.Depth})
	}
	if pc := w.Surface.Protective; pc != nil && pc.Diameter > 0 && pc.Bottom > 0 {
		out = append(out, schema.Interval{Top: max(pc.Top, 0), Bottom: pc.Bottom})
	}
	return out
}

// surfaceAt is the diameter of the widest surface part standing at depth
// z, or 0.
func surfaceAt(w *schema.Well, z schema.Length) schema.Diameter {
	var d schema.Diameter
	if v := w.Surface.Vault; v != nil && 0 <= z && z < v.Depth {
		d = max(d, v.Diameter)
	}
	if pc := w.Surface.Protective; pc != nil && max(pc.Top, 0) <= z && z < pc.Bottom {
		d = max(d, pc.Diameter)
	}
	return d
}

// within is secs.Within cut again at the surface parts' ends, so that
// each slab has one surface part or none.
func within(w *schema.Well, secs *schema.Sections, top, bottom schema.Length) []schema.CrossSection {
	cs := secs.Within(top, bottom)
	ivs := surfaceIntervals(w)
	if len(ivs) == 0 {
		return cs
	}
	out := make([]schema.CrossSection, 0, len(cs)+2*len(ivs))
	for _, c := range cs {
		cuts := []schema.Length{c.Top, c.Bottom}
		for _, iv := range ivs {
			for _, z := range []schema.Length{iv.Top, iv.Bottom} {
				if c.Top < z && z < c.Bottom {
					cuts = append(cuts, z)
				}
			}
		}
		stdslices.Sort(cuts)
		cuts = stdslices.Compact(cuts)
		for i := 1; i < len(cuts); i++ {
			piece := c
			piece.Top, piece.Bottom = cuts[i-1], cuts[i]
			out = append(out, piece)
		}
	}
	return out
}

// regionArea is Area with the surface parts: in the borehole annulus a
// vault or protective casing wider than every casing there takes its
// footprint in place of what stands inside it; one at least as wide as
// the hole stands in its own excavation and leaves no annulus (the pad
// takes that concrete).
func regionArea(w *schema.Well, c schema.CrossSection, r Region) (float64, error) {
	d := surfaceAt(w, c.Top+(c.Bottom-c.Top)/2)
	if d <= 0 || r.Within != "" || c.Hole <= 0 {
		return Area(c, r, w.Units)
	}
	for _, p := range c.Outermost() {
		if p.Casing != nil && p.OD > d {
			return Area(c, r, w.Units) // the surface part stands inside a casing
		}
	}
	if d >= c.Hole {
		return 0, nil
	}
	return circle(c.Hole) - circle(d), nil
}
