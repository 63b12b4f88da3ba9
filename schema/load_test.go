package schema

import (
	"errors"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"regexp"
	"sort"
	"strconv"
	"strings"
	"testing"
)

// Each file in testdata/bad states the first error it must produce on its
// first line: "# expect: LINE:COL message" (COL may be empty).
func TestBadFilesNameTheirLine(t *testing.T) {
	files, err := filepath.Glob("../testdata/bad/*.toml")
	if err != nil || len(files) == 0 {
		t.Fatalf("no bad fixtures: %v", err)
	}
	re := regexp.MustCompile(`^# expect: (\d+):(\d*) (.+)$`)
	for _, f := range files {
		t.Run(filepath.Base(f), func(t *testing.T) {
			data, err := os.ReadFile(f)
			if err != nil {
				t.Fatal(err)
			}
			first := strings.SplitN(string(data), "\n", 2)[0]
			m := re.FindStringSubmatch(first)
			if m == nil {
				t.Fatalf("fixture lacks an expect line: %q", first)
			}
			_, err = LoadFile(f)
			var list ErrorList
			if !errors.As(err, &list) || len(list) == 0 {
				t.Fatalf("want an ErrorList, got %v", err)
			}
			for _, e := range list {
				wantLine, _ := strconv.Atoi(m[1])
				if e.Line != wantLine || !strings.Contains(e.Msg, m[3]) {
					continue
				}
				if m[2] != "" {
					wantCol, _ := strconv.Atoi(m[2])
					if e.Col != wantCol {
						t.Errorf("column: got %d want %d (%s)", e.Col, wantCol, e)
					}
				}
				if e.File != f {
					t.Errorf("file: got %q want %q", e.File, f)
				}
				return
			}
			t.Errorf("no error at line %s containing %q; got:\n%v", m[1], m[3], err)
		})
	}
}

func near(a, b, tol float64) bool { return math.Abs(a-b) <= tol }

// ASTM D1785 (PVC Schedule 40 and 80), its table of dimensions in
// millimetres: outside diameter min-max and minimum wall for Sch 40 and
// Sch 80, NPS 1/2 to 8, as published (the metric values of the inch
// table, to 0.01 mm). The table's inch values must give them back.
var d1785mm = []struct {
	size                   string
	odMin, odMax, w40, w80 float64
}{
	{"1/2", 21.24, 21.44, 2.77, 3.73}, {"3/4", 26.57, 26.77, 2.87, 3.91}, {"1", 33.27, 33.53, 3.38, 4.55},
	{"1-1/4", 42.03, 42.29, 3.56, 4.85}, {"1-1/2", 48.11, 48.41, 3.68, 5.08}, {"2", 60.17, 60.47, 3.91, 5.54},
	{"2-1/2", 72.84, 73.20, 5.16, 7.01}, {"3", 88.70, 89.10, 5.49, 7.62}, {"4", 114.07, 114.53, 6.02, 8.56},
	{"5", 141.05, 141.55, 6.55, 9.52}, {"6", 168.00, 168.56, 7.11, 10.97}, {"8", 218.70, 219.46, 8.18, 12.70},
}

func TestPipeDimensions(t *testing.T) {
	for _, c := range d1785mm {
		for _, sc := range []struct {
			sched string
			wall  float64
		}{{"40", c.w40}, {"80", c.w80}} {
			p := Pipe{Material: "PVC", Size: c.size, Schedule: sc.sched}
			if err := resolvePipe(&p, 0, 0, false, false, Inches); err != nil {
				t.Fatal(err)
			}
			// The average OD is the middle of the published range; the
			// wall rounds to the published 0.01 mm.
			if mid := (c.odMin + c.odMax) / 2; !near(float64(p.OD), mid, 0.011) {
				t.Errorf("NPS %s: OD %.3f mm, ASTM D1785 %.2f-%.2f mm", c.size, float64(p.OD), c.odMin, c.odMax)
			}
			if !near(float64(p.Wall()), sc.wall, 0.0051) {
				t.Errorf("NPS %s Sch %s: wall %.3f mm, ASTM D1785 %.2f mm", c.size, sc.sched, float64(p.Wall()), sc.wall)
			}
		}
	}
	// NPS 10 and 12 (ASTM D1785 dimensions as tabulated in the PVC pipe data
	// of sd-w.com/channel_flow/pipe_data: OD 10.750 and 12.750 in; Sch 40
	// minimum walls 0.365 and 0.406 in; Sch 80 0.593 and 0.687 in).
	// ASME B36.10M Table 1 gives steel Sch 80 walls of 0.594 and 0.688 in
	// (and the same Sch 40 walls): steel pipe takes those.
	for _, c := range []struct {
		material, size, sched string
		od, wall              float64
	}{
		{"PVC", "10", "40", 10.750, 0.365}, {"PVC", "12", "40", 12.750, 0.406},
		{"PVC", "10", "80", 10.750, 0.593}, {"PVC", "12", "80", 12.750, 0.687},
		{"carbon steel", "10", "40", 10.750, 0.365}, {"carbon steel", "12", "40", 12.750, 0.406},
		{"carbon steel", "10", "80", 10.750, 0.594}, {"carbon steel", "12", "80", 12.750, 0.688},
		{"304 stainless steel", "12", "80", 12.750, 0.688},
		// ASME B36.10M Table 1: NPS 2, 4, 6, 8 steel Sch 40/80 (same as PVC).
		{"carbon steel", "2", "40", 2.375, 0.154}, {"carbon steel", "4", "80", 4.500, 0.337},
		{"carbon steel", "6", "40", 6.625, 0.280}, {"carbon steel", "8", "80", 8.625, 0.500},
	} {
		p := Pipe{Material: c.material, Size: c.size, Schedule: c.sched}
		if err := resolvePipe(&p, 0, 0, false, false, Inches); err != nil {
			t.Fatal(err)
		}
		if !near(p.OD.Inches(), c.od, 1e-9) || !near(p.Wall().Inches(), c.wall, 1e-9) {
			t.Errorf("%s NPS %s Sch %s: OD %.4f wall %.4f in, want %.3f and %.3f", c.material, c.size, c.sched, p.OD.Inches(), p.Wall().Inches(), c.od, c.wall)
		}
	}
	// SDR 21, 4-in (OD 4.500 in): ASTM D2241's table gives a minimum wall of
	// 0.214 in (4.500 / 21 = 0.2143).
	p := Pipe{Size: "4", SDR: 21}
	if err := resolvePipe(&p, 0, 0, false, false, Inches); err != nil {
		t.Fatal(err)
	}
	if !near(p.Wall().Inches(), 0.214, 0.0005) {
		t.Errorf("SDR 21 wall %.4f in, ASTM D2241 0.214", p.Wall().Inches())
	}
	// ISO 6708 pairs DN50 with NPS 2 (common practice).
	if s, err := NominalSize("DN50"); err != nil || s != "2" {
		t.Errorf("DN50 -> %q %v", s, err)
	}
}

func TestSlotNumbers(t *testing.T) {
	// common practice: slot number = slot width in thousandths of an inch;
	// 10-slot = 0.010 in = 0.254 mm, 20-slot = 0.020 in = 0.508 mm.
	src := `[units]
depth = "ft"
[well]
id = "S"
purpose = "monitoring"
total_depth = 30
[[borehole]]
top = 0
bottom = 30
diameter = 8.25
[[string]]
[[string.section]]
kind = "riser"
top = -2
bottom = 10
size = "2"
schedule = "40"
[[string.section]]
kind = "screen"
top = 10
bottom = 20
slot_number = 10
[[string.section]]
kind = "screen"
top = 20
bottom = 30
slot_number = 20
`
	w, err := Load("slots.toml", []byte(src))
	if err != nil {
		t.Fatal(err)
	}
	scr := w.Screens()
	if len(scr) != 2 {
		t.Fatalf("screens: %d", len(scr))
	}
	if !near(float64(scr[0].Section.Slot), 0.254, 1e-12) || !near(float64(scr[1].Section.Slot), 0.508, 1e-12) {
		t.Errorf("slots %v %v mm", scr[0].Section.Slot, scr[1].Section.Slot)
	}
	if !near(scr[1].Section.SlotNumber(), 20, 1e-9) {
		t.Errorf("slot number %v", scr[1].Section.SlotNumber())
	}
	// The screen inherits the riser's pipe when it gives none.
	if !near(scr[0].Section.Pipe.OD.Inches(), 2.375, 1e-12) {
		t.Errorf("inherited OD %v", scr[0].Section.Pipe.OD.Inches())
	}
}

func TestExactConversions(t *testing.T) {
	// NIST SP 811 appendix B: 1 ft = 0.3048 m, 1 in = 25.4 mm exactly.
	if LengthFrom(1, Feet) != 0.3048 || DiameterFrom(1, Inches) != 25.4 {
		t.Fatal("ft or in factor")
	}
	// NIST Handbook 44 appendix C: 1 US gal = 231 in^3 = 3.785411784 L.
	in3 := math.Pow(0.0254, 3)
	if !near(float64(VolumeFrom(1, USGallons)), 231*in3, 1e-15) {
		t.Errorf("gal = %v m3, want %v", float64(VolumeFrom(1, USGallons)), 231*in3)
	}
	// NIST Handbook 44 appendix C: 1 ft^3 = 7.48052 US gal.
	if !near(VolumeFrom(1, CubicFeet).In(USGallons), 7.48052, 5e-6) {
		t.Errorf("ft3 = %v gal", VolumeFrom(1, CubicFeet).In(USGallons))
	}
	// Round trip in the file's units is exact to a few ulps.
	if v := LengthFrom(25, Feet).In(Feet); !near(v, 25, 1e-12) {
		t.Errorf("25 ft round trip %v", v)
	}
}

// ASTM E11 Table 1: the nominal openings of the numbered sieves, No. 4
// (4.75 mm) to No. 635 (20 µm).
var e11 = map[int]float64{
	4: 4.75, 5: 4.00, 6: 3.35, 7: 2.80, 8: 2.36, 10: 2.00, 12: 1.70, 14: 1.40, 16: 1.18, 18: 1.00,
	20: 0.850, 25: 0.710, 30: 0.600, 35: 0.500, 40: 0.425, 45: 0.355, 50: 0.300, 60: 0.250, 70: 0.212,
	80: 0.180, 100: 0.150, 120: 0.125, 140: 0.106, 170: 0.090, 200: 0.075, 230: 0.063, 270: 0.053,
	325: 0.045, 400: 0.038, 450: 0.032, 500: 0.025, 635: 0.020,
}

func TestGradation(t *testing.T) {
	if len(sieveOpening) != len(e11) {
		t.Errorf("the table holds %d sieves, ASTM E11 numbers %d", len(sieveOpening), len(e11))
	}
	numbers := make([]int, 0, len(e11))
	for n, mm := range e11 {
		numbers = append(numbers, n)
		if got, ok := SieveOpening(n); !ok || float64(got) != mm {
			t.Errorf("No. %d: %v mm, ASTM E11 %v mm", n, got, mm)
		}
	}
	// ISO 565 R 40/3 (which E11's openings follow down to No. 450, 32 µm):
	// each opening is about 2^(1/4) = 1.189 times the next finer; rounded
	// openings stay within 3 %. No. 500 (25 µm) and No. 635 (20 µm) are
	// R 10 sizes added below the series.
	sort.Ints(numbers)
	for i := 1; i < len(numbers) && numbers[i] <= 450; i++ {
		r := e11[numbers[i-1]] / e11[numbers[i]]
		if math.Abs(r/math.Pow(2, 0.25)-1) > 0.03 {
			t.Errorf("No. %d / No. %d: ratio %.4f, not 2^(1/4)", numbers[i-1], numbers[i], r)
		}
	}
	lo, hi, err := ParseGradation("20/40")
	if err != nil || lo != 0.425 || hi != 0.850 {
		t.Errorf("20/40 -> %v %v %v", lo, hi, err)
	}
	if lo, hi, err := ParseGradation("#8x#16"); err != nil || lo != 1.18 || hi != 2.36 {
		t.Errorf("8x16 -> %v %v %v", lo, hi, err)
	}
	if _, _, err := ParseGradation("coarse"); err == nil {
		t.Error("want an error for a non-range")
	}
	if _, _, err := ParseGradation("20/33"); err == nil {
		t.Error("No. 33 is no E11 sieve")
	}
}

// ASTM D2487-17 Note 1 and its classification charts: the 15 group
// symbols; dual symbols only for 5 to 12 % fines (GW-GM, GW-GC, GP-GM,
// GP-GC, SW-SM, SW-SC, SP-SM, SP-SC), fines in the hatched CL-ML band
// (GC-GM, SC-SM) and CL-ML; borderline symbols with a slash (Note 1's
// examples: CL/CH, GM/SM, SC/CL, and CH/CL).
func TestUSCS(t *testing.T) {
	for _, s := range []string{
		"GW", "GP", "GM", "GC", "SW", "SP", "SM", "SC", "ML", "CL", "OL", "MH", "CH", "OH", "PT",
		"GW-GM", "GW-GC", "GP-GM", "GP-GC", "SW-SM", "SW-SC", "SP-SM", "SP-SC", "GC-GM", "SC-SM", "CL-ML",
		"CL/CH", "CH/CL", "GM/SM", "SC/CL",
	} {
		if !ValidUSCS(s) {
			t.Errorf("%s rejected: %s", s, USCSProblem(s))
		}
	}
	// Pairs D2487 never assigns as dual symbols, and malformed symbols.
	for _, s := range []string{
		"PT-GW", "ML-CL", "CH-SP", "SM-SP", "GM-GW", "SM-SC", "GM-GC", "CH-MH", "ML-MH", "OL-OH", "CL-CH", "GW-SW", "SP-SW", "CL-SC",
		"SX", "SP-SP", "SP-SM-ML", "", "sand", "CL/CL", "CL/CH/MH", "PT/OH", "CL/XY", "SP-SM-",
	} {
		if ValidUSCS(s) {
			t.Errorf("%q accepted", s)
		}
	}
	if msg := USCSProblem("ML-CL"); !strings.Contains(msg, "did you mean CL-ML") || !strings.Contains(msg, "ML/CL") {
		t.Errorf("ML-CL: %q, want a suggestion of CL-ML or ML/CL", msg)
	}
	if msg := USCSProblem("CH-SP"); !strings.Contains(msg, "CH/SP") {
		t.Errorf("CH-SP: %q, want the borderline form suggested", msg)
	}
	// The primary symbol decides fine-grained: CL-ML and CL/CH are fine,
	// SC/CL and SP-SM coarse (D2487: the first symbol is the classification).
	for s, fine := range map[string]bool{"CL-ML": true, "CL/CH": true, "SC/CL": false, "SP-SM": false, "PT": true} {
		if got := (Layer{USCS: s}).FineGrained(); got != fine {
			t.Errorf("%s fine-grained = %v", s, got)
		}
	}
}

// Weathering grades after ISRM (1981) and BS 5930:1999: I fresh, II
// slightly, III moderately (less than half of the rock decomposed to
// soil), IV highly (more than half), V completely (all, structure
// intact), VI residual soil. Grades IV to VI, saprolite, residual soil
// and made ground behave as soil.
func TestRockAndWeathering(t *testing.T) {
	for _, c := range []struct {
		rock, grade string
		soil        bool
	}{
		{"granite", "", false},
		{"granite", "fresh", false},
		{"granite", "II", false},
		{"granite", "moderately-weathered", false},
		{"granite", "IV", true},
		{"granite", "highly weathered", true},
		{"gneiss", "completely-weathered", true},
		{"schist", "VI", true},
		{"weathered granite", "", true},
		{"slightly weathered granite", "", false},
		{"saprolite", "", true},
		{"residual soil", "", true},
		{"fill", "", true},
		{"Sandstone", "", false},
	} {
		l := Layer{Rock: c.rock}
		if c.grade != "" {
			g, ok := ParseWeathering(c.grade)
			if !ok {
				t.Fatalf("grade %q not read", c.grade)
			}
			l.Weathering = g
		}
		if got := l.Unconsolidated(); got != c.soil {
			t.Errorf("%s (%s): unconsolidated = %v, want %v", c.rock, c.grade, got, c.soil)
		}
	}
	if _, ok := ParseWeathering("crumbly"); ok {
		t.Error("an unknown grade was read")
	}
	for in, want := range map[string]string{"Biotite GNEISS, fractured": "gneiss", "granit": "granite", "sandstne": "sandstone", "limestone, karstic": "limestone", "xyzzy": ""} {
		if got := SuggestRock(in); got != want {
			t.Errorf("SuggestRock(%q) = %q, want %q", in, got, want)
		}
	}
	for _, n := range []string{"granite", "weathered granite", "highly weathered gneiss", "saprolite", "fill"} {
		if _, _, ok := ParseRock(n); !ok {
			t.Errorf("%q not a listed rock", n)
		}
	}
}

func TestMetricWellAndReferences(t *testing.T) {
	w, err := LoadFile("../testdata/good/metric-piezometer.toml")
	if err != nil {
		t.Fatal(err)
	}
	if w.Units.Diameter != Millimetres || w.Units.Mass != Kilograms {
		t.Errorf("units %+v", w.Units)
	}
	// 0.5 mm slot kept in mm.
	if s := w.Screens()[0].Section; s.Slot != 0.5 || s.ScreenType != ContinuousWrap {
		t.Errorf("screen %+v", s)
	}
	// A level from the measuring point converts with MP - ground = 0.90 m.
	if d := float64(w.WaterLevels[0].Depth); !near(d, 4.35-0.90, 1e-9) {
		t.Errorf("water level below ground %v", d)
	}
	if !w.WaterLevels[0].Measured.IsZero() && w.WaterLevels[0].HasTime {
		t.Error("a bare date has no time")
	}
	if w.Fills[0].BagMass != 25 || w.Fills[0].Tags[0].Depth != 8.5 {
		t.Errorf("fill %+v", w.Fills[0])
	}
	if got := w.Line("fill[0].tag[0].depth"); got != 44 {
		t.Errorf("tag depth line %d", got)
	}
}

func TestDemoWellsLoad(t *testing.T) {
	files, _ := filepath.Glob("../cmd/tremie/demo/wells/*.toml")
	if len(files) < 6 {
		t.Fatalf("want at least six demo wells, have %d", len(files))
	}
	for _, f := range files {
		if _, err := LoadFile(f); err != nil {
			t.Errorf("%v", err)
		}
	}
}

func TestKeyPositionsNested(t *testing.T) {
	src := "[units]\ndepth = \"ft\"\n[[string]]\nname = \"a\"\n[[string.section]]\ntop = 1\n[[string]]\nname = \"b\"\n[[string.section]]\ntop = 2\n[[string.section]]\ntop = 3\n"
	pos := scanKeyPositions(src)
	want := map[string]int{"string[0].name": 4, "string[0].section[0].top": 6, "string[1].section[0].top": 10, "string[1].section[1].top": 12}
	for k, line := range want {
		if pos[k].line != line {
			t.Errorf("%s: line %d want %d", k, pos[k].line, line)
		}
	}
}

func FuzzLoad(f *testing.F) {
	for _, p := range []string{"../testdata/good/metric-piezometer.toml", "../cmd/tremie/demo/wells/NW-1.toml"} {
		if b, err := os.ReadFile(p); err == nil {
			f.Add(b)
		}
	}
	// Reproducers of issue 15's bad-input campaign, each refused with a
	// position (or loaded) at once.
	head := "[units]\ndepth = \"ft\"\ndiameter = \"in\"\n[well]\nid = \"%s\"\npurpose = \"monitoring\"\ntotal_depth = 10.0\n[[borehole]]\ntop = 0.0\nbottom = 10.0\ndiameter = %s\n"
	well := func(id, dia, extra string) { f.Add([]byte(fmt.Sprintf(head, id, dia) + extra)) }
	well("MW-\U0001F6B0", "8.0", "")                // astral-plane text
	well(`MW-\u001b]0;x\u0007\u001b[2J`, "8.0", "") // terminal escapes
	well("=HYPERLINK(1)", "8.0", "")                // a formula for a spreadsheet
	well("TWO-sheet1", "8.0", "")                   // a name another well's sheets take
	well(strings.Repeat("W", 10000), "8.0", "")     // text past MaxText
	well("HUGE", "1e6", "")                         // a hole a mile wide
	well("X", "8.0", "[[lithology]]\ntop = 0.0\nbottom = 10.0\nuscs = \"SM\"\nextra.thing = 1\n")
	for _, deep := range []int{10000, 100000} {
		well("X", "8.0", "x = "+strings.Repeat("{a=", deep)+"1"+strings.Repeat("}", deep)+"\n")
		well("X", "8.0", "x = "+strings.Repeat("[", deep)+"1"+strings.Repeat("]", deep)+"\n")
	}
	var many strings.Builder
	for i := 0; i < 10000; i++ {
		many.WriteString("[[water_level]]\ndepth = 5.0\n")
	}
	well("LEVELS", "8.0", many.String())
	many.Reset()
	for fill := 0; fill < 3; fill++ { // 2,100 tags over three fills
		fmt.Fprintf(&many, "[[fill]]\ntop = %d.0\nbottom = %d.0\nmaterial = \"filter-pack\"\n", fill, fill+1)
		for i := 0; i < 700; i++ {
			many.WriteString("[[fill.tag]]\nafter_bags = 1\ndepth = 1.0\n")
		}
	}
	well("TAGS", "8.0", many.String())
	f.Add([]byte{})                                          // an empty file
	f.Add([]byte("[well]\nid = \"A\"\n"))                    // no [units], no [[borehole]]
	f.Add([]byte("[units]\ndepth = \"ft\"\n[[borehole]]\n")) // no [well]
	f.Fuzz(func(t *testing.T, data []byte) {
		w, err := Load("fuzz.toml", data)
		if err == nil && w == nil {
			t.Fatal("nil well without error")
		}
	})
}

// FORMAT.md lists exactly the rock names the loader knows.
func TestRockNamesDocumented(t *testing.T) {
	doc, err := os.ReadFile("FORMAT.md")
	if err != nil {
		t.Fatal(err)
	}
	listed := map[string]bool{}
	for _, line := range strings.Split(string(doc), "\n") {
		cells := strings.Split(line, "|")
		if len(cells) != 4 || strings.HasPrefix(line, "| kind") {
			continue
		}
		for _, n := range strings.Split(cells[2], ",") {
			listed[strings.TrimSpace(n)] = true
		}
	}
	for n := range RockNames {
		if !listed[n] {
			t.Errorf("rock name %q is not in FORMAT.md's table", n)
		}
	}
}

// A key names its line and column, and a dotted key the tables it opens at
// its own line, each at its own segment, not at the enclosing header; an
// array table names its last segment (where a misspelt name is).
func TestKeyPositionsOfNames(t *testing.T) {
	src := "[[borehole]]\ntop = 0\n\n  extra . \"a\".c = 1\n[[ string . sectoin ]]\n"
	pos := scanKeyPositions(src)
	want := map[string]keyPos{
		"borehole[0]":           {line: 1, col: 1, keyCol: 3},
		"borehole[0].extra":     {line: 4, col: 3, keyCol: 3, implicit: true},
		"borehole[0].extra.a":   {line: 4, col: 11, keyCol: 11, implicit: true},
		"borehole[0].extra.a.c": {line: 4, col: 19, keyCol: 15},
		"string.sectoin[0]":     {line: 5, col: 1, keyCol: 13},
	}
	for k, w := range want {
		if got, ok := pos[k]; !ok || got != w {
			t.Errorf("%s: got %+v (found %v), want %+v", k, got, ok, w)
		}
	}
}

// A water level names the string it was measured in: a name the file
// does not give a string, the empty name too, is an error at the key; a
// wrong type is reported once, as a type error. Measured from the
// measuring point with no surveyed elevations, a named string's level is
// read from that string's riser top: 12.5 ft below NW-9D's top, 2.5 ft
// above ground, is 10 ft below ground (NW-9S's top is 0.5 ft up).
func TestWaterLevelString(t *testing.T) {
	base := "[units]\ndepth = \"ft\"\n[well]\nid = \"NW-9\"\npurpose = \"monitoring\"\ntotal_depth = 60.0\n" +
		"[[borehole]]\ntop = 0.0\nbottom = 60.0\ndiameter = 10.0\n" +
		"[[string]]\nname = \"NW-9S\"\n[[string.section]]\nkind = \"riser\"\ntop = -0.5\nbottom = 20.0\nsize = \"1\"\nschedule = \"40\"\n" +
		"[[string]]\nname = \"NW-9D\"\n[[string.section]]\nkind = \"riser\"\ntop = -2.5\nbottom = 45.0\nsize = \"1\"\nschedule = \"40\"\n"
	for level, want := range map[string]string{
		"string = \"NW-9X\"\ndepth = 3.0": `28:10: string = "NW-9X" names no [[string]] (the well's strings: "NW-9S", "NW-9D")`,
		"string = \"\"\ndepth = 3.0":      `28:10: string = "" names no [[string]]`,
		"string = 9\ndepth = 3.0":         `28:10: string must be a string, not an integer`,
	} {
		_, err := Load("w.toml", []byte(base+"[[water_level]]\n"+level+"\n"))
		if err == nil || !strings.Contains(err.Error(), want) || strings.Count(err.Error(), "w.toml:") != 1 {
			t.Errorf("%q: got %v, want one error %s", level, err, want)
		}
	}
	w, err := Load("w.toml", []byte(base+"[[water_level]]\nstring = \"NW-9D\"\nreference = \"measuring-point\"\ndepth = 12.5\n"))
	if err != nil {
		t.Fatal(err)
	}
	if got := w.WaterLevels[0].Depth.In(Feet); math.Abs(got-10) > 1e-9 || w.WaterLevels[0].String != "NW-9D" {
		t.Errorf("level %v ft in %q, want 10 ft in NW-9D", got, w.WaterLevels[0].String)
	}
}
