package quantity

import (
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// kgPerM3PerLbPerGal: 1 lb/gal = 0.45359237 kg / 3.785411784 L = 119.826
// kg/m3 (NIST Handbook 44, appendix C).
const kgPerM3PerLbPerGal = 0.45359237 / 3.785411784 * 1000

// The expected densities of the default grouts against published
// figures: neat cement at 5.2 US gal per 94-lb sack weighs about 15.6
// lb/gal and meets Ohio Adm. Code 3745-9-07 (at most 5.2 gal per sack, at
// least 15 lb/gal). The cementing worked example of "Cement Slurries"
// (eng-info-tech, from a drilling handbook) takes a sack with 5.18 gal:
// 0.478 + 0.693 = 1.171 ft3 weighing 137.2 lb, 117.1 lb/ft3 = 15.7
// lb/gal; the same arithmetic here gives those figures, and the default's
// 1.18 ft3 (air entrained in the sack) puts it at 15.56 lb/gal.
func TestGroutDensity(t *testing.T) {
	worked := SandCementYield(94, 0, 5.18)
	near(t, "worked example ft3", worked, 1.171, 5e-4)
	near(t, "worked example lb/gal", (94+5.18*waterLbPerFt3/galPerFt3)/(worked*galPerFt3), 15.7, 5e-3)
	y := DefaultYields()
	neat, _ := y.Get(schema.NeatCement)
	d, ok := neat.Density()
	if !ok {
		t.Fatal("neat cement has no density")
	}
	lbGal := d / kgPerM3PerLbPerGal
	near(t, "neat cement lb/gal", lbGal, 15.6, 0.05)
	if lbGal < 15 || neat.Water.In(schema.USGallons) > 5.2+1e-9 {
		t.Errorf("neat cement default %.2f lb/gal with %.2f gal/sack breaks Ohio 3745-9-07", lbGal, neat.Water.In(schema.USGallons))
	}
	// a 25-kg bag keeps the mix: same density, water in proportion
	// (5.2 gal x 25 / 42.638 kg = 3.049 gal = 11.54 L)
	f := fill(0, 1, schema.NeatCement)
	f.BagMass = 25
	m, _ := y.For(f)
	d25, _ := m.Density()
	near(t, "25-kg sack density", d25, d, 1e-9)
	near(t, "25-kg sack water L", m.Water.In(schema.Litres), 5.2*3.785411784*25/(94*0.45359237), 1e-9)
	// a dry material has none
	if chips, _ := y.Get(schema.BentoniteChips); func() bool { _, ok := chips.Density(); return ok }() {
		t.Error("chips have a slurry density")
	}
}

// USGS National Field Manual, chapter A4: the water in a well is V =
// 0.0408 x H x D^2 US gal (H ft of water, D in. inside diameter), and at
// least three well volumes are purged. 2-in Sch 40 PVC has a 2.067-in
// ID (ASTM D1785): 0.0408 x 2.067^2 = 0.17432 gal/ft. With the static
// level 12 ft below ground and the string's bottom at 30 ft, H = 18 ft:
// 3.1377 gal, purge 9.413 gal. A pack of porosity 0.30 from 20 to 30 ft
// in an 8.25-in hole (0.34046 ft2/ft annulus, 2.5469 gal/ft) adds 0.30 x
// 10 x 2.5469 = 7.6406 gal of pore water.
func TestWellVolumeUSGS(t *testing.T) {
	w := imperial()
	hole(w, 0, ft(30), in(8.25))
	str(w, "main", ft(-2.5), ft(20), ft(30), sch40Two)
	w.Fills = []schema.Fill{fill(ft(20), ft(30), schema.FilterPack)}
	w.WaterLevels = []schema.WaterLevel{{Depth: ft(14), Kind: schema.FirstEncountered}, {Depth: ft(12), Kind: schema.Static}}
	vs := WellVolumes(w, 0)
	if len(vs) != 1 {
		t.Fatalf("%d volumes", len(vs))
	}
	usgs := 0.0408 * 2.067 * 2.067 * 18
	near(t, "casing gal", vs[0].Casing.In(schema.USGallons), usgs, 1e-3) // 0.0408 is given to 3 figures
	near(t, "purge gal (USGS)", vs[0].Purge().In(schema.USGallons), 9.413, 0.005)
	withPack := WellVolumes(w, 0.30)[0]
	near(t, "pack pore gal", withPack.Pack.In(schema.USGallons), 7.6406, 5e-4)
	// a level below the bottom leaves nothing to purge
	w.WaterLevels = []schema.WaterLevel{{Depth: ft(31), Kind: schema.Static}}
	if vs := WellVolumes(w, 0); len(vs) != 0 {
		t.Errorf("dry well: %+v", vs)
	}
}

// In a nested well each string has its own head (USGS NFM A4 purges the
// water standing in the pipe sampled): two 2-in Sch 40 strings, S to 20
// ft and D to 30 ft, with S's level at 12 ft and D's at 16 ft, hold
// 0.0408 x 2.067^2 x 8 = 1.3946 gal and 0.0408 x 2.067^2 x 14 = 2.4405
// gal. A level of the whole hole at 10 ft counts only for a string with
// none of its own: 3.4864 gal for D (20 ft of water) without D's level.
func TestWellVolumeNestedStrings(t *testing.T) {
	w := imperial()
	hole(w, 0, ft(30), in(10))
	str(w, "S", ft(-2.5), ft(15), ft(20), sch40Two)
	str(w, "D", ft(-2.5), ft(25), ft(30), sch40Two)
	w.WaterLevels = []schema.WaterLevel{
		{Depth: ft(10), Kind: schema.Static},
		{Depth: ft(12), Kind: schema.Static, String: "S"},
		{Depth: ft(16), Kind: schema.Static, String: "D"},
	}
	perFt := 0.0408 * 2.067 * 2.067
	vs := WellVolumes(w, 0)
	if len(vs) != 2 {
		t.Fatalf("%d volumes", len(vs))
	}
	near(t, "S gal", vs[0].Casing.In(schema.USGallons), perFt*8, 1e-3)
	near(t, "D gal", vs[1].Casing.In(schema.USGallons), perFt*14, 1e-3)
	near(t, "S/D level ft", vs[1].Level.In(schema.Feet)-vs[0].Level.In(schema.Feet), 4, 1e-9)
	w.WaterLevels = w.WaterLevels[:2]
	vs = WellVolumes(w, 0)
	near(t, "D gal on the hole's level", vs[1].Casing.In(schema.USGallons), perFt*20, 1e-3)
}

// Entrance velocity by hand (Driscoll, Groundwater and Wells, ch. 13:
// at most 0.1 ft/s through the effective open area, taken as half the
// screen's): 10 ft of 6-in screen (OD 6.625 in) with 10 % open area has
// pi x 6.625/12 x 10 = 17.345 ft2 of surface, 1.7345 ft2 open, 0.86723
// ft2 effective; it transmits 0.086723 ft3/s = 38.92 gal/min at 0.1 ft/s
// (1 ft3/s = 448.83 gal/min, NIST HB 44); at 50 gal/min water enters at
// 0.11140 ft3/s / 0.86723 ft2 = 0.1285 ft/s.
func TestEntranceVelocity(t *testing.T) {
	w := imperial()
	hole(w, 0, ft(40), in(12))
	str(w, "main", ft(-1), ft(30), ft(40), pipe(in(6.625), in(6.065)))
	for i := range w.Strings[0].Sections {
		if w.Strings[0].Sections[i].Kind == schema.ScreenSection {
			w.Strings[0].Sections[i].OpenArea = 0.10
		}
	}
	if _, ok := Entrance(w); ok {
		t.Error("no pumping test, yet a flow")
	}
	w.PumpingTest = &schema.PumpingTest{Rate: schema.FlowFrom(50, w.Units)}
	f, ok := Entrance(w)
	if !ok {
		t.Fatal("no flow")
	}
	ft2 := schema.MetresPerFoot * schema.MetresPerFoot
	near(t, "open ft2", f.OpenArea/ft2, 1.7345, 1e-4)
	near(t, "capacity gal/min", f.Capacity/schema.CubicMetresPerSecondPerGPM, 38.92, 1e-3)
	near(t, "velocity ft/s", f.Velocity/schema.MetresPerFoot, 0.1285, 1e-3)
	if f.Design {
		t.Error("tested rate taken as the design rate")
	}
}
