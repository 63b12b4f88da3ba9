package main

import (
	"bytes"
	"testing"
)

// TestTextGuard: escape sequences in a well ID reach the terminal as
// visible text; ordinary text, accents and line breaks pass unchanged.
func TestTextGuard(t *testing.T) {
	for in, want := range map[string]string{
		"MW-1: 2 sheets\n":                 "MW-1: 2 sheets\n",
		"Ångström ±µ°\tok":                 "Ångström ±µ°\tok",
		"\x1b]0;pwned\x07\x1b[2J MW-1\r\n": `\x1b]0;pwned\x07\x1b[2J MW-1\x0d` + "\n",
		"C1 \u009b31m":                     `C1 \x9b31m`,
	} {
		var b bytes.Buffer
		n, err := textGuard{&b}.Write([]byte(in))
		if err != nil || n != len(in) || b.String() != want {
			t.Errorf("%q -> %q (%d, %v), want %q", in, b.String(), n, err, want)
		}
	}
}
