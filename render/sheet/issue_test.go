package sheet

import (
	"errors"
	"regexp"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema/rules"
)

// An issued set of the demo carries no rule IDs and no file lines,
// refuses MW-3 (unwaived errors) unless its errors are waived, states
// waivers in plain words, and leaves room for the seal and signature and
// a revision block on every sheet.
func TestIssuedSet(t *testing.T) {
	lineRef := regexp.MustCompile(`\(line \d+\)|line \d+:`)
	var ids []string
	for _, r := range rules.All() {
		ids = append(ids, r.ID)
	}
	wells := demoWells(t)
	for name, d := range wells {
		opt := d.opt
		opt.Issue = true
		doc, err := Layout(d.w, d.in, opt)
		if rules.Blocking(d.in.Findings) {
			if !errors.Is(err, ErrNotIssuable) {
				t.Errorf("%s has unwaived errors but was issued (err %v)", name, err)
			}
			continue
		}
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		for i, p := range doc.Pages {
			var all []string
			p.Walk(func(it draw.Item) {
				if tx, ok := it.(draw.Text); ok {
					all = append(all, tx.S)
				}
			})
			text := strings.Join(all, "\n")
			for _, id := range ids {
				if strings.Contains(text, id) {
					t.Errorf("%s sheet %d names rule %s", name, i+1, id)
				}
			}
			if lineRef.MatchString(text) {
				t.Errorf("%s sheet %d gives a file line: %q", name, i+1, lineRef.FindString(text))
			}
			if strings.Contains(text, NotFinal) {
				t.Errorf("%s sheet %d is stamped not final", name, i+1)
			}
			seal := boxes(p, "seal")
			if len(seal) != 1 || seal[0].Rect.W < sealSpace || seal[0].Rect.H < sealSpace {
				t.Errorf("%s sheet %d: seal space %v, want at least %g pt square", name, i+1, seal, sealSpace)
			}
			if got := texts(p, "field:Revisions"); len(got) < 2 {
				t.Errorf("%s sheet %d: revision block %q", name, i+1, got)
			}
		}
	}
	// MW-3 with its errors waived is issued, the waivers in plain words.
	d := wells["MW-3.toml"]
	in := waived(d.in)
	opt := d.opt
	opt.Issue = true
	doc, err := Layout(d.w, in, opt)
	if err != nil {
		t.Fatalf("MW-3 with waived errors: %v", err)
	}
	got := strings.Join(texts(doc.Pages[0], ""), " ")
	if !strings.Contains(got, "ACCEPTED DEPARTURES") || !strings.Contains(got, "Accepted by R. Vasquez, PG") {
		t.Errorf("MW-3's waivers are not stated in plain words: %q", got)
	}
}
