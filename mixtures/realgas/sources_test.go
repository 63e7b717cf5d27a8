package realgas

import (
	"strings"
	"testing"

	"zmix/model"
)

// TestCriticalConstantSources: every critical constant of the built-in
// catalogue names where it comes from, and, since no compilation of
// critical constants was read for this catalogue (the shared reference
// tables hold none), each says "from memory", or "read from" and the page
// of a compilation's entry seen in a public copy. A bare "from memory" is
// not enough: the compilation, rule or equation recalled must be named too.
func TestCriticalConstantSources(t *testing.T) {
	n := 0
	for _, sp := range model.Builtin().All() {
		if !sp.HasCritical() {
			continue
		}
		for _, f := range []string{"Tc_K", "Pc_bar", "omega"} {
			src := sp.Sources[f]
			if !strings.Contains(src, "from memory") && !strings.Contains(src, "read from") {
				t.Errorf("%s %s: source %q says neither \"from memory\" nor \"read from\" a named page", sp.Formula, f, src)
				continue
			}
			if named := strings.Trim(strings.NewReplacer("from memory", "", "uncertain", "").Replace(src), " ,;.()"); named == "" {
				t.Errorf("%s %s: source %q names no compilation", sp.Formula, f, src)
			}
			n++
		}
	}
	if n == 0 {
		t.Fatal("no critical constants found in the built-in catalogue")
	}
}
