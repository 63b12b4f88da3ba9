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
	// what names the value; built only for a finding, since most values pass
	check := func(path, k string, bottom schema.Length, what func() string) {
		if bottom > td+eps {
			p.Reportf(key(path, k), []schema.Length{td, bottom}, "%s reaches %s, below the total depth of %s", what(), p.D(bottom), p.D(td))
		}
	}
	for _, b := range w.Boreholes {
		check(b.Path, "bottom", b.Bottom, func() string { return "borehole section " + p.span(b.Interval) })
	}
	for _, c := range w.Casings {
		check(c.Path, "bottom", c.Bottom, func() string { return "casing \"" + c.Name + "\"" })
		for _, d := range c.Centralizers {
			check(c.Path, "centralizers", d, func() string { return "a centralizer on casing \"" + c.Name + "\"" })
		}
	}
	for _, s := range w.Strings {
		for _, sec := range s.Sections {
			check(sec.Path, "bottom", sec.Bottom, func() string {
				return "string \"" + s.Name + "\" " + string(sec.Kind) + " " + p.span(sec.Interval)
			})
		}
		for _, d := range s.Centralizers {
			check(s.Path, "centralizers", d, func() string { return "a centralizer on string \"" + s.Name + "\"" })
		}
	}
	for i := range w.Fills {
		f := &w.Fills[i]
		check(f.Path, "bottom", f.Bottom, func() string { return p.fillLabel(f) })
		for _, t := range f.Tags {
			check(t.Path, "depth", t.Depth, func() string { return "a tag of " + material(f.Material) })
		}
	}
	for _, o := range w.OpenHoles {
		check(o.Path, "bottom", o.Bottom, func() string { return "open hole " + p.span(o.Interval) })
	}
	for _, l := range w.Lithology {
		check(l.Path, "bottom", l.Bottom, func() string { return "lithology layer " + p.span(l.Interval) })
	}
	if v := w.Surface.Vault; v != nil {
		check("surface.vault", "depth", v.Depth, func() string { return "the vault" })
	}
	if pc := w.Surface.Protective; pc != nil {
		check("surface.protective", "bottom", pc.Bottom, func() string { return "the protective casing" })
	}
}
