package ui

import (
	"regexp"
	"strings"
	"testing"

	"github.com/charmbracelet/lipgloss"
)

// fuzzKeys are the keys FuzzWorkbenchKeys presses for the bytes below
// their count, fuzzWords the text it types for the bytes after them, and
// fuzzFileKeys the keys after those (save and open, each with its
// prompt: they come last so that saved inputs keep their meaning);
// any other byte types its printable ASCII character (a space for the
// rest), so that a run both moves through the panes and types into their
// fields, the extremes the parsers accept among it.
var (
	fuzzKeys = []string{"enter", "esc", "tab", "shift+tab", "left", "right", "up", "down",
		"home", "end", "backspace", "delete", "ctrl+u", "pgdown", "pgup", "ctrl+e"}
	fuzzWords    = []string{"1", "2", "3", "4", "5", "6", "?", "!", "e", "1e300", "1e-300", "ppb", " bar", " K", "%", "-", "SiH4 "}
	fuzzFileKeys = []string{"ctrl+s", "ctrl+o"}
)

// nonFiniteOnScreen matches a number that is not finite, as Go spells it.
var nonFiniteOnScreen = regexp.MustCompile(`NaN|[+-]?Inf\b`)

// FuzzWorkbenchKeys presses key sequences the fuzzer chooses on the demo
// at 80×24, and after every key checks the screen: no panic, no number
// that is not finite, and nothing wider or taller than the terminal.
func FuzzWorkbenchKeys(f *testing.F) {
	addKeySeeds(f)
	f.Fuzz(func(t *testing.T, seq []byte) { pressAndCheck(t, seq, 80, 24) })
}

// FuzzWorkbenchKeysLarge is FuzzWorkbenchKeys at 120×40, where several
// panes share the screen.
func FuzzWorkbenchKeysLarge(f *testing.F) {
	addKeySeeds(f)
	f.Fuzz(func(t *testing.T, seq []byte) { pressAndCheck(t, seq, 120, 40) })
}

// addKeySeeds adds the sequences every run starts from: the extremes
// typed into a process, the setpoint and the recipe.
func addKeySeeds(f *testing.F) {
	const (
		enter, esc, tab, right, down, ctrlU = 0, 1, 2, 5, 7, 12
		pane6, pane2, pane1                 = 21, 17, 16
		big, tiny, ppb, bar, kelvin, sih4   = 25, 26, 27, 28, 29, 32
	)
	f.Add([]byte{pane6, right, enter, ctrlU, big, bar, enter})                                   // compress to 1e300 bar
	f.Add([]byte{pane6, right, right, right, right, down, enter, ctrlU, sih4, tiny, ppb, enter}) // dilute to 1e-300 ppb
	f.Add([]byte{pane2, enter, ctrlU, tiny, kelvin, enter, pane1, enter, ctrlU, big, enter})
	f.Add([]byte{pane1, down, enter, ctrlU, tiny, ppb, enter, tab, tab, esc})
}

// pressAndCheck presses seq's keys on the demo at w × h and checks the
// screen after each.
func pressAndCheck(t *testing.T, seq []byte, w, h int) {
	if len(seq) > 60 {
		seq = seq[:60]
	}
	r := testRoot(t, w, h, testRootOpts{})
	for i, b := range seq {
		k := " "
		var quit bool
		switch n := int(b); {
		case n < len(fuzzKeys):
			k = fuzzKeys[n]
			quit = press(t, r, k)
		case n < len(fuzzKeys)+len(fuzzWords):
			k = fuzzWords[n-len(fuzzKeys)]
			for _, c := range k {
				if quit = press(t, r, string(c)); quit {
					break
				}
			}
		case n < len(fuzzKeys)+len(fuzzWords)+len(fuzzFileKeys):
			k = fuzzFileKeys[n-len(fuzzKeys)-len(fuzzWords)]
			quit = press(t, r, k)
		default:
			if b > ' ' && b < 127 {
				k = string(rune(b))
			}
			quit = press(t, r, k)
		}
		if quit {
			return
		}
		view := r.View()
		if m := nonFiniteOnScreen.FindString(view); m != "" {
			t.Fatalf("after key %d (%q) of %v the screen shows %q:\n%s", i, k, seq[:i+1], m, view)
		}
		lines := strings.Split(view, "\n")
		if len(lines) > h {
			t.Fatalf("after key %d (%q) of %v the screen has %d lines", i, k, seq[:i+1], len(lines))
		}
		for _, l := range lines {
			if lw := lipgloss.Width(l); lw > w {
				t.Fatalf("after key %d (%q) of %v a line is %d cells wide:\n%s", i, k, seq[:i+1], lw, view)
			}
		}
	}
}
