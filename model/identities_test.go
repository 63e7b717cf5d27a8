package model

import (
	"math"
	"math/rand/v2"
	"slices"
	"testing"

	"gonum.org/v1/gonum/unit/constant"
)

// Tolerances of the identity checks. Identities that hold by the algebra
// of State must hold to rounding (close). Derivatives taken by central
// differences with a step of 1e-4·T carry a truncation error of order
// (1e-4)² and a rounding error of order 1e-16·|E0|/h, so they get
// diffClose, relative, plus diffFloor, absolute, in SI units.
const (
	close     = 1e-12
	diffClose = 1e-6
	diffFloor = 1e-6
)

// identityPoints draws seeded random states, log-uniform over 20–3000 K
// and 1 Pa–10 MPa.
func identityPoints(n int) [][2]float64 {
	rng := rand.New(rand.NewPCG(1, 1))
	pts := make([][2]float64, n)
	for i := range pts {
		tempK := 20 * math.Pow(3000.0/20, rng.Float64())
		presPa := math.Pow(10, 7*rng.Float64())
		pts[i] = [2]float64{tempK, presPa}
	}
	return pts
}

func mustState(tb testing.TB, sp *Species, tempK, presPa float64) State {
	tb.Helper()
	s, err := sp.State(tempK, presPa)
	if err != nil {
		tb.Fatalf("%s.State(%g K, %g Pa): %v", sp.Formula, tempK, presPa, err)
	}
	return s
}

// TestThermodynamicIdentities checks, for every catalogue species at seeded
// random states, the identities that tie the state functions together:
// Cp − Cv = R, H = U + RT, A = U − TS, G = H − TS = A + RT, and by central
// differences Cv = ∂U/∂T, Cp = (∂H/∂T)_P, S = −(∂A/∂T)_V, S = −(∂G/∂T)_P
// and (∂G/∂P)_T = RT/P (the ideal-gas law, from the partition function).
//
// They hold under every treatment a caller can choose, not only the
// default: each degree of freedom's model must be a consistent partition
// function on its own.
func TestThermodynamicIdentities(t *testing.T) {
	r := GasConstant
	treatments := []Treatment{
		{}, // the default: summed levels where the constants exist
		{Levels: LevelsRigidHarmonic},
		{Rotation: RotationClassical},
		{Rotation: RotationSummed},
		{Vibration: VibrationFrozen},
		{Electronic: ElectronicGroundOnly},
	}
	species := slices.Concat(Builtin().All(), Builtin().SpinModifications()) // and eH2, pH2, oD2 …
	for _, tr := range treatments {
		for _, sp := range species {
			identitiesOf(t, sp, tr, r)
		}
	}
}

// identitiesOf checks the identities of one species under one treatment.
func identitiesOf(t *testing.T, sp *Species, tr Treatment, r float64) {
	t.Helper()
	mustState := func(_ *testing.T, sp *Species, tempK, presPa float64) State {
		s, err := sp.StateWith(tempK, presPa, tr)
		if err != nil {
			t.Fatalf("%s.StateWith(%g K, %g Pa, %+v): %v", sp.Formula, tempK, presPa, tr, err)
		}
		return s
	}
	for _, pt := range identityPoints(12) {
		tempK, presPa := pt[0], pt[1]
		s := mustState(t, sp, tempK, presPa)
		scale := math.Abs(s.HJPerMol) + tempK*math.Abs(s.SJPerMolK) + r*tempK

		algebra := []struct {
			name      string
			got, want float64
			tol       float64
		}{
			{"Cp − Cv", s.CpJPerMolK - s.CvJPerMolK, r, close * r},
			{"H", s.HJPerMol, s.UJPerMol + r*tempK, close * scale},
			{"A", s.AJPerMol, s.UJPerMol - tempK*s.SJPerMolK, close * scale},
			{"G", s.GJPerMol, s.HJPerMol - tempK*s.SJPerMolK, close * scale},
			{"G − A", s.GJPerMol - s.AJPerMol, r * tempK, close * scale},
		}
		for _, c := range algebra {
			if math.Abs(c.got-c.want) > c.tol {
				t.Errorf("%s (%+v) at %.6g K, %.6g Pa: %s = %.12g, want %.12g", sp.Formula, tr, tempK, presPa, c.name, c.got, c.want)
			}
		}

		h := 1e-4 * tempK
		// Fixed P for U, H and G; fixed n/V (P ∝ T) for A.
		up, dn := mustState(t, sp, tempK+h, presPa), mustState(t, sp, tempK-h, presPa)
		upV := mustState(t, sp, tempK+h, presPa*(tempK+h)/tempK)
		dnV := mustState(t, sp, tempK-h, presPa*(tempK-h)/tempK)
		dp := 1e-4 * presPa
		upP, dnP := mustState(t, sp, tempK, presPa+dp), mustState(t, sp, tempK, presPa-dp)

		derivs := []struct {
			name      string
			got, want float64
		}{
			{"Cv = ∂U/∂T", (up.UJPerMol - dn.UJPerMol) / (2 * h), s.CvJPerMolK},
			{"Cp = (∂H/∂T)_P", (up.HJPerMol - dn.HJPerMol) / (2 * h), s.CpJPerMolK},
			{"S = −(∂A/∂T)_V", -(upV.AJPerMol - dnV.AJPerMol) / (2 * h), s.SJPerMolK},
			{"S = −(∂G/∂T)_P", -(up.GJPerMol - dn.GJPerMol) / (2 * h), s.SJPerMolK},
			{"(∂G/∂P)_T = RT/P", (upP.GJPerMol - dnP.GJPerMol) / (2 * dp), r * tempK / presPa},
		}
		for _, c := range derivs {
			if math.Abs(c.got-c.want) > diffClose*math.Abs(c.want)+diffFloor {
				t.Errorf("%s (%+v) at %.6g K, %.6g Pa: %s: difference quotient %.10g, want %.10g", sp.Formula, tr, tempK, presPa, c.name, c.got, c.want)
			}
		}
	}
}

// helmholtzTotal builds the Helmholtz energy of N molecules in V, in J,
// from the one-molecule partition function q1 = q_tr·q_int,
// A = N·E0/N_A − kT·[N ln q1 − ln N!], with ln N! exact (Lgamma). q_tr =
// (2π m kT/h²)^{3/2}·V is written out here with gonum's constants; the
// internal factors come from the State. With indistinguishable = false
// the 1/N! is left out, as for particles that could be told apart.
func helmholtzTotal(tb testing.TB, sp *Species, n, volM3, tempK float64, indistinguishable bool) float64 {
	tb.Helper()
	k := float64(constant.Boltzmann)
	h := float64(constant.Planck)
	m := sp.MolarMassKgPerMol / float64(constant.Avogadro)
	presPa := n * k * tempK / volM3
	s := mustState(tb, sp, tempK, presPa)
	lnQtr := 1.5*math.Log(2*math.Pi*m*k*tempK/(h*h)) + math.Log(volM3)
	lnQ1 := lnQtr + s.Rot.LnQ + s.Vib.LnQ + s.Elec.LnQ
	lnW := n * lnQ1
	if indistinguishable {
		lnFact, _ := math.Lgamma(n + 1)
		lnW -= lnFact
	}
	return n*sp.EnergyZeroJPerMol/float64(constant.Avogadro) - k*tempK*lnW
}

// TestHelmholtzExtensive checks that A is extensive: doubling N and V at
// fixed T doubles A, which needs the 1/N! of indistinguishable molecules
// (without it, A gains −2NkT ln 2 and the check must fail). It also checks
// that the molar A of State is the total A per mole.
func TestHelmholtzExtensive(t *testing.T) {
	const nMolecules, volM3 = 1e22, 1e-3
	avogadro := float64(constant.Avogadro)
	for _, sp := range Builtin().All() {
		for _, pt := range identityPoints(4) {
			tempK := pt[0]
			a1 := helmholtzTotal(t, sp, nMolecules, volM3, tempK, true)
			a2 := helmholtzTotal(t, sp, 2*nMolecules, 2*volM3, tempK, true)
			e0 := nMolecules * sp.EnergyZeroJPerMol / avogadro
			if d := relDiff(a2-2*e0, 2*(a1-e0)); d > 1e-12 {
				t.Errorf("%s at %.6g K: A(2N, 2V) − 2A(N, V) is %.3g of A, want 0 (A must be extensive)", sp.Formula, tempK, d)
			}
			d1 := helmholtzTotal(t, sp, nMolecules, volM3, tempK, false)
			d2 := helmholtzTotal(t, sp, 2*nMolecules, 2*volM3, tempK, false)
			if d := relDiff(d2-2*e0, 2*(d1-e0)); d < 1e-3 {
				t.Errorf("%s at %.6g K: without 1/N!, A(2N, 2V) − 2A(N, V) is only %.3g of A: the check cannot fail", sp.Formula, tempK, d)
			}
			s := mustState(t, sp, tempK, nMolecules*float64(constant.Boltzmann)*tempK/volM3)
			perMol := (a1 - e0) * avogadro / nMolecules
			if d := relDiff(s.AJPerMol-sp.EnergyZeroJPerMol, perMol); d > 1e-12 {
				t.Errorf("%s at %.6g K: molar A − E0 = %.12g, total A − E0 per mole = %.12g", sp.Formula, tempK, s.AJPerMol-sp.EnergyZeroJPerMol, perMol)
			}
		}
	}
}

// TestRotorSumMeetsSeries checks that the summed rigid-rotor levels and
// the Euler–Maclaurin series agree where Auto switches between them,
// T = 50 Θrot. The first term the series leaves out is y⁴/315 in ln q
// (y = Θ/T), 5e-10 at the switch.
func TestRotorSumMeetsSeries(t *testing.T) {
	for _, sp := range Builtin().All() {
		if sp.Rotor != Linear {
			continue
		}
		theta := sp.RotThetaK()[0]
		tempK := rotorSumLimit * theta
		sum, err := sp.StateWith(tempK*(1-1e-12), 1e5, Treatment{Rotation: RotationSummed})
		if err != nil {
			t.Fatal(err)
		}
		// The rigid rotor's own switch from sum to series; a species
		// with Dunham constants sums its levels by default instead.
		auto, err := sp.StateWith(tempK*(1+1e-12), 1e5, Treatment{Levels: LevelsRigidHarmonic})
		if err != nil {
			t.Fatal(err)
		}
		if sp.Validity(tempK*(1+1e-12), 1e5).RotorSummed {
			t.Fatalf("%s: Auto still sums the rotor above 50 Θrot", sp.Formula)
		}
		checks := []struct {
			name           string
			summed, series float64
			tol            float64
		}{
			{"ln q", sum.Rot.LnQ, auto.Rot.LnQ, 1e-9},
			{"U/RT", sum.Rot.U, auto.Rot.U, 5e-9},
			{"Cv/R", sum.Rot.Cv, auto.Rot.Cv, 1e-8},
		}
		for _, c := range checks {
			if math.Abs(c.summed-c.series) > c.tol {
				t.Errorf("%s at 50 Θrot = %.4g K: rotor %s summed %.12g, series %.12g, want within %g", sp.Formula, tempK, c.name, c.summed, c.series, c.tol)
			}
		}
	}
}

// TestTreatmentsAgreeInTheirLimits checks that each simpler treatment is
// the limit of the full one: the classical rotor at T ≫ Θrot (its ln q
// misses y/3 at first order, its S and Cv only at second order), frozen
// vibrations at T ≪ Θvib, and the ground electronic level at
// T ≪ ΔE/k; and that each differs where it should.
func TestTreatmentsAgreeInTheirLimits(t *testing.T) {
	state := func(sp *Species, tempK float64, tr Treatment) State {
		t.Helper()
		s, err := sp.StateWith(tempK, 1e5, tr)
		if err != nil {
			t.Fatal(err)
		}
		return s
	}
	for _, sp := range Builtin().All() {
		if sp.Rotor == Linear {
			theta := sp.RotThetaK()[0]
			tempK := min(1000*theta, MaxTempK)
			y := theta / tempK
			sum := state(sp, tempK, Treatment{Rotation: RotationSummed})
			cl := state(sp, tempK, Treatment{Rotation: RotationClassical})
			if d := sum.Rot.LnQ - cl.Rot.LnQ - y/3; math.Abs(d) > y*y {
				t.Errorf("%s at %.4g K: summed − classical ln q_rot = %.6g, want Θ/3T = %.6g ± (Θ/T)²", sp.Formula, tempK, sum.Rot.LnQ-cl.Rot.LnQ, y/3)
			}
			if d := sum.Rot.S() - cl.Rot.S(); math.Abs(d) > y*y {
				t.Errorf("%s at %.4g K: summed − classical S_rot/R = %.3g, want within (Θ/T)²", sp.Formula, tempK, d)
			}
			if d := sum.Rot.Cv - cl.Rot.Cv; math.Abs(d) > y*y {
				t.Errorf("%s at %.4g K: summed − classical Cv_rot/R = %.3g, want within (Θ/T)²", sp.Formula, tempK, d)
			}
			// Near Θrot the classical rotor is plainly wrong.
			lo := max(theta, MinTempK)
			if d := state(sp, lo, Treatment{Rotation: RotationSummed}).Rot.U - state(sp, lo, Treatment{Rotation: RotationClassical}).Rot.U; math.Abs(d) < 0.05 {
				t.Errorf("%s at Θrot: summed and classical rotor U/RT differ by only %.3g", sp.Formula, d)
			}
		}
		if th := sp.VibThetaK(); len(th) > 0 {
			lowest := th[0]
			for _, x := range th {
				lowest = min(lowest, x)
			}
			cold := lowest / 40 // e^{−40} ≈ 4e-18
			harm := state(sp, cold, Treatment{})
			frozen := state(sp, cold, Treatment{Vibration: VibrationFrozen})
			// A ladder's ground doublet (NH3's inversion, 0.79 cm⁻¹) is
			// split far below any fundamental and stays populated: at
			// x = Θsplit/T it adds S/R = ln(½(1 + e^{−x})) + x/(e^{x} + 1).
			for _, l := range sp.Ladders {
				x := WavenumberToKelvin(l.LevelsCm[1]) / cold
				frozen.SJPerMolK += GasConstant * (math.Log((1+math.Exp(-x))/2) + x/(math.Exp(x)+1))
			}
			if d := relDiff(frozen.SJPerMolK, harm.SJPerMolK); d > 1e-12 && math.Abs(frozen.SJPerMolK-harm.SJPerMolK) > 1e-12 {
				t.Errorf("%s at %.4g K: frozen and harmonic S differ by %.3g", sp.Formula, cold, d)
			}
			hot := 2 * lowest
			if d := state(sp, hot, Treatment{}).CvJPerMolK - state(sp, hot, Treatment{Vibration: VibrationFrozen}).CvJPerMolK; d < 0.5*GasConstant {
				t.Errorf("%s at %.4g K: harmonic vibrations add only %.3g J/(mol·K) to Cv", sp.Formula, hot, d)
			}
		}
		if th := sp.ElecThetaK(); len(th) > 1 {
			cold := th[1] / 40
			lev := state(sp, cold, Treatment{})
			gnd := state(sp, cold, Treatment{Electronic: ElectronicGroundOnly})
			if d := lev.SJPerMolK - gnd.SJPerMolK; math.Abs(d) > 1e-12*lev.SJPerMolK+1e-12 {
				t.Errorf("%s at %.4g K: all levels and ground level only S differ by %.3g", sp.Formula, cold, d)
			}
		}
	}
}

// TestSackurTetrode checks S of argon at 298.15 K and 1 bar against the
// Sackur-Tetrode formula written out here with gonum's CODATA 2018
// constants, S = R[ln((2π m kT/h²)^{3/2} kT/P) + 5/2], with m the IUPAC
// standard atomic weight of Ar (39.95, from memory) in atomic mass units.
func TestSackurTetrode(t *testing.T) {
	k := float64(constant.Boltzmann)
	h := float64(constant.Planck)
	r := float64(constant.Avogadro) * k
	m := 39.95 * float64(constant.AtomicMass)
	const tempK, presPa = 298.15, 1e5
	nQ := math.Pow(2*math.Pi*m*k*tempK/(h*h), 1.5)
	want := r * (math.Log(nQ*k*tempK/presPa) + 2.5)

	s := mustState(t, mustSpecies(t, "Ar"), tempK, presPa)
	// The molar mass unit differs from 1 g/mol by 3.5e-10 since 2019.
	if math.Abs(s.SJPerMolK-want) > 1e-6 {
		t.Errorf("S(Ar, 298.15 K, 1 bar) = %.9f, Sackur-Tetrode gives %.9f", s.SJPerMolK, want)
	}
	if math.Abs(want-154.846) > 0.01 {
		t.Errorf("Sackur-Tetrode S(Ar) = %.4f, want 154.846 ± 0.01 (CODATA 1989, from memory)", want)
	}
}

// TestStandardPressure checks that the 1 atm tables differ from the 1 bar
// ones only in S° (and so in −[G°−H°(298.15)]/T), by R ln(101325/100000).
func TestStandardPressure(t *testing.T) {
	shift := GasConstant * math.Log(StdPressureAtmPa/StdPressureBarPa)
	for _, f := range []string{"Ar", "N2", "H2O", "SF6"} {
		sp := mustSpecies(t, f)
		for _, tempK := range []float64{100, RefTempK, 1000} {
			bar, err := sp.Table(tempK, StdPressureBarPa, Treatment{})
			if err != nil {
				t.Fatal(err)
			}
			atm, _ := sp.Table(tempK, StdPressureAtmPa, Treatment{})
			if d := bar.SJPerMolK - atm.SJPerMolK; math.Abs(d-shift) > 1e-9 {
				t.Errorf("%s at %g K: S°(bar) − S°(atm) = %.12g, want R ln(1.01325) = %.12g", f, tempK, d, shift)
			}
			if d := bar.GefJPerMolK - atm.GefJPerMolK; math.Abs(d-shift) > 1e-9 {
				t.Errorf("%s at %g K: gef(bar) − gef(atm) = %.12g, want %.12g", f, tempK, d, shift)
			}
			if bar.CpJPerMolK != atm.CpJPerMolK || math.Abs(bar.HIncJPerMol-atm.HIncJPerMol) > 1e-9 {
				t.Errorf("%s at %g K: Cp° or H°−H°(298.15) depend on the standard pressure", f, tempK)
			}
		}
	}
}

// The four factor shares of S and Cp add up to the species' totals, and
// translation carries 5R/2 of Cp (3R/2 of motion plus R of P dV work).
func TestBreakdownSums(t *testing.T) {
	for _, sp := range Builtin().All() {
		for _, tempK := range []float64{50, 298.15, 1500} {
			st, err := sp.State(tempK, 1e5)
			if err != nil {
				t.Fatal(err)
			}
			var sumS, sumCp float64
			for _, f := range st.Breakdown() {
				sumS += f.SJPerMolK
				sumCp += f.CpJPerMolK
			}
			if math.Abs(sumS-st.SJPerMolK) > 1e-9*math.Abs(st.SJPerMolK) || math.Abs(sumCp-st.CpJPerMolK) > 1e-9*st.CpJPerMolK {
				t.Errorf("%s at %g K: shares sum to S %g, Cp %g; want %g, %g", sp.Formula, tempK, sumS, sumCp, st.SJPerMolK, st.CpJPerMolK)
			}
			if tr := st.Breakdown()[0]; math.Abs(tr.CpJPerMolK-2.5*GasConstant) > 1e-9 {
				t.Errorf("%s: translational Cp %g, want 5R/2", sp.Formula, tr.CpJPerMolK)
			}
		}
	}
}

// TestRotorRecurrenceMatchesDirectSum checks the summed rotor, whose
// Boltzmann factors come by recurrence, against the levels summed here
// one exp at a time, E_J = kΘ J(J+1), for every linear species from
// Θ/10 to 50 Θ (the range where Auto sums) and, with RotationSummed, far
// above it. The direct sum is the definition, so the tolerance is the
// rounding the recurrence may add.
func TestRotorRecurrenceMatchesDirectSum(t *testing.T) {
	const close = 1e-11
	for _, sp := range Builtin().All() {
		if sp.Rotor != Linear {
			continue
		}
		theta := sp.RotThetaK()[0]
		for _, tOverTheta := range []float64{0.1, 0.5, 1, 3, 10, 30, 49.9, 200, 2000} {
			tempK := tOverTheta * theta
			if tempK < MinTempK || tempK > MaxTempK {
				continue
			}
			got, err := sp.StateWith(tempK, 1e5, Treatment{Rotation: RotationSummed})
			if err != nil {
				t.Fatal(err)
			}
			want := directRotorSum(sp, tempK)
			for _, c := range []struct {
				name      string
				got, want float64
			}{
				{"ln q", got.Rot.LnQ, want.LnQ},
				{"U/RT", got.Rot.U, want.U},
				{"Cv/R", got.Rot.Cv, want.Cv},
			} {
				if math.Abs(c.got-c.want) > close*max(1, math.Abs(c.want)) {
					t.Errorf("%s at %.4g K (%g Θ): rotor %s = %.15g, direct sum %.15g", sp.Formula, tempK, tOverTheta, c.name, c.got, c.want)
				}
			}
		}
	}
}

// directRotorSum sums the rigid-rotor levels with one exp a level, with
// the spin weights of a homonuclear molecule or 1/σ, and takes the moments
// of the energy for U and Cv. Levels up to 200 kT are summed.
func directRotorSum(sp *Species, tempK float64) Terms {
	if sp.SpinMod.Frozen {
		return directFrozenRotorSum(sp, tempK)
	}
	theta := sp.RotThetaK()[0]
	weight := func(j int) float64 { return 1 / float64(sp.Symmetry) }
	if sp.Homonuclear() {
		norm := sp.SpinWeights[0] + sp.SpinWeights[1]
		weight = func(j int) float64 { return sp.SpinWeights[j%2] / norm }
	}
	// The lowest allowed level sets a shift, so that e^{−x} cannot
	// underflow at low T; it is put back in ln q and U.
	shift := math.Inf(1)
	for j := 0; j < 2; j++ {
		if weight(j) > 0 {
			shift = min(shift, float64(j*(j+1))*theta/tempK)
		}
	}
	var z, m1, m2 float64
	for j := 0; ; j++ {
		x := float64(j*(j+1)) * theta / tempK
		if x-shift > 200 {
			break
		}
		tm := weight(j) * float64(2*j+1) * math.Exp(-(x - shift))
		z += tm
		m1 += tm * x
		m2 += tm * x * x
	}
	mean := m1 / z
	return Terms{LnQ: math.Log(z) - shift, U: mean, Cv: m2/z - mean*mean}
}

// directFrozenRotorSum is the rotor of a frozen mixture of spin
// modifications, the ideal mixture of the even-J and odd-J gases with
// mole fractions x_i and spin weights g_i, written out level by level:
// ln q = Σ x_i ln(g_i q_i/(g_tot x_i)), U = Σ x_i U_i, Cv = Σ x_i Cv_i.
func directFrozenRotorSum(sp *Species, tempK float64) Terms {
	theta := sp.RotThetaK()[0]
	gTot := sp.SpinWeights[0] + sp.SpinWeights[1]
	var out Terms
	for parity := 0; parity < 2; parity++ {
		x := sp.SpinMod.EvenFraction
		if parity == 1 {
			x = 1 - x
		}
		if x == 0 {
			continue
		}
		shift := float64(parity*(parity+1)) * theta / tempK
		var z, m1, m2 float64
		for j := parity; ; j += 2 {
			e := float64(j*(j+1)) * theta / tempK
			if e-shift > 200 {
				break
			}
			tm := float64(2*j+1) * math.Exp(-(e - shift))
			z += tm
			m1 += tm * e
			m2 += tm * e * e
		}
		mean := m1 / z
		out.LnQ += x * (math.Log(z) - shift + math.Log(sp.SpinWeights[parity]/(gTot*x)))
		out.U += x * mean
		out.Cv += x * (m2/z - mean*mean)
	}
	return out
}

// TestRotorSeriesIsLnF checks the Taylor coefficients of linearRotorSeries
// against ln f, f = 1 + y/3 + y²/15 + 4y³/315, taken here with math.Log,
// and U and Cv against the closed forms U = 1 − y f′/f and
// Cv = U + y f′/f + y² f″/f − (y f′/f)², over the y = Θ/T where Auto uses
// the series.
func TestRotorSeriesIsLnF(t *testing.T) {
	const veryclose = 4e-16
	for _, y := range []float64{1e-8, 1e-4, 1e-3, 5e-3, 0.01, 0.015, 0.02} {
		f := 1 + y/3 + y*y/15 + 4*y*y*y/315
		yf1 := y/3 + 2*y*y/15 + 12*y*y*y/315
		y2f2 := 2*y*y/15 + 24*y*y*y/315
		g1 := yf1 / f
		want := Terms{LnQ: math.Log(f), U: 1 - g1}
		want.Cv = want.U + g1 + y2f2/f - g1*g1
		got := linearRotorSeries(0, y, 0)
		for _, c := range []struct {
			name      string
			got, want float64
		}{{"ln f", got.LnQ, want.LnQ}, {"U", got.U, want.U}, {"Cv", got.Cv, want.Cv}} {
			if math.Abs(c.got-c.want) > veryclose*max(1, math.Abs(c.want)) {
				t.Errorf("series at y = %g: %s = %.17g, closed form %.17g", y, c.name, c.got, c.want)
			}
		}
	}
}
