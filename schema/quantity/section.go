package quantity

import (
	"fmt"
	"math"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// Pipe is one pipe present at a depth: an outer casing or a section of a
// well string.
type Pipe struct {
	Name   string // casing name, or "string name kind" for a section
	Path   string // key path in the well, e.g. "casing[0]", "string[1].section[2]"
	Casing bool   // an outer casing (a fill may be placed within it)
	// Surface marks a part of the surface completion standing in the hole
	// (the flush-mount vault, the stick-up protective casing): it takes
	// its footprint from the annulus, and pipes inside it do not.
	Surface bool
	OD      schema.Diameter
	ID      schema.Diameter
	// In is the index in CrossSection.Pipes of the casing this pipe runs
	// inside, or -1 when it stands in the borehole itself.
	In int
}

// CrossSection is what the well holds at one depth.
type CrossSection struct {
	Depth schema.Length
	Hole  schema.Diameter // borehole diameter; 0 if no borehole section covers the depth
	Pipes []Pipe          // casings first (outermost first), then string sections
	units schema.Units    // the well's, for messages
}

// At returns the cross-section at depth z. Boundaries belong to neither
// side reliably, so callers sample the middle of a slice between two
// boundaries; At itself treats a pipe as present when top <= z < bottom,
// and the hole at z is the deepest borehole section that contains it.
func At(w *schema.Well, z schema.Length) CrossSection {
	cs := CrossSection{Depth: z, units: w.Units}
	if b, ok := w.BoreholeAt(z); ok {
		cs.Hole = b.Diameter
	}
	for i, c := range w.Casings {
		if c.Top <= z && z < c.Bottom {
			cs.Pipes = append(cs.Pipes, Pipe{Name: c.Label(), Path: casingPath(c, i), Casing: true, OD: c.Pipe.OD, ID: c.Pipe.ID, In: -1})
		}
	}
	cs.Pipes = append(cs.Pipes, surfaceParts(w, z)...)
	// Outermost casing first, so that each casing's container is found
	// among those before it.
	sortByODDesc(cs.Pipes)
	for i := range cs.Pipes {
		cs.Pipes[i].In = container(cs.Pipes[:i], cs.Pipes[i].OD)
	}
	for si, s := range w.Strings {
		for ki, sec := range s.Sections {
			if sec.Top <= z && z < sec.Bottom {
				p := Pipe{Name: s.Label() + " " + string(sec.Kind), Path: sectionPath(sec, si, ki), OD: sec.Pipe.OD, ID: sec.Pipe.ID}
				p.In = container(cs.Pipes, p.OD)
				cs.Pipes = append(cs.Pipes, p)
				break // a string has one section at a depth
			}
		}
	}
	return cs
}

// container returns the index of the innermost casing among cs whose bore
// takes a pipe of outside diameter od, or -1 for the borehole.
func container(cs []Pipe, od schema.Diameter) int {
	best := -1
	for i, c := range cs {
		if !c.Casing || c.ID <= 0 || c.ID < od {
			continue
		}
		if best < 0 || c.ID < cs[best].ID {
			best = i
		}
	}
	return best
}

func sortByODDesc(ps []Pipe) {
	// insertion sort: a handful of casings, and stable for equal ODs
	for i := 1; i < len(ps); i++ {
		for j := i; j > 0 && ps[j].OD > ps[j-1].OD; j-- {
			ps[j], ps[j-1] = ps[j-1], ps[j]
		}
	}
}

// Region names the part of a cross-section a fill occupies.
type Region struct {
	// Within is the name of the outer casing whose bore the fill is in;
	// "" is the borehole annulus outside every casing.
	Within string
}

// RegionOf is the region a fill was placed in.
func RegionOf(f schema.Fill) Region { return Region{Within: f.Within} }

// Area returns the open area of a region in the cross-section, in square
// metres: the borehole (or the named casing's bore) less the outside areas
// of the pipes standing directly in it. It fails when the region is absent
// at this depth or what stands in it is wider than it; the error does not
// repeat the depth, which the caller names.
func (cs CrossSection) Area(r Region) (float64, error) {
	outer := cs.Hole
	what := "the borehole"
	in := -1
	if r.Within != "" {
		in = -2
		for i, p := range cs.Pipes {
			if p.Casing && p.Name == r.Within {
				in, outer = i, p.ID
				what = fmt.Sprintf("casing %q", r.Within)
				break
			}
		}
		if in == -2 {
			return 0, fmt.Errorf("casing %q is not there", r.Within)
		}
		if outer <= 0 {
			return 0, fmt.Errorf("casing %q has no inside diameter", r.Within)
		}
	} else if outer <= 0 {
		return 0, fmt.Errorf("no borehole section covers it")
	}
	area := circle(outer)
	var inside []string
	for _, p := range cs.Pipes {
		if p.In != in {
			continue
		}
		if p.OD <= 0 {
			return 0, fmt.Errorf("%s has no outside diameter", p.Path)
		}
		area -= circle(p.OD)
		inside = append(inside, p.Name)
	}
	if area < -1e-12 && surfaceWider(cs.Pipes, in, outer) {
		// a vault or protective casing wider than the hole stands in its
		// own excavation: no annulus is left beside it (the pad fills it)
		return 0, nil
	}
	if area < -1e-12 {
		return 0, fmt.Errorf("the pipes in %s (%s) take more than its %s bore", what, strings.Join(inside, ", "), cs.units.FormatDiameter(outer))
	}
	return math.Max(area, 0), nil
}

// The surface parts' names, as fills may name them in "within".
const (
	VaultName      = "vault"
	ProtectiveName = "protective casing"
)

// surfaceParts are the vault and the protective casing where they stand
// below ground at depth z, as thin-walled pipes (the file gives one
// diameter): the riser inside them takes nothing more from the annulus.
func surfaceParts(w *schema.Well, z schema.Length) []Pipe {
	var out []Pipe
	if v := w.Surface.Vault; v != nil && v.Diameter > 0 && 0 <= z && z < v.Depth {
		out = append(out, Pipe{Name: VaultName, Path: "surface.vault", Casing: true, Surface: true, OD: v.Diameter, ID: v.Diameter, In: -1})
	}
	if pc := w.Surface.Protective; pc != nil && pc.Diameter > 0 && pc.Top <= z && z < pc.Bottom {
		out = append(out, Pipe{Name: ProtectiveName, Path: "surface.protective", Casing: true, Surface: true, OD: pc.Diameter, ID: pc.Diameter, In: -1})
	}
	return out
}

// surfaceIntervals are the depth ranges of the surface parts below ground.
func surfaceIntervals(w *schema.Well) []schema.Interval {
	var out []schema.Interval
	if v := w.Surface.Vault; v != nil && v.Diameter > 0 && v.Depth > 0 {
		out = append(out, schema.Interval{Top: 0, Bottom: v.Depth})
	}
	if pc := w.Surface.Protective; pc != nil && pc.Diameter > 0 && pc.Bottom > 0 {
		out = append(out, schema.Interval{Top: max(pc.Top, 0), Bottom: pc.Bottom})
	}
	return out
}

// surfaceWider reports whether a surface part standing directly in the
// region is at least as wide as the region's bore.
func surfaceWider(ps []Pipe, in int, bore schema.Diameter) bool {
	for _, p := range ps {
		if p.Surface && p.In == in && p.OD >= bore {
			return true
		}
	}
	return false
}

// circle is the area in square metres of a circle of diameter d.
func circle(d schema.Diameter) float64 {
	m := d.Metres()
	return math.Pi / 4 * m * m
}

func pathOr(p, def string) string {
	if p != "" {
		return p
	}
	return def
}

// casingPath and sectionPath are the key paths, made up only for wells
// built in code (the loader sets Path).
func casingPath(c schema.Casing, i int) string {
	if c.Path != "" {
		return c.Path
	}
	return fmt.Sprintf("casing[%d]", i)
}

func sectionPath(sec schema.Section, si, ki int) string {
	if sec.Path != "" {
		return sec.Path
	}
	return fmt.Sprintf("string[%d].section[%d]", si, ki)
}
