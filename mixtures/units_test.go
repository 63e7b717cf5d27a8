package mixtures

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// Conversion factors used as check values. Each is a definition or a
// published value, not a number taken from units.go.
const (
	// 1 psi = 6894.757 Pa (NIST SP 811, Appendix B, from memory); the
	// exact figure follows from 1 lbf = 0.45359237 kg × 9.80665 m/s² and
	// 1 in = 0.0254 m, both definitions.
	psiPa = 6894.757
	// 1 Torr = 101325/760 Pa (definition).
	torrPa = 101325.0 / 760
	// 1 atm = 101325 Pa (definition).
	atmPa = 101325.0
)

func TestParseTemperature(t *testing.T) {
	cases := []struct {
		in     string
		wantK  float64
		tol    float64
		source string
	}{
		{"300 K", 300, 0, "definition"},
		{"300K", 300, 0, "definition"},
		{"300 k", 300, 0, "definition"},
		{"1e3 K", 1000, 0, "definition"},
		{"25 C", 298.15, 1e-12, "T/K = t/°C + 273.15 (definition)"},
		{"25C", 298.15, 1e-12, "definition"},
		{"25 °C", 298.15, 1e-12, "definition"},
		{"25°C", 298.15, 1e-12, "definition"},
		{"25 degC", 298.15, 1e-12, "definition"},
		{"25 deg C", 298.15, 1e-12, "definition"},
		{"25 ° C", 298.15, 1e-12, "definition"},
		{"0.01 C", 273.16, 1e-12, "triple point of water, 273.16 K (definition of the old kelvin)"},
		{"-40 C", 233.15, 1e-12, "definition"},
		{"-273.14 C", 0.01, 1e-9, "definition"},
		{"32 F", 273.15, 1e-12, "T/K = (t/°F + 459.67)·5/9 (definition)"},
		{"212 °F", 373.15, 1e-12, "definition"},
		{"-40 F", 233.15, 1e-12, "−40 °F = −40 °C (follows from the definitions)"},
		{"77°F", 298.15, 1e-12, "definition"},
		{"491.67 R", 273.15, 1e-12, "T/K = T/°R·5/9 (definition)"},
		{"540 R", 300, 1e-12, "definition"},
		{"540 °R", 300, 1e-12, "definition"},
		{"  300 K  ", 300, 0, "definition"},
	}
	for _, c := range cases {
		got, err := ParseTemperature(c.in)
		if err != nil {
			t.Errorf("ParseTemperature(%q): %v", c.in, err)
			continue
		}
		if math.Abs(got-c.wantK) > c.tol {
			t.Errorf("ParseTemperature(%q) = %.15g K, want %.15g K (%s)", c.in, got, c.wantK, c.source)
		}
	}
}

func TestParseTemperatureErrors(t *testing.T) {
	cases := []struct {
		in   string
		want string // the message must hold this besides the value
	}{
		{"0 K", "above 0 K"},
		{"-1 K", "above 0 K"},
		{"-273.15 C", "above 0 K"},
		{"-300 C", "above 0 K"},
		{"-459.67 F", "above 0 K"},
		{"0 R", "above 0 K"},
		{"warm", TemperatureUnits},
		{"", TemperatureUnits},
		{"K", TemperatureUnits},
		{"300", TemperatureUnits},
		{"300 kelvins", TemperatureUnits},
		{"300 X", TemperatureUnits},
		{"NaN K", TemperatureUnits},
		{"Inf K", TemperatureUnits},
		{"1e999 K", TemperatureUnits},
		{"3-00 K", TemperatureUnits},
	}
	for _, c := range cases {
		_, err := ParseTemperature(c.in)
		if err == nil {
			t.Errorf("ParseTemperature(%q): no error", c.in)
			continue
		}
		checkValueError(t, err, c.in, c.want)
	}
}

func TestParsePressure(t *testing.T) {
	cases := []struct {
		in     string
		wantPa float64
		gauge  bool
		tol    float64 // relative
		source string
	}{
		{"101325 Pa", 101325, false, 0, "definition"},
		{"100 kPa", 1e5, false, 1e-15, "SI prefix"},
		{"1 MPa", 1e6, false, 0, "SI prefix"},
		{"1 MPA", 1e6, false, 0, "SI prefix"},
		{"1 bar", 1e5, false, 0, "1 bar = 10⁵ Pa (definition)"},
		{"1 bara", 1e5, false, 0, "definition"},
		{"1bar", 1e5, false, 0, "definition"},
		{"1013.25 mbar", atmPa, false, 1e-15, "definition"},
		{"1 atm", atmPa, false, 0, "definition"},
		{"760 Torr", atmPa, false, 1e-15, "definition"},
		{"1 torr", torrPa, false, 1e-15, "definition"},
		{"1 psi", psiPa, false, 1e-7, "NIST SP 811, from memory"},
		{"1 psia", psiPa, false, 1e-7, "NIST SP 811, from memory"},
		{"14.696 psia", atmPa, false, 4e-6, "1 atm = 14.696 psi (handbook, from memory)"},
		{"1e-3 Pa", 1e-3, false, 0, "definition"},
		{"0 barg", atmPa, true, 0, "gauge zero is one standard atmosphere"},
		{"1 barg", atmPa + 1e5, true, 0, "definition"},
		{"2.5 barg", atmPa + 2.5e5, true, 1e-15, "definition"},
		{"-0.5 barg", atmPa - 0.5e5, true, 1e-15, "definition"},
		{"0 psig", atmPa, true, 0, "definition"},
		{"10 psig", atmPa + 10*psiPa, true, 1e-7, "NIST SP 811, from memory"},
		{"100 kPag", atmPa + 1e5, true, 0, "definition"},
		// The marks of drawings and datasheets.
		{"2.5 bar(g)", atmPa + 2.5e5, true, 1e-15, "definition"},
		{"2.5 bar g", atmPa + 2.5e5, true, 1e-15, "definition"},
		{"150 kPa(a)", 1.5e5, false, 0, "definition"},
		{"1013.25 hPa", atmPa, false, 1e-15, "SI prefix"},
		// The conventional mmHg is 13.5951 g/cm³ × 9.80665 m/s² × 1 mm
		// (from memory): 760 of them are 1 atm to 1.4e-7.
		{"760 mmHg", atmPa, false, 2e-7, "conventional mmHg, from memory"},
		{"29.9213 inHg", atmPa, false, 2e-6, "conventional inHg (25.4 mmHg), from memory"},
		// kgf/cm² = 9.80665 N / 1e-4 m² exactly (standard gravity, CGPM 1901).
		{"1 kgf/cm2", 98066.5, false, 0, "definition"},
		{"1 kg/cm²", 98066.5, false, 0, "definition"},
		{"5 kgf/cm2g", atmPa + 5*98066.5, true, 1e-15, "definition"},
		{"5 kg/cm2(g)", atmPa + 5*98066.5, true, 1e-15, "definition"},
	}
	for _, c := range cases {
		got, err := ParsePressure(c.in)
		if err != nil {
			t.Errorf("ParsePressure(%q): %v", c.in, err)
			continue
		}
		if !relClose(got.Pa, c.wantPa, c.tol, 0) || got.Gauge != c.gauge {
			t.Errorf("ParsePressure(%q) = %.12g Pa gauge=%v, want %.12g Pa gauge=%v (%s)", c.in, got.Pa, got.Gauge, c.wantPa, c.gauge, c.source)
		}
	}
}

func TestParsePressureErrors(t *testing.T) {
	cases := []struct {
		in   string
		want string
	}{
		{"0 Pa", "above 0 Pa"},
		{"-1 bar", "above 0 Pa"},
		{"-1.1 barg", "above 0 Pa"},
		{"-15 psig", "above 0 Pa"},
		{"high", PressureUnits},
		{"", PressureUnits},
		{"bar", PressureUnits},
		{"5", PressureUnits},
		{"5 furlongs", PressureUnits},
		{"5 K", PressureUnits},
		{"NaN bar", PressureUnits},
		{"1e400 Pa", PressureUnits},
		{"1e400 Pa", "too large a number"}, // a number, but past float64
		// Finite as typed, infinite in Pa.
		{"1e303 MPa", "too large"},
		// mPa would be millipascal; read as MPa it would be 10⁹ times off.
		{"5 mPa", "MPa"},
		{"5 mpa", "MPa"},
		{"5 mPa(g)", "MPa"},
		// A decimal comma would read as 1 and a unit ",5 bar".
		{"1,5 bar", `"1,5" has a comma in it: write decimals with a point (1.5) and numbers without thousands separators (1000)`},
		{"1,013 mbar", `"1,013" has a comma in it`},
		// A range where one value goes points at the sweep.
		{"1..5 bar", "is a range; one value is wanted here"},
		{"1 to 5 bar", "is a range; one value is wanted here"},
	}
	for _, c := range cases {
		_, err := ParsePressure(c.in)
		if err == nil {
			t.Errorf("ParsePressure(%q): no error", c.in)
			continue
		}
		checkValueError(t, err, c.in, c.want)
	}
}

// checkValueError checks that a value error wraps ErrValue, names the
// value as typed, says what is accepted and fits on one line.
func checkValueError(t *testing.T, err error, in, want string) {
	t.Helper()
	msg := err.Error()
	if !errors.Is(err, ErrValue) {
		t.Errorf("%q: error %q does not wrap ErrValue", in, msg)
	}
	if !strings.Contains(msg, `"`+in+`"`) {
		t.Errorf("%q: error %q does not name the value", in, msg)
	}
	if !strings.Contains(msg, want) {
		t.Errorf("%q: error %q does not say %q", in, msg, want)
	}
	if strings.Contains(msg, "\n") {
		t.Errorf("%q: error %q spans lines", in, msg)
	}
}

func TestParseRange(t *testing.T) {
	cases := []struct {
		in, from, to string
	}{
		{"300..1500 K", "300 K", "1500 K"},
		{"300 K..1500 K", "300 K", "1500 K"},
		{"300 K .. 1500 K", "300 K", "1500 K"},
		{"1 bar..50 bar", "1 bar", "50 bar"},
		{"1..50 bar", "1 bar", "50 bar"},
		{"1.5..2.5 bar", "1.5 bar", "2.5 bar"},
		{"-40..120 C", "-40 C", "120 C"},
		{"0 C..500 K", "0 C", "500 K"},
		{"1e-3..1e5 Pa", "1e-3 Pa", "1e5 Pa"},
		{"300 K..1500", "300 K", "1500 K"},
		{"1 bar..50", "1 bar", "50 bar"},
	}
	for _, c := range cases {
		from, to, err := ParseRange(c.in)
		if err != nil || from != c.from || to != c.to {
			t.Errorf("ParseRange(%q) = %q, %q, %v; want %q, %q", c.in, from, to, err, c.from, c.to)
		}
	}
	for _, bad := range []string{"", "300", "300-1500 K", "..1500 K", "300..", " .. "} {
		_, _, err := ParseRange(bad)
		if err == nil {
			t.Errorf("ParseRange(%q): no error", bad)
			continue
		}
		if !errors.Is(err, ErrValue) || !strings.Contains(err.Error(), `"`+bad+`"`) || !strings.Contains(err.Error(), "FROM..TO") {
			t.Errorf("ParseRange(%q): error %q; want one naming the value and the FROM..TO form", bad, err)
		}
	}
	// Both ends of a parsed range must then read as values of one kind.
	from, to, _ := ParseRange("300..1500 K")
	if a, err := ParseTemperature(from); err != nil || a != 300 {
		t.Errorf("range start %q = %g, %v", from, a, err)
	}
	if b, err := ParseTemperature(to); err != nil || b != 1500 {
		t.Errorf("range end %q = %g, %v", to, b, err)
	}
}

func TestParseStdPressure(t *testing.T) {
	cases := []struct {
		in     string
		wantPa float64
	}{
		{"", 1e5}, {"1 bar", 1e5}, {"bar", 1e5}, {"1 BAR", 1e5}, {"1 atm", atmPa}, {" atm ", atmPa},
	}
	for _, c := range cases {
		got, err := ParseStdPressure(c.in)
		if err != nil || got.Pa() != c.wantPa {
			t.Errorf("ParseStdPressure(%q) = %g, %v; want %g (1 bar and 1 atm by definition)", c.in, got.Pa(), err, c.wantPa)
		}
	}
	if _, err := ParseStdPressure("2 bar"); err == nil || !errors.Is(err, ErrValue) || !strings.Contains(err.Error(), `"2 bar"`) {
		t.Errorf(`ParseStdPressure("2 bar"): error %v; want one naming the value`, err)
	}
}

// Partial pressures in blend text take the same units as pressures, with
// the same care over case: "mPa" must not turn into megapascal.
func TestAmountPressureUnitCase(t *testing.T) {
	a, err := ParseAmount("0.1 MPa")
	if err != nil || a.Basis != PartialPres || a.Value != 1e5 {
		t.Errorf(`ParseAmount("0.1 MPa") = %+v, %v; want 1e5 Pa partial pressure`, a, err)
	}
	if a, err := ParseAmount("5 mPa"); err == nil || !strings.Contains(err.Error(), "MPa") {
		t.Errorf(`ParseAmount("5 mPa") = %+v, %v; want an error pointing to MPa`, a, err)
	}
	if a, err := ParseAmount("1e303 MPa"); err == nil || !strings.Contains(err.Error(), "too large") {
		t.Errorf(`ParseAmount("1e303 MPa") = %+v, %v; want a "too large" error`, a, err)
	}
}

// A pressure unit reads back what was typed, in either reading; gauge
// readings are above the standard atmosphere, 101 325 Pa (its definition).
func TestPressureUnitOf(t *testing.T) {
	for _, c := range []struct {
		text      string
		gaugeView bool
		pa        float64
		want      float64
		name      string
		tol       float64
	}{
		{"30 psig", true, 30*6894.757293168361 + 101325, 30, "psig", 1e-12},
		{"30 psig", false, 30*6894.757293168361 + 101325, 44.69594, "psia", 1e-6}, // 101325 Pa = 14.69595 psi (1 lbf/in² = 6894.757 Pa)
		{"1.4 bar", false, 1.4e5, 1.4, "bar abs", 1e-12},
		{"1.4 bar", true, 1.4e5, 0.38675, "barg", 1e-12},
		{"2 barg", false, 3e5, 3, "bar abs", 1e-12},
		{"500 kPag", true, 601325, 500, "kPag", 1e-12},
		{"760 Torr", false, 101325, 760, "Torr", 1e-12},
		{"0.5 MPag", true, 601325, 0.5, "MPag", 1e-12},
		{"250 mbarg", false, 126325, 1263.25, "mbar abs", 1e-12},
		{"1000 Pa", true, 1000, -100325, "Pa gauge", 1e-12},
		{"1 atm", true, 101325, 0, "atm gauge", 1e-12},
		{"2.5 bar(g)", true, 351325, 2.5, "barg", 1e-12},
		{"5 kg/cm2(g)", true, 5*98066.5 + 101325, 5, "kgf/cm2g", 1e-12},
		{"760 mmHg", false, 101325, 760, "mmHg", 2e-7},
	} {
		u, ok := PressureUnitOf(c.text)
		if !ok {
			t.Errorf("PressureUnitOf(%q) found no unit", c.text)
			continue
		}
		u = u.Reading(c.gaugeView)
		if got := u.FromPa(c.pa); math.Abs(got-c.want) > c.tol*math.Max(1, math.Abs(c.want)) {
			t.Errorf("%q in %s: FromPa(%g) = %g, want %g", c.text, u.Name(), c.pa, got, c.want)
		}
		if u.Name() != c.name {
			t.Errorf("%q (gauge %v): name %q, want %q", c.text, c.gaugeView, u.Name(), c.name)
		}
		if back := u.ToPa(u.FromPa(c.pa)); math.Abs(back-c.pa) > 1e-9*c.pa+1e-9 {
			t.Errorf("%q: ToPa(FromPa(%g)) = %g", c.text, c.pa, back)
		}
	}
	if _, ok := PressureUnitOf("3 furlongs"); ok {
		t.Error(`PressureUnitOf("3 furlongs") found a unit`)
	}
}
