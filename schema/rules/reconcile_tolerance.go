package rules

import (
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// Tag tolerances relative to the interval: a tag may miss by the depth a
// fraction of the volume placed takes up at the tagged top, never less than
// the resolution of a weighted tape. A 1.24 ft miss on a 625-ft pack is
// under 1 % of its volume, within measurement and yield uncertainty; on a
// 2-ft seal it is most of it.

// tagTolerance is the common parameter pair of the tag rules.
func tagToleranceParams(what string) []Param {
	return []Param{{
		Name: "tolerance", Kind: LengthParam, Default: 0.15, DefaultFt: 0.5,
		Doc:    "least accepted difference between " + what + ", whatever the interval",
		Source: "common practice: 0.5 ft (0.15 m), the resolution of a weighted tape on a soft top",
	}, {
		Name: "fraction", Kind: RatioParam, Default: 0.02, Fraction: true,
		Doc: "share of the volume placed whose depth at the tagged top is also accepted (0 to 1); the larger of " +
			"this depth and tolerance applies",
		Source: "common practice: 2 % of the volume placed, about the spread of bag yields and of a hole's real " +
			"diameter; no published figure",
	}}
}

// tagTolerance is the accepted miss, as a depth, for a tag at depth at of
// fill f after volume placed went in: the depth the fraction of placed
// takes up just below at, filling upward in f's annulus, or the tape's
// tolerance if larger.
func (p *Pass) tagTolerance(f schema.Fill, at schema.Length, placed schema.Volume) schema.Length {
	floor := p.Length("tolerance")
	frac := p.Param("fraction")
	if frac <= 0 || placed <= 0 || at <= 0 {
		return floor
	}
	g := f
	g.Bottom, g.Top = at, 0
	top, _, err := quantity.RiseTop(p.Well, g, schema.Volume(frac)*placed)
	if err != nil {
		return floor
	}
	return max(floor, at-top)
}
