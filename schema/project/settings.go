package project

import (
	"fmt"
	"strings"
)

// Settings writes, one per line in a fixed order, every project setting
// that can change a well's outputs: the incremental cache hashes it, so a
// change to any of them redraws every well. The contents of the profile
// and the logo are hashed separately, from their bytes. Where wells are
// read from and outputs go do not change what is drawn and are left out.
func (p *Project) Settings() []byte {
	var b strings.Builder
	line := func(k, v string) { fmt.Fprintf(&b, "%s=%q\n", k, v) }
	line("name", p.Name)
	line("client", p.Client)
	line("site", p.Site)
	line("units", string(p.Units))
	line("datum", p.Datum)
	line("coordinate_system", p.CoordinateSystem)
	line("crs", p.CRS)
	line("north", fmt.Sprintf("%s %v", p.Orientation.North, p.Orientation.Declination))
	line("page", p.Page)
	line("landscape", fmt.Sprint(p.Landscape))
	line("profile", p.Profile)
	line("yields", p.Yields)
	line("logo", p.LogoPath)
	tb := p.TitleBlock
	line("consultant", tb.Consultant)
	line("prepared_by", tb.PreparedBy)
	line("checked_by", tb.CheckedBy)
	line("approved_by", tb.ApprovedBy)
	line("report", tb.ReportNumber)
	line("job", tb.JobNumber)
	line("revision", tb.Revision)
	line("issued", tb.Issued.String())
	line("issue", fmt.Sprint(p.Issue))
	for i, r := range tb.Revisions {
		line(fmt.Sprintf("revision[%d]", i), strings.Join([]string{r.Rev, r.Date.String(), r.Description, r.By}, "\x1f"))
	}
	return []byte(b.String())
}
