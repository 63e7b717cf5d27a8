package ui

import (
	"math"
	"strconv"
	"strings"
	"unicode/utf8"

	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures"
	"zmix/mixtures/report"
)

// asciiReplacer spells out the non-ASCII glyphs that the engine's notes and
// our own labels use, for terminals and fonts without them. It follows the
// commands' ASCII output: a degree sign of a unit goes, the one left marks
// a standard state (P°, μ°) and becomes 0, and J/(mol·K) is J/(mol.K).
var asciiReplacer = strings.NewReplacer(
	"°C", "C", "°F", "F", "°", "0", "³", "3", "²", "2", "·", ".",
	"μ", "mu", "µ", "mu", "γ", "gamma", "ρ", "rho", "σ", "sigma",
	"Θrot", "Theta_rot", "Θvib", "Theta_vib", "Θel", "Theta_el", "Θ", "Theta", "θ", "theta",
	"Δf", "Delta_f", "Δ", "Delta", "ν̃", "nu", "ν", "nu", "Σ", "sum", "Π", "Pi", "Λ", "Lambda",
	"α", "alpha", "β", "beta", "ε", "eps", "λ", "lambda", "ω", "omega", "π", "pi",
	"≪", "<<", "≫", ">>", "≈", "~", "≤", "<=", "≥", ">=", "≠", "!=", "×", "x",
	"−", "-", "–", "-", "—", "-", "ᵢ", "_i", "⁻¹", "^-1", "⁻", "^-", "∞", "inf", "√", "sqrt", "∂", "d",
	"₀", "0", "₁", "1", "₂", "2", "₃", "3", "₄", "4", "₅", "5", "₆", "6", "₇", "7", "₈", "8", "₉", "9",
	"⁰", "^0", "¹", "^1", "⁴", "^4",
	"→", "->", "←", "<-", "↑", "^", "↓", "v", "…", "...", "•", "*", "▸", ">",
	"│", "|", "┊", ":", "─", "-",
	"’", "'", "‘", "'", "“", "\"", "”", "\"",
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

// toASCII is the package's toASCII that also tells the test hook of every
// glyph the table lacks, so that a test can fail on a "?" that stands in
// for a glyph of ours.
func (c *Common) toASCII(s string) string {
	out := toASCII(s)
	if c.missingGlyph != nil && strings.Contains(out, "?") {
		for _, r := range asciiReplacer.Replace(s) {
			if r >= utf8.RuneSelf {
				c.missingGlyph(r)
			}
		}
	}
	return out
}

func toASCII(s string) string {
	if isASCII(s) {
		return s
	}
	s = asciiReplacer.Replace(s)
	if isASCII(s) {
		return s
	}
	return strings.Map(func(r rune) rune {
		if r >= utf8.RuneSelf {
			return '?'
		}
		return r
	}, s)
}

func isASCII(s string) bool {
	for i := 0; i < len(s); i++ {
		if s[i] >= utf8.RuneSelf {
			return false
		}
	}
	return true
}

// sig formats x with n significant figures, in plain notation for everyday
// magnitudes and in e-notation for very large or small ones.
func sig(x float64, n int) string { return mixtures.FormatSig(x, n) }

// short formats x with up to n significant figures and no trailing
// zeros, for values the user typed, such as a temperature.
func short(x float64, n int) string {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return "n/a"
	}
	return strconv.FormatFloat(x, 'g', n, 64)
}

// fixed formats x with a fixed number of decimals.
func fixed(x float64, decimals int) string {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return "n/a"
	}
	s := strconv.FormatFloat(x, 'f', decimals, 64)
	if s == "-0" || strings.HasPrefix(s, "-0.") && strings.Trim(s[3:], "0") == "" {
		s = s[1:]
	}
	return s
}

// presText writes a pressure in Pa with a unit chosen by its size.
func presText(pa float64) string {
	a := math.Abs(pa)
	switch {
	case a >= 1e6:
		return short(pa/1e6, 5) + " MPa"
	case a >= 1e4:
		return short(pa/1e5, 5) + " bar"
	case a >= 1e3:
		return short(pa/1e3, 5) + " kPa"
	}
	return short(pa, 5) + " Pa"
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

// wrap breaks plain text into lines of at most w cells at spaces; it is
// the one word wrapper of the commands and the workbench, linear in the
// length of s and safe for any w (a width not yet known is taken as 8).
func wrap(s string, w int) []string { return report.Wrap(s, w) }

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
