package report

import (
	"fmt"
	"io"
	"math"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/realgas"
	"zmix/model"
)

// The real-gas section: the correction beside the ideal-gas figures, each
// with its method, so that nothing above it changes meaning.

// RealGasLines are the real-gas figures of a state as label and value
// pairs, for the text readout and the workbench alike; a single line
// saying why when they are not known. Z and the real density also stand
// in the quantity table, beside the ideal-gas density.
func RealGasLines(st *mixtures.State) [][2]string {
	if !st.RealGasKnown {
		return [][2]string{{"not known", "no species of the blend carries critical constants (Tc, Pc, ω)"}}
	}
	rg := &st.RealGas
	deviation := math.Abs(rg.Z-1) * 100
	lines := [][2]string{
		{"model", ModelText(rg)},
		{"Z = PV/(RT)", Sig(rg.Z, 5) + fmt.Sprintf("   |Z − 1| = %s %%: the ideal-gas density is off by that much", Sig(deviation, 2))},
		{"H − H(ideal)", Sig(rg.HResJPerMol, 4) + " J/mol   (departure at the same T and P)"},
		{"S − S(ideal)", Sig(rg.SResJPerMolK, 4) + " J/(mol·K)"},
		{"Cp, real gas", Sig(rg.CpJPerMolK, 5) + " J/(mol·K)   (ideal gas " + Sig(st.CpJPerMolK, 5) + ")"},
		{"speed of sound", Sig(rg.SoundSpeedMPerS, 5) + " m/s   (ideal gas " + Sig(st.SoundSpeedMPerS, 5) + ")"},
		{"Joule–Thomson μJT", Sig(rg.JouleThomsonKPerPa*1e5, 3) + " K/bar   (" + jtSense(rg.JouleThomsonKPerPa) + ")"},
	}
	return lines
}

// ModelText names the model that gives the state and why, with the
// switch rule marked as common practice.
func ModelText(rg *realgas.Result) string {
	rule := fmt.Sprintf("ρ/ρc = %s", Sig(rg.ReducedDensity, 2))
	switch rg.Model {
	case realgas.PengRobinson:
		rule += fmt.Sprintf(" > %g", realgas.ReducedDensitySwitch)
	default:
		rule += fmt.Sprintf(" ≤ %g", realgas.ReducedDensitySwitch)
	}
	return rg.Model.String() + "; " + rule + " (switch: common practice)"
}

func jtSense(muKPerPa float64) string {
	if muKPerPa > 0 {
		return "cools on throttling"
	}
	return "warms on throttling"
}

// realGasRemarks are the model's caveats for the blend, as lines.
func realGasRemarks(st *mixtures.State) []string {
	var out []string
	if !st.RealGasKnown {
		return nil
	}
	if st.RealGas.Range != realgas.InRange {
		out = append(out, "outside every model here: "+st.RealGas.Range.String()+"; neither the ideal-gas nor these figures can be trusted")
	}
	var ideal, polar []string
	for i := range st.Species {
		sp := st.Species[i].Species
		switch {
		case !sp.HasCritical():
			ideal = append(ideal, model.Printable(sp.Formula))
		case realgas.PolarLeftOut(sp.Formula):
			polar = append(polar, model.Printable(sp.Formula))
		}
	}
	if len(ideal) > 0 {
		out = append(out, "taken as ideal gases (no critical constants): "+strings.Join(ideal, ", "))
	}
	if len(polar) > 0 && st.RealGas.Model == realgas.Virial {
		out = append(out, "polar virial terms left out for "+strings.Join(polar, ", ")+": their |B| is underestimated")
	}
	return out
}

// writeRealGasText writes the section of the text readout.
func writeRealGasText(w io.Writer, st *mixtures.State) {
	fmt.Fprintln(w, "Real gas, beside the ideal-gas figures above")
	t := NewTable("  ", Left, Left)
	for _, l := range RealGasLines(st) {
		t.Row(l[0], l[1])
	}
	t.Write(w)
	for _, r := range realGasRemarks(st) {
		WriteWrapped(w, "  ", "    ", r)
	}
	fmt.Fprintln(w)
}

// realGas appends the member "real_gas": an object with the real-gas
// figures in SI units and the model's name, or null when not known.
func (j *jsonWriter) realGas(st *mixtures.State, indent string) {
	j.key(indent, "real_gas")
	if !st.RealGasKnown {
		j.buf = append(j.buf, "null"...)
		return
	}
	rg := &st.RealGas
	inner := indent + "  "
	j.buf = append(j.buf, "{\n"...)
	j.key(inner, "model")
	j.buf = appendJSONString(j.buf, rg.Model.String())
	for _, f := range []struct {
		name string
		v    float64
	}{
		{"z", rg.Z},
		{"density_kg_m3", st.RealDensityKgPerM3()},
		{"h_residual_J_mol", rg.HResJPerMol},
		{"s_residual_J_molK", rg.SResJPerMolK},
		{"cp_J_molK", rg.CpJPerMolK},
		{"cv_J_molK", rg.CvJPerMolK},
		{"sound_speed_m_s", rg.SoundSpeedMPerS},
		{"jt_K_per_Pa", rg.JouleThomsonKPerPa},
		{"reduced_density", rg.ReducedDensity},
		{"second_virial_m3_mol", rg.BM3PerMol},
	} {
		j.buf = append(j.buf, ",\n"...)
		j.key(inner, f.name)
		j.float(f.v)
	}
	j.buf = append(j.buf, ",\n"...)
	j.key(inner, "in_range")
	j.buf = append(j.buf, fmt.Sprint(rg.Range == realgas.InRange)...)
	j.buf = append(j.buf, ",\n"...)
	j.strings(inner, "remarks", realGasRemarks(st))
	j.buf = append(j.buf, '\n')
	j.buf = append(j.buf, indent...)
	j.buf = append(j.buf, '}')
}
