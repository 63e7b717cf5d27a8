package process

import (
	"math"
	"math/rand/v2"
	"strconv"
	"strings"
	"testing"

	"gonum.org/v1/gonum/diff/fd"
	"gonum.org/v1/gonum/mat"

	"zmix/model"
)

func mustParents(t *testing.T, massU float64, texts ...string) Weighing {
	t.Helper()
	w := Weighing{MassUKg: massU}
	for _, s := range texts {
		p, err := ParseParent(model.Builtin(), s)
		if err != nil {
			t.Fatalf("ParseParent(%q): %v", s, err)
		}
		w.Parents = append(w.Parents, p)
	}
	return w
}

func fractionOfWeighed(r *WeighedResult, formula string) (x, u float64) {
	for i, f := range r.Species {
		if f == formula {
			return r.X[i], r.UX[i]
		}
	}
	return math.NaN(), math.NaN()
}

// TestWeighedTwoComponents checks a two-component mixture against its
// closed form, derived by hand. With nₖ = mₖ/Mₖ, N = n₁ + n₂ and
// x₁ = n₁/N:
//
//	∂x₁/∂n₁ = n₂/N²,  ∂x₁/∂n₂ = −n₁/N²
//	∂x₁/∂m₁ = n₂/(N² M₁) = x₁x₂/m₁,   ∂x₁/∂m₂ = −x₁x₂/m₂
//	∂x₁/∂M₁ = −x₁x₂/M₁,              ∂x₁/∂M₂ = +x₁x₂/M₂
//
// so, the four inputs uncorrelated (CO2 and N2 share no element),
//
//	u(x₁) = x₁x₂ √[(u(m₁)/m₁)² + (u(m₂)/m₂)² + (u(M₁)/M₁)² + (u(M₂)/M₂)²]
//
// with u(M_CO2)² = u(A_C)² + 4u(A_O)², u(M_N2)² = 4u(A_N)², and each
// u(A) the IUPAC 2021 ± over √3 (C ±0.002, O ±0.001, N ±0.001; IUPAC
// CIAAW 2021 abridged table, from memory). For 25.000 g CO2 and
// 475.000 g N2, each weighed to 2 mg:
//
//	M_CO2 = 12.011 + 2·15.999 = 44.009 g/mol,  M_N2 = 2·14.007 = 28.014 g/mol
//	n_CO2 = 0.568066 mol,  n_N2 = 16.955808 mol,  x_CO2 = 0.0324167
//	x₁x₂ = 0.0313658; relative terms 8.0e-5, 4.2e-6, 3.71e-5, 4.12e-5
//	u(x_CO2) = 0.0313658 · 9.74e-5 = 3.056e-6
func TestWeighedTwoComponents(t *testing.T) {
	w := mustParents(t, 0.002e-3, "25.000 g CO2", "475.000 g N2")
	r, err := w.Solve()
	if err != nil {
		t.Fatal(err)
	}
	const (
		wantX = 0.032416670 // hand calculation above
		wantU = 3.0561e-6   // hand calculation above
	)
	x, u := fractionOfWeighed(r, "CO2")
	if math.Abs(x-wantX) > 1e-9 {
		t.Errorf("x(CO2) = %.10f, want %.10f", x, wantX)
	}
	if math.Abs(u/wantU-1) > 1e-4 {
		t.Errorf("u(x CO2) = %.6g, want %.6g", u, wantU)
	}
	// The closed form from the inputs, to the last digit.
	m1, m2, um := 25.0, 475.0, 0.002
	mm1, mm2 := 12.011+2*15.999, 2*14.007
	um1 := math.Sqrt(math.Pow(0.002, 2)+4*math.Pow(0.001, 2)) / math.Sqrt(3)
	um2 := 2 * 0.001 / math.Sqrt(3)
	n1, n2 := m1/mm1, m2/mm2
	x1 := n1 / (n1 + n2)
	closed := x1 * (1 - x1) * math.Sqrt(math.Pow(um/m1, 2)+math.Pow(um/m2, 2)+math.Pow(um1/mm1, 2)+math.Pow(um2/mm2, 2))
	if math.Abs(u/closed-1) > 1e-9 || math.Abs(x/x1-1) > 1e-12 {
		t.Errorf("x, u = %.10g, %.6g; closed form %.10g, %.6g", x, u, x1, closed)
	}
	if xn, un := fractionOfWeighed(r, "N2"); math.Abs(xn+x-1) > 1e-15 || math.Abs(un/u-1) > 1e-9 {
		t.Errorf("N2: x %.10g, u %.6g; want 1 − x(CO2) and the same u", xn, un)
	}
}

// TestWeighedIdentities: over seeded random weighings the fractions sum
// to 1 and each row of their covariance to 0 (Σxᵢ = 1 holds whatever
// the inputs). With every input's uncertainty zero (the masses, the
// amounts given without ±, the atomic weights' table zeroed) every u is
// zero.
func TestWeighedIdentities(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 1))
	gases := []string{"N2", "O2", "Ar", "CO2", "CH4", "H2", "He", "SF6", "NH3", "C3H8"}
	for trial := range 20 {
		var texts []string
		for range 2 + rng.IntN(4) {
			g := gases[rng.IntN(len(gases))]
			other := gases[rng.IntN(len(gases))]
			mass := 1 + rng.Float64()*1000
			if other != g && rng.IntN(2) == 0 {
				texts = append(texts, trimFloat(mass)+" g "+g+" with "+other+" "+trimFloat(1+rng.Float64()*50)+"ppm ±1ppm")
			} else {
				texts = append(texts, trimFloat(mass)+" g "+g)
			}
		}
		w := mustParents(t, 1e-6, texts...)
		r, err := w.Solve()
		if err != nil {
			t.Fatalf("trial %d %q: %v", trial, texts, err)
		}
		sum := 0.0
		for i, x := range r.X {
			sum += x
			row := 0.0
			for j := range r.X {
				row += r.Cov.At(i, j)
			}
			if math.Abs(row) > 1e-12*r.UX[i]*r.UX[i]+1e-30 {
				t.Errorf("trial %d %q: covariance row %d sums to %g", trial, texts, i, row)
			}
			if !(r.UX[i] > 0) {
				t.Errorf("trial %d: u(x %s) = %g, want > 0", trial, r.Species[i], r.UX[i])
			}
		}
		if math.Abs(sum-1) > 1e-14 {
			t.Errorf("trial %d %q: fractions sum to %.17g", trial, texts, sum)
		}
	}

	// Zero uncertainty in: zero out. The atomic weights of F, P and As
	// carry ±5e-9 to ±6e-6; zero the table for this check.
	saved := atomicWeightUGPerMol
	atomicWeightUGPerMol = map[string]float64{}
	for e := range saved {
		atomicWeightUGPerMol[e] = 0
	}
	defer func() { atomicWeightUGPerMol = saved }()
	w := mustParents(t, 0, "25.1 g CO2 with O2 5ppm", "500 g N2", "3.2 g CH4")
	r, err := w.Solve()
	if err != nil {
		t.Fatal(err)
	}
	for i, u := range r.UX {
		if u != 0 || r.UMasses[i] != 0 || r.UPurity[i] != 0 || r.UMolar[i] != 0 {
			t.Errorf("zero inputs' uncertainty: u(x %s) = %g", r.Species[i], u)
		}
	}
}

// TestWeighedFiniteDifference: the analytic sensitivities, combined, give
// the same u(xᵢ) as a numerical Jacobian of the measurement model
// (gonum diff/fd, central differences) combined the same way.
func TestWeighedFiniteDifference(t *testing.T) {
	w := mustParents(t, 0.005e-3,
		"12.345 g CO2 with H2O 20ppm ±4ppm, N2 <10ppm",
		"2.0513 g of CH4 1.002% ±0.003%, N2 bal",
		"780.25 g N2 with O2 <5ppm, H2O 3ppm ±1ppm, Ar 15ppm ±5ppm",
		"40.1 g ±0.02 g Ar",
		"5.02 g CH4 2.013 wt% ±0.004 wt%, CO2 <0.01 wt%, N2 bal") // a premix certified by mass
	r, err := w.Solve()
	if err != nil {
		t.Fatal(err)
	}
	g, q, u, err := w.build()
	if err != nil {
		t.Fatal(err)
	}
	ns := len(g.species)
	num := mat.NewDense(ns, len(q), nil)
	// Steps scaled to each input: masses of grams, amounts of ppm, atomic
	// weights of kg/mol all get a relative step.
	scaled := make([]float64, len(q))
	for j := range q {
		scaled[j] = 1
	}
	f := func(y, s []float64) {
		qq := make([]float64, len(q))
		for j := range q {
			qq[j] = q[j] * s[j]
		}
		g.fractions(y, qq)
	}
	fd.Jacobian(num, f, scaled, &fd.JacobianSettings{Formula: fd.Central, Step: 1e-6})
	for i := range ns {
		uNum := 0.0
		for j := range q {
			d := num.At(i, j) / q[j] * u[j] // undo the relative scaling
			uNum += d * d
		}
		uNum = math.Sqrt(uNum)
		if math.Abs(r.UX[i]/uNum-1) > 1e-5 {
			t.Errorf("u(x %s) = %.8g; finite differences give %.8g", r.Species[i], r.UX[i], uNum)
		}
	}
}

// TestWeighedLimitRule: an impurity below a limit L enters as L/2 with
// u = L/(2√3) (ISO 6142-1), carried into the blend in proportion.
func TestWeighedLimitRule(t *testing.T) {
	w := mustParents(t, 0, "100 g N2 with O2 <10ppm")
	r, err := w.Solve()
	if err != nil {
		t.Fatal(err)
	}
	x, _ := fractionOfWeighed(r, "O2")
	if math.Abs(x-5e-6) > 1e-15 {
		t.Errorf("x(O2) = %g, want 5e-6 (L/2)", x)
	}
	p := w.Parents[0].Parts[1]
	if !p.Limit || math.Abs(p.UX-10e-6/(2*math.Sqrt(3))) > 1e-18 {
		t.Errorf("O2 part %+v: want a limit with u = L/(2√3)", p)
	}
	// One parent: its purity's uncertainty passes straight through, to
	// first order (x = y: ∂x/∂y = 1).
	_, u := fractionOfWeighed(r, "O2")
	if math.Abs(u/p.UX-1) > 1e-3 {
		t.Errorf("u(x O2) = %g, want ≈ u(y) = %g", u, p.UX)
	}
}

// TestWeighedPremixByMass: a parent certified by mass brings
// Nᵢ = mA wᵢ/Mᵢ of each species. Hand calculation, with the IUPAC 2021
// conventional atomic weights (C 12.011, H 1.008, N 14.007; from memory):
// 10 g of 2 wt% CH4 in N2 and 400 g of N2 give
//
//	M_CH4 = 16.043, M_N2 = 28.014 g/mol
//	n_CH4 = 10 · 0.02/16.043 = 0.01246650 mol
//	n_N2  = (10 · 0.98 + 400)/28.014 = 14.62840 mol
//	x_CH4 = 0.000851486, and the premix's molar mass 27.60208 g/mol.
//
// The same premix stated by moles (3.4409 % CH4, the same gas) gives the
// same composition.
func TestWeighedPremixByMass(t *testing.T) {
	w := mustParents(t, 4e-6, "10 g CH4 2 wt%, N2 bal", "400 g N2")
	if !w.Parents[0].ByMass || w.Parents[1].ByMass {
		t.Fatalf("ByMass = %v, %v; want the premix only", w.Parents[0].ByMass, w.Parents[1].ByMass)
	}
	r, err := w.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if x, _ := fractionOfWeighed(r, "CH4"); math.Abs(x/0.000851486-1) > 1e-6 {
		t.Errorf("x(CH4) = %.9g, want 0.000851486 (hand calculation)", x)
	}
	parents := r.tables[0]
	if m := parents.Rows[0][2].SI * 1e3; math.Abs(m-27.60208) > 1e-5 {
		t.Errorf("premix molar mass %.7g g/mol, want 27.60208", m)
	}
	// By moles: y = (0.02/16.043)/(0.02/16.043 + 0.98/28.014).
	yMol := (0.02 / 16.043) / (0.02/16.043 + 0.98/28.014)
	w2 := mustParents(t, 4e-6, "10 g CH4 "+strconv.FormatFloat(100*yMol, 'g', 17, 64)+"%, N2 bal", "400 g N2")
	r2, err := w2.Solve()
	if err != nil {
		t.Fatal(err)
	}
	x1, _ := fractionOfWeighed(r, "CH4")
	x2, _ := fractionOfWeighed(r2, "CH4")
	if math.Abs(x1/x2-1) > 1e-12 {
		t.Errorf("by mass x = %.12g, by moles %.12g", x1, x2)
	}
	if !strings.Contains(strings.Join(r.Notes(), " "), "amounts by mass") {
		t.Errorf("notes %q should say the amounts were by mass", r.Notes())
	}
}

func TestParseParent(t *testing.T) {
	cat := model.Builtin()
	for _, tt := range []struct {
		in        string
		massKg    float64
		massUKg   float64
		gas       string
		nParts    int
		balanceOf string
	}{
		{"25.103 g CO2", 25.103e-3, -1, "CO2", 1, "CO2"},
		{"25.103g of CO2", 25.103e-3, -1, "CO2", 1, "CO2"},
		{"2.4612 kg ± 8 mg N2 with O2 <5ppm, H2O 10ppm ±2ppm", 2.4612, 8e-6, "N2 with O2 <5ppm, H2O 10ppm ±2ppm", 3, "N2"},
		{"2.4612 kg +/- 8mg N2 with O2 <5ppm", 2.4612, 8e-6, "N2 with O2 <5ppm", 2, "N2"},
		{"10 g +- 1 mg of CH4 2.5% +-0.01%, N2 bal", 10e-3, 1e-6, "CH4 2.5% ±0.01%, N2 bal", 2, "N2"},
		{"1 lb Ar", 0.45359237, -1, "Ar", 1, "Ar"},
		// Species named in words, pure and in a premix.
		{"25.103 g nitrous oxide", 25.103e-3, -1, "nitrous oxide", 1, "N2O"},
		{"10 g of CH4 2.5%, nitrous  oxide bal", 10e-3, -1, "CH4 2.5%, nitrous  oxide bal", 2, "N2O"},
	} {
		p, err := ParseParent(cat, tt.in)
		if err != nil {
			t.Errorf("ParseParent(%q): %v", tt.in, err)
			continue
		}
		bal := ""
		for _, pt := range p.Parts {
			if pt.Balance {
				bal = pt.Species.Formula
			}
		}
		if math.Abs(p.MassKg/tt.massKg-1) > 1e-12 || math.Abs(p.MassUKg-tt.massUKg) > 1e-15 || p.Gas != tt.gas || len(p.Parts) != tt.nParts || bal != tt.balanceOf {
			t.Errorf("ParseParent(%q) = mass %g ± %g, gas %q, %d parts, balance %s", tt.in, p.MassKg, p.MassUKg, p.Gas, len(p.Parts), bal)
		}
	}
	for _, tt := range []struct{ in, want string }{
		{"", "does not start with a mass"},
		{"CO2", "does not start with a mass"},
		{"25 g", "the gas is missing"},
		{"25 furlongs CO2", "unknown unit"},
		{"0 g CO2", "above 0"},
		{"25 g Unobtainium", "unknown species"},
		{"500 g air", "a weighed parent gives the composition its certificate states"},
		{"25 g N2 with O2 0.2 bar", "by moles (mol/mol, %, ppm, ppb) or by mass"},
		{"25 g N2 with O2 5wt%, Ar 3ppm", "all by moles (%, ppm) or all by mass"},
		{"25 g CH4 2 wt% ± 10ppm, N2 bal", "on one basis"},
		{"25 g CH4 2%, N2 3%", "one balance"},
		{"25 g CH4 2%, N2 bal, Ar bal", "one balance"},
		{"25 g CH4 60%, CO2 50%, N2 bal", "nothing for the balance"},
		{"25 g N2 with O2 0ppm", "above 0"},
		{"25 g N2 with N2 5ppm", "named twice"},
		{"25 g ± CO2", "± must be followed by a mass"},
		{"25 g N2 with O2 <0ppm", "limit must be above 0"},
		{"25 g " + strings.Repeat("N2 ", 400), "at most"},
		// A slip of the exponent: two such parents overflowed the
		// uncertainty sums (found by FuzzParseParent).
		{"1e308g N2", "at most 1e9 kg"},
		{"25 g ± 1e10 t N2", "unknown unit"},
		{"25 g ± 2e12 kg N2", "at most 1e9 kg"},
	} {
		_, err := ParseParent(cat, tt.in)
		if err == nil || !strings.Contains(err.Error(), tt.want) {
			t.Errorf("ParseParent(%q) = %v, want an error with %q", tt.in, err, tt.want)
		}
	}
}

// FuzzParseParent: any text gives a parent that solves to finite figures,
// or one error line; never a panic.
func FuzzParseParent(f *testing.F) {
	for _, s := range []string{"25.103 g CO2", "2.4612 kg ± 8 mg N2 with O2 <5ppm, H2O 10ppm ±2ppm",
		"10 g +- 1 mg of CH4 2.5% +-0.01%, N2 bal", "1e300 kg N2", "1 g N2 with O2 <1", "5 mg He with Ne 0.999999"} {
		f.Add(s)
	}
	cat := model.Builtin()
	f.Fuzz(func(t *testing.T, s string) {
		p, err := ParseParent(cat, s)
		if err != nil {
			if strings.Contains(err.Error(), "\n") {
				t.Errorf("error of more than one line: %q", err.Error())
			}
			return
		}
		r, err := Weighing{Parents: []WeighedParent{p, p}, MassUKg: 1e-6}.Solve()
		if err != nil {
			return
		}
		if what := FirstNonFinite(r); what != "" {
			t.Errorf("%q: non-finite %s", s, what)
		}
	})
}

// Every element of the built-in catalogue has its atomic weight's
// uncertainty.
func TestAtomicWeightUncertaintiesCoverCatalogue(t *testing.T) {
	for _, sp := range model.Builtin().All() {
		c, err := model.ParseFormula(sp.Formula)
		if err != nil {
			t.Errorf("%s: %v", sp.Formula, err)
			continue
		}
		for e := range c {
			if _, ok := atomicWeightUGPerMol[e]; !ok {
				t.Errorf("%s: no uncertainty for the atomic weight of %s", sp.Formula, e)
			}
		}
	}
}

// An atomic weight given by the user replaces the IUPAC one, value and
// uncertainty: for CO2 in argon the closed form of
// TestWeighedTwoComponents holds with u(M_Ar) = u(A_Ar) as given. With
// the IUPAC interval for argon (±0.16 g/mol, u = 0.092 g/mol) the molar
// masses dominate; with 39.9478 ± 0.0002 g/mol given (an input only,
// of the size a lab knows for argon of one source; the check is the
// closed form) the masses do.
func TestWeighedAtomicWeightGiven(t *testing.T) {
	base := mustParents(t, 0.002e-3, "37.6 g CO2", "695.1 g Ar")
	rIUPAC, err := base.Solve()
	if err != nil {
		t.Fatal(err)
	}
	aw, err := ParseAtomicWeight("Ar 39.9478 +- 0.0002")
	if err != nil {
		t.Fatal(err)
	}
	given := base
	given.AtomicWeights = []AtomicWeight{aw}
	r, err := given.Solve()
	if err != nil {
		t.Fatal(err)
	}
	m1, m2, um := 37.6, 695.1, 0.002
	mm1, mm2 := 12.011+2*15.999, 39.9478
	um1 := math.Sqrt(math.Pow(0.002, 2)+4*math.Pow(0.001, 2)) / math.Sqrt(3)
	um2 := 0.0002
	n1, n2 := m1/mm1, m2/mm2
	x1 := n1 / (n1 + n2)
	closed := x1 * (1 - x1) * math.Sqrt(math.Pow(um/m1, 2)+math.Pow(um/m2, 2)+math.Pow(um1/mm1, 2)+math.Pow(um2/mm2, 2))
	x, u := fractionOfWeighed(r, "CO2")
	if math.Abs(x/x1-1) > 1e-12 || math.Abs(u/closed-1) > 1e-9 {
		t.Errorf("CO2 in Ar, Ar as given: x, u = %.10g, %.6g; closed form %.10g, %.6g", x, u, x1, closed)
	}
	_, uIUPAC := fractionOfWeighed(rIUPAC, "CO2")
	if !(uIUPAC > 10*u) || !(rIUPAC.UMolar[0] > rIUPAC.UMasses[0]) || !(r.UMolar[0] < r.UMasses[0]) {
		t.Errorf("u(x CO2): IUPAC argon %.3g (molar %.3g, masses %.3g), given argon %.3g (molar %.3g, masses %.3g)",
			uIUPAC, rIUPAC.UMolar[0], rIUPAC.UMasses[0], u, r.UMolar[0], r.UMasses[0])
	}
	if !strings.Contains(strings.Join(r.Notes(), "\n"), "Ar 39.9478 ± 0.0002 g/mol") {
		t.Errorf("notes do not name the atomic weight given: %q", r.Notes())
	}
}

func TestParseAtomicWeight(t *testing.T) {
	for _, tt := range []struct {
		in   string
		el   string
		v, u float64
	}{
		{"Ar 39.9478 ± 0.0002", "Ar", 39.9478, 0.0002},
		{"Ar=39.9478+-0.0002", "Ar", 39.9478, 0.0002},
		{"B 10.812 +/- 0.003 g/mol", "B", 10.812, 0.003},
	} {
		a, err := ParseAtomicWeight(tt.in)
		if err != nil || a.Element != tt.el || a.GPerMol != tt.v || a.UGPer != tt.u {
			t.Errorf("ParseAtomicWeight(%q) = %+v, %v", tt.in, a, err)
		}
	}
	for _, tt := range []struct{ in, want string }{
		{"Ar", "value is missing"},
		{"Ar 39.95", "uncertainty is missing"},
		{"Xx 1 ± 0", "unknown element"},
		{"Ar2 79.9 ± 0", "unknown element"},
		{"Ar forty ± 0", "number above 0"},
		{"Ar 39.95 ± -1", "0 or more"},
		{"Ar 3.995 ± 0.001", "more than 1 %"},
	} {
		if _, err := ParseAtomicWeight(tt.in); err == nil || !strings.Contains(err.Error(), tt.want) {
			t.Errorf("ParseAtomicWeight(%q) = %v, want an error with %q", tt.in, err, tt.want)
		}
	}
}

// FuzzParseAtomicWeight: one error line or a finite, positive value.
func FuzzParseAtomicWeight(f *testing.F) {
	for _, s := range []string{"Ar 39.9478 ± 0.0002", "Ar=39.9478+-0.0002", "H 1.008 +/- 0", "Ar 1e308 ± 1e308"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		a, err := ParseAtomicWeight(s)
		if err != nil {
			if strings.Contains(err.Error(), "\n") {
				t.Errorf("error of more than one line: %q", err.Error())
			}
			return
		}
		if !(a.GPerMol > 0) || math.IsInf(a.GPerMol, 0) || !(a.UGPer >= 0) || math.IsInf(a.UGPer, 0) {
			t.Errorf("%q: %+v", s, a)
		}
	})
}
