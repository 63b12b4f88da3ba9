package quantity

import (
	"fmt"
	"math"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// Region names the part of a cross-section a fill occupies.
type Region struct {
	// Within is the name of the outer casing whose bore the fill is in;
	// "" is the borehole annulus outside every casing.
	Within string
}

// RegionOf is the region a fill was placed in.
func RegionOf(f schema.Fill) Region { return Region{Within: f.Within} }

// Area returns the open area of a region in a cross-section (the well's
// one, schema.Sections), in square metres: the borehole (or the named
// casing's bore) less the outside areas of the pipes standing directly in
// it. It fails when the region is absent there or what stands in it is
// wider than it; the error does not repeat the depth, which the caller
// names. u gives the units of messages.
func Area(cs schema.CrossSection, r Region, u schema.Units) (float64, error) {
	outer := cs.Hole
	what := "the borehole"
	inside := cs.Outermost()
	if r.Within != "" {
		c, in, ok := cs.Inside(r.Within)
		if !ok {
			return 0, fmt.Errorf("casing %q is not there", r.Within)
		}
		if c.ID <= 0 {
			return 0, fmt.Errorf("casing %q has no inside diameter", r.Within)
		}
		outer, what, inside = c.ID, fmt.Sprintf("casing %q", r.Within), in
	} else if outer <= 0 {
		return 0, fmt.Errorf("no borehole section covers it")
	}
	area := circle(outer)
	names := make([]string, 0, len(inside))
	for _, p := range inside {
		if p.OD <= 0 {
			return 0, fmt.Errorf("%s has no outside diameter", p.Path)
		}
		area -= circle(p.OD)
		names = append(names, p.Label())
	}
	if area < -1e-12 { // m²: pipes exactly filling the bore are not "more", whatever the round-off
		return 0, fmt.Errorf("the pipes in %s (%s) take more than its %s bore", what, strings.Join(names, ", "), u.FormatDiameter(outer))
	}
	return math.Max(area, 0), nil
}

// circle is the area in square metres of a circle of diameter d.
func circle(d schema.Diameter) float64 {
	m := d.Metres()
	return math.Pi / 4 * m * m
}
