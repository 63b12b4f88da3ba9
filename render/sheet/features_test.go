package sheet

import (
	"math"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/wallimage"
	"github.com/tremie-dev/tremie/schema"
)

// demoWallImages decodes the images the demo makes for a well.
func demoWallImages(t testing.TB, w *schema.Well) map[string]*wallimage.Image {
	t.Helper()
	files, err := wallimage.DemoImages(w)
	if err != nil {
		t.Fatal(err)
	}
	out := map[string]*wallimage.Image{}
	for _, wi := range w.WallImages {
		im, err := wallimage.Decode(files[wi.File])
		if err != nil {
			t.Fatal(err)
		}
		out[wi.Name] = im
	}
	return out
}

// The fixture: an image taken with its left edge at 090 running
// counter-clockwise, and ten picks, five by their high and low points and
// five by points on the curve.
const tenPicks = `[units]
depth = "m"
[well]
id = "FT-10"
purpose = "domestic"
total_depth = 20
[[borehole]]
top = 0
bottom = 20
diameter = 150
[[casing]]
top = -0.5
bottom = 5
size = "6"
schedule = "40"
material = "carbon steel"
[[fill]]
top = 0
bottom = 5
material = "neat-cement"
[[open_hole]]
top = 5
bottom = 20
[[lithology]]
top = 0
bottom = 20
rock = "granite"
[[wall_image]]
name = "acoustic"
file = "ft10.png"
top = 5
bottom = 19.5
left_azimuth = 90
direction = "counterclockwise"
`

func tenPicksWell(t *testing.T) *schema.Well {
	t.Helper()
	src := tenPicks
	for i := range 5 {
		d := 6.0 + 2.6*float64(i)
		src += "[[feature]]\nkind = \"fracture\"\nimage = \"acoustic\"\n" +
			"trace_high = " + schema.TrimFloat(d, 3) + "\ntrace_low = " + schema.TrimFloat(d+0.05+0.08*float64(i), 3) +
			"\nlow_azimuth = " + schema.TrimFloat(float64(i)*71, 0) + "\n"
		// Points on z = c + A·cos(θ − θd), written out here.
		c, a, td := d+1.3, 0.03+0.05*float64(i), float64(i)*53+20
		src += "[[feature]]\nkind = \"vein\"\nimage = \"acoustic\"\npoints = ["
		for k, az := range []float64{10, 100, 170, 250, 330} {
			if k > 0 {
				src += ", "
			}
			src += "[" + schema.TrimFloat(az, 0) + ", " + schema.TrimFloat(c+a*math.Cos((az-td)*math.Pi/180), 6) + "]"
		}
		src += "]\n"
	}
	w, err := schema.Load("ft10.toml", []byte(src))
	if err != nil {
		t.Fatal(err)
	}
	if len(w.Features) != 10 {
		t.Fatalf("%d features", len(w.Features))
	}
	return w
}

// Every trace drawn over the image passes through its picked points at
// the sheet's scale, read from the layout: x from the image's place and
// the azimuth, y from the image's depths.
func TestTracesPassThroughPicks(t *testing.T) {
	w := tenPicksWell(t)
	doc := layoutOf(t, w, Inputs{WallImages: demoWallImages(t, w)}, Options{})
	if len(doc.Pages) != 1 {
		t.Fatalf("%d pages", len(doc.Pages))
	}
	var img *draw.Image
	traces := map[string]draw.Shape{}
	dips := 0
	doc.Pages[0].Walk(func(it draw.Item) {
		switch v := it.(type) {
		case draw.Image:
			if strings.HasPrefix(v.Role, "wall-image:") {
				img = &v
			}
		case draw.Shape:
			if strings.HasPrefix(v.Role, "feature-trace:") {
				traces[strings.TrimPrefix(v.Role, "feature-trace:")] = v
			}
			if strings.HasPrefix(v.Role, "feature-dip:") {
				dips++
			}
		case draw.Circle:
			if strings.HasPrefix(v.Role, "feature-dip:") {
				dips++
			}
		}
	})
	if img == nil || len(traces) != 10 || dips != 10 {
		t.Fatalf("image %v, %d traces, %d dip marks", img != nil, len(traces), dips)
	}
	wi := w.WallImages[0]
	yOf := func(d schema.Length) float64 {
		return img.Y + float64((d-wi.Top)/(wi.Bottom-wi.Top))*img.H
	}
	for _, f := range w.Features {
		tr, ok := traces[f.Path]
		if !ok {
			t.Fatalf("no trace for %s", f.Path)
		}
		var picks []schema.TracePoint
		if pk := f.Picks; pk.HighLowGiven {
			picks = []schema.TracePoint{{Azimuth: pk.LowAzimuth, Depth: pk.Low}, {Azimuth: schema.NormAzimuth(pk.LowAzimuth + 180), Depth: pk.High}}
		} else {
			picks = pk.Points
		}
		for _, q := range picks {
			x := img.X + wi.ColumnOf(q.Azimuth)*img.W
			y, ok := polylineY(tr.Points, x)
			if !ok {
				t.Errorf("%s: trace does not reach x = %.2f", f.Path, x)
				continue
			}
			if want := yOf(q.Depth); math.Abs(y-want) > 0.05 {
				t.Errorf("%s: at %v° the trace is at y %.3f, the pick at %.3f", f.Path, q.Azimuth, y, want)
			}
		}
	}
}

// polylineY is the polyline's y at x, interpolated.
func polylineY(pts []draw.Point, x float64) (float64, bool) {
	for i := 1; i < len(pts); i++ {
		a, b := pts[i-1], pts[i]
		if (a.X <= x && x <= b.X) || (b.X <= x && x <= a.X) {
			if b.X == a.X {
				return a.Y, true
			}
			return a.Y + (x-a.X)/(b.X-a.X)*(b.Y-a.Y), true
		}
	}
	return 0, false
}
