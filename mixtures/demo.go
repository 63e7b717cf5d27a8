package mixtures

// DemoFile returns the built-in demo blend: an invented scenario, the
// nitride-deposition feed of "Harrow Fen Microfab", line 3, at the
// mass-flow controllers. It mixes silane, ammonia and a nitrogen balance,
// so it shows mixing entropy, polyatomic species and a full caution block.
func DemoFile() *BlendFile {
	return &BlendFile{
		Format: BlendFormat,
		Name:   "Harrow Fen Microfab, line 3 nitride feed (demo)",
		Note:   "Invented demo scenario: PECVD silicon-nitride feed at the gas-box outlet.",
		Components: []FileComponent{
			{Species: "SiH4", Amount: "4%"},
			{Species: "NH3", Amount: "18%"},
			{Species: "H2", Amount: "500ppm"},
			{Species: "N2", Amount: "bal"},
		},
		Temperature:      "22 C",
		Pressure:         "1.4 bar",
		StandardPressure: "1 bar",
	}
}
