package main

import (
	"bytes"
	"fmt"
	"io"
	"strings"

	"zmix/mixtures"
	"zmix/model"
)

// defaultTableTempsK are the rows of a species' table when --temps is not
// given: the reference temperature and round values across the range the
// published tables cover.
var defaultTableTempsK = []float64{100, 200, model.RefTempK, 500, 1000, 1500, 2000, 3000}

func (a *app) cmdCatalog(g *globalOpts, args []string) error {
	fs := newFlagSet("zmix catalog")
	var stdText, tempsText string
	fs.StringVar(&stdText, "std", "", "standard pressure of the table: `1bar` (default) or 1atm")
	fs.StringVar(&tempsText, "temps", "", "temperatures of the table, comma-separated with a unit (`LIST`, e.g. \"300, 600, 900 K\")")
	g.register(fs, false)
	rest, err := parseFlags(fs, args, true)
	if err != nil {
		return err
	}
	if len(rest) > 1 {
		return badInput("one species at a time; got %s (zmix catalog lists them all)", strings.Join(rest, " "))
	}
	stdPa, err := parseStd(stdText)
	if err != nil {
		return err
	}
	temps := defaultTableTempsK
	if tempsText != "" {
		if temps, err = parseTempList(tempsText); err != nil {
			return err
		}
	}
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	var out bytes.Buffer
	if len(rest) == 0 {
		writeCatalogList(page(&out, g.ascii), cat)
	} else {
		sp, ok := cat.Lookup(rest[0])
		if !ok {
			hint := "zmix catalog lists every species"
			if sug := cat.Suggest(rest[0], 3); len(sug) > 0 {
				hint = "did you mean " + strings.Join(sug, ", ") + "? (zmix catalog lists every species)"
			}
			return badInput("unknown species %q; %s", rest[0], hint)
		}
		if err := writeSpecies(page(&out, g.ascii), sp, builtinSpecies()[sp], stdPa, temps); err != nil {
			return err
		}
	}
	return a.emit(&out)
}

// parseTempList reads "300, 600, 900 K"; a unit written only on the last
// value applies to all of them.
func parseTempList(text string) ([]float64, error) {
	items := strings.Split(text, ",")
	last := strings.TrimSpace(items[len(items)-1])
	lastUnit := strings.TrimSpace(strings.TrimLeft(last, "0123456789.+-eE "))
	var out []float64
	for _, item := range items {
		item = strings.TrimSpace(item)
		if item == "" {
			continue
		}
		k, err := mixtures.ParseTemperature(item)
		if err != nil && lastUnit != "" {
			k, err = mixtures.ParseTemperature(item + " " + lastUnit)
		}
		if err != nil {
			return nil, badInput("--temps: %v", err)
		}
		out = append(out, k)
	}
	if len(out) == 0 {
		return nil, badInput("--temps %q holds no temperature; want a list such as \"300, 600, 900 K\"", text)
	}
	return out, nil
}

// builtinSpecies marks the species of the embedded catalogue, so that a
// listing can tell them from the user's.
func builtinSpecies() map[*model.Species]bool {
	set := map[*model.Species]bool{}
	for _, sp := range model.Builtin().All() {
		set[sp] = true
	}
	return set
}

func writeCatalogList(w io.Writer, cat *model.Catalogue) {
	var n numbers
	builtin := builtinSpecies()
	all := cat.All()
	user := 0
	t := newTable("  ", left, left, right, left, left)
	t.row("formula", "name", "M g/mol", "rotor", "hazards")
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
		t.row(formula, sp.Name, n.short(sp.Formula+" molar mass", 1000*sp.MolarMassKgPerMol, 7), sp.Rotor.String(), hazards)
	}
	fmt.Fprintf(w, "Species catalogue: %d species\n", len(all))
	t.write(w)
	if user > 0 {
		fmt.Fprintf(w, "  * %d from --species files (added, or replacing the built-in entry)\n", user)
	}
	fmt.Fprintln(w, "\nzmix catalog FORMULA shows one species' data, sources and standard-state table.")
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
	{"hazards", "hazards"},
	{"note", "note"},
}

func writeSpecies(w io.Writer, sp *model.Species, builtin bool, stdPa float64, tempsK []float64) error {
	var n numbers
	origin := "built-in catalogue"
	if !builtin {
		origin = "from a --species file"
	}
	fmt.Fprintf(w, "%s  %s  (%s)\n\n", sp.Formula, sp.Name, origin)

	d := newTable("  ", left, left)
	d.row("molar mass", n.short("molar mass", 1000*sp.MolarMassKgPerMol, 7)+" g/mol")
	rotor := sp.Rotor.String()
	if sp.Rotor != model.Atom {
		rotor += fmt.Sprintf(", symmetry number σ = %d", sp.Symmetry)
	}
	d.row("rotor", rotor)
	if sp.Rotor != model.Atom {
		labels := []string{"B"}
		if sp.Rotor == model.Nonlinear {
			labels = []string{"A", "B", "C"}
		}
		var parts []string
		for i, b := range sp.RotConstPerCm {
			parts = append(parts, fmt.Sprintf("%s = %s cm⁻¹ (Θ = %s K)", labels[i], n.short("rotational constant", b, 7), n.sig("Θrot", sp.RotThetaK()[i], 4)))
		}
		d.row("rotational constants", strings.Join(parts, ", "))
	}
	if sp.Homonuclear() {
		d.row("nuclear-spin weights", fmt.Sprintf("even J %g, odd J %g (spin isomers in equilibrium)", sp.SpinWeights[0], sp.SpinWeights[1]))
	}
	if len(sp.Vib) == 0 {
		d.row("vibrations", "none")
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
		d.row(label, fmt.Sprintf("%s cm⁻¹%s  (Θ = %s K)", n.short("vibration", v.WavenumberPerCm, 7), deg, n.sig("Θvib", sp.VibThetaK()[i], 5)))
	}
	for i, e := range sp.Elec {
		label, theta := "", ""
		if i == 0 {
			label = "electronic levels"
		} else {
			theta = "  (Θ = " + n.sig("Θel", sp.ElecThetaK()[i], 5) + " K)"
		}
		d.row(label, fmt.Sprintf("%s cm⁻¹, g = %d%s", n.short("electronic level", e.EnergyPerCm, 7), e.Degeneracy, theta))
	}
	if len(sp.Elec) == 1 {
		d.row("", "(ground level only)")
	}
	d.row("ΔfH°(0 K)", n.fixed("ΔfH°(0 K)", sp.EnergyZeroJPerMol/1000, 3)+" kJ/mol  (energy zero of G and μ)")
	if sp.BoilingK > 0 {
		d.row("normal boiling point", n.short("boiling point", sp.BoilingK, 6)+" K")
	} else {
		d.row("normal boiling point", "not recorded")
	}
	hazards := sp.Hazards.String()
	if hazards == "" {
		hazards = "none recorded (check the safety data sheet)"
	}
	d.row("hazards", hazards)
	d.write(w)
	if sp.Notes != "" {
		writeWrapped(w, "  note                  ", "                        ", sp.Notes)
	}

	fmt.Fprintln(w, "\nSources")
	fmt.Fprintln(w, "  molar mass: IUPAC standard atomic weights, summed over the formula")
	for _, f := range catalogueFieldLabels {
		if src, ok := sp.Sources[f.field]; ok {
			writeWrapped(w, "  ", "    ", f.label+": "+src)
		}
	}
	if len(sp.Sources) == 0 {
		fmt.Fprintln(w, "  no source recorded for the other fields")
	}

	fmt.Fprintf(w, "\nStandard-state table, P° = %s\n", stdLabel(stdPa))
	t := newTable("  ", right, right, right, right, right)
	t.row("T", "Cp°", "S°", "−[G°−H°(298.15 K)]/T", "H°−H°(298.15 K)")
	t.row("K", "J/(mol·K)", "J/(mol·K)", "J/(mol·K)", "kJ/mol")
	for _, tempK := range tempsK {
		row, err := sp.Table(tempK, stdPa, model.Treatment{})
		if err != nil {
			return badInput("%v", err)
		}
		t.row(n.short("T", row.TempK, 6),
			n.fixed("Cp°", row.CpJPerMolK, 3),
			n.fixed("S°", row.SJPerMolK, 3),
			n.fixed("−[G°−H°(298.15 K)]/T", row.GefJPerMolK, 3),
			n.fixed("H°−H°(298.15 K)", row.HIncJPerMol/1000, 3))
	}
	t.write(w)
	fmt.Fprintln(w, "  rigid rotor and harmonic oscillator; see the README for the model's limits")
	return n.err()
}
