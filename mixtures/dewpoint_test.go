package mixtures

import (
	"errors"
	"math"
	"strings"
	"testing"

	"zmix/mixtures/realgas"
	"zmix/model"
)

// TestDewPointAmount: "H2O dew T" puts water in at its saturation
// pressure at T, so that the readout's dew point at the line pressure is
// T again; below 0.01 °C the saturation is over ice (a frost point).
func TestDewPointAmount(t *testing.T) {
	for _, c := range []struct {
		blend  string
		presPa float64
		dewK   float64
		wantPa float64 // the water's partial pressure: source beside it
		tol    float64 // relative
		frost  bool
	}{
		// 10 °C: 1.2282 kPa (IAPWS-95 tables, from memory).
		{"H2O dew 10C, N2 bal", 7e5, 283.15, 1228.2, 2e-4, false},
		// 25 °C: 3.1699 kPa (IAPWS-95 tables, from memory).
		{"H2O dew point 25 C, air bal", 1.01325e5, 298.15, 3169.9, 2e-4, false},
		// −43.15 °C, 230 K: 8.94735 Pa over ice (IAPWS R14-08 check value).
		{"H2O dewpoint 230K, N2 bal", 8e5, 230, 8.94735, 1e-5, true},
	} {
		m := mustMixture(t, c.blend, c.presPa)
		pa := xOf(m, "H2O") * c.presPa
		if math.Abs(pa/c.wantPa-1) > c.tol {
			t.Errorf("%s: p(H2O) = %.6g Pa, want %.6g ± %.0e", c.blend, pa, c.wantPa, c.tol)
		}
		var s State
		m.Fill(&s, 300, c.presPa, Options{})
		dp := DewPoint(&s)
		// Air's CO2 adds its own tiny Raoult share: within 0.01 K.
		if !dp.Known || math.Abs(dp.TempK-c.dewK) > 0.01 || dp.Frost != c.frost {
			t.Errorf("%s at %g Pa: dew point %+v, want %.2f K (frost %v)", c.blend, c.presPa, dp, c.dewK, c.frost)
		}
	}
	// The same point at any total pressure: the partial pressure holds.
	a, b := mustMixture(t, "H2O dew -40C, N2 bal", 1e5), mustMixture(t, "H2O dew -40C, N2 bal", 1e6)
	if got := xOf(a, "H2O") * 1e5; math.Abs(got/realgas.WaterSublimationPa(233.15)-1) > 1e-12 || math.Abs(xOf(b, "H2O")*1e6/got-1) > 1e-12 {
		t.Errorf("-40 °C frost point: p(H2O) %g Pa at 1 bar, %g Pa at 10 bar", got, xOf(b, "H2O")*1e6)
	}
}

// A dew point that cannot be given is refused at its item, saying why;
// a blend with one is one of partial pressures (no pressure sweep, no
// normalising).
func TestDewPointAmountRefused(t *testing.T) {
	cat := testCatalogue(t)
	for _, c := range []struct{ blend, want string }{
		{"H2O dew 400C, N2 bal", "above its critical temperature"},
		{"air dew 0C, N2 bal", "air is a mixture"},
		{"OH dew 100K, N2 bal", "vapour pressure is not known"},
		{"WF6 dew 250K, N2 bal", "only a rough estimate"},
		{"H2O dew 20K, N2 bal", "below the range"},
	} {
		b, err := ParseBlend(c.blend)
		if err != nil {
			t.Fatalf("%s: %v", c.blend, err)
		}
		_, err = b.Resolve(cat, 1e5)
		var be *BlendError
		if !errors.Is(err, ErrNoDewPoint) || !errors.As(err, &be) || be.Index != 0 || !strings.Contains(model.UserMessage(err), c.want) {
			t.Errorf("%s: %v, want ErrNoDewPoint at item 0 with %q", c.blend, err, c.want)
		}
	}
	for _, c := range []struct{ amount, want string }{
		{"dew", "no number"}, {"dew -300C", "absolute zero"}, {"dew 10", "no unit"}, {"dew 10 bar", "dew -40C"},
	} {
		if _, err := ParseAmount(c.amount); err == nil || !strings.Contains(model.UserMessage(err), c.want) {
			t.Errorf("ParseAmount(%q) = %v, want an error with %q", c.amount, err, c.want)
		}
	}
	b, _ := ParseBlend("H2O dew 5C, N2 bal")
	if !b.HasPartialPressures() {
		t.Error("a dew point does not count as a partial pressure")
	}
	if _, all := b.SumPartialPa(); all {
		t.Error("a dew point's pressure was summed without its species")
	}
	if _, err := NormaliseAmounts([]string{"dew 5C", "50%"}); !errors.Is(err, ErrNormalisePartial) {
		t.Errorf("normalising a dew point: %v", err)
	}
}

// The relative humidity is the water's partial pressure over its
// saturation pressure at T: 10 °C dew point air at 25 °C holds
// 1.2282/3.1699 = 38.75 % (IAPWS-95 tables, from memory); below 0.01 °C
// over ice; none without water or above water's critical temperature.
func TestRelativeHumidity(t *testing.T) {
	var s State
	mustMixture(t, "H2O dew 10C, N2 bal", 1e5).Fill(&s, 298.15, 1e5, Options{})
	if h := RelativeHumidity(&s); !h.Known || h.OverIce || math.Abs(h.Percent-100*1228.2/3169.9) > 0.01 {
		t.Errorf("10 °C dew point at 25 °C: %+v, want 38.75 %% over water", h)
	}
	mustMixture(t, "H2O dew -40C, N2 bal", 8e5).Fill(&s, 263.15, 8e5, Options{})
	want := 100 * realgas.WaterSublimationPa(233.15) / realgas.WaterSublimationPa(263.15)
	if h := RelativeHumidity(&s); !h.Known || !h.OverIce || math.Abs(h.Percent/want-1) > 1e-12 {
		t.Errorf("-40 °C frost point at -10 °C: %+v, want %.4f %% over ice", h, want)
	}
	mustMixture(t, "H2O 5%, N2 bal", 1e5).Fill(&s, 700, 1e5, Options{})
	if h := RelativeHumidity(&s); h.Known {
		t.Errorf("water above its critical temperature: %+v, want none", h)
	}
	mustMixture(t, "N2 79%, O2 21%", 1e5).Fill(&s, 300, 1e5, Options{})
	if h := RelativeHumidity(&s); h.Known {
		t.Errorf("dry air: %+v, want none", h)
	}
}
