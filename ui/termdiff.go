package ui

import (
	"bytes"
	"io"
	"os"
	"strconv"
	"strings"
	"sync"

	"github.com/charmbracelet/x/ansi"
	"github.com/charmbracelet/x/term"
	"github.com/rivo/uniseg"
)

// cellWriter stands between bubbletea's renderer and the terminal. The
// renderer redraws every line that changed, whole; here each frame is read
// into a grid of cells, compared with what the terminal shows, and only
// the cells that differ are sent, after a cursor move. A digit that changes
// in a readout then costs a dozen bytes, not the 250 of its line: every
// byte crosses SSH (issue 6 item 8).
//
// It understands exactly what the renderer writes in the alternate screen:
// a frame starts with the cursor sent home, then lines of text with SGR
// colour codes, line feeds over unchanged lines, erases to the end of the
// line or the screen, and a final cursor position. Anything else in a
// frame, and any write that is not a frame, goes through unchanged; a write
// that clears the screen or changes its size makes every row unknown, and
// an unknown row is only ever learnt from a frame that draws it whole, and
// until then the writer sends nothing for it that the renderer did not.
type cellWriter struct {
	mu   sync.Mutex
	out  io.Writer
	file term.File // out, when it is a terminal: its size, and bubbletea's tty checks
	rows []cellRow // what the terminal shows, as far as we know
	w, h int       // the terminal's size when rows were learnt
	// sizeOf gives the terminal's size now (tests fix it); 0, 0 when
	// unknown.
	sizeOf func() (int, int)
}

// cellRow is one row of the screen; cells past the end are blank.
type cellRow struct {
	cells []cell
	known bool
}

// cell is one grapheme and the SGR codes it is drawn with; the right half
// of a wide glyph has g == "".
type cell struct{ g, pen string }

var blankCell = cell{g: " "}

func newCellWriter(out io.Writer) *cellWriter {
	cw := &cellWriter{out: out}
	if f, ok := out.(term.File); ok {
		cw.file = f
	}
	cw.sizeOf = cw.size
	return cw
}

// The term.File methods let bubbletea treat the writer as the terminal it
// wraps (raw mode, size, restore).
func (cw *cellWriter) Read(p []byte) (int, error) {
	if cw.file == nil {
		return 0, io.EOF
	}
	return cw.file.Read(p)
}

func (cw *cellWriter) Close() error { return nil } // the terminal is not ours to close

func (cw *cellWriter) Fd() uintptr {
	if cw.file == nil {
		return ^uintptr(0)
	}
	return cw.file.Fd()
}

// size is the terminal's size, or 0, 0 when out is no terminal.
func (cw *cellWriter) size() (int, int) {
	if cw.file == nil {
		return 0, 0
	}
	w, h, err := term.GetSize(cw.file.Fd())
	if err != nil {
		return 0, 0
	}
	return w, h
}

func (cw *cellWriter) Write(p []byte) (int, error) {
	cw.mu.Lock()
	defer cw.mu.Unlock()
	if w, h := cw.sizeOf(); w != cw.w || h != cw.h {
		cw.w, cw.h, cw.rows = w, h, nil // a resize: the terminal rearranged its cells
	}
	if !bytes.HasPrefix(p, []byte(ansi.CursorHomePosition)) {
		// Not a frame: modes and clears at the start and the end. What
		// they did to the cells is not worked out; the rows are learnt
		// again from the frames that draw them.
		cw.rows = nil
		return cw.pass(p)
	}
	next, endRow, endCol, ok := cw.apply(string(p))
	if !ok {
		cw.rows = nil
		return cw.pass(p)
	}
	// The cursor ends where the renderer left it, for what it writes next.
	diff := cw.diff(next) + ansi.CursorPosition(endCol+1, endRow+1)
	cw.rows = next
	if _, err := io.WriteString(cw.out, diff); err != nil {
		return 0, err
	}
	return len(p), nil
}

func (cw *cellWriter) pass(p []byte) (int, error) { return cw.out.Write(p) }

// apply reads a frame into a copy of the known screen. It reports false
// for anything it does not understand.
func (cw *cellWriter) apply(s string) (next []cellRow, endRow, endCol int, ok bool) {
	next = make([]cellRow, len(cw.rows))
	copy(next, cw.rows) // rows are copied on write below
	owned := make([]bool, len(next))
	row, col, pen := 0, 0, ""
	rowStart := true // the cursor came to col 0 of this row
	get := func() *cellRow {
		for len(next) <= row {
			next = append(next, cellRow{})
			owned = append(owned, true)
		}
		if !owned[row] {
			next[row].cells = append([]cell(nil), next[row].cells...)
			owned[row] = true
		}
		return &next[row]
	}
	for i := 0; i < len(s); {
		c := s[i]
		switch {
		case c == 0x1b:
			n, final, params := csi(s[i:])
			if n == 0 {
				return nil, 0, 0, false
			}
			i += n
			switch final {
			case 'm':
				if params == "" || params == "0" {
					pen = ""
				} else {
					pen += s[i-n : i]
				}
			case 'H':
				r, cc, ok := position(params)
				if !ok {
					return nil, 0, 0, false
				}
				row, col, rowStart = r, cc, cc == 0
			case 'K', 'J':
				if params != "" && params != "0" || pen != "" {
					return nil, 0, 0, false // other erases, or erasing in a colour
				}
				cr := get()
				if col < len(cr.cells) {
					cr.cells = cr.cells[:col]
				}
				if rowStart {
					cr.known = true // drawn from its start to its end
				}
				if final == 'J' {
					// Every row below is blank now, to the screen's foot.
					for len(next) < cw.h {
						next = append(next, cellRow{})
						owned = append(owned, true)
					}
					for y := row + 1; y < len(next); y++ {
						next[y], owned[y] = cellRow{known: true}, true
					}
				}
			default:
				return nil, 0, 0, false
			}
		case c == '\r':
			col, rowStart = 0, true
			i++
		case c == '\n':
			row++
			rowStart = col == 0
			i++
		case c < 0x20 || c == 0x7f:
			return nil, 0, 0, false
		default:
			g, _, w, _ := uniseg.FirstGraphemeClusterInString(s[i:], -1)
			i += len(g)
			cr := get()
			for len(cr.cells) < col+max(w, 1) {
				cr.cells = append(cr.cells, blankCell)
			}
			switch w {
			case 0:
				return nil, 0, 0, false // a lone zero-width mark: where it goes is the terminal's guess
			case 1:
				cr.cells[col] = cell{g, pen}
			default:
				cr.cells[col], cr.cells[col+1] = cell{g, pen}, cell{"", pen}
			}
			col += w
			if rowStart && cw.w > 0 && col >= cw.w {
				cr.known = true
			}
		}
	}
	return next, row, col, true
}

// csi reads a CSI sequence at the start of s: its length, final byte and
// parameters; 0 when s does not start with one.
func csi(s string) (n int, final byte, params string) {
	if len(s) < 3 || s[1] != '[' {
		return 0, 0, ""
	}
	for j := 2; j < len(s); j++ {
		switch c := s[j]; {
		case c >= '0' && c <= '9' || c == ';':
		case c >= 0x40 && c <= 0x7e:
			return j + 1, c, s[2:j]
		default:
			return 0, 0, "" // private modes and the like: not in frames
		}
	}
	return 0, 0, ""
}

// position reads "row;col" (1-based, either may be empty) as 0-based.
func position(params string) (row, col int, ok bool) {
	rs, cs, _ := strings.Cut(params, ";")
	num := func(s string) (int, bool) {
		if s == "" {
			return 0, true
		}
		v, err := strconv.Atoi(s)
		return max(v-1, 0), err == nil
	}
	row, ok1 := num(rs)
	col, ok2 := num(cs)
	return row, col, ok1 && ok2
}

// diff writes what turns the known screen into next: for each row, the
// runs of cells that differ, each after a cursor move, with the least
// colour codes. A row not known before is drawn whole.
func (cw *cellWriter) diff(next []cellRow) string {
	var b strings.Builder
	pen := ""
	setPen := func(p string) {
		if p == pen {
			return
		}
		if pen != "" {
			b.WriteString("\x1b[0m")
		}
		b.WriteString(p)
		pen = p
	}
	at := func(i int, cells []cell) cell {
		if i < len(cells) {
			return cells[i]
		}
		return blankCell
	}
	moveTo := func(y, x int) { b.WriteString(ansi.CursorPosition(x+1, y+1)) }
	for y := range next {
		nr := next[y]
		if !nr.known {
			continue // not drawn whole yet; nothing to say
		}
		var old cellRow
		if y < len(cw.rows) {
			old = cw.rows[y]
		}
		if !old.known {
			moveTo(y, 0)
			for _, c := range nr.cells {
				if c.g != "" {
					setPen(c.pen)
					b.WriteString(c.g)
				}
			}
			setPen("")
			if cw.w == 0 || len(nr.cells) < cw.w {
				// After the last column the cursor still sits on it, and an
				// erase there would take the last glyph.
				b.WriteString(ansi.EraseLineRight)
			}
			continue
		}
		width := max(len(nr.cells), len(old.cells))
		for x := 0; x < width; {
			if at(x, nr.cells) == at(x, old.cells) {
				x++
				continue
			}
			// A run of changes; gaps of a few equal cells are sent too,
			// which is cheaper than another cursor move.
			start := x
			if start > 0 && at(start, nr.cells).g == "" {
				start-- // the left half of a wide glyph
			}
			end, same := x, 0
			for ; x < width && same <= 6; x++ {
				if at(x, nr.cells) == at(x, old.cells) {
					same++
				} else {
					same, end = 0, x+1
				}
			}
			x = end
			moveTo(y, start)
			if end >= len(nr.cells) && end > len(nr.cells) {
				// The rest of the row is blank now: erase, don't send spaces.
				for i := start; i < len(nr.cells); i++ {
					if c := nr.cells[i]; c.g != "" {
						setPen(c.pen)
						b.WriteString(c.g)
					}
				}
				setPen("")
				b.WriteString(ansi.EraseLineRight)
				x = width
				continue
			}
			for i := start; i < end; i++ {
				if c := at(i, nr.cells); c.g != "" {
					setPen(c.pen)
					b.WriteString(c.g)
				}
			}
		}
	}
	setPen("")
	return b.String()
}

// terminalOutput is the output the program draws to: the cell writer over
// stdout when stdout is a terminal.
func terminalOutput() io.Writer {
	if term.IsTerminal(os.Stdout.Fd()) {
		return newCellWriter(os.Stdout)
	}
	return os.Stdout
}
