package report

import (
	"encoding/csv"
	"fmt"
	"io"

	"zmix/mixtures"
	"zmix/model"
)

// StateReport is one computed state with what is shown beside it. The
// commands and the workbench's export build one and hand it to the same
// writers, so that a file exported from the workbench holds what the
// command prints.
type StateReport struct {
	Label    string // how the blend is named: its text, or file and name
	State    *mixtures.State
	PresText string // the total pressure as typed; "" for a sum of partial pressures
	Gauge    bool   // the pressure was typed as gauge
	Cautions []mixtures.Caution
	Notes    []mixtures.StateNote
	// Anatomy, when not nil, is each species taken apart (see
	// SpeciesAnatomy), written after the species.
	Anatomy []SpeciesAnatomy
}

// CheckFinite refuses a state with a non-finite figure, naming it, so
// that no output ever shows NaN.
func CheckFinite(s *mixtures.State) error {
	if what := mixtures.FirstNonFinite(s); what != "" {
		return NonFiniteError(what)
	}
	return nil
}

// NonFiniteError is the error for a figure the model cannot give.
func NonFiniteError(what string) error {
	return model.Errorf("report", "the model gives a non-finite %s at this state; it lies outside what zmix can compute (try a temperature and pressure nearer everyday conditions)", what)
}

// NoteText is one validity note as a line.
func NoteText(n mixtures.StateNote) string {
	if n.Species == "" {
		return n.Severity.String() + ": " + n.Text
	}
	return n.Severity.String() + ": " + model.Printable(n.Species) + ": " + n.Text
}

// CautionLines are the cautions as lines, the line deferring to site
// practice last; none when there are no cautions.
func CautionLines(cautions []mixtures.Caution) []string {
	if len(cautions) == 0 {
		return nil
	}
	out := make([]string, 0, len(cautions)+1)
	for _, c := range cautions {
		out = append(out, mixtures.FormatCaution(c))
	}
	return append(out, mixtures.DeferLine)
}

// WriteStateText writes the full readout.
func WriteStateText(w io.Writer, r *StateReport) error {
	st := r.State
	if err := CheckFinite(st); err != nil {
		return err
	}
	fmt.Fprintf(w, "Blend  %s\n\n", model.Printable(r.Label))

	fmt.Fprintln(w, "Conditions")
	cond := NewTable("  ", Left, Left)
	for i := range mixtures.Quantities {
		q := &mixtures.Quantities[i]
		if q.Section != mixtures.SectionConditions {
			continue
		}
		switch q.Key {
		case "T":
			cond.Row(q.Label, Temperature(st.TempK))
		case "P":
			cond.Row(q.Label, PressureTyped(r.PresText, r.Gauge, st.PresPa))
		case "P0":
			cond.Row(q.Label, StdPressure(st.StdPresPa)+", for μ°")
		}
	}
	cond.Write(w)
	fmt.Fprintln(w)

	fmt.Fprintln(w, "Mixture")
	props := NewTable("  ", Left, Right, Left, Right, Left)
	props.Row("", "per mole", "", "per kilogram", "")
	var smix *mixtures.Quantity
	for i := range mixtures.Quantities {
		q := &mixtures.Quantities[i]
		if q.Section != mixtures.SectionMixture {
			continue
		}
		if q.Key == "Smix" {
			smix = q // a line of its own, with its formula
			continue
		}
		v := q.Get(st)
		cells := []string{q.Label, Number(v*q.Scale, q.Digits), q.Unit}
		if q.HasPerKg() {
			cells = append(cells, Number(q.PerKg(st)*q.Scale, q.Digits), q.PerKgUnit)
		}
		props.Row(cells...)
	}
	props.Write(w)
	if smix != nil {
		fmt.Fprintf(w, "  %s  %s %s  (−R Σ xᵢ ln xᵢ, included in S)\n\n", smix.Label, Number(smix.Get(st)*smix.Scale, smix.Digits), smix.Unit)
	}
	writeRealGasText(w, st)

	fmt.Fprintln(w, "Species, each at its partial pressure")
	var cols []*mixtures.SpeciesQuantity
	for i := range mixtures.SpeciesQuantities {
		if q := &mixtures.SpeciesQuantities[i]; !q.TextHidden {
			cols = append(cols, q)
		}
	}
	aligns := []Align{Left}
	head1, head2 := []string{""}, []string{""}
	for _, q := range cols {
		aligns = append(aligns, Right)
		head1 = append(head1, q.Label)
		head2 = append(head2, q.Unit)
	}
	sp := NewTable("  ", aligns...)
	sp.Row(head1...)
	sp.Row(head2...)
	for j := range st.Species {
		t := &st.Species[j]
		cells := []string{model.Printable(t.Species.Formula)}
		for _, q := range cols {
			v := q.Get(t)
			if q.ShareOf != "" {
				whole, _ := mixtures.QuantityByKey(q.ShareOf)
				cells = append(cells, Percent(v, whole.Get(st)))
				continue
			}
			cells = append(cells, Number(v*q.Scale, q.Digits))
		}
		sp.Row(cells...)
	}
	sp.Write(w)
	fmt.Fprintf(w, "  μᵢ = μᵢ°(T) + RT ln(xᵢP/P°), on the scale of the elements at 0 K\n\n")
	if r.Anatomy != nil {
		writeAnatomyText(w, r.Anatomy)
	}

	WriteNotes(w, r.Notes)
	fmt.Fprintln(w)
	WriteCautions(w, r.Cautions)
	return nil
}

// WriteNotes writes the validity section.
func WriteNotes(w io.Writer, notes []mixtures.StateNote) {
	fmt.Fprintln(w, "Validity")
	if len(notes) == 0 {
		fmt.Fprintln(w, "  no cautions from the model at this state (--all-notes lists n/nQ, T/Θrot and T/Θvib per species)")
		return
	}
	for _, note := range notes {
		WriteWrapped(w, "  ", "    ", NoteText(note))
	}
}

// WriteCautions writes the cautions section, always ending with the line
// that defers to site practice.
func WriteCautions(w io.Writer, cautions []mixtures.Caution) {
	fmt.Fprintln(w, "Cautions")
	if len(cautions) == 0 {
		fmt.Fprintln(w, "  none flagged for these gases at this pressure.")
	}
	for _, c := range cautions {
		WriteWrapped(w, "  ", "    ", mixtures.FormatCaution(c))
	}
	WriteWrapped(w, "  ", "  ", mixtures.DeferLine)
}

// WriteStateJSON writes one state as a JSON object: the figures in the
// quantity table's order (the per-kilogram forms after the molar ones),
// the species, then the cautions and validity notes as lines.
func WriteStateJSON(w io.Writer, r *StateReport) error {
	if err := CheckFinite(r.State); err != nil {
		return err
	}
	var j jsonWriter
	j.buf = append(j.buf, "{\n"...)
	j.stateFields(r.State, r.Gauge, "  ")
	j.buf = append(j.buf, ",\n"...)
	j.realGas(r.State, "  ")
	if r.Anatomy != nil {
		j.buf = append(j.buf, ",\n"...)
		var err error
		if j.buf, err = appendAnatomyJSON(j.buf, r.Anatomy, "  "); err != nil {
			return err
		}
	}
	// The lists are left out when empty, as a reader of the file expects
	// of an optional section.
	if lines := CautionLines(r.Cautions); len(lines) > 0 {
		j.buf = append(j.buf, ",\n"...)
		j.strings("  ", "cautions", lines)
	}
	if len(r.Notes) > 0 {
		notes := make([]string, len(r.Notes))
		for i, n := range r.Notes {
			notes[i] = NoteText(n)
		}
		j.buf = append(j.buf, ",\n"...)
		j.strings("  ", "notes", notes)
	}
	j.buf = append(j.buf, "\n}\n"...)
	_, err := w.Write(j.buf)
	return err
}

// WriteStateCSV writes one state as CSV: a header row and one row, in the
// same order as the JSON keys.
func WriteStateCSV(w io.Writer, r *StateReport) error {
	if err := CheckFinite(r.State); err != nil {
		return err
	}
	cw := csv.NewWriter(w)
	row := make([]string, 0, 64)
	if err := cw.Write(anatomyCSVHeader(CSVHeader(row, r.State), r.Anatomy)); err != nil {
		return err
	}
	if err := cw.Write(anatomyCSVRow(CSVRow(row[:0], r.State, r.Gauge), r.Anatomy)); err != nil {
		return err
	}
	cw.Flush()
	return cw.Error()
}
