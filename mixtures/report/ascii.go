package report

import (
	"io"
	"strings"
	"unicode/utf8"
)

// asciiText spells out every non-ASCII glyph that zmix's own text uses.
// Degree signs of units go first; the one left marks a standard state
// (P°, μ°) and becomes 0.
var asciiText = strings.NewReplacer(
	"°C", "C", "°F", "F", "°", "0", "³", "3", "²", "2", "·", ".",
	"μ", "mu", "µ", "mu", "γ", "gamma", "ρ", "rho", "σ", "sigma",
	"Θrot", "Theta_rot", "Θvib", "Theta_vib", "Θel", "Theta_el", "Θ", "Theta", "θ", "theta",
	"Δf", "Delta_f", "Δ", "Delta", "ν̃", "nu", "ν", "nu", "Σ", "sum", "Π", "Pi", "Λ", "Lambda",
	"α", "alpha", "β", "beta", "ε", "eps", "λ", "lambda", "ω", "omega", "π", "pi", "η", "eta",
	"≪", "<<", "≫", ">>", "≈", "~", "∝", "prop. to", "≤", "<=", "≥", ">=", "≠", "!=", "×", "x", "±", "+/-",
	"−", "-", "–", "-", "—", "-", "ᵢ", "_i", "ⱼ", "_j", "⁻¹", "^-1", "⁻", "^-", "∞", "inf", "√", "sqrt", "∂", "d",
	"₀", "0", "₁", "1", "₂", "2", "₃", "3", "₄", "4", "₅", "5", "₆", "6", "₇", "7", "₈", "8", "₉", "9",
	"⁰", "^0", "¹", "^1", "⁴", "^4",
	"→", "->", "←", "<-", "↑", "^", "↓", "v", "…", "...", "•", "*", "▸", ">", "·", ".",
	"’", "'", "‘", "'", "“", "\"", "”", "\"", "\u00a0", " ",
	// The workbench's separators and rules.
	"│", "|", "┊", ":", "─", "-",
)

// ToASCII rewrites s for ASCII mode. Anything the table does not cover,
// such as a user's name in another script, becomes "?", so that the
// promise of no byte above 127 holds for any text.
func ToASCII(s string) string {
	if isASCII(s) {
		return s
	}
	s = asciiText.Replace(s)
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

// ASCIIWriter rewrites everything written through it into ASCII. Tables
// and wrapped prose ask Measure of their writer, so that they lay out
// the text they will really print.
type ASCIIWriter struct{ W io.Writer }

func (a *ASCIIWriter) Write(p []byte) (int, error) {
	if _, err := io.WriteString(a.W, ToASCII(string(p))); err != nil {
		return 0, err
	}
	return len(p), nil
}

// ForWriter converts s the way w will, so that its width can be measured.
func ForWriter(w io.Writer, s string) string {
	if _, ok := w.(*ASCIIWriter); ok {
		return ToASCII(s)
	}
	return s
}

// IsASCIIWriter reports whether w transliterates to ASCII.
func IsASCIIWriter(w io.Writer) bool {
	_, ok := w.(*ASCIIWriter)
	return ok
}
