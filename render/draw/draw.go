// Package draw is tremie's device-independent drawing model: a Page is a
// list of primitive items in page points (1/72 in), origin at the top
// left, y growing downward. Layout code builds pages; backends (package
// render/out) only translate them to SVG, PDF or PNG. Tests inspect pages
// directly: every item may carry a Role naming what it depicts.
package draw

// Point is a position in points from the page's top-left corner.
type Point struct{ X, Y float64 }

// Rect is an axis-aligned rectangle; Y is its top edge.
type Rect struct{ X, Y, W, H float64 }

// Bottom is the rectangle's bottom edge.
func (r Rect) Bottom() float64 { return r.Y + r.H }

// Right is the rectangle's right edge.
func (r Rect) Right() float64 { return r.X + r.W }

// Intersects reports whether two rectangles share interior area.
func (r Rect) Intersects(o Rect) bool {
	return r.X < o.Right() && o.X < r.Right() && r.Y < o.Bottom() && o.Y < r.Bottom()
}

// Color is 8-bit sRGB with alpha; the zero value means "none".
type Color struct{ R, G, B, A uint8 }

// RGB is an opaque colour.
func RGB(r, g, b uint8) Color { return Color{r, g, b, 255} }

// None reports whether the colour paints nothing.
func (c Color) None() bool { return c.A == 0 }

// Common colours.
var (
	Black = RGB(0, 0, 0)
	White = RGB(255, 255, 255)
)

// Style is how a shape is stroked and filled.
type Style struct {
	Stroke      Color
	StrokeWidth float64   // points; 0 with a stroke colour means hairline 0.25
	Dash        []float64 // dash pattern in points; nil = solid
	Fill        Color
}

// Item is one drawing primitive.
type Item interface{ item() }

// Shape is a polyline or polygon.
type Shape struct {
	Style
	Points []Point
	Closed bool
	Role   string
}

// Box is a rectangle.
type Box struct {
	Style
	Rect
	Role string
}

// Circle is a circle or dot.
type Circle struct {
	Style
	Center Point
	R      float64
	Role   string
}

// FontStyle selects one of the embedded faces.
type FontStyle int

const (
	Regular FontStyle = iota
	Bold
	Italic
	Mono
)

// Anchor is where a text's reference point sits horizontally.
type Anchor int

const (
	Start Anchor = iota
	Middle
	End
)

// Text is one line of text; At is on its baseline. Rotate turns it
// counter-clockwise in degrees about At (90 reads bottom to top).
type Text struct {
	At     Point
	S      string
	Size   float64 // points
	Font   FontStyle
	Anchor Anchor
	Color  Color
	Rotate float64
	Role   string
}

// Image is a raster image (PNG or JPEG bytes) placed in a rectangle.
type Image struct {
	Rect
	Data []byte
	Role string
}

// Clip draws its items clipped to a rectangle.
type Clip struct {
	Rect
	Items []Item
}

func (Shape) item()  {}
func (Box) item()    {}
func (Circle) item() {}
func (Text) item()   {}
func (Image) item()  {}
func (Clip) item()   {}

// Page is one sheet.
type Page struct {
	Width, Height float64 // points
	Items         []Item
}

// Add appends items.
func (p *Page) Add(items ...Item) { p.Items = append(p.Items, items...) }

// Document is a set of pages with the metadata backends write.
type Document struct {
	Title   string
	Subject string
	Author  string
	// Date is written as the PDF creation date; it must come from the input
	// (or SOURCE_DATE_EPOCH), never the wall clock, so output is repeatable.
	Date  string // RFC 3339, or ""
	Pages []*Page
}

// Walk calls fn for every item of the page, descending into clips.
func (p *Page) Walk(fn func(Item)) { walk(p.Items, fn) }

func walk(items []Item, fn func(Item)) {
	for _, it := range items {
		fn(it)
		if c, ok := it.(Clip); ok {
			walk(c.Items, fn)
		}
	}
}

// WithRole returns it named role; a clip's items are named instead, in a
// copy (items may share their marks).
func WithRole(it Item, role string) Item {
	switch v := it.(type) {
	case Shape:
		v.Role = role
		return v
	case Box:
		v.Role = role
		return v
	case Circle:
		v.Role = role
		return v
	case Text:
		v.Role = role
		return v
	case Image:
		v.Role = role
		return v
	case Path:
		v.Role = role
		return v
	case Pattern:
		v.Role = role
		return v
	case Clip:
		items := make([]Item, len(v.Items))
		for i, c := range v.Items {
			items[i] = WithRole(c, role)
		}
		v.Items = items
		return v
	}
	return it
}
