package pipeline

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// markDuplicateIDs turns every well whose ID another well of the run
// also has (compared without case, as file names are) into an input
// error naming each file and line: a backup copy left beside a well file
// must not take over its sheets or enter the tables twice. None of them
// is judged, since which is the true one is the user's call.
func markDuplicateIDs(wells []*Well) {
	byID := map[string][]*Well{}
	var order []string
	for _, w := range wells {
		if w.Err != nil || w.Well == nil {
			continue
		}
		k := strings.ToLower(strings.TrimSpace(w.Well.ID))
		if k == "" {
			continue
		}
		if _, ok := byID[k]; !ok {
			order = append(order, k)
		}
		byID[k] = append(byID[k], w)
	}
	for _, k := range order {
		same := byID[k]
		if len(same) < 2 {
			continue
		}
		lines := make([]int, len(same))
		for i, w := range same {
			lines[i] = w.Well.Line("well.id")
		}
		for i, w := range same {
			var others []string
			for j, o := range same {
				if j != i {
					others = append(others, fmt.Sprintf("%s:%d", o.Path, lines[j]))
				}
			}
			w.Err = schema.ErrorList{&schema.Error{File: w.Path, Line: lines[i], Key: "well.id",
				Msg: fmt.Sprintf("well ID %q is also the ID of %s: each well needs its own ID (rename or move the copy)", w.Well.ID, strings.Join(others, ", "))}}
			w.Well = nil
		}
	}
}
