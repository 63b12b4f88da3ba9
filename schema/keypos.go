package schema

import (
	"strconv"
	"strings"
)

// keyPos is where a key sits in a file: its line and the column its value
// starts at.
type keyPos struct{ line, col, keyCol int }

// scanKeyPositions maps every key path in a TOML text, with array-of-table
// indices ("string[0].section[1].top"), to its position. The TOML library
// keeps positions private, so this light scanner recovers them; it only
// needs to be right for files the parser has already accepted.
func scanKeyPositions(src string) map[string]keyPos {
	out := map[string]keyPos{}
	counts := map[string]int{} // array-table path (with parent indices) -> entries
	current := ""
	lines := strings.Split(src, "\n")
	inMulti := ""
	for i, raw := range lines {
		lineNo := i + 1
		line := raw
		if inMulti != "" {
			if strings.Contains(line, inMulti) {
				inMulti = ""
			}
			continue
		}
		trimmed := strings.TrimSpace(line)
		if trimmed == "" || trimmed[0] == '#' {
			continue
		}
		if strings.HasPrefix(trimmed, "[[") {
			end := strings.Index(trimmed, "]]")
			if end < 0 {
				continue
			}
			name := cleanKey(trimmed[2:end])
			base := resolveTable(name, counts)
			idx := counts[base]
			counts[base] = idx + 1
			current = base + "[" + strconv.Itoa(idx) + "]"
			c := strings.Index(line, "[[") + 1
			out[current] = keyPos{lineNo, c, c}
			continue
		}
		if trimmed[0] == '[' {
			end := strings.Index(trimmed, "]")
			if end < 0 {
				continue
			}
			current = resolveTable(cleanKey(trimmed[1:end]), counts)
			c := strings.Index(line, "[") + 1
			out[current] = keyPos{lineNo, c, c}
			continue
		}
		eq := keyEquals(line)
		if eq < 0 {
			continue
		}
		key := cleanKey(line[:eq])
		path := key
		if current != "" {
			path = current + "." + key
		}
		col := eq + 2
		for col <= len(line) && (line[col-1] == ' ' || line[col-1] == '\t') {
			col++
		}
		keyCol := len(line) - len(strings.TrimLeft(line, " \t")) + 1
		out[path] = keyPos{lineNo, col, keyCol}
		rest := line[eq+1:]
		for _, q := range []string{`"""`, `'''`} {
			if strings.Count(rest, q)%2 == 1 {
				inMulti = q
			}
		}
	}
	return out
}

// resolveTable turns a dotted table name into a path with the current index
// of every array table along it: "string.section" -> "string[1].section".
func resolveTable(name string, counts map[string]int) string {
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
	parts := strings.Split(strings.TrimSpace(k), ".")
	for i, p := range parts {
		p = strings.TrimSpace(p)
		p = strings.Trim(p, `"'`)
		parts[i] = p
	}
	return strings.Join(parts, ".")
}
