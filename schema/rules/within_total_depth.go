package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "WITHIN-TOTAL-DEPTH",
		Title: "Every interval lies within the total depth",
		Doc: "Nothing can be built, placed or logged below the bottom of the hole: every borehole section, " +
			"casing, string section, fill, open hole, lithology layer, centralizer and tag must end at or above " +
			"the total depth. A deeper value is a typing error in either the interval or the total depth.",
		Severity: Error,
		Source:   "definition of total depth (common practice)",
		Run:      runWithinTotalDepth,
	})
}

func runWithinTotalDepth(p *Pass) {
	w := p.Well
	td := w.TotalDepth
	check := func(path, what string, bottom schema.Length) {
		if bottom > td+eps {
			p.Reportf(path, []schema.Length{td, bottom}, "%s reaches %s, below the total depth of %s", what, p.D(bottom), p.D(td))
		}
	}
	for _, b := range w.Boreholes {
		check(key(b.Path, "bottom"), "borehole section "+p.span(b.Interval), b.Bottom)
	}
	for _, c := range w.Casings {
		check(key(c.Path, "bottom"), "casing \""+c.Name+"\"", c.Bottom)
		for _, d := range c.Centralizers {
			check(key(c.Path, "centralizers"), "a centralizer on casing \""+c.Name+"\"", d)
		}
	}
	for _, s := range w.Strings {
		for _, sec := range s.Sections {
			check(key(sec.Path, "bottom"), "string \""+s.Name+"\" "+string(sec.Kind)+" "+p.span(sec.Interval), sec.Bottom)
		}
		for _, d := range s.Centralizers {
			check(key(s.Path, "centralizers"), "a centralizer on string \""+s.Name+"\"", d)
		}
	}
	for i := range w.Fills {
		f := &w.Fills[i]
		check(key(f.Path, "bottom"), p.fillLabel(f), f.Bottom)
		for _, t := range f.Tags {
			check(key(t.Path, "depth"), "a tag of "+material(f.Material), t.Depth)
		}
	}
	for _, o := range w.OpenHoles {
		check(key(o.Path, "bottom"), "open hole "+p.span(o.Interval), o.Bottom)
	}
	for _, l := range w.Lithology {
		check(key(l.Path, "bottom"), "lithology layer "+p.span(l.Interval), l.Bottom)
	}
	if v := w.Surface.Vault; v != nil {
		check("surface.vault.depth", "the vault", v.Depth)
	}
	if pc := w.Surface.Protective; pc != nil {
		check("surface.protective.bottom", "the protective casing", pc.Bottom)
	}
}
