package model

import (
	"strings"
	"testing"
)

func TestQuote(t *testing.T) {
	long := strings.Repeat("9", 120_000)
	tests := []struct {
		name, in, want string
	}{
		{"short", "abc", `"abc"`},
		{"escape", "EVIL\x1b[2J", `"EVIL\x1b[2J"`},
		{"exactly the cap", strings.Repeat("x", MaxQuotedRunes), `"` + strings.Repeat("x", MaxQuotedRunes) + `"`},
		{"long", long, `"` + strings.Repeat("9", MaxQuotedRunes) + `"… (120000 characters)`},
		{"long runes", strings.Repeat("μ", 100), `"` + strings.Repeat("μ", MaxQuotedRunes) + `"… (100 characters)`},
	}
	for _, tt := range tests {
		if got := Quote(tt.in); got != tt.want {
			t.Errorf("%s: Quote = %s, want %s", tt.name, got, tt.want)
		}
	}
}

func TestPrintable(t *testing.T) {
	tests := []struct {
		name, in, want string
	}{
		{"plain", "N2 in Ar, 5 %", "N2 in Ar, 5 %"},
		{"unicode kept", "μ° Σxᵢ", "μ° Σxᵢ"},
		{"escape", "EVIL\x1b[2J\x1b[1;1HHACKED", `EVIL\x1b[2J\x1b[1;1HHACKED`},
		{"newline and tab", "a\nb\tc\rd", "a b c d"},
		{"bell and del", "a\x07b\x7f", `a\ab\x7f`},
		{"C1 CSI", "a\u009bb", `a\u009bb`},
		{"invalid byte", "a\xffb", `a\xffb`},
	}
	for _, tt := range tests {
		if got := Printable(tt.in); got != tt.want {
			t.Errorf("%s: Printable(%q) = %q, want %q", tt.name, tt.in, got, tt.want)
		}
	}
}

// LeadingNumber keeps the rest of the text as it was, spacing included,
// and takes "1e5" as a number but the "e" of "5eV" or "2 e" as text.
func TestLeadingNumber(t *testing.T) {
	for _, c := range []struct {
		in, rest string
		x        float64
	}{
		{"25 °C", " °C", 25}, {"1.5bar", "bar", 1.5}, {"1e5Pa", "Pa", 1e5}, {"+3 K", " K", 3},
		{".5 L", " L", 0.5}, {"-2E-3", "", -2e-3}, {"5eV", "eV", 5}, {"2 e", " e", 2},
	} {
		x, rest, err := LeadingNumber(c.in)
		if err != nil || x != c.x || rest != c.rest {
			t.Errorf("LeadingNumber(%q) = %g, %q, %v; want %g, %q", c.in, x, rest, err, c.x, c.rest)
		}
	}
	for _, in := range []string{"", " 5", "kg", "NaN", "Inf K", "1e400 Pa", "--3", "."} {
		if x, rest, err := LeadingNumber(in); err == nil {
			t.Errorf("LeadingNumber(%q) = %g, %q; want an error", in, x, rest)
		} else if strings.Contains(err.Error(), "\n") {
			t.Errorf("LeadingNumber(%q): error %q, want one line", in, err)
		}
	}
}
