package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "WATER-LEVEL-IN-WELL",
		Title: "Water levels lie within the well",
		Doc: "A depth to water measured in the well lies between the top of the riser and the bottom of " +
			"the hole. One below the total depth cannot have been measured there (often a wrong reference or " +
			"unit); one above the riser top means a flowing well or a sign error and is a warning. A level " +
			"measured in one string of a nested well (string = NAME) is judged against that string alone: " +
			"below its bottom it cannot have been measured there, above its riser top it is a warning.",
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
		if s, ok := stringNamed(w, wl.String); ok {
			levelInString(p, wl, s)
			continue
		}
		switch {
		case wl.Depth > w.TotalDepth+eps:
			p.Reportf(k, []schema.Length{wl.Depth}, "the %s water level at %s is deeper than the well (total depth %s)", wl.Kind, p.level(wl.Depth), p.D(w.TotalDepth))
		case wl.Depth < top-eps:
			p.ReportSeverity(p.capped(Warning), k, []schema.Length{wl.Depth}, "the %s water level at %s is above the top of the riser (%s): a flowing well, or a sign or reference error",
				wl.Kind, p.level(wl.Depth), p.level(top))
		}
	}
}

// stringNamed is the string a level names, if it names one that has
// sections.
func stringNamed(w *schema.Well, name string) (schema.String, bool) {
	if name == "" {
		return schema.String{}, false
	}
	for _, s := range w.Strings {
		if s.Name == name && len(s.Sections) > 0 {
			return s, true
		}
	}
	return schema.String{}, false
}

// levelInString judges a level measured in one string against that
// string: the water stands inside its pipe, between its top and bottom.
func levelInString(p *Pass, wl schema.WaterLevel, s schema.String) {
	k := key(wl.Path, "depth")
	switch {
	case wl.Depth > s.Bottom()+eps:
		p.Reportf(k, []schema.Length{wl.Depth}, "the %s water level in %s at %s is below the bottom of that string (%s): it cannot have been measured there",
			wl.Kind, s.Name, p.level(wl.Depth), p.D(s.Bottom()))
	case wl.Depth < s.Top()-eps:
		p.ReportSeverity(p.capped(Warning), k, []schema.Length{wl.Depth}, "the %s water level in %s at %s is above the top of that string's riser (%s): a flowing well, or a sign or reference error",
			wl.Kind, s.Name, p.level(wl.Depth), p.level(s.Top()))
	}
}
