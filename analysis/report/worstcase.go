package report

import (
	"coilmemo/analysis"
	"coilmemo/format"
	"coilmemo/spec"
)

// WorstReport is one headline result over the tolerances: SI (°C for a
// temperature), with the names of the corners at which the minimum and
// the maximum occur ("nominal" when the nominal design is the extreme).
type WorstReport struct {
	Min       Num    `json:"min"`
	Nominal   Num    `json:"nominal"`
	Max       Num    `json:"max"`
	CornerMin string `json:"corner_min"`
	CornerMax string `json:"corner_max"`
}

// WorstCaseKeys are the worst_case keys of the headline results, the
// same keys the report uses for them elsewhere.
var WorstCaseKeys = map[string]string{
	"moment": "moment_A_m2", "torque": "torque_max_N_m", "field-center": "field_center_T",
	"current": "current_A", "voltage": "voltage_V", "power": "power_W",
	"temperature": "winding_temperature_C", "resistance": "resistance_hot_ohm",
	"switch-off-voltage": "switch_off_voltage_V",
}

func addWorstCase(rep *Report, j *analysis.Study) {
	wc := j.WorstCase
	if wc == nil {
		return
	}
	rep.WorstCase = map[string]WorstReport{}
	for _, r := range wc.Results {
		conv := func(v float64) Num { return Num(v) }
		if r.Quantity == "temperature" {
			conv = func(v float64) Num { return Num(format.Celsius(v)) }
		}
		rep.WorstCase[WorstCaseKeys[r.Quantity]] = WorstReport{Min: conv(r.Min), Nominal: conv(r.Nominal), Max: conv(r.Max),
			CornerMin: wc.CornerName(r.CornerMin), CornerMax: wc.CornerName(r.CornerMax)}
	}
	for i := range rep.Limits {
		if i >= len(wc.Limits) {
			break
		}
		w := wc.Limits[i].Worst
		if spec.LimitQuantities[j.Limits[i].Limit.Quantity].Unit == "degC" {
			w = format.Celsius(w)
		}
		n := Num(w)
		rep.Limits[i].Worst, rep.Limits[i].Corner = &n, wc.CornerName(wc.Limits[i].Corner)
	}
}
