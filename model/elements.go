package model

// atomicWeights holds standard atomic weights in g/mol (numerically, u).
//
// Source: IUPAC CIAAW, "Standard atomic weights of the elements 2021",
// Pure Appl. Chem. 94 (2022) 573; for elements given as an interval the
// conventional value of the abridged table is used. Values from memory.
// D is not an element: its value is the atomic mass of ²H (AME2020,
// 2.014101778 u, from memory), used for isotopologues such as HD and D2.
var atomicWeights = map[string]float64{
	"H":  1.008,
	"D":  2.014101778,
	"He": 4.002602,
	"B":  10.81,
	"C":  12.011,
	"N":  14.007,
	"O":  15.999,
	"F":  18.998403162,
	"Ne": 20.1797,
	"Si": 28.085,
	"P":  30.973761998,
	"S":  32.06,
	"Cl": 35.45,
	"Ar": 39.95,
	"Ge": 72.630,
	"As": 74.921595,
	"Br": 79.904,
	"Kr": 83.798,
	"W":  183.84,
	"Xe": 131.293,
}
