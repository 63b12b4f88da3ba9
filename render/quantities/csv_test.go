package quantities

import (
	"encoding/csv"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema/schematest"
)

func TestCSVMetric(t *testing.T) {
	dir := t.TempDir()
	// 200-mm hole, 60.325-mm OD pipe: pi/4 (0.2^2 - 0.060325^2) = 28.558 L/m;
	// a pack over 3 m is 85.673 L = 0.0857 m3
	metric := strings.NewReplacer(`depth = "ft"`, `depth = "m"`, "diameter = 8.25", "diameter = 200",
		"bottom = 30.0", "bottom = 10.0", "top = 20.0", "top = 7.0", "bottom = 20.0", "bottom = 7.0",
		"top = 17.0", "top = 5.0", "bottom = 17.0", "bottom = 5.0", "total_depth = 30.0", "total_depth = 10.0",
		"top = -2.5", "top = -0.5").Replace(schematest.PlannedWell)
	out := report(t, "csv", writeFile(t, dir, "M-1.toml", metric))
	recs, err := csv.NewReader(strings.NewReader(out)).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if len(recs) != 1+3+3+2 { // header, intervals, totals, profile and caution
		t.Fatalf("%d records", len(recs))
	}
	head := recs[0]
	col := func(name string) int {
		for i, h := range head {
			if h == name {
				return i
			}
		}
		t.Fatalf("no column %s", name)
		return -1
	}
	pack := recs[1]
	if pack[col("volume_unit")] != "L" || pack[col("calculated")] != "85.6733" {
		t.Errorf("pack row %v", pack)
	}
	// no bag mass is given, so a metric well counts 25-kg bags: 0.5 ft3
	// per 50 lb (22.680 kg) is 14.158 L x 25 / 22.680 = 15.607 L per bag,
	// 85.673 / 15.607 = 5.49 -> 6 bags
	if pack[col("bags_needed")] != "6" || pack[col("bag_mass")] != "25" {
		t.Errorf("pack bags %s of %s kg, want 6 of 25", pack[col("bags_needed")], pack[col("bag_mass")])
	}
	if last := recs[len(recs)-1]; last[0] != "caution" || !strings.Contains(last[col("note")], "licensed professional") {
		t.Errorf("last record %v", last)
	}
}

// Every record has a field for each column, and a list's line fills the
// columns of a list: with the default 10 % contingency (Kuo, Practical
// Design Calculations for Groundwater and Soil Remediation, ex.
// 2.21-2.22), schematest.PlannedWell's pack of 3.4046 ft3 orders
// 3.4046 x 1.1 / 0.5 = 7.49 -> 8 bags of the 7 needed.
func TestCSVOrderLine(t *testing.T) {
	dir := t.TempDir()
	out := report(t, "csv", writeFile(t, dir, "PL-1.toml", schematest.PlannedWell))
	recs, err := csv.NewReader(strings.NewReader(out)).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	field := map[string]string{}
	for _, r := range recs {
		if len(r) != len(csvColumns) {
			t.Fatalf("record of %d fields, %d columns: %v", len(r), len(csvColumns), r)
		}
		if r[0] == "order" && r[4] == "filter-pack" {
			for i, c := range csvColumns {
				field[c.Header] = r[i]
			}
		}
	}
	want := map[string]string{"kind": "order", "file": "", "top": "", "calculated": "3.4046", "volume_unit": "ft3", "yield": "0.5",
		"bag_mass": "50", "mass_unit": "lb", "bags_needed": "7", "bags_to_order": "8", "note": "1 interval of PL-1"}
	for k, v := range want {
		if field[k] != v {
			t.Errorf("order line %s = %q, want %q", k, field[k], v)
		}
	}
}
