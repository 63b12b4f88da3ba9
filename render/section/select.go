package section

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
)

// Select returns the sections to draw with their wells: the project's
// section called name, or an ad hoc one through the wells ids, or every
// section of the project when both are empty. Wells are matched by ID;
// every ID that no well has is named in the error.
func Select(p *project.Project, wells []*schema.Well, name string, ids []string) ([]Input, error) {
	var defs []project.Section
	switch {
	case len(ids) > 0:
		if len(ids) < 2 {
			return nil, fmt.Errorf("a section needs at least two wells")
		}
		n := name
		if n == "" {
			n = strings.Join(ids, "-")
		}
		unit := "us-ft"
		if p != nil && p.Units == schema.Metres {
			unit = "m"
		}
		defs = []project.Section{{Name: n, Wells: ids, CoordinateUnit: unit}}
	case name != "":
		if p == nil {
			return nil, fmt.Errorf("no project defines section %q", name)
		}
		s, ok := p.Section(name)
		if !ok {
			return nil, fmt.Errorf("no section named %q (%s)", name, known(p))
		}
		defs = []project.Section{s}
	default:
		if p == nil || len(p.Sections) == 0 {
			return nil, fmt.Errorf("the project defines no [[section]]; name wells with --wells A,B,C")
		}
		defs = p.Sections
	}
	byID := map[string]*schema.Well{}
	for _, w := range wells {
		if w != nil {
			byID[strings.ToLower(w.ID)] = w
		}
	}
	var out []Input
	for _, d := range defs {
		in := Input{Project: p, Section: d}
		var missing []string
		for _, id := range d.Wells {
			w, ok := byID[strings.ToLower(id)]
			if !ok {
				missing = append(missing, id)
				continue
			}
			in.Wells = append(in.Wells, w)
		}
		if len(missing) > 0 {
			return nil, fmt.Errorf("section %q: no readable well with ID %s", d.Name, strings.Join(missing, ", "))
		}
		out = append(out, in)
	}
	return out, nil
}

func known(p *project.Project) string {
	if len(p.Sections) == 0 {
		return "it defines none"
	}
	var ns []string
	for _, s := range p.Sections {
		ns = append(ns, s.Name)
	}
	return "it defines " + strings.Join(ns, ", ")
}
