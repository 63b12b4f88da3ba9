package quantity

import "github.com/tremie-dev/tremie/schema"

// PackDesign is a filter pack's grading figures: its uniformity
// coefficient and its d30 against each formation sample taken within a
// screen it surrounds. Rules PACK-UNIFORMITY and PACK-FORMATION-RATIO
// judge the same figures.
type PackDesign struct {
	Index  int     // index of the fill in Well.Fills
	Cu     float64 // d60/d10 (ASTM D2487); 0 when either is unknown
	Ratios []SampleRatio
}

// SampleRatio is the pack's d30 over one formation sample's d30.
type SampleRatio struct {
	Sample schema.FormationSample
	Ratio  float64
}

// PackDesigns lists the filter packs of a well that have a figure to
// show, in file order.
func PackDesigns(w *schema.Well) []PackDesign {
	var out []PackDesign
	screens := w.Screens()
	for i := range w.Fills {
		f := &w.Fills[i]
		if f.Material != schema.FilterPack {
			continue
		}
		d := PackDesign{Index: i, Cu: schema.UniformityCoefficient(f.D10, f.D60)}
		seen := map[string]bool{}
		for _, sc := range screens {
			iv := sc.Section.Interval
			if f.Top >= iv.Bottom || f.Bottom <= iv.Top {
				continue
			}
			for _, s := range w.SamplesWithin(iv) {
				if r := schema.PackFormationRatio(f, s); r > 0 && !seen[s.Path] {
					seen[s.Path] = true
					d.Ratios = append(d.Ratios, SampleRatio{Sample: s, Ratio: r})
				}
			}
		}
		if d.Cu > 0 || len(d.Ratios) > 0 {
			out = append(out, d)
		}
	}
	return out
}
