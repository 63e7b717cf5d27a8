package ui

import (
	"math"
	"strings"
	"unicode/utf8"

	"github.com/NimbleMarkets/ntcharts/canvas"
	"github.com/NimbleMarkets/ntcharts/canvas/graph"
	"github.com/NimbleMarkets/ntcharts/canvas/runes"
)

// The plot draws one to nine curves over a sweep grid on an ntcharts
// canvas. Curves are told apart without colour: the first is a line
// (braille dots, or slope characters in ASCII mode) and each further one
// is drawn with its own ASCII marker. All drawing happens when the data or
// the size changes; moving the cursor only re-renders the rows.

// plotMarkers are the runes of the second and later curves.
var plotMarkers = [...]rune{'*', 'o', '+', 'x', '#', '%', '@', '&'}

// plotMaxSeries is how many curves one plot can tell apart.
const plotMaxSeries = 1 + len(plotMarkers)

// plotMinRows and plotMinCols are the smallest plotting area drawn.
const (
	plotMinRows = 3
	plotMinCols = 12
)

// plotSeries is one curve: its legend name and its value, in display
// units, at grid index i.
type plotSeries struct {
	name string
	y    func(i int) float64
}

// plotSpec is what the plot shows.
type plotSpec struct {
	grid []float64 // the swept variable in data units (K, Pa), monotone
	// xDisplay converts a grid value to the axis unit (Pa to psig), and
	// xData back; nil for the identity. Both must increase together.
	xDisplay, xData func(float64) float64
	xLog            bool
	xLabel          string
	yLabel          string
	series          []plotSeries
}

// plotSample is the legend's picture of curve k.
func plotSample(k int, ascii bool) string {
	if k == 0 {
		if ascii {
			return "-/"
		}
		return "⠒⠒"
	}
	m := string(plotMarkers[(k-1)%len(plotMarkers)])
	return m + m
}

// Cell classes: which style a canvas cell is drawn in.
const (
	plotClsNone uint8 = iota
	plotClsAxis
	plotClsTick
	plotClsCursor
	plotClsSeries // series k is plotClsSeries + k
)

// plotGlyphs are the runes of the frame.
type plotGlyphs struct {
	vert, horiz, corner, yTick, xTick, cursor, cursorFoot rune
}

var (
	plotGlyphsUnicode = plotGlyphs{runes.LineVertical, runes.LineHorizontal, runes.LineUpRight, runes.LineVerticalLeft, runes.LineHorizontalDown, '┊', '^'}
	plotGlyphsASCII   = plotGlyphs{'|', '-', '+', '+', '+', ':', '^'}
)

// plotAxis maps a data value to its fraction of the axis length.
type plotAxis struct {
	lo, hi float64 // data units, lo < hi
	log    bool
	t0, dt float64 // the transformed lo and hi-lo
}

func newPlotAxis(lo, hi float64, log bool) plotAxis {
	a := plotAxis{lo: lo, hi: hi, log: log}
	a.t0, a.dt = lo, hi-lo
	if log {
		a.t0, a.dt = math.Log10(lo), math.Log10(hi)-math.Log10(lo)
	}
	return a
}

func (a plotAxis) frac(v float64) float64 {
	if a.log {
		v = math.Log10(v)
	}
	return (v - a.t0) / a.dt
}

// plotTick is a tick at a cell offset along an axis.
type plotTick struct {
	pos   int
	label string
}

// plotColumn is the envelope of one curve over one column of the plot: y
// as fractions of the y axis, first and last in x order.
type plotColumn struct {
	first, last, lo, hi float64
	ok                  bool // the column holds finite points
	brk                 bool // a non-finite point lies between this column and the previous one
}

// plotStyle is the escape sequences around a run of cells of one class.
type plotStyle struct{ open, close string }

// plotModel draws a plotSpec into a w×h block: the y-axis label line,
// the plotting area, the x axis and its tick labels.
type plotModel struct {
	ascii  bool
	styles *Styles
	wraps  []plotStyle

	spec plotSpec
	// From the data alone.
	yMin, yMax float64
	hasData    bool

	// From the size.
	w, h         int
	ok           bool // the size leaves room to plot
	margin       int  // the y axis column
	plotW, plotH int  // plotting area in cells
	sub          int  // x sub-columns per cell for the line curve
	xAxis, yAxis plotAxis
	col          []int32 // grid index → sub-column
	cells        []rune  // the drawn chart below the label line, (plotH+2)×w
	cls          []uint8

	covered []int // by curve: the curve drawn over it, or -1

	cursor int // grid index, or -1
	lines  []string
}

func newPlotModel(styles *Styles, ascii bool) *plotModel {
	pl := &plotModel{styles: styles, ascii: ascii, cursor: -1}
	pl.wraps = make([]plotStyle, int(plotClsSeries)+plotMaxSeries)
	if styles != nil {
		pl.wraps[plotClsAxis] = plotWrap(styles.PlotAxis.Render)
		pl.wraps[plotClsTick] = plotWrap(styles.Muted.Render)
		pl.wraps[plotClsCursor] = plotWrap(styles.PlotCursor.Render)
		for k := 0; k < plotMaxSeries; k++ {
			pl.wraps[int(plotClsSeries)+k] = plotWrap(styles.Series[k%len(styles.Series)].Render)
		}
	}
	return pl
}

// plotWrap learns a style's escape sequences once, so that rows are built
// by concatenation rather than a Render call per cell.
func plotWrap(render func(...string) string) plotStyle {
	s := render("X")
	i := strings.IndexByte(s, 'X')
	if i < 0 {
		return plotStyle{}
	}
	return plotStyle{open: s[:i], close: s[i+1:]}
}

func (pl *plotModel) glyphs() plotGlyphs {
	if pl.ascii {
		return plotGlyphsASCII
	}
	return plotGlyphsUnicode
}

// setSpec takes new data and redraws. It scans every value once, for
// the y range.
func (pl *plotModel) setSpec(spec plotSpec) {
	if len(spec.series) > plotMaxSeries {
		spec.series = spec.series[:plotMaxSeries]
	}
	if spec.xDisplay == nil || spec.xData == nil {
		spec.xDisplay, spec.xData = plotIdentity, plotIdentity
	}
	pl.spec = spec
	pl.yMin, pl.yMax = math.Inf(1), math.Inf(-1)
	n := len(spec.grid)
	for _, s := range spec.series {
		for i := 0; i < n; i++ {
			v := s.y(i)
			if math.IsNaN(v) || math.IsInf(v, 0) {
				continue
			}
			pl.yMin = math.Min(pl.yMin, v)
			pl.yMax = math.Max(pl.yMax, v)
		}
	}
	pl.hasData = n >= 2 && pl.yMin <= pl.yMax && plotFinite(spec.grid[0]) && plotFinite(spec.grid[n-1]) && spec.grid[0] != spec.grid[n-1]
	if pl.cursor >= n {
		pl.cursor = n - 1
	}
	pl.layout()
}

// clear drops the data.
func (pl *plotModel) clear() {
	pl.spec = plotSpec{}
	pl.hasData = false
	pl.cursor = -1
	pl.layout()
}

// setSize lays the plot out again for a w×h block.
func (pl *plotModel) setSize(w, h int) {
	pl.w, pl.h = max(w, 0), max(h, 0)
	pl.layout()
}

// setCursor moves the cursor to grid index i (-1 hides it).
func (pl *plotModel) setCursor(i int) {
	if i >= len(pl.spec.grid) {
		i = len(pl.spec.grid) - 1
	}
	pl.cursor = i
	pl.render()
}

// view returns the rendered lines (nil when there is nothing to show).
func (pl *plotModel) view() []string { return pl.lines }

// columnWidth is the number of grid points per cell column, at least 1:
// how far one cursor step moves to cross a column.
func (pl *plotModel) columnWidth() int {
	n := len(pl.spec.grid)
	if !pl.ok || n < 2 || pl.plotW < 2 {
		return 1
	}
	return max(1, int(math.Ceil(float64(n-1)/float64(pl.plotW-1))))
}

func (pl *plotModel) layout() {
	pl.ok = false
	pl.lines = nil
	pl.cells, pl.cls, pl.col = nil, nil, nil
	if !pl.hasData {
		return
	}
	pl.plotH = pl.h - 3 // label line above, axis and tick labels below
	if pl.plotH < plotMinRows {
		return
	}
	// y ticks first: their labels set the margin, hence the plot width.
	yTarget := min(max(pl.plotH/3+1, 2), 8)
	yVals, yStep, yLo, yHi := plotLinearTicks(pl.yMin, pl.yMax, yTarget, true)
	yMaxAbs := math.Max(math.Abs(yLo), math.Abs(yHi))
	pl.margin = 0
	yLabels := make([]string, len(yVals))
	for i, v := range yVals {
		yLabels[i] = plotTickLabel(v, yStep, yMaxAbs)
		pl.margin = max(pl.margin, len(yLabels[i]))
	}
	pl.plotW = pl.w - pl.margin - 1
	if pl.plotW < plotMinCols {
		return
	}
	pl.ok = true
	pl.yAxis = newPlotAxis(yLo, yHi, false)

	grid := pl.spec.grid
	n := len(grid)
	xLo, xHi := math.Min(grid[0], grid[n-1]), math.Max(grid[0], grid[n-1])
	pl.xAxis = newPlotAxis(xLo, xHi, pl.spec.xLog)
	pl.sub = 2
	if pl.ascii {
		pl.sub = 1
	}
	fine := pl.plotW * pl.sub
	pl.col = make([]int32, n)
	for i, x := range grid {
		c := int(math.Round(pl.xAxis.frac(x) * float64(fine-1)))
		pl.col[i] = int32(min(max(c, 0), fine-1))
	}

	yTicks := make([]plotTick, 0, len(yVals))
	for i, v := range yVals {
		row := pl.plotH - 1 - int(math.Round(pl.yAxis.frac(v)*float64(pl.plotH-1)))
		yTicks = append(yTicks, plotTick{pos: row, label: yLabels[i]})
	}
	pl.draw(yTicks, pl.xTicks())
	pl.render()
}

func plotIdentity(x float64) float64 { return x }

// xTicks places the x-axis ticks at round values of the axis unit. On a
// log axis whose unit reads below zero (gauge, from below the atmosphere)
// round values are spaced linearly; drawing keeps the labels apart.
func (pl *plotModel) xTicks() []plotTick {
	lo, hi := pl.spec.xDisplay(pl.xAxis.lo), pl.spec.xDisplay(pl.xAxis.hi)
	target := min(max(pl.plotW/10, 2), 8)
	var vals []float64
	var labels []string
	if pl.xAxis.log {
		vals = plotLogTicks(lo, hi, target)
		if lo <= 0 && hi > 0 {
			// A gauge reading from below the atmosphere: 0, then round
			// values on the log scale from about one tick's width on.
			d0 := pl.spec.xData(0)
			d1 := pl.spec.xDisplay(d0 * math.Pow(pl.xAxis.hi/d0, 1/float64(target)))
			if pos := plotLogTicks(d1, hi, target-1); len(pos) > 0 {
				vals = append([]float64{0}, pos...)
			}
		}
		for _, v := range vals {
			labels = append(labels, plotCompactNumber(v))
		}
	}
	if len(vals) == 0 {
		var step float64
		vals, step, _, _ = plotLinearTicks(lo, hi, target, false)
		maxAbs := math.Max(math.Abs(lo), math.Abs(hi))
		labels = labels[:0]
		for _, v := range vals {
			labels = append(labels, plotTickLabel(v, step, maxAbs))
		}
	}
	ticks := make([]plotTick, 0, len(vals))
	for i, v := range vals {
		pos := int(math.Round(pl.xAxis.frac(pl.spec.xData(v)) * float64(pl.plotW-1)))
		if pos < 0 || pos >= pl.plotW {
			continue
		}
		ticks = append(ticks, plotTick{pos: pos, label: labels[i]})
	}
	return ticks
}

// envelope reduces curve s to one plotColumn per column, cols columns
// across, with div sub-columns per column.
func (pl *plotModel) envelope(s plotSeries, div int) []plotColumn {
	cols := pl.plotW * pl.sub / div
	env := make([]plotColumn, cols)
	grid := pl.spec.grid
	n := len(grid)
	i, step := 0, 1
	if grid[0] > grid[n-1] { // walk in x order
		i, step = n-1, -1
	}
	span := pl.yAxis.hi - pl.yAxis.lo
	brk := false
	for ; i >= 0 && i < n; i += step {
		v := s.y(i)
		if math.IsNaN(v) || math.IsInf(v, 0) {
			brk = true
			continue
		}
		f := (v - pl.yAxis.lo) / span
		e := &env[int(pl.col[i])/div]
		if !e.ok {
			*e = plotColumn{first: f, last: f, lo: f, hi: f, ok: true, brk: brk}
		} else {
			e.last = f
			e.lo = math.Min(e.lo, f)
			e.hi = math.Max(e.hi, f)
		}
		brk = false
	}
	return env
}

// plotTrace walks a curve across columns at a vertical resolution of
// rows, returning connected runs of points (row 0 at the top) in x order.
func plotTrace(env []plotColumn, rows int) [][]canvas.Point {
	rowOf := func(f float64) int {
		r := rows - 1 - int(math.Round(f*float64(rows-1)))
		return min(max(r, 0), rows-1)
	}
	var runs [][]canvas.Point
	var run []canvas.Point
	add := func(p canvas.Point) {
		if k := len(run); k > 0 && run[k-1] == p {
			return
		}
		run = append(run, p)
	}
	// line appends the cells from a to b, in that order.
	line := func(a, b canvas.Point) {
		pts := graph.GetLinePoints(a, b)
		if len(pts) > 0 && pts[0] != a {
			for i, j := 0, len(pts)-1; i < j; i, j = i+1, j-1 {
				pts[i], pts[j] = pts[j], pts[i]
			}
		}
		for _, p := range pts {
			add(p)
		}
	}
	for c := range env {
		e := &env[c]
		if !e.ok {
			continue
		}
		first := canvas.Point{X: c, Y: rowOf(e.first)}
		if e.brk && len(run) > 0 {
			runs = append(runs, run)
			run = nil
		}
		if len(run) > 0 {
			line(run[len(run)-1], first)
		} else {
			add(first)
		}
		// Within a column: out to both extremes, ending at the last point.
		top, bot, last := rowOf(e.hi), rowOf(e.lo), rowOf(e.last)
		a, b := bot, top
		if last > first.Y { // heading down: up to the top first
			a, b = top, bot
		}
		for _, y := range []int{a, b, last} {
			line(run[len(run)-1], canvas.Point{X: c, Y: y})
		}
	}
	if len(run) > 0 {
		runs = append(runs, run)
	}
	return runs
}

// plotSlope picks the ASCII character for a path cell from its
// neighbours on the path.
func plotSlope(prev, cur, next canvas.Point) rune {
	dx, dy := next.X-prev.X, next.Y-prev.Y
	switch {
	case dx == 0 && dy == 0:
		return '-'
	case dx == 0:
		return '|'
	case dy == 0:
		return '-'
	case dy < 0:
		return '/'
	}
	return '\\'
}

// draw paints the frame and the curves onto a canvas and keeps its runes.
func (pl *plotModel) draw(yTicks, xTicks []plotTick) {
	w, rows := pl.w, pl.plotH+2
	cv := canvas.New(w, rows)
	cls := make([]uint8, w*rows)
	put := func(x, y int, r rune, c uint8) {
		if x < 0 || x >= w || y < 0 || y >= rows {
			return
		}
		cv.SetCell(canvas.Point{X: x, Y: y}, canvas.NewCell(r))
		cls[y*w+x] = c
	}
	text := func(x, y int, s string, c uint8) {
		for i, r := range []rune(s) {
			put(x+i, y, r, c)
		}
	}
	g := pl.glyphs()
	ox, ax := pl.margin, pl.plotH // y-axis column, x-axis row

	// Markers first, the last series lowest; then the line curve on top,
	// so the blend's curve is never hidden behind a species'.
	x0 := ox + 1
	marked := make([][]int, len(pl.spec.series)) // the cells each marker curve drew
	for k := len(pl.spec.series) - 1; k >= 1; k-- {
		m := plotMarkers[(k-1)%len(plotMarkers)]
		c := plotClsSeries + uint8(k)
		for _, run := range plotTrace(pl.envelope(pl.spec.series[k], pl.sub), pl.plotH) {
			for _, p := range run {
				put(x0+p.X, p.Y, m, c)
				marked[k] = append(marked[k], p.Y*w+x0+p.X)
			}
		}
	}
	if len(pl.spec.series) > 0 {
		s := pl.spec.series[0]
		if pl.ascii {
			for _, run := range plotTrace(pl.envelope(s, pl.sub), pl.plotH) {
				for i, p := range run {
					prev, next := p, p
					if i > 0 {
						prev = run[i-1]
					}
					if i+1 < len(run) {
						next = run[i+1]
					}
					put(x0+p.X, p.Y, plotSlope(prev, p, next), plotClsSeries)
				}
			}
		} else {
			bg := graph.NewBrailleGrid(pl.plotW, pl.plotH, 0, 1, 0, 1)
			for _, run := range plotTrace(pl.envelope(s, 1), pl.plotH*4) {
				for _, p := range run {
					bg.Set(p)
				}
			}
			for y, row := range bg.BraillePatterns() {
				for x, r := range row {
					if r != runes.BrailleBlockOffset {
						put(x0+x, y, r, plotClsSeries)
					}
				}
			}
		}
	}

	pl.findCovered(marked, cls)

	// The frame.
	for y := 0; y < ax; y++ {
		put(ox, y, g.vert, plotClsAxis)
	}
	put(ox, ax, g.corner, plotClsAxis)
	for x := ox + 1; x < w; x++ {
		put(x, ax, g.horiz, plotClsAxis)
	}
	for _, t := range yTicks {
		put(ox, t.pos, g.yTick, plotClsAxis)
		text(ox-len(t.label), t.pos, t.label, plotClsTick)
	}
	// x tick labels centred under their ticks, kept inside the row and
	// never overlapping: the first and last ticks are labelled first, the
	// ticks between them where there is room. The axis name goes on the
	// label line when it fits there (render), else at the row's right end.
	limit := w
	if name := pl.spec.xLabel; !pl.xNameOnTop() && len(name)+2 <= w-x0 {
		limit = w - len(name) - 1
		text(w-len(name), ax+1, name, plotClsTick)
	}
	place := func(t plotTick) (int, int) {
		start := max(x0+t.pos-len(t.label)/2, 0)
		if start+len(t.label) > limit {
			start = max(limit-len(t.label), 0)
		}
		return start, start + len(t.label)
	}
	for _, t := range xTicks {
		put(x0+t.pos, ax, g.xTick, plotClsAxis)
	}
	if n := len(xTicks); n > 0 {
		firstEnd, lastStart := -1, limit+1
		fs, fe := place(xTicks[0])
		text(fs, ax+1, xTicks[0].label, plotClsTick)
		firstEnd = fe
		if n > 1 {
			ls, _ := place(xTicks[n-1])
			if ls > firstEnd {
				text(ls, ax+1, xTicks[n-1].label, plotClsTick)
				lastStart = ls
			}
		}
		end := firstEnd
		for _, t := range xTicks[1:max(n-1, 1)] {
			st, e := place(t)
			if st <= end || e >= lastStart {
				continue
			}
			text(st, ax+1, t.label, plotClsTick)
			end = e
		}
	}

	pl.cells = make([]rune, w*rows)
	for y := 0; y < rows; y++ {
		for x := 0; x < w; x++ {
			pl.cells[y*w+x] = cv.Cell(canvas.Point{X: x, Y: y}).Rune
		}
	}
	pl.cls = cls
}

// plotAgainst joins the y and x axis names on the label line.
const plotAgainst = "  against "

// xNameOnTop reports whether the x axis name fits on the label line,
// after the y axis name, leaving the tick row to the tick labels.
func (pl *plotModel) xNameOnTop() bool {
	return utf8.RuneCountInString(pl.spec.yLabel)+len(plotAgainst)+utf8.RuneCountInString(pl.spec.xLabel) <= pl.w
}

// findCovered notes, for each marker curve, the curve drawn over most of
// it when little of it is left in sight (a species that coincides with the
// blend), so that the legend can say where it is.
func (pl *plotModel) findCovered(marked [][]int, cls []uint8) {
	pl.covered = make([]int, len(pl.spec.series))
	for k := range pl.covered {
		pl.covered[k] = -1
		cells := marked[k]
		if len(cells) == 0 {
			continue
		}
		seen := 0
		over := make([]int, len(pl.spec.series))
		for _, i := range cells {
			owner := int(cls[i]) - int(plotClsSeries)
			if owner == k {
				seen++
			} else if owner >= 0 && owner < len(over) {
				over[owner]++
			}
		}
		if 4*seen >= len(cells) {
			continue // a quarter or more in sight: it can be followed
		}
		best := 0
		for j, n := range over {
			if n > over[best] {
				best = j
			}
		}
		pl.covered[k] = best
	}
}

// coveredBy returns the curve drawn over most of curve k, or -1 when
// curve k can be seen.
func (pl *plotModel) coveredBy(k int) int {
	if !pl.ok || k < 0 || k >= len(pl.covered) {
		return -1
	}
	return pl.covered[k]
}

// cursorColumn is the canvas column of grid index i.
func (pl *plotModel) cursorColumn(i int) int {
	return pl.margin + 1 + int(pl.col[i])/pl.sub
}

// render builds the rows from the drawn chart and the cursor.
func (pl *plotModel) render() {
	if !pl.ok {
		pl.lines = nil
		return
	}
	w, rows := pl.w, pl.plotH+2
	g := pl.glyphs()
	cc := -1
	if pl.cursor >= 0 && pl.cursor < len(pl.col) {
		cc = pl.cursorColumn(pl.cursor)
	}
	lines := make([]string, 0, rows+1)
	label := pl.spec.yLabel
	if pl.xNameOnTop() {
		label += plotAgainst + pl.spec.xLabel
	}
	if utf8.RuneCountInString(label) > w {
		label = string([]rune(label)[:w])
	}
	lines = append(lines, pl.wraps[plotClsTick].open+label+pl.wraps[plotClsTick].close)
	var sb strings.Builder
	for y := 0; y < rows; y++ {
		sb.Reset()
		cur := plotClsNone
		for x := 0; x < w; x++ {
			r, c := pl.cells[y*w+x], pl.cls[y*w+x]
			if x == cc {
				switch {
				case y < pl.plotH && r == 0:
					r, c = g.cursor, plotClsCursor
				case y < pl.plotH:
					c = plotClsCursor // the curve at the cursor stands out in colour
				case y == pl.plotH:
					r, c = g.cursorFoot, plotClsCursor
				}
			}
			if r == 0 {
				r, c = ' ', plotClsNone
			}
			if c != cur {
				sb.WriteString(pl.wraps[cur].close)
				sb.WriteString(pl.wraps[c].open)
				cur = c
			}
			sb.WriteRune(r)
		}
		sb.WriteString(pl.wraps[cur].close)
		lines = append(lines, sb.String())
	}
	pl.lines = lines
}

func plotFinite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
