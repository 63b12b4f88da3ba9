package draw

// Tile is one repeat of a fill pattern: marks drawn in a W × H cell,
// copies of which lie edge to edge on a grid fixed to the page origin
// (cell (i, j) covers [i·W, (i+1)·W] × [j·H, (j+1)·H]). Backends define
// a tile once per document and fill any number of regions with it by
// reference, so a fill costs one path whatever its size.
type Tile struct {
	// ID names the pattern (a symbol's ID); backends derive the names
	// they write from it, so output stays repeatable.
	ID   string
	W, H float64 // points
	// Items are the marks in the cell's own coordinates: Path, Shape,
	// Box and Circle items in opaque colours. Marks may reach past the
	// cell, and what lies outside [0, W] × [0, H] is cut off: a mark
	// crossing an edge is drawn whole in each cell it touches, so the
	// copies join without seams.
	Items []Item
}

// Pattern fills a rectangle with copies of a tile. Only the part of the
// rectangle inside the enclosing clips is drawn, and a backend that
// must draw the marks itself (a raster) draws only the cells that meet
// it.
type Pattern struct {
	Rect
	Tile *Tile
	Role string
}

func (Pattern) item() {}
