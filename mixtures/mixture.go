package mixtures

import (
	"math"

	"zmix/mixtures/realgas"
	"zmix/model"
)

// Mixture is a resolved ideal-gas blend: species and mole fractions that
// sum to one.
type Mixture struct {
	Components        []Component
	MolarMassKgPerMol float64

	// Set by NewMixture, once, for every state: ln xᵢ of each component
	// and the ideal mixing entropy −R Σ xᵢ ln xᵢ, which depend on the
	// composition only.
	lnX          []float64
	sMixJPerMolK float64
	// real holds the real-gas models' constants for the composition.
	real *realgas.Mixture
}

// prepare computes what every state of the mixture shares.
func (m *Mixture) prepare() {
	m.lnX = make([]float64, len(m.Components))
	m.sMixJPerMolK = 0
	for i, c := range m.Components {
		m.lnX[i] = math.Log(c.X)
		m.sMixJPerMolK -= model.GasConstant * c.X * m.lnX[i]
	}
	comps := make([]realgas.Component, len(m.Components))
	for i, c := range m.Components {
		comps[i] = realgas.ComponentOf(c.Species, c.X)
	}
	m.real = realgas.New(comps)
}

// RealGas returns the blend's real-gas models: which species they take as
// ideal gases, and which polar species' virial terms they leave out.
func (m *Mixture) RealGas() *realgas.Mixture {
	if len(m.lnX) != len(m.Components) {
		m.prepare()
	}
	return m.real
}

// Options are the choices a state is computed with. The zero value means
// the defaults: the default model treatment and P° = 1 bar.
type Options struct {
	Treatment model.Treatment
	Std       StdPressure // standard pressure P° of μ°
}

// SpeciesTerm is one species' share of a mixture state.
type SpeciesTerm struct {
	Species       *model.Species
	X             float64 // mole fraction
	MassFrac      float64
	PartialPresPa float64
	// MuJPerMol is μᵢ = μᵢ°(T) + RT ln(xᵢP/P°); Mu0JPerMol is μᵢ°(T).
	MuJPerMol  float64
	Mu0JPerMol float64
	// Partial molar properties: the species at (T, pᵢ), per mole of i.
	SJPerMolK  float64
	CpJPerMolK float64
	HJPerMol   float64
	// Contributions to the blend's molar S and Cp: xᵢSᵢ and xᵢCpᵢ.
	SShareJPerMolK  float64
	CpShareJPerMolK float64
	// State is the full species state at (T, pᵢ), with its factor terms.
	State model.State
}

// State is a mixture at one (T, P), per mole of mixture unless a method
// says per kg.
type State struct {
	TempK, PresPa, StdPresPa float64

	MolarMassKgPerMol float64
	DensityKgPerM3    float64
	CpJPerMolK        float64
	CvJPerMolK        float64
	Gamma             float64
	SoundSpeedMPerS   float64
	HJPerMol          float64
	UJPerMol          float64
	SJPerMolK         float64
	GJPerMol          float64
	AJPerMol          float64
	SMixJPerMolK      float64 // −R Σ xᵢ ln xᵢ

	// RealGas is the real-gas correction beside the ideal-gas figures
	// (package realgas); RealGasKnown is false when no species of the
	// blend carries critical constants, or the models give no finite
	// figure, and then the real-gas quantities read NaN: "not known".
	RealGas      realgas.Result
	RealGasKnown bool

	Species []SpeciesTerm
}

// RealDensityKgPerM3 is the density from the real-gas Z, NaN when not
// known.
func (s *State) RealDensityKgPerM3() float64 {
	if !s.RealGasKnown {
		return math.NaN()
	}
	return s.MolarMassKgPerMol / s.RealGas.VM3PerMol
}

// Z is the compressibility factor PV/(RT), NaN when not known.
func (s *State) Z() float64 {
	if !s.RealGasKnown {
		return math.NaN()
	}
	return s.RealGas.Z
}

// PerKg converts a molar quantity of the state to a specific one.
func (s *State) PerKg(perMol float64) float64 { return perMol / s.MolarMassKgPerMol }

// minPartialPa is the smallest normal float64, 2⁻¹⁰²². Below it a partial
// pressure keeps too few digits for ln pᵢ, and at 0 the logarithm is −Inf.
const minPartialPa = 0x1p-1022

// CheckConditions reports whether the mixture can be computed at (T, P):
// the model's range for T and P, and every partial pressure xᵢP a normal
// float.
func (m *Mixture) CheckConditions(tempK, presPa float64) error {
	if err := model.CheckConditions(tempK, presPa); err != nil {
		return err
	}
	for _, c := range m.Components {
		if pi := c.X * presPa; pi < minPartialPa {
			return model.KindErrorf("mixtures", model.ErrPressure, "the partial pressure of %s, x·P = %g Pa, is too small to compute with (got P = %g Pa); want a higher pressure", model.Printable(c.Species.Formula), pi, presPa)
		}
	}
	return nil
}

// State computes the mixture at (T, P).
func (m *Mixture) State(tempK, presPa float64, opts Options) (State, error) {
	if err := m.CheckConditions(tempK, presPa); err != nil {
		return State{}, err
	}
	var s State
	m.Fill(&s, tempK, presPa, opts)
	return s, nil
}

// Fill computes the mixture at (T, P) into s, reusing s.Species when it
// has room. It does not check (T, P): callers check once with
// m.CheckConditions.
func (m *Mixture) Fill(s *State, tempK, presPa float64, opts Options) {
	if cap(s.Species) >= len(m.Components) {
		s.Species = s.Species[:len(m.Components)]
	} else {
		s.Species = make([]SpeciesTerm, len(m.Components))
	}
	if len(m.lnX) != len(m.Components) {
		// Not made by NewMixture. Fill may run on several goroutines at
		// once (the workbench's state and its sweep), so it computes
		// what NewMixture would have kept without storing it.
		c := *m
		c.prepare()
		m = &c
	}
	p0 := opts.Std.Pa()
	r := model.GasConstant
	rt := r * tempK
	s.TempK, s.PresPa, s.StdPresPa = tempK, presPa, p0
	s.MolarMassKgPerMol = m.MolarMassKgPerMol
	lnPOverP0 := math.Log(presPa / p0)
	var cp, cv, h, u, sEnt, g, a float64
	for i, c := range m.Components {
		t := &s.Species[i]
		t.Species, t.X, t.MassFrac = c.Species, c.X, c.MassFrac
		pi := c.X * presPa
		t.PartialPresPa = pi
		c.Species.Fill(&t.State, tempK, pi, opts.Treatment)
		st := &t.State
		t.MuJPerMol = st.GJPerMol
		// μ° at P°: the species' G shifted from pᵢ to P°, with
		// ln(pᵢ/P°) = ln xᵢ + ln(P/P°), ln xᵢ kept by the mixture.
		t.Mu0JPerMol = st.GJPerMol - rt*(m.lnX[i]+lnPOverP0)
		t.SJPerMolK, t.CpJPerMolK, t.HJPerMol = st.SJPerMolK, st.CpJPerMolK, st.HJPerMol
		t.SShareJPerMolK = c.X * st.SJPerMolK
		t.CpShareJPerMolK = c.X * st.CpJPerMolK
		cp += c.X * st.CpJPerMolK
		cv += c.X * st.CvJPerMolK
		h += c.X * st.HJPerMol
		u += c.X * st.UJPerMol
		sEnt += t.SShareJPerMolK
		g += c.X * st.GJPerMol
		a += c.X * st.AJPerMol
	}
	s.CpJPerMolK, s.CvJPerMolK = cp, cv
	s.Gamma = cp / cv
	s.HJPerMol, s.UJPerMol, s.SJPerMolK, s.GJPerMol = h, u, sEnt, g
	// A of an ideal mixture: Σ xᵢ Aᵢ(T, pᵢ) = G − PV/n = G − RT.
	s.AJPerMol = a
	s.SMixJPerMolK = m.sMixJPerMolK
	s.DensityKgPerM3 = presPa * m.MolarMassKgPerMol / rt
	s.SoundSpeedMPerS = math.Sqrt(s.Gamma * rt / m.MolarMassKgPerMol)
	s.RealGasKnown = false
	if m.real.Known() {
		rg := &s.RealGas
		m.real.Eval(rg, tempK, presPa, cp)
		s.RealGasKnown = finite(rg.Z) && finite(rg.VM3PerMol) && rg.VM3PerMol > 0 && finite(rg.HResJPerMol) &&
			finite(rg.SResJPerMolK) && finite(rg.CpJPerMolK) && finite(rg.CvJPerMolK) &&
			finite(rg.SoundSpeedMPerS) && finite(rg.JouleThomsonKPerPa)
	}
}
