package mixtures

import (
	"math"
	"os"
	"path/filepath"
	"strings"
	"sync"
	"testing"

	"gonum.org/v1/gonum/unit/constant"

	"zmix/model"
)

// rGas is R = N_A·k from gonum's CODATA 2018 exact constants, computed
// here rather than taken from package model so that the tests do not
// check the package against itself.
var rGas = float64(constant.Avogadro) * float64(constant.Boltzmann)

// extraSpeciesText holds species the tests need that the built-in
// catalogue may not hold yet. Only the blocks whose formula the built-in
// catalogue lacks are used, so once the catalogue has a species, its
// published data wins over these. The blend, caution and benchmark tests
// depend only on the molar mass (computed from the formula with the IUPAC
// weights), the hazard classes and the rotor kind, not on the fine detail
// of the spectroscopic constants.
const extraSpeciesText = `
[He]
name    = helium
rotor   = atom
dHf0_kJ = 0
boil_K  = 4.22       | from memory
hazards = asphyxiant

[CH4]
name    = methane
rotor   = nonlinear
rot_cm  = 5.241 5.241 5.241          | from memory
sigma   = 12
vib_cm  = 2917 1534x2 3019x3 1306x3  | from memory
dHf0_kJ = -66.911                    | NIST-JANAF 4th ed., table C-067, 0 K row
boil_K  = 111.7                      | from memory
hazards = flammable, asphyxiant

[H2O]
name    = water
rotor   = nonlinear
rot_cm  = 27.88 14.51 9.28   | from memory
sigma   = 2
vib_cm  = 3657 1595 3756     | from memory
dHf0_kJ = -238.921           | NIST-JANAF 4th ed., table H-064, 0 K row
boil_K  = 373.12             | from memory

[NH3]
name    = ammonia
rotor   = nonlinear
rot_cm  = 9.44 9.44 6.20            | from memory
sigma   = 3
vib_cm  = 3337 950 3444x2 1627x2    | from memory
dHf0_kJ = -38.907                   | NIST-JANAF 4th ed., table H-083, 0 K row
boil_K  = 239.8                     | from memory
hazards = toxic, corrosive, flammable

[CO]
name    = carbon monoxide
rotor   = linear
rot_cm  = 1.9313    | from memory
vib_cm  = 2143      | from memory
dHf0_kJ = -113.8    | from memory
boil_K  = 81.6      | from memory
hazards = toxic, flammable

[SiH4]
name    = silane
rotor   = nonlinear
rot_cm  = 2.859 2.859 2.859          | from memory
sigma   = 12
vib_cm  = 2187 975x2 2191x3 914x3    | from memory
dHf0_kJ = 43.9                       | from memory
boil_K  = 161                        | from memory
hazards = pyrophoric, flammable, toxic
`

var (
	testCatOnce sync.Once
	testCat     *model.Catalogue
	testCatErr  error
)

// testCatalogue returns the built-in catalogue plus the species of
// extraSpeciesText that it lacks.
func testCatalogue(tb testing.TB) *model.Catalogue {
	tb.Helper()
	testCatOnce.Do(func() {
		builtin := model.Builtin()
		var keep []string
		for _, block := range strings.Split(extraSpeciesText, "\n[")[1:] {
			formula, _, _ := strings.Cut(block, "]")
			if _, ok := builtin.Lookup(formula); !ok {
				keep = append(keep, "["+block)
			}
		}
		if len(keep) == 0 {
			testCat = builtin
			return
		}
		dir, err := os.MkdirTemp("", "zmix-mixtures-test-")
		if err != nil {
			testCatErr = err
			return
		}
		defer os.RemoveAll(dir)
		path := filepath.Join(dir, "extra.cat")
		if err := os.WriteFile(path, []byte(strings.Join(keep, "\n")), 0o644); err != nil {
			testCatErr = err
			return
		}
		testCat, testCatErr = builtin.WithFile(path)
	})
	if testCatErr != nil {
		tb.Fatalf("test catalogue: %v", testCatErr)
	}
	return testCat
}

// mustSpecies looks a formula up in the test catalogue.
func mustSpecies(tb testing.TB, formula string) *model.Species {
	tb.Helper()
	sp, ok := testCatalogue(tb).Lookup(formula)
	if !ok {
		tb.Fatalf("species %s not in the test catalogue", formula)
	}
	return sp
}

// mustMixture parses and resolves blend text against the test catalogue.
func mustMixture(tb testing.TB, text string, presPa float64) *Mixture {
	tb.Helper()
	b, err := ParseBlend(text)
	if err != nil {
		tb.Fatalf("ParseBlend(%q): %v", text, err)
	}
	m, err := b.Resolve(testCatalogue(tb), presPa)
	if err != nil {
		tb.Fatalf("Resolve(%q): %v", text, err)
	}
	return m
}

// mustState computes a mixture state or fails the test.
func mustState(tb testing.TB, m *Mixture, tempK, presPa float64) State {
	tb.Helper()
	s, err := m.State(tempK, presPa, Options{})
	if err != nil {
		tb.Fatalf("State(%g K, %g Pa): %v", tempK, presPa, err)
	}
	return s
}

// fractionOf returns the mole fraction of formula in m (0 if absent).
func fractionOf(m *Mixture, formula string) float64 {
	for _, c := range m.Components {
		if c.Species.Formula == formula {
			return c.X
		}
	}
	return 0
}

// relClose reports whether got is within relTol of want, relative to the
// larger magnitude, or within absTol absolutely.
func relClose(got, want, relTol, absTol float64) bool {
	d := math.Abs(got - want)
	return d <= absTol || d <= relTol*math.Max(math.Abs(got), math.Abs(want))
}
