package mixtures

import (
	"encoding/json"
	"errors"
	"math"
	"strings"
	"testing"
)

// Run one with, for example:
//
//	go test -run='^$' -fuzz=FuzzParseBlend -fuzztime=30s ./mixtures/
//
// Crashers go to testdata/fuzz/<FuzzName>/ and then run with every
// `go test` as regression cases.

var blendSeeds = []string{
	"N2 78.08%, O2 20.95%, Ar 0.93%, CO2 0.04%",
	"SiH4 2%, H2 500ppm, N2 bal",
	"N2 0.79, O2 0.21",
	"CO2 10 wt%, Ar 5%, N2 bal",
	"O2 150 Torr, CO2 5 wt%, Ar 1%, N2 bal",
	"N2 0.79 bar; O2 0.21 bar",
	"He 50 wt%\nAr 50 wt%",
	"N2 40%, N2 40%, O2 20%",
	"nitrogen 79 mol %, oxygen 21 %mol",
	"H2 20 ppb, N2 balance",
	"N2 -5%, O2 bal",
	"N2 80%, O2 30%",
	"N2 bal, O2 bal",
	"Oxy2 21%, N2 bal",
	"N2 bal, O2 2 barg",
	"N2 5 mPa, O2 bal",
	"N2 1e303 MPa",
	"N2 5e-324, O2 bal",
	"N2 1e-300 kg/kg, SF6 bal",
	"",
	" , ;\n",
	"N2",
	"N2 1e",
	"N2 .e5",
	"N2 +-1",
	"N2 0x10",
	"N2 ∞",
	"Ñ2 50%, O2 50%",
}

func FuzzParseBlend(f *testing.F) {
	for _, s := range blendSeeds {
		f.Add(s, 1e5)
	}
	f.Add("N2 1 bar", 0.0)
	f.Add("N2 1 bar", math.Inf(1))
	f.Add("N2 1e-300 Pa, O2 bal", 1e-320)
	f.Add("CO2 5%, air bal, O2 1 wt%", 1e5)
	f.Add("air 0.5 bar, AIR 50%", 1e5)
	f.Add("H2O dew -40C, air bal", 8e5)
	f.Add("H2O dew point 400 C, N2 dew 70 K, He bal", 1e5)
	cat := testCatalogue(f)
	f.Fuzz(func(t *testing.T, text string, presPa float64) {
		b, err := ParseBlend(text)
		if err != nil {
			checkBlendError(t, text, err)
			return
		}
		for _, it := range b.Items {
			if it.Offset < 0 || it.Offset+it.Length > len(text) || !strings.HasPrefix(text[it.Offset:it.Offset+it.Length], it.Key) {
				t.Fatalf("item %+v does not index %q", it, text)
			}
		}
		m, err := b.Resolve(cat, presPa)
		if err != nil {
			checkBlendError(t, text, err)
			return
		}
		checkMixture(t, text, m)
		// A resolved mixture exports finite numbers at any state it takes.
		for _, tp := range [][2]float64{{300, 1e5}, {20, 1}, {3000, 1e7}} {
			s, err := m.State(tp[0], tp[1], Options{})
			if err != nil {
				continue
			}
			if what := FirstNonFinite(&s); what != "" {
				t.Fatalf("%q at %g K, %g Pa: %s is not finite", text, tp[0], tp[1], what)
			}
		}
	})
}

// checkBlendError checks that a blend error is a *BlendError whose token
// sits at its offset in the text, with a one-line message.
func checkBlendError(t *testing.T, text string, err error) {
	t.Helper()
	var be *BlendError
	if !errors.As(err, &be) {
		t.Fatalf("%q: error %T %v, want *BlendError", text, err, err)
	}
	if be.Err == nil {
		t.Fatalf("%q: BlendError with no Err", text)
	}
	if be.Offset >= 0 && (be.Offset+len(be.Token) > len(text) || text[be.Offset:be.Offset+len(be.Token)] != be.Token) {
		t.Fatalf("%q: offset %d does not index token %q", text, be.Offset, be.Token)
	}
	if strings.Contains(err.Error(), "\n") {
		t.Fatalf("%q: message spans lines: %q", text, err)
	}
}

func checkMixture(t *testing.T, text string, m *Mixture) {
	t.Helper()
	if len(m.Components) == 0 {
		t.Fatalf("%q: mixture with no components", text)
	}
	seen := map[string]bool{}
	var sumX, sumW float64
	for _, c := range m.Components {
		if seen[c.Species.Formula] {
			t.Fatalf("%q: %s listed twice after merging", text, c.Species.Formula)
		}
		seen[c.Species.Formula] = true
		for _, v := range []float64{c.X, c.MassFrac} {
			if math.IsNaN(v) || math.IsInf(v, 0) || v < 0 || v > 1 {
				t.Fatalf("%q: %s has x = %g, w = %g", text, c.Species.Formula, c.X, c.MassFrac)
			}
		}
		sumX += c.X
		sumW += c.MassFrac
	}
	if math.Abs(sumX-1) > 1e-9 || math.Abs(sumW-1) > 1e-9 {
		t.Fatalf("%q: Σx = %.17g, Σw = %.17g; want 1", text, sumX, sumW)
	}
	if mm := m.MolarMassKgPerMol; !(mm > 0) || math.IsInf(mm, 0) {
		t.Fatalf("%q: molar mass %g", text, mm)
	}
}

var valueSeeds = []string{
	"300 K", "25 C", "25°C", "-40 F", "540 R", "0 K", "-273.15 C", "1e999 K", "NaN K",
	"1 bar", "2 barg", "14.7 psia", "-15 psig", "760 Torr", "1 mPa", "1e303 MPa", "5",
	"", " ", "°", "1e", "1e+", "-", "+.", "1.2.3 K", "12 ° C", "\x00", "1\u00a0bar",
}

func FuzzParseTemperature(f *testing.F) {
	for _, s := range valueSeeds {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		k, err := ParseTemperature(s)
		if err != nil {
			checkValueErrorFuzz(t, s, err)
			return
		}
		if !(k > 0) || math.IsInf(k, 0) {
			t.Fatalf("ParseTemperature(%q) = %g K", s, k)
		}
	})
}

func FuzzParsePressure(f *testing.F) {
	for _, s := range valueSeeds {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		p, err := ParsePressure(s)
		if err != nil {
			checkValueErrorFuzz(t, s, err)
			return
		}
		if !(p.Pa > 0) || math.IsInf(p.Pa, 0) {
			t.Fatalf("ParsePressure(%q) = %g Pa", s, p.Pa)
		}
	})
}

func checkValueErrorFuzz(t *testing.T, s string, err error) {
	t.Helper()
	if !errors.Is(err, ErrValue) {
		t.Fatalf("%q: error %v does not wrap ErrValue", s, err)
	}
	if strings.Contains(err.Error(), "\n") {
		t.Fatalf("%q: message spans lines: %q", s, err)
	}
}

func FuzzParseAmount(f *testing.F) {
	for _, s := range append([]string{"21%", "500ppm", "20 ppb", "0.3 kg/kg", "30 wt%", "0.2 bar", "bal", "-1", "2", "1.0000000000001"}, valueSeeds...) {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		a, err := ParseAmount(s)
		if err != nil {
			var be *BlendError
			if !errors.As(err, &be) || be.Err == nil || strings.Contains(err.Error(), "\n") {
				t.Fatalf("ParseAmount(%q): bad error %+v", s, err)
			}
			return
		}
		if math.IsNaN(a.Value) || math.IsInf(a.Value, 0) || a.Value < 0 {
			t.Fatalf("ParseAmount(%q) = %+v", s, a)
		}
		if (a.Basis == MoleFraction || a.Basis == MassFraction) && a.Value > 1+1e-12 {
			t.Fatalf("ParseAmount(%q) = %+v: a fraction above 1", s, a)
		}
		if a.Basis == Balance && a.Value != 0 {
			t.Fatalf("ParseAmount(%q) = %+v: balance with a value", s, a)
		}
	})
}

func FuzzParseRange(f *testing.F) {
	for _, s := range []string{"300..1500 K", "1 bar..50 bar", "1..", "..", "...", "1...2 K", "a..b", "-5..5 C"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		from, to, err := ParseRange(s)
		if err != nil {
			checkValueErrorFuzz(t, s, err)
			return
		}
		if from == "" || to == "" {
			t.Fatalf("ParseRange(%q) = %q, %q", s, from, to)
		}
	})
}

// FuzzBlendFile feeds arbitrary file contents to the blend-file reader:
// it must never panic, and what it accepts must save and load back.
func FuzzBlendFile(f *testing.F) {
	var good []byte
	if data, err := json.MarshalIndent(sampleFile(), "", "  "); err == nil {
		good = data
	}
	f.Add(good)
	f.Add(good[:len(good)/2])
	f.Add([]byte(`{"format":"zmix-blend/1","components":[{"species":"N2","amount":"bal"}]}`))
	f.Add([]byte(`{"format":"zmix-blend/1","components":[{"species":"N2","amount":"bal"},{"species":"O2","amount":"bal"}]}`))
	f.Add([]byte(`{"format":"zmix-blend/1","components":[{"species":"N2","amont":"bal"}]} {}`))
	f.Add([]byte(`[{"components": {"components": []}}]`))
	f.Add([]byte(""))
	f.Fuzz(func(t *testing.T, data []byte) {
		bf, err := parseBlendFile("fuzz.json", data)
		if err != nil {
			if !strings.Contains(err.Error(), "fuzz.json") || strings.Contains(err.Error(), "\n") {
				t.Fatalf("error %q must name the file on one line", err)
			}
			return
		}
		if _, err := bf.Parse(); err != nil {
			t.Fatalf("accepted a file whose blend does not parse: %v", err)
		}
		if _, _, err := bf.check(); err != nil {
			t.Fatalf("accepted a file that Save would refuse: %v", err)
		}
	})
}
