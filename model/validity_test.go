package model

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/unit/constant"
)

// TestDegeneracyHelium checks n/nQ of helium at 1 bar against the
// quantum concentration written out with gonum's constants and the IUPAC
// atomic weight of He (4.002602, from memory): about 0.15 at 4 K, where
// classical statistics fails, and about 3e-6 at 300 K, where it holds. n/nQ
// goes as P/T^{5/2}, so the two differ by (300/4)^{5/2}.
func TestDegeneracyHelium(t *testing.T) {
	k := float64(constant.Boltzmann)
	h := float64(constant.Planck)
	m := 4.002602 * float64(constant.AtomicMass)
	want := func(tempK, presPa float64) float64 {
		return presPa / (k * tempK) / math.Pow(2*math.Pi*m*k*tempK/(h*h), 1.5)
	}
	he := mustSpecies(t, "He")
	tests := []struct {
		tempK    float64
		severity Severity
	}{
		{4, Invalid},
		{300, Info},
	}
	for _, tt := range tests {
		v := he.Validity(tt.tempK, 1e5)
		if w := want(tt.tempK, 1e5); relDiff(v.Degeneracy, w) > 1e-9 {
			t.Errorf("He n/nQ at %g K, 1 bar = %.6g, want %.6g", tt.tempK, v.Degeneracy, w)
		}
		notes := v.Notes(he)
		if len(notes) == 0 || notes[0].Severity != tt.severity || !strings.Contains(notes[0].Text, "n/nQ") {
			t.Errorf("He at %g K: first note %+v, want a %v note on n/nQ", tt.tempK, notes, tt.severity)
		}
	}
	cold, warm := he.Validity(4, 1e5).Degeneracy, he.Validity(300, 1e5).Degeneracy
	if d := relDiff(cold/warm, math.Pow(75, 2.5)); d > 1e-12 {
		t.Errorf("He n/nQ(4 K)/n/nQ(300 K) = %.10g, want 75^2.5 = %.10g", cold/warm, math.Pow(75, 2.5))
	}
	if cold < 0.1 || cold > 0.2 || warm > 1e-5 {
		t.Errorf("He n/nQ = %.3g at 4 K and %.3g at 300 K, want about 0.15 and 3e-6", cold, warm)
	}
}

// TestValidityNotes checks the plain-word notes at states chosen to trip
// each one. Boiling points are the catalogue's (CRC, from memory).
func TestValidityNotes(t *testing.T) {
	tests := []struct {
		name          string
		formula       string
		tempK, presPa float64
		severity      Severity
		text          string // in the note's text
	}{
		// Trouton's rule puts N2's vapour pressure at 70 K near 0.33 atm
		// (the measured value is about 0.38 bar, from memory): 1 atm condenses.
		{"above the vapour pressure", "N2", 70, 101325, Invalid, "it would condense"},
		{"near the vapour pressure", "N2", 70, 25e3, Caution, "may condense it"},
		{"below Tb at a low partial pressure", "N2", 70, 1e3, Info, "below the normal boiling point, but"},
		{"near the boiling point", "N2", 100, 101325, Caution, "within 1.5× the boiling point"},
		{"near Tb but dilute", "N2", 100, 1e3, Info, "far from condensing"},
		// Water vapour at 2 kPa and 25 °C (about 60 % relative humidity)
		// is a gas, although 25 °C is below the boiling point.
		{"humid air's water", "H2O", 298.15, 2e3, Info, "below the normal boiling point, but"},
		{"rotor summed", "N2", 100, 101325, Info, "rotor levels summed"},
		{"rotor classical", "N2", 300, 101325, Info, "rotation fully classical"},
		{"nonlinear rotor near Θrot", "H2O", 150, 100, Caution, "classical rotor is rough"},
		{"nonlinear rotor", "CH4", 300, 101325, Info, "rotation classical, with its first quantum correction"},
		{"vibrations frozen", "N2", 300, 101325, Info, "vibrations frozen out"},
		{"vibrations partly excited", "CO2", 300, 101325, Info, "vibrations partly excited"},
		{"anharmonic drift", "CH4", 3000, 101325, Caution, "harmonic vibration drifts"},
		{"anharmonic levels summed", "CO2", 3000, 101325, Info, "summed over their anharmonic levels"},
		{"diatomic levels summed", "N2", 6000, 101325, Info, "summed over their anharmonic levels"},
		{"quantum corrections", "H2", 20.5, 101325, Caution, "quantum corrections may matter"},
	}
	for _, tt := range tests {
		sp := mustSpecies(t, tt.formula)
		found := false
		for _, n := range sp.Validity(tt.tempK, tt.presPa).Notes(sp) {
			if strings.Contains(n.Text, tt.text) {
				found = true
				if n.Severity != tt.severity {
					t.Errorf("%s: %s at %g K: note %q is %v, want %v", tt.name, tt.formula, tt.tempK, n.Text, n.Severity, tt.severity)
				}
			}
		}
		if !found {
			t.Errorf("%s: %s at %g K, %g Pa: no note containing %q", tt.name, tt.formula, tt.tempK, tt.presPa, tt.text)
		}
	}
}

// TestValidityQuiet: a plain room-temperature state of a permanent gas
// draws no caution (SF6 would: 298 K is within 1.5× its sublimation
// point), and
// species without a boiling point or a rotor get no notes about them.
func TestValidityQuiet(t *testing.T) {
	for _, f := range []string{"N2", "Ar", "CO2", "He"} {
		sp := mustSpecies(t, f)
		for _, n := range sp.Validity(RefTempK, StdPressureBarPa).Notes(sp) {
			if n.Severity != Info {
				t.Errorf("%s at 298.15 K, 1 bar: note %q is %v, want only info", f, n.Text, n.Severity)
			}
		}
	}
	o := mustSpecies(t, "O")
	v := o.Validity(1000, 1e5)
	if v.TOverThetaRot != 0 || v.TOverThetaVib != 0 || v.TOverBoiling != 0 || v.RotorSummed {
		t.Errorf("O atom validity %+v: want no rotor, vibration or boiling figures", v)
	}
	if notes := v.Notes(o); len(notes) != 1 {
		t.Errorf("O atom at 1000 K: notes %+v, want only the n/nQ note", notes)
	}
}

// TestValidityLeavesOutTorsions: the harmonic drift note counts only the
// modes that stay harmonic. Hexafluoroethane's 68 cm⁻¹ torsion (Θ 98 K)
// is summed as a hindered rotor, so at room temperature its lowest
// harmonic mode is the 216 cm⁻¹ bend (Θ 311 K): no caution at 295 K, a
// caution at 600 K. Propane likewise: its torsions at 216 and 268 cm⁻¹
// are rotors, its lowest harmonic mode 369 cm⁻¹ (Θ 531 K).
func TestValidityLeavesOutTorsions(t *testing.T) {
	drift := func(f string, tempK float64) bool {
		sp := mustSpecies(t, f)
		for _, n := range sp.Validity(tempK, 1e5).Notes(sp) {
			if n.Severity == Caution && strings.Contains(n.Text, "drifts") {
				return true
			}
		}
		return false
	}
	for _, tt := range []struct {
		formula string
		tempK   float64
		want    bool
	}{
		{"C2F6", 295, false}, {"C2F6", 600, true}, {"C3H8", 500, false}, {"C3H8", 900, true},
	} {
		if got := drift(tt.formula, tt.tempK); got != tt.want {
			t.Errorf("%s at %g K: harmonic drift caution %v, want %v", tt.formula, tt.tempK, got, tt.want)
		}
	}
	sp := mustSpecies(t, "C2F6")
	if got, want := sp.Validity(295, 1e5).TOverThetaVib, 295/WavenumberToKelvin(216); math.Abs(got/want-1) > 1e-12 {
		t.Errorf("C2F6 T/Θvib at 295 K = %g, want %g (the 216 cm⁻¹ bend)", got, want)
	}
}

func TestSeverityString(t *testing.T) {
	for s, want := range map[Severity]string{Info: "note", Caution: "caution", Invalid: "outside model"} {
		if s.String() != want {
			t.Errorf("Severity(%d).String() = %q, want %q", s, s.String(), want)
		}
	}
}

// Trouton's rule with the catalogue's boiling points gives vapour
// pressures within a factor of about three of measured ones (steam tables
// and handbook values, from memory): enough to flag condensation.
func TestSatPresEstimate(t *testing.T) {
	tests := []struct {
		formula string
		tempK   float64
		wantPa  float64 // measured vapour pressure
		source  string
	}{
		{"H2O", 298.15, 3169.9, "IAPWS-IF97 saturation pressure at 25 °C, from memory"},
		{"H2O", 353.15, 47414, "IAPWS-IF97 saturation pressure at 80 °C, from memory"},
		{"N2", 70, 38.5e3, "N2 vapour pressure at 70 K, handbook, from memory"},
		{"NH3", 273.15, 429.4e3, "NH3 vapour pressure at 0 °C, handbook, from memory"},
	}
	for _, tt := range tests {
		sp := mustSpecies(t, tt.formula)
		got := sp.Validity(tt.tempK, 1e5).SatPresEstPa
		if r := got / tt.wantPa; r < 1.0/3 || r > 3 {
			t.Errorf("%s at %g K: estimated vapour pressure %.4g Pa, want within ×3 of %.4g Pa (%s)", tt.formula, tt.tempK, got, tt.wantPa, tt.source)
		}
	}
}
