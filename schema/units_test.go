package schema

import "testing"

// NIST SP 811 appendix B and NIST Handbook 44 appendix C, exact
// definitions: 1 lb = 0.45359237 kg; 1 US gal = 3.785411784 L; 1 L =
// 0.001 m3; 1 ft3 = 1728 in3 = 28.316846592 L. A 94-lb sack of cement is
// 42.63768278 kg, the 42.6-kg sack a metric file was once given.
func TestMassAndVolumeExact(t *testing.T) {
	for _, c := range []struct {
		what      string
		got, want float64
	}{
		{"1 lb in kg", float64(MassFrom(1, Pounds)), 0.45359237},
		{"94 lb in kg", float64(MassFrom(94, Pounds)), 42.63768278},
		{"1 gal in L", VolumeFrom(1, USGallons).In(Litres), 3.785411784},
		{"1 L in m3", float64(VolumeFrom(1, Litres)), 0.001},
		{"1 ft3 in L", VolumeFrom(1, CubicFeet).In(Litres), 28.316846592},
		{"1 lb/gal in kg/L", SlurryDensityFrom(1, DefaultUnits(Feet)) / 1000, 0.45359237 / 3.785411784},
		{"15.6 lb/gal in kg/L", SlurryDensityFrom(15.6, DefaultUnits(Feet)) / 1000, 1.86931},
	} {
		if !near(c.got, c.want, 1e-5*c.want) {
			t.Errorf("%s = %.10g, want %.10g", c.what, c.got, c.want)
		}
	}
}
