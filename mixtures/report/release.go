package report

import (
	"encoding/json"
	"fmt"
	"io"
	"sort"
	"strings"

	"zmix/mixtures/safety"
	"zmix/model"
)

// ReleaseReport is a release into a room as `zmix release` shows it.
type ReleaseReport struct {
	Label   string
	Release safety.Release
	Result  safety.ReleaseResult
	What    string // the release as typed: "2 Nm3 at once", "10 SLPM"
	Vent    string // the ventilation as typed; "" for none
	// Cylinder, when the amount is a cylinder's contents, is how it was
	// found; nil otherwise.
	Cylinder *ReleaseCylinder
}

// ReleaseCylinder is a cylinder whose contents are the amount released:
// what it holds at its fill, with the real-gas Z, less what stays at
// 1 atm.
type ReleaseCylinder struct {
	VolumeM3      float64 `json:"volume_m3"`
	FillPresPa    float64 `json:"fill_pressure_Pa"`
	FillTempK     float64 `json:"fill_temperature_K"`
	Z             float64 `json:"z"`
	ContentsMol   float64 `json:"contents_mol"`
	LeftAt1AtmMol float64 `json:"left_at_1_atm_mol"`
	ReleasedMol   float64 `json:"released_mol"`
}

// alarmText places a peak % of LFL against the common alarm points.
func alarmText(pct float64) string {
	switch {
	case pct >= 100:
		return "AT OR ABOVE THE LFL"
	case pct >= safety.AlarmHighPctLFL:
		return "above the 25 % LFL alarm point"
	case pct >= safety.AlarmLowPctLFL:
		return "above the 10 % LFL alarm point"
	}
	return "below the 10 % LFL alarm point"
}

func o2Text(pct float64) string {
	s := Fixed(pct, 2) + " %"
	if pct < safety.O2DeficientPc {
		s += "  BELOW 19.5 %: oxygen-deficient"
	}
	return s
}

// releaseSources lists the model and the sources of every figure used.
func releaseSources(rep *ReleaseReport) []string {
	set := map[string]bool{}
	for _, p := range rep.Result.Species {
		sp := p.Species
		for _, f := range []string{"lfl_pct", "lc50_ppm", "oel_ppm"} {
			if src, ok := sp.Sources[f]; ok && (f != "lfl_pct" || p.PctOfLFL > 0) {
				set[sp.Formula+" "+f+": "+src] = true
			}
		}
	}
	out := make([]string, 0, len(set)+2)
	for s := range set {
		out = append(out, s)
	}
	sort.Strings(out)
	head := []string{safety.MethodRelease, "alarm points of 10 % and 25 % LFL and 19.5 % O2: common practice"}
	return append(head, out...)
}

// WriteReleaseText writes the release readout.
func WriteReleaseText(w io.Writer, rep *ReleaseReport) error {
	r, res := &rep.Release, &rep.Result
	fmt.Fprintf(w, "Blend    %s\n", model.Printable(rep.Label))
	vent := "no ventilation"
	if r.VentM3PerS > 0 {
		vent = "ventilation " + model.Printable(rep.Vent) + " (" + Short(r.VentM3PerS*3600, 4) + " m3/h at 20 °C, " + Short(r.VentM3PerS*3600/r.RoomM3, 3) + " air changes per hour)"
		if strings.HasSuffix(rep.Vent, "air changes per hour") {
			vent = "ventilation " + rep.Vent + " (" + Short(r.VentM3PerS*3600, 4) + " m3/h)"
		}
	}
	fmt.Fprintf(w, "Release  %s into a %s m3 room, %s\n", model.Printable(rep.What), Short(r.RoomM3, 4), vent)
	fmt.Fprintf(w, "Model    %s; volumes at 20 °C and 1 atm\n\n", safety.MethodRelease)

	fmt.Fprintln(w, "Oxygen")
	t := NewTable("  ", Left, Left)
	if !res.Continuous {
		t.Row("closed room (gas added, room air stays)", o2Text(res.O2ClosedPct))
		t.Row("room air displaced outward as gas comes", o2Text(res.O2DisplacedPct))
		t.Row("worst (the lower)", o2Text(res.O2Pct))
		if r.VentM3PerS > 0 {
			t.Row("ventilation", "lowers the level only after the release; the peak is the same")
		}
	} else {
		t.Row("time constant V/(q+v)", Sig(res.TauS/60, 4)+" min")
		t.Row("steady state", o2Text(res.O2SteadyPct))
		if res.DurationS > 0 {
			t.Row("release lasts", Sig(res.DurationS/60, 4)+" min")
			t.Row("at its end (worst)", o2Text(res.O2Pct))
		} else {
			t.Row("worst (steady state)", o2Text(res.O2Pct))
		}
		if res.TimeToDeficientS >= 0 {
			t.Row("reaches 19.5 % after", Sig(res.TimeToDeficientS/60, 3)+" min")
		} else {
			t.Row("reaches 19.5 %", "never, by this model")
		}
	}
	t.Write(w)

	if len(res.Species) > 0 {
		fmt.Fprintln(w, "\nPeak in the room")
		st := NewTable("  ", Left, Right, Left, Left)
		st.Row("species", "peak ppm", "flammability", "toxicity")
		for _, p := range res.Species {
			flam := "-"
			switch {
			case p.PctOfLFL > 0:
				flam = Sig(p.PctOfLFL, 3) + " % LFL, " + alarmText(p.PctOfLFL)
			case p.Species.Hazards&model.Flammable != 0:
				flam = "LFL not known"
			}
			tox := "-"
			switch {
			case p.LC50PPM4h > 0:
				tox = Sig(100*p.PeakPPM/p.LC50PPM4h, 3) + " % of LC50 (" + ppmText(p.LC50PPM4h) + " ppm, 4 h"
				if p.Category > 0 {
					tox += fmt.Sprintf(", Cat. %d", p.Category)
				}
				tox += ")"
			case p.Species.Hazards&model.Toxic != 0:
				tox = "LC50 not known"
			}
			if el := p.Species.Safety.Exposure; el.Known() {
				tox += "; " + Sig(p.PeakPPM/el.PPM, 3) + " × limit " + el.String()
			}
			st.Row(p.Species.Formula, ppmText(p.PeakPPM), flam, tox)
		}
		st.Write(w)
		if res.MixPctOfLFL > 0 {
			fmt.Fprintf(w, "  all flammables together (Le Chatelier): %s %% LFL, %s\n", Sig(res.MixPctOfLFL, 3), alarmText(res.MixPctOfLFL))
		}
	}
	if res.Continuous {
		fmt.Fprintln(w, "\nTime course")
		tc := NewTable("  ", Right, Right)
		tc.Row("min", "O2 %")
		for _, p := range res.TimeCourse {
			tc.Row(Sig(p.TimeS/60, 4), Fixed(p.O2Pct, 2))
		}
		tc.Write(w)
	}
	writeSafetyFooter(w, res.Recalled, releaseSources(rep))
	return nil
}

func ppmText(x float64) string {
	if x >= 1e4 {
		return fmt.Sprintf("%.0f", x)
	}
	return Sig(x, 4)
}

type releaseSpeciesJSON struct {
	Species      string        `json:"species"`
	PeakPPM      float64       `json:"peak_ppm"`
	PercentOfLFL *float64      `json:"percent_of_lfl,omitempty"`
	LFLAlarm     string        `json:"lfl_alarm,omitempty"`
	LC50PPM4h    *float64      `json:"lc50_4h_ppm,omitempty"`
	GHSCategory  *int          `json:"ghs_inhalation_category,omitempty"`
	Limit        *exposureJSON `json:"exposure_limit,omitempty"`
	NotKnown     []string      `json:"not_known,omitempty"`
}

type exposureJSON struct {
	PPM          float64 `json:"ppm"`
	Kind         string  `json:"kind"`
	Jurisdiction string  `json:"jurisdiction"`
	Year         int     `json:"year"`
}

type timePointJSON struct {
	TimeS     float64 `json:"t_s"`
	O2Percent float64 `json:"o2_percent"`
}

type releaseJSON struct {
	Blend               string               `json:"blend"`
	Model               string               `json:"model"`
	Continuous          bool                 `json:"continuous"`
	RoomM3              float64              `json:"room_m3"`
	ReleasedM3          *float64             `json:"released_m3"`
	RateM3PerH          *float64             `json:"rate_m3_per_h"`
	VentM3PerH          float64              `json:"vent_m3_per_h"`
	O2Percent           float64              `json:"o2_percent"`
	O2ClosedPercent     *float64             `json:"o2_closed_room_percent"`
	O2DisplacedPercent  *float64             `json:"o2_displaced_percent"`
	O2SteadyPercent     *float64             `json:"o2_steady_percent"`
	TimeConstantS       *float64             `json:"time_constant_s"`
	DurationS           *float64             `json:"duration_s"`
	TimeTo19_5S         *float64             `json:"time_to_19_5_percent_o2_s"`
	Species             []releaseSpeciesJSON `json:"species"`
	MixturePercentOfLFL *float64             `json:"mixture_percent_of_lfl"`
	TimeCourse          []timePointJSON      `json:"time_course"`
	Recalled            bool                 `json:"rests_on_recalled_figures"`
	Sources             []string             `json:"sources"`
	Screening           string               `json:"screening"`
	Cylinder            *ReleaseCylinder     `json:"cylinder"`
}

// WriteReleaseJSON writes the release as one JSON object; volumes are at
// 20 °C and 1 atm.
func WriteReleaseJSON(w io.Writer, rep *ReleaseReport) error {
	r, res := &rep.Release, &rep.Result
	j := releaseJSON{
		Blend:      model.Printable(rep.Label),
		Model:      safety.MethodRelease,
		Continuous: res.Continuous,
		RoomM3:     r.RoomM3,
		VentM3PerH: r.VentM3PerS * 3600,
		O2Percent:  res.O2Pct,
		Species:    []releaseSpeciesJSON{},
		TimeCourse: []timePointJSON{},
		Recalled:   res.Recalled,
		Sources:    releaseSources(rep),
		Screening:  ScreeningLine,
		Cylinder:   rep.Cylinder,
	}
	if r.AmountM3 > 0 {
		j.ReleasedM3 = fptr(r.AmountM3)
	}
	if res.Continuous {
		j.RateM3PerH = fptr(r.RateM3PerS * 3600)
		j.O2SteadyPercent, j.TimeConstantS = fptr(res.O2SteadyPct), fptr(res.TauS)
		if res.DurationS > 0 {
			j.DurationS = fptr(res.DurationS)
		}
		if res.TimeToDeficientS >= 0 {
			j.TimeTo19_5S = fptr(res.TimeToDeficientS)
		}
		for _, p := range res.TimeCourse {
			j.TimeCourse = append(j.TimeCourse, timePointJSON{p.TimeS, p.O2Pct})
		}
	} else {
		j.O2ClosedPercent, j.O2DisplacedPercent = fptr(res.O2ClosedPct), fptr(res.O2DisplacedPct)
	}
	if res.MixPctOfLFL > 0 {
		j.MixturePercentOfLFL = fptr(res.MixPctOfLFL)
	}
	for _, p := range res.Species {
		e := releaseSpeciesJSON{Species: p.Species.Formula, PeakPPM: p.PeakPPM}
		if p.PctOfLFL > 0 {
			e.PercentOfLFL, e.LFLAlarm = fptr(p.PctOfLFL), alarmText(p.PctOfLFL)
		} else if p.Species.Hazards&model.Flammable != 0 {
			e.NotKnown = append(e.NotKnown, "lfl")
		}
		if p.LC50PPM4h > 0 {
			e.LC50PPM4h = fptr(p.LC50PPM4h)
			if p.Category > 0 {
				c := p.Category
				e.GHSCategory = &c
			}
		} else if p.Species.Hazards&model.Toxic != 0 {
			e.NotKnown = append(e.NotKnown, "lc50")
		}
		if el := p.Species.Safety.Exposure; el.Known() {
			e.Limit = &exposureJSON{el.PPM, el.Kind, el.Jurisdiction, el.Year}
		}
		j.Species = append(j.Species, e)
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(j)
}
