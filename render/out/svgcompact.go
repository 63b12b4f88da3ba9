package out

import (
	"bytes"
	"strconv"
)

// compactSVG shortens canvas's SVG without changing what it draws:
//   - a text whose one tspan repeats the text's own position loses the
//     tspan;
//   - a style written on two or more elements becomes a class, defined
//     once in a <style> element (a sheet repeats a handful of styles on
//     hundreds of elements).
//
// It leaves a document alone that already uses classes.
func compactSVG(b []byte) []byte {
	if bytes.Contains(b, []byte(` class="`)) {
		return b
	}
	b = dropLoneTspans(b)
	count := map[string]int{}
	var order []string
	eachStyle(b, func(_, _ int, v []byte) {
		st := string(v)
		if count[st] == 0 {
			order = append(order, st)
		}
		count[st]++
	})
	class := map[string]string{}
	var css []byte
	for _, st := range order {
		if count[st] < 2 || bytes.ContainsAny([]byte(st), "{}<>&") {
			continue
		}
		name := "s" + strconv.FormatInt(int64(len(class)), 36)
		class[st] = name
		css = append(css, '.')
		css = append(css, name...)
		css = append(css, '{')
		css = append(css, st...)
		css = append(css, '}')
	}
	if len(class) == 0 {
		return b
	}
	var classed []byte
	last := 0
	eachStyle(b, func(from, to int, v []byte) {
		name, ok := class[string(v)]
		if !ok {
			return
		}
		classed = append(classed, b[last:from]...)
		classed = append(classed, ` class="`...)
		classed = append(classed, name...)
		classed = append(classed, '"')
		last = to
	})
	b = append(classed, b[last:]...)
	at := bytes.IndexByte(b, '>')
	if at < 0 {
		return b
	}
	out := make([]byte, 0, len(b)+len(css)+16)
	out = append(out, b[:at+1]...)
	out = append(out, "<style>"...)
	out = append(out, css...)
	out = append(out, "</style>"...)
	return append(out, b[at+1:]...)
}

// The scans below stand for two regular expressions, match for match,
// at a fraction of their time (they were a sixth of a batch's):
//
//	` style="([^"]*)"`
//	`<text x="([^"]*)" y="([^"]*)"([^>]*)><tspan x="([^"]*)" y="([^"]*)">([^<]*)</tspan></text>`

// eachStyle calls fn for every style attribute of b, in order, with the
// attribute's span b[from:to] and its value.
func eachStyle(b []byte, fn func(from, to int, v []byte)) {
	const open = ` style="`
	for i := 0; ; {
		at := bytes.Index(b[i:], []byte(open))
		if at < 0 {
			return
		}
		from := i + at
		vs := from + len(open)
		n := bytes.IndexByte(b[vs:], '"')
		if n < 0 {
			return
		}
		fn(from, vs+n+1, b[vs:vs+n])
		i = vs + n + 1
	}
}

// dropLoneTspans rewrites <text x="X" y="Y" A><tspan x="X" y="Y">T</tspan></text>
// as <text x="X" y="Y" A>T</text>; a tspan elsewhere stays.
func dropLoneTspans(b []byte) []byte {
	var out []byte
	last := 0
	for i := 0; ; {
		at := bytes.Index(b[i:], []byte(`<text x="`))
		if at < 0 {
			break
		}
		from := i + at
		end, keep, ok := loneTspan(b, from)
		if !ok {
			i = from + 1
			continue
		}
		out = append(out, b[last:from]...)
		out = append(out, keep...)
		last, i = end, end
	}
	if out == nil {
		return b
	}
	return append(out, b[last:]...)
}

// loneTspan matches the text element at b[from:], returning where it ends
// and what replaces it (itself when its tspan moves it).
func loneTspan(b []byte, from int) (end int, keep []byte, ok bool) {
	p := from
	lit := func(s string) bool {
		if !bytes.HasPrefix(b[p:], []byte(s)) {
			return false
		}
		p += len(s)
		return true
	}
	upTo := func(stop byte) ([]byte, bool) {
		n := bytes.IndexByte(b[p:], stop)
		if n < 0 {
			return nil, false
		}
		v := b[p : p+n]
		p += n
		return v, true
	}
	var x, y, attrs, x2, y2, text []byte
	if !lit(`<text x="`) {
		return 0, nil, false
	}
	if x, ok = upTo('"'); !ok || !lit(`" y="`) {
		return 0, nil, false
	}
	if y, ok = upTo('"'); !ok || !lit(`"`) {
		return 0, nil, false
	}
	if attrs, ok = upTo('>'); !ok || !lit(`><tspan x="`) {
		return 0, nil, false
	}
	if x2, ok = upTo('"'); !ok || !lit(`" y="`) {
		return 0, nil, false
	}
	if y2, ok = upTo('"'); !ok || !lit(`">`) {
		return 0, nil, false
	}
	if text, ok = upTo('<'); !ok || !lit(`</tspan></text>`) {
		return 0, nil, false
	}
	if !bytes.Equal(x, x2) || !bytes.Equal(y, y2) {
		return p, b[from:p], true
	}
	keep = make([]byte, 0, p-from)
	keep = append(keep, `<text x="`...)
	keep = append(keep, x...)
	keep = append(keep, `" y="`...)
	keep = append(keep, y...)
	keep = append(keep, '"')
	keep = append(keep, attrs...)
	keep = append(keep, '>')
	keep = append(keep, text...)
	return p, append(keep, "</text>"...), true
}
