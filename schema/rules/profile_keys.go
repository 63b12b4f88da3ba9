package rules

import (
	"strings"
	"sync"

	"github.com/tremie-dev/tremie/schema"
)

// Units of profile values, by parameter kind.
const (
	profileLength   = "profile length unit ([profile] units: ft or m)"
	profileDiameter = "in with a ft profile, mm with a m profile"
	profileRatio    = "a plain number (0.9 = 90 %)"
	profileVelocity = "ft/s with a ft profile, m/s with a m profile"
)

// ProfileFile is the key table of a rule profile, made once from the rule
// registry (each rule's parameters) and schema.Purposes, the same
// definitions the profile reader checks keys against.
var ProfileFile = sync.OnceValue(profileSpec)

func profileSpec() *schema.TableSpec {
	header := &schema.TableSpec{Doc: "What the profile is and the units its numbers are in.", Keys: []schema.KeySpec{
		{Name: "name", Type: schema.TypeString, Doc: "Name shown in the check summary.", Example: "Example County well ordinance"},
		{Name: "units", Type: schema.TypeString, Enum: []string{"ft", "m"}, Doc: "ft: lengths in feet, diameters in inches; m: lengths in metres, diameters in millimetres. Required when any number is set.", Example: "ft"},
		{Name: "source", Type: schema.TypeString, Doc: "The code the values follow.", Example: "Example County Code, chapter 9"},
	}}
	ruleTable := &schema.TableSpec{Doc: "Thresholds and severities by rule ID (tremie rules lists them).", Noun: "rule",
		Hint: "[rule.RULE-ID] takes the ID of a rule: tremie rules lists them"}
	for _, rl := range All() {
		settings := []schema.KeySpec{
			{Name: "severity", Type: schema.TypeString, Enum: []string{"error", "warning", "off"}, Doc: "Severity of the rule's findings, or off.", Example: rl.Severity.String()},
		}
		for _, p := range rl.Params {
			settings = append(settings, schema.KeySpec{Name: p.Name, Type: schema.TypeNumber, Bound: schema.NonNegative, Unit: paramUnit(p.Kind), Doc: p.Doc + " Source of the default: " + p.Source + ".", Example: p.exampleFt()})
		}
		t := &schema.TableSpec{Doc: rl.Title + ". " + rl.Doc, Keys: settings,
			Hint: "[rule." + rl.ID + "] takes: " + settingNames(settings) + "; and [rule." + rl.ID + ".PURPOSE] or [rule." + rl.ID + ".GROUP] for some wells only"}
		// [rule.ID.PURPOSE] and [rule.ID.GROUP]: the same settings for those wells only
		forSome := &schema.TableSpec{Doc: "The rule's settings for wells of these purposes only.", Keys: settings}
		var short *schema.KeySpec
		if len(rl.Params) == 1 {
			short = &settings[1]
		}
		for _, name := range purposeAndGroupNames() {
			t.Keys = append(t.Keys, schema.KeySpec{Name: name, Type: schema.TypeTable, Doc: "Settings for " + name + " wells only" + shortForm(short) + ".", Table: forSome, Alt: short})
		}
		t.Other = &schema.KeySpec{Type: schema.TypeTable, Doc: "Settings for the wells of a group of the profile's [groups].", Table: forSome, Alt: short}
		ruleTable.Keys = append(ruleTable.Keys, schema.KeySpec{Name: rl.ID, Type: schema.TypeTable, Doc: t.Doc, Table: t})
	}
	groups := &schema.TableSpec{Doc: "Groups of purposes of the profile's own, usable as [rule.RULE-ID.NAME].", Other: &schema.KeySpec{
		Type: schema.TypeStrings, Enum: purposeStrings(), Doc: "The purposes of the group.", Example: []any{"domestic", "irrigation"}}}
	seal := &schema.TableSpec{Noun: "purpose", Doc: "Minimum sanitary-seal depth by well purpose (the same as the purpose parameters of [rule.SANITARY-SEAL-DEPTH]; give each in one place)."}
	for _, p := range schema.Purposes {
		seal.Keys = append(seal.Keys, schema.KeySpec{Name: string(p), Type: schema.TypeNumber, Bound: schema.NonNegative, Unit: profileLength, Doc: "Minimum sanitary-seal depth of a " + string(p) + " well.", Example: 20.0})
	}
	return &schema.TableSpec{Title: "tremie rule profile", Doc: "Thresholds and severities of the rules for one project or jurisdiction. Set them to the governing local well code.", Keys: []schema.KeySpec{
		{Name: "profile", Type: schema.TypeTable, Doc: header.Doc, Table: header},
		{Name: "groups", Type: schema.TypeTable, Doc: groups.Doc, Table: groups},
		{Name: "rule", Type: schema.TypeTable, Doc: ruleTable.Doc, Table: ruleTable},
		{Name: "sanitary_seal", Type: schema.TypeTable, Doc: seal.Doc, Table: seal},
	}}
}

// settingNames lists a rule table's own keys: severity and parameters.
func settingNames(settings []schema.KeySpec) string {
	names := make([]string, len(settings))
	for i, k := range settings {
		names[i] = k.Name
	}
	return strings.Join(names, ", ")
}

func purposeStrings() []string {
	out := make([]string, len(schema.Purposes))
	for i, p := range schema.Purposes {
		out[i] = string(p)
	}
	return out
}

// purposeAndGroupNames are the purposes and the built-in groups.
func purposeAndGroupNames() []string {
	out := purposeStrings()
	for _, g := range PurposeGroups {
		out = append(out, g.Name)
	}
	return out
}

func shortForm(p *schema.KeySpec) string {
	if p == nil {
		return ""
	}
	return "; or a number: its " + p.Name
}

func paramUnit(k ParamKind) string {
	switch k {
	case LengthParam:
		return profileLength
	case DiameterParam:
		return profileDiameter
	case VelocityParam:
		return profileVelocity
	}
	return profileRatio
}

// exampleFt is the parameter's default as a ft profile writes it.
func (p Param) exampleFt() float64 {
	if p.DefaultFt != 0 {
		return p.DefaultFt
	}
	switch p.Kind {
	case LengthParam:
		return schema.Length(p.Default).In(schema.Feet)
	case DiameterParam:
		return schema.Diameter(p.Default).In(schema.Inches)
	case VelocityParam:
		return p.Default / schema.MetresPerFoot
	}
	return p.Default
}
