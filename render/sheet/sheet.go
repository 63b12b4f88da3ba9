// Package sheet lays out one well as scaled construction-log sheets: a
// device-independent draw.Document whose items carry Role strings that
// tests read ("interval:fill[2]", "screen:main[1]", "callout:fill[2]",
// "legend:filter-pack", ...). It reads the typed well model, the check's
// findings and the quantity report; it knows nothing of files or output
// formats (package render/out writes the document).
package sheet

import (
	"errors"
	"fmt"
	"strings"
	"time"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/wallimage"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

// Inputs is what the sheet shows besides the well itself.
type Inputs struct {
	Findings   []rules.Finding
	Quantities *quantity.Report // nil: no amounts table
	TitleBlock project.TitleBlock
	Logo       []byte // the client's or consultant's logo, PNG or JPEG; nil for none
	// Profile is the rule profile the findings were made under (nil for
	// the defaults): the footer names it.
	Profile *rules.Profile
	// WallImages are the well's [[wall_image]] files, decoded, by name;
	// a missing one is drawn as a blank strip.
	WallImages map[string]*wallimage.Image
}

// Options are the drafting choices.
type Options struct {
	Page  Page   // zero value: US Letter, portrait
	Scale *Scale // nil: automatic
	// SheetOffset is the number of sheets before this well's in a set, and
	// SheetTotal the set's size (0: this well's own sheet count), for
	// "sheet n of m" in a bound book.
	SheetOffset int
	SheetTotal  int
	// Date is the document date written by backends (RFC 3339); "" takes
	// the well's completed or drilled date. Never the clock.
	Date string
	// Issue draws the issued set rather than the draft: no rule IDs or
	// file lines, waivers and remarks in plain words, a revision block and
	// a space for the professional's seal and signature. A well with
	// unwaived error findings is refused (ErrNotIssuable).
	Issue bool
}

// ErrNotIssuable is returned (wrapped) by Layout for an issued set of a
// well whose check found unwaived errors.
var ErrNotIssuable = errors.New("not issuable")

// Caution is printed on every sheet drawn under the default thresholds;
// under a profile the footer names it (rules.Caution).
var Caution = rules.Caution(nil)

// NotFinal is the stamp of a sheet whose well has unwaived error findings.
const NotFinal = "NOT FINAL — check findings"

// Layout draws a well on one or more sheets.
func Layout(w *schema.Well, in Inputs, opt Options) (*draw.Document, error) {
	doc, _, err := LayoutReport(w, in, opt)
	return doc, err
}

// LayoutReport draws a well as Layout does and says how its sheets were
// spent.
func LayoutReport(w *schema.Well, in Inputs, opt Options) (*draw.Document, Economy, error) {
	l, err := planned(w, in, opt)
	if err != nil {
		return nil, Economy{}, err
	}
	doc := &draw.Document{
		Title:   fmt.Sprintf("%s %s", w.ID, strings.ToLower(l.sheetTitle())),
		Subject: joinNonEmpty(" · ", w.Project, w.Site),
		Author:  joinNonEmpty(", ", in.TitleBlock.Consultant, w.LoggedBy),
		Date:    documentDate(w, opt.Date),
	}
	for i := 0; i < l.sheetCount(); i++ {
		doc.Pages = append(doc.Pages, l.page(i))
	}
	return doc, l.economy(), nil
}

// planned checks the page and the issue and plans the well's sheets.
func planned(w *schema.Well, in Inputs, opt Options) (*layout, error) {
	if w == nil {
		return nil, fmt.Errorf("sheet: no well")
	}
	pg := opt.Page
	if pg.Width == 0 {
		pg = Letter
	}
	if err := pg.check(); err != nil {
		return nil, err
	}
	if opt.Issue && rules.Blocking(in.Findings) {
		n := rules.Count(in.Findings).Errors
		return nil, fmt.Errorf("well %s: %w: %d unwaived error %s; resolve or waive them, or draw a draft without --issue", w.ID, ErrNotIssuable, n, plural(n, "finding", "findings"))
	}
	l := newLayout(w, in, opt, pg)
	if err := l.plan(); err != nil {
		return nil, fmt.Errorf("well %s: %w", w.ID, err)
	}
	return l, nil
}

// documentDate is the given date, or the well's completed (else drilled)
// date at midnight UTC, or "".
func documentDate(w *schema.Well, given string) string {
	if given != "" {
		return given
	}
	for _, d := range []schema.Date{w.Completed, w.Drilled} {
		if !d.IsZero() {
			return d.Time().Format(time.RFC3339)
		}
	}
	return ""
}

func joinNonEmpty(sep string, parts ...string) string {
	out := ""
	for _, p := range parts {
		if p == "" {
			continue
		}
		if out != "" {
			out += sep
		}
		out += p
	}
	return out
}
