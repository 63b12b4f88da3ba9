package out

import (
	"bytes"
	"regexp"
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
	b = loneTspanRE.ReplaceAllFunc(b, func(m []byte) []byte {
		s := loneTspanRE.FindSubmatch(m)
		if !bytes.Equal(s[1], s[4]) || !bytes.Equal(s[2], s[5]) {
			return m
		}
		out := make([]byte, 0, len(m))
		out = append(out, `<text x="`...)
		out = append(out, s[1]...)
		out = append(out, `" y="`...)
		out = append(out, s[2]...)
		out = append(out, '"')
		out = append(out, s[3]...)
		out = append(out, '>')
		out = append(out, s[6]...)
		return append(out, "</text>"...)
	})
	count := map[string]int{}
	var order []string
	for _, m := range styleAttrRE.FindAllSubmatch(b, -1) {
		st := string(m[1])
		if count[st] == 0 {
			order = append(order, st)
		}
		count[st]++
	}
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
	b = styleAttrRE.ReplaceAllFunc(b, func(m []byte) []byte {
		name, ok := class[string(m[len(` style="`):len(m)-1])]
		if !ok {
			return m
		}
		return []byte(` class="` + name + `"`)
	})
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

var (
	styleAttrRE = regexp.MustCompile(` style="([^"]*)"`)
	loneTspanRE = regexp.MustCompile(`<text x="([^"]*)" y="([^"]*)"([^>]*)><tspan x="([^"]*)" y="([^"]*)">([^<]*)</tspan></text>`)
)
