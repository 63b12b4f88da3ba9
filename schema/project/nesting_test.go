package project

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"
)

// TestDeepNestingRefused: a project file nested 10,000 or 100,000 deep
// (issue 15's reproducer; the TOML library would spend minutes and
// gigabytes on it) is refused at once, at the line and column where the
// nesting passes the limit.
func TestDeepNestingRefused(t *testing.T) {
	for _, deep := range []int{10000, 100000} {
		for _, open := range []string{"{a=", "["} {
			dir := t.TempDir()
			text := "[project]\nname = \"x\"\nx = " + nested(open, deep)
			if err := os.WriteFile(filepath.Join(dir, FileName), []byte(text), 0o644); err != nil {
				t.Fatal(err)
			}
			start := time.Now()
			_, err := Load(dir)
			if took := time.Since(start); took > 2*time.Second {
				t.Errorf("%d deep %q: %v to refuse", deep, open, took)
			}
			want := filepath.Join(dir, FileName) + ":3:"
			if err == nil || !strings.HasPrefix(err.Error(), want) || !strings.Contains(err.Error(), "nest more than 64 deep") {
				t.Errorf("%d deep %q: %v, want %s... nest more than 64 deep", deep, open, err, want)
			}
		}
	}
}

// nested is a value nested deep levels: inline tables ({a={a=...1}})
// or arrays ([[...]]).
func nested(open string, deep int) string {
	if open == "[" {
		return strings.Repeat("[", deep) + strings.Repeat("]", deep)
	}
	return strings.Repeat(open, deep) + "1" + strings.Repeat("}", deep)
}
