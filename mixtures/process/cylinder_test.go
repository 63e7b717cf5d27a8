package process

import (
	"math"
	"slices"
	"strings"
	"testing"

	"zmix/model"
)

// Contents from the pressure and back: the amount found at P gives P
// again, and the mass and ideal-gas figures follow from it.
func TestCylinderRoundTrip(t *testing.T) {
	mix := mixOf(t, "H2 100%")
	c := Cylinder{Mixture: mix, VolumeM3: 0.05, TempK: 288.15, PresPa: 200e5}
	r, err := c.Solve()
	if err != nil {
		t.Fatal(err)
	}
	// H2 at 15 °C and 200 bar: Z ≈ 1.12 (NIST WebBook, from memory).
	if math.Abs(r.Z/1.12-1) > 0.03 {
		t.Errorf("Z(H2, 288 K, 200 bar) = %.4f, want 1.12 ± 3 %%", r.Z)
	}
	if want := 200e5 * 0.05 / (model.GasConstant * 288.15); math.Abs(r.IdealAmountMol/want-1) > 1e-12 || math.Abs(r.AmountMol*r.Z/want-1) > 1e-12 {
		t.Errorf("amount %g mol, ideal %g, Z %g: PV = nZRT broken", r.AmountMol, r.IdealAmountMol, r.Z)
	}
	for _, back := range []Cylinder{
		{Mixture: mix, VolumeM3: 0.05, TempK: 288.15, AmountMol: r.AmountMol},
		{Mixture: mix, VolumeM3: 0.05, TempK: 288.15, MassKg: r.MassKg},
	} {
		b, err := back.Solve()
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(b.PresPa/200e5-1) > 1e-9 {
			t.Errorf("pressure from %+v = %g Pa, want 200 bar", back, b.PresPa)
		}
	}
}

// Warming a nearly ideal gas at fixed amount raises P in proportion to T.
func TestCylinderWarming(t *testing.T) {
	r, err := Cylinder{Mixture: mixOf(t, "He 100%"), VolumeM3: 0.05, TempK: 288.15, PresPa: 1e5, ToTempK: 323.15}.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if want := 1e5 * 323.15 / 288.15; math.Abs(r.ToPresPa/want-1) > 1e-3 {
		t.Errorf("He warmed to 50 °C: %g Pa, want about %g", r.ToPresPa, want)
	}
}

// The partial-pressure recipe adds up: the last step reaches the fill
// pressure, the amounts sum to the contents, the minor gas goes first.
// A blend with air is filled with air as one parent, after the minor
// gases, and an O2 given on its own as well is its own step; the steps'
// amounts and masses add up to the contents.
func TestCylinderRecipeWithAir(t *testing.T) {
	r, err := Cylinder{Mixture: mixOf(t, "CH4 2.5%, O2 5%, air bal"), VolumeM3: 0.01, TempK: 293.15, PresPa: 150e5, Recipe: "weight"}.Solve()
	if err != nil {
		t.Fatal(err)
	}
	var labels []string
	sumMol := 0.0
	for _, s := range r.Steps {
		labels = append(labels, s.Species)
		sumMol += s.AddedMol
	}
	if strings.Join(labels, " ") != "CH4 O2 air" {
		t.Fatalf("steps %v, want CH4 O2 air", labels)
	}
	if got := r.Steps[2].AddedMol / r.AmountMol; math.Abs(got-0.925) > 1e-12 {
		t.Errorf("air step: %.6f of the contents, want 0.925", got)
	}
	last := r.Steps[len(r.Steps)-1]
	if math.Abs(sumMol/r.AmountMol-1) > 1e-12 || math.Abs(last.CumulativeKg/r.MassKg-1) > 1e-12 {
		t.Errorf("steps hold %g of the moles and %g of the mass", sumMol/r.AmountMol, last.CumulativeKg/r.MassKg)
	}
	if !slices.ContainsFunc(r.Notes(), func(n string) bool { return strings.Contains(n, "air is filled as one parent gas") }) {
		t.Errorf("notes %q: want the one on air as a parent", r.Notes())
	}
}

func TestCylinderRecipe(t *testing.T) {
	r, err := Cylinder{Mixture: mixOf(t, "CH4 2.5%, CO2 5%, N2 bal"), VolumeM3: 0.01, TempK: 293.15, PresPa: 150e5, Recipe: "pressure"}.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if len(r.Steps) != 3 || r.Steps[0].Species != "CH4" || r.Steps[2].Species != "N2" {
		t.Fatalf("steps %+v", r.Steps)
	}
	sum := 0.0
	for i, s := range r.Steps {
		sum += s.AddedMol
		if i > 0 && s.PresPa <= r.Steps[i-1].PresPa {
			t.Errorf("step %d: pressure falls", i)
		}
		if math.Abs(s.GaugePa-(s.PresPa-101325)) > 1e-6 {
			t.Errorf("step %d: gauge %g", i, s.GaugePa)
		}
	}
	if math.Abs(sum/r.AmountMol-1) > 1e-12 || math.Abs(r.Steps[2].PresPa/150e5-1) > 1e-9 {
		t.Errorf("amounts sum to %g of %g; last step at %g Pa", sum, r.AmountMol, r.Steps[2].PresPa)
	}
	w, err := Cylinder{Mixture: mixOf(t, "CH4 2.5%, CO2 5%, N2 bal"), VolumeM3: 0.01, TempK: 293.15, PresPa: 150e5, Recipe: "weight"}.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if last := w.Steps[len(w.Steps)-1]; math.Abs(last.CumulativeKg/w.MassKg-1) > 1e-12 {
		t.Errorf("weights sum to %g kg, contents %g kg", last.CumulativeKg, w.MassKg)
	}
}

// Refusals: CO2 at 20 °C and 60 bar is above its vapour pressure (57 bar,
// NIST WebBook, from memory); a fill above the rating given.
func TestCylinderRefusals(t *testing.T) {
	for _, tt := range []struct {
		name string
		c    Cylinder
		msg  string
	}{
		{"condenses", Cylinder{Mixture: mixOf(t, "CO2 100%"), VolumeM3: 0.05, TempK: 293.15, PresPa: 60e5}, "condense"},
		// Past the vapour pressure (57.3 bar at 20 °C, from memory) and
		// on the cubic's liquid-like root: condensation is the reason.
		{"condenses, dense", Cylinder{Mixture: mixOf(t, "CO2 100%"), VolumeM3: 0.05, TempK: 293.15, PresPa: 70e5}, "would condense"},
		// 30 kg in 50 L is a liquefied-CO2 cylinder, which is mostly liquid.
		{"liquefied by weight", Cylinder{Mixture: mixOf(t, "CO2 100%"), VolumeM3: 0.05, TempK: 293.15, MassKg: 30}, "partly liquid"},
		{"over the rating", Cylinder{Mixture: mixOf(t, "N2 100%"), VolumeM3: 0.05, TempK: 293.15, PresPa: 300e5, RatedPresPa: 200e5}, "exceeds the rating"},
		{"two of pressure, mass, amount", Cylinder{Mixture: mixOf(t, "N2 100%"), VolumeM3: 0.05, TempK: 293.15, PresPa: 1e5, MassKg: 1}, "exactly one"},
		{"no volume", Cylinder{Mixture: mixOf(t, "N2 100%"), TempK: 293.15, PresPa: 1e5}, "water volume"},
	} {
		_, err := tt.c.Solve()
		if err == nil || !strings.Contains(err.Error(), tt.msg) {
			t.Errorf("%s: error %v, want %q", tt.name, err, tt.msg)
		}
	}
}

func TestParseCylinderQuantity(t *testing.T) {
	for _, tt := range []struct {
		kind, text string
		want       float64
	}{
		{"volume", "50L", 0.05}, {"volume", "0.05 m3", 0.05}, {"mass", "500 g", 0.5}, {"amount", "2kmol", 2000},
		{"volume", "1e9 m3", 1e9}, {"mass", "1e9 kg", 1e9}, {"amount", "1e12 mol", 1e12}, // the bounds themselves
		{"volume", "1.5 ft3", 1.5 * 0.028316846592}, // ft = 0.3048 m exactly (international foot)
	} {
		got, err := ParseCylinderQuantity(tt.kind, tt.text)
		if err != nil || math.Abs(got/tt.want-1) > 1e-12 {
			t.Errorf("%s %q = %g, %v; want %g", tt.kind, tt.text, got, err, tt.want)
		}
	}
	for _, bad := range []struct{ kind, text string }{
		{"volume", ""}, {"volume", "50"}, {"volume", "50 kg"}, {"volume", "-3 L"}, {"volume", "x L"},
		{"volume", "1e300 L"}, {"volume", "1.1e9 m3"}, {"mass", "2e9 kg"}, {"mass", "0 g"}, {"mass", "5 L"},
		{"amount", "2e9 kmol"}, {"amount", "NaN mol"}, {"amount", "10"},
	} {
		if v, err := ParseCylinderQuantity(bad.kind, bad.text); err == nil {
			t.Errorf("%s %q accepted as %g", bad.kind, bad.text, v)
		} else if msg := model.UserMessage(err); !strings.Contains(msg, bad.kind) || strings.Contains(msg, "\n") {
			t.Errorf("%s %q: error %q, want one line naming the %s", bad.kind, bad.text, msg, bad.kind)
		}
	}
}

// The throttle of an ideal gas is isothermal; N2 from 200 bar at 20 °C
// cools by roughly 25–35 K to 1 bar (Perry's Joule–Thomson data for
// nitrogen, from memory: about 0.15–0.2 K/bar over that range); H2 warms.
func TestThrottle(t *testing.T) {
	n2 := mixOf(t, "N2 100%")
	r, err := Throttle{Mixture: n2, InletTempK: 293.15, InletPresPa: 200e5, OutletPresPa: 1e5, Model: Ideal{}}.Solve()
	if err != nil || math.Abs(r.DeltaTK) > 1e-6 {
		t.Errorf("ideal throttle: ΔT = %v, %v; want 0", r, err)
	}
	r, err = Throttle{Mixture: n2, InletTempK: 293.15, InletPresPa: 200e5, OutletPresPa: 1e5}.Solve()
	if err != nil || r.DeltaTK > -20 || r.DeltaTK < -45 {
		t.Errorf("N2 200 → 1 bar at 20 °C: %+v, %v; want cooling by 25–35 K", r, err)
	}
	r, err = Throttle{Mixture: mixOf(t, "H2 100%"), InletTempK: 293.15, InletPresPa: 200e5, OutletPresPa: 1e5}.Solve()
	if err != nil || r.DeltaTK <= 0 {
		t.Errorf("H2 throttled at 20 °C: %+v, %v; want warming", r, err)
	}
	if _, err := (Throttle{Mixture: n2, InletTempK: 293.15, InletPresPa: 1e5, OutletPresPa: 2e5}).Solve(); err == nil {
		t.Error("a throttle that raises the pressure is accepted")
	}
}

// TestCylinderRelease: a cylinder empties to 1 atm, so it releases its
// contents less what 1 atm leaves in it, each with the blend's Z.
func TestCylinderRelease(t *testing.T) {
	// N2, 50 L at 200 bar and 20 °C: Z ≈ 1.02 (NIST WebBook, from
	// memory), about 400 mol in all.
	mix := mixOf(t, "N2 100%")
	c := Cylinder{Mixture: mix, VolumeM3: 0.05, TempK: 293.15, PresPa: 200e5}
	r, err := c.Release()
	if err != nil {
		t.Fatal(err)
	}
	full, err := c.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if r.Full.AmountMol != full.AmountMol || math.Abs(r.Full.Z/1.02-1) > 0.01 {
		t.Errorf("contents %g mol, Z %.4f; want the cylinder's %g mol and Z 1.02 ± 1 %%", r.Full.AmountMol, r.Full.Z, full.AmountMol)
	}
	// What stays: 1 atm in 50 L at 20 °C, Z within 1e-3 of 1 there.
	if ideal := model.StdPressureAtmPa * 0.05 / (model.GasConstant * 293.15); math.Abs(r.LeftMol/ideal-1) > 1e-3 {
		t.Errorf("left %g mol, want %g (ideal gas at 1 atm) within 0.1 %%", r.LeftMol, ideal)
	}
	if math.Abs(r.ReleasedMol-(r.Full.AmountMol-r.LeftMol)) > 1e-12*r.Full.AmountMol {
		t.Errorf("released %g ≠ full %g − left %g", r.ReleasedMol, r.Full.AmountMol, r.LeftMol)
	}
	// At 2 bar the gas is near ideal: (P − 1 atm)V/(RT) within 0.1 %.
	low := Cylinder{Mixture: mix, VolumeM3: 0.05, TempK: 293.15, PresPa: 2e5}
	lr, err := low.Release()
	if err != nil {
		t.Fatal(err)
	}
	if want := (2e5 - model.StdPressureAtmPa) * 0.05 / (model.GasConstant * 293.15); math.Abs(lr.ReleasedMol/want-1) > 1e-3 {
		t.Errorf("2 bar: released %g mol, want %g (ideal gas) within 0.1 %%", lr.ReleasedMol, want)
	}
	// Refused: a fill at or below the ambient, a fill given by mass, and a
	// liquefied gas.
	for _, bad := range []Cylinder{
		{Mixture: mix, VolumeM3: 0.05, TempK: 293.15, PresPa: 0.9e5},
		{Mixture: mix, VolumeM3: 0.05, TempK: 293.15, MassKg: 10},
		{Mixture: mixOf(t, "CO2 100%"), VolumeM3: 0.05, TempK: 293.15, PresPa: 100e5},
	} {
		if _, err := bad.Release(); err == nil {
			t.Errorf("%+v: released, want a refusal", bad)
		}
	}
}
