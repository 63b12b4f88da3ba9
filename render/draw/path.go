package draw

import "math"

// Path is many marks in one style, drawn as one outline: a pattern's
// hatch lines, dots and small polygons. Backends paint it as a single
// compound path, filled as one area (non-zero rule, every subpath turned
// the same way, so overlapping marks stay filled) and then stroked; a
// page of patterns then costs a few paths instead of thousands.
type Path struct {
	Style
	Subpaths []Subpath
	Circles  []Disc
	Role     string
}

// Subpath is a polyline of a Path; Closed joins its ends.
type Subpath struct {
	Points []Point
	Closed bool
}

// Disc is a circle of a Path.
type Disc struct {
	Center Point
	R      float64
}

func (Path) item() {}

// ClipSegment cuts the segment p–q to r (Liang–Barsky); ok is false when
// none of it lies inside.
func ClipSegment(r Rect, p, q Point) (a, b Point, ok bool) {
	x0, y0 := p.X, p.Y
	dx, dy := q.X-x0, q.Y-y0
	t0, t1 := 0.0, 1.0
	for _, e := range [4][2]float64{
		{-dx, x0 - r.X}, {dx, r.Right() - x0},
		{-dy, y0 - r.Y}, {dy, r.Bottom() - y0},
	} {
		pp, q := e[0], e[1]
		if pp == 0 {
			if q < 0 {
				return a, b, false
			}
			continue
		}
		t := q / pp
		if pp < 0 {
			if t > t1 {
				return a, b, false
			}
			t0 = math.Max(t0, t)
		} else {
			if t < t0 {
				return a, b, false
			}
			t1 = math.Min(t1, t)
		}
	}
	if t1-t0 < 1e-9 {
		return a, b, false
	}
	return Point{X: x0 + t0*dx, Y: y0 + t0*dy}, Point{X: x0 + t1*dx, Y: y0 + t1*dy}, true
}
