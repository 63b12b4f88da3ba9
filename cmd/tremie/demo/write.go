package demo

import (
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"

	"github.com/tremie-dev/tremie/render/out"
)

// ErrNotEmpty is returned by Write for a directory that already holds
// something: the demo never writes over anything unasked.
var ErrNotEmpty = errors.New("is not empty")

// Write copies the demo project into dir, each file atomically. A dir
// that exists and is not empty is refused (an error wrapping
// ErrNotEmpty) unless force, so that no project of the user's is ever
// overwritten by the demo.
func Write(dir string, force bool) error {
	if !force {
		empty, err := isEmptyOrAbsent(dir)
		if err != nil {
			return err
		}
		if !empty {
			return fmt.Errorf("%s %w: the demo writes only into a new or empty directory (choose another -o DIR, or --force to write over it)", dir, ErrNotEmpty)
		}
	}
	return fs.WalkDir(FS, ".", func(path string, d fs.DirEntry, err error) error {
		if err != nil {
			return err
		}
		target := filepath.Join(dir, filepath.FromSlash(path))
		if d.IsDir() {
			if err := os.MkdirAll(target, 0o755); err != nil {
				return fmt.Errorf("creating %s: %w", target, err)
			}
			return nil
		}
		if ext := filepath.Ext(path); ext != ".toml" && ext != ".png" {
			return nil
		}
		data, err := FS.ReadFile(path)
		if err != nil {
			return fmt.Errorf("reading embedded %s: %w", path, err)
		}
		return out.WriteFileAtomic(target, data)
	})
}

// isEmptyOrAbsent reports whether dir does not exist or holds nothing.
func isEmptyOrAbsent(dir string) (bool, error) {
	f, err := os.Open(dir)
	if errors.Is(err, fs.ErrNotExist) {
		return true, nil
	}
	if err != nil {
		return false, err
	}
	defer f.Close()
	st, err := f.Stat()
	if err != nil {
		return false, err
	}
	if !st.IsDir() {
		return false, fmt.Errorf("%s is a file, not a directory", dir)
	}
	_, err = f.Readdirnames(1)
	if errors.Is(err, io.EOF) {
		return true, nil
	}
	return false, err
}
