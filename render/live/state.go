// Package live serves a project as a local web page that follows the
// files on disk: every well with its status, sheets (SVG), findings with
// file and line, and quantities. When a well, project, profile or yields
// file changes, the wells it touches are checked and drawn again (an
// unchanged well keeps its drawing: a content-hash cache) and the open
// page updates itself over Server-Sent Events, keeping its scroll
// position. Sheets are kept in memory: the server writes no file.
package live

import (
	"crypto/sha256"
	"errors"
	"fmt"
	"html/template"
	"strings"

	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/pipeline"
	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/render/wallimage"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

// Status is a well's standing on the page, in the words of the summary
// table and the book (table.StatusOf).
type Status = table.Status

// Well is one well file as the page shows it.
type Well struct {
	Key        string // path relative to the project, forward slashes
	Path       string
	ID         string
	Status     Status
	Problems   schema.ErrorList // why it could not be read or parsed; then no sheet
	Findings   []rules.Finding
	Quantities *quantity.Report
	Sheets     []Sheet
	// Thresholds names the rule thresholds the well was checked with:
	// the defaults, or the profile in force with its file and code.
	Thresholds string
	Version    string // hash of what it was made from: changes when it is redrawn
	// Images are the well's wall image files: their size and time enter
	// Version, so that a changed image redraws the sheet, and their
	// folders are watched.
	Images []string
	// idLine finds the line of well.id, for the error naming a well that
	// shares its ID (only then: it scans the file's keys); prepared is the well as drawn when this is such an
	// error laid over it, kept so that an unchanged file is not drawn again.
	idLine   func() int
	prepared *Well
}

// Sheet is one drawn sheet.
type Sheet struct {
	SVG []byte
	// Aspect is the sheet's "width / height", to hold its place on the
	// page while it loads (a number pair, safe as CSS).
	Aspect template.CSS
}

// settings reads the project through the pipeline: its wells, each with
// the setting (profile, yields, page) it is judged with, a hash of each
// setting's files, and what could not be read.
type settings struct {
	run      *pipeline.Run
	hashes   map[*pipeline.Setting][32]byte
	problems []error
}

func loadSettings(dir string) *settings {
	st := &settings{hashes: map[*pipeline.Setting][32]byte{}}
	run, _, err := pipeline.ResolveProject(dir, pipeline.Options{Quiet: true})
	if err != nil {
		st.problems = append(st.problems, err)
		return st
	}
	st.run = run
	st.problems = append(st.problems, run.Problems...)
	for _, s := range run.Settings {
		h := sha256.New()
		if s.Project != nil {
			data, _ := schema.ReadInput(s.Project.File, schema.MaxTextFile)
			h.Write(data)
		}
		for _, f := range []string{s.ProfileFile, s.YieldsFile} {
			h.Write([]byte{0})
			if f != "" {
				data, _ := schema.ReadInput(f, schema.MaxTextFile)
				h.Write(data)
			}
		}
		fmt.Fprintf(h, "\x00%s\x00%v", s.PageName, s.Landscape)
		var sum [32]byte
		h.Sum(sum[:0])
		st.hashes[s] = sum
	}
	return st
}

// prepare checks, quantifies and draws one well through the pipeline.
// prev is the last result for the same file: returned as it is when
// neither the file nor its setting changed.
func prepare(st *settings, in pipeline.Input, prev *Well) *Well {
	data, rerr := schema.ReadInput(in.Path, schema.MaxTextFile)
	sum := st.hashes[in.Setting]
	// The images the well named last time: if the file names others, its
	// bytes changed and it is drawn again anyway.
	var images []string
	if prev != nil {
		images = prev.Images
	}
	versionOf := func(images []string) string {
		h := sha256.New()
		h.Write(sum[:])
		h.Write(data)
		h.Write(wallimage.FingerprintOf(images))
		return fmt.Sprintf("%x", h.Sum(nil))[:16]
	}
	version := versionOf(images)
	if prev != nil && prev.Version == version && rerr == nil {
		return prev
	}
	w := &Well{Key: in.Key, Path: in.Path, Version: versionOf(nil), Status: table.Unreadable}
	pw := pipeline.Prepare(in, pipeline.AllRules)
	if pw.Err != nil {
		w.Problems = problemsOf(pw.Err, in)
		return w
	}
	w.Images = wallimage.Paths(in.Path, pw.Well)
	w.Version = versionOf(w.Images)
	w.ID = pw.ID
	wl := pw.Well
	w.idLine = func() int { return wl.Line("well.id") }
	note := in.Setting.Profile.ThresholdNote() // "rule thresholds ..."
	w.Thresholds = strings.ToUpper(note[:1]) + note[1:]
	w.Quantities = pw.Quantities
	w.Findings = pw.Findings
	for i := range w.Findings {
		if w.Findings[i].File == in.Path {
			w.Findings[i].File = in.Key // name the file as the project does
		}
	}
	w.Status = table.StatusOf(pw.Well, w.Findings)
	doc, err := pw.Layout(pipeline.LayoutOptions{})
	if err != nil {
		w.Problems = problemsOf(err, in)
		return w
	}
	for i := range doc.Pages {
		svg, err := out.SVG(doc, i)
		if err != nil {
			w.Problems = problemsOf(err, in)
			return w
		}
		pg := doc.Pages[i]
		w.Sheets = append(w.Sheets, Sheet{SVG: svg, Aspect: template.CSS(fmt.Sprintf("%g / %g", pg.Width, pg.Height))})
	}
	return w
}

// problemsOf is an error as the page lists it, each position naming the
// file relative to the project.
func problemsOf(err error, in pipeline.Input) schema.ErrorList {
	el, ok := listOf(err)
	if !ok {
		el = schema.ErrorList{{File: in.Path, Msg: err.Error()}}
	}
	return renamed(el, func(file string) string {
		if file == in.Path {
			return in.Key
		}
		return file
	})
}

// listOf is err as a list of errors with positions; ok is false for an
// error without one.
func listOf(err error) (el schema.ErrorList, ok bool) {
	var one *schema.Error
	switch {
	case errors.As(err, &el):
		return el, true
	case errors.As(err, &one):
		return schema.ErrorList{one}, true
	}
	return nil, false
}

// renamed is a copy of the list with each error's file named by name.
func renamed(el schema.ErrorList, name func(file string) string) schema.ErrorList {
	out := make(schema.ErrorList, len(el))
	for i, e := range el {
		c := *e
		c.File = name(c.File)
		out[i] = &c
	}
	return out
}

// markDuplicateIDs shows every well sharing its ID with another as an
// input error naming the others (pipeline.DuplicateIDs), as every other
// command does; the wells as drawn are kept beneath for the next refresh.
func markDuplicateIDs(wells []*Well) {
	var ids []pipeline.IDAt
	var of []int
	for i, w := range wells {
		if w.Problems == nil && w.ID != "" {
			ids = append(ids, pipeline.IDAt{File: w.Key, ID: w.ID, Locate: w.idLine})
			of = append(of, i)
		}
	}
	for k, e := range pipeline.DuplicateIDs(ids) {
		if e == nil {
			continue
		}
		w := wells[of[k]]
		wells[of[k]] = &Well{Key: w.Key, Path: w.Path, ID: w.ID, Status: table.Unreadable, Problems: schema.ErrorList{e},
			Version: fmt.Sprintf("%.16x", sha256.Sum256([]byte(w.Version+e.Error()))), Images: w.Images, prepared: w}
	}
}
