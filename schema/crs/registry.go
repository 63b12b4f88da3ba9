package crs

import (
	"fmt"
	"slices"
	"sync"
)

// The registry: every system tremie converts, by EPSG code. Parameters
// are those of the EPSG Geodetic Parameter Dataset (latitudes and
// longitudes in decimal degrees, false eastings and northings in metres
// even for a system in feet, as EPSG defines the State Plane zones). State
// Plane scale factors are written exactly, as 1 - 1/N: the NGS defines
// each SPCS 83 zone's scale that way (e.g. Arizona West 1 - 1/15000 =
// 0.999933333).

// Lookup returns the system with an EPSG code.
func Lookup(code int) (*CRS, bool) {
	registryOnce.Do(buildRegistry)
	c, ok := registry[code]
	return c, ok
}

// Codes lists every code Lookup knows, in increasing order.
func Codes() []int {
	registryOnce.Do(buildRegistry)
	return codes
}

var (
	registryOnce sync.Once
	registry     map[int]*CRS
	codes        []int
)

func k(n float64) float64 { return 1 - 1/n }

// tm and lc describe a projection before its ellipsoid is known.
type projSpec func(ellipsoid) projection

func tm(lat0, lon0, k0, fe, fn float64) projSpec {
	return func(el ellipsoid) projection { return newTransverseMercator(el, lat0, lon0, k0, fe, fn) }
}

func lc(lat0, lon0, lat1, lat2, fe, fn float64) projSpec {
	return func(el ellipsoid) projection { return newLambertConic2SP(el, lat0, lon0, lat1, lat2, fe, fn) }
}

// spcsZone is one NAD83 State Plane zone: its metre code and, where the
// state adopted feet, the code in US survey feet (ftUS) or international
// feet (ft).
type spcsZone struct {
	metre    int
	feet     int
	feetUnit Unit
	name     string
	proj     projSpec
}

var us, intl = USSurveyFoot, Foot

// stateZones are the NAD83 State Plane zones (Alaska zone 1, an oblique
// Mercator, is left out).
var stateZones = []spcsZone{
	{26929, 0, us, "Alabama East", tm(30.5, -85.83333333333333, k(25000), 200000, 0)},
	{26930, 0, us, "Alabama West", tm(30, -87.5, k(15000), 600000, 0)},
	{26932, 0, us, "Alaska zone 2", tm(54, -142, k(10000), 500000, 0)},
	{26933, 0, us, "Alaska zone 3", tm(54, -146, k(10000), 500000, 0)},
	{26934, 0, us, "Alaska zone 4", tm(54, -150, k(10000), 500000, 0)},
	{26935, 0, us, "Alaska zone 5", tm(54, -154, k(10000), 500000, 0)},
	{26936, 0, us, "Alaska zone 6", tm(54, -158, k(10000), 500000, 0)},
	{26937, 0, us, "Alaska zone 7", tm(54, -162, k(10000), 500000, 0)},
	{26938, 0, us, "Alaska zone 8", tm(54, -166, k(10000), 500000, 0)},
	{26939, 0, us, "Alaska zone 9", tm(54, -170, k(10000), 500000, 0)},
	{26940, 0, us, "Alaska zone 10", lc(51, -176, 53.83333333333334, 51.83333333333334, 1000000, 0)},
	{26941, 2225, us, "California zone 1", lc(39.33333333333334, -122, 41.66666666666666, 40, 2000000, 500000)},
	{26942, 2226, us, "California zone 2", lc(37.66666666666666, -122, 39.83333333333334, 38.33333333333334, 2000000, 500000)},
	{26943, 2227, us, "California zone 3", lc(36.5, -120.5, 38.43333333333333, 37.06666666666667, 2000000, 500000)},
	{26944, 2228, us, "California zone 4", lc(35.33333333333334, -119, 37.25, 36, 2000000, 500000)},
	{26945, 2229, us, "California zone 5", lc(33.5, -118, 35.46666666666667, 34.03333333333333, 2000000, 500000)},
	{26946, 2230, us, "California zone 6", lc(32.16666666666666, -116.25, 33.88333333333333, 32.78333333333333, 2000000, 500000)},
	{26948, 2222, intl, "Arizona East", tm(31, -110.1666666666667, k(10000), 213360, 0)},
	{26949, 2223, intl, "Arizona Central", tm(31, -111.9166666666667, k(10000), 213360, 0)},
	{26950, 2224, intl, "Arizona West", tm(31, -113.75, k(15000), 213360, 0)},
	{26951, 0, us, "Arkansas North", lc(34.33333333333334, -92, 36.23333333333333, 34.93333333333333, 400000, 0)},
	{26952, 0, us, "Arkansas South", lc(32.66666666666666, -92, 34.76666666666667, 33.3, 400000, 400000)},
	{26953, 2231, us, "Colorado North", lc(39.33333333333334, -105.5, 40.78333333333333, 39.71666666666667, 914401.8289, 304800.6096)},
	{26954, 2232, us, "Colorado Central", lc(37.83333333333334, -105.5, 39.75, 38.45, 914401.8289, 304800.6096)},
	{26955, 2233, us, "Colorado South", lc(36.66666666666666, -105.5, 38.43333333333333, 37.23333333333333, 914401.8289, 304800.6096)},
	{26956, 2234, us, "Connecticut", lc(40.83333333333334, -72.75, 41.86666666666667, 41.2, 304800.6096, 152400.3048)},
	{26957, 2235, us, "Delaware", tm(38, -75.41666666666667, k(200000), 200000, 0)},
	{26958, 2236, us, "Florida East", tm(24.33333333333333, -81, k(17000), 200000, 0)},
	{26959, 2237, us, "Florida West", tm(24.33333333333333, -82, k(17000), 200000, 0)},
	{26960, 2238, us, "Florida North", lc(29, -84.5, 30.75, 29.58333333333333, 600000, 0)},
	{26961, 0, us, "Hawaii zone 1", tm(18.83333333333333, -155.5, k(30000), 500000, 0)},
	{26962, 0, us, "Hawaii zone 2", tm(20.33333333333333, -156.6666666666667, k(30000), 500000, 0)},
	{26963, 0, us, "Hawaii zone 3", tm(21.16666666666667, -158, k(100000), 500000, 0)},
	{26964, 0, us, "Hawaii zone 4", tm(21.83333333333333, -159.5, k(100000), 500000, 0)},
	{26965, 0, us, "Hawaii zone 5", tm(21.66666666666667, -160.1666666666667, 1, 500000, 0)},
	{26966, 2239, us, "Georgia East", tm(30, -82.16666666666667, k(10000), 200000, 0)},
	{26967, 2240, us, "Georgia West", tm(30, -84.16666666666667, k(10000), 700000, 0)},
	{26968, 2241, us, "Idaho East", tm(41.66666666666666, -112.1666666666667, k(19000), 200000, 0)},
	{26969, 2242, us, "Idaho Central", tm(41.66666666666666, -114, k(19000), 500000, 0)},
	{26970, 2243, us, "Idaho West", tm(41.66666666666666, -115.75, k(15000), 800000, 0)},
	{26971, 0, us, "Illinois East", tm(36.66666666666666, -88.33333333333333, k(40000), 300000, 0)},
	{26972, 0, us, "Illinois West", tm(36.66666666666666, -90.16666666666667, k(17000), 700000, 0)},
	{26973, 0, us, "Indiana East", tm(37.5, -85.66666666666667, k(30000), 100000, 250000)},
	{26974, 0, us, "Indiana West", tm(37.5, -87.08333333333333, k(30000), 900000, 250000)},
	{26975, 0, us, "Iowa North", lc(41.5, -93.5, 43.26666666666667, 42.06666666666667, 1500000, 1000000)},
	{26976, 0, us, "Iowa South", lc(40, -93.5, 41.78333333333333, 40.61666666666667, 500000, 0)},
	{26977, 0, us, "Kansas North", lc(38.33333333333334, -98, 39.78333333333333, 38.71666666666667, 400000, 0)},
	{26978, 0, us, "Kansas South", lc(36.66666666666666, -98.5, 38.56666666666667, 37.26666666666667, 400000, 400000)},
	{2205, 2246, us, "Kentucky North", lc(37.5, -84.25, 37.96666666666667, 38.96666666666667, 500000, 0)},
	{26980, 2247, us, "Kentucky South", lc(36.33333333333334, -85.75, 37.93333333333333, 36.73333333333333, 500000, 500000)},
	{26981, 0, us, "Louisiana North", lc(30.5, -92.5, 32.66666666666666, 31.16666666666667, 1000000, 0)},
	{26982, 0, us, "Louisiana South", lc(28.5, -91.33333333333333, 30.7, 29.3, 1000000, 0)},
	{26983, 0, us, "Maine East", tm(43.66666666666666, -68.5, k(10000), 300000, 0)},
	{26984, 0, us, "Maine West", tm(42.83333333333334, -70.16666666666667, k(30000), 900000, 0)},
	{26985, 2248, us, "Maryland", lc(37.66666666666666, -77, 39.45, 38.3, 400000, 0)},
	{26986, 2249, us, "Massachusetts Mainland", lc(41, -71.5, 42.68333333333333, 41.71666666666667, 200000, 750000)},
	{26987, 2250, us, "Massachusetts Island", lc(41, -70.5, 41.48333333333333, 41.28333333333333, 500000, 0)},
	{26988, 2251, intl, "Michigan North", lc(44.78333333333333, -87, 47.08333333333334, 45.48333333333333, 8000000, 0)},
	{26989, 2252, intl, "Michigan Central", lc(43.31666666666667, -84.36666666666666, 45.7, 44.18333333333333, 6000000, 0)},
	{26990, 2253, intl, "Michigan South", lc(41.5, -84.36666666666666, 43.66666666666666, 42.1, 4000000, 0)},
	{26991, 0, us, "Minnesota North", lc(46.5, -93.1, 48.63333333333333, 47.03333333333333, 800000, 100000)},
	{26992, 0, us, "Minnesota Central", lc(45, -94.25, 47.05, 45.61666666666667, 800000, 100000)},
	{26993, 0, us, "Minnesota South", lc(43, -94, 45.21666666666667, 43.78333333333333, 800000, 100000)},
	{26994, 2254, us, "Mississippi East", tm(29.5, -88.83333333333333, k(20000), 300000, 0)},
	{26995, 2255, us, "Mississippi West", tm(29.5, -90.33333333333333, k(20000), 700000, 0)},
	{26996, 0, us, "Missouri East", tm(35.83333333333334, -90.5, k(15000), 250000, 0)},
	{26997, 0, us, "Missouri Central", tm(35.83333333333334, -92.5, k(15000), 500000, 0)},
	{26998, 0, us, "Missouri West", tm(36.16666666666666, -94.5, k(17000), 850000, 0)},
	{32100, 2256, intl, "Montana", lc(44.25, -109.5, 49, 45, 600000, 0)},
	{32104, 0, us, "Nebraska", lc(39.83333333333334, -100, 43, 40, 500000, 0)},
	{32107, 0, us, "Nevada East", tm(34.75, -115.5833333333333, k(10000), 200000, 8000000)},
	{32108, 0, us, "Nevada Central", tm(34.75, -116.6666666666667, k(10000), 500000, 6000000)},
	{32109, 0, us, "Nevada West", tm(34.75, -118.5833333333333, k(10000), 800000, 4000000)},
	{32110, 0, us, "New Hampshire", tm(42.5, -71.66666666666667, k(30000), 300000, 0)},
	{32111, 0, us, "New Jersey", tm(38.83333333333334, -74.5, k(10000), 150000, 0)},
	{32112, 2257, us, "New Mexico East", tm(31, -104.3333333333333, k(11000), 165000, 0)},
	{32113, 2258, us, "New Mexico Central", tm(31, -106.25, k(10000), 500000, 0)},
	{32114, 2259, us, "New Mexico West", tm(31, -107.8333333333333, k(12000), 830000, 0)},
	{32115, 2260, us, "New York East", tm(38.83333333333334, -74.5, k(10000), 150000, 0)},
	{32116, 2261, us, "New York Central", tm(40, -76.58333333333333, k(16000), 250000, 0)},
	{32117, 2262, us, "New York West", tm(40, -78.58333333333333, k(16000), 350000, 0)},
	{32118, 2263, us, "New York Long Island", lc(40.16666666666666, -74, 41.03333333333333, 40.66666666666666, 300000, 0)},
	{32119, 2264, us, "North Carolina", lc(33.75, -79, 36.16666666666666, 34.33333333333334, 609601.22, 0)},
	{32120, 2265, intl, "North Dakota North", lc(47, -100.5, 48.73333333333333, 47.43333333333333, 600000, 0)},
	{32121, 2266, intl, "North Dakota South", lc(45.66666666666666, -100.5, 47.48333333333333, 46.18333333333333, 600000, 0)},
	{32122, 0, us, "Ohio North", lc(39.66666666666666, -82.5, 41.7, 40.43333333333333, 600000, 0)},
	{32123, 0, us, "Ohio South", lc(38, -82.5, 40.03333333333333, 38.73333333333333, 600000, 0)},
	{32124, 2267, us, "Oklahoma North", lc(35, -98, 36.76666666666667, 35.56666666666667, 600000, 0)},
	{32125, 2268, us, "Oklahoma South", lc(33.33333333333334, -98, 35.23333333333333, 33.93333333333333, 600000, 0)},
	{32126, 2269, intl, "Oregon North", lc(43.66666666666666, -120.5, 46, 44.33333333333334, 2500000, 0)},
	{32127, 2270, intl, "Oregon South", lc(41.66666666666666, -120.5, 44, 42.33333333333334, 1500000, 0)},
	{32128, 2271, us, "Pennsylvania North", lc(40.16666666666666, -77.75, 41.95, 40.88333333333333, 600000, 0)},
	{32129, 2272, us, "Pennsylvania South", lc(39.33333333333334, -77.75, 40.96666666666667, 39.93333333333333, 600000, 0)},
	{32130, 0, us, "Rhode Island", tm(41.08333333333334, -71.5, k(160000), 100000, 0)},
	{32133, 2273, intl, "South Carolina", lc(31.83333333333333, -81, 34.83333333333334, 32.5, 609600, 0)},
	{32134, 0, us, "South Dakota North", lc(43.83333333333334, -100, 45.68333333333333, 44.41666666666666, 600000, 0)},
	{32135, 0, us, "South Dakota South", lc(42.33333333333334, -100.3333333333333, 44.4, 42.83333333333334, 600000, 0)},
	{32136, 2274, us, "Tennessee", lc(34.33333333333334, -86, 36.41666666666666, 35.25, 600000, 0)},
	{32137, 2275, us, "Texas North", lc(34, -101.5, 36.18333333333333, 34.65, 200000, 1000000)},
	{32138, 2276, us, "Texas North Central", lc(31.66666666666667, -98.5, 33.96666666666667, 32.13333333333333, 600000, 2000000)},
	{32139, 2277, us, "Texas Central", lc(29.66666666666667, -100.3333333333333, 31.88333333333333, 30.11666666666667, 700000, 3000000)},
	{32140, 2278, us, "Texas South Central", lc(27.83333333333333, -99, 30.28333333333333, 28.38333333333333, 600000, 4000000)},
	{32141, 2279, us, "Texas South", lc(25.66666666666667, -98.5, 27.83333333333333, 26.16666666666667, 300000, 5000000)},
	{32142, 2280, intl, "Utah North", lc(40.33333333333334, -111.5, 41.78333333333333, 40.71666666666667, 500000, 1000000)},
	{32143, 2281, intl, "Utah Central", lc(38.33333333333334, -111.5, 40.65, 39.01666666666667, 500000, 2000000)},
	{32144, 2282, intl, "Utah South", lc(36.66666666666666, -111.5, 38.35, 37.21666666666667, 500000, 3000000)},
	{32145, 0, us, "Vermont", tm(42.5, -72.5, k(28000), 500000, 0)},
	{32146, 2283, us, "Virginia North", lc(37.66666666666666, -78.5, 39.2, 38.03333333333333, 3500000, 2000000)},
	{32147, 2284, us, "Virginia South", lc(36.33333333333334, -78.5, 37.96666666666667, 36.76666666666667, 3500000, 1000000)},
	{32148, 2285, us, "Washington North", lc(47, -120.8333333333333, 48.73333333333333, 47.5, 500000, 0)},
	{32149, 2286, us, "Washington South", lc(45.33333333333334, -120.5, 47.33333333333334, 45.83333333333334, 500000, 0)},
	{32150, 0, us, "West Virginia North", lc(38.5, -79.5, 40.25, 39, 600000, 0)},
	{32151, 0, us, "West Virginia South", lc(37, -81, 38.88333333333333, 37.48333333333333, 600000, 0)},
	{32152, 2287, us, "Wisconsin North", lc(45.16666666666666, -90, 46.76666666666667, 45.56666666666667, 600000, 0)},
	{32153, 2288, us, "Wisconsin Central", lc(43.83333333333334, -90, 45.5, 44.25, 600000, 0)},
	{32154, 2289, us, "Wisconsin South", lc(42, -90, 44.06666666666667, 42.73333333333333, 600000, 0)},
	{32155, 0, us, "Wyoming East", tm(40.5, -105.1666666666667, k(16000), 200000, 0)},
	{32156, 0, us, "Wyoming East Central", tm(40.5, -107.3333333333333, k(16000), 400000, 100000)},
	{32157, 0, us, "Wyoming West Central", tm(40.5, -108.75, k(16000), 600000, 0)},
	{32158, 0, us, "Wyoming West", tm(40.5, -110.0833333333333, k(16000), 800000, 100000)},
	{32161, 0, us, "Puerto Rico & Virgin Is.", lc(17.83333333333333, -66.43333333333334, 18.43333333333333, 18.03333333333333, 200000, 200000)},
}

// nationalGrids are projected systems other than UTM and State Plane.
var nationalGrids = []struct {
	code  int
	name  string
	datum *datum
	proj  projSpec
}{
	{27700, "OSGB 1936 / British National Grid", osgb36, tm(49, -2, 0.9996012717, 400000, -100000)},
	{2154, "RGF93 / Lambert-93", etrs89, lc(46.5, 3, 49, 44, 700000, 6600000)},
	{2157, "IRENET95 / Irish Transverse Mercator", etrs89, tm(53.5, -8, 0.99982, 600000, 750000)},
	{2180, "ETRS89 / Poland CS92", etrs89, tm(0, 19, 0.9993, 500000, -5300000)},
	{3006, "SWEREF99 TM", etrs89, tm(0, 15, 0.9996, 500000, 0)},
	{3067, "ETRS89 / TM35FIN(E,N)", etrs89, tm(0, 27, 0.9996, 500000, 0)},
	{2193, "NZGD2000 / New Zealand Transverse Mercator 2000", nzgd2000, tm(0, 173, 0.9996, 1600000, 10000000)},
}

func utm(zone int, south bool) projSpec {
	fn := 0.0
	if south {
		fn = 10000000
	}
	return tm(0, float64(6*zone-183), 0.9996, 500000, fn)
}

func buildRegistry() {
	registry = map[int]*CRS{}
	add := func(code int, name string, d *datum, unit Unit, p projSpec) {
		if _, dup := registry[code]; dup {
			panic(fmt.Sprintf("crs: EPSG:%d registered twice", code))
		}
		c := &CRS{Code: code, Name: name, Unit: unit, datum: d}
		if p != nil {
			c.proj = p(d.ellipsoid)
		}
		registry[code] = c
	}
	for _, g := range []struct {
		code int
		d    *datum
	}{{4326, wgs84Datum}, {4269, nad83}, {4258, etrs89}, {4283, gda94}, {7844, gda2020}, {4167, nzgd2000}, {4277, osgb36}} {
		add(g.code, g.d.name, g.d, Degree, nil)
	}
	for z := 1; z <= 60; z++ {
		add(32600+z, fmt.Sprintf("WGS 84 / UTM zone %dN", z), wgs84Datum, Metre, utm(z, false))
		add(32700+z, fmt.Sprintf("WGS 84 / UTM zone %dS", z), wgs84Datum, Metre, utm(z, true))
	}
	for z := 1; z <= 23; z++ {
		add(26900+z, fmt.Sprintf("NAD83 / UTM zone %dN", z), nad83, Metre, utm(z, false))
	}
	for z := 28; z <= 38; z++ {
		add(25800+z, fmt.Sprintf("ETRS89 / UTM zone %dN", z), etrs89, Metre, utm(z, false))
	}
	for z := 48; z <= 58; z++ {
		add(28300+z, fmt.Sprintf("GDA94 / MGA zone %d", z), gda94, Metre, utm(z, true))
	}
	for z := 46; z <= 59; z++ {
		add(7800+z, fmt.Sprintf("GDA2020 / MGA zone %d", z), gda2020, Metre, utm(z, true))
	}
	for _, z := range stateZones {
		add(z.metre, "NAD83 / "+z.name, nad83, Metre, z.proj)
		if z.feet != 0 {
			suffix := " (ftUS)"
			if z.feetUnit == Foot {
				suffix = " (ft)"
			}
			add(z.feet, "NAD83 / "+z.name+suffix, nad83, z.feetUnit, z.proj)
		}
	}
	for _, g := range nationalGrids {
		add(g.code, g.name, g.datum, Metre, g.proj)
	}
	for c := range registry {
		codes = append(codes, c)
	}
	slices.Sort(codes)
}
