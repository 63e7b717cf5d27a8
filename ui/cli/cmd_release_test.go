package cli

import (
	"encoding/json"
	"math"
	"strings"
	"testing"
)

func releaseJSONOf(t *testing.T, args ...string) map[string]any {
	t.Helper()
	code, stdout, stderr := zmix(t, append([]string{"release", "--json"}, args...)...)
	if code != 0 {
		t.Fatalf("zmix release %q: exit %d, %s", args, code, stderr)
	}
	var obj map[string]any
	if err := json.Unmarshal([]byte(stdout), &obj); err != nil {
		t.Fatalf("zmix release --json: %v\n%s", err, stdout)
	}
	return obj
}

// TestReleaseCommand checks the command against the model's closed forms,
// with volumes through the units: 40 mol of N2 is 40·R·293.15/101325 m³
// at the room's 20 °C and 1 atm (R from the engine).
func TestReleaseCommand(t *testing.T) {
	obj := releaseJSONOf(t, "--blend", "N2 100%", "--amount", "40 mol", "--room", "2 m3")
	q := 40 * 8.314462618 * 293.15 / 101325 // CODATA 2018 R
	want := 20.9 * math.Exp(-q/2)           // displacement, the lower
	if got := obj["o2_percent"].(float64); math.Abs(got-want) > 1e-6*want {
		t.Errorf("o2_percent = %g, want %g", got, want)
	}
	if got := obj["o2_closed_room_percent"].(float64); math.Abs(got-20.9*2/(2+q)) > 1e-6 {
		t.Errorf("closed room %g, want %g", got, 20.9*2/(2+q))
	}
	for _, key := range []string{"o2_percent", "species", "model"} {
		if _, ok := obj[key]; !ok {
			t.Errorf("key %q missing", key)
		}
	}
	// A flammable species gives percent_of_lfl: 10 SL of H2 into 1 m³ of
	// room, 10 % H2 in N2: 1 − e^(−0.01073) of the blend at worst.
	obj = releaseJSONOf(t, "--blend", "H2 10%, N2 bal", "--amount", "10 SL", "--room", "1 m3")
	sp := obj["species"].([]any)[0].(map[string]any)
	ratio := 10e-3 * 293.15 / 273.15
	peak := 0.10 * -math.Expm1(-ratio) * 1e6
	if math.Abs(sp["peak_ppm"].(float64)-peak) > 1e-6*peak || math.Abs(sp["percent_of_lfl"].(float64)-peak/1e4/4*100) > 1e-6 {
		t.Errorf("H2: %v; want peak %g ppm, %g %% LFL", sp, peak, peak/1e4/4*100)
	}
	// Steady state with ventilation: 6 changes an hour of 60 m³ against
	// 10 m³/h at 20 °C of N2: 20.9 × 360/370.
	obj = releaseJSONOf(t, "--blend", "N2 100%", "--rate", "10 m3/h", "--room", "60 m3", "--ach", "6")
	if got, want := obj["o2_percent"].(float64), 20.9*360/370; math.Abs(got-want) > 1e-9 {
		t.Errorf("steady o2_percent %g, want %g", got, want)
	}
	code, stdout, _ := zmix(t, "release", "--blend", "PH3 1%, N2 bal", "--amount", "50SL", "--room", "200m3")
	for _, w := range []string{"% of LC50", "Cat. 1", "common practice", "do not replace"} {
		if code != 0 || !strings.Contains(stdout, w) {
			t.Errorf("release text lacks %q:\n%s", w, stdout)
		}
	}
	for _, args := range [][]string{
		{"release", "--blend", "N2 bal", "--amount", "1kg"},
		{"release", "--blend", "N2 bal", "--room", "30m3"},
		{"release", "--blend", "N2 bal", "--room", "30m3", "--amount", "0kg"},
		{"release", "--blend", "N2 bal", "--room", "-3m3", "--amount", "1kg"},
		{"release", "--blend", "N2 bal", "--room", "30m3", "--rate", "5"},
		{"release", "--blend", "N2 bal", "--room", "30m3", "--amount", "1kg", "--ach", "lots"},
		{"release", "--blend", "N2 bal", "--room", "30m3", "--amount", "1kg", "--vent", "3 kg/h"},
		{"release", "--blend", "N2 bal", "--room", "30m3", "--amount", "1kg", "--ach", "2", "--vent", "3m3/h"},
		{"release", "--blend", "N2 bal", "--room", "30m3", "--cylinder", "50L"},
		{"release", "--blend", "N2 bal", "--room", "30m3", "--fill", "200bar"},
		{"release", "--blend", "N2 bal", "--room", "30m3", "--cylinder", "50L", "--fill", "200bar", "--amount", "1kg"},
		{"release", "--blend", "N2 bal", "--room", "30m3", "--cylinder", "50L", "--fill", "0.5bar"},
		{"release", "--blend", "N2 bal", "--room", "30m3", "--cylinder", "-5L", "--fill", "200bar"},
		{"release", "--blend", "N2 bal", "--room", "30m3", "--cylinder", "50L", "--fill", "200bar", "--fill-temp", "-300C"},
		{"release", "--blend", "CO2 bal", "--room", "30m3", "--cylinder", "50L", "--fill", "100bar"}, // liquefied
	} {
		code, stdout, stderr := zmix(t, args...)
		if code != 2 || stdout != "" {
			t.Errorf("zmix %q: exit %d, stdout %q", args, code, stdout)
		}
		checkOneLineError(t, stderr)
	}
}

// TestReleaseCylinder: a cylinder's contents, as the cylinder calculation
// gives them less what stays at 1 atm, release as that amount would.
func TestReleaseCylinder(t *testing.T) {
	cyl := releaseJSONOf(t, "--blend", "N2 100%", "--cylinder", "50L", "--fill", "200bar", "--room", "40m3")
	code, stdout, stderr := zmix(t, "cylinder", "--blend", "N2 100%", "--volume", "50L", "--temp", "20C", "--pres", "200bar", "--json")
	if code != 0 {
		t.Fatalf("zmix cylinder: exit %d, %s", code, stderr)
	}
	var c struct {
		AmountMol float64 `json:"amount_mol"`
	}
	if err := json.Unmarshal([]byte(stdout), &c); err != nil {
		t.Fatalf("zmix cylinder --json: %v\n%s", err, stdout)
	}
	full := c.AmountMol
	left := 101325 * 0.05 / (8.314462618 * 293.15) // ideal at 1 atm: Z there is 1 within 1e-3
	want := (full - left) * 8.314462618 * 293.15 / 101325
	if got, _ := cyl["released_m3"].(float64); full == 0 || math.Abs(got/want-1) > 1e-3 {
		t.Errorf("released_m3 %v, want %g: the cylinder's %g mol less %g mol at 1 atm", cyl["released_m3"], want, full, left)
	}
	c2, _ := cyl["cylinder"].(map[string]any)
	if got, _ := c2["released_mol"].(float64); math.Abs(got/(full-left)-1) > 1e-3 || c2["contents_mol"] != full {
		t.Errorf("cylinder %v; want contents_mol %g (zmix cylinder's) and released_mol %g", c2, full, full-left)
	}
	if plain := releaseJSONOf(t, "--blend", "N2 100%", "--amount", "1 kg", "--room", "40m3"); plain["cylinder"] != nil {
		t.Errorf("cylinder %v with --amount; want null", plain["cylinder"])
	}
	warm := releaseJSONOf(t, "--blend", "N2 100%", "--cylinder", "50L", "--fill", "200bar", "--fill-temp", "50C", "--room", "40m3")
	if w, _ := warm["released_m3"].(float64); !(w < want) {
		t.Errorf("a warmer cylinder at the same pressure holds less: %v, want below %g", warm["released_m3"], want)
	}
}
