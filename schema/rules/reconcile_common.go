package rules

// Shared by the reconciliation rules (reconcile_*.go): the quantities of
// the well under check and how to describe them.

import (
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// reconcileSources is where the duty to reconcile comes from.
const reconcileSources = "US EPA, RCRA Ground-Water Monitoring: Draft Technical Guidance (1992): calculate and record " +
	"the volumes of filter pack and seal placed and explain any significant discrepancy; California DWR Bulletin " +
	"74-90: check the depth of the top of the filter pack and verify its volume, to detect bridging"

// reconcileRun is the body of a reconciliation rule that needs the well's
// quantities.
type reconcileRun func(p *Pass, q *quantity.Report)

// reconciling makes a rule's Run from its body. The quantities are those of
// the profile's yields (the built-in ones when it has none; a fill's own
// yield key overrides them), computed once for all the rules of a run.
func reconciling(run reconcileRun) func(*Pass) {
	return func(p *Pass) { run(p, p.quantities()) }
}

// placedText says how much went in: "5 × 50-lb bags = 2.500 ft³ (18.70 gal)"
// or "5.000 ft³ (37.40 gal)" for a recorded volume.
func placedText(u schema.Units, r quantity.Row) string {
	if r.Fill.Placed > 0 {
		return quantity.FormatVolume(r.Placed, u)
	}
	return quantity.FormatBags(r.BagsPlaced, r.Yield.BagMass, u) + " = " + quantity.FormatVolume(r.Placed, u)
}

// amountKey is the key that records the amount placed, for the line.
func amountKey(f schema.Fill) string {
	if f.Placed > 0 {
		return key(f.Path, "volume")
	}
	return key(f.Path, "bags")
}
