// Package features lists a well's open-hole wall features with their
// computed orientation (text, CSV, JSON) and lays out the feature summary
// page: an equal-area net of the poles, a rose of dip directions and the
// feature table. It knows nothing of files: commands and the book call it.
package features

import (
	"fmt"
	"math"

	"github.com/tremie-dev/tremie/schema"
)

// Caution goes with every feature listing.
const Caution = "Figures and checks support, and never replace, the review of a licensed professional and the governing " +
	"local well code. Orientations take the hole as vertical."

// Row is one feature with its orientation, in the well's file units.
type Row struct {
	File    string
	Line    int
	WellID  string
	Feature *schema.Feature
	Units   schema.Units

	Depth     float64  // file depth unit
	Elevation *float64 // nil when the ground elevation was not surveyed
	Dip       *float64 // nil when no orientation was given or picked
	DipDir    *float64
	Strike    *float64
	PoleTrend *float64
	PolePl    *float64
	Aperture  *float64 // file diameter unit
	Inflow    *float64 // gpm or L/min (schema.InflowUnit)
	FlowUnit  string
	Method    string   // how the orientation was found
	Hole      *float64 // hole diameter used for picks, file diameter unit
	Residual  *float64 // RMS misfit of a fitted sinusoid, file diameter unit
	North     string   // azimuth reference of the file
}

// Rows lists a well's features in file order.
func Rows(file string, w *schema.Well) []Row {
	u := w.Units
	out := make([]Row, 0, len(w.Features))
	for i := range w.Features {
		f := &w.Features[i]
		r := Row{File: file, Line: w.Line(f.Path), WellID: w.ID, Feature: f, Units: u, Depth: f.Depth.In(u.Depth), North: north(w.Orientation)}
		if g := w.Elevation.Ground; g != nil {
			r.Elevation = ptr(g.In(u.Depth) - r.Depth)
		}
		o := f.Orient
		if o.HasAttitude {
			r.Dip, r.DipDir, r.Strike = ptr(o.Dip), ptr(o.DipDirection), ptr(o.Strike)
			r.PoleTrend, r.PolePl = ptr(o.PoleTrend), ptr(o.PolePlunge)
		}
		if f.Aperture > 0 {
			r.Aperture = ptr(f.Aperture.In(u.Diameter))
		}
		vu, label := schema.InflowUnit(u)
		r.FlowUnit = label
		if f.HasInflow {
			r.Inflow = ptr(f.Inflow.In(vu))
		}
		r.Method = method(o)
		if p := o.Picked; p != nil {
			r.Hole = ptr(p.HoleDiameter.In(u.Diameter))
			if p.Points > 2 {
				r.Residual = ptr(schema.Diameter(p.Fit.Residual * 1000).In(u.Diameter))
			}
		}
		out = append(out, r)
	}
	return out
}

func north(o schema.Orientation) string {
	if o.North == schema.MagneticNorth {
		return fmt.Sprintf("magnetic north, declination %s°", schema.TrimFloat(o.Declination, 2))
	}
	return "true north"
}

// method says where the orientation came from.
func method(o schema.FeatureOrientation) string {
	p := o.Picked
	var picks string
	switch {
	case p == nil:
	case p.Points == 2:
		picks = "picks: high and low"
	default:
		picks = fmt.Sprintf("picks: %d-point fit", p.Points)
	}
	switch {
	case o.Given != nil && p != nil:
		return fmt.Sprintf("given; %s %.1f° off", picks, o.Disagree)
	case o.Given != nil:
		return "given"
	case p != nil:
		return picks
	}
	return "none"
}

func ptr(v float64) *float64 {
	v = math.Round(v*1e4) / 1e4
	if v == 0 {
		v = 0 // no "-0"
	}
	return &v
}
