package crs

import "math"

// ellipsoid is a reference ellipsoid: semi-major axis a (m) and inverse
// flattening.
type ellipsoid struct {
	a, invF float64
}

// Ellipsoids (EPSG 7030, 7019, 7001, 7008).
var (
	wgs84Ellipsoid = ellipsoid{6378137, 298.257223563}
	grs80          = ellipsoid{6378137, 298.257222101}
	airy1830       = ellipsoid{6377563.396, 299.3249646}
	clarke1866     = ellipsoid{6378206.4, 294.978698213898}
)

func (el ellipsoid) f() float64  { return 1 / el.invF }
func (el ellipsoid) e2() float64 { f := el.f(); return f * (2 - f) }
func (el ellipsoid) e() float64  { return math.Sqrt(el.e2()) }

// datum is a geodetic datum: its ellipsoid and, when it is not taken as
// WGS 84, the Helmert transformation to WGS 84.
type datum struct {
	name      string
	ellipsoid ellipsoid
	toWGS     *helmert // nil: the same as WGS 84 (a null transformation)
}

// Datums of the registry.
var (
	wgs84Datum = &datum{name: "WGS 84", ellipsoid: wgs84Ellipsoid}
	// Null transformations to WGS 84 (EPSG 1188 for NAD83, 1149 for
	// ETRS89, 1150 for GDA94, 8450 for GDA2020, 1565 for NZGD2000): about
	// 1 to 2 m.
	nad83    = &datum{name: "NAD83", ellipsoid: grs80}
	etrs89   = &datum{name: "ETRS89", ellipsoid: grs80}
	gda94    = &datum{name: "GDA94", ellipsoid: grs80}
	gda2020  = &datum{name: "GDA2020", ellipsoid: grs80}
	nzgd2000 = &datum{name: "NZGD2000", ellipsoid: grs80}
	// OSGB 1936 to WGS 84 (1), EPSG 1314, position vector, about 2 m; the
	// parameters are those epsg.io gives for EPSG:27700.
	osgb36 = &datum{name: "OSGB 1936", ellipsoid: airy1830,
		toWGS: &helmert{tx: 446.448, ty: -125.157, tz: 542.06, rx: 0.15, ry: 0.247, rz: 0.842, ppm: -20.489}}
)

func (d *datum) toWGS84(lon, lat float64) (float64, float64) {
	if d.toWGS == nil {
		return lon, lat
	}
	x, y, z := geocentric(d.ellipsoid, lon, lat)
	x, y, z = d.toWGS.forward(x, y, z)
	return geodetic(wgs84Ellipsoid, x, y, z)
}

func (d *datum) fromWGS84(lon, lat float64) (float64, float64) {
	if d.toWGS == nil {
		return lon, lat
	}
	x, y, z := geocentric(wgs84Ellipsoid, lon, lat)
	x, y, z = d.toWGS.reverse(x, y, z)
	return geodetic(d.ellipsoid, x, y, z)
}

// helmert is a seven-parameter position-vector transformation (EPSG
// method 9606): translations in m, rotations in arc-seconds, scale in ppm.
type helmert struct {
	tx, ty, tz, rx, ry, rz, ppm float64
}

// forward applies the transformation (EPSG 9606 formula).
func (h *helmert) forward(x, y, z float64) (float64, float64, float64) {
	const arcsec = math.Pi / (180 * 3600)
	rx, ry, rz := h.rx*arcsec, h.ry*arcsec, h.rz*arcsec
	m := 1 + h.ppm*1e-6
	return m*(x-rz*y+ry*z) + h.tx,
		m*(rz*x+y-rx*z) + h.ty,
		m*(-ry*x+rx*y+z) + h.tz
}

// reverse undoes forward exactly: a few fixed-point steps, each closing
// the residual by the rotation's size (about 1e-5), reach 1e-9 m.
func (h *helmert) reverse(x, y, z float64) (float64, float64, float64) {
	sx, sy, sz := x, y, z
	for range 6 {
		fx, fy, fz := h.forward(sx, sy, sz)
		sx, sy, sz = sx+(x-fx), sy+(y-fy), sz+(z-fz)
	}
	return sx, sy, sz
}

// geocentric converts longitude and latitude (degrees, height 0) to
// Earth-centred Cartesian coordinates (IOGP 373-7-2 §4.1.1).
func geocentric(el ellipsoid, lon, lat float64) (x, y, z float64) {
	phi, lam := lat*deg, lon*deg
	e2 := el.e2()
	nu := el.a / math.Sqrt(1-e2*math.Sin(phi)*math.Sin(phi))
	return nu * math.Cos(phi) * math.Cos(lam), nu * math.Cos(phi) * math.Sin(lam), (1 - e2) * nu * math.Sin(phi)
}

// geodetic converts Earth-centred coordinates back to longitude and
// latitude (degrees), dropping the height: Bowring's formula of IOGP
// 373-7-2 §4.1.1 for a start, refined by fixed-point steps so that points
// off the ellipsoid (after a datum shift) come back to 1e-11 degree.
func geodetic(el ellipsoid, x, y, z float64) (lon, lat float64) {
	e2 := el.e2()
	b := el.a * (1 - el.f())
	ep2 := e2 / (1 - e2)
	p := math.Hypot(x, y)
	q := math.Atan2(z*el.a, p*b)
	phi := math.Atan2(z+ep2*b*math.Pow(math.Sin(q), 3), p-e2*el.a*math.Pow(math.Cos(q), 3))
	for range 5 {
		s := math.Sin(phi)
		nu := el.a / math.Sqrt(1-e2*s*s)
		phi = math.Atan2(z+e2*nu*s, p)
	}
	return math.Atan2(y, x) / deg, phi / deg
}
