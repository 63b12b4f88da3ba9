package pipeline

import (
	"fmt"
	"regexp"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// SafeName is the output base name of a well ID (schema.SafeFileName).
func SafeName(id string) string { return schema.SafeFileName(id) }

// AssignNames gives each well a unique output base name in input order:
// the first well to claim a name keeps it, later ones get -2, -3, ...
// Names are compared without case, for case-insensitive file systems.
// Wells that could not be read get none.
//
// The names a well's outputs derive from its base (BASE-sheet2,
// BASE-features, BASE-features-page3) are reserved too: a well whose own
// name would be one of them, such as a well "TWO-sheet1" beside a well
// "TWO" drawn on two sheets, is given a suffix, so that no two outputs of
// a run can share a file.
func AssignNames(wells []*Well) map[*Well]string {
	taken := map[string]bool{}
	bases := map[string]bool{}
	for _, w := range wells {
		if w.Well != nil {
			bases[strings.ToLower(SafeName(w.Well.ID))] = true
		}
	}
	reserved := func(name string) bool {
		l := strings.ToLower(name)
		if taken[l] {
			return true
		}
		if m := derived.FindStringSubmatch(l); m != nil && bases[m[1]] {
			return true
		}
		return false
	}
	out := make(map[*Well]string, len(wells))
	for _, w := range wells {
		if w.Well == nil {
			continue
		}
		base := SafeName(w.Well.ID)
		name := base
		for n := 2; reserved(name); n++ {
			name = fmt.Sprintf("%s-%d", base, n)
		}
		taken[strings.ToLower(name)] = true
		out[w] = name
	}
	return out
}

// derived matches the output names made from a base name; group 1 is
// the base.
var derived = regexp.MustCompile(`^(.+)-(?:sheet[0-9]+|features(?:-page[0-9]+)?)$`)
