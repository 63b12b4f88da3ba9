package quantity

import (
	"github.com/tremie-dev/tremie/schema"
)

// Basis says where a yield figure comes from, so that every report can
// show how far to trust it.
type Basis string

const (
	CommonPractice Basis = "common practice" // a figure widely used in the trade
	FromMemory     Basis = "from memory"     // recalled, not looked up: check the product sheet
	ProjectBasis   Basis = "project"         // from a [yields] table
	FillBasis      Basis = "fill"            // from the fill's own yield key
)

// Yield is the volume one bag (or sack, or mixed batch) of a material
// fills in place.
type Yield struct {
	Volume schema.Volume
	// BagMass is the bag the volume is for. A bag of another mass yields in
	// proportion; 0 means "per bag as placed", never scaled.
	BagMass schema.Mass
	Basis   Basis
	Note    string // how the figure is made up
}

// Scaled is the yield of a bag of mass m: in proportion to the reference
// bag, or unchanged when either mass is unknown.
func (y Yield) Scaled(m schema.Mass) Yield {
	if m <= 0 || y.BagMass <= 0 || m == y.BagMass {
		return y
	}
	y.Volume = schema.Volume(float64(y.Volume) * float64(m) / float64(y.BagMass))
	y.BagMass = m
	if y.Note != "" {
		y.Note += "; scaled to this bag's mass"
	}
	return y
}

// Yields is a table of yields by material class.
type Yields struct {
	m map[schema.Material]Yield
}

// Get returns a material's yield.
func (y *Yields) Get(m schema.Material) (Yield, bool) {
	if y == nil {
		return Yield{}, false
	}
	v, ok := y.m[m]
	return v, ok
}

// Set replaces a material's yield.
func (y *Yields) Set(m schema.Material, v Yield) {
	if y.m == nil {
		y.m = map[schema.Material]Yield{}
	}
	y.m[m] = v
}

// Materials lists the materials that have a yield, in schema.Materials order.
func (y *Yields) Materials() []schema.Material {
	var out []schema.Material
	for _, m := range schema.Materials {
		if _, ok := y.Get(m); ok {
			out = append(out, m)
		}
	}
	return out
}

// For is the yield in force for one bag of a fill: the fill's own yield
// if it gives one, else the table's, scaled to the fill's bag mass.
func (y *Yields) For(f schema.Fill) (Yield, bool) {
	if f.Yield > 0 {
		return Yield{Volume: f.Yield, BagMass: f.BagMass, Basis: FillBasis, Note: "yield given in the well file"}, true
	}
	v, ok := y.Get(f.Material)
	if !ok {
		return Yield{}, false
	}
	return v.Scaled(f.BagMass), true
}

func ft3(v float64) schema.Volume { return schema.VolumeFrom(v, schema.CubicFeet) }
func lb(v float64) schema.Mass    { return schema.MassFrom(v, schema.Pounds) }

// DefaultYields is the built-in table. The dry materials' figures are
// bulk volumes of the bag as poured; the slurries' are absolute-volume
// sums (solids at their specific gravity plus the mix water), which is how
// a mix sheet reaches them. Native backfill and cave-in come by the
// bucket, not the bag, and have none. Each call returns a fresh table.
func DefaultYields() *Yields {
	y := &Yields{}
	sand := Yield{Volume: ft3(0.5), BagMass: lb(50), Basis: CommonPractice,
		Note: "50-lb bag of dry silica sand at about 100 lb/ft3 loose"}
	y.Set(schema.FilterPack, sand)
	y.Set(schema.FineSand, sand)
	dryBentonite := Yield{Volume: ft3(0.65), BagMass: lb(50), Basis: FromMemory,
		Note: "50-lb bag; product sheets quote 0.6 to 0.7 ft3"}
	y.Set(schema.BentoniteChips, dryBentonite)
	y.Set(schema.BentonitePellets, dryBentonite)
	y.Set(schema.BentoniteGranular, dryBentonite)
	// 50 lb / (2.6 x 62.4 lb/ft3) + 24 gal / 7.48052 gal/ft3 = 0.31 + 3.21
	y.Set(schema.BentoniteGrout, Yield{Volume: ft3(3.5), BagMass: lb(50), Basis: FromMemory,
		Note: "50-lb bag of grout-grade bentonite with about 24 US gal water (20% solids)"})
	// 94 lb / (3.15 x 62.4 lb/ft3) + 5.2 gal / 7.48052 gal/ft3 = 0.48 + 0.70
	y.Set(schema.NeatCement, Yield{Volume: ft3(1.18), BagMass: lb(94), Basis: CommonPractice,
		Note: "94-lb sack of Portland cement with 5.2 US gal water"})
	// as neat cement, plus 4.7 lb bentonite (5%) and 0.65 gal water per 1%
	y.Set(schema.CementBentonite, Yield{Volume: ft3(1.64), BagMass: lb(94), Basis: FromMemory,
		Note: "94-lb sack of Portland cement with 5% bentonite and 8.5 US gal water"})
	y.Set(schema.Concrete, Yield{Volume: ft3(0.6), BagMass: lb(80), Basis: FromMemory,
		Note: "80-lb bag of premixed concrete"})
	return y
}
