package quantity

import (
	"sync"

	"github.com/tremie-dev/tremie/schema"
)

// YieldsFile is the key table of a yields file: the units, then one table
// per fill material of schema.Materials, made once. The reader checks
// keys against it.
var YieldsFile = sync.OnceValue(yieldsSpec)

// groutEntry is a grout's yield with its mix.
var groutEntry = &schema.TableSpec{Doc: "The yield of one grout, overriding the built-in figure, with its mix.", Keys: append(append([]schema.KeySpec{}, yieldEntry.Keys...),
	schema.KeySpec{Name: "water", Type: schema.TypeNumber, Bound: schema.Positive, Unit: "[yields] water_unit", Doc: "A grout's mix water per bag (gal where masses are in lb, L where in kg, unless water_unit says).", Example: 5.2},
	schema.KeySpec{Name: "solids", Type: schema.TypeNumber, Bound: schema.Positive, Unit: "[yields] mass unit", Doc: "A grout's dry mass per bag with its additives; default bag_mass.", Example: 98.7},
	schema.KeySpec{Name: "density", Type: schema.TypeNumber, Bound: schema.Positive, Doc: "A grout's expected slurry density from its mix sheet: lb/gal where masses are in lb, kg/L where in kg; default worked from water, solids and yield.", Example: 15.6},
)}

// yieldEntry is the table of one material's yield.
var yieldEntry = &schema.TableSpec{Doc: "The yield of one material, overriding the built-in figure.", Keys: []schema.KeySpec{
	{Name: "yield", Type: schema.TypeNumber, Required: true, Bound: schema.Positive, Unit: "[yields] volume unit", Doc: "Volume one bag fills in place.", Example: 0.45},
	{Name: "bag_mass", Type: schema.TypeNumber, Bound: schema.Positive, Unit: "[yields] mass unit", Doc: "Mass of the bag the yield is for; omit for per bag as placed.", Example: 50},
	{Name: "note", Type: schema.TypeString, Doc: "Where the figure comes from.", Example: "supplier data sheet, 2026"},
}}

func yieldsSpec() *schema.TableSpec {
	t := &schema.TableSpec{Doc: "Yields per bag of the materials named; the others keep the built-in figures.", Keys: []schema.KeySpec{
		{Name: "volume", Type: schema.TypeString, Enum: []string{string(schema.CubicFeet), string(schema.USGallons), string(schema.Litres), string(schema.CubicMetres)}, Doc: "Unit of each yield (gal = US gallon); default ft3.", Example: "ft3"},
		{Name: "mass", Type: schema.TypeString, Enum: []string{string(schema.Pounds), string(schema.Kilograms)}, Doc: "Unit of each bag_mass and solids; default lb.", Example: "lb"},
		{Name: "water_unit", Type: schema.TypeString, Enum: []string{string(schema.CubicFeet), string(schema.USGallons), string(schema.Litres), string(schema.CubicMetres)}, Doc: "Unit of each grout's mix water; default gal with lb, L with kg.", Example: "gal"},
	}}
	for _, m := range schema.Materials {
		entry := yieldEntry
		if m.Group() == schema.GroutGroup {
			entry = groutEntry
		}
		t.Keys = append(t.Keys, schema.KeySpec{Name: string(m), Type: schema.TypeTable, Doc: "Yield of " + string(m) + ".", Table: entry})
	}
	return &schema.TableSpec{Title: "tremie yields file", Doc: "Material yields per bag for a project, named by project.toml's yields key.", Keys: []schema.KeySpec{
		{Name: "yields", Type: schema.TypeTable, Required: true, Doc: t.Doc, Table: t},
	}}
}
