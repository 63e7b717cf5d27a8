package process

import (
	"zmix/mixtures"
	"zmix/model"
)

// Figure describes one figure of a process result once: its names, unit,
// digits and JSON name. The commands' text and JSON and the workbench's
// Process pane all read it, as the quantity table serves the state.
type Figure struct {
	Key         string // stable short name: "t2"
	Label       string // "outlet temperature"
	Symbol      string // "T₂"
	SymbolASCII string // "T2"
	Unit        string // display unit, "" for none
	UnitASCII   string
	Scale       float64 // display value = SI value × Scale
	Name        string  // JSON key, in SI units: "outlet_temperature_K"
	Digits      mixtures.Digits
	// Integer figures (a count of cycles) are written without decimals
	// and as JSON integers.
	Integer bool
	// Also are further display units, shown beside the first in text.
	Also []AltUnit
}

// AltUnit is one more display unit of a figure.
type AltUnit struct {
	Unit, UnitASCII string
	Scale           float64 // display value = SI value × Scale + Offset
	Offset          float64
}

// celsius shows a temperature in °C beside kelvin.
var celsius = []AltUnit{{Unit: "°C", UnitASCII: "C", Scale: 1, Offset: -model.ZeroCelsiusK}}

// Value is a figure's SI value in one result.
type Value struct {
	*Figure
	SI float64
}

// Display is the value in the figure's display unit.
func (v Value) Display() float64 { return v.SI * v.Scale }

// Table is a list of rows of the same figures, such as the stages of a
// compression; Name is its JSON key and Title its heading in text.
type Table struct {
	Name, Title string
	// RowName is the JSON key of each row's label and RowLabels the
	// labels ("species" and the formulas); empty when rows have none.
	RowName   string
	RowLabels []string
	Rows      [][]Value
	// Brief lists the keys of the columns a text readout shows when it
	// has no room for all; empty means all. JSON always has every column.
	Brief []string
}

// Result is what every calculation's Solve returns. The writers in
// package report and the workbench know results only through it.
type Result interface {
	// Kind names the calculation: "flow", "compress", "heat", "mix",
	// "dilute", "purge".
	Kind() string
	// Assumptions states the model in one line.
	Assumptions() string
	// Inputs are the figures the calculation was given, as it read them.
	Inputs() []Value
	// Outputs are the figures it found, in display order; a figure that
	// does not apply (a power with no flow) is left out.
	Outputs() []Value
	// Tables holds row lists such as the stages; none for most results.
	Tables() []Table
	// Outlet is the full state of the outlet, where the calculation makes
	// a new gas (mixing); nil otherwise.
	Outlet() *mixtures.State
	// Notes are lines that qualify the figures (the source of a factor).
	Notes() []string
	// Cautions are the safety reminders for what the process does.
	Cautions() []mixtures.Caution
}

// base holds the parts every result shares.
type base struct {
	kind, assumptions string
	inputs, outputs   []Value
	tables            []Table
	outlet            *mixtures.State
	notes             []string
	cautions          []mixtures.Caution
	// laterCautions, when set, adds cautions the first time they are
	// asked for: they are words for a reader, which a solve inside a
	// loop (a benchmark, a path) never needs.
	laterCautions func() []mixtures.Caution
}

func (b *base) Kind() string            { return b.kind }
func (b *base) Assumptions() string     { return b.assumptions }
func (b *base) Inputs() []Value         { return b.inputs }
func (b *base) Outputs() []Value        { return b.outputs }
func (b *base) Tables() []Table         { return b.tables }
func (b *base) Outlet() *mixtures.State { return b.outlet }
func (b *base) Notes() []string         { return b.notes }
func (b *base) Cautions() []mixtures.Caution {
	if f := b.laterCautions; f != nil {
		b.laterCautions = nil
		b.cautions = append(b.cautions, f()...)
	}
	return b.cautions
}
func (b *base) note(line string)              { b.notes = append(b.notes, line) }
func (b *base) caution(c ...mixtures.Caution) { b.cautions = append(b.cautions, c...) }

// A result has a dozen figures at most: room for them up front saves
// the slices growing one by one.
const figuresCap = 12

func (b *base) in(f *Figure, si float64) {
	if b.inputs == nil {
		b.inputs = make([]Value, 0, figuresCap)
	}
	b.inputs = append(b.inputs, Value{f, si})
}

func (b *base) out(f *Figure, si float64) {
	if b.outputs == nil {
		b.outputs = make([]Value, 0, figuresCap)
	}
	b.outputs = append(b.outputs, Value{f, si})
}

// Lookup returns the value of the figure with the key among the result's
// inputs and outputs, and false when it has none.
func Lookup(r Result, key string) (Value, bool) {
	for _, list := range [][]Value{r.Outputs(), r.Inputs()} {
		for _, v := range list {
			if v.Key == key {
				return v, true
			}
		}
	}
	return Value{}, false
}

// Units shared by the figure tables.
const (
	unitKJPerMol  = "kJ/mol"
	unitKJPerKg   = "kJ/kg"
	unitKW        = "kW"
	unitWPerK     = "W/K"
	unitJPerMolK  = "J/(mol·K)"
	unitJPerMolKA = "J/(mol.K)"
)

// Figures shared by several calculations.
var (
	figInletT = &Figure{Key: "t1", Label: "inlet temperature", Symbol: "T₁", SymbolASCII: "T1", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "inlet_temperature_K", Digits: mixtures.Digits{Sig: 6}, Also: celsius}
	figInletP = &Figure{Key: "p1", Label: "inlet pressure", Symbol: "P₁", SymbolASCII: "P1", Unit: "bar", UnitASCII: "bar", Scale: 1e-5,
		Name: "inlet_pressure_Pa", Digits: mixtures.Digits{Sig: 6}}
	figPres = &Figure{Key: "p", Label: "pressure", Symbol: "P", SymbolASCII: "P", Unit: "bar", UnitASCII: "bar", Scale: 1e-5,
		Name: "pressure_Pa", Digits: mixtures.Digits{Sig: 6}}
	figMolarMass = &Figure{Key: "M", Label: "molar mass", Symbol: "M", SymbolASCII: "M", Unit: "g/mol", UnitASCII: "g/mol", Scale: 1e3,
		Name: "molar_mass_kg_mol", Digits: mixtures.Digits{Sig: 6}}
)

// titles name each kind of result in headings.
var titles = map[string]string{
	"flow": "Flow", "compress": "Compression", "expand": "Expansion", "heat": "Heating and cooling",
	"mix": "Mixing", "dilute": "Dilution", "purge": "Purging", "release": "Release into a room",
	"cylinder": "Cylinder contents", "throttle": "Throttle across a valve",
	"weighed": "Composition from weighed masses",
}

// Title is the heading of a result of the kind.
func Title(kind string) string {
	if t, ok := titles[kind]; ok {
		return t
	}
	return kind
}

// FirstNonFinite names the first figure of r that is NaN or infinite, and
// returns "" when all are finite.
func FirstNonFinite(r Result) string {
	for _, list := range [][]Value{r.Inputs(), r.Outputs()} {
		for _, v := range list {
			if v.SI-v.SI != 0 {
				return v.Label
			}
		}
	}
	for _, tb := range r.Tables() {
		for _, row := range tb.Rows {
			for _, v := range row {
				if v.SI-v.SI != 0 {
					return tb.Title + " " + v.Label
				}
			}
		}
	}
	if st := r.Outlet(); st != nil {
		if what := mixtures.FirstNonFinite(st); what != "" {
			return "outlet " + what
		}
	}
	return ""
}
