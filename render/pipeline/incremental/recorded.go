package incremental

import (
	"os"
	"path/filepath"
	"slices"
)

// Recorded returns the outputs recorded for key when they were drawn from
// the same hash and are all still on disk, each of the size it was
// written with (when that was recorded). It serves callers that learn a
// well's outputs only by drawing it (a multi-sheet well has one file per
// sheet), where Fresh needs them beforehand.
func (c *Cache) Recorded(key, hash string) ([]string, bool) {
	c.mu.Lock()
	e, ok := c.entries[key]
	c.mu.Unlock()
	if !ok || e.Hash != hash || len(e.Outputs) == 0 {
		return nil, false
	}
	for _, o := range e.Outputs {
		st, err := os.Stat(filepath.Join(c.dir, filepath.FromSlash(o)))
		if err != nil || !st.Mode().IsRegular() {
			return nil, false
		}
		if size, ok := e.Sizes[o]; ok && st.Size() != size {
			return nil, false
		}
	}
	return slices.Clone(e.Outputs), true
}
