package ui

import (
	"strings"
	"testing"

	"zmix/mixtures/process"
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

// The Process pane's release choice shows the well-mixed model of package
// safety on the recipe: 2 Nm3 of the demo feed into 30 m3.
func TestProcessPaneRelease(t *testing.T) {
	p, b := testProcess(t, false, 90, 30)
	for p.current().key != "release" {
		p.keys(t, "right")
	}
	v := p.whole()
	if p.result == nil {
		t.Fatalf("no result: %s", p.err)
	}
	want, err := process.RoomRelease{Mixture: b.in.Mixture, Amount: "2 Nm3", Room: "30 m3"}.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if got, ok := process.Lookup(p.result, "o2"); !ok || got.SI != want.Room.O2Pct {
		t.Errorf("pane worst O2 %v, model %g", got.SI, want.Room.O2Pct)
	}
	for _, s := range []string{"worst oxygen", "Peak in the room", "SiH4", "well-mixed"} {
		if !strings.Contains(v, s) {
			t.Errorf("release screen lacks %q:\n%s", s, v)
		}
	}
	// A room typed wrong names the field (amount, cylinder, rate, room).
	p.keys(t, "down", "down", "down", "enter", "ctrl+u", "l", "o", "t", "s", "enter")
	if p.result != nil || !strings.Contains(p.err, "room") {
		t.Errorf("bad room: result %v, error %q", p.result != nil, p.err)
	}
}

// In place of the amount, a cylinder's contents at the setpoint's T and
// P, as the model gives them; with the amount too, the pane says to give
// one.
func TestProcessPaneReleaseCylinder(t *testing.T) {
	p, b := testProcess(t, false, 90, 30)
	for p.current().key != "release" {
		p.keys(t, "right")
	}
	p.keys(t, "down", "enter", "5", "0", " ", "L", "enter")
	if p.result != nil || !strings.Contains(p.err, "give one") {
		t.Errorf("amount and cylinder: result %v, error %q", p.result != nil, p.err)
	}
	p.keys(t, "up", "enter", "ctrl+u", "enter")
	if p.result == nil {
		t.Fatalf("no result: %s", p.err)
	}
	want, err := process.RoomRelease{Mixture: b.in.Mixture, Cylinder: "50 L", Room: "30 m3", FillTempK: b.in.TempK, FillPresPa: b.in.PresPa}.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if got, ok := process.Lookup(p.result, "q"); !ok || got.SI != want.Release.AmountM3 || !(got.SI > 0) {
		t.Errorf("pane released %v m3, model %g", got.SI, want.Release.AmountM3)
	}
}
