package quantity

import (
	"math"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// FuzzCompute builds wells of arbitrary, often inconsistent geometry from
// the fuzzer's bytes: Compute must never panic, and every volume, ratio
// and expected top it returns must be finite, volumes not negative.
func FuzzCompute(f *testing.F) {
	f.Add([]byte{10, 40, 80, 20, 5, 30, 60, 2, 200, 3})
	f.Add([]byte{0, 0, 0, 0, 0, 0, 0, 0})
	f.Add([]byte{255, 1, 254, 2, 253, 3, 252, 4, 251, 5, 250, 6, 249, 7})
	f.Add([]byte{50, 10, 10, 50, 100, 30, 90, 60, 20, 20, 1, 2, 3})
	f.Fuzz(func(t *testing.T, b []byte) {
		next := func() float64 {
			if len(b) == 0 {
				return 0
			}
			v := float64(b[0])
			b = b[1:]
			return v
		}
		w := &schema.Well{Units: schema.DefaultUnits(schema.Feet)}
		for range int(next()) % 4 {
			top := ft(next() - 20)
			w.Boreholes = append(w.Boreholes, schema.BoreholeSection{Interval: iv(top, top+ft(next())), Diameter: in(next() / 8)})
		}
		for range int(next()) % 3 {
			top := ft(next() - 20)
			od := in(next() / 10)
			w.Casings = append(w.Casings, schema.Casing{Interval: iv(top, top+ft(next())), Name: "c", Pipe: pipe(od, od-in(next()/100))})
		}
		for range int(next()) % 3 {
			top := ft(next() - 20)
			mid := top + ft(next())
			str(w, "s", top, mid, mid+ft(next()), pipe(in(next()/20), in(next()/40)))
		}
		for range int(next()) % 4 {
			top := ft(next())
			fl := fill(top, top+ft(next()), schema.Materials[int(next())%len(schema.Materials)])
			fl.Bags = next() / 4
			if next() > 128 {
				fl.Within = "c"
			}
			fl.Tags = []schema.Tag{{AfterBags: next() / 8, Depth: ft(next())}}
			w.Fills = append(w.Fills, fl)
		}
		r := Compute(w, nil)
		for _, row := range r.Rows {
			v := float64(row.Calculated)
			if math.IsNaN(v) || math.IsInf(v, 0) || v < 0 {
				t.Fatalf("fill %d: volume %v", row.Index, v)
			}
			if math.IsNaN(row.Ratio) || math.IsInf(row.Ratio, 0) || row.Ratio < 0 {
				t.Fatalf("fill %d: ratio %v", row.Index, row.Ratio)
			}
			for _, tc := range row.Tags {
				if e := float64(tc.Expected); math.IsNaN(e) || math.IsInf(e, 0) {
					t.Fatalf("fill %d: expected top %v", row.Index, e)
				}
			}
		}
	})
}

// FuzzParseYields: any document gives a table or an error, never a panic,
// and a table never holds a yield that is not positive.
func FuzzParseYields(f *testing.F) {
	f.Add([]byte("[yields]\nvolume = \"L\"\n[yields.filter-pack]\nyield = 15\nbag_mass = 25\n"))
	f.Add([]byte("[yields]\nfilter-pack = { yield = 0.5, bag_mass = 50 }\n"))
	f.Add([]byte("yields = 3\n"))
	f.Add([]byte("[yields.fine-sand]\nyield = nan\nbag_mass = inf\n"))
	f.Add([]byte("[yields.neat-cement]\nyield = -1\n"))
	// Issue 15: nesting 10,000 and 100,000 deep, a broken and an empty file.
	for _, deep := range []int{10000, 100000} {
		f.Add([]byte("x = " + strings.Repeat("{a=", deep) + "1" + strings.Repeat("}", deep)))
		f.Add([]byte("x = " + strings.Repeat("[", deep) + strings.Repeat("]", deep)))
	}
	f.Add([]byte("[yields]\nvolume = = 1\n"))
	f.Add([]byte{})
	f.Fuzz(func(t *testing.T, b []byte) {
		y, err := ParseYields("f.toml", b)
		if err != nil {
			return
		}
		for _, m := range y.Materials() {
			if v, _ := y.Get(m); !(v.Volume > 0) || math.IsInf(float64(v.Volume), 0) || v.BagMass < 0 || math.IsInf(float64(v.BagMass), 0) {
				t.Fatalf("%s: yield %v", m, v.Volume)
			}
		}
	})
}
