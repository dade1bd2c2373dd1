// Package report is the stable `calc --json` interface: a Study written
// as JSON in SI units, snake_case keys with the unit in the name. Keys are
// only ever added, never renamed or dropped.
package report

import (
	"bytes"
	"encoding/json"
	"math"
	"strconv"

	"coilmemo/analysis"
	"coilmemo/calc"
	"coilmemo/format"
	"coilmemo/spec"
)

// Num is a float that encodes NaN and ±Inf (an unknown value) as JSON null.
type Num float64

// MarshalJSON implements json.Marshaler.
func (n Num) MarshalJSON() ([]byte, error) {
	f := float64(n)
	if math.IsNaN(f) || math.IsInf(f, 0) {
		return []byte("null"), nil
	}
	return strconv.AppendFloat(nil, f, 'g', -1, 64), nil
}

func vec(v calc.Vec) [3]Num { return [3]Num{Num(v[0]), Num(v[1]), Num(v[2])} }

// Report is the stable `calc --json` interface: SI values, snake_case keys
// with the unit in the name. Keys are only ever added, never renamed.
type Report struct {
	Tool         string        `json:"tool"`
	Spec         string        `json:"spec"`
	SpecSHA256   string        `json:"spec_sha256"`
	Coils        []CoilReport  `json:"coils"`
	FieldCenter  [3]Num        `json:"field_center_T"`
	Moment       Num           `json:"moment_A_m2"`
	MomentVector [3]Num        `json:"moment_vector_A_m2"`
	Probes       []ProbeReport `json:"probes"`
	TorqueMax    Num           `json:"torque_max_N_m"`
	TorqueDesign Num           `json:"torque_N_m"`
	TorqueAngle  Num           `json:"torque_angle_deg"`
	TorqueVector [3]Num        `json:"torque_vector_N_m"`
	Limits       []LimitReport `json:"limits"`
	Checks       []CheckReport `json:"checks"`
	Sweep        *SweepReport  `json:"sweep,omitempty"`
	LimitsFailed int           `json:"limits_failed"`
	ChecksFailed int           `json:"checks_failed"`
	// HandlingAmbient is the ambient at which the hot surface is judged,
	// where people handle the coil (analysis.Handling), °C.
	HandlingAmbient Num `json:"handling_ambient_C"`
	Interactions
	// WorstCase is each headline result over the tolerances' corners
	// (worstcase.go); absent without a tolerances block.
	WorstCase map[string]WorstReport `json:"worst_case,omitempty"`
	// Sizing is the size block's choice (sizing.go); absent without one.
	Sizing *SizingReport `json:"size,omitempty"`
	// AxisSet is the set of coils on several axes; absent otherwise.
	AxisSet *AxisSetReport `json:"axis_set,omitempty"`
}

// SweepReport is the design re-evaluated over one parameter's range.
type SweepReport struct {
	Parameter string            `json:"parameter"`
	Coil      string            `json:"coil,omitempty"`
	Steps     []SweepStepReport `json:"steps"`
}

// SweepStepReport is one step; Value is SI (a count for turns, a fraction
// for duty). The figures are absent for a winding that does not fit.
type SweepStepReport struct {
	Value              Num    `json:"value"`
	Feasible           bool   `json:"feasible"`
	Problem            string `json:"problem,omitempty"`
	Moment             *Num   `json:"moment_A_m2,omitempty"`
	FieldCenter        *Num   `json:"field_center_magnitude_T,omitempty"`
	Power              *Num   `json:"power_W,omitempty"`
	WindingTemperature *Num   `json:"winding_temperature_C,omitempty"`
	LimitsFailed       *int   `json:"limits_failed,omitempty"`
}

// CoilReport is one coil block.
type CoilReport struct {
	Name               string `json:"name"`
	Form               string `json:"form"`
	Turns              int    `json:"turns"`
	Moment             Num    `json:"moment_A_m2"`
	MomentVector       [3]Num `json:"moment_vector_A_m2"`
	Resistance20C      Num    `json:"resistance_20C_ohm"`
	ResistanceHot      Num    `json:"resistance_hot_ohm"`
	Current            Num    `json:"current_A"`
	CurrentCold        Num    `json:"current_cold_A"`
	Voltage            Num    `json:"voltage_V"`
	VoltagePeak        Num    `json:"voltage_cycle_peak_V"`
	Power              Num    `json:"power_W"`
	WireLength         Num    `json:"wire_length_m"`
	ConductorMass      Num    `json:"conductor_mass_kg"`
	CurrentDensity     Num    `json:"current_density_A_m2"`
	Inductance         Num    `json:"inductance_H"`
	WindingTemperature Num    `json:"winding_temperature_C"`
	Runaway            bool   `json:"runaway"`
	AboveClass         bool   `json:"above_insulation_class"`
	FieldCenter        [3]Num `json:"field_center_T"`
	TurnsPerLayer      int    `json:"turns_per_layer"`
	Layers             int    `json:"layers"`
	// Distances from the coil's centre beyond which the point-dipole field
	// is within 1 % and 0.1 % of the exact field, on the axis and in the
	// coil's plane (null without a dipole moment).
	DipoleAxis1   Num         `json:"dipole_distance_axis_1pct_m"`
	DipoleAxis01  Num         `json:"dipole_distance_axis_0p1pct_m"`
	DipolePlane1  Num         `json:"dipole_distance_plane_1pct_m"`
	DipolePlane01 Num         `json:"dipole_distance_plane_0p1pct_m"`
	DipoleAny1    Num         `json:"dipole_distance_any_1pct_m"`
	DipoleAny01   Num         `json:"dipole_distance_any_0p1pct_m"`
	Pair          *PairReport `json:"pair,omitempty"`
	// Plane is a rectangle's field over its plane of interest (the
	// test-plane key, else the probes' plane); absent for other coils.
	Plane *PlaneReport `json:"plane,omitempty"`
	// UnmodelledCore names the part in the bore the figures leave out
	// (the unmodelled-core key); absent when none is stated.
	UnmodelledCore string `json:"unmodelled_core,omitempty"`
	CoilHeatSwitch
	CoilKindsReport
}

// PairReport is the region of a pair of coils: for an aiding pair the
// extents from the centre within which the field stays within 1 % and
// 0.1 % of the centre field; for an opposing pair the axial gradient at the
// centre and the extents within which it stays within 1 %.
type PairReport struct {
	SpacingToRadius     Num  `json:"spacing_to_radius"`
	Helmholtz           bool `json:"helmholtz"`
	HomogeneousAxial1   Num  `json:"homogeneous_axial_1pct_m"`
	HomogeneousRadial1  Num  `json:"homogeneous_radial_1pct_m"`
	HomogeneousAxial01  Num  `json:"homogeneous_axial_0p1pct_m"`
	HomogeneousRadial01 Num  `json:"homogeneous_radial_0p1pct_m"`
	Gradient            Num  `json:"gradient_center_T_per_m"`
	LinearAxial         Num  `json:"gradient_linear_axial_1pct_m"`
	LinearRadial        Num  `json:"gradient_linear_radial_1pct_m"`
}

// PlaneReport is the normal field Bn of a rectangle alone over its plane
// of interest: the plane's distance from the coil's centre along its axis,
// Bn where the axis crosses it and its extremes over the mapped area, and
// for each band (±1 %, ±5 % of the centre value) the half-sides of the
// largest centred rectangle, in the coil's proportions, within it.
type PlaneReport struct {
	Distance   Num                 `json:"distance_m"`
	Named      bool                `json:"test_plane"`
	Centre     Num                 `json:"bn_center_T"`
	Min        Num                 `json:"bn_min_T"`
	Max        Num                 `json:"bn_max_T"`
	HalfWidth  Num                 `json:"map_half_width_m"`
	HalfHeight Num                 `json:"map_half_height_m"`
	Uniform    []PlaneRegionReport `json:"uniform"`
}

// PlaneRegionReport is one band of a PlaneReport: whole_map when the band
// holds over the whole mapped area (the half-sides are then the map's).
type PlaneRegionReport struct {
	Tolerance  Num  `json:"tolerance"`
	HalfWidth  Num  `json:"half_width_m"`
	HalfHeight Num  `json:"half_height_m"`
	WholeMap   bool `json:"whole_map"`
}

// AxisSetReport is a set of driven coils whose axes are not all parallel:
// the coils (names, in spec order), each one's moment vector alone at its
// operating current, the coupling coefficients k = M/√(L_a L_b) between
// them (null where none is computed) and the largest |k| off the diagonal.
type AxisSetReport struct {
	Coils    []string `json:"coils"`
	Moments  [][3]Num `json:"moment_vectors_A_m2"`
	Coupling [][]Num  `json:"coupling_coefficients"`
	CrossMax Num      `json:"cross_coupling_max"`
}

// ProbeReport is the field at one probe.
type ProbeReport struct {
	Name string `json:"name"`
	At   [3]Num `json:"at_m"`
	B    [3]Num `json:"B_T"`
	BMag Num    `json:"B_magnitude_T"`
}

// LimitReport is one requirement. Temperatures are in °C (unit "degC"),
// everything else in the SI unit named.
type LimitReport struct {
	Quantity string `json:"quantity"`
	// Subject is the coil block or probe the limit is about ("" for the
	// whole design); TestedOn says which: "design", "coil" or "probe".
	Subject  string `json:"subject"`
	TestedOn string `json:"tested_on"`
	// Tolerance is a uniform-radius limit's relative tolerance.
	Tolerance *Num   `json:"tolerance,omitempty"`
	Relation  string `json:"relation"`
	Required  Num    `json:"required"`
	Computed  Num    `json:"computed"`
	Unit      string `json:"unit"`
	Pass      bool   `json:"pass"`
	// Worst and Corner are the computed value at the corner of the
	// tolerances closest to failing and that corner's name; absent
	// without a tolerances block. Pass is then met at every corner.
	Worst  *Num   `json:"worst,omitempty"`
	Corner string `json:"corner,omitempty"`
}

// CheckReport is one verification check.
type CheckReport struct {
	Coil      string `json:"coil,omitempty"`
	Name      string `json:"name"`
	Method    string `json:"method"`
	Reference string `json:"reference"`
	Value     Num    `json:"value"`
	Expected  Num    `json:"expected"`
	Unit      string `json:"unit"`
	RelDiff   Num    `json:"rel_diff"`
	Tolerance Num    `json:"tolerance"`
	Pass      bool   `json:"pass"`
}

// Report builds the JSON report of an evaluated spec.
func Build(j *analysis.Study) Report {
	r := j.Results
	d := j.Spec.Design
	rep := Report{
		Tool: "coilmemo " + analysis.Version, Spec: j.Name, SpecSHA256: j.SHA256, HandlingAmbient: Num(format.Celsius(j.Safety.Handling.Ambient)),
		FieldCenter: vec(r.FieldCentre), Moment: Num(r.Moment.Norm()), MomentVector: vec(r.Moment),
		TorqueMax: Num(r.TorqueMax), TorqueDesign: Num(r.TorqueDesign), TorqueAngle: Num(r.TorqueAngle * 180 / math.Pi), TorqueVector: vec(r.Torque),
		Coils: []CoilReport{}, Probes: []ProbeReport{}, Limits: []LimitReport{}, Checks: []CheckReport{},
	}
	rep.LimitsFailed, rep.ChecksFailed = j.Failed()
	for i, cr := range r.Coils {
		co := d.Coils[i]
		rep.Coils = append(rep.Coils, CoilReport{
			Name: cr.Name, Form: analysis.FormName(co), Turns: co.Turns, UnmodelledCore: co.UnmodelledCore,
			Moment: Num(cr.Moment.Norm()), MomentVector: vec(cr.Moment),
			Resistance20C: Num(cr.R20), ResistanceHot: Num(cr.RHot),
			Current: Num(cr.Current), CurrentCold: Num(cr.ColdCurrent), Voltage: Num(cr.Voltage), VoltagePeak: Num(cr.VoltagePeak), Power: Num(cr.Power),
			WireLength: Num(cr.Length), ConductorMass: Num(cr.Mass), CurrentDensity: Num(cr.Density),
			Inductance: Num(cr.Inductance), WindingTemperature: Num(format.Celsius(cr.Temperature)),
			Runaway: runaway(co, cr), AboveClass: cr.Verdict.Runaway,
			FieldCenter: vec(cr.FieldCentre), TurnsPerLayer: cr.Winding.TurnsPerLayer, Layers: cr.Winding.LayerCount,
			DipoleAxis1: Num(cr.Dipole.Axis1), DipoleAxis01: Num(cr.Dipole.Axis01),
			DipolePlane1: Num(cr.Dipole.Plane1), DipolePlane01: Num(cr.Dipole.Plane01),
			DipoleAny1: Num(cr.Dipole.Any1), DipoleAny01: Num(cr.Dipole.Any01),
			CoilHeatSwitch: coilHeatSwitch(co, cr),
		})
		if ts, at := j.HottestSurface(i); !math.IsNaN(ts) {
			c := &rep.Coils[len(rep.Coils)-1]
			c.SurfaceHottest = Num(format.Celsius(ts))
			if j.WorstCase != nil {
				name := j.WorstCase.CornerName(at)
				c.SurfaceHottestCorner = &name
			}
		}
		if hd := j.Safety.Handling; i < len(hd.Nominal) {
			c := &rep.Coils[len(rep.Coils)-1]
			c.SurfaceHandling = Num(format.Celsius(hd.Nominal[i]))
			if i < len(hd.Surface) && j.WorstCase != nil {
				ws := hd.Surface[i]
				c.SurfaceHandling = Num(format.Celsius(ws.Max))
				name := j.WorstCase.CornerName(ws.Corner)
				if hd.AmbientHeld {
					name = j.WorstCase.CornerNameWithout(ws.Corner, "ambient")
				}
				c.SurfaceHandlingCorner = &name
			}
		}
		if i < len(j.Coils) {
			rep.Coils[len(rep.Coils)-1].SwitchOffCapacitanceLimit = Num(j.Coils[i].SwitchOff.RingingSwitch)
			if p := j.Coils[i].Suppression; p != nil {
				cr := &rep.Coils[len(rep.Coils)-1]
				name := j.WorstCase.CornerName(p.Corner)
				cr.SuppressionCorners, cr.SwitchVoltageSuppressedWorst, cr.SwitchVoltageSuppressedCorner = Num(p.ResistorMax), Num(p.SwitchVoltage), &name
			}
		}
		coilKinds(j, i, &rep.Coils[len(rep.Coils)-1])
		if co.Form == calc.Pair {
			p := cr.Pair
			rep.Coils[len(rep.Coils)-1].Pair = &PairReport{SpacingToRadius: Num(p.SpacingRatio), Helmholtz: p.Helmholtz,
				HomogeneousAxial1: Num(p.Axial1), HomogeneousRadial1: Num(p.Radial1),
				HomogeneousAxial01: Num(p.Axial01), HomogeneousRadial01: Num(p.Radial01),
				Gradient: Num(p.Gradient), LinearAxial: Num(p.LinearAxial), LinearRadial: Num(p.LinearRadial)}
		}
	}
	for i := range rep.Coils {
		if i < len(j.Design.Planes) && j.Design.Planes[i] != nil {
			pm := j.Design.Planes[i]
			pr := &PlaneReport{Distance: Num(pm.Dist), Named: d.Coils[i].HasTestPlane, Centre: Num(pm.Centre),
				Min: Num(pm.Min), Max: Num(pm.Max), HalfWidth: Num(pm.UHalf), HalfHeight: Num(pm.VHalf), Uniform: []PlaneRegionReport{}}
			for _, w := range pm.Within {
				pr.Uniform = append(pr.Uniform, PlaneRegionReport{Tolerance: Num(w.Tol), HalfWidth: Num(w.U), HalfHeight: Num(w.V), WholeMap: w.Full})
			}
			rep.Coils[i].Plane = pr
		}
	}
	if a := j.Design.Axes; a != nil {
		ar := &AxisSetReport{CrossMax: Num(a.Cross)}
		for k, i := range a.Coils {
			ar.Coils = append(ar.Coils, d.Coils[i].Name)
			ar.Moments = append(ar.Moments, vec(a.Moments[k]))
			row := make([]Num, len(a.K[k]))
			for l, v := range a.K[k] {
				row[l] = Num(v)
			}
			ar.Coupling = append(ar.Coupling, row)
		}
		rep.AxisSet = ar
	}
	rep.Interactions = interactions(d, r)
	for _, p := range r.Probes {
		rep.Probes = append(rep.Probes, ProbeReport{Name: p.Name, At: vec(p.At), B: vec(p.B), BMag: Num(p.B.Norm())})
	}
	for _, l := range j.Limits {
		unit := spec.LimitQuantities[l.Limit.Quantity].Unit
		req, got := l.Limit.Required, l.Computed
		if unit == "degC" {
			req, got = format.Celsius(req), format.Celsius(got)
		}
		rel := ">="
		if l.Limit.Relation == calc.AtMost {
			rel = "<="
		}
		on := map[analysis.Tested]string{analysis.OnDesign: "design", analysis.OnCoil: "coil", analysis.OnProbe: "probe"}[l.On]
		var tol *Num
		if l.Limit.Quantity == "uniform-radius" {
			t := Num(l.Limit.Tolerance)
			tol = &t
		}
		rep.Limits = append(rep.Limits, LimitReport{Quantity: l.Limit.Quantity, Subject: l.Limit.Subject, TestedOn: on, Tolerance: tol, Relation: rel,
			Required: Num(req), Computed: Num(got), Unit: unit, Pass: l.Pass})
	}
	addWorstCase(&rep, j)
	addSizing(&rep, j)
	if sw := j.Spec.Sweep; sw != nil {
		rep.Sweep = &SweepReport{Parameter: sw.Param, Coil: sw.Coil, Steps: []SweepStepReport{}}
		for _, st := range j.Sweep {
			sr := SweepStepReport{Value: Num(st.Value), Feasible: st.Feasible, Problem: st.Problem}
			if st.Feasible {
				n := func(v float64) *Num { x := Num(v); return &x }
				failed := len(st.Limits) - st.Met
				sr.Moment, sr.FieldCenter = n(st.Results.Moment.Norm()), n(st.Results.FieldCentre.Norm())
				sr.Power, sr.WindingTemperature, sr.LimitsFailed = n(st.Power), n(format.Celsius(st.Hottest)), &failed
			}
			rep.Sweep.Steps = append(rep.Sweep.Steps, sr)
		}
	}
	for _, k := range j.Checks {
		rep.Checks = append(rep.Checks, CheckReport{Coil: k.Coil, Name: k.Name, Method: k.Method, Reference: k.Reference,
			Value: Num(k.Value), Expected: Num(k.Expected), Unit: k.Unit, RelDiff: Num(k.RelDiff),
			Tolerance: Num(k.Tolerance), Pass: k.Pass})
	}
	return rep
}

// JSON is the indented JSON report of a study.
// Relations and names are written as they are, not HTML-escaped ("<="
// rather than "\u003c=").
func JSON(j *analysis.Study) ([]byte, error) {
	var buf bytes.Buffer
	enc := json.NewEncoder(&buf)
	enc.SetEscapeHTML(false)
	enc.SetIndent("", "  ")
	err := enc.Encode(Build(j))
	return buf.Bytes(), err
}

// CoilHeatSwitch holds a coil's heating, switching and a.c. keys of the
// JSON report (embedded in CoilReport; keys only ever added). Null where a
// figure does not apply: switch_off_voltage_V without switch-off,
// skin_depth_m, impedance_ohm and current_ac_A without frequency, force_N
// without field-gradient, pair_force_N for anything but a pair,
// time_to_limit_s when the class is never reached, cycle figures without
// on-time.
type CoilHeatSwitch struct {
	SurfaceTemperature Num `json:"surface_temperature_C"`
	MeanTemperature    Num `json:"mean_temperature_C"`
	TimeToLimit        Num `json:"time_to_limit_s"`
	CyclePeak          Num `json:"cycle_peak_C"`
	CycleTrough        Num `json:"cycle_trough_C"`
	MomentCold         Num `json:"moment_cold_A_m2"`
	HeatCapacity       Num `json:"heat_capacity_J_K"`
	TimeConstant       Num `json:"time_constant_s"`
	RiseTime           Num `json:"rise_time_s"`
	Energy             Num `json:"energy_J"`
	SwitchOffVoltage   Num `json:"switch_off_voltage_V"`
	// SwitchOffVoltageWorst is the spike at the largest current the switch
	// may open (a voltage drive's cold switch-on current), V.
	SwitchOffVoltageWorst Num `json:"switch_off_voltage_worst_V"`
	// SwitchOffCapacitanceLimit is the most the unsuppressed switch can
	// see however fast it opens, the supply plus the winding's
	// capacitance-limited peak I √(L/C_s) at that largest current, V
	// (analysis.SwitchOffParts.RingingSwitch; null where the
	// self-capacitance is not modelled or no current flows).
	SwitchOffCapacitanceLimit Num `json:"switch_off_voltage_capacitance_limit_V"`
	// SuppressionR is the largest resistor in series with the freewheeling
	// diode that keeps the switch within its limit, Ω, and SuppressionE12
	// the standard (E12) value at or below it that the memo sizes the
	// suppression with.
	SuppressionR   Num `json:"suppression_resistor_ohm"`
	SuppressionE12 Num `json:"suppression_resistor_e12_ohm"`
	// SwitchVoltageSuppressed is the switch voltage with the suggested
	// suppression, the supply plus the largest current times the fitted
	// resistor (the supply alone with a bare freewheeling diode), V.
	SwitchVoltageSuppressed Num `json:"switch_voltage_suppressed_V"`
	// With a tolerances block (null without one, or where no resistor is
	// sized): SuppressionCorners is the smallest largest resistor over the
	// nominal design and every corner, Ω, at or below which the fitted
	// resistor lies, and SwitchVoltageSuppressedWorst the largest switch
	// voltage with it over them, V, at the corner named by
	// SwitchVoltageSuppressedCorner (analysis.Suppression).
	SuppressionCorners            Num     `json:"suppression_resistor_corners_ohm"`
	SwitchVoltageSuppressedWorst  Num     `json:"switch_voltage_suppressed_worst_V"`
	SwitchVoltageSuppressedCorner *string `json:"switch_voltage_suppressed_worst_corner"`
	SkinDepth                     Num     `json:"skin_depth_m"`
	Impedance                     Num     `json:"impedance_ohm"`
	CurrentAC                     Num     `json:"current_ac_A"`
	Force                         Num     `json:"force_N"`
	PairForce                     Num     `json:"pair_force_N"`
	// CyclePeakSurface is the hottest surface of the periodic on/off state
	// (calc.Cycle.PeakSurface; null without on-time).
	CyclePeakSurface Num `json:"cycle_peak_surface_C"`
	// SurfaceHottest is the hottest surface where the coil works: the
	// steady surface or the on/off cycle's, over the nominal design and,
	// with a tolerances block, every corner, at the corner named by
	// SurfaceHottestCorner ("nominal" for the nominal design; null without
	// tolerances).
	SurfaceHottest       Num     `json:"surface_temperature_hottest_C"`
	SurfaceHottestCorner *string `json:"surface_temperature_hottest_corner"`
	// SurfaceHandling is the hottest surface where people handle the coil,
	// which the hot-surface caution is judged on (analysis.Handling): at
	// the handling ambient, over the nominal design and every corner of the
	// tolerances (the ambient line, if any, held at the handling ambient
	// unless people touch the coil where it works), at the corner named by
	// SurfaceHandlingCorner (null without tolerances).
	SurfaceHandling       Num     `json:"surface_temperature_handling_C"`
	SurfaceHandlingCorner *string `json:"surface_temperature_handling_corner"`
}

func coilHeatSwitch(co calc.Coil, cr calc.CoilResult) CoilHeatSwitch {
	h, s, a := cr.Heat, cr.Switch, cr.AC
	pair := math.NaN()
	if co.Form == calc.Pair {
		pair = cr.PairForce
	}
	return CoilHeatSwitch{
		SurfaceTemperature: Num(format.Celsius(h.Steady.Surface)), MeanTemperature: Num(format.Celsius(h.Steady.Mean)),
		TimeToLimit: Num(h.TimeToLimit), CyclePeak: Num(format.Celsius(h.Cycle.PeakHot)), CycleTrough: Num(format.Celsius(h.Cycle.Trough)),
		CyclePeakSurface: Num(format.Celsius(h.Cycle.PeakSurface)), SurfaceHottest: Num(math.NaN()),
		MomentCold: Num(h.ColdMoment), HeatCapacity: Num(h.HeatCapacity),
		TimeConstant: Num(s.TimeConstant), RiseTime: Num(s.RiseTime), Energy: Num(s.Energy),
		SwitchOffVoltage: Num(s.Spike), SwitchOffVoltageWorst: Num(s.SpikeWorst), SwitchOffCapacitanceLimit: Num(math.NaN()), SuppressionR: Num(s.ResistorMax), SuppressionE12: Num(s.Resistor),
		SwitchVoltageSuppressed: Num(s.SwitchVoltage), SuppressionCorners: Num(math.NaN()), SwitchVoltageSuppressedWorst: Num(math.NaN()),
		SkinDepth: Num(a.SkinDepth), Impedance: Num(a.Impedance), CurrentAC: Num(a.Current),
		Force: Num(cr.GradientForce), PairForce: Num(pair),
	}
}

// Interactions holds the design's coupling keys of the JSON report
// (embedded in Report).
type Interactions struct {
	Couplings     []CouplingReport `json:"couplings"`
	GradientForce Num              `json:"gradient_force_N"`
}

// CouplingReport is the mutual inductance of two coil blocks and the force
// on the second from the first; the mutual inductance is null unless they
// can be computed, force_method says "coaxial" (Maxwell's formula),
// "lorentz" (non-coaxial: Neumann's mutual inductance and the Lorentz
// integral) or "dipole" (far-field
// approximation).
type CouplingReport struct {
	Coils       [2]string `json:"coils"`
	Coaxial     bool      `json:"coaxial"`
	Mutual      Num       `json:"mutual_inductance_H"`
	K           Num       `json:"coupling_coefficient"`
	Force       [3]Num    `json:"force_N"`
	ForceMethod string    `json:"force_method"`
}

func interactions(d calc.Design, r calc.Results) Interactions {
	out := Interactions{Couplings: []CouplingReport{}, GradientForce: Num(r.GradientForce)}
	for _, cp := range r.Couplings {
		m := "dipole"
		switch {
		case cp.Coaxial:
			m = "coaxial"
		case cp.Exact:
			m = "lorentz"
		}
		out.Couplings = append(out.Couplings, CouplingReport{Coils: [2]string{d.Coils[cp.A].Name, d.Coils[cp.B].Name},
			Coaxial: cp.Coaxial, Mutual: Num(cp.Mutual), K: Num(cp.K), Force: vec(cp.Force), ForceMethod: m})
	}
	return out
}

// runaway is the report's thermal runaway: no steady temperature exists,
// or — under current drive, where the heat grows with the resistance
// without the check a voltage drive's falling current gives — none at or
// below the insulation class. A voltage-driven winding that settles above
// its class is not in runaway; above_insulation_class says it is too hot.
func runaway(co calc.Coil, cr calc.CoilResult) bool {
	v := cr.Verdict
	return v.NoSolution || (v.Runaway && co.Drive == calc.CurrentDrive)
}
