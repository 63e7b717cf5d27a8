package model

import "strings"

// Centrifugal distortion of a nonlinear molecule, to first order.
//
// Watson's A-reduced quartic Hamiltonian lowers the rigid rotor's levels by
//
//	E_cd = ΔJ J⁴ + ΔJK J²Jz² + ΔK Jz⁴ + 2δJ J²(Jx² − Jy²) + δK{Jz², Jx² − Jy²}
//
// (a symmetric top has δJ = δK = 0, and ΔJ, ΔJK, ΔK are its DJ, DJK, DK).
// To first order in the constants, ln q gains ⟨E_cd⟩/kT, the average over
// the classical rigid rotor's Boltzmann distribution, in which each Ji² is
// an independent gamma variable with ⟨Ji²⟩ = tᵢ/2 and ⟨Ji⁴⟩ = 3tᵢ²/4,
// tᵢ = kT/Bᵢ (Bᵢ the rotational constant of axis i):
//
//	⟨J⁴⟩           = ¾ Σ tᵢ² + ½ Σ_{i<j} tᵢ tⱼ
//	⟨J² Jz²⟩       = ¾ tz² + ¼ tz (tx + ty)
//	⟨Jz⁴⟩          = ¾ tz²
//	⟨J²(Jx² − Jy²)⟩ = ¾ (tx² − ty²) + ¼ tz (tx − ty)
//	⟨{Jz², Jx² − Jy²}⟩ = ½ tz (tx − ty)
//
// Each is (kT)² times a constant, so ln q gains c·T with c fixed by the
// constants: U/RT gains cT and Cv/R gains 2cT. For a linear molecule the
// same average gives the familiar q = (kT/B)(1 + 2DkT/B²). The correction
// is first order: it grows without bound with T, while the true levels
// bend back, so it holds while the sextic terms' average stays well below
// it. For NH3 (DK 9e-4 cm⁻¹) that holds to some 3000 K. For H2O, whose ΔK
// (0.033 cm⁻¹) is among the largest of any molecule, it brings S° at
// 298.15 K from 0.12 below table H-064 to within 0.01, and alone would
// overshoot Cp° by 1.9 % at 3000 K; but H2O's bend also raises its A
// constant (alpha_cm, see anharmonic.go), which takes about as much back,
// so that together they hold H-064 to 0.1 J/(mol·K) in S° and 0.8 % in
// Cp° up to 3000 K (TestAnharmonicWater). Above that, the first-order
// terms are not to be trusted.
type Distortion struct {
	Axis                     int     // 1, 2 or 3: which rot_cm constant is the z axis
	DeltaJ, DeltaJK, DeltaK  float64 // ΔJ, ΔJK, ΔK in cm⁻¹
	SmallDeltaJ, SmallDeltaK float64 // δJ, δK in cm⁻¹
}

// The ranges of the quartic constants (values from memory): H2O's ΔK,
// 0.033 cm⁻¹, is among the largest of any molecule.
var quarticRange = numRange{"quartic centrifugal distortion constant", -1, 1, "cm⁻¹", false}

// setDistortion reads "AXIS ΔJ ΔJK ΔK δJ δK".
func setDistortion(sp *Species, value string) error {
	const want = "the z axis (1, 2 or 3, in rot_cm's order) and ΔJ ΔJK ΔK δJ δK in cm⁻¹, e.g. 1 1.25e-3 -5.8e-3 3.26e-2 5.1e-4 1.3e-3"
	f := strings.Fields(value)
	if len(f) != 6 {
		return Errorf("model", "distortion %s: %d items; want %s", Quote(value), len(f), want)
	}
	axis, err := numRange{"axis", 1, 3, "", true}.parse(f[0])
	if err != nil {
		return Errorf("model", "distortion %s: %v", Quote(value), err)
	}
	var c [5]float64
	for i, tok := range f[1:] {
		if c[i], err = quarticRange.parse(tok); err != nil {
			return Errorf("model", "distortion %s: %v", Quote(value), err)
		}
	}
	sp.Distortion = &Distortion{int(axis), c[0], c[1], c[2], c[3], c[4]}
	return nil
}

// prepareDistortion checks the constants and sets the coefficient c of
// ln q = … + c·T, in 1/K.
func (sp *Species) prepareDistortion() error {
	sp.distortionPerK = 0
	d := sp.Distortion
	if d == nil {
		return nil
	}
	if sp.Rotor != Nonlinear {
		return Errorf("model", "%s: distortion constants apply to nonlinear molecules (a diatomic takes De_cm)", sp.Formula)
	}
	if d.Axis < 1 || d.Axis > 3 {
		return Errorf("model", "%s: distortion axis %d; want 1, 2 or 3", sp.Formula, d.Axis)
	}
	for _, x := range []float64{d.DeltaJ, d.DeltaJK, d.DeltaK, d.SmallDeltaJ, d.SmallDeltaK} {
		if !quarticRange.contains(x) {
			return Errorf("model", "%s: distortion constant %g cm⁻¹; want %s", sp.Formula, x, quarticRange)
		}
	}
	// t_i = kT/B_i; with kT in cm⁻¹ per kelvin, the averages are
	// (kT)²·(…) and ln q gains ⟨E⟩/kT = kT·(…)/… : take kT = 1 cm⁻¹ units
	// and scale by the kelvin-to-wavenumber factor at the end.
	b := sp.RotConstPerCm
	z := d.Axis - 1
	tz, tx, ty := 1/b[z], 1/b[(z+1)%3], 1/b[(z+2)%3]
	j4 := 0.75*(tx*tx+ty*ty+tz*tz) + 0.5*(tx*ty+tx*tz+ty*tz)
	j2z2 := 0.75*tz*tz + 0.25*tz*(tx+ty)
	z4 := 0.75 * tz * tz
	j2xy := 0.75*(tx*tx-ty*ty) + 0.25*tz*(tx-ty)
	zxy := 0.5 * tz * (tx - ty)
	perCm := d.DeltaJ*j4 + d.DeltaJK*j2z2 + d.DeltaK*z4 + 2*d.SmallDeltaJ*j2xy + d.SmallDeltaK*zxy
	// ⟨E⟩/kT = (kT in cm⁻¹)·perCm, and kT in cm⁻¹ is T/WavenumberToKelvin(1).
	sp.distortionPerK = perCm / WavenumberToKelvin(1)
	return nil
}

// distortionTerms returns what the distortion adds to the rotor at T.
func (sp *Species) distortionTerms(tempK float64) Terms {
	x := sp.distortionPerK * tempK
	return Terms{LnQ: x, U: x, Cv: 2 * x}
}
