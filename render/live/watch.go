package live

import (
	"os"
	"path/filepath"
	"strings"
	"time"

	"github.com/fsnotify/fsnotify"
)

// settle is how long the watcher waits after a change for more: an
// editor's save is often several events (write, rename, chmod), which
// follow each other within a few milliseconds; 120 ms is common practice
// for a file watcher's debounce, below what a person notices as a delay.
const settle = 120 * time.Millisecond

// watcher calls refresh after TOML files in the watched directories
// change, once per burst of changes.
type watcher struct {
	fs   *fsnotify.Watcher
	done chan struct{}
}

func newWatcher(root string, refresh func(), dirs func() []string) (*watcher, error) {
	fw, err := fsnotify.NewWatcher()
	if err != nil {
		return nil, err
	}
	w := &watcher{fs: fw, done: make(chan struct{})}
	watched := map[string]bool{}
	rewatch := func() {
		for _, d := range dirs() {
			if !watched[d] {
				if st, err := os.Stat(d); err == nil && st.IsDir() && fw.Add(d) == nil {
					watched[d] = true
				}
			}
		}
	}
	rewatch()
	go func() {
		defer close(w.done)
		var timer <-chan time.Time
		for {
			select {
			case ev, ok := <-fw.Events:
				if !ok {
					return
				}
				if relevant(ev) {
					timer = time.After(settle)
				}
			case _, ok := <-fw.Errors:
				if !ok {
					return
				}
			case <-timer:
				timer = nil
				refresh()
				rewatch() // a new wells subfolder, profile or yields file
			}
		}
	}()
	return w, nil
}

// relevant reports whether an event may change what the page shows: a
// TOML file, a wall image (PNG, JPEG, TIFF), or a folder appearing or
// going.
func relevant(ev fsnotify.Event) bool {
	name := filepath.Base(ev.Name)
	if strings.HasPrefix(name, ".") && !strings.HasSuffix(name, ".toml") {
		return false // editor swap and lock files
	}
	switch strings.ToLower(filepath.Ext(name)) {
	case ".toml", ".png", ".jpg", ".jpeg", ".tif", ".tiff":
		return true
	}
	return ev.Has(fsnotify.Create) || ev.Has(fsnotify.Remove) || ev.Has(fsnotify.Rename)
}

func (w *watcher) Close() error {
	err := w.fs.Close()
	<-w.done
	return err
}
