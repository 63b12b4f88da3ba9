package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "WATER-LEVEL-IN-WELL",
		Title: "Water levels lie within the well",
		Doc: "A depth to water measured in the well lies between the top of the riser and the bottom of " +
			"the hole. One below the total depth cannot have been measured there (often a wrong reference or " +
			"unit); one above the riser top means a flowing well or a sign error and is a warning.",
		Severity: Error,
		Source:   "geometry of the measurement (common practice)",
		Run:      runWaterLevelInWell,
	})
}

func runWaterLevelInWell(p *Pass) {
	w := p.Well
	top := schema.Length(0)
	for _, s := range w.Strings {
		if len(s.Sections) > 0 && s.Top() < top {
			top = s.Top()
		}
	}
	for _, c := range w.Casings {
		if c.Top < top {
			top = c.Top
		}
	}
	for _, wl := range w.WaterLevels {
		k := key(wl.Path, "depth")
		switch {
		case wl.Depth > w.TotalDepth+eps:
			p.Reportf(k, []schema.Length{wl.Depth}, "the %s water level at %s is deeper than the well (total depth %s)", wl.Kind, p.level(wl.Depth), p.D(w.TotalDepth))
		case wl.Depth < top-eps:
			p.ReportSeverity(p.capped(Warning), k, []schema.Length{wl.Depth}, "the %s water level at %s is above the top of the riser (%s): a flowing well, or a sign or reference error",
				wl.Kind, p.level(wl.Depth), p.level(top))
		}
	}
}
