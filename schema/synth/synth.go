// Package synth writes synthetic well files of realistic size (a few
// borehole sections, one or two strings, five or six fill intervals with
// tags, ten or so lithology layers, several water levels) and projects of
// N of them, for tests and benchmarks. Well i is always the same text; the
// wells are invented and are built to follow common construction practice
// (pack over the screen, a bentonite seal above it, grout to a surface
// seal), so that they check clean unless a test spoils one.
package synth

import (
	"fmt"
	"math"
	"math/rand"
	"os"
	"path/filepath"
	"strings"
)

// ID is the well ID of synthetic well i.
func ID(i int) string { return fmt.Sprintf("SW-%04d", i+1) }

// FileName is the file name of synthetic well i.
func FileName(i int) string { return ID(i) + ".toml" }

var (
	soils = []struct{ uscs, desc string }{
		{"ML", "Sandy SILT, brown, moist, soft"},
		{"SM", "Silty SAND, fine, olive brown, moist, loose"},
		{"SP", "Poorly graded SAND, fine to medium, grey-brown, wet"},
		{"SW", "Well-graded SAND with gravel, brown, wet, medium dense"},
		{"SP-SM", "SAND with silt, medium, grey, wet, medium dense"},
		{"CL", "Lean CLAY, stiff, grey-green, moist, low plasticity"},
		{"GW", "Well-graded GRAVEL with sand, wet, dense, subrounded"},
		{"GP", "Poorly graded GRAVEL, wet, dense, cobbles to 4 in"},
		{"CH", "Fat CLAY, very stiff, dark grey, high plasticity"},
		{"SC", "Clayey SAND, fine, reddish brown, moist, medium dense"},
	}
	aquifers = []struct{ uscs, desc string }{
		{"SP", "Poorly graded SAND, medium, grey, wet, medium dense"},
		{"SW", "Well-graded SAND with gravel, brown, wet, dense"},
		{"GW", "Well-graded GRAVEL with sand, wet, dense"},
		{"SP-SM", "SAND with silt, fine to medium, grey, wet"},
	}
	methods     = []string{"hollow-stem auger", "mud rotary", "sonic", "air rotary"}
	drillers    = []string{"D. Farrow", "K. Ibarra", "T. Nakamura-Boyd", "L. Osei"}
	contractors = []string{"Three Forks Drilling Co.", "Basin Line Drilling", "Kestrel Sonic Services"}
	loggers     = []string{"R. Okafor", "S. Demir", "A. Lindgren", "P. Mbeki"}
)

// Well returns the TOML text of synthetic well i.
func Well(i int) []byte {
	r := rand.New(rand.NewSource(int64(i)*7919 + 17))
	metric := i%4 == 3
	u := unitsOf(metric)
	var b strings.Builder
	p := func(format string, args ...any) { fmt.Fprintf(&b, format+"\n", args...) }

	purpose := "monitoring"
	switch i % 10 {
	case 7:
		purpose = "piezometer"
	case 9:
		purpose = "recovery"
	}
	big := purpose == "recovery"

	// Dimensions in the file's depth unit.
	td := u.round(u.ft(40 + r.Float64()*80))
	screenLen := u.round(u.ft(math.Min(10+5*float64(r.Intn(3)), float64(td)/float64(u.ft(1))-30)))
	sump := u.round(u.ft(2))
	screenBottom := td - sump
	screenTop := screenBottom - screenLen
	packTop := screenTop - u.round(u.ft(2))
	bore := 8.25
	pipe := "2"
	if big {
		bore, pipe = 12.25, "6"
	}
	// Bags from the annular volume: a 50-lb bag of sand fills about
	// 0.5 ft3 and one of bentonite chips about 0.65 ft3 (common practice).
	od := map[string]float64{"2": 2.375, "6": 6.625}[pipe] // ASTM D1785 ODs, in
	ann := u.annulus(bore, od)
	packBags := math.Ceil(float64(td-packTop) * ann / u.ft3(0.5)) // at least the nominal 2 ft above the screen
	tagAfter := func(bags float64) Len { return td - u.round(Len(bags*u.ft3(0.5)/ann)) }
	packTop = tagAfter(packBags) // the pack's top is where the last bag was tagged
	sandTop := packTop - u.round(u.ft(1))
	sealTop := sandTop - u.round(u.ft(3))
	concrete := u.round(u.ft(1.5))
	chipBags := math.Ceil(float64(sandTop-sealTop) * ann / u.ft3(0.65))
	stickUp := r.Intn(2) == 0
	riserTop := u.round(u.ft(-2.5))
	if !stickUp {
		riserTop = u.round(u.ft(0.3))
	}
	ground := u.round(u.ft(380 + r.Float64()*60))
	mp := ground - riserTop
	day := 1 + i%27
	month := 1 + (i/27)%12

	p("# Synthetic well %s (generated test data, invented).", ID(i))
	p("[units]")
	p("depth = %q", u.depth)
	p("diameter = %q", u.diam)
	p("")
	p("[well]")
	p("id = %q", ID(i))
	p("purpose = %q", purpose)
	p("status = \"active\"")
	p("drilled = 2025-%02d-%02d", month, day)
	p("completed = 2025-%02d-%02d", month, day)
	p("total_depth = %s", num(td))
	p("permit = \"SYN-%05d\"", 10000+i)
	p("logged_by = %q", loggers[i%len(loggers)])
	p("notes = [%q, %q]", "Synthetic well for tests and benchmarks.", fmt.Sprintf("Screen set across the water table in unit %d.", 1+r.Intn(4)))
	p("")
	p("[drilling]")
	p("method = %q", methods[i%len(methods)])
	p("contractor = %q", contractors[i%len(contractors)])
	p("licence = \"C57-%06d\"", 400000+i)
	p("driller = %q", drillers[i%len(drillers)])
	p("")
	p("[location]")
	p("description = %q", fmt.Sprintf("Grid node %d, %d %s east of the north fence", i, 5+r.Intn(40), u.depth))
	p("easting = %.2f", 500000+float64(i%100)*37.5+r.Float64())
	p("northing = %.2f", 4100000+float64(i/100)*41.25+r.Float64())
	p("system = \"Synthetic grid, metres\"")
	p("")
	p("[elevation]")
	p("ground = %s", num(ground))
	p("measuring_point = %s", num(mp))
	p("datum = \"NAVD88\"")
	p("surveyed = 2025-%02d-%02d", month, day)
	p("")

	// Recovery wells are reamed wider near the surface.
	if big {
		cbot := u.round(u.ft(20))
		p("[[borehole]]")
		p("top = 0.0\nbottom = %s\ndiameter = %s\nmethod = \"air rotary\"", num(cbot), num(u.in(16)))
		p("")
		p("[[borehole]]")
		p("top = %s\nbottom = %s\ndiameter = %s\nmethod = %q", num(cbot), num(td), num(u.in(bore)), methods[i%len(methods)])
		p("")
	} else {
		p("[[borehole]]")
		p("top = 0.0\nbottom = %s\ndiameter = %s\nmethod = %q", num(td), num(u.in(bore)), methods[i%len(methods)])
		p("")
	}

	p("[[string]]")
	p("name = %q", ID(i))
	p("top_cap = \"locking expansion plug\"")
	p("bottom_cap = \"threaded end plug\"")
	p("centralizers = [%s, %s]", num(u.round(screenTop/2)), num(screenTop-u.round(u.ft(1))))
	p("")
	p("[[string.section]]")
	p("kind = \"riser\"\ntop = %s\nbottom = %s", num(riserTop), num(screenTop))
	p("material = \"PVC\"\nsize = %q\nschedule = \"40\"\njoint = \"flush-threaded\"", pipe)
	p("")
	p("[[string.section]]")
	p("kind = \"screen\"\ntop = %s\nbottom = %s", num(screenTop), num(screenBottom))
	p("material = \"PVC\"\nslot_number = %d\ntype = \"slotted\"", []int{10, 10, 20}[i%3])
	p("")
	p("[[string.section]]")
	p("kind = \"sump\"\ntop = %s\nbottom = %s\nmaterial = \"PVC\"", num(screenBottom), num(td))
	p("")

	p("[[fill]]")
	p("top = %s\nbottom = %s\nmaterial = \"filter-pack\"", num(packTop), num(td))
	p("product = \"silica sand\"\ngradation = %q\nmethod = \"tremie\"", []string{"20/40", "20/40", "10/20"}[i%3])
	p("bags = %s\nbag_mass = %s", num(packBags), num(u.lb(50)))
	p("")
	p("[[fill.tag]]\nafter_bags = %s\ndepth = %s", num(math.Floor(packBags/2)), num(tagAfter(math.Floor(packBags/2))))
	p("")
	p("[[fill.tag]]\nafter_bags = %s\ndepth = %s", num(packBags), num(tagAfter(packBags)))
	p("")
	p("[[fill]]")
	p("top = %s\nbottom = %s\nmaterial = \"fine-sand\"\ngradation = \"30/70\"\nmethod = \"poured\"\nbags = 1\nbag_mass = %s", num(sandTop), num(packTop), num(u.lb(50)))
	p("")
	p("[[fill]]")
	p("top = %s\nbottom = %s\nmaterial = \"bentonite-chips\"\nproduct = \"3/8-in chips, hydrated in lifts\"\nmethod = \"poured\"\nbags = %s\nbag_mass = %s", num(sealTop), num(sandTop), num(chipBags), num(u.lb(50)))
	p("")
	p("[[fill]]")
	p("top = %s\nbottom = %s\nmaterial = \"cement-bentonite\"\nproduct = \"Portland Type I/II with 5 %% bentonite\"\nmethod = \"tremie\"", num(concrete), num(sealTop))
	p("")
	p("[[fill]]")
	p("top = 0.0\nbottom = %s\nmaterial = \"concrete\"\nmethod = \"poured\"", num(concrete))
	p("")

	// Lithology: 8 to 14 layers from ground to total depth.
	n := 8 + r.Intn(7)
	cuts := make([]float64, n-1)
	for k := range cuts {
		cuts[k] = float64(td) * (float64(k+1) + 0.6*(r.Float64()-0.5)) / float64(n)
	}
	prev := 0.0
	for k := 0; k < n; k++ {
		bot := float64(td)
		if k < n-1 {
			bot = float64(u.round(Len(cuts[k])))
		}
		if bot <= prev {
			continue
		}
		s := soils[(i+k*3+r.Intn(2))%len(soils)]
		if Len(bot) > sandTop { // no aquitard across the packed length
			s = aquifers[(i+k)%len(aquifers)]
		}
		p("[[lithology]]")
		p("top = %s\nbottom = %s\nuscs = %q\ndescription = %q", num(Len(prev)), num(Len(bot)), s.uscs, s.desc)
		p("")
		prev = bot
	}

	// Water levels: first encountered, then monthly static readings.
	wl := screenTop + u.round(u.ft(2+r.Float64()*4))
	p("[[water_level]]\ndepth = %s\nkind = \"first-encountered\"\nmeasured = 2025-%02d-%02dT10:40:00", num(wl), month, day)
	p("")
	readings := 3 + r.Intn(5)
	for k := 0; k < readings; k++ {
		m := (month+k)%12 + 1
		y := 2025 + (month+k)/12
		d := wl - riserTop + u.round(u.ft(r.Float64()-0.5))
		p("[[water_level]]\ndepth = %s\nreference = \"measuring-point\"\nkind = \"static\"\nmeasured = %d-%02d-15T08:%02d:00", num(d), y, m, 10+k)
		p("")
	}

	p("[surface]")
	if stickUp {
		p("kind = \"stick-up\"\nlock = \"keyed-alike padlock\"\nbollards = 3")
		p("")
		p("[surface.protective]")
		p("top = %s\nbottom = %s\ndiameter = %s\nmaterial = \"steel\"", num(u.round(u.ft(-3))), num(u.round(u.ft(2))), num(u.in(6)))
	} else {
		p("kind = \"flush-mount\"\nlock = \"keyed-alike padlock on J-plug\"\ndrainage = \"gravel base\"")
		p("")
		p("[surface.vault]")
		p("diameter = %s\ndepth = %s\ncover = \"bolted steel lid\"", num(u.in(8)), num(u.round(u.ft(1))))
	}
	p("")
	p("[surface.pad]")
	p("length = %s\nwidth = %s\nthickness = %s", num(u.round(u.ft(3))), num(u.round(u.ft(3))), num(u.round(u.ft(0.5))))
	return []byte(b.String())
}

// Len is a value in the file's depth unit.
type Len float64

type units struct {
	depth, diam string
	metric      bool
}

func unitsOf(metric bool) units {
	if metric {
		return units{"m", "mm", true}
	}
	return units{"ft", "in", false}
}

// ft converts feet to the file's depth unit.
func (u units) ft(v float64) Len {
	if u.metric {
		return Len(v * 0.3048)
	}
	return Len(v)
}

// in converts inches to the file's diameter unit.
func (u units) in(v float64) float64 {
	if u.metric {
		return math.Round(v*25.4*10) / 10
	}
	return v
}

// annulus is the annular volume per unit depth between a hole and a
// pipe of the given diameters in inches, in the file's volume per depth
// unit (ft3/ft, or m3/m).
func (u units) annulus(hole, pipe float64) float64 {
	a := math.Pi / 4 * (hole*hole - pipe*pipe) / 144 // ft2
	if u.metric {
		return a * 0.3048 * 0.3048
	}
	return a
}

// ft3 converts cubic feet to the file's volume per (depth unit x area
// unit): ft3, or m3.
func (u units) ft3(v float64) float64 {
	if u.metric {
		return v * 0.3048 * 0.3048 * 0.3048
	}
	return v
}

// lb converts pounds to the file's mass unit (kg with metres).
func (u units) lb(v float64) float64 {
	if u.metric {
		return math.Round(v*0.45359237*10) / 10
	}
	return v
}

// round keeps two decimals in metres, one in feet.
func (u units) round(v Len) Len {
	if u.metric {
		return Len(math.Round(float64(v)*100) / 100)
	}
	return Len(math.Round(float64(v)*10) / 10)
}

func num[T ~float64](v T) string {
	s := fmt.Sprintf("%.2f", float64(v))
	s = strings.TrimRight(s, "0")
	if strings.HasSuffix(s, ".") {
		s += "0"
	}
	if s == "-0.0" {
		s = "0.0"
	}
	return s
}

// ProjectFile is the text of a synthetic project.toml.
func ProjectFile(name string) []byte {
	return []byte(fmt.Sprintf(`# Synthetic project (generated test data, invented).
[project]
name = %q
client = "Synthetic Water District"
site = "Synthetic test site"
units = "ft"
page = "letter"
wells = "wells"
output = "out"
consultant = "Example Hydro Consultants"
prepared_by = "T. Tester"
report = "SYN-0001"
`, name))
}

// Project writes a project of n synthetic wells under dir: project.toml
// and wells/SW-0001.toml, ...
func Project(dir string, n int) error {
	wells := filepath.Join(dir, "wells")
	if err := os.MkdirAll(wells, 0o755); err != nil {
		return fmt.Errorf("synth: %w", err)
	}
	if err := os.WriteFile(filepath.Join(dir, "project.toml"), ProjectFile(fmt.Sprintf("Synthetic project of %d wells", n)), 0o644); err != nil {
		return fmt.Errorf("synth: %w", err)
	}
	for i := 0; i < n; i++ {
		if err := os.WriteFile(filepath.Join(wells, FileName(i)), Well(i), 0o644); err != nil {
			return fmt.Errorf("synth: %w", err)
		}
	}
	return nil
}
