package report

import (
	"io"
	"testing"

	"zmix/mixtures"
	"zmix/model"
)

// blend10 is the 10-species blend of mixtures' BenchmarkBlendState10.
const blend10 = "N2 bal, O2 10%, Ar 5%, CO2 4%, H2 3%, He 2%, CO 1%, CH4 1%, H2O 2%, NH3 500ppm"

func benchSweep(b *testing.B, steps int) (*mixtures.Mixture, mixtures.Sweep, *SweepSource) {
	b.Helper()
	bl, err := mixtures.ParseBlend(blend10)
	if err != nil {
		b.Fatal(err)
	}
	mix, err := bl.Resolve(model.Builtin(), 1e5)
	if err != nil {
		b.Fatal(err)
	}
	sw := mixtures.Sweep{Var: mixtures.SweepTemperature, From: 20, To: 3000, Steps: steps}
	return mix, sw, &SweepSource{Mix: mix, Sweep: sw, FixedPresPa: 1e5}
}

// The goal for `zmix sweep` of 200 000 points of this blend, 20–3000 K, is
// ≤ 3 s whatever the format: ≤ 15 ms per 1000 points here.
func BenchmarkSweepWrite1000(b *testing.B) {
	mix, sw, points := benchSweep(b, 1000)
	rep := &SweepReport{Label: blend10, Mix: mix, Sweep: sw, FixedPresPa: 1e5}
	b.Run("csv", func(b *testing.B) {
		for b.Loop() {
			if err := WriteSweepCSV(io.Discard, false, points); err != nil {
				b.Fatal(err)
			}
		}
	})
	b.Run("json", func(b *testing.B) {
		for b.Loop() {
			if err := WriteSweepJSON(io.Discard, false, points); err != nil {
				b.Fatal(err)
			}
		}
	})
	b.Run("text", func(b *testing.B) {
		for b.Loop() {
			if err := WriteSweepText(io.Discard, rep, points); err != nil {
				b.Fatal(err)
			}
		}
	})
}
