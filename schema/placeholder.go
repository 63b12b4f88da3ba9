package schema

import "strings"

// FillMark marks a value of a starter file (tremie new) that is still an
// example: the comment "# FILL" after it. The value is realistic, so the
// file loads, checks and draws; the mark stays until someone replaces the
// value with the real one and deletes it, and rule FILL-IN names each one
// left.
const FillMark = "FILL"

// Placeholder is one value still marked to fill.
type Placeholder struct {
	Path string // key path, e.g. "fill[2].bags"
	Line int
}

// findPlaceholders lists the keys whose line ends in a FILL comment.
func findPlaceholders(src string) []Placeholder {
	if !strings.Contains(src, "# "+FillMark) && !strings.Contains(src, "#"+FillMark) {
		return nil // the common case: a finished file
	}
	marked := map[int]bool{}
	for i, line := range strings.Split(src, "\n") {
		if strings.HasPrefix(strings.TrimSpace(line), "[") {
			continue // a table header, not a value
		}
		if c, ok := commentOf(line); ok && isFillMark(c) {
			marked[i+1] = true
		}
	}
	if len(marked) == 0 {
		return nil
	}
	var out []Placeholder
	scanKeys(src, false, func(path string, p keyPos) {
		if marked[p.line] && !p.implicit {
			out = append(out, Placeholder{Path: path, Line: p.line})
		}
	})
	return out
}

// isFillMark reports whether a comment's text is the FILL mark, alone or
// followed by a space or colon and a hint.
func isFillMark(c string) bool {
	c = strings.TrimSpace(c)
	if !strings.HasPrefix(c, FillMark) {
		return false
	}
	rest := c[len(FillMark):]
	return rest == "" || rest[0] == ' ' || rest[0] == ':' || rest[0] == '\t'
}

// commentOf returns the text after the first # outside a string on one
// line of TOML. Lines in or opening multi-line strings are skipped: the
// mark is written only after single-line values.
func commentOf(line string) (string, bool) {
	if strings.Contains(line, `"""`) || strings.Contains(line, "'''") {
		return "", false
	}
	var quote byte
	for i := 0; i < len(line); i++ {
		c := line[i]
		switch {
		case quote == '"' && c == '\\':
			i++ // skip the escaped character
		case quote != 0 && c == quote:
			quote = 0
		case quote != 0:
		case c == '"' || c == '\'':
			quote = c
		case c == '#':
			return line[i+1:], true
		}
	}
	return "", false
}
