package realgas

import (
	"math"
	"testing"

	"zmix/model"
)

// TestWaterSaturation checks the IAPWS equations against their published
// check values.
func TestWaterSaturation(t *testing.T) {
	for _, tt := range []struct {
		name   string
		got    float64
		want   float64
		relTol float64
	}{
		// IAPWS 1992 supplementary release: the triple point, 611.657 Pa
		// (from memory); the equation gives it to 1e-5.
		{"saturation at 273.16 K", WaterSaturationPa(273.16), 611.657, 1e-4},
		// 298.15 K: 3.1699 kPa (IAPWS-95 tables, from memory).
		{"saturation at 298.15 K", WaterSaturationPa(298.15), 3169.9, 3e-4},
		// 373.15 K: 101.418 kPa (IAPWS-95 tables, from memory); the
		// normal boiling point is 373.124 K.
		{"saturation at 373.15 K", WaterSaturationPa(373.15), 101418, 3e-4},
		// The critical point, by construction of the equation.
		{"saturation at the critical point", WaterSaturationPa(647.096), 22.064e6, 1e-9},
		// IAPWS R14-08 check values: 611.657 Pa at the triple point and
		// 8.94735 Pa at 230 K (from memory).
		{"sublimation at 273.16 K", WaterSublimationPa(273.16), 611.657, 1e-6},
		{"sublimation at 230 K", WaterSublimationPa(230), 8.94735, 1e-4},
	} {
		if math.Abs(tt.got/tt.want-1) > tt.relTol {
			t.Errorf("%s = %.6g Pa, want %.6g (±%g)", tt.name, tt.got, tt.want, tt.relTol)
		}
	}
}

// TestLeeKesler checks the corresponding-states vapour pressure against
// published saturation tables; the correlation is good to a few percent.
func TestLeeKesler(t *testing.T) {
	for _, tt := range []struct {
		formula string
		tempK   float64
		wantPa  float64
		relTol  float64
	}{
		{"CO2", 273.15, 34.85e5, 0.03}, // Span and Wagner CO2 table (NIST WebBook), 0 °C, from memory
		{"CO2", 298.15, 64.34e5, 0.03}, // Span and Wagner CO2 table (NIST WebBook), 25 °C, from memory
		{"NH3", 239.82, 101325, 0.05},  // normal boiling point of NH3, CRC, from memory
		{"C3H8", 231.04, 101325, 0.05}, // normal boiling point of propane, CRC, from memory
	} {
		sp, _ := model.Builtin().Lookup(tt.formula)
		sat := VapourPressure(sp, tt.tempK)
		if sat.Method != LeeKesler || math.Abs(sat.Pa/tt.wantPa-1) > tt.relTol {
			t.Errorf("Psat(%s, %g K) = %.5g Pa by %v, want %.5g ± %g %%", tt.formula, tt.tempK, sat.Pa, sat.Method, tt.wantPa, 100*tt.relTol)
		}
	}
}

// Above its critical temperature a species never condenses: N2 and H2 at
// 300 K are supercritical, CO2 at 310 K too.
func TestSupercritical(t *testing.T) {
	for _, f := range []string{"N2", "H2", "He", "CH4"} {
		sp, _ := model.Builtin().Lookup(f)
		if sat := VapourPressure(sp, 300); !sat.Supercritical {
			t.Errorf("%s at 300 K: not supercritical (%+v)", f, sat)
		}
	}
	co2, _ := model.Builtin().Lookup("CO2")
	if !VapourPressure(co2, 310).Supercritical || VapourPressure(co2, 300).Supercritical {
		t.Error("CO2: supercritical above 304.12 K only")
	}
}

func blendOf(t *testing.T, xs map[string]float64) []Condensable {
	var out []Condensable
	for f, x := range xs {
		sp, ok := model.Builtin().Lookup(f)
		if !ok {
			t.Fatalf("no %s", f)
		}
		out = append(out, Condensable{sp, x})
	}
	return out
}

func TestDewPoint(t *testing.T) {
	// One condensable: the partial pressure equals the vapour pressure
	// there. 5 % water in N2 at 1 atm: p = 5.066 kPa, the IAPWS
	// saturation pressure at 306.4 K (33.3 °C): above 25 °C, so it
	// condenses at 25 °C.
	dp := DewPointOf(blendOf(t, map[string]float64{"H2O": 0.05, "N2": 0.95}), 101325, 1, 6000)
	if !dp.Known || math.Abs(WaterSaturationPa(dp.TempK)/(0.05*101325)-1) > 1e-9 || dp.Frost || dp.Raoult ||
		len(dp.Species) != 1 || dp.Species[0] != "H2O" || dp.TempK < 298.15 {
		t.Errorf("wet N2 dew point %+v", dp)
	}
	// 100 ppm water at 1 atm: a frost point, below the triple point.
	dp = DewPointOf(blendOf(t, map[string]float64{"H2O": 1e-4, "N2": 1 - 1e-4}), 101325, 1, 6000)
	if !dp.Known || !dp.Frost || math.Abs(WaterSublimationPa(dp.TempK)/(1e-4*101325)-1) > 1e-9 {
		t.Errorf("dry N2 frost point %+v", dp)
	}
	// Several condensables: Σ yᵢP/Psatᵢ = 1 at the Raoult dew point.
	blend := blendOf(t, map[string]float64{"C3H8": 0.3, "CO2": 0.2, "CH4": 0.5})
	dp = DewPointOf(blend, 20e5, 1, 6000)
	sum := 0.0
	for _, c := range blend {
		if sat := VapourPressure(c.Species, dp.TempK); !sat.Supercritical {
			sum += c.X * 20e5 / sat.Pa
		}
	}
	if !dp.Known || !dp.Raoult || math.Abs(sum-1) > 1e-9 || dp.Species[0] != "C3H8" {
		t.Errorf("Raoult dew point %+v, Σ yP/Psat = %g", dp, sum)
	}
	// Above the critical pressure, no dew point.
	dp = DewPointOf(blendOf(t, map[string]float64{"CO2": 1}), 100e5, 1, 6000)
	if dp.Known || dp.Why == "" {
		t.Errorf("CO2 at 100 bar: %+v, want no dew point and a reason", dp)
	}
}
