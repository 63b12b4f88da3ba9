package out

import (
	"fmt"
	"os"
	"path/filepath"
)

// WriteFileAtomic writes data to path so that path holds either its old
// content or all of data, never a part: it writes a temporary file in the
// same directory, syncs it, and renames it over path.
func WriteFileAtomic(path string, data []byte) (err error) {
	dir, base := filepath.Split(path)
	if dir == "" {
		dir = "."
	}
	tmp, err := os.CreateTemp(dir, "."+base+".tmp-*")
	if err != nil {
		return fmt.Errorf("write %s: %w", path, err)
	}
	defer func() {
		if err != nil {
			tmp.Close()
			os.Remove(tmp.Name())
		}
	}()
	if _, err = tmp.Write(data); err != nil {
		return fmt.Errorf("write %s: %w", path, err)
	}
	if err = tmp.Sync(); err != nil {
		return fmt.Errorf("write %s: sync: %w", path, err)
	}
	// CreateTemp makes the file 0600; an output is an ordinary document.
	if err = tmp.Chmod(0o644); err != nil {
		return fmt.Errorf("write %s: %w", path, err)
	}
	if err = tmp.Close(); err != nil {
		return fmt.Errorf("write %s: close: %w", path, err)
	}
	if err = os.Rename(tmp.Name(), path); err != nil {
		return fmt.Errorf("write %s: %w", path, err)
	}
	// Sync the directory so the rename itself survives a crash; not every
	// system allows it, and the data is already safe, so failure is ignored.
	if d, derr := os.Open(dir); derr == nil {
		d.Sync()
		d.Close()
	}
	return nil
}
