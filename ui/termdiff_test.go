package ui

import (
	"bytes"
	"strconv"
	"strings"
	"testing"

	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/x/ansi"
	"github.com/rivo/uniseg"
)

// rendererFrame is what bubbletea's standard renderer writes, in the
// alternate screen, to go from one screen to the next (its flush): each
// changed line whole, a line feed over each unchanged one, an erase below
// when the screen has fewer lines, and the cursor put back.
func rendererFrame(prev, next string, width int) []byte {
	if prev == next {
		return nil
	}
	old, lines := strings.Split(prev, "\n"), strings.Split(next, "\n")
	var b bytes.Buffer
	b.WriteString(ansi.CursorHomePosition)
	for i, l := range lines {
		if i < len(old) && old[i] == l {
			if i < len(lines)-1 {
				b.WriteByte('\n')
			}
			continue
		}
		if i == 0 && prev == "" {
			b.WriteByte('\r')
		}
		l = ansi.Truncate(l, width, "")
		b.WriteString(l)
		if ansi.StringWidth(l) < width {
			b.WriteString(ansi.EraseLineRight)
		}
		if i < len(lines)-1 {
			b.WriteString("\r\n")
		}
	}
	if len(old) > len(lines) {
		b.WriteString(ansi.EraseScreenBelow)
	}
	b.WriteString(ansi.CursorPosition(0, len(lines)))
	return b.Bytes()
}

// vt is a small terminal, written apart from cellWriter to check it: a grid
// of cells with the SGR codes in force, cursor moves, erases, and the
// pending wrap of the last column (an erase there takes the last cell).
type vt struct {
	w, h     int
	grid     [][]cell
	row, col int
	pen      string
}

func newVT(w, h int) *vt {
	t := &vt{w: w, h: h}
	t.grid = make([][]cell, h)
	for i := range t.grid {
		t.grid[i] = blankRow(w)
	}
	return t
}

func blankRow(w int) []cell {
	r := make([]cell, w)
	for i := range r {
		r[i] = blankCell
	}
	return r
}

func (t *vt) write(t2 *testing.T, s string) {
	t2.Helper()
	for i := 0; i < len(s); {
		switch c := s[i]; {
		case c == 0x1b:
			start := i
			j := i + 2
			for j < len(s) && (s[j] >= '0' && s[j] <= '9' || s[j] == ';') {
				j++
			}
			if i+1 >= len(s) || s[i+1] != '[' || j >= len(s) {
				t2.Fatalf("vt: unknown escape %q", s[i:min(i+10, len(s))])
			}
			params, final := s[i+2:j], s[j]
			i = j + 1
			switch final {
			case 'm':
				if params == "" || params == "0" {
					t.pen = ""
				} else {
					t.pen += s[start:i]
				}
			case 'H':
				rs, cs, _ := strings.Cut(params, ";")
				r, _ := strconv.Atoi(rs)
				cc, _ := strconv.Atoi(cs)
				t.row, t.col = max(r-1, 0), max(cc-1, 0)
			case 'K':
				for x := min(t.col, t.w-1); x < t.w; x++ {
					t.grid[t.row][x] = blankCell
				}
			case 'J':
				for x := min(t.col, t.w-1); x < t.w; x++ {
					t.grid[t.row][x] = blankCell
				}
				for y := t.row + 1; y < t.h; y++ {
					t.grid[y] = blankRow(t.w)
				}
			default:
				t2.Fatalf("vt: unknown sequence %q", s[start:i])
			}
		case c == '\r':
			t.col = 0
			i++
		case c == '\n':
			t.row = min(t.row+1, t.h-1)
			i++
		default:
			g, _, w, _ := uniseg.FirstGraphemeClusterInString(s[i:], -1)
			i += len(g)
			if t.col >= t.w {
				t2.Fatalf("vt: text past the last column at row %d: %q", t.row, g)
			}
			t.grid[t.row][t.col] = cell{g, t.pen}
			if w == 2 && t.col+1 < t.w {
				t.grid[t.row][t.col+1] = cell{"", t.pen}
			}
			t.col += w
		}
	}
}

func (t *vt) screen() string {
	var b strings.Builder
	for _, r := range t.grid {
		for _, c := range r {
			b.WriteString(c.pen + c.g + "|")
		}
		b.WriteByte('\n')
	}
	return b.String()
}

// The cell writer's output leaves the terminal exactly as the renderer's
// own would, cell by cell and colour by colour, through edits, pane
// changes, overlays, a sweep and resizes; and it sends far fewer bytes.
func TestCellWriterMatchesRenderer(t *testing.T) {
	r := colourRoot(t, 120, 40)
	var out bytes.Buffer
	w, h := 120, 40
	cw := newCellWriter(&out)
	cw.sizeOf = func() (int, int) { return w, h }
	direct, diffed := newVT(w, h), newVT(w, h)
	prev := ""
	var rawBytes, sentBytes int
	// The goals of issue 6 item 8, for what reaches the terminal at 120x40.
	const switchGoal, typeGoal = 2000, 2500
	goal := func(key string, i int) int {
		switch {
		case key == "tab" || i == 12 || i == 25 || i == 30: // tab, or a pane's number
			return switchGoal
		case i == 2 || i == 17 || i == 18 || i == 28: // typed into an amount or a temperature
			return typeGoal
		}
		return 0
	}
	step := func(what string) {
		t.Helper()
		view := r.View()
		frame := rendererFrame(prev, view, w)
		prev = view
		if frame == nil {
			return
		}
		direct.write(t, string(frame))
		out.Reset()
		cw.Write(frame)
		diffed.write(t, out.String())
		if !strings.Contains(what, "resize") && w == 120 {
			rawBytes += len(frame)
			sentBytes += out.Len()
			t.Logf("%-10s renderer %6d  sent %6d", what, len(frame), out.Len())
		}
		if direct.screen() != diffed.screen() {
			t.Fatalf("after %s the screens differ", what)
		}
	}
	keyStep := func(i int, k string) {
		t.Helper()
		press(t, r, k)
		step(k)
		if g := goal(k, i); g > 0 && out.Len() > g {
			t.Errorf("key %d (%s): %d bytes sent, goal <= %d", i, k, out.Len(), g)
		}
	}
	step("start")
	for i, k := range []string{"enter", "left", "5", "enter", "tab", "tab", "tab", "o", "p", "right", "right",
		"tab", "1", "a", "s", "i", "enter", "3", "%", "enter", "d", "?", "esc", "!", "esc", "2", "t", "backspace", "5", "enter", "4", "v"} {
		keyStep(i, k)
	}
	for _, size := range [][2]int{{80, 24}, {100, 30}, {64, 18}, {50, 15}, {120, 40}} {
		w, h = size[0], size[1]
		direct, diffed = newVT(w, h), newVT(w, h) // a resize: the terminal's cells are its own business
		cw.Write([]byte("\x1b[2J"))               // as the renderer clears on a resize
		prev = ""
		settle(t, r, r.Update(tea.WindowSizeMsg{Width: w, Height: h}))
		step("resize")
		press(t, r, "tab")
		step("tab after resize")
		prev = r.View()
	}
	t.Logf("keys at 120x40: the renderer wrote %d bytes, the cell writer sent %d", rawBytes, sentBytes)
}
