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
// pairs; a single line saying why when they are not known. Z and the
// real density are rows of the quantity table too (SectionRealGas), for
// JSON, CSV, sweeps and the workbench.
func RealGasLines(st *mixtures.State) [][2]string {
	rg, known := st.RealGasResult()
	if !known {
		return [][2]string{{"not known", "no species of the blend carries critical constants (Tc, Pc, ω)"}}
	}
	deviation := math.Abs(rg.Z-1) * 100
	lines := [][2]string{
		{"model", ModelText(rg)},
		{"Z = PV/(RT)", Sig(rg.Z, 5) + fmt.Sprintf("   |Z − 1| = %s %%: the ideal-gas density is off by that much", Sig(deviation, 2))},
		{"real density", Sig(st.RealDensityKgPerM3(), 5) + " kg/m³   (ideal gas " + Sig(st.DensityKgPerM3, 5) + ")"},
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
	rg, known := st.RealGasResult()
	if !known {
		return nil
	}
	if rg.Range != realgas.InRange {
		out = append(out, "outside every model here: "+rg.Range.String()+"; neither the ideal-gas nor these figures can be trusted")
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
	if len(polar) > 0 && rg.Model == realgas.Virial {
		out = append(out, "polar virial terms left out for "+strings.Join(polar, ", ")+": their |B| is underestimated")
	}
	return out
}

// DewPointLine is the blend's dew point at the line pressure as a label
// and a value, with the margin to the state's temperature and its method.
func DewPointLine(st *mixtures.State, dp realgas.DewPoint) [2]string {
	return dewPointLine(st, dp, " at the line pressure")
}

// DewPointShort is DewPointLine for a pane's one line: the same figures
// without the words "at the line pressure", which the pane's heading
// implies.
func DewPointShort(st *mixtures.State, dp realgas.DewPoint) [2]string {
	return dewPointLine(st, dp, "")
}

func dewPointLine(st *mixtures.State, dp realgas.DewPoint, at string) [2]string {
	if !dp.Known {
		return [2]string{"dew point", "none: " + dp.Why}
	}
	label := "dew point"
	if dp.Frost {
		label = "frost point"
	}
	margin := st.TempK - dp.TempK
	marginText := Short(math.Abs(margin), 3) + " K below T"
	if margin <= 0 {
		marginText = "T is " + Short(-margin, 3) + " K below it: the blend condenses"
	}
	how := strings.Join(dp.Species, ", ")
	if dp.Raoult {
		how += "; ideal-solution (Raoult) estimate"
	}
	if dp.Rough {
		how += "; rough: a vapour pressure from Trouton's rule"
	}
	return [2]string{label, Temperature(dp.TempK) + at + ", " + marginText + " (" + model.Printable(how) + ")"}
}

// HumidityLine is the relative humidity of the blend's water as a label
// and a value, with the pressures it is the ratio of; ok is false when the
// blend holds no water or the state has no saturation pressure for it.
func HumidityLine(h mixtures.Humidity) ([2]string, bool) {
	if !h.Known {
		return [2]string{}, false
	}
	return [2]string{"relative humidity", humidityText(h) + " (H2O at " + Sig(h.PartPa/1000, 4) + " kPa of " +
		Sig(h.SatPa/1000, 4) + " kPa at T, IAPWS)"}, true
}

// HumidityShort is HumidityLine for a pane's one line: the figure and
// over what.
func HumidityShort(h mixtures.Humidity) ([2]string, bool) {
	if !h.Known {
		return [2]string{}, false
	}
	return [2]string{"RH", humidityText(h)}, true
}

// humidityText is "38.74 % over water" or "4.941 % over ice".
func humidityText(h mixtures.Humidity) string {
	if h.OverIce {
		return Sig(h.Percent, 4) + " % over ice"
	}
	return Sig(h.Percent, 4) + " % over water"
}

// writeRealGasText writes the section of the text readout.
func writeRealGasText(w io.Writer, st *mixtures.State) {
	fmt.Fprintln(w, "Real gas, beside the ideal-gas figures above")
	t := NewTable("  ", Left, Left)
	for _, l := range RealGasLines(st) {
		t.Row(l[0], l[1])
	}
	dp := DewPointLine(st, mixtures.DewPoint(st))
	t.Row(dp[0], dp[1])
	if rh, ok := HumidityLine(mixtures.RelativeHumidity(st)); ok {
		t.Row(rh[0], rh[1])
	}
	t.Write(w)
	for _, r := range realGasRemarks(st) {
		WriteWrapped(w, "  ", "    ", r)
	}
	fmt.Fprintln(w)
}

// realGas appends the member "real_gas": an object with the real-gas
// figures in SI units and the model's name, or null when not known; then
// the dew point at the line pressure: dew_point_K (null when nothing can
// condense at any temperature the catalogue covers), dew_point_species,
// dew_point_kind ("dew" or "frost") and dew_point_method; and
// relative_humidity_percent of the blend's water (null without water, or
// above water's critical temperature).
func (j *jsonWriter) realGas(st *mixtures.State, indent string) {
	j.realGasObject(st, indent)
	dp := mixtures.DewPoint(st)
	j.buf = append(j.buf, ",\n"...)
	j.key(indent, "dew_point_K")
	if dp.Known {
		j.float(dp.TempK)
	} else {
		j.buf = append(j.buf, "null"...)
	}
	j.buf = append(j.buf, ",\n"...)
	j.strings(indent, "dew_point_species", dp.Species)
	kind, method := "dew", "vapour pressures: IAPWS for water, Lee-Kesler from Tc, Pc and omega for the others"
	if dp.Frost {
		kind = "frost"
	}
	if dp.Raoult {
		method += "; ideal-solution (Raoult) estimate"
	}
	if dp.Rough {
		method += "; rough: a vapour pressure from Trouton's rule"
	}
	if !dp.Known {
		kind, method = "", dp.Why
	}
	j.buf = append(j.buf, ",\n"...)
	j.key(indent, "dew_point_kind")
	j.buf = appendJSONString(j.buf, kind)
	j.buf = append(j.buf, ",\n"...)
	j.key(indent, "dew_point_method")
	j.buf = appendJSONString(j.buf, method)
	j.buf = append(j.buf, ",\n"...)
	j.key(indent, "relative_humidity_percent")
	if h := mixtures.RelativeHumidity(st); h.Known {
		j.float(h.Percent)
	} else {
		j.buf = append(j.buf, "null"...)
	}
}

func (j *jsonWriter) realGasObject(st *mixtures.State, indent string) {
	j.key(indent, "real_gas")
	rg, known := st.RealGasResult()
	if !known {
		j.buf = append(j.buf, "null"...)
		return
	}
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
