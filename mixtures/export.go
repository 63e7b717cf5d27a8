package mixtures

import (
	"encoding/csv"
	"encoding/json"
	"io"
	"strconv"
)

// Record is the exported form of a mixture state. The JSON keys carry SI
// units; the README lists them.
type Record struct {
	TemperatureK      float64         `json:"temperature_K"`
	PressurePa        float64         `json:"pressure_Pa"`
	PressureGauge     bool            `json:"pressure_given_as_gauge"`
	StdPressurePa     float64         `json:"standard_pressure_Pa"`
	MolarMassKgPerMol float64         `json:"molar_mass_kg_mol"`
	DensityKgPerM3    float64         `json:"density_kg_m3"`
	CpJPerMolK        float64         `json:"cp_J_molK"`
	CvJPerMolK        float64         `json:"cv_J_molK"`
	Gamma             float64         `json:"gamma"`
	SoundSpeedMPerS   float64         `json:"sound_speed_m_s"`
	HJPerMol          float64         `json:"h_J_mol"`
	UJPerMol          float64         `json:"u_J_mol"`
	SJPerMolK         float64         `json:"s_J_molK"`
	GJPerMol          float64         `json:"g_J_mol"`
	AJPerMol          float64         `json:"a_J_mol"`
	SMixJPerMolK      float64         `json:"s_mix_J_molK"`
	CpJPerKgK         float64         `json:"cp_J_kgK"`
	CvJPerKgK         float64         `json:"cv_J_kgK"`
	HJPerKg           float64         `json:"h_J_kg"`
	UJPerKg           float64         `json:"u_J_kg"`
	SJPerKgK          float64         `json:"s_J_kgK"`
	GJPerKg           float64         `json:"g_J_kg"`
	AJPerKg           float64         `json:"a_J_kg"`
	Species           []SpeciesRecord `json:"species"`
}

// SpeciesRecord is one species of a Record.
type SpeciesRecord struct {
	Name            string  `json:"name"`
	X               float64 `json:"x"`
	MassFraction    float64 `json:"mass_fraction"`
	PartialPresPa   float64 `json:"partial_pressure_Pa"`
	MuJPerMol       float64 `json:"mu_J_mol"`
	Mu0JPerMol      float64 `json:"mu_std_J_mol"`
	SJPerMolK       float64 `json:"s_J_molK"`
	CpJPerMolK      float64 `json:"cp_J_molK"`
	HJPerMol        float64 `json:"h_J_mol"`
	SShareJPerMolK  float64 `json:"s_share_J_molK"`
	CpShareJPerMolK float64 `json:"cp_share_J_molK"`
}

// Record returns the exported form of s; gauge says the pressure was
// entered as gauge.
func (s *State) Record(gauge bool) Record {
	r := Record{
		TemperatureK: s.TempK, PressurePa: s.PresPa, PressureGauge: gauge, StdPressurePa: s.StdPresPa,
		MolarMassKgPerMol: s.MolarMassKgPerMol, DensityKgPerM3: s.DensityKgPerM3,
		CpJPerMolK: s.CpJPerMolK, CvJPerMolK: s.CvJPerMolK, Gamma: s.Gamma, SoundSpeedMPerS: s.SoundSpeedMPerS,
		HJPerMol: s.HJPerMol, UJPerMol: s.UJPerMol, SJPerMolK: s.SJPerMolK, GJPerMol: s.GJPerMol, AJPerMol: s.AJPerMol,
		SMixJPerMolK: s.SMixJPerMolK,
		CpJPerKgK:    s.PerKg(s.CpJPerMolK), CvJPerKgK: s.PerKg(s.CvJPerMolK),
		HJPerKg: s.PerKg(s.HJPerMol), UJPerKg: s.PerKg(s.UJPerMol), SJPerKgK: s.PerKg(s.SJPerMolK),
		GJPerKg: s.PerKg(s.GJPerMol), AJPerKg: s.PerKg(s.AJPerMol),
		Species: make([]SpeciesRecord, len(s.Species)),
	}
	for i, t := range s.Species {
		r.Species[i] = SpeciesRecord{
			Name: t.Species.Formula, X: t.X, MassFraction: t.MassFrac, PartialPresPa: t.PartialPresPa,
			MuJPerMol: t.MuJPerMol, Mu0JPerMol: t.Mu0JPerMol, SJPerMolK: t.SJPerMolK, CpJPerMolK: t.CpJPerMolK,
			HJPerMol: t.HJPerMol, SShareJPerMolK: t.SShareJPerMolK, CpShareJPerMolK: t.CpShareJPerMolK,
		}
	}
	return r
}

// WriteJSON writes one state as a JSON object.
func WriteJSON(w io.Writer, s *State, gauge bool) error {
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(s.Record(gauge))
}

// WriteSweepJSON writes a sweep as a JSON list of state objects.
func WriteSweepJSON(w io.Writer, res *SweepResult, gauge bool) error {
	recs := make([]Record, len(res.Points))
	for i := range res.Points {
		recs[i] = res.Points[i].Record(gauge)
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(recs)
}

// csvScalar lists the CSV columns of the mixture, in order, with the same
// names as the JSON keys.
var csvScalar = []struct {
	name string
	get  func(*Record) float64
}{
	{"temperature_K", func(r *Record) float64 { return r.TemperatureK }},
	{"pressure_Pa", func(r *Record) float64 { return r.PressurePa }},
	{"standard_pressure_Pa", func(r *Record) float64 { return r.StdPressurePa }},
	{"molar_mass_kg_mol", func(r *Record) float64 { return r.MolarMassKgPerMol }},
	{"density_kg_m3", func(r *Record) float64 { return r.DensityKgPerM3 }},
	{"cp_J_molK", func(r *Record) float64 { return r.CpJPerMolK }},
	{"cv_J_molK", func(r *Record) float64 { return r.CvJPerMolK }},
	{"gamma", func(r *Record) float64 { return r.Gamma }},
	{"sound_speed_m_s", func(r *Record) float64 { return r.SoundSpeedMPerS }},
	{"h_J_mol", func(r *Record) float64 { return r.HJPerMol }},
	{"u_J_mol", func(r *Record) float64 { return r.UJPerMol }},
	{"s_J_molK", func(r *Record) float64 { return r.SJPerMolK }},
	{"g_J_mol", func(r *Record) float64 { return r.GJPerMol }},
	{"a_J_mol", func(r *Record) float64 { return r.AJPerMol }},
	{"s_mix_J_molK", func(r *Record) float64 { return r.SMixJPerMolK }},
	{"cp_J_kgK", func(r *Record) float64 { return r.CpJPerKgK }},
	{"cv_J_kgK", func(r *Record) float64 { return r.CvJPerKgK }},
	{"h_J_kg", func(r *Record) float64 { return r.HJPerKg }},
	{"u_J_kg", func(r *Record) float64 { return r.UJPerKg }},
	{"s_J_kgK", func(r *Record) float64 { return r.SJPerKgK }},
	{"g_J_kg", func(r *Record) float64 { return r.GJPerKg }},
	{"a_J_kg", func(r *Record) float64 { return r.AJPerKg }},
}

var csvSpecies = []struct {
	name string
	get  func(*SpeciesRecord) float64
}{
	{"x", func(r *SpeciesRecord) float64 { return r.X }},
	{"mass_fraction", func(r *SpeciesRecord) float64 { return r.MassFraction }},
	{"partial_pressure_Pa", func(r *SpeciesRecord) float64 { return r.PartialPresPa }},
	{"mu_J_mol", func(r *SpeciesRecord) float64 { return r.MuJPerMol }},
	{"mu_std_J_mol", func(r *SpeciesRecord) float64 { return r.Mu0JPerMol }},
	{"s_J_molK", func(r *SpeciesRecord) float64 { return r.SJPerMolK }},
	{"cp_J_molK", func(r *SpeciesRecord) float64 { return r.CpJPerMolK }},
	{"h_J_mol", func(r *SpeciesRecord) float64 { return r.HJPerMol }},
	{"s_share_J_molK", func(r *SpeciesRecord) float64 { return r.SShareJPerMolK }},
	{"cp_share_J_molK", func(r *SpeciesRecord) float64 { return r.CpShareJPerMolK }},
}

// WriteCSV writes states as CSV: one header row, then a row per state.
// Species columns are named "FORMULA.key" with the JSON species keys.
// All states must be of the same mixture.
func WriteCSV(w io.Writer, states []State, gauge bool) error {
	cw := csv.NewWriter(w)
	if len(states) == 0 {
		cw.Flush()
		return cw.Error()
	}
	header := []string{"pressure_given_as_gauge"}
	for _, c := range csvScalar {
		header = append(header, c.name)
	}
	for _, t := range states[0].Species {
		for _, c := range csvSpecies {
			header = append(header, t.Species.Formula+"."+c.name)
		}
	}
	if err := cw.Write(header); err != nil {
		return err
	}
	row := make([]string, 0, len(header))
	for i := range states {
		rec := states[i].Record(gauge)
		row = append(row[:0], strconv.FormatBool(gauge))
		for _, c := range csvScalar {
			row = append(row, formatCSV(c.get(&rec)))
		}
		for j := range rec.Species {
			for _, c := range csvSpecies {
				row = append(row, formatCSV(c.get(&rec.Species[j])))
			}
		}
		if err := cw.Write(row); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}

func formatCSV(x float64) string { return strconv.FormatFloat(x, 'g', -1, 64) }
