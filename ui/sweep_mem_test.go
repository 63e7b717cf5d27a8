package ui

import (
	"os"
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
