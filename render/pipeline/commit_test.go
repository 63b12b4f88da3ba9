package pipeline

import (
	"os"
	"path/filepath"
	"testing"

	"github.com/tremie-dev/tremie/render/pipeline/incremental"
)

// TestCommitAllIsAllOrNothing: when one of a well's outputs may not be
// written (a file of the user's stands there), none is, and the well's
// old outputs stay as they were.
func TestCommitAllIsAllOrNothing(t *testing.T) {
	dir := t.TempDir()
	cache, _ := incremental.Load(dir)
	os.WriteFile(filepath.Join(dir, "MW-1.svg"), []byte("old svg"), 0o644)
	cache.RecordOutputs("MW-1", "MW-1.toml", "h", []incremental.Output{{Rel: "MW-1.svg", Size: 7}})
	os.WriteFile(filepath.Join(dir, "MW-1.pdf"), []byte("the user's own"), 0o644) // not tremie's
	err := commitAll(dir, []pending{{"MW-1.svg", []byte("new svg")}, {"MW-1.pdf", []byte("new pdf")}}, cache, false)
	if !IsOutputError(err) {
		t.Fatalf("err = %v, want an output error", err)
	}
	for name, want := range map[string]string{"MW-1.svg": "old svg", "MW-1.pdf": "the user's own"} {
		if b, _ := os.ReadFile(filepath.Join(dir, name)); string(b) != want {
			t.Errorf("%s = %q, want %q", name, b, want)
		}
	}
	entries, _ := os.ReadDir(dir)
	for _, e := range entries {
		if e.Name() != "MW-1.svg" && e.Name() != "MW-1.pdf" && e.Name() != incremental.JournalName {
			t.Errorf("left behind: %s", e.Name())
		}
	}
	if err := commitAll(dir, []pending{{"MW-1.svg", []byte("new svg")}, {"MW-1.png", []byte("png")}}, cache, false); err != nil {
		t.Fatal(err)
	}
	if b, _ := os.ReadFile(filepath.Join(dir, "MW-1.svg")); string(b) != "new svg" {
		t.Errorf("MW-1.svg = %q after a clean commit", b)
	}
}
