// Package jsonschema writes the JSON Schema of each tremie input file from
// the key tables the loaders use (schema.WellFile, project.File,
// rules.ProfileFile, quantity.YieldsFile), so that a TOML editor that
// reads JSON Schema completes and checks the same keys the loader accepts.
//
// The schemas are draft-04, the newest draft every common TOML language
// server reads. TOML dates reach a schema as strings, so a date is a
// string with a date pattern.
package jsonschema

import (
	"encoding/json"
	"fmt"
	"sort"
	"strings"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

// Draft is the JSON Schema dialect written.
const Draft = "http://json-schema.org/draft-04/schema#"

// Kinds names the input files that have a schema, in the order help
// lists them.
var Kinds = []string{"well", "project", "profile", "yields"}

// Spec returns the key table of an input file kind.
func Spec(kind string) (*schema.TableSpec, error) {
	switch kind {
	case "well":
		return schema.WellFile, nil
	case "project":
		return project.File, nil
	case "profile":
		return rules.ProfileFile(), nil
	case "yields":
		return quantity.YieldsFile(), nil
	}
	return nil, fmt.Errorf("no schema %q (one of: %s)", kind, strings.Join(Kinds, ", "))
}

// Generate returns the JSON Schema of an input file kind, indented, with a
// final newline. The same tables give the same bytes.
func Generate(kind string) ([]byte, error) {
	spec, err := Spec(kind)
	if err != nil {
		return nil, err
	}
	doc := object(spec)
	doc["$schema"] = Draft
	doc["title"] = spec.Title
	b, err := json.MarshalIndent(doc, "", "  ")
	if err != nil {
		return nil, fmt.Errorf("schema %s: %w", kind, err)
	}
	return append(b, '\n'), nil
}

// object is the schema of a table: only its keys, each described.
func object(t *schema.TableSpec) map[string]any {
	props := map[string]any{}
	var required []string
	for i := range t.Keys {
		k := &t.Keys[i]
		props[k.Name] = property(k)
		if k.Required {
			required = append(required, k.Name)
		}
	}
	o := map[string]any{
		"type":                 "object",
		"additionalProperties": false,
		"properties":           props,
	}
	if t.Other != nil {
		o["additionalProperties"] = property(t.Other)
	}
	if t.Doc != "" {
		o["description"] = t.Doc
	}
	if len(required) > 0 {
		sort.Strings(required)
		o["required"] = required
	}
	return o
}

// datePattern and dateTimePattern match TOML local dates and date-times as
// an editor hands them to a schema.
const (
	datePattern     = `^[0-9]{4}-[0-9]{2}-[0-9]{2}$`
	dateTimePattern = `^[0-9]{4}-[0-9]{2}-[0-9]{2}([Tt ][0-9]{2}:[0-9]{2}(:[0-9]{2}(\.[0-9]+)?)?)?$`
)

func property(k *schema.KeySpec) map[string]any {
	var p map[string]any
	switch k.Type {
	case schema.TypeTable:
		p = object(k.Table)
	case schema.TypeTables:
		p = map[string]any{"type": "array", "items": object(k.Table)}
	case schema.TypeString:
		p = map[string]any{"type": "string"}
		if len(k.Enum) > 0 {
			p["enum"] = k.Enum
		}
	case schema.TypeNumber:
		p = map[string]any{"type": "number"}
	case schema.TypeInteger:
		p = map[string]any{"type": "integer"}
		if k.Max > 0 {
			p["maximum"] = k.Max
		}
	case schema.TypeBool:
		p = map[string]any{"type": "boolean"}
	case schema.TypeDate:
		p = map[string]any{"type": "string", "format": "date", "pattern": datePattern}
	case schema.TypeDateTime:
		p = map[string]any{"type": "string", "pattern": dateTimePattern}
	case schema.TypeStrings:
		item := map[string]any{"type": "string"}
		if len(k.Enum) > 0 {
			item["enum"] = k.Enum
		}
		p = map[string]any{"type": []string{"string", "array"}, "items": item}
	case schema.TypeNumbers:
		p = map[string]any{"type": "array", "items": map[string]any{"type": "number"}}
	case schema.TypeNumberPairs:
		pair := map[string]any{"type": "array", "items": map[string]any{"type": "number"}, "minItems": 2, "maxItems": 2}
		p = map[string]any{"type": "array", "items": pair}
	}
	switch k.Bound {
	case schema.NonNegative:
		p["minimum"] = 0
	case schema.Positive:
		p["minimum"] = 0
		p["exclusiveMinimum"] = true // draft-04 form
	}
	if k.Alt != nil {
		p = map[string]any{"anyOf": []any{p, property(k.Alt)}}
	}
	p["description"] = describe(k)
	if k.Unit != "" {
		p["x-unit"] = k.Unit
	}
	if k.Example != nil {
		p["examples"] = []any{k.Example}
	}
	return p
}

// describe is the key's doc with its unit and whether it is required, as
// an editor shows it on hover.
func describe(k *schema.KeySpec) string {
	d := k.Doc
	if k.Unit != "" {
		d += " Unit: " + k.Unit + "."
	}
	if k.Required {
		d += " Required."
	}
	if k.RequiredIf != "" {
		d += " Required " + k.RequiredIf + "."
	}
	return strings.TrimSpace(d)
}
