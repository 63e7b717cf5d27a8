package report

import (
	"bufio"
	"encoding/csv"
	"fmt"
	"io"
	"strings"

	"zmix/mixtures"
	"zmix/model"
)

// Points runs a sweep and hands each point to yield in grid order. The
// state is reused between calls: yield must copy what it keeps. A sweep's
// writers take one, so that rows are written as they are computed and
// memory stays flat however many points there are.
type Points func(yield func(i int, s *mixtures.State) error) error

// SweepReport describes a sweep for its text header and footer.
type SweepReport struct {
	Label     string
	Mix       *mixtures.Mixture
	Sweep     mixtures.Sweep
	RangeText string // the range as typed
	// RangeGauge says a pressure range was typed as gauge; FixedPresText
	// and FixedGauge describe the fixed pressure of a temperature sweep.
	RangeGauge    bool
	FixedTempK    float64
	FixedPresText string
	FixedGauge    bool
	FixedPresPa   float64
	StdPresPa     float64
	Cautions      []mixtures.Caution
}

// Gauge says whether the sweep's pressures were entered as gauge.
func (r *SweepReport) Gauge() bool {
	if r.Sweep.Var == mixtures.SweepPressure {
		return r.RangeGauge
	}
	return r.FixedGauge
}

// sweepColumn is one column of the sweep's text table.
type sweepColumn struct {
	name, unit string
	cell       func(s *mixtures.State) string
}

// sweepTextKeys are the blend figures of the text table, in order; each
// species' μ follows them.
var sweepTextKeys = []string{"T", "P", "rho", "Z", "Cp", "gamma", "c", "H", "S", "G"}

func sweepColumns(mix *mixtures.Mixture) []sweepColumn {
	var cols []sweepColumn
	for _, key := range sweepTextKeys {
		q, _ := mixtures.QuantityByKey(key)
		switch key {
		case "T": // the grid's own values, as short as they are
			cols = append(cols, sweepColumn{q.Symbol, q.Unit, func(s *mixtures.State) string { return Short(s.TempK, 6) }})
		case "P": // bar reads better in a table than Pa
			cols = append(cols, sweepColumn{q.Symbol, "bar", func(s *mixtures.State) string { return Sig(s.PresPa/1e5, 5) }})
		default:
			cols = append(cols, sweepColumn{q.Symbol, q.Unit, func(s *mixtures.State) string { return Number(q.Get(s)*q.Scale, q.Digits) }})
		}
	}
	mu, _ := mixtures.SpeciesQuantityByKey("mu")
	for j, c := range mix.Components {
		cols = append(cols, sweepColumn{mu.Label + " " + model.Printable(c.Species.Formula), mu.Unit, func(s *mixtures.State) string {
			return Number(mu.Get(&s.Species[j])*mu.Scale, mu.Digits)
		}})
	}
	return cols
}

// copyState copies s into dst with its own species terms.
func copyState(dst, s *mixtures.State) {
	species := append(dst.Species[:0], s.Species...)
	*dst = *s
	dst.Species = species
}

// WriteSweepText writes the sweep as an aligned table with its header,
// the validity notes at the two end points and the cautions. It runs the
// sweep twice: once to measure the columns, once to write them, so that
// memory does not grow with the number of points.
func WriteSweepText(w io.Writer, r *SweepReport, points Points) error {
	cols := sweepColumns(r.Mix)
	widths := make([]int, len(cols))
	for k, c := range cols {
		widths[k] = max(Width(ForWriter(w, c.name)), Width(ForWriter(w, c.unit)))
	}
	var first, last mixtures.State
	n := 0
	err := points(func(i int, s *mixtures.State) error {
		if err := CheckFinite(s); err != nil {
			return model.Errorf("report", "at point %d of the sweep: %w", i+1, err)
		}
		for k, c := range cols {
			widths[k] = max(widths[k], len(c.cell(s)))
		}
		if i == 0 {
			copyState(&first, s)
		}
		copyState(&last, s)
		n++
		return nil
	})
	if err != nil {
		return err
	}

	bw := bufio.NewWriter(w)
	out := io.Writer(bw)
	if IsASCIIWriter(w) {
		out = &ASCIIWriter{W: bw}
	}
	writeSweepHeader(out, r)
	var line strings.Builder
	row := func(cells func(k int) string) {
		line.Reset()
		line.WriteString("  ")
		for k := range cols {
			if k > 0 {
				line.WriteString("  ")
			}
			c := ForWriter(out, cells(k))
			line.WriteString(strings.Repeat(" ", max(widths[k]-Width(c), 0)))
			line.WriteString(c)
		}
		fmt.Fprintln(out, strings.TrimRight(line.String(), " "))
	}
	row(func(k int) string { return cols[k].name })
	row(func(k int) string { return cols[k].unit })
	err = points(func(i int, s *mixtures.State) error {
		row(func(k int) string { return cols[k].cell(s) })
		return nil
	})
	if err != nil {
		return err
	}
	fmt.Fprintln(out)

	// Validity is worst at one end or the other of a monotone sweep.
	fmt.Fprintln(out, "Validity at the end points")
	noted := false
	ends := []*mixtures.State{&first, &last}
	if n < 2 {
		ends = ends[:1]
	}
	for _, end := range ends {
		for _, note := range mixtures.Notes(end, false) {
			WriteWrapped(out, "  ", "    ", fmt.Sprintf("at %s K, %s bar: %s", Short(end.TempK, 6), Short(end.PresPa/1e5, 6), NoteText(note)))
			noted = true
		}
	}
	if !noted {
		fmt.Fprintln(out, "  no cautions from the model at either end of the sweep")
	}
	fmt.Fprintln(out)
	WriteCautions(out, r.Cautions)
	return bw.Flush()
}

func writeSweepHeader(w io.Writer, r *SweepReport) {
	fmt.Fprintf(w, "Blend  %s\n", model.Printable(r.Label))
	m, _ := mixtures.QuantityByKey("M")
	fmt.Fprintf(w, "       M = %s %s\n", Number(r.Mix.MolarMassKgPerMol*m.Scale, m.Digits), m.Unit)
	grid := "linear grid"
	if r.Sweep.Log || r.Sweep.Var == mixtures.SweepPressure {
		grid = "log grid"
	}
	typed := model.Printable(strings.TrimSpace(r.RangeText))
	if r.Sweep.Var == mixtures.SweepTemperature {
		fmt.Fprintf(w, "Sweep  T %s (%s to %s K), %d points, %s; P = %s\n",
			typed, Short(r.Sweep.From, 6), Short(r.Sweep.To, 6),
			r.Sweep.Steps, grid, PressureTyped(r.FixedPresText, r.FixedGauge, r.FixedPresPa))
	} else {
		kind := "absolute"
		if r.RangeGauge {
			kind = "entered as gauge"
		}
		fmt.Fprintf(w, "Sweep  P %s (%s to %s bar %s), %d points, %s; T = %s K\n",
			typed, Short(r.Sweep.From/1e5, 6), Short(r.Sweep.To/1e5, 6), kind,
			r.Sweep.Steps, grid, Short(r.FixedTempK, 6))
	}
	fmt.Fprintf(w, "       P° = %s; μ = μ°(T) + RT ln(xP/P°), on the scale of the elements at 0 K\n\n", StdPressure(r.StdPresPa))
}

// WriteSweepCSV streams the sweep as CSV: one header row, then a row per
// point as it is computed, with the same columns as a state's CSV.
func WriteSweepCSV(w io.Writer, gauge bool, points Points) error {
	bw := bufio.NewWriterSize(w, 64<<10)
	var line []byte
	err := points(func(i int, s *mixtures.State) error {
		if err := CheckFinite(s); err != nil {
			return model.Errorf("report", "at point %d of the sweep: %w", i+1, err)
		}
		if i == 0 {
			// The header may need quoting (a user's species name).
			cw := csv.NewWriter(bw)
			if err := cw.Write(CSVHeader(nil, s)); err != nil {
				return err
			}
			cw.Flush()
		}
		line = appendCSVRow(line[:0], s, gauge)
		_, err := bw.Write(line)
		return err
	})
	if err != nil {
		return err
	}
	return bw.Flush()
}

// WriteSweepJSON streams the sweep as a JSON list of state objects, one
// per point as it is computed.
func WriteSweepJSON(w io.Writer, gauge bool, points Points) error {
	bw := bufio.NewWriterSize(w, 64<<10)
	var j jsonWriter
	bw.WriteString("[")
	err := points(func(i int, s *mixtures.State) error {
		if err := CheckFinite(s); err != nil {
			return model.Errorf("report", "at point %d of the sweep: %w", i+1, err)
		}
		j.buf = j.buf[:0]
		if i > 0 {
			j.buf = append(j.buf, ',')
		}
		j.buf = append(j.buf, "\n  {\n"...)
		j.stateFields(s, gauge, "    ")
		j.buf = append(j.buf, "\n  }"...)
		_, err := bw.Write(j.buf)
		return err
	})
	if err != nil {
		return err
	}
	bw.WriteString("\n]\n")
	return bw.Flush()
}
