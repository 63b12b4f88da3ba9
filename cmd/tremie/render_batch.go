package main

import (
	"fmt"
	"os"
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

// renderRun draws every well in parallel, skipping those whose inputs are
// unchanged since the cache in the output directory was written (unless
// force). A skipped well is still loaded and checked, which is cheap, so
// that the exit code always reflects the check.
func renderRun(files []string, opts renderOptions, force bool, profileBytes, yieldsBytes []byte) ([]batch.Result[renderResult], batch.Summary, *incremental.Cache, []string, error) {
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
	res, sum := batch.Run(jobs, batch.Options{Progress: batch.Terminal(), Label: "drawing"}, func(_ int, j renderJob) (renderResult, batch.Outcome, error) {
		data, err := os.ReadFile(j.path)
		if err != nil {
			return renderResult{Path: j.path}, batch.Failed, inputErr(schema.ErrorList{{File: j.path, Msg: fmt.Sprintf("cannot read: %v", err)}})
		}
		hash := j.base.Well(data)
		if !force {
			if outs, ok := cache.Recorded(j.key, hash); ok {
				r, err := checkOnly(j.path, data, opts)
				if err == nil {
					for _, o := range outs {
						r.Outputs = append(r.Outputs, filepath.Join(opts.outDir, filepath.FromSlash(o)))
					}
					return r, batch.Skipped, nil
				}
			}
		}
		r, err := renderWell(j.path, opts)
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

// checkOnly loads and checks a well whose sheets are up to date.
func checkOnly(path string, data []byte, opts renderOptions) (renderResult, error) {
	w, err := schema.Load(path, data)
	if err != nil {
		return renderResult{Path: path}, err
	}
	project.Apply(opts.projects[path], w)
	r := renderResult{Path: path, WellID: w.ID, Findings: rules.Check(w, opts.profile)}
	r.Blocking = rules.Blocking(r.Findings)
	return r, nil
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
		"date=" + opts.date,
		"yields=" + string(yieldsBytes),
	}
	return s
}
