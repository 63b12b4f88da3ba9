package quantity

import (
	"fmt"

	"github.com/tremie-dev/tremie/schema"
)

// Slice is a depth range over which a region's cross-section is constant.
type Slice struct {
	schema.Interval
	Area float64 // open area, square metres
}

// Volume is the slice's volume.
func (s Slice) Volume() schema.Volume { return schema.Volume(s.Area * float64(s.Thickness())) }

// Slices splits [top, bottom] of a region into constant cross-sections,
// top down.
func Slices(w *schema.Well, r Region, top, bottom schema.Length) ([]Slice, error) {
	return regionSlices(w, w.CrossSections(), r, top, bottom)
}

func regionSlices(w *schema.Well, secs *schema.Sections, r Region, top, bottom schema.Length) ([]Slice, error) {
	if !(top < bottom) {
		if top == bottom {
			return nil, nil
		}
		return nil, fmt.Errorf("top %s is below bottom %s", w.Units.FormatDepth(top), w.Units.FormatDepth(bottom))
	}
	cs := within(w, secs, top, bottom)
	out := make([]Slice, 0, len(cs))
	for _, c := range cs {
		a, err := regionArea(w, c, r)
		if err != nil {
			return nil, fmt.Errorf("at %s: %w", w.Units.FormatInterval(c.Top, c.Bottom), err)
		}
		out = append(out, Slice{Interval: c.Interval, Area: a})
	}
	return out, nil
}

// AnnularVolume is the volume a fill interval should take: its region's
// open area integrated from the fill's top to its bottom.
func AnnularVolume(w *schema.Well, f schema.Fill) (schema.Volume, error) {
	return annularVolume(w, w.CrossSections(), f)
}

func annularVolume(w *schema.Well, secs *schema.Sections, f schema.Fill) (schema.Volume, error) {
	sl, err := regionSlices(w, secs, RegionOf(f), f.Top, f.Bottom)
	if err != nil {
		return 0, err
	}
	var v schema.Volume
	for _, s := range sl {
		v += s.Volume()
	}
	return v, nil
}

// RiseTop is the depth the top of a fill should reach once volume v has
// gone in above its bottom, filling upward through the actual
// cross-sections. The rise may pass the fill's recorded top; it stops at
// the top of the region (the shallowest depth where the region still
// exists, never above ground), and reached reports whether v fitted below
// there.
func RiseTop(w *schema.Well, f schema.Fill, v schema.Volume) (top schema.Length, reached bool, err error) {
	return riseTop(w, w.CrossSections(), f, v)
}

func riseTop(w *schema.Well, secs *schema.Sections, f schema.Fill, v schema.Volume) (top schema.Length, reached bool, err error) {
	if v <= 0 {
		return f.Bottom, true, nil
	}
	// Walk up slab by slab, from the fill's bottom to the highest depth
	// the geometry still defines (ground, or the casing's top).
	ceiling := min(f.Top, 0)
	cs := within(w, secs, ceiling, f.Bottom)
	left := float64(v)
	for i := len(cs) - 1; i >= 0; i-- {
		lo, hi := cs[i].Bottom, cs[i].Top
		a, aerr := regionArea(w, cs[i], RegionOf(f))
		if aerr != nil {
			if hi >= f.Top {
				// within the interval itself the geometry must hold
				return lo, false, fmt.Errorf("at %s: %w", w.Units.FormatInterval(hi, lo), aerr)
			}
			return lo, false, nil // above the interval: the region ends here
		}
		room := a * float64(lo-hi)
		if left <= room {
			if a == 0 {
				return lo, true, nil
			}
			return lo - schema.Length(left/a), true, nil
		}
		left -= room
	}
	return ceiling, false, nil
}

// VolumePerLength is a volume per unit length of pipe or hole: cubic
// metres per metre (an area, in square metres).
type VolumePerLength float64

// GallonsPerFoot is US gallons per foot.
func (v VolumePerLength) GallonsPerFoot() float64 {
	return float64(v) * schema.MetresPerFoot * 1000 / schema.LitresPerUSGallon
}

// CubicFeetPerFoot is cubic feet per foot (square feet).
func (v VolumePerLength) CubicFeetPerFoot() float64 {
	return float64(v) / (schema.MetresPerFoot * schema.MetresPerFoot)
}

// LitresPerMetre is litres per metre.
func (v VolumePerLength) LitresPerMetre() float64 { return float64(v) * 1000 }

// InsideVolumePerLength is the volume inside a pipe per unit length, from
// its inside diameter: the casing volume used for purging.
func InsideVolumePerLength(p schema.Pipe) VolumePerLength { return VolumePerLength(circle(p.ID)) }
