package mixtures

import "context"

// SweepColumn names one figure a SweepTable keeps at every point: a row
// of the quantity table for the blend, or a species quantity of one
// component.
type SweepColumn struct {
	Quantity  *Quantity        // a blend figure; nil for a species figure
	Species   *SpeciesQuantity // a species figure; nil for a blend figure
	Component int              // the component's index, for a species figure
}

// BlendColumn is the column of the blend quantity with the key (see
// Quantities); ok is false for an unknown key.
func BlendColumn(key string) (col SweepColumn, ok bool) {
	q, ok := QuantityByKey(key)
	return SweepColumn{Quantity: q}, ok
}

// SpeciesColumns are the columns of the species quantity with the key
// (see SpeciesQuantities), one per component of m, in order.
func SpeciesColumns(key string, m *Mixture) ([]SweepColumn, bool) {
	q, ok := SpeciesQuantityByKey(key)
	if !ok {
		return nil, false
	}
	cols := make([]SweepColumn, len(m.Components))
	for j := range cols {
		cols[j] = SweepColumn{Species: q, Component: j}
	}
	return cols, true
}

func (c SweepColumn) value(s *State) float64 {
	if c.Quantity != nil {
		return c.Quantity.Get(s)
	}
	return c.Species.Get(&s.Species[c.Component])
}

// SweepTable is a compact sweep result: the grid and, for each chosen
// column, one float64 per point, in one pointer-free block. A sweep of
// 200 000 points keeps 1.6 MB per column and nothing else, where full
// states would take about 300 B per species per point. Fill it with
// Mixture.Tabulate, or point by point with Record as Stream's PointFunc.
type SweepTable struct {
	Sweep   Sweep
	Grid    []float64
	Columns []SweepColumn
	data    []float64 // column c holds data[c*n : (c+1)*n]
}

// NewSweepTable makes an empty table for the sweep and the columns.
func NewSweepTable(sw Sweep, cols []SweepColumn) *SweepTable {
	n := sw.Steps
	return &SweepTable{Sweep: sw, Grid: make([]float64, n), Columns: cols, data: make([]float64, n*len(cols))}
}

// Reuse returns an empty table for the sweep and the columns that takes
// over t's storage where it is large enough, so that a long sweep run
// again does not hold two tables at once. t must not be used afterwards.
func (t *SweepTable) Reuse(sw Sweep, cols []SweepColumn) *SweepTable {
	n := sw.Steps
	if t == nil || cap(t.Grid) < n || cap(t.data) < n*len(cols) {
		return NewSweepTable(sw, cols)
	}
	r := &SweepTable{Sweep: sw, Grid: t.Grid[:n], Columns: cols, data: t.data[:n*len(cols)]}
	*t = SweepTable{}
	return r
}

// Len is the number of points.
func (t *SweepTable) Len() int { return len(t.Grid) }

// Column returns the values of column c, one per point. The slice is the
// table's own storage.
func (t *SweepTable) Column(c int) []float64 {
	n := len(t.Grid)
	return t.data[c*n : (c+1)*n : (c+1)*n]
}

// Blend returns the values of the blend quantity with the key, or nil if
// the table does not keep it.
func (t *SweepTable) Blend(key string) []float64 {
	for c, col := range t.Columns {
		if col.Quantity != nil && col.Quantity.Key == key {
			return t.Column(c)
		}
	}
	return nil
}

// Species returns the values of the species quantity with the key for
// component j, or nil if the table does not keep it.
func (t *SweepTable) Species(key string, j int) []float64 {
	for c, col := range t.Columns {
		if col.Species != nil && col.Species.Key == key && col.Component == j {
			return t.Column(c)
		}
	}
	return nil
}

// Record keeps point i of a sweep: its grid value and the table's
// columns of s. Its signature is a PointFunc, to pass to Stream.
func (t *SweepTable) Record(i int, x float64, s *State) error {
	n := len(t.Grid)
	t.Grid[i] = x
	for c, col := range t.Columns {
		t.data[c*n+i] = col.value(s)
	}
	return nil
}

// Clone returns a copy of the table with storage of its own.
func (t *SweepTable) Clone() *SweepTable {
	c := *t
	c.Grid = append([]float64(nil), t.Grid...)
	c.Columns = append([]SweepColumn(nil), t.Columns...)
	c.data = append([]float64(nil), t.data...)
	return &c
}

// Tabulate computes the sweep as Stream does and keeps the columns of
// every point in a SweepTable.
func (m *Mixture) Tabulate(ctx context.Context, sw Sweep, fixedTempK, fixedPresPa float64, opts Options, cols []SweepColumn) (*SweepTable, error) {
	if err := m.CheckSweep(sw, fixedTempK, fixedPresPa); err != nil {
		return nil, err
	}
	t := NewSweepTable(sw, cols)
	if err := m.StreamSpan(ctx, sw, 0, sw.Steps, fixedTempK, fixedPresPa, opts, nil, t.Record); err != nil {
		return nil, err
	}
	return t, nil
}
