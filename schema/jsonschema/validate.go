package jsonschema

import (
	"bytes"
	"encoding/json"
	"fmt"
	"sync"
	"time"

	validator "github.com/santhosh-tekuri/jsonschema/v6"
	"github.com/tremie-dev/tremie/schema"
)

// compiled holds each kind's schema compiled once by the validator.
var compiled struct {
	sync.Mutex
	m map[string]*validator.Schema
}

// Validate checks a TOML document against the schema of an input file
// kind with santhosh-tekuri/jsonschema, a general-purpose JSON Schema
// validator, as an editor would: tables as objects, dates as their text.
// It lets tests hold the generated schemas to an implementation that is
// not ours.
func Validate(kind string, src []byte) error {
	s, err := schemaOf(kind)
	if err != nil {
		return err
	}
	inst, err := Instance(src)
	if err != nil {
		return err
	}
	return s.Validate(inst)
}

func schemaOf(kind string) (*validator.Schema, error) {
	compiled.Lock()
	defer compiled.Unlock()
	if s, ok := compiled.m[kind]; ok {
		return s, nil
	}
	b, err := Generate(kind)
	if err != nil {
		return nil, err
	}
	doc, err := validator.UnmarshalJSON(bytes.NewReader(b))
	if err != nil {
		return nil, fmt.Errorf("schema %s: %w", kind, err)
	}
	c := validator.NewCompiler()
	if err := c.AddResource(kind+".json", doc); err != nil {
		return nil, err
	}
	s, err := c.Compile(kind + ".json")
	if err != nil {
		return nil, fmt.Errorf("schema %s: %w", kind, err)
	}
	if compiled.m == nil {
		compiled.m = map[string]*validator.Schema{}
	}
	compiled.m[kind] = s
	return s, nil
}

// Instance is a TOML document as JSON Schema sees it.
func Instance(src []byte) (any, error) {
	tree, err := schema.DecodeTOML("input", src)
	if err != nil {
		return nil, err
	}
	b, err := json.Marshal(jsonable(tree))
	if err != nil {
		return nil, err
	}
	return validator.UnmarshalJSON(bytes.NewReader(b))
}

func jsonable(v any) any {
	switch x := v.(type) {
	case map[string]any:
		out := make(map[string]any, len(x))
		for k, e := range x {
			out[k] = jsonable(e)
		}
		return out
	case []map[string]any:
		out := make([]any, len(x))
		for i, e := range x {
			out[i] = jsonable(e)
		}
		return out
	case []any:
		out := make([]any, len(x))
		for i, e := range x {
			out[i] = jsonable(e)
		}
		return out
	case time.Time:
		switch name, _ := x.Zone(); name {
		case "date-local":
			return x.Format("2006-01-02")
		case "datetime-local":
			return x.Format("2006-01-02T15:04:05")
		}
		return x.Format(time.RFC3339)
	}
	return v
}
