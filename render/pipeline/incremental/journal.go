package incremental

import (
	"bufio"
	"bytes"
	"encoding/json"
	"github.com/tremie-dev/tremie/schema"
	"os"
	"path/filepath"
)

// JournalName is the file beside the cache where each well's record is
// appended as soon as its outputs are written. The cache itself is saved
// once at the end of a run; if the run is interrupted (Ctrl-C, kill -9,
// a crash) the journal still holds every well it finished, and the next
// run replays it, so that only what was missing is drawn again.
const JournalName = ".tremie-cache.journal"

// maxJournalLine bounds one record as replayed: a well's record is a few
// hundred bytes per output, so 16 MiB holds any real well many times
// over, and a longer (damaged) line ends the replay instead of growing
// the buffer without limit.
const maxJournalLine = 16 << 20

// maxCacheFile bounds the cache file and the journal as read, and they
// are read only as regular files (schema.ReadInput): a FIFO or a device
// left under the cache's name must not hang or exhaust a run. A record
// is a few hundred bytes, so 256 MiB is about a million wells; past it
// the cache counts as damaged and every well is drawn again.
const maxCacheFile = 256 << 20

// journalLine is one well's record as drawn, or as forgotten (Forget
// journals the entry with its hash cleared).
type journalLine struct {
	Key   string `json:"key"`
	Entry *entry `json:"entry,omitempty"`
}

// appendJournal writes one line under c.mu. A journal that cannot be
// written only loses the interruption safety, not the run, so errors are
// dropped; the cache is still saved at the end.
func (c *Cache) appendJournal(l journalLine) {
	if c.journal == nil {
		if c.journalFailed {
			return
		}
		if err := os.MkdirAll(c.dir, 0o755); err != nil {
			c.journalFailed = true
			return
		}
		f, err := os.OpenFile(filepath.Join(c.dir, JournalName), os.O_CREATE|os.O_WRONLY|os.O_APPEND, 0o644)
		if err != nil {
			c.journalFailed = true
			return
		}
		c.journal = f
	}
	b, err := json.Marshal(l)
	if err != nil {
		return
	}
	c.journal.Write(append(b, '\n'))
}

// replayJournal applies a journal left by an interrupted run; a torn
// last line (the run died while writing it) is ignored.
func (c *Cache) replayJournal() {
	data, err := schema.ReadInput(filepath.Join(c.dir, JournalName), maxCacheFile)
	if err != nil || len(data) == 0 {
		return
	}
	sc := bufio.NewScanner(bytes.NewReader(data))
	sc.Buffer(make([]byte, 0, 64<<10), maxJournalLine)
	for sc.Scan() {
		var l journalLine
		if json.Unmarshal(sc.Bytes(), &l) != nil || l.Key == "" || l.Entry == nil {
			continue
		}
		for _, o := range l.Entry.Outputs {
			delete(c.orphans, o)
		}
		c.entries[l.Key] = *l.Entry
		c.dirty = true
	}
}

// closeJournal ends the journal once the cache holds everything in it.
func (c *Cache) closeJournal() {
	if c.journal != nil {
		c.journal.Close()
		c.journal = nil
	}
	os.Remove(filepath.Join(c.dir, JournalName))
}
