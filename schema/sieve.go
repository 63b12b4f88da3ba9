package schema

import (
	"fmt"
	"strconv"
	"strings"
)

// sieveOpening is the nominal opening in mm of each numbered US standard
// sieve, ASTM E11 Table 1 (No. 4 to No. 635; the openings follow the
// ISO 565 R 40/3 series, each about 2^(1/4) times the next finer).
var sieveOpening = map[int]float64{
	4: 4.75, 5: 4.00, 6: 3.35, 7: 2.80, 8: 2.36, 10: 2.00, 12: 1.70, 14: 1.40, 16: 1.18, 18: 1.00,
	20: 0.850, 25: 0.710, 30: 0.600, 35: 0.500, 40: 0.425, 45: 0.355, 50: 0.300,
	60: 0.250, 70: 0.212, 80: 0.180, 100: 0.150, 120: 0.125, 140: 0.106, 170: 0.090, 200: 0.075,
	230: 0.063, 270: 0.053, 325: 0.045, 400: 0.038, 450: 0.032, 500: 0.025, 635: 0.020,
}

// SieveOpening returns the opening of a US standard sieve in mm.
func SieveOpening(number int) (Diameter, bool) {
	mm, ok := sieveOpening[number]
	return Diameter(mm), ok
}

// gradationNoise strips what may decorate sieve numbers ("#10", "No. 20");
// built once, a Replacer is safe for concurrent use.
var gradationNoise = strings.NewReplacer("#", "", "No.", "", "no.", "", " ", "")

// ParseGradation reads a sieve range such as "20/40", "#10/#20" or "8x16"
// (passes the coarse sieve, held on the fine one) and returns the finest and
// coarsest grain sizes it stands for.
func ParseGradation(s string) (min, max Diameter, err error) {
	t := gradationNoise.Replace(s)
	var sep string
	for _, c := range []string{"/", "x", "X", "-"} {
		if strings.Contains(t, c) {
			sep = c
			break
		}
	}
	if sep == "" {
		return 0, 0, fmt.Errorf("gradation %q: write a sieve range such as \"20/40\"", s)
	}
	parts := strings.SplitN(t, sep, 2)
	a, err1 := strconv.Atoi(parts[0])
	b, err2 := strconv.Atoi(parts[1])
	if err1 != nil || err2 != nil {
		return 0, 0, fmt.Errorf("gradation %q: write a sieve range such as \"20/40\"", s)
	}
	oa, ok1 := SieveOpening(a)
	ob, ok2 := SieveOpening(b)
	if !ok1 || !ok2 {
		return 0, 0, fmt.Errorf("gradation %q: unknown US sieve number", s)
	}
	if oa < ob {
		oa, ob = ob, oa
	}
	if oa == ob {
		return 0, 0, fmt.Errorf("gradation %q: the two sieves must differ", s)
	}
	return ob, oa, nil
}
