package realgas

import (
	"math"
	"testing"

	"zmix/model"
)

func pure(t testing.TB, formula string) *Mixture {
	t.Helper()
	sp, ok := model.Builtin().Lookup(formula)
	if !ok {
		t.Fatalf("no species %s", formula)
	}
	return New([]Component{ComponentOf(sp, 1)})
}

func blend(t testing.TB, xs map[string]float64) *Mixture {
	t.Helper()
	var comps []Component
	for f, x := range xs {
		sp, ok := model.Builtin().Lookup(f)
		if !ok {
			t.Fatalf("no species %s", f)
		}
		comps = append(comps, ComponentOf(sp, x))
	}
	return New(comps)
}

// cpIdeal is a fixed ideal-gas Cp for tests of the departures; the
// identities below hold for any value.
const cpIdeal = 29.1

// TestSecondVirial checks B near 300 K against the compilation of Dymond
// and Smith, The Virial Coefficients of Pure Gases and Mixtures (Oxford,
// 1980), values from memory. Tsonopoulos' correlation is good to a few
// cm³/mol for simple gases.
func TestSecondVirial(t *testing.T) {
	for _, tt := range []struct {
		formula string
		tempK   float64
		wantCm3 float64
		tolCm3  float64
	}{
		{"N2", 300, -4.5, 2},    // Dymond & Smith, N2 300 K, from memory
		{"Ar", 300, -15.9, 2},   // Dymond & Smith, Ar 300 K, from memory
		{"CH4", 300, -42.8, 4},  // Dymond & Smith, CH4 300 K, from memory
		{"CO2", 300, -122.0, 8}, // Dymond & Smith, CO2 300 K, from memory
		{"H2", 300, 14.8, 3},    // Dymond & Smith, H2 300 K, from memory (Chueh–Prausnitz constants)
	} {
		b, _, _ := pure(t, tt.formula).SecondVirial(tt.tempK)
		if got := b * 1e6; math.Abs(got-tt.wantCm3) > tt.tolCm3 {
			t.Errorf("B(%s, %g K) = %.2f cm³/mol, want %.1f ± %g", tt.formula, tt.tempK, got, tt.wantCm3, tt.tolCm3)
		}
	}
}

// TestCompressibility checks Z at high pressure against reference
// densities (NIST Chemistry WebBook fluid tables: Span et al. 2000 for
// N2, Leachman et al. 2009 for normal H2), values from memory.
func TestCompressibility(t *testing.T) {
	for _, tt := range []struct {
		formula string
		tempK   float64
		presPa  float64
		wantZ   float64
		relTol  float64
	}{
		{"N2", 300, 100e5, 1.00, 0.02}, // NIST WebBook, from memory
		{"N2", 300, 200e5, 1.04, 0.02}, // NIST WebBook, from memory
		{"N2", 300, 300e5, 1.10, 0.02}, // NIST WebBook, from memory
		{"H2", 300, 100e5, 1.06, 0.02}, // NIST WebBook, from memory
		{"H2", 300, 200e5, 1.12, 0.02}, // NIST WebBook, from memory: a 200 bar cylinder
		{"H2", 300, 300e5, 1.18, 0.02}, // NIST WebBook, from memory
	} {
		var r Result
		pure(t, tt.formula).Eval(&r, tt.tempK, tt.presPa, cpIdeal)
		if math.Abs(r.Z/tt.wantZ-1) > tt.relTol {
			t.Errorf("Z(%s, %g K, %g bar) = %.4f (%v), want %.3f ± %g %%", tt.formula, tt.tempK, tt.presPa/1e5, r.Z, r.Model, tt.wantZ, 100*tt.relTol)
		}
		if r.Range != InRange {
			t.Errorf("%s at %g bar: %v, want in range", tt.formula, tt.presPa/1e5, r.Range)
		}
	}
}

// TestJouleThomson: N2 at 300 K and 1 bar cools on throttling by about
// 0.22 K/bar (Perry's Chemical Engineers' Handbook, Joule–Thomson table
// for nitrogen, from memory); H2 and He warm (inversion temperatures far
// below 300 K).
func TestJouleThomson(t *testing.T) {
	var r Result
	pure(t, "N2").Eval(&r, 300, 1e5, cpIdeal)
	if got := r.JouleThomsonKPerPa * 1e5; math.Abs(got-0.22) > 0.03 {
		t.Errorf("μJT(N2, 300 K, 1 bar) = %.3f K/bar, want 0.22 ± 0.03", got)
	}
	for _, f := range []string{"H2", "He"} {
		pure(t, f).Eval(&r, 300, 1e5, cpIdeal)
		if r.JouleThomsonKPerPa >= 0 {
			t.Errorf("μJT(%s, 300 K) = %g K/Pa, want negative", f, r.JouleThomsonKPerPa)
		}
	}
}

// TestIdealLimit: as P → 0, Z → 1, the departures → 0 in proportion to
// P (the virial's are exactly linear in P), Cp → Cp°, and the speed of
// sound → √(γRT/M). H2O and NH3 carry the polar term, the largest |B|
// and |B − T dB/dT| here: at 1 Pa NH3's Hres is about 1e-3 J/mol, so the
// absolute checks are made at 0.01 Pa and the proportion between them.
func TestIdealLimit(t *testing.T) {
	rg := model.GasConstant
	for _, f := range []string{"N2", "CO2", "H2", "NH3", "H2O", "SF6"} {
		m := pure(t, f)
		var r, r1 Result
		m.Eval(&r, 300, 0.01, cpIdeal)
		m.Eval(&r1, 300, 1, cpIdeal)
		mass := m.massKg
		cIdeal := math.Sqrt(cpIdeal / (cpIdeal - rg) * rg * 300 / mass)
		if math.Abs(r.Z-1) > 1e-6 || math.Abs(r.HResJPerMol) > 1e-3 || math.Abs(r.SResJPerMolK) > 1e-5 ||
			math.Abs(r.CpJPerMolK-cpIdeal) > 1e-5 || math.Abs(r.SoundSpeedMPerS/cIdeal-1) > 1e-6 {
			t.Errorf("%s at 0.01 Pa: Z %g, Hres %g, Sres %g, Cp %g (want %g), c %g (want %g)", f, r.Z, r.HResJPerMol, r.SResJPerMolK, r.CpJPerMolK, cpIdeal, r.SoundSpeedMPerS, cIdeal)
		}
		if math.Abs(r1.HResJPerMol/r.HResJPerMol/100-1) > 1e-9 || math.Abs(r1.SResJPerMolK/r.SResJPerMolK/100-1) > 1e-9 || math.Abs((r1.Z-1)/(r.Z-1)/100-1) > 1e-4 { // Z − 1 ≈ 1e-11 keeps 5 digits
			t.Errorf("%s: from 0.01 to 1 Pa, Hres %g → %g, Sres %g → %g, Z − 1 %g → %g; want each ×100", f, r.HResJPerMol, r1.HResJPerMol, r.SResJPerMolK, r1.SResJPerMolK, r.Z-1, r1.Z-1)
		}
	}
}

// TestIdealLimitFarBelow: at the lowest pressures the engine accepts
// the figures stay finite and are the ideal gas's, Cv = Cp° − R and
// c = √(γRT/M), where P² underflows (it turned Cv and c into 0/0 below
// about 1e-154 Pa).
func TestIdealLimitFarBelow(t *testing.T) {
	rg := model.GasConstant
	for _, f := range []string{"N2", "NH3", "SF6"} {
		m := pure(t, f)
		cIdeal := math.Sqrt(cpIdeal / (cpIdeal - rg) * rg * 300 / m.massKg)
		for _, presPa := range []float64{1e-160, 1e-250, 1e-300, 5e-324} {
			var r Result
			m.Eval(&r, 300, presPa, cpIdeal)
			if r.Z != 1 || math.Abs(r.CvJPerMolK-(cpIdeal-rg)) > 1e-12 || math.Abs(r.SoundSpeedMPerS/cIdeal-1) > 1e-12 {
				t.Errorf("%s at %g Pa: Z %g, Cv %g (want %g), c %g (want %g)", f, presPa, r.Z, r.CvJPerMolK, cpIdeal-rg, r.SoundSpeedMPerS, cIdeal)
			}
		}
	}
}

// TestIdentities checks each model's departures against each other by
// finite differences: Cp − Cp° = ∂Hres/∂T at P, Sres consistent with
// Hres through ∂(Gres/RT)/∂T = −Hres/(RT²), and μJT = −(∂H/∂P)_T/Cp.
func TestIdentities(t *testing.T) {
	rg := model.GasConstant
	cases := []struct {
		formula string
		tempK   float64
		presPa  float64
		want    Model
	}{
		{"N2", 300, 20e5, Virial},
		{"CH4", 250, 20e5, Virial},
		{"NH3", 350, 5e5, Virial}, // the polar term's 1/T⁶ in B, B', B''
		{"H2O", 450, 2e5, Virial},
		{"N2", 300, 250e5, PengRobinson},
		{"CO2", 350, 100e5, PengRobinson},
		{"C3H8", 400, 60e5, PengRobinson},
	}
	for _, tt := range cases {
		m := pure(t, tt.formula)
		eval := func(tk, p float64) Result {
			var r Result
			m.Eval(&r, tk, p, cpIdeal)
			return r
		}
		r := eval(tt.tempK, tt.presPa)
		if r.Model != tt.want {
			t.Errorf("%s %g K %g bar: model %v, want %v", tt.formula, tt.tempK, tt.presPa/1e5, r.Model, tt.want)
			continue
		}
		dT := 1e-3 * tt.tempK
		hi, lo := eval(tt.tempK+dT, tt.presPa), eval(tt.tempK-dT, tt.presPa)
		if hi.Model != r.Model || lo.Model != r.Model {
			continue
		}
		cpRes := (hi.HResJPerMol - lo.HResJPerMol) / (2 * dT)
		if got := r.CpJPerMolK - cpIdeal; math.Abs(got-cpRes) > 1e-3*math.Max(1, math.Abs(cpRes)) {
			t.Errorf("%s %g K %g bar: Cp − Cp° = %g, ∂Hres/∂T = %g", tt.formula, tt.tempK, tt.presPa/1e5, got, cpRes)
		}
		g := func(x Result, tk float64) float64 { return (x.HResJPerMol - tk*x.SResJPerMolK) / (rg * tk) }
		dGdT := (g(hi, tt.tempK+dT) - g(lo, tt.tempK-dT)) / (2 * dT)
		if want := -r.HResJPerMol / (rg * tt.tempK * tt.tempK); math.Abs(dGdT-want) > 1e-4*math.Max(1e-3, math.Abs(want)) {
			t.Errorf("%s %g K %g bar: ∂(Gres/RT)/∂T = %g, −Hres/RT² = %g", tt.formula, tt.tempK, tt.presPa/1e5, dGdT, want)
		}
		dP := 1e-4 * tt.presPa
		ph, pl := eval(tt.tempK, tt.presPa+dP), eval(tt.tempK, tt.presPa-dP)
		jt := -(ph.HResJPerMol - pl.HResJPerMol) / (2 * dP) / r.CpJPerMolK
		if math.Abs(jt-r.JouleThomsonKPerPa) > 1e-3*math.Abs(jt) {
			t.Errorf("%s %g K %g bar: μJT = %g, −(∂H/∂P)/Cp = %g", tt.formula, tt.tempK, tt.presPa/1e5, r.JouleThomsonKPerPa, jt)
		}
		// Z from the residual volume: V = ZRT/P.
		if math.Abs(r.VM3PerMol-r.Z*rg*tt.tempK/tt.presPa) > 1e-12 {
			t.Errorf("%s: V %g and Z %g disagree", tt.formula, r.VM3PerMol, r.Z)
		}
	}
}

// TestCombiningRules: a species split into two components is the same
// gas, so B and the Peng–Robinson Z must not change.
func TestCombiningRules(t *testing.T) {
	sp, _ := model.Builtin().Lookup("CH4")
	one := New([]Component{ComponentOf(sp, 1)})
	two := New([]Component{ComponentOf(sp, 0.3), ComponentOf(sp, 0.7)})
	for _, p := range []float64{1e5, 150e5} {
		var a, b Result
		one.Eval(&a, 280, p, cpIdeal)
		two.Eval(&b, 280, p, cpIdeal)
		if math.Abs(a.Z-b.Z) > 1e-12 || math.Abs(a.BM3PerMol-b.BM3PerMol) > 1e-18 {
			t.Errorf("CH4 split in two at %g bar: Z %g vs %g, B %g vs %g", p/1e5, a.Z, b.Z, a.BM3PerMol, b.BM3PerMol)
		}
	}
}

// TestOutsideModels: N2 at 1 GPa is liquid-like in density; CO2 at 300 K
// and 100 bar is a liquid; CO2 at its critical point is near-critical.
func TestOutsideModels(t *testing.T) {
	for _, tt := range []struct {
		formula string
		tempK   float64
		presPa  float64
		want    Range
	}{
		{"N2", 300, 1e9, TooDense},
		{"CO2", 300, 100e5, LiquidRoot},
		{"CO2", 305, 74e5, NearCritical},
		{"CO2", 300, 60e5, InRange}, // vapour, below its 67 bar saturation pressure
		{"N2", 300, 1e5, InRange},
	} {
		var r Result
		pure(t, tt.formula).Eval(&r, tt.tempK, tt.presPa, cpIdeal)
		if r.Range != tt.want {
			t.Errorf("%s %g K %g bar: %v, want %v", tt.formula, tt.tempK, tt.presPa/1e5, r.Range, tt.want)
		}
	}
}

// TestIdealSpecies: a radical has no critical constants and counts as an
// ideal gas, named in the result.
func TestIdealSpecies(t *testing.T) {
	m := blend(t, map[string]float64{"N2": 0.9, "O": 0.1})
	if len(m.Ideal) != 1 || m.Ideal[0] != "O" {
		t.Errorf("ideal species %v, want [O]", m.Ideal)
	}
	only := blend(t, map[string]float64{"OH": 1})
	if only.Known() {
		t.Error("a blend of radicals claims real-gas constants")
	}
}

func TestEvalAllocatesNothing(t *testing.T) {
	m := blend(t, map[string]float64{"N2": 0.5, "H2": 0.3, "He": 0.2})
	var r Result
	if n := testing.AllocsPerRun(100, func() { m.Eval(&r, 300, 200e5, cpIdeal) }); n != 0 {
		t.Errorf("Eval allocates %g times", n)
	}
}

var benchResult Result

// BenchmarkEval10 times the correction for the ten species of the
// mixtures benchmark blend; goal ≤ 1 µs at 1 bar (virial) and at 200 bar
// (Peng–Robinson).
func BenchmarkEval10(b *testing.B) {
	m := blend(b, map[string]float64{"N2": 0.7195, "O2": 0.1, "Ar": 0.05, "CO2": 0.04, "H2": 0.03,
		"He": 0.02, "CO": 0.01, "CH4": 0.01, "H2O": 0.02, "NH3": 0.0005})
	for _, p := range []float64{1e5, 200e5} {
		b.Run(map[float64]string{1e5: "1bar", 200e5: "200bar"}[p], func(b *testing.B) {
			b.ReportAllocs()
			for i := 0; i < b.N; i++ {
				m.Eval(&benchResult, 300, p, cpIdeal)
			}
		})
	}
}
