package schema

import "strings"

// SafeFileName makes a well ID a file name that stays in its directory: only
// [A-Za-z0-9._-], runs of other characters one '-', no leading dot or
// dash, at most 80 bytes; "well" when nothing is left.
func SafeFileName(id string) string {
	var b strings.Builder
	lastSep := false
	for _, r := range id {
		ok := r < 128 && (r >= 'a' && r <= 'z' || r >= 'A' && r <= 'Z' || r >= '0' && r <= '9' || r == '.' || r == '_' || r == '-')
		if !ok {
			r = '-'
		}
		sep := r == '-' || r == '.'
		if sep && lastSep {
			continue
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
