package mixtures

import (
	"context"
	"fmt"
	"testing"

	"zmix/model"
)

// blend10 has ten catalogue species of every rotor kind: atoms (Ar, He),
// linear molecules (N2, O2, H2, CO, CO2) and nonlinear ones (CH4, H2O,
// NH3). H2 at room temperature has its rotor levels summed one by one.
const blend10 = "N2 bal, O2 10%, Ar 5%, CO2 4%, H2 3%, He 2%, CO 1%, CH4 1%, H2O 2%, NH3 500ppm"

// Results go to package-level variables so that the compiler cannot drop
// the work.
var (
	benchState State
	benchTable *SweepTable
	benchSum   float64
	benchMix   *Mixture
)

func benchMixture(b *testing.B) *Mixture {
	b.Helper()
	m := mustMixture(b, blend10, 1e5)
	if len(m.Components) != 10 {
		b.Fatalf("%d species, want 10", len(m.Components))
	}
	return m
}

// BenchmarkBlendState10: a 10-species blend at one state; goal ≤ 0.8 µs.
// Fill leaves the real-gas figures until they are asked for;
// BenchmarkBlendState10RealGas is the state with them.
func BenchmarkBlendState10(b *testing.B) {
	m := benchMixture(b)
	var s State
	m.Fill(&s, 300, 1e5, Options{})
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		m.Fill(&s, 300, 1e5, Options{})
	}
	benchState = s
}

// BenchmarkBlendState10RealGas is BenchmarkBlendState10 with the real-gas
// figures computed too, as the state command, the Properties pane and a
// sweep's points have them; the realgas benchmark's goal is that they add
// ≤ 1 µs.
func BenchmarkBlendState10RealGas(b *testing.B) {
	m := benchMixture(b)
	var s State
	m.Fill(&s, 300, 1e5, Options{})
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		m.Fill(&s, 300, 1e5, Options{})
		if _, ok := s.RealGasResult(); !ok {
			b.Fatal("no real-gas figures for a blend with critical constants")
		}
	}
	benchState = s
}

// BenchmarkSweep1000: a 1000-point T sweep of the same blend, streamed
// point by point; goal ≤ 2 ms.
func BenchmarkSweep1000(b *testing.B) {
	m := benchMixture(b)
	sw := Sweep{Var: SweepTemperature, From: 20, To: 3000, Steps: 1000}
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		err := m.Stream(context.Background(), sw, 0, 1e5, Options{}, func(_ int, _ float64, s *State) error {
			benchSum += s.CpJPerMolK
			return nil
		})
		if err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkTabulate1000 is BenchmarkSweep1000 kept as the workbench keeps
// it: the conditions and every plottable figure, per species too.
func BenchmarkTabulate1000(b *testing.B) {
	m := benchMixture(b)
	sw := Sweep{Var: SweepTemperature, From: 20, To: 3000, Steps: 1000}
	var cols []SweepColumn
	for _, k := range []string{"T", "P", "S", "Cp", "G", "H", "gamma"} {
		c, _ := BlendColumn(k)
		cols = append(cols, c)
	}
	for _, k := range []string{"S", "Cp", "mu", "H"} {
		sc, _ := SpeciesColumns(k, m)
		cols = append(cols, sc...)
	}
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		t, err := m.Tabulate(context.Background(), sw, 0, 1e5, Options{}, cols)
		if err != nil {
			b.Fatal(err)
		}
		benchTable = t
	}
}

// BenchmarkBlendStateSize steps through blends of 1 to all catalogue
// species, to show the cost per species.
func BenchmarkBlendStateSize(b *testing.B) {
	all := model.Builtin().All()
	for _, n := range []int{1, 3, 10, len(all)} {
		comps := make([]Component, n)
		for i := range comps {
			comps[i] = Component{Species: all[i], X: 1}
		}
		m, err := NewMixture(comps)
		if err != nil {
			b.Fatal(err)
		}
		b.Run(fmt.Sprintf("species=%d", n), func(b *testing.B) {
			var s State
			b.ReportAllocs()
			for i := 0; i < b.N; i++ {
				m.Fill(&s, 300, 1e5, Options{})
			}
			benchState = s
		})
	}
}

// BenchmarkParseResolve10 is the cost of reading blend text, as the
// workbench does on every edit.
func BenchmarkParseResolve10(b *testing.B) {
	cat := testCatalogue(b)
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		bl, err := ParseBlend(blend10)
		if err != nil {
			b.Fatal(err)
		}
		if benchMix, err = bl.Resolve(cat, 1e5); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkItemsResolve10 is the engine's part of a keystroke in the
// workbench's recipe: each row checked on its own, then the rows as items
// resolved into a mixture, with no text joined or parsed.
func BenchmarkItemsResolve10(b *testing.B) {
	cat := testCatalogue(b)
	bl, err := ParseBlend(blend10)
	if err != nil {
		b.Fatal(err)
	}
	items := make([]BlendItem, len(bl.Items))
	for i, it := range bl.Items {
		items[i] = BlendItem{Species: it.Key, Amount: it.Text}
	}
	b.ReportAllocs()
	for b.Loop() {
		for _, it := range items {
			if err := CheckItem(cat, it); err != nil {
				b.Fatal(err)
			}
		}
		nb, err := NewBlend(items)
		if err != nil {
			b.Fatal(err)
		}
		if benchMix, err = nb.Resolve(cat, 1e5); err != nil {
			b.Fatal(err)
		}
	}
}
