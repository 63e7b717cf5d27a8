package ui

import (
	"math"
	"strconv"
	"strings"
	"testing"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/model"
)

func testAnatomy(t *testing.T, blend mixtures.BlendFile) (*anatomyPane, *bench) {
	t.Helper()
	c := testPaneCommon(false)
	b := newBench(c.Catalogue)
	b.loadFile(&blend)
	b.update()
	p := newAnatomyPane(c, b)
	p.SetSize(70, 200)
	return p, b
}

// column reads the number in the given column (counted from 0 after the
// label) of the line that starts with label.
func anatomyNumber(t *testing.T, view, label string, col int) float64 {
	t.Helper()
	for _, l := range strings.Split(view, "\n") {
		if strings.HasPrefix(l, label) {
			f := strings.Fields(strings.TrimPrefix(l, label))
			x, err := strconv.ParseFloat(f[col], 64)
			if err != nil {
				t.Fatalf("line %q: %v", l, err)
			}
			return x
		}
	}
	t.Fatalf("no line %q in\n%s", label, view)
	return 0
}

// The four contributions add up to the species' own S and Cp at its
// partial pressure (S = R Σ(ln q + U), Cp = R Σ Cv + R).
func TestAnatomySumsToSpecies(t *testing.T) {
	p, b := testAnatomy(t, *mixtures.DemoFile())
	for i := range b.state.Species {
		term := &b.state.Species[i]
		v := p.View()
		if !strings.HasPrefix(v, term.Species.Formula+",") {
			t.Fatalf("shows %q, want %s", strings.SplitN(v, "\n", 2)[0], term.Species.Formula)
		}
		var sumS, sumCp float64
		for _, f := range []string{"translation", "rotation", "vibration", "electronic"} {
			sumS += anatomyNumber(t, v, f, 0)
			sumCp += anatomyNumber(t, v, f, 1)
		}
		const tol = 3e-3 // four rounded figures of 3 decimals
		if math.Abs(sumS-term.SJPerMolK) > tol || math.Abs(anatomyNumber(t, v, "total", 0)-term.SJPerMolK) > 1e-3 {
			t.Errorf("%s: S parts sum to %g, total %g; species S %g", term.Species.Formula, sumS, anatomyNumber(t, v, "total", 0), term.SJPerMolK)
		}
		if math.Abs(sumCp-term.CpJPerMolK) > tol {
			t.Errorf("%s: Cp parts sum to %g, species Cp %g", term.Species.Formula, sumCp, term.CpJPerMolK)
		}
		// Translation alone: Cp = 5R/2, the Sackur-Tetrode gas.
		if got := anatomyNumber(t, v, "translation", 1); math.Abs(got-2.5*model.GasConstant) > 1e-3 {
			t.Errorf("%s: translational Cp %g, want 5R/2", term.Species.Formula, got)
		}
		p.Update(testKey("right"))
	}
	if !strings.HasPrefix(p.View(), b.state.Species[0].Species.Formula+",") {
		t.Errorf("right from the last species does not come round to the first")
	}
	p.Update(testKey("left"))
	if f := b.state.Species[len(b.state.Species)-1].Species.Formula; p.formula != f {
		t.Errorf("left from the first species gives %s, want %s", p.formula, f)
	}
}

func TestAnatomyThetasAndNotes(t *testing.T) {
	cold := mixtures.BlendFile{Components: []mixtures.FileComponent{{Species: "NH3", Amount: "0.9"}, {Species: "Ar", Amount: "bal"}},
		Temperature: "230 K", Pressure: "1 bar"}
	p, _ := testAnatomy(t, cold)
	v := p.View()
	sp, _ := model.Builtin().Lookup("NH3")
	for _, want := range []string{
		"Θrot", report.Sig(sp.RotThetaK()[0], 4), "nonlinear, σ = 3",
		"Θvib", report.Sig(sp.VibThetaK()[2], 4) + " ×2",
		"ground level g = 1",
		"above its vapour pressure", // 0.9 bar of NH3 at 230 K is above its vapour pressure (about 0.6 bar): the note must say so
		"outside model",
	} {
		if !strings.Contains(v, want) {
			t.Errorf("view lacks %q:\n%s", want, v)
		}
	}
	p.Update(testKey("right")) // argon: no rotation, no vibration
	v = p.View()
	for _, want := range []string{"an atom does not rotate", "no vibration", "n/nQ"} {
		if !strings.Contains(v, want) {
			t.Errorf("argon view lacks %q:\n%s", want, v)
		}
	}
}

func TestAnatomyBlendNote(t *testing.T) {
	high := *mixtures.DemoFile()
	high.Pressure = "40 bar"
	p, _ := testAnatomy(t, high)
	if v := p.View(); !strings.Contains(v, "The blend as a whole") || !strings.Contains(v, "real-gas") {
		t.Errorf("no blend-wide pressure note at 40 bar:\n%s", v)
	}
}

// The pane says which treatment each species gets, factor by factor, and
// what it adds over the rigid rotor: facts it reads from the model.
func TestAnatomyTreatment(t *testing.T) {
	blend := mixtures.BlendFile{Components: []mixtures.FileComponent{{Species: "H2", Amount: "0.2"}, {Species: "NH3", Amount: "0.2"},
		{Species: "pH2", Amount: "0.2"}, {Species: "C2H6", Amount: "0.2"}, {Species: "Ar", Amount: "bal"}},
		Temperature: "300 K", Pressure: "1 bar"}
	p, b := testAnatomy(t, blend)
	want := map[string][]string{
		"H2":   {"summed rovibronic levels", "spin modification: normal hydrogen", "over the rigid rotor and harmonic oscillator"},
		"NH3":  {"inversion ladder", "centrifugal distortion", "the inversion mode from its levels"},
		"pH2":  {"spin modification: para hydrogen", "spin modifications frozen"},
		"C2H6": {"hindered internal rotation", "torsions as hindered rotors"},
		"Ar":   {"Treatment: rigid rotor and harmonic oscillator", "rotation: none"},
	}
	for range b.state.Species {
		v := strings.Join(strings.Fields(p.View()), " ") // wrapped lines joined
		f := p.formula
		if f == "" {
			f = b.state.Species[0].Species.Formula
		}
		for _, w := range want[f] {
			if !strings.Contains(v, w) {
				t.Errorf("%s: view lacks %q:\n%s", f, w, p.View())
			}
		}
		if f == "Ar" && strings.Contains(v, "over the rigid rotor") {
			t.Errorf("Ar: a correction shown for the rigid rotor itself")
		}
		p.Update(testKey("right"))
	}
}
