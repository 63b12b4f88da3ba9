package project

import (
	"strings"
)

// keyLines maps every table header and key of a TOML document to its
// line, for messages about keys the decoder accepted but we reject. It
// understands what a project file needs: [table] headers, bare or quoted
// (possibly dotted) keys, and multi-line strings it must skip over.
func keyLines(data []byte) map[string]int {
	out := map[string]int{}
	table := ""
	inMulti := "" // the closing delimiter of an open multi-line string
	for i, line := range strings.Split(string(data), "\n") {
		n := i + 1
		s := strings.TrimSpace(line)
		if inMulti != "" {
			if strings.Contains(s, inMulti) {
				inMulti = ""
			}
			continue
		}
		if s == "" || s[0] == '#' {
			continue
		}
		if strings.HasPrefix(s, "[") {
			h := strings.Trim(strings.SplitN(s, "#", 2)[0], " \t")
			h = strings.TrimSpace(strings.Trim(h, "[]"))
			table = joinKey(splitKey(h))
			if _, ok := out[table]; !ok {
				out[table] = n
			}
			continue
		}
		eq := strings.IndexByte(s, '=')
		if eq < 0 {
			continue
		}
		key := joinKey(splitKey(strings.TrimSpace(s[:eq])))
		if table != "" {
			key = table + "." + key
		}
		if _, ok := out[key]; !ok {
			out[key] = n
		}
		v := strings.TrimSpace(s[eq+1:])
		for _, d := range []string{`"""`, `'''`} {
			if strings.HasPrefix(v, d) && !strings.Contains(v[3:], d) {
				inMulti = d
			}
		}
	}
	return out
}

// splitKey splits a dotted key, keeping dots inside quotes.
func splitKey(k string) []string {
	var parts []string
	var cur strings.Builder
	quote := byte(0)
	for i := 0; i < len(k); i++ {
		c := k[i]
		switch {
		case quote != 0:
			if c == quote {
				quote = 0
			} else {
				cur.WriteByte(c)
			}
		case c == '"' || c == '\'':
			quote = c
		case c == '.':
			parts = append(parts, strings.TrimSpace(cur.String()))
			cur.Reset()
		default:
			cur.WriteByte(c)
		}
	}
	return append(parts, strings.TrimSpace(cur.String()))
}

func joinKey(parts []string) string { return strings.Join(parts, ".") }
