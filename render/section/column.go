package section

import (
	"fmt"
	"sort"
	"strconv"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// column draws one well: its lithology strip, the borehole with its
// fills and open hole, the pipes, the ground mark, the screens' labels
// and the total depth. Widths are schematic; depths are to scale.
func (l *layout) column(p *placed) []draw.Item {
	w := p.w
	g := float64(p.ground)
	yd := func(d schema.Length) float64 { return l.y(g - float64(d)) }
	var items []draw.Item
	x0 := p.x - colWidth/2
	// Lithology.
	for _, ly := range w.Lithology {
		r := draw.Rect{X: x0, Y: yd(ly.Top), W: colWidth, H: yd(ly.Bottom) - yd(ly.Top)}
		items = append(items, l.paint(symbols.ForLayer(ly), r)...)
		items = append(items, draw.Box{Rect: r, Style: draw.Style{Stroke: ink, StrokeWidth: 0.3}, Role: "section-layer:" + w.ID + ":" + ly.Path})
	}
	// Borehole: white where nothing was placed, then the fills.
	hx := p.x - holeWidth/2
	for _, b := range w.Boreholes {
		r := draw.Rect{X: hx, Y: yd(max(b.Top, 0)), W: holeWidth, H: yd(b.Bottom) - yd(max(b.Top, 0))}
		items = append(items, draw.Box{Rect: r, Style: draw.Style{Fill: draw.White}})
	}
	for _, f := range w.Fills {
		r := draw.Rect{X: hx, Y: yd(max(f.Top, 0)), W: holeWidth, H: yd(f.Bottom) - yd(max(f.Top, 0))}
		items = append(items, l.paint(symbols.ForMaterial(f.Material), r)...)
	}
	for _, oh := range w.OpenHoles {
		r := draw.Rect{X: hx, Y: yd(oh.Top), W: holeWidth, H: yd(oh.Bottom) - yd(oh.Top)}
		items = append(items, draw.Box{Rect: r, Style: draw.Style{Fill: draw.White}})
		items = append(items, l.paint(symbols.MustPart(symbols.OpenHole), draw.Rect{X: hx, Y: r.Y, W: 2.5, H: r.H})...)
		items = append(items, l.paint(symbols.MustPart(symbols.OpenHole), draw.Rect{X: hx + holeWidth - 2.5, Y: r.Y, W: 2.5, H: r.H})...)
	}
	for _, b := range w.Boreholes {
		r := draw.Rect{X: hx, Y: yd(max(b.Top, 0)), W: holeWidth, H: yd(b.Bottom) - yd(max(b.Top, 0))}
		items = append(items, draw.Box{Rect: r, Style: draw.Style{Stroke: ink, StrokeWidth: 0.5}, Role: "section-hole:" + w.ID})
	}
	items = append(items, l.pipes(p, yd)...)
	items = append(items, l.unitBar(p, yd)...)
	items = append(items, l.lithologyCodes(p, yd)...)
	// Ground mark across the column.
	items = append(items, draw.Shape{Points: []draw.Point{{X: x0 - 3, Y: yd(0)}, {X: x0 + colWidth + 3, Y: yd(0)}}, Style: draw.Style{Stroke: groundInk, StrokeWidth: 1.2}, Role: "section-ground:" + w.ID})
	// Total depth.
	td := deepest(w)
	items = append(items,
		draw.Shape{Points: []draw.Point{{X: x0, Y: yd(td)}, {X: x0 + colWidth, Y: yd(td)}}, Style: draw.Style{Stroke: ink, StrokeWidth: 1}, Role: "section-td:" + w.ID},
		draw.Text{At: draw.Point{X: p.x, Y: yd(td) + sizeSmall + 2}, S: "TD " + l.elev(g-float64(td)), Size: sizeSmall, Anchor: draw.Middle, Color: ink, Role: "section-td-label:" + w.ID},
	)
	items = append(items, l.screenLabels(p)...)
	return items
}

// pipes draws outer casings as wide walls and each string's sections as
// narrow ones; several strings stand side by side in the hole.
func (l *layout) pipes(p *placed, yd func(schema.Length) float64) []draw.Item {
	var items []draw.Item
	w := p.w
	wall := 1.4
	for _, c := range w.Casings {
		items = append(items, l.pipe(p.x-holeWidth/2+1, holeWidth-2, wall, yd(c.Top), yd(c.Bottom), symbols.Casing, "section-casing:"+w.ID)...)
	}
	n := len(w.Strings)
	if n == 0 {
		return items
	}
	pw := 6.0
	if n > 1 {
		pw = (holeWidth - 3) / float64(n)
	}
	start := p.x - pw*float64(n)/2
	for i, s := range w.Strings {
		x := start + float64(i)*pw
		for k, sec := range s.Sections {
			id := symbols.Casing
			if sec.Kind == schema.ScreenSection {
				id = symbols.ScreenSlotted
				if sec.ScreenType == schema.ContinuousWrap {
					id = symbols.ScreenWrap
				}
			}
			role := fmt.Sprintf("section-pipe:%s:%d:%d", w.ID, i, k)
			if sec.Kind == schema.ScreenSection {
				role = fmt.Sprintf("section-screen:%s:%d:%d", w.ID, i, k)
			}
			items = append(items, l.pipe(x+0.3, pw-0.6, min(wall, (pw-0.6)/3), yd(sec.Top), yd(sec.Bottom), id, role)...)
		}
	}
	return items
}

// pipe draws a pipe of width wd between y0 and y1: two wall strips of the
// part's symbol with white between.
func (l *layout) pipe(x, wd, wall, y0, y1 float64, part, role string) []draw.Item {
	if y1 <= y0 || wd <= 0 {
		return nil
	}
	sym := symbols.MustPart(part)
	items := []draw.Item{draw.Box{Rect: draw.Rect{X: x, Y: y0, W: wd, H: y1 - y0}, Style: draw.Style{Fill: draw.White}, Role: role}}
	items = append(items, l.paint(sym, draw.Rect{X: x, Y: y0, W: wall, H: y1 - y0})...)
	items = append(items, l.paint(sym, draw.Rect{X: x + wd - wall, Y: y0, W: wall, H: y1 - y0})...)
	return items
}

// screenLabel is one screen's label beside a column: its text, turned
// to read up the page with its baseline at x, from y0 to y1.
type screenLabel struct {
	s         string
	x, y0, y1 float64
}

// screenLabelPlaces places each screen's label, with its top and bottom
// elevations, beside the column; a label that would overlap the one above
// it moves to the other side, then to a second row on the right.
func (l *layout) screenLabelPlaces(p *placed) []screenLabel {
	var labs []screenLabel
	g := float64(p.ground)
	yd := func(d schema.Length) float64 { return l.y(g - float64(d)) }
	for _, s := range p.w.Strings {
		for _, sec := range s.Screens() {
			txt := "screen " + l.elev(g-float64(sec.Top)) + " to " + l.elev(g-float64(sec.Bottom))
			if us := unitsAt(p.w, sec.Interval); len(us) > 0 {
				txt += " in " + strings.Join(us, " and ")
			}
			if len(p.w.Strings) > 1 && s.Name != "" && s.Name != p.w.ID {
				txt = s.Name + ": " + txt
			}
			mid := (yd(sec.Top) + yd(sec.Bottom)) / 2
			half := draw.TextWidth(draw.Regular, sizeSmall, txt) / 2
			labs = append(labs, screenLabel{s: txt, y0: mid - half, y1: mid + half})
		}
	}
	sort.Slice(labs, func(i, j int) bool { return labs[i].y0 < labs[j].y0 })
	lastRight, lastLeft := -1e9, -1e9
	for i, lb := range labs {
		x := p.x + colWidth/2 + sizeSmall + 1
		if lb.y0 < lastRight+2 {
			if lb.y0 >= lastLeft+2 {
				x = p.x - colWidth/2 - unitBarWidth - 2
				lastLeft = lb.y1
			} else {
				x = p.x + colWidth/2 + 2*sizeSmall + 2 // a second row on the right
				lastRight = lb.y1
			}
		} else {
			lastRight = lb.y1
		}
		labs[i].x = x
	}
	return labs
}

// screenLabels writes the column's screen labels where
// screenLabelPlaces puts them.
func (l *layout) screenLabels(p *placed) []draw.Item {
	var items []draw.Item
	for _, lb := range l.screenLabelPlaces(p) {
		items = append(items, draw.Text{At: draw.Point{X: lb.x, Y: (lb.y0 + lb.y1) / 2}, S: lb.s, Size: sizeSmall, Anchor: draw.Middle, Color: ink, Rotate: 90, Role: "section-screen-label:" + p.w.ID})
	}
	return items
}

// paint fills r with a symbol and records it for the legend.
func (l *layout) paint(s symbols.Symbol, r draw.Rect) []draw.Item {
	l.used.add(s)
	return s.Paint(r)
}

// elev writes an elevation in metres in the sheet's unit, with its unit
// left to the axis title.
func (l *layout) elev(m float64) string {
	return strconv.FormatFloat(schema.Length(m).In(l.u), 'f', 1, 64)
}

// lithologyCodes writes each interval's USCS group symbol (or the rock
// class's short name) in the strip of lithology left of the hole, turned
// to run along it, on a white ground so the pattern does not hide it;
// an interval drawn too short for its code goes without (the legend
// still names its pattern).
func (l *layout) lithologyCodes(p *placed, yd func(schema.Length) float64) []draw.Item {
	var items []draw.Item
	strip := (colWidth - holeWidth) / 2
	size := 4.6
	for _, ly := range p.w.Lithology {
		code := ly.USCS
		if code == "" {
			code = symbols.ForLayer(ly).Code
		}
		if code == "" {
			continue
		}
		tw := draw.TextWidth(draw.Bold, size, code)
		y0, y1 := yd(ly.Top), yd(ly.Bottom)
		if y1-y0 < tw+3 {
			continue
		}
		cx, cy := p.x-colWidth/2+strip/2, (y0+y1)/2
		items = append(items,
			draw.Box{Rect: draw.Rect{X: cx - size*0.62, Y: cy - tw/2 - 1, W: size * 1.24, H: tw + 2}, Style: draw.Style{Fill: draw.White}},
			draw.Text{At: draw.Point{X: cx + size*0.36, Y: cy}, S: code, Size: size, Font: draw.Bold, Anchor: draw.Middle, Color: ink, Rotate: 90, Role: "section-uscs:" + p.w.ID},
		)
	}
	return items
}
