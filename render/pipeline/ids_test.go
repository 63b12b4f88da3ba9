package pipeline

import (
	"fmt"
	"strings"
	"testing"
)

// TestDuplicateIDsNameAFewOthers: wells sharing an ID (without case) each
// get an error naming the others, at most three with a count of the rest,
// so that many copies do not make every message a list of every file; a
// well with its own ID gets none.
func TestDuplicateIDsNameAFewOthers(t *testing.T) {
	ids := []IDAt{{File: "own.toml", ID: "PW-1", Line: 3}, {File: "a.toml", ID: "MW-1", Line: 8}, {File: "b.toml", ID: "mw-1 ", Line: 9}}
	errs := DuplicateIDs(ids)
	if errs[0] != nil {
		t.Errorf("a well with its own ID: %v", errs[0])
	}
	if errs[1] == nil || !strings.Contains(errs[1].Error(), `a.toml:8: well ID "MW-1" is also the ID of b.toml:9:`) {
		t.Errorf("first copy: %v", errs[1])
	}
	if errs[2] == nil || !strings.Contains(errs[2].Error(), "is also the ID of a.toml:8:") {
		t.Errorf("second copy: %v", errs[2])
	}
	ids = nil
	for i := range 10 {
		ids = append(ids, IDAt{File: fmt.Sprintf("w%d.toml", i), ID: "FX-1", Line: 7})
	}
	for i, e := range DuplicateIDs(ids) {
		msg := e.Error()
		if strings.Count(msg, ".toml:7") != 4 || !strings.Contains(msg, ", 6 other files:") {
			t.Errorf("copy %d: %s", i, msg)
		}
	}
}

// TestDuplicateIDsLocateOnlyDuplicates: a well's ID line is looked for
// only when its ID is shared (finding a key's line scans the file; check
// on 1,000 clean wells spent a tenth of its time so), and then named.
func TestDuplicateIDsLocateOnlyDuplicates(t *testing.T) {
	calls := map[string]int{}
	at := func(file, id string, line int) IDAt {
		return IDAt{File: file, ID: id, Locate: func() int { calls[file]++; return line }}
	}
	errs := DuplicateIDs([]IDAt{at("own.toml", "PW-1", 3), at("a.toml", "MW-1", 8), at("b.toml", "MW-1", 9)})
	if calls["own.toml"] != 0 {
		t.Errorf("the line of a well with its own ID was looked for %d times", calls["own.toml"])
	}
	if errs[1] == nil || errs[1].Line != 8 || !strings.Contains(errs[1].Msg, "b.toml:9") {
		t.Errorf("a.toml: %v", errs[1])
	}
}
