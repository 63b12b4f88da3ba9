package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "SEAL-ABOVE-PACK",
		Title: "A bentonite seal lies directly on the filter pack",
		Doc: "The annulus is filled bottom up: filter pack, optional fine sand, a bentonite seal (chips, " +
			"pellets or granular bentonite), then grout or backfill, then the surface seal. The bentonite seal " +
			"keeps grout out of the pack and the screened zone cut off from the water above. Grout, concrete or " +
			"backfill placed directly on the pack (or fine sand), or nothing at all above it, leaves the pack " +
			"without a seal. Grout outside a casing whose shoe stands on a hole drilled out narrower below (a telescoped " +
			"well) lies on the formation's shelf, not on the pack under the shoe: the casing closes the pack's top.",
		Severity: Error,
		Source: "US Army Corps of Engineers TI 814-01 (1998): a bentonite seal above the filter pack; US EPA, RCRA " +
			"Ground-Water Monitoring: Draft Technical Guidance (1992): pack, fine sand, seal, grout",
		Run: runSealAbovePack,
	})
}

func runSealAbovePack(p *Pass) {
	for _, name := range annulusNames(p.Well) {
		fs := p.annulusFills(name)
		for _, st := range runs(fs, isPack) {
			top := st.Fills[0]
			if st.Top <= eps {
				p.Reportf(key(top.Path, "top"), []schema.Length{st.Top}, "%s reaches ground surface: nothing seals the pack at %s", p.fillLabel(top), p.span(st.Interval))
				continue
			}
			if sealOverlapsTop(fs, st.Interval) {
				continue // a seal is recorded there; the overlap is FILL-OVERLAP's finding
			}
			above, touching := fillAbove(fs, st.Top, isPack)
			switch {
			case above == nil:
				p.Reportf(key(top.Path, "top"), []schema.Length{st.Top}, "nothing is placed above the pack at %s: no bentonite seal", p.span(st.Interval))
			case isBentoniteSeal(above):
				// sealed; its thickness is SEAL-THICKNESS's business
			case touching && name == boreholeAnnulus && p.shoeCapsPack(st.Top):
				// the fill above stands outside a casing whose shoe sits on
				// a narrower hole: it touches the formation's shelf, not
				// the pack, and the casing closes the pack's top (what
				// fills the casing's bore over it, the lap, is ANNULUS-GAP's)
			case touching:
				p.Reportf(key(above.Path, "bottom"), []schema.Length{st.Top}, "%s rests directly on the pack (top at %s): no bentonite seal above the pack at %s", p.fillLabel(above), p.D(st.Top), p.span(st.Interval))
			default:
				p.Reportf(key(above.Path, "bottom"), []schema.Length{above.Bottom, st.Top}, "the first fill above the pack at %s is %s, with nothing recorded between: no bentonite seal", p.span(st.Interval), p.fillLabel(above))
			}
		}
	}
}

// sealOverlapsTop reports whether a bentonite seal recorded in the annulus
// reaches down across the top of the pack run iv: the file then records a
// seal on the pack, only with intervals that overlap.
func sealOverlapsTop(fs []*schema.Fill, iv schema.Interval) bool {
	for _, f := range fs {
		if isBentoniteSeal(f) && f.Top < iv.Top-eps && f.Bottom > iv.Top+eps {
			return true
		}
	}
	return false
}

// shoeCapsPack reports whether a casing ends at depth d on a hole no wider
// than its outside diameter, so that nothing in the borehole annulus above
// d lies over what is in the hole below it: a telescoped well's casing
// set on the shelf where the hole was drilled out narrower.
func (p *Pass) shoeCapsPack(d schema.Length) bool {
	below := p.crossSections().At(d)
	if !below.HasHole {
		return false
	}
	for _, cs := range p.crossSections().All() {
		if cs.Bottom < d-eps || cs.Bottom > d+eps {
			continue
		}
		for _, c := range cs.Outermost() {
			if c.Casing != nil && c.Bottom <= d+eps && c.OD >= below.Hole {
				return true
			}
		}
	}
	return false
}
