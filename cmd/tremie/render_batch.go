package main

import (
	"fmt"
	"path/filepath"
	"strings"

	"github.com/tremie-dev/tremie/cmd/internal/batch"
	"github.com/tremie-dev/tremie/cmd/internal/incremental"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/rules"
)

// renderJob is one well of a render run with its cache identity.
type renderJob struct {
	path string
	key  string // the cache key: the file relative to its project, else its path
	base incremental.Base
}

// loadedWell is a well file read and parsed once, before names are given
// out; the worker that draws it takes it from there.
type loadedWell struct {
	data []byte
	well *schema.Well // nil when err is set
	err  error        // the file could not be read or parsed
}

// loadAll reads and parses every file in parallel.
func loadAll(files []string) []loadedWell {
	res, _ := batch.Run(files, batch.Options{}, func(_ int, f string) (loadedWell, batch.Outcome, error) {
		data, err := schema.ReadInput(f, schema.MaxTextFile)
		if err != nil {
			return loadedWell{err: inputErr(schema.ErrorList{schema.ReadError(f, "", err)})}, batch.Done, nil
		}
		w, err := schema.Load(f, data)
		if err != nil {
			return loadedWell{data: data, err: inputErr(err)}, batch.Done, nil
		}
		return loadedWell{data: data, well: w}, batch.Done, nil
	})
	out := make([]loadedWell, len(res))
	for i, r := range res {
		out[i] = r.Value
		if r.Err != nil { // a panic caught by the runner
			out[i] = loadedWell{err: inputErr(r.Err)}
		}
	}
	return out
}

// renderRun draws every well in parallel, skipping those whose inputs are
// unchanged since the cache in the output directory was written (unless
// force). A skipped well is still loaded and checked, which is cheap, so
// that the exit code always reflects the check.
func renderRun(files []string, loaded []loadedWell, opts renderOptions, force bool, profileBytes, yieldsBytes []byte) ([]batch.Result[renderResult], batch.Summary, *incremental.Cache, []string, error) {
	defer lessEagerGC()()
	cache, cacheErr := incremental.Load(opts.outDir)
	bases := map[*project.Project]incremental.Base{}
	jobs := make([]renderJob, len(files))
	for i, f := range files {
		prj := opts.projects[f]
		b, ok := bases[prj]
		if !ok {
			b = incremental.NewBase(renderShared(prj, opts, profileBytes, yieldsBytes))
			bases[prj] = b
		}
		key := filepath.ToSlash(f)
		if prj != nil {
			key = prj.Key(f)
		}
		jobs[i] = renderJob{path: f, key: key, base: b}
	}
	res, sum := batch.Run(jobs, batch.Options{Progress: batch.Terminal(), Label: "drawing"}, func(i int, j renderJob) (renderResult, batch.Outcome, error) {
		l := loaded[i]
		loaded[i] = loadedWell{} // this worker owns it now; let it go when done
		if l.err != nil {
			if l.data != nil { // read but not parsed: its outputs no longer stand for it
				cache.Forget(j.key)
			}
			return renderResult{Path: j.path}, batch.Failed, l.err
		}
		hash := j.base.Well(l.data)
		if !force {
			if outs, ok := cache.Recorded(j.key, hash); ok {
				r := checkOnly(j.path, l.well, opts)
				for _, o := range outs {
					r.Outputs = append(r.Outputs, filepath.Join(opts.outDir, filepath.FromSlash(o)))
				}
				return r, batch.Skipped, nil
			}
		}
		r, err := renderLoaded(j.path, l.well, opts)
		if err != nil {
			cache.Forget(j.key)
			return r, batch.Failed, err
		}
		if r.Refused {
			cache.Forget(j.key)
			return r, batch.Done, nil
		}
		rel := make([]string, len(r.Outputs))
		for k, o := range r.Outputs {
			if p, err := filepath.Rel(opts.outDir, o); err == nil {
				rel[k] = p
			} else {
				rel[k] = o
			}
		}
		cache.Record(j.key, hash, rel)
		return r, batch.Done, nil
	})
	present := make([]string, len(jobs))
	for i, j := range jobs {
		present[i] = j.key
	}
	stale := cache.Stale(present)
	return res, sum, cache, stale, cacheErr
}

// checkOnly checks a well whose sheets are up to date.
func checkOnly(path string, w *schema.Well, opts renderOptions) renderResult {
	project.Apply(opts.projects[path], w)
	r := renderResult{Path: path, WellID: w.ID, Findings: rules.Check(w, opts.profile)}
	r.Blocking = rules.Blocking(r.Findings)
	return r
}

// renderShared lists everything besides the well file that changes what
// a well's outputs hold.
func renderShared(prj *project.Project, opts renderOptions, profileBytes, yieldsBytes []byte) incremental.Shared {
	s := incremental.Shared{Version: Version, Profile: profileBytes}
	page, landscape := opts.pageName, opts.landscape
	if prj != nil {
		s.Settings = prj.Settings()
		if prj.Logo != nil {
			s.Logo = prj.Logo.Data
		}
		if !opts.pageSet {
			page, landscape = prj.Page, prj.Landscape
		}
	}
	s.Template = []byte(fmt.Sprintf("%s landscape=%v", page, landscape))
	scale := ""
	if opts.scale != nil {
		scale = opts.scale.String()
	}
	s.Options = []string{
		"formats=" + strings.Join(opts.formats, ","),
		fmt.Sprintf("dpi=%g", opts.dpi),
		"scale=" + scale,
		fmt.Sprintf("strict=%v", opts.strict),
		fmt.Sprintf("issue=%v", opts.issue),
		"date=" + opts.date,
		"yields=" + string(yieldsBytes),
	}
	return s
}
