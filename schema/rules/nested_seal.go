package rules

import (
	"sort"

	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&Rule{
		ID:    "NESTED-SEAL",
		Title: "A seal separates the packs of nested wells",
		Doc: "In a nested completion (two or more well strings in one borehole) each string monitors its own " +
			"zone only if the annulus between neighbouring screens holds a seal (bentonite or grout) of at least " +
			"the minimum thickness. A pack running from one screen to the next, or a thin seal, joins the zones.",
		Severity: Error,
		Source:   "US Army Corps of Engineers TI 814-01 (1998): at least 2 ft of bentonite seal above each filter pack",
		Params: []Param{{
			Name: "min", Kind: LengthParam, Default: 0.6, DefaultFt: 2,
			Doc:    "minimum seal thickness between the screens of neighbouring strings",
			Source: "US Army Corps of Engineers TI 814-01 (1998): 2 ft (0.6 m)",
		}},
		Run: runNestedSeal,
	})
}

func runNestedSeal(p *Pass) {
	w := p.Well
	if len(w.Strings) < 2 {
		return
	}
	screens := w.Screens()
	sort.SliceStable(screens, func(i, j int) bool { return screens[i].Section.Top < screens[j].Section.Top })
	minSeal := p.Length("min")
	for i := 1; i < len(screens); i++ {
		up, low := screens[i-1], screens[i]
		if up.String == low.String {
			continue
		}
		if iv, ok := overlap(up.Section.Interval, low.Section.Interval); ok {
			p.Reportf(low.Section.Path, depths(iv), "the screens of strings %q and %q overlap at %s: they screen one zone", up.String.Name, low.String.Name, p.span(iv))
			continue
		}
		between := schema.Interval{Top: up.Section.Bottom, Bottom: low.Section.Top}
		var sealed []schema.Interval
		for _, f := range p.annulusFills(p.annulusAt(mid(between))) {
			if iv, ok := overlap(f.Interval, between); ok && f.Material.IsSeal() {
				sealed = append(sealed, iv)
			}
		}
		t := thickness(sealed)
		if t < minSeal-eps {
			p.Reportf(low.Section.Path, depths(between), "between the screen of string %q and that of string %q (%s) the annulus holds %s of seal; at least %s is needed",
				up.String.Name, low.String.Name, p.span(between), p.D(t), p.D(minSeal))
		}
	}
}
