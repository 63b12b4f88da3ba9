package section

import (
	"math"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// elevationTicks are round elevations (in metres) inside the plot, at a
// step of the sheet's unit that puts ticks about half an inch apart.
func (l *layout) elevationTicks() (ticks []float64, step float64) {
	perUnit := l.vs.points(float64(schema.LengthFrom(1, l.u)))
	step = niceStep(36 / perUnit)
	unit := float64(schema.LengthFrom(1, l.u))
	topU := l.elevTop / unit
	botU := (l.elevTop - l.plot.H/l.vs.points(1)) / unit
	for v := math.Ceil(botU/step) * step; v <= topU+1e-9; v += step {
		ticks = append(ticks, v*unit)
	}
	return ticks, step
}

// grid draws faint lines across the plot at the elevation ticks.
func (l *layout) grid() []draw.Item {
	ticks, _ := l.elevationTicks()
	var items []draw.Item
	for _, z := range ticks {
		y := l.y(z)
		items = append(items, draw.Shape{Points: []draw.Point{{X: l.plot.X, Y: y}, {X: l.plot.Right(), Y: y}}, Style: draw.Style{Stroke: gridInk, StrokeWidth: 0.3}})
	}
	return items
}

// axes draws the elevation axes on both sides, the distance axis below
// with a tick at every well, and the section's end letters.
func (l *layout) axes() []draw.Item {
	var items []draw.Item
	items = append(items, draw.Box{Rect: l.plot, Style: draw.Style{Stroke: ink, StrokeWidth: 0.6}, Role: "section-plot"})
	ticks, step := l.elevationTicks()
	digits := 0
	if step < 1 {
		digits = 1
	}
	for _, z := range ticks {
		y := l.y(z)
		s := schema.TrimFloat(schema.Length(z).In(l.u), digits)
		items = append(items,
			draw.Shape{Points: []draw.Point{{X: l.plot.X - 4, Y: y}, {X: l.plot.X, Y: y}}, Style: draw.Style{Stroke: ink, StrokeWidth: 0.5}},
			draw.Shape{Points: []draw.Point{{X: l.plot.Right(), Y: y}, {X: l.plot.Right() + 4, Y: y}}, Style: draw.Style{Stroke: ink, StrokeWidth: 0.5}},
			draw.Text{At: draw.Point{X: l.plot.X - 6, Y: y + 2.5}, S: s, Size: sizeLabel, Anchor: draw.End, Color: ink, Role: "section-elev-tick"},
			draw.Text{At: draw.Point{X: l.plot.Right() + 6, Y: y + 2.5}, S: s, Size: sizeLabel, Anchor: draw.Start, Color: ink, Role: "section-elev-tick"},
		)
	}
	title := "Elevation, " + string(l.u) + l.datum()
	midY := l.plot.Y + l.plot.H/2
	items = append(items,
		draw.Text{At: draw.Point{X: l.body.X + 10, Y: midY}, S: title, Size: sizeLabel, Anchor: draw.Middle, Color: ink, Rotate: 90, Role: "section-elev-title"},
		draw.Text{At: draw.Point{X: l.body.Right() - 4, Y: midY}, S: title, Size: sizeLabel, Anchor: draw.Middle, Color: ink, Rotate: 90, Role: "section-elev-title"},
	)
	// Distance axis: round distances, and each well's own distance.
	unit := float64(schema.LengthFrom(1, l.u))
	perUnit := l.hs.points(unit)
	dstep := niceStep(54 / perUnit)
	left := (l.chainLeft - (l.xOrigin-l.plot.X)/l.hs.points(1)) / unit
	right := left + l.plot.W/perUnit
	by := l.plot.Bottom()
	for v := math.Ceil(left/dstep) * dstep; v <= right+1e-9; v += dstep {
		x := l.xAt(v * unit)
		if v < -1e-9 {
			continue
		}

		items = append(items,
			draw.Shape{Points: []draw.Point{{X: x, Y: by}, {X: x, Y: by + 4}}, Style: draw.Style{Stroke: ink, StrokeWidth: 0.5}},
			draw.Text{At: draw.Point{X: x, Y: by + 4 + sizeLabel}, S: distanceLabel(v), Size: sizeLabel, Anchor: draw.Middle, Color: ink, Role: "section-dist-tick"},
		)
	}
	items = append(items, draw.Text{At: draw.Point{X: l.plot.X + l.plot.W/2, Y: by + footHeight - 8}, S: "Distance along section, " + string(l.u), Size: sizeLabel, Anchor: draw.Middle, Color: ink, Role: "section-dist-title"})
	// End letters: "A-A'" gives A at the left and A' at the right.
	if a, b, ok := endLetters(l.in.Section.Name); ok {
		items = append(items,
			draw.Text{At: draw.Point{X: l.plot.X + 4, Y: l.plot.Y + 14}, S: a, Size: 14, Font: draw.Bold, Anchor: draw.Start, Color: ink, Role: "section-end"},
			draw.Text{At: draw.Point{X: l.plot.Right() - 4, Y: l.plot.Y + 14}, S: b, Size: 14, Font: draw.Bold, Anchor: draw.End, Color: ink, Role: "section-end"},
		)
	}
	return items
}

// distanceLabel writes a round distance, 0 as "0": the first tick of an
// axis that starts just left of the first well is the ceiling of a small
// negative number, a negative zero that would read "-0".
func distanceLabel(v float64) string {
	if math.Abs(v) < 1e-9 {
		v = 0
	}
	return schema.TrimFloat(v, 0)
}

// endLetters splits a name such as "A-A'" or "B–B′" into its two ends.
func endLetters(name string) (string, string, bool) {
	for _, sep := range []string{"–", "—", "-"} {
		for i := 0; i+len(sep) <= len(name); i++ {
			if name[i:i+len(sep)] == sep {
				a, b := name[:i], name[i+len(sep):]
				if a != "" && b != "" && len(a) <= 3 && len(b) <= 4 {
					return a, b, true
				}
			}
		}
	}
	return "", "", false
}

func (l *layout) datum() string {
	for _, p := range l.wells {
		if d := p.w.Elevation.Datum; d != "" {
			return " " + d
		}
	}
	if l.in.Project != nil && l.in.Project.Datum != "" {
		return " " + l.in.Project.Datum
	}
	return ""
}

// groundLine joins the ground surface between neighbouring columns.
func (l *layout) groundLine() []draw.Item {
	ws := l.ordered
	var items []draw.Item
	for i := 1; i < len(ws); i++ {
		a, b := ws[i-1], ws[i]
		items = append(items, draw.Shape{Points: []draw.Point{{X: a.x + colWidth/2, Y: l.y(float64(a.ground))}, {X: b.x - colWidth/2, Y: l.y(float64(b.ground))}},
			Style: draw.Style{Stroke: groundInk, StrokeWidth: 1.2}, Role: "section-ground-line"})
	}
	return items
}

// wellHead is a well's name over its column: its ID, and for a planned
// well "(planned)", so that a design is not read as built.
func wellHead(w *schema.Well) string {
	if w.IsPlanned() {
		return w.ID + " (planned)"
	}
	return w.ID
}

// wellLabels writes each well's ID and ground elevation above the plot,
// over its column, with a thin guide down to the ground.
func (l *layout) wellLabels() []draw.Item {
	var items []draw.Item
	for _, p := range l.wells {
		items = append(items,
			draw.Text{At: draw.Point{X: p.x, Y: l.plot.Y - 16}, S: wellHead(p.w), Size: sizeLabel + 0.5, Font: draw.Bold, Anchor: draw.Middle, Color: ink, Role: "section-well:" + p.w.ID},
			draw.Text{At: draw.Point{X: p.x, Y: l.plot.Y - 6}, S: "GS " + l.elev(float64(p.ground)), Size: sizeSmall, Anchor: draw.Middle, Color: ink, Role: "section-gs:" + p.w.ID},
			draw.Shape{Points: []draw.Point{{X: p.x, Y: l.plot.Y}, {X: p.x, Y: l.y(float64(p.ground + stickUp(p.w)))}}, Style: draw.Style{Stroke: gridInk, StrokeWidth: 0.4, Dash: []float64{1.5, 1.5}}},
		)
	}
	return items
}
