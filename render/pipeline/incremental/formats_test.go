package incremental

import (
	"fmt"
	"os"
	"path/filepath"
	"testing"
)

// cacheAmong writes the named files (one byte each) into dir and loads
// the cache there.
func cacheAmong(t *testing.T, dir string, files ...string) *Cache {
	t.Helper()
	for _, f := range files {
		if err := os.WriteFile(filepath.Join(dir, f), []byte("x"), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	c, err := Load(dir)
	if err != nil {
		t.Fatal(err)
	}
	return c
}

// A well drawn as SVG and PDF, then as SVG alone (render --format svg):
// its PDF is still its last drawing in that format, not a stale output
// of a well that is gone, and stays tremie's to replace. A name the well
// no longer draws in a format it did draw (one sheet, then two) is stale.
func TestFewerFormatsLeaveNoStaleOutput(t *testing.T) {
	dir := t.TempDir()
	src := filepath.Join(dir, "MW-1.toml")
	c := cacheAmong(t, dir, "MW-1.toml", "MW-1.svg", "MW-1.pdf", "MW-1-sheet1.svg", "MW-1-sheet2.svg")
	c.RecordFrom("MW-1", src, "h1", []string{"MW-1.svg", "MW-1.pdf"})
	c.RecordFrom("MW-1", src, "h2", []string{"MW-1.svg"})
	if s := c.Stale([]string{"MW-1"}); len(s) != 0 {
		t.Errorf("after --format svg: stale %v, want none", s)
	}
	if !c.Owns("MW-1.pdf") {
		t.Error("the PDF tremie wrote is no longer known as its own")
	}
	c.RecordFrom("MW-1", src, "h3", []string{"MW-1-sheet1.svg", "MW-1-sheet2.svg"})
	if s := c.Stale([]string{"MW-1"}); fmt.Sprint(s) != "[MW-1.svg]" {
		t.Errorf("after the well went to two sheets: stale %v, want [MW-1.svg]", s)
	}
}

// The PDF kept from a run of more formats is the well's: once the well
// file is gone, it is stale with the rest of the well's outputs.
func TestKeptFormatIsStaleWhenTheWellIsGone(t *testing.T) {
	dir := t.TempDir()
	src := filepath.Join(dir, "MW-1.toml")
	c := cacheAmong(t, dir, "MW-1.toml", "MW-1.svg", "MW-1.pdf")
	c.RecordFrom("MW-1", src, "h1", []string{"MW-1.svg", "MW-1.pdf"})
	c.RecordFrom("MW-1", src, "h2", []string{"MW-1.svg"})
	if err := os.Remove(src); err != nil {
		t.Fatal(err)
	}
	if s := c.Stale(nil); fmt.Sprint(s) != "[MW-1.pdf MW-1.svg]" {
		t.Errorf("after the well file went: stale %v, want [MW-1.pdf MW-1.svg]", s)
	}
}
