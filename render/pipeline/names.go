package pipeline

import (
	"fmt"
	"strings"
)

// SafeName makes a well ID a file name that stays in its directory:
// only [A-Za-z0-9._-], runs of other characters made one '-', no leading
// dot or dash, at most 80 bytes; "well" when nothing is left.
func SafeName(id string) string {
	var b strings.Builder
	lastSep := false
	for _, r := range id {
		ok := r < 128 && (r >= 'a' && r <= 'z' || r >= 'A' && r <= 'Z' || r >= '0' && r <= '9' || r == '.' || r == '_' || r == '-')
		if !ok {
			r = '-'
		}
		sep := r == '-' || r == '.'
		if sep && lastSep {
			continue // collapse "..", "-.", "--": no ".." survives
		}
		b.WriteRune(r)
		lastSep = sep
	}
	s := strings.Trim(b.String(), ".-")
	if len(s) > 80 {
		s = strings.TrimRight(s[:80], ".-")
	}
	if s == "" {
		s = "well"
	}
	return s
}

// AssignNames gives each well a unique output base name in input order:
// the first well to claim a name keeps it, later ones get -2, -3, ...
// Names are compared without case, for case-insensitive file systems.
// Wells that could not be read get none.
func AssignNames(wells []*Well) map[*Well]string {
	taken := map[string]bool{}
	out := make(map[*Well]string, len(wells))
	for _, w := range wells {
		if w.Well == nil {
			continue
		}
		base := SafeName(w.Well.ID)
		name := base
		for n := 2; taken[strings.ToLower(name)]; n++ {
			name = fmt.Sprintf("%s-%d", base, n)
		}
		taken[strings.ToLower(name)] = true
		out[w] = name
	}
	return out
}
