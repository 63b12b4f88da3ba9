package schema

import (
	"fmt"
	"reflect"
	"strconv"
	"strings"
)

// SpecOf builds the key table of a file that is decoded into a Go struct
// (the project file): the struct the loader decodes into is the one
// definition of its keys. Each field gives its key with a `toml` tag and
// its meaning with `doc`; optional tags: `unit`, `enum` (values separated
// by commas), `example`, `required:"true"`, and `type:"date"` for a field
// of type any that holds a TOML date. Nested structs are tables.
func SpecOf(title, doc string, v any) *TableSpec {
	spec := specOfType(reflect.TypeOf(v))
	spec.Title, spec.Doc = title, doc
	return spec
}

func specOfType(t reflect.Type) *TableSpec {
	spec := &TableSpec{}
	for i := 0; i < t.NumField(); i++ {
		f := t.Field(i)
		name, _, _ := strings.Cut(f.Tag.Get("toml"), ",")
		if name == "" || name == "-" {
			continue
		}
		k := KeySpec{Name: name, Doc: f.Tag.Get("doc"), Unit: f.Tag.Get("unit"), Required: f.Tag.Get("required") == "true"}
		if e := f.Tag.Get("enum"); e != "" {
			k.Enum = strings.Split(e, ",")
		}
		ft := f.Type
		if ft.Kind() == reflect.Pointer {
			ft = ft.Elem() // an optional value
		}
		switch ft.Kind() {
		case reflect.String:
			k.Type = TypeString
		case reflect.Bool:
			k.Type = TypeBool
		case reflect.Float64:
			k.Type = TypeNumber
		case reflect.Int, reflect.Int64:
			k.Type = TypeInteger
		case reflect.Struct:
			k.Type = TypeTable
			k.Table = specOfType(ft)
			k.Table.Doc = k.Doc
		case reflect.Slice:
			switch el := ft.Elem(); {
			case el.Kind() == reflect.Struct:
				k.Type = TypeTables
				k.Table = specOfType(el)
				k.Table.Doc = k.Doc
			case el.Kind() == reflect.String:
				k.Type = TypeStrings
			case el.Kind() == reflect.Float64:
				k.Type = TypeNumbers
			case el.Kind() == reflect.Array && el.Len() == 2 && el.Elem().Kind() == reflect.Float64:
				k.Type = TypeNumberPairs
			default:
				panic(fmt.Sprintf("schema.SpecOf: field %s has unsupported type %s", f.Name, f.Type))
			}
		case reflect.Interface:
			if f.Tag.Get("type") != "date" {
				panic(fmt.Sprintf("schema.SpecOf: field %s of type any needs type:\"date\"", f.Name)) // a programming error, caught by every test
			}
			k.Type = TypeDate
		default:
			panic(fmt.Sprintf("schema.SpecOf: field %s has unsupported type %s", f.Name, f.Type))
		}
		if ex, ok := f.Tag.Lookup("example"); ok {
			k.Example = exampleOf(k.Type, ex)
		}
		spec.Keys = append(spec.Keys, k)
	}
	return spec
}

func exampleOf(t ValueType, s string) any {
	switch t {
	case TypeBool:
		return s == "true"
	case TypeNumber:
		f, _ := strconv.ParseFloat(s, 64)
		return f
	case TypeInteger:
		n, _ := strconv.Atoi(s)
		return n
	case TypeStrings: // "a,b"
		var out []any
		for _, e := range strings.Split(s, ",") {
			out = append(out, e)
		}
		return out
	case TypeNumberPairs: // "x y;x y"
		var out []any
		for _, pair := range strings.Split(s, ";") {
			var p []any
			for _, f := range strings.Fields(pair) {
				v, _ := strconv.ParseFloat(f, 64)
				p = append(p, v)
			}
			out = append(out, p)
		}
		return out
	}
	return s
}
