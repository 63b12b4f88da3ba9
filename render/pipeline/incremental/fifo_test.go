package incremental

import (
	"path/filepath"
	"syscall"
	"testing"
	"time"
)

// A FIFO left under the cache's or the journal's name must not hang a
// run: Load reads them only as regular files and, finding something else,
// draws every well (issue 15's reproducer was a FIFO named as a well).
func TestFIFOInPlaceOfTheCacheDoesNotHang(t *testing.T) {
	for _, name := range []string{FileName, JournalName} {
		dir := t.TempDir()
		if err := syscall.Mkfifo(filepath.Join(dir, name), 0o600); err != nil {
			t.Skipf("no FIFOs here: %v", err)
		}
		done := make(chan error, 1)
		go func() {
			_, err := Load(dir)
			done <- err
		}()
		select {
		case err := <-done:
			if name == FileName && err == nil {
				t.Errorf("%s as a FIFO: want a warning that the cache is unreadable", name)
			}
		case <-time.After(5 * time.Second):
			t.Fatalf("%s as a FIFO: Load still blocked after 5 s", name)
		}
	}
}
