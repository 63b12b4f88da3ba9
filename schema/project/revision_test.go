package project

import (
	"strings"
	"testing"
)

// The issued-set keys: issue = true and a revision history, oldest
// first; a revision without its date is an error naming its line.
func TestIssueAndRevisions(t *testing.T) {
	src := "[project]\nname = \"x\"\nissue = true\n\n[[revision]]\nrev = \"A\"\ndate = 2026-03-02\ndescription = \"Issued for review\"\nby = \"JO\"\n\n[[revision]]\nrev = \"B\"\ndate = 2026-04-10\ndescription = \"Issued for permit\"\n"
	p, err := Parse(t.TempDir(), "project.toml", []byte(src))
	if err != nil {
		t.Fatal(err)
	}
	rs := p.TitleBlock.Revisions
	if !p.Issue || len(rs) != 2 || rs[0].Rev != "A" || rs[0].Date.String() != "2026-03-02" || rs[0].By != "JO" || rs[1].Description != "Issued for permit" {
		t.Errorf("issue %v, revisions %+v", p.Issue, rs)
	}
	_, err = Parse(t.TempDir(), "project.toml", []byte("[project]\nname = \"x\"\n\n[[revision]]\nrev = \"A\"\ndescription = \"no date\"\n"))
	if err == nil || !strings.Contains(err.Error(), "project.toml:4") || !strings.Contains(err.Error(), "needs rev, date and description") {
		t.Errorf("a revision without a date: %v", err)
	}
}
