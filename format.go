package main

import (
	"bytes"
	"fmt"
	"io"
	"math"
	"reflect"
	"strconv"
	"strings"
	"unicode/utf8"

	"zmix/mixtures"
)

// numbers formats the figures of one text output. It remembers the first
// non-finite value it is handed, so that the caller can print an error
// instead of a page with a NaN in it.
type numbers struct {
	bad string // what the first non-finite value was, "" if none
}

func (n *numbers) check(what string, x float64) bool {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		if n.bad == "" {
			n.bad = what
		}
		return false
	}
	return true
}

// sig writes x with sig significant figures, in fixed notation for
// everyday magnitudes and in exponent notation for the very small or
// very large.
func (n *numbers) sig(what string, x float64, sig int) string {
	if !n.check(what, x) {
		return "?"
	}
	return mixtures.FormatSig(x, sig)
}

// short writes x with up to sig significant figures and no trailing
// zeros, for values the user typed or chose, such as a temperature.
func (n *numbers) short(what string, x float64, sig int) string {
	if !n.check(what, x) {
		return "?"
	}
	return strconv.FormatFloat(x, 'g', sig, 64)
}

// fixed writes x with a fixed number of decimals; energies read best this
// way, because their zero is a convention and relative digits mislead.
func (n *numbers) fixed(what string, x float64, decimals int) string {
	if !n.check(what, x) {
		return "?"
	}
	return strconv.FormatFloat(x, 'f', decimals, 64)
}

// err returns the error for a non-finite figure, or nil.
func (n *numbers) err() error {
	if n.bad == "" {
		return nil
	}
	return nonFinite(n.bad)
}

func nonFinite(what string) error {
	return badInput("the model gives a non-finite %s at this state; it lies outside what zmix can compute (try a temperature and pressure nearer everyday conditions)", what)
}

// checkFinite walks the float fields of an exported record (and of its
// nested lists) and reports the first one that is NaN or infinite, named
// by its JSON key.
func checkFinite(v any) error {
	if what := firstNonFinite(reflect.ValueOf(v), ""); what != "" {
		return nonFinite(what)
	}
	return nil
}

func firstNonFinite(v reflect.Value, path string) string {
	switch v.Kind() {
	case reflect.Pointer, reflect.Interface:
		if v.IsNil() {
			return ""
		}
		return firstNonFinite(v.Elem(), path)
	case reflect.Float32, reflect.Float64:
		if x := v.Float(); math.IsNaN(x) || math.IsInf(x, 0) {
			return path
		}
	case reflect.Slice, reflect.Array:
		for i := range v.Len() {
			if w := firstNonFinite(v.Index(i), fmt.Sprintf("%s[%d]", path, i)); w != "" {
				return w
			}
		}
	case reflect.Struct:
		t := v.Type()
		for i := range t.NumField() {
			f := t.Field(i)
			if !f.IsExported() {
				continue
			}
			name := f.Name
			if tag, _, _ := strings.Cut(f.Tag.Get("json"), ","); tag != "" && tag != "-" {
				name = tag
			}
			if f.Anonymous {
				name = ""
			}
			if path != "" && name != "" {
				name = path + "." + name
			} else if name == "" {
				name = path
			}
			if w := firstNonFinite(v.Field(i), name); w != "" {
				return w
			}
		}
	}
	return ""
}

// align says how a table column is aligned.
type align int

const (
	left align = iota
	right
)

// table lays out rows of cells in columns, measuring width in runes so
// that μ, ³ and · count as one column each.
type table struct {
	aligns []align
	rows   [][]string
	indent string
	gap    string
}

func newTable(indent string, aligns ...align) *table {
	return &table{aligns: aligns, indent: indent, gap: "  "}
}

func (t *table) row(cells ...string) { t.rows = append(t.rows, cells) }

func (t *table) write(w io.Writer) {
	var widths []int
	for _, r := range t.rows {
		for i, c := range r {
			c = forWriter(w, c)
			r[i] = c
			if i >= len(widths) {
				widths = append(widths, 0)
			}
			widths[i] = max(widths[i], utf8.RuneCountInString(c))
		}
	}
	var b strings.Builder
	for _, r := range t.rows {
		b.Reset()
		b.WriteString(t.indent)
		for i, c := range r {
			if i > 0 {
				b.WriteString(t.gap)
			}
			pad := strings.Repeat(" ", widths[i]-utf8.RuneCountInString(c))
			a := left
			if i < len(t.aligns) {
				a = t.aligns[i]
			}
			if a == right {
				b.WriteString(pad + c)
			} else if i < len(r)-1 {
				b.WriteString(c + pad)
			} else {
				b.WriteString(c)
			}
		}
		fmt.Fprintln(w, strings.TrimRight(b.String(), " "))
	}
}

// asciiText maps the few non-ASCII glyphs of zmix's text output to plain
// ASCII, for terminals and fonts that lack them. Degree signs of units go
// first; the one left marks a standard state (P°, μ°) and becomes 0.
var asciiText = strings.NewReplacer(
	"°C", "C", "°F", "F", "°", "0",
	"³", "3", "²", "2", "·", ".", "γ", "gamma", "μ", "mu", "ρ", "rho",
	"Θrot", "Theta_rot", "Θvib", "Theta_vib", "Θ", "Theta", "θ", "theta",
	"Δf", "Delta_f", "Δ", "Delta", "ν̃", "nu", "Σ", "sum", "σ", "sigma",
	"≪", "<<", "≈", "~", "×", "x", "−", "-", "–", "-", "—", "-", "ᵢ", "_i",
	"⁻¹", "^-1", "Π", "Pi", "…", "...", "≤", "<=", "≥", ">=", "’", "'",
	"“", "\"", "”", "\"", "→", "->",
)

// asciiWriter rewrites everything written through it into ASCII. Tables
// and wrapped prose check for it, so that they measure the text they will
// really print.
type asciiWriter struct{ w io.Writer }

func (a *asciiWriter) Write(p []byte) (int, error) {
	if _, err := io.WriteString(a.w, toASCII(string(p))); err != nil {
		return 0, err
	}
	return len(p), nil
}

// forWriter converts s the way w will, so that its width can be measured.
func forWriter(w io.Writer, s string) string {
	if _, ok := w.(*asciiWriter); ok {
		return toASCII(s)
	}
	return s
}

// toASCII rewrites text for ASCII mode and replaces anything left outside
// ASCII with "?", so the promise holds even for user-supplied names.
func toASCII(s string) string {
	s = asciiText.Replace(s)
	if isASCII(s) {
		return s
	}
	var b bytes.Buffer
	for _, r := range s {
		if r < utf8.RuneSelf {
			b.WriteRune(r)
		} else {
			b.WriteByte('?')
		}
	}
	return b.String()
}

func isASCII(s string) bool {
	for i := 0; i < len(s); i++ {
		if s[i] >= utf8.RuneSelf {
			return false
		}
	}
	return true
}
