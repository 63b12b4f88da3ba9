package schema

import (
	"strconv"
	"strings"
)

// keyPos is where a key sits in a file: its line, the column its value
// starts at and the column of its name. implicit marks a table that a
// dotted key makes (extra in "extra.thing = 1"): it sits at that key's
// line, unless a header or an earlier key placed it already.
type keyPos struct {
	line, col, keyCol int
	implicit          bool
}

// scanKeyPositions maps every key path in a TOML text, with array-of-table
// indices ("string[0].section[1].top"), to its position. The TOML library
// keeps positions private, so this light scanner recovers them; it only
// needs to be right for files the parser has already accepted.
func scanKeyPositions(src string) map[string]keyPos {
	out := map[string]keyPos{}
	scanKeys(src, false, func(path string, p keyPos) {
		if !p.implicit {
			out[path] = p
		} else if _, seen := out[path]; !seen {
			out[path] = p
		}
	})
	return out
}

// scanKeyLines is scanKeyPositions with lines only, for Well.Line.
// Columns are needed only to report an error.
func scanKeyLines(src string) map[string]int {
	out := make(map[string]int, strings.Count(src, "=")+8)
	scanKeys(src, false, func(path string, p keyPos) {
		if !p.implicit {
			out[path] = p.line
		} else if _, seen := out[path]; !seen {
			out[path] = p.line
		}
	})
	return out
}

// scanHeaderLines maps the path of every table header ("fill[2]") to its
// line: the positions the loader gives to the parts of a well. It skips
// the work of naming every key.
func scanHeaderLines(src string) map[string]int {
	out := make(map[string]int, strings.Count(src, "\n[")+2)
	scanKeys(src, true, func(path string, p keyPos) { out[path] = p.line })
	return out
}

// scanKeys calls visit for every table header and, unless headersOnly,
// every key of a TOML text, in file order, with its path and position.
func scanKeys(src string, headersOnly bool, visit func(path string, p keyPos)) {
	counts := map[string]int{} // array-table path (with parent indices) -> entries
	current := ""
	inMulti := ""
	lineNo := 0
	var paths pathArena
	if headersOnly {
		paths.Grow(len(src) / 8)
	} else {
		paths.Grow(len(src) + len(src)/2) // the paths of a typical well file fit
	}
	for rest := src; ; {
		var line string
		nl := strings.IndexByte(rest, '\n')
		if nl < 0 {
			line = rest
		} else {
			line, rest = rest[:nl], rest[nl+1:]
		}
		lineNo++
		scanLine(line, lineNo, &current, &inMulti, counts, &paths, headersOnly, visit)
		if nl < 0 {
			return
		}
	}
}

// scanLine handles one line of scanKeys.
func scanLine(line string, lineNo int, current, inMulti *string, counts map[string]int, paths *pathArena, headersOnly bool, visit func(string, keyPos)) {
	if *inMulti != "" {
		if strings.Contains(line, *inMulti) {
			*inMulti = ""
		}
		return
	}
	trimmed := strings.TrimSpace(line)
	if trimmed == "" || trimmed[0] == '#' {
		return
	}
	if strings.HasPrefix(trimmed, "[[") {
		end := strings.Index(trimmed, "]]")
		if end < 0 {
			return
		}
		name := cleanKey(trimmed[2:end])
		base := resolveTable(name, counts)
		idx := counts[base]
		counts[base] = idx + 1
		*current = paths.indexed(base, idx)
		c := strings.Index(line, "[[") + 1
		visit(*current, keyPos{line: lineNo, col: c, keyCol: c + 2 + lastSegment(trimmed[2:end])})
		return
	}
	if trimmed[0] == '[' {
		end := strings.IndexByte(trimmed, ']')
		if end < 0 {
			return
		}
		*current = resolveTable(cleanKey(trimmed[1:end]), counts)
		c := strings.IndexByte(line, '[') + 1
		visit(*current, keyPos{line: lineNo, col: c, keyCol: c + 1 + lastSegment(trimmed[1:end])})
		return
	}
	if headersOnly && !strings.Contains(line, `"""`) && !strings.Contains(line, `'''`) {
		return // a key line that opens no multi-line string changes nothing
	}
	eq := keyEquals(line)
	if eq < 0 {
		return
	}
	if !headersOnly {
		visitKey(line, lineNo, eq, *current, paths, visit)
	}
	value := line[eq+1:]
	if strings.Contains(value, `"""`) || strings.Contains(value, `'''`) {
		for _, q := range []string{`"""`, `'''`} {
			if strings.Count(value, q)%2 == 1 {
				*inMulti = q
			}
		}
	}
}

// visitKey names the key of a key/value line whose '=' is at eq.
func visitKey(line string, lineNo, eq int, current string, paths *pathArena, visit func(string, keyPos)) {
	key := cleanKey(line[:eq])
	path := key
	if current != "" {
		path = paths.join(current, key)
	}
	col := eq + 2
	for col <= len(line) && (line[col-1] == ' ' || line[col-1] == '\t') {
		col++
	}
	keyCol := len(line) - len(strings.TrimLeft(line, " \t")) + 1
	if strings.IndexByte(key, '.') >= 0 {
		// extra.thing = 1: the tables it opens are at this line, each
		// named at its own segment, and the key at its last
		starts := segmentStarts(line[:eq])
		if len(starts) > 0 {
			keyCol = starts[len(starts)-1] + 1
		}
		parts := strings.Split(key, ".")
		prefix := current
		for i, p := range parts[:len(parts)-1] {
			if prefix == "" {
				prefix = p
			} else {
				prefix = paths.join(prefix, p)
			}
			if i < len(starts) {
				visit(prefix, keyPos{line: lineNo, col: starts[i] + 1, keyCol: starts[i] + 1, implicit: true})
			}
		}
	}
	visit(path, keyPos{line: lineNo, col: col, keyCol: keyCol})
}

// segmentStarts gives the offset where each segment of a dotted key
// starts (its first character after any blank), quotes respected:
// ` a . "b.c"` gives 1 and 5.
func segmentStarts(raw string) []int {
	var out []int
	quote := byte(0)
	want := true // looking for the next segment's first character
	for i := 0; i < len(raw); i++ {
		c := raw[i]
		switch {
		case quote != 0:
			if c == quote {
				quote = 0
			}
			continue
		case c == ' ' || c == '\t':
			continue
		case c == '.':
			want = true
			continue
		}
		if want {
			out = append(out, i)
			want = false
		}
		if c == '"' || c == '\'' {
			quote = c
		}
	}
	return out
}

// lastSegment is the offset of a dotted name's last segment within it
// (" string . sectoin " gives 10), where an unknown table is named.
func lastSegment(raw string) int {
	starts := segmentStarts(raw)
	if len(starts) == 0 {
		return 0
	}
	return starts[len(starts)-1]
}

// pathArena builds the key paths of one file in a single growing buffer:
// each path is a slice of the buffer's string, so a file's few hundred
// paths cost a few allocations rather than one each. A strings.Builder
// only ever appends, so a string taken from it never changes.
type pathArena struct{ strings.Builder }

// join returns table + "." + key.
func (a *pathArena) join(table, key string) string {
	start := a.Len()
	a.WriteString(table)
	a.WriteByte('.')
	a.WriteString(key)
	return a.String()[start:]
}

// indexed returns base + "[" + i + "]".
func (a *pathArena) indexed(base string, i int) string {
	start := a.Len()
	a.WriteString(base)
	a.WriteByte('[')
	a.WriteString(strconv.Itoa(i))
	a.WriteByte(']')
	return a.String()[start:]
}

// resolveTable turns a dotted table name into a path with the current index
// of every array table along it: "string.section" -> "string[1].section".
func resolveTable(name string, counts map[string]int) string {
	if strings.IndexByte(name, '.') < 0 {
		return name // a top-level table has no parent to index
	}
	parts := strings.Split(name, ".")
	path := ""
	for i, p := range parts {
		if path != "" {
			path += "."
		}
		path += p
		if i < len(parts)-1 {
			if n, ok := counts[path]; ok && n > 0 {
				path += "[" + strconv.Itoa(n-1) + "]"
			}
		}
	}
	return path
}

// keyEquals finds the '=' of a key/value line outside quotes, or -1.
func keyEquals(line string) int {
	quote := byte(0)
	for i := 0; i < len(line); i++ {
		c := line[i]
		switch {
		case quote != 0:
			if c == quote {
				quote = 0
			}
		case c == '"' || c == '\'':
			quote = c
		case c == '=':
			return i
		case c == '#':
			return -1
		}
	}
	return -1
}

func cleanKey(k string) string {
	k = strings.TrimSpace(k)
	if strings.IndexAny(k, `."'`) < 0 {
		return k // a bare key: nothing to split or unquote
	}
	parts := strings.Split(k, ".")
	for i, p := range parts {
		p = strings.TrimSpace(p)
		p = strings.Trim(p, `"'`)
		parts[i] = p
	}
	return strings.Join(parts, ".")
}

// Position is where a key of a TOML document sits: its line, and the
// column its value starts at (1-based).
type Position struct{ Line, Col int }

// KeyPositions maps every table header and key path of a TOML document
// ("rule.SEAL-THICKNESS.min", "fill[2].top") to its position, for the
// other TOML files tremie reads (rule profiles, project files), whose
// messages must name a line as the well loader's do.
func KeyPositions(src string) map[string]Position {
	out := map[string]Position{}
	scanKeys(src, false, func(path string, p keyPos) {
		if _, seen := out[path]; !seen {
			out[path] = Position{Line: p.line, Col: p.col}
		}
	})
	return out
}

// KeyLines is KeyPositions with lines only, for messages that name a line.
func KeyLines(src string) map[string]int {
	return scanKeyLines(src)
}
