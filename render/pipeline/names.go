package pipeline

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// SafeName is the output base name of a well ID (schema.SafeFileName).
func SafeName(id string) string { return schema.SafeFileName(id) }

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
