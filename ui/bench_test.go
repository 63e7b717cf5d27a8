package ui

import (
	"testing"

	tea "github.com/charmbracelet/bubbletea"
)

// benchScreen keeps the benchmarks' results, so that the compiler cannot
// drop the work.
var benchScreen string

// BenchmarkViewFull draws the whole 120 × 40 screen, every pane on it.
// Goal: at most 2 ms.
func BenchmarkViewFull(b *testing.B) {
	r := testRoot(b, 120, 40, testRootOpts{})
	b.ReportAllocs()
	for b.Loop() {
		benchScreen = r.View()
	}
}

// BenchmarkEditKeystroke is one keystroke in the temperature field, each
// one a new valid state ("122 C", then "22 C" again), through Update and a
// full View. The commands it starts (the sweep, the autosave) run in the
// background and are not timed. Goal: at most 3 ms.
func BenchmarkEditKeystroke(b *testing.B) {
	r := testRoot(b, 120, 40, testRootOpts{})
	press(b, r, "2", "t", "home")
	keys := []tea.KeyMsg{testKey("1"), testKey("backspace")}
	b.ReportAllocs()
	i := 0
	for b.Loop() {
		r.Update(keys[i%2])
		benchScreen = r.View()
		i++
	}
	if r.b.tempText != "22 C" && r.b.tempText != "122 C" {
		b.Fatalf("temperature text %q", r.b.tempText)
	}
}
