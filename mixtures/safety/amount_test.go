package safety

import (
	"math"
	"strings"
	"testing"

	"zmix/model"
)

func TestParseAmount(t *testing.T) {
	// Reference conditions are definitions: normal 0 °C and 101.325 kPa,
	// ISO 13443 15 °C, scf at 60 °F and 14.696 psia; 1 lb = 0.45359237 kg.
	r := model.GasConstant
	cases := []struct {
		in      string
		molarKg float64
		wantMol float64
	}{
		{"40 mol", 0.028, 40},
		{"2 kmol", 0.028, 2000},
		{"2.8 kg", 0.028, 100},
		{"1 lb", 0.45359237, 1},
		{"1 Nm3", 0.028, 101325 / (r * 273.15)},
		{"1000 SL", 0.028, 101325 / (r * 273.15)},
		{"1 Sm3", 0.028, 101325 / (r * 288.15)},
		{"1 m³", 0.028, 101325 / (r * 293.15)},
		{"1 scf", 0.028, 0.3048 * 0.3048 * 0.3048 * 14.696 * 0.45359237 * 9.80665 / (0.0254 * 0.0254) / (r * (60 + 459.67) * 5 / 9)},
	}
	for _, c := range cases {
		a, err := ParseAmount(c.in)
		if err != nil {
			t.Errorf("ParseAmount(%q): %v", c.in, err)
			continue
		}
		if got := a.Mol(c.molarKg); math.Abs(got-c.wantMol) > 1e-12*c.wantMol {
			t.Errorf("ParseAmount(%q).Mol = %g, want %g", c.in, got, c.wantMol)
		}
	}
	for _, bad := range []string{"", "5", "kg", "-1 kg", "0 mol", "NaN kg", "1e400 kg", "5 parsecs", strings.Repeat("9", 300) + " kg"} {
		if _, err := ParseAmount(bad); err == nil {
			t.Errorf("ParseAmount(%q) accepted", bad)
		}
	}
}

func FuzzParseAmount(f *testing.F) {
	for _, s := range []string{"2 Nm3", "5 kg", "300 scf", "1e3 SL", "-1 mol", "NaN kg", "1e400 g", "3 m^3"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		a, err := ParseAmount(s)
		if err != nil {
			if strings.Contains(model.UserMessage(err), "\n") {
				t.Fatalf("multi-line error for %q", s)
			}
			return
		}
		if mol := a.Mol(0.028); !(mol > 0) || math.IsInf(mol, 0) {
			t.Fatalf("ParseAmount(%q) = %g mol", s, mol)
		}
	})
}
