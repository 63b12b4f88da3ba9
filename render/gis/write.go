package gis

import (
	"bytes"
	"encoding/json"
	"fmt"

	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/crs"
)

// Decimals written: 7 for degrees (about 1 cm, finer than RFC 7946 §11.2's
// 6 so a surveyed point keeps its centimetres), 3 for projected units.
const (
	degreeDigits    = 7
	projectedDigits = 3
)

// unitAbbrev names a projected unit in a column title.
func unitAbbrev(u crs.Unit) string {
	switch u {
	case crs.USSurveyFoot:
		return "ftUS"
	case crs.Foot:
		return "ft"
	}
	return "m"
}

// projectedTitles are the projected column set's titles.
func (x *Export) projectedTitles() (string, string) {
	s := unitAbbrev(x.Projected.Unit) + ", " + x.Projected.String()
	return "Easting (" + s + ")", "Northing (" + s + ")"
}

const (
	lonTitle   = "Longitude (deg E, WGS 84)"
	latTitle   = "Latitude (deg N, WGS 84)"
	pointTitle = "Monitoring point"
	sheetTitle = "Sheets"
	posTitle   = "Position from"
)

// GeoJSON writes an RFC 7946 FeatureCollection: one Point feature per
// monitoring point in WGS 84 longitude, latitude; properties are the
// monitoring point, the summary's columns (units in their names), the
// projected coordinates, how the position was found and the sheet links.
// The caution is a foreign member of the collection (RFC 7946 §6.1).
func (x *Export) GeoJSON() []byte {
	var b bytes.Buffer
	b.WriteString("{\n\"type\": \"FeatureCollection\",\n\"caution\": ")
	b.Write(jsonString(x.Caution))
	b.WriteString(",\n\"features\": [")
	for i, p := range x.Points {
		if i > 0 {
			b.WriteString(",")
		}
		b.WriteString("\n{\"type\": \"Feature\", \"id\": ")
		b.Write(jsonString(p.ID))
		fmt.Fprintf(&b, ", \"geometry\": {\"type\": \"Point\", \"coordinates\": [%s, %s]}, \"properties\": {",
			schema.TrimFloat(p.Pos.Lon, degreeDigits), schema.TrimFloat(p.Pos.Lat, degreeDigits))
		first := true
		prop := func(name string, raw []byte) {
			if !first {
				b.WriteString(", ")
			}
			first = false
			b.Write(jsonString(name))
			b.WriteString(": ")
			b.Write(raw)
		}
		prop(pointTitle, jsonString(p.Name))
		for ci, c := range x.Columns {
			prop(c.Title(), cellJSON(p.Cells[ci]))
		}
		if x.Projected != nil {
			et, nt := x.projectedTitles()
			prop(et, []byte(schema.TrimFloat(p.E, projectedDigits)))
			prop(nt, []byte(schema.TrimFloat(p.N, projectedDigits)))
		}
		prop(posTitle, jsonString(p.Pos.Source))
		links := []byte("[]")
		if len(p.Sheets) > 0 {
			links, _ = json.Marshal(p.Sheets)
		}
		prop(sheetTitle, links)
		b.WriteString("}}")
	}
	b.WriteString("\n]\n}\n")
	return b.Bytes()
}

func jsonString(s string) []byte {
	out, _ := json.Marshal(s) // a string always marshals
	return out
}

// cellJSON is a number, a string or null.
func cellJSON(c table.Cell) []byte {
	if c.Num != nil {
		return []byte(c.String())
	}
	if c.Text == "" {
		return []byte("null")
	}
	return jsonString(c.Text)
}

// CSV writes RFC 4180 CSV, one record per monitoring point: the point, the
// summary's columns, then the projected column set (every row in the one
// projected system, when there is one) and the WGS 84 longitude and
// latitude, how the position was found, the sheets (separated by "; ")
// and the caution.
func (x *Export) CSV() ([]byte, error) {
	var b bytes.Buffer
	w := table.NewCSV(&b)
	head := []string{pointTitle}
	for _, c := range x.Columns {
		head = append(head, c.Title())
	}
	if x.Projected != nil {
		et, nt := x.projectedTitles()
		head = append(head, et, nt)
	}
	head = append(head, lonTitle, latTitle, posTitle, sheetTitle, "Caution")
	if err := w.Write(head); err != nil {
		return nil, fmt.Errorf("csv: %w", err)
	}
	for _, p := range x.Points {
		rec := []string{table.Inert(p.Name)}
		for _, c := range p.Cells {
			rec = append(rec, c.CSVText())
		}
		if x.Projected != nil {
			rec = append(rec, schema.TrimFloat(p.E, projectedDigits), schema.TrimFloat(p.N, projectedDigits))
		}
		sheets := ""
		for i, s := range p.Sheets {
			if i > 0 {
				sheets += "; "
			}
			sheets += s
		}
		rec = append(rec, schema.TrimFloat(p.Pos.Lon, degreeDigits), schema.TrimFloat(p.Pos.Lat, degreeDigits), p.Pos.Source, sheets, x.Caution)
		if err := w.Write(rec); err != nil {
			return nil, fmt.Errorf("csv: %w", err)
		}
	}
	w.Flush()
	if err := w.Error(); err != nil {
		return nil, fmt.Errorf("csv: %w", err)
	}
	return b.Bytes(), nil
}
