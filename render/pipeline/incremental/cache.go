package incremental

import (
	"encoding/json"
	"errors"
	"fmt"
	"github.com/tremie-dev/tremie/schema"
	"io/fs"
	"os"
	"path"
	"path/filepath"
	"slices"
	"sort"
	"sync"

	"github.com/tremie-dev/tremie/render/out"
)

// FileName is the cache file in the output directory.
const FileName = ".tremie-cache.json"

// format is the cache file's layout version; a different one is ignored.
const format = 2

// Cache is the record of the last run in one output directory. Its methods
// are safe for concurrent use by a batch's workers.
type Cache struct {
	dir string

	mu      sync.Mutex
	entries map[string]entry
	orphans map[string]bool // outputs no well claims any more
	files   map[string]bool // other outputs tremie wrote here (a book, a table)
	dirty   bool

	journal       *os.File // see journal.go; opened on the first record
	journalFailed bool
}

// entry is what was drawn for one well.
type entry struct {
	Hash    string   `json:"hash"`
	Outputs []string `json:"outputs"` // relative to the output directory, sorted
	// Source is the well file, relative to the output directory: a well
	// left out of a run is stale only when this file is gone.
	Source string `json:"source,omitempty"`
	// Kept are outputs in formats the last run did not ask for (render
	// --format svg after svg,pdf): still the well's last drawing in that
	// format, so neither stale while the well is there nor another's.
	Kept []string `json:"kept,omitempty"`
	// Sizes and Sums are each output's length and SHA-256 as written, and
	// Times its modification time once in place (Unix nanoseconds): an
	// output of another size, or of another time whose bytes no longer
	// hash to its sum (a file truncated by a crash, damaged or edited), is
	// drawn again (see Recorded).
	Sizes map[string]int64  `json:"sizes,omitempty"`
	Sums  map[string]string `json:"sums,omitempty"`
	Times map[string]int64  `json:"times,omitempty"`
}

// Output is one file written for a well, as the cache records it.
type Output struct {
	Rel     string // relative to the output directory
	Size    int64
	Sum     string // hex SHA-256 of the bytes written
	ModTime int64  // Unix nanoseconds, as the file system gives it once in place; 0 if unknown
}

// RecordOutputs is RecordFrom with each output's size and checksum, so
// that a damaged output is noticed on the next run.
func (c *Cache) RecordOutputs(key, source, hash string, outs []Output) {
	rel := make([]string, len(outs))
	sizes := make(map[string]int64, len(outs))
	sums := make(map[string]string, len(outs))
	times := make(map[string]int64, len(outs))
	for i, o := range outs {
		r := filepath.ToSlash(o.Rel)
		rel[i], sizes[r], sums[r] = r, o.Size, o.Sum
		if o.ModTime != 0 {
			times[r] = o.ModTime
		}
	}
	c.mu.Lock()
	defer c.mu.Unlock()
	e := c.record(key, source, hash, rel)
	e.Sizes, e.Sums, e.Times = sizes, sums, times
	c.entries[key] = e
	c.appendJournal(journalLine{Key: key, Entry: &e})
}

type fileData struct {
	Format  int              `json:"format"`
	Wells   map[string]entry `json:"wells"`
	Orphans []string         `json:"orphans,omitempty"`
	Files   []string         `json:"files,omitempty"`
}

// Load reads the cache of an output directory. A missing file gives an
// empty cache. A damaged or foreign one also gives an empty, usable cache
// (everything is drawn again) together with an error to print as a
// warning.
func Load(outdir string) (*Cache, error) {
	c := &Cache{dir: outdir, entries: map[string]entry{}, orphans: map[string]bool{}, files: map[string]bool{}}
	path := filepath.Join(outdir, FileName)
	data, err := schema.ReadInput(path, maxCacheFile)
	if errors.Is(err, fs.ErrNotExist) {
		c.replayJournal() // a first run that was interrupted
		return c, nil
	}
	if err != nil {
		return c, fmt.Errorf("cache %s: %w (drawing every well)", path, err)
	}
	var fd fileData
	if err := json.Unmarshal(data, &fd); err != nil {
		c.dirty = true
		return c, fmt.Errorf("cache %s is damaged (%v); drawing every well", path, err)
	}
	if fd.Format != format {
		c.dirty = true
		return c, nil
	}
	for k, e := range fd.Wells {
		c.entries[k] = e
	}
	for _, o := range fd.Orphans {
		c.orphans[o] = true
	}
	for _, f := range fd.Files {
		c.files[f] = true
	}
	c.replayJournal()
	return c, nil
}

// Dir is the output directory.
func (c *Cache) Dir() string { return c.dir }

// Fresh reports whether the well under key was last drawn from inputs
// with this hash into exactly these outputs (relative to the output
// directory), and every one of them is still there. With nil outputs
// (names known only after layout, e.g. one file per sheet) the outputs
// recorded last time are checked instead.
func (c *Cache) Fresh(key, hash string, outputs []string) bool {
	c.mu.Lock()
	e, ok := c.entries[key]
	c.mu.Unlock()
	if !ok || e.Hash != hash || (outputs != nil && !slices.Equal(e.Outputs, sorted(outputs))) {
		return false
	}
	for _, o := range e.Outputs {
		if _, err := os.Stat(filepath.Join(c.dir, filepath.FromSlash(o))); err != nil {
			return false
		}
	}
	return true
}

// Record notes that the well under key was drawn from inputs with this
// hash into these outputs. Outputs it had before and no longer has become
// orphans, reported by Stale.
func (c *Cache) Record(key, hash string, outputs []string) {
	c.RecordFrom(key, "", hash, outputs)
}

// RecordFrom is Record for a well read from source (a path relative to
// the output directory), which Stale consults.
func (c *Cache) RecordFrom(key, source, hash string, outputs []string) {
	c.mu.Lock()
	defer c.mu.Unlock()
	c.record(key, source, hash, outputs)
}

// owned is every file the entry stands for: its outputs and those kept
// from formats the last run did not draw.
func (e entry) owned() []string {
	if len(e.Kept) == 0 {
		return e.Outputs
	}
	return append(slices.Clone(e.Outputs), e.Kept...)
}

// record is RecordFrom under c.mu; it returns the entry it stored.
func (c *Cache) record(key, source, hash string, outputs []string) entry {
	outs := sorted(outputs)
	drawn := map[string]bool{} // the kinds of file this run wrote
	for _, o := range outs {
		drawn[path.Ext(o)] = true
	}
	var kept []string
	for _, o := range c.entries[key].owned() {
		switch {
		case slices.Contains(outs, o):
		case drawn[path.Ext(o)]:
			c.orphans[o] = true // a name the well no longer draws
		default:
			kept = append(kept, o)
		}
	}
	for _, o := range outs {
		delete(c.orphans, o)
	}
	e := entry{Hash: hash, Outputs: outs, Source: filepath.ToSlash(source), Kept: sorted(kept)}
	c.entries[key] = e
	c.dirty = true
	return e
}

// Forget marks a well's record out of date, so that it is drawn next
// time; call it when a well could not be drawn (unreadable, not judged,
// refused, failed). Its outputs stay its own: while its well file is
// there its old sheets are not stale (Stale), only once the file is gone.
func (c *Cache) Forget(key string) {
	c.mu.Lock()
	defer c.mu.Unlock()
	if e, ok := c.entries[key]; ok && e.Hash != "" {
		e.Hash = "" // matches no well's hash
		c.entries[key] = e
		c.dirty = true
		c.appendJournal(journalLine{Key: key, Entry: &e})
	}
}

// Stale returns, sorted, the outputs still on disk that belong to no
// present well: those of wells whose keys are not in present and whose
// well file is gone (a run over some of a project's wells leaves the
// others' sheets alone), and those a well produced once under another
// name. Nothing is deleted. Records of absent wells whose outputs are all
// gone are dropped.
func (c *Cache) Stale(present []string) []string {
	here := make(map[string]bool, len(present))
	for _, k := range present {
		here[k] = true
	}
	c.mu.Lock()
	defer c.mu.Unlock()
	claimed := map[string]bool{}
	for k, e := range c.entries {
		if here[k] {
			for _, o := range e.owned() {
				claimed[o] = true
			}
		}
	}
	var out []string
	seen := map[string]bool{}
	consider := func(o string) bool {
		if claimed[o] || seen[o] {
			return false
		}
		if _, err := os.Stat(filepath.Join(c.dir, filepath.FromSlash(o))); err != nil {
			return false
		}
		seen[o] = true
		out = append(out, o)
		return true
	}
	for k, e := range c.entries {
		if here[k] {
			continue
		}
		if e.Source != "" {
			if _, err := os.Stat(filepath.Join(c.dir, filepath.FromSlash(e.Source))); err == nil {
				for _, o := range e.owned() {
					claimed[o] = true
				}
				continue // its well is still there, only not in this run
			}
		}
		alive := false
		for _, o := range e.owned() {
			if consider(o) || seen[o] {
				alive = true
			}
		}
		if !alive {
			delete(c.entries, k)
			c.dirty = true
		}
	}
	for o := range c.orphans {
		if !consider(o) && !seen[o] {
			delete(c.orphans, o)
			c.dirty = true
		}
	}
	sort.Strings(out)
	return out
}

// Save writes the cache atomically if anything changed, creating the
// output directory if needed.
func (c *Cache) Save() error {
	c.mu.Lock()
	defer c.mu.Unlock()
	if !c.dirty {
		return nil
	}
	fd := fileData{Format: format, Wells: c.entries}
	for o := range c.orphans {
		fd.Orphans = append(fd.Orphans, o)
	}
	sort.Strings(fd.Orphans)
	for f := range c.files {
		fd.Files = append(fd.Files, f)
	}
	sort.Strings(fd.Files)
	data, err := json.MarshalIndent(fd, "", "  ") // map keys come sorted
	if err != nil {
		return fmt.Errorf("cache: %w", err)
	}
	if err := os.MkdirAll(c.dir, 0o755); err != nil {
		return fmt.Errorf("cache: %w", err)
	}
	if err := out.WriteFileAtomic(filepath.Join(c.dir, FileName), append(data, '\n')); err != nil {
		return fmt.Errorf("cache: %w", err)
	}
	c.dirty = false
	c.closeJournal()
	return nil
}

func sorted(s []string) []string {
	out := make([]string, len(s))
	for i, v := range s {
		out[i] = filepath.ToSlash(v)
	}
	sort.Strings(out)
	return out
}

// Owns reports whether tremie wrote the file at rel (relative to the
// output directory) itself, as far as this cache knows: a well's output,
// an orphan, or a file recorded with Claim. A file it does not own is the
// user's and is never replaced unasked.
func (c *Cache) Owns(rel string) bool {
	rel = filepath.ToSlash(rel)
	c.mu.Lock()
	defer c.mu.Unlock()
	if c.files[rel] || c.orphans[rel] {
		return true
	}
	for _, e := range c.entries {
		if slices.Contains(e.owned(), rel) {
			return true
		}
	}
	return false
}

// Claim records a file tremie wrote at rel that belongs to no one well
// (a book, a summary table), so that a later run may replace it.
func (c *Cache) Claim(rel string) {
	rel = filepath.ToSlash(rel)
	c.mu.Lock()
	defer c.mu.Unlock()
	if !c.files[rel] {
		c.files[rel] = true
		c.dirty = true
	}
}
