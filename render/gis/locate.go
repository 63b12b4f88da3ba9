// Package gis exports a project's wells for maps: GeoJSON (RFC 7946) and
// a CSV with one coordinate system per column set. Each monitoring point
// (each string of a nested well) is one point, carrying the construction
// summary's columns, its check status and links to its well's sheets. A
// well whose location cannot be placed is reported and left out, never
// put at 0,0.
package gis

import (
	"errors"
	"fmt"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/crs"
)

// Position is where a well stands in WGS 84, and how that was found.
type Position struct {
	Lon, Lat float64
	Source   string // "EPSG:2227 easting/northing" or "latitude/longitude"
}

// ErrNoCoordinates: the well records no coordinates at all.
var ErrNoCoordinates = errors.New("no coordinates recorded")

// Locate places a well: its easting and northing converted from its
// `crs`, else its latitude and longitude (WGS 84, or the geographic
// system its `crs` names). The error says why a well cannot be placed.
func Locate(w *schema.Well) (Position, error) {
	loc := w.Location
	var sys *crs.CRS
	if loc.CRS != "" {
		c, err := crs.Parse(loc.CRS)
		if err != nil {
			return Position{}, err
		}
		sys = c
	}
	if loc.Easting != nil && loc.Northing != nil && sys != nil && !sys.Geographic() {
		lon, lat, err := sys.ToLonLat(*loc.Easting, *loc.Northing)
		if err != nil {
			return Position{}, err
		}
		return Position{Lon: lon, Lat: lat, Source: sys.String() + " easting/northing"}, nil
	}
	if loc.Latitude != nil && loc.Longitude != nil {
		lon, lat := *loc.Longitude, *loc.Latitude
		if sys != nil && sys.Geographic() {
			var err error
			if lon, lat, err = sys.ToLonLat(lon, lat); err != nil {
				return Position{}, err
			}
			return Position{Lon: lon, Lat: lat, Source: sys.String() + " latitude/longitude"}, nil
		}
		return Position{Lon: lon, Lat: lat, Source: "latitude/longitude (WGS 84)"}, nil
	}
	if loc.Easting != nil && loc.Northing != nil {
		return Position{}, fmt.Errorf("easting and northing without a crs (add crs = \"EPSG:…\" to [location] or the project)")
	}
	return Position{}, ErrNoCoordinates
}
