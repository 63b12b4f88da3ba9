package project

import (
	"errors"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

func TestSectionsRead(t *testing.T) {
	p, err := Parse(".", "project.toml", []byte(`[project]
name = "x"
units = "m"

[[section]]
name = "A-A'"
wells = ["MW-1", "MW-2"]
bends = [[10.0, 20.0], [30.0, 40.0]]
max_offset = 25.0
water_date = 2026-03-20
`))
	if err != nil {
		t.Fatal(err)
	}
	s, ok := p.Section("a-a'")
	if !ok {
		t.Fatal("section A-A' not found by a case-insensitive name")
	}
	if len(s.Wells) != 2 || s.CoordinateUnit != "m" || s.MaxOffset != schema.LengthFrom(25, schema.Metres) || s.WaterDate.String() != "2026-03-20" || len(s.Bends) != 2 || s.Line != 5 {
		t.Errorf("section = %+v", s)
	}
}

// TestSectionErrorsAll: three mistakes in one file are all reported, each
// with its line.
func TestSectionErrorsAll(t *testing.T) {
	_, err := Parse(".", "project.toml", []byte(`[project]
name = "x"

[[section]]
wells = ["MW-1"]

[[section]]
name = "B"
wells = ["MW-1", "MW-2"]
coordinate_unit = "yards"
`))
	var list schema.ErrorList
	if !errors.As(err, &list) {
		t.Fatalf("err = %v, want an ErrorList", err)
	}
	want := []string{"project.toml:4: [[section]] needs a name", "project.toml:5: a section needs at least two wells", "project.toml:10: coordinate_unit must be"}
	if len(list) != len(want) {
		t.Fatalf("got %d errors: %v", len(list), err)
	}
	for i, w := range want {
		if !strings.HasPrefix(list[i].Error(), w) {
			t.Errorf("error %d = %q, want prefix %q", i, list[i], w)
		}
	}
}
