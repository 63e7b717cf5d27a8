package report

import (
	"encoding/csv"
	"encoding/json"
	"fmt"
	"io"
	"sort"
	"strconv"
	"strings"

	"zmix/mixtures"
	"zmix/model"
)

// builtinSpecies marks the species of the embedded catalogue, so that a
// listing can tell them from the user's.
func BuiltinSpecies() map[*model.Species]bool {
	set := map[*model.Species]bool{}
	for _, sp := range model.Builtin().All() {
		set[sp] = true
	}
	// The named spin modifications (eH2, pH2 …) are built in too.
	for _, name := range model.SpinVariantNames() {
		if sp, ok := model.Builtin().Lookup(name); ok {
			set[sp] = true
		}
	}
	return set
}

// WriteCatalogList lists the species of cat, marking those from the
// user's files.
func WriteCatalogList(w io.Writer, cat *model.Catalogue) {
	builtin := BuiltinSpecies()
	all := cat.All()
	user := 0
	t := NewTable("  ", Left, Left, Right, Left, Left)
	t.Row("formula", "name", "M g/mol", "rotor", "hazards")
	for _, sp := range all {
		formula := sp.Formula
		if !builtin[sp] {
			formula += " *"
			user++
		}
		hazards := sp.Hazards.String()
		if hazards == "" {
			hazards = "-"
		}
		t.Row(model.Printable(formula), model.Printable(sp.Name), Short(1000*sp.MolarMassKgPerMol, 7), sp.Rotor.String(), hazards)
	}
	fmt.Fprintf(w, "Species catalogue: %d species\n", len(all))
	t.Write(w)
	if user > 0 {
		fmt.Fprintf(w, "  * %d from --species files (added, or replacing the built-in entry)\n", user)
	}
	if mods := cat.SpinModifications(); len(mods) > 0 {
		var names []string
		for _, sp := range mods {
			names = append(names, model.Printable(sp.Formula)+" ("+model.Printable(sp.Name)+")")
		}
		fmt.Fprintln(w)
		for _, l := range Wrap("Spin modifications, by name: "+strings.Join(names, ", ")+".", 78) {
			fmt.Fprintln(w, l)
		}
	}
	var named []string
	for _, m := range mixtures.AllNamedMixtures() {
		named = append(named, m.Name+" ("+m.Short+")")
	}
	if len(named) > 0 {
		fmt.Fprintln(w)
		for _, l := range Wrap("Named mixtures, which blend text takes as one item: "+strings.Join(named, ", ")+".", 78) {
			fmt.Fprintln(w, l)
		}
	}
	fmt.Fprintln(w, "\nzmix catalog FORMULA shows one species' data, sources and standard-state table.")
}

// NamedMixtureParts is a named mixture resolved in a catalogue: each
// part's species and mole fraction, and the molar mass.
type NamedMixtureParts struct {
	Mixture           mixtures.NamedMixture
	Parts             []mixtures.Component
	MolarMassKgPerMol float64
}

// ResolveNamedMixture resolves m in cat, as blend text would.
func ResolveNamedMixture(cat *model.Catalogue, m mixtures.NamedMixture) (NamedMixtureParts, error) {
	b, err := mixtures.ParseBlend(m.Name)
	if err != nil {
		return NamedMixtureParts{}, err
	}
	mix, err := b.Resolve(cat, model.StdPressureAtmPa)
	if err != nil {
		return NamedMixtureParts{}, err
	}
	return NamedMixtureParts{Mixture: m, Parts: mix.Components, MolarMassKgPerMol: mix.MolarMassKgPerMol}, nil
}

// WriteNamedMixture writes what zmix catalog NAME gives for a named
// mixture: what it is, its parts and its molar mass.
func WriteNamedMixture(w io.Writer, r NamedMixtureParts) {
	fmt.Fprintf(w, "%s: a named mixture, not a species; blend text shares an item of it among its parts\n", r.Mixture.Name)
	for _, l := range Wrap(r.Mixture.Title, 76) {
		fmt.Fprintln(w, "  "+l)
	}
	fmt.Fprintln(w, "\n  species   x mol/mol")
	for _, c := range r.Parts {
		fmt.Fprintf(w, "  %-8s  %s\n", model.Printable(c.Species.Formula), strconv.FormatFloat(c.X, 'f', 6, 64))
	}
	fmt.Fprintf(w, "\n  molar mass  %s g/mol\n", Sig(r.MolarMassKgPerMol*1000, 6))
	fmt.Fprintln(w, "\nzmix catalog FORMULA shows each part's data, sources and standard-state table.")
}

// WriteNamedMixtureJSON writes the same as one JSON object.
func WriteNamedMixtureJSON(w io.Writer, r NamedMixtureParts) error {
	type part struct {
		Formula string  `json:"formula"`
		X       float64 `json:"x"`
	}
	out := struct {
		Name              string  `json:"name"`
		NamedMixture      bool    `json:"named_mixture"`
		Title             string  `json:"title"`
		Parts             []part  `json:"parts"`
		MolarMassKgPerMol float64 `json:"molar_mass_kg_mol"`
	}{Name: r.Mixture.Name, NamedMixture: true, Title: r.Mixture.Title, MolarMassKgPerMol: r.MolarMassKgPerMol}
	for _, c := range r.Parts {
		out.Parts = append(out.Parts, part{c.Species.Formula, c.X})
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(out)
}

// WriteNamedMixtureCSV writes a header row and one row per part.
func WriteNamedMixtureCSV(w io.Writer, r NamedMixtureParts) error {
	cw := csv.NewWriter(w)
	cw.Write([]string{"formula", "x"})
	for _, c := range r.Parts {
		cw.Write([]string{c.Species.Formula, strconv.FormatFloat(c.X, 'g', -1, 64)})
	}
	cw.Flush()
	return cw.Error()
}

// catalogueFieldLabels names the catalogue file's fields in display order,
// for the sources list.
var catalogueFieldLabels = []struct{ field, label string }{
	{"name", "name"},
	{"rotor", "rotor"},
	{"rot_cm", "rotational constants"},
	{"sigma", "symmetry number"},
	{"spin", "nuclear-spin weights"},
	{"vib_cm", "vibrations"},
	{"elec_cm", "electronic levels"},
	{"dHf0_kJ", "ΔfH°(0 K)"},
	{"boil_K", "boiling point"},
	{"Tc_K", "critical temperature"},
	{"Pc_bar", "critical pressure"},
	{"omega", "acentric factor"},
	{"hazards", "hazards"},
	{"note", "note"},
}

// WriteSpecies writes one species' data, sources and standard-state
// table at tempsK.
func WriteSpecies(w io.Writer, sp *model.Species, builtin bool, stdPa float64, tempsK []float64) error {
	origin := "built-in catalogue"
	if !builtin {
		origin = "from a --species file"
	}
	if base, ok := sp.SpinVariantOf(); ok && base != sp.Formula {
		origin = "built-in spin modification of " + model.Printable(base)
		if !builtin {
			origin = "spin modification of " + model.Printable(base) + " from a --species file"
		}
	}
	fmt.Fprintf(w, "%s  %s  (%s)\n\n", model.Printable(sp.Formula), model.Printable(sp.Name), origin)

	d := NewTable("  ", Left, Left)
	d.Row("molar mass", Short(1000*sp.MolarMassKgPerMol, 7)+" g/mol")
	rotor := sp.Rotor.String()
	if sp.Rotor != model.Atom {
		rotor += fmt.Sprintf(", symmetry number σ = %d", sp.Symmetry)
	}
	d.Row("rotor", rotor)
	if sp.Rotor != model.Atom {
		labels := []string{"B"}
		if sp.Rotor == model.Nonlinear {
			labels = []string{"A", "B", "C"}
		}
		var parts []string
		for i, b := range sp.RotConstPerCm {
			parts = append(parts, fmt.Sprintf("%s = %s cm⁻¹ (Θ = %s K)", labels[i], Short(b, 7), Sig(sp.RotThetaK()[i], 4)))
		}
		d.Row("rotational constants", strings.Join(parts, ", "))
	}
	if sp.Homonuclear() {
		how := "spin isomers in equilibrium"
		switch {
		case sp.SpinMod.Frozen && sp.SpinMod.EvenFraction == 1:
			how = "frozen: even J only"
		case sp.SpinMod.Frozen && sp.SpinMod.EvenFraction == 0:
			how = "frozen: odd J only"
		case sp.SpinMod.Frozen:
			how = fmt.Sprintf("frozen mixture: %s %% even J, %s %% odd J", Short(100*sp.SpinMod.EvenFraction, 3), Short(100*(1-sp.SpinMod.EvenFraction), 3))
		}
		d.Row("nuclear-spin weights", fmt.Sprintf("even J %g, odd J %g (%s)", sp.SpinWeights[0], sp.SpinWeights[1], how))
	}
	if len(sp.Vib) == 0 {
		d.Row("vibrations", "none")
	}
	for i, v := range sp.Vib {
		label := ""
		if i == 0 {
			label = "vibrations"
		}
		deg := ""
		if v.Degeneracy > 1 {
			deg = fmt.Sprintf(" ×%d", v.Degeneracy)
		}
		by := ""
		if r := sp.VibReplacedBy(i); r != "" {
			by = ", summed as a " + r
		}
		d.Row(label, fmt.Sprintf("%s cm⁻¹%s  (Θ = %s K%s)", Short(v.WavenumberPerCm, 7), deg, Sig(sp.VibThetaK()[i], 5), by))
	}
	for i, e := range sp.Elec {
		label, theta := "", ""
		if i == 0 {
			label = "electronic levels"
		} else {
			theta = "  (Θ = " + Sig(sp.ElecThetaK()[i], 5) + " K)"
		}
		d.Row(label, fmt.Sprintf("%s cm⁻¹, g = %d%s", Short(e.EnergyPerCm, 7), e.Degeneracy, theta))
	}
	if len(sp.Elec) == 1 {
		d.Row("", "(ground level only)")
	}
	d.Row("ΔfH°(0 K)", Fixed(sp.EnergyZeroJPerMol/1000, 3)+" kJ/mol  (energy zero of G and μ)")
	if sp.BoilingK > 0 {
		d.Row("normal boiling point", Short(sp.BoilingK, 6)+" K")
	} else {
		d.Row("normal boiling point", "not recorded")
	}
	switch {
	case sp.QuantumGas:
		d.Row("critical constants", "Tc⁰ "+Short(sp.CriticalK, 6)+" K, Pc⁰ "+Short(sp.CriticalPa/1e5, 6)+" bar, ω "+Short(sp.Acentric, 4)+
			"  (quantum gas: classical limits of effective constants, applied per temperature)")
	case sp.HasCritical():
		d.Row("critical constants", "Tc "+Short(sp.CriticalK, 6)+" K, Pc "+Short(sp.CriticalPa/1e5, 6)+" bar, ω "+Short(sp.Acentric, 4)+"  (for the real-gas models)")
	default:
		d.Row("critical constants", "not recorded: taken as an ideal gas in the real-gas models")
	}
	hazards := sp.Hazards.String()
	if hazards == "" {
		hazards = "none recorded (check the safety data sheet)"
	}
	d.Row("hazards", hazards)
	d.Write(w)
	if sp.Notes != "" {
		WriteWrapped(w, "  note                  ", "                        ", model.Printable(sp.Notes))
	}

	writeSpeciesSafety(w, sp)

	fmt.Fprintln(w, "\nSources")
	fmt.Fprintln(w, "  molar mass: IUPAC standard atomic weights, summed over the formula")
	for _, f := range catalogueFieldLabels {
		if src, ok := sp.Sources[f.field]; ok {
			WriteWrapped(w, "  ", "    ", f.label+": "+model.Printable(src))
		}
	}
	var levelKeys []string
	for k := range sp.Sources {
		if model.IsLevelField(k) {
			levelKeys = append(levelKeys, k)
		}
	}
	sort.Strings(levelKeys)
	for _, k := range levelKeys {
		WriteWrapped(w, "  ", "    ", k+": "+model.Printable(sp.Sources[k]))
	}
	if len(sp.Sources) == 0 {
		fmt.Fprintln(w, "  no source recorded for the other fields")
	}

	fmt.Fprintf(w, "\nStandard-state table, P° = %s\n", StdPressure(stdPa))
	t := NewTable("  ", Right, Right, Right, Right, Right)
	t.Row("T", "Cp°", "S°", "−[G°−H°(298.15 K)]/T", "H°−H°(298.15 K)")
	t.Row("K", "J/(mol·K)", "J/(mol·K)", "J/(mol·K)", "kJ/mol")
	for _, tempK := range tempsK {
		row, err := sp.Table(tempK, stdPa, model.Treatment{})
		if err != nil {
			return err
		}
		t.Row(Short(row.TempK, 6),
			Fixed(row.CpJPerMolK, 3),
			Fixed(row.SJPerMolK, 3),
			Fixed(row.GefJPerMolK, 3),
			Fixed(row.HIncJPerMol/1000, 3))
	}
	t.Write(w)
	WriteWrapped(w, "  treatment: ", "    ", sp.Treatments(model.RefTempK, stdPa, model.Treatment{}).Kind)
	fmt.Fprintln(w, "  see the README for the model's limits")
	return nil
}

// catalogEntry is one species of the listing in JSON and CSV.
type catalogEntry struct {
	Formula           string   `json:"formula"`
	Name              string   `json:"name"`
	MolarMassKgPerMol float64  `json:"molar_mass_kg_mol"`
	Rotor             string   `json:"rotor"`
	Hazards           []string `json:"hazards"`
	FromUserFile      bool     `json:"from_species_file"`
}

func newCatalogEntry(sp *model.Species, builtin bool) catalogEntry {
	e := catalogEntry{Formula: sp.Formula, Name: sp.Name, MolarMassKgPerMol: sp.MolarMassKgPerMol,
		Rotor: sp.Rotor.String(), Hazards: []string{}, FromUserFile: !builtin}
	if h := sp.Hazards.String(); h != "" {
		e.Hazards = strings.Split(h, ", ")
	}
	return e
}

// WriteCatalogJSON writes the species list as a JSON list.
func WriteCatalogJSON(w io.Writer, cat *model.Catalogue) error {
	builtin := BuiltinSpecies()
	list := []catalogEntry{}
	for _, sp := range cat.All() {
		list = append(list, newCatalogEntry(sp, builtin[sp]))
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(list)
}

// WriteCatalogCSV writes the species list as CSV, with the JSON keys as
// column names; hazards are separated by semicolons.
func WriteCatalogCSV(w io.Writer, cat *model.Catalogue) error {
	builtin := BuiltinSpecies()
	cw := csv.NewWriter(w)
	cw.Write([]string{"formula", "name", "molar_mass_kg_mol", "rotor", "hazards", "from_species_file"})
	for _, sp := range cat.All() {
		e := newCatalogEntry(sp, builtin[sp])
		cw.Write([]string{e.Formula, e.Name, csvFloat(e.MolarMassKgPerMol), e.Rotor, strings.Join(e.Hazards, ";"), strconv.FormatBool(e.FromUserFile)})
	}
	cw.Flush()
	return cw.Error()
}

// tableNames are the JSON keys and CSV columns of a standard-state table,
// in SI units, after the published tables' columns.
var tableNames = []string{"temperature_K", "cp_J_molK", "s_J_molK", "gef_J_molK", "h_minus_h298_J_mol"}

func tableValues(r model.TableRow) []float64 {
	return []float64{r.TempK, r.CpJPerMolK, r.SJPerMolK, r.GefJPerMolK, r.HIncJPerMol}
}

// WriteSpeciesJSON writes one species' data and standard-state table as a
// JSON object.
func WriteSpeciesJSON(w io.Writer, sp *model.Species, builtin bool, stdPa float64, tempsK []float64) error {
	type tableDoc struct {
		StdPresPa float64              `json:"standard_pressure_Pa"`
		Rows      []map[string]float64 `json:"rows"`
	}
	doc := struct {
		catalogEntry
		RotConstPerCm []float64         `json:"rot_cm,omitempty"`
		Symmetry      int               `json:"symmetry_number,omitempty"`
		Vib           []modeDoc         `json:"vib_cm"`
		Elec          []modeDoc         `json:"elec_cm"`
		BoilingK      float64           `json:"boiling_K,omitempty"`
		CriticalK     float64           `json:"critical_temperature_K,omitempty"`
		CriticalPa    float64           `json:"critical_pressure_Pa,omitempty"`
		Acentric      *float64          `json:"acentric_factor,omitempty"`
		QuantumGas    bool              `json:"quantum_gas,omitempty"`
		EnergyZero    float64           `json:"dHf0_J_mol"`
		Sources       map[string]string `json:"sources"`
		Treatment     string            `json:"treatment"`
		SpinBase      string            `json:"spin_modification_of,omitempty"`
		Table         tableDoc          `json:"table"`
	}{catalogEntry: newCatalogEntry(sp, builtin), RotConstPerCm: sp.RotConstPerCm, Symmetry: sp.Symmetry,
		Treatment: sp.Treatments(model.RefTempK, stdPa, model.Treatment{}).Kind,
		BoilingK:  sp.BoilingK, EnergyZero: sp.EnergyZeroJPerMol, Sources: sp.Sources,
		CriticalK: sp.CriticalK, CriticalPa: sp.CriticalPa, QuantumGas: sp.QuantumGas,
		Table: tableDoc{StdPresPa: stdPa, Rows: []map[string]float64{}}}
	if sp.HasCritical() {
		omega := sp.Acentric
		doc.Acentric = &omega
	}
	doc.Vib, doc.Elec = []modeDoc{}, []modeDoc{}
	for i, v := range sp.Vib {
		doc.Vib = append(doc.Vib, modeDoc{Cm: v.WavenumberPerCm, Degeneracy: v.Degeneracy, ReplacedBy: sp.VibReplacedBy(i)})
	}
	for _, e := range sp.Elec {
		doc.Elec = append(doc.Elec, modeDoc{Cm: e.EnergyPerCm, Degeneracy: e.Degeneracy})
	}
	if base, ok := sp.SpinVariantOf(); ok && base != sp.Formula {
		doc.SpinBase = base
	}
	for _, tempK := range tempsK {
		row, err := sp.Table(tempK, stdPa, model.Treatment{})
		if err != nil {
			return err
		}
		m := map[string]float64{}
		for i, v := range tableValues(row) {
			m[tableNames[i]] = v
		}
		doc.Table.Rows = append(doc.Table.Rows, m)
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(doc)
}

// modeDoc is a vibrational mode or an electronic level in the JSON of a
// species: its wavenumber (or energy) in cm⁻¹, its degeneracy, and, for a
// mode the summed levels replace, what stands for it.
type modeDoc struct {
	Cm         float64 `json:"cm"`
	Degeneracy int     `json:"degeneracy"`
	ReplacedBy string  `json:"replaced_by,omitempty"`
}

// WriteSpeciesCSV writes one species' standard-state table as CSV.
func WriteSpeciesCSV(w io.Writer, sp *model.Species, stdPa float64, tempsK []float64) error {
	cw := csv.NewWriter(w)
	cw.Write(append([]string{"formula", "standard_pressure_Pa"}, tableNames...))
	for _, tempK := range tempsK {
		row, err := sp.Table(tempK, stdPa, model.Treatment{})
		if err != nil {
			return err
		}
		cells := []string{sp.Formula, csvFloat(stdPa)}
		for _, v := range tableValues(row) {
			cells = append(cells, csvFloat(v))
		}
		cw.Write(cells)
	}
	cw.Flush()
	return cw.Error()
}
