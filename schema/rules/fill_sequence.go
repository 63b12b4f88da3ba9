package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "FILL-SEQUENCE",
		Title: "Annular fills follow the bottom-up sequence",
		Doc: "Bottom up, an annulus holds filter pack around the screen, optional fine sand, a bentonite " +
			"seal, grout or backfill, and the surface seal. Besides a missing seal on the pack (SEAL-ABOVE-PACK), " +
			"this warns of three departures: fine sand below the filter pack (fine sand belongs above it, to " +
			"keep the seal out of the pack), a pack that surrounds no screen (it connects zones and monitors " +
			"nothing), and a fill above the concrete surface seal.",
		Severity: Warning,
		Source: "US EPA, RCRA Ground-Water Monitoring: Draft Technical Guidance (1992): filter pack, 1 to 2 ft of " +
			"fine sand, bentonite seal, grout, surface seal",
		Run: runFillSequence,
	})
}

func runFillSequence(p *Pass) {
	w := p.Well
	screens := w.Screens()
	for _, name := range annulusNames(w) {
		fs := p.annulusFills(name)
		for _, st := range runs(fs, isPack) {
			for _, f := range st.Fills {
				if f.Material != schema.FineSand {
					continue
				}
				for _, g := range st.Fills {
					if g.Material == schema.FilterPack && g.Top < f.Top-eps {
						p.Reportf(key(f.Path, "top"), depths(f.Interval), "fine sand at %s lies below %s: fine sand belongs above the filter pack", p.span(f.Interval), p.fillLabel(g))
						break
					}
				}
			}
			packs := false
			for _, sc := range screens {
				if _, ok := overlap(sc.Section.Interval, st.Interval); ok {
					packs = true
				}
			}
			if !packs {
				p.Reportf(key(st.Fills[0].Path, "top"), depths(st.Interval), "the pack at %s surrounds no screen: it connects the layers it crosses and monitors nothing", p.span(st.Interval))
			}
		}
		for _, c := range fs {
			if c.Material != schema.Concrete {
				continue
			}
			if above, _ := fillAbove(fs, c.Top, func(f *schema.Fill) bool { return f.Material == schema.Concrete }); above != nil {
				p.Reportf(key(above.Path, "bottom"), depths(above.Interval), "%s lies above the concrete at %s: concrete is the surface seal and belongs on top", p.fillLabel(above), p.span(c.Interval))
			}
		}
	}
}
