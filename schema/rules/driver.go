package rules

import (
	"cmp"
	"fmt"
	"slices"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// Run is the one driver: it runs the given rules on a well under a profile
// (nil for the defaults; its Yields, if any, make the quantities), applies
// the well's waivers and returns the findings sorted by file, line, then
// rule. Rules share what they derive from the well (segments, fills,
// quantities) through one shared value. A panic in one rule becomes an
// error finding for it, so that no input stops the check.
func Run(w *schema.Well, rs []*Rule, prof *Profile) []Finding {
	return RunWithQuantities(w, rs, prof, nil)
}

// RunWithQuantities is Run for a caller that has already computed the
// well's quantities under the profile's yields (prof.Yields, nil for the
// built-in ones): the rules read q instead of computing it again. q must
// not change while they run; nil computes it as Run does.
func RunWithQuantities(w *schema.Well, rs []*Rule, prof *Profile, q *quantity.Report) []Finding {
	if prof == nil {
		prof = DefaultProfile()
	}
	var out []Finding
	sh := &shared{yields: prof.Yields, report: q}
	for _, r := range rs {
		runOne(r, w, prof, sh, &out)
	}
	applyWaivers(w, out)
	slices.SortStableFunc(out, func(a, b Finding) int {
		return cmp.Or(cmp.Compare(a.File, b.File), cmp.Compare(a.Line, b.Line), cmp.Compare(a.Rule, b.Rule))
	})
	return out
}

// Check runs every rule on a well: Run with All().
func Check(w *schema.Well, prof *Profile) []Finding {
	return Run(w, sortedRules(), prof)
}

// Select returns the rules keep accepts, sorted by ID.
func Select(keep func(*Rule) bool) []*Rule {
	var out []*Rule
	for _, r := range sortedRules() {
		if keep(r) {
			out = append(out, r)
		}
	}
	return out
}

// Reconciling accepts the rules that compare placed amounts and tags with
// the calculated quantities (Rule.Reconcile), for Select.
func Reconciling(r *Rule) bool { return r.Reconcile }

func runOne(r *Rule, w *schema.Well, prof *Profile, sh *shared, out *[]Finding) {
	defer func() {
		if e := recover(); e != nil {
			*out = append(*out, Finding{Rule: r.ID, Severity: Error, File: w.Pos.File, Line: 1, WellID: w.ID,
				Message: fmt.Sprintf("internal error in rule %s: %v (please report)", r.ID, e)})
		}
	}()
	if !prof.applies(r, w.Purpose) {
		return
	}
	r.Run(&Pass{Well: w, Rule: r, profile: prof, out: out, shared: sh})
}

func applyWaivers(w *schema.Well, fs []Finding) {
	for i := range fs {
		for _, wv := range w.Waivers {
			if wv.Rule == fs[i].Rule {
				fs[i].Waived = true
				fs[i].Waiver = &Waiver{Reason: wv.Reason, ApprovedBy: wv.ApprovedBy, Date: wv.Date.String()}
				break
			}
		}
	}
}
