package model

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// asymmetricTopSum sums the rigid asymmetric top's levels, every level
// with weight 1 (no symmetry number, no spin weights), and returns ln q
// and U/kT. The Hamiltonian A Ja² + B Jb² + C Jc² (cm⁻¹) is taken in the
// symmetric-top basis |J K⟩ quantised along a:
//
//	⟨J K|H|J K⟩   = ½(B+C)[J(J+1) − K²] + A K²
//	⟨J K±2|H|J K⟩ = ¼(B−C) √{[J(J+1) − K(K±1)][J(J+1) − (K±1)(K±2)]}
//
// and each J block is diagonalised; every level is (2J+1)-fold
// degenerate in M.
func asymmetricTopSum(t *testing.T, aCm, bCm, cCm, tempK float64, maxJ int) (lnQ, u float64) {
	t.Helper()
	invKT := WavenumberToKelvin(1) / tempK // cm⁻¹ → E/kT
	var z, m1 float64
	var eig mat.EigenSym
	for j := 0; j <= maxJ; j++ {
		n := 2*j + 1
		jj := float64(j * (j + 1))
		h := mat.NewSymDense(n, nil)
		for i := 0; i < n; i++ {
			k := float64(i - j)
			h.SetSym(i, i, 0.5*(bCm+cCm)*(jj-k*k)+aCm*k*k)
			if i+2 < n {
				h.SetSym(i, i+2, 0.25*(bCm-cCm)*math.Sqrt((jj-k*(k+1))*(jj-(k+1)*(k+2))))
			}
		}
		if !eig.Factorize(h, false) {
			t.Fatalf("J = %d: eigenvalues did not converge", j)
		}
		for _, e := range eig.Values(nil) {
			x := e * invKT
			w := float64(n) * math.Exp(-x)
			z += w
			m1 += w * x
		}
	}
	return math.Log(z), m1 / z
}

// TestRotorQuantumCorrection checks the nonlinear rotor's terms against
// an exact sum over the rigid top's levels: the classical rotor with the
// Stripp–Kirkwood correction must agree with the sum to second order in
// Θ/T, and much better than the classical rotor alone. The rotational
// constants are the catalogue's; the sum is this test's own.
func TestRotorQuantumCorrection(t *testing.T) {
	cases := []struct {
		formula string
		tempK   float64
		tol     float64 // on ln q and on U/kT
	}{
		// Asymmetric top, ΘA = 40 K: the residual is of order (Θ/T)²/100.
		{"H2O", 298.15, 4e-4},
		{"H2O", 100, 3e-3},
		{"NH3", 298.15, 1e-4}, // oblate symmetric top
		// Spherical top: q = q_classical·e^{Θ/4T} up to terms that vanish
		// faster than any power of Θ/T.
		{"CH4", 298.15, 1e-9},
		{"CH4", 50, 1e-9},
	}
	for _, c := range cases {
		sp := mustSpecies(t, c.formula)
		r := sp.RotConstPerCm
		lnQ, u := asymmetricTopSum(t, r[0], r[1], r[2], c.tempK, 60)
		lnSigma := math.Log(float64(sp.Symmetry))
		got := sp.rigidBodyRotor(math.Log(c.tempK), 1/c.tempK, RotationAuto)
		cl := sp.rigidBodyRotor(math.Log(c.tempK), 1/c.tempK, RotationClassical)
		dq, du := got.LnQ+lnSigma-lnQ, got.U-u
		dqc, duc := cl.LnQ+lnSigma-lnQ, cl.U-u
		t.Logf("%-4s %6.1f K: ln q %+.2e (classical %+.2e), U/kT %+.2e (classical %+.2e)", c.formula, c.tempK, dq, dqc, du, duc)
		if math.Abs(dq) > c.tol || math.Abs(du) > c.tol {
			t.Errorf("%s at %g K: ln q off by %.2e, U/kT by %.2e from the level sum; want within %.0e", c.formula, c.tempK, dq, du, c.tol)
		}
		if math.Abs(dq) > math.Abs(dqc)/5 || math.Abs(du) > math.Abs(duc)/5 {
			t.Errorf("%s at %g K: the correction does not improve on the classical rotor fivefold (ln q %.2e vs %.2e, U %.2e vs %.2e)", c.formula, c.tempK, dq, dqc, du, duc)
		}
	}
}
