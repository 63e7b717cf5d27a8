package report

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"math"
	"strings"
	"testing"

	"zmix/mixtures"
	"zmix/model"
)

// TestAnatomyShares: each species' four factor shares sum to its S and Cp
// (the identity the Anatomy pane and `zmix state --anatomy` rest on), a
// species whose treatment is the rigid rotor with harmonic vibration
// reports nothing over it and one summed over levels reports what the
// sum adds, which is that treatment's S and Cp less the rigid rotor's at
// the same state.
func TestAnatomyShares(t *testing.T) {
	m := mustMixture(t, "SiH4 4%, H2O 1%, C2F6 1%, n-C4H10 2%, NH3 1%, N2 bal", 1.4e5)
	s, err := m.State(450, 1.4e5, mixtures.Options{})
	if err != nil {
		t.Fatal(err)
	}
	list := Anatomy(&s)
	if len(list) != len(s.Species) {
		t.Fatalf("%d species taken apart, want %d", len(list), len(s.Species))
	}
	names := []string{"translation", "rotation", "vibration", "electronic"}
	for k, a := range list {
		term := &s.Species[k]
		var sumS, sumCp float64
		for i, f := range a.Factors {
			if f.Name != names[i] || f.Treatment == "" {
				t.Errorf("%s factor %d: %+v", a.Name, i, f)
			}
			sumS += f.SJPerMolK
			sumCp += f.CpJPerMolK
		}
		if math.Abs(sumS-term.SJPerMolK) > 1e-9 || math.Abs(sumCp-term.CpJPerMolK) > 1e-9 {
			t.Errorf("%s: shares sum to S %.12g, Cp %.12g; the species has %.12g, %.12g", a.Name, sumS, sumCp, term.SJPerMolK, term.CpJPerMolK)
		}
		rigid, err := term.Species.StateWith(450, term.PartialPresPa, model.Treatment{Levels: model.LevelsRigidHarmonic})
		if err != nil {
			t.Fatal(err)
		}
		dS, dCp := term.SJPerMolK-rigid.SJPerMolK, term.CpJPerMolK-rigid.CpJPerMolK
		switch d := a.OverRigidHarmonic; {
		case a.Name == "SiH4" && d != nil:
			t.Errorf("SiH4 is a rigid rotor with harmonic vibration, yet reports %+v over it", *d)
		case a.Name != "SiH4" && d == nil:
			t.Errorf("%s reports nothing over the rigid rotor", a.Name)
		case d != nil && (math.Abs(d.SJPerMolK-dS) > 1e-9 || math.Abs(d.CpJPerMolK-dCp) > 1e-9):
			t.Errorf("%s over the rigid rotor: %+v, the two states differ by S %.6g, Cp %.6g", a.Name, *d, dS, dCp)
		}
		replaced := 0
		for _, l := range a.ThetaVib {
			if l.ReplacedBy != "" {
				replaced++
			}
		}
		if want := len(term.Species.Torsions) + len(term.Species.Ladders); replaced != want {
			t.Errorf("%s: %d modes marked replaced, want %d (its torsions and ladders)", a.Name, replaced, want)
		}
		if len(a.ThetaVib) != len(term.Species.Vib) || len(a.ThetaRot) != len(term.Species.RotConstPerCm) {
			t.Errorf("%s: %d Θvib and %d Θrot, want %d and %d", a.Name, len(a.ThetaVib), len(a.ThetaRot), len(term.Species.Vib), len(term.Species.RotConstPerCm))
		}
	}
}

// TestAnatomyOutputs: the text, JSON and CSV forms carry the same figures,
// and leave the anatomy out unless it was asked for.
func TestAnatomyOutputs(t *testing.T) {
	m := mustMixture(t, "SiH4 4%, N2 bal", 1.4e5)
	s, err := m.State(295.15, 1.4e5, mixtures.Options{})
	if err != nil {
		t.Fatal(err)
	}
	with := &StateReport{State: &s, Anatomy: Anatomy(&s)}
	without := &StateReport{State: &s}

	var js bytes.Buffer
	if err := WriteStateJSON(&js, with); err != nil {
		t.Fatal(err)
	}
	var doc struct {
		Anatomy []SpeciesAnatomy `json:"anatomy"`
	}
	if err := json.Unmarshal(js.Bytes(), &doc); err != nil {
		t.Fatalf("JSON with the anatomy does not parse: %v\n%s", err, js.String())
	}
	if len(doc.Anatomy) != 2 || doc.Anatomy[0].Factors[1].SJPerMolK != with.Anatomy[0].Factors[1].SJPerMolK || doc.Anatomy[1].OverRigidHarmonic == nil {
		t.Errorf("JSON anatomy %+v", doc.Anatomy)
	}
	js.Reset()
	if err := WriteStateJSON(&js, without); err != nil {
		t.Fatal(err)
	}
	if strings.Contains(js.String(), "anatomy") {
		t.Error("JSON holds the anatomy though it was not asked for")
	}

	var cs bytes.Buffer
	if err := WriteStateCSV(&cs, with); err != nil {
		t.Fatal(err)
	}
	rows, err := csv.NewReader(&cs).ReadAll()
	if err != nil || len(rows) != 2 || len(rows[0]) != len(rows[1]) {
		t.Fatalf("CSV with the anatomy: %v, %d rows", err, len(rows))
	}
	col := func(name string) string {
		for i, h := range rows[0] {
			if h == name {
				return rows[1][i]
			}
		}
		t.Fatalf("CSV lacks column %s", name)
		return ""
	}
	if got, want := col("SiH4.vibration.cp_J_molK"), csvFloat(with.Anatomy[0].Factors[2].CpJPerMolK); got != want {
		t.Errorf("CSV SiH4.vibration.cp_J_molK = %s, want %s", got, want)
	}
	if col("SiH4.over_rigid_harmonic.s_J_molK") != "" || col("N2.over_rigid_harmonic.s_J_molK") == "" {
		t.Error("CSV over_rigid_harmonic: want empty for SiH4 (rigid rotor) and a figure for N2 (summed levels)")
	}

	var txt bytes.Buffer
	if err := WriteStateText(&txt, with); err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{"Anatomy, each species at its partial pressure", "SiH4 (silane)", Fixed(with.Anatomy[0].Factors[1].SJPerMolK, 3), "Θvib: ", "over the rigid rotor and harmonic oscillator"} {
		if !strings.Contains(txt.String(), want) {
			t.Errorf("text readout lacks %q", want)
		}
	}
}

// TestCatalogModes: the species JSON lists its modes and levels, marking
// those the summed levels replace, as the text does.
func TestCatalogModes(t *testing.T) {
	sp, _ := model.Builtin().Lookup("C2F6")
	var buf bytes.Buffer
	if err := WriteSpeciesJSON(&buf, sp, true, 1e5, []float64{298.15}); err != nil {
		t.Fatal(err)
	}
	var doc struct {
		Vib []struct {
			Cm         float64 `json:"cm"`
			Degeneracy int     `json:"degeneracy"`
			ReplacedBy string  `json:"replaced_by"`
		} `json:"vib_cm"`
		Elec []struct {
			Cm float64 `json:"cm"`
		} `json:"elec_cm"`
	}
	if err := json.Unmarshal(buf.Bytes(), &doc); err != nil {
		t.Fatal(err)
	}
	if len(doc.Vib) != len(sp.Vib) || len(doc.Elec) != len(sp.Elec) {
		t.Fatalf("%d modes and %d levels, want %d and %d", len(doc.Vib), len(doc.Elec), len(sp.Vib), len(sp.Elec))
	}
	for i, v := range doc.Vib {
		want := ""
		if v.Cm == 68 {
			want = "hindered rotor"
		}
		if v.ReplacedBy != want || v.Degeneracy != sp.Vib[i].Degeneracy {
			t.Errorf("mode %g cm⁻¹: %+v, want replaced_by %q", v.Cm, v, want)
		}
	}
	var txt bytes.Buffer
	if err := WriteSpecies(&txt, sp, true, 1e5, []float64{298.15}); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(txt.String(), "68 cm⁻¹  (Θ = 97.837 K, summed as a hindered rotor)") {
		t.Errorf("catalog text does not mark the torsion:\n%s", txt.String())
	}
}
