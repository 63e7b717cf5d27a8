package process

import "testing"

// blend10 is the ten-species blend of mixtures' BenchmarkBlendState10.
const blend10 = "N2 bal, O2 10%, Ar 5%, CO2 4%, H2 3%, He 2%, CO 1%, CH4 1%, H2O 2%, NH3 500ppm"

var (
	sinkCompress *CompressionResult
	sinkMix      MixingResult
)

// BenchmarkCompress10: a 10-species blend, one stage at η = 0.8 with a
// flow, 300 K and 1 bar to 8 bar, the whole Solve; goal ≤ 20 µs.
func BenchmarkCompress10(b *testing.B) {
	c := Compression{Mixture: mixOf(b, blend10), InletTempK: 300, InletPresPa: 1e5, OutletPresPa: 8e5, Efficiency: 0.8, RateMolPerSec: 1}
	states := countStates(b, func(m Model) error { c := c; c.Model = m; _, err := c.Solve(); return err })
	b.ReportAllocs()
	for b.Loop() {
		r, err := c.Solve()
		if err != nil {
			b.Fatal(err)
		}
		sinkCompress = r
	}
	b.ReportMetric(states, "states/op")
}

// countStates counts the mixture states one run computes, a figure of
// the work that a loaded machine does not blur: the time per op is about
// that many BenchmarkBlendState10s plus the bookkeeping.
func countStates(b *testing.B, run func(Model) error) float64 {
	b.Helper()
	n := 0
	if err := run(countingModel{&n}); err != nil {
		b.Fatal(err)
	}
	return float64(n)
}

// BenchmarkMix3: three streams of 2, 3 and 10 species joined at 5 bar,
// the balance and the outlet state (SolveInto); goal ≤ 30 µs.
func BenchmarkMix3(b *testing.B) {
	m := Mixing{PresPa: 5e5, Streams: []Stream{
		{Mixture: mixOf(b, "N2 79%, O2 21%"), TempK: 300, RateMolPerSec: 2},
		{Mixture: mixOf(b, "CH4 90%, C2H6 7%, CO2 3%"), TempK: 420, RateMolPerSec: 0.5},
		{Mixture: mixOf(b, blend10), TempK: 650, RateMolPerSec: 1},
	}}
	states := countStates(b, func(md Model) error { m := m; m.Model = md; var r MixingResult; return m.SolveInto(&r) })
	b.ReportAllocs()
	for b.Loop() {
		if err := m.SolveInto(&sinkMix); err != nil {
			b.Fatal(err)
		}
	}
	b.ReportMetric(states, "states/op")
}

// BenchmarkMix3Describe is BenchmarkMix3 with the figures, notes and
// cautions a command prints, for comparison.
func BenchmarkMix3Describe(b *testing.B) {
	m := Mixing{PresPa: 5e5, Streams: []Stream{
		{Mixture: mixOf(b, "N2 79%, O2 21%"), TempK: 300, RateMolPerSec: 2},
		{Mixture: mixOf(b, "CH4 90%, C2H6 7%, CO2 3%"), TempK: 420, RateMolPerSec: 0.5},
		{Mixture: mixOf(b, blend10), TempK: 650, RateMolPerSec: 1},
	}}
	b.ReportAllocs()
	for b.Loop() {
		r, err := m.Solve()
		if err != nil {
			b.Fatal(err)
		}
		sinkMix = *r
	}
}
