package quantity

import (
	"math"
	"testing"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/schematest"
)

// A pack with d10 0.45, d30 1.2, d60 1.4 mm beside a screen at 25-35 ft.
// By hand: Cu = 1.4/0.45 = 3.111 (ASTM D2487's definition); d30 ratio to
// the sample at 30 ft = 1.2/0.25 = 4.8 (ASTM D5092's design ratio); the
// sample at 10 ft lies above the screen and is not compared.
func TestPackDesigns(t *testing.T) {
	src := schematest.MonitoringWell("PD-1", "ft", "8.25", "36.0",
		schematest.Fill("23.0", "36.0", "filter-pack")+"d10 = 0.45\nd30 = 1.2\nd60 = 1.4\n"+
			schematest.Fill("0.0", "23.0", "neat-cement")+
			"[[sample]]\ndepth = 10.0\nd30 = 0.05\n[[sample]]\ndepth = 30.0\nd30 = 0.25\n")
	w, err := schema.Load("PD-1.toml", []byte(src))
	if err != nil {
		t.Fatal(err)
	}
	ds := PackDesigns(w)
	if len(ds) != 1 || ds[0].Index != 0 {
		t.Fatalf("designs: %+v", ds)
	}
	if math.Abs(ds[0].Cu-3.111) > 5e-4 {
		t.Errorf("Cu = %v, want 1.4/0.45 = 3.111", ds[0].Cu)
	}
	if len(ds[0].Ratios) != 1 || math.Abs(ds[0].Ratios[0].Ratio-4.8) > 1e-9 || ds[0].Ratios[0].Sample.Depth != schema.LengthFrom(30, schema.Feet) {
		t.Errorf("ratios: %+v, want one of 1.2/0.25 = 4.8 at 30 ft", ds[0].Ratios)
	}
}
