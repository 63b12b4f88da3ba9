package stereonet

import "math"

// RoseBins counts directions (azimuths, degrees) in bins of width
// degrees starting at north: bin i holds [i·width, (i+1)·width).
func RoseBins(dirs []float64, width float64) []int {
	n := int(math.Round(360 / width))
	if n < 1 {
		n = 1
	}
	out := make([]int, n)
	for _, d := range dirs {
		d = math.Mod(d, 360)
		if d < 0 {
			d += 360
		}
		i := min(int(d/width), n-1)
		out[i]++
	}
	return out
}
