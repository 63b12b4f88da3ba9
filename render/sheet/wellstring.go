package sheet

import (
	"fmt"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// stringPart is one well string on its own axis: its risers and screens,
// its top and bottom caps, and their labels with the measuring point's
// (a nested well's other strings are measuring points of their own).
// Its centralizers are a part of their own.
type stringPart struct {
	si      int
	mp      bool // the measuring point is on its top
	mpNamed bool // the file states the measuring point's height
}

func (stringPart) stack() stack { return on(layerString) }

func (sp stringPart) extent(l *layout) (schema.Interval, bool) {
	var ivs []schema.Interval
	for _, sec := range l.w.Strings[sp.si].Sections {
		ivs = append(ivs, sec.Interval)
	}
	return hull(ivs...)
}

func (sp stringPart) legend(l *layout, v window) []symbol {
	s := l.w.Strings[sp.si]
	var out []symbol
	for k := range s.Sections {
		if sec := &s.Sections[k]; v.shows(sec.Top, sec.Bottom) {
			out = append(out, pipeSymbols(sec)...)
		}
	}
	if n := len(s.Sections); n > 0 && (s.TopCap != "" && v.showsAt(s.Sections[0].Top) || s.BottomCap != "" && v.showsAt(s.Sections[n-1].Bottom)) {
		out = append(out, partSymbol(symbols.Cap))
	}
	return out
}

func (sp stringPart) paint(p *painter) []draw.Item {
	s := p.l.w.Strings[sp.si]
	x := p.l.hz.strX[sp.si]
	var items []draw.Item
	for k := range s.Sections {
		sec := &s.Sections[k]
		items = append(items, p.pipe(string(sec.Kind)+":"+s.Label()+fmt.Sprintf("[%d]", k), x, sec.Interval, sec.Pipe, sec)...)
	}
	return append(items, p.caps(s, x)...)
}

// caps paints a string's top cap and bottom cap.
func (p *painter) caps(s schema.String, x float64) []draw.Item {
	if len(s.Sections) == 0 {
		return nil
	}
	var items []draw.Item
	h := p.l.hz
	top, bot := s.Sections[0], s.Sections[len(s.Sections)-1]
	capSym := partSymbol(symbols.Cap)
	rt := float64(od(top.Pipe)) / 2 * h.ppmm
	if s.TopCap != "" && p.visible(top.Top) {
		y := p.y(top.Top)
		r := draw.Rect{X: x - rt - 0.8, Y: y - 2.8, W: 2*rt + 1.6, H: 2.8}
		items = append(items, box(r, draw.Color{}, 0, draw.Color{}, "topcap:"+s.Label()))
		items = append(items, capSym.paint(r)...)
	}
	rb := float64(od(bot.Pipe)) / 2 * h.ppmm
	if s.BottomCap != "" && p.visible(bot.Bottom) {
		y := p.y(bot.Bottom)
		r := draw.Rect{X: x - rb, Y: y - 3, W: 2 * rb, H: 3}
		items = append(items, box(r, draw.Color{}, 0, draw.Color{}, "bottomcap:"+s.Label()))
		items = append(items, capSym.paint(r)...)
	}
	return items
}

// ofSuffix is what a string's labels add to their titles when the well
// has several strings: " — NAME".
func ofSuffix(l *layout, s schema.String) string {
	if len(l.w.Strings) > 1 {
		return " — " + s.Label()
	}
	return ""
}

func (sp stringPart) callouts(l *layout) []callout {
	w := l.w
	h := l.hz
	si, s := sp.si, w.Strings[sp.si]
	x := h.strX[si]
	named := len(w.Strings) > 1
	suffix := ofSuffix(l, s)
	var cs []callout
	add := func(c callout) { cs = append(cs, c) }
	if len(s.Sections) > 0 && s.Liner == nil {
		top := s.Sections[0]
		rt := float64(od(top.Pipe)) / 2 * h.ppmm
		lines := l.mpLines("riser", top.Top, s.TopCap)
		if !sp.mp && w.Elevation.MeasuringPoint != nil {
			lines = lines[:1]
			if s.TopCap != "" {
				lines = append(lines, "cap: "+s.TopCap)
			}
		}
		title := "Measuring point"
		if sp.mpNamed && !sp.mp {
			title = "Top of riser"
		}
		add(callout{key: "mp:" + s.Label(), iv: schema.Interval{Top: top.Top, Bottom: top.Top}, anchorX: fixed(x + rt), title: title + suffix, lines: lines, rank: 3,
			base: title, of: ofString(named, s)})
	}
	for k, sec := range s.Sections {
		r := float64(od(sec.Pipe)) / 2 * h.ppmm
		role := string(sec.Kind) + ":" + s.Label() + fmt.Sprintf("[%d]", k)
		var lines []string
		var minor map[int]bool
		switch sec.Kind {
		case schema.ScreenSection:
			t := string(sec.ScreenType)
			if t == "" {
				t = string(schema.Slotted)
			}
			lines = []string{l.pipeSpec(sec.Pipe), l.slot(sec) + ", " + t, l.interval(sec.Interval)}
		default:
			lines = []string{l.pipeLine(sec.Pipe), l.pipeSizes(sec.Pipe), l.interval(sec.Interval)}
			minor = map[int]bool{1: true}
		}
		add(callout{key: role, iv: sec.Interval, anchorX: fixed(x + r), title: upperFirst(string(sec.Kind)) + suffix, lines: lines, minor: minor, where: 2, rank: 4,
			base: upperFirst(string(sec.Kind)), of: ofString(named, s)})
	}
	if s.BottomCap != "" && len(s.Sections) > 0 {
		b := s.Sections[len(s.Sections)-1]
		r := float64(od(b.Pipe)) / 2 * h.ppmm
		add(callout{key: "bottomcap:" + s.Label(), iv: schema.Interval{Top: b.Bottom, Bottom: b.Bottom}, anchorX: fixed(x + r), title: "Bottom cap" + suffix,
			lines: []string{s.BottomCap + " at " + l.depth(b.Bottom)}, rank: 5, base: "Bottom cap", of: ofString(named, s)})
	}
	return cs
}

func ofString(named bool, s schema.String) []string {
	if !named {
		return nil
	}
	return []string{s.Label()}
}
