package rules

import (
	"fmt"
	"math"
	"path/filepath"
	"sort"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// LoadProfile reads a rule profile (see PROFILE.md). Like a well file it
// is strict: an unknown table, rule, parameter or purpose is an error with
// its line, and a rejected profile yields a schema.ErrorList.
func LoadProfile(path string) (*Profile, error) {
	data, err := schema.ReadInput(path, schema.MaxTextFile)
	if err != nil {
		return nil, schema.ErrorList{schema.ReadError(path, "profile", err)}
	}
	return ParseProfile(path, data)
}

// ParseProfile reads a profile's bytes; name is used in error positions.
// The file is parsed and its errors placed, sorted and returned by the
// one strict reader (schema.Doc); the walk below reads its rule and
// purpose tables, whose names come from the registry.
func ParseProfile(name string, data []byte) (*Profile, error) {
	doc, err := schema.ParseDoc(name, data, ProfileFile())
	if err != nil {
		return nil, err
	}
	root := doc.Root()
	raw := map[string]any{}
	for _, k := range root.Keys() {
		raw[k], _ = root.Raw(k)
	}
	pr := &profileReader{file: name, doc: doc}
	prof := pr.read(raw)
	if err := doc.Err(); err != nil {
		return nil, err
	}
	return prof, nil
}

type profileReader struct {
	file   string
	doc    *schema.Doc
	groups map[string][]schema.Purpose // the profile's own [groups]
	claims map[string]setting          // rule|purpose|key -> where it was set
}

func (r *profileReader) errAt(path, format string, args ...any) {
	r.doc.Errorf(path, format, args...)
}

// tableOf returns v as a table, or reports that path should be one.
func (r *profileReader) tableOf(path string, v any) (map[string]any, bool) {
	m, ok := v.(map[string]any)
	if !ok {
		r.errAt(path, "%s must be a table, as [%s]", path, path)
	}
	return m, ok
}

// number reads a finite, non-negative number.
func (r *profileReader) number(path string, v any) (float64, bool) {
	var f float64
	switch n := v.(type) {
	case int64:
		f = float64(n)
	case float64:
		f = n
	default:
		r.errAt(path, "%s must be a number, not %s", path, tomlType(v))
		return 0, false
	}
	if math.IsNaN(f) || math.IsInf(f, 0) {
		r.errAt(path, "%s must be a finite number", path)
		return 0, false
	}
	if f < 0 {
		r.errAt(path, "%s = %v must not be negative", path, f)
		return 0, false
	}
	return f, true
}

func (r *profileReader) read(raw map[string]any) *Profile {
	prof := &Profile{
		Name:       profileNameOf(r.file),
		File:       r.file,
		Values:     map[string]map[string]float64{},
		Severities: map[string]Severity{},
		Off:        map[string]bool{},
	}
	if v, ok := raw["profile"]; ok {
		if m, ok := r.tableOf("profile", v); ok {
			r.header(prof, m)
		}
	}
	if v, ok := raw["groups"]; ok {
		if m, ok := r.tableOf("groups", v); ok {
			r.readGroups(m)
		}
	}
	numbers := r.hasNumbers(raw)
	// units written but wrong are reported where they are written
	if pt, _ := raw["profile"].(map[string]any); numbers && prof.Units == "" && pt["units"] == nil {
		r.errAt("profile", "give units = \"ft\" or \"m\" in [profile]: the profile sets thresholds")
	}
	if v, ok := raw["rule"]; ok {
		if m, ok := r.tableOf("rule", v); ok {
			for _, id := range sortedKeys(m) {
				r.rule(prof, id, m[id])
			}
		}
	}
	if v, ok := raw["sanitary_seal"]; ok {
		if m, ok := r.tableOf("sanitary_seal", v); ok {
			r.sanitarySeal(prof, m)
		}
	}
	for _, k := range sortedKeys(raw) {
		switch k {
		case "profile", "rule", "sanitary_seal", "groups":
		default:
			r.errAt(k, "unknown key %q at top level (expected [profile], [groups], [rule.RULE-ID] or [sanitary_seal])%s", k,
				schema.DidYouMean(k, []string{"profile", "groups", "rule", "sanitary_seal"}))
		}
	}
	return prof
}

func (r *profileReader) header(prof *Profile, m map[string]any) {
	for _, k := range sortedKeys(m) {
		path := "profile." + k
		switch k {
		case "name", "source":
			s, ok := m[k].(string)
			if !ok {
				r.errAt(path, "%s must be a string, not %s", path, tomlType(m[k]))
				continue
			}
			if k == "name" {
				prof.Name = s
			} else {
				prof.Source = s
			}
		case "units":
			s, _ := m[k].(string)
			if s != "ft" && s != "m" {
				r.errAt(path, "units must be \"ft\" or \"m\" (got %v)", m[k])
				continue
			}
			prof.Units = schema.DepthUnit(s)
		default:
			names := ProfileFile().Key("profile").Table.Names()
			r.errAt(path, "unknown key %q in [profile] (expected %s)%s", k, strings.Join(names, ", "), schema.DidYouMean(k, names))
		}
	}
}

// hasNumbers reports whether any threshold is set, so that units matter.
func (r *profileReader) hasNumbers(raw map[string]any) bool {
	if m, ok := raw["sanitary_seal"].(map[string]any); ok && len(m) > 0 {
		return true
	}
	rules, _ := raw["rule"].(map[string]any)
	for _, v := range rules {
		if m, ok := v.(map[string]any); ok && setsNumber(m) {
			return true
		}
	}
	return false
}

// setsNumber reports whether a rule table, or a purpose table in it, sets
// anything but a severity.
func setsNumber(m map[string]any) bool {
	for k, v := range m {
		if sub, ok := v.(map[string]any); ok {
			if setsNumber(sub) {
				return true
			}
			continue
		}
		if k != "severity" {
			return true
		}
	}
	return false
}

func (r *profileReader) rule(prof *Profile, id string, v any) {
	path := "rule." + id
	m, ok := r.tableOf(path, v)
	if !ok {
		return
	}
	rl, ok := Lookup(id)
	if !ok {
		r.errAt(path, "unknown rule %q (tremie rules lists them)%s", id, schema.DidYouMean(id, ruleIDs()))
		return
	}
	for _, k := range sortedKeys(m) {
		kp := path + "." + k
		if k == "severity" {
			if sev, off, ok := r.severityValue(kp, m[k]); ok {
				if off {
					prof.Off[id] = true
				} else {
					prof.Severities[id] = sev
				}
			}
			continue
		}
		prm, ok := rl.param(k)
		if !ok && r.isPurposeOrGroup(k) {
			if sub, isTable := m[k].(map[string]any); isTable {
				r.purposeTable(prof, rl, k, sub)
				continue
			}
			if len(rl.Params) == 1 {
				// [rule.X] purpose = N: the rule's one parameter, for those purposes
				r.purposeTable(prof, rl, k, map[string]any{rl.Params[0].Name: m[k]})
				continue
			}
		}
		if !ok {
			r.errAt(kp, "rule %s has no parameter %q%s%s", id, k, rl.paramList(), schema.DidYouMean(k, rl.paramNames()))
			continue
		}
		f, ok := r.paramNumber(kp, prm, m[k])
		if !ok {
			continue
		}
		if prof.Values[id] == nil {
			prof.Values[id] = map[string]float64{}
		}
		prof.Values[id][k] = prof.toModel(prm.Kind, f)
	}
}

// sanitarySeal reads [sanitary_seal], the short form of
// [rule.SANITARY-SEAL-DEPTH.PURPOSE] depth = N.
func (r *profileReader) sanitarySeal(prof *Profile, m map[string]any) {
	rl, ok := Lookup("SANITARY-SEAL-DEPTH")
	if !ok {
		return
	}
	for _, k := range sortedKeys(m) {
		kp := "sanitary_seal." + k
		if !isPurpose(k) {
			r.errAt(kp, "unknown purpose %q in [sanitary_seal] (one of: %s)%s", k, purposeNames(), schema.DidYouMean(k, strings.Split(purposeNames(), ", ")))
			continue
		}
		f, ok := r.number(kp, m[k])
		if ok && r.claim(rl.ID, schema.Purpose(k), "depth", kp, true) {
			o := prof.overridesOf(schema.Purpose(k))
			if o.Values[rl.ID] == nil {
				o.Values[rl.ID] = map[string]float64{}
			}
			o.Values[rl.ID]["depth"] = prof.toModel(LengthParam, f)
		}
	}
}

// profileNameOf names a profile by its file when [profile] gives no name:
// "county" for county.profile.toml.
func profileNameOf(file string) string {
	base := filepath.Base(file)
	for _, ext := range []string{".toml", ".profile"} {
		base = strings.TrimSuffix(base, ext)
	}
	if base == "" || base == "." {
		return "unnamed profile"
	}
	return base
}

// toModel converts a profile value to model units: lengths from the
// profile's depth unit to metres, diameters from inches (ft profiles) or
// millimetres (m profiles).
func (p *Profile) toModel(kind ParamKind, v float64) float64 {
	switch kind {
	case LengthParam:
		return float64(schema.LengthFrom(v, p.Units))
	case DiameterParam:
		if p.Units == schema.Feet {
			return float64(schema.DiameterFrom(v, schema.Inches))
		}
		return v
	}
	return v
}

func (rl *Rule) param(name string) (Param, bool) {
	for _, p := range rl.Params {
		if p.Name == name {
			return p, true
		}
	}
	return Param{}, false
}

func (rl *Rule) paramList() string {
	if len(rl.Params) == 0 {
		return " (it takes only severity)"
	}
	var names []string
	for _, p := range rl.Params {
		names = append(names, p.Name)
	}
	return " (it takes severity, " + strings.Join(names, ", ") + ")"
}

func sortedKeys(m map[string]any) []string {
	out := make([]string, 0, len(m))
	for k := range m {
		out = append(out, k)
	}
	sort.Strings(out)
	return out
}

func tomlType(v any) string {
	switch v.(type) {
	case string:
		return "a string"
	case bool:
		return "a boolean"
	case int64, float64:
		return "a number"
	case map[string]any:
		return "a table"
	case []any, []map[string]any:
		return "an array"
	}
	return fmt.Sprintf("%T", v)
}

// ruleIDs lists every registered rule's ID, for "did you mean".
func ruleIDs() []string {
	out := make([]string, len(registry))
	for i, r := range registry {
		out[i] = r.ID
	}
	return out
}

// paramNames lists the keys a [rule.ID] table takes, for "did you mean".
func (rl *Rule) paramNames() []string {
	out := []string{"severity"}
	for _, p := range rl.Params {
		out = append(out, p.Name)
	}
	return out
}
