package pipeline

import (
	"errors"
	"fmt"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/sheet"
	"github.com/tremie-dev/tremie/render/wallimage"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

// Checks says which rules a well is checked with.
type Checks int

const (
	AllRules       Checks = iota // every rule (check, render, book, table)
	ReconcileRules               // only the reconciliation of placed amounts and tags (quantities)
)

// Well is one well file carried through the pipeline: read and parsed by
// Load, completed, checked and quantified by Prepare, drawn by Layout.
type Well struct {
	Input
	Data []byte       // the file's bytes, nil when it could not be read
	Well *schema.Well // nil when Err is set
	ID   string       // the well's ID, "" when it could not be read
	// Err is why the well cannot be judged: the file could not be read or
	// parsed (a schema.ErrorList), its setting could not be read, or its
	// ID is another well's too.
	Err        error
	Findings   []rules.Finding  // after Prepare
	Quantities *quantity.Report // after Prepare
}

// ErrSetting marks a well whose project settings could not be read; the
// reasons are in Run.Problems, printed once.
var ErrSetting = errors.New("not judged: its project's settings could not be read")

// Load reads and parses one well file.
func Load(in Input) *Well {
	w := &Well{Input: in}
	if in.Setting != nil && in.Setting.Err != nil {
		w.Err = &schema.Error{File: in.Path, Msg: ErrSetting.Error()}
		return w
	}
	data, err := schema.ReadInput(in.Path, schema.MaxTextFile)
	if err != nil {
		w.Err = schema.ErrorList{schema.ReadError(in.Path, "", err)}
		return w
	}
	w.Data = data
	if w.Well, err = schema.Load(in.Path, data); err != nil {
		w.Well, w.Err = nil, err
		return w
	}
	w.ID = w.Well.ID
	return w
}

// Prepare completes a loaded well from its project's defaults, checks it
// with its setting's profile and computes its quantities with the
// setting's yields. A well that could not be loaded is left as it is.
func (w *Well) Prepare(checks Checks) {
	if w.Err != nil || w.Well == nil {
		return
	}
	s := w.Setting
	project.Apply(s.Project, w.Well)
	w.Quantities = quantity.Compute(w.Well, s.Yields)
	rs := rules.All()
	if checks == ReconcileRules {
		rs = rules.Select(rules.Reconciling)
	}
	// The rules reuse the quantities when they were computed with the
	// yields the rules would use.
	var q *quantity.Report
	if prof := s.Profile; (prof == nil && s.Yields == nil) || (prof != nil && prof.Yields == s.Yields) {
		q = w.Quantities
	}
	w.Findings = rules.RunWithQuantities(w.Well, rs, s.Profile, q)
	if w.Findings == nil {
		w.Findings = []rules.Finding{}
	}
}

// Prepare loads and prepares one well.
func Prepare(in Input, checks Checks) *Well {
	w := Load(in)
	w.Prepare(checks)
	return w
}

// Blocking reports whether the well has an unwaived error finding.
func (w *Well) Blocking() bool { return rules.Blocking(w.Findings) }

// LayoutOptions are the drafting choices a command may make.
type LayoutOptions struct {
	Scale *sheet.Scale // nil: automatic
	// Date is the document date (RFC 3339): the run's SourceDate, a
	// project's date, or "" for the well's own.
	Date string
	// SheetOffset and SheetTotal number the sheets within a bound set.
	SheetOffset, SheetTotal int
	// Issue draws the issued set (sheet.Options.Issue).
	Issue bool
}

// SheetInputs is what the sheet shows besides the well: its findings,
// quantities, wall images (read relative to the well file) and its
// project's title block and logo. An image that cannot be read is an
// input error naming the well file and line.
func (w *Well) SheetInputs() (sheet.Inputs, error) {
	s := w.Setting
	in := sheet.Inputs{Findings: w.Findings, Quantities: w.Quantities, TitleBlock: s.TitleBlock(), Logo: s.Logo(), Profile: s.Profile}
	images, errs := wallimage.LoadAll(w.Path, w.Well)
	if len(errs) > 0 {
		return in, errors.Join(errs...)
	}
	in.WallImages = images
	return in, nil
}

// SheetOptions are the drafting choices: the setting's page and opt.
func (w *Well) SheetOptions(opt LayoutOptions) sheet.Options {
	return sheet.Options{Page: w.Setting.Page, Scale: opt.Scale, Date: opt.Date, SheetOffset: opt.SheetOffset, SheetTotal: opt.SheetTotal, Issue: opt.Issue}
}

// Layout lays a prepared well out on its setting's page with its
// project's title block and logo.
func (w *Well) Layout(opt LayoutOptions) (*draw.Document, error) {
	doc, _, err := w.LayoutReport(opt)
	return doc, err
}

// LayoutReport lays the well out as Layout does and says how its sheets
// were spent.
func (w *Well) LayoutReport(opt LayoutOptions) (*draw.Document, sheet.Economy, error) {
	if w.Well == nil {
		return nil, sheet.Economy{}, fmt.Errorf("%s: no well to draw", w.Path)
	}
	in, err := w.SheetInputs()
	if err != nil {
		return nil, sheet.Economy{}, err
	}
	doc, econ, err := sheet.LayoutReport(w.Well, in, w.SheetOptions(opt))
	if err != nil {
		return nil, sheet.Economy{}, fmt.Errorf("%s: %w", w.Path, err)
	}
	if n := len(doc.Pages); n > MaxSheets {
		return nil, sheet.Economy{}, fmt.Errorf("%s: %s would take %d sheets (%d log and %d notes sheets), more than the %d one well may have; draw at a smaller scale (--scale), on a larger page (--page), or shorten its notes", w.Path, w.Well.ID, n, econ.Drawings, econ.NotesSheets, MaxSheets)
	}
	if econ.NotesSheets > MaxNotesSheets {
		return nil, sheet.Economy{}, fmt.Errorf("%s: %s: its notes, descriptions, water levels, tags and findings would fill %d notes sheets, more than the %d one well may have; shorten them, or draw at a larger scale (--scale) or on a larger page (--page)", w.Path, w.Well.ID, econ.NotesSheets, MaxNotesSheets)
	}
	return doc, econ, nil
}

// MaxNotesSheets bounds the notes sheets of one well: each costs as much
// to draw as a log sheet, and the wells of the demo and the gallery need
// none (the 1,200-ft, 150-layer well fits on 8 log sheets), so that a
// well of valid but absurd notes (within schema's count and text limits)
// is refused instead of drawn on dozens of sheets for a minute.
const MaxNotesSheets = 10

// MaxSheets bounds all the sheets of one well, log and notes sheets
// together (render/sheet bounds the log sheets alone at 30 too): the
// 1,200-ft gallery well's 25 sheets at 1in=10ft take 2.3 s in SVG, PDF
// and PNG, so the worst well accepted draws in a few seconds.
const MaxSheets = 30

// FitNotes says of a well drawn with --scale fit that its notes still
// need notes sheets: how many, why, and what a larger page would do.
type FitNotes struct {
	ID      string
	Economy sheet.Economy
	// Larger is the next larger page's name ("" when there is none) and
	// LargerNotes the notes sheets the well needs on it.
	Larger      string
	LargerNotes int
}

// String is the message the command prints.
func (f FitNotes) String() string {
	s := fmt.Sprintf("%s: %s", f.ID, f.Economy)
	switch {
	case f.Larger == "":
	case f.LargerNotes == 0:
		s += fmt.Sprintf("; a larger page (%s) holds them on its drawing", f.Larger)
	default:
		s += fmt.Sprintf("; a larger page (%s) holds them on %d notes %s", f.Larger, f.LargerNotes, map[bool]string{true: "sheet", false: "sheets"}[f.LargerNotes == 1])
	}
	return s
}

// plannedFitNotes is the FitNotes of a well whose sheets are not drawn
// again (the render cache found them unchanged): its sheets are planned,
// not drawn, and only with --scale fit.
func (w *Well) plannedFitNotes(opt LayoutOptions) *FitNotes {
	if opt.Scale == nil || !opt.Scale.Fit || w.Well == nil {
		return nil
	}
	in, err := w.SheetInputs()
	if err != nil {
		return nil
	}
	econ, err := sheet.Plan(w.Well, in, w.SheetOptions(opt))
	if err != nil {
		return nil
	}
	return w.fitNotes(opt, econ)
}

// largerPage is the page one size up in its series: Tabloid for Letter,
// A3 for A4.
var largerPage = map[string]string{"letter": "tabloid", "a4": "a3"}

// fitNotes is the FitNotes of a well drawn with --scale fit that keeps
// notes sheets, or nil.
func (w *Well) fitNotes(opt LayoutOptions, econ sheet.Economy) *FitNotes {
	if opt.Scale == nil || !opt.Scale.Fit || econ.NotesSheets == 0 {
		return nil
	}
	f := &FitNotes{ID: w.Well.ID, Economy: econ}
	name := w.Setting.PageName
	if name == "" {
		name = "letter"
	}
	big, ok := largerPage[name]
	if !ok {
		return f
	}
	pg, err := PageFor(big, w.Setting.Landscape)
	if err != nil {
		return f
	}
	in, err := w.SheetInputs()
	if err != nil {
		return f
	}
	so := w.SheetOptions(opt)
	so.Page = pg
	if e, err := sheet.Plan(w.Well, in, so); err == nil {
		f.Larger, f.LargerNotes = big, e.NotesSheets
	}
	return f
}
