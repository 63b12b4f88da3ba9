package sheet

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// callouts lists every component of the well with its words, one
// callout for what several strings share.
func (l *layout) callouts() []callout { return mergeStrings(l.rawCallouts()) }

// rawCallouts lists every component of the well with its words, part
// by part in reading order (layout.assemble).
func (l *layout) rawCallouts() []callout {
	var cs []callout
	for _, pt := range l.parts {
		cs = append(cs, pt.callouts(l)...)
	}
	return cs
}

// mergeStrings joins the callouts of one part of several strings that
// stand at the same depth and say the same first thing (the measuring
// points of a nested well, say) into one label naming every string. A
// line not all of them share is kept, followed by the strings it is of.
func mergeStrings(cs []callout) []callout {
	var out []callout
	used := make([]bool, len(cs))
	for i, c := range cs {
		if used[i] {
			continue
		}
		if len(c.of) != 1 || len(c.lines) == 0 {
			out = append(out, c)
			continue
		}
		group := []callout{c}
		for j := i + 1; j < len(cs); j++ {
			d := cs[j]
			if !used[j] && len(d.of) == 1 && d.base == c.base && d.iv == c.iv && len(d.lines) > 0 && d.lines[0] == c.lines[0] {
				group = append(group, d)
				used[j] = true
			}
		}
		if len(group) == 1 {
			out = append(out, c)
			continue
		}
		m := c
		m.of = nil
		m.also = nil
		m.lines = nil
		m.minor = map[int]bool{}
		var order []string
		from := map[string][]string{}
		minor := map[string]bool{}
		for _, g := range group {
			m.of = append(m.of, g.of[0])
			if g.key != c.key {
				m.also = append(m.also, g.anchorX)
			}
			for k, s := range g.lines {
				if _, seen := from[s]; !seen {
					order = append(order, s)
				}
				from[s] = append(from[s], g.of[0])
				minor[s] = minor[s] || g.minor[k]
			}
		}
		m.where = 0
		for k, s := range order {
			if k > 0 && s == c.lines[min(c.where, len(c.lines)-1)] {
				m.where = k
			}
			if len(from[s]) < len(group) {
				s += " (" + strings.Join(from[s], ", ") + ")"
			}
			if minor[order[k]] {
				m.minor[len(m.lines)] = true
			}
			m.lines = append(m.lines, s)
		}
		m.title = pluralTitle(c.base) + " — " + strings.Join(m.of, ", ")
		out = append(out, m)
	}
	return out
}

func pluralTitle(s string) string {
	if strings.HasSuffix(s, "s") {
		return s
	}
	return s + "s"
}

func ratioSuffix(r string) string {
	if r == "—" {
		return ""
	}
	return ", " + r + " of calc."
}

func fixed(x float64) func(schema.Length) float64 { return func(schema.Length) float64 { return x } }

func upperFirst(s string) string {
	if s == "" {
		return s
	}
	return strings.ToUpper(s[:1]) + s[1:]
}

// measuringPointPipe finds the pipe whose top is the measuring point: a
// casing index or a string index (the other -1), and whether the file
// named it. With none named it is the first string that reaches the
// surface, else the highest casing; a nested well's other strings are
// measuring points of their own.
func (l *layout) measuringPointPipe() (casing, str int, named bool) {
	w := l.w
	casing, str = -1, -1
	if m := w.MeasuringPoint; m.Pipe != "" {
		for i, c := range w.Casings {
			if c.Name == m.Pipe {
				return i, -1, true
			}
		}
		for i, s := range w.Strings {
			if s.Name == m.Pipe {
				return -1, i, true
			}
		}
	}
	named = w.MeasuringPoint.Height != nil
	for i, s := range w.Strings {
		if s.Liner == nil && len(s.Sections) > 0 {
			return -1, i, named
		}
	}
	for i, c := range w.Casings {
		if casing < 0 || c.Top < w.Casings[casing].Top {
			casing = i
		}
	}
	return casing, -1, named
}

// mpLines describes a measuring point at the top of a pipe.
func (l *layout) mpLines(pipe string, top schema.Length, topCap string) []string {
	var lines []string
	if su := -top; su > 0 {
		lines = append(lines, fmt.Sprintf("top of %s, %s above ground", pipe, l.depth(su)))
	} else {
		lines = append(lines, fmt.Sprintf("top of %s, %s below ground", pipe, l.depth(top)))
	}
	if mp := l.w.Elevation.MeasuringPoint; mp != nil {
		lines = append(lines, strings.TrimSpace(fmt.Sprintf("elev. %s %s", l.depth(*mp), l.w.Elevation.Datum)))
	}
	if topCap != "" {
		lines = append(lines, "cap: "+topCap)
	}
	return lines
}
