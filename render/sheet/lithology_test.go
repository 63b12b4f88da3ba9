package sheet

import (
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// TestRockAbbrevReadsWeathering: the USCS column's rock label marks
// weathered rock with a lower-case w however the file says it, as the
// words FORMAT.md admits before the name ("highly weathered granite" once
// gave "HGHL", "fresh granite" "FRSH") or as a weathering grade (a grade
// IV gneiss, drawn as weathered rock, once read "GNSS" like the fresh
// gneiss below it); the notes explain each label once. Grades after ISRM
// (1981) and BS 5930:1999, as schema.Weathering.
func TestRockAbbrevReadsWeathering(t *testing.T) {
	for _, c := range []struct {
		rock  string
		grade schema.Weathering
		want  string
	}{
		{"granite", "", "GRNT"},
		{"gneiss", "", "GNSS"},
		{"sandstone", "", "SNDS"},
		{"weathered gneiss", "", "wGNS"},
		{"highly weathered granite", "", "wGRN"},
		{"decomposed granite", "", "wGRN"},
		{"fresh granite", "", "GRNT"},
		{"Granite", schema.HighlyWeathered, "wGRN"},
		{"gneiss", schema.SlightlyWeathered, "wGNS"},
		{"gneiss", schema.Fresh, "GNSS"},
		{"weathered gneiss", schema.Fresh, "GNSS"}, // the grade, when given, is the record
		{"residual soil", "", "RSDL"},
	} {
		if got := rockAbbrev(schema.Layer{Rock: c.rock, Weathering: c.grade}); got != c.want {
			t.Errorf("rock %q, weathering %q: %q, want %q", c.rock, c.grade, got, c.want)
		}
	}
	l := &layout{w: &schema.Well{Lithology: []schema.Layer{
		{Rock: "granite", Weathering: schema.HighlyWeathered},
		{Rock: "highly weathered granite"},
		{Rock: "granite"},
		{USCS: "SM"},
		{Rock: "Granite"},
	}}}
	if got, want := l.rockKey(), "USCS column, rocks (our abbreviations): wGRN weathered granite; GRNT granite."; got != want {
		t.Errorf("rockKey: %q, want %q", got, want)
	}
}

// TestThinRockLayerNamesItsLabel: a rock layer too thin for its label in
// the USCS column carries the label before its description, as a thin
// soil layer carries its group symbol, so that the notes' key of rock
// labels names something the sheet shows.
func TestThinRockLayerNamesItsLabel(t *testing.T) {
	w := simpleWell(40)
	w.Lithology = []schema.Layer{
		{Interval: schema.Interval{Top: 0, Bottom: ft(30)}, USCS: "SM", Description: "Silty SAND", Path: "lithology[0]"},
		{Interval: schema.Interval{Top: ft(30), Bottom: ft(30.5)}, Rock: "granite", Weathering: schema.HighlyWeathered, Description: "GRANITE, grus", Path: "lithology[1]"},
		{Interval: schema.Interval{Top: ft(30.5), Bottom: ft(40)}, Rock: "granite", Description: "GRANITE, fresh", Path: "lithology[2]"},
	}
	doc := layoutOf(t, w, Inputs{}, Options{})
	var all string
	for _, p := range doc.Pages {
		all += strings.Join(texts(p, "description"), "\n") + "\n" + strings.Join(texts(p, "uscs:"), "\n") + "\n"
	}
	if !strings.Contains(all, "wGRN: GRANITE, grus") {
		t.Errorf("the thin weathered layer's description lacks its label:\n%s", all)
	}
	if !strings.Contains(all, "GRNT") || strings.Contains(all, "GRNT: ") {
		t.Errorf("the thick layer's label should stand in the column, not before its text:\n%s", all)
	}
}
