package cli

import (
	"fmt"
	"os"
	"regexp"
	"strconv"
	"strings"
	"testing"
)

// readmeExample is one "$ zmix ..." line of a README code block and the
// lines shown under it.
type readmeExample struct {
	line    string   // as written, after "$ "
	args    []string // zmix's arguments
	filters []string // the commands after each " | "
	stdout  bool     // "2>/dev/null": only standard output is shown
	want    []string // the lines shown, without an "(exit status N)" line
	code    int      // the exit status shown, 0 when none is
}

var exitLine = regexp.MustCompile(`^\(exit status (\d+)\)$`)

// readmeExamples reads every "$ zmix" example of the README's code blocks.
func readmeExamples(t *testing.T) []readmeExample {
	t.Helper()
	data, err := os.ReadFile("README.md")
	if err != nil {
		t.Fatal(err)
	}
	var out []readmeExample
	var cur *readmeExample
	inBlock := false
	flush := func() {
		if cur == nil {
			return
		}
		for len(cur.want) > 0 && cur.want[len(cur.want)-1] == "" {
			cur.want = cur.want[:len(cur.want)-1]
		}
		if n := len(cur.want); n > 0 {
			if m := exitLine.FindStringSubmatch(cur.want[n-1]); m != nil {
				cur.code, _ = strconv.Atoi(m[1])
				cur.want = cur.want[:n-1]
			}
		}
		out = append(out, *cur)
		cur = nil
	}
	for _, l := range strings.Split(string(data), "\n") {
		if strings.HasPrefix(l, "```") {
			flush()
			inBlock = !inBlock
			continue
		}
		if !inBlock {
			continue
		}
		if strings.HasPrefix(l, "$ ") {
			flush()
			cmd, ok := strings.CutPrefix(l, "$ zmix ")
			if !ok {
				continue
			}
			parts := strings.Split(cmd, " | ")
			ex := readmeExample{line: l[2:], filters: parts[1:]}
			first := parts[0]
			if strings.Contains(first, " 2>/dev/null") {
				first = strings.ReplaceAll(first, " 2>/dev/null", "")
				ex.stdout = true
			}
			ex.args = splitShell(first)
			cur = &ex
			continue
		}
		if cur != nil {
			cur.want = append(cur.want, l)
		}
	}
	flush()
	return out
}

// TestReadmeExamples runs every "$ zmix" example of the README and checks
// what it shows: the whole output for a plain command, the lines in order
// for one filtered by sed, grep or head (with cut applied here), and the
// exit status where one is shown. The README is the user's document; its
// worked examples must never drift from the program.
func TestReadmeExamples(t *testing.T) {
	examples := readmeExamples(t)
	if len(examples) < 30 {
		t.Fatalf("found %d README examples, want the 30 and more it has", len(examples))
	}
	for _, ex := range examples {
		code, stdout, stderr := zmix(t, ex.args...)
		if code != ex.code {
			t.Errorf("README example %q: exit %d, shown %d: %s", ex.line, code, ex.code, stderr)
			continue
		}
		got := stdout
		if !ex.stdout {
			got += stderr
		}
		lines := strings.Split(strings.TrimRight(got, "\n"), "\n")
		filtered := false
		for _, f := range ex.filters {
			if fields, ok := cutFields(f); ok {
				lines = applyCut(lines, fields)
				continue
			}
			filtered = true // sed -n, grep, head: a selection of the lines
		}
		if !filtered {
			if strings.Join(lines, "\n") != strings.Join(ex.want, "\n") {
				t.Errorf("README example %q shows\n%s\nbut the command prints\n%s", ex.line, strings.Join(ex.want, "\n"), strings.Join(lines, "\n"))
			}
			continue
		}
		// The shown lines must come in order among the printed ones.
		i := 0
		for _, l := range lines {
			if i < len(ex.want) && l == ex.want[i] {
				i++
			}
		}
		if i < len(ex.want) {
			t.Errorf("README example %q shows %q, which the command no longer prints there", ex.line, ex.want[i])
		}
	}
}

// cutFields reads "cut -d, -fLIST" into the 1-based fields it keeps.
func cutFields(filter string) ([]int, bool) {
	f := strings.Fields(filter)
	if len(f) != 3 || f[0] != "cut" || f[1] != "-d," || !strings.HasPrefix(f[2], "-f") {
		return nil, false
	}
	var keep []int
	for _, s := range strings.Split(strings.TrimPrefix(f[2], "-f"), ",") {
		lo, hi, isRange := strings.Cut(s, "-")
		a, err := strconv.Atoi(lo)
		if err != nil {
			return nil, false
		}
		b := a
		if isRange {
			if b, err = strconv.Atoi(hi); err != nil {
				return nil, false
			}
		}
		for k := a; k <= b; k++ {
			keep = append(keep, k)
		}
	}
	return keep, true
}

// applyCut keeps the given comma-separated fields of each line, as cut
// does (the README's CSV examples have no quoted commas in those fields).
func applyCut(lines []string, fields []int) []string {
	out := make([]string, len(lines))
	for i, l := range lines {
		cols := strings.Split(l, ",")
		var kept []string
		for _, k := range fields {
			if k-1 < len(cols) {
				kept = append(kept, cols[k-1])
			}
		}
		out[i] = strings.Join(kept, ",")
	}
	return out
}

// The checker itself: a drifted line is caught.
func TestReadmeExampleCheckerCatchesDrift(t *testing.T) {
	keep, ok := cutFields("cut -d, -f1-2,4")
	if !ok || fmt.Sprint(keep) != "[1 2 4]" {
		t.Fatalf("cutFields: %v %v", keep, ok)
	}
	if got := applyCut([]string{"a,b,c,d"}, keep); got[0] != "a,b,d" {
		t.Errorf("applyCut: %q", got[0])
	}
	if m := exitLine.FindStringSubmatch("(exit status 2)"); m == nil || m[1] != "2" {
		t.Errorf("exit line not read")
	}
}
