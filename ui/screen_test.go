package ui

import (
	"flag"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/x/exp/teatest"

	"zmix/model"
)

// goldenDir holds the screens, beside the other test data of the module.
const goldenDir = "../testdata/ui"

// updateGolden is the -update flag, which teatest's golden package
// defines; go test ./ui/ -update rewrites the screens.
func updateGolden() bool {
	f := flag.Lookup("update")
	return f != nil && f.Value.String() == "true"
}

func compareGolden(t *testing.T, name, got string) {
	t.Helper()
	path := filepath.Join(goldenDir, name+".golden")
	if updateGolden() {
		if err := os.MkdirAll(goldenDir, 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(path, []byte(got), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run go test ./ui/ -update to write it)", err)
	}
	if string(want) != got {
		t.Errorf("screen %s differs from %s (go test ./ui/ -update rewrites it after a deliberate change)\n--- got\n%s\n--- want\n%s",
			name, path, got, want)
	}
}

// programModel is the workbench as Run builds it, on a state directory of
// its own and a fixed clock.
func programModel(t *testing.T) (*guard, string) {
	t.Helper()
	// Not t.TempDir: a last autosave command may still be writing when
	// the program has quit, and a failed clean-up must not fail the test.
	dir, err := os.MkdirTemp("", "zmix-ui-test-")
	if err != nil {
		t.Fatal(err)
	}
	t.Cleanup(func() { os.RemoveAll(dir) })
	now := func() time.Time { return testClock }
	r, err := newRoot(Config{Catalogue: model.Builtin()}, rootOptions{store: newStateStore(dir), now: now, cwd: dir, mono: true})
	if err != nil {
		t.Fatal(err)
	}
	return newGuard(r, dir, now), dir
}

// waitSettled waits until the program has drawn and then written nothing
// for a while: every command, the sweep included, has finished.
func waitSettled(t *testing.T, tm *teatest.TestModel) {
	t.Helper()
	last, since := -1, time.Now()
	teatest.WaitFor(t, tm.Output(), func(b []byte) bool {
		if len(b) != last {
			last, since = len(b), time.Now()
			return false
		}
		return len(b) > 0 && time.Since(since) > 300*time.Millisecond
	}, teatest.WithDuration(10*time.Second), teatest.WithCheckInterval(50*time.Millisecond))
}

func finalScreen(t *testing.T, tm *teatest.TestModel) string {
	t.Helper()
	if err := tm.Quit(); err != nil {
		t.Fatal(err)
	}
	g, ok := tm.FinalModel(t, teatest.WithFinalTimeout(10*time.Second)).(*guard)
	if !ok {
		t.Fatal("the final model is not the workbench")
	}
	if g.crashed {
		t.Fatalf("crashed: %v", g.exitError())
	}
	return g.View()
}

// The start-up screen on the demo blend, at the smallest size the issue
// names and at a large one.
func TestGoldenScreens(t *testing.T) {
	for _, size := range []struct {
		name string
		w, h int
	}{
		{"main_80x24", 80, 24},
		{"main_120x40", 120, 40},
	} {
		t.Run(size.name, func(t *testing.T) {
			g, _ := programModel(t)
			tm := teatest.NewTestModel(t, g, teatest.WithInitialTermSize(size.w, size.h))
			waitSettled(t, tm)
			compareGolden(t, size.name, finalScreen(t, tm))
		})
	}
}

// Panes of the 80 × 24 screen, one at a time, in ASCII mode too. A step
// is a key, or text to type after "type:".
func TestGoldenPanes(t *testing.T) {
	for _, c := range []struct {
		name  string
		w, h  int
		ascii bool
		steps []string
	}{
		{"properties_80x24", 80, 24, false, []string{"3"}},
		{"anatomy_80x24", 80, 24, false, []string{"5", "right"}},
		{"help_recipe_80x24", 80, 24, false, []string{"?"}},
		{"error_in_place_80x24", 80, 24, false, []string{"enter", "ctrl+u", "type:two percent", "enter", "tab", "p", "ctrl+u", "type:-3 bar", "enter"}},
		{"ascii_recipe_80x24", 80, 24, true, nil},
		{"ascii_anatomy_80x24", 80, 24, true, []string{"5"}},
		{"too_small_60x20", 60, 20, false, nil},
		{"process_compress_80x24", 80, 24, false, []string{"6", "right"}},
		{"process_mix_80x24", 80, 24, false, []string{"6", "right", "right", "right", "pgdown"}},
		{"ascii_process_plot_80x24", 80, 24, true, []string{"6", "right", "p"}},
		{"ascii_process_weighed_80x24", 80, 24, true, []string{"6", "left", "pgdown"}},
	} {
		t.Run(c.name, func(t *testing.T) {
			r := testRoot(t, c.w, c.h, testRootOpts{ascii: c.ascii})
			for _, step := range c.steps {
				if text, ok := strings.CutPrefix(step, "type:"); ok {
					typeIn(t, r, text)
				} else {
					press(t, r, step)
				}
			}
			compareGolden(t, c.name, r.View())
		})
	}
}

// Build a blend and change T by keystrokes through the running program;
// the readout must show what the engine computes for the same input.
func TestTypedBlendMatchesEngine(t *testing.T) {
	g, _ := programModel(t)
	tm := teatest.NewTestModel(t, g, teatest.WithInitialTermSize(120, 50))
	enter := tea.KeyMsg{Type: tea.KeyEnter}
	tm.Type("a")
	tm.Type("ar")
	tm.Send(enter)
	tm.Type("1%")
	tm.Send(enter)
	tm.Send(tea.KeyMsg{Type: tea.KeyTab})
	tm.Type("t")
	tm.Send(tea.KeyMsg{Type: tea.KeyCtrlU})
	tm.Type("350 K")
	tm.Send(enter)
	waitSettled(t, tm)
	screen := finalScreen(t, tm)

	st := engineState(t, "SiH4 4%, NH3 18%, H2 500ppm, N2 bal, Ar 1%", 350, 1.4e5)
	for _, w := range wantReadout(&st, true) {
		if !strings.Contains(screen, w) {
			t.Errorf("screen lacks %q", w)
		}
	}
	if !strings.Contains(screen, "350 K") || !strings.Contains(screen, "Ar      1%") {
		t.Errorf("the typed input is not on screen")
	}
	if t.Failed() {
		t.Logf("screen:\n%s", screen)
	}
}
