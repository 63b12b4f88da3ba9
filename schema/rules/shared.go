package rules

import (
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// shared is what several rules derive from the same well: the elementary
// depth segments with what stands in the hole in each, the fills of each
// annulus, the quantities. Check builds each piece once, on first use, and
// every rule of that Check reads it; rules must not change it. A piece is
// stored only once fully built, so a rule that panics half-way leaves
// nothing half-made for the next one.
type shared struct {
	yields *quantity.Yields // for quantities; nil for the built-in ones

	segs     []schema.Interval
	sections []crossSection // what stands in the hole at the middle of segs[i]
	hasSegs  bool

	fills map[string][]*schema.Fill // annulus name -> its fills, top down

	report *quantity.Report
}

// segments returns segments(w) and the cross-section at the middle of each.
func (p *Pass) segments() ([]schema.Interval, []crossSection) {
	s := p.shared
	if s != nil && s.hasSegs {
		return s.segs, s.sections
	}
	segs := segments(p.Well)
	cs := make([]crossSection, len(segs))
	for i, seg := range segs {
		cs[i] = crossSectionAt(p.Well, mid(seg))
	}
	if s != nil {
		s.segs, s.sections, s.hasSegs = segs, cs, true
	}
	return segs, cs
}

// annulusFills returns annulusFills(w, name), shared across the rules.
func (p *Pass) annulusFills(name string) []*schema.Fill {
	s := p.shared
	if s == nil {
		return annulusFills(p.Well, name)
	}
	if fs, ok := s.fills[name]; ok {
		return fs
	}
	fs := annulusFills(p.Well, name)
	if s.fills == nil {
		s.fills = map[string][]*schema.Fill{}
	}
	s.fills[name] = fs
	return fs
}

// quantities returns the well's quantities with the yields of this check.
func (p *Pass) quantities() *quantity.Report {
	s := p.shared
	if s == nil {
		return quantity.Compute(p.Well, nil)
	}
	if s.report == nil {
		s.report = quantity.Compute(p.Well, s.yields)
	}
	return s.report
}
