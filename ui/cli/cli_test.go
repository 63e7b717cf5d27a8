package cli

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"math"
	"math/rand/v2"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
	"unicode/utf8"

	"zmix/mixtures"
	"zmix/mixtures/process"
	"zmix/mixtures/report"
	"zmix/model"
	"zmix/ui"
)

// The -update flag rewrites the golden files under testdata/golden. The
// golden package that teatest brings in defines a flag of that name
// already; share it rather than clash with it.
func init() {
	if flag.Lookup("update") == nil {
		flag.Bool("update", false, "rewrite the golden files under testdata/golden")
	}
}

func updating() bool {
	f := flag.Lookup("update")
	return f != nil && f.Value.String() == "true"
}

// zmix runs the program in-process with no terminal and an empty
// environment.
func zmix(t *testing.T, args ...string) (code int, stdout, stderr string) {
	t.Helper()
	return zmixWith(t, newTestApp(nil), args...)
}

func zmixWith(t *testing.T, a *app, args ...string) (int, string, string) {
	t.Helper()
	var out, errOut bytes.Buffer
	a.stdout, a.stderr = &out, &errOut
	code := a.run(args)
	return code, out.String(), errOut.String()
}

func newTestApp(env map[string]string) *app {
	return &app{
		getenv:     func(k string) string { return env[k] },
		workbench:  func(ui.Config) error { return errors.New("test: the workbench must not start") },
		isTerminal: func(io.Writer) bool { return false },
	}
}

// air is dry air by mole fraction, rounded as handbooks give it.
const air = "N2 78.08%, O2 20.95%, Ar 0.93%, CO2 0.04%"

func TestBadInput(t *testing.T) {
	okBlend := []string{"--blend", "N2 0.79, O2 0.21"}
	tests := []struct {
		name string
		args []string
		code int
		want string // a piece of the one-line error
	}{
		{"zero kelvin", append([]string{"state", "--temp", "0K", "--pres", "1bar"}, okBlend...), 2, `"0K" is at or below absolute zero`},
		{"below absolute zero", append([]string{"state", "--temp", "-300C", "--pres", "1bar"}, okBlend...), 2, "absolute zero"},
		{"zero pressure", append([]string{"state", "--temp", "300K", "--pres", "0Pa"}, okBlend...), 2, `"0Pa" is at or below zero`},
		{"negative absolute from gauge", append([]string{"state", "--temp", "300K", "--pres", "-2barg"}, okBlend...), 2, "below zero"},
		{"non-numeric temperature", append([]string{"state", "--temp", "warm", "--pres", "1bar"}, okBlend...), 2, `temperature "warm"`},
		{"non-numeric pressure", append([]string{"state", "--temp", "300K", "--pres", "high"}, okBlend...), 2, `pressure "high"`},
		{"temperature without unit", append([]string{"state", "--temp", "300", "--pres", "1bar"}, okBlend...), 2, "K, C (°C), F (°F), R (Rankine)"},
		{"unknown pressure unit", append([]string{"state", "--temp", "300K", "--pres", "3 furlongs"}, okBlend...), 2, "Torr"},
		{"unknown flag", []string{"state", "--colour"}, 2, "unknown flag --colour; the flags are"},
		{"flag spelt out", []string{"state", "--temperature", "20C"}, 2, "unknown flag --temperature; did you mean --temp? The flags are"},
		{"flag cut short", []string{"throttle", "--to", "1bar"}, 2, "unknown flag --to; did you mean --to-pres? The flags are"},
		{"another command's flag", []string{"cylinder", "--fill", "200bar"}, 2, "unknown flag --fill; did you mean --pres? The flags are"},
		{"another command's flag, the other way", []string{"compress", "--to-pres", "5bar"}, 2, "unknown flag --to-pres; did you mean --to? The flags are"},
		{"the weighing's word for --add", []string{"weighed", "--parent", "5 g N2"}, 2, "unknown flag --parent; did you mean --add? The flags are"},
		{"flag without value", []string{"state", "--blend"}, 2, "flag --blend needs a value"},
		{"missing blend", []string{"state", "--temp", "300K", "--pres", "1bar"}, 2, "--blend is missing"},
		{"missing temperature", append([]string{"state", "--pres", "1bar"}, okBlend...), 2, "--temp is missing"},
		{"missing pressure", append([]string{"state", "--temp", "300K"}, okBlend...), 2, "--pres is missing"},
		{"json and csv", append([]string{"state", "--temp", "300K", "--pres", "1bar", "--json", "--csv"}, okBlend...), 2, "--json and --csv"},
		{"stray argument", append([]string{"state", "--temp", "300K", "--pres", "1", "bar"}, okBlend...), 2, `unexpected argument "bar"`},
		{"bad standard pressure", append([]string{"state", "--temp", "300K", "--pres", "1bar", "--std", "2bar"}, okBlend...), 2, "1 bar or 1 atm"},
		{"over 100 %", []string{"state", "--blend", "N2 80%, O2 30%", "--temp", "300K", "--pres", "1bar"}, 2, "more than 100 %"},
		{"under 100 %", []string{"state", "--blend", "N2 50%", "--temp", "300K", "--pres", "1bar"}, 2, "less than 100 %"},
		{"negative amount", []string{"state", "--blend", "N2 -5%, O2 bal", "--temp", "300K", "--pres", "1bar"}, 2, "negative amount"},
		{"empty blend", []string{"state", "--blend", " , ; ", "--temp", "300K", "--pres", "1bar"}, 2, "empty blend"},
		{"unknown species", []string{"state", "--blend", "N3 79%, O2 21%", "--temp", "300K", "--pres", "1bar"}, 2, `"N3": unknown species: did you mean`},
		{"two balances", []string{"state", "--blend", "N2 bal, Ar bal", "--temp", "300K", "--pres", "1bar"}, 2, "more than one balance"},
		{"bare isomer formula", []string{"state", "--blend", "C4H10 2%, N2 bal", "--temp", "300K", "--pres", "1bar"}, 2, `"C4H10" is the formula of more than one isomer; write n-C4H10 (n-butane) or i-C4H10 (isobutane)`},
		{"catalog bare isomer formula", []string{"catalog", "C4H10"}, 2, "write n-C4H10 (n-butane) or i-C4H10 (isobutane)"},
		{"sweep both ranges", append([]string{"sweep", "--temp", "300..400K", "--pres", "1..2bar"}, okBlend...), 2, "both ranges"},
		{"sweep no range", append([]string{"sweep", "--temp", "300K", "--pres", "1bar"}, okBlend...), 2, "nothing to sweep"},
		{"sweep one step", append([]string{"sweep", "--temp", "300..400K", "--pres", "1bar", "--steps", "1"}, okBlend...), 2, `invalid value "1" for flag --steps: want a whole number of points from 2`},
		{"sweep steps not a number", append([]string{"sweep", "--temp", "300..400K", "--pres", "1bar", "--steps", "ten"}, okBlend...), 2, `invalid value "ten"`},
		{"sweep a step for the count", append([]string{"sweep", "--temp", "300..400K", "--pres", "1bar", "--steps", "25K"}, okBlend...), 2, `--steps "25K": a number of points, end points included, not a step; a step of 25K over this range is --steps 5`},
		{"sweep a step that fits no count", append([]string{"sweep", "--temp", "300..400K", "--pres", "1bar", "--steps", "30K"}, okBlend...), 2, `--steps "30K": a number of points, end points included, not a step: want a whole number from 2 to 200000`},
		{"sweep pressure with a dew point", append([]string{"sweep", "--pres", "1..10bar", "--temp", "20C"}, "--blend", "H2O dew 5C, N2 bal"), 2, `--blend gives partial pressures or dew points, which fix the total`},
		{"state dew point above critical", []string{"state", "--blend", "H2O dew 400C, N2 bal", "--temp", "20C", "--pres", "1bar"}, 2, `blend item "H2O": no dew point: a dew point of 673.15 K for H2O: above its critical temperature (647.1 K) it does not condense; give its amount instead`},
		{"sweep range in words", []string{"sweep", "--blend", "N2", "--temp", "300 to 900 K", "--pres", "1bar"}, 2, `--temp: range "300 to 900 K": want FROM..TO with a unit, such as 300..900 K`},
		{"sweep a step on a pressure grid", append([]string{"sweep", "--pres", "1..10bar", "--temp", "300K", "--steps", "1bar"}, okBlend...), 2, `--steps "1bar": a number of points`},
		{"sweep zero end", append([]string{"sweep", "--temp", "0..400K", "--pres", "1bar"}, okBlend...), 2, "absolute zero"},
		{"sweep empty range", append([]string{"sweep", "--temp", "300..300K", "--pres", "1bar"}, okBlend...), 2, "two different end points"},
		{"sweep half range", append([]string{"sweep", "--temp", "300..", "--pres", "1bar"}, okBlend...), 2, "FROM..TO"},
		{"sweep gauge and absolute", append([]string{"sweep", "--temp", "300K", "--pres", "1bar..5barg"}, okBlend...), 2, "mixes gauge and absolute"},
		{"sweep pressure of partial pressures", []string{"sweep", "--blend", "Ar 0.5bar, He 0.5bar", "--temp", "300K", "--pres", "1..2bar"}, 2, "partial pressures"},
		{"sweep missing fixed pressure", append([]string{"sweep", "--temp", "300..400K"}, okBlend...), 2, "--pres is missing"},
		{"sweep json and csv", append([]string{"sweep", "--temp", "300..400K", "--pres", "1bar", "--json", "--csv"}, okBlend...), 2, "--json and --csv"},
		{"unknown command", []string{"stir"}, 2, "unknown command \"stir\"; the commands are state, sweep, flow, compress, heat, mix, dilute, purge, hazard, release, cylinder, throttle, weighed, catalog, open, help"},
		{"unknown global flag", []string{"--verbose"}, 2, "unknown flag --verbose"},
		{"command with an s", []string{"states"}, 2, `unknown command "states"; did you mean state? The commands are`},
		{"command as a noun", []string{"dilution"}, 2, `unknown command "dilution"; did you mean dilute?`},
		{"species for catalog", []string{"species"}, 2, `unknown command "species"; did you mean catalog?`},
		{"help on a mistyped command", []string{"help", "states"}, 2, `no help on "states"; did you mean state?`},
		{"command in capitals", []string{"STATE", "--blend", "N2", "--temp", "300K"}, 2, "zmix state: --pres is missing"},
		{"unknown catalog species", []string{"catalog", "CO22"}, 2, "did you mean CO2"},
		{"two catalog species", []string{"catalog", "CO2", "N2"}, 2, "one species at a time"},
		{"bad table temperature", []string{"catalog", "N2", "--temps", "300, cold"}, 2, `"cold"`},
		{"open without file", []string{"open"}, 2, "the blend file is missing"},
		{"help on nothing", []string{"help", "stir"}, 2, "no help on \"stir\""},
		{"missing blend file", append([]string{"state", "--blend", "@testdata/blends/no-such-file.json"}, "--temp", "300K", "--pres", "1bar"), 1, "cannot read it"},
		{"blend file with a bad amount", []string{"state", "--blend", "@testdata/blends/bad-amount.json", "--temp", "300K", "--pres", "1bar"}, 2, `"N2 lots"`},
		{"blend file not JSON", []string{"state", "--blend", "@testdata/blends/not-json.json", "--temp", "300K", "--pres", "1bar"}, 2, "not-json.json:1:"},
		{"missing species file", append([]string{"state", "--species", "testdata/species/none.cat", "--temp", "300K", "--pres", "1bar"}, okBlend...), 1, "cannot read it"},
		{"species file with a bad field", append([]string{"state", "--species", "testdata/species/bad-field.cat", "--temp", "300K", "--pres", "1bar"}, okBlend...), 2, `bad-field.cat:5: field "colour": unknown field`},
		{"open missing file", []string{"open", "testdata/blends/no-such-file.json"}, 1, "cannot read it"},
		// Issue 7, item 12: the list is quoted as typed, with the real reason.
		{"table temperature below zero", []string{"catalog", "N2", "--temps", "-5 K"}, 2, `--temps "-5 K": temperature "-5 K" is at or below absolute zero`},
		{"table temperature not a number", []string{"catalog", "N2", "--temps", "abc"}, 2, `--temps "abc": temperature "abc"`},
		// Issue 7, item 15: an empty value is not a value left out.
		{"empty table temperatures", []string{"catalog", "N2", "--temps", ""}, 2, "--temps was given an empty value"},
		{"empty standard pressure", append([]string{"state", "--temp", "300K", "--pres", "1bar", "--std", ""}, okBlend...), 2, "--std was given an empty value"},
		// Issue 7, item 13: a huge value is quoted in part.
		{"huge value quoted in part", append([]string{"state", "--temp", strings.Repeat("9", 120_000), "--pres", "1bar"}, okBlend...), 2, "(120000 characters)"},
		{"huge argument quoted in part", []string{"state", strings.Repeat("x", 5000)}, 2, "(5000 characters)"},
		// Issue 7, item 19: out of range names the flag and what was typed.
		{"temperature out of the model's range", append([]string{"state", "--temp", "1e7 K", "--pres", "1bar"}, okBlend...), 2, `--temp "1e7 K": temperature must be`},
		// Issue 7, item 2: a name cannot carry escapes to the terminal.
		{"escape in a command name", []string{"mix\x1b[2J"}, 2, `unknown command "mix\x1b[2J"`},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			code, stdout, stderr := zmix(t, tt.args...)
			if code != tt.code {
				t.Errorf("zmix %q: exit %d, want %d (stderr %q)", tt.args, code, tt.code, stderr)
			}
			if stdout != "" {
				t.Errorf("zmix %q: wrote to stdout on error:\n%s", tt.args, stdout)
			}
			checkOneLineError(t, stderr)
			if len(stderr) > 1000 {
				t.Errorf("zmix %q: a %d-byte error line", tt.args[:min(len(tt.args), 2)], len(stderr))
			}
			if strings.ContainsRune(stderr, 0x1b) {
				t.Errorf("zmix %q: the error holds an ESC byte", tt.args)
			}
			if !strings.Contains(stderr, tt.want) {
				t.Errorf("zmix %q: error %q does not contain %q", tt.args, stderr, tt.want)
			}
		})
	}
}

func checkOneLineError(t *testing.T, stderr string) {
	t.Helper()
	if strings.Count(stderr, "\n") != 1 || !strings.HasSuffix(stderr, "\n") {
		t.Errorf("error is not exactly one line: %q", stderr)
	}
	if !strings.HasPrefix(stderr, "zmix") {
		t.Errorf("error does not start with zmix: %q", stderr)
	}
	for _, bad := range []string{"panic", "goroutine", "NaN", "mixtures: ", "model: "} {
		if strings.Contains(stderr, bad) {
			t.Errorf("error holds %q: %q", bad, stderr)
		}
	}
}

// stateJSONOf runs zmix state --json and decodes the object.
func stateJSONOf(t *testing.T, args ...string) map[string]any {
	t.Helper()
	code, stdout, stderr := zmix(t, append([]string{"state", "--json"}, args...)...)
	if code != 0 {
		t.Fatalf("zmix state --json %q: exit %d: %s", args, code, stderr)
	}
	var obj map[string]any
	if err := json.Unmarshal([]byte(stdout), &obj); err != nil {
		t.Fatalf("zmix state --json %q: %v\n%s", args, err, stdout)
	}
	return obj
}

var (
	requiredKeys        = []string{"temperature_K", "pressure_Pa", "molar_mass_kg_mol", "density_kg_m3", "cp_J_molK", "cv_J_molK", "gamma", "sound_speed_m_s", "h_J_mol", "s_J_molK", "g_J_mol", "s_mix_J_molK", "species"}
	requiredSpeciesKeys = []string{"name", "x", "partial_pressure_Pa", "mu_J_mol", "s_J_molK", "cp_J_molK"}
)

func checkRequiredKeys(t *testing.T, obj map[string]any) {
	t.Helper()
	for _, k := range requiredKeys {
		if _, ok := obj[k]; !ok {
			t.Errorf("JSON lacks key %q", k)
		}
	}
	list, ok := obj["species"].([]any)
	if !ok || len(list) == 0 {
		t.Fatalf("JSON species = %v, want a non-empty list", obj["species"])
	}
	for _, item := range list {
		sp := item.(map[string]any)
		for _, k := range requiredSpeciesKeys {
			if _, ok := sp[k]; !ok {
				t.Errorf("JSON species %v lacks key %q", sp["name"], k)
			}
		}
	}
}

func TestStateJSONKeys(t *testing.T) {
	obj := stateJSONOf(t, "--blend", "SiH4 2%, H2 500ppm, N2 bal", "--temp", "300K", "--pres", "2barg")
	checkRequiredKeys(t, obj)
	if obj["pressure_given_as_gauge"] != true {
		t.Errorf("pressure_given_as_gauge = %v, want true for 2barg", obj["pressure_given_as_gauge"])
	}
	// 2 barg is 2e5 Pa above the 101325 Pa atmosphere the gauge unit assumes.
	if got := obj["pressure_Pa"].(float64); got != 301325 {
		t.Errorf("pressure_Pa = %v, want 301325", got)
	}
	cautions, _ := obj["cautions"].([]any)
	if len(cautions) == 0 || cautions[len(cautions)-1] != mixtures.DeferLine {
		t.Errorf("cautions = %v, want a list ending with the line that defers to site practice", cautions)
	}
}

// TestStateMatchesEngine checks that the command reports exactly what the
// engine computes, at full precision.
func TestStateMatchesEngine(t *testing.T) {
	obj := stateJSONOf(t, "--blend", air, "--temp", "25C", "--pres", "1atm")
	b, err := mixtures.ParseBlend(air)
	if err != nil {
		t.Fatal(err)
	}
	mix, err := b.Resolve(model.Builtin(), 101325)
	if err != nil {
		t.Fatal(err)
	}
	st, err := mix.State(298.15, 101325, mixtures.Options{})
	if err != nil {
		t.Fatal(err)
	}
	want := map[string]float64{
		"temperature_K": st.TempK, "pressure_Pa": st.PresPa, "molar_mass_kg_mol": st.MolarMassKgPerMol,
		"density_kg_m3": st.DensityKgPerM3, "cp_J_molK": st.CpJPerMolK, "cv_J_molK": st.CvJPerMolK,
		"gamma": st.Gamma, "sound_speed_m_s": st.SoundSpeedMPerS, "h_J_mol": st.HJPerMol,
		"s_J_molK": st.SJPerMolK, "g_J_mol": st.GJPerMol, "s_mix_J_molK": st.SMixJPerMolK,
	}
	for k, w := range want {
		if got := obj[k].(float64); got != w {
			t.Errorf("%s = %v, want the engine's %v", k, got, w)
		}
	}
	list := obj["species"].([]any)
	if len(list) != len(st.Species) {
		t.Fatalf("%d species, want %d", len(list), len(st.Species))
	}
	for i, item := range list {
		sp, term := item.(map[string]any), st.Species[i]
		if sp["name"] != term.Species.Formula || sp["mu_J_mol"].(float64) != term.MuJPerMol || sp["x"].(float64) != term.X {
			t.Errorf("species %d = %v, want %s with x %v, μ %v", i, sp, term.Species.Formula, term.X, term.MuJPerMol)
		}
	}

	// The text readout shows the same figures, rounded (the rounding
	// itself is checked in mixtures/report).
	_, text, _ := zmix(t, "state", "--blend", air, "--temp", "25C", "--pres", "1atm")
	for _, piece := range []string{
		report.Sig(st.DensityKgPerM3, 5) + "  kg/m³",
		report.Sig(st.SoundSpeedMPerS, 5) + "  m/s",
		report.Fixed(st.GJPerMol/1000, 3) + "  kJ/mol",
		"mixing entropy  " + report.Sig(st.SMixJPerMolK, 5) + " J/(mol·K)",
		report.Sig(st.Species[0].X, 4),
	} {
		if !strings.Contains(text, piece) {
			t.Errorf("text readout lacks %q:\n%s", piece, text)
		}
	}
}

// TestAirCheckValues compares the readout of dry air with handbook values.
func TestAirCheckValues(t *testing.T) {
	obj := stateJSONOf(t, "--blend", air, "--temp", "25C", "--pres", "1atm")
	tests := []struct {
		key       string
		want, tol float64
		source    string
	}{
		// Dry air at 25 °C and 1 atm, handbook values (from memory).
		{"density_kg_m3", 1.184, 0.001, "handbook table of dry air, 25 °C, 1 atm (from memory)"},
		{"sound_speed_m_s", 346.1, 0.5, "handbook speed of sound in dry air, 25 °C (from memory)"},
		{"gamma", 1.400, 0.002, "handbook ratio of heat capacities of air, 300 K (from memory)"},
		{"cp_J_kgK", 1005, 3, "handbook cp of air, 1.005 kJ/(kg·K) at 300 K (from memory)"},
		{"molar_mass_kg_mol", 0.028965, 0.00001, "handbook molar mass of dry air, 28.965 g/mol (from memory)"},
	}
	for _, tt := range tests {
		got := obj[tt.key].(float64)
		if math.Abs(got-tt.want) > tt.tol {
			t.Errorf("%s = %.6g, want %.6g ± %g (%s)", tt.key, got, tt.want, tt.tol, tt.source)
		}
	}
}

// TestMixingEntropyFiftyFifty checks the textbook value R ln 2 for an
// equimolar blend of two different gases.
func TestMixingEntropyFiftyFifty(t *testing.T) {
	obj := stateJSONOf(t, "--blend", "N2 50%, Ar 50%", "--temp", "300K", "--pres", "1bar")
	want := model.GasConstant * math.Ln2 // textbook: ΔS_mix = R ln 2 per mole
	if got := obj["s_mix_J_molK"].(float64); math.Abs(got-want) > 1e-9 {
		t.Errorf("s_mix_J_molK = %v, want R ln 2 = %v", got, want)
	}
}

func TestPartialPressuresGiveTheTotal(t *testing.T) {
	obj := stateJSONOf(t, "--blend", "Ar 0.8 bar, He 200 mbar", "--temp", "300K")
	if got := obj["pressure_Pa"].(float64); math.Abs(got-1e5) > 1e-6 {
		t.Errorf("pressure_Pa = %v, want the sum of the partial pressures, 1e5", got)
	}
	_, text, _ := zmix(t, "state", "--blend", "Ar 0.8 bar, He 200 mbar", "--temp", "300K")
	if !strings.Contains(text, "(sum of the partial pressures)") {
		t.Errorf("text readout does not say the total is the sum of the partial pressures:\n%s", text)
	}
}

func TestGaugeIsFlagged(t *testing.T) {
	_, text, _ := zmix(t, "state", "--blend", air, "--temp", "25C", "--pres", "2 barg")
	if want := "2 barg (gauge; 3.01325 bar absolute)"; !strings.Contains(text, want) {
		t.Errorf("readout lacks %q:\n%s", want, text)
	}
}

func TestStateText(t *testing.T) {
	code, text, stderr := zmix(t, "state", "--blend", "SiH4 2%, H2 500ppm, N2 bal", "--temp", "300K", "--pres", "1bar")
	if code != 0 || stderr != "" {
		t.Fatalf("exit %d, stderr %q", code, stderr)
	}
	for _, want := range []string{
		"molar mass M", "density ρ", "heat capacity Cp", "heat capacity Cv", "γ = Cp/Cv", "speed of sound c",
		"enthalpy H", "internal energy U", "entropy S", "Gibbs energy G", "Helmholtz energy A",
		"J/(kg·K)", "kJ/kg", "mixing entropy", "share", "SiH4", "Validity", "Cautions",
		"Pyrophoric (SiH4)", "Flammable", mixtures.DeferLine[:40],
	} {
		if !strings.Contains(text, want) {
			t.Errorf("readout lacks %q", want)
		}
	}
	if strings.Contains(text, "NaN") || strings.Contains(text, "Inf") {
		t.Errorf("readout holds a non-finite number:\n%s", text)
	}
}

func TestStateCSV(t *testing.T) {
	code, stdout, stderr := zmix(t, "state", "--blend", "SiH4 2%, N2 bal", "--temp", "300K", "--pres", "1bar", "--csv")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	rows, err := csv.NewReader(strings.NewReader(stdout)).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if len(rows) != 2 {
		t.Fatalf("%d CSV rows, want a header and one row", len(rows))
	}
	// CSV has no room for the cautions: they go to stderr.
	if !strings.Contains(stderr, "caution: Pyrophoric (SiH4)") || !strings.Contains(stderr, mixtures.DeferLine) {
		t.Errorf("stderr lacks the cautions: %q", stderr)
	}
}

func TestSweepCSV(t *testing.T) {
	for _, steps := range []int{2, 11, 37} {
		code, stdout, stderr := zmix(t, "sweep", "--blend", air, "--temp", "300..1500K", "--pres", "1atm", "--steps", fmt.Sprint(steps), "--csv")
		if code != 0 {
			t.Fatalf("exit %d: %s", code, stderr)
		}
		rows, err := csv.NewReader(strings.NewReader(stdout)).ReadAll()
		if err != nil {
			t.Fatal(err)
		}
		if len(rows) != 1+steps {
			t.Errorf("--steps %d: %d CSV rows, want 1 header + %d", steps, len(rows), steps)
		}
		header := strings.Join(rows[0], ",")
		for _, k := range append(requiredKeys[:len(requiredKeys)-1], "N2.x", "CO2.mu_J_mol") {
			if !strings.Contains(","+header+",", ","+k+",") {
				t.Errorf("CSV header lacks %q", k)
			}
		}
		// End points included: the first and last rows are the range ends.
		col := indexOf(rows[0], "temperature_K")
		if rows[1][col] != "300" || rows[len(rows)-1][col] != "1500" {
			t.Errorf("T from %s to %s, want 300 to 1500", rows[1][col], rows[len(rows)-1][col])
		}
	}
}

func indexOf(list []string, s string) int {
	for i, x := range list {
		if x == s {
			return i
		}
	}
	return -1
}

func TestSweepJSON(t *testing.T) {
	code, stdout, stderr := zmix(t, "sweep", "--blend", "N2 0.79, O2 0.21", "--pres", "1..50bar", "--temp", "25C", "--steps", "4", "--json")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	var list []map[string]any
	if err := json.Unmarshal([]byte(stdout), &list); err != nil {
		t.Fatal(err)
	}
	if len(list) != 4 {
		t.Fatalf("%d points, want 4", len(list))
	}
	for _, obj := range list {
		checkRequiredKeys(t, obj)
	}
	// A pressure sweep is on a log grid: the middle points are 1·50^(1/3)
	// and 1·50^(2/3) bar.
	if got, want := list[1]["pressure_Pa"].(float64), 1e5*math.Pow(50, 1.0/3); math.Abs(got-want) > 1e-6*want {
		t.Errorf("second point at %v Pa, want %v", got, want)
	}
	// The stored-energy caution of 50 bar goes to stderr.
	if !strings.Contains(stderr, "caution: Pressure") {
		t.Errorf("stderr lacks the pressure caution: %q", stderr)
	}
}

func TestSweepText(t *testing.T) {
	code, text, _ := zmix(t, "sweep", "--blend", air, "--temp", "300..1500K", "--log", "--pres", "1atm", "--steps", "3")
	if code != 0 {
		t.Fatal(text)
	}
	lines := strings.Split(text, "\n")
	var rows int
	for _, l := range lines {
		if strings.HasPrefix(strings.TrimSpace(l), "300 ") || strings.HasPrefix(strings.TrimSpace(l), "670.8") || strings.HasPrefix(strings.TrimSpace(l), "1500 ") {
			rows++
		}
	}
	// ln grid: the middle point is √(300·1500) = 670.82 K.
	if rows != 3 {
		t.Errorf("want rows at 300, 670.8 and 1500 K:\n%s", text)
	}
	for _, want := range []string{"μ N2", "μ CO2", "log grid", "Cautions"} {
		if !strings.Contains(text, want) {
			t.Errorf("sweep table lacks %q", want)
		}
	}
}

func TestBlendFile(t *testing.T) {
	// The file holds 450 C, 1.03 bar and 1 atm; flags override them.
	obj := stateJSONOf(t, "--blend", "@testdata/blends/lehr-forming-gas.json")
	if got := obj["temperature_K"].(float64); math.Abs(got-723.15) > 1e-9 {
		t.Errorf("temperature_K = %v, want the file's 450 C = 723.15 K", got)
	}
	if got := obj["pressure_Pa"].(float64); math.Abs(got-103000) > 1e-6 {
		t.Errorf("pressure_Pa = %v, want the file's 1.03 bar", got)
	}
	if got := obj["standard_pressure_Pa"].(float64); got != 101325 {
		t.Errorf("standard_pressure_Pa = %v, want the file's 1 atm", got)
	}
	obj = stateJSONOf(t, "--blend", "@testdata/blends/lehr-forming-gas.json", "--temp", "20C", "--std", "1bar")
	if got := obj["temperature_K"].(float64); math.Abs(got-293.15) > 1e-9 {
		t.Errorf("temperature_K = %v, want --temp 20C to win over the file", got)
	}
	if got := obj["standard_pressure_Pa"].(float64); got != 1e5 {
		t.Errorf("standard_pressure_Pa = %v, want --std 1bar to win over the file", got)
	}
	code, _, stderr := zmix(t, "sweep", "--blend", "@testdata/blends/lehr-forming-gas.json", "--temp", "300..900K", "--steps", "3")
	if code != 0 {
		t.Errorf("sweep of a blend file with its own pressure: exit %d: %s", code, stderr)
	}
}

func TestCatalog(t *testing.T) {
	code, list, _ := zmix(t, "catalog")
	if code != 0 {
		t.Fatal(list)
	}
	for _, sp := range model.Builtin().All() {
		if !strings.Contains(list, "  "+sp.Formula+" ") {
			t.Errorf("catalog list lacks %s", sp.Formula)
		}
	}
	code, one, _ := zmix(t, "catalog", "CO2", "--std", "1atm")
	if code != 0 {
		t.Fatal(one)
	}
	for _, want := range []string{"carbon dioxide", "Sources", "Θ = ", "cm⁻¹", "−[G°−H°(298.15 K)]/T", "P° = 1 atm", "298.15"} {
		if !strings.Contains(one, want) {
			t.Errorf("catalog CO2 lacks %q", want)
		}
	}
	// At 298.15 K the two reference columns meet: −[G°−H°(298.15)]/T = S°
	// and H°−H°(298.15) = 0, by their definitions.
	for _, line := range strings.Split(one, "\n") {
		f := strings.Fields(line)
		if len(f) == 5 && f[0] == "298.15" {
			if f[2] != f[3] || f[4] != "0.000" {
				t.Errorf("row at 298.15 K = %q, want S° = −[G°−H°(298.15)]/T and H°−H°(298.15) = 0", line)
			}
		}
	}
	// Lookup by name and in any case.
	if code, _, stderr := zmix(t, "catalog", "carbon dioxide"); code != 0 {
		t.Errorf("catalog by name: exit %d: %s", code, stderr)
	}
}

func TestSpeciesFile(t *testing.T) {
	code, list, stderr := zmix(t, "catalog", "--species", "testdata/species/tracer.cat")
	if code != 0 {
		t.Fatal(stderr)
	}
	if !strings.Contains(list, "Kr *") || !strings.Contains(list, "krypton (test entry)") || !strings.Contains(list, "1 from --species files") {
		t.Errorf("catalog does not mark the user entry:\n%s", list)
	}
	// The global form, before the command, works too.
	code, one, _ := zmix(t, "--species", "testdata/species/tracer.cat", "catalog", "Kr")
	if code != 0 || !strings.Contains(one, "from a --species file") {
		t.Errorf("global --species: exit %d:\n%s", code, one)
	}
}

func TestHelp(t *testing.T) {
	for _, args := range [][]string{{"--help"}, {"-h"}, {"help"}, {"help", "sweep"}, {"state", "--help"}, {"sweep", "-h"}, {"catalog", "--help"}, {"open", "--help"}} {
		code, stdout, stderr := zmix(t, args...)
		if code != 0 || stderr != "" {
			t.Errorf("zmix %q: exit %d, stderr %q", args, code, stderr)
		}
		if !strings.Contains(stdout, "Usage") || !strings.Contains(stdout, "Examples") {
			t.Errorf("zmix %q: help lacks usage or examples:\n%s", args, stdout)
		}
	}
	_, stdout, _ := zmix(t, "state", "--help")
	// The help lists every unit the parser accepts, from the engine's own
	// list (issue 7, item 19: kPag and bara worked but were not listed).
	flat := strings.Join(strings.Fields(stdout), " ")
	for _, unit := range []string{mixtures.TemperatureUnits, mixtures.PressureUnits, "Pa, hPa, kPa, MPa, GPa, bar, mbar, atm, Torr, mmHg, inHg, psi, kgf/cm2", "psia", "bara", "kPag", "MPag", "barg", "psig", "kgf/cm2g", "bar(g)"} {
		if !strings.Contains(flat, unit) {
			t.Errorf("state --help lacks the units %q", unit)
		}
	}
	// And flow --help every flow unit, from the process package's table
	// (t/h, MMSCFD and slm were read but not listed).
	_, stdout, _ = zmix(t, "flow", "--help")
	words := strings.FieldsFunc(stdout, func(r rune) bool { return r == ',' || r == ' ' || r == '\n' })
	for _, b := range []process.Basis{process.BasisMolar, process.BasisMass, process.BasisActual, process.BasisStandard} {
		for _, unit := range process.RateUnitNames(b) {
			if !slices.Contains(words, unit) {
				t.Errorf("flow --help lacks the unit %s", unit)
			}
		}
	}
}

// TestHelpExamplesRun runs every example line of every command's help, so
// that the help never shows a command that fails.
func TestHelpExamplesRun(t *testing.T) {
	for _, c := range commands {
		var b bytes.Buffer
		c.usage(&b)
		_, examples, _ := strings.Cut(b.String(), "Examples:\n")
		for _, line := range strings.Split(strings.TrimSpace(examples), "\n") {
			args := splitShell(strings.TrimPrefix(strings.TrimSpace(line), "zmix "))
			if len(args) == 0 || args[0] == "open" || strings.Contains(line, "@") || strings.Contains(line, "my-gases") {
				continue // needs a file of the user's, or a terminal
			}
			if code, _, stderr := zmix(t, args...); code != 0 {
				t.Errorf("help example %q: exit %d: %s", line, code, stderr)
			}
		}
	}
}

// splitShell splits a command line on spaces outside double quotes.
func splitShell(s string) []string {
	var out []string
	var cur strings.Builder
	quoted, any := false, false
	for _, r := range s {
		switch {
		case r == '"':
			quoted, any = !quoted, true
		case r == ' ' && !quoted:
			if any {
				out = append(out, cur.String())
				cur.Reset()
				any = false
			}
		default:
			cur.WriteRune(r)
			any = true
		}
	}
	if any {
		out = append(out, cur.String())
	}
	return out
}

func TestASCII(t *testing.T) {
	for _, args := range [][]string{
		{"state", "--ascii", "--blend", air, "--temp", "25C", "--pres", "1atm", "--all-notes"},
		{"sweep", "--ascii", "--blend", "SiH4 2%, N2 bal", "--temp", "300..900K", "--pres", "1bar"},
		{"catalog", "--ascii", "O2"},
		{"catalog", "--ascii"},
	} {
		code, stdout, _ := zmix(t, args...)
		if code != 0 {
			t.Fatalf("zmix %q: exit %d", args, code)
		}
		if !isASCII(stdout) {
			t.Errorf("zmix %q: non-ASCII output in ASCII mode:\n%s", args, stdout)
		}
	}
	// ZMIX_ASCII=1 does the same.
	code, stdout, _ := zmixWith(t, newTestApp(map[string]string{"ZMIX_ASCII": "1"}), "catalog", "CO2")
	if code != 0 || !isASCII(stdout) {
		t.Errorf("ZMIX_ASCII=1: exit %d, ASCII %v", code, isASCII(stdout))
	}
}

func TestWorkbenchStart(t *testing.T) {
	var got *ui.Config
	a := newTestApp(map[string]string{"NO_COLOR": "1", "ZMIX_ASCII": "1"})
	a.isTerminal = func(io.Writer) bool { return true }
	a.workbench = func(cfg ui.Config) error { got = &cfg; return nil }
	if code, _, stderr := zmixWith(t, a); code != 0 {
		t.Fatalf("zmix: exit %d: %s", code, stderr)
	}
	if got == nil || !got.ASCII || !got.NoColor || got.BlendFile != "" || got.Catalogue == nil {
		t.Errorf("workbench config = %+v, want ASCII and NoColor from the environment, the catalogue, no file", got)
	}

	got = nil
	a = newTestApp(nil)
	a.isTerminal = func(io.Writer) bool { return true }
	a.workbench = func(cfg ui.Config) error { got = &cfg; return nil }
	path := "testdata/blends/lehr-forming-gas.json"
	if code, _, stderr := zmixWith(t, a, "open", "--ascii", "--species", "testdata/species/tracer.cat", path); code != 0 {
		t.Fatalf("zmix open: exit %d: %s", code, stderr)
	}
	if got == nil || got.BlendFile != path || !got.ASCII || got.NoColor {
		t.Fatalf("workbench config = %+v, want the file and --ascii", got)
	}
	if sp, ok := got.Catalogue.Lookup("Kr"); !ok || sp.Name != "krypton (test entry)" {
		t.Errorf("workbench catalogue lacks the --species entry")
	}
}

func TestWorkbenchFallback(t *testing.T) {
	// Without a terminal the workbench is not started; the demo's readout
	// is printed instead.
	code, stdout, stderr := zmix(t)
	if code != 0 {
		t.Fatalf("zmix: exit %d: %s", code, stderr)
	}
	demo := mixtures.DemoFile()
	if !strings.Contains(stdout, demo.Name) || !strings.Contains(stdout, "Cautions") || !strings.Contains(stdout, "mixing entropy") {
		t.Errorf("zmix without a terminal does not print the demo readout:\n%s", stdout)
	}
	if !strings.Contains(stderr, "not a terminal") {
		t.Errorf("stderr %q does not say why the workbench did not open", stderr)
	}

	a := newTestApp(nil)
	a.isTerminal = func(io.Writer) bool { return true }
	// Any other workbench failure is an I/O failure, reported in one line.
	a.workbench = func(ui.Config) error { return errors.New("could not open /dev/tty") }
	code, stdout, stderr = zmixWith(t, a)
	if code != 1 || stdout != "" {
		t.Errorf("failing workbench: exit %d, want 1; stdout %q", code, stdout)
	}
	checkOneLineError(t, stderr)
}

// TestNeverNaN drives the state command over seeded random conditions,
// far outside everyday ones: each run either prints only finite numbers or
// fails with a one-line error.
func TestNeverNaN(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 1))
	blends := []string{air, "H2 0.5, D2 0.5", "SiH4 2%, H2 500ppm, N2 bal", "He 1", "SF6 10 ppm, Ar bal"}
	for range 200 {
		tempK := math.Pow(10, -4+11*rng.Float64())  // 1e-4 .. 1e7 K
		presPa := math.Pow(10, -6+16*rng.Float64()) // 1e-6 .. 1e10 Pa
		args := []string{"--blend", blends[rng.IntN(len(blends))], "--temp", fmt.Sprintf("%g K", tempK), "--pres", fmt.Sprintf("%g Pa", presPa)}
		for _, format := range []string{"", "--json", "--csv"} {
			full := append([]string{"state"}, args...)
			if format != "" {
				full = append(full, format)
			}
			code, stdout, stderr := zmix(t, full...)
			switch code {
			case 0:
				low := strings.ToLower(stdout)
				if strings.Contains(low, "nan") || strings.Contains(low, "inf") || strings.Contains(stdout, "?") {
					t.Errorf("zmix %q printed a non-finite number:\n%s", full, stdout)
				}
			case 2:
				checkOneLineError(t, stderr)
			default:
				t.Errorf("zmix %q: exit %d: %s", full, code, stderr)
			}
		}
	}
}

// TestGolden compares whole text outputs with testdata/golden/*.golden.
// Each NAME.args holds the arguments, one per line. The goldens use a
// frozen copy of the air species (testdata/species/frozen-air.cat), so they
// change only when the engine or the layout does; go test -update rewrites
// them after a deliberate change.
func TestGolden(t *testing.T) {
	files, err := filepath.Glob("testdata/golden/*.args")
	if err != nil || len(files) == 0 {
		t.Fatalf("no golden cases: %v", err)
	}
	for _, argsFile := range files {
		name := strings.TrimSuffix(filepath.Base(argsFile), ".args")
		t.Run(name, func(t *testing.T) {
			data, err := os.ReadFile(argsFile)
			if err != nil {
				t.Fatal(err)
			}
			args := strings.Split(strings.TrimRight(string(data), "\n"), "\n")
			code, stdout, stderr := zmix(t, args...)
			if code != 0 {
				t.Fatalf("zmix %q: exit %d: %s", args, code, stderr)
			}
			goldenFile := strings.TrimSuffix(argsFile, ".args") + ".golden"
			if updating() {
				if err := os.WriteFile(goldenFile, []byte(stdout), 0o644); err != nil {
					t.Fatal(err)
				}
				return
			}
			want, err := os.ReadFile(goldenFile)
			if err != nil {
				t.Fatalf("%v (run go test -update to create it)", err)
			}
			if stdout != string(want) {
				t.Errorf("zmix %q differs from %s (go test -update rewrites it after a deliberate change):\ngot:\n%s\nwant:\n%s", args, goldenFile, stdout, want)
			}
		})
	}
}

func isASCII(s string) bool {
	for i := 0; i < len(s); i++ {
		if s[i] >= 0x80 {
			return false
		}
	}
	return true
}

// TestUsageNamesEveryFlag: each command's --help, and the README, name
// every flag the command takes, so that a flag added to a command cannot
// be left out of its help or of the user's document.
func TestUsageNamesEveryFlag(t *testing.T) {
	readme, err := os.ReadFile("README.md")
	if err != nil {
		t.Fatal(err)
	}
	var seen *flag.FlagSet
	helpAsked = func(fs *flag.FlagSet) { seen = fs }
	defer func() { helpAsked = nil }()
	for _, c := range commands {
		seen = nil
		code, stdout, stderr := zmix(t, c.name, "--help")
		if code != 0 {
			t.Errorf("zmix %s --help: exit %d, %s", c.name, code, stderr)
			continue
		}
		if seen == nil {
			continue // a command with no flags of its own (help)
		}
		seen.VisitAll(func(f *flag.Flag) {
			if !strings.Contains(stdout, "--"+f.Name) {
				t.Errorf("zmix %s --help does not name --%s", c.name, f.Name)
			}
			if !bytes.Contains(readme, []byte("--"+f.Name)) {
				t.Errorf("the README does not name --%s of zmix %s", f.Name, c.name)
			}
		})
	}
}

// TestUsageFlagsFit80: the flag lists of every command's help fit 80
// columns, a flag's description continuing under it; usage lines and
// examples, which are commands to copy whole, may run longer. No help
// holds a formatting slip.
func TestUsageFlagsFit80(t *testing.T) {
	for _, c := range commands {
		_, stdout, _ := zmix(t, c.name, "--help")
		if strings.Contains(stdout, "%!") {
			t.Errorf("zmix %s --help holds a formatting slip (%%!): a %% in text given to Fprintf", c.name)
		}
		inFlags := false
		for _, l := range strings.Split(stdout, "\n") {
			switch {
			case strings.HasPrefix(l, "Flags"):
				inFlags = true
				continue
			case l == "":
				inFlags = false
			}
			if inFlags && utf8.RuneCountInString(l) > 80 {
				t.Errorf("zmix %s --help: a flag line of %d columns: %q", c.name, utf8.RuneCountInString(l), l)
			}
		}
	}
}

// "air" in blend text is dry air's components, and every readout that
// names the blend says what air was taken to be, once.
func TestAirInBlendText(t *testing.T) {
	const note = "[air = dry air: O2 20.946 %, Ar 0.934 %, CO2 0.04 %, N2 bal (US Standard Atmosphere 1976, CO2 updated; from memory)]"
	code, out, stderr := zmix(t, "state", "--blend", "CO2 5%, air bal", "--temp", "20C", "--pres", "1atm")
	if code != 0 || !strings.Contains(out, "Blend  CO2 5%, air bal  "+note) {
		t.Fatalf("state with air: exit %d, stderr %q; output:\n%s", code, stderr, out)
	}
	for _, sp := range []string{"  N2 ", "  O2 ", "  Ar ", "  CO2 "} {
		if !strings.Contains(out, sp) {
			t.Errorf("state with air: no species line %q", sp)
		}
	}
	code, out, _ = zmix(t, "dilute", "--blend", "CH4 2.5%, air bal", "--with", "air", "--target", "CH4 1%")
	if code != 0 || strings.Count(out, note) != 1 {
		t.Errorf("dilute air with air: exit %d, the note %d times, want once:\n%s", code, strings.Count(out, note), out)
	}
	code, out, _ = zmix(t, "mix", "--stream", "air; 25C; 100 Nm3/h", "--stream", "CO2 1; 80C; 20 kg/h", "--pres", "1.2bar")
	if code != 0 || !strings.Contains(out, "Mixing  air  +  CO2 1  "+note) {
		t.Errorf("mix with air: exit %d:\n%s", code, out)
	}
	code, out, _ = zmix(t, "state", "--blend", "N2 79%, O2 21%", "--temp", "20C", "--pres", "1atm")
	if code != 0 || strings.Contains(out, "dry air") {
		t.Errorf("a blend without air has the note:\n%s", out)
	}
}

// zmix catalog air says what the named mixture is, in each format.
func TestCatalogNamedMixture(t *testing.T) {
	code, out, stderr := zmix(t, "catalog", "air")
	if code != 0 || !strings.Contains(out, "air: a named mixture, not a species") || !strings.Contains(out, "molar mass  28.9664 g/mol") || !strings.Contains(out, "O2        0.209460") {
		t.Fatalf("catalog air: exit %d, stderr %q:\n%s", code, stderr, out)
	}
	code, out, _ = zmix(t, "catalog", "Air", "--json")
	var got struct {
		Name         string `json:"name"`
		NamedMixture bool   `json:"named_mixture"`
		Parts        []struct {
			Formula string  `json:"formula"`
			X       float64 `json:"x"`
		} `json:"parts"`
	}
	if err := json.Unmarshal([]byte(out), &got); code != 0 || err != nil || !got.NamedMixture || got.Name != "air" || len(got.Parts) != 4 || got.Parts[1].Formula != "O2" || got.Parts[1].X != 0.20946 {
		t.Errorf("catalog air --json: exit %d, %v, %+v", code, err, got)
	}
	code, out, _ = zmix(t, "catalog", "air", "--csv")
	if code != 0 || !strings.HasPrefix(out, "formula,x\nN2,0.7808\n") {
		t.Errorf("catalog air --csv: exit %d:\n%s", code, out)
	}
	code, out, _ = zmix(t, "catalog")
	if flat := strings.Join(strings.Fields(out), " "); code != 0 || !strings.Contains(flat, "Named mixtures, which blend text takes as one item: air (dry air (N2, O2, Ar, CO2)).") {
		t.Errorf("catalog list does not name air:\n%s", out)
	}
}

// A species file may not give a species the name blend text keeps for a
// named mixture: "air" would never reach it.
func TestSpeciesFileCannotTakeAir(t *testing.T) {
	path := filepath.Join(t.TempDir(), "lump.cat")
	text := "[N2O3]\nname = Air\nrotor = nonlinear\nrot_cm = 0.4 0.15 0.1 | test fixture\nvib_cm = 1000x3 900x3 800x3 | test fixture\ndHf0_kJ = 0 | test fixture\n"
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	code, _, stderr := zmix(t, "state", "--species", path, "--blend", "air", "--temp", "20C", "--pres", "1atm")
	if code != 2 || !strings.Contains(stderr, `goes by the name "air", which blend text keeps for dry air`) || strings.Count(stderr, "\n") != 1 {
		t.Errorf("species file naming air: exit %d, stderr %q", code, stderr)
	}
}

// zmix catalog takes a name in words without quotes; words that are not
// one name are several species, refused as before.
func TestCatalogNameInWords(t *testing.T) {
	code, out, stderr := zmix(t, "catalog", "nitrous", "oxide")
	if code != 0 || !strings.HasPrefix(out, "N2O  nitrous oxide") {
		t.Errorf("catalog nitrous oxide: exit %d, stderr %q:\n%.200s", code, stderr, out)
	}
	code, _, stderr = zmix(t, "catalog", "N2", "O2")
	if code != 2 || !strings.Contains(stderr, "one species at a time; got N2 O2") {
		t.Errorf("catalog N2 O2: exit %d, stderr %q", code, stderr)
	}
}

// Help is output like any other: with --ascii anywhere on the line, or
// ZMIX_ASCII=1, every command's help is plain ASCII (the units and
// references in it carry °C and ³ otherwise).
func TestHelpASCII(t *testing.T) {
	nonASCII := func(s string) int {
		n := 0
		for _, r := range s {
			if r > 127 {
				n++
			}
		}
		return n
	}
	for _, c := range commands {
		for _, args := range [][]string{{c.name, "--help", "--ascii"}, {"--ascii", c.name, "--help"}, {"help", c.name, "--ascii"}} {
			code, stdout, stderr := zmix(t, args...)
			if code != 0 || stdout == "" || nonASCII(stdout) > 0 {
				t.Errorf("zmix %q: exit %d, %d characters past ASCII; %s", args, code, nonASCII(stdout), stderr)
			}
		}
		code, stdout, _ := zmixWith(t, newTestApp(map[string]string{"ZMIX_ASCII": "1"}), c.name, "--help")
		if code != 0 || nonASCII(stdout) > 0 {
			t.Errorf("ZMIX_ASCII=1 zmix %s --help: exit %d, %d characters past ASCII", c.name, code, nonASCII(stdout))
		}
	}
	if _, stdout, _ := zmix(t, "flow", "--help"); nonASCII(stdout) == 0 {
		t.Error("flow --help without --ascii holds no °C: the test above proves nothing")
	}
}
