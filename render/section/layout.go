package section

import (
	"math"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/templates"
)

// Sizes in points.
const (
	colWidth     = 30.0 // lithology strip of a well column
	holeWidth    = 14.0 // borehole drawn in the column (schematic)
	axisWidth    = 44.0 // each elevation axis
	headHeight   = 34.0 // well labels above the plot
	footHeight   = 40.0 // distance axis below the plot
	titleHeight  = 78.0 // title block
	gap          = 8.0
	unitBarWidth = 4.0  // the strip that marks a well's units
	endRoom      = 52.0 // room beyond the end columns for labels
	sizeLabel    = 7.5
	sizeSmall    = 6.0
	sizeTitle    = 10.0
)

var (
	ink       = draw.RGB(0x22, 0x22, 0x22)
	gridInk   = draw.RGB(0xCC, 0xCC, 0xCC)
	waterInk  = draw.RGB(0x44, 0x77, 0xAA)
	groundInk = draw.RGB(0x5A, 0x3E, 0x1B)
)

// layout holds the geometry of one section sheet.
type layout struct {
	in Input
	// ordered is the wells left to right, and joins and units the units
	// joined between them and every unit named, in order of first
	// appearance; worked out once the columns are placed.
	ordered []*placed
	joins   []unitJoin
	units   []string
	tpl     *templates.Template
	wells   []*placed
	line    polyline
	method  string
	u       schema.DepthUnit // the unit elevations and distances are written in

	frame, body, plot, panel, titleBox draw.Rect
	vs, hs                             scale
	vFits, hFits                       bool
	elevTop                            float64 // elevation (m) at plot.Y
	chainLeft                          float64 // chainage (m) at the plot's left drawing origin
	xOrigin                            float64 // x of chainLeft

	water waterLine
	notes []string
	used  legendSet
}

func newLayout(in Input, tpl *templates.Template, wells []*placed, line polyline, method string) *layout {
	l := &layout{in: in, tpl: tpl, wells: wells, line: line, method: method}
	l.u = schema.Feet
	if in.Project != nil && in.Project.Units != "" {
		l.u = in.Project.Units
	} else if len(wells) > 0 {
		l.u = wells[0].w.Units.Depth
	}
	l.regions()
	l.scales()
	l.joins, l.units = correlate(l.ordered)
	l.water = chooseWater(in.Section.WaterDate, wells)
	l.collectNotes()
	return l
}

// regions splits the page: a frame inside the margins, the title block
// along the bottom, a side panel (plan and legend) on the right and the
// body, which holds the plot between two elevation axes.
func (l *layout) regions() {
	m := l.tpl.Margin
	l.frame = draw.Rect{X: m, Y: m, W: l.tpl.Width - 2*m, H: l.tpl.Height - 2*m}
	panelW := math.Max(150, 0.22*l.frame.W)
	l.titleBox = draw.Rect{X: l.frame.X, Y: l.frame.Bottom() - titleHeight, W: l.frame.W, H: titleHeight}
	l.panel = draw.Rect{X: l.frame.Right() - panelW, Y: l.frame.Y, W: panelW, H: l.titleBox.Y - l.frame.Y}
	l.body = draw.Rect{X: l.frame.X, Y: l.frame.Y, W: l.panel.X - l.frame.X, H: l.titleBox.Y - l.frame.Y}
	l.plot = draw.Rect{X: l.body.X + axisWidth, Y: l.body.Y + headHeight, W: l.body.W - 2*axisWidth, H: l.body.H - headHeight - footHeight}
}

// scales chooses the vertical scale from the elevation span and the
// horizontal one from the line's length, each the most detailed round
// scale that fits, and centres the drawing in the plot.
func (l *layout) scales() {
	imperial := l.u == schema.Feet
	top, bottom := math.Inf(-1), math.Inf(1)
	cmin, cmax := math.Inf(1), math.Inf(-1)
	for _, p := range l.wells {
		g := float64(p.ground)
		top = math.Max(top, g+float64(stickUp(p.w)))
		bottom = math.Min(bottom, g-float64(deepest(p.w)))
		cmin = math.Min(cmin, p.chainage)
		cmax = math.Max(cmax, p.chainage)
	}
	span := top - bottom
	if span <= 0 {
		span = 1
	}
	// A little room above the highest ground for the level labels.
	l.vs, l.vFits = fit(imperial, pick(imperial, verticalFeet, verticalMetric), span*1.06, l.plot.H)
	l.elevTop = top + (l.plot.H/l.vs.points(1)-span)/2
	room := l.plot.W - 2*endRoom
	l.hs, l.hFits = fit(imperial, pick(imperial, horizontalFeet, horizontalMetre), cmax-cmin, room)
	drawn := l.hs.points(cmax - cmin)
	l.chainLeft = cmin
	l.xOrigin = l.plot.X + endRoom + math.Max(0, (room-drawn)/2)
	for _, p := range l.wells {
		p.x = l.xAt(p.chainage)
	}
	l.spreadColumns()
}

func pick(imperial bool, ft, m []float64) []float64 {
	if imperial {
		return ft
	}
	return m
}

// y is the page y of an elevation in metres.
func (l *layout) y(elev float64) float64 { return l.plot.Y + l.vs.points(l.elevTop-elev) }

// xAt is the page x of a chainage in metres.
func (l *layout) xAt(c float64) float64 { return l.xOrigin + l.hs.points(c-l.chainLeft) }

// spreadColumns moves columns that would touch apart, keeping their
// order; the moved ones are noted on the sheet, since they no longer
// stand at their true distance.
func (l *layout) spreadColumns() {
	// Spreading keeps the order, so it is the drawn order too.
	l.ordered = drawnOrder(l.wells)
	order := l.ordered
	minGap := colWidth + 6
	for i := 1; i < len(order); i++ {
		if order[i].x-order[i-1].x < minGap {
			order[i].x = order[i-1].x + minGap
			order[i].moved = true
		}
	}
	// Pull the row back inside the plot if pushing ran it off the right.
	if n := len(order); n > 0 {
		over := order[n-1].x + colWidth/2 - (l.plot.Right() - 4)
		if over > 0 {
			for _, p := range order {
				p.x -= over
			}
		}
	}
}

// stickUp is how far the highest drawn part stands above ground.
func stickUp(w *schema.Well) schema.Length {
	var up schema.Length
	for _, s := range w.Strings {
		up = max(up, -s.Top())
	}
	for _, c := range w.Casings {
		up = max(up, -c.Top)
	}
	return up
}

// deepest is the depth of the deepest thing logged or built.
func deepest(w *schema.Well) schema.Length {
	d := w.TotalDepth
	for _, b := range w.Boreholes {
		d = max(d, b.Bottom)
	}
	for _, ly := range w.Lithology {
		d = max(d, ly.Bottom)
	}
	return d
}

// draw assembles the sheet.
func (l *layout) draw() *draw.Page {
	pg := &draw.Page{Width: l.tpl.Width, Height: l.tpl.Height}
	pg.Add(draw.Box{Rect: l.frame, Style: draw.Style{Stroke: ink, StrokeWidth: 0.8}, Role: "frame"})
	pg.Add(l.grid()...)
	pg.Add(draw.Clip{Rect: l.plot, Items: l.unitBands()})
	pg.Add(draw.Clip{Rect: l.plot, Items: l.groundLine()})
	for _, p := range l.wells {
		pg.Add(draw.Clip{Rect: l.plot, Items: l.column(p)})
	}
	pg.Add(draw.Clip{Rect: l.plot, Items: l.waterItems()})
	pg.Add(l.wellLabels()...)
	pg.Add(l.axes()...)
	pg.Add(l.panelItems()...)
	pg.Add(l.titleItems()...)
	return pg
}
