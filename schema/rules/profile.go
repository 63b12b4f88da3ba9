package rules

import (
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// Profile holds a project's thresholds and severities. The zero overrides
// mean every rule runs with its documented defaults.
type Profile struct {
	Name string
	// File is the profile's path, "" for the defaults.
	File string
	// Source names the local code or authority the thresholds follow.
	Source string
	// Units is the depth unit the profile file wrote its values in; the
	// values below are already converted to model units.
	Units schema.DepthUnit
	// overrides are what the profile sets for every well: Values,
	// Severities and Off.
	overrides
	// Yields are the material yields the placement checks compare placed
	// amounts with (a project's yields file); nil for the built-in ones.
	Yields *quantity.Yields
	// ByPurpose holds what the profile sets for wells of one purpose only
	// ([rule.RULE-ID.PURPOSE] or a group of purposes); see profile_purpose.go.
	ByPurpose map[schema.Purpose]*overrides
}

// overrides are what a profile sets, for every well (Profile) or for the
// wells of one purpose (Profile.ByPurpose); [rule.ID] and
// [rule.ID.PURPOSE] are read into them by one reader (profileReader.settings).
type overrides struct {
	// Values overrides parameters: Values[ruleID][param] in model units.
	Values map[string]map[string]float64
	// Severities overrides a rule's default severity (for a purpose it
	// also switches the rule on).
	Severities map[string]Severity
	// Off lists rules switched off.
	Off map[string]bool
}

// setValue sets parameter name of rule id, in model units.
func (o *overrides) setValue(id, name string, v float64) {
	if o.Values == nil {
		o.Values = map[string]map[string]float64{}
	}
	if o.Values[id] == nil {
		o.Values[id] = map[string]float64{}
	}
	o.Values[id][name] = v
}

// setSeverity sets rule id's severity, or switches it off; the one set
// last stands.
func (o *overrides) setSeverity(id string, sev Severity, off bool) {
	if o.Severities == nil {
		o.Severities = map[string]Severity{}
	}
	if o.Off == nil {
		o.Off = map[string]bool{}
	}
	if off {
		o.Off[id] = true
		delete(o.Severities, id)
		return
	}
	o.Severities[id] = sev
	delete(o.Off, id)
}

// DefaultProfile is the profile with every default in force.
func DefaultProfile() *Profile { return &Profile{Name: "defaults"} }

func (p *Profile) value(r *Rule, name string, u schema.Units) float64 {
	if v, ok := p.Values[r.ID][name]; ok {
		return v
	}
	for _, prm := range r.Params {
		if prm.Name == name {
			return unitDefault(prm.Kind, prm.Default, prm.DefaultFt, u)
		}
	}
	panic("rules: rule " + r.ID + " has no parameter " + name)
}

func (p *Profile) severity(r *Rule) Severity {
	if s, ok := p.Severities[r.ID]; ok {
		return s
	}
	return r.Severity
}

func (p *Profile) disabled(r *Rule) bool { return p.Off[r.ID] }
