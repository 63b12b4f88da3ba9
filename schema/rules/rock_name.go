package rules

import (
	"fmt"

	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&Rule{
		ID:    "ROCK-NAME",
		Title: "Rock names come from the documented list",
		Doc: "A lithology layer's rock key takes one name from the list in FORMAT.md (granite, sandstone, " +
			"saprolite, fill, ...), optionally after a weathering word (\"highly weathered granite\"); the rest of " +
			"the log's words belong in description. A name off the list cannot be drawn with its symbol or judged " +
			"as rock or soil (the open-hole rule): it is reported with the nearest listed name.",
		Severity: Warning,
		Source:   "completeness of the boring log (common practice); weathering words after ISRM (1981) and BS 5930:1999",
		Run:      runRockName,
	})
}

func runRockName(p *Pass) {
	for _, l := range p.Well.Lithology {
		if l.Rock == "" {
			continue
		}
		if _, _, ok := schema.ParseRock(l.Rock); ok {
			continue
		}
		hint := "; see the rock names in FORMAT.md and put other words in description"
		if s := schema.SuggestRock(l.Rock); s != "" {
			hint = fmt.Sprintf(": did you mean %q?%s", s, hint)
		}
		p.Reportf(key(l.Path, "rock"), depths(l.Interval), "rock = %q at %s is not a listed rock name%s", l.Rock, p.span(l.Interval), hint)
	}
}
