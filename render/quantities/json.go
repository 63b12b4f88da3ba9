package quantities

import (
	"encoding/json"
	"io"
	"math"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

// jsonQuantities is the report as JSON: the wells, the lists and the
// findings of every well.
type jsonQuantities struct {
	Caution     string      `json:"caution"`
	Profiles    []string    `json:"profiles"` // the profiles in force: "default thresholds" or "profile NAME"
	Contingency float64     `json:"contingency_pct"`
	Wells       []jsonWell  `json:"wells"`
	OrderingFor []string    `json:"ordering_for"`
	ForPlanned  bool        `json:"ordering_for_planned"`
	Totals      []jsonTotal `json:"totals"`
	AsBuiltFor  []string    `json:"as_built"`
	// Held are wells left out of both lists: a likely unit slip.
	Held     []string        `json:"held_back"`
	AsBuilt  []jsonTotal     `json:"as_built_totals"`
	Findings []rules.Finding `json:"findings"`
}

type jsonWell struct {
	File        string     `json:"file"`
	Well        string     `json:"well"`
	DepthUnit   string     `json:"depth_unit"`
	VolumeUnit  string     `json:"volume_unit"`
	VolumeUnit2 string     `json:"volume_unit_2"`
	MassUnit    string     `json:"mass_unit"`
	Fills       []jsonFill `json:"fills"`
	Pipes       []jsonPipe `json:"pipes"`
	// WellVolumes are in volume_unit, levels in depth_unit.
	WellVolumes []jsonWellVolume `json:"well_volumes"`
	// CollapseLoads are in pressure_unit (psi, or kPa in a well in metres).
	CollapseLoads []jsonCollapse `json:"collapse_loads"`
}

// jsonCollapse is a grout column's worst load on PVC casing.
type jsonCollapse struct {
	Fill         int     `json:"fill"` // the column's lowest fill, from 1
	Top          float64 `json:"top"`
	Bottom       float64 `json:"bottom"`
	At           float64 `json:"at"`
	Pipe         string  `json:"pipe"`
	Outside      float64 `json:"outside"`
	Inside       float64 `json:"inside"`
	WaterStated  bool    `json:"water_inside_stated"`
	Differential float64 `json:"differential"`
	Rating       float64 `json:"rating"`
	Fraction     float64 `json:"fraction_of_rating"`
	Unit         string  `json:"pressure_unit"`
}

type jsonWellVolume struct {
	String     string   `json:"string"`
	Level      float64  `json:"static_level"`
	Bottom     float64  `json:"bottom"`
	Casing     float64  `json:"casing_volume"`
	Pack       *float64 `json:"pack_pore_volume,omitempty"`
	Porosity   *float64 `json:"pack_porosity,omitempty"`
	WellVolume float64  `json:"well_volume"`
	Purge      float64  `json:"purge_volume"`
	PurgeTimes int      `json:"purge_well_volumes"`
}

// jsonMix is a grout's mix per bag: water in water_unit (gal, or L for a
// well in metres) and densities in density_unit (lb/gal or kg/L).
type jsonMix struct {
	Water       float64  `json:"water_per_bag"`
	WaterUnit   string   `json:"water_unit"`
	Expected    float64  `json:"expected_density"`
	Measured    *float64 `json:"measured_density,omitempty"`
	DensityUnit string   `json:"density_unit"`
	// Stated: the expected density is the yields file's, not worked from
	// the mix; water_per_bag is 0 where the file gives no water.
	Stated bool `json:"density_stated"`
}

type jsonFill struct {
	Index       int       `json:"index"` // 0-based, as in the key paths
	Path        string    `json:"path"`
	Material    string    `json:"material"`
	Within      string    `json:"within,omitempty"`
	Top         float64   `json:"top"`
	Bottom      float64   `json:"bottom"`
	Calculated  float64   `json:"calculated"`
	Calculated2 float64   `json:"calculated_2"`
	Yield       *float64  `json:"yield,omitempty"`
	BagMass     *float64  `json:"bag_mass,omitempty"`
	YieldBasis  string    `json:"yield_basis,omitempty"`
	BagsExact   *float64  `json:"bags_exact,omitempty"`
	BagsNeeded  *int      `json:"bags_needed,omitempty"`
	BagsPlaced  *float64  `json:"bags_placed,omitempty"`
	Placed      *float64  `json:"placed,omitempty"`
	Ratio       *float64  `json:"ratio,omitempty"`
	Tags        []jsonTag `json:"tags,omitempty"`
	Mix         *jsonMix  `json:"mix,omitempty"`
	Error       string    `json:"error,omitempty"`
	// A filter pack's grading figures (quantity.PackDesigns).
	Cu           *float64          `json:"uniformity_coefficient,omitempty"`
	SampleRatios []jsonSampleRatio `json:"formation_d30_ratios,omitempty"`
}

// jsonSampleRatio is a pack's d30 over a formation sample's, the sample's
// depth in depth_unit.
type jsonSampleRatio struct {
	Path  string  `json:"sample"`
	Depth float64 `json:"depth"`
	Ratio float64 `json:"ratio"`
}

type jsonTag struct {
	AfterBags float64 `json:"after_bags"`
	Depth     float64 `json:"depth"`
	Expected  float64 `json:"expected"`
	Reached   bool    `json:"reached"`
}

type jsonPipe struct {
	Name   string  `json:"name"`
	Kind   string  `json:"kind"`
	Path   string  `json:"path"`
	Top    float64 `json:"top"`
	Bottom float64 `json:"bottom"`
	// Inside is the volume per length: US gal/ft for a file in feet, L/m
	// for one in metres (see unit).
	Inside float64 `json:"inside"`
	Unit   string  `json:"unit"`
}

type jsonTotal struct {
	Material   string   `json:"material"`
	Yield      *float64 `json:"yield,omitempty"`
	BagMass    *float64 `json:"bag_mass,omitempty"`
	MassUnit   string   `json:"mass_unit"`
	YieldBasis string   `json:"yield_basis,omitempty"`
	VolumeUnit string   `json:"volume_unit"`
	Calculated float64  `json:"calculated"`
	Intervals  int      `json:"intervals"`
	BagsNeeded *int     `json:"bags_needed,omitempty"`
	BagsOrder  *int     `json:"bags_to_order,omitempty"`
	BagsPlaced float64  `json:"bags_placed"`
	Placed     *float64 `json:"placed,omitempty"`
}

// jsonTotals writes a list's lines.
func jsonTotals(lines []*quantity.Line) []jsonTotal {
	out := []jsonTotal{}
	for _, t := range lines {
		p, _ := quantity.VolumeUnits(t.Units)
		mu := quantity.MassUnit(t.Units)
		jt := jsonTotal{Material: string(t.Material), MassUnit: string(mu), VolumeUnit: string(p), Calculated: r4(t.Calculated.In(p)),
			Intervals: t.Intervals, BagsPlaced: t.BagsPlaced}
		if t.HasYield {
			jt.Yield = ptr(r4(t.Yield.Volume.In(p)))
			if t.Yield.BagMass > 0 {
				jt.BagMass = ptr(r4(t.Yield.BagMass.In(mu)))
			}
			jt.YieldBasis = string(t.Yield.Basis)
			jt.BagsNeeded, jt.BagsOrder = ptr(t.BagsNeeded), ptr(t.BagsOrder)
		}
		if t.Placed > 0 {
			jt.Placed = ptr(r4(t.Placed.In(p)))
		}
		out = append(out, jt)
	}
	return out
}

// r4 rounds to 4 decimals: stable output with no false precision.
func r4(v float64) float64 { return math.Round(v*1e4) / 1e4 }

func ptr[T any](v T) *T { return &v }

// writeJSON writes the report as one indented JSON object; fields a row
// lacks are left out, lists are never null.
func writeJSON(w io.Writer, rep *Report) error {
	order := rep.Order
	out := jsonQuantities{Caution: rep.Caution, Profiles: rep.Profiles, Contingency: order.Contingency, Wells: []jsonWell{}, Totals: jsonTotals(order.Lines),
		OrderingFor: append([]string{}, order.For...), ForPlanned: order.Planned, AsBuiltFor: append([]string{}, order.AsBuilt...), Held: append([]string{}, order.Held...),
		AsBuilt: jsonTotals(order.AsBuiltLines), Findings: []rules.Finding{}}
	for _, wq := range rep.Wells {
		r := wq.Quantities
		u := r.Well.Units
		p, s := quantity.VolumeUnits(u)
		mu := quantity.MassUnit(u)
		jw := jsonWell{File: wq.File, Well: r.Well.ID, DepthUnit: string(u.Depth), VolumeUnit: string(p), VolumeUnit2: string(s), MassUnit: string(mu),
			Fills: []jsonFill{}, Pipes: []jsonPipe{}, WellVolumes: []jsonWellVolume{}, CollapseLoads: []jsonCollapse{}}
		for _, c := range wq.Collapse {
			pressure := func(pa float64) float64 { v, _ := quantity.PressureIn(pa, u); return r4(v) }
			_, unit := quantity.PressureIn(0, u)
			jw.CollapseLoads = append(jw.CollapseLoads, jsonCollapse{Fill: fillNumber(r.Well, c.Fills[len(c.Fills)-1]),
				Top: r4(c.Top.In(u.Depth)), Bottom: r4(c.Bottom.In(u.Depth)), At: r4(c.At.In(u.Depth)), Pipe: c.Pipe.Label(),
				Outside: pressure(c.Outside), Inside: pressure(c.Inside), WaterStated: c.WaterStated, Differential: pressure(c.Differential()),
				Rating: pressure(c.Rating), Fraction: r4(c.Fraction()), Unit: unit})
		}
		designs := map[int]quantity.PackDesign{}
		for _, d := range quantity.PackDesigns(r.Well) {
			designs[d.Index] = d
		}
		for _, v := range wq.Volumes {
			jv := jsonWellVolume{String: v.String, Level: r4(v.Level.In(u.Depth)), Bottom: r4(v.Bottom.In(u.Depth)), Casing: r4(v.Casing.In(p)),
				WellVolume: r4(v.Well().In(p)), Purge: r4(v.Purge().In(p)), PurgeTimes: quantity.PurgeWellVolumes}
			if v.Porosity > 0 {
				jv.Pack, jv.Porosity = ptr(r4(v.Pack.In(p))), ptr(v.Porosity)
			}
			jw.WellVolumes = append(jw.WellVolumes, jv)
		}
		for _, row := range r.AllRows() {
			f := row.Fill
			jf := jsonFill{Index: row.Index, Path: f.Path, Material: string(f.Material), Within: f.Within,
				Top: r4(f.Top.In(u.Depth)), Bottom: r4(f.Bottom.In(u.Depth))}
			if row.Err != nil {
				jf.Error = row.Err.Error()
				jw.Fills = append(jw.Fills, jf)
				continue
			}
			jf.Calculated, jf.Calculated2 = r4(row.Calculated.In(p)), r4(row.Calculated.In(s))
			if row.HasYield {
				jf.Yield = ptr(r4(row.Yield.Volume.In(p)))
				if row.Yield.BagMass > 0 {
					jf.BagMass = ptr(r4(row.Yield.BagMass.In(mu)))
				}
				jf.YieldBasis = string(row.Yield.Basis)
				jf.BagsExact = ptr(r4(row.BagsExact))
				jf.BagsNeeded = ptr(row.BagsNeeded)
			}
			if f.Bags > 0 {
				jf.BagsPlaced = ptr(f.Bags)
			}
			if row.Placed > 0 {
				jf.Placed = ptr(r4(row.Placed.In(p)))
			}
			if row.Ratio > 0 {
				jf.Ratio = ptr(r4(row.Ratio))
			}
			if d, ok := designs[row.Index]; ok && !row.IsPad() {
				if d.Cu > 0 {
					jf.Cu = ptr(r4(d.Cu))
				}
				for _, sr := range d.Ratios {
					jf.SampleRatios = append(jf.SampleRatios, jsonSampleRatio{Path: sr.Sample.Path, Depth: r4(sr.Sample.Depth.In(u.Depth)), Ratio: r4(sr.Ratio)})
				}
			}
			if d, ok := row.Yield.Density(); ok && row.HasYield && f.Yield <= 0 {
				water, wunit := quantity.WaterPerBagIn(row.Yield, u)
				m := &jsonMix{Water: r4(water), WaterUnit: wunit, Stated: row.Yield.Stated > 0}
				var want float64
				want, m.DensityUnit = schema.SlurryDensityIn(d, u)
				m.Expected = r4(want)
				if f.Density > 0 {
					got, _ := schema.SlurryDensityIn(f.Density, u)
					m.Measured = ptr(r4(got))
				}
				jf.Mix = m
			}
			for _, tc := range row.Tags {
				if tc.Err == nil {
					jf.Tags = append(jf.Tags, jsonTag{AfterBags: tc.Tag.AfterBags, Depth: r4(tc.Tag.Depth.In(u.Depth)), Expected: r4(tc.Expected.In(u.Depth)), Reached: tc.Reached})
				}
			}
			jw.Fills = append(jw.Fills, jf)
		}
		for _, pv := range r.Pipes {
			jp := jsonPipe{Name: pv.Name, Kind: pv.Kind, Path: pv.Path, Top: r4(pv.Interval.Top.In(u.Depth)), Bottom: r4(pv.Interval.Bottom.In(u.Depth))}
			inside, unit := quantity.PerLengthIn(pv.Inside, u)
			jp.Inside, jp.Unit = r4(inside), unit
			jw.Pipes = append(jw.Pipes, jp)
		}
		out.Wells = append(out.Wells, jw)
		out.Findings = append(out.Findings, wq.Findings...)
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(out)
}
