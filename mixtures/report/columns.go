package report

import (
	"encoding/json"
	"strconv"

	"zmix/mixtures"
	"zmix/model"
)

// The JSON and CSV forms list the same figures in the same order: the
// blend's quantities in table order, the gauge flag after the pressure,
// the per-kilogram forms after the molar ones, then each species.

const gaugeName = "pressure_given_as_gauge"

// CSVHeader appends the CSV column names for states of s's blend.
// Species columns are "FORMULA.name".
func CSVHeader(row []string, s *mixtures.State) []string {
	for i := range mixtures.Quantities {
		q := &mixtures.Quantities[i]
		row = append(row, q.Name)
		if q.Key == "P" {
			row = append(row, gaugeName)
		}
	}
	for i := range mixtures.Quantities {
		if q := &mixtures.Quantities[i]; q.HasPerKg() {
			row = append(row, q.PerKgName)
		}
	}
	for j := range s.Species {
		f := model.Printable(s.Species[j].Species.Formula)
		for i := range mixtures.SpeciesQuantities {
			row = append(row, f+"."+mixtures.SpeciesQuantities[i].Name)
		}
	}
	return row
}

// CSVRow appends the CSV cells of s, in SI units with every digit.
func CSVRow(row []string, s *mixtures.State, gauge bool) []string {
	for i := range mixtures.Quantities {
		q := &mixtures.Quantities[i]
		row = append(row, csvFloat(q.Get(s)))
		if q.Key == "P" {
			row = append(row, strconv.FormatBool(gauge))
		}
	}
	for i := range mixtures.Quantities {
		if q := &mixtures.Quantities[i]; q.HasPerKg() {
			row = append(row, csvFloat(q.PerKg(s)))
		}
	}
	for j := range s.Species {
		t := &s.Species[j]
		for i := range mixtures.SpeciesQuantities {
			row = append(row, csvFloat(mixtures.SpeciesQuantities[i].Get(t)))
		}
	}
	return row
}

// csvFloat writes x with every digit; NaN, which only an optional
// quantity that is not known can hold once the finite check has passed,
// is an empty cell.
func csvFloat(x float64) string {
	if x != x {
		return ""
	}
	return strconv.FormatFloat(x, 'g', -1, 64)
}

// appendCSVRow appends the CSV line of s, the same cells as CSVRow, with
// no string per cell: a number never needs CSV quoting.
func appendCSVRow(b []byte, s *mixtures.State, gauge bool) []byte {
	for i := range mixtures.Quantities {
		q := &mixtures.Quantities[i]
		if i > 0 {
			b = append(b, ',')
		}
		if v := q.Get(s); v == v {
			b = strconv.AppendFloat(b, v, 'g', -1, 64)
		}
		if q.Key == "P" {
			b = append(b, ',')
			b = strconv.AppendBool(b, gauge)
		}
	}
	for i := range mixtures.Quantities {
		if q := &mixtures.Quantities[i]; q.HasPerKg() {
			b = append(b, ',')
			b = strconv.AppendFloat(b, q.PerKg(s), 'g', -1, 64)
		}
	}
	for j := range s.Species {
		t := &s.Species[j]
		for i := range mixtures.SpeciesQuantities {
			b = append(b, ',')
			b = strconv.AppendFloat(b, mixtures.SpeciesQuantities[i].Get(t), 'g', -1, 64)
		}
	}
	return append(b, '\n')
}

// jsonWriter appends JSON by hand, in the table's order and with no
// reflection, so that a sweep can stream a row at a time.
type jsonWriter struct {
	buf []byte
	// compact writes no spaces or new lines inside an object: a sweep
	// writes one object a line.
	compact bool
}

func (j *jsonWriter) key(indent, name string) {
	j.quotedKey(indent, string(appendJSONString(nil, name)))
}

// quotedKey is key for a name already JSON-quoted.
func (j *jsonWriter) quotedKey(indent, quoted string) {
	if !j.compact {
		j.buf = append(j.buf, indent...)
	}
	j.buf = append(j.buf, quoted...)
	if j.compact {
		j.buf = append(j.buf, ':')
	} else {
		j.buf = append(j.buf, ": "...)
	}
}

// nl ends a member or element: a comma when more follow, then, unless
// compact, a new line and the indent of what comes next.
func (j *jsonWriter) nl(comma bool, indent string) {
	if comma {
		j.buf = append(j.buf, ',')
	}
	if !j.compact {
		j.buf = append(j.buf, '\n')
		j.buf = append(j.buf, indent...)
	}
}

// The table's names, JSON-quoted once, by row: a sweep writes each of
// them once per point.
var (
	quotedQuantity, quotedPerKg, quotedSpecies = quoteNames()
	quotedGauge                                = string(appendJSONString(nil, gaugeName))
)

func quoteNames() (q, kg, sp []string) {
	for _, x := range mixtures.Quantities {
		q = append(q, string(appendJSONString(nil, x.Name)))
		kg = append(kg, string(appendJSONString(nil, x.PerKgName)))
	}
	for _, x := range mixtures.SpeciesQuantities {
		sp = append(sp, string(appendJSONString(nil, x.Name)))
	}
	return q, kg, sp
}

// float appends x as encoding/json would write it.
func (j *jsonWriter) float(x float64) {
	j.buf = appendJSONFloat(j.buf, x)
}

// stateFields appends the figures of s as object members, without the
// braces, each line indented by indent.
func (j *jsonWriter) stateFields(s *mixtures.State, gauge bool, indent string) {
	first := true
	sep := func() {
		if !first {
			j.nl(true, "")
		}
		first = false
	}
	for i := range mixtures.Quantities {
		q := &mixtures.Quantities[i]
		sep()
		j.quotedKey(indent, quotedQuantity[i])
		j.float(q.Get(s))
		if q.Key == "P" {
			sep()
			j.quotedKey(indent, quotedGauge)
			j.buf = strconv.AppendBool(j.buf, gauge)
		}
	}
	for i := range mixtures.Quantities {
		if q := &mixtures.Quantities[i]; q.HasPerKg() {
			sep()
			j.quotedKey(indent, quotedPerKg[i])
			j.float(q.PerKg(s))
		}
	}
	sep()
	j.species(s, indent)
}

// species appends the member "species": the list of s's species, each
// an object of the species table's figures.
func (j *jsonWriter) species(s *mixtures.State, indent string) {
	j.key(indent, "species")
	j.buf = append(j.buf, '[')
	inner := indent + "  "
	inner2 := inner + "  "
	for k := range s.Species {
		t := &s.Species[k]
		j.nl(k > 0, inner)
		j.buf = append(j.buf, '{')
		j.nl(false, "")
		j.key(inner2, "name")
		j.buf = appendJSONString(j.buf, t.Species.Formula)
		for i := range mixtures.SpeciesQuantities {
			q := &mixtures.SpeciesQuantities[i]
			j.nl(true, "")
			j.quotedKey(inner2, quotedSpecies[i])
			j.float(q.Get(t))
		}
		j.nl(false, inner)
		j.buf = append(j.buf, '}')
	}
	j.nl(false, indent)
	j.buf = append(j.buf, ']')
}

// strings appends a member holding a list of strings.
func (j *jsonWriter) strings(indent, name string, list []string) {
	j.key(indent, name)
	if len(list) == 0 {
		j.buf = append(j.buf, "[]"...)
		return
	}
	j.buf = append(j.buf, "[\n"...)
	for i, s := range list {
		if i > 0 {
			j.buf = append(j.buf, ",\n"...)
		}
		j.buf = append(j.buf, indent+"  "...)
		j.buf = appendJSONString(j.buf, s)
	}
	j.buf = append(j.buf, '\n')
	j.buf = append(j.buf, indent+"]"...)
}

// appendJSONFloat writes x the way encoding/json does for a float64: the
// shortest form that reads back exactly, in exponent form below 1e-6 and
// from 1e21, with a two-digit exponent cleaned to one ("1e-07" → "1e-7").
//
// NaN, which only an optional quantity that is not known can hold once
// the finite check has passed, is null.
func appendJSONFloat(b []byte, x float64) []byte {
	if x != x {
		return append(b, "null"...)
	}
	abs := x
	if abs < 0 {
		abs = -abs
	}
	format := byte('f')
	if abs != 0 && (abs < 1e-6 || abs >= 1e21) {
		format = 'e'
	}
	b = strconv.AppendFloat(b, x, format, -1, 64)
	if format == 'e' {
		n := len(b)
		if n >= 4 && b[n-4] == 'e' && b[n-3] == '-' && b[n-2] == '0' {
			b[n-2] = b[n-1]
			b = b[:n-1]
		}
	}
	return b
}

// appendJSONString appends s as a JSON string, escaped as encoding/json
// escapes it (control characters as \u00XX, so a name holding an escape
// sequence cannot reach a terminal that shows the file).
func appendJSONString(b []byte, s string) []byte {
	if plainJSON(s) {
		b = append(b, '"')
		b = append(b, s...)
		return append(b, '"')
	}
	q, _ := json.Marshal(s) // a string always marshals
	return append(b, q...)
}

// plainJSON reports whether s needs no escaping in a JSON string, as is
// the case for formulas and the table's names.
func plainJSON(s string) bool {
	for i := 0; i < len(s); i++ {
		c := s[i]
		if c < 0x20 || c >= 0x7f || c == '"' || c == '\\' || c == '<' || c == '>' || c == '&' {
			return false
		}
	}
	return true
}
