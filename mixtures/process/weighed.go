package process

import (
	"fmt"
	"math"
	"slices"
	"strings"

	"gonum.org/v1/gonum/mat"

	"zmix/mixtures"
	"zmix/model"
)

// Weighing is the reverse of a fill by weight: from the mass of each
// parent gas weighed into a cylinder, the composition made, with each mole
// fraction's standard uncertainty. It follows the gravimetric method for
// calibration gas mixtures (ISO 6142-1):
//
//	xᵢ = Σ_A yᵢ,A mA/MA / Σ_A mA/MA,   MA = Σₖ yₖ,A Mₖ,   Mₖ = Σₑ νₖₑ Aₑ
//
// with mA the mass of parent A, yᵢ,A its mole fractions (the main gas the
// balance, 1 − Σ of the others), Mₖ a species' molar mass and Aₑ the
// atomic weights. The uncertainty is the GUM's law of propagation
// (JCGM 100, 5.1.2) for uncorrelated inputs, u²(xᵢ) = Σⱼ (∂xᵢ/∂qⱼ)² u²(qⱼ),
// over every mass, every stated amount in a parent and every atomic
// weight; the full covariance of the fractions is Cov = (J U)(J U)ᵀ.
type Weighing struct {
	Parents []WeighedParent
	// MassUKg is the standard uncertainty of each weighed mass (the
	// balance's, for the difference of the two weighings), unless a
	// parent states its own.
	MassUKg float64
	// AtomicWeights replace the IUPAC values of some elements: argon of
	// known origin, say, whose atomic weight is known far better than
	// the standard interval.
	AtomicWeights []AtomicWeight
}

// AtomicWeight is an element's atomic weight as the user knows it, with
// its standard uncertainty.
type AtomicWeight struct {
	Element        string
	GPerMol, UGPer float64
}

// WeighedParent is one parent gas and the mass of it weighed in.
type WeighedParent struct {
	Text    string // as typed
	Gas     string // the gas part of Text
	MassKg  float64
	MassUKg float64 // < 0: the Weighing's MassUKg
	Parts   []ParentPart
	// ByMass: the parts' amounts are mass fractions (a premix certified
	// in wt% or kg/kg), turned into mole fractions with the molar masses,
	// whose uncertainty then counts twice: in MA and in the conversion.
	ByMass bool
}

// ParentPart is one species of a parent gas.
type ParentPart struct {
	Species *model.Species
	// X is the stated mole fraction (mass fraction in a parent ByMass)
	// and UX its standard uncertainty; for the balance they are found
	// from the others.
	X, UX   float64
	Balance bool
	// Limit: stated as below LimitX, taken as LimitX/2 with a rectangular
	// distribution over [0, LimitX] (ISO 6142-1).
	Limit  bool
	LimitX float64
	// Stated: the uncertainty was given with ±; an amount with neither ±
	// nor < is taken as exact.
	Stated bool
}

// check says whether the parts make a parent: one balance, the rest
// stated, summing below 1.
func (p *WeighedParent) check() error {
	bal, sum := 0, 0.0
	for _, pt := range p.Parts {
		if pt.Balance {
			bal++
			continue
		}
		if !(pt.X > 0) {
			return model.Errorf("process", "%s at %g: a stated amount must be above 0 (write a species not found as %s <LIMIT)", pt.Species.Formula, pt.X, pt.Species.Formula)
		}
		if !(pt.UX >= 0) || math.IsInf(pt.UX, 0) {
			return model.Errorf("process", "%s: the uncertainty must be 0 or more", pt.Species.Formula)
		}
		sum += pt.X
	}
	if bal != 1 {
		return model.Errorf("process", "name one balance species (SPECIES bal, or MAIN with IMPURITIES); found %d", bal)
	}
	if !(sum < 1) {
		return model.Errorf("process", "the stated amounts sum to %.6g, leaving nothing for the balance", sum)
	}
	return nil
}

// atomicWeightUGPerMol is the half-width, in g/mol, of each standard
// atomic weight (IUPAC CIAAW 2021, Pure Appl. Chem. 94 (2022) 573, from
// memory): for an element given as an interval (H, B, C, N, O, Si, S, Cl,
// Ar, Br) the abridged table's ± around the conventional value that
// package model uses; for the others the standard atomic weight's own
// uncertainty. Each is taken as the half-width of a rectangular
// distribution, u = U/√3 (JCGM 100, 4.3.7), as is common practice in
// gravimetry. Argon's ±0.16 spans argon from every source; atmospheric
// argon is known far better, which a lab with a certified value may use.
// D is one nuclide (AME2020), its uncertainty negligible here.
var atomicWeightUGPerMol = map[string]float64{
	"H": 0.0002, "D": 0, "He": 0.000002, "B": 0.02, "C": 0.002, "N": 0.001,
	"O": 0.001, "F": 0.000000005, "Ne": 0.0006, "Si": 0.001, "P": 0.000000005,
	"S": 0.02, "Cl": 0.01, "Ar": 0.16, "Ge": 0.008, "As": 0.000006,
	"Br": 0.003, "Kr": 0.002, "W": 0.01, "Xe": 0.006,
}

// WeighedResult is a solved Weighing.
type WeighedResult struct {
	base
	Species []string  // formulas, in the order they first appear
	X, UX   []float64 // mole fractions and their standard uncertainties
	// The parts of u² from each kind of input, as standard uncertainties:
	// the masses, the parents' stated amounts, the atomic weights.
	UMasses, UPurity, UMolar []float64
	// Cov is the covariance of the fractions; each row sums to 0, since
	// the fractions sum to 1.
	Cov                 *mat.SymDense
	TotalMassKg, AmtMol float64
	MolarMassKgPerMol   float64
}

var (
	figWMassU = &Figure{Key: "um", Label: "u of each weighed mass", Symbol: "u(m)", SymbolASCII: "u(m)", Unit: "mg", UnitASCII: "mg", Scale: 1e6,
		Name: "mass_uncertainty_kg", Digits: mixtures.Digits{Sig: 3}}
	figWParents = &Figure{Key: "parents", Label: "parent gases", Symbol: "P", SymbolASCII: "P", Scale: 1,
		Name: "parent_count", Integer: true}
	figWMass = &Figure{Key: "m", Label: "mass weighed in", Symbol: "m", SymbolASCII: "m", Unit: "g", UnitASCII: "g", Scale: 1e3,
		Name: "mass_kg", Digits: mixtures.Digits{Sig: 7}}
	figWAmount = &Figure{Key: "n", Label: "amount", Symbol: "n", SymbolASCII: "n", Unit: "mol", UnitASCII: "mol", Scale: 1,
		Name: "amount_mol", Digits: mixtures.Digits{Sig: 7}}
	figWPartU = &Figure{Key: "upm", Label: "u(m)", Symbol: "u(m)", SymbolASCII: "u(m)", Unit: "mg", UnitASCII: "mg", Scale: 1e6,
		Name: "mass_uncertainty_kg", Digits: mixtures.Digits{Sig: 3}}
	figWPartM = &Figure{Key: "M", Label: "molar mass", Symbol: "M", SymbolASCII: "M", Unit: "g/mol", UnitASCII: "g/mol", Scale: 1e3,
		Name: "molar_mass_kg_mol", Digits: mixtures.Digits{Sig: 7}}
	figWX = &Figure{Key: "x", Label: "mole fraction", Symbol: "x", SymbolASCII: "x", Unit: "mol/mol", UnitASCII: "mol/mol", Scale: 1,
		Name: "x_mol_mol", Digits: mixtures.Digits{Sig: 7}}
	figWU = &Figure{Key: "u", Label: "standard uncertainty", Symbol: "u(x)", SymbolASCII: "u(x)", Unit: "mol/mol", UnitASCII: "mol/mol", Scale: 1,
		Name: "u_mol_mol", Digits: mixtures.Digits{Sig: 2}}
	figWUExp = &Figure{Key: "U", Label: "expanded uncertainty, k = 2", Symbol: "U (k=2)", SymbolASCII: "U (k=2)", Unit: "mol/mol", UnitASCII: "mol/mol", Scale: 1,
		Name: "U_k2_mol_mol", Digits: mixtures.Digits{Sig: 2}}
	figWURel = &Figure{Key: "ur", Label: "relative standard uncertainty", Symbol: "u(x)/x", SymbolASCII: "u(x)/x", Unit: "%", UnitASCII: "%", Scale: 100,
		Name: "u_relative", Digits: mixtures.Digits{Sig: 2}}
	figWUMass = &Figure{Key: "u_m", Label: "from the masses", Symbol: "masses", SymbolASCII: "masses", Unit: "mol/mol", UnitASCII: "mol/mol", Scale: 1,
		Name: "u_from_masses_mol_mol", Digits: mixtures.Digits{Sig: 2}}
	figWUPur = &Figure{Key: "u_p", Label: "from the purity", Symbol: "purity", SymbolASCII: "purity", Unit: "mol/mol", UnitASCII: "mol/mol", Scale: 1,
		Name: "u_from_purity_mol_mol", Digits: mixtures.Digits{Sig: 2}}
	figWUMol = &Figure{Key: "u_M", Label: "from the molar masses", Symbol: "molar masses", SymbolASCII: "molar masses", Unit: "mol/mol", UnitASCII: "mol/mol", Scale: 1,
		Name: "u_from_molar_masses_mol_mol", Digits: mixtures.Digits{Sig: 2}}
)

// gravimetry is the measurement model of a Weighing, written as a
// function of one vector of inputs q: the masses, then each parent's
// stated amounts, then the atomic weights (all SI). The composition and
// its sensitivities both come from it, and a test differentiates it
// numerically.
type gravimetry struct {
	species  []string
	elements []string
	// nu[k][e]: atoms of element e in species k.
	nu [][]float64
	// parents[a]: the species index of each part, which part is the
	// balance, and where its stated amounts sit in q.
	parents []gravParent
	nq      int
	// Where each kind of input starts in q.
	massAt, partAt, elemAt int
}

type gravParent struct {
	byMass  bool  // the stated amounts are mass fractions
	species []int // species index of each part
	balance int   // index into species of the balance part
	qAt     []int // position in q of each stated part (-1 for the balance)
}

// inputKind says what an input of q is, for the budget.
type inputKind int

const (
	inMass inputKind = iota
	inPurity
	inAtomic
)

func (g *gravimetry) kind(j int) inputKind {
	switch {
	case j < g.partAt:
		return inMass
	case j < g.elemAt:
		return inPurity
	}
	return inAtomic
}

// parentState holds, for one q, each parent's fractions over all
// species, its molar mass and amount.
type parentState struct {
	y    [][]float64
	molM []float64 // per species
	mA   []float64 // per parent
	nA   []float64
	n    float64 // total amount
}

func (g *gravimetry) state(q []float64) parentState {
	s := parentState{molM: make([]float64, len(g.species)), y: make([][]float64, len(g.parents)),
		mA: make([]float64, len(g.parents)), nA: make([]float64, len(g.parents))}
	for k := range g.species {
		for e := range g.elements {
			s.molM[k] += g.nu[k][e] * q[g.elemAt+e]
		}
	}
	for a, p := range g.parents {
		y := make([]float64, len(g.species))
		rest := 1.0
		for i, at := range p.qAt {
			if at >= 0 {
				y[p.species[i]] = q[at]
				rest -= q[at]
			}
		}
		y[p.species[p.balance]] = rest
		if p.byMass {
			// Mass fractions w to mole fractions: yₖ = (wₖ/Mₖ)/Σ wⱼ/Mⱼ.
			sum := 0.0
			for k, wk := range y {
				if wk != 0 {
					y[k] = wk / s.molM[k]
					sum += y[k]
				}
			}
			for k := range y {
				y[k] /= sum
			}
		}
		s.y[a] = y
		for k, yk := range y {
			s.mA[a] += yk * s.molM[k]
		}
		s.nA[a] = q[g.massAt+a] / s.mA[a]
		s.n += s.nA[a]
	}
	return s
}

// fractions writes the mole fractions at q into x.
func (g *gravimetry) fractions(x, q []float64) {
	s := g.state(q)
	clear(x)
	for a := range g.parents {
		for i, yi := range s.y[a] {
			x[i] += yi * s.nA[a]
		}
	}
	for i := range x {
		x[i] /= s.n
	}
}

// jacobian writes ∂xᵢ/∂qⱼ into jac (species × inputs), from
// ∂xᵢ/∂nA = (yᵢ,A − xᵢ)/N and the chain through nA = mA/MA.
func (g *gravimetry) jacobian(jac *mat.Dense, q []float64) {
	s := g.state(q)
	ns := len(g.species)
	x := make([]float64, ns)
	g.fractions(x, q)
	jac.Zero()
	for a, p := range g.parents {
		if p.byMass {
			g.massParentJacobian(jac, q, s, x, a)
			continue
		}
		y := s.y[a]
		// The mass.
		for i := range ns {
			jac.Set(i, g.massAt+a, (y[i]-x[i])/s.n/s.mA[a])
		}
		// Each stated amount, the balance taking up the change.
		b := p.species[p.balance]
		for pi, at := range p.qAt {
			if at < 0 {
				continue
			}
			k := p.species[pi]
			dnA := -s.nA[a] * (s.molM[k] - s.molM[b]) / s.mA[a]
			for i := range ns {
				dNi := y[i] * dnA
				if i == k {
					dNi += s.nA[a]
				}
				if i == b {
					dNi -= s.nA[a]
				}
				jac.Set(i, at, (dNi-x[i]*dnA)/s.n)
			}
		}
		// The atomic weights, through MA.
		for e := range g.elements {
			atoms := 0.0
			for k, yk := range y {
				atoms += yk * g.nu[k][e]
			}
			dnA := -s.nA[a] * atoms / s.mA[a]
			for i := range ns {
				jac.Set(i, g.elemAt+e, jac.At(i, g.elemAt+e)+(y[i]-x[i])/s.n*dnA)
			}
		}
	}
}

// massParentJacobian adds parent a's sensitivities when its amounts are
// mass fractions: it brings Nᵢ = mA wᵢ/Mᵢ of each species (wᵢ its mass
// fraction, the balance's 1 − Σ of the stated ones), so that
// ∂xᵢ/∂q = (∂Nᵢ/∂q − xᵢ ∂N/∂q)/N with ∂Nᵢ/∂mA = wᵢ/Mᵢ,
// ∂Nᵢ/∂wₖ = mA(δᵢₖ/Mₖ − δᵢᵦ/Mᵦ) and ∂Nᵢ/∂Aₑ = −mA wᵢ νᵢₑ/Mᵢ².
func (g *gravimetry) massParentJacobian(jac *mat.Dense, q []float64, s parentState, x []float64, a int) {
	p := g.parents[a]
	ns := len(g.species)
	m := q[g.massAt+a]
	w := make([]float64, ns) // the parent's mass fractions over all species
	rest := 1.0
	for i, at := range p.qAt {
		if at >= 0 {
			w[p.species[i]] = q[at]
			rest -= q[at]
		}
	}
	b := p.species[p.balance]
	w[b] = rest
	set := func(j int, dN func(i int) float64) {
		total := 0.0
		for i := range ns {
			total += dN(i)
		}
		for i := range ns {
			jac.Set(i, j, jac.At(i, j)+(dN(i)-x[i]*total)/s.n)
		}
	}
	set(g.massAt+a, func(i int) float64 { return w[i] / s.molM[i] })
	for pi, at := range p.qAt {
		if at < 0 {
			continue
		}
		k := p.species[pi]
		set(at, func(i int) float64 {
			d := 0.0
			if i == k {
				d += m / s.molM[k]
			}
			if i == b {
				d -= m / s.molM[b]
			}
			return d
		})
	}
	for e := range g.elements {
		set(g.elemAt+e, func(i int) float64 { return -m * w[i] * g.nu[i][e] / (s.molM[i] * s.molM[i]) })
	}
}

// build turns the parents into the measurement model, its inputs q and
// their standard uncertainties.
func (w Weighing) build() (*gravimetry, []float64, []float64, error) {
	g := &gravimetry{}
	index := map[string]int{}
	elemIndex := map[string]int{}
	var counts []map[string]int
	for _, p := range w.Parents {
		for _, pt := range p.Parts {
			f := pt.Species.Formula
			if _, ok := index[f]; ok {
				continue
			}
			c, err := model.ParseFormula(f)
			if err != nil {
				return nil, nil, nil, model.Errorf("process", "%s: its formula is needed for the molar mass: %v", f, err)
			}
			index[f] = len(g.species)
			g.species = append(g.species, f)
			counts = append(counts, c)
			els := make([]string, 0, len(c))
			for e := range c {
				els = append(els, e)
			}
			slices.Sort(els)
			for _, e := range els {
				if _, ok := elemIndex[e]; !ok {
					elemIndex[e] = len(g.elements)
					g.elements = append(g.elements, e)
				}
			}
		}
	}
	g.nu = make([][]float64, len(g.species))
	for k, c := range counts {
		g.nu[k] = make([]float64, len(g.elements))
		for e, n := range c {
			g.nu[k][elemIndex[e]] = float64(n)
		}
	}
	var q, u []float64
	g.massAt = 0
	for _, p := range w.Parents {
		q = append(q, p.MassKg)
		um := p.MassUKg
		if um < 0 {
			um = w.MassUKg
		}
		u = append(u, um)
	}
	g.partAt = len(q)
	for _, p := range w.Parents {
		gp := gravParent{byMass: p.ByMass}
		for i, pt := range p.Parts {
			gp.species = append(gp.species, index[pt.Species.Formula])
			if pt.Balance {
				gp.balance = i
				gp.qAt = append(gp.qAt, -1)
				continue
			}
			gp.qAt = append(gp.qAt, len(q))
			q = append(q, pt.X)
			u = append(u, pt.UX)
		}
		g.parents = append(g.parents, gp)
	}
	g.elemAt = len(q)
	for _, e := range g.elements {
		if i := slices.IndexFunc(w.AtomicWeights, func(a AtomicWeight) bool { return a.Element == e }); i >= 0 {
			q = append(q, w.AtomicWeights[i].GPerMol*1e-3)
			u = append(u, w.AtomicWeights[i].UGPer*1e-3)
			continue
		}
		a, err := model.MolarMassKgPerMol(e)
		if err != nil {
			return nil, nil, nil, err
		}
		uA, ok := atomicWeightUGPerMol[e]
		if !ok {
			return nil, nil, nil, model.Errorf("process", "the uncertainty of the atomic weight of %s is not known here; zmix cannot give the uncertainty of a blend holding it", e)
		}
		q = append(q, a)
		u = append(u, uA*1e-3/math.Sqrt(3))
	}
	g.nq = len(q)
	return g, q, u, nil
}

// Solve computes the composition and its uncertainty.
func (w Weighing) Solve() (*WeighedResult, error) {
	if len(w.Parents) == 0 {
		return nil, model.Errorf("process", "no parent gas given; give each as %s", ParentForm)
	}
	if len(w.Parents) > maxWeighedParents {
		return nil, model.Errorf("process", "%d parent gases; want at most %d", len(w.Parents), maxWeighedParents)
	}
	for _, a := range w.AtomicWeights {
		if !(a.GPerMol > 0) || math.IsInf(a.GPerMol, 0) || !(a.UGPer >= 0) || math.IsInf(a.UGPer, 0) {
			return nil, model.Errorf("process", "atomic weight of %s: %g ± %g g/mol; want a value above 0 and an uncertainty of 0 or more", a.Element, a.GPerMol, a.UGPer)
		}
	}
	if !(w.MassUKg >= 0) || math.IsInf(w.MassUKg, 0) {
		return nil, model.Errorf("process", "mass uncertainty %g kg: want a finite value of 0 or more", w.MassUKg)
	}
	for i := range w.Parents {
		p := &w.Parents[i]
		if !(p.MassKg > 0) || math.IsInf(p.MassKg, 0) {
			return nil, model.Errorf("process", "parent %s: the mass must be above 0", model.Quote(p.Text))
		}
		if math.IsNaN(p.MassUKg) || math.IsInf(p.MassUKg, 0) {
			return nil, model.Errorf("process", "parent %s: the mass's uncertainty must be finite", model.Quote(p.Text))
		}
		if err := p.check(); err != nil {
			return nil, model.Errorf("process", "parent %s: %v", model.Quote(p.Text), err)
		}
	}
	g, q, u, err := w.build()
	if err != nil {
		return nil, err
	}
	ns := len(g.species)
	r := &WeighedResult{Species: g.species, X: make([]float64, ns), UX: make([]float64, ns),
		UMasses: make([]float64, ns), UPurity: make([]float64, ns), UMolar: make([]float64, ns)}
	g.fractions(r.X, q)
	jac := mat.NewDense(ns, g.nq, nil)
	g.jacobian(jac, q)
	// The contributions c = J diag(u); Cov = c cᵀ.
	var c mat.Dense
	c.Apply(func(i, j int, v float64) float64 { return v * u[j] }, jac)
	r.Cov = mat.NewSymDense(ns, nil)
	r.Cov.SymOuterK(1, &c)
	for i := range ns {
		r.UX[i] = math.Sqrt(max(r.Cov.At(i, i), 0))
		var parts [3]float64
		for j := range g.nq {
			v := c.At(i, j)
			parts[g.kind(j)] += v * v
		}
		r.UMasses[i], r.UPurity[i], r.UMolar[i] = math.Sqrt(parts[inMass]), math.Sqrt(parts[inPurity]), math.Sqrt(parts[inAtomic])
	}
	st := g.state(q)
	for _, p := range w.Parents {
		r.TotalMassKg += p.MassKg
	}
	r.AmtMol = st.n
	r.MolarMassKgPerMol = r.TotalMassKg / st.n

	r.kind = "weighed"
	r.assumptions = "composition from the masses weighed in, xᵢ = Σ yᵢ,A mA/MA / Σ mA/MA (ISO 6142-1 gravimetric method); " +
		"standard uncertainties by the GUM law of propagation (JCGM 100) for uncorrelated masses, parent amounts and atomic weights; " +
		"no gas lost in transfer or held on the cylinder wall, the cylinder evacuated before the first parent"
	r.in(figWParents, float64(len(w.Parents)))
	r.in(figWMassU, w.MassUKg)
	r.out(figWMass, r.TotalMassKg)
	r.out(figWAmount, r.AmtMol)
	r.out(figMolarMass, r.MolarMassKgPerMol)

	var parentRows [][]Value
	var parentLabels []string
	for a, p := range w.Parents {
		um := p.MassUKg
		if um < 0 {
			um = w.MassUKg
		}
		parentLabels = append(parentLabels, p.Gas)
		parentRows = append(parentRows, []Value{{figWMass, p.MassKg}, {figWPartU, um}, {figWPartM, st.mA[a]}, {figWAmount, st.nA[a]}})
	}
	r.tables = append(r.tables, Table{Name: "parents", Title: "Parent gases weighed in", RowName: "gas", RowLabels: parentLabels, Rows: parentRows})
	var compRows, budgetRows [][]Value
	for i := range ns {
		compRows = append(compRows, []Value{{figWX, r.X[i]}, {figWU, r.UX[i]}, {figWUExp, 2 * r.UX[i]}, {figWURel, r.UX[i] / r.X[i]}})
		budgetRows = append(budgetRows, []Value{{figWUMass, r.UMasses[i]}, {figWUPur, r.UPurity[i]}, {figWUMol, r.UMolar[i]}})
	}
	r.tables = append(r.tables,
		Table{Name: "composition", Title: "Composition (mole fractions)", RowName: "species", RowLabels: g.species, Rows: compRows},
		Table{Name: "budget", Title: "Standard uncertainty by source", RowName: "species", RowLabels: g.species, Rows: budgetRows})

	var exact, limits, byMass []string
	for a, p := range w.Parents {
		if p.ByMass {
			byMass = append(byMass, fmt.Sprintf("parent %d", a+1))
		}
		for _, pt := range p.Parts {
			where := fmt.Sprintf("%s in parent %d", pt.Species.Formula, a+1)
			switch {
			case pt.Limit:
				limits = append(limits, where)
			case !pt.Balance && !pt.Stated:
				exact = append(exact, where)
			}
		}
	}
	if len(limits) > 0 {
		r.note("below a limit L, an amount is taken as L/2 with u = L/(2√3) (ISO 6142-1): " + strings.Join(limits, ", "))
	}
	if len(exact) > 0 {
		r.note("amounts given without ± are taken as exact (u = 0): " + strings.Join(exact, ", "))
	}
	if len(byMass) > 0 {
		r.note("amounts by mass, turned into mole fractions with the molar masses (yᵢ = (wᵢ/Mᵢ)/Σ wⱼ/Mⱼ), whose uncertainty is carried through the conversion too: " + strings.Join(byMass, ", "))
	}
	var given []string
	for _, a := range w.AtomicWeights {
		if slices.Contains(g.elements, a.Element) {
			given = append(given, fmt.Sprintf("%s %s ± %s g/mol", a.Element, trimFloat(a.GPerMol), trimFloat(a.UGPer)))
		}
	}
	if len(given) > 0 {
		r.note("atomic weights as given, with their standard uncertainty: " + strings.Join(given, ", "))
	}
	r.note("atomic weights: IUPAC 2021, each ± taken as the half-width of a rectangular distribution (u = U/√3); U = 2u, a coverage of about 95 % for a normal distribution")
	r.caution(mixtures.Caution{Title: "Verification", Text: "a gravimetric composition is verified by analysis before the cylinder is used as a calibration gas (ISO 6142-1); the cylinder's rating and marking are yours to check."})
	return r, nil
}

// maxWeighedParents bounds the parents of one cylinder.
const maxWeighedParents = 50
