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
			"of it, one at the coarse end none. A pack given by its grading curve (d10, and d30, d60 if known) is " +
			"judged on it instead: by definition a slot no wider than d10 holds back the 90 % of the pack that is " +
			"coarser; between two known points the share passing is read on a straight line in log grain size. " +
			"Packs with no gradation, grain sizes or grading recorded are skipped.",
		Severity: Error,
		Source: "US EPA, RCRA Ground-Water Monitoring: Draft Technical Guidance (1992): the slot retains 90 to 100 % of the filter pack; " +
			"d10, d30, d60 as defined in ASTM D2487 and D6913 (the sizes 10, 30, 60 % of the mass is finer than)",
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
			if !isPack(f) || (f.GrainMin <= 0 && f.D10 <= 0) {
				continue
			}
			if _, ok := overlap(f.Interval, sec.Interval); !ok {
				continue
			}
			if f.D10 > 0 {
				p.slotAgainstCurve(sc, f, need)
				continue
			}
			kept := retainedFraction(sec.Slot, f.GrainMin, f.GrainMax)
			if kept >= need-roundOff {
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

// retainedByCurve bounds the share of a pack a slot holds back, from the
// points of its grading curve that are known ((d10, 10 %), (d30, 30 %),
// (d60, 60 %) finer by mass): exact at a point, read on a straight line in
// log size between two (our model, as a sieve analysis is plotted), and
// only bounded outside them.
func retainedByCurve(slot schema.Diameter, f *schema.Fill) (lo, hi float64) {
	type point struct {
		d       schema.Diameter
		passing float64
	}
	var pts []point
	for _, q := range []point{{f.D10, 0.10}, {f.D30, 0.30}, {f.D60, 0.60}} {
		if q.d > 0 {
			pts = append(pts, q)
		}
	}
	if slot <= pts[0].d {
		return 1 - pts[0].passing, 1 // at most 10 % is finer than the slot
	}
	for i := 1; i < len(pts); i++ {
		a, b := pts[i-1], pts[i]
		if slot <= b.d {
			passing := a.passing
			if b.d > a.d {
				passing += (b.passing - a.passing) * math.Log(float64(slot/a.d)) / math.Log(float64(b.d/a.d))
			}
			return 1 - passing, 1 - passing
		}
	}
	// coarser than the last point known: strictly less is retained than
	// at that point, so the bound sits a millionth (well above roundOff)
	// below it and a need of exactly that share is not met
	return 0, 1 - pts[len(pts)-1].passing - 1e-6
}

// slotAgainstCurve checks a screen's slot against a pack's grading curve.
func (p *Pass) slotAgainstCurve(sc schema.StringSection, f *schema.Fill, need float64) {
	sec := sc.Section
	lo, hi := retainedByCurve(sec.Slot, f)
	if hi >= need-roundOff {
		return // retains enough, or may: the curve says no less
	}
	slotKey := key(sec.Path, "slot")
	if !p.Well.HasKey(slotKey) {
		slotKey = key(sec.Path, "slot_number")
	}
	share := "about " + pct(lo)
	if lo != hi {
		share = "less than " + pct(hi)
	}
	p.Reportf(slotKey, depths(sec.Interval), "the %.0f-slot (%s) screen of string %q at %s is wider than the d10 (%s mm) of the %s at %s: it retains %s of it; at least %s should be retained",
		sec.SlotNumber(), p.Dia(sec.Slot), sc.String.Name, p.span(sec.Interval), schema.TrimFloat(float64(f.D10), 3),
		material(f.Material), p.span(f.Interval), share, pct(need))
}
