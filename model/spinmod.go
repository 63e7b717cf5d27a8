package model

import "math"

// Spin modifications of H2 and D2.
//
// The nuclear spins of a homonuclear molecule split its rotational levels
// into two modifications that interconvert only slowly without a catalyst:
// for H2, para (even J, spin weight 1) and ortho (odd J, weight 3); for
// D2, ortho (even J, weight 6) and para (odd J, weight 3). Blend text
// names which one a user holds:
//
//	H2   normal hydrogen: ortho:para frozen at 3:1, what a cylinder at room
//	     temperature holds
//	eH2  equilibrium hydrogen: the modifications in equilibrium at each T,
//	     what the JANAF table describes
//	pH2  para hydrogen
//	D2   normal deuterium: ortho:para frozen at 2:1
//	eD2  equilibrium deuterium
//	oD2  ortho deuterium
//
// A frozen mixture with even-J fraction x_e (odd 1 − x_e) is the ideal
// mixture of the two modifications, each with the levels of its parity:
//
//	ln q_rot = Σ_i x_i ln(q_i · g_i / (g_tot · x_i)),  q_i = Σ_{J∈i} (2J+1) e^{−E_J/kT}
//
// so U, Cv and S are the fraction-weighted sums of the modifications'
// (with their mixing entropy), the energy zero stays at J = 0, and at high
// T every modification at its natural ratio meets the equilibrium gas, as
// the nuclear-spin convention of the tables (R ln g_tot left out)
// requires. A pure modification (x_i = 1) sits R ln(g_tot/g_i) below it in
// S at high T.
//
// With the summed levels (LevelsSummed, or the default once it sums),
// each modification sums its own rovibrational levels from the Dunham
// constants (see levels.go, directFrozen). Otherwise the frozen
// modifications sum the rigid-rotor levels (RotationAuto and
// RotationSummed); RotationClassical gives the common high-T limit.

// SpinModification says how the spin isomers of a homonuclear linear
// molecule are populated. The zero value is equilibrium.
type SpinModification struct {
	Frozen bool
	// EvenFraction is the fixed mole fraction of the even-J modification
	// when Frozen.
	EvenFraction float64
}

// spinVariant is one named modification of a species.
type spinVariant struct {
	prefix, base string
	mod          SpinModification
	what         string
}

// spinVariants lists the named modifications. Normal hydrogen and
// deuterium are "nH2" and "nD2", and take the base name too while
// normalByDefault is set (3:1 and 2:1 ortho:para, frozen).
var spinVariants = []spinVariant{
	{"e", "H2", SpinModification{}, "equilibrium hydrogen"},
	{"n", "H2", SpinModification{Frozen: true, EvenFraction: 0.25}, "normal hydrogen"},
	{"p", "H2", SpinModification{Frozen: true, EvenFraction: 1}, "para hydrogen"},
	{"e", "D2", SpinModification{}, "equilibrium deuterium"},
	{"n", "D2", SpinModification{Frozen: true, EvenFraction: 2.0 / 3}, "normal deuterium"},
	{"o", "D2", SpinModification{Frozen: true, EvenFraction: 1}, "ortho deuterium"},
}

// normalByDefault says whether "H2" and "D2" name the normal (frozen)
// gases rather than the equilibrium ones. It is set: a cylinder holds
// normal hydrogen, and the published tables' equilibrium gas is eH2.
// Turning it off moves the README's worked examples and the workbench's
// golden screens that show H2, which must be refreshed in the same change.
const normalByDefault = true

// splitSpinPrefix splits "eH2" into "e" and "H2"; a formula without a
// known spin-modification prefix comes back whole.
func splitSpinPrefix(formula string) (prefix, base string) {
	if len(formula) > 1 {
		for _, v := range spinVariants {
			if formula[1:] == v.base && formula[:1] == v.prefix {
				return v.prefix, v.base
			}
		}
	}
	return "", formula
}

// withSpinVariants returns the list, with H2 and D2 replaced by their
// normal modification once normalByDefault is set, and the named
// modifications of the homonuclear species in it.
func withSpinVariants(list []*Species) (out, variants []*Species) {
	for _, sp := range list {
		if sp.Rotor != Linear || !sp.Homonuclear() {
			out = append(out, sp)
			continue
		}
		base := sp
		for _, v := range spinVariants {
			if v.base != sp.Formula {
				continue
			}
			// A species already made normal (a catalogue built on
			// another's list) stays the same value.
			if normalByDefault && v.prefix == "n" && !sp.SpinMod.Frozen {
				if vs := sp.variant(sp.Formula, v.mod, v.what); vs != nil {
					base = vs
				}
			}
			if vs := sp.variant(v.prefix+v.base, v.mod, v.what); vs != nil {
				variants = append(variants, vs)
			}
		}
		out = append(out, base)
	}
	return out, variants
}

// variant copies sp as a spin modification named name; nil if it does
// not prepare (it always should: the base species did).
func (sp *Species) variant(name string, mod SpinModification, what string) *Species {
	c := *sp
	c.Formula = name
	c.Name = what
	c.SpinMod = mod
	c.spinBase = sp.Formula
	c.Sources = make(map[string]string, len(sp.Sources))
	for k, v := range sp.Sources {
		c.Sources[k] = v
	}
	c.rotThetaK, c.vibThetaK, c.vibDeg, c.vibModes, c.elecThetaK, c.elecDeg = nil, nil, nil, nil, nil, nil
	if err := c.Prepare(); err != nil {
		return nil
	}
	return &c
}

// SpinVariantOf reports whether sp is a named spin modification made by
// the catalogue (eH2, pH2, nD2 …, and H2 and D2 themselves once they name
// the normal gases), and the formula of the species it derives from.
func (sp *Species) SpinVariantOf() (base string, ok bool) { return sp.spinBase, sp.spinBase != "" }

// SpinVariantNames lists the names of the spin modifications a catalogue
// answers to beside its entries, for listings.
func SpinVariantNames() []string {
	var out []string
	for _, v := range spinVariants {
		out = append(out, v.prefix+v.base)
	}
	return out
}

// SpinModificationOf reports the species' spin modification.
func (sp *Species) SpinModificationOf() SpinModification { return sp.SpinMod }

// frozenRotorSum returns the rotational terms of a frozen mixture of the
// two spin modifications (see the comment at the top of this file).
func (sp *Species) frozenRotorSum(invT float64) Terms {
	y := sp.rotThetaK[0] * invT
	c := math.Exp(-2 * y) // both modifications' recurrences start from it
	var t Terms
	for parity := 0; parity < 2; parity++ {
		x := sp.SpinMod.EvenFraction
		if parity == 1 {
			x = 1 - x
		}
		if x == 0 {
			continue
		}
		one := paritySum(y, c, parity)
		t.LnQ += x * (one.LnQ + sp.frozenLnW[parity])
		t.U += x * one.U
		t.Cv += x * one.Cv
	}
	return t
}

// paritySum sums (2J+1) e^{−J(J+1)y} over the J of one parity, relative
// to J = 0 (its lowest level may be J = 1), with the recurrence of
// linearRotorSum.
func paritySum(y, c float64, parity int) Terms {
	j0 := parity
	e0 := j0 * (j0 + 1)
	x0 := float64(e0) * y
	// c = e^{−2y}. From J to J+2 the factor is e^{−(4J+6)y} = c^{2J+3};
	// that step shrinks by c⁴ = e^{−8y}.
	step := c * c * c
	if j0 == 1 {
		step *= c * c
	}
	c4 := c * c * c * c
	boltz := 1.0
	var z, m1, m2 float64
	for j := j0; ; j += 2 {
		x := float64(j*(j+1)-e0) * y
		if x > 60 {
			break
		}
		t := float64(2*j+1) * boltz
		z += t
		m1 += t * x
		m2 += t * x * x
		boltz *= step
		step *= c4
	}
	mean := m1 / z
	return Terms{LnQ: math.Log(z) - x0, U: mean + x0, Cv: m2/z - mean*mean}
}
