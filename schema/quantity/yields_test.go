package quantity

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// Every default says where it comes from, and the two the issue quotes
// keep their figures: 50-lb bag of filter sand about 0.5 ft3; 94-lb sack
// of Portland cement with 5.2 US gal water about 1.18 ft3 (common
// practice).
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
	sand, _ := y.Get(schema.FilterPack)
	near(t, "sand ft3", sand.Volume.In(schema.CubicFeet), 0.5, 1e-12)
	near(t, "sand bag lb", sand.BagMass.In(schema.Pounds), 50, 1e-12)
	cement, _ := y.Get(schema.NeatCement)
	near(t, "cement ft3", cement.Volume.In(schema.CubicFeet), 1.18, 1e-12)
	near(t, "cement sack lb", cement.BagMass.In(schema.Pounds), 94, 1e-12)
}

// The slurry yields agree with the absolute-volume sum a mix sheet uses:
// solids at their specific gravity (Portland cement 3.15, bentonite 2.6:
// from memory) in water at 62.4 lb/ft3, plus the mix water at 7.48052
// gal/ft3 (NIST Handbook 44).
func TestSlurryYieldsAbsoluteVolume(t *testing.T) {
	y := DefaultYields()
	abs := func(solids ...float64) float64 { // pairs of lb, SG; then gal water last
		v := solids[len(solids)-1] / 7.48052
		for i := 0; i+1 < len(solids)-1; i += 2 {
			v += solids[i] / (solids[i+1] * 62.4)
		}
		return v
	}
	for _, c := range []struct {
		m    schema.Material
		want float64
	}{
		{schema.NeatCement, abs(94, 3.15, 5.2)},
		{schema.CementBentonite, abs(94, 3.15, 4.7, 2.6, 8.5)},
		{schema.BentoniteGrout, abs(50, 2.6, 24)},
	} {
		v, _ := y.Get(c.m)
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
		p + `:4:1: unknown key "filter-pak" in [yields] (did you mean "filter-pack"?)`,
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
