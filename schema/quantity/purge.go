package quantity

import (
	"github.com/tremie-dev/tremie/schema"
)

// PurgeWellVolumes is how many well volumes are purged before sampling:
// USGS National Field Manual for the Collection of Water-Quality Data,
// chapter A4 (collection of water samples), section 4.2: at least three
// well volumes, with field measurements stable.
const PurgeWellVolumes = 3

// WellVolume is the water standing in one string of a well, from the
// latest static level down to the string's bottom, for purging.
type WellVolume struct {
	String string        // the string's name
	Level  schema.Length // the static level used, below ground
	Bottom schema.Length // the string's bottom
	// Casing is the water inside the string: each section's inside area
	// over its length below the level (USGS NFM A4: V = pi/4 D^2 H).
	Casing schema.Volume
	// Pack is the water in the pores of the saturated filter pack around
	// the string (the pack's annular volume below the level x Porosity);
	// 0 unless a porosity is given.
	Pack     schema.Volume
	Porosity float64
}

// Well is the well volume: the casing's water, plus the pack's if asked.
func (v WellVolume) Well() schema.Volume { return v.Casing + v.Pack }

// Purge is PurgeWellVolumes well volumes.
func (v WellVolume) Purge() schema.Volume { return PurgeWellVolumes * v.Well() }

// WellVolumes works out the volume of every string of a well that has a
// static level, below that level: each string's own level in a nested
// well (Well.LatestLevelIn). porosity (0 to 1) adds the saturated
// pack's pore water around each string's screens; 0 leaves it out. A
// level below a string's bottom gives no row for it.
func WellVolumes(w *schema.Well, porosity float64) []WellVolume {
	var out []WellVolume
	for _, s := range w.Strings {
		lvl, ok := w.LatestLevelIn(s)
		if !ok || len(s.Sections) == 0 || s.Bottom() <= lvl.Depth {
			continue
		}
		v := WellVolume{String: s.Label(), Level: lvl.Depth, Bottom: s.Bottom(), Porosity: porosity}
		for _, sec := range s.Sections {
			top := max(sec.Top, lvl.Depth)
			if sec.Bottom > top {
				v.Casing += schema.Volume(circle(sec.Pipe.ID) * float64(sec.Bottom-top))
			}
		}
		if porosity > 0 {
			v.Pack = schema.Volume(porosity * float64(packBelow(w, s, lvl.Depth)))
		}
		out = append(out, v)
	}
	if lvl, ok := w.LatestLevel(); ok && len(w.Strings) == 0 && w.TotalDepth > lvl.Depth {
		out = append(out, openWellVolume(w, lvl.Depth))
	}
	return out
}

// openWellVolume is the water in a well with no string (a rock well open
// below its casing): inside the innermost casing where there is one, the
// full hole below it, from the level to the total depth.
func openWellVolume(w *schema.Well, level schema.Length) WellVolume {
	v := WellVolume{String: w.ID, Level: level, Bottom: w.TotalDepth}
	for _, c := range w.CrossSections().Within(level, w.TotalDepth) {
		var d schema.Diameter
		switch {
		case len(c.Casings) > 0:
			d = c.Casings[len(c.Casings)-1].ID
		case c.HasHole:
			d = c.Hole
		}
		v.Casing += schema.Volume(circle(d) * float64(c.Thickness()))
	}
	return v
}

// packBelow is the annular volume of the pack fills around a string's
// screens, below depth z.
func packBelow(w *schema.Well, s schema.String, z schema.Length) schema.Volume {
	var total schema.Volume
	for _, f := range PacksAround(w, s) {
		if f.Bottom <= z {
			continue
		}
		f.Top = max(f.Top, z)
		if v, err := AnnularVolume(w, f); err == nil {
			total += v
		}
	}
	return total
}

// PacksAround is the pack fills (filter pack, fine sand) that reach one
// string's screens, in file order: a nested well's pack per string.
func PacksAround(w *schema.Well, s schema.String) []schema.Fill {
	var out []schema.Fill
	for _, f := range w.Fills {
		if f.Material.Group() != schema.PackGroup {
			continue
		}
		for _, sec := range s.Screens() {
			if f.Overlaps(sec.Interval) {
				out = append(out, f)
				break
			}
		}
	}
	return out
}
