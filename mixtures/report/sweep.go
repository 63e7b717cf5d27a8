package report

import (
	"bufio"
	"bytes"
	"context"
	"encoding/csv"
	"fmt"
	"io"
	"strings"

	"zmix/mixtures"
	"zmix/model"
)

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

// sweepColumn is one column of the sweep's text table: a figure of the
// state and how it is written.
type sweepColumn struct {
	name, unit string
	value      func(s *mixtures.State) float64
	format     func(x float64) string
	// exact columns are measured cell by cell; the others' widths grow
	// with |x| away from 1 either way, so the extremes of |x| bound them.
	exact bool
}

func (c *sweepColumn) cell(s *mixtures.State) string { return c.format(c.value(s)) }

// sweepTextKeys are the blend figures of the text table, in order; each
// species' μ follows them.
var sweepTextKeys = []string{"T", "P", "rho", "Z", "Cp", "gamma", "c", "H", "S", "G"}

func sweepColumns(mix *mixtures.Mixture) []sweepColumn {
	var cols []sweepColumn
	for _, key := range sweepTextKeys {
		q, _ := mixtures.QuantityByKey(key)
		switch key {
		case "T": // the grid's own values, as short as they are
			cols = append(cols, sweepColumn{name: q.Symbol, unit: q.Unit, exact: true,
				value:  func(s *mixtures.State) float64 { return s.TempK },
				format: func(x float64) string { return Short(x, 6) }})
		case "P": // bar reads better in a table than Pa
			cols = append(cols, sweepColumn{name: q.Symbol, unit: "bar",
				value:  func(s *mixtures.State) float64 { return s.PresPa / 1e5 },
				format: func(x float64) string { return Sig(x, 5) }})
		default:
			cols = append(cols, sweepColumn{name: q.Symbol, unit: q.Unit,
				value:  func(s *mixtures.State) float64 { return q.Get(s) * q.Scale },
				format: func(x float64) string { return Number(x, q.Digits) }})
		}
	}
	mu, _ := mixtures.SpeciesQuantityByKey("mu")
	for j, c := range mix.Components {
		cols = append(cols, sweepColumn{name: mu.Label + " " + model.Printable(c.Species.Formula), unit: mu.Unit,
			value:  func(s *mixtures.State) float64 { return mu.Get(&s.Species[j]) * mu.Scale },
			format: func(x float64) string { return Number(x, mu.Digits) }})
	}
	return cols
}

// columnRange is what the first pass keeps of a column: the smallest and
// largest |x| among its positive and among its negative values, and the
// widest cell of an exact column.
type columnRange struct {
	pos, neg [2]float64 // min and max |x|; max < 0 when none seen
	seen     [2]bool
	nan      bool
	width    int
}

func (r *columnRange) add(x float64) {
	switch {
	case x != x:
		r.nan = true
		return
	case x < 0:
		r.neg = extend(r.neg, -x, r.seen[1])
		r.seen[1] = true
	default:
		r.pos = extend(r.pos, x, r.seen[0])
		r.seen[0] = true
	}
}

func extend(mm [2]float64, a float64, seen bool) [2]float64 {
	if !seen {
		return [2]float64{a, a}
	}
	return [2]float64{min(mm[0], a), max(mm[1], a)}
}

// widest is the widest cell the kept extremes give.
func (r *columnRange) widest(format func(float64) string) int {
	w := 0
	if r.nan {
		w = len(NotANumber)
	}
	for _, a := range []float64{r.pos[0], r.pos[1]} {
		if r.seen[0] {
			w = max(w, len(format(a)))
		}
	}
	for _, a := range []float64{r.neg[0], r.neg[1]} {
		if r.seen[1] {
			w = max(w, len(format(-a)))
		}
	}
	return w
}

// WriteSweepText writes the sweep as an aligned table with its header,
// the validity notes at the two end points and the cautions. It computes
// the sweep twice: once to measure the columns, once to write them, so
// that memory does not grow with the number of points.
func WriteSweepText(w io.Writer, r *SweepReport, src *SweepSource) error {
	ctx := context.Background()
	cols := sweepColumns(r.Mix)
	widths := make([]int, len(cols))
	for k, c := range cols {
		widths[k] = max(Width(ForWriter(w, c.name)), Width(ForWriter(w, c.unit)))
	}
	// The first pass writes no cell: it keeps each column's extremes of
	// |x|, by sign, and measures those (and the exact columns' cells).
	err := inChunks(ctx, src, func(from, to int, s *mixtures.State) ([]columnRange, error) {
		rs := make([]columnRange, len(cols))
		err := src.span(ctx, from, to, s, func(i int, s *mixtures.State) error {
			if err := CheckFinite(s); err != nil {
				return model.Errorf("report", "at point %d of the sweep: %w", i+1, err)
			}
			for k := range cols {
				c := &cols[k]
				if c.exact {
					rs[k].width = max(rs[k].width, len(c.cell(s)))
				} else {
					rs[k].add(c.value(s))
				}
			}
			return nil
		})
		return rs, err
	}, func(rs []columnRange) error {
		for k := range widths {
			widths[k] = max(widths[k], rs[k].width, rs[k].widest(cols[k].format))
		}
		return nil
	})
	if err != nil {
		return err
	}

	bw := bufio.NewWriterSize(w, 64<<10)
	out := io.Writer(bw)
	if IsASCIIWriter(w) {
		out = &ASCIIWriter{W: bw}
	}
	writeSweepHeader(out, r)
	row := func(b []byte, cells func(k int) string) []byte {
		b = append(b, "  "...)
		start := len(b)
		for k := range cols {
			if k > 0 {
				b = append(b, "  "...)
			}
			c := ForWriter(out, cells(k))
			for range max(widths[k]-Width(c), 0) {
				b = append(b, ' ')
			}
			b = append(b, c...)
		}
		for len(b) > start && b[len(b)-1] == ' ' {
			b = b[:len(b)-1]
		}
		return append(b, '\n')
	}
	out.Write(row(nil, func(k int) string { return cols[k].name }))
	out.Write(row(nil, func(k int) string { return cols[k].unit }))
	err = writeRows(ctx, out, src, func(b []byte, _ int, s *mixtures.State) []byte {
		return row(b, func(k int) string { return cols[k].cell(s) })
	})
	if err != nil {
		return err
	}
	fmt.Fprintln(out)

	// Validity is worst at one end or the other of a monotone sweep.
	fmt.Fprintln(out, "Validity at the end points")
	noted := false
	var end mixtures.State
	for _, i := range []int{0, src.Sweep.Steps - 1} {
		if err := src.span(ctx, i, i+1, &end, func(int, *mixtures.State) error { return nil }); err != nil {
			return err
		}
		for _, note := range mixtures.Notes(&end, false) {
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

// writeRows computes the sweep in chunks on every core, appends each
// point's row with appendRow, and writes the chunks to w in grid order.
// A non-finite figure stops the sweep with an error naming the point.
func writeRows(ctx context.Context, w io.Writer, src *SweepSource, appendRow func(b []byte, i int, s *mixtures.State) []byte) error {
	return inChunks(ctx, src, func(from, to int, s *mixtures.State) ([]byte, error) {
		b := getChunkBuf()
		err := src.span(ctx, from, to, s, func(i int, s *mixtures.State) error {
			if err := CheckFinite(s); err != nil {
				return model.Errorf("report", "at point %d of the sweep: %w", i+1, err)
			}
			b = appendRow(b, i, s)
			return nil
		})
		return b, err
	}, func(b []byte) error {
		_, err := w.Write(b)
		putChunkBuf(b)
		return err
	})
}

// WriteSweepCSV streams the sweep as CSV: one header row, then a row per
// point, with the same columns as a state's CSV. Rows are formatted on
// every core and written in grid order as they are done.
func WriteSweepCSV(w io.Writer, gauge bool, src *SweepSource) error {
	bw := bufio.NewWriterSize(w, 64<<10)
	err := writeRows(context.Background(), bw, src, func(b []byte, i int, s *mixtures.State) []byte {
		if i == 0 {
			// The header may need quoting (a user's species name).
			var hb bytes.Buffer
			cw := csv.NewWriter(&hb)
			cw.Write(CSVHeader(nil, s))
			cw.Flush()
			b = append(b, hb.Bytes()...)
		}
		return appendCSVRow(b, s, gauge)
	})
	if err != nil {
		return err
	}
	return bw.Flush()
}

// WriteSweepJSON streams the sweep as a JSON list of state objects, one
// per point and one a line, formatted on every core and written in grid
// order.
func WriteSweepJSON(w io.Writer, gauge bool, src *SweepSource) error {
	bw := bufio.NewWriterSize(w, 64<<10)
	bw.WriteString("[")
	err := writeRows(context.Background(), bw, src, func(b []byte, i int, s *mixtures.State) []byte {
		j := jsonWriter{buf: b, compact: true}
		if i > 0 {
			j.buf = append(j.buf, ',')
		}
		j.buf = append(j.buf, "\n{"...)
		j.stateFields(s, gauge, "")
		j.buf = append(j.buf, '}')
		return j.buf
	})
	if err != nil {
		return err
	}
	bw.WriteString("\n]\n")
	return bw.Flush()
}
