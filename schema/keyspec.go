package schema

import (
	"fmt"
	"strconv"
	"strings"
)

// A key table declares, once, every key an input file may hold: its TOML
// type, unit, allowed values, whether it is required, what it means and an
// example. The well loader takes its unknown-key check and its allowed
// values from it, and the JSON Schema that editors read is generated from
// it, so the two cannot drift apart.

// ValueType is the TOML type a key takes.
type ValueType int

const (
	TypeString      ValueType = iota
	TypeNumber                // integer or float
	TypeInteger               // integer only
	TypeBool                  // true or false
	TypeDate                  // TOML local date: 2026-03-14
	TypeDateTime              // TOML local date-time or date: 2026-03-14T09:30:00
	TypeStrings               // array of strings (a single string is accepted)
	TypeNumbers               // array of numbers
	TypeNumberPairs           // array of [number, number] pairs
	TypeTable                 // [table]
	TypeTables                // [[array of tables]]
)

var typeNames = [...]string{"a string", "a number", "an integer", "a boolean", "a date", "a date or date-time", "an array of strings", "an array of numbers", "an array of number pairs", "a table", "an array of tables"}

func (t ValueType) String() string {
	if int(t) < len(typeNames) {
		return typeNames[t]
	}
	return "an unknown type"
}

// Bound limits a number.
type Bound int

const (
	AnyNumber   Bound = iota
	NonNegative       // >= 0
	Positive          // > 0
)

// Units a key may be in, as the key table and the schema describe them.
const (
	UnitDepth    = "depth unit ([units] depth: ft or m)"
	UnitDiameter = "diameter unit ([units] diameter: in or mm)"
	UnitMass     = "mass unit ([units] mass: lb or kg)"
	UnitVolume   = "volume unit ([units] volume: ft3, gal, L or m3)"
	UnitGrain    = "mm"
	UnitSlotNo   = "thousandths of an inch"
	UnitDegrees  = "decimal degrees"
	UnitAngle    = "degrees"
)

// KeySpec is one key of a table.
type KeySpec struct {
	Name     string
	Type     ValueType
	Doc      string   // what the key means, in a sentence
	Unit     string   // for numbers: the unit, one of the Unit constants or plain text
	Enum     []string // allowed values of a string; nil for free text
	Bound    Bound    // for numbers
	Required bool
	// RequiredIf says when an otherwise optional key is required, e.g.
	// "with dip"; "" when never.
	RequiredIf string
	Example    any        // a realistic value; nil for tables
	Max        float64    // for integers: the largest value accepted (0 = none)
	Table      *TableSpec // the keys of a TypeTable or TypeTables value
	Alt        *KeySpec   // another form the key may take (a number instead of a table), or nil
}

// TableSpec is the keys of one table, in the order the documentation and
// starter files give them.
type TableSpec struct {
	Title string // e.g. "well file"
	Doc   string
	Keys  []KeySpec
	Other *KeySpec // the form of keys named by the user (a profile's groups), or nil: no others
	// Noun is what the table's keys are called in an "unknown" message
	// ("rule", "purpose"); "" for "key".
	Noun string
	// Hint replaces the list of keys in an unknown key's hint, for a table
	// whose keys are too many to list (every rule ID); "" lists them.
	Hint string
}

// spec is the spec of key name: its own, or the form of keys named by the
// user; nil when the table takes neither.
func (t *TableSpec) spec(name string) *KeySpec {
	if ks := t.Key(name); ks != nil {
		return ks
	}
	if t == nil {
		return nil
	}
	return t.Other
}

// takes reports whether a key of the spec (or its other form, Alt) is of
// type want.
func (k *KeySpec) takes(want ValueType) bool {
	return k.Type == want || (k.Alt != nil && k.Alt.Type == want)
}

// Key returns the spec of key name, or nil when the table has no such key.
func (t *TableSpec) Key(name string) *KeySpec {
	if t == nil {
		return nil
	}
	for i := range t.Keys {
		if t.Keys[i].Name == name {
			return &t.Keys[i]
		}
	}
	return nil
}

// Names lists the table's keys in order.
func (t *TableSpec) Names() []string {
	out := make([]string, len(t.Keys))
	for i, k := range t.Keys {
		out[i] = k.Name
	}
	return out
}

// ExampleTOML writes a document holding every key of the table with its
// example value, one entry of each array of tables: a catalogue of the
// keys for tests and the schema, not a consistent well (it gives both of
// each pair of alternatives, such as slot and slot_number).
func (t *TableSpec) ExampleTOML() string {
	var b strings.Builder
	t.writeExample(&b, "", false)
	return b.String()
}

func (t *TableSpec) writeExample(b *strings.Builder, path string, array bool) {
	if path != "" {
		if array {
			fmt.Fprintf(b, "\n[[%s]]\n", path)
		} else {
			fmt.Fprintf(b, "\n[%s]\n", path)
		}
	}
	for _, k := range t.Keys {
		if k.Table == nil {
			fmt.Fprintf(b, "%s = %s\n", k.Name, TOMLValue(k.Type, k.Example))
		}
	}
	for _, k := range t.Keys {
		if k.Table != nil {
			sub := k.Name
			if path != "" {
				sub = path + "." + k.Name
			}
			k.Table.writeExample(b, sub, k.Type == TypeTables)
		}
	}
}

// TOMLValue writes a value as TOML: dates bare, strings quoted, arrays
// bracketed.
func TOMLValue(t ValueType, v any) string {
	switch x := v.(type) {
	case string:
		if t == TypeDate || t == TypeDateTime {
			return x
		}
		return strconv.Quote(x)
	case float64:
		s := strconv.FormatFloat(x, 'f', -1, 64)
		if t != TypeInteger && !strings.ContainsAny(s, ".e") {
			s += ".0"
		}
		return s
	case int:
		return strconv.Itoa(x)
	case bool:
		return strconv.FormatBool(x)
	case []any:
		parts := make([]string, len(x))
		for i, e := range x {
			parts[i] = TOMLValue(TypeNumber, e)
			if s, ok := e.(string); ok {
				parts[i] = strconv.Quote(s)
			}
		}
		return "[" + strings.Join(parts, ", ") + "]"
	}
	return `""`
}
