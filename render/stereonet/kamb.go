package stereonet

import "math"

// Kamb's method (W. B. Kamb, 1959, "Ice petrofabric observations from
// Blue Glacier, Washington, in relation to theory and experiment",
// J. Geophys. Res. 64, 1891–1909): count the poles within a cone about
// each point of the net, the cone chosen so that for n poles spread
// uniformly the expected count E is three standard deviations σ of the
// count: the cone takes the fraction A = k² / (n + k²) of the hemisphere,
// k = 3, E = nA and σ = √(nA(1 − A)). Contours are drawn at 2σ steps
// above E, so each marks a concentration unlikely under uniform chance.

// Smoothed counts weigh each pole by exp(f·(|cos θ| − 1)), f = 2(1 + n/k²),
// θ its angle from the counting point, instead of counting it 1 inside
// the cone and 0 outside (F. W. Vollmer, 1995, "C program for automatic
// contouring of spherical orientation data using a modified Kamb
// method", Computers & Geosciences 21, 31–49): the same E = 3σ with
// E = n/f and σ = √(n(f/2 − 1))/f, and contours without the steps of
// whole counts.

// KambK is the number of standard deviations E is made to equal.
const KambK = 3

// MinKambPoles is the fewest poles contoured: below it a counting cone
// covers most of the net and the contours say nothing (our choice).
const MinKambPoles = 10

// Density is a Kamb count over a square grid covering the net.
type Density struct {
	N        int
	Area     float64 // A: the cone's fraction of the hemisphere
	CosCone  float64 // cosine of the cone's half-angle
	Expected float64 // E = nA (n/f smoothed)
	Sigma    float64 // σ
	Smoothed bool
	Cells    int // grid cells per side; nodes are Cells+1
	// Count at node (i, j), x = -1 + 2i/Cells east, y = -1 + 2j/Cells
	// north; nodes outside the net take the count at the primitive.
	Count [][]float64
}

// Kamb counts poles over a grid of cells × cells; smoothed selects
// Vollmer's exponential weights.
func Kamb(poles []Axis, cells int, smoothed bool) *Density {
	n := len(poles)
	d := &Density{N: n, Cells: cells, Smoothed: smoothed}
	if n == 0 || cells < 2 {
		return d
	}
	k2 := float64(KambK * KambK)
	d.Area = k2 / (float64(n) + k2)
	d.CosCone = 1 - d.Area // a cap of half-angle θ is (1 − cos θ) of the hemisphere
	d.Expected = float64(n) * d.Area
	d.Sigma = math.Sqrt(float64(n) * d.Area * (1 - d.Area))
	f := 2 * (1 + float64(n)/k2)
	if smoothed {
		d.Expected = float64(n) / f
		d.Sigma = math.Sqrt(float64(n)*(f/2-1)) / f
	}
	units := make([][3]float64, n)
	for i, p := range poles {
		units[i] = p.unit()
	}
	d.Count = make([][]float64, cells+1)
	for i := range d.Count {
		d.Count[i] = make([]float64, cells+1)
		for j := range d.Count[i] {
			x, y := -1+2*float64(i)/float64(cells), -1+2*float64(j)/float64(cells)
			if r := math.Hypot(x, y); r > 1 {
				x, y = x/r, y/r
			}
			g := Inverse(x, y).unit()
			c := 0.0
			for _, u := range units {
				// Axes: a pole and its antipode are one line.
				cos := math.Abs(u[0]*g[0] + u[1]*g[1] + u[2]*g[2])
				switch {
				case smoothed:
					c += math.Exp(f * (cos - 1))
				case cos >= d.CosCone:
					c++
				}
			}
			d.Count[i][j] = c
		}
	}
	return d
}

// Levels are the counts of the contours: E + 2σ, E + 4σ, ... up to the
// highest count.
func (d *Density) Levels() []float64 {
	if d.Sigma == 0 {
		return nil
	}
	hi := 0.0
	for _, col := range d.Count {
		for _, c := range col {
			hi = max(hi, c)
		}
	}
	var out []float64
	for s := 2.0; d.Expected+s*d.Sigma < hi && len(out) < 10; s += 2 {
		out = append(out, d.Expected+s*d.Sigma)
	}
	return out
}

// Segment is a piece of a contour in net coordinates (radius 1).
type Segment struct{ X0, Y0, X1, Y1 float64 }

// Contour traces a level over the grid by marching squares, keeping the
// pieces inside the net.
func (d *Density) Contour(level float64) []Segment {
	var out []Segment
	at := func(i, j int) (x, y float64) {
		return -1 + 2*float64(i)/float64(d.Cells), -1 + 2*float64(j)/float64(d.Cells)
	}
	for i := 0; i < d.Cells; i++ {
		for j := 0; j < d.Cells; j++ {
			// Corners counter-clockwise from the south-west.
			ci := [4][2]int{{i, j}, {i + 1, j}, {i + 1, j + 1}, {i, j + 1}}
			var v [4]float64
			var px, py [4]float64
			for k, c := range ci {
				v[k] = d.Count[c[0]][c[1]] - level
				px[k], py[k] = at(c[0], c[1])
			}
			// Where the level crosses each edge.
			var cx, cy []float64
			for k := range 4 {
				a, b := k, (k+1)%4
				if (v[a] >= 0) != (v[b] >= 0) {
					t := v[a] / (v[a] - v[b])
					cx = append(cx, px[a]+t*(px[b]-px[a]))
					cy = append(cy, py[a]+t*(py[b]-py[a]))
				}
			}
			for k := 0; k+1 < len(cx); k += 2 {
				s := Segment{cx[k], cy[k], cx[k+1], cy[k+1]}
				if math.Hypot((s.X0+s.X1)/2, (s.Y0+s.Y1)/2) <= 1 {
					out = append(out, s)
				}
			}
		}
	}
	return out
}
