package quantity

import (
	"math"

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
// named it for its yields. Every problem of the file is reported, sorted,
// in one schema.ErrorList.
func LoadYields(path string) (*Yields, error) {
	data, err := schema.ReadInput(path, schema.MaxTextFile)
	if err != nil {
		return nil, schema.ErrorList{schema.ReadError(path, "yields", err)}
	}
	y, _, err := parseYields(path, data, true)
	return y, err
}

// ParseYields returns the defaults overridden by the [yields] table of a
// TOML document (a project file, say); a document without one gives the
// defaults. name is the file name for errors.
func ParseYields(name string, data []byte) (*Yields, error) {
	y, _, err := parseYields(name, data, false)
	return y, err
}

// parseYields reads the [yields] table strictly (schema.Doc); whole says
// the document is a yields file, which holds nothing else.
func parseYields(name string, data []byte, whole bool) (*Yields, bool, error) {
	doc, err := schema.ParseDoc(name, data, YieldsFile())
	if err != nil {
		return nil, false, err
	}
	root := doc.Root()
	found := root.Has("yields")
	y := DefaultYields()
	if t := root.Sub("yields"); t != nil {
		readYields(doc, t, y)
	}
	if whole {
		if !found {
			doc.Errorf("", "no [yields] table in this file")
		}
		root.Done()
	}
	if err := doc.Err(); err != nil {
		return nil, found, err
	}
	return y, found, nil
}

func readYields(doc *schema.Doc, t *schema.Table, y *Yields) {
	vu, mu := schema.CubicFeet, schema.Pounds
	if s := t.Str("volume"); s != "" {
		switch u := schema.VolumeUnit(s); u {
		case schema.CubicFeet, schema.USGallons, schema.Litres, schema.CubicMetres:
			vu = u
		default:
			doc.Errorf("yields.volume", "yields volume unit must be one of ft3, gal, L, m3, not %q", s)
		}
	}
	if s := t.Str("mass"); s != "" {
		switch u := schema.MassUnit(s); u {
		case schema.Pounds, schema.Kilograms:
			mu = u
		default:
			doc.Errorf("yields.mass", "yields mass unit must be lb or kg, not %q", s)
		}
	}
	for _, k := range t.Keys() {
		if k == "volume" || k == "mass" {
			continue
		}
		path := "yields." + k
		if YieldsFile().Keys[0].Table.Key(k) == nil {
			continue // not a material: Done reports it, with the materials
		}
		e := t.Sub(k)
		if e == nil {
			continue
		}
		entry := Yield{Basis: ProjectBasis, Note: e.Str("note")}
		if n, ok := positiveNumber(doc, e, "yield"); ok {
			entry.Volume = schema.VolumeFrom(n, vu)
		} else if !e.Has("yield") {
			doc.Errorf(path, "yields.%s has no yield", k)
		}
		if n, ok := positiveNumber(doc, e, "bag_mass"); ok {
			entry.BagMass = schema.MassFrom(n, mu)
		}
		e.Done()
		if entry.Volume > 0 {
			y.Set(schema.Material(k), entry)
		}
	}
	t.Done()
}

// positiveNumber reads a key that must be a positive, finite number, and
// whether it was given and valid.
func positiveNumber(doc *schema.Doc, t *schema.Table, k string) (float64, bool) {
	v, ok := t.Raw(k)
	if !ok {
		return 0, false
	}
	n, ok := schema.Number(v)
	if !ok || !(n > 0) || math.IsInf(n, 0) {
		doc.Errorf(t.Path()+"."+k, "%s must be a positive number, not %v", k, v)
		return 0, false
	}
	return n, true
}
