package ui

import (
	"strings"
	"unicode/utf8"

	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures/report"
)

// keyWords spells out arrow glyphs in key help, where a word reads better
// than an ASCII arrow.
var keyWords = strings.NewReplacer("←", "left", "→", "right", "↑", "up", "↓", "down")

// Text returns s as it may be drawn: unchanged, or with every non-ASCII
// glyph spelled out in ASCII mode. Any glyph not in the table becomes "?",
// so that ASCII mode never sends a byte above 127.
func (c *Common) Text(s string) string {
	if !c.ASCII {
		return s
	}
	return c.toASCII(s)
}

// KeyText is Text for key names: arrows become words in ASCII mode.
func (c *Common) KeyText(s string) string {
	if !c.ASCII {
		return s
	}
	return c.toASCII(keyWords.Replace(s))
}

// toASCII is report.ToASCII, which also tells the test hook of every
// glyph the table lacks, so that a test can fail on a "?" that stands in
// for a glyph of ours.
func (c *Common) toASCII(s string) string {
	out := report.ToASCII(s)
	if c.missingGlyph != nil && strings.Contains(out, "?") {
		for _, r := range s {
			if r >= utf8.RuneSelf && report.ToASCII(string(r)) == "?" && !strings.ContainsRune("̃", r) {
				c.missingGlyph(r)
			}
		}
	}
	return out
}

func isASCII(s string) bool {
	for i := 0; i < len(s); i++ {
		if s[i] >= utf8.RuneSelf {
			return false
		}
	}
	return true
}

// fitLine cuts s (which may hold styles) to width w cells and pads it to
// exactly w, so that frames line up.
func fitLine(s string, w int) string {
	if w <= 0 {
		return ""
	}
	n := lipgloss.Width(s)
	if n > w {
		s = truncate(s, w)
		n = lipgloss.Width(s)
	}
	if n < w {
		s += strings.Repeat(" ", w-n)
	}
	return s
}

var truncStyle = lipgloss.NewStyle()

func truncate(s string, w int) string {
	if isASCII(s) && !strings.Contains(s, "\x1b") {
		if len(s) > w {
			return s[:w]
		}
		return s
	}
	return truncStyle.MaxWidth(w).Render(s)
}

// shorten fits plain text into w cells, as it may be drawn (Text): whole
// when it fits, else cut at the last space that leaves room for an
// ellipsis, so that no word is cut.
func (c *Common) shorten(s string, w int) string {
	s = c.Text(s)
	if lipgloss.Width(s) <= w {
		return s
	}
	ell := c.Text("…")
	ew := lipgloss.Width(ell)
	if w <= ew {
		return ""
	}
	rs := []rune(s)
	cut := 0
	for i, n := 0, 0; i < len(rs); i++ {
		n += lipgloss.Width(string(rs[i]))
		if n > w-ew {
			break
		}
		if rs[i] == ' ' {
			cut = i
		}
	}
	if cut == 0 { // one long word: cut it, and say so
		for n := 0; cut < len(rs); cut++ {
			if n += lipgloss.Width(string(rs[cut])); n > w-ew {
				break
			}
		}
	}
	return strings.TrimRight(string(rs[:cut]), " ,;:") + ell
}

// padRight pads plain text to w cells.
func padRight(s string, w int) string {
	n := lipgloss.Width(s)
	if n >= w {
		return s
	}
	return s + strings.Repeat(" ", w-n)
}

// padLeft right-aligns plain text in w cells.
func padLeft(s string, w int) string {
	n := lipgloss.Width(s)
	if n >= w {
		return s
	}
	return strings.Repeat(" ", w-n) + s
}
