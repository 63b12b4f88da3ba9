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
	// Values overrides parameters: Values[ruleID][param] in model units.
	Values map[string]map[string]float64
	// Severities overrides a rule's default severity.
	Severities map[string]Severity
	// Off lists rules switched off for the project.
	Off map[string]bool
	// Yields are the material yields the placement checks compare placed
	// amounts with (a project's yields file); nil for the built-in ones.
	Yields *quantity.Yields
	// ByPurpose holds what the profile sets for wells of one purpose only
	// ([rule.RULE-ID.PURPOSE] or a group of purposes); see profile_purpose.go.
	ByPurpose map[schema.Purpose]*purposeOverrides
}

// DefaultProfile is the profile with every default in force.
func DefaultProfile() *Profile { return &Profile{Name: "defaults"} }

func (p *Profile) value(r *Rule, name string, u schema.Units) float64 {
	if v, ok := p.Values[r.ID][name]; ok {
		return v
	}
	for _, prm := range r.Params {
		if prm.Name != name {
			continue
		}
		if u.Imperial() && prm.DefaultFt != 0 {
			switch prm.Kind {
			case LengthParam:
				return float64(schema.LengthFrom(prm.DefaultFt, schema.Feet))
			case DiameterParam:
				return float64(schema.DiameterFrom(prm.DefaultFt, schema.Inches))
			case VelocityParam:
				return prm.DefaultFt * schema.MetresPerFoot
			}
		}
		return prm.Default
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
