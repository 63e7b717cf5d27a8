package cli

import (
	"encoding/json"
	"regexp"
	"strconv"
	"strings"
	"testing"
)

// commandShapes are command lines whose numbers FuzzCommandNumbers
// chooses: {0} to {3} in an argument stand for its four numbers. Each
// line is well formed, so that the numbers, not the syntax, reach the
// calculations: the extremes the parsers accept (1e-300 ppb, 1e12 bar,
// 1e9 kg) are where overflow and 0/0 hide.
var commandShapes = [][]string{
	{"state", "--blend", "SiH4 {0}%, NH3 {1} ppm, N2 bal", "--temp", "{2}K", "--pres", "{3}bar"},
	{"state", "--blend", "H2O {0} ppm, CO2 {1} ppb, air bal", "--temp", "{2}C", "--pres", "{3}Pa"},
	{"state", "--blend", "H2O dew {0}C, N2 bal", "--temp", "{2}C", "--pres", "{3}barg"},
	{"sweep", "--blend", "CO2 {0}%, N2 bal", "--temp", "{1}..{2}K", "--pres", "{3}bar", "--steps", "7"},
	{"sweep", "--blend", "NH3 {0}%, H2 bal", "--pres", "{1}..{2}bar", "--temp", "{3}C", "--steps", "5", "--log"},
	{"flow", "--blend", "CH4 {0}%, N2 bal", "--rate", "{1} Nm3/h", "--temp", "{2}C", "--pres", "{3}barg"},
	{"flow", "--blend", "SiH4 {0}%, N2 bal", "--rate", "{1} sccm", "--ref", "{2}C, {3} bar"},
	{"compress", "--blend", "N2 {0}%, CO2 bal", "--temp", "{1}C", "--pres", "{2}bar", "--to", "{3}bar"},
	{"compress", "--blend", "H2 {0}%, N2 bal", "--temp", "{2}K", "--pres", "{3}bar", "--to", "{1}bar", "--stages", "3", "--intercool", "{2}K"},
	{"heat", "--blend", "CH4 {0}%, N2 bal", "--temp", "{1}K", "--pres", "{2}bar", "--to-temp", "{3}K"},
	{"mix", "--stream", "N2 {0}%, O2 bal; {1}C; 10 kg/h", "--stream", "CO2; {2}C; {3} kg/h", "--pres", "1bar"},
	{"dilute", "--blend", "SiH4 {0}%, N2 bal", "--with", "N2", "--target", "SiH4 {1} ppm"},
	{"dilute", "--blend", "NH3 {0} ppm, N2 bal", "--with", "N2", "--target", "NH3", "--ratio", "{1}"},
	{"purge", "--start", "O2 {0}%, N2 bal", "--purge", "N2 bal, O2 {1} ppm", "--target", "O2 {2} ppm", "--swing", "1bar..{3}bar"},
	{"purge", "--start", "air", "--purge", "N2", "--target", "O2 {0} ppm", "--rate", "{1} Nm3/h", "--volume", "{2}m3", "--temp", "20C", "--pres", "{3}bar"},
	{"release", "--blend", "N2 {0}%, CH4 bal", "--amount", "{1} kg", "--room", "{2}m3", "--ach", "{3}"},
	{"release", "--blend", "NH3 {0} ppm, N2 bal", "--rate", "{1} kg/h", "--room", "{2} m3", "--ach", "{3}"},
	{"release", "--blend", "SiH4 {0}%, N2 bal", "--cylinder", "{1}L", "--fill", "{2}bar", "--room", "{3}m3"},
	{"cylinder", "--blend", "SiH4 {0}%, N2 bal", "--volume", "{1}L", "--temp", "{2}C", "--pres", "{3}bar"},
	{"cylinder", "--blend", "CO2 {0}%, N2 bal", "--volume", "{1}L", "--temp", "{2}C", "--mass", "{3}kg"},
	{"throttle", "--blend", "CO2 {0}%, N2 bal", "--temp", "{1}C", "--pres", "{2}bar", "--to-pres", "{3}bar"},
	{"weighed", "--add", "{0} g CH4", "--add", "{1} g N2 with O2 {2} ppm", "--mass-u", "{3}mg"},
	{"hazard", "--blend", "H2 {0}%, SiH4 {1} ppm, O2 {3}%, N2 bal"},
}

// nonFiniteText matches a number that is not finite, as Go's formatting
// spells it.
var nonFiniteText = regexp.MustCompile(`NaN|[+-]?Inf\b`)

// FuzzCommandNumbers runs every command shape with numbers the fuzzer
// chooses, as text, JSON and CSV: each run ends with exit status 0 and
// its readout (and, with --json or --csv, any cautions on standard
// error), or 2 and one line on standard error; no number that is not
// finite is printed, and the JSON parses.
func FuzzCommandNumbers(f *testing.F) {
	for i := range commandShapes {
		f.Add(uint8(i), 4.0, 18.0, 295.0, 1.4)
		f.Add(uint8(i), 1e-300, 1e12, 1e-3, 1e9)
		f.Add(uint8(i), 99.999999, 1e-9, 1e6, 1e-6)
		f.Add(uint8(i), 1e-12, 1e3, -273.149, 1e-300)
	}
	f.Fuzz(func(t *testing.T, which uint8, a, b, c, d float64) {
		shape := commandShapes[int(which)%len(commandShapes)]
		nums := [4]string{}
		for i, x := range [4]float64{a, b, c, d} {
			nums[i] = strconv.FormatFloat(x, 'g', -1, 64)
		}
		args := make([]string, len(shape))
		for i, s := range shape {
			for k, n := range nums {
				s = strings.ReplaceAll(s, "{"+strconv.Itoa(k)+"}", n)
			}
			args[i] = s
		}
		for _, format := range []string{"", "--json", "--csv"} {
			run := args
			if format != "" {
				run = append(append([]string(nil), args...), format)
			}
			asJSON := format == "--json"
			code, stdout, stderr := zmix(t, run...)
			// With --json or --csv the cautions go to standard error, so
			// that standard output stays one document.
			switch {
			case code == 0 && stderr != "" && !strings.HasPrefix(stderr, "zmix: caution: "):
				t.Fatalf("zmix %q: exit 0 with an error: %s", run, stderr)
			case code == 2 && (stdout != "" || strings.Count(stderr, "\n") != 1):
				t.Fatalf("zmix %q: exit 2 wants one error line and no output; got\n%s\n%s", run, stdout, stderr)
			case code != 0 && code != 2:
				t.Fatalf("zmix %q: exit %d: %s", run, code, stderr)
			}
			if m := nonFiniteText.FindString(stdout + stderr); m != "" && !anyArgHas(run, m) {
				t.Fatalf("zmix %q prints %q:\n%s%s", run, m, stdout, stderr)
			}
			if asJSON && code == 0 && !json.Valid([]byte(stdout)) {
				t.Fatalf("zmix %q: the JSON does not parse:\n%s", run, stdout)
			}
		}
	})
}

// anyArgHas reports whether the command line itself holds s: an error
// may quote the value typed, Inf or NaN included.
func anyArgHas(args []string, s string) bool {
	for _, a := range args {
		if strings.Contains(a, s) {
			return true
		}
	}
	return false
}

// The seed shapes run as given: each typical line succeeds, so that the
// fuzzing starts from the calculations, not from refusals.
func TestCommandShapesRun(t *testing.T) {
	for i, shape := range commandShapes {
		args := make([]string, len(shape))
		for j, s := range shape {
			s = strings.NewReplacer("{0}", "4", "{1}", "18", "{2}", "295", "{3}", "1.4").Replace(s)
			args[j] = s
		}
		for _, format := range []string{"", "--json", "--csv"} {
			run := args
			if format != "" {
				run = append(append([]string(nil), args...), format)
			}
			if code, _, stderr := zmix(t, run...); code != 0 {
				t.Errorf("shape %d, zmix %q: exit %d: %s", i, run, code, stderr)
			}
		}
	}
}
