package pipeline

import (
	"fmt"
	"os"
	"strconv"
	"time"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
)

// SourceDate is SOURCE_DATE_EPOCH as RFC 3339, "" when unset: outputs
// carry it instead of any clock, for repeatable builds.
func SourceDate() (string, error) {
	v := os.Getenv("SOURCE_DATE_EPOCH")
	if v == "" {
		return "", nil
	}
	n, err := strconv.ParseInt(v, 10, 64)
	if err != nil || n < 0 {
		return "", fmt.Errorf("SOURCE_DATE_EPOCH=%q is not a count of seconds", v)
	}
	return time.Unix(n, 0).UTC().Format(time.RFC3339), nil
}

// ProjectDate is the date a project's documents (book, table) carry,
// never the clock: the run's source date when set, else the project's
// issue date, else the newest date in any of the wells, else 1970-01-01.
func (r *Run) ProjectDate(p *project.Project, wells []*Well) time.Time {
	if r.SourceDate != "" {
		if t, err := time.Parse(time.RFC3339, r.SourceDate); err == nil {
			return t
		}
	}
	if p != nil && !p.TitleBlock.Issued.IsZero() {
		return p.TitleBlock.Issued.Time()
	}
	var newest time.Time
	later := func(t time.Time) {
		if t.After(newest) {
			newest = t
		}
	}
	for _, w := range wells {
		if w.Well == nil {
			continue
		}
		for _, d := range []schema.Date{w.Well.Drilled, w.Well.Completed, w.Well.Elevation.Surveyed} {
			if !d.IsZero() {
				later(d.Time())
			}
		}
		for _, l := range w.Well.WaterLevels {
			later(l.Measured.UTC())
		}
	}
	if newest.IsZero() {
		return time.Unix(0, 0).UTC()
	}
	return newest
}
