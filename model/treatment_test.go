package model

import (
	"math"
	"strings"
	"testing"
)

// TestTreatments: the report names every treatment a species takes, and
// its deltas are the difference from the rigid rotor with harmonic
// vibration at the same state, zero for that treatment itself.
func TestTreatments(t *testing.T) {
	for _, tt := range []struct {
		name  string
		tr    Treatment
		want  []string
		rigid bool
	}{
		{"H2", Treatment{}, []string{"summed rovibronic levels from the RKR potential curve", "spin modification: normal hydrogen"}, false},
		{"eH2", Treatment{}, []string{"summed rovibronic levels", "spin modifications in equilibrium"}, false},
		{"O2", Treatment{}, []string{"summed rovibronic levels (Dunham constants) with excited states"}, false},
		{"NH3", Treatment{}, []string{"inversion ladder", "centrifugal distortion"}, false},
		{"H2O", Treatment{}, []string{"anharmonic vibration summed from xij"}, false},
		{"C2H6", Treatment{}, []string{"hindered internal rotation"}, false},
		{"Ar", Treatment{}, []string{"rigid rotor and harmonic oscillator"}, true},
		{"O2", Treatment{Levels: LevelsRigidHarmonic}, []string{"rigid rotor and harmonic oscillator"}, true},
	} {
		sp, ok := Builtin().Lookup(tt.name)
		if !ok {
			t.Fatalf("no %s", tt.name)
		}
		r := sp.Treatments(1000, 1e5, tt.tr)
		for _, w := range tt.want {
			if !strings.Contains(r.Kind, w) {
				t.Errorf("%s %+v: kind %q lacks %q", tt.name, tt.tr, r.Kind, w)
			}
		}
		if r.RigidHarmonic != tt.rigid {
			t.Errorf("%s %+v: RigidHarmonic %v, want %v", tt.name, tt.tr, r.RigidHarmonic, tt.rigid)
		}
		a, _ := sp.StateWith(1000, 1e5, tt.tr)
		b, _ := sp.StateWith(1000, 1e5, Treatment{Levels: LevelsRigidHarmonic})
		if d := a.SJPerMolK - b.SJPerMolK - r.DeltaSJPerMolK; math.Abs(d) > 1e-12 {
			t.Errorf("%s: ΔS %g, want %g", tt.name, r.DeltaSJPerMolK, a.SJPerMolK-b.SJPerMolK)
		}
		if !tt.rigid && r.DeltaCpJPerMolK == 0 {
			t.Errorf("%s: the summed treatment adds nothing to Cp at 1000 K", tt.name)
		}
	}
}

// A noble-gas atom is translation and ln g₀ under every treatment: its
// state does not move with the treatment asked for (the fill takes a
// short path for it), and its Cp is (5/2)R exactly.
func TestAtomStateUnderEveryTreatment(t *testing.T) {
	ar := mustSpecies(t, "Ar")
	want, err := ar.State(812.5, 2.5e5)
	if err != nil {
		t.Fatal(err)
	}
	for _, tr := range []Treatment{
		{Rotation: RotationSummed}, {Rotation: RotationClassical}, {Vibration: VibrationFrozen},
		{Electronic: ElectronicGroundOnly}, {Levels: LevelsSummed}, {Levels: LevelsRigidHarmonic},
	} {
		if got, _ := ar.StateWith(812.5, 2.5e5, tr); got != want {
			t.Errorf("Ar under %+v: %+v, want %+v", tr, got, want)
		}
	}
	// Cp = (5/2)R: translation's 3/2 R, the P dV work's R (exact).
	if math.Abs(want.CpJPerMolK-2.5*GasConstant) > 1e-12 || want.Rot != (Terms{}) || want.Vib != (Terms{}) {
		t.Errorf("Ar: Cp %v, rotation %+v, vibration %+v", want.CpJPerMolK, want.Rot, want.Vib)
	}
}
