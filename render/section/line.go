package section

import (
	"fmt"
	"math"
)

// XY is a point in plan, in metres: easting and northing.
type XY struct{ E, N float64 }

// polyline is the line a section follows in plan, in metres.
type polyline []XY

// length is the polyline's length.
func (pl polyline) length() float64 {
	var s float64
	for i := 1; i < len(pl); i++ {
		s += math.Hypot(pl[i].E-pl[i-1].E, pl[i].N-pl[i-1].N)
	}
	return s
}

// project returns how far along the polyline the point's nearest point
// lies (the chainage) and how far the point is from it (the offset). Each
// segment is tried with the foot of the perpendicular clamped to the
// segment, except that the first and last segments run on past the
// line's ends, so a well beyond an end gets a distance before 0 or past
// the length instead of piling up on the end point; the nearest wins,
// the earlier on a tie.
func (pl polyline) project(p XY) (chainage, offset float64) {
	best := math.Inf(1)
	var run float64
	for i := 1; i < len(pl); i++ {
		a, b := pl[i-1], pl[i]
		dx, dy := b.E-a.E, b.N-a.N
		seg := math.Hypot(dx, dy)
		t := 0.0
		if seg > 0 {
			t = ((p.E-a.E)*dx + (p.N-a.N)*dy) / (seg * seg)
			if i > 1 {
				t = math.Max(0, t)
			}
			if i < len(pl)-1 {
				t = math.Min(1, t)
			}
		}
		fx, fy := a.E+t*dx, a.N+t*dy
		if d := math.Hypot(p.E-fx, p.N-fy); d < best {
			best, chainage = d, run+t*seg
		}
		run += seg
	}
	return chainage, best
}

// localPlane turns latitude/longitude into metres on a plane tangent at
// the mean of the points: the equirectangular approximation, good to a
// fraction of a percent over a site a few kilometres across. R is the
// mean Earth radius of the IUGG (Moritz 1980, Geodetic Reference System
// 1980): 6 371 008.8 m.
func localPlane(lat, lon []float64) []XY {
	const r = 6371008.8
	var lat0, lon0 float64
	for i := range lat {
		lat0 += lat[i]
		lon0 += lon[i]
	}
	lat0 /= float64(len(lat))
	lon0 /= float64(len(lon))
	k := math.Pi / 180
	out := make([]XY, len(lat))
	for i := range lat {
		out[i] = XY{E: r * (lon[i] - lon0) * k * math.Cos(lat0*k), N: r * (lat[i] - lat0) * k}
	}
	return out
}

// lineThrough builds the section's polyline: the bend points when given,
// else the straight line from the first well to the last.
func lineThrough(bends []XY, wells []XY) (polyline, error) {
	if len(bends) >= 2 {
		pl := polyline(bends)
		if pl.length() == 0 {
			return nil, fmt.Errorf("the bend points all stand at one place")
		}
		return pl, nil
	}
	pl := polyline{wells[0], wells[len(wells)-1]}
	if pl.length() == 0 {
		return nil, fmt.Errorf("the first and last wells stand at one place; give bend points")
	}
	return pl, nil
}
