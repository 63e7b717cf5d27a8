package report

import (
	"fmt"
	"io"
	"slices"
	"strconv"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/process"
	"zmix/model"
)

// ProcessReport is one solved process calculation with what is shown
// beside it. The commands and the workbench's export hand the same
// report to the same writers.
type ProcessReport struct {
	// Label names what went in: the blend, or the streams.
	Label  string
	Result process.Result
}

// CheckProcessFinite refuses a result with a non-finite figure, naming it.
func CheckProcessFinite(r process.Result) error {
	if what := process.FirstNonFinite(r); what != "" {
		return NonFiniteError(what)
	}
	return nil
}

// FigureNumber writes a value in its figure's display unit, without the
// unit: a count as a whole number, the rest with the figure's digits.
func FigureNumber(v process.Value) string {
	if v.Integer {
		return Short(v.SI, 12)
	}
	return Number(v.Display(), v.Digits)
}

// FigureText writes a value with its unit: "574.28 K".
func FigureText(v process.Value) string {
	n := FigureNumber(v)
	if v.Unit == "" {
		return n
	}
	return n + " " + v.Unit
}

// FigureAlso writes the value in the figure's further units, one string
// each: "301.13 °C", "2000.00 L/min".
func FigureAlso(v process.Value) []string {
	var out []string
	for _, a := range v.Also {
		if a.Offset != 0 {
			// A shifted scale (°C) reads best with fixed decimals.
			out = append(out, Fixed(v.SI*a.Scale+a.Offset, 2)+" "+a.Unit)
			continue
		}
		out = append(out, Number(v.SI*a.Scale, v.Digits)+" "+a.Unit)
	}
	return out
}

// WriteProcessText writes the readout of a process: what it assumes,
// what it was given, what it found, its tables, notes and cautions.
func WriteProcessText(w io.Writer, r *ProcessReport) error {
	res := r.Result
	if err := CheckProcessFinite(res); err != nil {
		return err
	}
	fmt.Fprintf(w, "%s  %s\n", process.Title(res.Kind()), model.Printable(r.Label))
	WriteWrapped(w, "  ", "  ", "Model: "+res.Assumptions()+".")
	fmt.Fprintln(w)
	figureSection(w, "Given", res.Inputs(), true)
	figureSection(w, "Result", res.Outputs(), false)
	for _, tb := range res.Tables() {
		WriteFigureTable(w, tb)
	}
	if st := res.Outlet(); st != nil {
		fmt.Fprintln(w, "Outlet")
		outletTable(w, st)
		fmt.Fprintln(w)
	}
	if notes := res.Notes(); len(notes) > 0 {
		fmt.Fprintln(w, "Notes")
		for _, n := range notes {
			WriteWrapped(w, "  ", "    ", n)
		}
		fmt.Fprintln(w)
	}
	WriteCautions(w, res.Cautions())
	return nil
}

// figureSection writes figures as label, number, unit; given values are
// written short, as a person would type them.
func figureSection(w io.Writer, title string, values []process.Value, given bool) {
	if len(values) == 0 {
		return
	}
	fmt.Fprintln(w, title)
	t := NewTable("  ", Left, Right, Left)
	for _, v := range values {
		n := FigureNumber(v)
		if given {
			n = Short(v.Display(), 7)
		}
		// A shifted unit (°C) goes in brackets on the line; other units
		// on lines of their own, aligned under the first.
		unit := v.Unit
		var more [][2]string
		for i, a := range v.Also {
			text := FigureAlso(v)[i]
			if a.Offset != 0 {
				unit += "  (" + text + ")"
				continue
			}
			num, u, _ := strings.Cut(text, " ")
			if given {
				num = Short(v.SI*a.Scale, 7)
			}
			more = append(more, [2]string{num, u})
		}
		t.Row(v.Label, n, unit)
		for _, m := range more {
			t.Row("", m[0], m[1])
		}
	}
	t.Write(w)
	fmt.Fprintln(w)
}

// WriteFigureTable writes a table of rows: its title, the figures'
// symbols and units as headings, a row label first when the rows have
// them, and only the Brief columns when the table names some.
func WriteFigureTable(w io.Writer, tb process.Table) {
	labelled := len(tb.RowLabels) == len(tb.Rows)
	if len(tb.Rows) == 0 || (len(tb.Rows) == 1 && !labelled) {
		return // one unlabelled row repeats the result above it
	}
	show := func(v process.Value) bool { return len(tb.Brief) == 0 || slices.Contains(tb.Brief, v.Key) }
	fmt.Fprintln(w, tb.Title)
	var aligns []Align
	var h1, h2 []string
	if labelled {
		aligns, h1, h2 = append(aligns, Left), append(h1, ""), append(h2, "")
	}
	for _, v := range tb.Rows[0] {
		if !show(v) {
			continue
		}
		aligns = append(aligns, Right)
		h1 = append(h1, v.Symbol)
		h2 = append(h2, v.Unit)
	}
	t := NewTable("  ", aligns...)
	t.Row(h1...)
	t.Row(h2...)
	for i, row := range tb.Rows {
		var cells []string
		if labelled {
			cells = append(cells, model.Printable(tb.RowLabels[i]))
		}
		for _, v := range row {
			if show(v) {
				cells = append(cells, FigureNumber(v))
			}
		}
		t.Row(cells...)
	}
	t.Write(w)
	fmt.Fprintln(w)
}

// outletTable writes the outlet's figures from the quantity table and
// its composition; the full readout is one `zmix state` away.
func outletTable(w io.Writer, st *mixtures.State) {
	t := NewTable("  ", Left, Right, Left)
	for i := range mixtures.Quantities {
		q := &mixtures.Quantities[i]
		switch q.Key {
		case "T":
			t.Row(q.Label, Short(st.TempK, 6), "K  ("+Fixed(mixtures.KelvinToCelsius(st.TempK), 2)+" °C)")
			continue
		case "P":
			t.Row(q.Label, PressureAuto(st.PresPa), "")
			continue
		case "P0":
			continue
		}
		t.Row(q.Label, Number(q.Get(st)*q.Scale, q.Digits), q.Unit)
	}
	t.Write(w)
	fmt.Fprintln(w)
	WriteComposition(w, st)
}

// WriteComposition writes each species' mole fraction and partial
// pressure in the state.
func WriteComposition(w io.Writer, st *mixtures.State) {
	x, _ := mixtures.SpeciesQuantityByKey("x")
	p, _ := mixtures.SpeciesQuantityByKey("p")
	sp := NewTable("  ", Left, Right, Right)
	sp.Row("", x.Label, p.Label)
	sp.Row("", x.Unit, p.Unit)
	for i := range st.Species {
		tm := &st.Species[i]
		sp.Row(model.Printable(tm.Species.Formula), Number(x.Get(tm)*x.Scale, x.Digits), Number(p.Get(tm)*p.Scale, p.Digits))
	}
	sp.Write(w)
}

// WriteProcessJSON writes a process as one JSON object: the kind, the
// assumptions and the label, then every given and found figure by its
// JSON name in SI units, the tables as lists of objects, the outlet's
// species and full state when there is one, the notes and the cautions.
func WriteProcessJSON(w io.Writer, r *ProcessReport) error {
	res := r.Result
	if err := CheckProcessFinite(res); err != nil {
		return err
	}
	var j jsonWriter
	j.buf = append(j.buf, "{\n"...)
	j.key("  ", "process")
	j.buf = appendJSONString(j.buf, res.Kind())
	j.buf = append(j.buf, ",\n"...)
	j.key("  ", "assumptions")
	j.buf = appendJSONString(j.buf, res.Assumptions())
	j.buf = append(j.buf, ",\n"...)
	j.key("  ", "label")
	j.buf = appendJSONString(j.buf, r.Label)
	for _, list := range [][]process.Value{res.Inputs(), res.Outputs()} {
		for _, v := range list {
			j.buf = append(j.buf, ",\n"...)
			j.value("  ", v)
		}
	}
	for _, tb := range res.Tables() {
		j.buf = append(j.buf, ",\n"...)
		j.key("  ", tb.Name)
		j.buf = append(j.buf, "["...)
		for i, row := range tb.Rows {
			if i > 0 {
				j.buf = append(j.buf, ',')
			}
			j.buf = append(j.buf, "\n    {\n"...)
			first := true
			if len(tb.RowLabels) == len(tb.Rows) {
				j.key("      ", tb.RowName)
				j.buf = appendJSONString(j.buf, tb.RowLabels[i])
				first = false
			}
			for _, v := range row {
				if !first {
					j.buf = append(j.buf, ",\n"...)
				}
				first = false
				j.value("      ", v)
			}
			j.buf = append(j.buf, "\n    }"...)
		}
		j.buf = append(j.buf, "\n  ]"...)
	}
	if st := res.Outlet(); st != nil {
		j.buf = append(j.buf, ",\n"...)
		j.species(st, "  ")
		j.buf = append(j.buf, ",\n"...)
		j.key("  ", "outlet")
		j.buf = append(j.buf, "{\n"...)
		j.stateFields(st, false, "    ")
		j.buf = append(j.buf, "\n  }"...)
	}
	j.buf = append(j.buf, ",\n"...)
	j.strings("  ", "notes", res.Notes())
	j.buf = append(j.buf, ",\n"...)
	j.strings("  ", "cautions", CautionLines(res.Cautions()))
	j.buf = append(j.buf, "\n}\n"...)
	_, err := w.Write(j.buf)
	return err
}

// value appends one figure as a member, a count as a JSON integer.
func (j *jsonWriter) value(indent string, v process.Value) {
	j.key(indent, v.Name)
	if v.Integer {
		j.buf = strconv.AppendInt(j.buf, int64(v.SI), 10)
		return
	}
	j.float(v.SI)
}
