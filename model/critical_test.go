package model

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// radicals have no critical point: they exist only in hot gases.
var radicals = map[string]bool{"H": true, "O": true, "N": true, "OH": true}

// criticalNotKnown lists bottled species whose critical constants no
// source at hand gave; they are taken as ideal gases, and the readout says
// so (see mixtures/report realGasRemarks).
var criticalNotKnown = map[string]string{
	"GeH4": "no Tc, Pc, ω recalled with confidence or read",
	"WF6":  "no Tc, Pc, ω recalled with confidence or read",
}

// TestBuiltinCriticalConstants: every bottled species carries Tc, Pc and
// ω with a source each, and the quantum gases are marked.
func TestBuiltinCriticalConstants(t *testing.T) {
	quantum := map[string]bool{"He": true, "Ne": true, "H2": true, "D2": true}
	for _, sp := range Builtin().All() {
		if radicals[sp.Formula] {
			if sp.HasCritical() {
				t.Errorf("%s: a radical with critical constants", sp.Formula)
			}
			continue
		}
		if _, unknown := criticalNotKnown[sp.Formula]; unknown {
			if sp.HasCritical() {
				t.Errorf("%s: criticalNotKnown lists it, but it has critical constants: drop the exception", sp.Formula)
			}
			continue
		}
		if !sp.HasCritical() {
			t.Errorf("%s: no critical constants", sp.Formula)
			continue
		}
		for _, f := range []string{"Tc_K", "Pc_bar", "omega"} {
			if sp.Sources[f] == "" {
				t.Errorf("%s: no source for %s", sp.Formula, f)
			}
		}
		if sp.QuantumGas != quantum[sp.Formula] {
			t.Errorf("%s: QuantumGas = %v, want %v", sp.Formula, sp.QuantumGas, quantum[sp.Formula])
		}
	}
}

// TestCriticalConstantsParsed: a few values as the catalogue gives them
// (PGL5 App. A, from memory), in SI units after parsing.
func TestCriticalConstantsParsed(t *testing.T) {
	for _, tt := range []struct {
		formula   string
		tcK, pcPa float64
		omega     float64
	}{
		{"N2", 126.20, 33.98e5, 0.037},
		{"CO2", 304.12, 73.74e5, 0.225},
		{"H2O", 647.096, 220.64e5, 0.344},
	} {
		sp, _ := Builtin().Lookup(tt.formula)
		if sp.CriticalK != tt.tcK || math.Abs(sp.CriticalPa/tt.pcPa-1) > 1e-12 || sp.Acentric != tt.omega {
			t.Errorf("%s: Tc %g K, Pc %g Pa, ω %g; want %g, %g, %g", tt.formula, sp.CriticalK, sp.CriticalPa, sp.Acentric, tt.tcK, tt.pcPa, tt.omega)
		}
	}
}

func TestCriticalConstantErrors(t *testing.T) {
	const head = "[Ar]\nname = argon\nrotor = atom\ndHf0_kJ = 0\n"
	for _, tt := range []struct {
		name, text, field, msg string
	}{
		{"negative Tc", head + "Tc_K = -3\nPc_bar = 40\nomega = 0\n", "Tc_K", "critical temperature from 1 to 10000 K"},
		{"huge Pc", head + "Tc_K = 150\nPc_bar = 1e9\nomega = 0\n", "Pc_bar", "critical pressure from 0.1 to 5000 bar"},
		{"omega out of range", head + "Tc_K = 150\nPc_bar = 49\nomega = 7\n", "omega", "acentric factor from -1 to 2"},
		{"quantum not yes or no", head + "quantum = maybe\n", "quantum", "yes or no"},
		{"only Tc", head + "Tc_K = 150\n", "", "come together"},
		{"quantum without constants", head + "quantum = yes\n", "quantum", "needs Tc_K"},
	} {
		_, err := ParseCatalogue("site.cat", strings.NewReader(tt.text))
		var ce *CatalogueError
		if !errors.As(err, &ce) || ce.Field != tt.field || !strings.Contains(ce.Msg, tt.msg) {
			t.Errorf("%s: error %v; want field %q and %q", tt.name, err, tt.field, tt.msg)
		}
	}
	sp, err := ParseCatalogue("site.cat", strings.NewReader(head+"Tc_K = 150.86\nPc_bar = 48.98\nomega = -0.002\n"))
	if err != nil || sp[0].CriticalK != 150.86 || math.Abs(sp[0].CriticalPa/48.98e5-1) > 1e-12 || sp[0].Acentric != -0.002 {
		t.Errorf("user file with critical constants: %v, %+v", err, sp)
	}
}
