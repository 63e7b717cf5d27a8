package ui

import (
	"strings"
	"testing"
)

// The safety details (!) show the recipe's classification from package
// safety: the demo feed holds SiH4 and NH3, so its flammability and GHS
// verdicts are there, with the deferral line, at 80×24 and 120×40.
func TestSafetyDetailsClassification(t *testing.T) {
	for _, size := range [][2]int{{80, 24}, {120, 40}} {
		r := testRoot(t, size[0], size[1], testRootOpts{})
		press(t, r, "!")
		if r.overlay != overlaySafety {
			t.Fatalf("%v: ! did not open the safety details", size)
		}
		r.overlayScroll.setHeight(1000)
		v := r.overlayScroll.view()
		for _, want := range []string{"Classification", "ISO 10156 flammability", "GHS inhalation", "pyrophoric: SiH4", "from memory", "licensed"} {
			if !strings.Contains(v, want) {
				t.Errorf("%v: safety details lack %q:\n%s", size, want, v)
			}
		}
		if strings.Contains(v, "NaN") {
			t.Errorf("%v: NaN in the safety details", size)
		}
	}
}
