package mixtures

import (
	"math"
	"testing"

	"zmix/model"
)

// The table is read by every output, so its rows must be unambiguous:
// one key and one JSON/CSV name each.
func TestQuantityTableUnique(t *testing.T) {
	names := map[string]string{}
	keys := map[string]bool{}
	for _, q := range Quantities {
		if q.Get == nil || q.Key == "" || q.Name == "" || q.Label == "" || q.Symbol == "" || q.SymbolASCII == "" {
			t.Errorf("quantity %q: missing key, name, label, symbol or getter", q.Key)
		}
		if q.Scale == 0 || (q.Digits.Sig == 0 && q.Digits.Decimals == 0) {
			t.Errorf("quantity %q: no scale or digits", q.Key)
		}
		if keys[q.Key] {
			t.Errorf("quantity key %q twice", q.Key)
		}
		keys[q.Key] = true
		for _, n := range []string{q.Name, q.PerKgName} {
			if n == "" {
				continue
			}
			if other, dup := names[n]; dup {
				t.Errorf("name %q used by %q and %q", n, other, q.Key)
			}
			names[n] = q.Key
		}
		if q.SpeciesKey != "" {
			if _, ok := SpeciesQuantityByKey(q.SpeciesKey); !ok {
				t.Errorf("quantity %q: species key %q not in the species table", q.Key, q.SpeciesKey)
			}
		}
	}
	skeys := map[string]bool{}
	snames := map[string]bool{}
	for _, q := range SpeciesQuantities {
		if q.Get == nil || q.Name == "" || q.Key == "" || q.Scale == 0 {
			t.Errorf("species quantity %q: missing name, key, scale or getter", q.Key)
		}
		if skeys[q.Key] || snames[q.Name] {
			t.Errorf("species quantity %q / %q twice", q.Key, q.Name)
		}
		skeys[q.Key], snames[q.Name] = true, true
		if q.ShareOf != "" {
			if _, ok := QuantityByKey(q.ShareOf); !ok {
				t.Errorf("species quantity %q: share of unknown %q", q.Key, q.ShareOf)
			}
		}
	}
}

// Each getter reads its own field: on a real state the rows give the
// values the State holds, so a row copied and not edited is caught.
func TestQuantityGetters(t *testing.T) {
	m := mustMixture(t, "N2 78%, O2 21%, Ar 1%", 101325)
	s, err := m.State(300, 101325, Options{})
	if err != nil {
		t.Fatal(err)
	}
	want := map[string]float64{
		"T": s.TempK, "P": s.PresPa, "P0": s.StdPresPa, "M": s.MolarMassKgPerMol, "rho": s.DensityKgPerM3,
		"Cp": s.CpJPerMolK, "Cv": s.CvJPerMolK, "gamma": s.Gamma, "c": s.SoundSpeedMPerS,
		"H": s.HJPerMol, "U": s.UJPerMol, "S": s.SJPerMolK, "G": s.GJPerMol, "A": s.AJPerMol, "Smix": s.SMixJPerMolK,
		"Z": s.RealGas.Z, "rho_real": s.MolarMassKgPerMol / s.RealGas.VM3PerMol,
		"Wsep": s.TempK * s.SMixJPerMolK,
	}
	if len(want) != len(Quantities) {
		t.Errorf("the test checks %d quantities, the table has %d: add the new row here", len(want), len(Quantities))
	}
	for _, q := range Quantities {
		if got := q.Get(&s); got != want[q.Key] {
			t.Errorf("%s.Get = %g, want %g", q.Key, got, want[q.Key])
		}
	}
	tr := &s.Species[1]
	swant := map[string]float64{
		"x": tr.X, "w": tr.MassFrac, "p": tr.PartialPresPa, "mu": tr.MuJPerMol, "mu0": tr.Mu0JPerMol,
		"S": tr.SJPerMolK, "Cp": tr.CpJPerMolK, "H": tr.HJPerMol, "Sshare": tr.SShareJPerMolK, "Cpshare": tr.CpShareJPerMolK,
	}
	if len(swant) != len(SpeciesQuantities) {
		t.Errorf("the test checks %d species quantities, the table has %d", len(swant), len(SpeciesQuantities))
	}
	for _, q := range SpeciesQuantities {
		if got := q.Get(tr); got != swant[q.Key] {
			t.Errorf("species %s.Get = %g, want %g", q.Key, got, swant[q.Key])
		}
	}
}

func TestFirstNonFinite(t *testing.T) {
	m := mustMixture(t, "N2 78%, O2 22%", 101325)
	s, err := m.State(300, 101325, Options{})
	if err != nil {
		t.Fatal(err)
	}
	if got := FirstNonFinite(&s); got != "" {
		t.Fatalf("FirstNonFinite(air) = %q, want \"\"", got)
	}
	bad := s
	bad.Gamma = math.NaN()
	if got, want := FirstNonFinite(&bad), "γ = Cp/Cv"; got != want {
		t.Errorf("FirstNonFinite(γ NaN) = %q, want %q", got, want)
	}
	bad = s
	bad.Species = append([]SpeciesTerm(nil), s.Species...)
	bad.Species[1].MuJPerMol = math.Inf(-1)
	if got, want := FirstNonFinite(&bad), "O2 chemical potential μᵢ = μᵢ° + RT ln(xᵢP/P°)"; got != want {
		t.Errorf("FirstNonFinite(μ −Inf) = %q, want %q", got, want)
	}
	// A real-gas figure that is not known is no fault; one that is known
	// and not finite is.
	bad = s
	bad.RealGasKnown = false
	if got := FirstNonFinite(&bad); got != "" {
		t.Errorf("FirstNonFinite(real gas not known) = %q, want \"\"", got)
	}
	bad = s
	bad.RealGas.Z = math.Inf(1)
	if got, want := FirstNonFinite(&bad), "compressibility Z"; got != want {
		t.Errorf("FirstNonFinite(Z Inf) = %q, want %q", got, want)
	}
	if n := testing.AllocsPerRun(100, func() { FirstNonFinite(&s) }); n != 0 {
		t.Errorf("FirstNonFinite allocates %v times, want 0", n)
	}
}

// The minimum separation work is T·ΔSmix, the reversible work of
// un-mixing: for an equimolar binary it is RT ln 2 per mole, and for a
// pure gas it is zero (exact identities of ideal mixing).
func TestMinSeparationWork(t *testing.T) {
	q, ok := QuantityByKey("Wsep")
	if !ok {
		t.Fatal("no Wsep row")
	}
	cases := []struct {
		name  string
		blend string
		tempK float64
		want  float64
	}{
		{"equimolar N2/O2", "N2 50%, O2 50%", 300, model.GasConstant * 300 * math.Ln2},
		{"equimolar He/Ar at 1000 K", "He 0.5, Ar 0.5", 1000, model.GasConstant * 1000 * math.Ln2},
		{"pure N2", "N2 1", 300, 0},
	}
	for _, c := range cases {
		m := mustMixture(t, c.blend, 1e5)
		s, err := m.State(c.tempK, 1e5, Options{})
		if err != nil {
			t.Fatal(err)
		}
		if got := q.Get(&s); math.Abs(got-c.want) > 1e-6*math.Max(1, c.want) {
			t.Errorf("%s: Wsep = %.9g J/mol, want %.9g", c.name, got, c.want)
		}
	}
}
