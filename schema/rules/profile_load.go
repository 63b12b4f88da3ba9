package rules

import (
	"path/filepath"
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
// It is read by the one strict reader (schema.Doc) against the profile's
// key table (ProfileFile, made from the rule registry): every table and
// value, the rule and purpose tables too, is read through a schema.Table,
// so every error has its line and column, an unknown key its "did you
// mean" and a hint of what the table takes, and all come back sorted.
func ParseProfile(name string, data []byte) (*Profile, error) {
	doc, err := schema.ParseDoc(name, data, ProfileFile())
	if err != nil {
		return nil, err
	}
	pr := &profileReader{doc: doc}
	prof := pr.read(name, doc.Root())
	if err := doc.Err(); err != nil {
		return nil, err
	}
	return prof, nil
}

type profileReader struct {
	doc     *schema.Doc
	groups  map[string][]schema.Purpose // the profile's own [groups]
	claims  map[string]setting          // rule|purpose|key -> where it was set
	numbers string                      // the key path of the first threshold set, which makes units matter
}

func (r *profileReader) read(file string, root *schema.Table) *Profile {
	prof := &Profile{
		Name: profileNameOf(file),
		File: file,
		overrides: overrides{
			Values:     map[string]map[string]float64{},
			Severities: map[string]Severity{},
			Off:        map[string]bool{},
		},
	}
	unitsWritten := false
	if h := root.Sub("profile"); h != nil {
		if n := h.Str("name"); n != "" {
			prof.Name = n
		}
		prof.Source = h.Str("source")
		unitsWritten = h.Has("units")
		prof.Units = schema.DepthUnit(h.OneOf("units"))
		h.Done()
	}
	if g := root.Sub("groups"); g != nil {
		r.readGroups(g)
	}
	if rt := root.Sub("rule"); rt != nil {
		for _, id := range rt.Keys() {
			if rl, ok := Lookup(id); ok {
				if t := rt.Sub(id); t != nil {
					r.rule(prof, rl, t)
				}
			}
		}
		rt.Done() // an unknown rule ID, with the closest known one
	}
	if t := root.Sub("sanitary_seal"); t != nil {
		r.sanitarySeal(prof, t)
	}
	root.Done()
	// units written but wrong are reported where they are written
	if r.numbers != "" && prof.Units == "" && !unitsWritten {
		at := "profile" // at [profile], else at the first threshold
		if !root.Has("profile") {
			at = r.numbers
		}
		r.doc.Errorf(at, "give units = \"ft\" or \"m\" in [profile]: the profile sets thresholds")
	}
	return prof
}

// rule reads [rule.ID]: a severity and the rule's parameters for every
// well, and for some purposes [rule.ID.PURPOSE] tables or, for a rule of
// one parameter, PURPOSE = N.
func (r *profileReader) rule(prof *Profile, rl *Rule, t *schema.Table) {
	own := []*overrides{&prof.overrides}
	r.settings(prof, rl, t, func(string, string) []*overrides { return own }, func(k string) {
		if !r.isPurposeOrGroup(k) {
			return // not read: Done names it
		}
		if v, _ := t.Raw(k); isTable(v) || len(rl.Params) != 1 {
			if sub := t.Sub(k); sub != nil {
				r.purposeTable(prof, rl, k, sub)
			}
			return
		}
		// [rule.X] purpose = N: the rule's one parameter, for those purposes
		prm := rl.Params[0]
		if f, ok := r.number(t, k, prm); ok {
			r.setForPurposes(prof, rl, k, prm, f, t.Path()+"."+k)
		}
	})
}

// settings is the one reader of a rule's table, [rule.ID] and
// [rule.ID.PURPOSE] alike: its severity and parameters go to the overrides
// into returns for each key (written at key path kp); any other key goes
// to rest, or is left for Done to name when rest is nil.
func (r *profileReader) settings(prof *Profile, rl *Rule, t *schema.Table, into func(key, kp string) []*overrides, rest func(key string)) {
	for _, k := range t.Keys() {
		kp := t.Path() + "." + k
		if k == "severity" {
			if sev, off, ok := r.severity(t); ok {
				for _, o := range into(k, kp) {
					o.setSeverity(rl.ID, sev, off)
				}
			}
			continue
		}
		if prm, ok := rl.param(k); ok {
			if f, ok := r.number(t, k, prm); ok {
				v := prof.toModel(prm.Kind, f)
				for _, o := range into(k, kp) {
					o.setValue(rl.ID, k, v)
				}
			}
			continue
		}
		if rest != nil {
			rest(k)
		}
	}
	t.Done()
}

// sanitarySeal reads [sanitary_seal], the short form of
// [rule.SANITARY-SEAL-DEPTH.PURPOSE] depth = N.
func (r *profileReader) sanitarySeal(prof *Profile, t *schema.Table) {
	rl, ok := Lookup("SANITARY-SEAL-DEPTH")
	if !ok {
		t.Done()
		return
	}
	prm, _ := rl.param("depth")
	for _, k := range t.Keys() {
		if !isPurpose(k) {
			continue // not read: Done names it, with the closest purpose
		}
		if f, ok := r.number(t, k, prm); ok {
			r.setForPurposes(prof, rl, k, prm, f, "sanitary_seal."+k)
		}
	}
	t.Done()
}

// number reads a threshold: finite and not negative; a fraction stays
// within 0 to 1.
func (r *profileReader) number(t *schema.Table, k string, prm Param) (float64, bool) {
	if r.numbers == "" {
		r.numbers = t.Path() + "." + k
	}
	f, ok := t.NonNegative(k)
	if ok && prm.Kind == RatioParam && prm.Fraction && f > 1 {
		r.doc.Errorf(t.Path()+"."+k, "%s is a fraction from 0 to 1 (0.9 = 90 %%), not %v", k, f)
		return 0, false
	}
	return f, ok
}

// severity reads "error", "warning" or "off".
func (r *profileReader) severity(t *schema.Table) (sev Severity, off, ok bool) {
	switch t.OneOf("severity") {
	case "error":
		return Error, false, true
	case "warning":
		return Warning, false, true
	case "off":
		return 0, true, true
	}
	return 0, false, false
}

func isTable(v any) bool {
	_, ok := v.(map[string]any)
	return ok
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
	case VelocityParam:
		if p.Units == schema.Feet {
			return v * schema.MetresPerFoot
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
