package report

import (
	"encoding/json"
	"fmt"
	"io"
	"strings"

	"zmix/mixtures"
	"zmix/model"
)

// SpeciesAnatomy is one species of a state taken apart, as the
// workbench's Anatomy pane shows it and `zmix state --anatomy` writes it:
// what translation, rotation, vibration and electronic levels give to S
// and Cp at the species' partial pressure, how each factor is treated,
// what the treatment adds over the rigid rotor with harmonic vibration,
// and the characteristic temperatures. Both read it from here, so that
// they cannot differ.
type SpeciesAnatomy struct {
	Name          string          `json:"name"`
	X             float64         `json:"x"`
	PartialPresPa float64         `json:"partial_pressure_Pa"`
	Factors       []FactorFigures `json:"factors"`
	TotalS        float64         `json:"s_J_molK"`
	TotalCp       float64         `json:"cp_J_molK"`
	Treatment     string          `json:"treatment"`
	// OverRigidHarmonic is what the treatment adds to S and Cp over the
	// rigid rotor with harmonic vibration at the same state; nil when the
	// treatment is that one.
	OverRigidHarmonic *FactorFigures `json:"over_rigid_harmonic"`
	ThetaRot          []Level        `json:"theta_rot_K"`
	ThetaVib          []Level        `json:"theta_vib_K"`
	ThetaEl           []Level        `json:"theta_el_K"`
	GroundDegeneracy  int            `json:"electronic_ground_degeneracy"`
	BoilingK          float64        `json:"boiling_point_K,omitempty"`

	species *model.Species
}

// FactorFigures is one factor's share of S and Cp, with its treatment.
// The R of Cp − Cv, the P dV work of heating at constant pressure, is
// booked with translation, so the shares sum to the species' S and Cp.
type FactorFigures struct {
	Name       string  `json:"name,omitempty"`
	SJPerMolK  float64 `json:"s_J_molK"`
	CpJPerMolK float64 `json:"cp_J_molK"`
	Treatment  string  `json:"treatment,omitempty"`
}

// Level is a characteristic temperature with its degeneracy, and, for a
// vibrational mode that the summed levels replace, what stands for it.
type Level struct {
	K          float64 `json:"K"`
	Degeneracy int     `json:"degeneracy"`
	ReplacedBy string  `json:"replaced_by,omitempty"`
}

// AnatomyOf takes one species term of a state apart.
func AnatomyOf(t *mixtures.SpeciesTerm) SpeciesAnatomy {
	sp, st := t.Species, &t.State
	tr := sp.Treatments(st.TempK, t.PartialPresPa, model.Treatment{})
	a := SpeciesAnatomy{Name: sp.Formula, X: t.X, PartialPresPa: t.PartialPresPa,
		TotalS: st.SJPerMolK, TotalCp: st.CpJPerMolK, Treatment: tr.Kind,
		GroundDegeneracy: sp.Elec[0].Degeneracy, BoilingK: sp.BoilingK, species: sp}
	for i, f := range st.Breakdown() {
		a.Factors = append(a.Factors, FactorFigures{Name: f.Name, SJPerMolK: f.SJPerMolK, CpJPerMolK: f.CpJPerMolK, Treatment: tr.Factors[i]})
	}
	if !tr.RigidHarmonic {
		a.OverRigidHarmonic = &FactorFigures{SJPerMolK: tr.DeltaSJPerMolK, CpJPerMolK: tr.DeltaCpJPerMolK}
	}
	for _, k := range sp.RotThetaK() {
		a.ThetaRot = append(a.ThetaRot, Level{K: k, Degeneracy: 1})
	}
	for i, k := range sp.VibThetaK() {
		a.ThetaVib = append(a.ThetaVib, Level{K: k, Degeneracy: sp.Vib[i].Degeneracy, ReplacedBy: sp.VibReplacedBy(i)})
	}
	el := sp.ElecThetaK()
	for i := 1; i < len(el); i++ {
		a.ThetaEl = append(a.ThetaEl, Level{K: el[i], Degeneracy: sp.Elec[i].Degeneracy})
	}
	return a
}

// Anatomy takes every species of a state apart, in the state's order.
func Anatomy(s *mixtures.State) []SpeciesAnatomy {
	out := make([]SpeciesAnatomy, len(s.Species))
	for i := range s.Species {
		out[i] = AnatomyOf(&s.Species[i])
	}
	return out
}

// thetaList writes levels as a list: "2.75, 3.1 ×2, 97.84 (hindered
// rotor) K".
func thetaList(levels []Level) string {
	parts := make([]string, len(levels))
	for i, l := range levels {
		parts[i] = Sig(l.K, 4)
		if l.Degeneracy > 1 {
			parts[i] += fmt.Sprintf(" ×%d", l.Degeneracy)
		}
		if l.ReplacedBy != "" {
			parts[i] += " (" + l.ReplacedBy + ")"
		}
	}
	return strings.Join(parts, ", ") + " K"
}

// RotorLine, VibLine and ElecLine say the characteristic temperatures in
// words, as the pane and the text readout show them.
func (a *SpeciesAnatomy) RotorLine() string {
	if len(a.ThetaRot) == 0 {
		return "none: an atom does not rotate"
	}
	return fmt.Sprintf("%s (%s, σ = %d)", thetaList(a.ThetaRot), a.species.Rotor, a.species.Symmetry)
}

func (a *SpeciesAnatomy) VibLine() string {
	if len(a.ThetaVib) == 0 {
		return "none: no vibration"
	}
	return thetaList(a.ThetaVib)
}

func (a *SpeciesAnatomy) ElecLine() string {
	ground := fmt.Sprintf("ground level g = %d", a.GroundDegeneracy)
	if len(a.ThetaEl) == 0 {
		return ground + " only"
	}
	return ground + "; then " + thetaList(a.ThetaEl)
}

// OverRigidHarmonicLine says what the treatment adds, or "" when it is
// the rigid rotor with harmonic vibration.
func (a *SpeciesAnatomy) OverRigidHarmonicLine() string {
	d := a.OverRigidHarmonic
	if d == nil {
		return ""
	}
	return "over the rigid rotor and harmonic oscillator: S " + signed(d.SJPerMolK, 3) + ", Cp " + signed(d.CpJPerMolK, 3) + " J/(mol·K)"
}

// signed formats a difference with its sign.
func signed(x float64, decimals int) string {
	f := Fixed(x, decimals)
	if !strings.HasPrefix(f, "-") {
		f = "+" + f
	}
	return f
}

// writeAnatomyText writes the anatomy section of the text readout.
func writeAnatomyText(w io.Writer, list []SpeciesAnatomy) {
	fmt.Fprintln(w, "Anatomy, each species at its partial pressure")
	for k := range list {
		a := &list[k]
		if k > 0 {
			fmt.Fprintln(w)
		}
		fmt.Fprintf(w, "  %s (%s): x %s at pᵢ %s\n", model.Printable(a.Name), model.Printable(a.species.Name), Sig(a.X, 4), PressureAuto(a.PartialPresPa))
		tab := NewTable("    ", Left, Right, Right)
		tab.Row("", "S J/(mol·K)", "Cp J/(mol·K)")
		for _, f := range a.Factors {
			name := f.Name
			if name == "translation" {
				name += " *"
			}
			tab.Row(name, Fixed(f.SJPerMolK, 3), Fixed(f.CpJPerMolK, 3))
		}
		tab.Row("total", Fixed(a.TotalS, 3), Fixed(a.TotalCp, 3))
		tab.Write(w)
		WriteWrapped(w, "    ", "      ", "treatment: "+a.Treatment)
		for _, f := range a.Factors {
			WriteWrapped(w, "      ", "        ", f.Name+": "+f.Treatment)
		}
		if line := a.OverRigidHarmonicLine(); line != "" {
			WriteWrapped(w, "    ", "      ", line)
		}
		WriteWrapped(w, "    ", "      ", "Θrot: "+a.RotorLine())
		WriteWrapped(w, "    ", "      ", "Θvib: "+a.VibLine())
		WriteWrapped(w, "    ", "      ", "Θel: "+a.ElecLine())
		if a.BoilingK > 0 {
			WriteWrapped(w, "    ", "      ", "Tb: "+Sig(a.BoilingK, 5)+" K at 1 atm")
		}
	}
	WriteWrapped(w, "  ", "    ", "* Cp = Cv + R: the R, the P dV work of heating at constant pressure, is booked with translation.")
	fmt.Fprintln(w)
}

// appendAnatomyJSON appends the member "anatomy", the list of species
// taken apart, indented by indent.
func appendAnatomyJSON(buf []byte, list []SpeciesAnatomy, indent string) ([]byte, error) {
	b, err := json.MarshalIndent(list, indent, "  ")
	if err != nil {
		return buf, err
	}
	buf = append(buf, indent...)
	buf = append(buf, `"anatomy": `...)
	return append(buf, b...), nil
}

// anatomyCSVHeader and anatomyCSVRow append the anatomy's figures as
// columns "FORMULA.FACTOR.s_J_molK", "FORMULA.FACTOR.cp_J_molK", then
// "FORMULA.over_rigid_harmonic.…", empty for the rigid rotor itself.
func anatomyCSVHeader(row []string, list []SpeciesAnatomy) []string {
	for _, a := range list {
		f := model.Printable(a.Name)
		for _, x := range a.Factors {
			row = append(row, f+"."+x.Name+".s_J_molK", f+"."+x.Name+".cp_J_molK")
		}
		row = append(row, f+".over_rigid_harmonic.s_J_molK", f+".over_rigid_harmonic.cp_J_molK")
	}
	return row
}

func anatomyCSVRow(row []string, list []SpeciesAnatomy) []string {
	for _, a := range list {
		for _, x := range a.Factors {
			row = append(row, csvFloat(x.SJPerMolK), csvFloat(x.CpJPerMolK))
		}
		if d := a.OverRigidHarmonic; d != nil {
			row = append(row, csvFloat(d.SJPerMolK), csvFloat(d.CpJPerMolK))
		} else {
			row = append(row, "", "")
		}
	}
	return row
}
