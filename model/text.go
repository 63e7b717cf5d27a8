package model

import (
	"errors"
	"math"
	"strconv"
	"strings"
	"unicode"
	"unicode/utf8"
)

// Text from outside (files, flags, pastes, the environment) is untrusted:
// it may hold terminal escapes, and it may be huge. These two helpers are
// the only way such text reaches a message or a screen, in every package.

// MaxQuotedRunes is how much of an input value an error message repeats.
// A 120 KB number must not make a 360 KB error line.
const MaxQuotedRunes = 60

// Quote returns s as a Go-quoted string for an error message, cut to
// MaxQuotedRunes runes with an ellipsis and a note of the full length.
// Control characters come out escaped, so the result is safe to print.
func Quote(s string) string {
	n := utf8.RuneCountInString(s)
	if n <= MaxQuotedRunes {
		return strconv.Quote(s)
	}
	cut, k := s, 0
	for i := range s {
		if k == MaxQuotedRunes {
			cut = s[:i]
			break
		}
		k++
	}
	return strconv.Quote(cut) + "… (" + strconv.Itoa(n) + " characters)"
}

// Printable returns s with every control character, escape sequence
// introducer and invalid byte replaced by a visible stand-in, so that a
// name read from a file cannot move the cursor or clear a screen. Tabs
// and newlines become spaces: callers lay text out themselves.
func Printable(s string) string {
	clean := true
	for _, r := range s {
		if r == utf8.RuneError || !unicode.IsPrint(r) {
			clean = false
			break
		}
	}
	if clean {
		return s
	}
	var b strings.Builder
	b.Grow(len(s))
	for i, w := 0, 0; i < len(s); i += w {
		r, size := utf8.DecodeRuneInString(s[i:])
		w = size
		switch {
		case r == utf8.RuneError && size <= 1:
			b.WriteString(`\x`)
			b.WriteString(strconv.FormatUint(uint64(s[i]), 16))
		case r == '\t' || r == '\n' || r == '\r':
			b.WriteByte(' ')
		case unicode.IsPrint(r):
			b.WriteRune(r)
		default:
			// ESC becomes "\x1b", so the reader sees what was there.
			q := strconv.QuoteRune(r)
			b.WriteString(q[1 : len(q)-1])
		}
	}
	return b.String()
}

// LeadingNumber reads the finite number that leads s ("25" of "25 °C",
// "1.5" of "1.5bar", "1e5" of "1e5Pa") and returns it with the rest of s
// untouched, spacing included. Every reader of a value with a unit, in
// every package, takes its number this way, so that "1e5", "+3" and
// ".5" mean the same wherever they are typed. The error says why, in
// words that fit after the value's own name.
func LeadingNumber(s string) (float64, string, error) {
	end := 0
	for end < len(s) {
		c := s[end]
		if (c >= '0' && c <= '9') || c == '.' || c == '-' || c == '+' ||
			((c == 'e' || c == 'E') && end > 0 && end+1 < len(s) && (s[end+1] == '-' || s[end+1] == '+' || (s[end+1] >= '0' && s[end+1] <= '9'))) {
			end++
			continue
		}
		break
	}
	if end == 0 {
		return 0, "", errors.New("no number")
	}
	x, err := strconv.ParseFloat(s[:end], 64)
	if errors.Is(err, strconv.ErrRange) && math.IsInf(x, 0) {
		return 0, "", errors.New(Quote(s[:end]) + " is too large a number to compute with (beyond 1.8e308)")
	}
	if err != nil || math.IsNaN(x) || math.IsInf(x, 0) {
		return 0, "", errors.New(Quote(s[:end]) + " is not a number")
	}
	return x, s[end:], nil
}
