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
