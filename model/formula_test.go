package model

import (
	"maps"
	"math"
	"strings"
	"testing"
)

// TestMolarMass checks molar masses summed from the formula against the
// values that follow from the IUPAC standard atomic weights (CIAAW 2021
// abridged table), quoted to the digits of the usual references; all from
// memory.
func TestMolarMass(t *testing.T) {
	tests := []struct {
		formula string
		want    float64 // g/mol
		tol     float64
	}{
		{"CO2", 44.009, 0.001},    // IUPAC, from memory
		{"SF6", 146.05, 0.01},     // IUPAC, from memory
		{"H2O", 18.015, 0.001},    // IUPAC, from memory
		{"N2", 28.014, 0.001},     // IUPAC, from memory
		{"O2", 31.998, 0.001},     // IUPAC, from memory
		{"Ar", 39.95, 0.002},      // IUPAC 2021 conventional value, from memory
		{"CH4", 16.043, 0.001},    // IUPAC, from memory
		{"NH3", 17.031, 0.001},    // IUPAC, from memory
		{"SiH4", 32.117, 0.001},   // IUPAC, from memory
		{"HCl", 36.46, 0.01},      // IUPAC, from memory
		{"C3H8", 44.097, 0.002},   // IUPAC, from memory
		{"NF3", 71.002, 0.001},    // IUPAC, from memory
		{"WF6", 297.83, 0.01},     // IUPAC, from memory
		{"CH3CH3", 30.069, 0.002}, // ethane written as groups, IUPAC, from memory
	}
	for _, tt := range tests {
		got, err := MolarMassKgPerMol(tt.formula)
		if err != nil {
			t.Errorf("MolarMassKgPerMol(%q): %v", tt.formula, err)
			continue
		}
		if math.Abs(got*1000-tt.want) > tt.tol {
			t.Errorf("MolarMassKgPerMol(%q) = %.5f g/mol, want %.4f ± %g", tt.formula, got*1000, tt.want, tt.tol)
		}
	}
}

func TestParseFormula(t *testing.T) {
	tests := []struct {
		formula string
		want    map[string]int
	}{
		{"N2", map[string]int{"N": 2}},
		{"SiH4", map[string]int{"Si": 1, "H": 4}},
		{"CH3CH3", map[string]int{"C": 2, "H": 6}},
		{"D2", map[string]int{"D": 2}},
		{"C10H22", map[string]int{"C": 10, "H": 22}},
	}
	for _, tt := range tests {
		got, err := ParseFormula(tt.formula)
		if err != nil || !maps.Equal(got, tt.want) {
			t.Errorf("ParseFormula(%q) = %v, %v; want %v", tt.formula, got, err, tt.want)
		}
	}
}

func TestParseFormulaErrors(t *testing.T) {
	tests := []struct {
		formula string
		want    string // in the message
	}{
		{"", "empty formula"},
		{"co2", `unexpected 'c' at position 1`},
		{"2H2", `unexpected '2' at position 1`},
		{"H2O!", `unexpected '!' at position 4`},
		{"N 2", `unexpected ' ' at position 2`},
		{"Xx2", `unknown element "Xx"`},
		{"C0", `bad count "0" for C`},
		{"C1001", `bad count "1001" for C`},
	}
	for _, tt := range tests {
		_, err := ParseFormula(tt.formula)
		if err == nil {
			t.Errorf("ParseFormula(%q) succeeded, want an error", tt.formula)
			continue
		}
		msg := err.Error()
		if !strings.Contains(msg, tt.want) || !strings.HasPrefix(msg, "model: ") || strings.Contains(msg, "\n") {
			t.Errorf("ParseFormula(%q) error %q, want one line containing %q", tt.formula, msg, tt.want)
		}
		if _, err := MolarMassKgPerMol(tt.formula); err == nil {
			t.Errorf("MolarMassKgPerMol(%q) succeeded, want an error", tt.formula)
		}
	}
}
