package ui

import "strings"

// compactSGR rewrites styled text with fewer escape codes and the same
// look. lipgloss closes every styled run with a reset, so that a frame's
// edge, the edge of the pane beside it and an empty styled run each cost
// a reset and a new code; here a style is set only before text that needs
// it, a reset only when the next text needs less, and every line ends
// plain, because the renderer redraws lines one by one.
//
// It is also the last guard of the terminal: every other control byte
// (an ESC that starts no SGR code, a carriage return, a bell) becomes "?",
// so that text that slipped past model.Printable still cannot move the
// cursor or clear the screen.
func compactSGR(s string) string {
	if !needsCompact(s) {
		return s
	}
	var out strings.Builder
	out.Grow(len(s))
	want, have := "", "" // the codes in force for the next text, and on the terminal
	for i := 0; i < len(s); {
		if n := sgrLen(s[i:]); n > 0 {
			if code := s[i : i+n]; code == "\x1b[0m" || code == "\x1b[m" {
				want = ""
			} else {
				want += code
			}
			i += n
			continue
		}
		c := s[i]
		if c < 0x20 && c != '\n' || c == 0x7f {
			c = '?'
		}
		if c == '\n' {
			if have != "" {
				out.WriteString("\x1b[0m")
				have = ""
			}
		} else if want != have {
			if !strings.HasPrefix(want, have) {
				out.WriteString("\x1b[0m")
				have = ""
			}
			out.WriteString(want[len(have):])
			have = want
		}
		out.WriteByte(c)
		i++
	}
	if have != "" {
		out.WriteString("\x1b[0m")
	}
	return out.String()
}

// needsCompact reports whether s holds an escape or a control byte.
func needsCompact(s string) bool {
	for i := 0; i < len(s); i++ {
		if c := s[i]; c < 0x20 && c != '\n' || c == 0x7f {
			return true
		}
	}
	return false
}

// sgrLen is the length of the SGR code at the start of s, or 0.
func sgrLen(s string) int {
	if len(s) < 3 || s[0] != 0x1b || s[1] != '[' {
		return 0
	}
	for j := 2; j < len(s); j++ {
		switch c := s[j]; {
		case c == 'm':
			return j + 1
		case c == ';' || c >= '0' && c <= '9':
		default:
			return 0
		}
	}
	return 0
}
