package model

import (
	"errors"
	"fmt"
	"math"
	"strings"
	"testing"
)

// TestStateSpecialCases: a temperature or pressure the model cannot take
// is an error that wraps ErrTemperature or ErrPressure and names the value;
// never a NaN.
func TestStateSpecialCases(t *testing.T) {
	nan, inf := math.NaN(), math.Inf(1)
	tests := []struct {
		name          string
		tempK, presPa float64
		want          error
		wantInMessage string
	}{
		{"T = 0", 0, 1e5, ErrTemperature, "got 0 K"},
		{"T = −0", math.Copysign(0, -1), 1e5, ErrTemperature, "got -0 K"},
		{"T < 0", -40, 1e5, ErrTemperature, "got -40 K"},
		{"T NaN", nan, 1e5, ErrTemperature, "got NaN K"},
		{"T +Inf", inf, 1e5, ErrTemperature, "got +Inf K"},
		{"T −Inf", -inf, 1e5, ErrTemperature, "got -Inf K"},
		{"T below MinTempK", MinTempK / 2, 1e5, ErrTemperature, "got 0.0005 K"},
		{"T above MaxTempK", 2 * MaxTempK, 1e5, ErrTemperature, "got 2e+06 K"},
		{"P = 0", 300, 0, ErrPressure, "got 0 Pa"},
		{"P < 0", 300, -1e5, ErrPressure, "got -100000 Pa"},
		{"P NaN", 300, nan, ErrPressure, "got NaN Pa"},
		{"P +Inf", 300, inf, ErrPressure, "got +Inf Pa"},
		{"both bad", nan, nan, ErrTemperature, "got NaN K"},
	}
	sp := mustSpecies(t, "CO2")
	for _, tt := range tests {
		check := func(what string, err error) {
			t.Helper()
			if !errors.Is(err, tt.want) {
				t.Errorf("%s: %s error = %v, want %v", tt.name, what, err, tt.want)
				return
			}
			if msg := err.Error(); !strings.Contains(msg, tt.wantInMessage) || strings.Contains(msg, "\n") {
				t.Errorf("%s: %s error %q, want one line containing %q", tt.name, what, msg, tt.wantInMessage)
			}
		}
		check("CheckConditions", CheckConditions(tt.tempK, tt.presPa))
		s, err := sp.State(tt.tempK, tt.presPa)
		check("State", err)
		if s != (State{}) {
			t.Errorf("%s: State returned %+v with its error, want the zero State", tt.name, s)
		}
		_, err = sp.Table(tt.tempK, tt.presPa, Treatment{})
		check("Table", err)
	}
}

// TestStateFiniteAtExtremes: at the edges of the accepted range, and at
// the smallest and largest pressures a float64 holds, every figure of every
// species is finite.
func TestStateFiniteAtExtremes(t *testing.T) {
	temps := []float64{MinTempK, 0.0123, 1, 20, 1e4, MaxTempK}
	press := []float64{5e-324, 1e-300, 1, 1e5, 1e300, math.MaxFloat64}
	for _, sp := range Builtin().All() {
		for _, tempK := range temps {
			for _, presPa := range press {
				s, err := sp.State(tempK, presPa)
				if err != nil {
					t.Fatalf("%s.State(%g K, %g Pa): %v", sp.Formula, tempK, presPa, err)
				}
				if bad := nonFinite(s); bad != "" {
					t.Errorf("%s.State(%g K, %g Pa).%s is not finite", sp.Formula, tempK, presPa, bad)
				}
				v := sp.Validity(tempK, presPa)
				if math.IsNaN(v.Degeneracy) || v.Degeneracy < 0 {
					t.Errorf("%s.Validity(%g K, %g Pa).Degeneracy = %g", sp.Formula, tempK, presPa, v.Degeneracy)
				}
				for _, n := range v.Notes(sp) {
					if strings.Contains(n.Text, "NaN") {
						t.Errorf("%s at %g K, %g Pa: note %q", sp.Formula, tempK, presPa, n.Text)
					}
				}
			}
			row, err := sp.Table(tempK, StdPressureBarPa, Treatment{})
			if err != nil {
				t.Fatal(err)
			}
			for name, x := range map[string]float64{"Cp": row.CpJPerMolK, "S": row.SJPerMolK, "gef": row.GefJPerMolK, "HInc": row.HIncJPerMol} {
				if math.IsNaN(x) || math.IsInf(x, 0) {
					t.Errorf("%s.Table(%g K).%s = %g", sp.Formula, tempK, name, x)
				}
			}
		}
	}
}

// nonFinite names the first field of s that is NaN or infinite.
func nonFinite(s State) string {
	fields := []struct {
		name string
		x    float64
	}{
		{"CvJPerMolK", s.CvJPerMolK}, {"CpJPerMolK", s.CpJPerMolK},
		{"UJPerMol", s.UJPerMol}, {"HJPerMol", s.HJPerMol},
		{"SJPerMolK", s.SJPerMolK}, {"AJPerMol", s.AJPerMol},
		{"GJPerMol", s.GJPerMol},
	}
	for i, tm := range []Terms{s.Trans, s.Rot, s.Vib, s.Elec} {
		for j, x := range []float64{tm.LnQ, tm.U, tm.Cv} {
			fields = append(fields, struct {
				name string
				x    float64
			}{fmt.Sprintf("terms[%d][%d]", i, j), x})
		}
	}
	for _, f := range fields {
		if math.IsNaN(f.x) || math.IsInf(f.x, 0) {
			return f.name
		}
	}
	return ""
}
