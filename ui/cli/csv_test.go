package cli

import (
	"encoding/csv"
	"encoding/json"
	"fmt"
	"sort"
	"strings"
	"testing"
)

// The process, hazard and release commands write with --csv the same
// figures as with --json: one row per JSON scalar, in order, each with
// the JSON's value.
func TestProcessCSVHoldsTheJSON(t *testing.T) {
	commands := [][]string{
		{"flow", "--blend", "N2 79%, O2 21%", "--rate", "100 Nm3/h", "--temp", "25C", "--pres", "2bar"},
		{"compress", "--blend", "H2 1", "--temp", "25C", "--pres", "20bar", "--to", "200bar", "--eff", "78%", "--stages", "3", "--intercool", "35C", "--rate", "500 Nm3/h"},
		{"heat", "--blend", "N2 1", "--temp", "25C", "--to-temp", "400C", "--pres", "1atm"},
		{"mix", "--stream", "CH4 1; 10C; 100 Nm3/h", "--stream", "N2 1; 40C; 20 Nm3/h", "--pres", "4barg"},
		{"dilute", "--blend", "SiH4 5%, N2 bal", "--with", "N2 1", "--target", "SiH4 1%"},
		{"purge", "--start", "O2 21%, N2 bal", "--purge", "N2 1", "--target", "O2 10ppm", "--swing", "1bar..5bar"},
		{"cylinder", "--blend", "Ar 1", "--volume", "50L", "--temp", "20C", "--pres", "200bar"},
		{"throttle", "--blend", "N2 1", "--temp", "20C", "--pres", "200bar", "--to-pres", "5bar"},
		{"weighed", "--add", "2.4105 g CH4 with C2H6 20ppm ±5ppm", "--add", "412.37 g N2 with O2 <5ppm", "--mass-u", "4mg"},
		{"hazard", "--blend", "H2 10%, N2 bal"},
		{"release", "--blend", "N2 1", "--amount", "9 Nm3", "--room", "60 m3"},
	}
	for _, args := range commands {
		t.Run(args[0], func(t *testing.T) {
			code, js, stderr := zmix(t, append(args, "--json")...)
			if code != 0 {
				t.Fatalf("--json: exit %d: %s", code, stderr)
			}
			code, out, stderr := zmix(t, append(args, "--csv")...)
			if code != 0 {
				t.Fatalf("--csv: exit %d: %s", code, stderr)
			}
			rows, err := csv.NewReader(strings.NewReader(out)).ReadAll()
			if err != nil {
				t.Fatalf("not CSV: %v\n%s", err, out)
			}
			if got := strings.Join(rows[0], ","); got != "section,row,name,value" {
				t.Errorf("header %q", got)
			}
			dec := json.NewDecoder(strings.NewReader(js))
			dec.UseNumber() // the numbers as the JSON writes them
			var obj any
			if err := dec.Decode(&obj); err != nil {
				t.Fatal(err)
			}
			want := scalars(obj)
			got := make([]string, 0, len(rows)-1)
			for _, r := range rows[1:] {
				got = append(got, r[3])
			}
			sort.Strings(want)
			sort.Strings(got)
			if strings.Join(got, "|") != strings.Join(want, "|") {
				t.Errorf("the CSV's values differ from the JSON's:\ncsv  %q\njson %q", got, want)
			}
		})
	}
	if code, _, stderr := zmix(t, "heat", "--blend", "N2 1", "--temp", "25C", "--to-temp", "400C", "--pres", "1atm", "--json", "--csv"); code != 2 {
		t.Errorf("--json with --csv: exit %d, want 2", code)
	} else {
		checkOneLineError(t, stderr)
	}
}

// scalars lists every scalar of a decoded JSON value as CSV would write it.
func scalars(v any) []string {
	switch x := v.(type) {
	case map[string]any:
		var out []string
		for _, e := range x {
			out = append(out, scalars(e)...)
		}
		return out
	case []any:
		var out []string
		for _, e := range x {
			out = append(out, scalars(e)...)
		}
		return out
	case nil:
		return []string{""}
	default:
		return []string{fmt.Sprint(x)}
	}
}
