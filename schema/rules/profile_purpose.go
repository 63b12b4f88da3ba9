package rules

// Thresholds by well purpose. A rule states the purposes it applies to by
// default (Rule.Purposes, nil for every well) and a parameter may carry
// defaults for some purposes (Param.ByPurpose), each with its source. A
// profile may set any parameter, or a severity, for one purpose or a group
// of purposes ([rule.RULE-ID.public-supply], [rule.RULE-ID.supply]); such a
// value changes only wells of those purposes.

import (
	"sort"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// PurposeDefault is a parameter's default for some purposes.
type PurposeDefault struct {
	Purposes  []schema.Purpose
	Default   float64 // model units, as Param.Default
	DefaultFt float64 // feet or inches for wells in feet; 0 = convert Default
	Source    string
}

// PurposeGroup names a set of purposes a profile may set at once.
type PurposeGroup struct {
	Name     string
	Purposes []schema.Purpose
	Doc      string
}

// Built-in purpose groups; a profile may add its own in [groups].
var (
	observationWells = []schema.Purpose{schema.Monitoring, schema.Piezometer}
	environmental    = []schema.Purpose{schema.Monitoring, schema.Piezometer, schema.Recovery}
	supplyWells      = []schema.Purpose{schema.Domestic, schema.PublicSupply, schema.Industrial, schema.Irrigation}
	productionWells  = []schema.Purpose{schema.PublicSupply, schema.Industrial, schema.Irrigation}
)

// PurposeGroups lists the built-in groups.
var PurposeGroups = []PurposeGroup{
	{"observation", observationWells, "wells that measure: monitoring wells and piezometers"},
	{"environmental", environmental, "monitoring wells, piezometers and recovery (extraction) wells"},
	{"supply", supplyWells, "water-supply wells: domestic, public-supply, industrial, irrigation"},
	{"production", productionWells, "high-capacity supply wells: public-supply, industrial, irrigation"},
}

// ForPurpose returns what the profile sets for one purpose, or nil.
func (p *Profile) forPurpose(pu schema.Purpose) *overrides {
	if p == nil || pu == "" {
		return nil
	}
	return p.ByPurpose[pu]
}

// overridesOf returns (making it) the overrides of one purpose.
func (p *Profile) overridesOf(pu schema.Purpose) *overrides {
	if p.ByPurpose == nil {
		p.ByPurpose = map[schema.Purpose]*overrides{}
	}
	o := p.ByPurpose[pu]
	if o == nil {
		o = &overrides{}
		p.ByPurpose[pu] = o
	}
	return o
}

// valueFor is the parameter in force for a well of a purpose: the profile's
// value for that purpose, else the profile's value for every well, else
// the rule's default for that purpose, else its default.
func (p *Profile) valueFor(r *Rule, name string, u schema.Units, pu schema.Purpose) float64 {
	if o := p.forPurpose(pu); o != nil {
		if v, ok := o.Values[r.ID][name]; ok {
			return v
		}
	}
	if _, ok := p.Values[r.ID][name]; ok {
		return p.value(r, name, u)
	}
	prm, ok := r.param(name)
	if ok {
		if d, ok := prm.defaultFor(pu); ok {
			return unitDefault(prm.Kind, d.Default, d.DefaultFt, u)
		}
		if prm.Default == 0 && prm.Fallback != "" {
			return p.valueFor(r, prm.Fallback, u, pu)
		}
	}
	return p.value(r, name, u)
}

// unitDefault picks the imperial default for a well in feet when one is
// given, so that "2 in / 50 mm" stays round in both.
func unitDefault(kind ParamKind, def, defFt float64, u schema.Units) float64 {
	if u.Imperial() && defFt != 0 {
		switch kind {
		case LengthParam:
			return float64(schema.LengthFrom(defFt, schema.Feet))
		case DiameterParam:
			return float64(schema.DiameterFrom(defFt, schema.Inches))
		case VelocityParam:
			return defFt * schema.MetresPerFoot
		}
	}
	return def
}

// defaultFor is the parameter's default for a purpose, if it has one.
func (prm Param) defaultFor(pu schema.Purpose) (PurposeDefault, bool) {
	for _, d := range prm.ByPurpose {
		for _, q := range d.Purposes {
			if q == pu {
				return d, true
			}
		}
	}
	return PurposeDefault{}, false
}

// applies reports whether a rule runs on a well of a purpose: the profile
// may switch it off or on for that purpose; else it runs on the purposes
// it names, and on wells whose purpose is not given.
func (p *Profile) applies(r *Rule, pu schema.Purpose) bool {
	if o := p.forPurpose(pu); o != nil {
		if o.Off[r.ID] {
			return false
		}
		if _, ok := o.Severities[r.ID]; ok {
			return true
		}
	}
	return r.AppliesTo(pu)
}

// AppliesTo reports whether the rule runs by default on a well of the
// purpose ("" = not given: every rule runs).
func (r *Rule) AppliesTo(pu schema.Purpose) bool {
	if len(r.Purposes) == 0 || pu == "" {
		return true
	}
	for _, q := range r.Purposes {
		if q == pu {
			return true
		}
	}
	return false
}

// severityFor is the severity in force for a well of a purpose.
func (p *Profile) severityFor(r *Rule, pu schema.Purpose) Severity {
	if o := p.forPurpose(pu); o != nil {
		if s, ok := o.Severities[r.ID]; ok {
			return s
		}
	}
	return p.severity(r)
}

// purposeNames lists every purpose name, for messages.
func purposeNames() string {
	var names []string
	for _, p := range schema.Purposes {
		names = append(names, string(p))
	}
	return strings.Join(names, ", ")
}

// isPurpose reports whether s names a purpose.
func isPurpose(s string) bool {
	for _, p := range schema.Purposes {
		if string(p) == s {
			return true
		}
	}
	return false
}

// PurposeList writes purposes as "monitoring, piezometer".
func PurposeList(ps []schema.Purpose) string {
	s := make([]string, len(ps))
	for i, p := range ps {
		s[i] = string(p)
	}
	return strings.Join(s, ", ")
}

// setting is where a purpose value came from, to tell a purpose's own
// value (which wins) from a group's and to refuse the same one twice.
type setting struct {
	exact bool
	at    string // key path, for "set twice" messages
}

// purposeTable reads [rule.ID.NAME]: NAME is a purpose or a group; its keys
// are the rule's parameters and severity, for those purposes only.
func (r *profileReader) purposeTable(prof *Profile, rl *Rule, name string, t *schema.Table) {
	r.settings(prof, rl, t, func(k, kp string) []*overrides {
		return r.claimed(prof, rl, name, k, kp)
	}, nil)
}

// setForPurposes sets parameter prm of a rule to f (profile units) for the
// purposes of a purpose or group name, written at key path kp.
func (r *profileReader) setForPurposes(prof *Profile, rl *Rule, name string, prm Param, f float64, kp string) {
	v := prof.toModel(prm.Kind, f)
	for _, o := range r.claimed(prof, rl, name, prm.Name, kp) {
		o.setValue(rl.ID, prm.Name, v)
	}
}

// claimed returns the overrides of the purposes of a purpose or group name
// that take key k of a rule from key path kp (see claim).
func (r *profileReader) claimed(prof *Profile, rl *Rule, name, k, kp string) []*overrides {
	targets, exact := r.purposesOf(name)
	var os []*overrides
	for _, pu := range targets {
		if r.claim(rl.ID, pu, k, kp, exact) {
			os = append(os, prof.overridesOf(pu))
		}
	}
	return os
}

// claim records that key path kp sets (rule, purpose, key); a purpose's
// own table overrides a group's, and two tables of the same kind setting
// the same thing is an error.
func (r *profileReader) claim(rule string, pu schema.Purpose, k, kp string, exact bool) bool {
	if r.claims == nil {
		r.claims = map[string]setting{}
	}
	id := rule + "|" + string(pu) + "|" + k
	prev, seen := r.claims[id]
	switch {
	case !seen || (exact && !prev.exact):
		r.claims[id] = setting{exact, kp}
		return true
	case prev.exact && !exact:
		return false // the purpose's own value stands
	}
	r.doc.Errorf(kp, "%s for %s wells is set twice: here and at line %d (%s)", k, pu, r.doc.Line(prev.at), prev.at)
	return false
}

// purposesOf resolves a purpose or group name (built-in or the profile's
// [groups]); exact is true for a single purpose.
func (r *profileReader) purposesOf(name string) ([]schema.Purpose, bool) {
	if isPurpose(name) {
		return []schema.Purpose{schema.Purpose(name)}, true
	}
	if ps, ok := r.groups[name]; ok {
		return ps, false
	}
	for _, g := range PurposeGroups {
		if g.Name == name {
			return g.Purposes, false
		}
	}
	return nil, false
}

// isPurposeOrGroup reports whether a key under [rule.ID] names purposes.
func (r *profileReader) isPurposeOrGroup(name string) bool {
	ps, _ := r.purposesOf(name)
	return len(ps) > 0
}

// readGroups reads [groups]: name = ["purpose", ...].
func (r *profileReader) readGroups(t *schema.Table) {
	r.groups = map[string][]schema.Purpose{}
	for _, k := range t.Keys() {
		kp := t.Path() + "." + k
		list := t.Strings(k)
		if isPurpose(k) {
			r.doc.Errorf(kp, "group %q has the name of a purpose", k)
			continue
		}
		if len(list) == 0 {
			if v, _ := t.Raw(k); isEmptyList(v) { // another type is reported by Strings
				r.doc.Errorf(kp, "%s must be a list of purposes, e.g. [\"domestic\", \"irrigation\"]", k)
			}
			continue
		}
		var ps []schema.Purpose
		for _, s := range list {
			if !isPurpose(s) {
				r.doc.Errorf(kp, "unknown purpose %q in group %s (one of: %s)%s", s, k, purposeNames(), schema.DidYouMean(s, purposeStrings()))
				ps = nil
				break
			}
			ps = append(ps, schema.Purpose(s))
		}
		if ps != nil {
			sort.SliceStable(ps, func(i, j int) bool { return ps[i] < ps[j] })
			r.groups[k] = ps
		}
	}
	t.Done()
}

// DefaultFor is a parameter's default for a well of the purpose ("" for
// one whose purpose is not given) with its source: the purpose's own
// default, else the general one, else that of the parameter it falls back
// to. def is in model units and defFt in feet or inches (0 = convert def),
// as in Param.
func (r *Rule) DefaultFor(prm Param, pu schema.Purpose) (def, defFt float64, source string) {
	if d, ok := prm.defaultFor(pu); ok {
		return d.Default, d.DefaultFt, d.Source
	}
	if prm.Default == 0 && prm.Fallback != "" {
		if fb, ok := r.param(prm.Fallback); ok && fb.Name != prm.Name {
			return r.DefaultFor(fb, pu)
		}
	}
	return prm.Default, prm.DefaultFt, prm.Source
}

func isEmptyList(v any) bool {
	l, ok := v.([]any)
	return ok && len(l) == 0
}
