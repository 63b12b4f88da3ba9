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
//
//	[yields.neat-cement]  # a grout may give its mix
//	yield = 1.18
//	bag_mass = 94
//	water = 5.2           # mix water per bag, in water_unit (gal with lb, L with kg)
//	solids = 94           # dry mass per bag with additives (default bag_mass)
//	density = 15.6        # expected slurry density, lb/gal with lb, kg/L with kg

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
	wu := schema.VolumeUnit("")
	if u, ok := volumeUnit(doc, t, "volume", "volume"); ok {
		vu = u
	}
	if s := t.Str("mass"); s != "" {
		switch u := schema.MassUnit(s); u {
		case schema.Pounds, schema.Kilograms:
			mu = u
		default:
			doc.Errorf("yields.mass", "yields mass unit must be lb or kg, not %q", s)
		}
	}
	if u, ok := volumeUnit(doc, t, "water_unit", "water"); ok {
		wu = u
	}
	if wu == "" { // US gallons with pounds, litres with kilograms
		wu = schema.USGallons
		if mu == schema.Kilograms {
			wu = schema.Litres
		}
	}
	for _, k := range t.Keys() {
		if k == "volume" || k == "mass" || k == "water_unit" {
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
		readMix(doc, e, &entry, schema.Material(k), wu, mu)
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

// readMix reads a grout's mix from its yields entry: water and solids per
// bag, and the expected density (lb/gal where masses are in pounds, kg/L
// where in kilograms). A dry material takes none.
func readMix(doc *schema.Doc, e *schema.Table, entry *Yield, m schema.Material, wu schema.VolumeUnit, mu schema.MassUnit) {
	has := e.Has("water") || e.Has("solids") || e.Has("density")
	if !has {
		return
	}
	path := e.Path()
	if m.Group() != schema.GroutGroup {
		return // not in a dry material's key table: Done reports the key
	}
	if n, ok := positiveNumber(doc, e, "water"); ok {
		entry.Water = schema.VolumeFrom(n, wu)
	}
	if n, ok := positiveNumber(doc, e, "solids"); ok {
		entry.Solids = schema.MassFrom(n, mu)
	} else if !e.Has("solids") {
		entry.Solids = entry.BagMass
	}
	if entry.Water > 0 && entry.Solids <= 0 {
		doc.Errorf(path+".water", "water per bag needs the bag: give bag_mass or solids")
	}
	if n, ok := positiveNumber(doc, e, "density"); ok {
		kg := n * 1000 // kg/L
		if mu == schema.Pounds {
			kg = float64(schema.MassFrom(n, schema.Pounds)) / float64(schema.VolumeFrom(1, schema.USGallons))
		}
		entry.Stated = kg
	}
}

// volumeUnit reads a volume unit key of the [yields] table; false when it
// is not given or not one of ft3, gal, L, m3 (then reported).
func volumeUnit(doc *schema.Doc, t *schema.Table, key, what string) (schema.VolumeUnit, bool) {
	s := t.Str(key)
	if s == "" {
		return "", false
	}
	switch u := schema.VolumeUnit(s); u {
	case schema.CubicFeet, schema.USGallons, schema.Litres, schema.CubicMetres:
		return u, true
	}
	doc.Errorf("yields."+key, "yields %s unit must be one of ft3, gal, L, m3, not %q", what, s)
	return "", false
}
