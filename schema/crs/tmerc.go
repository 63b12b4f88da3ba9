package crs

import "math"

// transverseMercator is EPSG method 9807 with the JHS series of IOGP
// 373-7-2 §3.5.3.1: better than a millimetre within 4 degrees of the
// central meridian, as UTM and State Plane zones are.
type transverseMercator struct {
	el             ellipsoid
	lat0, lon0, k0 float64 // degrees; scale at the natural origin
	fe, fn         float64 // metres
	b, m0, e       float64
	h, hr          [4]float64 // forward and reverse series coefficients
}

func newTransverseMercator(el ellipsoid, lat0, lon0, k0, fe, fn float64) *transverseMercator {
	t := &transverseMercator{el: el, lat0: lat0, lon0: lon0, k0: k0, fe: fe, fn: fn, e: el.e()}
	f := el.f()
	n := f / (2 - f)
	n2, n3, n4 := n*n, n*n*n, n*n*n*n
	t.b = el.a / (1 + n) * (1 + n2/4 + n4/64)
	t.h = [4]float64{
		n/2 - 2.0/3*n2 + 5.0/16*n3 + 41.0/180*n4,
		13.0/48*n2 - 3.0/5*n3 + 557.0/1440*n4,
		61.0/240*n3 - 103.0/140*n4,
		49561.0 / 161280 * n4,
	}
	t.hr = [4]float64{
		n/2 - 2.0/3*n2 + 37.0/96*n3 - 1.0/360*n4,
		1.0/48*n2 + 1.0/15*n3 - 437.0/1440*n4,
		17.0/480*n3 - 37.0/840*n4,
		4397.0 / 161280 * n4,
	}
	t.m0 = t.meridionalArc(lat0 * deg)
	return t
}

// meridionalArc is M0 of §3.5.3.1: B times ξO at latitude phi.
func (t *transverseMercator) meridionalArc(phi float64) float64 {
	switch {
	case phi == 0:
		return 0
	case phi == math.Pi/2:
		return t.b * math.Pi / 2
	case phi == -math.Pi/2:
		return -t.b * math.Pi / 2
	}
	q := math.Asinh(math.Tan(phi)) - t.e*math.Atanh(t.e*math.Sin(phi))
	beta := math.Atan(math.Sinh(q))
	xi := beta
	for i, h := range t.h {
		xi += h * math.Sin(float64(2*(i+1))*beta)
	}
	return t.b * xi
}

func (t *transverseMercator) forward(lon, lat float64) (e, n float64) {
	phi := lat * deg
	q := math.Asinh(math.Tan(phi)) - t.e*math.Atanh(t.e*math.Sin(phi))
	beta := math.Atan(math.Sinh(q))
	eta0 := math.Atanh(math.Cos(beta) * math.Sin((lon-t.lon0)*deg))
	xi0 := math.Asin(math.Sin(beta) * math.Cosh(eta0))
	xi, eta := xi0, eta0
	for i, h := range t.h {
		k := float64(2 * (i + 1))
		xi += h * math.Sin(k*xi0) * math.Cosh(k*eta0)
		eta += h * math.Cos(k*xi0) * math.Sinh(k*eta0)
	}
	return t.fe + t.k0*t.b*eta, t.fn + t.k0*(t.b*xi-t.m0)
}

func (t *transverseMercator) inverse(e, n float64) (lon, lat float64) {
	etaP := (e - t.fe) / (t.b * t.k0)
	xiP := ((n - t.fn) + t.k0*t.m0) / (t.b * t.k0)
	xi0, eta0 := xiP, etaP
	for i, h := range t.hr {
		k := float64(2 * (i + 1))
		xi0 -= h * math.Sin(k*xiP) * math.Cosh(k*etaP)
		eta0 -= h * math.Cos(k*xiP) * math.Sinh(k*etaP)
	}
	betaP := math.Asin(math.Sin(xi0) / math.Cosh(eta0))
	qP := math.Asinh(math.Tan(betaP))
	qq := qP
	for range 20 { // converges in 4 or 5 (§3.5.3.1)
		next := qP + t.e*math.Atanh(t.e*math.Tanh(qq))
		if math.Abs(next-qq) < 1e-14 {
			qq = next
			break
		}
		qq = next
	}
	lat = math.Atan(math.Sinh(qq)) / deg
	lon = t.lon0 + math.Asin(math.Tanh(eta0)/math.Cos(betaP))/deg
	return lon, lat
}
