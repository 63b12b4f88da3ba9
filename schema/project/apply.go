package project

import "github.com/tremie-dev/tremie/schema"

// Apply fills the fields a well left blank with the project's values; a
// value the well gives always wins.
func Apply(p *Project, w *schema.Well) {
	if p == nil || w == nil {
		return
	}
	fill(&w.Project, p.Name)
	fill(&w.Client, p.Client)
	fill(&w.Site, p.Site)
	fill(&w.CheckedBy, p.TitleBlock.CheckedBy)
	fill(&w.Elevation.Datum, p.Datum)
	fill(&w.Location.System, p.CoordinateSystem)
	fill(&w.Location.CRS, p.CRS)
	if p.Orientation.Given && !w.Orientation.Given {
		w.SetOrientation(p.Orientation)
	}
}

func fill(dst *string, v string) {
	if *dst == "" {
		*dst = v
	}
}
