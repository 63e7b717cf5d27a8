package model

import (
	"math"
	"testing"
)

// TestFabGasMolarMasses: the molar masses of the species added for issue
// 10 §5, computed by the catalogue from their formulas, against the sums
// of the IUPAC standard atomic weights (CIAAW 2021, abridged values, from
// memory) done by hand.
func TestFabGasMolarMasses(t *testing.T) {
	for _, tt := range []struct {
		formula string
		gPerMol float64
		sum     string
	}{
		{"B2H6", 27.668, "2 × 10.81 + 6 × 1.008"},
		{"GeH4", 76.662, "72.630 + 4 × 1.008"},
		{"WF6", 297.830419, "183.84 + 6 × 18.998403162"},
		{"SiH2Cl2", 101.001, "28.085 + 2 × 1.008 + 2 × 35.45"},
		{"n-C4H10", 58.124, "4 × 12.011 + 10 × 1.008"},
		{"i-C4H10", 58.124, "4 × 12.011 + 10 × 1.008"},
	} {
		sp := mustSpecies(t, tt.formula)
		if got := sp.MolarMassKgPerMol * 1000; math.Abs(got-tt.gPerMol) > 1e-6 {
			t.Errorf("%s: M = %.6f g/mol, want %.6f (%s)", tt.formula, got, tt.gPerMol, tt.sum)
		}
	}
}

// TestFabGasLevels: the structural facts the catalogue gives the new
// species, each a rule rather than a measurement: the symmetry number of
// the point group, a singlet ground state, and 3N − 6 modes.
func TestFabGasLevels(t *testing.T) {
	for _, tt := range []struct {
		formula string
		sigma   int
		atoms   int
	}{
		{"B2H6", 4, 8},     // D2h
		{"GeH4", 12, 5},    // Td
		{"WF6", 24, 7},     // Oh
		{"SiH2Cl2", 2, 5},  // C2v
		{"n-C4H10", 2, 14}, // C2h, the anti conformer
		{"i-C4H10", 3, 14}, // C3v
	} {
		sp := mustSpecies(t, tt.formula)
		modes := 0
		for _, v := range sp.Vib {
			modes += v.Degeneracy
		}
		if sp.Symmetry != tt.sigma || modes != 3*tt.atoms-6 {
			t.Errorf("%s: σ %d, %d modes; want %d, %d", tt.formula, sp.Symmetry, modes, tt.sigma, 3*tt.atoms-6)
		}
		if len(sp.Elec) != 1 || sp.Elec[0].Degeneracy != 1 {
			t.Errorf("%s: electronic levels %v, want a singlet ground level only", tt.formula, sp.Elec)
		}
	}
}
