package cli

import (
	"encoding/json"
	"math"
	"strings"
	"testing"

	"zmix/mixtures"
)

// processJSONOf runs a process command with --json and decodes it.
func processJSONOf(t *testing.T, args ...string) map[string]any {
	t.Helper()
	code, stdout, stderr := zmix(t, append(args, "--json")...)
	if code != 0 {
		t.Fatalf("zmix %q: exit %d: %s", args, code, stderr)
	}
	var obj map[string]any
	if err := json.Unmarshal([]byte(stdout), &obj); err != nil {
		t.Fatalf("zmix %q --json: %v\n%s", args, err, stdout)
	}
	return obj
}

// Each command's JSON holds at least the keys the issue lists.
func TestProcessJSONKeys(t *testing.T) {
	cases := []struct {
		args []string
		keys []string
	}{
		{[]string{"flow", "--blend", air, "--rate", "120 Nm3/h", "--temp", "25C", "--pres", "8barg"},
			[]string{"mol_s", "kg_s", "ref_m3_s", "ref_temperature_K", "ref_pressure_Pa", "actual_m3_s", "gas_correction_factor", "relative_density", "ref_density_kg_m3"}},
		{[]string{"compress", "--blend", air, "--temp", "300K", "--pres", "1bar", "--to", "10bar", "--eff", "80%", "--rate", "1 mol/s"},
			[]string{"outlet_temperature_K", "isentropic_outlet_temperature_K", "work_J_mol", "work_J_kg", "power_W", "stages", "mean_gamma", "polytropic_exponent"}},
		{[]string{"heat", "--blend", air, "--temp", "25C", "--to-temp", "300C", "--pres", "1atm", "--rate", "2 kg/h"},
			[]string{"duty_J_mol", "duty_J_kg", "duty_W"}},
		{[]string{"mix", "--stream", "N2 1; 300K; 1 mol/s", "--stream", "O2 1; 400K; 1 mol/s", "--pres", "1bar"},
			[]string{"outlet_temperature_K", "species", "rate_mol_s", "entropy_generation_W_K", "outlet", "streams"}},
		{[]string{"dilute", "--blend", "SiH4 2%, N2 bal", "--with", "N2 1", "--target", "SiH4 50ppm"},
			[]string{"diluent_per_parent_mol_mol", "final_level", "dilution_factor", "species"}},
		{[]string{"purge", "--start", air, "--purge", "N2 1", "--target", "O2 10ppm", "--swing", "1..7bar"},
			[]string{"cycles", "final_level"}},
		{[]string{"purge", "--start", air, "--purge", "N2 1", "--target", "O2 10ppm", "--volume", "2m3", "--rate", "6 m3/h"},
			[]string{"time_s", "volume_exchanges", "final_level"}},
		{[]string{"weighed", "--add", "25.103 g CO2", "--add", "475.2 g N2 with O2 <5ppm", "--mass-u", "2mg"},
			[]string{"parent_count", "mass_uncertainty_kg", "mass_kg", "amount_mol", "molar_mass_kg_mol", "parents", "composition", "budget"}},
	}
	for _, c := range cases {
		obj := processJSONOf(t, c.args...)
		for _, k := range append(c.keys, "process", "assumptions", "cautions", "notes") {
			if _, ok := obj[k]; !ok {
				t.Errorf("zmix %s --json lacks %q", c.args[0], k)
			}
		}
		cautions, _ := obj["cautions"].([]any)
		if len(cautions) > 0 && cautions[len(cautions)-1] != mixtures.DeferLine {
			t.Errorf("zmix %s: cautions do not end with the line that defers to site practice", c.args[0])
		}
	}
	// cycles is a whole number, as JSON writes one.
	obj := processJSONOf(t, "purge", "--start", air, "--purge", "N2 1", "--target", "O2 10ppm", "--swing", "1..7bar")
	if c := obj["cycles"].(float64); c != math.Trunc(c) || c != 6 {
		t.Errorf("cycles = %v, want 6 (ln(0.2095/1e-5)/ln 7 = 5.11, rounded up)", c)
	}
	// stages is a list with one object per stage.
	obj = processJSONOf(t, "compress", "--blend", "H2 1", "--temp", "25C", "--pres", "20bar", "--to", "200bar", "--stages", "3", "--intercool", "35C")
	if st, _ := obj["stages"].([]any); len(st) != 3 {
		t.Errorf("stages = %v, want 3 objects", obj["stages"])
	}
	// mix's species are the state's species objects.
	obj = processJSONOf(t, "mix", "--stream", "N2 1; 300K; 1 mol/s", "--stream", "O2 1; 300K; 3 mol/s", "--pres", "1bar")
	sp, _ := obj["species"].([]any)
	if len(sp) != 2 {
		t.Fatalf("species = %v, want N2 and O2", obj["species"])
	}
	for _, k := range requiredSpeciesKeys {
		if _, ok := sp[0].(map[string]any)[k]; !ok {
			t.Errorf("mix species lacks %q", k)
		}
	}
}

func TestProcessBadInput(t *testing.T) {
	blend := []string{"--blend", air}
	tests := []struct {
		name string
		args []string
		want string
	}{
		{"flow without rate", append([]string{"flow"}, blend...), "--rate is missing"},
		{"flow bad rate unit", append([]string{"flow", "--rate", "3 buckets"}, blend...), `unknown unit "buckets"`},
		{"flow actual without T", append([]string{"flow", "--rate", "3 m3/h"}, blend...), "actual volume"},
		{"flow only temp", append([]string{"flow", "--rate", "3 kg/h", "--temp", "25C"}, blend...), "both --temp and --pres"},
		{"flow bad ref", append([]string{"flow", "--rate", "3 kg/h", "--ref", "tuesday"}, blend...), "normal (0 °C, 101.325 kPa)"},
		{"compress without to", append([]string{"compress", "--temp", "300K", "--pres", "1bar"}, blend...), "--to is missing"},
		{"compress same pressure", append([]string{"compress", "--temp", "300K", "--pres", "1bar", "--to", "1bar"}, blend...), "equals the inlet pressure"},
		{"compress bad eff", append([]string{"compress", "--temp", "300K", "--pres", "1bar", "--to", "5bar", "--eff", "120%"}, blend...), "efficiency"},
		{"compress bad stages", append([]string{"compress", "--temp", "300K", "--pres", "1bar", "--to", "5bar", "--stages", "two"}, blend...), "whole number from 1 to 20"},
		{"expander stages", append([]string{"compress", "--temp", "300K", "--pres", "5bar", "--to", "1bar", "--stages", "2"}, blend...), "one stage"},
		{"intercool one stage", append([]string{"compress", "--temp", "300K", "--pres", "1bar", "--to", "5bar", "--intercool", "300K"}, blend...), "--stages 2 or more"},
		{"heat without to-temp", append([]string{"heat", "--temp", "300K", "--pres", "1bar"}, blend...), "--to-temp is missing"},
		{"mix one stream", []string{"mix", "--stream", "N2 1; 300K; 1 mol/s", "--pres", "1bar"}, "two or more --stream"},
		{"mix bad stream", []string{"mix", "--stream", "N2 1; 300K", "--stream", "O2 1; 300K; 1 mol/s", "--pres", "1bar"}, "--stream 1"},
		{"mix bad blend", []string{"mix", "--stream", "N2 1; 300K; 1 mol/s", "--stream", "Q9 1; 300K; 1 mol/s", "--pres", "1bar"}, "--stream 2"},
		{"dilute unreachable", []string{"dilute", "--blend", "SiH4 2%, N2 bal", "--with", "N2 1", "--target", "SiH4 5%"}, "cannot be reached"},
		{"purge two methods", []string{"purge", "--start", air, "--purge", "N2 1", "--target", "O2 1ppm", "--swing", "1..7bar", "--vacuum", "0.1..1bar"}, "choose one way to purge"},
		{"purge reversed swing", []string{"purge", "--start", air, "--purge", "N2 1", "--target", "O2 1ppm", "--swing", "7..1bar"}, "low pressure first"},
		{"purge dirty purge gas", []string{"purge", "--start", air, "--purge", "N2 bal, O2 5ppm", "--target", "O2 1ppm", "--swing", "1..7bar"}, "purge gas itself holds 5 ppm"},
		{"purge flow without volume", []string{"purge", "--start", air, "--purge", "N2 1", "--target", "O2 1ppm", "--rate", "1 Nm3/h"}, "--volume"},
		{"purge flow needs T and P", []string{"purge", "--start", air, "--purge", "N2 1", "--target", "O2 1ppm", "--rate", "1 Nm3/h", "--volume", "1m3"}, "temperature and pressure"},
		{"purge bad target", []string{"purge", "--start", air, "--purge", "N2 1", "--target", "O2 lots", "--swing", "1..7bar"}, "--target"},
		{"weighed nothing added", []string{"weighed", "--mass-u", "2mg"}, "give each parent gas weighed in as --add"},
		{"weighed without mass-u", []string{"weighed", "--add", "25 g CO2"}, "--mass-u is missing"},
		{"weighed bad mass-u", []string{"weighed", "--add", "25 g CO2", "--mass-u", "2 grains"}, `unknown unit "grains"`},
		{"weighed bad parent", []string{"weighed", "--add", "25 g CO2", "--add", "CO2 25 g", "--mass-u", "2mg"}, "--add 2: "},
		{"weighed no balance", []string{"weighed", "--add", "25 g CH4 2%, N2 3%", "--mass-u", "2mg"}, "one balance species"},
		{"weighed bad atomic weight", []string{"weighed", "--add", "25 g Ar", "--mass-u", "2mg", "--atomic-weight", "Ar 30 ± 0.1"}, "--atomic-weight: "},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			code, stdout, stderr := zmix(t, tt.args...)
			if code != 2 {
				t.Errorf("zmix %q: exit %d, want 2 (stderr %q)", tt.args, code, stderr)
			}
			if stdout != "" {
				t.Errorf("zmix %q: wrote to stdout on error:\n%s", tt.args, stdout)
			}
			checkOneLineError(t, stderr)
			if !strings.Contains(stderr, tt.want) {
				t.Errorf("zmix %q: error %q does not contain %q", tt.args, stderr, tt.want)
			}
		})
	}
}

// The commands print what the engine computes: a check value through the
// whole path, and ASCII mode for every process readout.
func TestProcessText(t *testing.T) {
	for _, args := range [][]string{
		{"flow", "--blend", air, "--rate", "120 Nm3/h", "--temp", "25C", "--pres", "8barg"},
		{"compress", "--blend", "H2 1", "--temp", "25C", "--pres", "20bar", "--to", "200bar", "--eff", "78%", "--stages", "3", "--intercool", "35C", "--rate", "500 Nm3/h"},
		{"heat", "--blend", air, "--temp", "25C", "--to-temp", "300C", "--pres", "1atm"},
		{"mix", "--stream", "N2 1; 300K; 1 mol/s", "--stream", "O2 1; 400K; 1 mol/s", "--pres", "1bar"},
		{"dilute", "--blend", "SiH4 2%, N2 bal", "--with", "N2 1", "--target", "SiH4", "--ratio", "9"},
		{"purge", "--start", air, "--purge", "N2 1", "--target", "O2 10ppm", "--vacuum", "50mbar..1atm", "--volume", "50L", "--temp", "20C"},
		{"weighed", "--add", "25.103 g CO2", "--add", "475.2 g ± 3 mg N2 with O2 <5ppm", "--mass-u", "2mg"},
	} {
		code, stdout, stderr := zmix(t, append(args, "--ascii")...)
		if code != 0 {
			t.Fatalf("zmix %q: exit %d: %s", args, code, stderr)
		}
		if !isASCII(stdout) || strings.Contains(stdout, "NaN") || strings.Contains(stdout, "n/a") {
			t.Errorf("zmix %q --ascii: non-ASCII or non-finite output:\n%s", args, stdout)
		}
		if !strings.Contains(stdout, "Model: ") || !strings.Contains(stdout, mixtures.DeferLine[:30]) {
			t.Errorf("zmix %q: no model line or cautions:\n%s", args, stdout)
		}
	}
	// 300 K to 10 bar: the air table's 574 K, through the command.
	obj := processJSONOf(t, "compress", "--blend", air, "--temp", "300K", "--pres", "1bar", "--to", "10bar")
	if got := obj["isentropic_outlet_temperature_K"].(float64); math.Abs(got-574.1) > 1 {
		t.Errorf("T2s = %g K, want 574.1 ± 1 K (ideal-gas air table, from memory)", got)
	}
}
