package ui

import "zmix/mixtures"

// stateFormatV1 is the first state format, which mirrored the blend
// file's fields one by one. Files in it still load; they are written back
// in the current format.
const stateFormatV1 = "zmix-workbench/1"

type savedStateV1 struct {
	Format           string                   `json:"format"`
	Name             string                   `json:"name,omitempty"`
	Note             string                   `json:"note,omitempty"`
	Recipe           []mixtures.FileComponent `json:"recipe"`
	Temperature      string                   `json:"temperature"`
	Pressure         string                   `json:"pressure"`
	StandardPressure string                   `json:"standard_pressure"`
	PressureView     string                   `json:"pressure_view"`
	Sweep            SweepSettings            `json:"sweep"`
	Pane             string                   `json:"pane"`
	BlendPath        string                   `json:"blend_path,omitempty"`
	Unsaved          bool                     `json:"unsaved_changes,omitempty"`
	AnatomySpecies   string                   `json:"anatomy_species,omitempty"`
	LastValid        *struct {
		Recipe      []mixtures.FileComponent `json:"recipe,omitempty"`
		Temperature string                   `json:"temperature,omitempty"`
		Pressure    string                   `json:"pressure,omitempty"`
	} `json:"last_valid,omitempty"`
}

func (v *savedStateV1) upgrade() *savedState {
	st := &savedState{
		Format: stateFormat,
		Blend: mixtures.BlendFile{Format: mixtures.BlendFormat, Name: v.Name, Note: v.Note, Components: v.Recipe,
			Temperature: v.Temperature, Pressure: v.Pressure, StandardPressure: v.StandardPressure},
		PressureView: v.PressureView, Sweep: v.Sweep, Pane: v.Pane,
		BlendPath: v.BlendPath, Unsaved: v.Unsaved, AnatomySpecies: v.AnatomySpecies,
	}
	if lv := v.LastValid; lv != nil {
		st.LastValid = &mixtures.BlendFile{Format: mixtures.BlendFormat, Components: lv.Recipe,
			Temperature: lv.Temperature, Pressure: lv.Pressure, StandardPressure: v.StandardPressure}
	}
	return st
}
