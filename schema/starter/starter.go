// Package starter writes the files a practitioner starts from: a starter
// well file for each kind of well (tremie new) and a project skeleton
// (tremie init). Every key is preceded by a comment of its meaning and
// unit, taken from the key tables the loaders use, and every example value
// still to be replaced carries the mark "# FILL" (schema.FillMark), which
// rule FILL-IN reports until it is gone. The example values make a
// construction that passes every rule, so that a starter loads, draws, and
// checks with only its marks reported.
package starter

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// Kinds lists the kinds of starter well, in the order help gives them.
var Kinds = []string{"monitoring", "nested", "rock", "supply", "planned"}

// kindDoc says what each kind is, for help and the file's header.
var kindDoc = map[string]string{
	"monitoring": "a monitoring well: one 2-in (DN50) PVC string, filter pack, bentonite seal, grout, flush-mount vault",
	"nested":     "a nested monitoring well: two strings screened at two depths in one borehole, each with its own pack and seal",
	"rock":       "a rock well: a grouted surface casing and an open hole below it",
	"supply":     "a water-supply well: steel casing, stainless screen, filter pack and a deep sanitary seal",
	"planned":    "a planned monitoring well: the design, with no amounts placed and no water levels yet",
}

// KindDoc describes a kind of starter well.
func KindDoc(kind string) string { return kindDoc[kind] }

// defaultPurpose is the purpose a kind of well has unless told.
var defaultPurpose = map[string]schema.Purpose{
	"monitoring": schema.Monitoring, "nested": schema.Monitoring, "rock": schema.Domestic,
	"supply": schema.Domestic, "planned": schema.Monitoring,
}

// Options choose a starter well.
type Options struct {
	ID      string
	Kind    string         // one of Kinds; "" = monitoring
	Purpose schema.Purpose // "" = the kind's usual purpose
	Units   schema.DepthUnit
	// Schema is the path of the well JSON Schema as the file's #:schema
	// directive gives it (relative to the file); "" writes none.
	Schema string
}

// Well writes a starter well file.
func Well(o Options) ([]byte, error) {
	if o.Kind == "" {
		o.Kind = "monitoring"
	}
	build, ok := wellKinds[o.Kind]
	if !ok {
		return nil, fmt.Errorf("no starter for kind %q (one of: %s)", o.Kind, strings.Join(Kinds, ", "))
	}
	if strings.TrimSpace(o.ID) == "" {
		return nil, fmt.Errorf("a well ID is needed")
	}
	if o.Units == "" {
		o.Units = schema.Feet
	}
	if o.Units != schema.Feet && o.Units != schema.Metres {
		return nil, fmt.Errorf("units must be ft or m, not %q", o.Units)
	}
	if o.Purpose == "" {
		o.Purpose = defaultPurpose[o.Kind]
	}
	known := false
	for _, p := range schema.Purposes {
		known = known || p == o.Purpose
	}
	if !known {
		var names []string
		for _, p := range schema.Purposes {
			names = append(names, string(p))
		}
		return nil, fmt.Errorf("purpose %q is not one of: %s", o.Purpose, strings.Join(names, ", "))
	}
	var b strings.Builder
	if o.Schema != "" {
		fmt.Fprintf(&b, "#:schema %s\n", o.Schema)
	}
	unitName := map[schema.DepthUnit]string{schema.Feet: "feet and inches", schema.Metres: "metres and millimetres"}[o.Units]
	wrap(&b, fmt.Sprintf("%s: starter well file from tremie new: %s, in %s.", o.ID, kindDoc[o.Kind], unitName))
	wrap(&b, "Each value marked \"# FILL\" is a realistic example, not a record: replace it with what was measured or recorded, then delete the mark. tremie check names every mark left (rule FILL-IN). The key reference is schema/FORMAT.md; an editor reading the #:schema line completes keys and flags mistakes.")
	wrap(&b, "Depths are below ground surface and grow downward; a height above ground (stick-up) is a negative depth.")
	if optionalKinds[o.Kind] != nil {
		wrap(&b, "At the end, commented out, are optional tables this kind of well may record ("+optionalNames(o)+").")
	}
	writeParts(&b, build(o), o.Units)
	if opt := optionalKinds[o.Kind]; opt != nil {
		writeOptional(&b, opt(o), o.Units)
	}
	return []byte(b.String()), nil
}

// value is one key's value in each unit system; m is nil when the same.
type value struct {
	key    string
	ft, m  any
	fill   bool
	inline string // a short note after the value
}

// part is one table of the file.
type part struct {
	path  string // "well", "string.section"
	array bool
	note  string // a comment above the header, for repeated tables
	vals  []value
}

// same is a value written alike in both unit systems; fill marks it.
func same(key string, v any, fill bool) value { return value{key: key, ft: v, fill: fill} }

// per is a value written differently in feet and in metres.
func per(key string, ft, m any, fill bool) value { return value{key: key, ft: ft, m: m, fill: fill} }

func (v value) in(u schema.DepthUnit) any {
	if u == schema.Metres && v.m != nil {
		return v.m
	}
	return v.ft
}

func writeParts(b *strings.Builder, parts []part, u schema.DepthUnit) {
	for _, p := range parts {
		writeTable(b, p, u, false)
	}
}

// writeTable writes one table: its note (else the table's own doc), its
// header and each value with its key's comment. commented writes it as
// the optional section does: every line begins with "#", a TOML line
// with "# " and its explanation with "##".
func writeTable(b *strings.Builder, p part, u schema.DepthUnit, commented bool) {
	sep, cmt, lead := "\n", "#", ""
	if commented {
		sep, cmt, lead = "#\n", "##", "# "
	}
	spec := tableAt(schema.WellFile, p.path)
	b.WriteString(sep)
	if p.note != "" {
		wrapWith(b, cmt, p.note)
	} else if spec != nil && spec.Doc != "" {
		wrapWith(b, cmt, spec.Doc)
	}
	if p.array {
		fmt.Fprintf(b, "%s[[%s]]\n", lead, p.path)
	} else {
		fmt.Fprintf(b, "%s[%s]\n", lead, p.path)
	}
	for _, v := range p.vals {
		k := spec.Key(v.key)
		if k == nil {
			panic("starter: " + p.path + "." + v.key + " is not a well key") // caught by every test
		}
		wrapWith(b, cmt, keyComment(k, u))
		line := lead + v.key + " = " + schema.TOMLValue(k.Type, v.in(u))
		switch {
		case v.fill && v.inline != "":
			line += "  # " + schema.FillMark + ": " + v.inline
		case v.fill:
			line += "  # " + schema.FillMark
		case v.inline != "":
			line += "  # " + v.inline
		}
		b.WriteString(line + "\n")
	}
}

// keyComment is a key's meaning with its unit in the file's units and,
// for a list of values, the values allowed.
func keyComment(k *schema.KeySpec, u schema.DepthUnit) string {
	c := k.Doc
	if unit := concreteUnit(k.Unit, u); unit != "" {
		c += " [" + unit + "]"
	}
	if len(k.Enum) > 0 && len(k.Enum) <= 12 {
		c += " One of: " + strings.Join(k.Enum, ", ") + "."
	}
	if k.Required {
		c += " Required."
	}
	return c
}

// concreteUnit names a key's unit as the starter's [units] make it.
func concreteUnit(unit string, u schema.DepthUnit) string {
	d := schema.DefaultUnits(u)
	switch unit {
	case schema.UnitDepth:
		return string(d.Depth)
	case schema.UnitDiameter:
		return string(d.Diameter)
	case schema.UnitMass:
		return string(d.Mass)
	case schema.UnitVolume:
		return string(d.Volume)
	}
	return unit
}

// tableAt finds the key table of a dotted table path.
func tableAt(t *schema.TableSpec, path string) *schema.TableSpec {
	for _, name := range strings.Split(path, ".") {
		k := t.Key(name)
		if k == nil {
			return nil
		}
		t = k.Table
	}
	return t
}

// wrap writes text as # comment lines of at most 78 columns.
func wrap(b *strings.Builder, text string) { wrapWith(b, "#", text) }

// wrapWith writes text as comment lines that begin with prefix.
func wrapWith(b *strings.Builder, prefix, text string) {
	line := prefix
	for _, w := range strings.Fields(text) {
		if len(line)+1+len(w) > 78 && line != prefix {
			b.WriteString(line + "\n")
			line = prefix
		}
		line += " " + w
	}
	b.WriteString(line + "\n")
}
