package ui

import (
	"strconv"
	"strings"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures"
	"zmix/mixtures/process"
	"zmix/mixtures/report"
)

// The Process pane runs one calculation of mixtures/process on the
// current recipe at the current setpoint: the recipe is the inlet (stream
// 1, the parent, the start gas) and the fields give the rest, typed with
// the same units and parsing as the commands. It holds no physics: it
// parses the fields, calls Solve and lays out the result's figures.

// processKind is one calculation the pane offers, with its fields.
type processKind struct {
	key, name string
	fields    []processField
	// ownInputs: the calculation does not use the recipe and setpoint
	// (a weighed fill names its own parent gases).
	ownInputs bool
}

// processField is one input of a calculation.
type processField struct {
	key, label string
	def        string // the value a new pane starts with
	hint       string // what the field accepts
	choices    []string
}

var processKinds = []processKind{
	{key: "flow", name: "flow", fields: []processField{
		{key: "rate", label: "flow", def: "100 Nm3/h", hint: "mol/s, kmol/h, kg/h, lb/h, m3/h, L/min, ACFM, Nm3/h, Sm3/h, SLPM, sccm, SCFH, SCFM"},
		{key: "ref", label: "reference", def: "normal", hint: "normal (0 °C), 15C (ISO 13443), 20C, 60F, or \"T, P\""},
	}},
	{key: "compress", name: "compress", fields: []processField{
		{key: "to", label: "to pressure", def: "8 bar", hint: "outlet pressure; below the setpoint makes an expander"},
		{key: "eff", label: "efficiency", def: "0.8", hint: "isentropic efficiency: 0.8 or 80%"},
		{key: "stages", label: "stages", def: "1", hint: "compression stages of equal pressure ratio, 1 to 20"},
		{key: "intercool", label: "intercool to", def: "", hint: "temperature between stages; empty: the inlet's"},
		{key: "rate", label: "flow", def: "", hint: "for the power; empty: none"},
	}},
	{key: "heat", name: "heat", fields: []processField{
		{key: "to", label: "to temperature", def: "150 C", hint: "outlet temperature, at the setpoint pressure"},
		{key: "rate", label: "flow", def: "", hint: "for the duty as a power; empty: none"},
	}},
	{key: "mix", name: "mix", fields: []processField{
		{key: "rate1", label: "recipe flow", def: "100 Nm3/h", hint: "stream 1: the recipe at the setpoint"},
		{key: "blend2", label: "stream 2", def: "N2 1", hint: "blend text, or @FILE for a blend file"},
		{key: "temp2", label: "stream 2 T", def: "25 C", hint: "stream 2 temperature"},
		{key: "rate2", label: "stream 2 flow", def: "20 Nm3/h", hint: "stream 2 flow"},
	}},
	{key: "dilute", name: "dilute", fields: []processField{
		{key: "with", label: "diluent", def: "N2 1", hint: "a pure gas or a second blend, or @FILE"},
		{key: "target", label: "target", def: "SiH4 100ppm", hint: "\"SPECIES LEVEL\", e.g. SiH4 50ppm; with a ratio, the species only"},
		{key: "ratio", label: "or ratio", def: "", hint: "moles of diluent per mole of recipe; empty: use the target level"},
		{key: "rate", label: "recipe flow", def: "", hint: "for the diluent and total flows; empty: none"},
	}},
	{key: "purge", name: "purge", fields: []processField{
		{key: "gas", label: "purge gas", def: "N2 1", hint: "blend text, or @FILE"},
		{key: "target", label: "target", def: "O2 10ppm", hint: "\"SPECIES LEVEL\" to reach in the volume"},
		{key: "method", label: "method", def: "swing", hint: "enter switches", choices: []string{"swing", "vacuum", "flow"}},
		{key: "range", label: "pressures", def: "1..7 bar", hint: "swing or vacuum: P_LOW..P_HIGH, absolute"},
		{key: "volume", label: "volume", def: "", hint: "m3, L or ft3; flow purge, or gas used"},
		{key: "rate", label: "purge flow", def: "", hint: "flow purge only"},
	}},
	{key: "release", name: "release", fields: []processField{
		{key: "amount", label: "amount", def: "2 Nm3", hint: "released at once, or in all with a rate: mol, kg, lb, Nm3, SL, Sm3, scf, m3 at 20 °C"},
		{key: "cylinder", label: "or cylinder", def: "", hint: "in place of the amount, a cylinder's water volume (50 L): its contents at the setpoint's T and P, less what stays at 1 atm"},
		{key: "rate", label: "or rate", def: "", hint: "a continuous release: SLPM, Nm3/h, kg/h, ...; empty: all at once"},
		{key: "room", label: "room", def: "30 m3", hint: "room volume: m3, L or ft3, or its sides, 6 x 4 x 3 m"},
		{key: "ach", label: "air changes/h", def: "", hint: "ventilation; empty: none"},
	}},
	{key: "throttle", name: "throttle", fields: []processField{
		{key: "to", label: "to pressure", def: "1 atm", hint: "outlet pressure of the valve, at most the setpoint's (real gas: enthalpy kept)"},
	}},
	{key: "cylinder", name: "cylinder", fields: []processField{
		{key: "volume", label: "water volume", def: "50 L", hint: "L, m3 or ft3; the setpoint gives the fill T and P"},
		{key: "to", label: "later T", def: "", hint: "the pressure after warming or cooling to it; empty: none"},
		{key: "recipe", label: "recipe", def: "pressure", hint: "enter switches", choices: []string{"pressure", "weight", "none"}},
		{key: "rated", label: "rated P", def: "", hint: "the cylinder's rating: a fill above it is refused; empty: none"},
	}},
	{key: "weighed", name: "weighed", ownInputs: true, fields: []processField{
		{key: "parent1", label: "parent 1", def: "2.4105 g CH4", hint: weighedParentHint},
		{key: "parent2", label: "parent 2", def: "412.37 g N2 with O2 <5ppm", hint: weighedParentHint},
		{key: "parent3", label: "parent 3", def: "", hint: weighedParentHint},
		{key: "parent4", label: "parent 4", def: "", hint: weighedParentHint},
		{key: "massu", label: "u of each mass", def: "4 mg", hint: "standard uncertainty of each weighed mass: " + process.WeighedMassUnits},
		{key: "atomic", label: "atomic weight", def: "", hint: "an element's own: EL VALUE +- U, e.g. Ar 39.9478 +- 0.0002 (g/mol, standard uncertainty); empty: IUPAC's"},
	}},
}

// weighedParentHint says how a parent weighed in is typed.
const weighedParentHint = "MASS [+- U] [of] GAS: 25.1 g CO2, 412 g N2 with O2 <5ppm, H2O 3ppm +-1ppm, or a premix CH4 2.5% +-0.002%, N2 bal (by mass: 2.5 wt%); empty: none"

// processPathPoints is how finely a path is sampled for the plot.
const processPathPoints = 60

type processPane struct {
	c    *Common
	b    *bench
	w, h int

	kind    int
	values  map[string]string // "kind.field" → text as typed
	sel     int
	editing bool
	input   field
	before  string
	plotOn  bool

	// From the last solve, for the inputs of generation gen.
	gen     uint64
	solved  bool
	result  process.Result
	label   string
	err     string // why there is no result: which field, what is accepted
	path    *process.Path
	pathErr string

	plot     *plotModel
	scroll   scroller
	selLine  int // where the marked field is, and the plot starts (-1: none)
	plotLine int
	changed  bool // a setting changed since the autosave last looked
}

func newProcessPane(c *Common, b *bench) *processPane {
	p := &processPane{c: c, b: b, input: newField(c), values: map[string]string{}, plot: newPlotModel(c.Styles, c.ASCII)}
	for _, k := range processKinds {
		for _, f := range k.fields {
			p.values[k.key+"."+f.key] = f.def
		}
	}
	return p
}

func (p *processPane) current() *processKind { return &processKinds[p.kind] }

func (p *processPane) value(fieldKey string) string {
	return strings.TrimSpace(p.values[p.current().key+"."+fieldKey])
}

func (p *processPane) SetSize(w, h int) {
	p.w, p.h = max(w, 0), max(h, 0)
	p.input.setWidth(p.fieldWidth())
	p.refresh()
}

func (p *processPane) fieldWidth() int { return max(8, min(28, p.w-18)) }

func (p *processPane) Editing() bool { return p.editing }

func (p *processPane) KeyHelp() []key.Binding {
	k := p.c.Keys.Process
	if p.editing {
		return []key.Binding{p.c.Keys.Accept, p.c.Keys.Back, p.c.Keys.Interrupt}
	}
	sc := p.c.Keys.Scroll
	return []key.Binding{k.PrevKind, k.NextKind, k.Up, k.Down, k.Edit, k.Plot, sc.PageUp, sc.PageDown, sc.Top, sc.Bottom, p.c.Keys.Export}
}

func (p *processPane) ShortHelp() []key.Binding {
	k := p.c.Keys.Process
	if p.editing {
		return []key.Binding{p.c.Keys.Accept, p.c.Keys.Back}
	}
	return []key.Binding{k.NextKind, k.Edit, k.Plot}
}

func (p *processPane) Title() string { return "Process: " + p.current().name }

func (p *processPane) More() (above, below bool) { return p.scroll.more() }

func (p *processPane) View() string { return p.scroll.view() }

// Sync solves again when the recipe or the setpoint changed.
func (p *processPane) Sync() tea.Cmd {
	if !p.solved || p.gen != p.b.in.Gen {
		p.solve()
	}
	p.refresh()
	return nil
}

func (p *processPane) Update(m tea.Msg) tea.Cmd {
	msg, ok := m.(tea.KeyMsg)
	if !ok {
		return nil
	}
	kind := p.current()
	if p.editing {
		var cmd tea.Cmd
		switch {
		case key.Matches(msg, p.c.Keys.Back):
			p.values[kind.key+"."+kind.fields[p.sel].key] = p.before
			p.stopEdit()
			p.solve()
		case key.Matches(msg, p.c.Keys.Accept):
			p.stopEdit()
			p.solve()
		default:
			cmd = p.input.update(msg)
			p.values[kind.key+"."+kind.fields[p.sel].key] = p.input.value()
			p.changed = true
			p.solve() // the result follows the typing, as in the recipe
		}
		p.refresh()
		return cmd
	}
	k := p.c.Keys.Process
	sc := p.c.Keys.Scroll
	switch {
	case key.Matches(msg, k.NextKind):
		p.setKind((p.kind + 1) % len(processKinds))
		p.scroll.top()
	case key.Matches(msg, k.PrevKind):
		p.setKind((p.kind + len(processKinds) - 1) % len(processKinds))
		p.scroll.top()
	case key.Matches(msg, k.Up):
		p.sel = max(p.sel-1, 0)
		p.refresh()
		p.scroll.show(p.selLine, p.selLine)
	case key.Matches(msg, k.Down):
		p.sel = min(p.sel+1, len(kind.fields)-1)
		p.refresh()
		p.scroll.show(p.selLine, p.selLine+1)
	case key.Matches(msg, k.Plot):
		p.plotOn = !p.plotOn
		p.changed = true
		p.solvePath()
		p.refresh()
		if p.plotLine >= 0 {
			p.scroll.bottom() // the plot is what was asked for
		}
	case key.Matches(msg, k.Edit):
		f := kind.fields[p.sel]
		if len(f.choices) > 0 {
			p.cycle(f)
			p.solve()
			break
		}
		p.editing = true
		p.before = p.values[kind.key+"."+f.key]
		p.input.start(p.before)
		p.refresh()
		p.scroll.show(p.selLine, p.selLine+1)
	case key.Matches(msg, sc.PageUp):
		p.scroll.scroll(-max(p.h-1, 1))
	case key.Matches(msg, sc.PageDown):
		p.scroll.scroll(max(p.h-1, 1))
	case key.Matches(msg, sc.Top):
		p.scroll.top()
	case key.Matches(msg, sc.Bottom):
		p.scroll.bottom()
	}
	p.refresh()
	return nil
}

func (p *processPane) setKind(i int) {
	p.kind, p.sel = i, 0
	p.changed = true
	p.solve()
}

// cycle moves a field of fixed choices to its next choice.
func (p *processPane) cycle(f processField) {
	k := p.current().key + "." + f.key
	i := 0
	for j, c := range f.choices {
		if c == p.values[k] {
			i = j + 1
		}
	}
	p.values[k] = f.choices[i%len(f.choices)]
	p.changed = true
}

func (p *processPane) stopEdit() {
	p.editing = false
	p.input.stop()
}

// solve parses the fields and runs the calculation on the current inputs.
func (p *processPane) solve() {
	p.gen, p.solved = p.b.in.Gen, true
	p.result, p.err, p.path, p.pathErr = nil, "", nil, ""
	if !p.b.in.Valid() && !p.current().ownInputs {
		p.err = "no valid recipe and setpoint yet (see Recipe and Setpoint)"
		return
	}
	res, label, err := p.calculate()
	if err != nil {
		p.err = cleanErr(err)
		return
	}
	if what := process.FirstNonFinite(res); what != "" {
		p.err = "the model gives a non-finite " + what + " here"
		return
	}
	p.result, p.label = res, label
	p.solvePath()
}

// solvePath samples the path to plot, when the plot is on and the result
// has one.
func (p *processPane) solvePath() {
	p.path, p.pathErr = nil, ""
	pl, ok := p.result.(process.Plotter)
	if !p.plotOn || !ok || p.result == nil {
		return
	}
	path, err := pl.Path(processPathPoints)
	if err != nil {
		p.pathErr = cleanErr(err)
		return
	}
	p.path = &path
}

// fieldError names the field at fault.
func fieldError(label string, err error) error {
	return &fieldErr{label: label, err: err}
}

type fieldErr struct {
	label string
	err   error
}

func (e *fieldErr) Error() string       { return e.label + ": " + cleanErr(e.err) }
func (e *fieldErr) UserMessage() string { return e.Error() }

func (p *processPane) rate(fieldKey, label string, mix *mixtures.Mixture, tempK, presPa float64) (float64, error) {
	text := p.value(fieldKey)
	if text == "" {
		return 0, nil
	}
	r, err := process.ParseRate(text)
	if err != nil {
		return 0, fieldError(label, err)
	}
	n, err := r.MolPerSec(process.Ideal{Options: p.b.in.Opts}.Gas(mix), process.Conditions{TempK: tempK, PresPa: presPa})
	if err != nil {
		return 0, fieldError(label, err)
	}
	return n, nil
}

// blendField reads a blend typed in a field: text, or @FILE.
func (p *processPane) blendField(fieldKey, label string, presPa float64) (*mixtures.Mixture, string, error) {
	text := p.value(fieldKey)
	if text == "" {
		return nil, "", fieldError(label, errText("give a blend, e.g. N2 1"))
	}
	var b *mixtures.Blend
	var err error
	if path, ok := strings.CutPrefix(text, "@"); ok {
		_, b, err = mixtures.ReadBlendFile(path)
	} else {
		b, err = mixtures.ParseBlend(text)
	}
	if err != nil {
		return nil, "", fieldError(label, err)
	}
	mix, err := b.Resolve(p.c.Catalogue, presPa)
	if err != nil {
		return nil, "", fieldError(label, err)
	}
	return mix, text, nil
}

type errText string

func (e errText) Error() string { return string(e) }

// calculate builds the chosen calculation from the fields and solves it.
func (p *processPane) calculate() (process.Result, string, error) {
	in := p.b.in
	mix, t, pres := in.Mixture, in.TempK, in.PresPa
	m := process.Ideal{Options: in.Opts}
	recipe := "the recipe at " + report.Short(t, 6) + " K, " + p.b.presShown(pres)
	temp := func(fieldKey, label string) (float64, error) {
		k, err := mixtures.ParseTemperature(p.value(fieldKey))
		if err != nil {
			return 0, fieldError(label, err)
		}
		return k, nil
	}
	switch p.current().key {
	case "flow":
		r, err := process.ParseRate(p.value("rate"))
		if err != nil {
			return nil, "", fieldError("flow", err)
		}
		f := process.Flow{Mixture: mix, Rate: r, LineTempK: t, LinePresPa: pres, Model: m}
		if ref := p.value("ref"); ref != "" {
			if f.Ref, err = process.ParseReference(ref); err != nil {
				return nil, "", fieldError("reference", err)
			}
		}
		res, err := f.Solve()
		return res, recipe, err
	case "compress":
		to, err := mixtures.ParsePressure(p.value("to"))
		if err != nil {
			return nil, "", fieldError("to pressure", err)
		}
		c := process.Compression{Mixture: mix, InletTempK: t, InletPresPa: pres, OutletPresPa: to.Pa, Model: m}
		if e := p.value("eff"); e != "" {
			if c.Efficiency, err = process.ParseEfficiency(e); err != nil {
				return nil, "", fieldError("efficiency", err)
			}
		}
		if s := p.value("stages"); s != "" {
			n, err := strconv.Atoi(s)
			if err != nil || n < 1 || n > process.MaxStages {
				return nil, "", fieldError("stages", errText("want a whole number from 1 to "+strconv.Itoa(process.MaxStages)))
			}
			c.Stages = n
		}
		if p.value("intercool") != "" {
			if c.IntercoolTempK, err = temp("intercool", "intercool to"); err != nil {
				return nil, "", err
			}
		}
		if c.RateMolPerSec, err = p.rate("rate", "flow", mix, t, pres); err != nil {
			return nil, "", err
		}
		res, err := c.Solve()
		return res, recipe, err
	case "heat":
		t2, err := temp("to", "to temperature")
		if err != nil {
			return nil, "", err
		}
		h := process.Heating{Mixture: mix, InletTempK: t, OutletTempK: t2, PresPa: pres, Model: m}
		if h.RateMolPerSec, err = p.rate("rate", "flow", mix, t, pres); err != nil {
			return nil, "", err
		}
		res, err := h.Solve()
		return res, recipe, err
	case "mix":
		n1, err := p.rate("rate1", "recipe flow", mix, t, pres)
		if err != nil {
			return nil, "", err
		}
		if n1 == 0 {
			return nil, "", fieldError("recipe flow", errText("give the recipe's flow, e.g. 100 Nm3/h"))
		}
		mix2, text2, err := p.blendField("blend2", "stream 2", pres)
		if err != nil {
			return nil, "", err
		}
		t2, err := temp("temp2", "stream 2 T")
		if err != nil {
			return nil, "", err
		}
		n2, err := p.rate("rate2", "stream 2 flow", mix2, t2, pres)
		if err != nil {
			return nil, "", err
		}
		if n2 == 0 {
			return nil, "", fieldError("stream 2 flow", errText("give stream 2's flow, e.g. 20 Nm3/h"))
		}
		mx := process.Mixing{PresPa: pres, Model: m, Streams: []process.Stream{
			{Label: "recipe", Mixture: mix, TempK: t, RateMolPerSec: n1},
			{Label: text2, Mixture: mix2, TempK: t2, RateMolPerSec: n2},
		}}
		res, err := mx.Solve()
		return res, "the recipe  +  " + text2, err
	case "dilute":
		dil, text2, err := p.blendField("with", "diluent", pres)
		if err != nil {
			return nil, "", err
		}
		d := process.Dilution{Parent: mix, Diluent: dil}
		target := p.value("target")
		if target == "" {
			return nil, "", fieldError("target", errText("give "+process.TargetForm))
		}
		if ratio := p.value("ratio"); ratio != "" {
			r, err := process.ParseDilutionRatio(ratio)
			if err != nil {
				return nil, "", fieldError("ratio", err)
			}
			sp, err := process.ParseTargetSpecies(p.c.Catalogue, target)
			if err != nil {
				return nil, "", fieldError("target", err)
			}
			d.Species, d.Ratio = sp, r
		} else {
			tg, err := process.ParseTarget(p.c.Catalogue, target)
			if err != nil {
				return nil, "", fieldError("target", err)
			}
			d.Species, d.TargetX = tg.Species, tg.X
		}
		if d.ParentRateMolPerSec, err = p.rate("rate", "recipe flow", mix, t, pres); err != nil {
			return nil, "", err
		}
		res, err := d.Solve()
		return res, "the recipe diluted with " + text2, err
	case "purge":
		gas, text2, err := p.blendField("gas", "purge gas", pres)
		if err != nil {
			return nil, "", err
		}
		tg, err := process.ParseTarget(p.c.Catalogue, p.value("target"))
		if err != nil {
			return nil, "", fieldError("target", err)
		}
		pu := process.Purge{Start: mix, PurgeGas: gas, Target: tg, TempK: t, Model: m}
		if v := p.value("volume"); v != "" {
			if pu.VolumeM3, err = process.ParseVolume(v); err != nil {
				return nil, "", fieldError("volume", err)
			}
		}
		switch p.value("method") {
		case "flow":
			pu.Method, pu.PresPa = process.PurgeFlow, pres
			if pu.VolumeM3 == 0 {
				return nil, "", fieldError("volume", errText("a flow purge needs the volume, e.g. 2 m3"))
			}
			if pu.Rate, err = process.ParseRate(p.value("rate")); err != nil {
				return nil, "", fieldError("purge flow", err)
			}
		default:
			pu.Method = process.PurgeSwing
			if p.value("method") == "vacuum" {
				pu.Method = process.PurgeVacuum
			}
			lo, hi, err := mixtures.ParseRange(p.value("range"))
			if err != nil {
				return nil, "", fieldError("pressures", err)
			}
			plo, err := mixtures.ParsePressure(lo)
			if err != nil {
				return nil, "", fieldError("pressures", err)
			}
			phi, err := mixtures.ParsePressure(hi)
			if err != nil {
				return nil, "", fieldError("pressures", err)
			}
			pu.PLowPa, pu.PHighPa = plo.Pa, phi.Pa
		}
		res, err := pu.Solve()
		return res, "the recipe purged with " + text2, err
	case "throttle":
		to, err := mixtures.ParsePressure(p.value("to"))
		if err != nil {
			return nil, "", fieldError("to pressure", err)
		}
		res, err := process.Throttle{Mixture: mix, InletTempK: t, InletPresPa: pres, OutletPresPa: to.Pa,
			Model: process.RealGas{Options: in.Opts}}.Solve()
		return res, recipe + " through a valve", err
	case "cylinder":
		c := process.Cylinder{Mixture: mix, TempK: t, PresPa: pres}
		var err error
		if c.VolumeM3, err = process.ParseCylinderQuantity("volume", p.value("volume")); err != nil {
			return nil, "", fieldError("water volume", err)
		}
		if v := p.value("to"); v != "" {
			if c.ToTempK, err = temp("to", "later T"); err != nil {
				return nil, "", err
			}
		}
		if r := p.value("recipe"); r != "none" {
			c.Recipe = r
		}
		if v := p.value("rated"); v != "" {
			rp, err := mixtures.ParsePressure(v)
			if err != nil {
				return nil, "", fieldError("rated P", err)
			}
			c.RatedPresPa = rp.Pa
		}
		res, err := c.Solve()
		return res, recipe + " in a cylinder", err
	case "weighed":
		massU, err := process.ParseWeighedMass(p.value("massu"))
		if err != nil {
			return nil, "", fieldError("u of each mass", err)
		}
		w := process.Weighing{MassUKg: massU}
		if text := p.value("atomic"); text != "" {
			aw, err := process.ParseAtomicWeight(text)
			if err != nil {
				return nil, "", fieldError("atomic weight", err)
			}
			w.AtomicWeights = []process.AtomicWeight{aw}
		}
		var gases []string
		for i, f := range p.current().fields[:4] {
			text := p.value(f.key)
			if text == "" {
				continue
			}
			parent, err := process.ParseParent(p.c.Catalogue, text)
			if err != nil {
				return nil, "", fieldError("parent "+strconv.Itoa(i+1), err)
			}
			w.Parents = append(w.Parents, parent)
			gases = append(gases, parent.Gas)
		}
		res, err := w.Solve()
		return res, strings.Join(gases, "  +  ") + " weighed in", err
	case "release":
		res, err := process.RoomRelease{Mixture: mix, Amount: p.value("amount"), Rate: p.value("rate"), Room: p.value("room"), ACH: p.value("ach"),
			Cylinder: p.value("cylinder"), FillTempK: t, FillPresPa: pres}.Solve()
		if err != nil {
			return nil, "", err
		}
		return res, "the recipe released into a room (well-mixed model; zmix release gives the time course and sources)", nil
	}
	return nil, "", errText("unknown process")
}

// processReport is the result as the commands write it, for the export.
func (p *processPane) processReport() *report.ProcessReport {
	if p.result == nil {
		return nil
	}
	return &report.ProcessReport{Label: p.label, Result: p.result}
}

// refresh lays the pane out: the kinds, the fields, the result, and the
// plot when it is on.
func (p *processPane) refresh() {
	s := p.c.Styles
	t := p.c.Text
	var lines []string
	add := func(l string) { lines = append(lines, l) }
	wrapped := func(style func(...string) string, indent, text string) {
		for _, l := range report.Wrap(t(text), max(p.w-len(indent), 8)) {
			add(indent + style(l))
		}
	}

	var kinds []string
	for i, k := range processKinds {
		if i == p.kind {
			kinds = append(kinds, s.Selected.Render("["+k.name+"]"))
		} else {
			kinds = append(kinds, " "+k.name+" ")
		}
	}
	// The kinds run on as many lines as the width needs, never cut.
	row := ""
	for _, k := range kinds {
		if row != "" && lipgloss.Width(row)+lipgloss.Width(k) > p.w {
			add(row)
			row = ""
		}
		row += k
	}
	add(row)
	if in := p.b.in; in.Valid() && !p.current().ownInputs {
		wrapped(s.Muted.Render, "", "inlet: the recipe at "+report.Short(in.TempK, 6)+" K, "+p.b.presShown(in.PresPa))
	}

	kind := p.current()
	const lw = 15
	fw := p.fieldWidth()
	selLine := 0
	for i, f := range kind.fields {
		mark, label := "  ", padRight(f.label, lw)
		if i == p.sel {
			mark, label = "> ", s.Selected.Render(label)
			selLine = len(lines)
		}
		v := p.values[kind.key+"."+f.key]
		var shown string
		switch {
		case p.editing && i == p.sel:
			shown = p.input.view(fw)
		case v == "":
			shown = s.Muted.Render(padRight("(none)", fw))
		default:
			shown = padRight(t(p.c.shorten(v, fw)), fw)
		}
		add(mark + label + " " + shown)
	}
	if p.sel < len(kind.fields) && (p.editing || p.w >= 40) {
		wrapped(s.Muted.Render, "    ", kind.fields[p.sel].hint)
	}
	add("")

	switch {
	case p.err != "":
		wrapped(s.Error.Render, "", p.err)
	case p.result != nil:
		p.resultLines(add, wrapped)
	}
	p.plotLine = -1
	if p.plotOn {
		p.plotLine = len(lines)
	}
	p.plotLines(add)
	p.selLine = selLine
	p.scroll.setHeight(p.h)
	p.scroll.setLines(lines)
}

// resultLines lays out the result's figures from their descriptions.
func (p *processPane) resultLines(add func(string), wrapped func(func(...string) string, string, string)) {
	s := p.c.Styles
	t := p.c.Text
	res := p.result
	const lw, vw = 30, 12
	for _, v := range res.Outputs() {
		label := v.Label
		if lipgloss.Width(label) > lw {
			label = p.c.shorten(label, lw)
		}
		line := s.Label.Render(padRight(t(label), lw)) + s.Value.Render(padLeft(report.FigureNumber(v), vw)) + " " + s.Unit.Render(t(v.Unit))
		if also := report.FigureAlso(v); len(also) > 0 && p.w >= lw+vw+30 {
			line += s.Muted.Render(t("  " + also[0]))
		}
		add(line)
	}
	// The tables (stages, streams, composition) and the outlet's
	// composition, written by the commands' own table writer.
	var tb strings.Builder
	for _, table := range res.Tables() {
		report.WriteFigureTable(&tb, table)
	}
	if st := res.Outlet(); st != nil {
		tb.WriteString("Outlet composition\n")
		report.WriteComposition(&tb, st)
	}
	if tb.Len() > 0 {
		add("")
		for _, l := range strings.Split(strings.TrimRight(tb.String(), "\n"), "\n") {
			add(t(l))
		}
		add("")
	}
	wrapped(s.Muted.Render, "", "Model: "+res.Assumptions()+".")
	// The notes qualify the figures (a factor that is common practice, a
	// target already met), so they are shown as the commands show them.
	for _, n := range res.Notes() {
		wrapped(s.Muted.Render, "", "Note: "+strings.TrimSuffix(n, ".")+".")
	}
	if n := len(res.Cautions()); n > 0 {
		var titles []string
		for _, c := range res.Cautions() {
			titles = append(titles, c.Title)
		}
		wrapped(s.Caution.Render, "", "Cautions: "+strings.Join(titles, " · ")+" (ctrl+e exports them in full)")
	}
}

// plotLines draws the path below the result when the plot is on.
func (p *processPane) plotLines(add func(string)) {
	if !p.plotOn {
		return
	}
	s := p.c.Styles
	if p.result == nil {
		return // the error above says why there is nothing to plot
	}
	if _, ok := p.result.(process.Plotter); !ok {
		add(s.Muted.Render(p.c.Text("no path to plot for this process (compress and heat have one)")))
		return
	}
	if p.pathErr != "" {
		add(s.Error.Render(p.c.Text(p.pathErr)))
		return
	}
	if p.path == nil {
		return
	}
	path := p.path
	spec := plotSpec{grid: path.X, xLabel: path.XLabel, yLabel: path.YLabel, xLog: path.XLog}
	for _, c := range path.Curves {
		y := c.Y
		spec.series = append(spec.series, plotSeries{name: c.Name, y: func(i int) float64 { return y[i] }})
	}
	add("")
	var legend []string
	for k, c := range path.Curves {
		legend = append(legend, plotSample(k, p.c.ASCII)+" "+c.Name)
	}
	add(s.Muted.Render(p.c.Text(strings.Join(legend, "   "))))
	p.plot.setSize(p.w, max(plotMinRows+4, min(16, p.h-1)))
	p.plot.setSpec(spec)
	for _, l := range p.plot.view() {
		add(l)
	}
}

// The settings the autosave keeps: the process chosen, the plot, and
// every field as typed.
func (p *processPane) saveState(st *savedState) {
	st.Process = map[string]string{"kind": p.current().key}
	if p.plotOn {
		st.Process["plot"] = "on"
	}
	for k, v := range p.values {
		st.Process[k] = v
	}
}

func (p *processPane) restoreState(st *savedState) {
	if st.Process == nil {
		return
	}
	for i, k := range processKinds {
		if k.key == st.Process["kind"] {
			p.kind = i
		}
		for _, f := range k.fields {
			if v, ok := st.Process[k.key+"."+f.key]; ok && len(v) <= maxFieldRunes {
				p.values[k.key+"."+f.key] = v
			}
		}
	}
	p.plotOn = st.Process["plot"] == "on"
	p.solved = false
}

func (p *processPane) stateChanged() bool {
	c := p.changed
	p.changed = false
	return c
}
