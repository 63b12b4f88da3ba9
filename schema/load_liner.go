package schema

// Reading of liners, drive shoes, the measuring point and the pump: the
// parts of telescoped supply wells.

// boolean reads a true/false key.
func (t *table) boolean(k string) bool {
	v, ok := t.get(k, TypeBool)
	if !ok {
		return false
	}
	b, isBool := v.(bool)
	if !isBool {
		t.r.errAt(t.keyPath(k), "%s must be true or false, not %s", k, typeName(v))
	}
	return b
}

// liner reads a string's liner keys; nil when the string is not hung in
// a casing.
func (r *reader) liner(t *table) *Liner {
	in := t.str("hung_in")
	hanger := HangerKind(t.oneOf("hanger"))
	product := t.str("hanger_product")
	seal := Material(t.oneOf("lap_seal"))
	if in == "" {
		for _, k := range []string{"hanger", "hanger_product", "lap_seal"} {
			if _, ok := t.m[k]; ok {
				r.errAt(t.keyPath(k), "%s applies to a liner: give hung_in = the name of the casing it hangs in", k)
			}
		}
		return nil
	}
	if hanger == "" {
		if _, ok := t.m["hanger"]; !ok {
			r.errAt(t.path, "liner: say what holds it with hanger = \"packer\" (seals the lap) or \"hanger\"")
		}
	}
	if seal != "" && !seal.IsSeal() {
		r.errAt(t.keyPath("lap_seal"), "lap_seal = %q does not seal: give bentonite or a grout", seal)
	}
	return &Liner{HungIn: in, Hanger: hanger, Product: product, LapSeal: seal}
}

// checkLiners ties each liner to its casing: the casing must exist and the
// liner's top must lie within it.
func (r *reader) checkLiners(w *Well) {
	for _, s := range w.Strings {
		if s.Liner == nil || len(s.Sections) == 0 {
			continue
		}
		var host *Casing
		for i := range w.Casings {
			if w.Casings[i].Name == s.Liner.HungIn {
				host = &w.Casings[i]
			}
		}
		switch {
		case host == nil:
			r.errAt(s.Path+".hung_in", "hung_in = %q names no [[casing]]", s.Liner.HungIn)
		case !(s.Top() >= host.Top && s.Top() < host.Bottom):
			r.errAt(s.Path+".hung_in", "liner %q: its top at %s is not within casing %q (%s to %s)",
				s.Name, w.Units.FormatDepth(s.Top()), host.Name, w.Units.FormatDepth(host.Top), w.Units.FormatDepth(host.Bottom))
		}
	}
}

// measuringPoint reads [measuring_point].
func (r *reader) measuringPoint(t *table, w *Well) MeasuringPoint {
	defer t.done()
	m := MeasuringPoint{Pipe: t.str("pipe"), Description: t.str("description"), Pos: r.at(t.path)}
	if v, ok := t.num("height"); ok {
		h := LengthFrom(v, w.Units.Depth)
		m.Height = &h
	}
	switch {
	case m.Pipe != "" && m.Height != nil:
		r.errAt(t.keyPath("height"), "give pipe or height, not both")
	case m.Pipe == "" && m.Height == nil:
		r.errAt(t.path, "[measuring_point]: give pipe = the name of the casing or string whose top it is, or height above ground")
	case m.Pipe != "":
		if _, ok := w.PipeTop(m.Pipe); !ok {
			r.errAt(t.keyPath("pipe"), "pipe = %q names no [[casing]] or [[string]]", m.Pipe)
		}
	}
	return m
}

// pump reads [pump].
func (r *reader) pump(t *table, w *Well) *Pump {
	defer t.done()
	p := &Pump{Description: t.str("description"), Pos: r.at(t.path)}
	if _, ok := t.m["intake"]; !ok {
		r.errAt(t.path, "missing required key \"intake\" in [pump] (depth of the pump intake)")
	}
	if v, ok := t.positive("intake"); ok {
		p.Intake = LengthFrom(v, w.Units.Depth)
		if w.TotalDepth > 0 && p.Intake > w.TotalDepth {
			r.errAt(t.keyPath("intake"), "intake = %v is below the total depth", v)
		}
	}
	return p
}
