package symbols

import (
	"math"

	"github.com/tremie-dev/tremie/render/draw"
)

// Kind is what a symbol depicts; the legend groups by it.
type Kind int

const (
	Lithology Kind = iota // a soil or rock class
	Material              // an annular fill material
	WellPart              // a drawn part of the well
)

func (k Kind) String() string {
	switch k {
	case Lithology:
		return "lithology"
	case Material:
		return "material"
	default:
		return "well part"
	}
}

// Symbol is one entry of the table: how a class is painted and named.
type Symbol struct {
	ID   string // stable key, e.g. "fill:filter-pack", "soil:SP", "rock:shale"; the legend deduplicates on it
	Name string // legend words, e.g. "Filter pack"
	Code string // the ASTM D2487 group symbol for a soil, else ""
	Kind Kind
	Fill draw.Color // ground colour under the marks; zero for a part drawn as marks alone

	marks  func(p *pen)                  // the pattern, laid on the page grid
	period draw.Point                    // the pattern's repeat (points), or zero: marks drawn into each region
	tile   *draw.Tile                    // the repeat as a tile, made once from marks and period (see makeTile)
	paint  func(r draw.Rect) []draw.Item // overrides the ground+marks painting (dual soils)
	swatch func(r draw.Rect) []draw.Item // overrides the legend swatch (well parts)
}

// Paint fills r with the symbol: the ground colour, then the marks,
// clipped exactly to r. The marks sit on a grid fixed to the page, so
// touching rectangles of one symbol join seamlessly. A periodic pattern
// (every soil, rock and fill material) is one draw.Pattern of its tile,
// which backends define once and fill by reference.
func (s Symbol) Paint(r draw.Rect) []draw.Item {
	if !(r.W > 0 && r.H > 0) || math.IsInf(r.W, 0) || math.IsInf(r.H, 0) {
		return nil
	}
	// Marks are laid cell by cell over r: bound r by the largest sheet, so
	// that a fill drawn far past the page (an absurd diameter) costs no
	// more than one that fills it.
	if r = within(r, drawable); !(r.W > 0 && r.H > 0) {
		return nil
	}
	if s.paint != nil {
		return s.paint(r)
	}
	var items []draw.Item
	if !s.Fill.None() {
		items = append(items, draw.Box{Rect: r, Style: draw.Style{Fill: s.Fill}, Role: "symbol " + s.ID})
	}
	switch {
	case s.tile != nil:
		items = append(items, draw.Pattern{Rect: r, Tile: s.tile, Role: "pattern " + s.ID})
	case s.marks != nil:
		items = append(items, s.direct(r)...)
	}
	return items
}

// direct draws the marks straight into r, clipped to it: how a well
// part's motif, which does not repeat, is drawn.
func (s Symbol) direct(r draw.Rect) []draw.Item {
	p := &pen{r: r, period: s.period}
	s.marks(p)
	if marks := p.done(); len(marks) > 0 {
		return []draw.Item{draw.Clip{Rect: r, Items: marks}}
	}
	return nil
}

// tileMisfits lists the symbols whose motif does not fit their tile
// (a test fails on any).
var tileMisfits []string

// makeTile draws one repeat of a periodic pattern: the marks of the cells
// of one period, each once and whole.
func makeTile(s Symbol) *draw.Tile {
	p := &pen{r: draw.Rect{W: s.period.X, H: s.period.Y}, period: s.period, tile: true}
	s.marks(p)
	if p.misfit != "" {
		tileMisfits = append(tileMisfits, s.ID+": "+p.misfit)
	}
	return &draw.Tile{ID: s.ID, W: s.period.X, H: s.period.Y, Items: p.done()}
}

// Swatch is the symbol as the legend shows it in r: the pattern in a thin
// frame, or for a well part a small picture of the part.
func (s Symbol) Swatch(r draw.Rect) []draw.Item {
	if !(r.W > 0 && r.H > 0) {
		return nil
	}
	if s.swatch != nil {
		return s.swatch(r)
	}
	items := s.Paint(r)
	return append(items, frame(r))
}

func frame(r draw.Rect) draw.Item {
	return draw.Box{Rect: r, Style: draw.Style{Stroke: frameInk, StrokeWidth: 0.5}, Role: "swatch frame"}
}

// drawable holds every page tremie draws (the largest template, A3 or
// Tabloid, is under 1,250 points a side) with room to spare; nothing
// outside it can be seen.
var drawable = draw.Rect{X: -1000, Y: -1000, W: 6000, H: 6000}

// within is the part of r inside b; r itself, to the bit, when it lies
// inside already.
func within(r, b draw.Rect) draw.Rect {
	if r.X >= b.X && r.Y >= b.Y && r.Right() <= b.Right() && r.Bottom() <= b.Bottom() {
		return r
	}
	x0, y0 := math.Max(r.X, b.X), math.Max(r.Y, b.Y)
	x1, y1 := math.Min(r.Right(), b.Right()), math.Min(r.Bottom(), b.Bottom())
	return draw.Rect{X: x0, Y: y0, W: x1 - x0, H: y1 - y0}
}
