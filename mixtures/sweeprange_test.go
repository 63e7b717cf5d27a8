package mixtures

import (
	"context"
	"errors"
	"reflect"
	"strings"
	"testing"

	"zmix/model"
)

// Every pressure unit with a gauge form takes it, and the absolute forms
// too (issue 7, item 19). Sizes by definition of each unit (SI brochure;
// 1 bar = 1e5 Pa; 1 psi from NIST SP 811, from memory).
func TestPressureUnitForms(t *testing.T) {
	cases := []struct {
		in    string
		pa    float64
		gauge bool
	}{
		{"1 MPag", 1e6 + atmPa, true},
		{"1 kPag", 1e3 + atmPa, true},
		{"1 barg", 1e5 + atmPa, true},
		{"100 mbarg", 1e4 + atmPa, true},
		{"1 psig", psiPa + atmPa, true},
		{"1 bara", 1e5, false},
		{"1 kPaa", 1e3, false},
		{"1 MPaa", 1e6, false},
		{"1 psia", psiPa, false},
		{"1 PSIG", psiPa + atmPa, true},
	}
	for _, c := range cases {
		p, err := ParsePressure(c.in)
		if err != nil || !relClose(p.Pa, c.pa, 1e-6, 0) || p.Gauge != c.gauge {
			t.Errorf("ParsePressure(%q) = %+v, %v; want %g Pa, gauge %v", c.in, p, err, c.pa, c.gauge)
		}
	}
	for _, bad := range []string{"1 mPag", "1 mPaa", "1 atmg", "1 Torrg", "1 Pag"} {
		if _, err := ParsePressure(bad); err == nil {
			t.Errorf("ParsePressure(%q): no error", bad)
		}
	}
	names := strings.Join(PressureUnitNames(), " ")
	for _, want := range []string{"MPag", "kPag", "barg", "psig", "bara", "kPaa", "psia", "Torr"} {
		if !strings.Contains(names, want) || !strings.Contains(PressureUnits, strings.TrimSuffix(want, "a")) {
			t.Errorf("unit lists lack %s: %q / %q", want, names, PressureUnits)
		}
	}
}

func TestParseSweepRange(t *testing.T) {
	cases := []struct {
		v        SweepVar
		in       string
		from, to float64
		gauge    bool
		fromText string
	}{
		{SweepTemperature, "300..900 K", 300, 900, false, "300 K"},
		{SweepTemperature, "300 K..900 K", 300, 900, false, "300 K"},
		{SweepTemperature, "0 C..500 K", 273.15, 500, false, "0 C"},
		{SweepPressure, "5..150 psig", 5*psiPa + atmPa, 150*psiPa + atmPa, true, "5 psig"},
		{SweepPressure, "1..50 bar", 1e5, 50e5, false, "1 bar"},
	}
	for _, c := range cases {
		r, err := ParseSweepRange(c.v, c.in)
		if err != nil || !relClose(r.From, c.from, 1e-6, 0) || !relClose(r.To, c.to, 1e-6, 0) || r.Gauge != c.gauge || r.FromText != c.fromText {
			t.Errorf("ParseSweepRange(%v, %q) = %+v, %v", c.v, c.in, r, err)
		}
		if sw := r.Sweep(11, false); sw.Check() != nil || sw.Var != c.v || sw.IsLog() != (c.v == SweepPressure) {
			t.Errorf("%q: sweep %+v", c.in, sw)
		}
	}
	bad := []struct {
		v        SweepVar
		in, want string
	}{
		// Issue 7, item 19: a step written into the range.
		{SweepTemperature, "300..600..900K", `"300..600..900K" has 3 parts`},
		{SweepTemperature, "300..600..900K", "--steps N"},
		{SweepTemperature, "300..", "FROM..TO"},
		{SweepTemperature, "0..400K", "absolute zero"},
		{SweepPressure, "1 bar..5 barg", "mixes gauge and absolute"},
	}
	for _, c := range bad {
		_, err := ParseSweepRange(c.v, c.in)
		if err == nil || !strings.Contains(err.Error(), c.want) || !errors.Is(err, ErrValue) {
			t.Errorf("ParseSweepRange(%q): error %v, want one of kind ErrValue holding %q", c.in, err, c.want)
		}
	}
}

func TestParseSteps(t *testing.T) {
	for in, want := range map[string]int{"2": 2, "11": 11, "20 000": 20000, "200_000": 200000, "1,000": 1000, "1e5": 100000} {
		if got, err := ParseSteps(in); err != nil || got != want {
			t.Errorf("ParseSteps(%q) = %d, %v; want %d", in, got, err, want)
		}
	}
	for _, in := range []string{"", "1", "0", "-5", "200001", "2.5", "ten", "1e400", "NaN"} {
		if _, err := ParseSteps(in); !errors.Is(err, ErrSweep) || !strings.Contains(err.Error(), "from 2 to 200000") {
			t.Errorf("ParseSteps(%q): error %v, want ErrSweep naming the accepted range", in, err)
		}
	}
}

// A step typed where the number of points goes maps back to the count
// only on an evenly spaced temperature grid, and only where it divides
// the range; a degree Fahrenheit is 5/9 K (by definition).
func TestPointsForStep(t *testing.T) {
	linear := Sweep{Var: SweepTemperature, From: 300, To: 400}
	for _, c := range []struct {
		sw   Sweep
		step string
		n    int
		ok   bool
	}{
		{linear, "50K", 3, true}, {linear, "50 °C", 3, true}, {linear, "18F", 11, true}, {linear, "100 K", 2, true},
		{Sweep{Var: SweepTemperature, From: 400, To: 300}, "25K", 5, true},
		{linear, "30K", 0, false}, {linear, "200K", 0, false}, {linear, "0K", 0, false}, {linear, "1bar", 0, false},
		{Sweep{Var: SweepTemperature, From: 300, To: 400, Log: true}, "50K", 0, false},
		{Sweep{Var: SweepPressure, From: 1e5, To: 1e6, Log: true}, "1K", 0, false},
	} {
		if n, ok := c.sw.PointsForStep(c.step); n != c.n || ok != c.ok {
			t.Errorf("%+v PointsForStep(%q) = %d, %v; want %d, %v", c.sw, c.step, n, ok, c.n, c.ok)
		}
	}
}

func TestSplitNumber(t *testing.T) {
	for in, want := range map[string]struct {
		x    float64
		unit string
	}{"25 °C": {25, "°C"}, "1.5bar": {1.5, "bar"}, " -2e3 Pa ": {-2e3, "Pa"}, "120 Nm3/h": {120, "Nm3/h"}, "7": {7, ""}} {
		x, unit, err := SplitNumber(in)
		if err != nil || x != want.x || unit != want.unit {
			t.Errorf("SplitNumber(%q) = %g, %q, %v; want %g, %q", in, x, unit, err, want.x, want.unit)
		}
	}
	for _, in := range []string{"", "bar", "NaN K", "1e999 Pa", "-"} {
		if _, _, err := SplitNumber(in); err == nil {
			t.Errorf("SplitNumber(%q): no error", in)
		}
	}
}

// A table computed again in the storage of the last one holds what a
// fresh table holds, and takes no new storage when it fits.
func TestSweepTableReuse(t *testing.T) {
	m := mustMixture(t, dryAir, 1e5)
	cols, _ := SpeciesColumns("mu", m)
	cp, _ := BlendColumn("Cp")
	cols = append(cols, cp)
	ctx := context.Background()
	sw := Sweep{Var: SweepTemperature, From: 300, To: 1500, Steps: 500}
	first, err := m.Tabulate(ctx, sw, 0, 1e5, Options{}, cols)
	if err != nil {
		t.Fatal(err)
	}
	firstData := &first.data[0]
	sw2 := Sweep{Var: SweepPressure, From: 1e4, To: 1e7, Steps: 400}
	again := first.Reuse(sw2, cols)
	if &again.data[0] != firstData || first.Len() != 0 {
		t.Errorf("Reuse took new storage, or left the old table usable")
	}
	if err := m.StreamSpan(ctx, sw2, 0, sw2.Steps, 300, 0, Options{}, nil, again.Record); err != nil {
		t.Fatal(err)
	}
	fresh, _ := m.Tabulate(ctx, sw2, 300, 0, Options{}, cols)
	if !reflect.DeepEqual(again.Grid, fresh.Grid) || !reflect.DeepEqual(again.data, fresh.data) || again.Sweep != fresh.Sweep {
		t.Errorf("a reused table differs from a fresh one")
	}
	bigger := again.Reuse(Sweep{Var: SweepTemperature, From: 300, To: 1500, Steps: 1000}, cols)
	if bigger.Len() != 1000 || len(bigger.Column(len(cols)-1)) != 1000 {
		t.Errorf("a larger sweep got a table of %d points", bigger.Len())
	}
	var none *SweepTable
	if got := none.Reuse(sw, cols); got.Len() != sw.Steps {
		t.Errorf("Reuse of nil: %d points", got.Len())
	}
}

// A range written in words or with a dash is named as a range and told
// the syntax; an ellipsis, as editors write "...", reads as "..".
func TestRangeLookalikes(t *testing.T) {
	for s, want := range map[string]bool{
		"300 to 900 K": true, "300-900 K": true, "5 TO 10 bar": true,
		"300..900 K": false, "300…900 K": false, "-40 C": false, "1e-3 bar": false, "25C": false,
	} {
		if got := LooksLikeRange(s); got != want {
			t.Errorf("LooksLikeRange(%q) = %v, want %v", s, got, want)
		}
	}
	for _, s := range []string{"300 to 900 K", "300-900 K"} {
		if _, err := ParseSweepRange(SweepTemperature, s); err == nil || !strings.Contains(model.UserMessage(err), "want FROM..TO with a unit") {
			t.Errorf("ParseSweepRange(%q) = %v, want the range syntax named", s, err)
		}
	}
	r, err := ParseSweepRange(SweepTemperature, "300…900 K")
	if err != nil || r.From != 300 || r.To != 900 {
		t.Errorf("ParseSweepRange(300…900 K) = %+v, %v; want 300 to 900 K", r, err)
	}
}
