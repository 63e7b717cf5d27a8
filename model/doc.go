// Package model computes the thermodynamics of one ideal-gas species at a
// temperature and pressure, from its molecular partition function.
//
// # Partition function
//
// The molecular partition function factorises into translation, rotation,
// vibration and electronic levels, q = q_tr · q_rot · q_vib · q_el. Each
// factor reports three dimensionless numbers (see Terms):
//
//	LnQ = ln q
//	U   = T ∂ln q/∂T              (so U_f = RT·U)
//	Cv  = ∂/∂T (T² ∂ln q/∂T)      (so Cv_f = R·Cv)
//
// all analytic, with no finite differences. For N molecules,
// A = −NkT[ln(q_tr/N) + 1 + Σ ln q_int]; the "+1" and the 1/N of Stirling's
// approximation are folded into the translational LnQ, so that for every
// factor A_f/RT = −LnQ and S_f/R = LnQ + U. The translational factor at
// fixed (T, P) is
//
//	ln(q_tr/N) + 1 = ln[(2π m kT/h²)^{3/2} · kT/P] + 1,
//
// which makes S_tr the Sackur-Tetrode entropy. Molar properties follow:
//
//	U = E0 + RT·ΣU_f    H = U + RT     A = E0 − RT·ΣLnQ_f   G = A + RT
//	S = R·Σ(LnQ_f + U_f)               Cv = R·ΣCv_f         Cp = Cv + R
//
// and the chemical potential of the pure gas is μ = G (per mole).
//
// # Treatments
//
//   - Translation: particle in a box, classical (valid while n/nQ ≪ 1).
//   - Rotation: atoms have none. Linear molecules sum the rigid-rotor levels
//     E_J = kΘ J(J+1) exactly while T < 50 Θrot and use the Euler–Maclaurin
//     series q = T/(σΘ)·(1 + Θ/3T + Θ²/15T² + 4Θ³/315T³) above; nonlinear
//     molecules use the classical rigid-rotor limit
//     q = √π/σ · T^{3/2}/√(ΘA ΘB ΘC) with its first quantum correction,
//     e^{a/T} (Stripp and Kirkwood; see rigidBodyRotor), which moves
//     H − H(0) and G but not S or Cp. Treatment selects the choice. The
//     summed levels' Boltzmann factors come by recurrence, with one exp a
//     sum: e^{−ε_{J+1}/kT} = e^{−ε_J/kT}·e^{−2(J+1)Θ/T}, and the step
//     itself shrinks by e^{−2Θ/T} each level. From 20 Θrot (10 Θrot for a
//     heteronuclear molecule) to 50 Θrot the sum is taken as its full
//     Euler–Maclaurin expansion on the half-integers J + ½, which equals it
//     to rounding there (see linearRotorExpansion): no exp, no log. Above
//     50 Θrot, ln of the series' bracket is taken as its own Taylor series
//     in Θ/T, so that the rotor costs no log.
//   - Vibration: harmonic oscillators, energy zero at v = 0 (the zero-point
//     energy is inside E0).
//   - Electronic: a sum over the listed levels, ground level at zero.
//
// # Diatomics by their levels
//
// A diatomic molecule with Dunham constants (see DunhamConstants and the
// catalogue fields term, we_cm … D0_cm, state_LABEL) can instead be summed
// over its rovibronic levels, Treatment.Levels = LevelsSummed:
//
//	E(v,N) = Te + ωe(v+½) − ωexe(v+½)² + ωeye(v+½)³ + B_v K − D_v K² + H_e K³
//	B_v = Be − αe(v+½) + γe(v+½)²,  D_v = De + βe(v+½),  K = N(N+1) − Λ²
//
// for each electronic state, with a ²Π state's two spin components from
// the Hill–Van Vleck formula (intermediate between Hund's cases a and b;
// Ω = ½ from J = ½, Ω = 3/2 from J = 3/2, the lower of the two roots
// being Ω = ½ for A > 0 and Ω = 3/2 for A < 0; each level Λ-doubled), a
// Σ state's spin multiplicity
// as a weight (its few-cm⁻¹ splitting left out), and a Λ > 0 state's
// levels from N = Λ, Λ-doubled. Nuclear-spin weights go to the levels
// symmetric and antisymmetric under exchange of the nuclei, which for a
// Σ state are the even or the odd N according to its g/u and ± labels.
//
// Cut-off: a level counts if it lies at or below the lowest dissociation
// limit, D0 above the lowest level; the quasi-bound levels above it are
// left out, as are the levels past the v at which G(v) stops rising and
// past the N at which E(v,N) stops rising, where the series no longer
// describes the molecule.
//
// The energy zero is the rotationless level (v = 0, N = 0) of a Σ ground
// state, even where the nuclear spins forbid it (¹⁶O2), as in the
// published tables; for a ²Π ground state it is the rotationless point
// B0·Ω below the lowest level (J = Ω of the lower spin component), which
// is also the tables' zero (OH: 1.5 B0 ≈ 28 cm⁻¹, 0.33 kJ/mol).
//
// The factors split as: rotation is the v = 0 ladder of the ground state;
// vibration is what the ground state's other levels add (with the
// vibration–rotation coupling); electronic is the ground state's
// multiplicity and what the excited states add. VibrationFrozen keeps the
// v = 0 ladder, ElectronicGroundOnly the ground state, and
// RotationSummed or RotationClassical select the rigid rotor.
//
// For H2 and D2 the series in K fails past N ≈ 15 (H2's levels bend
// over towards the dissociation limit), so their ground state's levels
// come from its potential curve instead (catalogue field curve = yes,
// see potential.go): the RKR curve of G(v) and B_v, continued by an
// exponential wall and a De − C/r⁶ tail, and the levels of each N by
// WKB quantization in V(r) + B_e r_e² N(N+1)/r². There the cut-off rule
// is the barrier: a level counts below the dissociation limit, or above
// it (quasi-bound) while it lies below the top of its centrifugal
// barrier. H2's 49 quasi-bound levels add 0.75 J/(mol·K) to Cp° at
// 6000 K.
//
// The built-in species with these constants are H2 and D2 (from their
// curves), N2, O2 (with its a, b and Herzberg c, A', A states), CO, NO
// and OH (X²Πi and A²Σ⁺). Against the tables, H2 meets Cp° 0.3 % and S°
// 0.05 J/(mol·K) to 3000 K and Cp° 1 % to 6000 K; OH lies 0.8 % high in
// Cp° at 3000 K (see levels_test.go for each species' figures).
//
// Speed: the level list is built when the species is prepared; the sums
// are tabulated as needed (an interval when a state first falls in it)
// at steps of 0.02 in ln T up to MaxTempK, and read by quintic Hermite
// interpolation in ln T from ln q and its first two derivatives at the
// nodes. ln q, U and Cv then come from one polynomial, so the identities
// hold to rounding, and the table agrees with the sum itself within
// 1e-10 in ln q and U and 1e-8 in Cv/R (see
// TestLevelTableMatchesDirectSum). Below the table's first node (where
// the 8th level is 40 kT up) the sum is taken level by level.
//
// # Hindered internal rotation
//
// A torsion listed in torsion_cm (see Torsion) replaces its fundamental
// in the summed levels: a rotor with internal constant F in
// V(φ) = (V0/2)(1 − cos nφ), whose levels are the eigenvalues of
// F m² + V(φ) in the basis e^{imφ}, |m| ≤ 120 (gonum's EigenSym), free
// rotor levels F m² + V0/2 above those that converge, divided by the
// torsion's symmetry σ_int, energy zero at its lowest level. It is
// tabulated like the diatomics' sums and booked with vibration.
// Torsions alike in every constant (propane's two methyl tops,
// isobutane's three) share one level list, counted as many times. The
// catalogue lists them for C2H6, C3H8, C3H6, C2F6 and the butanes.
//
// # Anharmonic vibration of polyatomics
//
// A polyatomic may list harmonic wavenumbers ωi (harm_cm), anharmonicity
// constants xij (xij_cm), g_tt of its doubly degenerate modes (gll_cm)
// and D0 (D0_cm); its vibrational levels
// G = Σ ωi(vi+di/2) + Σ_{i≤j} xij(vi+di/2)(vj+dj/2) + Σ g_tt l_t² are then
// summed up to D0, each mode only while G rises, and tabulated like the
// others (see anharmonic.go). This is the second-order term expansion,
// without resonances or vibration–rotation coupling (CO2's Fermi
// resonance is left out: its deperturbed constants are summed). H2O's Cp°
// comes within 0.6 % of the tables to 3000 K, CO2's within 0.1 % to
// 3500 K.
//
// # Level ladders and centrifugal distortion
//
// A mode may be given by its observed levels (ladder_cm, see Ladder):
// NH3's umbrella mode ν2 by its inversion levels, 0/0.79, 932/968,
// 1597/1882, 2384/2896, 3462/4062 cm⁻¹, each doublet counted as one level
// (divisor 2), continued above the last with the last spacing up to D0.
// A nonlinear molecule may list Watson's quartic distortion constants
// (dist_cm, see Distortion); with the summed levels its rotor then gains
// the first-order classical correction ln q += ⟨E_cd⟩/kT = c·T. NH3 takes
// both: S° at 298.15 K comes within 0.02 J/(mol·K) of the tables (0.11
// with the rigid rotor and harmonic ν2). H2O takes distortion together
// with its vibration–rotation constants (alpha_cm, see Anharmonic), which
// take back at high T what the first-order distortion overshoots there
// (see distortion.go).
//
// Summed levels are the default (LevelsDefault, see summedByDefault)
// wherever a species lists the constants for them; the rigid rotor with
// harmonic vibration stays available as LevelsRigidHarmonic.
//
// # Nuclear spin of homonuclear molecules
//
// Homonuclear linear molecules whose rotor levels are summed (H2, D2, O2,
// N2, F2, Cl2 …) carry statistical weights for even and odd J taken from
// the nuclear spins (H2: 1 for even J, 3 for odd J; ¹⁶O2: odd J only). The
// spin isomers are taken in equilibrium with each other at every
// temperature (equilibrium hydrogen, not the frozen 3:1 "normal" mixture),
// and the weighted sum is divided by the total spin weight so that the
// nuclear-spin entropy is left out, as in the published tables. At high T
// this reduces to q = T/(2Θ).
//
// The catalogue also answers to the spin modifications by name: eH2
// (equilibrium), nH2 (normal: 3:1 ortho:para, frozen) and pH2 (para);
// eD2, nD2 (2:1, frozen) and oD2 (ortho). A frozen modification is the
// ideal mixture of the even-J and odd-J gases at fixed fractions x_i,
// ln q_rot = Σ x_i ln(g_i q_i/(g_tot x_i)); see spinmod.go. With the
// summed levels each modification sums its own rovibrational levels
// (all v, its own N), so the frozen gases and the equilibrium one share
// one level list and meet at high T. They are names for Lookup, not
// entries of All. With normalByDefault set, "H2" and "D2" name the
// normal gases, as a cylinder holds them; the equilibrium gases of the
// published tables are eH2 and eD2.
//
// # Conventions
//
// The energy zero E0 of each species is its enthalpy of formation at 0 K,
// ΔfH°(0 K), from the elements in their reference states. G and μ are
// therefore on the scale of the JANAF tables: μ of O2 at 0 K is zero, and
// μ of any species differs from the sum of its elements' by the Gibbs
// energy of formation. The standard pressure is 1 bar (10⁵ Pa) unless a
// caller selects 1 atm (101 325 Pa); it enters the standard-state table
// functions only, never the absolute value of G at (T, P).
//
// State accepts temperatures from MinTempK to MaxTempK and any finite
// pressure above 0 Pa; every figure it returns is then finite. Whether the
// model is trustworthy there is a separate question, answered by Validity.
//
// # Species files
//
// The built-in catalogue (species.cat, embedded) and the user's species
// files share one format, read by ParseCatalogue: a block per species
// opened by its formula in brackets, one "field = value" a line, an
// optional source after "|", comments after "#". A file is checked
// whole as it is read, and the first fault is a *CatalogueError whose
// line reads "file:line: field "f": value, and the range accepted":
//
//   - every number lies in a physical range (see numRange in catfile.go):
//     rotational constants 1e-4 to 100 cm⁻¹, vibrational wavenumbers 1 to
//     5000 cm⁻¹ with degeneracies 1 to 5, electronic levels 0 to 2e5 cm⁻¹
//     (ground level first, at 0) with degeneracies 1 to 100, σ 1 to 60
//     (1 or 2 for a linear molecule), spin weights whole numbers 0 to 100,
//     ΔfH°(0 K) −10 000 to 10 000 kJ/mol, boiling point 1 to 6000 K;
//   - the rotor agrees with the formula (an atom is one atom, a linear
//     molecule two or more, a nonlinear one three or more), and the
//     vibrational modes, counted with their degeneracies, number 3N − 5
//     (linear) or 3N − 6 (nonlinear) for the formula's N atoms;
//   - names, notes, sources and field names hold no control character,
//     no invalid UTF-8 and nothing that does not print (they are refused,
//     not cleaned); a name holds at most 64 characters, a note 500 and a
//     source 300;
//   - a line holds at most MaxSpeciesLineBytes (64 KiB) and a file at most
//     MaxSpeciesFileBytes (1 MiB); no more than that is read before a
//     file is refused.
//
// Prepare applies the same ranges to a species built in code, so that
// every prepared species gives, at every state State accepts,
// Cp ≥ 5R/2 and 1 < γ ≤ 5/3.
//
// # Errors
//
// Errors are built by Errorf and KindErrorf: Error() reads "model: …"
// for logs, and UserMessage (or the function UserMessage) is the line a
// person reads, without the prefix. Errors of State and CheckConditions
// match ErrTemperature or ErrPressure with errors.Is. A *CatalogueError
// names its file and line instead of a package.
//
// Physical constants are the CODATA 2018 exact values from
// gonum.org/v1/gonum/unit/constant. Molar masses are summed from the formula
// with IUPAC standard atomic weights.
package model
