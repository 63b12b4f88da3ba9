package sheet

import (
	"fmt"
	"os"
	"path/filepath"
	"sort"
	"testing"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

// The tests over every kind of well (the band, the text regions, the
// sheet economy) walk one corpus: the demo, the gallery and a few wells
// of their own, on every page size and orientation, as a draft and as an
// issued set.

// corpusWell is a well with its inputs, for the tests over every kind.
type corpusWell struct {
	name string
	w    *schema.Well
	in   Inputs
}

// galleryWells reads every well of testdata/gallery with its findings
// and quantities.
func galleryWells(t testing.TB) []corpusWell {
	t.Helper()
	files, err := filepath.Glob("../../testdata/gallery/*.toml")
	if err != nil || len(files) == 0 {
		t.Fatalf("gallery: %v (%d files)", err, len(files))
	}
	var out []corpusWell
	for _, f := range files {
		data, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		w, err := schema.Load(f, data)
		if err != nil {
			t.Fatalf("%s: %v", f, err)
		}
		out = append(out, corpusWell{filepath.Base(f), w, Inputs{Findings: rules.Check(w, nil), Quantities: quantity.Compute(w, nil)}})
	}
	return out
}

// demoAndGallery are the demo's wells, with the inputs tremie render
// gives them, by name, and the gallery's.
func demoAndGallery(t *testing.T) []corpusWell {
	demo := demoWells(t)
	var names []string
	for n := range demo {
		names = append(names, n)
	}
	sort.Strings(names)
	var wells []corpusWell
	for _, n := range names {
		wells = append(wells, corpusWell{n, demo[n].w, demo[n].in})
	}
	return append(wells, galleryWells(t)...)
}

// waived is in with every blocking finding waived, as a professional
// accepting the departures would, so that the well can be issued.
func waived(in Inputs) Inputs {
	out := in
	out.Findings = nil
	for _, f := range in.Findings {
		if f.Blocking() {
			f.Waived, f.Waiver = true, &rules.Waiver{Reason: "accepted by the county for this site", ApprovedBy: "R. Vasquez, PG"}
		}
		out.Findings = append(out.Findings, f)
	}
	return out
}

// setup is one well of the corpus planned on one page.
type setup struct {
	tag  string // "NW-1.toml letter landscape=true", " issued" added for an issued set
	well corpusWell
	opt  Options
	l    *layout
}

// eachSetup plans every well on every page (eachPage), as a draft and,
// with issued, as an issued set too (its errors waived), and calls f.
func eachSetup(t *testing.T, wells []corpusWell, issued bool, f func(s setup)) {
	t.Helper()
	eachPage(t, func(page string, pg Page) {
		for _, c := range wells {
			for _, issue := range []bool{false, true} {
				if issue && !issued {
					continue
				}
				tag := fmt.Sprintf("%s %s", c.name, page)
				if issue {
					tag += " issued"
					c.in = waived(c.in)
				}
				opt := Options{Page: pg, Issue: issue}
				l := newLayout(c.w, c.in, opt, pg)
				if err := l.plan(); err != nil {
					t.Fatalf("%s: %v", tag, err)
				}
				f(setup{tag: tag, well: c, opt: opt, l: l})
			}
		}
	})
}
