package sheet

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// waterPart is one water-level reading, an inverted triangle in the
// bore: the first-encountered mark for water met while drilling, the
// level mark for static and pumping readings (the callout names which).
type waterPart struct{ i int }

func (waterPart) stack() stack { return on(layerWater) }

func (wp waterPart) extent(l *layout) (schema.Interval, bool) {
	return at(l.w.WaterLevels[wp.i].Depth), true
}

func (wp waterPart) symbol(l *layout) symbol {
	if l.w.WaterLevels[wp.i].Kind == schema.FirstEncountered {
		return partSymbol(symbols.FirstWater)
	}
	return partSymbol(symbols.WaterLevel)
}

func (wp waterPart) legend(l *layout, v window) []symbol {
	if !v.showsAt(l.w.WaterLevels[wp.i].Depth) {
		return nil
	}
	return []symbol{wp.symbol(l)}
}

// x is the mark's centre: on the axis of the string the level was
// measured in (a nested well's strings each have their own head), else
// of the first string; readings of one string set apart by a few points.
func (wp waterPart) x(l *layout) float64 {
	x := l.hz.cx
	si := wp.stringIndex(l)
	if si < len(l.hz.strX) {
		x = l.hz.strX[si]
	}
	name := l.w.WaterLevels[wp.i].String
	k, n := 0, 0
	for i, o := range l.w.WaterLevels {
		if o.String == name {
			n++
			if i < wp.i {
				k++
			}
		}
	}
	if name != "" && n == 1 {
		return x // a string's one reading stands on its axis, in its pipe
	}
	return x + float64(k%3-1)*3.5
}

// stringIndex is the index of the string the level names, 0 for a level
// of the whole hole.
func (wp waterPart) stringIndex(l *layout) int {
	if name := l.w.WaterLevels[wp.i].String; name != "" {
		for si, s := range l.w.Strings {
			if s.Name == name {
				return si
			}
		}
	}
	return 0
}

func (wp waterPart) paint(p *painter) []draw.Item {
	wl := p.l.w.WaterLevels[wp.i]
	if !p.visible(wl.Depth) {
		return nil
	}
	y := p.y(wl.Depth)
	xi := wp.x(p.l)
	mark := draw.Rect{X: xi - 4, Y: y - 4, W: 8, H: 8} // the table's mark has its apex at the box's centre
	items := []draw.Item{box(mark, draw.Color{}, 0, draw.Color{}, "water:"+pathOr(wl.Path, "water_level", wp.i))}
	return append(items, wp.symbol(p.l).paint(mark)...)
}

func (wp waterPart) callouts(l *layout) []callout {
	w := l.w
	wl := w.WaterLevels[wp.i]
	title := map[schema.LevelKind]string{schema.FirstEncountered: "Water first encountered", schema.Pumping: "Pumping water level"}[wl.Kind]
	if title == "" {
		title = "Static water level"
	}
	if wl.String != "" && len(w.Strings) > 1 {
		title += " — " + wl.String // which head, in a nested well
	}
	line := l.depth(wl.Depth) + " below ground"
	if wl.Reference == schema.FromMeasuringPoint {
		line += fmt.Sprintf(" (%s below MP)", l.depth(wl.Written))
	}
	lines := []string{line}
	if g := w.Elevation.Ground; g != nil {
		lines = append(lines, strings.TrimSpace(fmt.Sprintf("elev. %s %s", l.depth(*g-wl.Depth), w.Elevation.Datum)))
	}
	if !wl.Measured.IsZero() {
		if wl.HasTime {
			lines = append(lines, wl.Measured.Format("2006-01-02 15:04"))
		} else {
			lines = append(lines, wl.Measured.Format("2006-01-02"))
		}
	}
	return []callout{{key: "water:" + pathOr(wl.Path, "water_level", wp.i), iv: schema.Interval{Top: wl.Depth, Bottom: wl.Depth}, anchorX: fixed(wp.x(l) + 3.5), title: title, lines: lines, rank: 8}}
}
