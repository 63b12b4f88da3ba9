package pipeline

import (
	"crypto/sha256"
	"encoding/hex"
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"strconv"
	"strings"

	"github.com/tremie-dev/tremie/render/features"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/pipeline/batch"
	"github.com/tremie-dev/tremie/render/pipeline/incremental"
	"github.com/tremie-dev/tremie/render/sheet"
	"github.com/tremie-dev/tremie/render/wallimage"
)

// RenderOptions are the drawing choices of a render run.
type RenderOptions struct {
	Formats []out.Format // in the order given
	DPI     float64      // for raster formats
	Text    out.TextMode // how SVG and PDF write words ("" is text)
	Scale   *sheet.Scale // nil: automatic
	Strict  bool         // refuse to draw a well with unwaived error findings
	// Issue draws the issued set (a project may ask for it too): no rule
	// IDs or file lines, a revision block and a seal space; a well with
	// unwaived error findings is refused.
	Issue bool
	// Force redraws every well, and lets outputs replace files in the
	// output directory that tremie did not write.
	Force bool
	// Version is the tool version; it enters every output's content hash.
	Version string
}

// Rendered is what became of one well of a render run.
type Rendered struct {
	*Well
	Sheets  int
	Outputs []string      // paths of the files written (or, when skipped, already there)
	Outcome batch.Outcome // Done, Skipped (unchanged) or Failed
	Refused bool          // Strict (or Issue) and blocking: nothing written
	Issue   bool          // drawn, or refused, as the issued set
	// FitNotes is set when --scale fit drew the well on one sheet but its
	// notes still need notes sheets: the command says so (not an error).
	FitNotes *FitNotes
	// Err is why the well was not drawn: an *OutputError when a file
	// could not be written, else an input error.
	Err error

	written []incremental.Output // what the cache records of the outputs
}

// RenderReport is the outcome of a render run.
type RenderReport struct {
	Wells   []Rendered // in input order
	Summary batch.Summary
	// Refused counts the wells refused under --strict or in an issued set:
	// nothing was drawn for them, so Summary.Done leaves them out.
	Refused int
	// Stale are outputs in the output directory (relative to it) whose
	// well file is gone or that a well no longer produces; never deleted.
	Stale []string
	// Warnings are problems that did not stop the run (a damaged cache).
	Warnings []error
	// SaveErr is set when the cache could not be written.
	SaveErr error
}

// OutputError is a failure to write an output (exit code 4), as opposed
// to a well that could not be read or drawn.
type OutputError struct{ Err error }

func (e *OutputError) Error() string { return e.Err.Error() }
func (e *OutputError) Unwrap() error { return e.Err }

// IsOutputError reports whether err is a failure to write an output.
func IsOutputError(err error) bool {
	var oe *OutputError
	return errors.As(err, &oe)
}

// renderJob is one well of a render run with its cache identity.
type renderJob struct {
	well *Well
	name string // output base name
	base incremental.Base
}

// Render draws every well of the run into Run.OutDir in parallel,
// skipping those whose inputs are unchanged since the cache in the output
// directory was written (unless Force). A skipped well is still checked,
// which is cheap, so that the verdict always reflects the check. Outputs
// only replace files tremie wrote there itself (or with Force).
func (r *Run) Render(opt RenderOptions) (*RenderReport, error) {
	if r.OutDir == "" {
		return nil, errors.New("name the output directory with -o OUTDIR")
	}
	if err := os.MkdirAll(r.OutDir, 0o755); err != nil {
		return nil, &OutputError{err}
	}
	defer lessEagerGC()()
	rep := &RenderReport{}
	// Temporary files of runs killed before they could clean up.
	out.SweepTemps(r.OutDir)
	cache, err := incremental.Load(r.OutDir)
	if err != nil {
		rep.Warnings = append(rep.Warnings, err)
	}
	// Names first, in input order, so collisions resolve the same way
	// however the wells are then drawn.
	wells := r.LoadAll()
	names := AssignNames(wells)
	bases := map[*Setting]incremental.Base{}
	jobs := make([]renderJob, len(wells))
	for i, w := range wells {
		b, ok := bases[w.Setting]
		if !ok {
			b = incremental.NewBase(r.shared(w.Setting, opt))
			bases[w.Setting] = b
		}
		jobs[i] = renderJob{well: w, name: names[w], base: b}
	}
	res, sum := batch.Run(jobs, batch.Options{Progress: r.progress(), Label: "drawing"}, func(_ int, j renderJob) (Rendered, batch.Outcome, error) {
		w := j.well
		rd := Rendered{Well: w}
		if w.Err != nil {
			if w.Data != nil { // read but not judged: its outputs no longer stand for it
				cache.Forget(w.Key)
			}
			return rd, batch.Failed, w.Err
		}
		w.Prepare(AllRules)
		// A changed wall image changes the sheet: it joins the well's bytes
		// in the cache key (by size and time, not read twice).
		hash := j.base.Well(append(w.Data[:len(w.Data):len(w.Data)], wallimage.Fingerprint(w.Path, w.Well)...))
		w.Data = nil // drawn from the model from here on; let the bytes go
		if !opt.Force {
			if outs, ok := cache.Recorded(w.Key, hash); ok {
				for _, o := range outs {
					rd.Outputs = append(rd.Outputs, filepath.Join(r.OutDir, filepath.FromSlash(o)))
				}
				// The sheets stand as drawn: --scale fit still says what
				// went on notes sheets (a plan, nothing drawn).
				rd.FitNotes = w.plannedFitNotes(LayoutOptions{Scale: opt.Scale, Date: r.SourceDate, Issue: w.Setting.Issue(opt.Issue)})
				w.Well, w.Quantities = nil, nil
				return rd, batch.Skipped, nil
			}
		}
		rd.Issue = w.Setting.Issue(opt.Issue)
		if w.Blocking() && (opt.Strict || rd.Issue) {
			rd.Refused = true
			cache.Forget(w.Key)
			return rd, batch.Done, nil
		}
		if err := r.draw(&rd, j.name, cache, opt); err != nil {
			cache.Forget(w.Key)
			return rd, batch.Failed, err
		}
		cache.RecordOutputs(w.Key, relTo(r.OutDir, w.Path), hash, rd.written)
		w.Well, w.Quantities = nil, nil // drawn: keep only what the report prints
		return rd, batch.Done, nil
	})
	rep.Wells = make([]Rendered, len(res))
	present := make([]string, len(jobs))
	for i, x := range res {
		rep.Wells[i] = x.Value
		rep.Wells[i].Outcome, rep.Wells[i].Err = x.Outcome, x.Err
		if rep.Wells[i].Well == nil { // a panic leaves no value
			rep.Wells[i].Well = jobs[i].well
		}
		present[i] = jobs[i].well.Key
		if rep.Wells[i].Refused {
			rep.Refused++
			sum.Done--
		}
	}
	rep.Summary = sum
	rep.Stale = cache.Stale(present)
	rep.SaveErr = cache.Save()
	return rep, nil
}

// draw lays out one prepared well, encodes it in every format (with its
// wall-feature summary) and writes every file of the well together: all
// are staged beside their destinations first, and only when every one is
// staged are they renamed into place, so that a failure part-way leaves
// the well's old outputs as they were, none of them mixed with new ones.
func (r *Run) draw(rd *Rendered, base string, cache *incremental.Cache, opt RenderOptions) error {
	w := rd.Well
	lo := LayoutOptions{Scale: opt.Scale, Date: r.SourceDate, Issue: rd.Issue}
	doc, econ, err := w.LayoutReport(lo)
	if err != nil {
		return err
	}
	rd.FitNotes = w.fitNotes(lo, econ)
	rd.Sheets = len(doc.Pages)
	docs := []outputDoc{{doc: doc, base: base, several: "-sheet"}}
	pw, ph := portrait(w.Setting.Page)
	if feats := features.WellSummary(w.Path, w.Well, pw, ph, r.SourceDate); feats != nil {
		docs = append(docs, outputDoc{doc: feats, base: base + "-features", several: "-features-page", what: "feature summary: "})
	}
	files, err := encodeAll(w.Path, docs, opt)
	if err != nil {
		return err
	}
	if err := commitAll(r.OutDir, files, cache, opt.Force); err != nil {
		return err
	}
	for _, f := range files {
		rd.Outputs = append(rd.Outputs, filepath.Join(r.OutDir, f.name))
		sum := sha256.Sum256(f.data)
		o := incremental.Output{Rel: f.name, Size: int64(len(f.data)), Sum: hex.EncodeToString(sum[:])}
		if st, err := os.Stat(filepath.Join(r.OutDir, f.name)); err == nil {
			o.ModTime = st.ModTime().UnixNano() // the time Recorded compares before hashing
		}
		rd.written = append(rd.written, o)
	}
	for _, f := range opt.Formats {
		if f.PerSheet {
			removeStaleSheets(r.OutDir, base, f.Ext, len(doc.Pages), cache)
		}
	}
	return nil
}

// pending is an encoded output not yet written.
type pending struct {
	name string
	data []byte
}

// commitAll writes files into dir all or nothing: each must be the
// user's to replace (see writeOwned), each is staged, and only then are
// they renamed into place.
func commitAll(dir string, files []pending, cache *incremental.Cache, force bool) error {
	for _, f := range files {
		if err := mayReplace(dir, f.name, cache, force); err != nil {
			return err
		}
	}
	staged := make([]*out.Staged, 0, len(files))
	for _, f := range files {
		s, err := out.Stage(filepath.Join(dir, f.name), f.data)
		if err != nil {
			for _, done := range staged {
				done.Abort()
			}
			return &OutputError{err}
		}
		staged = append(staged, s)
	}
	if err := out.CommitAll(staged); err != nil {
		return &OutputError{err}
	}
	return nil
}

// mayReplace refuses to replace a file at dir/name that tremie did not
// write (the cache does not know it), unless force.
func mayReplace(dir, name string, cache *incremental.Cache, force bool) error {
	dst := filepath.Join(dir, name)
	if !force && !cache.Owns(name) {
		if _, err := os.Lstat(dst); err == nil {
			return &OutputError{fmt.Errorf("%s exists and was not written by tremie: not replaced (move it away, or use --force)", dst)}
		}
	}
	return nil
}

// writeOwned writes dir/name atomically, unless a file is there that
// tremie did not write (the cache does not know it) and force is off:
// nothing of the user's is replaced unasked.
func writeOwned(dir, name string, data []byte, cache *incremental.Cache, force bool) error {
	if err := mayReplace(dir, name, cache, force); err != nil {
		return err
	}
	if err := out.WriteFileAtomic(filepath.Join(dir, name), data); err != nil {
		return &OutputError{err}
	}
	return nil
}

// WriteOwned writes a file that belongs to no one well (a book, a summary
// table) into an output directory, under the same rule as sheets: it
// replaces only a file tremie wrote there, unless force. It records the
// file in the directory's cache.
func WriteOwned(dir, name string, data []byte, force bool) error {
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return &OutputError{fmt.Errorf("creating %s: %w", dir, err)}
	}
	cache, _ := incremental.Load(dir) // a damaged cache owns nothing: refuse rather than guess
	if err := writeOwned(dir, name, data, cache, force); err != nil {
		return err
	}
	cache.Claim(name)
	if err := cache.Save(); err != nil {
		return &OutputError{err}
	}
	return nil
}

// removeStaleSheets deletes this well's sheet files left by an earlier
// run that drew it on a different number of sheets, so the directory
// never holds a mix: base.ext when there are now several sheets, and
// base-sheetN.ext beyond the count (all of them when there is one). Only
// files tremie wrote are removed.
func removeStaleSheets(dir, base, ext string, n int, cache *incremental.Cache) {
	entries, err := os.ReadDir(dir)
	if err != nil {
		return
	}
	prefix := base + "-sheet"
	for _, e := range entries {
		name := e.Name()
		if e.IsDir() || !cache.Owns(name) {
			continue
		}
		if name == base+ext && n > 1 {
			os.Remove(filepath.Join(dir, name))
			continue
		}
		if !strings.HasPrefix(name, prefix) || !strings.HasSuffix(name, ext) {
			continue
		}
		num := name[len(prefix) : len(name)-len(ext)]
		k, err := strconv.Atoi(num)
		if err != nil || k < 1 || strconv.Itoa(k) != num {
			continue
		}
		if n == 1 || k > n {
			os.Remove(filepath.Join(dir, name))
		}
	}
}

// relTo is path relative to dir with forward slashes, else path itself.
func relTo(dir, path string) string {
	ad, err1 := filepath.Abs(dir)
	ap, err2 := filepath.Abs(path)
	if err1 == nil && err2 == nil {
		if rel, err := filepath.Rel(ad, ap); err == nil {
			return filepath.ToSlash(rel)
		}
	}
	return filepath.ToSlash(path)
}

// shared lists everything besides the well file that changes what a
// well's outputs hold.
func (r *Run) shared(s *Setting, opt RenderOptions) incremental.Shared {
	sh := incremental.Shared{Version: opt.Version, Profile: s.profileBytes}
	if s.Project != nil {
		sh.Settings = s.Project.Settings()
	}
	sh.Logo = s.Logo()
	sh.Template = []byte(fmt.Sprintf("%s landscape=%v", s.PageName, s.Landscape))
	scale := ""
	if opt.Scale != nil {
		scale = opt.Scale.String()
	}
	names := make([]string, len(opt.Formats))
	for i, f := range opt.Formats {
		names[i] = f.Name
	}
	sh.Options = []string{
		"formats=" + strings.Join(names, ","),
		fmt.Sprintf("dpi=%g", opt.DPI),
		"text=" + string(opt.Text),
		"scale=" + scale,
		fmt.Sprintf("strict=%v", opt.Strict),
		fmt.Sprintf("issue=%v", opt.Issue),
		"date=" + r.SourceDate,
		"yields=" + string(s.yieldsBytes),
	}
	return sh
}

// WriteFile writes a file the user named, atomically, creating its
// directory.
func WriteFile(path string, data []byte) error {
	if dir := filepath.Dir(path); dir != "" {
		if err := os.MkdirAll(dir, 0o755); err != nil {
			return &OutputError{fmt.Errorf("creating %s: %w", dir, err)}
		}
	}
	if err := out.WriteFileAtomic(path, data); err != nil {
		return &OutputError{err}
	}
	return nil
}
