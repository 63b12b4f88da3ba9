// Package crs names a coordinate reference system by its EPSG code
// ("EPSG:2227") and converts its coordinates to WGS 84 longitude and
// latitude, for maps and GIS exports. It carries the systems practitioners
// survey wells in (UTM zones, every US State Plane zone of NAD83 in metres
// and the US survey or international feet its states use, and common
// national grids); see registry.go.
//
// The projections follow the formulas of IOGP Publication 373-7-2
// (Geomatics Guidance Note 7 part 2): Transverse Mercator (EPSG method
// 9807, the JHS series) and Lambert Conic Conformal 2SP (9802). They are
// written here rather than taken from a library: the one pure-Go library
// served to us (github.com/wroge/wgs84 v1.1.7) misses the IOGP Transverse
// Mercator example by 5.9e-5 degrees of latitude (about 6 m) on the way
// back to latitude, and the others need PROJ through cgo.
//
// Datums on the GRS 80 ellipsoid (NAD83, ETRS89, GDA94, GDA2020,
// NZGD2000) are taken as WGS 84, as IOGP's null transformations do: they
// agree to about 1 to 2 m, well within what a well location on a map
// needs. OSGB 1936 is shifted with its seven-parameter transformation
// (EPSG 1314, about 2 m).
package crs

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// CRS is one coordinate reference system.
type CRS struct {
	Code int    // EPSG code
	Name string // EPSG name, e.g. "NAD83 / California zone 3 (ftUS)"
	Unit Unit   // of the projected coordinates; Degree for a geographic system
	// proj is nil for a geographic system.
	proj  projection
	datum *datum
}

// Unit is a unit of coordinates.
type Unit struct {
	Name   string  // "metre", "US survey foot", "foot", "degree"
	Metres float64 // metres in one unit; 0 for degrees
}

// Units of the registry (EPSG 9001, 9003, 9002, 9102).
var (
	Metre        = Unit{"metre", 1}
	USSurveyFoot = Unit{"US survey foot", 1200.0 / 3937.0} // exact by definition
	Foot         = Unit{"foot", 0.3048}                    // international foot, exact
	Degree       = Unit{"degree", 0}
)

// Geographic reports whether the system's coordinates are longitude and
// latitude.
func (c *CRS) Geographic() bool { return c.proj == nil }

// String is "EPSG:CODE".
func (c *CRS) String() string { return "EPSG:" + strconv.Itoa(c.Code) }

// Parse reads "EPSG:2227" (any case, spaces around the colon allowed) and
// returns the system, or an error naming what is wrong.
func Parse(s string) (*CRS, error) {
	t := strings.TrimSpace(s)
	authority, code, ok := strings.Cut(t, ":")
	if !ok || !strings.EqualFold(strings.TrimSpace(authority), "EPSG") {
		return nil, fmt.Errorf("coordinate reference %q: write it as an EPSG code, e.g. \"EPSG:2227\"", s)
	}
	n, err := strconv.Atoi(strings.TrimSpace(code))
	if err != nil || n <= 0 {
		return nil, fmt.Errorf("coordinate reference %q: %q is not an EPSG code number", s, strings.TrimSpace(code))
	}
	c, ok := Lookup(n)
	if !ok {
		return nil, fmt.Errorf("coordinate reference %q is not one tremie can convert (UTM zones, NAD83 State Plane zones and the national grids listed in docs/import.md are)", s)
	}
	return c, nil
}

// IsEPSG reports whether s is written as an EPSG code ("EPSG:…"), known
// or not; free-text descriptions are not.
func IsEPSG(s string) bool {
	a, _, ok := strings.Cut(strings.TrimSpace(s), ":")
	return ok && strings.EqualFold(strings.TrimSpace(a), "EPSG")
}

// ToLonLat converts a coordinate pair of the system (easting and northing
// in its unit; for a geographic system longitude and latitude) to WGS 84
// longitude and latitude in degrees.
func (c *CRS) ToLonLat(x, y float64) (lon, lat float64, err error) {
	if !finite(x) || !finite(y) {
		return 0, 0, fmt.Errorf("%s: coordinates %v, %v are not numbers", c, x, y)
	}
	if c.proj == nil {
		lon, lat = x, y
	} else {
		e, n := x*c.Unit.Metres, y*c.Unit.Metres
		if math.Abs(e) > maxProjected || math.Abs(n) > maxProjected {
			return 0, 0, fmt.Errorf("%s: %v, %v lies outside the projection", c, x, y)
		}
		lon, lat = c.proj.inverse(e, n)
		// A point far outside the zone may come back as a latitude the
		// forward projection does not return to: refuse it.
		if e2, n2 := c.proj.forward(lon, lat); !(math.Abs(e2-e) < 0.01 && math.Abs(n2-n) < 0.01) {
			return 0, 0, fmt.Errorf("%s: %v, %v lies outside the projection", c, x, y)
		}
	}
	if !finite(lon) || !finite(lat) || math.Abs(lat) > 90 {
		return 0, 0, fmt.Errorf("%s: %v, %v lies outside the projection", c, x, y)
	}
	lon, lat = c.datum.toWGS84(lon, lat)
	if math.Abs(lon) > 180 || math.Abs(lat) > 90 {
		return 0, 0, fmt.Errorf("%s: %v, %v lies outside the projection", c, x, y)
	}
	return lon, lat, nil
}

// FromLonLat converts WGS 84 longitude and latitude to the system's
// coordinates, in its unit.
func (c *CRS) FromLonLat(lon, lat float64) (x, y float64, err error) {
	if !finite(lon) || !finite(lat) || math.Abs(lon) > 180 || math.Abs(lat) > 90 {
		return 0, 0, fmt.Errorf("%s: %v, %v is not a longitude and latitude", c, lon, lat)
	}
	lon, lat = c.datum.fromWGS84(lon, lat)
	if c.proj == nil {
		return lon, lat, nil
	}
	e, n := c.proj.forward(lon, lat)
	if !finite(e) || !finite(n) {
		return 0, 0, fmt.Errorf("%s: %v, %v lies outside the projection", c, lon, lat)
	}
	return e / c.Unit.Metres, n / c.Unit.Metres, nil
}

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// projection maps geodetic longitude and latitude (degrees, on the
// system's own datum) to easting and northing in metres and back.
type projection interface {
	forward(lon, lat float64) (e, n float64)
	inverse(e, n float64) (lon, lat float64)
}

const deg = math.Pi / 180

// maxProjected bounds eastings and northings (m): no projected system
// here reaches 20,000 km from its false origin.
const maxProjected = 2e7
