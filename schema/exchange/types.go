package exchange

import (
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// valueType is the TOML type a key's cell is written as.
type valueType int

const (
	tString valueType = iota
	tNumber
	tInteger
	tBool
	tDate
	tDateTime // a date, or a date and time
	tStrings  // one per line in the cell
	tNumbers  // separated by ";"
	tPairs    // "a b; c d" for [[a, b], [c, d]]
)

// tableSpec finds a table of the well file's key table by its dotted
// path ("surface.pad", "string.section"); nil when there is none.
func tableSpec(table string) *schema.TableSpec {
	spec := schema.WellFile
	if table == "" {
		return spec
	}
	for _, part := range strings.Split(table, ".") {
		k := spec.Key(part)
		if k == nil || k.Table == nil {
			return nil
		}
		spec = k.Table
	}
	return spec
}

// keySpec finds a key in the well file's key table (schema.WellFile):
// table is a dotted path ("surface.pad", "string.section"). nil when the
// format has no such key; the loader then names the cell.
func keySpec(table, key string) *schema.KeySpec {
	return tableSpec(table).Key(key)
}

// typeOf is the type of a key of a table, from the key table; a key it
// does not know is written as a string, and the loader reports it.
func typeOf(table, key string) valueType {
	k := keySpec(table, key)
	if k == nil {
		return tString
	}
	switch k.Type {
	case schema.TypeNumber:
		return tNumber
	case schema.TypeInteger:
		return tInteger
	case schema.TypeBool:
		return tBool
	case schema.TypeDate:
		return tDate
	case schema.TypeDateTime:
		return tDateTime
	case schema.TypeStrings:
		return tStrings
	case schema.TypeNumbers:
		return tNumbers
	case schema.TypeNumberPairs:
		return tPairs
	}
	return tString
}
