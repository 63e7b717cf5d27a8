package model

import (
	"math"
	"slices"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// TestHinderedRotorEthane: with its torsion summed as a hindered rotor,
// ethane meets the goal for polyatomics at 298.15 K (S° within
// 0.1 J/(mol·K), Cp° within 1 %), where the harmonic torsion misses S° by
// 0.8. Reference: S° 229.2 and Cp° 52.49 J/(mol·K) at 298.15 K, 1 bar,
// NBS tables 1982, C2H6, from memory.
func TestHinderedRotorEthane(t *testing.T) {
	sp := mustSpecies(t, "C2H6")
	row, err := sp.Table(RefTempK, StdPressureBarPa, summed)
	if err != nil {
		t.Fatal(err)
	}
	const wantS, wantCp = 229.2, 52.49 // NBS tables 1982, C2H6, from memory
	if d := row.SJPerMolK - wantS; math.Abs(d) > 0.1 {
		t.Errorf("C2H6 S°(298.15 K) = %.3f, want %.1f ± 0.1", row.SJPerMolK, wantS)
	}
	if d := row.CpJPerMolK/wantCp - 1; math.Abs(d) > 0.01 {
		t.Errorf("C2H6 Cp°(298.15 K) = %.3f, want %.2f ± 1 %%", row.CpJPerMolK, wantCp)
	}
	rr, _ := sp.Table(RefTempK, StdPressureBarPa, Treatment{Levels: LevelsRigidHarmonic})
	t.Logf("C2H6 at 298.15 K: hindered S° %.3f Cp° %.3f; harmonic torsion S° %.3f Cp° %.3f", row.SJPerMolK, row.CpJPerMolK, rr.SJPerMolK, rr.CpJPerMolK)
}

// TestHinderedRotorLimits checks a torsion's levels where they are known
// in closed form: the lowest spacing is near the harmonic fundamental
// n√(V0 F) less the anharmonic drop (within 10 %, the observed ν4 of
// ethane 289 cm⁻¹ lies 7 % below 3√(V0 F)); far below it the torsion
// adds nothing, as a frozen harmonic mode (its ground level's tunnelling
// split, 0.008 K, is merged); far above the
// barrier it is the free rotor, S/R = ln(√(πkT/F)/σ) + ½ and Cv/R = ½,
// within (V0/kT)² (S does not depend on the energy zero, which is the
// lowest level, not the bottom of the wells).
func TestHinderedRotorLimits(t *testing.T) {
	tor := Torsion{ReplacesCm: 289, BarrierCm: 1012, FCm: 10.68, Fold: 3, Symmetry: 3}
	lv := tor.levels()
	harm := float64(tor.Fold) * math.Sqrt(tor.BarrierCm*tor.FCm)
	var first float64
	for _, th := range lv.thetaK {
		if th > 1 {
			first = th / WavenumberToKelvin(1)
			break
		}
	}
	if math.Abs(first/harm-1) > 0.1 {
		t.Errorf("first torsional excitation %.1f cm⁻¹, want within 10 %% of n√(V0F) = %.1f", first, harm)
	}
	cold := lv.torsionTerms(10, math.Log(10))
	if math.Abs(cold.S()) > 1e-12 || math.Abs(cold.Cv) > 1e-12 {
		t.Errorf("torsion at 10 K: S/R %.3g, Cv/R %.3g; want 0", cold.S(), cold.Cv)
	}
	hotK := 200 * WavenumberToKelvin(tor.BarrierCm)
	hot := lv.torsionTerms(hotK, math.Log(hotK))
	y := WavenumberToKelvin(tor.BarrierCm) / hotK
	wantS := 0.5*math.Log(math.Pi*hotK/WavenumberToKelvin(tor.FCm)) - math.Log(float64(tor.Symmetry)) + 0.5
	if math.Abs(hot.S()-wantS) > y*y || math.Abs(hot.Cv-0.5) > y*y {
		t.Errorf("torsion at %.4g K: S/R %.6f, Cv/R %.6f; want free rotor %.6f and ½", hotK, hot.S(), hot.Cv, wantS)
	}
}

// TestTorsionField: the torsion_cm field of a species file is checked as
// it is read and when the block is prepared.
func TestTorsionField(t *testing.T) {
	block := func(torsion string) string {
		return "[C2H6]\nname = ethane (test)\nrotor = nonlinear\nrot_cm = 2.671 0.6630 0.6630\nsigma = 6\n" +
			"vib_cm = 2954 1388 995 289 2896 1379 2969x2 1468x2 822x2 2985x2 1469x2 1190x2\ndHf0_kJ = -68.07\n" +
			"torsion_cm = " + torsion + "\n"
	}
	list, err := ParseCatalogue("user.cat", strings.NewReader(block("289 1012 10.68 3 3")))
	if err != nil || len(list[0].Torsions) != 1 {
		t.Fatalf("valid torsion refused: %v", err)
	}
	for _, tt := range []struct{ value, want string }{
		{"289 1012 10.68 3", "4 items"},
		{"289 -5 10.68 3 3", "torsional barrier V0 from 1 to 20000"},
		{"289 1012 10.68 9 3", "torsional fold n"},
		{"300 1012 10.68 3 3", "which vib_cm does not list"},
		{"289 1012 10.68 2 3", "σ from 1 to n"},
	} {
		_, err := ParseCatalogue("user.cat", strings.NewReader(block(tt.value)))
		if err == nil || !strings.Contains(UserMessage(err), tt.want) || strings.Contains(UserMessage(err), "\n") {
			t.Errorf("torsion_cm = %s: got %v, want one line with %q", tt.value, err, tt.want)
		}
	}
}

// A potential given as several terms is their sum: a threefold barrier
// split in two halves gives the levels of the whole.
func TestTorsionTermsAdd(t *testing.T) {
	whole := Torsion{ReplacesCm: 289, BarrierCm: 1012, FCm: 10.68, Fold: 3, Symmetry: 3}.levels()
	split := Torsion{ReplacesCm: 289, BarrierCm: 506, FCm: 10.68, Fold: 3, Symmetry: 3, More: []PotentialTerm{{506, 3}}}.levels()
	if len(whole.thetaK) != len(split.thetaK) {
		t.Fatalf("%d levels against %d", len(split.thetaK), len(whole.thetaK))
	}
	for i := range whole.thetaK {
		if math.Abs(whole.thetaK[i]-split.thetaK[i]) > 1e-6*(1+whole.thetaK[i]) {
			t.Fatalf("level %d: %g K against %g K", i, split.thetaK[i], whole.thetaK[i])
		}
	}
}

// n-Butane's C–C torsion over V1 576, V2 −264, V3 1174 cm⁻¹ (F 0.913):
// the anti well's ladder starts near its observed 102 cm⁻¹ (Shimanouchi's
// tables, as the catalogue lists it), and the two gauche wells, 234 cm⁻¹
// above the anti minimum by construction, give a pair of alike ground
// levels below 350 cm⁻¹, above the anti ground level by the well
// difference less the change in zero-point energy.
func TestTorsionGaucheWells(t *testing.T) {
	lv := Torsion{ReplacesCm: 102, BarrierCm: 576, FCm: 0.913, Fold: 1, Symmetry: 1, More: []PotentialTerm{{-264, 2}, {1174, 3}}}.levels()
	cm := func(i int) float64 { return lv.thetaK[i] / WavenumberToKelvin(1) }
	if f := cm(1); f < 85 || f > 110 {
		t.Errorf("first anti excitation %.1f cm⁻¹, want near the observed 102", f)
	}
	pair := 0
	for i := 1; i+1 < len(lv.thetaK) && cm(i) < 350; i++ {
		if cm(i) > 150 && math.Abs(cm(i+1)-cm(i)) < 0.01 {
			pair++
		}
	}
	if pair == 0 {
		t.Errorf("no pair of alike gauche levels between 150 and 350 cm⁻¹; levels %v", lv.thetaK[:12])
	}
}

// The block-by-block eigenvalues are those of the whole matrix, for a
// methyl top (three blocks) and for n-butane's C–C torsion (one).
func TestTorsionBlocksMatchWholeMatrix(t *testing.T) {
	for _, tor := range []Torsion{
		{ReplacesCm: 289, BarrierCm: 1012, FCm: 10.68, Fold: 3, Symmetry: 3},
		{ReplacesCm: 216, BarrierCm: 1154, FCm: 6.27, Fold: 3, Symmetry: 3, More: []PotentialTerm{{40, 6}}},
		{ReplacesCm: 102, BarrierCm: 576, FCm: 0.913, Fold: 1, Symmetry: 1, More: []PotentialTerm{{-264, 2}, {1174, 3}}},
	} {
		n := 2*torsionBasisM + 1
		h := mat.NewSymDense(n, nil)
		for i := 0; i < n; i++ {
			m := float64(i - torsionBasisM)
			h.SetSym(i, i, tor.FCm*m*m+tor.meanPotentialCm())
		}
		terms := append([]PotentialTerm{{tor.BarrierCm, tor.Fold}}, tor.More...)
		for _, p := range terms {
			for i := 0; i+p.Fold < n; i++ {
				h.SetSym(i, i+p.Fold, h.At(i, i+p.Fold)-p.Cm/4)
			}
		}
		var eig mat.EigenSym
		if !eig.Factorize(h, false) {
			t.Fatal("no eigenvalues")
		}
		want := eig.Values(nil)
		got := tor.eigenvalues()
		if len(got) != len(want) {
			t.Fatalf("%d eigenvalues, want %d", len(got), len(want))
		}
		for i := range want {
			if math.Abs(got[i]-want[i]) > 1e-9*(1+math.Abs(want[i])) {
				t.Fatalf("fold %d: eigenvalue %d = %.12g, want %.12g", tor.Fold, i, got[i], want[i])
			}
		}
	}
}

// Alike torsions share one level list: propane's two methyl rotors are
// one set counted twice, n-butane's two methyls one and its C–C torsion
// another, isobutane's three methyls one. The hindered vibration so taken
// equals the harmonic modes plus each torsion's own list, built apart
// from the catalogue's sharing, at temperatures below and above each
// list's table.
func TestAlikeTorsionsShareLevels(t *testing.T) {
	cases := []struct {
		formula string
		sets    []float64 // the count of each set, in catalogue order
	}{
		{"C2H6", []float64{1}},
		{"C3H8", []float64{2}},
		{"n-C4H10", []float64{2, 1}},
		{"i-C4H10", []float64{3}},
	}
	for _, c := range cases {
		sp := mustSpecies(t, c.formula)
		var counts []float64
		for _, set := range sp.torsionLevels {
			counts = append(counts, set.count)
		}
		if !slices.Equal(counts, c.sets) {
			t.Errorf("%s: sets counted %v, want %v", c.formula, counts, c.sets)
			continue
		}
		apart := make([]*rovibLevels, len(sp.Torsions))
		for i, tor := range sp.Torsions {
			apart[i] = tor.levels()
		}
		for _, tempK := range []float64{0.5, 5, 60, 298.15, 812.5, 3000} {
			invT, lnT := 1/tempK, math.Log(tempK)
			want := vibrationOf(sp.vibModesHindered, invT)
			for _, lv := range apart {
				want = want.add(lv.torsionTerms(tempK, lnT))
			}
			got := sp.hinderedVibration(tempK, invT, lnT)
			for _, q := range []struct {
				name      string
				got, want float64
			}{{"ln q", got.LnQ, want.LnQ}, {"U", got.U, want.U}, {"Cv", got.Cv, want.Cv}} {
				if math.Abs(q.got-q.want) > 1e-12*(1+math.Abs(q.want)) {
					t.Errorf("%s at %g K: %s = %.15g, want %.15g", c.formula, tempK, q.name, q.got, q.want)
				}
			}
		}
	}
}
