package project

import (
	"fmt"
	"math"
	"sort"
	"strings"
	"time"

	"github.com/tremie-dev/tremie/schema"
)

// Section is one cross-section the project defines: wells in order along
// a line, hung on their ground elevations.
type Section struct {
	Name  string
	Wells []string // well IDs, in order along the line
	// Bends is the polyline the section follows, as easting/northing pairs
	// in CoordinateUnit; nil means the straight line through the first and
	// last well.
	Bends [][2]float64
	// CoordinateUnit is the unit of the wells' easting and northing: "m",
	// "ft" or "us-ft".
	CoordinateUnit string
	// MaxOffset is how far a well may lie off the line before the sheet
	// notes it; 0 means a tenth of the line's length.
	MaxOffset schema.Length
	// WaterDate picks the day whose water levels are joined; zero means
	// the day with the most wells' static levels.
	WaterDate schema.Date
	Line      int // line of the [[section]] header, for messages
}

// sectionData is a [[section]] table as written.
type sectionData struct {
	Name           string       `toml:"name" required:"true" doc:"The section's name; also its output file name." example:"A-A'"`
	Wells          []string     `toml:"wells" required:"true" doc:"Well IDs in order along the line: at least two, each once." example:"MW-1,MW-3"`
	Bends          [][2]float64 `toml:"bends" doc:"A polyline the section follows, as [easting, northing] pairs; default the straight line through the first and last well." example:"500000 4100000;500200 4100100"`
	CoordinateUnit string       `toml:"coordinate_unit" enum:"m,ft,us-ft" doc:"Unit of the wells' easting and northing and of bends; default m for a metric project, else us-ft." example:"m"`
	MaxOffset      *float64     `toml:"max_offset" unit:"project depth unit" doc:"A well farther than this from the line is noted with its offset; default a tenth of the line's length." example:"50"`
	WaterDate      any          `toml:"water_date" type:"date" doc:"The date whose water levels are joined into a line; default the date with the most static levels." example:"2026-03-20"`
}

// CoordinateUnits lists the accepted coordinate units with metres per unit
// (the US survey foot is 1200/3937 m exactly, NIST Handbook 44 appendix C).
var CoordinateUnits = map[string]float64{"m": 1, "ft": schema.MetresPerFoot, "us-ft": 1200.0 / 3937.0}

// checkSections checks the [[section]] tables; depth is the project's depth
// unit (for max_offset and the coordinate unit's default).
func checkSections(file string, lines map[string]int, in []sectionData, depth schema.DepthUnit) ([]Section, error) {
	var errs schema.ErrorList
	bad := func(i int, key, format string, args ...any) {
		path := fmt.Sprintf("section[%d]", i)
		if key != "" {
			path += "." + key
		}
		errs = append(errs, &schema.Error{File: file, Line: schema.LineOf(lines, path), Key: path, Msg: fmt.Sprintf(format, args...)})
	}
	names := map[string]int{}
	var out []Section
	for i, d := range in {
		s := Section{Name: strings.TrimSpace(d.Name), CoordinateUnit: d.CoordinateUnit, Line: schema.LineOf(lines, fmt.Sprintf("section[%d]", i))}
		if s.Name == "" {
			bad(i, "", "[[section]] needs a name (name = \"A-A'\")")
		} else if j, dup := names[strings.ToLower(s.Name)]; dup {
			bad(i, "name", "section %q is defined twice (also section %d)", s.Name, j+1)
		}
		names[strings.ToLower(s.Name)] = i
		seen := map[string]bool{}
		for _, id := range d.Wells {
			id = strings.TrimSpace(id)
			if id == "" || seen[id] {
				bad(i, "wells", "wells must name each well once, by its ID")
				break
			}
			seen[id] = true
			s.Wells = append(s.Wells, id)
		}
		if len(d.Wells) < 2 {
			bad(i, "wells", "a section needs at least two wells, in order along the line")
		}
		for _, b := range d.Bends {
			if !finite(b[0]) || !finite(b[1]) {
				bad(i, "bends", "bend points must be finite [easting, northing] pairs")
				break
			}
		}
		if len(d.Bends) == 1 {
			bad(i, "bends", "give at least two bend points, or none for the line through the end wells")
		}
		s.Bends = d.Bends
		if s.CoordinateUnit == "" {
			s.CoordinateUnit = "us-ft"
			if depth == schema.Metres {
				s.CoordinateUnit = "m"
			}
		}
		if _, ok := CoordinateUnits[s.CoordinateUnit]; !ok {
			bad(i, "coordinate_unit", "coordinate_unit must be \"m\", \"ft\" or \"us-ft\", not %q", s.CoordinateUnit)
		}
		if d.MaxOffset != nil {
			if !finite(*d.MaxOffset) || *d.MaxOffset <= 0 {
				bad(i, "max_offset", "max_offset must be a positive distance")
			} else {
				u := depth
				if u == "" {
					u = schema.Metres
				}
				s.MaxOffset = schema.LengthFrom(*d.MaxOffset, u)
			}
		}
		if d.WaterDate != nil {
			t, ok := d.WaterDate.(time.Time)
			if zone, _ := t.Zone(); !ok || zone != "date-local" {
				bad(i, "water_date", "water_date must be a date such as 2026-03-20, without quotes")
			} else {
				s.WaterDate = schema.Date{Year: t.Year(), Month: t.Month(), Day: t.Day()}
			}
		}
		out = append(out, s)
	}
	if len(errs) > 0 {
		sort.SliceStable(errs, func(a, b int) bool { return errs[a].Line < errs[b].Line })
		return nil, errs
	}
	return out, nil
}

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// Section returns the project's section of that name (case-insensitive).
func (p *Project) Section(name string) (Section, bool) {
	for _, s := range p.Sections {
		if strings.EqualFold(s.Name, name) {
			return s, true
		}
	}
	return Section{}, false
}
