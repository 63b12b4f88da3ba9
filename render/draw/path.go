package draw

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
