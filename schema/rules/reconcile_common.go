package rules

// Shared by the reconciliation rules (reconcile_*.go): the quantities of
// the well under check and how to describe them.

import (
	"fmt"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// reconcileSources is where the duty to reconcile comes from.
const reconcileSources = "US EPA, RCRA Ground-Water Monitoring: Draft Technical Guidance (1992): calculate and record " +
	"the volumes of filter pack and seal placed and explain any significant discrepancy; California DWR Bulletin " +
	"74-90: check the depth of the top of the filter pack and verify its volume, to detect bridging"

// quantities computes the well's quantities with the built-in yields; a
// fill's own yield key overrides them.
func quantities(p *Pass) *quantity.Report { return quantity.Compute(p.Well, quantity.DefaultYields()) }

// placedText says how much went in: "5 x 50-lb bag = 2.500 ft3 (18.70 gal)"
// or "5.000 ft3 (37.40 gal)" for a recorded volume.
func placedText(u schema.Units, r quantity.Row) string {
	if r.Fill.Placed > 0 {
		return quantity.FormatVolume(r.Placed, u)
	}
	return fmt.Sprintf("%s x %s = %s", schema.TrimFloat(r.BagsPlaced, 2), quantity.FormatBag(r.Yield.BagMass, u), quantity.FormatVolume(r.Placed, u))
}

// amountKey is the key that records the amount placed, for the line.
func amountKey(f schema.Fill) string {
	if f.Placed > 0 {
		return key(f.Path, "volume")
	}
	return key(f.Path, "bags")
}
