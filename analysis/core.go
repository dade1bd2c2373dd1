package analysis

import (
	"math"

	"coilmemo/calc"
)

// CoilKinds holds what a cored coil, a pick-up coil and an a.c. winding add
// to a coil block's study; nil pointers where a kind does not apply.
type CoilKinds struct {
	// Core is the core's figures at the operating current (nil: air core).
	Core *calc.CoreResult
	// EndField is |B| of core and winding on the axis RodEndPoint core
	// diameters beyond the core's end, T (NaN without a core or current).
	EndField float64
	// Air is the block's result without its core (the winding alone): the
	// moment, inductance and mass before the core's share is added.
	AirMoment     calc.Vec
	AirInductance float64
	AirMass       float64
	// Receiver is set for a pick-up coil (no drive, a frequency or band).
	Receiver *calc.ReceiverResult
	// AC is the winding's a.c. resistance at its frequency (nil without one).
	AC *calc.ACLoss
	// AboveResonance says the drive or design frequency is at or above the
	// self-resonance (the impedance is not quoted); SelfResonance is the
	// winding's (with its load for a receiver), Hz, NaN when unknown.
	AboveResonance  bool
	SelfResonance   float64
	SelfCapacitance float64 // F, the winding's (with a pick-up coil's load)
	// ACPower is the heating at R_ac of a driven winding at its r.m.s.
	// current, W (NaN without a frequency).
	ACPower float64
}

// IsReceiver says whether coil c is a pick-up coil: no current, no
// voltage, and a frequency or a band.
func IsReceiver(c calc.Coil) bool {
	return c.Current == 0 && c.Voltage == 0 && (c.Frequency > 0 || c.BandHigh > 0)
}

// studyKinds computes the core, receiver and a.c. figures of every coil
// block from the air-core results r (calc.Evaluate).
func studyKinds(d calc.Design, r calc.Results) []CoilKinds { return kindsOf(d, r, false) }

// kindsOf is studyKinds; with cored set, r are results already through
// coredResults, whose inductance includes the core's share (so it is not
// added again); the Air fields are then not the air coil's.
func kindsOf(d calc.Design, r calc.Results, cored bool) []CoilKinds {
	out := make([]CoilKinds, len(d.Coils))
	for i, c := range d.Coils {
		if i >= len(r.Coils) {
			break
		}
		cr := r.Coils[i]
		w := cr.Winding
		k := CoilKinds{AirMoment: cr.Moment, AirInductance: cr.Inductance, AirMass: cr.Mass, ACPower: math.NaN(), SelfResonance: math.NaN(), SelfCapacitance: math.NaN(), EndField: math.NaN()}
		L := cr.Inductance
		aEff := w.AreaSum
		if c.Core.Present() {
			core := calc.EvaluateCore(c, w, cr.Current)
			k.Core = &core
			if cr.Current != 0 {
				k.EndField = RodEndField(c, cr, core)
			}
			if !math.IsNaN(core.InductanceAdded) && !cored {
				L += core.InductanceAdded
				if IsReceiver(c) {
					L = cr.Inductance + core.InductanceAddedInitial
				}
			}
			if !math.IsNaN(core.EffectiveArea) {
				aEff = core.EffectiveArea
			}
		}
		T := cr.Temperature
		if math.IsNaN(T) {
			T = calc.CelsiusToKelvin(20)
		}
		if IsReceiver(c) {
			rec := calc.EvaluateReceiver(c, w, aEff, cr.RHot, L, T)
			k.Receiver = &rec
			k.SelfResonance, k.SelfCapacitance = rec.SelfResonance, rec.Capacitance
			k.AboveResonance = rec.AboveResonance
		} else {
			k.SelfCapacitance = calc.SelfCapacitance(c, w)
			k.SelfResonance = calc.SelfResonance(L, k.SelfCapacitance)
		}
		if c.Frequency > 0 && c.Form != calc.Rectangle && c.Form != calc.Pair {
			ac := calc.ACResistance(c, w, cr.RHot, T, c.Frequency)
			k.AC = &ac
			if !IsReceiver(c) {
				k.AboveResonance = calc.AboveSelfResonance(c.Frequency, k.SelfResonance)
				k.ACPower = ac.Factor * cr.PowerOn * c.Duty
			}
		}
		out[i] = k
	}
	return out
}

// coredResults returns r with the headline figures of each cored coil
// block replaced by the cored ones: the moment (winding plus core), the
// inductance (air-core plus the core's share at the current), the mass
// (conductor plus core), and the totals and torques that follow from the
// moment. Probes outside the cores get the core's pole-model field added.
func coredResults(d calc.Design, r calc.Results, kinds []CoilKinds) calc.Results {
	out := r
	out.Coils = append([]calc.CoilResult(nil), r.Coils...)
	out.Probes = append([]calc.ProbeResult(nil), r.Probes...)
	var total calc.Vec
	for i := range out.Coils {
		cr := &out.Coils[i]
		if k := kinds[i]; k.Core != nil && !math.IsNaN(k.Core.CoreMoment) {
			c := d.Coils[i]
			cr.Moment = calc.CoredMoment(c, cr.Winding, cr.Current, *k.Core)
			added := k.Core.InductanceAdded
			if cr.Current == 0 { // a pick-up coil: the small-signal inductance
				added = k.Core.InductanceAddedInitial
			}
			if !math.IsNaN(added) {
				cr.Inductance += added
				cr.Energy = cr.Inductance * cr.Current * cr.Current / 2
				if cr.RHot > 0 {
					cr.TimeConstant = cr.Inductance / cr.RHot
				}
				cr.Switch = coredSwitching(c, *cr, d.Conditions)
				if c.Frequency > 0 {
					tm := cr.Heat.Steady.Mean
					if !(tm > 0) { // a corner's quick evaluation carries no heat balance
						tm = cr.Temperature
					}
					cr.AC = calc.AC(c, cr.Inductance, cr.RHot, tm, c.Frequency)
					cr.ACBounds = calc.ACBoundsFor(c.Drive, c.Frequency, cr.RHot, cr.AC.Reactance)
				}
			}
			if !math.IsNaN(k.Core.Mass) {
				cr.Mass += k.Core.Mass
			}
			for j, p := range out.Probes {
				out.Probes[j].B = p.B.Add(calc.CorePoleField(c, *k.Core, p.At))
			}
		}
		total = total.Add(cr.Moment)
	}
	bg := d.Conditions.BackgroundField
	out.Moment = total
	out.Torque = calc.Torque(total, bg)
	out.TorqueMax = calc.TorqueMax(total, bg)
	out.TorqueDesign = calc.TorqueAtAngle(total.Norm(), bg.Norm(), d.Conditions.DesignAngle)
	out.GradientForce = calc.GradientForce(total.Norm(), d.Conditions.FieldGradient)
	return out
}

// coredSwitching is the switching of a cored coil block at its cored
// inductance cr.Inductance, sized as calc.Evaluate sizes it (for the worst
// current the switch may open, the winding then cold under voltage drive).
func coredSwitching(c calc.Coil, cr calc.CoilResult, cond calc.Conditions) calc.SwitchResult {
	rCold := cr.RHot
	if c.Drive == calc.VoltageDrive {
		rCold = calc.ResistanceAt(cr.R20, c.Wire.Material.Alpha20, calc.ColdTemperature(cond))
	}
	return calc.SwitchingWorst(cr.Inductance, cr.RHot, rCold, cr.Current, cr.SwitchOnCurrent, cr.Voltage, c.SwitchOff, c.DriverRating, c.Drive == calc.VoltageDrive)
}

// WithCores returns the results r of calc.Evaluate (or of a worst-case
// corner's quick evaluation) of design d with every cored coil block's
// figures replaced by the cored ones (coredResults): what the study's
// limits, the sweep's and the worst case's corners are all judged on.
func WithCores(d calc.Design, r calc.Results) calc.Results {
	for _, c := range d.Coils {
		if c.Core.Present() {
			return coredResults(d, r, studyKinds(d, r))
		}
	}
	return r
}

// kindLimit is LimitValue's case for the limit quantities of cored and
// pick-up coils and a.c. windings; r are cored results (WithCores).
func kindLimit(l calc.Limit, d calc.Design, r calc.Results) (float64, bool) {
	if _, ok := kindQuantities[l.Quantity]; !ok {
		return 0, false
	}
	return KindLimitValue(l, d, kindsOf(d, r, true))
}

// KindLimitValue returns the value, SI, of the limit quantities of cored
// and pick-up coils for limit l (ok false for another quantity): for a
// coil block its own figure; for the design the worst over the coils it
// applies to: the smallest sensitivity and self-resonance, the largest
// flux density, band noise and a.c. resistance. NaN where the quantity does
// not apply to the coil named.
func KindLimitValue(l calc.Limit, d calc.Design, kinds []CoilKinds) (float64, bool) {
	get, ok := kindQuantities[l.Quantity]
	if !ok {
		return 0, false
	}
	on, ci, _ := subjectOf(l, d)
	idx := []int{}
	switch on {
	case OnCoil:
		idx = append(idx, ci)
	case OnDesign:
		for i := range kinds {
			if !math.IsNaN(get(kinds[i])) {
				idx = append(idx, i)
			}
		}
	}
	if len(idx) == 0 {
		return math.NaN(), true
	}
	smallest := l.Quantity == "sensitivity" || l.Quantity == "self-resonance"
	v := math.Inf(-1)
	if smallest {
		v = math.Inf(1)
	}
	for _, i := range idx {
		if i >= len(kinds) {
			return math.NaN(), true
		}
		x := get(kinds[i])
		if math.IsNaN(x) {
			return math.NaN(), true
		}
		if smallest {
			v = math.Min(v, x)
		} else {
			v = math.Max(v, x)
		}
	}
	return v, true
}

var kindQuantities = map[string]func(CoilKinds) float64{
	"core-flux-density": func(k CoilKinds) float64 {
		if k.Core == nil {
			return math.NaN()
		}
		return k.Core.FluxDensityPeak
	},
	"sensitivity": func(k CoilKinds) float64 {
		if k.Receiver == nil {
			return math.NaN()
		}
		return k.Receiver.Sensitivity
	},
	"band-noise": func(k CoilKinds) float64 {
		if k.Receiver == nil {
			return math.NaN()
		}
		return k.Receiver.BandNoiseField
	},
	"self-resonance": func(k CoilKinds) float64 { return k.SelfResonance },
	"resistance-ac": func(k CoilKinds) float64 {
		if k.AC == nil {
			return math.NaN()
		}
		return k.AC.Rac
	},
}
