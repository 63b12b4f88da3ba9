package crs

import "math"

// lambertConic2SP is EPSG method 9802, Lambert Conic Conformal with two
// standard parallels, in the exact form of IOGP 373-7-2 §3.2.1.1.
type lambertConic2SP struct {
	el          ellipsoid
	lon0        float64 // longitude of the false origin, degrees
	fe, fn      float64 // metres
	e, n, f, r0 float64 // r0 = rF, the radius at the false origin
}

func newLambertConic2SP(el ellipsoid, lat0, lon0, lat1, lat2, fe, fn float64) *lambertConic2SP {
	l := &lambertConic2SP{el: el, lon0: lon0, fe: fe, fn: fn, e: el.e()}
	m1, m2 := l.m(lat1*deg), l.m(lat2*deg)
	t1, t2 := l.t(lat1*deg), l.t(lat2*deg)
	if lat1 == lat2 {
		l.n = math.Sin(lat1 * deg)
	} else {
		l.n = (math.Log(m1) - math.Log(m2)) / (math.Log(t1) - math.Log(t2))
	}
	l.f = m1 / (l.n * math.Pow(t1, l.n))
	l.r0 = el.a * l.f * math.Pow(l.t(lat0*deg), l.n)
	return l
}

func (l *lambertConic2SP) m(phi float64) float64 {
	s := math.Sin(phi)
	return math.Cos(phi) / math.Sqrt(1-l.e*l.e*s*s)
}

func (l *lambertConic2SP) t(phi float64) float64 {
	s := math.Sin(phi)
	return math.Tan(math.Pi/4-phi/2) / math.Pow((1-l.e*s)/(1+l.e*s), l.e/2)
}

func (l *lambertConic2SP) forward(lon, lat float64) (e, n float64) {
	r := l.el.a * l.f * math.Pow(l.t(lat*deg), l.n)
	theta := l.n * (lon - l.lon0) * deg
	return l.fe + r*math.Sin(theta), l.fn + l.r0 - r*math.Cos(theta)
}

func (l *lambertConic2SP) inverse(e, n float64) (lon, lat float64) {
	de, dn := e-l.fe, l.r0-(n-l.fn)
	r := math.Copysign(math.Hypot(de, dn), l.n)
	tp := math.Pow(r/(l.el.a*l.f), 1/l.n)
	var theta float64
	if l.n > 0 {
		theta = math.Atan2(de, dn)
	} else {
		theta = math.Atan2(-de, -dn)
	}
	phi := math.Pi/2 - 2*math.Atan(tp)
	for range 20 { // converges in 3 or 4 (§3.2.1.1)
		s := math.Sin(phi)
		next := math.Pi/2 - 2*math.Atan(tp*math.Pow((1-l.e*s)/(1+l.e*s), l.e/2))
		if math.Abs(next-phi) < 1e-14 {
			phi = next
			break
		}
		phi = next
	}
	return theta/l.n/deg + l.lon0, phi / deg
}
