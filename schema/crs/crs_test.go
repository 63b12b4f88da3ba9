package crs

import (
	"math"
	"testing"
)

// Tolerances: the IOGP examples print eastings and northings to 0.01 (m or
// US survey ft) and latitudes to 0.001 arc-second (3e-7 degree), so a
// result within half that last digit agrees with them.
const (
	tolLength = 0.005
	tolDegree = 1.5e-7
)

func near(t *testing.T, what string, got, want, tol float64) {
	t.Helper()
	if math.Abs(got-want) > tol {
		t.Errorf("%s = %.9f, want %.9f (±%g)", what, got, want, tol)
	}
}

// IOGP Publication 373-7-2 (Geomatics Guidance Note 7 part 2), §3.5.3.1
// Transverse Mercator example: OSGB 1936 / British National Grid, Airy
// 1830; 50°30'N, 0°30'E. The JHS series values it prints (B, M0, ξ, η to
// ten digits) must come out exactly; its E 577274.99 m and N 69740.50 m
// are printed to the centimetre (we get 577274.984 and 69740.492: within
// 1 cm, the tolerance here), and the reverse gives 50°30'N, 0°30'E back.
func TestTransverseMercatorIOGPExample(t *testing.T) {
	p := newTransverseMercator(airy1830, 49, -2, 0.9996012717, 400000, -100000)
	near(t, "B", p.b, 6366914.609, 0.0005)
	near(t, "M0", p.m0, 5429228.602, 0.0005)
	e, n := p.forward(0.5, 50.5)
	near(t, "η", (e-p.fe)/(p.k0*p.b), 0.0278542603, 5e-11)
	near(t, "ξ", ((n-p.fn)/p.k0+p.m0)/p.b, 0.8793956171, 5e-11)
	near(t, "E", e, 577274.99, 0.01)
	near(t, "N", n, 69740.50, 0.01)
	lon, lat := p.inverse(577274.99, 69740.50)
	near(t, "lon", lon, 0.5, tolDegree)
	near(t, "lat", lat, 50.5, tolDegree)
}

// Ordnance Survey, "A guide to coordinate systems in Great Britain",
// worked example of the National Grid projection (from memory, and it
// agrees to the millimetre): OSGB36 52°39'27.2531"N, 1°43'4.5177"E is
// E 651409.903 m, N 313177.270 m.
func TestBritishNationalGridOSExample(t *testing.T) {
	c, _ := Lookup(27700)
	p := c.proj.(*transverseMercator)
	e, n := p.forward(1+43.0/60+4.5177/3600, 52+39.0/60+27.2531/3600)
	near(t, "E", e, 651409.903, 0.001)
	near(t, "N", n, 313177.270, 0.001)
}

// IOGP 373-7-2 §3.2.1.1 Lambert Conic Conformal (2SP) example: NAD27 /
// Texas South Central, Clarke 1866; 28°30'N, 96°00'W gives
// E 2963503.91 ftUS, N 254759.80 ftUS, and back.
func TestLambertConic2SPIOGPExample(t *testing.T) {
	ft := USSurveyFoot.Metres
	p := newLambertConic2SP(clarke1866, 27+50.0/60, -99, 28+23.0/60, 30+17.0/60, 2000000*ft, 0)
	e, n := p.forward(-96, 28.5)
	near(t, "E (ftUS)", e/ft, 2963503.91, tolLength)
	near(t, "N (ftUS)", n/ft, 254759.80, tolLength)
	lon, lat := p.inverse(2963503.91*ft, 254759.80*ft)
	near(t, "lon", lon, -96, tolDegree)
	near(t, "lat", lat, 28.5, tolDegree)
}

// IOGP 373-7-2 §4.4.3 Position Vector transformation example (WGS 72 to
// WGS 84): tZ = +4.5 m, rZ = +0.554", dS = +0.219 ppm take X 3657660.66,
// Y 255768.55, Z 5201382.11 to 3657660.78, 255778.43, 5201387.75 (printed
// to the centimetre). The reverse returns the start.
func TestHelmertIOGPExample(t *testing.T) {
	h := &helmert{tz: 4.5, rz: 0.554, ppm: 0.219}
	x, y, z := h.forward(3657660.66, 255768.55, 5201382.11)
	near(t, "X", x, 3657660.78, 0.01)
	near(t, "Y", y, 255778.43, 0.01)
	near(t, "Z", z, 5201387.75, 0.01)
	x, y, z = h.reverse(x, y, z)
	near(t, "X back", x, 3657660.66, 1e-6)
	near(t, "Y back", y, 255768.55, 1e-6)
	near(t, "Z back", z, 5201382.11, 1e-6)
}

// EPSG defines NAD83 / California zone 3 (ftUS), EPSG:2227, with its false
// origin at 36°30'N, 120°30'W and false easting and northing of
// 6561666.667 and 1640416.667 US survey feet (2000000 and 500000 m): the
// origin must come back there, in feet, and the metre zone EPSG:26943
// must agree with it to the conversion.
func TestStatePlaneFeetAndMetres(t *testing.T) {
	ft, err := Parse("EPSG:2227")
	if err != nil {
		t.Fatal(err)
	}
	if ft.Unit != USSurveyFoot {
		t.Fatalf("EPSG:2227 unit = %v", ft.Unit)
	}
	e, n, err := ft.FromLonLat(-120.5, 36.5)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "FE (ftUS)", e, 6561666.667, 0.001)
	near(t, "FN (ftUS)", n, 1640416.667, 0.001)
	m, _ := Parse("EPSG:26943")
	em, nm, _ := m.FromLonLat(-121.9, 37.7)
	ef, nf, _ := ft.FromLonLat(-121.9, 37.7)
	near(t, "E ft vs m", ef*USSurveyFoot.Metres, em, 1e-6)
	near(t, "N ft vs m", nf*USSurveyFoot.Metres, nm, 1e-6)
	// Arizona chose the international foot (EPSG:2222 "(ft)").
	az, _ := Parse("EPSG:2222")
	if az.Unit != Foot {
		t.Errorf("EPSG:2222 unit = %v, want the international foot", az.Unit)
	}
}

// Every system converts a point inside its zone there and back to within
// 1e-7 degree (1 cm; a datum shift drops the ellipsoidal height on the
// way, which costs about a millimetre): no zone breaks its inverse.
func TestEverySystemRoundTrips(t *testing.T) {
	for _, code := range Codes() {
		c, _ := Lookup(code)
		var lon, lat float64
		switch p := c.proj.(type) {
		case nil:
			lon, lat = 10, 45
		case *transverseMercator:
			lon, lat = p.lon0+0.7, math.Max(p.lat0, -60)+1.3
			if p.fn == 10000000 {
				lat = -30
			}
		case *lambertConic2SP:
			lon, lat = p.lon0+0.9, 0
			// a latitude between the standard parallels
			lat = latBetween(p)
		}
		lon, lat = c.datum.toWGS84(lon, lat)
		x, y, err := c.FromLonLat(lon, lat)
		if err != nil {
			t.Errorf("%s: %v", c, err)
			continue
		}
		lon2, lat2, err := c.ToLonLat(x, y)
		if err != nil {
			t.Errorf("%s: %v", c, err)
			continue
		}
		if math.Abs(lon2-lon) > 1e-7 || math.Abs(lat2-lat) > 1e-7 {
			t.Errorf("%s: %v,%v -> %v,%v -> %v,%v", c, lon, lat, x, y, lon2, lat2)
		}
	}
}

// latBetween finds the latitude where a Lambert zone's radius is its
// radius at the false origin less 100 km: inside the zone.
func latBetween(p *lambertConic2SP) float64 {
	_, lat := p.inverse(p.fe, p.fn+100000)
	return lat
}

func TestParse(t *testing.T) {
	for _, s := range []string{"EPSG:2227", "epsg:2227", " EPSG : 2227 "} {
		if c, err := Parse(s); err != nil || c.Code != 2227 {
			t.Errorf("Parse(%q) = %v, %v", s, c, err)
		}
	}
	for _, s := range []string{"2227", "NAD83 / California zone 3", "EPSG:", "EPSG:abc", "EPSG:-4", "EPSG:99999999", "ESRI:102643"} {
		if _, err := Parse(s); err == nil {
			t.Errorf("Parse(%q) accepted", s)
		}
	}
	if !IsEPSG("EPSG:1") || IsEPSG("State plane, ft") {
		t.Error("IsEPSG")
	}
}

func TestBadCoordinates(t *testing.T) {
	c, _ := Parse("EPSG:2227")
	for _, xy := range [][2]float64{{math.NaN(), 0}, {math.Inf(1), 0}, {1e300, 1e300}} {
		if _, _, err := c.ToLonLat(xy[0], xy[1]); err == nil {
			t.Errorf("ToLonLat(%v) accepted", xy)
		}
	}
}

// Snyder, Map Projections: A Working Manual (USGS Professional Paper 1395,
// 1987), Transverse Mercator worked example on the Clarke 1866 ellipsoid
// (from memory): 40°30'N, 73°30'W with the central meridian at 75°W and
// k0 = 0.9996 (UTM zone 18 without its false easting) is x = 127106.5 m,
// y = 4484124.4 m, printed to 0.1 m.
func TestTransverseMercatorSnyderExample(t *testing.T) {
	p := newTransverseMercator(clarke1866, 0, -75, 0.9996, 0, 0)
	x, y := p.forward(-73.5, 40.5)
	near(t, "x", x, 127106.5, 0.05)
	near(t, "y", y, 4484124.4, 0.05)
}

// A published State Plane pair through NGS's NCAT: a section corner in
// South Dakota North at N 735056.25 ftUS, E 1002231.06 ftUS (NAD 83(2011),
// the same projection as EPSG:32134 in US survey feet) is UTM zone 13
// N 5071141.376 m, E 594138.761 m (J. Mahun, Coordinate Systems self
// study, question 1). Through longitude and latitude both ways: 1 cm.
func TestStatePlaneToUTMPublishedPair(t *testing.T) {
	sd, _ := Lookup(32134)
	utm, _ := Lookup(26913)
	ft := USSurveyFoot.Metres
	lon, lat, err := sd.ToLonLat(1002231.06*ft, 735056.25*ft)
	if err != nil {
		t.Fatal(err)
	}
	e, n, err := utm.FromLonLat(lon, lat)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "UTM E", e, 594138.761, 0.01)
	near(t, "UTM N", n, 5071141.376, 0.01)
}
