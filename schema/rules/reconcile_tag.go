package rules

import (
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

func init() {
	register(&Rule{
		ID:    "TAG-EXPECTED-TOP",
		Title: "Each tag is where the bags placed should have brought the fill",
		Doc: "For each weighted-tape tag of a fill's top, computes the depth the top should have reached after " +
			"that many bags, filling upward from the interval's bottom through the recorded hole and pipe " +
			"diameters, and compares. A tag shallower than expected suggests a bridge (material hung up above a " +
			"void) or a narrower hole; a tag deeper than expected suggests material lost to the formation or an " +
			"enlarged hole. The accepted miss grows with the interval: the depth that a fraction of the volume " +
			"placed so far takes up at the expected top, but at least the tape's tolerance.",
		Severity:  Warning,
		Source:    reconcileSources,
		Params:    tagToleranceParams("a tag and the expected top"),
		Reconcile: true,
		Run:       reconciling(runTagExpectedTop),
	})
	register(&Rule{
		ID:    "TAG-FINAL-TOP",
		Title: "The final tag confirms the fill's recorded top",
		Doc: "The last tag of a fill, taken once all its bags were in, measures where its top really is. When it " +
			"differs from the top the file records for the interval, the log shows the pack or seal where it " +
			"is not. The accepted miss is the depth a fraction of the interval's volume takes up at its top, but " +
			"at least the tape's tolerance.",
		Severity:  Error,
		Source:    reconcileSources,
		Params:    tagToleranceParams("the final tag and the recorded top"),
		Reconcile: true,
		Run:       runTagFinalTop,
	})
}

func runTagExpectedTop(p *Pass, q *quantity.Report) {
	u := p.Well.Units
	for _, r := range q.Rows {
		if r.Err != nil {
			continue
		}
		for _, tc := range r.Tags {
			if tc.Err != nil {
				continue
			}
			off := tc.Off()
			vol := schema.Volume(tc.Tag.AfterBags) * r.Yield.Volume
			tol := p.tagTolerance(r.Fill, tc.Expected, vol)
			if absLength(off) <= tol+eps {
				continue
			}
			why := "a possible bridge above a void, or a hole narrower than recorded"
			if off > 0 {
				why = "material lost to the formation, or a hole wider than recorded"
			}
			expected := "which should bring the top to " + p.D(tc.Expected)
			if !tc.Reached {
				expected = "more than the annulus holds up to " + p.D(tc.Expected)
			}
			p.Reportf(key(tc.Tag.Path, "depth"), ordered(tc.Expected, tc.Tag.Depth),
				"%s: tagged at %s after %s bags, but %s bags at %s make %s, %s: %s %s (accepted: %s), %s",
				p.fillLabel(&r.Fill), p.D(tc.Tag.Depth), schema.TrimFloat(tc.Tag.AfterBags, 2),
				schema.TrimFloat(tc.Tag.AfterBags, 2), quantity.FormatYield(r.Yield, u), quantity.FormatVolume(vol, u),
				expected, p.D(absLength(off)), tagDirection(off), p.D(tol), why)
		}
	}
}

func runTagFinalTop(p *Pass) {
	for _, f := range p.Well.Fills {
		final, ok := finalTag(f)
		if !ok {
			continue
		}
		off := final.Depth - f.Top
		vol, err := quantity.AnnularVolume(p.Well, f)
		if err != nil {
			vol = 0 // the geometry's fault is another rule's; the tape's tolerance applies
		}
		tol := p.tagTolerance(f, f.Top, vol)
		if absLength(off) <= tol+eps {
			continue
		}
		p.Reportf(key(final.Path, "depth"), ordered(f.Top, final.Depth),
			"%s: the final tag (after %s bags) found the top at %s, but the recorded top is %s: %s %s (accepted: %s)",
			p.fillLabel(&f), schema.TrimFloat(final.AfterBags, 2), p.D(final.Depth), p.D(f.Top), p.D(absLength(off)), tagDirection(off), p.D(tol))
	}
}

// finalTag is the tag taken after the most bags, if it was taken once
// every recorded bag was in (or no bag count was recorded).
func finalTag(f schema.Fill) (schema.Tag, bool) {
	if len(f.Tags) == 0 {
		return schema.Tag{}, false
	}
	last := f.Tags[0]
	for _, t := range f.Tags[1:] {
		if t.AfterBags >= last.AfterBags {
			last = t
		}
	}
	if f.Bags > 0 && last.AfterBags < f.Bags {
		return schema.Tag{}, false
	}
	return last, true
}

func tagDirection(off schema.Length) string {
	if off > 0 {
		return "deeper"
	}
	return "shallower"
}

func absLength(l schema.Length) schema.Length {
	if l < 0 {
		return -l
	}
	return l
}

// ordered is two depths as a finding's Depths, shallower first.
func ordered(a, b schema.Length) []schema.Length {
	if b < a {
		a, b = b, a
	}
	return []schema.Length{a, b}
}
