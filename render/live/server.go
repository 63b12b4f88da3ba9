package live

import (
	"context"
	"errors"
	"fmt"
	"net"
	"net/http"
	"path/filepath"
	"strconv"
	"strings"
	"sync"
	"time"

	"github.com/tremie-dev/tremie/render/pipeline"
)

// Server holds a project's wells as last prepared and the pages watching
// them.
type Server struct {
	dir string

	mu       sync.Mutex
	settings *settings
	wells    []*Well // in file order
	problems []error // project-level problems: listing, settings
	version  uint64  // bumped on every change the page shows
	waiters  map[chan struct{}]bool
	reported string // the input problems as last told to OnProblems

	// Prepared is called after every refresh with the number of wells
	// prepared again (tests wait on it); may be nil.
	Prepared func(redrawn int)
	// OnProblems is called after a refresh whose input problems (Problems)
	// differ from those of the refresh before, with the new ones (none
	// once all are fixed), so that the terminal that started the server
	// shows what the page shows; may be nil.
	OnProblems func(problems []error)
}

// New prepares every well of the project in dir (a directory holding
// project.toml, or any directory of well files).
func New(dir string) (*Server, error) {
	abs, err := filepath.Abs(dir)
	if err != nil {
		return nil, err
	}
	s := &Server{dir: abs, waiters: map[chan struct{}]bool{}}
	s.Refresh()
	return s, nil
}

// Refresh reads the settings again and prepares every well whose file or
// setting changed; the others keep their sheets. It wakes the pages when
// anything they show changed.
func (s *Server) Refresh() {
	st := loadSettings(s.dir)
	problems := s.relative(st.problems)
	s.mu.Lock()
	prev := map[string]*Well{}
	for _, w := range s.wells {
		if w.prepared != nil {
			w = w.prepared
		}
		prev[w.Path] = w
	}
	s.mu.Unlock()
	var wells []*Well
	redrawn := 0
	if st.run != nil {
		for _, in := range st.run.Inputs {
			in.Key = s.keyOf(in)
			w := prepare(st, in, prev[in.Path])
			if w != prev[in.Path] {
				redrawn++
			}
			wells = append(wells, w)
		}
	}
	markDuplicateIDs(wells)
	s.mu.Lock()
	changed := redrawn > 0 || len(wells) != len(s.wells) || errText(problems) != errText(s.problems)
	s.settings, s.wells, s.problems = st, wells, problems
	if changed {
		s.version++
		for ch := range s.waiters {
			select {
			case ch <- struct{}{}:
			default:
			}
		}
	}
	all := s.problemsLocked()
	text := errText(all)
	report := text != s.reported
	s.reported = text
	s.mu.Unlock()
	if report && s.OnProblems != nil {
		s.OnProblems(all)
	}
	if s.Prepared != nil {
		s.Prepared(redrawn)
	}
}

// keyOf names a well file as the page shows it: relative to its project
// (the pipeline's key), or for a folder of wells without a project file,
// relative to the folder served rather than by its full path.
func (s *Server) keyOf(in pipeline.Input) string {
	if filepath.IsAbs(filepath.FromSlash(in.Key)) {
		if rel, err := filepath.Rel(s.dir, in.Path); err == nil && filepath.IsLocal(rel) {
			return filepath.ToSlash(rel)
		}
	}
	return in.Key
}

// relative names the files of the project's problems (its project file,
// profile or yields file) relative to the project, as its wells are
// named; a problem without a position, or outside the project, is kept.
func (s *Server) relative(problems []error) []error {
	var out []error
	for _, p := range problems {
		el, ok := listOf(p)
		if !ok {
			out = append(out, p)
			continue
		}
		// a list, so that each keeps its hint
		out = append(out, renamed(el, func(file string) string {
			if rel, err := filepath.Rel(s.dir, file); err == nil && filepath.IsAbs(file) && filepath.IsLocal(rel) {
				return filepath.ToSlash(rel)
			}
			return file
		}))
	}
	return out
}

// Problems is every problem of the project's input files as last read:
// those of the project, profile and yields files, then each well file's
// (named relative to the project), each with its file and line.
func (s *Server) Problems() []error {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.problemsLocked()
}

func (s *Server) problemsLocked() []error {
	all := append([]error(nil), s.problems...)
	for _, w := range s.wells {
		for _, e := range w.Problems {
			all = append(all, e)
		}
	}
	return all
}

func errText(errs []error) string {
	var b strings.Builder
	for _, e := range errs {
		b.WriteString(e.Error() + "\n")
	}
	return b.String()
}

// snapshot is what one page render shows.
type snapshot struct {
	Dir      string
	Version  uint64
	Wells    []*Well
	Problems []error
}

func (s *Server) snapshot() snapshot {
	s.mu.Lock()
	defer s.mu.Unlock()
	return snapshot{Dir: s.dir, Version: s.version, Wells: s.wells, Problems: s.problems}
}

// Handler serves the page, its parts and the sheets. Every path it
// answers is fixed or an index into the wells in memory: no request
// names a file, so none can reach outside the project.
func (s *Server) Handler() http.Handler {
	mux := http.NewServeMux()
	mux.HandleFunc("GET /{$}", s.servePage)
	mux.HandleFunc("GET /wells", s.serveWells)
	mux.HandleFunc("GET /events", s.serveEvents)
	mux.HandleFunc("GET /sheet/{well}/{n}", s.serveSheet)
	return mux
}

func (s *Server) servePage(w http.ResponseWriter, r *http.Request) {
	w.Header().Set("Content-Type", "text/html; charset=utf-8")
	w.Header().Set("Cache-Control", "no-store")
	if err := pageTemplate.Execute(w, s.snapshot()); err != nil {
		http.Error(w, err.Error(), http.StatusInternalServerError)
	}
}

func (s *Server) serveWells(w http.ResponseWriter, r *http.Request) {
	w.Header().Set("Content-Type", "text/html; charset=utf-8")
	w.Header().Set("Cache-Control", "no-store")
	if err := pageTemplate.ExecuteTemplate(w, "body", s.snapshot()); err != nil {
		http.Error(w, err.Error(), http.StatusInternalServerError)
	}
}

// serveSheet answers /sheet/WELL-INDEX/SHEET-INDEX.svg from memory.
func (s *Server) serveSheet(w http.ResponseWriter, r *http.Request) {
	i, err1 := strconv.Atoi(r.PathValue("well"))
	n, err2 := strconv.Atoi(strings.TrimSuffix(r.PathValue("n"), ".svg"))
	snap := s.snapshot()
	if err1 != nil || err2 != nil || i < 0 || i >= len(snap.Wells) || n < 0 || n >= len(snap.Wells[i].Sheets) {
		http.NotFound(w, r)
		return
	}
	w.Header().Set("Content-Type", "image/svg+xml")
	w.Header().Set("Cache-Control", "no-cache")
	w.Header().Set("ETag", `"`+snap.Wells[i].Version+`"`)
	w.Write(snap.Wells[i].Sheets[n].SVG)
}

// serveEvents streams one event per change to an open page.
func (s *Server) serveEvents(w http.ResponseWriter, r *http.Request) {
	fl, ok := w.(http.Flusher)
	if !ok {
		http.Error(w, "streaming unsupported", http.StatusInternalServerError)
		return
	}
	ch := make(chan struct{}, 1)
	s.mu.Lock()
	s.waiters[ch] = true
	s.mu.Unlock()
	defer func() {
		s.mu.Lock()
		delete(s.waiters, ch)
		s.mu.Unlock()
	}()
	w.Header().Set("Content-Type", "text/event-stream")
	w.Header().Set("Cache-Control", "no-store")
	fmt.Fprintf(w, "retry: 500\ndata: %d\n\n", s.snapshot().Version)
	fl.Flush()
	keep := time.NewTicker(15 * time.Second)
	defer keep.Stop()
	for {
		select {
		case <-r.Context().Done():
			return
		case <-ch:
			fmt.Fprintf(w, "data: %d\n\n", s.snapshot().Version)
		case <-keep.C:
			fmt.Fprint(w, ": keep-alive\n\n")
		}
		fl.Flush()
	}
}

// Serve listens on addr and serves until ctx ends, following the
// project's files; ready is called with the address once listening.
func (s *Server) Serve(ctx context.Context, addr string, ready func(addr string)) error {
	ln, err := net.Listen("tcp", addr)
	if err != nil {
		return err
	}
	watch, err := newWatcher(s.dir, s.Refresh, s.watchDirs)
	if err != nil {
		ln.Close()
		return err
	}
	defer watch.Close()
	srv := &http.Server{Handler: s.Handler(), ReadHeaderTimeout: 10 * time.Second, BaseContext: func(net.Listener) context.Context { return ctx }}
	done := make(chan error, 1)
	go func() { done <- srv.Serve(ln) }()
	if ready != nil {
		ready(ln.Addr().String())
	}
	select {
	case <-ctx.Done():
		shut, cancel := context.WithTimeout(context.Background(), 2*time.Second)
		defer cancel()
		if err := srv.Shutdown(shut); err != nil {
			srv.Close()
		}
		return nil
	case err := <-done:
		if errors.Is(err, http.ErrServerClosed) {
			return nil
		}
		return err
	}
}

// watchDirs are the directories whose files the page depends on: the
// project's, the wells' (and their subfolders), and those of the profile
// and yields files.
func (s *Server) watchDirs() []string {
	s.mu.Lock()
	st, wells := s.settings, s.wells
	s.mu.Unlock()
	seen := map[string]bool{s.dir: true}
	out := []string{s.dir}
	add := func(d string) {
		if d != "" && !seen[d] {
			seen[d] = true
			out = append(out, d)
		}
	}
	for _, w := range wells {
		add(filepath.Dir(w.Path))
		for _, im := range w.Images {
			add(filepath.Dir(im))
		}
	}
	if st != nil && st.run != nil {
		for _, set := range st.run.Settings {
			if p := set.Project; p != nil {
				add(filepath.Clean(p.Path(p.Wells)))
			}
			for _, f := range []string{set.ProfileFile, set.YieldsFile} {
				if f != "" {
					add(filepath.Dir(f))
				}
			}
		}
	}
	return out
}
