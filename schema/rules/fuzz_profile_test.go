package rules

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// FuzzParseProfile: no rule profile makes the loader panic; a rejected
// one names the file.
func FuzzParseProfile(f *testing.F) {
	paths, _ := filepath.Glob("testdata/profiles/*.toml")
	for _, p := range paths {
		if b, err := os.ReadFile(p); err == nil {
			f.Add(b)
		}
	}
	f.Add([]byte("[profile]\nname = \"county\"\n[thresholds]\n\"SEAL-THICKNESS\".min = 3.0\n"))
	f.Add([]byte("x = " + strings.Repeat("[", 500) + strings.Repeat("]", 500)))
	// Issue 15: nesting 10,000 and 100,000 deep, a broken and an empty file.
	for _, deep := range []int{10000, 100000} {
		f.Add([]byte("x = " + strings.Repeat("{a=", deep) + "1" + strings.Repeat("}", deep)))
		f.Add([]byte("x = " + strings.Repeat("[", deep) + strings.Repeat("]", deep)))
	}
	f.Add([]byte("[profile]\nname = = 1\n"))
	f.Add([]byte{})
	f.Add([]byte("[profile]\nname = \"county \U0001F6B0\"\nextra.thing = 1\n"))
	f.Fuzz(func(t *testing.T, data []byte) {
		p, err := ParseProfile("p.toml", data)
		if err == nil && p == nil {
			t.Fatal("nil profile without error")
		}
		if err != nil && !strings.Contains(err.Error(), "p.toml") {
			t.Fatalf("error without the file's name: %v", err)
		}
	})
}
