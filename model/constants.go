package model

import (
	"math"

	"gonum.org/v1/gonum/unit/constant"
)

// SI values of the CODATA 2018 exact constants, taken from gonum so that no
// constant is typed by hand.
var (
	boltzmannJPerK  = float64(constant.Boltzmann)
	planckJs        = float64(constant.Planck)
	lightSpeedMPerS = float64(constant.LightSpeedInVacuum)
	avogadroPerMol  = float64(constant.Avogadro)
)

// lnBoltzmann is ln(k/(J/K)), for products with k taken in logs.
var lnBoltzmann = math.Log(boltzmannJPerK)

// GasConstant is R = N_A·k in J/(mol·K).
var GasConstant = avogadroPerMol * boltzmannJPerK

// kelvinPerWavenumber converts a level in cm⁻¹ to a characteristic
// temperature in K: hc/k with c in cm/s.
var kelvinPerWavenumber = planckJs * lightSpeedMPerS * 100 / boltzmannJPerK

// quantumConcTerm is (2π k / h²)^{3/2} in SI, the mass- and
// temperature-free part of the quantum concentration nQ = (2π m kT/h²)^{3/2}.
var quantumConcTerm = math.Pow(2*math.Pi*boltzmannJPerK/(planckJs*planckJs), 1.5)

// Standard pressures in Pa.
const (
	StdPressureBarPa = 1e5
	StdPressureAtmPa = 101325
)

// ZeroCelsiusK is 0 °C in kelvin, by definition of the Celsius scale.
const ZeroCelsiusK = 273.15

// RefTempK is the reference temperature of the published tables, 298.15 K.
const RefTempK = 298.15

// WavenumberToKelvin converts an energy in cm⁻¹ to a temperature hcν̃/k in K.
func WavenumberToKelvin(perCm float64) float64 { return perCm * kelvinPerWavenumber }
