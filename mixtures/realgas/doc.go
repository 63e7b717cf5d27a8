// Package realgas corrects the ideal-gas figures of a blend for the
// forces between molecules, and says, as numbers, where the ideal gas
// stops being true. It knows each species only by its critical constants
// (Tc, Pc, ω) and its mole fraction; the ideal-gas heat capacity comes
// from the caller, so that the real-gas Cp, speed of sound and
// Joule–Thomson coefficient build on the partition-function Cp.
//
// # Two models and a switch
//
// At low and moderate density, the second virial coefficient of
// Tsonopoulos (AIChE J. 20, 263, 1974), non-polar terms:
//
//	B Pc/(R Tc) = f⁰(Tr) + ω f¹(Tr)
//	f⁰ = 0.1445 − 0.330/Tr − 0.1385/Tr² − 0.0121/Tr³ − 0.000607/Tr⁸
//	f¹ = 0.0637 + 0.331/Tr² − 0.423/Tr³ − 0.008/Tr⁸
//
// with the mixture B = Σᵢ Σⱼ xᵢ xⱼ Bᵢⱼ and the combining rules Tsonopoulos
// used (after Prausnitz): Tcᵢⱼ = √(Tcᵢ Tcⱼ)(1 − kᵢⱼ),
// ωᵢⱼ = (ωᵢ + ωⱼ)/2, Pcᵢⱼ = 4 Tcᵢⱼ (Pcᵢ Vcᵢ/Tcᵢ + Pcⱼ Vcⱼ/Tcⱼ)/(Vcᵢ^⅓ + Vcⱼ^⅓)³.
// The critical volume comes from the Lee–Kesler critical compressibility
// Zc = 0.2905 − 0.085 ω (AIChE J. 21, 510, 1975), Vc = Zc R Tc/Pc, so
// that the catalogue needs no Vc.
//
// Polar gases add Tsonopoulos' polar term f² = a/Tr⁶ − b/Tr⁸ (polar.go):
// water the fitted a = −0.0109, b = 0 of Tsonopoulos and Heidman (Fluid
// Phase Equilib. 57, 261, 1990); NH3 and H2S, and as an estimate SO2,
// HCl, HBr and NO2, b = 0 and a = −2.14×10⁻⁴ μr − 4.308×10⁻²¹ μr⁸ from
// the reduced dipole moment μr = 10⁵ μ² Pc/Tc² (μ in debye, Pc in atm),
// Tsonopoulos' rule for polar gases that do not hydrogen-bond. A polar–
// non-polar pair takes aᵢⱼ = bᵢⱼ = 0, two polar species the means. HF,
// which associates, and CHF3, of the alkyl-halide class, are left out:
// the correlation then underestimates their |B|, which the output says.
// The pressure-explicit
// truncation Z = 1 + BP/(RT) gives the departure functions
//
//	H − Hig = P (B − T dB/dT)
//	S − Sig = −P dB/dT           (at the same T and P)
//	Cp − Cpig = −P T d²B/dT²
//	μJT = (T dB/dT − B)/Cp
//
// At high density, Peng–Robinson (Ind. Eng. Chem. Fundam. 15, 59, 1976)
// with van der Waals one-fluid mixing, a = ΣΣ xᵢxⱼ √(aᵢaⱼ)(1 − kᵢⱼ),
// b = Σ xᵢbᵢ. No published kᵢⱼ is carried, so every pair has kᵢⱼ = 0 and
// a = (Σ xᵢ √aᵢ)². For ω > 0.49 κ takes the 1978 form (Robinson and
// Peng, GPA RR-28). With A = aP/(RT)², B = bP/(RT) and δ± = 1 ± √2:
//
//	Z³ − (1 − B)Z² + (A − 3B² − 2B)Z − (AB − B² − B³) = 0
//	H − Hig = RT(Z − 1) + (T a' − a)/(2√2 b) · ln[(Z + δ₊B)/(Z + δ₋B)]
//	S − Sig = R ln(Z − B) + a'/(2√2 b) · ln[(Z + δ₊B)/(Z + δ₋B)]
//	Cv − Cvig = T a''/(2√2 b) · ln[(Z + δ₊B)/(Z + δ₋B)]
//
// and Cp, the speed of sound and μJT from the exact relations
//
//	Cp = Cv − T (∂P/∂T)²_V / (∂P/∂V)_T
//	c² = −(V²/M)(Cp/Cv)(∂P/∂V)_T
//	μJT = −[T (∂P/∂T)_V/(∂P/∂V)_T + V]/Cp
//
// Where the cubic has three roots, the one of lowest fugacity is taken.
//
// The switch (common practice): the virial gives the reported state while
// the reduced density ρr = Vc/V, with Kay's pseudo-critical
// Vc = Σ xᵢ Vcᵢ, stays at or below 0.25; Peng–Robinson beyond. The usual
// guideline for the generalized virial correlation (Smith, Van Ness and
// Abbott) allows half the critical density; without a third virial
// coefficient the truncation then drifts by 2–3 % for N2 and Ar at 300 K,
// while at a quarter the two models agree within about 1 %. Past ρr = 2 (liquid-like densities), on a liquid-like root, and
// within 3 % of the pseudo-critical temperature and 15 % of the
// pseudo-critical pressure together, the state is "outside every model
// here" (common practice: there a cubic's densities err by 10 % or more).
//
// # Quantum gases
//
// He, Ne, H2 and D2 follow corresponding states only with the effective
// constants of Chueh and Prausnitz (AIChE J. 13, 896, 1967):
//
//	Tc = Tc⁰/(1 + 21.8/(M T)),  Pc = Pc⁰/(1 + 44.2/(M T)),  ω = 0
//
// M in g/mol, T in K, Tc⁰ and Pc⁰ from the catalogue. They are taken at
// the state's T; their own T-dependence is left out of dB/dT and a',
// which is small above 50 K.
//
// # Species without critical constants
//
// Radicals (H, O, N, OH) have no critical point; a user species may give
// none. They enter the sums with a = b = B = 0, as ideal gases, and the
// result names them.
//
// # Vapour pressure
//
// Water follows IAPWS: the saturation-pressure equation of Wagner and
// Pruß (IAPWS R7 / the 1992 revised supplementary release) above the
// triple point, the sublimation equation (IAPWS R14-08) below it. Other
// species use the Lee–Kesler correlation from Tc, Pc and ω:
//
//	ln Prsat = f⁰(Tr) + ω f¹(Tr)
//	f⁰ = 5.92714 − 6.09648/Tr − 1.28862 ln Tr + 0.169347 Tr⁶
//	f¹ = 15.2518 − 15.6875/Tr − 13.4721 ln Tr + 0.43577 Tr⁶
//
// A species above its critical temperature is supercritical and never
// condenses. A user species with a boiling point but no critical
// constants falls back to Trouton's rule (ΔSvap ≈ 10.5 R), a rough
// estimate that the output marks.
//
// Units are SI throughout: K, Pa, m³/mol, J/mol.
package realgas
