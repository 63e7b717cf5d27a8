package ui

import (
	"math"
	"reflect"
	"strconv"
	"strings"
	"testing"
	"unicode/utf8"
)

// plotTestSpec is n points over [lo, hi] with curves f.
func plotTestSpec(n int, lo, hi float64, log bool, fs ...func(x float64) float64) plotSpec {
	grid := make([]float64, n)
	for i := range grid {
		f := float64(i) / float64(n-1)
		if log {
			grid[i] = lo * math.Pow(hi/lo, f)
		} else {
			grid[i] = lo + f*(hi-lo)
		}
	}
	spec := plotSpec{grid: grid, xLog: log, xLabel: "T / K", yLabel: "y / 1"}
	for k, f := range fs {
		f := f
		spec.series = append(spec.series, plotSeries{name: "s" + strconv.Itoa(k), y: func(i int) float64 { return f(grid[i]) }})
	}
	return spec
}

func plotTestModel(spec plotSpec, w, h int, ascii bool) *plotModel {
	pl := newPlotModel(DefaultStyles(true, ascii), ascii)
	pl.setSize(w, h)
	pl.setSpec(spec)
	return pl
}

func TestPlotLinearTicks(t *testing.T) {
	tests := []struct {
		name           string
		lo, hi         float64
		target         int
		loose          bool
		want           []float64
		wantStep       float64
		wantLo, wantHi float64
	}{
		// Expected ticks worked by hand from the 1-2-5 rule.
		{"T range, tight", 200, 1500, 6, false, []float64{200, 400, 600, 800, 1000, 1200, 1400}, 200, 200, 1500},
		{"Cp range, loose", 29.6, 44.4, 5, true, []float64{25, 30, 35, 40, 45}, 5, 25, 45},
		{"negative energies", -98.2, -3.1, 6, true, []float64{-100, -80, -60, -40, -20, 0}, 20, -100, 0},
		{"reversed ends", 10, 0, 3, false, []float64{0, 5, 10}, 5, 0, 10},
		{"flat curve opens a window", 1.5, 1.5, 3, true, []float64{1.48, 1.49, 1.50, 1.51, 1.52}, 0.01, 1.48, 1.52},
		{"flat at zero", 0, 0, 3, true, []float64{-1, 0, 1}, 1, -1, 1},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got, step, lo, hi := plotLinearTicks(tc.lo, tc.hi, tc.target, tc.loose)
			if len(got) != len(tc.want) {
				t.Fatalf("ticks %v, want %v", got, tc.want)
			}
			for i := range got {
				if math.Abs(got[i]-tc.want[i]) > 1e-9*math.Max(1, math.Abs(tc.want[i])) {
					t.Fatalf("ticks %v, want %v", got, tc.want)
				}
			}
			if math.Abs(step-tc.wantStep) > 1e-12 || math.Abs(lo-tc.wantLo) > 1e-9 || math.Abs(hi-tc.wantHi) > 1e-9 {
				t.Errorf("step %g over [%g, %g], want %g over [%g, %g]", step, lo, hi, tc.wantStep, tc.wantLo, tc.wantHi)
			}
		})
	}
}

func TestPlotLogTicks(t *testing.T) {
	tests := []struct {
		name   string
		lo, hi float64
		maxN   int
		want   []float64
	}{
		{"1 to 100 bar", 1, 100, 8, []float64{1, 2, 5, 10, 20, 50, 100}},
		{"half to 20", 0.5, 20, 8, []float64{0.5, 1, 2, 5, 10, 20}},
		{"dense in one decade", 2, 9, 8, []float64{2, 3, 4, 5, 6, 7, 8, 9}},
		{"decades only", 1e-3, 1e3, 8, []float64{1e-3, 1e-2, 0.1, 1, 10, 100, 1e3}},
		{"every other decade", 1, 1e6, 4, []float64{1, 100, 1e4, 1e6}},
		{"inside one step: none", 1.1, 1.9, 6, nil},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got := plotLogTicks(tc.lo, tc.hi, tc.maxN); !reflect.DeepEqual(got, tc.want) {
				t.Errorf("plotLogTicks(%g, %g, %d) = %v, want %v", tc.lo, tc.hi, tc.maxN, got, tc.want)
			}
		})
	}
}

func TestPlotLabels(t *testing.T) {
	tests := []struct {
		v, step, maxAbs float64
		want            string
	}{
		{1400, 200, 1400, "1400"},
		{0.25, 0.05, 1, "0.25"},
		{-40, 20, 100, "-40"},
		{1e-17, 0.1, 1, "0"}, // round-off of a zero tick
		{2e6, 5e5, 3e6, "2.0e6"},
		{1e-4, 1e-5, 5e-4, "1.0e-4"},
		{1.52, 0.01, 1.52, "1.52"},
	}
	for _, tc := range tests {
		if got := plotTickLabel(tc.v, tc.step, tc.maxAbs); got != tc.want {
			t.Errorf("plotTickLabel(%g, %g, %g) = %q, want %q", tc.v, tc.step, tc.maxAbs, got, tc.want)
		}
	}
	for in, want := range map[string]string{"1.5e+06": "1.5e6", "2e-05": "2e-5", "3e+00": "3", "12": "12"} {
		if got := plotCompactExp(in); got != want {
			t.Errorf("plotCompactExp(%q) = %q, want %q", in, got, want)
		}
	}
	for v, want := range map[float64]string{1e5: "100000", 1e6: "1e6", 0.3: "0.3", 2e-5: "2e-5"} {
		if got := plotCompactNumber(v); got != want {
			t.Errorf("plotCompactNumber(%g) = %q, want %q", v, got, want)
		}
	}
}

// TestPlotEnvelope checks the per-column reduction of a large sweep
// against a brute-force scan.
func TestPlotEnvelope(t *testing.T) {
	const n = 100000
	spec := plotTestSpec(n, 300, 3000, false, func(x float64) float64 { return math.Sin(x / 7) })
	for _, ascii := range []bool{false, true} {
		pl := plotTestModel(spec, 90, 20, ascii)
		env := pl.envelope(spec.series[0], 1)
		cols := pl.plotW * pl.sub
		lo := make([]float64, cols)
		hi := make([]float64, cols)
		for c := range lo {
			lo[c], hi[c] = math.Inf(1), math.Inf(-1)
		}
		for i, x := range spec.grid {
			c := int(math.Round((x - 300) / 2700 * float64(cols-1)))
			f := (spec.series[0].y(i) - pl.yAxis.lo) / (pl.yAxis.hi - pl.yAxis.lo)
			lo[c], hi[c] = math.Min(lo[c], f), math.Max(hi[c], f)
		}
		for c := range env {
			if !env[c].ok || env[c].lo != lo[c] || env[c].hi != hi[c] {
				t.Fatalf("ascii %v, column %d: envelope [%g, %g] ok %v, want [%g, %g]", ascii, c, env[c].lo, env[c].hi, env[c].ok, lo[c], hi[c])
			}
		}
	}
}

// TestPlotDistinctCurves draws nine well-separated flat curves and
// checks that each is drawn with its own runes, shared with no other.
func TestPlotDistinctCurves(t *testing.T) {
	var fs []func(float64) float64
	for k := 0; k < plotMaxSeries; k++ {
		v := float64(k)
		fs = append(fs, func(float64) float64 { return v })
	}
	for _, ascii := range []bool{false, true} {
		pl := plotTestModel(plotTestSpec(200, 200, 1500, false, fs...), 80, 3*plotMaxSeries+3, ascii)
		if !pl.ok {
			t.Fatal("no room to plot")
		}
		owner := map[rune]int{}
		count := make([]int, plotMaxSeries)
		for i, r := range pl.cells {
			c := pl.cls[i]
			if c < plotClsSeries {
				continue
			}
			k := int(c - plotClsSeries)
			count[k]++
			if o, seen := owner[r]; seen && o != k {
				t.Errorf("ascii %v: rune %q drawn for curves %d and %d", ascii, r, o, k)
			}
			owner[r] = k
		}
		for k, c := range count {
			if c == 0 {
				t.Errorf("ascii %v: curve %d not drawn", ascii, k)
			}
		}
	}
	samples := map[string]bool{}
	for k := 0; k < plotMaxSeries; k++ {
		for _, ascii := range []bool{false, true} {
			s := plotSample(k, ascii)
			key := strconv.FormatBool(ascii) + s
			if samples[key] {
				t.Errorf("legend sample %q used twice", s)
			}
			samples[key] = true
		}
	}
}

func TestPlotASCIIRunes(t *testing.T) {
	spec := plotTestSpec(5000, 1e3, 1e7, true,
		func(x float64) float64 { return math.Log(x) },
		func(x float64) float64 { return -math.Log(x) },
		func(x float64) float64 { return math.Sin(math.Log(x)) })
	spec.xDisplay, spec.xData, spec.xLabel = func(pa float64) float64 { return pa / 1e5 }, func(bar float64) float64 { return bar * 1e5 }, "P / bar"
	pl := plotTestModel(spec, 80, 20, true)
	pl.setCursor(2500)
	lines := pl.view()
	if len(lines) != 20 {
		t.Fatalf("%d lines, want 20", len(lines))
	}
	for _, l := range lines {
		for _, r := range l {
			if r > 127 {
				t.Fatalf("rune %q in ASCII mode:\n%s", r, strings.Join(lines, "\n"))
			}
		}
	}
	// The same plot in Unicode uses braille and box drawing.
	pl = plotTestModel(spec, 80, 20, false)
	if v := strings.Join(pl.view(), "\n"); !strings.ContainsRune(v, '└') || !strings.ContainsAny(v, "⠁⠂⠄⠈⠐⠠⡀⢀⠉⠒⠤⣀") {
		t.Errorf("unicode plot lacks its frame or braille:\n%s", v)
	}
}

// TestPlotTickPlacement checks that a tick label sits over the column of
// the grid point with its value, so the axis and the cursor agree.
func TestPlotTickPlacement(t *testing.T) {
	spec := plotTestSpec(1301, 200, 1500, false, func(x float64) float64 { return x })
	pl := plotTestModel(spec, 100, 20, true)
	axisRow := pl.plotH
	i := 800 // grid value 1000 K
	col := pl.cursorColumn(i)
	if r := pl.cells[axisRow*pl.w+col]; r != '+' {
		t.Errorf("no tick on the axis at the column of 1000 K (found %q)", r)
	}
	labels := string(pl.cells[(axisRow+1)*pl.w : (axisRow+2)*pl.w])
	if at := strings.Index(labels, "1000"); at < 0 || at > col || at+4 <= col {
		t.Errorf("label 1000 at %d does not cover column %d: %q", at, col, labels)
	}
}

func TestPlotNonFinite(t *testing.T) {
	nan := func(x float64) float64 {
		if x > 500 && x < 700 {
			return math.NaN()
		}
		if x > 1000 && x < 1010 {
			return math.Inf(-1)
		}
		return x / 100
	}
	pl := plotTestModel(plotTestSpec(500, 200, 1500, false, nan), 80, 16, false)
	if !pl.ok || pl.yMin != 2 || pl.yMax != 15 {
		t.Errorf("y range [%g, %g], ok %v; want the finite values' [2, 15]", pl.yMin, pl.yMax, pl.ok)
	}
	for _, l := range pl.view() {
		if strings.Contains(l, "NaN") || strings.Contains(l, "Inf") {
			t.Errorf("not-a-number on screen: %q", l)
		}
	}
	all := plotTestModel(plotTestSpec(50, 200, 1500, false, func(float64) float64 { return math.NaN() }), 80, 16, false)
	if all.hasData || all.view() != nil {
		t.Error("a curve with no finite value is drawn")
	}
}

func TestPlotTinySizes(t *testing.T) {
	spec := plotTestSpec(300, 200, 1500, false, math.Sqrt, math.Cbrt)
	for _, ascii := range []bool{false, true} {
		for _, sz := range [][2]int{{0, 0}, {1, 1}, {5, 2}, {10, 3}, {12, 6}, {16, 6}, {20, 7}, {300, 100}} {
			pl := plotTestModel(spec, sz[0], sz[1], ascii)
			pl.setCursor(299)
			lines := pl.view()
			if lines == nil {
				continue
			}
			if len(lines) != sz[1] {
				t.Errorf("%dx%d: %d lines", sz[0], sz[1], len(lines))
			}
			for _, l := range lines[1:] {
				if n := utf8.RuneCountInString(l); n != sz[0] {
					t.Errorf("%dx%d: row of %d cells", sz[0], sz[1], n)
				}
			}
		}
	}
}

// plotSink keeps benchmark results alive.
var plotSink []string

// BenchmarkPlotLayout is the work done when a sweep finishes or the
// pane is resized: scanning, reducing and drawing every curve.
func BenchmarkPlotLayout(b *testing.B) {
	for _, n := range []int{100, 1000, 100000, 1000000} {
		spec := plotTestSpec(n, 200, 1500, false, math.Sqrt, math.Cbrt, math.Log)
		b.Run(strconv.Itoa(n), func(b *testing.B) {
			pl := newPlotModel(DefaultStyles(true, false), false)
			pl.setSize(120, 30)
			b.ReportAllocs()
			for i := 0; i < b.N; i++ {
				pl.setSpec(spec)
				plotSink = pl.view()
			}
		})
	}
}

// BenchmarkPlotCursor is redrawing the rows for a moved cursor.
func BenchmarkPlotCursor(b *testing.B) {
	pl := plotTestModel(plotTestSpec(1000, 200, 1500, false, math.Sqrt, math.Cbrt, math.Log), 120, 30, false)
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		pl.setCursor(i % 1000)
		plotSink = pl.view()
	}
}

// The first and last ticks of an axis always carry their labels, at every
// width, on linear, log and gauge axes (issue 7, item 10).
func TestPlotEndTicksLabelled(t *testing.T) {
	gauge := func(spec plotSpec) plotSpec {
		psi := 6894.757293168361 // Pa per psi: 1 lbf/in²
		spec.xDisplay = func(pa float64) float64 { return (pa - 101325) / psi }
		spec.xData = func(v float64) float64 { return v*psi + 101325 }
		spec.xLabel = "P in psig"
		return spec
	}
	for _, c := range []struct {
		name string
		spec plotSpec
	}{
		{"T 200..1500 K", plotTestSpec(200, 200, 1500, false, func(x float64) float64 { return x })},
		{"P 1..100 bar, log", plotTestSpec(200, 1e5, 1e7, true, math.Log)},
		{"P 0.5..20 bar, log", plotTestSpec(200, 0.5e5, 20e5, true, math.Log)},
		{"P 1 bar..150 psig, log, gauge", gauge(plotTestSpec(200, 1e5, 150*6894.757293168361+101325, true, math.Log))},
	} {
		for _, w := range []int{40, 60, 78, 118, 198} {
			pl := plotTestModel(c.spec, w, 16, true)
			ticks := pl.xTicks()
			if len(ticks) < 2 {
				t.Errorf("%s at %d: %d ticks", c.name, w, len(ticks))
				continue
			}
			if second, _ := strconv.ParseFloat(ticks[min(1, len(ticks)-1)].label, 64); strings.Contains(c.name, "gauge") && w >= 78 && (ticks[0].label != "0" || second > 10) {
				t.Errorf("%s at %d: ticks %v, want 0 and round values on the log scale after it", c.name, w, ticks)
			}
			row := strings.ReplaceAll(string(pl.cells[(pl.plotH+1)*pl.w:(pl.plotH+2)*pl.w]), "\x00", " ")
			for _, tk := range []plotTick{ticks[0], ticks[len(ticks)-1]} {
				if !strings.Contains(" "+row+" ", " "+tk.label+" ") {
					t.Errorf("%s at %d: end tick %q has no label in %q", c.name, w, tk.label, row)
				}
			}
		}
	}
}

// A curve drawn under another is named in the legend's terms: the plot
// knows which curve covers it (issue 7, item 10).
func TestPlotCoveredCurve(t *testing.T) {
	spec := plotTestSpec(300, 200, 1500, false,
		func(x float64) float64 { return x },
		func(x float64) float64 { return x },        // on the first curve
		func(x float64) float64 { return 1500 - x }) // crosses it
	for _, ascii := range []bool{true, false} {
		pl := plotTestModel(spec, 80, 20, ascii)
		if got := pl.coveredBy(1); got != 0 {
			t.Errorf("ascii %v: curve 1 lies on curve 0; coveredBy = %d", ascii, got)
		}
		if got := pl.coveredBy(2); got != -1 {
			t.Errorf("ascii %v: curve 2 can be seen; coveredBy = %d", ascii, got)
		}
	}
}
