package rules

import (
	"github.com/tremie-dev/tremie/schema/quantity"
)

func init() {
	register(&Rule{
		ID:    "PLACED-VOLUME-LOW",
		Title: "Each fill took about the volume its annulus holds",
		Doc: "Compares the amount recorded as placed in each fill interval (bags times the yield per bag, or a " +
			"recorded volume) with the annular volume computed from the recorded hole and pipe diameters. Much " +
			"less than calculated means the material may have bridged in the annulus and left a void below, the " +
			"hole is narrower than recorded, or the record is wrong; the pack or seal may not be where the log " +
			"says.",
		Severity: Error,
		Source:   reconcileSources,
		Params: []Param{{
			Name: "min_ratio", Kind: RatioParam, Default: 0.8,
			Doc:    "lowest acceptable ratio of placed to calculated volume",
			Source: "common practice: 80 %, to allow for yields quoted loosely and for compaction",
		}},
		Reconcile: true,
		Run:       reconciling(runPlacedVolumeLow),
	})
	register(&Rule{
		ID:    "PLACED-VOLUME-HIGH",
		Title: "No fill took far more than its annulus holds",
		Doc: "Compares the amount recorded as placed in each fill interval with the annular volume computed " +
			"from the recorded diameters. Much more than calculated means material was lost to the formation " +
			"(a void, a fracture, a coarse layer) or the hole is enlarged (caving, washout); where it went " +
			"should be explained.",
		Severity: Warning,
		Source:   reconcileSources,
		Params: []Param{{
			Name: "max_ratio", Kind: RatioParam, Default: 1.5,
			Doc:    "highest acceptable ratio of placed to calculated volume",
			Source: "common practice: 150 %, since augered and mud-rotary holes commonly take more than their nominal size",
		}},
		Reconcile: true,
		Run:       reconciling(runPlacedVolumeHigh),
	})
}

func runPlacedVolumeLow(p *Pass, q *quantity.Report) {
	limit := p.Param("min_ratio")
	for _, r := range q.Rows {
		if r.Ratio <= 0 || r.Ratio >= limit {
			continue
		}
		u := p.Well.Units
		p.Reportf(amountKey(r.Fill), depths(r.Fill.Interval),
			"%s took %s against %s calculated (%s, below %s): a possible bridge, a hole narrower than recorded, or a recording error",
			p.fillLabel(&r.Fill), placedText(u, r), quantity.FormatVolume(r.Calculated, u), pct(r.Ratio), pct(limit))
	}
}

func runPlacedVolumeHigh(p *Pass, q *quantity.Report) {
	limit := p.Param("max_ratio")
	for _, r := range q.Rows {
		if r.Ratio <= limit {
			continue
		}
		u := p.Well.Units
		p.Reportf(amountKey(r.Fill), depths(r.Fill.Interval),
			"%s took %s against %s calculated (%s, above %s): material lost to the formation or a hole enlarged beyond its recorded diameter",
			p.fillLabel(&r.Fill), placedText(u, r), quantity.FormatVolume(r.Calculated, u), pct(r.Ratio), pct(limit))
	}
}
