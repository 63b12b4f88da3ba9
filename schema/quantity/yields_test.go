package quantity

import (
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// plugGuide is Table 1, "Plugging Materials Calculation Guide", of the
// public handout "Calculate the Volume of a Well" (studylib.net doc
// 8382949): the linear feet of hole one 94-lb sack of Portland cement
// with 7 US gal water fills, and one 50-lb sack of 3/8- to 3/4-in
// bentonite chips, by hole diameter in inches.
var plugGuide = []struct{ dia, cementFt, chipsFt float64 }{
	{6, 7.2, 3.5}, {8, 4, 2}, {12, 1.8, 0.86},
}

// Every default says where it comes from and lies within published
// figures:
//   - filter sand, 50-lb bag: about 0.5 ft3 (gaeatech.com, "filter pack
//     and grout for monitoring wells": standard 50-lb bags of silica sand
//     have a volume of ~0.5 ft3); Kuo, Practical Design Calculations for
//     Groundwater and Soil Remediation, ex. 2.21, takes sand at 112
//     lb/ft3, 0.446 ft3 per bag: the default lies between;
//   - bentonite chips, 50-lb sack: the plugging guide's rows give 0.687
//     (6-in, 3.5 ft), 0.698 (8-in, 2 ft) and 0.675 ft3 (12-in, 0.86 ft);
//   - granular bentonite: 28 ft3 per short ton (naturalwaterscapes.com,
//     "using bentonite to seal around an outlet pipe"): 0.700 ft3 per 50 lb;
//   - neat cement, 94-lb sack with 5.2 gal: the absolute-volume sum is
//     1.173 ft3 (checked below); Concrete Construction's weighed batch (117
//     lb/ft3) came out 1.3 % above its sum (1.16 against 1.145 ft3), which
//     puts the sack at 1.173 to 1.188 ft3 (the cementing tables' 1.18;
//     a drilling handbook's worked sack with 5.18 gal is 1.171 ft3,
//     TestGroutDensity).
func TestDefaultYields(t *testing.T) {
	y := DefaultYields()
	for _, m := range schema.Materials {
		v, ok := y.Get(m)
		if m.Group() == schema.BackfillGroup {
			if ok {
				t.Errorf("%s has a yield; it is not bagged", m)
			}
			continue
		}
		if !ok || v.Volume <= 0 {
			t.Errorf("%s: no yield", m)
			continue
		}
		if v.Basis != CommonPractice && v.Basis != FromMemory {
			t.Errorf("%s: basis %q, want common practice or from memory", m, v.Basis)
		}
		if v.Note == "" || v.BagMass <= 0 {
			t.Errorf("%s: no note or no reference bag", m)
		}
	}
	within := func(m schema.Material, lo, hi, bagLb float64) {
		t.Helper()
		v, _ := y.Get(m)
		if got := v.Volume.In(schema.CubicFeet); got < lo-1e-9 || got > hi+1e-9 {
			t.Errorf("%s: %.4f ft3, published %.3f to %.3f", m, got, lo, hi)
		}
		near(t, string(m)+" bag lb", v.BagMass.In(schema.Pounds), bagLb, 1e-9)
	}
	within(schema.FilterPack, 50.0/112, 0.5, 50)
	var chipsLo, chipsHi = math.Inf(1), math.Inf(-1)
	for _, r := range plugGuide {
		v := math.Pi / 4 * (r.dia / 12) * (r.dia / 12) * r.chipsFt
		chipsLo, chipsHi = math.Min(chipsLo, v), math.Max(chipsHi, v)
	}
	within(schema.BentoniteChips, chipsLo, chipsHi, 50)
	within(schema.BentoniteGranular, 0.700, 0.700, 50)
	within(schema.NeatCement, 1.173, 1.173*1.16/1.145, 94)
}

// The slurry yields are absolute-volume sums: each solid's mass over its
// specific gravity times water's 62.4 lb/ft3, plus the water at 7.48052
// gal/ft3 (NIST Handbook 44). The method is checked against two worked
// figures from outside:
//   - Concrete Construction, "Volume of grout": 94 lb of cement (SG 3.15)
//     is 0.478 ft3, 5 gal of water 0.667 ft3, the grout 1.145 ft3;
//   - the plugging guide above: a 94-lb sack with 7 gal water fills 7.2 ft
//     of 6-in hole and 1.8 ft of 12-in hole (1.414 ft3).
//
// The default sand-cement grout, worked the same way: one 94-lb sack of
// cement, 188 lb of silica sand (2 parts to 1 by weight, SG 2.65) and 7
// gal water:
//
//	cement  94 / (3.15 x 62.4) = 0.4782 ft3
//	sand   188 / (2.65 x 62.4) = 1.1369 ft3
//	water    7 / 7.48052       = 0.9358 ft3
//	                             2.5509 ft3 per sack
//
// so the demo's 0-60 ft conductor annulus of PW-1 (90.32 ft3) takes 36
// sacks, where the cement-bentonite yield it was filed under (1.64) gave 56.
func TestSlurryYieldsAbsoluteVolume(t *testing.T) {
	near(t, "Concrete Construction 94 lb + 5 gal", SandCementYield(94, 0, 5), 1.145, 2e-3)
	for _, r := range plugGuide[:1] {
		ft := SandCementYield(94, 0, 7) / (math.Pi / 4 * (r.dia / 12) * (r.dia / 12))
		near(t, "plugging guide 6-in ft per sack", ft, r.cementFt, 0.01)
	}
	near(t, "plugging guide 12-in ft per sack", SandCementYield(94, 0, 7)/(math.Pi/4), 1.8, 0.01)
	sc, _ := DefaultYields().Get(schema.SandCement)
	near(t, "sand-cement ft3", sc.Volume.In(schema.CubicFeet), 2.5509, 1e-4)
	if n := bagsUp(90.32 / sc.Volume.In(schema.CubicFeet)); n != 36 {
		t.Errorf("PW-1 conductor annulus: %d sacks of sand-cement, want 36", n)
	}
	// the other slurries, by the same sums, within their rounding
	for _, c := range []struct {
		m    schema.Material
		want float64
	}{
		{schema.NeatCement, 0.4782 + 5.2/7.48052},                       // 1.173, 1.18 in the tables
		{schema.CementBentonite, 0.4782 + 4.7/(2.6*62.4) + 8.5/7.48052}, // 1.643
		{schema.BentoniteGrout, 50/(2.6*62.4) + 24/7.48052},             // 3.516
	} {
		v, _ := DefaultYields().Get(c.m)
		near(t, string(c.m)+" ft3", v.Volume.In(schema.CubicFeet), c.want, 0.01)
	}
}

// A 25-kg bag yields in proportion to its mass against the 50-lb
// (22.680 kg) reference: 0.5 x 25 / 22.680 = 0.5512 ft3.
func TestBagMassScaling(t *testing.T) {
	y := DefaultYields()
	f := fill(0, 1, schema.FilterPack)
	f.Bags, f.BagMass = 4, 25
	v, ok := y.For(f)
	if !ok {
		t.Fatal("no yield")
	}
	near(t, "25-kg bag ft3", v.Volume.In(schema.CubicFeet), 0.5512, 1e-4)
	near(t, "25-kg bag kept", float64(v.BagMass), 25, 0)
	// the fill's own yield wins and is not scaled
	f.Yield = schema.VolumeFrom(0.4, schema.CubicFeet)
	v, _ = y.For(f)
	if v.Basis != FillBasis || v.Volume != f.Yield {
		t.Errorf("fill yield: %+v", v)
	}
}

func TestParseYields(t *testing.T) {
	src := `# project file
[project]
name = "x"

[yields]
volume = "L"
mass = "kg"

[yields.filter-pack]
yield = 15
bag_mass = 25
note = "supplier sheet"

[yields.neat-cement]
yield = 33.4
`
	y, err := ParseYields("project.toml", []byte(src))
	if err != nil {
		t.Fatal(err)
	}
	sand, _ := y.Get(schema.FilterPack)
	near(t, "sand L", sand.Volume.In(schema.Litres), 15, 1e-12)
	near(t, "sand kg", float64(sand.BagMass), 25, 0)
	if sand.Basis != ProjectBasis || sand.Note != "supplier sheet" {
		t.Errorf("sand entry %+v", sand)
	}
	cement, _ := y.Get(schema.NeatCement)
	if cement.BagMass != 0 {
		t.Errorf("cement without bag_mass has reference bag %v", cement.BagMass)
	}
	chips, _ := y.Get(schema.BentoniteChips)
	if chips.Basis != FromMemory {
		t.Errorf("chips not kept from defaults: %+v", chips)
	}
	// a document without the table gives the defaults
	d, err := ParseYields("p.toml", []byte("[project]\nname = \"x\"\n"))
	if err != nil {
		t.Fatal(err)
	}
	if s, _ := d.Get(schema.FilterPack); s.Basis != CommonPractice {
		t.Errorf("defaults not given: %+v", s)
	}
}

func TestParseYieldsErrors(t *testing.T) {
	for _, c := range []struct {
		src  string
		line int
		msg  string
	}{
		{"[yields]\n[yields.gravel]\nyield = 1\n", 2, `unknown key "gravel" in [yields]`},
		{"[yields]\n\n[yields.filter-pack]\nyeild = 1\n", 4, "unknown key"},
		{"[yields]\n[yields.filter-pack]\nyield = -1\n", 3, "positive"},
		{"[yields]\nvolume = \"cups\"\n", 2, "volume unit"},
		{"[yields]\nfilter-pack = { bag_mass = 50 }\n", 2, "no yield"},
		{"[yields]\nfilter-pack = { yield = \"a lot\" }\n", 2, "positive"},
		{"[yields.filter-pack]\nyield = nan\n", 2, "positive"},
		{"[yields.filter-pack]\nyield = 0.5\nbag_mass = inf\n", 3, "positive"},
		{"[yields]\nvolume = = 1\n", 2, ""},
	} {
		_, err := ParseYields("y.toml", []byte(c.src))
		found := false
		for _, e := range schema.Errors("", err) {
			found = found || (e.Line == c.line && strings.Contains(e.Msg, c.msg) && e.File == "y.toml")
		}
		if !found {
			t.Errorf("%q: %v, want line %d with %q", c.src, err, c.line, c.msg)
		}
	}
}

// A yields file with three mistakes reports all three, sorted, each with
// file:line:col; a slip of the keyboard gets "did you mean".
func TestLoadYieldsReportsEveryError(t *testing.T) {
	p := filepath.Join(t.TempDir(), "site.yields.toml")
	src := "[yields]\nvolume = \"cuft\"\n\n[yields.filter-pak]\nyield = 0.5\n\n[yields.neat-cement]\nyield = 0.9\nbagmass = 94\n"
	if err := os.WriteFile(p, []byte(src), 0o644); err != nil {
		t.Fatal(err)
	}
	_, err := LoadYields(p)
	list := schema.Errors("", err)
	want := []string{
		p + `:2:10: yields volume unit must be one of ft3, gal, L, m3, not "cuft"`,
		p + `:4:9: unknown key "filter-pak" in [yields] (did you mean "filter-pack"?)`,
		p + `:9:1: unknown key "bagmass" in [yields.neat-cement] (did you mean "bag_mass"?)`,
	}
	if len(list) != len(want) {
		t.Fatalf("%d errors, want %d:\n%v", len(list), len(want), err)
	}
	for i, e := range list {
		if e.Error() != want[i] {
			t.Errorf("error %d:\n got %s\nwant %s", i, e, want[i])
		}
	}
}

func TestLoadYields(t *testing.T) {
	dir := t.TempDir()
	p := filepath.Join(dir, "yields.toml")
	if err := os.WriteFile(p, []byte("[yields.bentonite-chips]\nyield = 0.7\nbag_mass = 50\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	y, err := LoadYields(p)
	if err != nil {
		t.Fatal(err)
	}
	c, _ := y.Get(schema.BentoniteChips)
	near(t, "chips ft3", c.Volume.In(schema.CubicFeet), 0.7, 1e-12)
	empty := filepath.Join(dir, "empty.toml")
	os.WriteFile(empty, []byte("a = 1\n"), 0o644)
	if _, err := LoadYields(empty); err == nil || !strings.Contains(err.Error(), "no [yields]") {
		t.Errorf("file without a table: %v", err)
	}
	if _, err := LoadYields(filepath.Join(dir, "missing.toml")); err == nil || !strings.Contains(err.Error(), "missing.toml") {
		t.Errorf("missing file: %v", err)
	}
}

// A yields file in kilograms gives a grout's mix in litres and its density
// in kg/L: 25 kg of cement with 11 L of water in 19 L of slurry is (25 +
// 11 x 0.99955) / 19 = 1.8945 kg/L (water at 62.4 lb/ft3 = 999.55 kg/m3);
// a stated density wins over the mix's.
func TestParseYieldsMix(t *testing.T) {
	y, err := ParseYields("y.toml", []byte("[yields]\nvolume = \"L\"\nmass = \"kg\"\n[yields.neat-cement]\nyield = 19\nbag_mass = 25\nwater = 11\n[yields.sand-cement]\nyield = 40\nbag_mass = 25\nsolids = 75\nwater = 18\ndensity = 1.9\n"))
	if err != nil {
		t.Fatal(err)
	}
	neat, _ := y.Get(schema.NeatCement)
	near(t, "water L", neat.Water.In(schema.Litres), 11, 1e-12)
	near(t, "solids kg", float64(neat.Solids), 25, 1e-12)
	d, ok := neat.Density()
	if !ok {
		t.Fatal("no density")
	}
	near(t, "neat kg/m3", d, 1894.5, 1e-4)
	sc, _ := y.Get(schema.SandCement)
	if d, _ := sc.Density(); d != 1900 || float64(sc.Solids) != 75 {
		t.Errorf("sand-cement stated density %v, solids %v", d, sc.Solids)
	}
	// a 50-kg bag keeps the stated density and doubles the water
	if s := sc.Scaled(50); s.Stated != 1900 || math.Abs(s.Water.In(schema.Litres)-36) > 1e-9 {
		t.Errorf("scaled: %+v", s)
	}
}
