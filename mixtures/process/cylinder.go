package process

import (
	"cmp"
	"fmt"
	"math"
	"slices"
	"strconv"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/realgas"
	"zmix/model"
)

// Cylinder is a gas cylinder's contents: from its water volume, a
// temperature and one of the fill pressure, the mass or the amount, the
// others, with the real-gas Z of the blend (package realgas) and the
// ideal-gas figure beside it. A fill recipe lists the steps that make the
// blend from its pure parent gases.
type Cylinder struct {
	Mixture     *mixtures.Mixture
	VolumeM3    float64 // water volume
	TempK       float64
	PresPa      float64 // one of PresPa, MassKg, AmountMol is given
	MassKg      float64
	AmountMol   float64
	ToTempK     float64   // when > 0: the pressure after warming or cooling to it
	Ref         Reference // reference condition of the standard volume; zero means normal
	Recipe      string    // "", "pressure" or "weight"
	RatedPresPa float64   // when > 0: a fill above it is refused
}

// CylinderResult is a solved Cylinder.
type CylinderResult struct {
	base
	PresPa, AmountMol, MassKg, Z float64
	IdealAmountMol               float64
	RefM3                        float64
	ToPresPa                     float64
	Steps                        []FillStep
}

// FillStep is one step of a fill recipe: the species added and the
// cylinder's state after it.
type FillStep struct {
	Species      string
	AddedMol     float64
	AddedKg      float64
	CumulativeKg float64
	PresPa       float64 // absolute pressure after the step, at the fill temperature
	GaugePa      float64
	Z            float64
}

var (
	figCylV = &Figure{Key: "v", Label: "water volume", Symbol: "V", SymbolASCII: "V", Unit: "L", UnitASCII: "L", Scale: 1e3,
		Name: "volume_m3", Digits: mixtures.Digits{Sig: 5}}
	figCylT = &Figure{Key: "t", Label: "temperature", Symbol: "T", SymbolASCII: "T", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "temperature_K", Digits: mixtures.Digits{Sig: 6}, Also: celsius}
	figCylN = &Figure{Key: "n", Label: "amount", Symbol: "n", SymbolASCII: "n", Unit: "mol", UnitASCII: "mol", Scale: 1,
		Name: "amount_mol", Digits: mixtures.Digits{Sig: 5}}
	figCylNIdeal = &Figure{Key: "nideal", Label: "amount, ideal gas (Z = 1)", Symbol: "n°", SymbolASCII: "n_ideal", Unit: "mol", UnitASCII: "mol", Scale: 1,
		Name: "ideal_gas_amount_mol", Digits: mixtures.Digits{Sig: 5}}
	figCylM = &Figure{Key: "m", Label: "mass", Symbol: "m", SymbolASCII: "m", Unit: "kg", UnitASCII: "kg", Scale: 1,
		Name: "mass_kg", Digits: mixtures.Digits{Sig: 5}}
	figCylZ = &Figure{Key: "z", Label: "compressibility Z", Symbol: "Z", SymbolASCII: "Z", Scale: 1,
		Name: "z", Digits: mixtures.Digits{Sig: 5}}
	figCylRef = &Figure{Key: "ref", Label: "standard volume", Symbol: "Vref", SymbolASCII: "Vref", Unit: "m³", UnitASCII: "m3", Scale: 1,
		Name: "ref_m3", Digits: mixtures.Digits{Sig: 5}}
	figCylT2 = &Figure{Key: "t2", Label: "temperature later", Symbol: "T₂", SymbolASCII: "T2", Unit: "K", UnitASCII: "K", Scale: 1,
		Name: "to_temperature_K", Digits: mixtures.Digits{Sig: 6}, Also: celsius}
	figCylP2 = &Figure{Key: "p2", Label: "pressure at T₂", Symbol: "P₂", SymbolASCII: "P2", Unit: "bar", UnitASCII: "bar", Scale: 1e-5,
		Name: "to_pressure_Pa", Digits: mixtures.Digits{Sig: 5}}
	figStepN = &Figure{Key: "dn", Label: "added", Symbol: "Δn", SymbolASCII: "dn", Unit: "mol", UnitASCII: "mol", Scale: 1,
		Name: "added_mol", Digits: mixtures.Digits{Sig: 5}}
	figStepKg = &Figure{Key: "dm", Label: "weigh in", Symbol: "Δm", SymbolASCII: "dm", Unit: "g", UnitASCII: "g", Scale: 1e3,
		Name: "added_kg", Digits: mixtures.Digits{Sig: 5}}
	figStepCum = &Figure{Key: "mcum", Label: "scale reading", Symbol: "Σm", SymbolASCII: "m_total", Unit: "g", UnitASCII: "g", Scale: 1e3,
		Name: "cumulative_kg", Digits: mixtures.Digits{Sig: 5}}
	figStepP = &Figure{Key: "pabs", Label: "pressure", Symbol: "P", SymbolASCII: "P", Unit: "bar", UnitASCII: "bar", Scale: 1e-5,
		Name: "pressure_Pa", Digits: mixtures.Digits{Sig: 5}}
	figStepG = &Figure{Key: "pg", Label: "gauge reading", Symbol: "Pg", SymbolASCII: "Pg", Unit: "barg", UnitASCII: "barg", Scale: 1e-5,
		Name: "gauge_Pa", Digits: mixtures.Digits{Sig: 5}}
	figStepZ = &Figure{Key: "zs", Label: "Z in the cylinder", Symbol: "Z", SymbolASCII: "Z", Scale: 1,
		Name: "z", Digits: mixtures.Digits{Sig: 5}}
)

// atmPa is the ambient pressure a gauge reads against: 1 atm (common
// practice; a gauge reads against the local barometer).
const atmPa = model.StdPressureAtmPa

// cylinderGas fills s at (T, P) and says the state's Z, with the ideal
// gas where no real-gas figure is known.
func cylinderGas(mix *mixtures.Mixture, s *mixtures.State, tempK, presPa float64) (float64, error) {
	if err := mix.CheckConditions(tempK, presPa); err != nil {
		return 0, err
	}
	mix.Fill(s, tempK, presPa, mixtures.Options{})
	rg, known := s.RealGasResult()
	if !known {
		return 1, nil
	}
	return rg.Z, nil
}

// pressureFor finds the pressure at which n mol of the blend fill V at
// T: P/Z(P) = nRT/V, by bisection on ln P (P/Z, the density times RT,
// rises with P for a gas).
func pressureFor(mix *mixtures.Mixture, amountMol, volM3, tempK float64) (presPa, z float64, err error) {
	target := amountMol * model.GasConstant * tempK / volM3
	var s mixtures.State
	lo, hi := target/20, target*20
	for i := 0; i < 200 && hi/lo > 1+1e-12; i++ {
		mid := math.Sqrt(lo * hi)
		z, err = cylinderGas(mix, &s, tempK, mid)
		if err != nil {
			return 0, 0, err
		}
		if mid/z < target {
			lo = mid
		} else {
			hi = mid
		}
	}
	presPa = math.Sqrt(lo * hi)
	z, err = cylinderGas(mix, &s, tempK, presPa)
	return presPa, z, err
}

// Solve computes the contents and, when asked, the recipe.
func (c Cylinder) Solve() (*CylinderResult, error) {
	if c.Mixture == nil {
		return nil, model.Errorf("process", "no blend given")
	}
	if !(c.VolumeM3 > 0) || math.IsInf(c.VolumeM3, 0) {
		return nil, model.Errorf("process", "water volume %g m³: want a volume above 0", c.VolumeM3)
	}
	given := 0
	for _, v := range []float64{c.PresPa, c.MassKg, c.AmountMol} {
		if v != 0 {
			given++
		}
		if v < 0 || math.IsNaN(v) || math.IsInf(v, 0) {
			return nil, model.Errorf("process", "%g: want a pressure, mass or amount above 0", v)
		}
	}
	if given != 1 {
		return nil, model.Errorf("process", "give exactly one of the pressure, the mass and the amount")
	}
	mix := c.Mixture
	rt := model.GasConstant * c.TempK
	r := &CylinderResult{}
	var s mixtures.State
	var err error
	switch {
	case c.PresPa > 0:
		if r.Z, err = cylinderGas(mix, &s, c.TempK, c.PresPa); err != nil {
			return nil, err
		}
		r.PresPa = c.PresPa
		r.AmountMol = c.PresPa * c.VolumeM3 / (r.Z * rt)
	default:
		r.AmountMol = c.AmountMol
		if c.MassKg > 0 {
			r.AmountMol = c.MassKg / mix.MolarMassKgPerMol
		}
		if r.PresPa, r.Z, err = pressureFor(mix, r.AmountMol, c.VolumeM3, c.TempK); err != nil {
			return nil, err
		}
	}
	r.MassKg = r.AmountMol * mix.MolarMassKgPerMol
	r.IdealAmountMol = r.PresPa * c.VolumeM3 / rt
	ref := c.Ref
	if ref.Key == "" && ref.TempK == 0 {
		ref = RefNormal
	}
	// The standard volume of the same amount at the reference, with the
	// blend's Z there.
	zRef, err := cylinderGas(mix, &s, ref.TempK, ref.PresPa)
	if err != nil {
		return nil, err
	}
	r.RefM3 = r.AmountMol * zRef * model.GasConstant * ref.TempK / ref.PresPa

	// The state in the cylinder, for its notes.
	if _, err := cylinderGas(mix, &s, c.TempK, r.PresPa); err != nil {
		return nil, err
	}
	// Condensation first: a liquefied gas is refused for that reason,
	// before its dense, liquid-like state puts it outside the models.
	if dp := mixtures.DewPoint(&s); dp.Known && dp.TempK >= c.TempK {
		if c.PresPa > 0 {
			return nil, model.Errorf("process", "%s would condense at %.5g K (its dew point at %.4g bar is %.5g K); refused", strings.Join(dp.Species, ", "), c.TempK, r.PresPa/1e5, dp.TempK)
		}
		return nil, model.Errorf("process", "that much gas would be partly liquid at %.5g K (%s condenses below %.5g K at the %.4g bar it would reach); zmix models the gas only: a liquefied-gas cylinder stands at its vapour pressure, and its contents go by weight", c.TempK, strings.Join(dp.Species, ", "), dp.TempK, r.PresPa/1e5)
	}
	modelName := "ideal gas (no critical constants)"
	if rg, known := s.RealGasResult(); known {
		modelName = rg.Model.String()
		if rg.Range != realgas.InRange {
			return nil, model.Errorf("process", "cylinder at %.4g bar: outside every model here (%s); zmix cannot give its contents", r.PresPa/1e5, rg.Range)
		}
	}
	r.kind = "cylinder"
	r.assumptions = "closed cylinder of fixed water volume, uniform temperature, well mixed; Z from " + modelName +
		"; standard volume at " + ref.Label
	r.in(figCylV, c.VolumeM3)
	r.in(figCylT, c.TempK)
	r.out(figPres, r.PresPa)
	r.out(figCylN, r.AmountMol)
	r.out(figCylM, r.MassKg)
	r.out(figCylZ, r.Z)
	r.out(figCylNIdeal, r.IdealAmountMol)
	r.out(figCylRef, r.RefM3)
	r.note(fmt.Sprintf("the ideal gas would put %.4g mol in at this pressure: %+.2g %% against Z", r.IdealAmountMol, 100*(r.IdealAmountMol/r.AmountMol-1)))

	if c.RatedPresPa > 0 && r.PresPa > c.RatedPresPa {
		return nil, model.Errorf("process", "%.4g bar exceeds the rating given, %.4g bar; refused", r.PresPa/1e5, c.RatedPresPa/1e5)
	}
	if c.ToTempK > 0 {
		if r.ToPresPa, _, err = pressureFor(mix, r.AmountMol, c.VolumeM3, c.ToTempK); err != nil {
			return nil, err
		}
		r.in(figCylT2, c.ToTempK)
		r.out(figCylP2, r.ToPresPa)
		if c.RatedPresPa > 0 && r.ToPresPa > c.RatedPresPa {
			r.caution(mixtures.Caution{Title: "Pressure", Text: fmt.Sprintf("at %.5g K the cylinder reaches %.4g bar, above the rating given (%.4g bar).", c.ToTempK, r.ToPresPa/1e5, c.RatedPresPa/1e5)})
		}
	}
	switch c.Recipe {
	case "":
	case "pressure", "weight":
		if err := r.recipe(c, mix); err != nil {
			return nil, err
		}
	default:
		return nil, model.Errorf("process", "recipe %s: want pressure or weight", model.Quote(c.Recipe))
	}
	r.caution(mixtures.Caution{Title: "Pressure", Text: "the cylinder's rated pressure and its marking are yours to check; follow local codes and licensed practice for filling."})
	return r, nil
}

// fillParent is one gas filled in one step: a pure species, or a named
// mixture (air) from its own supply, with the share of the blend each of
// its species makes.
type fillParent struct {
	label string
	parts []mixtures.Component // X: the species' share of the whole blend
	x     float64              // the parent's share of the blend
}

// fillParents are the parent gases of mix: its blend's items, each
// species once (a species given twice is one parent, air one parent of
// its own), or, for a mixture not made from a blend, its components.
func fillParents(mix *mixtures.Mixture) []fillParent {
	var out []fillParent
	if len(mix.Items) == 0 {
		for _, c := range mix.Components {
			out = append(out, fillParent{label: c.Species.Formula, parts: []mixtures.Component{c}, x: c.X})
		}
		return out
	}
	for _, it := range mix.Items {
		if it.X <= 0 {
			continue
		}
		label := it.Named
		if label == "" {
			label = it.Parts[0].Species.Formula
		}
		i := slices.IndexFunc(out, func(p fillParent) bool { return p.label == label })
		if i < 0 {
			out = append(out, fillParent{label: label})
			i = len(out) - 1
		}
		out[i].x += it.X
		for _, part := range it.Parts {
			out[i].parts = append(out[i].parts, mixtures.Component{Species: part.Species, X: it.X * part.X})
		}
	}
	return out
}

// recipe builds the fill steps: the parent gases in rising order of
// amount, the largest (the balance) last, each step's pressure and Z from
// the gases in the cylinder so far (common practice: the minor gases go
// in first so that the balance gas stirs them in). A named mixture (air)
// is one parent, filled from its own supply.
func (r *CylinderResult) recipe(c Cylinder, mix *mixtures.Mixture) error {
	parents := fillParents(mix)
	slices.SortStableFunc(parents, func(a, b fillParent) int { return cmp.Compare(a.x, b.x) })
	var so mixtures.State
	var sofar []mixtures.Component
	cum := 0.0
	var table [][]Value
	var labels []string
	for _, parent := range parents {
		sofar = append(sofar, parent.parts...)
		sub, err := mixtures.NewMixture(sofar)
		if err != nil {
			return err
		}
		sumX := 0.0
		for _, s := range sofar {
			sumX += s.X
		}
		n := r.AmountMol * sumX
		p, z, err := pressureFor(sub, n, c.VolumeM3, c.TempK)
		if err != nil {
			return err
		}
		if _, err := cylinderGas(sub, &so, c.TempK, p); err != nil {
			return err
		}
		// A gas added as a parent must not condense in its line, nor in
		// the cylinder at this step.
		addKg := 0.0
		for _, comp := range parent.parts {
			addKg += r.AmountMol * comp.X * comp.Species.MolarMassKgPerMol
			if sat := realgas.VapourPressure(comp.Species, c.TempK); !sat.Supercritical && sat.Method != realgas.NoMethod && sat.Pa > 0 {
				for _, t := range so.Species {
					if t.Species == comp.Species && t.PartialPresPa >= sat.Pa {
						return model.Errorf("process", "recipe: %s at %.4g bar in the cylinder is above its vapour pressure at the fill temperature (%.4g bar, %s): it would condense; refused", comp.Species.Formula, t.PartialPresPa/1e5, sat.Pa/1e5, sat.Method)
					}
				}
			}
		}
		cum += addKg
		st := FillStep{Species: parent.label, AddedMol: r.AmountMol * parent.x, AddedKg: addKg, CumulativeKg: cum,
			PresPa: p, GaugePa: p - atmPa, Z: z}
		r.Steps = append(r.Steps, st)
		labels = append(labels, parent.label)
		if c.Recipe == "weight" {
			table = append(table, []Value{{figStepN, st.AddedMol}, {figStepKg, st.AddedKg}, {figStepCum, st.CumulativeKg}})
		} else {
			table = append(table, []Value{{figStepN, st.AddedMol}, {figStepP, st.PresPa}, {figStepG, st.GaugePa}, {figStepZ, st.Z}})
		}
	}
	for _, parent := range parents {
		if m, ok := mixtures.LookupNamedMixture(parent.label); ok && len(parent.parts) > 1 {
			r.note(m.Name + " is filled as one parent gas of its stated composition (" + m.Short + "); a synthetic air's certificate may differ (it holds no argon), which zmix weighed takes from the masses weighed in")
		}
	}
	title := "Fill by partial pressure, in this order, at " + strconv.FormatFloat(c.TempK, 'g', 5, 64) + " K"
	if c.Recipe == "weight" {
		title = "Fill by weight: masses to weigh in, in this order"
		r.note("weights from the molar masses (IUPAC atomic weights) and pure parent gases; the composition and its uncertainty (ISO 6142-1) from the masses actually weighed in: zmix weighed")
	} else {
		r.note("gauge readings against 1 atm at the fill temperature; each step's pressure uses Z of the gases in the cylinder so far, which is assumed well mixed")
	}
	r.tables = append(r.tables, Table{Name: "steps", Title: title, RowName: "species", RowLabels: labels, Rows: table})
	return nil
}

// ParseCylinderQuantity reads "50 L", "0.05 m3", "10 kg", "500 g",
// "120 mol" into SI (m³, kg, mol), checking the unit is of the kind
// wanted ("volume", "mass" or "amount"). Volumes and masses are read as
// every other volume and mass is (ParseVolume, the weighing's units); a
// mass is at most 1e9 kg and an amount 1e12 mol, so that a slip of the
// exponent is refused rather than computed.
func ParseCylinderQuantity(kind, text string) (float64, error) {
	switch kind {
	case "volume":
		return ParseVolume(text)
	case "mass":
		kg, err := parseMassKg(text)
		if err != nil {
			return 0, err
		}
		if !(kg > 0) {
			return 0, model.Errorf("process", "mass %s: want a number above 0 and at most 1e9 kg", model.Quote(text))
		}
		return kg, nil
	}
	if err := tooLong("an amount", text); err != nil {
		return 0, err
	}
	units := map[string]float64{"mol": 1, "kmol": 1e3}
	x, unit, ok := splitValue(strings.TrimSpace(text))
	if !ok || unit == "" {
		return 0, model.Errorf("process", "amount %s: want a number and a unit (%s)", model.Quote(text), unitList(units))
	}
	scale, ok := units[unit]
	if !ok {
		return 0, model.Errorf("process", "amount %s: unknown unit %s; want %s", model.Quote(text), model.Quote(unit), unitList(units))
	}
	if v := x * scale; !(v > 0) || v > 1e12 {
		return 0, model.Errorf("process", "amount %s: want a number above 0 and at most 1e12 mol", model.Quote(text))
	}
	return x * scale, nil
}

func unitList(units map[string]float64) string {
	keys := make([]string, 0, len(units))
	for k := range units {
		keys = append(keys, k)
	}
	slices.Sort(keys)
	return strings.Join(keys, ", ")
}

// CylinderRelease is what a cylinder gives up when it empties into a room:
// its contents at the fill pressure less what stays in it at the ambient
// 1 atm, both at the fill temperature and each with the blend's real-gas
// Z. The gas cools as it leaves and warms back to the room; for the
// room's air only the amount counts.
type CylinderRelease struct {
	Full        *CylinderResult // the contents as filled
	LeftMol     float64         // what stays at 1 atm
	ReleasedMol float64
}

// Release solves c (given by its pressure) and the amount it releases
// down to 1 atm.
func (c Cylinder) Release() (*CylinderRelease, error) {
	if !(c.PresPa > atmPa) || c.MassKg != 0 || c.AmountMol != 0 {
		return nil, model.Errorf("process", "fill pressure %.4g bar: want a pressure above the ambient 1 atm", c.PresPa/1e5)
	}
	c.Recipe, c.ToTempK = "", 0
	full, err := c.Solve()
	if err != nil {
		return nil, err
	}
	var s mixtures.State
	z, err := cylinderGas(c.Mixture, &s, c.TempK, atmPa)
	if err != nil {
		return nil, err
	}
	left := atmPa * c.VolumeM3 / (z * model.GasConstant * c.TempK)
	return &CylinderRelease{Full: full, LeftMol: left, ReleasedMol: full.AmountMol - left}, nil
}
