package mixtures

import (
	"errors"
	"math"
	"math/rand/v2"
	"reflect"
	"strconv"
	"testing"

	"zmix/model"
)

const dryAir = "N2 78.08%, O2 20.95%, Ar 0.93%, CO2 0.04%"

// Mixture properties against outside references.
func TestMixtureReferences(t *testing.T) {
	perKg := func(s *State, perMol float64) float64 { return s.PerKg(perMol) }
	cases := []struct {
		name   string
		blend  string
		tempK  float64
		presPa float64
		get    func(*State) float64
		want   float64
		tol    float64 // absolute, in the unit of want
		source string
	}{
		{"mixing entropy, 50/50 of two gases", "N2 50%, O2 50%", 300, 1e5,
			func(s *State) float64 { return s.SMixJPerMolK }, rGas * math.Ln2, 1e-12,
			"ΔS_mix = R ln 2 per mole, textbook worked example; R from gonum CODATA 2018"},
		{"mixing entropy, 50/50 of an atom and a molecule", "Ar 0.5, CO2 0.5", 1000, 1e6,
			func(s *State) float64 { return s.SMixJPerMolK }, rGas * math.Ln2, 1e-12,
			"textbook worked example (R ln 2 whatever the gases)"},
		{"mixing entropy, equal thirds by partial pressure", "N2 1 bar, O2 1 bar, Ar 1 bar", 300, 3e5,
			func(s *State) float64 { return s.SMixJPerMolK }, rGas * math.Log(3), 1e-12,
			"ΔS_mix = R ln 3 for equal thirds, textbook worked example"},
		{"molar mass of dry air", dryAir, 298.15, atmPa,
			func(s *State) float64 { return s.MolarMassKgPerMol * 1000 }, 28.96, 0.01,
			"handbook value for dry air, 28.96 g/mol, from memory"},
		{"density of dry air, 25 °C and 1 atm", dryAir, 298.15, atmPa,
			func(s *State) float64 { return s.DensityKgPerM3 }, 1.184, 0.001,
			"handbook table of air properties, 1.184 kg/m³, from memory"},
		{"density of dry air, 0 °C and 1 atm", dryAir, 273.15, atmPa,
			func(s *State) float64 { return s.DensityKgPerM3 }, 1.293, 0.001,
			"handbook value at 0 °C and 101.325 kPa, 1.293 kg/m³, from memory"},
		{"speed of sound in dry air, 20 °C", dryAir, 293.15, atmPa,
			func(s *State) float64 { return s.SoundSpeedMPerS }, 343.2, 0.5,
			"handbook value, 343.2 m/s, from memory"},
		{"cp of dry air, 300 K", dryAir, 300, 1e5,
			func(s *State) float64 { return perKg(s, s.CpJPerMolK) / 1000 }, 1.005, 0.003,
			"handbook table of air properties, 1.005 kJ/(kg·K), from memory"},
		{"γ of dry air, 300 K", dryAir, 300, 1e5,
			func(s *State) float64 { return s.Gamma }, 1.400, 0.002,
			"handbook value, 1.400, from memory"},
		// Σ xᵢ Cp°ᵢ with Cp° (J/(mol·K)) at 298.15 K and 1000 K from
		// NIST-JANAF 4th ed., tables N-023, O-029, Ar-001, C-095:
		//   298.15 K: N2 29.124, O2 29.376, Ar 20.786, CO2 37.129
		//   1000 K:   N2 32.697, O2 34.870, Ar 20.786, CO2 54.308
		{"Cp of dry air, 298.15 K", dryAir, 298.15, 1e5,
			func(s *State) float64 { return s.CpJPerMolK },
			0.7808*29.124 + 0.2095*29.376 + 0.0093*20.786 + 0.0004*37.129, 0.01 * 29.1,
			"NIST-JANAF 4th ed., N-023, O-029, Ar-001, C-095; 1 % (rigid rotor / harmonic)"},
		{"Cp of dry air, 1000 K", dryAir, 1000, 1e5,
			func(s *State) float64 { return s.CpJPerMolK },
			0.7808*32.697 + 0.2095*34.870 + 0.0093*20.786 + 0.0004*54.308, 0.03 * 33.05,
			"NIST-JANAF 4th ed., N-023, O-029, Ar-001, C-095; 3 % (rigid rotor / harmonic)"},
		// S = Σ xᵢ S°ᵢ − R Σ xᵢ ln xᵢ at P = P° = 1 bar, with S° (J/(mol·K))
		// at 298.15 K from NIST-JANAF 4th ed.: N2 191.609 (N-023),
		// O2 205.147 (O-029), Ar 154.845 (Ar-001), CO2 213.795 (C-095).
		{"S of dry air, 298.15 K and 1 bar", dryAir, 298.15, 1e5,
			func(s *State) float64 { return s.SJPerMolK },
			0.7808*191.609 + 0.2095*205.147 + 0.0093*154.845 + 0.0004*213.795 -
				rGas*(0.7808*math.Log(0.7808)+0.2095*math.Log(0.2095)+0.0093*math.Log(0.0093)+0.0004*math.Log(0.0004)),
			0.3, "NIST-JANAF 4th ed., N-023, O-029, Ar-001, C-095; 0.3 J/(mol·K) (rigid rotor / harmonic)"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			s := mustState(t, mustMixture(t, c.blend, c.presPa), c.tempK, c.presPa)
			got := c.get(&s)
			if math.Abs(got-c.want) > c.tol {
				t.Errorf("%s = %.6g, want %.6g ± %.2g (%s)", c.name, got, c.want, c.tol, c.source)
			}
			t.Logf("%s: %.6g vs %.6g (%s)", c.name, got, c.want, c.source)
		})
	}
}

// randomBlend draws a blend of 1 to 6 distinct catalogue species with
// random amounts (some at ppm level), and a state over 20–3000 K and
// 1 Pa–10 MPa, both log-uniform.
func randomBlend(t *testing.T, rng *rand.Rand) (m *Mixture, tempK, presPa float64) {
	t.Helper()
	all := model.Builtin().All()
	k := 1 + rng.IntN(6)
	comps := make([]Component, k)
	for i, j := range rng.Perm(len(all))[:k] {
		x := rng.Float64() + 1e-3
		if rng.IntN(5) == 0 {
			x *= 1e-5
		}
		comps[i] = Component{Species: all[j], X: x}
	}
	m, err := NewMixture(comps)
	if err != nil {
		t.Fatalf("NewMixture: %v", err)
	}
	tempK = 20 * math.Pow(3000.0/20, rng.Float64())
	presPa = math.Pow(1e7, rng.Float64())
	return m, tempK, presPa
}

func blendName(m *Mixture) string {
	s := ""
	for i, c := range m.Components {
		if i > 0 {
			s += ", "
		}
		s += c.Species.Formula + " " + formatX(c.X)
	}
	return s
}

func formatX(x float64) string { return strconv.FormatFloat(x, 'g', 4, 64) }

// The identities of an ideal mixture, for seeded random blends. Each
// tolerance is set by the arithmetic (rounding of sums, or the truncation
// and rounding of a central difference), not by the physics: the
// identities are exact.
func TestMixtureIdentities(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 1))
	const samples = 400
	var worstCv, worstS, worstSP, worstCp float64
	for n := 0; n < samples; n++ {
		m, tempK, presPa := randomBlend(t, rng)
		s := mustState(t, m, tempK, presPa)
		name := func() string { return blendName(m) }
		rt := rGas * tempK

		// Cp − Cv = R (exact for an ideal gas).
		if d := s.CpJPerMolK - s.CvJPerMolK - rGas; math.Abs(d) > 1e-9 {
			t.Errorf("%s at %.4g K, %.4g Pa: Cp − Cv − R = %g", name(), tempK, presPa, d)
		}
		// G = H − TS, and A = U − TS.
		if d := s.GJPerMol - (s.HJPerMol - tempK*s.SJPerMolK); math.Abs(d) > 1e-9*(math.Abs(s.HJPerMol)+tempK*math.Abs(s.SJPerMolK)) {
			t.Errorf("%s at %.4g K, %.4g Pa: G − (H − TS) = %g", name(), tempK, presPa, d)
		}
		if d := s.AJPerMol - (s.UJPerMol - tempK*s.SJPerMolK); math.Abs(d) > 1e-9*(math.Abs(s.UJPerMol)+tempK*math.Abs(s.SJPerMolK)) {
			t.Errorf("%s at %.4g K, %.4g Pa: A − (U − TS) = %g", name(), tempK, presPa, d)
		}
		// H = U + PV/n = U + RT, G = A + RT.
		if d := s.HJPerMol - s.UJPerMol - rt; math.Abs(d) > 1e-9*(math.Abs(s.HJPerMol)+rt) {
			t.Errorf("%s: H − U − RT = %g", name(), d)
		}

		// G = Σ xᵢμᵢ, with μᵢ = μᵢ°(T) + RT ln(xᵢP/P°) and μᵢ° taken from
		// the pure species at P°; S = Σ xᵢS°ᵢ − R Σ xᵢ ln(xᵢP/P°).
		p0 := model.StdPressureBarPa
		var sumXMu, sumS float64
		for _, term := range s.Species {
			sp := term.Species
			mu0 := sp.StandardGibbs(tempK, p0, model.Treatment{})
			ln := math.Log(term.X * presPa / p0)
			wantMu := mu0 + rt*ln
			if d := term.MuJPerMol - wantMu; math.Abs(d) > 1e-9*(math.Abs(mu0)+math.Abs(rt*ln)+rt) {
				t.Errorf("%s: μ(%s) = %.10g, want μ° + RT ln(xP/P°) = %.10g", name(), sp.Formula, term.MuJPerMol, wantMu)
			}
			if d := term.Mu0JPerMol - mu0; math.Abs(d) > 1e-9*(math.Abs(mu0)+math.Abs(rt*ln)+rt) {
				t.Errorf("%s: μ°(%s) = %.10g, want %.10g", name(), sp.Formula, term.Mu0JPerMol, mu0)
			}
			std, err := sp.State(tempK, p0)
			if err != nil {
				t.Fatal(err)
			}
			sumXMu += term.X * term.MuJPerMol
			sumS += term.X * (std.SJPerMolK - rGas*ln)
		}
		if d := s.GJPerMol - sumXMu; math.Abs(d) > 1e-9*(math.Abs(s.GJPerMol)+rt) {
			t.Errorf("%s: G − Σxμ = %g", name(), d)
		}
		if d := s.SJPerMolK - sumS; math.Abs(d) > 1e-9*(math.Abs(s.SJPerMolK)+rGas) {
			t.Errorf("%s at %.4g K, %.4g Pa: S = %.10g, want Σ xS° − R Σ x ln(xP/P°) = %.10g", name(), tempK, presPa, s.SJPerMolK, sumS)
		}

		// Central differences. Cv = ∂U/∂T and S = −∂A/∂T hold V and N
		// fixed, so P moves with T (P ∝ T); S = −∂G/∂T and Cp = ∂H/∂T
		// hold P fixed.
		// h = 1e-4 T leaves a truncation error ~1e-9 (relative) and a
		// rounding error ~1e-16·|U|/h; fdTol allows 20 times the worst seen.
		h := 1e-4 * tempK
		const fdTol = 1e-7
		atV := func(dT float64) State { return mustState(t, m, tempK+dT, presPa*(tempK+dT)/tempK) }
		atP := func(dT float64) State { return mustState(t, m, tempK+dT, presPa) }
		vUp, vDown := atV(h), atV(-h)
		pUp, pDown := atP(h), atP(-h)
		cvFD := (vUp.UJPerMol - vDown.UJPerMol) / (2 * h)
		sFD := -(vUp.AJPerMol - vDown.AJPerMol) / (2 * h)
		sPFD := -(pUp.GJPerMol - pDown.GJPerMol) / (2 * h)
		cpFD := (pUp.HJPerMol - pDown.HJPerMol) / (2 * h)
		worstCv = max(worstCv, math.Abs(cvFD-s.CvJPerMolK)/s.CvJPerMolK)
		worstS = max(worstS, math.Abs(sFD-s.SJPerMolK)/math.Abs(s.SJPerMolK))
		worstSP = max(worstSP, math.Abs(sPFD-s.SJPerMolK)/math.Abs(s.SJPerMolK))
		worstCp = max(worstCp, math.Abs(cpFD-s.CpJPerMolK)/s.CpJPerMolK)
		if !relClose(cvFD, s.CvJPerMolK, fdTol, 1e-9) {
			t.Errorf("%s at %.6g K, %.4g Pa: ∂U/∂T|V = %.10g, Cv = %.10g", name(), tempK, presPa, cvFD, s.CvJPerMolK)
		}
		if !relClose(sFD, s.SJPerMolK, fdTol, 1e-9) {
			t.Errorf("%s at %.6g K, %.4g Pa: −∂A/∂T|V = %.10g, S = %.10g", name(), tempK, presPa, sFD, s.SJPerMolK)
		}
		if !relClose(sPFD, s.SJPerMolK, fdTol, 1e-9) {
			t.Errorf("%s at %.6g K, %.4g Pa: −∂G/∂T|P = %.10g, S = %.10g", name(), tempK, presPa, sPFD, s.SJPerMolK)
		}
		if !relClose(cpFD, s.CpJPerMolK, fdTol, 1e-9) {
			t.Errorf("%s at %.6g K, %.4g Pa: ∂H/∂T|P = %.10g, Cp = %.10g", name(), tempK, presPa, cpFD, s.CpJPerMolK)
		}
	}
	t.Logf("worst relative deviation of central differences over %d blends: Cv %.2g, S(V) %.2g, S(P) %.2g, Cp %.2g", samples, worstCv, worstS, worstSP, worstCp)
}

// helmholtzJ is the total Helmholtz energy of n mol of the mixture in a
// volume V at T: n·A(T, P) with P = nRT/V.
func helmholtzJ(t *testing.T, m *Mixture, tempK, nMol, volM3 float64) float64 {
	t.Helper()
	s := mustState(t, m, tempK, nMol*rGas*tempK/volM3)
	return nMol * s.AJPerMol
}

// A(T, V, N) is extensive (first-order homogeneous in N and V), and its
// volume derivative is the pressure: P = −∂A/∂V at fixed T and N.
func TestHelmholtzExtensiveAndPressure(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 1))
	for n := 0; n < 100; n++ {
		m, tempK, presPa := randomBlend(t, rng)
		nMol := 0.1 + 10*rng.Float64()
		volM3 := nMol * rGas * tempK / presPa
		a1 := helmholtzJ(t, m, tempK, nMol, volM3)
		for _, lambda := range []float64{2, 0.5, 7.3} {
			aL := helmholtzJ(t, m, tempK, lambda*nMol, lambda*volM3)
			if !relClose(aL, lambda*a1, 1e-12, 1e-9) {
				t.Errorf("%s: A(%gN, %gV) = %.12g, want %g·A(N, V) = %.12g", blendName(m), lambda, lambda, aL, lambda, lambda*a1)
			}
		}
		// Doubling N alone does not double A (the test above can fail).
		if a2 := helmholtzJ(t, m, tempK, 2*nMol, volM3); relClose(a2, 2*a1, 1e-9, 0) {
			t.Errorf("%s: A(2N, V) = 2A(N, V); A must depend on N/V", blendName(m))
		}
		h := 1e-5 * volM3
		pFD := -(helmholtzJ(t, m, tempK, nMol, volM3+h) - helmholtzJ(t, m, tempK, nMol, volM3-h)) / (2 * h)
		if !relClose(pFD, presPa, 1e-5, 0) {
			t.Errorf("%s at %.4g K: −∂A/∂V = %.8g Pa, want P = %.8g Pa", blendName(m), tempK, pFD, presPa)
		}
	}
}

// Mixing at the same T and P: two portions of one gas give ΔS = 0; two or
// more different gases give ΔS = −R Σ nᵢ ln xᵢ. Before mixing, each
// portion is the pure gas at (T, P); after, the mixture at (T, P).
func TestEntropyOfMixing(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 1))
	all := model.Builtin().All()
	for n := 0; n < 200; n++ {
		tempK := 20 * math.Pow(3000.0/20, rng.Float64())
		presPa := math.Pow(1e7, rng.Float64())
		pureS := func(sp *model.Species) float64 {
			st, err := sp.State(tempK, presPa)
			if err != nil {
				t.Fatal(err)
			}
			return st.SJPerMolK
		}

		// Same gas, two portions.
		sp := all[rng.IntN(len(all))]
		n1, n2 := 0.1+rng.Float64(), 0.1+rng.Float64()
		same, err := NewMixture([]Component{{Species: sp, X: n1}, {Species: sp, X: n2}})
		if err != nil {
			t.Fatal(err)
		}
		ss := mustState(t, same, tempK, presPa)
		if dS := (n1+n2)*ss.SJPerMolK - (n1+n2)*pureS(sp); math.Abs(dS) > 1e-9*(n1+n2)*math.Abs(ss.SJPerMolK) {
			t.Errorf("%s + %s at %.4g K, %.4g Pa: ΔS = %g J/K, want 0", sp.Formula, sp.Formula, tempK, presPa, dS)
		}

		// Different gases.
		k := 2 + rng.IntN(4)
		comps := make([]Component, k)
		var total float64
		for i, j := range rng.Perm(len(all))[:k] {
			comps[i] = Component{Species: all[j], X: 0.01 + rng.Float64()}
			total += comps[i].X
		}
		before, want := 0.0, 0.0
		for _, c := range comps {
			before += c.X * pureS(c.Species)
			want -= rGas * c.X * math.Log(c.X/total)
		}
		mix, err := NewMixture(comps)
		if err != nil {
			t.Fatal(err)
		}
		after := total * mustState(t, mix, tempK, presPa).SJPerMolK
		if dS := after - before; !relClose(dS, want, 1e-9, 1e-9*math.Abs(before)) {
			t.Errorf("%s at %.4g K, %.4g Pa: ΔS = %.10g J/K, want −R Σ n ln x = %.10g", blendName(mix), tempK, presPa, dS, want)
		}
	}
}

// Ideal mixing releases no heat: H of the mixture is the mole-weighted
// H of the pure gases at the same T and P, and so is Cp.
func TestNoHeatOfMixing(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 1))
	for n := 0; n < 100; n++ {
		m, tempK, presPa := randomBlend(t, rng)
		s := mustState(t, m, tempK, presPa)
		var h, cp float64
		for _, c := range m.Components {
			st, err := c.Species.State(tempK, presPa)
			if err != nil {
				t.Fatal(err)
			}
			h += c.X * st.HJPerMol
			cp += c.X * st.CpJPerMolK
		}
		if !relClose(s.HJPerMol, h, 1e-12, 1e-9*rGas*tempK) || !relClose(s.CpJPerMolK, cp, 1e-12, 0) {
			t.Errorf("%s: H = %.12g, Cp = %.12g; want Σ xH = %.12g, Σ xCp = %.12g", blendName(m), s.HJPerMol, s.CpJPerMolK, h, cp)
		}
	}
}

// The per-species terms add up to the blend's figures, and the standard
// pressure option moves μ° but not μ.
func TestSpeciesTermsAndStdPressure(t *testing.T) {
	m := mustMixture(t, "SiH4 2%, H2 500ppm, N2 bal", 1e5)
	bar, err := m.State(500, 2e5, Options{})
	if err != nil {
		t.Fatal(err)
	}
	atm, err := m.State(500, 2e5, Options{Std: StdAtm})
	if err != nil {
		t.Fatal(err)
	}
	var sumS, sumCp, sumX, sumW, sumP float64
	for i, term := range bar.Species {
		sumS += term.SShareJPerMolK
		sumCp += term.CpShareJPerMolK
		sumX += term.X
		sumW += term.MassFrac
		sumP += term.PartialPresPa
		if d := term.MuJPerMol - atm.Species[i].MuJPerMol; math.Abs(d) > 1e-9*math.Abs(term.MuJPerMol) {
			t.Errorf("μ(%s) depends on P°: %g", term.Species.Formula, d)
		}
		// μ°(1 atm) − μ°(1 bar) = RT ln(101325/100000) (definition of μ°).
		want := rGas * 500 * math.Log(101325.0/1e5)
		if d := atm.Species[i].Mu0JPerMol - term.Mu0JPerMol; math.Abs(d-want) > 1e-6 {
			t.Errorf("μ°(%s) at 1 atm − at 1 bar = %.9g, want %.9g", term.Species.Formula, d, want)
		}
	}
	if atm.StdPresPa != model.StdPressureAtmPa || bar.StdPresPa != model.StdPressureBarPa {
		t.Errorf("StdPresPa = %g and %g", bar.StdPresPa, atm.StdPresPa)
	}
	for _, c := range []struct {
		name      string
		got, want float64
	}{
		{"Σ x S", sumS, bar.SJPerMolK}, {"Σ x Cp", sumCp, bar.CpJPerMolK},
		{"Σ x", sumX, 1}, {"Σ w", sumW, 1}, {"Σ pᵢ", sumP, 2e5},
	} {
		if !relClose(c.got, c.want, 1e-12, 0) {
			t.Errorf("%s = %.15g, want %.15g", c.name, c.got, c.want)
		}
	}
}

// Fill reuses the State's species slice, so that callers in a loop do not
// allocate, and gives the same result as State.
func TestFillReusesState(t *testing.T) {
	m := mustMixture(t, dryAir, 1e5)
	var s State
	m.Fill(&s, 300, 1e5, Options{})
	first := &s.Species[0]
	m.Fill(&s, 600, 2e5, Options{})
	if &s.Species[0] != first {
		t.Error("Fill allocated a new species slice")
	}
	want := mustState(t, m, 600, 2e5)
	if s.SJPerMolK != want.SJPerMolK || s.Species[3].MuJPerMol != want.Species[3].MuJPerMol {
		t.Error("Fill and State disagree")
	}
	if allocs := testing.AllocsPerRun(100, func() { m.Fill(&s, 450, 1e5, Options{}) }); allocs != 0 {
		t.Errorf("Fill allocates %g times per call, want 0", allocs)
	}
}

func TestStateErrors(t *testing.T) {
	m := mustMixture(t, dryAir, 1e5)
	cases := []struct {
		name          string
		tempK, presPa float64
		want          error
	}{
		{"zero K", 0, 1e5, model.ErrTemperature},
		{"negative K", -5, 1e5, model.ErrTemperature},
		{"NaN K", math.NaN(), 1e5, model.ErrTemperature},
		{"zero Pa", 300, 0, model.ErrPressure},
		{"infinite Pa", 300, math.Inf(1), model.ErrPressure},
		// At 1e-320 Pa every partial pressure is below the smallest
		// normal float: ln pᵢ would lose its digits, or be −Inf at 0.
		{"partial pressure underflows", 300, 1e-320, model.ErrPressure},
	}
	for _, c := range cases {
		if _, err := m.State(c.tempK, c.presPa, Options{}); !errors.Is(err, c.want) {
			t.Errorf("%s: State error %v, want %v", c.name, err, c.want)
		}
	}
}

// A Mixture made without NewMixture (a literal) computes the same states:
// ln xᵢ and the mixing entropy, which NewMixture keeps, are computed on
// the fly without writing to the shared Mixture.
func TestMixtureLiteralSameState(t *testing.T) {
	m := mustMixture(t, "SiH4 2%, H2 500ppm, N2 bal", 1e5)
	lit := &Mixture{Components: m.Components, MolarMassKgPerMol: m.MolarMassKgPerMol}
	want := mustState(t, m, 450, 2e5)
	got := mustState(t, lit, 450, 2e5)
	if !reflect.DeepEqual(got, want) {
		t.Errorf("a literal Mixture's state differs from NewMixture's")
	}
	if lit.lnX != nil {
		t.Errorf("Fill wrote to a literal Mixture")
	}
}
