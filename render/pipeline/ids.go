package pipeline

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// IDAt is a well's ID where its file gives it.
type IDAt struct {
	File string // as the error should name it
	ID   string
	Line int // of well.id
	// Locate, when set and Line is 0, finds the line: only a duplicate's
	// message needs it, and finding a key's line scans the whole file
	// text, which checking a clean well never does (a tenth of check).
	Locate func() int
}

// line is where x's ID stands.
func (x IDAt) line() int {
	if x.Line == 0 && x.Locate != nil {
		return x.Locate()
	}
	return x.Line
}

// maxOthersNamed is how many other files a duplicate ID's message names.
const maxOthersNamed = 3

// DuplicateIDs gives, for each well whose ID another of the list also
// has (compared without case, as file names are), the input error naming
// each other file and line; nil for a well whose ID is its own. A backup
// copy left beside a well file must not take over its sheets or enter the
// tables twice, and which is the true one is the user's call.
func DuplicateIDs(ids []IDAt) []*schema.Error {
	errs := make([]*schema.Error, len(ids))
	byID := map[string][]int{}
	var order []string
	for i, x := range ids {
		k := strings.ToLower(strings.TrimSpace(x.ID))
		if k == "" {
			continue
		}
		if _, ok := byID[k]; !ok {
			order = append(order, k)
		}
		byID[k] = append(byID[k], i)
	}
	for _, k := range order {
		same := byID[k]
		if len(same) < 2 {
			continue
		}
		for _, i := range same {
			var others []string
			for _, j := range same {
				if j != i {
					others = append(others, fmt.Sprintf("%s:%d", ids[j].File, ids[j].line()))
				}
			}
			// Name a few: many copies would make every message as long
			// as the list of files.
			if n := len(others); n > maxOthersNamed {
				others = append(others[:maxOthersNamed], fmt.Sprintf("%d other files", n-maxOthersNamed))
			}
			errs[i] = &schema.Error{File: ids[i].File, Line: ids[i].line(), Key: "well.id",
				Msg: fmt.Sprintf("well ID %q is also the ID of %s: each well needs its own ID (rename or move the copy)", ids[i].ID, strings.Join(others, ", "))}
		}
	}
	return errs
}

// markDuplicateIDs turns every well sharing its ID with another well of
// the run into an input error (DuplicateIDs); none of them is judged.
func markDuplicateIDs(wells []*Well) {
	var ids []IDAt
	var of []*Well
	for _, w := range wells {
		if w.Err != nil || w.Well == nil {
			continue
		}
		wl := w.Well
		ids = append(ids, IDAt{File: w.Path, ID: wl.ID, Locate: func() int { return wl.Line("well.id") }})
		of = append(of, w)
	}
	for i, e := range DuplicateIDs(ids) {
		if e != nil {
			of[i].Err = schema.ErrorList{e}
			of[i].Well = nil
		}
	}
}
