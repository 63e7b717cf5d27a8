package model

// TableRow holds the standard-state functions in the columns of the
// published thermochemical tables, at one temperature and the chosen
// standard pressure.
type TableRow struct {
	TempK       float64
	CpJPerMolK  float64 // Cp°
	SJPerMolK   float64 // S°
	GefJPerMolK float64 // −[G° − H°(298.15 K)]/T
	HIncJPerMol float64 // H° − H°(298.15 K)
}

// Table returns the table row at tempK and standard pressure stdPresPa
// (StdPressureBarPa or StdPressureAtmPa).
func (sp *Species) Table(tempK, stdPresPa float64, tr Treatment) (TableRow, error) {
	s, err := sp.StateWith(tempK, stdPresPa, tr)
	if err != nil {
		return TableRow{}, err
	}
	var ref State
	sp.fill(&ref, RefTempK, stdPresPa, tr)
	return TableRow{
		TempK:       tempK,
		CpJPerMolK:  s.CpJPerMolK,
		SJPerMolK:   s.SJPerMolK,
		GefJPerMolK: -(s.GJPerMol - ref.HJPerMol) / tempK,
		HIncJPerMol: s.HJPerMol - ref.HJPerMol,
	}, nil
}

// StandardGibbs returns μ°(T) = G°(T, P°), the standard chemical potential.
func (sp *Species) StandardGibbs(tempK, stdPresPa float64, tr Treatment) float64 {
	var s State
	sp.fill(&s, tempK, stdPresPa, tr)
	return s.GJPerMol
}
