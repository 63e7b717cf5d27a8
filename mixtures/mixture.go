package mixtures

import (
	"math"
	"strings"
	"sync"

	"zmix/mixtures/realgas"
	"zmix/model"
)

// Mixture is a resolved ideal-gas blend: species and mole fractions that
// sum to one.
type Mixture struct {
	Components        []Component
	MolarMassKgPerMol float64
	// Items are the items of the blend it was resolved from, in the
	// blend's order, each with its mole fraction before repeated species
	// were merged and a named mixture (air) was shared among its
	// components; nil for a mixture not made from a blend.
	Items []ItemShare

	// Set by NewMixture, once, for every state: ln xᵢ of each component
	// and the ideal mixing entropy −R Σ xᵢ ln xᵢ, which depend on the
	// composition only.
	lnX          []float64
	sMixJPerMolK float64
	// real holds the real-gas models' constants for the composition,
	// made when a state first asks for its real-gas figures: a process
	// balance on the ideal gas makes mixtures it never asks.
	real *lazyRealGas
}

// ItemShare is one blend item's mole fraction in the mixture: Key as the
// blend names it ("N2", "nitrogen", "air"); Named, the named mixture it
// stands for ("air"), or "" for a species; Parts, its species with their
// fractions of the item (one part of 1 for a species).
type ItemShare struct {
	Key   string
	X     float64
	Named string
	Parts []Component
}

// ItemFraction returns the mole fraction the blend items named key make
// together (case does not matter), and whether any does.
func (m *Mixture) ItemFraction(key string) (float64, bool) {
	x, found := 0.0, false
	for _, it := range m.Items {
		if strings.EqualFold(it.Key, strings.TrimSpace(key)) {
			x, found = x+it.X, true
		}
	}
	return x, found
}

// lazyRealGas makes a composition's real-gas constants once, on request;
// known says beforehand whether any species carries critical constants.
type lazyRealGas struct {
	once  sync.Once
	comps []Component
	known bool
	m     *realgas.Mixture
}

func (l *lazyRealGas) get() *realgas.Mixture {
	l.once.Do(func() {
		comps := make([]realgas.Component, len(l.comps))
		for i, c := range l.comps {
			comps[i] = realgas.ComponentOf(c.Species, c.X)
		}
		l.m = realgas.New(comps)
	})
	return l.m
}

// prepare computes what every state of the mixture shares.
func (m *Mixture) prepare() {
	m.lnX = make([]float64, len(m.Components))
	m.sMixJPerMolK = 0
	m.real = &lazyRealGas{comps: m.Components}
	for i, c := range m.Components {
		m.lnX[i] = math.Log(c.X)
		m.sMixJPerMolK -= model.GasConstant * c.X * m.lnX[i]
		// As realgas.New counts a species with constants.
		m.real.known = m.real.known || c.Species.CriticalK > 0 && c.Species.CriticalPa > 0
	}
}

// RealGas returns the blend's real-gas models: which species they take as
// ideal gases, and which polar species' virial terms they leave out.
func (m *Mixture) RealGas() *realgas.Mixture {
	if len(m.lnX) != len(m.Components) {
		m.prepare()
	}
	return m.real.get()
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
	//
	// Mixture.State fills both. Mixture.Fill leaves them to be computed
	// on the first request, since most states of a sweep or a process
	// balance never show them: read them through RealGasResult (or the
	// getters Z and RealDensityKgPerM3, as the quantity table does)
	// after Fill.
	RealGas      realgas.Result
	RealGasKnown bool
	realPending  pendingRealGas

	Species []SpeciesTerm
}

// pendingRealGas is what the real-gas figures of a state filled by
// Fill are computed from, kept apart from the State's public fields so
// that a caller that changes those (a process model adding the
// departures) cannot change the result.
type pendingRealGas struct {
	model                    *lazyRealGas // nil: nothing pending
	tempK, presPa, cpIdealJK float64
}

// RealGasResult returns the state's real-gas figures and whether they
// are known, computing them first if Fill left them for later. Like
// every method that may compute them (Z, RealDensityKgPerM3 and so the
// quantity table's getters), it writes to s: a State read from several
// goroutines at once must have had them computed before.
func (s *State) RealGasResult() (*realgas.Result, bool) {
	if p := &s.realPending; p.model != nil {
		rg := &s.RealGas
		p.model.get().Eval(rg, p.tempK, p.presPa, p.cpIdealJK)
		s.RealGasKnown = finite(rg.Z) && finite(rg.VM3PerMol) && rg.VM3PerMol > 0 && finite(rg.HResJPerMol) &&
			finite(rg.SResJPerMolK) && finite(rg.CpJPerMolK) && finite(rg.CvJPerMolK) &&
			finite(rg.SoundSpeedMPerS) && finite(rg.JouleThomsonKPerPa)
		p.model = nil
	}
	return &s.RealGas, s.RealGasKnown
}

// RealDensityKgPerM3 is the density from the real-gas Z, NaN when not
// known.
func (s *State) RealDensityKgPerM3() float64 {
	rg, ok := s.RealGasResult()
	if !ok {
		return math.NaN()
	}
	return s.MolarMassKgPerMol / rg.VM3PerMol
}

// Z is the compressibility factor PV/(RT), NaN when not known.
func (s *State) Z() float64 {
	rg, ok := s.RealGasResult()
	if !ok {
		return math.NaN()
	}
	return rg.Z
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
	s.RealGasResult() // the whole state, as callers of State read its fields
	return s, nil
}

// The logs of the standard pressures, taken once.
var (
	lnStdBarPa = math.Log(StdBar.Pa())
	lnStdAtmPa = math.Log(StdAtm.Pa())
)

// lnStdPa returns ln P° of std.
func lnStdPa(std StdPressure) float64 {
	if std == StdAtm {
		return lnStdAtmPa
	}
	return lnStdBarPa
}

// Fill computes the mixture at (T, P) into s, reusing s.Species when it
// has room. It does not check (T, P): callers check once with
// m.CheckConditions. The real-gas figures are computed when first asked
// for (see State.RealGasResult).
//
// ln T and ln P are taken once for the whole blend, and each species'
// ln pᵢ is ln xᵢ + ln P from the ln xᵢ the mixture keeps, so that a
// species adds only the exp and log calls of its own factors.
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
	lnT, lnP := math.Log(tempK), math.Log(presPa)
	lnPOverP0 := lnP - lnStdPa(opts.Std)
	var cp, cv, h, u, sEnt, g, a float64
	for i, c := range m.Components {
		t := &s.Species[i]
		t.Species, t.X, t.MassFrac = c.Species, c.X, c.MassFrac
		pi := c.X * presPa
		t.PartialPresPa = pi
		lnX := m.lnX[i]
		c.Species.FillLn(&t.State, tempK, lnT, pi, lnX+lnP, opts.Treatment)
		st := &t.State
		t.MuJPerMol = st.GJPerMol
		// μ° at P°: the species' G shifted from pᵢ to P°, with
		// ln(pᵢ/P°) = ln xᵢ + ln(P/P°).
		t.Mu0JPerMol = st.GJPerMol - rt*(lnX+lnPOverP0)
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
	s.realPending = pendingRealGas{}
	if m.real.known {
		s.realPending = pendingRealGas{model: m.real, tempK: tempK, presPa: presPa, cpIdealJK: cp}
	}
}
