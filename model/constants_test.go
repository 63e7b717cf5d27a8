package model

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/unit/constant"
)

func TestGasConstant(t *testing.T) {
	// R = N_A·k, both exact in the 2019 SI (gonum unit/constant, CODATA
	// 2018), so R is exact too.
	if want := float64(constant.Avogadro) * float64(constant.Boltzmann); GasConstant != want {
		t.Errorf("GasConstant = %.15g, want N_A·k = %.15g", GasConstant, want)
	}
	// CODATA 2018: R = 8.314 462 618… J/(mol·K), from memory.
	if math.Abs(GasConstant-8.314462618) > 1e-9 {
		t.Errorf("GasConstant = %.12g, want 8.314462618…", GasConstant)
	}
}

func TestWavenumberToKelvin(t *testing.T) {
	// The second radiation constant c2 = hc/k = 1.438 776 877 cm·K
	// (CODATA 2018, exact in the 2019 SI; value from memory).
	if got := WavenumberToKelvin(1); relDiff(got, 1.438776877) > 1e-9 {
		t.Errorf("WavenumberToKelvin(1 cm⁻¹) = %.12g K, want c2 = 1.438776877 K", got)
	}
}

func TestStandardPressures(t *testing.T) {
	// IUPAC standard pressure 1 bar = 10⁵ Pa; 1 atm = 101 325 Pa by
	// definition.
	if StdPressureBarPa != 1e5 || StdPressureAtmPa != 101325 {
		t.Errorf("standard pressures %v Pa and %v Pa, want 1e5 and 101325", StdPressureBarPa, StdPressureAtmPa)
	}
}
