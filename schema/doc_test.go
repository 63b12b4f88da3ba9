package schema

import (
	"strings"
	"testing"
)

// Suggest names a known word one or two keystrokes away, and nothing
// farther. Two neighbouring letters swapped count as one slip: Damerau
// (Communications of the ACM 7(3), 1964; from memory) found most
// misspellings to be one letter inserted, deleted, changed or swapped
// with its neighbour.
func TestSuggest(t *testing.T) {
	known := []string{"top", "bottom", "material", "within", "gradation", "bag_mass"}
	for _, c := range []struct{ word, want string }{
		{"botom", "bottom"},       // one deletion
		{"Bottom", "bottom"},      // case
		{"tpo", "top"},            // neighbours swapped: one slip
		{"pot", ""},               // two letters changed; a 3-letter word allows 1
		{"materail", "material"},  // transposition in a long word
		{"gradaton", "gradation"}, // one deletion
		{"bagmass", "bag_mass"},
		{"colour", ""}, // nothing close
		{"wihtin", "within"},
	} {
		if got := Suggest(c.word, known); got != c.want {
			t.Errorf("Suggest(%q) = %q, want %q", c.word, got, c.want)
		}
	}
}

// An unknown table of a well file gets "did you mean" and the usage hint
// lists the tables the file takes.
func TestUnknownTableDidYouMean(t *testing.T) {
	src := "[units]\ndepth = \"m\"\n[well]\nid = \"X\"\npurpose = \"monitoring\"\ntotal_depth = 10.0\n[[borehole]]\ntop = 0.0\nbottom = 10.0\ndiameter = 150\n\n[[fil]]\ntop = 0.0\n"
	_, err := Load("x.toml", []byte(src))
	list := Errors("x.toml", err)
	if len(list) != 1 || list[0].Error() != `x.toml:12:3: unknown key "fil" at top level (did you mean "fill"?)` {
		t.Fatalf("got %v", err)
	}
	if !strings.Contains(list[0].Hint, "borehole") || !strings.Contains(err.Error(), "\n\tthe file takes: ") {
		t.Errorf("hint %q", list[0].Hint)
	}
}
