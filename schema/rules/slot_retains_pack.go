package rules

import (
	"math"

	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&Rule{
		ID:    "SLOT-RETAINS-PACK",
		Title: "The screen slot retains the filter pack",
		Doc: "The slot must be narrow enough to hold back nearly all of the pack around the screen, or the " +
			"pack washes into the well and the formation follows. For a pack given by a sieve range (e.g. " +
			"20/40: 0.425 to 0.850 mm) the share retained by a slot is estimated by taking the grains as spread " +
			"evenly on a log scale between the two sieve openings: a slot at or below the fine end retains all " +
			"of it, one at the coarse end none. Packs with no gradation or grain sizes recorded are skipped.",
		Severity: Error,
		Source:   "US EPA, RCRA Ground-Water Monitoring: Draft Technical Guidance (1992): the slot retains 90 to 100 % of the filter pack",
		Params: []Param{{
			Name: "min_retained", Kind: RatioParam, Default: 0.90, Fraction: true,
			Doc:    "least fraction of the pack the slot must retain (0 to 1)",
			Source: "US EPA 1992: 90 %",
			ByPurpose: []PurposeDefault{{
				Purposes: supplyWells, Default: 0.85,
				Source: "US Army Corps of Engineers TI 814-01 (1998) / TM 5-813-1: the slot such that 85 to 100 % of the pack is larger than the openings; US EPA 1992 notes production wells need less retention than monitoring wells",
			}},
		}},
		Run: runSlotRetainsPack,
	})
}

// retainedFraction estimates the share of a pack with grains from lo to hi
// (mm) that a slot of the given width holds back, for grains spread evenly
// on a log scale between the two sieve openings (our model; a sieve range
// says no more). hi == 0 means only the finest grain is known: then the
// slot retains all or, past it, an unknown share, returned as 0.
func retainedFraction(slot, lo, hi schema.Diameter) float64 {
	switch {
	case slot <= lo:
		return 1
	case hi <= lo || slot >= hi:
		return 0
	}
	return 1 - math.Log(float64(slot/lo))/math.Log(float64(hi/lo))
}

func runSlotRetainsPack(p *Pass) {
	w := p.Well
	need := p.Param("min_retained")
	for _, sc := range w.Screens() {
		sec := sc.Section
		if sec.Slot <= 0 {
			continue
		}
		for _, f := range p.annulusFills(p.annulusAt(mid(sec.Interval))) {
			if !isPack(f) || f.GrainMin <= 0 {
				continue
			}
			if _, ok := overlap(f.Interval, sec.Interval); !ok {
				continue
			}
			kept := retainedFraction(sec.Slot, f.GrainMin, f.GrainMax)
			if kept >= need-1e-9 {
				continue
			}
			pack := material(f.Material)
			if f.Gradation != "" {
				pack = f.Gradation + " " + pack
			}
			slotKey := key(sec.Path, "slot")
			if !w.HasKey(slotKey) {
				slotKey = key(sec.Path, "slot_number")
			}
			if f.GrainMax <= f.GrainMin {
				p.Reportf(slotKey, depths(sec.Interval), "the %.0f-slot (%s) screen of string %q at %s is wider than the finest grain (%s mm) of the %s at %s",
					sec.SlotNumber(), p.Dia(sec.Slot), sc.String.Name, p.span(sec.Interval), schema.TrimFloat(float64(f.GrainMin), 3), pack, p.span(f.Interval))
				continue
			}
			p.Reportf(slotKey, depths(sec.Interval), "the %.0f-slot (%s) screen of string %q at %s retains about %s of the %s at %s (%s to %s mm); at least %s should be retained",
				sec.SlotNumber(), p.Dia(sec.Slot), sc.String.Name, p.span(sec.Interval), pct(kept), pack, p.span(f.Interval),
				schema.TrimFloat(float64(f.GrainMin), 3), schema.TrimFloat(float64(f.GrainMax), 3), pct(need))
		}
	}
}
