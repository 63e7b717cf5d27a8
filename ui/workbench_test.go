package ui

import (
	"math"
	"strings"
	"testing"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/model"
)

func testBench(t *testing.T, entries []mixtures.FileComponent, temp, pres string) *bench {
	t.Helper()
	b := newBench(model.Builtin())
	b.entries = entries
	b.tempText, b.presText = temp, pres
	b.update()
	return b
}

func TestBenchErrorsInPlace(t *testing.T) {
	cases := []struct {
		name     string
		entries  []mixtures.FileComponent
		wantRow  int    // entry that carries the error, -1 for the blend as a whole
		wantText string // part of the error
	}{
		{"unknown species with suggestion", recipe("N2", "bal", "Argon2", "1%"), 1, "unknown species"},
		{"bad unit", recipe("N2", "bal", "O2", "21 furlongs"), 1, "unknown unit"},
		{"no amount yet", recipe("N2", "bal", "O2", ""), 1, "type an amount"},
		{"negative", recipe("N2", "bal", "O2", "-3%"), 1, "negative"},
		{"over 100 %", recipe("N2", "80%", "O2", "30%"), -1, "more than 100 %"},
		{"under 100 % and no balance", recipe("N2", "50%", "O2", "30%"), -1, "no species is the balance"},
		{"two balances", recipe("N2", "bal", "Ar", "bal"), 1, "more than one balance"},
		{"comma in an amount", recipe("N2", "bal", "O2", "2%, Ar 1%"), 1, "one amount per line"},
		{"decimal comma in an amount", recipe("N2", "bal", "O2", "4,5 %"), 1, `the comma in "4,5": write decimals with a point`},
		{"empty", nil, -1, "empty"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			b := testBench(t, c.entries, "300 K", "1 bar")
			got := b.blendErr
			if c.wantRow >= 0 {
				got = b.rowErr[c.wantRow]
			}
			if !strings.Contains(got, c.wantText) {
				t.Errorf("error = %q (row errors %q, blend %q), want it to contain %q", got, b.rowErr, b.blendErr, c.wantText)
			}
			if b.in.Mixture != nil {
				t.Errorf("an invalid recipe produced a mixture")
			}
		})
	}
}

func TestBenchUnknownSpeciesSuggests(t *testing.T) {
	b := testBench(t, recipe("N2", "bal", "SiH5", "1%"), "300 K", "1 bar")
	if !strings.Contains(b.rowErr[1], "SiH4") {
		t.Errorf("row error %q, want a suggestion of SiH4", b.rowErr[1])
	}
}

// A typing slip must not replace the last valid state: the Inputs and
// their generation stay until the text reads again.
func TestBenchLastValidStays(t *testing.T) {
	b := testBench(t, recipe("N2", "79%", "O2", "21%"), "300 K", "1 bar")
	if !b.in.Valid() || b.in.Gen != 1 {
		t.Fatalf("first state: valid %v gen %d", b.in.Valid(), b.in.Gen)
	}
	want := b.in
	b.setAmount(1, "21%x")
	b.setTemp("300 Q")
	b.setPres("-1 bar")
	if changed := b.update(); changed {
		t.Errorf("update() = true after invalid edits, want false")
	}
	if b.in.Gen != want.Gen || b.in.TempK != want.TempK || b.in.PresPa != want.PresPa || b.in.Mixture != want.Mixture {
		t.Errorf("inputs changed on invalid text: %+v, want %+v", b.in, want)
	}
	if b.rowErr[1] == "" || b.tempErr == "" || b.presErr == "" {
		t.Errorf("errors not shown: row %q temp %q pres %q", b.rowErr[1], b.tempErr, b.presErr)
	}
	if b.entries[1].Amount != "21%x" || b.tempText != "300 Q" {
		t.Errorf("the typed text was not kept: %q, %q", b.entries[1].Amount, b.tempText)
	}
	b.setAmount(1, "20%")
	b.setAmount(0, "bal")
	b.setTemp("310 K")
	if !b.update() || b.in.Gen != want.Gen+1 {
		t.Errorf("fixing the text did not bring new inputs (gen %d)", b.in.Gen)
	}
	if b.in.TempK != 310 {
		t.Errorf("TempK = %g, want 310", b.in.TempK)
	}
	// The pressure is still wrong: the last valid one stays in force.
	if b.in.PresPa != 1e5 {
		t.Errorf("PresPa = %g, want the last valid 1e5", b.in.PresPa)
	}
}

func TestBenchNoChangeNoGeneration(t *testing.T) {
	b := testBench(t, recipe("N2", "bal", "O2", "21%"), "300 K", "1 bar")
	gen := b.in.Gen
	b.setAmount(1, "21 %") // reads the same
	if b.update() || b.in.Gen != gen {
		t.Errorf("same blend, new generation %d (was %d)", b.in.Gen, gen)
	}
}

func TestBenchNormalise(t *testing.T) {
	cases := []struct {
		name    string
		amounts []string
		want    []string
		err     error
	}{
		{"percent", []string{"30%", "30%"}, []string{"50%", "50%"}, nil},
		{"units kept", []string{"0.5", "25%", "250000 ppm"}, []string{"0.5", "25%", "250000 ppm"}, nil},
		{"units scaled", []string{"0.3", "10 %", "100000ppm"}, []string{"0.6", "20 %", "200000ppm"}, nil},
		{"mass basis", []string{"20 wt%", "20 wt%"}, []string{"50 wt%", "50 wt%"}, nil},
		{"balance present", []string{"10%", "bal"}, nil, errNormBalance},
		{"mixed bases", []string{"10%", "20 wt%"}, nil, errNormMixed},
		{"partial pressure", []string{"0.2 bar", "0.8 bar"}, nil, errNormPartial},
		{"bad entry", []string{"10%", "x"}, nil, errNormBad},
		{"all zero", []string{"0%", "0"}, nil, errNormEmpty},
	}
	species := []string{"N2", "O2", "Ar"}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			var es []mixtures.FileComponent
			for i, a := range c.amounts {
				es = append(es, mixtures.FileComponent{Species: species[i], Amount: a})
			}
			b := testBench(t, es, "300 K", "1 bar")
			err := b.normalise()
			if err != c.err {
				t.Fatalf("normalise() = %v, want %v", err, c.err)
			}
			if err != nil {
				for i, a := range c.amounts {
					if b.entries[i].Amount != a {
						t.Errorf("a refused normalise changed %q to %q", a, b.entries[i].Amount)
					}
				}
				return
			}
			for i, w := range c.want {
				if b.entries[i].Amount != w {
					t.Errorf("entry %d = %q, want %q", i, b.entries[i].Amount, w)
				}
			}
			if b.update(); b.in.Mixture == nil {
				t.Errorf("normalised recipe does not resolve: %q %q", b.rowErr, b.blendErr)
			}
		})
	}
}

// Moving the balance keeps the blend: the old balance gets its share.
func TestBenchSetBalance(t *testing.T) {
	b := testBench(t, recipe("N2", "bal", "O2", "21%", "Ar", "1%"), "300 K", "1 bar")
	before := b.in.Mixture
	b.setBalance(1)
	b.update()
	if got := b.entries[1].Amount; got != "bal" {
		t.Errorf("O2 amount = %q, want bal", got)
	}
	if got := b.entries[0].Amount; got != "78%" {
		t.Errorf("N2 amount = %q, want its share 78%%", got)
	}
	for i, c := range b.in.Mixture.Components {
		if math.Abs(c.X-before.Components[i].X) > 1e-12 {
			t.Errorf("%s: x = %g, was %g", c.Species.Formula, c.X, before.Components[i].X)
		}
	}
	// Marking the balance again writes its share back.
	b.setBalance(1)
	if got := b.entries[1].Amount; got != "21%" {
		t.Errorf("O2 amount = %q after clearing the balance, want 21%%", got)
	}
}

// An entry may name its species instead of giving the formula.
func TestBenchSpeciesByName(t *testing.T) {
	b := testBench(t, recipe("nitrogen", "bal", "argon", "1%"), "300 K", "1 bar")
	if x, ok := b.moleFraction("argon"); !ok || x != 0.01 {
		t.Errorf("x(argon) = %g, %v", x, ok)
	}
	b.setBalance(1)
	if got := b.entries[0].Amount; got != "99%" {
		t.Errorf("nitrogen after moving the balance: %q, want 99%%", got)
	}
}

func TestBenchBlendFileRoundTrip(t *testing.T) {
	b := newBench(model.Builtin())
	b.loadFile(mixtures.DemoFile())
	f := b.blendFile()
	demo := mixtures.DemoFile()
	if f.BlendText() != demo.BlendText() || f.Temperature != demo.Temperature || f.Pressure != demo.Pressure ||
		f.StandardPressure != demo.StandardPressure || f.Name != demo.Name {
		t.Errorf("blend file round trip: got %+v, want %+v", f, demo)
	}
}

// Numbers on screen are mixtures.FormatSig's (its table, special values
// included, is in mixtures/format_test.go), the same as the commands'.
func TestSig(t *testing.T) {
	for _, x := range []float64{29.1234, 0, math.NaN()} {
		if got, want := report.Sig(x, 5), mixtures.FormatSig(x, 5); got != want {
			t.Errorf("report.Sig(%g, 5) = %q, want %q", x, got, want)
		}
	}
	if got := report.Fixed(-0.0001, 3); got != "0.000" {
		t.Errorf("report.Fixed(-0.0001, 3) = %q, want 0.000", got)
	}
}

func TestToASCII(t *testing.T) {
	cases := []struct{ in, want string }{
		{"μᵢ = μᵢ°(T), P° 1 bar, 25 °C", "mu_i = mu_i0(T), P0 1 bar, 25 C"},
		{"J/(mol·K)", "J/(mol.K)"},
		{"kg/m³, J mol⁻¹", "kg/m3, J mol^-1"},
		{"n/nQ ≪ 1", "n/nQ << 1"},
		{"Θrot ×2, T/Θvib", "Theta_rot x2, T/Theta_vib"},
		{"odd ☃", "odd ?"},
	}
	for _, c := range cases {
		if got := report.ToASCII(c.in); got != c.want {
			t.Errorf("report.ToASCII(%q) = %q, want %q", c.in, got, c.want)
		}
	}
}
