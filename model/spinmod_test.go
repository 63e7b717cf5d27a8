package model

import (
	"math"
	"testing"
)

// TestSpinModificationNames: blend text reaches every named modification
// through Lookup, each with the molar mass and elements of its base gas.
func TestSpinModificationNames(t *testing.T) {
	for _, tt := range []struct {
		name, base string
		frozen     bool
		even       float64
	}{
		{"eH2", "H2", false, 0},
		{"nH2", "H2", true, 0.25},
		{"pH2", "H2", true, 1},
		{"eD2", "D2", false, 0},
		{"nD2", "D2", true, 2.0 / 3},
		{"oD2", "D2", true, 1},
	} {
		sp, ok := Builtin().Lookup(tt.name)
		if !ok {
			t.Errorf("Lookup(%q) found nothing", tt.name)
			continue
		}
		base := mustSpecies(t, tt.base)
		if sp.MolarMassKgPerMol != base.MolarMassKgPerMol {
			t.Errorf("%s molar mass %g, want %g", tt.name, sp.MolarMassKgPerMol, base.MolarMassKgPerMol)
		}
		if m := sp.SpinModificationOf(); m.Frozen != tt.frozen || m.EvenFraction != tt.even {
			t.Errorf("%s modification %+v, want frozen %v, even-J fraction %g", tt.name, m, tt.frozen, tt.even)
		}
		counts, err := ParseFormula(tt.name)
		if err != nil || len(counts) != 1 || counts[tt.base[:1]] != 2 {
			t.Errorf("ParseFormula(%q) = %v, %v; want two %s atoms", tt.name, counts, err, tt.base[:1])
		}
	}
	if _, err := ParseFormula("xH2"); err == nil {
		t.Errorf("ParseFormula(\"xH2\") accepted an unknown prefix")
	}
}

// TestSpinModificationLimits checks the modifications where the answer is
// known in closed form, and that each keeps the identities.
//   - Low T (T = Θ/20, only J = 0 and J = 1 populated): para H2 and ortho
//     D2 sit in J = 0, S_rot/R = ln(g/g_tot) (−ln 4 and −ln(3/2)), U_rot = 0;
//     normal H2 keeps its ortho quarter in J = 1: S_rot/R = ¾ ln 3, U_rot/RT
//     = ¾·2Θ/T (the conversion heat it still holds).
//   - High T (T = 2000 Θ): the normal gases meet the equilibrium ones
//     within (Θ/T)², and a pure modification lies R ln(g_tot/g) below.
//   - Below 300 K normal and equilibrium H2 differ plainly in Cp (the
//     issue's "up to 80 % in rotational Cp").
func TestSpinModificationLimits(t *testing.T) {
	st := func(name string, tempK float64) State {
		sp, ok := Builtin().Lookup(name)
		if !ok {
			t.Fatalf("no %s", name)
		}
		// The closed forms are those of the rigid rotor; the summed
		// levels have their own test, TestSpinModificationLevels.
		s, err := sp.StateWith(tempK, 1e5, Treatment{Levels: LevelsRigidHarmonic})
		if err != nil {
			t.Fatal(err)
		}
		return s
	}
	thH2 := mustSpecies(t, "H2").RotThetaK()[0]
	thD2 := mustSpecies(t, "D2").RotThetaK()[0]
	cold := []struct {
		name         string
		tempK        float64
		wantS, wantU float64
	}{
		{"pH2", thH2 / 20, -math.Log(4), 0},
		{"oD2", thD2 / 20, math.Log(6.0 / 9), 0},
		{"nH2", thH2 / 20, 0.75 * math.Log(3), 0.75 * 2 * 20},
	}
	for _, c := range cold {
		s := st(c.name, c.tempK)
		if math.Abs(s.Rot.S()-c.wantS) > 1e-6 || math.Abs(s.Rot.U-c.wantU) > 1e-6*max(1, c.wantU) {
			t.Errorf("%s at %.4g K: S_rot/R = %.8f, U_rot/RT = %.8f; want %.8f and %.8f", c.name, c.tempK, s.Rot.S(), s.Rot.U, c.wantS, c.wantU)
		}
	}
	for _, c := range []struct {
		name, eq string
		theta    float64
		offset   float64 // S_rot/R below the equilibrium gas
	}{
		{"nH2", "eH2", thH2, 0},
		{"pH2", "eH2", thH2, math.Log(4)},
		{"nD2", "eD2", thD2, 0},
		{"oD2", "eD2", thD2, math.Log(9.0 / 6)},
	} {
		tempK := 2000 * c.theta
		a, b := st(c.name, tempK), st(c.eq, tempK)
		y := c.theta / tempK
		if d := b.Rot.S() - a.Rot.S() - c.offset; math.Abs(d) > y*y {
			t.Errorf("%s − %s at %.4g K: S_rot/R differs by %.3g beyond ln(g_tot/g) = %.4f", c.name, c.eq, tempK, d, c.offset)
		}
		if d := a.Rot.Cv - b.Rot.Cv; math.Abs(d) > y*y {
			t.Errorf("%s − %s at %.4g K: Cv_rot/R differs by %.3g", c.name, c.eq, tempK, d)
		}
	}
	n, e := st("nH2", 100), st("eH2", 100)
	if r := n.Rot.Cv / e.Rot.Cv; r > 0.8 {
		t.Errorf("rotational Cv at 100 K: normal/equilibrium = %.3f; the frozen mixture should lie far below", r)
	}
	// Identities by central differences, as in TestThermodynamicIdentities.
	for _, name := range []string{"nH2", "pH2", "nD2", "oD2"} {
		for _, tempK := range []float64{5, 20, 77, 150, 300, 1000} {
			s, up, dn := st(name, tempK), st(name, tempK*(1+1e-4)), st(name, tempK*(1-1e-4))
			h := 1e-4 * tempK
			if d := (up.UJPerMol-dn.UJPerMol)/(2*h) - s.CvJPerMolK; math.Abs(d) > diffClose*s.CvJPerMolK+diffFloor {
				t.Errorf("%s at %g K: Cv − ∂U/∂T = %.3g", name, tempK, d)
			}
			if d := -(up.GJPerMol-dn.GJPerMol)/(2*h) - s.SJPerMolK; math.Abs(d) > diffClose*math.Abs(s.SJPerMolK)+diffFloor {
				t.Errorf("%s at %g K: S + ∂G/∂T = %.3g", name, tempK, d)
			}
		}
	}
}

// TestSpinModificationLevels checks the frozen modifications with the
// summed levels, where each sums its own rovibrational levels:
//   - at Θrot/20 para H2 and ortho D2 sit in J = 0 (S_rot/R = ln(g/g_tot)),
//     and normal H2 holds its ortho quarter in J = 1, whose energy is the
//     level sum's own E(0,1) (U_rot/RT = ¾ E/kT);
//   - at 2000 K, where Θrot/T = 0.04, normal and equilibrium H2 agree in
//     S and Cv within (Θrot/T)² (the high-T meeting of the rigid rotor);
//   - the identities hold by central differences at 5 K to 5000 K.
func TestSpinModificationLevels(t *testing.T) {
	st := func(name string, tempK float64) State {
		sp, ok := Builtin().Lookup(name)
		if !ok {
			t.Fatalf("no %s", name)
		}
		s, err := sp.StateWith(tempK, 1e5, summed)
		if err != nil {
			t.Fatal(err)
		}
		return s
	}
	h2 := mustSpecies(t, "nH2")
	// E(0,1) as the level sum has it (from the curve), and the lowest
	// level's height above the energy zero.
	e1K, shiftK := h2.levelList().modLowK[1], h2.levelList().zeroShiftK
	if e1K < 150 || e1K > 190 {
		t.Fatalf("nH2: lowest odd-N level at %g K, want E(0,1) ≈ 118.5 cm⁻¹ = 170.5 K", e1K)
	}
	thH2, thD2 := h2.RotThetaK()[0], mustSpecies(t, "D2").RotThetaK()[0]
	for _, c := range []struct {
		name         string
		tempK        float64
		wantS, wantU float64
	}{
		{"pH2", thH2 / 20, -math.Log(4), 0},
		{"oD2", thD2 / 20, math.Log(6.0 / 9), 0},
		{"nH2", thH2 / 20, 0.75 * math.Log(3), (0.75*e1K + shiftK) / (thH2 / 20)},
	} {
		s := st(c.name, c.tempK)
		if math.Abs(s.Rot.S()-c.wantS) > 1e-6*max(1, c.wantS) || math.Abs(s.Rot.U-c.wantU) > 1e-6*max(1, c.wantU) {
			t.Errorf("%s at %.4g K: S_rot/R = %.8f, U_rot/RT = %.8f; want %.8f and %.8f", c.name, c.tempK, s.Rot.S(), s.Rot.U, c.wantS, c.wantU)
		}
	}
	n, e := st("nH2", 2000), st("eH2", 2000)
	y := thH2 / 2000
	if dS := (n.SJPerMolK - e.SJPerMolK) / GasConstant; math.Abs(dS) > y*y {
		t.Errorf("nH2 − eH2 at 2000 K: S/R differs by %.3g, want within %.3g", dS, y*y)
	}
	if dCv := (n.CvJPerMolK - e.CvJPerMolK) / GasConstant; math.Abs(dCv) > y*y {
		t.Errorf("nH2 − eH2 at 2000 K: Cv/R differs by %.3g, want within %.3g", dCv, y*y)
	}
	for _, name := range []string{"nH2", "pH2", "nD2", "oD2"} {
		for _, tempK := range []float64{5, 20, 77, 150, 300, 1000, 5000} {
			s, up, dn := st(name, tempK), st(name, tempK*(1+1e-4)), st(name, tempK*(1-1e-4))
			h := 1e-4 * tempK
			if d := (up.UJPerMol-dn.UJPerMol)/(2*h) - s.CvJPerMolK; math.Abs(d) > diffClose*s.CvJPerMolK+diffFloor {
				t.Errorf("%s summed at %g K: Cv − ∂U/∂T = %.3g", name, tempK, d)
			}
			if d := -(up.GJPerMol-dn.GJPerMol)/(2*h) - s.SJPerMolK; math.Abs(d) > diffClose*math.Abs(s.SJPerMolK)+diffFloor {
				t.Errorf("%s summed at %g K: S + ∂G/∂T = %.3g", name, tempK, d)
			}
		}
	}
}
