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

	secs     *schema.Sections
	segs     []schema.Interval
	sections []schema.CrossSection // what stands in the hole over segs[i]
	hasSegs  bool

	fills map[string][]*schema.Fill // annulus name -> its fills, top down

	report *quantity.Report
}

// crossSections returns the well's cross-sections, made once per check.
func (p *Pass) crossSections() *schema.Sections {
	s := p.shared
	if s != nil && s.secs != nil {
		return s.secs
	}
	secs := p.Well.CrossSections()
	if s != nil {
		s.secs = secs
	}
	return secs
}

// segments returns the slabs of the well from ground to total depth
// thicker than eps, with the cross-section over each.
func (p *Pass) segments() ([]schema.Interval, []schema.CrossSection) {
	s := p.shared
	if s != nil && s.hasSegs {
		return s.segs, s.sections
	}
	var segs []schema.Interval
	var cs []schema.CrossSection
	for _, c := range p.crossSections().Within(0, p.Well.TotalDepth) {
		if c.Thickness() > eps {
			segs, cs = append(segs, c.Interval), append(cs, c)
		}
	}
	if s != nil {
		s.segs, s.sections, s.hasSegs = segs, cs, true
	}
	return segs, cs
}

// annulusAt names the annulus just outside a string at depth d: the
// innermost casing present there, or the borehole annulus.
func (p *Pass) annulusAt(d schema.Length) string { return p.crossSections().At(d).Annulus() }

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
