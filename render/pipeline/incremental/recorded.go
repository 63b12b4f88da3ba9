package incremental

import (
	"crypto/sha256"
	"encoding/hex"
	"io"
	"os"
	"path/filepath"
	"slices"
)

// Recorded returns the outputs recorded for key when they were drawn from
// the same hash and are all still on disk as they were written: each of
// the size it was written with, and of the same modification time or,
// where the time differs, of the same SHA-256. It serves callers that
// learn a well's outputs only by drawing it (a multi-sheet well has one
// file per sheet), where Fresh needs them beforehand.
//
// Hashing only when the time differs is the make-style shortcut (git's
// index does the same): a file whose time has not moved was not written
// since, so an unchanged run reads no output. An output whose bytes still
// match after its time moved (touched, copied back) gets its new time
// recorded, and is not hashed again.
func (c *Cache) Recorded(key, hash string) ([]string, bool) {
	c.mu.Lock()
	e, ok := c.entries[key]
	c.mu.Unlock()
	if !ok || e.Hash != hash || len(e.Outputs) == 0 {
		return nil, false
	}
	retimed := map[string]int64{}
	for _, o := range e.Outputs {
		p := filepath.Join(c.dir, filepath.FromSlash(o))
		st, err := os.Stat(p)
		if err != nil || !st.Mode().IsRegular() {
			return nil, false
		}
		if size, ok := e.Sizes[o]; ok && st.Size() != size {
			return nil, false
		}
		sum, ok := e.Sums[o]
		if !ok {
			continue // recorded before sums were: its size is all there is
		}
		if t, ok := e.Times[o]; ok && t == st.ModTime().UnixNano() {
			continue
		}
		if got, err := fileSum(p); err != nil || got != sum {
			return nil, false
		}
		retimed[o] = st.ModTime().UnixNano()
	}
	if len(retimed) > 0 {
		c.mu.Lock()
		if cur, ok := c.entries[key]; ok && cur.Hash == hash {
			times := make(map[string]int64, len(cur.Outputs))
			for k, v := range cur.Times {
				times[k] = v
			}
			for k, v := range retimed {
				times[k] = v
			}
			cur.Times = times
			c.entries[key] = cur
			c.dirty = true
		}
		c.mu.Unlock()
	}
	return slices.Clone(e.Outputs), true
}

// fileSum is the hex SHA-256 of a file's bytes.
func fileSum(path string) (string, error) {
	f, err := os.Open(path)
	if err != nil {
		return "", err
	}
	defer f.Close()
	h := sha256.New()
	if _, err := io.Copy(h, f); err != nil {
		return "", err
	}
	return hex.EncodeToString(h.Sum(nil)), nil
}
