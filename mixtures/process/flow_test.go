package process

import (
	"math"
	"strings"
	"testing"

	"zmix/model"
)

// Flow conversions against the ideal-gas molar volume, CODATA 2018:
// Vm = 22.413 969 54 L/mol at 273.15 K and 101.325 kPa, and RT/P from
// the exact R, 23.644 9 L/mol, at 288.15 K.
func TestFlowConversions(t *testing.T) {
	n2 := mixOf(t, "N2 1")
	cases := []struct {
		name    string
		rate    string
		ref     Reference
		wantMol float64 // mol/s
		wantRef float64 // m³/s at ref
		tol     float64
	}{
		{"1 kmol/h at normal", "1 kmol/h", RefNormal, 1000.0 / 3600, 1000 * 22.41396954e-3 / 3600, 1e-9},
		{"22.41396954 Nm3/h is 1 kmol/h", "22.41396954 Nm3/h", RefNormal, 1000.0 / 3600, 22.41396954 / 3600, 1e-9},
		{"1 SLPM of N2 at normal", "1 SLPM", RefNormal, 1e-3 / 60 / 22.41396954e-3, 1e-3 / 60, 1e-9},
		// Sm3/h defaults to 15 °C (ISO 13443): Vm = 23.6447 L/mol.
		{"Sm3/h at 15 C", "23.6449 Sm3/h", Reference{}, 1000.0 / 3600, 23.6449 / 3600 * 273.15 / 288.15, 1e-5},
		// 1 lb/h is 0.45359237 kg/h, exact by definition of the pound.
		{"lb/h", "1 lb/h", RefNormal, 0.45359237 / 3600 / n2.MolarMassKgPerMol, 0.45359237 / 3600 / n2.MolarMassKgPerMol * 22.41396954e-3, 1e-9},
		{"lb/hr reads as lb/h", "1 lb/hr", RefNormal, 0.45359237 / 3600 / n2.MolarMassKgPerMol, 0.45359237 / 3600 / n2.MolarMassKgPerMol * 22.41396954e-3, 1e-9},
		{"t/h is 1000 kg/h", "1 t/h", RefNormal, 1000.0 / 3600 / n2.MolarMassKgPerMol, 1000.0 / 3600 / n2.MolarMassKgPerMol * 22.41396954e-3, 1e-9},
		{"slm is SLPM", "1 slm", RefNormal, 1e-3 / 60 / 22.41396954e-3, 1e-3 / 60, 1e-9},
		{"Nm3/hr", "22.41396954 Nm3/hr", RefNormal, 1000.0 / 3600, 22.41396954 / 3600, 1e-9},
		{"Nm3/d", "24 Nm3/d", RefNormal, 1.0 / 3600 / 22.41396954e-3, 1.0 / 3600, 1e-9},
		{"Nm3/min", "1 Nm3/min", RefNormal, 1.0 / 60 / 22.41396954e-3, 1.0 / 60, 1e-9},
		// 1 MMSCFD: 10⁶ ft³ a day (ft = 0.3048 m exactly) at 60 °F and
		// 14.696 psia: p V/(R T) with the exact R.
		{"MMSCFD", "1 MMSCFD", Ref60F, 14.696 * 6894.757293168361 * 1e6 * 0.028316846592 / (8.314462618 * (60 + 459.67) * 5 / 9) / 86400, 1e6 * 0.028316846592 / 86400, 1e-9},
	}
	for _, c := range cases {
		r, err := ParseRate(c.rate)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		f, err := Flow{Mixture: n2, Rate: r, Ref: c.ref}.Solve()
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		if math.Abs(f.MolPerSec/c.wantMol-1) > c.tol {
			t.Errorf("%s: %.10g mol/s, want %.10g", c.name, f.MolPerSec, c.wantMol)
		}
		if math.Abs(f.RefM3PerSec/c.wantRef-1) > c.tol {
			t.Errorf("%s: %.10g m³/s at the reference, want %.10g", c.name, f.RefM3PerSec, c.wantRef)
		}
	}
	// Actual volume at 2 bar and 300 K: V = nRT/P.
	r, _ := ParseRate("1 kmol/h")
	f, err := Flow{Mixture: n2, Rate: r, LineTempK: 300, LinePresPa: 2e5}.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if want := 1000.0 / 3600 * model.GasConstant * 300 / 2e5; math.Abs(f.ActualM3PerSec/want-1) > 1e-12 {
		t.Errorf("actual volume %g m³/s, want %g", f.ActualM3PerSec, want)
	}
	// Relative density of N2 to dry air, 0.9672 (ISO 6976:2016 Table of
	// properties, from memory; 28.0134/28.96546).
	if want := 0.9672; math.Abs(f.RelativeDensity/want-1) > 2e-4 {
		t.Errorf("relative density %g, want %g", f.RelativeDensity, want)
	}
}

// Bad input to the parsers: one line naming the value and what is accepted.
func TestParseErrors(t *testing.T) {
	cat := model.Builtin()
	cases := []struct {
		name, in, want string
		parse          func(string) error
	}{
		{"rate no unit", "12", "no unit", func(s string) error { _, err := ParseRate(s); return err }},
		{"rate unknown unit", "12 furlongs", "unknown unit", func(s string) error { _, err := ParseRate(s); return err }},
		{"rate zero", "0 kg/h", "above zero", func(s string) error { _, err := ParseRate(s); return err }},
		{"rate negative", "-3 kg/h", "above zero", func(s string) error { _, err := ParseRate(s); return err }},
		{"rate NaN", "NaN kg/h", "want a number", func(s string) error { _, err := ParseRate(s); return err }},
		{"rate huge", "1e308 kmol/s", "at most 1e12 kmol/s", func(s string) error { _, err := ParseRate(s); return err }},
		{"rate past the bound", "1.5e12 SLPM", "at most 1e12 SLPM", func(s string) error { _, err := ParseRate(s); return err }},
		{"volume past the bound", "1e300 L", "at most 1e9 m3", func(s string) error { _, err := ParseVolume(s); return err }},
		{"sides without a unit", "6 x 4 x 3", "one length unit after the last", func(s string) error { _, err := ParseVolume(s); return err }},
		{"sides with two units", "6 x 4 m x 3 m", "one length unit after the last", func(s string) error { _, err := ParseVolume(s); return err }},
		{"two negative sides", "-6 x 4 x -3 m", "each side above zero", func(s string) error { _, err := ParseVolume(s); return err }},
		{"sides in yards", "6 x 4 x 3 yd", "unknown length unit", func(s string) error { _, err := ParseVolume(s); return err }},
		{"rate long", strings.Repeat("9", 300) + " kg/h", "at most 200", func(s string) error { _, err := ParseRate(s); return err }},
		{"stream two fields", "N2 1; 300K", "BLEND; T; RATE", func(s string) error { _, err := ParseStream(s); return err }},
		{"stream no blend", " ; 300K; 1 mol/s", "blend is missing", func(s string) error { _, err := ParseStream(s); return err }},
		{"stream bad T", "N2 1; hot; 1 mol/s", "temperature", func(s string) error { _, err := ParseStream(s); return err }},
		{"target one field", "O2", "SPECIES LEVEL", func(s string) error { _, err := ParseTarget(cat, s); return err }},
		{"target unknown", "Xx 1ppm", "unknown species", func(s string) error { _, err := ParseTarget(cat, s); return err }},
		{"target mass", "O2 1 wt%", "by moles", func(s string) error { _, err := ParseTarget(cat, s); return err }},
		{"target zero", "O2 0ppm", "never reached", func(s string) error { _, err := ParseTarget(cat, s); return err }},
		{"target below 1 ppt", "O2 1e-300 ppb", "below 1e-12", func(s string) error { _, err := ParseTarget(cat, s); return err }},
		{"reference", "tuesday", "normal", func(s string) error { _, err := ParseReference(s); return err }},
	}
	for _, c := range cases {
		err := c.parse(c.in)
		if err == nil {
			t.Errorf("%s: %q accepted, want an error", c.name, c.in)
			continue
		}
		msg := model.UserMessage(err)
		if !strings.Contains(msg, c.want) || strings.Contains(msg, "\n") || strings.HasPrefix(msg, "process:") {
			t.Errorf("%s: %q gives %q, want one line holding %q", c.name, c.in, msg, c.want)
		}
	}
	s, err := ParseStream("N2 79%; O2 21%; 25C; 120 Nm3/h")
	if err != nil || s.BlendText != "N2 79%; O2 21%" || s.TempK != 298.15 || s.Rate.Unit.Name != "Nm3/h" {
		t.Errorf("ParseStream with a ; in the blend = %+v, %v", s, err)
	}
	for _, name := range []string{"normal", "15C", "ISO 13443", "20c", "60F", "25C, 1 bar"} {
		if _, err := ParseReference(name); err != nil {
			t.Errorf("ParseReference(%q): %v", name, err)
		}
	}
}

func FuzzParseRate(f *testing.F) {
	for _, s := range []string{"120 Nm3/h", "2.5 kg/h", "500 sccm", "1e3 mol/s", "3 m³/h", "-1 kg/s", "", "kg/h", "1e400 SLPM"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		r, err := ParseRate(s)
		if err != nil {
			if msg := model.UserMessage(err); msg == "" || strings.Contains(msg, "\n") {
				t.Fatalf("ParseRate(%q): error %q, want one line", s, msg)
			}
			return
		}
		if !(r.Value > 0) || r.Value > MaxRateValue {
			t.Fatalf("ParseRate(%q) = %+v: want a rate above zero and at most MaxRateValue", s, r)
		}
	})
}

func FuzzParseStream(f *testing.F) {
	for _, s := range []string{"N2 79%, O2 21%; 25C; 120 Nm3/h", "N2 1;300K;1 mol/s", ";;", "a;b;c;d", "N2 1; 0K; 1 kg/h"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		sp, err := ParseStream(s)
		if err != nil {
			if msg := model.UserMessage(err); msg == "" || strings.Contains(msg, "\n") {
				t.Fatalf("ParseStream(%q): error %q, want one line", s, msg)
			}
			return
		}
		if sp.BlendText == "" || !(sp.TempK > 0) || !(sp.Rate.Value > 0) {
			t.Fatalf("ParseStream(%q) = %+v", s, sp)
		}
	})
}

func FuzzParseTarget(f *testing.F) {
	cat := model.Builtin()
	for _, s := range []string{"O2 10ppm", "SiH4 50 ppm", "H2O 1%", "O2 0.5", "O2", "O2 2", "Xe 1ppb"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		if sp, err := ParseTargetSpecies(cat, s); err != nil {
			if msg := model.UserMessage(err); msg == "" || strings.Contains(msg, "\n") {
				t.Fatalf("ParseTargetSpecies(%q): error %q, want one line", s, msg)
			}
		} else if sp == nil {
			t.Fatalf("ParseTargetSpecies(%q): no species and no error", s)
		}
		tg, err := ParseTarget(cat, s)
		if err != nil {
			if msg := model.UserMessage(err); msg == "" || strings.Contains(msg, "\n") {
				t.Fatalf("ParseTarget(%q): error %q, want one line", s, msg)
			}
			return
		}
		if tg.Species == nil || !(tg.X > 0 && tg.X < 1) {
			t.Fatalf("ParseTarget(%q) = %+v", s, tg)
		}
	})
}

// The smaller parsers: volume, efficiency and reference condition. Each
// gives a value in range or one line of error.
func FuzzParseOthers(f *testing.F) {
	for _, s := range []string{"2.5 m3", "50 L", "12 ft3", "0.8", "80%", "normal", "15C", "25C, 1 bar", "", "-1 L", "1e400 m3", "120%", "10 kg", "2 kmol", "3 mg"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		oneLine := func(what string, err error) {
			if msg := model.UserMessage(err); msg == "" || strings.Contains(msg, "\n") {
				t.Fatalf("%s(%q): error %q, want one line", what, s, msg)
			}
		}
		if v, err := ParseVolume(s); err != nil {
			oneLine("ParseVolume", err)
		} else if !(v > 0) || v > MaxVolumeM3 {
			t.Fatalf("ParseVolume(%q) = %g", s, v)
		}
		for _, kind := range []string{"volume", "mass", "amount"} {
			if v, err := ParseCylinderQuantity(kind, s); err != nil {
				oneLine("ParseCylinderQuantity", err)
			} else if !(v > 0) || v > 1e12 {
				t.Fatalf("ParseCylinderQuantity(%s, %q) = %g", kind, s, v)
			}
		}
		if e, err := ParseEfficiency(s); err != nil {
			oneLine("ParseEfficiency", err)
		} else if !(e > 0 && e <= 1) {
			t.Fatalf("ParseEfficiency(%q) = %g", s, e)
		}
		if r, err := ParseReference(s); err != nil {
			oneLine("ParseReference", err)
		} else if !(r.TempK > 0 && r.PresPa > 0) {
			t.Fatalf("ParseReference(%q) = %+v", s, r)
		}
	})
}

// Volumes as a unit or as a room's three sides; ft = 0.3048 m exactly
// (international foot).
func TestParseVolume(t *testing.T) {
	ft3 := 0.3048 * 0.3048 * 0.3048
	for _, c := range []struct {
		in   string
		want float64
	}{
		{"2.5 m3", 2.5}, {"2.5 m³", 2.5}, {"50 L", 0.05}, {"12 ft3", 12 * ft3},
		{"6 x 4 x 3 m", 72}, {"6x4x3m", 72}, {"20 × 15 × 10 ft", 3000 * ft3}, {"300 X 200 X 250 cm", 15},
	} {
		if got, err := ParseVolume(c.in); err != nil || math.Abs(got/c.want-1) > 1e-12 {
			t.Errorf("ParseVolume(%q) = %g, %v; want %g m³", c.in, got, err, c.want)
		}
	}
}

// Air changes per hour as the trade writes them; a change a minute is 60
// an hour.
func TestParseACH(t *testing.T) {
	for _, c := range []struct {
		in   string
		want float64
	}{{"6", 6}, {"6/h", 6}, {"6 /hr", 6}, {"6 ACH", 6}, {"6 h-1", 6}, {"0.1/min", 6}, {"0", 0}, {"1000", 1000}} {
		if got, err := ParseACH(c.in); err != nil || math.Abs(got-c.want) > 1e-12 {
			t.Errorf("ParseACH(%q) = %g, %v; want %g", c.in, got, err, c.want)
		}
	}
	for _, bad := range []string{"six", "-1", "1001", "20/min", "6 m3/h", "", "NaN"} {
		if got, err := ParseACH(bad); err == nil {
			t.Errorf("ParseACH(%q) = %g, want an error", bad, got)
		} else if msg := model.UserMessage(err); !strings.Contains(msg, "from 0 to 1000") {
			t.Errorf("ParseACH(%q): %q", bad, msg)
		}
	}
}

// A target names its species by formula or in words; with a ratio the
// species alone is read, and a level after it is not used.
func TestParseTargetNames(t *testing.T) {
	cat := model.Builtin()
	for _, c := range []struct {
		in      string
		formula string
		x       float64
	}{{"SiH4 50ppm", "SiH4", 50e-6}, {"nitrous oxide 1%", "N2O", 0.01}, {"silane  2 ppm", "SiH4", 2e-6}} {
		tg, err := ParseTarget(cat, c.in)
		if err != nil || tg.Species.Formula != c.formula || math.Abs(tg.X-c.x) > 1e-18 {
			t.Errorf("ParseTarget(%q) = %+v, %v; want %s at %g", c.in, tg, err, c.formula, c.x)
		}
	}
	for in, want := range map[string]string{"SiH4": "SiH4", "nitrous oxide": "N2O", " Nitrous Oxide ": "N2O", "SiH4 50ppm": "SiH4"} {
		if sp, err := ParseTargetSpecies(cat, in); err != nil || sp.Formula != want {
			t.Errorf("ParseTargetSpecies(%q) = %v, %v; want %s", in, sp, err, want)
		}
	}
	if _, err := ParseTargetSpecies(cat, "Xq"); err == nil || !strings.Contains(model.UserMessage(err), "unknown species") {
		t.Errorf("ParseTargetSpecies(Xq): %v", err)
	}
}

// Every unit of the table reads by the name help gives it, in any case,
// and the units message and the standard-volume groups name each once.
func TestRateUnitsListed(t *testing.T) {
	var all []string
	for _, b := range []Basis{BasisMolar, BasisMass, BasisActual, BasisStandard} {
		names := RateUnitNames(b)
		if len(names) == 0 {
			t.Errorf("basis %d lists no unit", b)
		}
		all = append(all, names...)
	}
	if len(all) != len(rateUnits) {
		t.Errorf("%d units listed by basis, %d in the table", len(all), len(rateUnits))
	}
	inGroups := 0
	for _, g := range StandardUnitGroups() {
		inGroups += len(g.Names)
	}
	if want := len(RateUnitNames(BasisStandard)); inGroups != want {
		t.Errorf("standard groups hold %d units, want %d", inGroups, want)
	}
	words := strings.FieldsFunc(RateUnits, func(r rune) bool { return r == ',' || r == ';' || r == ' ' })
	for _, name := range all {
		for _, typed := range []string{"2.5 " + name, "2.5 " + strings.ToLower(name), "2.5" + strings.ToUpper(name)} {
			r, err := ParseRate(typed)
			if err != nil || r.Unit.Name != name || r.Value != 2.5 {
				t.Errorf("ParseRate(%q) = %+v, %v; want 2.5 %s", typed, r, err, name)
			}
		}
		n := 0
		for _, w := range words {
			if w == name {
				n++
			}
		}
		if n != 1 {
			t.Errorf("RateUnits names %s %d times, want once: %s", name, n, RateUnits)
		}
	}
}
