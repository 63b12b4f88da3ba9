package quantity

import (
	"errors"
	"fmt"
	"math"
	"sort"
	"strings"

	"github.com/BurntSushi/toml"

	"github.com/tremie-dev/tremie/schema"
)

// A [yields] table overrides the built-in yields of the materials it
// names, and keeps the others:
//
//	[yields]
//	volume = "ft3"        # unit of each yield: ft3, gal, L, m3 (default ft3)
//	mass = "lb"           # unit of each bag_mass: lb, kg (default lb)
//
//	[yields.filter-pack]
//	yield = 0.45          # volume one bag fills in place
//	bag_mass = 50         # the bag it is for; omit for "per bag as placed"
//	note = "supplier data sheet, 2026"

// LoadYields reads a TOML file that holds a [yields] table and returns the
// defaults overridden by it. A file without the table is an error: the user
// named it for its yields.
func LoadYields(path string) (*Yields, error) {
	data, err := schema.ReadInput(path, schema.MaxTextFile)
	if err != nil {
		return nil, schema.ReadError(path, "yields", err)
	}
	y, found, err := parseYields(path, data)
	if err != nil {
		return nil, err
	}
	if !found {
		return nil, &schema.Error{File: path, Line: 1, Msg: "no [yields] table in this file"}
	}
	if k := otherTable(data); k != "" {
		return nil, &schema.Error{File: path, Line: schema.LineOf(schema.KeyLines(string(data)), k), Key: k, Msg: fmt.Sprintf("unknown table or key %q (a yields file holds only a [yields] table)", k)}
	}
	return y, nil
}

// ParseYields returns the defaults overridden by the [yields] table of a
// TOML document (a project file, say); a document without one gives the
// defaults. name is the file name for errors.
func ParseYields(name string, data []byte) (*Yields, error) {
	y, _, err := parseYields(name, data)
	return y, err
}

func parseYields(name string, data []byte) (*Yields, bool, error) {
	var doc map[string]any
	if _, err := toml.Decode(string(data), &doc); err != nil {
		var pe toml.ParseError
		if errors.As(err, &pe) {
			return nil, false, &schema.Error{File: name, Line: pe.Position.Line, Col: pe.Position.Col, Msg: pe.Message}
		}
		return nil, false, &schema.Error{File: name, Msg: err.Error()}
	}
	y := DefaultYields()
	raw, ok := doc["yields"]
	if !ok {
		return y, false, nil
	}
	lines := schema.KeyLines(string(data))
	errAt := func(key, format string, args ...any) *schema.Error {
		return &schema.Error{File: name, Line: schema.LineOf(lines, key), Key: key, Msg: fmt.Sprintf(format, args...)}
	}
	t, ok := raw.(map[string]any)
	if !ok {
		return nil, true, errAt("yields", "yields must be a table")
	}
	vu, mu := schema.CubicFeet, schema.Pounds
	if v, ok := t["volume"]; ok {
		s, _ := v.(string)
		switch u := schema.VolumeUnit(s); u {
		case schema.CubicFeet, schema.USGallons, schema.Litres, schema.CubicMetres:
			vu = u
		default:
			return nil, true, errAt("yields.volume", "yields volume unit must be one of ft3, gal, L, m3, not %v", v)
		}
	}
	if v, ok := t["mass"]; ok {
		s, _ := v.(string)
		switch u := schema.MassUnit(s); u {
		case schema.Pounds, schema.Kilograms:
			mu = u
		default:
			return nil, true, errAt("yields.mass", "yields mass unit must be lb or kg, not %v", v)
		}
	}
	keys := make([]string, 0, len(t))
	for k := range t {
		keys = append(keys, k)
	}
	sort.Strings(keys) // the first error is the same on every run
	for _, k := range keys {
		if k == "volume" || k == "mass" {
			continue
		}
		path := "yields." + k
		if YieldsFile().Keys[0].Table.Key(k) == nil {
			return nil, true, errAt(path, "unknown material %q in [yields] (one of: %s)", k, materialList())
		}
		e, ok := t[k].(map[string]any)
		if !ok {
			return nil, true, errAt(path, "yields.%s must be a table with yield and bag_mass", k)
		}
		var entry Yield
		entry.Basis = ProjectBasis
		for _, ek := range sortedKeys(e) {
			v := e[ek]
			switch ek {
			case "yield", "bag_mass":
				n, ok := number(v)
				if !ok || !(n > 0) || math.IsInf(n, 0) {
					return nil, true, errAt(path+"."+ek, "%s must be a positive number, not %v", ek, v)
				}
				if ek == "yield" {
					entry.Volume = schema.VolumeFrom(n, vu)
				} else {
					entry.BagMass = schema.MassFrom(n, mu)
				}
			case "note":
				s, ok := v.(string)
				if !ok {
					return nil, true, errAt(path+".note", "note must be a string")
				}
				entry.Note = s
			default: // every key of yieldEntry has a case above
				return nil, true, errAt(path+"."+ek, "unknown key %q in yields.%s (%s)", ek, k, strings.Join(yieldEntry.Names(), ", "))
			}
		}
		if entry.Volume <= 0 {
			return nil, true, errAt(path, "yields.%s has no yield", k)
		}
		y.Set(schema.Material(k), entry)
	}
	return y, true, nil
}

// otherTable is the first top-level key of a yields file other than
// yields, or "". The file already parsed.
func otherTable(data []byte) string {
	var doc map[string]any
	if _, err := toml.Decode(string(data), &doc); err != nil {
		return ""
	}
	for _, k := range sortedKeys(doc) {
		if YieldsFile().Key(k) == nil {
			return k
		}
	}
	return ""
}

func number(v any) (float64, bool) {
	switch n := v.(type) {
	case int64:
		return float64(n), true
	case float64:
		return n, true
	}
	return 0, false
}

func sortedKeys(m map[string]any) []string {
	out := make([]string, 0, len(m))
	for k := range m {
		out = append(out, k)
	}
	sort.Strings(out)
	return out
}

func materialList() string {
	names := make([]string, len(schema.Materials))
	for i, m := range schema.Materials {
		names[i] = string(m)
	}
	return strings.Join(names, ", ")
}
