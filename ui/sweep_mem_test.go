package ui

import (
	"context"
	"os"
	"reflect"
	"runtime"
	"strconv"
	"strings"
	"testing"

	"zmix/mixtures"
	"zmix/model"
)

// vmKB reads a figure of /proc/self/status in kB (0 where there is none).
func vmKB(field string) float64 {
	data, err := os.ReadFile("/proc/self/status")
	if err != nil {
		return 0
	}
	for _, line := range strings.Split(string(data), "\n") {
		if rest, ok := strings.CutPrefix(line, field+":"); ok {
			n, _ := strconv.ParseFloat(strings.TrimSuffix(strings.TrimSpace(rest), " kB"), 64)
			return n
		}
	}
	return 0
}

// BenchmarkSweepPaneMemory200k is the memory the sweep pane holds after a
// 200 000-point sweep, 20–3000 K, of a ten-species blend (the blend of the
// engine's BenchmarkBlendState10); goal: workbench RSS ≤ 120 MB. It
// reports the live heap after a collection and the process's resident
// and peak resident sizes, which include the test binary itself. Run it
// alone: -run '^$' -bench SweepPaneMemory -benchtime 1x.
func BenchmarkSweepPaneMemory200k(b *testing.B) {
	blend, err := mixtures.ParseBlend("N2 bal, O2 10%, Ar 5%, CO2 4%, H2 3%, He 2%, CO 1%, CH4 1%, H2O 2%, NH3 500ppm")
	if err != nil {
		b.Fatal(err)
	}
	m, err := blend.Resolve(model.Builtin(), 1e5)
	if err != nil {
		b.Fatal(err)
	}
	in := Inputs{Mixture: m, TempK: 300, PresPa: 1e5, Gen: 1}
	for i := 0; i < b.N; i++ {
		p := newSweepPane(sweepTestCommon(false), SweepSettings{Var: mixtures.SweepTemperature, From: "20 K", To: "3000 K", Steps: mixtures.MaxSweepSteps, Property: "Cp", Overlay: true})
		p.SetSize(120, 40)
		sweepRun(b, p, p.SetInputs(in))
		if p.Result() == nil || p.Result().Len() != mixtures.MaxSweepSteps {
			b.Fatal("no full result")
		}
		runtime.GC()
		var ms runtime.MemStats
		runtime.ReadMemStats(&ms)
		b.ReportMetric(float64(ms.HeapAlloc)/(1<<20), "MB-live")
		b.ReportMetric(vmKB("VmRSS")/1024, "MB-RSS")
		b.ReportMetric(vmKB("VmHWM")/1024, "MB-peakRSS")
		runtime.KeepAlive(p)
	}
}

// A sweep runs only while its pane is on screen: a long sweep in the
// saved settings costs nothing at start until the pane is shown, and a
// pane that is shown runs it at once.
func TestSweepWaitsUntilShown(t *testing.T) {
	r := testRoot(t, 80, 24, testRootOpts{})
	sp := r.panes[paneSweep].(*sweepPane)
	if r.lay.visible[paneSweep] {
		t.Fatal("the sweep pane is on screen at 80x24 with the recipe focused; the test needs it hidden")
	}
	if sp.Result() != nil || sp.running {
		t.Fatal("a hidden sweep pane computed a sweep")
	}
	// Inputs change while it is hidden: still nothing.
	press(t, r, "2", "down", "enter", "ctrl+u")
	typeIn(t, r, "2 bar")
	press(t, r, "enter")
	if sp.Result() != nil || sp.running {
		t.Fatal("a hidden sweep pane computed a sweep after an edit")
	}
	press(t, r, "4")
	if sp.Result() == nil || sp.resultKey.fixedPresPa != 2e5 {
		t.Fatalf("shown sweep pane: result %v at %g Pa; want the sweep at the current 2 bar", sp.Result() != nil, sp.resultKey.fixedPresPa)
	}
	// At 120x40 every pane is on screen, and the sweep runs at start.
	r2 := testRoot(t, 120, 40, testRootOpts{})
	if r2.panes[paneSweep].(*sweepPane).Result() == nil {
		t.Error("no sweep at start with the sweep pane on screen")
	}
}

// A long sweep run again takes over the storage of the one on screen,
// which is released when the new one starts (nothing draws from it while
// it is overwritten), and the new result is the engine's.
func TestSweepReusesLongResult(t *testing.T) {
	defer func(v int) { sweepReleaseValues = v }(sweepReleaseValues)
	sweepReleaseValues = 1000 // the test's sweep counts as long
	s := SweepSettings{Var: mixtures.SweepTemperature, From: "200 K", To: "1500 K", Steps: 3000, Property: "Cp", Overlay: true}
	p := sweepTestPane(t, false, s, 100, 30)
	first := p.Result()
	storage := &first.Column(0)[0]
	in := sweepTestInputs(t)
	in.Gen, in.PresPa = 2, 3e5
	cmd := p.SetInputs(in)
	if p.Result() != nil || len(p.series) != 0 {
		t.Fatal("the long result stayed on screen while its storage is reused")
	}
	sweepRun(t, p, cmd)
	res := p.Result()
	if res == nil || &res.Column(0)[0] != storage {
		t.Fatal("the new sweep did not take over the old storage")
	}
	want, err := in.Mixture.Tabulate(context.Background(), res.Sweep, 0, 3e5, in.Opts, sweepColumns(in.Mixture))
	if err != nil {
		t.Fatal(err)
	}
	for c := range want.Columns {
		if !reflect.DeepEqual(res.Column(c), want.Column(c)) {
			t.Fatalf("column %d differs from the engine's", c)
		}
	}
	// A short sweep stays on screen until the next one is done.
	sweepReleaseValues = 1 << 30
	in.Gen, in.PresPa = 3, 4e5
	cmd = p.SetInputs(in)
	if p.Result() != res {
		t.Error("a short result left the screen before the next was done")
	}
	sweepRun(t, p, cmd)
}
