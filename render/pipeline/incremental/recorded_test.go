package incremental

import (
	"crypto/sha256"
	"encoding/hex"
	"os"
	"path/filepath"
	"testing"
	"time"
)

// TestDamagedOutputOfTheSameSize: one byte of an output flipped without
// changing its size (a damaged disk block, a stray edit) makes the well
// drawn again (issue 15: "the cache records each output's size and hash,
// and a damaged output is drawn again"); the same bytes with a new time
// (a touch, a copy back) do not, and the new time is kept so that the
// next run does not hash the file again.
func TestDamagedOutputOfTheSameSize(t *testing.T) {
	dir := t.TempDir()
	p := filepath.Join(dir, "MW-1.svg")
	data := []byte("<svg>the sheet</svg>")
	if err := os.WriteFile(p, data, 0o644); err != nil {
		t.Fatal(err)
	}
	st, _ := os.Stat(p)
	sum := sha256.Sum256(data)
	c, _ := Load(dir)
	c.RecordOutputs("MW-1", "MW-1.toml", "h", []Output{{Rel: "MW-1.svg", Size: int64(len(data)), Sum: hex.EncodeToString(sum[:]), ModTime: st.ModTime().UnixNano()}})
	if _, ok := c.Recorded("MW-1", "h"); !ok {
		t.Fatal("an untouched output is not recognised")
	}
	// The same bytes, written again an hour later.
	later := st.ModTime().Add(time.Hour)
	os.Chtimes(p, later, later)
	if _, ok := c.Recorded("MW-1", "h"); !ok {
		t.Error("the same bytes with a new time count as damaged")
	}
	if got := c.entries["MW-1"].Times["MW-1.svg"]; got != later.UnixNano() {
		t.Errorf("recorded time %d after the check, want the file's new time %d", got, later.UnixNano())
	}
	// One byte flipped, size and time as they were.
	damaged := append([]byte{}, data...)
	damaged[5] ^= 0x20
	if err := os.WriteFile(p, damaged, 0o644); err != nil {
		t.Fatal(err)
	}
	os.Chtimes(p, later.Add(time.Minute), later.Add(time.Minute))
	if _, ok := c.Recorded("MW-1", "h"); ok {
		t.Error("an output with one byte flipped and the same size counts as unchanged")
	}
}
