package schema

// FormationSample is a sieve analysis of the formation at one depth: the
// grain sizes (mm, always) 10, 30 and 60 % of its mass is finer than
// (ASTM D6913), from which the filter pack is designed (ASTM D5092).
type FormationSample struct {
	Depth         Length
	D10, D30, D60 Diameter // 0 if not given
	Note          string
	Pos           Pos
	Path          string // key path, e.g. "sample[0]"
}

// SamplesWithin returns the formation samples whose depth lies in iv,
// in the order written.
func (w *Well) SamplesWithin(iv Interval) []FormationSample {
	var out []FormationSample
	for _, s := range w.Samples {
		if s.Depth >= iv.Top && s.Depth <= iv.Bottom {
			out = append(out, s)
		}
	}
	return out
}

func (r *reader) sample(t *table, w *Well) FormationSample {
	defer t.done()
	s := FormationSample{Pos: r.at(t.path), Path: t.path, Note: t.str("note")}
	if _, ok := t.m["depth"]; !ok {
		r.errAt(t.path, "missing required key \"depth\" in [[sample]]")
	}
	if d, ok := t.nonNegative("depth"); ok {
		s.Depth = LengthFrom(d, w.Units.Depth)
	}
	r.gradingCurve(t, &s.D10, &s.D30, &s.D60)
	if s.D10 == 0 && s.D30 == 0 && s.D60 == 0 {
		r.errAt(t.path, "a [[sample]] gives at least one of d10, d30, d60 (mm)")
	}
	return s
}

// UniformityCoefficient is Cu = d60 / d10 of a grading curve (ASTM
// D2487); 0 when either is unknown.
func UniformityCoefficient(d10, d60 Diameter) float64 {
	if d10 <= 0 || d60 <= 0 {
		return 0
	}
	return float64(d60 / d10)
}

// PackFormationRatio is the filter-pack design ratio: the pack's d30 over
// the formation sample's d30 (ASTM D5092); 0 when either is unknown.
func PackFormationRatio(pack *Fill, s FormationSample) float64 {
	if pack.D30 <= 0 || s.D30 <= 0 {
		return 0
	}
	return float64(pack.D30 / s.D30)
}
