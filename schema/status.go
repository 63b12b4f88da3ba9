package schema

import "strings"

// IsPlanned reports whether the file describes a design rather than a
// well as built: its status says planned (or proposed).
func (w *Well) IsPlanned() bool {
	s := strings.TrimSpace(w.Status)
	return strings.EqualFold(s, "planned") || strings.EqualFold(s, "proposed")
}
