package ui

import (
	"math"
	"runtime/debug"
	"strconv"
	"strings"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/model"
)

// The sweep pane moves T or P across a grid, plots one property of the
// blend (or of its species, overlaid) and reads exact values off the grid
// at a cursor. Sweeps run as chains of commands (sweep_run.go); the chart
// is drawn in Update (plot.go), so View only joins finished lines.

// Fields of the range editor.
const (
	sweepFieldFrom = iota
	sweepFieldTo
	sweepFieldSteps
	sweepFieldCount
)

// sweepDefaultRanges are the ranges a variable starts with.
var sweepDefaultRanges = [2][2]string{{"200 K", "1500 K"}, {"1 bar", "100 bar"}}

type sweepPane struct {
	c    *Common
	b    *bench // the document whose inputs are swept; nil in tests of the pane alone
	w, h int

	// In force: always a valid sweep. applied remembers the last valid
	// range of each variable; drafts hold what was typed, valid or not.
	set        SweepSettings
	sweep      mixtures.Sweep
	applied    [2][2]string
	drafts     [2][2]string
	stepsDraft string
	before     sweepDrafts // the text when the fields were opened, for Esc
	fields     [sweepFieldCount]field
	errs       [sweepFieldCount]string
	rangeErr   string // the range as a whole (e.g. equal end points)
	editing    bool
	focus      int
	changed    bool
	note       string // a notice about the last key, until the next

	in     Inputs
	haveIn bool
	hidden bool // off screen: sweeps wait until it is shown

	// The sweep being computed, if any.
	gen     uint64
	running bool
	runKey  sweepKey
	done    int
	total   int
	runErr  string
	// failedKey is the last sweep that failed: it is not started again
	// until something it depends on changes, since every message asks
	// for the wanted sweep and a failing one would be rerun for ever.
	failedKey sweepKey
	failed    bool

	result    *mixtures.SweepTable
	resultKey sweepKey

	plot      *plotModel
	series    []plotSeries
	plotNote  string                // what the plot leaves out, or why it is empty
	plotted   string                // whose curves the plot draws, for the header
	xUnit     string                // the x axis unit's name
	xPres     mixtures.PressureUnit // the unit of a pressure sweep's axis
	presShown string                // the held pressure as last shown
	cursor    int
	chartRows int
	view      string
}

// newBenchSweepPane is the workbench's sweep pane, which sweeps the
// bench's inputs.
func newBenchSweepPane(c *Common, b *bench) *sweepPane {
	p := newSweepPane(c, DefaultSweepSettings())
	p.b = b
	return p
}

func newSweepPane(c *Common, s SweepSettings) *sweepPane {
	p := &sweepPane{c: c, plot: newPlotModel(c.Styles, c.ASCII)}
	for i := range p.fields {
		p.fields[i] = newField(c)
	}
	p.load(s)
	return p
}

// load takes settings as saved: the ranges as typed are applied where
// they read, and shown with their error where they do not.
func (p *sweepPane) load(s SweepSettings) {
	p.applied, p.drafts = sweepDefaultRanges, sweepDefaultRanges
	def := DefaultSweepSettings()
	if s == (SweepSettings{}) {
		s = def
	}
	if s.Var != mixtures.SweepPressure {
		s.Var = mixtures.SweepTemperature
	}
	if _, ok := sweepPropIndex(s.Property); !ok {
		s.Property = def.Property
	}
	vi := s.Var
	// Start from a range known to be good, then take the saved text as
	// if typed: a saved entry that no longer parses is shown with its
	// error instead of being dropped.
	p.set = s
	p.set.From, p.set.To, p.set.Steps = p.applied[vi][0], p.applied[vi][1], def.Steps
	p.sweep, _, _ = sweepParse(vi, p.set.From, p.set.To, strconv.Itoa(p.set.Steps), p.set.Log)
	p.drafts[vi] = [2]string{s.From, s.To}
	p.stepsDraft = strconv.Itoa(s.Steps)
	if s.Steps == 0 {
		p.stepsDraft = strconv.Itoa(def.Steps)
	}
	p.tryApply()
	p.changed = false
	p.refresh()
}

// sweepDrafts is the typed text of the three fields.
type sweepDrafts struct {
	fromTo [2]string
	steps  string
}

// sweepSplit splits a whole range typed into the from field with the
// commands' range parser; ends that do not read are split all the same,
// so that each shows its error on its own field.
func sweepSplit(vi mixtures.SweepVar, s string) (from, to string, err error) {
	r, err := mixtures.ParseSweepRange(vi, s)
	if err == nil {
		return r.FromText, r.ToText, nil
	}
	if a, b, perr := mixtures.ParseRange(s); perr == nil {
		return a, b, nil
	}
	return "", "", err
}

// vi is the variable swept, which also indexes the ranges the pane
// remembers, one per variable.
func (p *sweepPane) vi() mixtures.SweepVar { return p.set.Var }

// sweepParse reads a range and a number of points as typed. It returns
// the sweep, an error per field, and an error for the range as a whole.
func sweepParse(vi mixtures.SweepVar, fromText, toText, stepsText string, logGrid bool) (sw mixtures.Sweep, errs [sweepFieldCount]string, rangeErr string) {
	sw.Log = logGrid
	parse := func(s string) (float64, error) { return mixtures.ParseTemperature(s) }
	if vi == mixtures.SweepPressure {
		sw.Var, sw.Log = mixtures.SweepPressure, true
		parse = func(s string) (float64, error) {
			pr, err := mixtures.ParsePressure(s)
			return pr.Pa, err
		}
	}
	var err error
	if sw.From, err = parse(fromText); err != nil {
		errs[sweepFieldFrom] = "from: " + cleanErr(err)
	}
	if sw.To, err = parse(toText); err != nil {
		errs[sweepFieldTo] = "to: " + cleanErr(err)
	}
	if sw.Steps, err = sweepParseSteps(stepsText); err != nil {
		errs[sweepFieldSteps] = err.Error()
	}
	if errs == [sweepFieldCount]string{} {
		// The range as a whole, by the parser the commands use too.
		if r, err := mixtures.ParseSweepEnds(vi, fromText, toText); err != nil {
			rangeErr = cleanErr(err)
		} else if sw = r.Sweep(sw.Steps, logGrid); sw.Check() != nil {
			rangeErr = cleanErr(sw.Check())
		}
	}
	return sw, errs, rangeErr
}

// sweepStepsError is the one-line error for a bad number of points.
type sweepStepsError struct{ text string }

func (e sweepStepsError) Error() string {
	return "points " + strconv.Quote(e.text) + ": want a whole number from 2 to " + strconv.Itoa(mixtures.MaxSweepSteps)
}

// sweepParseSteps reads a number of points in the one syntax the
// commands' --steps takes too (mixtures.ParseSteps).
func sweepParseSteps(s string) (int, error) {
	n, err := mixtures.ParseSteps(s)
	if err != nil {
		return 0, sweepStepsError{s}
	}
	return n, nil
}

// tryApply puts the typed range in force if it is valid, and reports
// whether it did. Invalid text stays, with its error; the settings in
// force do not change.
func (p *sweepPane) tryApply() bool {
	vi := p.vi()
	from, to := p.drafts[vi][0], p.drafts[vi][1]
	var rangeTyped error
	// A whole range typed at once, in the range syntax or (to be told
	// it) as "300 to 900 K".
	if strings.Contains(from, "..") || strings.Contains(from, "…") || mixtures.LooksLikeRange(from) {
		a, b, err := sweepSplit(vi, from)
		if err == nil {
			from, to = a, b
			p.drafts[vi] = [2]string{a, b}
		}
		rangeTyped = err
	}
	sw, errs, rangeErr := sweepParse(vi, from, to, p.stepsDraft, p.set.Log)
	if rangeTyped != nil {
		errs[sweepFieldFrom] = "from: " + cleanErr(rangeTyped)
	}
	p.errs, p.rangeErr = errs, rangeErr
	if errs != [sweepFieldCount]string{} || rangeErr != "" {
		return false
	}
	next := p.set
	next.From, next.To, next.Steps = from, to, sw.Steps
	if next != p.set {
		p.set = next
		p.changed = true
	}
	p.applied[vi] = [2]string{from, to}
	p.stepsDraft = strconv.Itoa(sw.Steps)
	p.sweep = sw
	return true
}

// hasErrors reports whether typed text is waiting to be fixed.
func (p *sweepPane) hasErrors() bool {
	return p.errs != [sweepFieldCount]string{} || p.rangeErr != ""
}

// SetInputs takes new inputs and returns the command that sweeps them,
// or nil when the sweep would not change.
func (p *sweepPane) SetInputs(in Inputs) tea.Cmd {
	if p.haveIn && in.Gen == p.in.Gen {
		return nil
	}
	p.in, p.haveIn = in, true
	cmd := p.recompute()
	p.refresh()
	return cmd
}

// wanted is the sweep the inputs and settings ask for.
func (p *sweepPane) wanted() (sweepKey, bool) {
	if !p.haveIn || !p.in.Valid() {
		return sweepKey{}, false
	}
	k := sweepKey{mix: p.in.Mixture, sweep: p.sweep, opts: p.in.Opts}
	if p.sweep.Var == mixtures.SweepPressure {
		k.fixedTempK = p.in.TempK
	} else {
		k.fixedPresPa = p.in.PresPa
	}
	return k, true
}

// recompute starts the wanted sweep unless it is running or shown
// already. Starting one makes every older message stale.
func (p *sweepPane) recompute() tea.Cmd {
	k, ok := p.wanted()
	if !ok || p.hidden {
		return nil
	}
	if p.running && k == p.runKey || p.failed && k == p.failedKey {
		return nil
	}
	if p.result != nil && k == p.resultKey {
		if p.running { // back to what is on screen: drop the newer run
			p.gen++
			p.running = false
		}
		return nil
	}
	p.gen++
	p.running, p.runKey, p.done, p.total = true, k, 0, k.sweep.Steps
	var reuse *mixtures.SweepTable
	if p.result != nil && p.result.Len()*len(p.result.Columns) >= sweepReleaseValues {
		// The new sweep takes the old one's storage: nothing may read
		// it from here on, the plot's curves included.
		reuse = p.result
		p.result, p.series = nil, nil
		p.plot.clear()
	}
	return sweepStartCmd(p.gen, k, reuse)
}

// Update handles a key (when the pane has focus) or any other message.
func (p *sweepPane) Update(msg tea.Msg) tea.Cmd {
	var cmd tea.Cmd
	switch msg := msg.(type) {
	case sweepProgressMsg:
		if msg.gen != p.gen || !p.running {
			return nil // stale: a newer request replaced it
		}
		cmd = p.progress(msg)
	case tea.KeyMsg:
		if p.editing {
			cmd = p.editKey(msg)
		} else {
			cmd = p.key(msg)
		}
	default:
		return nil
	}
	p.refresh()
	return cmd
}

func (p *sweepPane) progress(msg sweepProgressMsg) tea.Cmd {
	if msg.err != nil {
		p.running = false
		p.failed, p.failedKey = true, p.runKey
		p.result, p.series = nil, nil
		p.runErr = cleanErr(msg.err)
		p.plot.clear()
		return nil
	}
	p.done, p.total = msg.done, msg.total
	if msg.done < msg.total {
		return sweepNextCmd(p.gen, msg.job, msg.done)
	}
	old := p.result
	p.running, p.runErr = false, ""
	p.result, p.resultKey = msg.job.res, msg.job.key
	p.placeCursor(old)
	p.rebuildPlot()
	if p.result.Len()*len(p.result.Columns) >= sweepReleaseValues {
		// A long sweep leaves megabytes of drawing and the last table
		// behind, and Go would collect them only once the heap doubled
		// (some 150 MB for 200 000 points). Once per long sweep, give
		// them back now: the table holds no pointers, so this is quick.
		debug.FreeOSMemory()
	}
	return nil
}

// placeCursor puts the cursor on a new result: where it was when only the
// blend or conditions changed (the grid is the same), or else (first
// result, a new range or variable) at the grid point nearest the current
// state, the setpoint.
func (p *sweepPane) placeCursor(old *mixtures.SweepTable) {
	n := len(p.result.Grid)
	if old != nil && old.Sweep == p.result.Sweep && p.cursor < n {
		return
	}
	here := p.in.TempK
	if p.result.Sweep.Var == mixtures.SweepPressure {
		here = p.in.PresPa
	}
	p.cursor = n / 2
	lo, hi := math.Min(p.result.Grid[0], p.result.Grid[n-1]), math.Max(p.result.Grid[0], p.result.Grid[n-1])
	if here < lo || here > hi {
		return
	}
	best := math.Inf(1)
	for i, x := range p.result.Grid {
		if d := math.Abs(x - here); d < best {
			best, p.cursor = d, i
		}
	}
}

func (p *sweepPane) key(msg tea.KeyMsg) tea.Cmd {
	k := &p.c.Keys.Sweep
	p.note = ""
	switch {
	case key.Matches(msg, k.Variable):
		return p.toggleVar()
	case key.Matches(msg, k.EditRange):
		p.startEdit()
	case key.Matches(msg, k.ToggleLog):
		if p.sweep.Var == mixtures.SweepPressure {
			p.note = "pressure sweeps always use a log grid"
			return nil
		}
		p.set.Log = !p.set.Log
		p.sweep.Log = p.set.Log
		p.changed = true
		return p.recompute()
	case key.Matches(msg, k.Property):
		p.cycleProperty(1)
	case key.Matches(msg, k.PrevProperty):
		p.cycleProperty(-1)
	case key.Matches(msg, k.NextSpecies):
		p.cycleSpecies(1)
	case key.Matches(msg, k.PrevSpecies):
		p.cycleSpecies(-1)
	case key.Matches(msg, k.Overlay):
		p.set.Overlay = !p.set.Overlay
		p.changed = true
		p.rebuildPlot()
	case key.Matches(msg, k.CursorLeft):
		p.moveCursor(-p.plot.columnWidth())
	case key.Matches(msg, k.CursorRight):
		p.moveCursor(p.plot.columnWidth())
	case key.Matches(msg, k.CursorStepLeft):
		p.moveCursor(-1)
	case key.Matches(msg, k.CursorStepRight):
		p.moveCursor(1)
	case key.Matches(msg, k.CursorHome):
		p.moveCursor(-mixtures.MaxSweepSteps)
	case key.Matches(msg, k.CursorEnd):
		p.moveCursor(mixtures.MaxSweepSteps)
	}
	return nil
}

// moveCursor moves the cursor by d grid points to the right on screen
// (left for d < 0), whichever way the grid runs.
func (p *sweepPane) moveCursor(d int) {
	if p.result == nil {
		return
	}
	g := p.result.Grid
	n := len(g)
	if g[0] > g[n-1] {
		d = -d
	}
	p.cursor = min(max(p.cursor+d, 0), n-1)
	p.plot.setCursor(p.cursor)
}

func (p *sweepPane) toggleVar() tea.Cmd {
	p.saveDrafts()
	vi := p.vi().Other()
	p.set.Var = vi
	p.set.From, p.set.To = p.applied[vi][0], p.applied[vi][1]
	// The remembered range is valid; the drafts may be too.
	p.sweep, _, _ = sweepParse(vi, p.set.From, p.set.To, strconv.Itoa(p.set.Steps), p.set.Log)
	p.tryApply()
	p.loadFields()
	p.changed = true
	return p.recompute()
}

func (p *sweepPane) cycleProperty(d int) {
	i, _ := sweepPropIndex(p.set.Property)
	i = (i + d + len(sweepProps)) % len(sweepProps)
	p.set.Property = sweepProps[i].key
	p.changed = true
	p.rebuildPlot()
}

// speciesChoices are the formulas s steps through, after "" (the blend).
func (p *sweepPane) speciesChoices() []string {
	mix := p.resultKey.mix
	if p.result == nil && p.haveIn {
		mix = p.in.Mixture
	}
	if mix == nil {
		return nil
	}
	out := make([]string, len(mix.Components))
	for i, c := range mix.Components {
		out[i] = c.Species.Formula
	}
	return out
}

func (p *sweepPane) cycleSpecies(d int) {
	choices := append([]string{""}, p.speciesChoices()...)
	i := 0
	for j, f := range choices {
		if f == p.set.Species {
			i = j
		}
	}
	i = (i + d + len(choices)) % len(choices)
	p.set.Species = choices[i]
	p.changed = true
	p.rebuildPlot()
}

func (p *sweepPane) propIndex() int {
	i, _ := sweepPropIndex(p.set.Property)
	return i
}

// Editing the range.

func (p *sweepPane) saveDrafts() {
	if !p.editing {
		return
	}
	vi := p.vi()
	p.drafts[vi] = [2]string{p.fields[sweepFieldFrom].value(), p.fields[sweepFieldTo].value()}
	p.stepsDraft = p.fields[sweepFieldSteps].value()
}

func (p *sweepPane) loadFields() {
	vi := p.vi()
	for i, v := range []string{p.drafts[vi][0], p.drafts[vi][1], p.stepsDraft} {
		focused := p.editing && i == p.focus
		p.fields[i].start(v)
		if !focused {
			p.fields[i].stop()
		}
	}
}

// startEdit opens the fields, on the first one with an error if any.
func (p *sweepPane) startEdit() {
	vi := p.vi()
	p.before = sweepDrafts{p.drafts[vi], p.stepsDraft}
	p.editing = true
	first := sweepFieldFrom
	for i := sweepFieldCount - 1; i >= 0; i-- {
		if p.errs[i] != "" {
			first = i
		}
	}
	p.focus = first
	p.loadFields()
}

func (p *sweepPane) setFocus(i int) {
	p.fields[p.focus].stop()
	p.focus = i
	p.fields[i].start(p.fields[i].value())
}

func (p *sweepPane) stopEdit() {
	p.fields[p.focus].stop()
	p.editing = false
}

// validate checks the typed text, showing errors as they are typed,
// without putting anything in force.
func (p *sweepPane) validate() {
	p.saveDrafts()
	vi := p.vi()
	from, to := p.drafts[vi][0], p.drafts[vi][1]
	var rangeTyped error
	if strings.Contains(from, "..") {
		a, b, err := sweepSplit(vi, from)
		if err == nil {
			from, to = a, b
		}
		rangeTyped = err
	}
	_, p.errs, p.rangeErr = sweepParse(vi, from, to, p.stepsDraft, p.set.Log)
	if rangeTyped != nil {
		p.errs[sweepFieldFrom] = "from: " + cleanErr(rangeTyped)
	}
}

// editKey handles a key while the fields are open. As in every field of
// the workbench, Enter keeps what was typed (putting it in force if it
// is valid, else leaving it on screen with its error) and Esc undoes the
// edit.
func (p *sweepPane) editKey(msg tea.KeyMsg) tea.Cmd {
	k := &p.c.Keys.Sweep
	switch {
	case key.Matches(msg, p.c.Keys.Back):
		vi := p.vi()
		p.drafts[vi], p.stepsDraft = p.before.fromTo, p.before.steps
		p.stopEdit()
		p.loadFields()
		p.validate()
		return nil
	case key.Matches(msg, k.Apply):
		p.saveDrafts()
		p.stopEdit()
		ok := p.tryApply()
		p.loadFields()
		if ok {
			return p.recompute()
		}
		return nil
	case key.Matches(msg, k.NextField), key.Matches(msg, k.PrevField):
		d := 1
		if key.Matches(msg, k.PrevField) {
			d = sweepFieldCount - 1
		}
		p.setFocus((p.focus + d) % sweepFieldCount)
		return nil
	}
	cmd := p.fields[p.focus].update(msg)
	p.validate()
	return cmd
}

// The plot.

// rebuildPlot hands the plot the curves of the current property. It
// scans the whole result, so it runs only when the result or the choice
// of curves changes.
func (p *sweepPane) rebuildPlot() {
	p.plotNote = ""
	if p.result == nil {
		p.series = nil
		p.plotted = ""
		p.plot.clear()
		return
	}
	res := p.result
	ascii := p.c.ASCII
	prop := &sweepProps[p.propIndex()]
	scale, speciesScale := prop.scale(), 1.0
	if prop.hasSpecies() {
		speciesScale = prop.speciesScale()
	}
	blendValues := res.Blend(prop.blend)
	blend := plotSeries{name: "blend", y: func(i int) float64 { return blendValues[i] * scale }}
	comps := p.resultKey.mix.Components
	speciesSeries := func(j int) plotSeries {
		values := res.Species(prop.species, j)
		return plotSeries{name: comps[j].Species.Formula, y: func(i int) float64 { return values[i] * speciesScale }}
	}
	var series []plotSeries
	var of string
	overlay := false
	switch {
	case !prop.hasSpecies():
		series = []plotSeries{blend}
		if p.set.Overlay || p.set.Species != "" {
			p.plotNote = prop.sym(ascii) + " is plotted for the blend only"
		}
	case p.set.Overlay:
		overlay = true
		series = []plotSeries{blend}
		for j := range comps {
			if len(series) == plotMaxSeries {
				p.plotNote = strconv.Itoa(len(comps)-j) + " more species not shown (the plot tells " + strconv.Itoa(plotMaxSeries) + " curves apart)"
				break
			}
			series = append(series, speciesSeries(j))
		}
	case p.set.Species != "":
		series = []plotSeries{blend}
		for j, c := range comps {
			if c.Species.Formula == p.set.Species {
				series, of = []plotSeries{speciesSeries(j)}, c.Species.Formula
			}
		}
		if of == "" {
			p.plotNote = p.set.Species + " is not in this blend; showing the blend"
		}
	default:
		series = []plotSeries{blend}
	}
	p.series = series
	// The header names what is drawn, never a choice that could not be.
	p.plotted = "blend"
	switch {
	case overlay:
		p.plotted = "blend and species"
	case of != "":
		p.plotted = of
	}

	// The x axis: kelvin, or pressure in the unit the range was typed in,
	// read as gauge where it was typed so or the workbench shows gauge.
	sw := res.Sweep
	spec := plotSpec{grid: res.Grid, xLog: sw.Log || sw.Var == mixtures.SweepPressure,
		yLabel: prop.axisLabel(ascii, of, overlay), series: series}
	p.xUnit = "K"
	name := sw.Var.Key()
	if sw.Var == mixtures.SweepPressure {
		p.xPres = p.pressureUnit()
		p.xUnit = p.xPres.Name()
		spec.xDisplay, spec.xData = p.xPres.FromPa, p.xPres.ToPa
	}
	spec.xLabel = name + " in " + p.xUnit
	p.plot.cursor = p.cursor
	p.plot.setSpec(spec)
	if p.plotNote == "" {
		p.plotNote = p.nonFiniteNote()
	}
}

// nonFiniteNote names the first curve with a value that is not a finite
// number; such points are left out of the plot.
func (p *sweepPane) nonFiniteNote() string {
	for _, s := range p.series {
		bad, first := 0, -1
		for i := range p.result.Grid {
			if v := s.y(i); math.IsNaN(v) || math.IsInf(v, 0) {
				if bad++; first < 0 {
					first = i
				}
			}
		}
		if bad > 0 {
			return s.name + ": " + strconv.Itoa(bad) + " points are not finite (first at " + p.xText(p.result.Grid[first]) + "); they are left out"
		}
	}
	return ""
}

// seriesDigits are the digits the quantity table gives curve k's value:
// the blend's row for the blend, the species row for a species.
func (p *sweepPane) seriesDigits(k int) mixtures.Digits {
	prop := &sweepProps[p.propIndex()]
	if k < len(p.series) && p.series[k].name != "blend" && prop.hasSpecies() {
		return prop.sq.Digits
	}
	return prop.q.Digits
}

// xText writes a grid value in the x axis unit.
func (p *sweepPane) xText(x float64) string {
	name := mixtures.SweepTemperature.Key()
	if p.result != nil {
		name = p.result.Sweep.Var.Key()
	}
	if p.result != nil && p.result.Sweep.Var == mixtures.SweepPressure {
		x = p.xPres.FromPa(x)
	}
	return name + " = " + sweepTrimZeros(report.Sig(x, 6)) + " " + p.xUnit
}

// pressureUnit is the unit pressures of the sweep show in: that of the
// range as typed, read as gauge when typed so or when the workbench shows
// pressures as gauge.
func (p *sweepPane) pressureUnit() mixtures.PressureUnit {
	u, ok := mixtures.PressureUnitOf(p.set.From)
	if !ok {
		u = mixtures.BarAbsolute
	}
	if p.b != nil && p.b.showGauge {
		u = u.Reading(true)
	}
	return u
}

// sweepTrimZeros drops trailing zeros after a decimal point: grid points
// are often the round numbers typed, and 200 K reads better than 200.000 K.
func sweepTrimZeros(s string) string {
	if !strings.Contains(s, ".") || strings.ContainsAny(s, "eE") {
		return s
	}
	return strings.TrimSuffix(strings.TrimRight(s, "0"), ".")
}

// SetSize sets the cells the pane may draw in.
func (p *sweepPane) SetSize(w, h int) {
	p.w, p.h = max(w, 0), max(h, 0)
	p.refresh()
}

// View draws the pane from lines built in Update.
func (p *sweepPane) View() string { return p.view }

// Settings returns the settings in force, for autosave.
func (p *sweepPane) Settings() SweepSettings { return p.set }

// Editing reports whether a range field is being typed in.
func (p *sweepPane) Editing() bool { return p.editing }

// Result returns the last finished sweep, or nil.
func (p *sweepPane) Result() *mixtures.SweepTable { return p.result }

// StreamResult computes the shown sweep again, point by point, with every
// figure of every point, for an export; the pane keeps only what it
// plots.
func (p *sweepPane) ResultSource() *report.SweepSource { return p.resultKey.source() }

// ShortHelp is the first few bindings, the most used.
func (p *sweepPane) ShortHelp() []key.Binding {
	h := p.KeyHelp()
	return h[:min(len(h), 4)]
}

func (p *sweepPane) Title() string { return "Sweep" }

// Sync follows the document: a sweep of the new inputs, if they changed.
func (p *sweepPane) Sync() tea.Cmd {
	if p.b == nil {
		return nil
	}
	if shown := p.b.presShown(p.b.in.PresPa); shown != p.presShown {
		// The workbench's pressure view changed: the header and a
		// pressure axis follow.
		p.presShown = shown
		if p.result != nil && p.result.Sweep.Var == mixtures.SweepPressure {
			p.rebuildPlot()
		}
		p.refresh()
	}
	return p.SetInputs(p.b.in)
}

func (p *sweepPane) More() (above, below bool) { return false, false }

// setShown starts the wanted sweep when the pane comes on screen; while
// it is hidden, a change of inputs or settings computes nothing, so that
// a long sweep in the saved settings costs nothing until it is looked at.
func (p *sweepPane) setShown(shown bool) tea.Cmd {
	p.hidden = !shown
	if !shown {
		return nil
	}
	cmd := p.recompute()
	if cmd != nil {
		p.refresh()
	}
	return cmd
}

// The settings are kept with the workbench state.
func (p *sweepPane) saveState(st *savedState) { st.Sweep = p.set }
func (p *sweepPane) stateChanged() bool       { return p.Changed() }
func (p *sweepPane) restoreState(st *savedState) {
	if s := st.Sweep; s != (SweepSettings{}) {
		s.From, s.To, s.Species = model.Printable(s.From), model.Printable(s.To), model.Printable(s.Species)
		p.load(s)
	}
}

// Changed reports whether the settings changed since the last call.
func (p *sweepPane) Changed() bool {
	c := p.changed
	p.changed = false
	return c
}

// KeyHelp lists every binding of the pane.
func (p *sweepPane) KeyHelp() []key.Binding {
	k := &p.c.Keys.Sweep
	// The most used first: the first few may serve as short help.
	return []key.Binding{
		k.EditRange, k.Variable, k.Property, k.Overlay,
		k.PrevProperty, k.NextSpecies, k.PrevSpecies, k.ToggleLog,
		k.CursorLeft, k.CursorRight, k.CursorStepLeft, k.CursorStepRight, k.CursorHome, k.CursorEnd,
		k.NextField, k.PrevField, k.Apply, p.c.Keys.Back,
	}
}
