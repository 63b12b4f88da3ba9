package features

import (
	"encoding/json"
	"fmt"
	"io"
	"strconv"
	"text/tabwriter"

	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/schema"
)

// Formats lists what Write can produce.
var Formats = []string{"text", "csv", "json"}

// Write lists rows in a format: "text", "csv" or "json".
func Write(w io.Writer, rows []Row, format string) error {
	switch format {
	case "text", "":
		return writeText(w, rows)
	case "csv":
		return writeCSV(w, rows)
	case "json":
		return writeJSON(w, rows)
	}
	return fmt.Errorf("unknown format %q (text, csv or json)", format)
}

func num(p *float64, digits int) string {
	if p == nil {
		return ""
	}
	return schema.TrimFloat(*p, digits)
}

func azimuth(p *float64) string {
	if p == nil {
		return ""
	}
	return fmt.Sprintf("%03.0f", schema.NormAzimuth(float64(int(*p+0.5))))
}

func writeText(w io.Writer, rows []Row) error {
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	well := ""
	for _, r := range rows {
		if r.File+r.WellID != well {
			if well != "" {
				fmt.Fprintln(tw)
			}
			well = r.File + r.WellID
			fmt.Fprintf(tw, "%s  %s  (azimuths from true north; read from %s)\n", r.WellID, r.File, r.North)
			fmt.Fprintf(tw, "  line\tdepth %s\televation\tkind\tdip°\tdip dir.\tstrike (RHR)\tpole\taperture %s\tinflow %s\thow\n", r.Units.Depth, r.Units.Diameter, r.FlowUnit)
		}
		dip, pole := "-", "-"
		if r.Dip != nil {
			dip = num(r.Dip, 1)
			pole = num(r.PolePl, 1) + "→" + azimuth(r.PoleTrend)
		}
		fmt.Fprintf(tw, "  %d\t%s\t%s\t%s\t%s\t%s\t%s\t%s\t%s\t%s\t%s\n", r.Line, num(&r.Depth, 2), dash(num(r.Elevation, 2)), r.Feature.Kind.Label(),
			dip, dash(azimuth(r.DipDir)), dash(azimuth(r.Strike)), pole, dash(num(r.Aperture, 3)), dash(num(r.Inflow, 2)), r.Method)
	}
	if len(rows) == 0 {
		fmt.Fprintln(tw, "no features recorded")
	}
	fmt.Fprintln(tw)
	fmt.Fprintln(tw, Caution)
	return tw.Flush()
}

func dash(s string) string {
	if s == "" {
		return "-"
	}
	return s
}

var csvHeader = []string{"file", "line", "well", "depth", "elevation", "depth_unit", "kind", "dip", "dip_direction", "strike_rhr",
	"pole_trend", "pole_plunge", "aperture", "diameter_unit", "inflow", "inflow_unit", "confidence", "method", "hole_diameter", "fit_residual", "file_north", "note"}

func writeCSV(w io.Writer, rows []Row) error {
	cw := table.NewCSV(w)
	cw.Write(csvHeader)
	for _, r := range rows {
		f := r.Feature
		// Every field made inert: an ID or note a spreadsheet would run.
		cw.Write(table.InertRecord([]string{r.File, strconv.Itoa(r.Line), r.WellID, num(&r.Depth, 4), num(r.Elevation, 4), string(r.Units.Depth), string(f.Kind),
			num(r.Dip, 2), num(r.DipDir, 2), num(r.Strike, 2), num(r.PoleTrend, 2), num(r.PolePl, 2),
			num(r.Aperture, 4), string(r.Units.Diameter), num(r.Inflow, 4), r.FlowUnit, string(f.Confidence), r.Method,
			num(r.Hole, 4), num(r.Residual, 4), r.North, f.Note}))
	}
	cw.Write([]string{"caution", "", "", "", "", "", "", "", "", "", "", "", "", "", "", "", "", "", "", "", "", Caution})
	cw.Flush()
	return cw.Error()
}

type jsonFeature struct {
	File         string   `json:"file"`
	Line         int      `json:"line"`
	Well         string   `json:"well"`
	Depth        float64  `json:"depth"`
	Elevation    *float64 `json:"elevation,omitempty"`
	DepthUnit    string   `json:"depth_unit"`
	Kind         string   `json:"kind"`
	WaterBearing bool     `json:"water_bearing"`
	Dip          *float64 `json:"dip,omitempty"`
	DipDirection *float64 `json:"dip_direction,omitempty"`
	Strike       *float64 `json:"strike_rhr,omitempty"`
	PoleTrend    *float64 `json:"pole_trend,omitempty"`
	PolePlunge   *float64 `json:"pole_plunge,omitempty"`
	Aperture     *float64 `json:"aperture,omitempty"`
	DiameterUnit string   `json:"diameter_unit"`
	Inflow       *float64 `json:"inflow,omitempty"`
	InflowUnit   string   `json:"inflow_unit"`
	Confidence   string   `json:"confidence,omitempty"`
	Method       string   `json:"method"`
	HoleDiameter *float64 `json:"hole_diameter,omitempty"`
	FitResidual  *float64 `json:"fit_residual,omitempty"`
	FileNorth    string   `json:"file_north"`
	Note         string   `json:"note,omitempty"`
}

func writeJSON(w io.Writer, rows []Row) error {
	out := struct {
		Caution  string        `json:"caution"`
		Features []jsonFeature `json:"features"`
	}{Caution: Caution, Features: []jsonFeature{}}
	for _, r := range rows {
		f := r.Feature
		out.Features = append(out.Features, jsonFeature{File: r.File, Line: r.Line, Well: r.WellID, Depth: *ptr(r.Depth), Elevation: r.Elevation,
			DepthUnit: string(r.Units.Depth), Kind: string(f.Kind), WaterBearing: f.IsWaterBearing(), Dip: r.Dip, DipDirection: r.DipDir,
			Strike: r.Strike, PoleTrend: r.PoleTrend, PolePlunge: r.PolePl, Aperture: r.Aperture, DiameterUnit: string(r.Units.Diameter),
			Inflow: r.Inflow, InflowUnit: r.FlowUnit, Confidence: string(f.Confidence), Method: r.Method,
			HoleDiameter: r.Hole, FitResidual: r.Residual, FileNorth: r.North, Note: f.Note})
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(out)
}
