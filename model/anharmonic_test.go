package model

import (
	"math"
	"strings"
	"testing"
)

// h2oRows quotes every row of NIST-JANAF 4th ed. (1998), table H-064,
// Water (H2O, ideal gas), from 100 K to 3000 K: T, Cp°, S°,
// −[G°−H°(298.15)]/T, H°−H°(298.15).
var h2oRows = []janafRow{
	{100, 33.299, 152.388, 218.534, -6.615},
	{200, 33.349, 175.485, 191.896, -3.282},
	{298.15, 33.590, 188.834, 188.834, 0.},
	{300, 33.596, 189.042, 188.835, 0.062},
	{400, 34.262, 198.788, 190.159, 3.452},
	{500, 35.226, 206.534, 192.685, 6.925},
	{600, 36.325, 213.052, 195.550, 10.501},
	{700, 37.495, 218.739, 198.465, 14.192},
	{800, 38.721, 223.825, 201.322, 18.002},
	{900, 39.987, 228.459, 204.084, 21.938},
	{1000, 41.268, 232.738, 206.738, 26.000},
	{1100, 42.536, 236.731, 209.285, 30.191},
	{1200, 43.768, 240.485, 211.730, 34.506},
	{1300, 44.945, 244.035, 214.080, 38.942},
	{1400, 46.054, 247.407, 216.341, 43.493},
	{1500, 47.090, 250.620, 218.520, 48.151},
	{1600, 48.050, 253.690, 220.623, 52.908},
	{1700, 48.935, 256.630, 222.655, 57.758},
	{1800, 49.749, 259.451, 224.621, 62.693},
	{1900, 50.496, 262.161, 226.526, 67.706},
	{2000, 51.180, 264.769, 228.374, 72.790},
	{2100, 51.823, 267.282, 230.167, 77.941},
	{2200, 52.408, 269.706, 231.909, 83.153},
	{2300, 52.947, 272.048, 233.604, 88.421},
	{2400, 53.444, 274.312, 235.253, 93.741},
	{2500, 53.904, 276.503, 236.860, 99.108},
	{2600, 54.329, 278.625, 238.425, 104.520},
	{2700, 54.723, 280.683, 239.952, 109.973},
	{2800, 55.089, 282.680, 241.443, 115.464},
	{2900, 55.430, 284.619, 242.899, 120.990},
	{3000, 55.748, 286.504, 244.321, 126.549},
}

// TestAnharmonicWater checks H2O with its vibrational levels summed from
// ωi and xij, each level with its own rotational constants (alpha_cm),
// the rotor's first quantum correction and its first-order centrifugal
// distortion, against every quoted row. It holds the goals for
// polyatomics (S° within 0.1 J/(mol·K) at 298.15 K, Cp° within 1 % to
// 1500 K) over the whole table to 3000 K: S° within 0.1 J/(mol·K) and
// Cp° within 1 % at every row. (The harmonic modes miss Cp° by 3.1 % at
// 3000 K; without the distortion S° runs 0.12 low at 298.15 K; with the
// distortion but not the αi, Cp° runs 1.9 % high at 3000 K.)
func TestAnharmonicWater(t *testing.T) {
	cp, dS := checkTableRows(t, mustSpecies(t, "H2O"), "H-064", h2oRows, summed, func(tempK float64) rowAllowance {
		return rowAllowance{cpRel: 0.01, sAbs: 0.1}
	})
	t.Logf("H2O table H-064, anharmonic levels: worst Cp° %+.2f %% at %g K, worst S° %+.3f at %g K", 100*cp.d, cp.tempK, dS.d, dS.tempK)
}

// TestAnharmonicFields: harm_cm, xij_cm and D0_cm of a polyatomic come
// together, match vib_cm's modes and are range-checked as they are read.
func TestAnharmonicFields(t *testing.T) {
	block := func(harm, xij, d0 string) string {
		b := "[H2O]\nname = water (test)\nrotor = nonlinear\nrot_cm = 27.8806 14.5216 9.2778\nsigma = 2\nvib_cm = 1594.7 3657.1 3755.9\ndHf0_kJ = -238.921\n"
		for _, f := range [][2]string{{"harm_cm", harm}, {"xij_cm", xij}, {"D0_cm", d0}} {
			if f[1] != "" {
				b += f[0] + " = " + f[1] + "\n"
			}
		}
		return b
	}
	const harm, xij, d0 = "1648.5 3832.2 3942.5", "-16.8 -15.9 -20.3 -42.6 -165.8 -47.6", "41145"
	list, err := ParseCatalogue("user.cat", strings.NewReader(block(harm, xij, d0)))
	if err != nil || list[0].anharmonicVib == nil {
		t.Fatalf("valid block refused: %v", err)
	}
	for _, tt := range []struct{ harm, xij, d0, want string }{
		{harm, xij, "", "come together"},
		{"1648.5 3832.2", xij, d0, "2 harmonic wavenumbers for 3 modes"},
		{harm, "-16.8 -15.9 -20.3 -42.6 -165.8", d0, "n(n+1)/2"},
		{harm, "-16.8 -15.9 -20.3 -42.6 -900 -47.6", d0, "anharmonicity constant xij from -500 to 500"},
		{"500 3832.2 3942.5", "-300 -15.9 -20.3 -42.6 -165.8 -47.6", d0, "no rising ladder"},
	} {
		_, err := ParseCatalogue("user.cat", strings.NewReader(block(tt.harm, tt.xij, tt.d0)))
		if err == nil || !strings.Contains(UserMessage(err), tt.want) || strings.Contains(UserMessage(err), "\n") {
			t.Errorf("harm %q xij %q D0 %q: got %v, want one line with %q", tt.harm, tt.xij, tt.d0, err, tt.want)
		}
	}
	// alpha_cm: one α per rot_cm constant for each mode, each below
	// half its constant, and only beside harm_cm.
	for _, tt := range []struct{ extra, want string }{
		{"alpha_cm = -3.248 -0.166 0.149 0.755 0.216 0.174\n", "alpha_cm gives 6 constants; want 9"},
		{"alpha_cm = -3.248 -0.166 0.149 0.755 0.216 0.174 1.234 0.089 5\n", "want |α| below half of it"},
		{"alpha_cm = -3.248 -0.166 0.149 0.755 0.216 0.174 1.234 0.089 25\n", "vibration–rotation constant αi from -20 to 20"},
	} {
		_, err := ParseCatalogue("user.cat", strings.NewReader(block(harm, xij, d0)+tt.extra))
		if err == nil || !strings.Contains(UserMessage(err), tt.want) || strings.Contains(UserMessage(err), "\n") {
			t.Errorf("%q: got %v, want one line with %q", tt.extra, err, tt.want)
		}
	}
	withAlpha, err := ParseCatalogue("user.cat", strings.NewReader(block(harm, xij, d0)+"alpha_cm = -3.248 -0.166 0.149 0.755 0.216 0.174 1.234 0.089 0.138\n"))
	if err != nil {
		t.Fatalf("alpha_cm refused: %v", err)
	}
	// The first excited level, v2 = 1, carries exp(½ Σk α2k/Bk) by hand.
	lv := withAlpha[0].anharmonicVib
	want := math.Exp(0.5 * (-3.248/27.8806 - 0.166/14.5216 + 0.149/9.2778))
	if len(lv.weight) < 2 || math.Abs(lv.weight[1]-want) > 1e-12 {
		t.Errorf("v2 = 1 weight %v, want %.9f (hand calculation)", lv.weight[:2], want)
	}
	if _, err := ParseCatalogue("user.cat", strings.NewReader("[H2O]\nname = x\nrotor = nonlinear\nrot_cm = 27.8806 14.5216 9.2778\nsigma = 2\nvib_cm = 1594.7 3657.1 3755.9\ndHf0_kJ = 0\nalpha_cm = 0 0 0 0 0 0 0 0 0\n")); err == nil || !strings.Contains(UserMessage(err), "come together") {
		t.Errorf("alpha_cm alone: got %v, want it refused", err)
	}
	co2 := "[CO2]\nname = co2 (test)\nrotor = linear\nrot_cm = 0.39022\nsigma = 2\nspin = 1 0\nvib_cm = 1333 667.4x2 2349.1\ndHf0_kJ = -393.151\n" +
		"harm_cm = 1354.31 672.85 2396.32\nxij_cm = -2.93 -4.61 -19.82 1.35 -12.31 -12.47\nD0_cm = 43980\n"
	if _, err := ParseCatalogue("user.cat", strings.NewReader(co2)); err == nil || !strings.Contains(UserMessage(err), "gll_cm gives 0 constants for 1 doubly degenerate") {
		t.Errorf("CO2 without gll_cm: got %v", err)
	}
	if _, err := ParseCatalogue("user.cat", strings.NewReader(co2+"gll_cm = -0.97\n")); err != nil {
		t.Errorf("CO2 with gll_cm refused: %v", err)
	}
}

// co2Rows quotes every row of NIST-JANAF 4th ed. (1998), table C-095,
// Carbon Dioxide (CO2), from 100 K to 3500 K: T, Cp°, S°,
// −[G°−H°(298.15)]/T, H°−H°(298.15).
var co2Rows = []janafRow{
	{100, 29.208, 179.009, 243.568, -6.456},
	{200, 32.359, 199.975, 217.046, -3.414},
	{298.15, 37.129, 213.795, 213.795, 0.},
	{300, 37.221, 214.025, 213.795, 0.069},
	{400, 41.325, 225.314, 215.307, 4.003},
	{500, 44.627, 234.901, 218.290, 8.305},
	{600, 47.321, 243.283, 221.772, 12.907},
	{700, 49.564, 250.750, 225.388, 17.754},
	{800, 51.434, 257.494, 228.986, 22.806},
	{900, 52.999, 263.645, 232.500, 28.030},
	{1000, 54.308, 269.299, 235.901, 33.397},
	{1100, 55.409, 274.528, 239.178, 38.884},
	{1200, 56.342, 279.390, 242.329, 44.473},
	{1300, 57.137, 283.932, 245.356, 50.148},
	{1400, 57.802, 288.191, 248.265, 55.896},
	{1500, 58.379, 292.199, 251.062, 61.705},
	{1600, 58.886, 295.983, 253.753, 67.569},
	{1700, 59.317, 299.566, 256.343, 73.480},
	{1800, 59.701, 302.968, 258.840, 79.431},
	{1900, 60.049, 306.205, 261.248, 85.419},
	{2000, 60.350, 309.293, 263.574, 91.439},
	{2100, 60.622, 312.244, 265.822, 97.488},
	{2200, 60.865, 315.070, 267.996, 103.562},
	{2300, 61.086, 317.781, 270.102, 109.660},
	{2400, 61.287, 320.385, 272.144, 115.779},
	{2500, 61.471, 322.890, 274.124, 121.917},
	{2600, 61.647, 325.305, 276.046, 128.073},
	{2700, 61.802, 327.634, 277.914, 134.246},
	{2800, 61.952, 329.885, 279.730, 140.433},
	{2900, 62.095, 332.061, 281.497, 146.636},
	{3000, 62.229, 334.169, 283.218, 152.852},
	{3100, 62.347, 336.211, 284.895, 159.081},
	{3200, 62.462, 338.192, 286.529, 165.321},
	{3300, 62.573, 340.116, 288.124, 171.573},
	{3400, 62.681, 341.986, 289.681, 177.836},
	{3500, 62.785, 343.804, 291.202, 184.109},
}

// TestAnharmonicCarbonDioxide checks CO2 with its vibrational levels summed
// from ωi, xij and g22 (the doubly degenerate bend with its vibrational
// angular momentum; the Fermi resonance of ν1 with 2ν2 is left out: the
// deperturbed constants are summed as they are, and the resonance only
// pushes pairs of levels apart). Against every quoted row it holds Cp°
// within 0.3 % and S° within 0.1 J/(mol·K) to 3500 K (the harmonic modes:
// −2.2 % and −0.83 at 3500 K). Above 4000 K it falls away from the table
// (−5.9 % in Cp° at 6000 K): the levels are cut at D0, which the table
// evidently does not do, so those rows are not checked.
func TestAnharmonicCarbonDioxide(t *testing.T) {
	cp, dS := checkTableRows(t, mustSpecies(t, "CO2"), "C-095", co2Rows, summed, func(float64) rowAllowance {
		return rowAllowance{cpRel: 0.003, sAbs: 0.1, gefAbs: 0.1}
	})
	t.Logf("CO2 table C-095, anharmonic levels: worst Cp° %+.2f %% at %g K, worst S° %+.3f at %g K", 100*cp.d, cp.tempK, dS.d, dS.tempK)
}
