package quantity

import (
	"fmt"

	"github.com/tremie-dev/tremie/schema"
)

// PadPath is the key path of the surface pad, used as its row's path.
const PadPath = "surface.pad"

// PadInterval is where the concrete pad stands: flush with the ground
// around a vault (the vault's lid is at grade), on grade around a stick-up
// or a completion of no stated kind. It is the one place the pad's depth
// is decided; the sheet draws it there too.
func PadInterval(s schema.Surface) (schema.Interval, bool) {
	if s.Pad == nil || s.Pad.Thickness <= 0 {
		return schema.Interval{}, false
	}
	if s.Kind == schema.FlushMount {
		return schema.Interval{Top: 0, Bottom: s.Pad.Thickness}, true
	}
	return schema.Interval{Top: -s.Pad.Thickness, Bottom: 0}, true
}

// PadVolume is the concrete the pad takes beyond what the annular fills
// count: length x width x thickness, less the footprint of what stands in
// it. A flush pad is poured into the top of the hole, whose bore the
// annular fills and the vault already account for, so the footprint is
// the wider of the hole and the vault; a pad on grade surrounds the
// protective casing (or, without one, the widest pipe standing in it).
// What stands where is read from the well's cross-sections (secs).
func PadVolume(w *schema.Well, secs *schema.Sections) (schema.Volume, error) {
	s := w.Surface
	iv, ok := PadInterval(s)
	if !ok {
		return 0, fmt.Errorf("no pad thickness")
	}
	p := s.Pad
	if p.Length <= 0 || p.Width <= 0 {
		return 0, fmt.Errorf("the pad has no length or width")
	}
	var foot schema.Diameter
	if s.Kind == schema.FlushMount {
		if cs := secs.At(0); cs.HasHole {
			foot = cs.Hole
		}
		if v := s.Vault; v != nil {
			foot = max(foot, v.Diameter)
		}
	} else if pc := s.Protective; pc != nil && pc.Diameter > 0 {
		foot = pc.Diameter
	} else {
		foot = widestWithin(secs, iv)
	}
	slab := float64(p.Length) * float64(p.Width)
	hole := circle(foot)
	if hole > slab {
		return 0, fmt.Errorf("the pad (%s by %s) is smaller than the %s it surrounds",
			w.Units.FormatDepth(p.Length), w.Units.FormatDepth(p.Width), w.Units.FormatDiameter(foot))
	}
	return schema.Volume((slab - hole) * float64(iv.Thickness())), nil
}

// widestWithin is the outside diameter of the widest pipe standing
// anywhere in iv (top <= z < bottom, as every part covers its depths).
func widestWithin(secs *schema.Sections, iv schema.Interval) schema.Diameter {
	var d schema.Diameter
	for _, cs := range secs.Within(iv.Top, iv.Bottom) {
		for _, p := range cs.Casings {
			d = max(d, p.OD)
		}
		for _, p := range cs.Strings {
			d = max(d, p.OD)
		}
	}
	return d
}

// padRow is the pad as a row of concrete, counted in bags like a fill;
// Index is -1 and Fill.Path is PadPath. The pad records no amount of its
// own: its concrete is counted with the concrete fill's, if any.
func padRow(w *schema.Well, secs *schema.Sections, y *Yields) *Row {
	iv, ok := PadInterval(w.Surface)
	if !ok {
		return nil
	}
	f := schema.Fill{Interval: iv, Material: schema.Concrete, Path: PadPath, Pos: w.Surface.Pad.Pos}
	r := &Row{Index: -1, Fill: f}
	r.Calculated, r.Err = PadVolume(w, secs)
	if r.Err != nil {
		r.Err = fmt.Errorf("%s: %w", PadPath, r.Err)
		r.Calculated = 0
	}
	r.Yield, r.HasYield = y.ForWell(f, w.Units)
	if r.HasYield && r.Yield.Volume > 0 && r.Err == nil {
		r.BagsExact = float64(r.Calculated / r.Yield.Volume)
		r.BagsNeeded = bagsUp(r.BagsExact)
	}
	return r
}
