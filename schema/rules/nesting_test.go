package rules

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"
)

// TestDeepNestingRefused: a profile nested 10,000 or 100,000 deep (issue
// 15's reproducer; the TOML library would spend minutes and gigabytes on
// it, and 100,000 deep ran out of memory) is refused at once, at the line
// and column where the nesting passes the limit.
func TestDeepNestingRefused(t *testing.T) {
	for _, deep := range []int{10000, 100000} {
		for _, v := range []string{
			"x = " + strings.Repeat("{a=", deep) + "1" + strings.Repeat("}", deep),
			"x = " + strings.Repeat("[", deep) + strings.Repeat("]", deep),
		} {
			path := filepath.Join(t.TempDir(), "county.toml")
			if err := os.WriteFile(path, []byte("[profile]\nname = \"county\"\n"+v), 0o644); err != nil {
				t.Fatal(err)
			}
			start := time.Now()
			_, err := LoadProfile(path)
			if took := time.Since(start); took > 2*time.Second {
				t.Errorf("%d deep %.5q: %v to refuse", deep, v, took)
			}
			if err == nil || !strings.HasPrefix(err.Error(), path+":3:") || !strings.Contains(err.Error(), "nest more than 64 deep") {
				t.Errorf("%d deep %.5q: %v, want %s:3:... nest more than 64 deep", deep, v, err, path)
			}
		}
	}
}
