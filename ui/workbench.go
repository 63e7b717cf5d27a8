package ui

import (
	"errors"
	"fmt"
	"math"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/mixtures/safety"
	"zmix/model"
)

// bench is the document the panes edit: the recipe and the conditions as
// typed, and everything derived from them. The text is the truth; the
// derived Inputs change only when the text resolves, so a typing slip never
// replaces the last valid state.
type bench struct {
	cat *model.Catalogue

	entries            []mixtures.FileComponent // the recipe, each line as typed
	undo               []mixtures.FileComponent // the recipe before its last change
	canUndo            bool
	name, note         string // carried from a blend file
	tempText, presText string
	std                mixtures.StdPressure // standard pressure P° of μ°
	showGauge          bool                 // show the total pressure as gauge

	// Derived by update.
	rowErr   []string // per entry; "" when the entry reads
	blendErr string   // the recipe as a whole does not resolve
	tempErr  string
	presErr  string
	in       Inputs
	state    mixtures.State // valid when stateErr == "" and in.Valid()
	stateErr string
	cautions []mixtures.Caution
	notes    []mixtures.StateNote
	hazard   *safety.Result // the recipe's classification; nil without a state

	// The text of the last valid recipe and conditions, saved with the
	// state so that a restart with a typing slip still has a state.
	validEntries         []mixtures.FileComponent
	validTemp, validPres string

	content uint64 // grows with every edit of what a blend file holds
	loads   uint64 // grows with every blend file loaded over the recipe
	changed bool   // an edit since the last update
}

func newBench(cat *model.Catalogue) *bench { return &bench{cat: cat} }

// printableFile is f with every text made printable (model.Printable):
// a blend file or a saved state may hold escapes that would otherwise
// reach the terminal, and what the document holds is what panes draw.
func printableFile(f *mixtures.BlendFile) *mixtures.BlendFile {
	c := *f
	c.Name, c.Note = model.Printable(f.Name), model.Printable(f.Note)
	c.Temperature, c.Pressure = model.Printable(f.Temperature), model.Printable(f.Pressure)
	c.StandardPressure = model.Printable(f.StandardPressure)
	c.Components = make([]mixtures.FileComponent, len(f.Components))
	for i, fc := range f.Components {
		c.Components[i] = mixtures.FileComponent{Species: model.Printable(fc.Species), Amount: model.Printable(fc.Amount)}
	}
	return &c
}

// loadFile replaces the recipe and conditions with those of a blend file.
// How pressures are shown (absolute or gauge) is the user's setting, which
// a file does not change; see viewFromFile.
func (b *bench) loadFile(f *mixtures.BlendFile) {
	f = printableFile(f)
	b.entries = append(b.entries[:0], f.Components...)
	b.name, b.note = f.Name, f.Note
	b.loads++
	if f.Temperature != "" {
		b.tempText = f.Temperature
	}
	if f.Pressure != "" {
		b.presText = f.Pressure
	}
	b.std, _ = mixtures.ParseStdPressure(f.StandardPressure)
	b.touch()
}

// blendFile returns the recipe and conditions in blend-file form.
func (b *bench) blendFile() *mixtures.BlendFile {
	return &mixtures.BlendFile{Format: mixtures.BlendFormat, Name: b.name, Note: b.note,
		Components:  append([]mixtures.FileComponent(nil), b.entries...),
		Temperature: b.tempText, Pressure: b.presText, StandardPressure: b.stdText()}
}

// lastValidFile is the recipe and conditions that last resolved.
func (b *bench) lastValidFile() *mixtures.BlendFile {
	return &mixtures.BlendFile{Format: mixtures.BlendFormat,
		Components:  append([]mixtures.FileComponent(nil), b.validEntries...),
		Temperature: b.validTemp, Pressure: b.validPres, StandardPressure: b.stdText()}
}

// setText takes the recipe and conditions of f exactly as written, for a
// restart; unlike loadFile it keeps empty conditions empty.
func (b *bench) setText(f *mixtures.BlendFile) {
	f = printableFile(f)
	b.entries = append(b.entries[:0], f.Components...)
	b.name, b.note = f.Name, f.Note
	b.tempText, b.presText = f.Temperature, f.Pressure
	b.std, _ = mixtures.ParseStdPressure(f.StandardPressure)
	b.changed = true
}

func (b *bench) stdText() string { return b.std.String() }

func (b *bench) touch() { b.content++; b.changed = true }

// valid reports whether everything typed reads, so that the screen shows
// what was typed rather than an older state.
func (b *bench) valid() bool {
	return b.blendErr == "" && !anyErr(b.rowErr) && b.tempErr == "" && b.presErr == "" && b.stateErr == ""
}

func (b *bench) setAmount(i int, text string) {
	if i >= 0 && i < len(b.entries) && b.entries[i].Amount != text {
		b.entries[i].Amount = text
		b.touch()
	}
}

// addSpecies appends a species with an empty amount, or finds it if it is
// already there; it returns the entry's index and whether it was added.
func (b *bench) addSpecies(formula string) (int, bool) {
	want, _ := b.cat.Lookup(formula)
	for i, e := range b.entries {
		if sp, ok := b.cat.Lookup(e.Species); e.Species == formula || ok && sp == want {
			return i, false
		}
	}
	b.entries = append(b.entries, mixtures.FileComponent{Species: formula})
	b.touch()
	return len(b.entries) - 1, true
}

// rememberRecipe keeps a recipe (the current one when before is nil) for
// one undo of the change about to be made.
func (b *bench) rememberRecipe(before []mixtures.FileComponent) {
	if before == nil {
		before = b.entries
	}
	b.undo = append(b.undo[:0], before...)
	b.canUndo = true
}

// undoRecipe puts back the remembered recipe and remembers the current
// one in its place, so that undoing again redoes. It reports whether
// there was anything to undo.
func (b *bench) undoRecipe() bool {
	if !b.canUndo {
		return false
	}
	cur := append([]mixtures.FileComponent{}, b.entries...)
	b.entries = append(b.entries[:0], b.undo...)
	b.undo = cur
	b.touch()
	return true
}

// setName and setNote change the blend's name and note, which its file
// keeps; control characters are left out.
func (b *bench) setName(s string) {
	if s = model.Printable(s); s != b.name {
		b.name = s
		b.touch()
	}
}

func (b *bench) setNote(s string) {
	if s = model.Printable(s); s != b.note {
		b.note = s
		b.touch()
	}
}

func (b *bench) remove(i int) {
	if i >= 0 && i < len(b.entries) {
		b.entries = append(b.entries[:i], b.entries[i+1:]...)
		b.touch()
	}
}

func isBalance(amount string) bool {
	a := strings.ToLower(strings.TrimSpace(amount))
	return a == "bal" || a == "balance"
}

// setBalance makes entry i the balance. The entry that was the balance
// before keeps the share it had, written as mol %, so the blend does not
// change under the user's feet. Marking the balance again clears it to
// its share, too.
func (b *bench) setBalance(i int) {
	if i < 0 || i >= len(b.entries) {
		return
	}
	share := func(j int) string {
		if x, ok := b.moleFraction(b.entries[j].Species); ok {
			return report.Short(100*x, 6) + "%"
		}
		return ""
	}
	if isBalance(b.entries[i].Amount) {
		b.entries[i].Amount = share(i)
		b.touch()
		return
	}
	for j := range b.entries {
		if j != i && isBalance(b.entries[j].Amount) {
			b.entries[j].Amount = share(j)
		}
	}
	b.entries[i].Amount = "bal"
	b.touch()
}

// moleFraction returns the mole fraction, in the last valid mixture, of
// the species an entry names (by formula or name).
func (b *bench) moleFraction(key string) (float64, bool) {
	if b.in.Mixture == nil {
		return 0, false
	}
	// The row's own share, as the blend's items give it: air's row shows
	// air, not the O2 and N2 it brings to other rows.
	if x, ok := b.in.Mixture.ItemFraction(key); ok {
		return x, true
	}
	sp, ok := b.cat.Lookup(key)
	if !ok {
		return 0, false
	}
	for _, c := range b.in.Mixture.Components {
		if c.Species == sp {
			return c.X, true
		}
	}
	return 0, false
}

// Normalise errors; the text is what the status line shows.
var (
	errNormBalance = errors.New("normalise: the recipe has a balance species, which already closes it to 100 %; clear the balance first (b)")
	errNormMixed   = errors.New("normalise: the amounts mix mole and mass bases; write them all on one basis first")
	errNormPartial = errors.New("normalise: partial pressures and dew points are absolute amounts and cannot be scaled; write them as fractions first")
	errNormBad     = errors.New("normalise: fix the entries marked in red first")
	errNormEmpty   = errors.New("normalise: nothing to scale: every amount is zero")
)

// normalise scales every amount so that they sum to 100 %, keeping each
// amount's own unit; the arithmetic is mixtures.NormaliseAmounts.
func (b *bench) normalise() error {
	texts := make([]string, len(b.entries))
	for i, e := range b.entries {
		texts[i] = e.Amount
	}
	scaled, err := mixtures.NormaliseAmounts(texts)
	switch {
	case errors.Is(err, mixtures.ErrNormaliseBalance):
		return errNormBalance
	case errors.Is(err, mixtures.ErrNormaliseMixed):
		return errNormMixed
	case errors.Is(err, mixtures.ErrNormalisePartial):
		return errNormPartial
	case errors.Is(err, mixtures.ErrNormaliseEmpty):
		return errNormEmpty
	case err != nil:
		return errNormBad
	}
	for i := range b.entries {
		b.entries[i].Amount = scaled[i]
	}
	b.touch()
	return nil
}

func (b *bench) setTemp(text string) {
	if b.tempText != text {
		b.tempText = text
		b.touch()
	}
}

func (b *bench) setPres(text string) {
	if b.presText != text {
		b.presText = text
		b.touch()
	}
}

func (b *bench) toggleStd() { b.std = 1 - b.std; b.touch() }

// toggleGauge changes only how pressures are shown, which a blend file
// does not hold.
// viewFromFile shows pressures the way a file's pressure was written, for
// a workbench that starts on the file with no setting of its own.
func (b *bench) viewFromFile(f *mixtures.BlendFile) {
	if p, err := mixtures.ParsePressure(f.Pressure); err == nil {
		b.showGauge = p.Gauge
	}
}

func (b *bench) toggleGauge() { b.showGauge = !b.showGauge; b.changed = true }

// cleanErr is an error's one line for the user, with no package prefix
// and nothing in it that a terminal would act on.
func cleanErr(err error) string { return model.Printable(model.UserMessage(err)) }

// blendErrText writes a blend error without the blend text, which the
// pane already shows line by line.
func blendErrText(err error) string {
	var be *mixtures.BlendError
	if errors.As(err, &be) {
		return be.Reason()
	}
	return cleanErr(err)
}

// update derives everything from the text. It reports whether the Inputs
// changed (their Gen grew).
func (b *bench) update() bool {
	b.changed = false
	next := b.in

	b.tempErr = ""
	if t, err := mixtures.ParseTemperature(b.tempText); err != nil {
		b.tempErr = cleanErr(err)
	} else {
		next.TempK = t
		b.validTemp = b.tempText
	}
	b.presErr = ""
	if p, err := mixtures.ParsePressure(b.presText); err != nil {
		b.presErr = cleanErr(err)
	} else {
		next.PresPa, next.Gauge = p.Pa, p.Gauge
		b.validPres = b.presText
	}
	next.Opts = mixtures.Options{Std: b.std}

	if mix := b.resolve(next.PresPa); mix != nil {
		next.Mixture = mix
		b.validEntries = append(b.validEntries[:0], b.entries...)
	}

	changed := !sameInputs(b.in, next)
	if changed {
		next.Gen = b.in.Gen + 1
		b.in = next
	}
	b.derive()
	return changed
}

// resolve checks every entry, then the recipe as a whole; it returns the
// mixture, or nil with the errors recorded. The entries go to the engine
// as items, and an error comes back on its row by the item's index.
func (b *bench) resolve(presPa float64) *mixtures.Mixture {
	b.rowErr = b.rowErr[:0]
	b.blendErr = ""
	bad := false
	items := make([]mixtures.BlendItem, len(b.entries))
	for i, e := range b.entries {
		items[i] = mixtures.BlendItem{Species: e.Species, Amount: e.Amount}
		msg := ""
		switch {
		case strings.TrimSpace(e.Amount) == "":
			msg = "type an amount: 2%, 500 ppm, 0.3 kg/kg, 30 wt%, 0.2 bar or bal"
		default:
			if err := mixtures.CheckItem(b.cat, items[i]); err != nil {
				msg = blendErrText(err)
			}
		}
		// A comma inside a number ("4,5 %") keeps the engine's own message.
		if strings.ContainsAny(e.Amount, ",;\n") && !mixtures.CommaInNumber(e.Amount) {
			msg = "one amount per line: remove the , ; or line break"
		}
		b.rowErr = append(b.rowErr, msg)
		bad = bad || msg != ""
	}
	if len(b.entries) == 0 {
		b.blendErr = "the recipe is empty: add a species"
		return nil
	}
	if bad {
		return nil
	}
	blend, err := mixtures.NewBlend(items)
	if err == nil {
		if !(presPa > 0) && blend.HasPartialPressures() {
			b.blendErr = "partial pressures need a valid total pressure"
			return nil
		}
		var mix *mixtures.Mixture
		if mix, err = blend.Resolve(b.cat, presPa); err == nil {
			return mix
		}
	}
	var be *mixtures.BlendError
	if errors.As(err, &be) && be.Index >= 0 && be.Index < len(b.rowErr) {
		b.rowErr[be.Index] = blendErrText(err)
		return nil
	}
	b.blendErr = blendErrText(err)
	return nil
}

func sameInputs(a, b Inputs) bool {
	if a.TempK != b.TempK || a.PresPa != b.PresPa || a.Gauge != b.Gauge || a.Opts != b.Opts {
		return false
	}
	if (a.Mixture == nil) != (b.Mixture == nil) {
		return false
	}
	if a.Mixture == nil {
		return true
	}
	if len(a.Mixture.Components) != len(b.Mixture.Components) {
		return false
	}
	for i, c := range a.Mixture.Components {
		d := b.Mixture.Components[i]
		if c.Species != d.Species || c.X != d.X {
			return false
		}
	}
	return true
}

// derive computes the state of the current Inputs, its cautions and its
// validity notes.
func (b *bench) derive() {
	b.stateErr = ""
	b.cautions, b.notes, b.hazard = nil, nil, nil
	if !b.in.Valid() {
		b.stateErr = "no valid recipe and conditions yet"
		return
	}
	st, err := b.in.Mixture.State(b.in.TempK, b.in.PresPa, b.in.Opts)
	if err != nil {
		b.stateErr = cleanErr(err)
		return
	}
	if name := nonFinite(&st); name != "" {
		b.stateErr = fmt.Sprintf("the model gives no finite %s at %s and %s; try another temperature or pressure",
			name, mixtures.FormatTemperature(b.in.TempK), b.presShown(b.in.PresPa))
		return
	}
	b.state = st
	b.cautions = mixtures.Cautions(b.in.Mixture, b.in.PresPa)
	hz := safety.Classify(mixtures.SafetyParts(b.in.Mixture))
	b.hazard = &hz
	b.notes = mixtures.Notes(&b.state, true)
}

// nonFinite names the first shown quantity of s that is not a finite
// number, or returns "".
func nonFinite(s *mixtures.State) string {
	for _, q := range []struct {
		name string
		v    float64
	}{
		{"molar mass", s.MolarMassKgPerMol}, {"density", s.DensityKgPerM3}, {"Cp", s.CpJPerMolK},
		{"Cv", s.CvJPerMolK}, {"heat-capacity ratio", s.Gamma}, {"speed of sound", s.SoundSpeedMPerS},
		{"enthalpy", s.HJPerMol}, {"internal energy", s.UJPerMol}, {"entropy", s.SJPerMolK},
		{"Gibbs energy", s.GJPerMol}, {"Helmholtz energy", s.AJPerMol}, {"mixing entropy", s.SMixJPerMolK},
	} {
		if math.IsNaN(q.v) || math.IsInf(q.v, 0) {
			return q.name
		}
	}
	for i := range s.Species {
		t := &s.Species[i]
		st := &t.State
		for _, v := range []float64{t.X, t.PartialPresPa, t.MuJPerMol, t.SJPerMolK, t.CpJPerMolK,
			st.Trans.LnQ, st.Trans.U, st.Trans.Cv, st.Rot.LnQ, st.Rot.U, st.Rot.Cv,
			st.Vib.LnQ, st.Vib.U, st.Vib.Cv, st.Elec.LnQ, st.Elec.U, st.Elec.Cv} {
			if math.IsNaN(v) || math.IsInf(v, 0) {
				return "value for " + t.Species.Formula
			}
		}
	}
	return ""
}

// presShown writes the total pressure as absolute or gauge, as chosen.
func (b *bench) presShown(presPa float64) string {
	return report.PressureIn(presPa, b.presUnit())
}

// presUnit is the unit pressures show in: the one of the pressure last
// typed that read, as absolute or gauge as the user chose.
func (b *bench) presUnit() mixtures.PressureUnit {
	u, ok := mixtures.PressureUnitOf(b.validPres)
	if !ok {
		u = mixtures.BarAbsolute
	}
	return u.Reading(b.showGauge)
}

// stateReport is the current state as the state command reports it: the
// figures, the hazard cautions and the validity notes at caution level
// (those the command prints without --all-notes).
func (b *bench) stateReport() *report.StateReport {
	st := b.state
	return &report.StateReport{
		Label:    b.name,
		State:    &st,
		PresText: b.validPres,
		Gauge:    b.in.Gauge,
		Cautions: b.cautions,
		Notes:    cautionNotes(b.notes),
	}
}
