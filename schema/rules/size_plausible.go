package rules

import (
	"fmt"

	"github.com/tremie-dev/tremie/schema"
)

// Bounds of what is made and drilled, for telling a unit slip from a real
// size. Each is stated with where it comes from.
const (
	// smallestPipeIn is the OD of NPS 1/8, the smallest nominal pipe size
	// (0.405 in; ASME B36.10M, ASTM D1785 as tabulated in the PVC pipe data
	// of sd-w.com/channel_flow/pipe_data).
	smallestPipeIn = 0.405
	// largestSlotIn: continuous-wrap and slotted screens are made to about
	// 0.250 in (250-slot); twice that is taken as the largest plausible
	// (common practice).
	largestSlotIn = 0.5
	// smallestSlotIn: ASTM D5092-04 §6.3.3 (as its text is reproduced)
	// names 0.004 in (4-slot, continuous wire-wound) and 0.006 in (slotted
	// casing) the finest screens made; half the finest, 0.002 in, is the
	// bound (ours), below which a value is taken as a slip.
	smallestSlotIn = 0.002
)

func init() {
	register(&Rule{
		ID:    "SIZE-PLAUSIBLE",
		Title: "Diameters and slots are plausible for the file's units",
		Doc: "A diameter or slot typed in the wrong unit or with a digit too many passes every geometric " +
			"check yet orders hundreds of bags: a 2000 mm hole for a 50 mm pipe, a 254-in hole, a 10-in slot. " +
			"Reported, with the likely cause: a hole many times the OD of the pipe in it (max_ratio); a hole or " +
			"pipe wider than any drilled well (max_hole); a diameter below the smallest pipe made (NPS 1/8, " +
			"0.405 in = 10.3 mm); a slot wider than any screen slot made or finer than 0.002 in.",
		Severity: Error,
		Source: "common practice: bits and augers for a casing are rarely more than a few times its OD; NPS 1/8 " +
			"(OD 0.405 in) is the smallest nominal pipe size (ASME B36.10M, ASTM D1785); the finest screens made are " +
			"0.004-in wire-wound and 0.006-in slotted (ASTM D5092-04 §6.3.3), the widest slots about 0.250 in (common practice)",
		Params: []Param{{
			Name: "max_ratio", Kind: RatioParam, Default: 10,
			Doc:    "largest plausible ratio of a hole's diameter to the summed OD of the pipes standing in it",
			Source: "common practice: 10 (a 2-in well in an 8-in hole is 3.4; a 24-in bucket-auger hole for 4-in casing 5.3)",
		}, {
			Name: "max_hole", Kind: DiameterParam, Default: 3000, DefaultFt: 120,
			Doc:    "largest plausible diameter of a drilled hole or a pipe",
			Source: "common practice: 120 in (3 m), beyond large-diameter bucket-auger and caisson wells",
		}},
		// The quantities report runs it too: a slip there orders hundreds of bags.
		Reconcile: true,
		Run:       runSizePlausible,
	})
}

func runSizePlausible(p *Pass) {
	w := p.Well
	maxHole := schema.Diameter(p.Param("max_hole"))
	for _, b := range w.Boreholes {
		p.checkSize(func() string { return key(b.Path, "diameter") }, "hole", b.Interval, b.Diameter, maxHole)
	}
	for _, q := range w.HolePipes() {
		// The line to name is the od key if written, else the size's;
		// asking the file is work (every key's line is found), so only
		// for a finding.
		given := func() string {
			if k := key(q.Path, "od"); w.HasKey(k) {
				return k
			}
			return key(q.Path, "size")
		}
		p.checkSize(given, q.Label()+" OD", q.Interval, q.OD, maxHole)
	}
	for _, sc := range w.Screens() {
		sec := sc.Section
		if sec.Slot > 0 {
			p.checkSlot(&sec, sc.String.Name)
		}
	}
	p.checkHoleRatio(maxHole)
}

// checkSize flags a diameter beyond any hole or below any pipe; path
// gives the key path of a finding.
func (p *Pass) checkSize(path func() string, what string, iv schema.Interval, d, maxHole schema.Diameter) {
	if d <= 0 {
		return
	}
	u := p.Well.Units.Diameter
	written := d.In(u)
	switch {
	case d > maxHole:
		p.Reportf(path(), depths(iv), "the %s of %s at %s is larger than any drilled well (%s): %s",
			what, p.Dia(d), p.span(iv), p.Dia(maxHole), slipLarge(written, u))
	case d < schema.DiameterFrom(smallestPipeIn, schema.Inches):
		p.Reportf(path(), depths(iv), "the %s of %s at %s is below the smallest pipe made (NPS 1/8, OD 0.405 in = 10.3 mm): %s",
			what, p.Dia(d), p.span(iv), slipSmall(written, u))
	}
}

// slipLarge names the likely cause of a value too large in unit u.
func slipLarge(v float64, u schema.DiameterUnit) string {
	if u == schema.Inches {
		return fmt.Sprintf("written in mm in an inch file? (%s mm = %s in)", schema.TrimFloat(v, 3), schema.TrimFloat(v/25.4, 3))
	}
	return fmt.Sprintf("a digit too many (%s mm?), or written in another unit?", schema.TrimFloat(v/10, 3))
}

// slipSmall names the likely cause of a value too small in unit u.
func slipSmall(v float64, u schema.DiameterUnit) string {
	if u == schema.Millimetres {
		return fmt.Sprintf("written in inches in a mm file? (%s in = %s mm)", schema.TrimFloat(v, 3), schema.TrimFloat(v*25.4, 3))
	}
	return "written in feet in an inch file, or a digit lost?"
}

// checkSlot flags a slot no screen is made with.
func (p *Pass) checkSlot(sec *schema.Section, stringName string) {
	inches := sec.Slot.Inches()
	var why string
	switch {
	case inches > largestSlotIn && p.Well.HasKey(key(sec.Path, "slot")) && p.Well.Units.Diameter == schema.Inches:
		why = fmt.Sprintf("a slot number written as the slot? (slot_number = %s is %s in)", schema.TrimFloat(inches, 3), schema.TrimFloat(inches/1000, 4))
	case inches > largestSlotIn && p.Well.HasKey(key(sec.Path, "slot")):
		why = fmt.Sprintf("a slot number written as millimetres? (slot_number = %s is %s mm)", schema.TrimFloat(float64(sec.Slot), 3), schema.TrimFloat(float64(sec.Slot)*0.0254, 4))
	case inches > largestSlotIn:
		why = "a slot number of thousandths of an inch is at most a few hundred"
	case inches < smallestSlotIn && p.Well.Units.Diameter == schema.Millimetres:
		why = fmt.Sprintf("written in inches in a mm file? (%s in = %s mm)", schema.TrimFloat(float64(sec.Slot), 4), schema.TrimFloat(float64(sec.Slot)*25.4, 4))
	case inches < smallestSlotIn:
		why = "a digit lost?"
	default:
		return
	}
	path := key(sec.Path, "slot")
	if !p.Well.HasKey(path) {
		path = key(sec.Path, "slot_number")
	}
	p.Reportf(path, depths(sec.Interval), "the slot of %s (%s in) of the screen of string %q at %s is outside the slots screens are made with (0.002 to 0.5 in): %s",
		p.Dia(sec.Slot), schema.TrimFloat(inches, 4), stringName, p.span(sec.Interval), why)
}

// checkHoleRatio flags a hole many times the pipes standing in it, once
// per borehole section.
func (p *Pass) checkHoleRatio(maxHole schema.Diameter) {
	maxRatio := p.Param("max_ratio")
	u := p.Well.Units.Diameter
	type worst struct {
		iv    schema.Interval
		ratio float64
		od    schema.Diameter
		hole  schema.Diameter
		pipes string
	}
	found := map[*schema.BoreholeSection]*worst{} // the borehole section each slab's hole comes from
	segs, sections := p.segments()
	for i, seg := range segs {
		cs := sections[i]
		out := cs.Outermost()
		if !cs.HasHole || len(out) == 0 || sumOD(out) <= 0 {
			continue
		}
		r := float64(cs.Hole / sumOD(out))
		if r <= maxRatio {
			continue
		}
		b := cs.Borehole
		if f := found[b]; f == nil || r > f.ratio {
			names := ""
			for j, q := range out {
				if j > 0 {
					names += " and "
				}
				names += q.Owner()
			}
			found[b] = &worst{seg, r, sumOD(out), cs.Hole, names}
		}
	}
	for b := range p.Well.Boreholes {
		bh := &p.Well.Boreholes[b]
		f := found[bh]
		if f == nil {
			continue
		}
		if bh.Diameter > maxHole {
			continue // already reported as wider than any drilled well
		}
		hole := f.hole.In(u)
		cause := slipLarge(hole, u)
		if u == schema.Inches && hole/25.4 < f.od.In(u)*1.1 {
			cause = "the hole or the pipe mistyped?"
		}
		p.Reportf(key(bh.Path, "diameter"), depths(bh.Interval), "the %s hole at %s is %s times the %s OD of %s standing in it (more than %s): %s",
			p.Dia(f.hole), p.span(bh.Interval), schema.TrimFloat(f.ratio, 1), p.Dia(f.od), f.pipes, schema.TrimFloat(maxRatio, 1), cause)
	}
}
