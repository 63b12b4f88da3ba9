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
	// A slurry's mix per bag: the water and the dry mass with additives
	// (the bag, and bentonite or sand added to it); 0 for a dry material.
	Water  schema.Volume
	Solids schema.Mass
	// Stated is the slurry's expected density in kg/m3 as a yields file
	// states it (its mix sheet's figure); 0 works it out from the mix.
	Stated float64
}

// Density is the slurry's expected density in kg/m3: the density a yields
// file states, else the mix's mass over its yield, water at 62.4 lb/ft3
// (999.6 kg/m3); false for a dry material or a yield with no mix.
func (y Yield) Density() (float64, bool) {
	if y.Stated > 0 {
		return y.Stated, true
	}
	if y.Water <= 0 || y.Solids <= 0 || y.Volume <= 0 {
		return 0, false
	}
	return (float64(y.Solids) + float64(y.Water)*waterKgPerM3) / float64(y.Volume), true
}

// Scaled is the yield of a bag of mass m: in proportion to the reference
// bag, or unchanged when either mass is unknown.
func (y Yield) Scaled(m schema.Mass) Yield {
	if m <= 0 || y.BagMass <= 0 || m == y.BagMass {
		return y
	}
	k := float64(m) / float64(y.BagMass)
	y.Volume = schema.Volume(float64(y.Volume) * k)
	y.Water = schema.Volume(float64(y.Water) * k)
	y.Solids = schema.Mass(float64(y.Solids) * k)
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

// ForWell is For with the well's units: a fill of a metric well that
// gives no bag mass is counted in the metric bag of its material
// (MetricBag), not in the US sack the built-in figure is for.
func (y *Yields) ForWell(f schema.Fill, u schema.Units) (Yield, bool) {
	v, ok := y.For(f)
	if !ok || f.Yield > 0 || f.BagMass > 0 || u.Imperial() {
		return v, ok
	}
	if v.Basis != CommonPractice && v.Basis != FromMemory {
		return v, ok // a project's own figure stays as written
	}
	if m := MetricBag(f.Material); m > 0 {
		v = v.Scaled(m)
	}
	return v, ok
}

// MetricBag is the bag a material comes in where it is sold by the
// kilogram: 25 kg for sand, bentonite and cement (EN 197-1 cements are
// sold in 25-kg sacks in most of Europe: common practice), 0 for a
// material not bagged.
func MetricBag(m schema.Material) schema.Mass {
	switch m.Group() {
	case schema.BackfillGroup:
		return 0
	}
	return schema.MassFrom(25, schema.Kilograms)
}

func ft3(v float64) schema.Volume { return schema.VolumeFrom(v, schema.CubicFeet) }
func gal(v float64) schema.Volume { return schema.VolumeFrom(v, schema.USGallons) }
func lb(v float64) schema.Mass    { return schema.MassFrom(v, schema.Pounds) }

// Densities used to make up the default yields. Water weighs 62.4 lb/ft3
// and a US gallon is 231 in3 (NIST Handbook 44, appendix C), so 7.48052
// gal/ft3.
const (
	waterLbPerFt3 = 62.4
	galPerFt3     = 1728.0 / 231
	cementSG      = 3.15 // Portland cement (Concrete Construction, "Volume of grout"; ASTM C188 measures it)
	bentoniteSG   = 2.6  // sodium montmorillonite (from memory)
	quartzSG      = 2.65 // silica sand (common practice)
)

// waterKgPerM3 is 62.4 lb/ft3 in kg/m3.
var waterKgPerM3 = float64(lb(waterLbPerFt3)) / float64(ft3(1))

// absolute is the absolute volume in cubic feet of pounds lb of a solid of
// specific gravity sg.
func absolute(lb, sg float64) float64 { return lb / (sg * waterLbPerFt3) }

// DefaultYields is the built-in table. The dry materials' figures are
// bulk volumes of the bag as poured (bag mass over loose bulk density);
// the slurries' are absolute-volume sums (solids at their specific
// gravity plus the mix water), which is how a mix sheet reaches them.
// Native backfill and cave-in come by the bucket, not the bag, and have
// none. Each call returns a fresh table.
func DefaultYields() *Yields {
	y := &Yields{}
	sand := Yield{Volume: ft3(0.5), BagMass: lb(50), Basis: CommonPractice,
		Note: "50-lb bag of dry silica sand at about 100 lb/ft³ loose"}
	y.Set(schema.FilterPack, sand)
	y.Set(schema.FineSand, sand)
	// 50 lb / 72 lb/ft3 = 0.694 ft3
	y.Set(schema.BentoniteChips, Yield{Volume: ft3(50.0 / 72), BagMass: lb(50), Basis: FromMemory,
		Note: "50-lb bag of chips at about 72 lb/ft³ bulk (0.68 to 0.70 ft³ per bag)"})
	y.Set(schema.BentonitePellets, Yield{Volume: ft3(50.0 / 72), BagMass: lb(50), Basis: FromMemory,
		Note: "50-lb pail or bag of pellets at about 72 lb/ft³ bulk"})
	// 28 ft3 per short ton: 2000 / 28 = 71.4 lb/ft3, 50 lb = 0.700 ft3
	y.Set(schema.BentoniteGranular, Yield{Volume: ft3(50 * 28 / 2000.0), BagMass: lb(50), Basis: CommonPractice,
		Note: "50-lb bag of granular bentonite at 28 ft³ per short ton (71.4 lb/ft³)"})
	// 50 lb / (2.6 x 62.4 lb/ft3) + 24 gal / 7.48052 gal/ft3 = 0.31 + 3.21
	y.Set(schema.BentoniteGrout, Yield{Volume: ft3(3.5), BagMass: lb(50), Basis: FromMemory,
		Note: "50-lb bag of grout-grade bentonite with about 24 US gal water (20% solids)", Water: gal(24), Solids: lb(50)})
	// 94 lb / (3.15 x 62.4 lb/ft3) + 5.2 gal / 7.48052 gal/ft3 = 0.48 + 0.70,
	// 1.18 in the cementing tables (the sack's entrained air)
	y.Set(schema.NeatCement, Yield{Volume: ft3(1.18), BagMass: lb(94), Basis: CommonPractice,
		Note: "94-lb sack of Portland cement with 5.2 US gal water", Water: gal(5.2), Solids: lb(94)})
	// as neat cement, plus 4.7 lb bentonite (5%) and 0.65 gal water per 1%
	y.Set(schema.CementBentonite, Yield{Volume: ft3(1.64), BagMass: lb(94), Basis: FromMemory,
		Note: "94-lb sack of Portland cement with 5% bentonite and 8.5 US gal water", Water: gal(8.5), Solids: lb(94 + 4.7)})
	y.Set(schema.SandCement, Yield{Volume: ft3(SandCementYield(94, 188, 7)), BagMass: lb(94), Basis: CommonPractice,
		Note:  "94-lb sack of Portland cement with 188 lb sand (2 parts sand to 1 of cement by weight) and 7 US gal water, by absolute volumes",
		Water: gal(7), Solids: lb(94 + 188)})
	y.Set(schema.Concrete, Yield{Volume: ft3(0.6), BagMass: lb(80), Basis: FromMemory,
		Note: "80-lb bag of premixed concrete"})
	return y
}

// SandCementYield is the volume in cubic feet of a batch of cement and
// sand (pounds) with water (US gallons), by absolute volumes: cement at
// specific gravity 3.15, quartz sand at 2.65, no entrained air.
func SandCementYield(cementLb, sandLb, waterGal float64) float64 {
	return absolute(cementLb, cementSG) + absolute(sandLb, quartzSG) + waterGal/galPerFt3
}
