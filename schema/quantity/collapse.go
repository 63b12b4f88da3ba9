package quantity

import (
	"math"
	"sort"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// Collapse of thermoplastic casing under a grout column.
//
// ASTM F480 (appendix, resistance to hydraulic collapse pressure) rates a
// thermoplastic well casing for collapse by its dimension ratio DR = OD /
// wall:
//
//	P = 2E / (1 - v^2) x (1 / (DR - 1))^3
//
// with, for PVC (cell class 12454), E = 400,000 psi and v = 0.38. The
// form and E are as the standard's appendix is reproduced in trade
// discussions of it; v = 0.38 is from memory. Maryland's well code (COMAR
// 26.04.04.17, Table 1) lists depth limits for PVC casing by SDR and
// schedule that are these ratings over one and the same 0.44 psi/ft to
// within 1.5 % in 19 of its 20 cells (the test holds them), which fixes
// the form and every rating up to that one factor.
const (
	pvcModulusPsi = 400000.0
	pvcPoisson    = 0.38
	// PsiPa is one pound-force per square inch in pascals (NIST SP 811).
	PsiPa = 6894.757293168
	// gravity is standard gravity, m/s2 (NIST SP 330).
	gravity = 9.80665
)

// CollapseRatingSource names where CollapseRating comes from, for reports.
const CollapseRatingSource = "ASTM F480 resistance to hydraulic collapse pressure, 2E/(1-v^2)/(DR-1)^3, E = 400,000 psi, v = 0.38"

// CollapseRating is the rated hydraulic collapse pressure, in pascals, of
// a PVC pipe of outside diameter od and inside diameter id (ASTM F480's
// formula above); false for a pipe of another material or with no wall.
// The rating is for a short-term load at 73 F: cement's heat of hydration
// lowers it, which the rating does not see.
func CollapseRating(material string, od, id schema.Diameter) (float64, bool) {
	if !IsPVC(material) || od <= 0 || id <= 0 || id >= od {
		return 0, false
	}
	dr := float64(od) / (float64(od-id) / 2)
	if dr <= 1 {
		return 0, false
	}
	psi := 2 * pvcModulusPsi / (1 - pvcPoisson*pvcPoisson) / math.Pow(dr-1, 3)
	return psi * PsiPa, true
}

// IsPVC reports whether a pipe material is PVC (or CPVC), the
// thermoplastic ASTM F480's PVC rating is for.
func IsPVC(material string) bool {
	return strings.Contains(strings.ToUpper(material), "PVC")
}

// CollapseLoad is the worst load of one grout column on the PVC pipe it
// stands against.
type CollapseLoad struct {
	// Fills are the grout fills of the column, top down; the column runs
	// from the first's top to the last's bottom.
	Fills       []*schema.Fill
	Top, Bottom schema.Length
	// At is the depth of the worst load (the column's bottom, or the
	// bottom of a weaker pipe higher up) and Pipe the pipe loaded there.
	At   schema.Length
	Pipe schema.HolePipe
	// Outside is the column's pressure at At: each slurry's density x g x
	// its height above At. Inside is the water standing in the casing,
	// where the lowest fill states its level (water_inside); else the
	// casing is taken as empty and Inside is 0.
	Outside, Inside float64 // Pa
	WaterStated     bool
	WaterTop        schema.Length
	// Density is the lowest fill's slurry density (kg/m3) and Measured
	// whether it is a mud-balance reading rather than the mix's.
	Density  float64
	Measured bool
	Rating   float64 // Pa, CollapseRating of Pipe
}

// Differential is the net pressure on the pipe, Pa.
func (c CollapseLoad) Differential() float64 { return c.Outside - c.Inside }

// Fraction is the differential pressure over the pipe's rating.
func (c CollapseLoad) Fraction() float64 { return c.Differential() / c.Rating }

// PipeMaterial is the loaded pipe's material as written.
func (c CollapseLoad) PipeMaterial() string { return holePipe(c.Pipe).Material }

func holePipe(p schema.HolePipe) schema.Pipe {
	if p.Casing != nil {
		return p.Casing.Pipe
	}
	if p.Section != nil {
		return p.Section.Pipe
	}
	return schema.Pipe{}
}

// slurryDensity is a grout fill's density, kg/m3: its mud-balance reading,
// else its mix's from the yields (y, else the built-in ones).
func slurryDensity(f *schema.Fill, y *Yields, u schema.Units) (float64, bool, bool) {
	if f.Density > 0 {
		return f.Density, true, true
	}
	if y == nil {
		y = DefaultYields()
	}
	if v, ok := y.ForWell(*f, u); ok {
		if d, ok := v.Density(); ok {
			return d, false, true
		}
	}
	if v, ok := DefaultYields().Get(f.Material); ok { // a fill's own yield gives no mix
		if d, ok := v.Density(); ok {
			return d, false, true
		}
	}
	return 0, false, false
}

// CollapseLoads finds every column of grout (contiguous grout fills in one
// annulus) standing against PVC pipe and gives its worst load: the
// greatest differential pressure over rating at the bottom of each slab
// of the column. Columns against no rated pipe give none. y are the
// yields the mixes come from (nil: the built-in ones).
func CollapseLoads(w *schema.Well, y *Yields) []CollapseLoad {
	var out []CollapseLoad
	sections := w.CrossSections()
	for _, col := range groutColumns(w) {
		dens := columnDensities(col, y, w.Units)
		low := col[len(col)-1]
		var best CollapseLoad
		found := false
		for _, cs := range sections.Within(col[0].Top, col[len(col)-1].Bottom) {
			pipes := cs.Outermost()
			if within := col[0].Within; within != "" {
				_, in, ok := cs.Inside(within)
				if !ok {
					continue
				}
				pipes = in
			} else if !cs.HasHole {
				continue
			}
			at := cs.Bottom
			outside, ok := columnPressure(col, dens, at)
			if !ok {
				break
			}
			inside := 0.0
			if low.HasWaterInside && at > low.WaterInside {
				inside = waterKgPerM3 * gravity * float64(at-low.WaterInside)
			}
			for _, p := range pipes {
				pp := holePipe(p)
				rating, ok := CollapseRating(pp.Material, p.OD, p.ID)
				if !ok {
					continue
				}
				c := CollapseLoad{Fills: col, Top: col[0].Top, Bottom: low.Bottom, At: at, Pipe: p,
					Outside: outside, Inside: inside, WaterStated: low.HasWaterInside, WaterTop: low.WaterInside, Rating: rating,
					Density: dens[len(dens)-1].kgm3, Measured: dens[len(dens)-1].measured}
				// a pipe must be worse by more than round-off to replace the
				// first found, so that equal loads keep the listing order
				if !found || c.Fraction() > best.Fraction()+1e-12 {
					best, found = c, true
				}
			}
		}
		if found {
			out = append(out, best)
		}
	}
	return out
}

// density is one fill's slurry density as slurryDensity gives it.
type density struct {
	kgm3            float64
	measured, known bool
}

// columnDensities are the slurry densities of a column's fills, in its
// order, worked once per column rather than once per slab and pipe.
func columnDensities(col []*schema.Fill, y *Yields, u schema.Units) []density {
	out := make([]density, len(col))
	for i, f := range col {
		d := &out[i]
		d.kgm3, d.measured, d.known = slurryDensity(f, y, u)
	}
	return out
}

// columnPressure is the pressure of a grout column at depth at: each
// fill's slurry density (dens, from columnDensities) x g x its height
// above at. False when a fill's density is not known.
func columnPressure(col []*schema.Fill, dens []density, at schema.Length) (float64, bool) {
	var p float64
	for i, f := range col {
		if f.Top >= at {
			break
		}
		if !dens[i].known {
			return 0, false
		}
		p += dens[i].kgm3 * gravity * float64(min(f.Bottom, at)-f.Top)
	}
	return p, true
}

// groutColumns are the runs of grout fills that touch end to end in one
// annulus, each top down.
func groutColumns(w *schema.Well) [][]*schema.Fill {
	byWithin := map[string][]*schema.Fill{}
	var order []string
	for i := range w.Fills {
		f := &w.Fills[i]
		if f.Material.Group() != schema.GroutGroup {
			continue
		}
		if _, ok := byWithin[f.Within]; !ok {
			order = append(order, f.Within)
		}
		byWithin[f.Within] = append(byWithin[f.Within], f)
	}
	const touch = 1e-6 // m: fills meeting within a micrometre (unit round-off) are one column
	var out [][]*schema.Fill
	for _, within := range order {
		fs := byWithin[within]
		sort.SliceStable(fs, func(i, j int) bool { return fs[i].Top < fs[j].Top })
		var run []*schema.Fill
		for _, f := range fs {
			if len(run) > 0 && math.Abs(float64(f.Top-run[len(run)-1].Bottom)) > touch {
				out = append(out, run)
				run = nil
			}
			run = append(run, f)
		}
		if len(run) > 0 {
			out = append(out, run)
		}
	}
	return out
}

// PressureIn is a pressure (Pa) in the unit a well's reports give it in,
// with the unit's name: psi in a file in feet, kPa in one in metres. The
// text, CSV and JSON reports all take the unit from here.
func PressureIn(pa float64, u schema.Units) (float64, string) {
	if u.Imperial() {
		return pa / PsiPa, "psi"
	}
	return pa / 1000, "kPa"
}

// FormatPressure writes a pressure in the well's units: "146.2 psi" (to a
// tenth) or "1008 kPa" (whole).
func FormatPressure(pa float64, u schema.Units) string {
	v, unit := PressureIn(pa, u)
	decimals := 0
	if u.Imperial() {
		decimals = 1
	}
	return schema.TrimFloat(v, decimals) + " " + unit
}

// Describe says what a load is made of, for reports: `neat cement 0–180 ft
// at 15.56 lb/gal (its mix), on string "main" riser (PVC, rated 59.8 psi)
// at 180 ft: 146.2 psi outside, the casing taken as empty`.
func (c CollapseLoad) Describe(u schema.Units) string {
	low := c.Fills[len(c.Fills)-1]
	d, unit := schema.SlurryDensityIn(c.Density, u)
	basis := "its mix"
	if c.Measured {
		basis = "measured"
	}
	water := "the casing taken as empty (no water_inside given)"
	if c.WaterStated {
		water = "less " + FormatPressure(c.Inside, u) + " of water inside from " + u.FormatDepth(c.WaterTop)
	}
	return low.Material.Words() + " " + u.FormatInterval(c.Top, c.Bottom) +
		" at " + schema.TrimFloat(d, 2) + " " + unit + " (" + basis + "), on " + c.Pipe.Label() + " (" + c.PipeMaterial() +
		", rated " + FormatPressure(c.Rating, u) + ") at " + u.FormatDepth(c.At) + ": " + FormatPressure(c.Outside, u) +
		" outside, " + water
}
