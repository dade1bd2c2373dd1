package analysis

import (
	"math"
	"runtime"
	"sync"

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
	// EndFieldCore and EndFieldWinding are the parts of EndField (on the
	// axis both point along it, so EndField is their sum): the core's, of
	// its magnetisation spread along it (the slice model's poles,
	// calc.CorePoleField), and the winding's own. EndFieldTwoPole is what
	// the core's two point poles (calc.CoreTwoPoleField: its pole strength
	// at ± half its pole separation) would give at that point in place of
	// the spread ones, T; NaN where EndField is.
	EndFieldCore, EndFieldWinding, EndFieldTwoPole float64
	// Air is the block's result without its core (the winding alone): the
	// moment, inductance and mass before the core's share is added;
	// AirMass is the conductor's mass (the results' Mass adds the core's).
	AirMoment     calc.Vec
	AirField      calc.Vec // T, the winding's own field at its centre
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
	// ResonanceInductance is the inductance SelfResonance is taken with,
	// H: the winding's, with a core's share where it has one.
	ResonanceInductance float64
	// Capacitance is how the winding's own self-capacitance was found (its
	// formula and figures; without a pick-up coil's load).
	Capacitance calc.CapacitanceParts
	// Temperature is the winding temperature, K, that the a.c. resistance
	// and a pick-up coil's thermal noise are taken at: the steady mean, or
	// 20 °C where the results carry none.
	Temperature float64
	// ACPower is the heating at R_ac of a driven winding at its r.m.s.
	// current, W (NaN without a frequency).
	ACPower float64
	// DCPower is what the same r.m.s. current would dissipate in R(T),
	// the d.c. resistance at the winding temperature, duty-averaged, W:
	// ACPower = F_R · DCPower (NaN without a frequency).
	DCPower float64
}

// RodEndAt is the point at which a cored coil's near field is stated: on
// its axis RodEndPoint core diameters beyond the core's end face (the one
// the axis points to).
func RodEndAt(c calc.Coil) calc.Vec {
	return c.Centre.Add(calc.CoilFrame(c.Axis).U.Scale(c.Core.Length/2 + RodEndPoint*c.Core.Diameter))
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
		k := CoilKinds{AirMoment: cr.Moment, AirField: cr.FieldCentre, AirInductance: cr.Inductance, AirMass: cr.Mass, ACPower: math.NaN(), DCPower: math.NaN(), SelfResonance: math.NaN(), SelfCapacitance: math.NaN(), EndField: math.NaN(),
			EndFieldCore: math.NaN(), EndFieldWinding: math.NaN(), EndFieldTwoPole: math.NaN()}
		L := cr.Inductance
		aEff := w.AreaSum
		if c.Core.Present() {
			core := calc.EvaluateCore(c, w, cr.Current)
			k.Core = &core
			if cr.Current != 0 {
				k.EndField = RodEndField(c, cr, core)
				p := RodEndAt(c)
				k.EndFieldCore = calc.CorePoleField(c, core, p).Norm()
				k.EndFieldWinding = calc.CoilField(c, cr.Winding, cr.Current, p).Norm()
				k.EndFieldTwoPole = calc.CoreTwoPoleField(c, core, p).Norm()
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
		// the winding's mean temperature, at which its resistance (and the
		// heat balance's a.c. factor) is taken
		T := cr.Heat.Steady.Mean
		if math.IsNaN(T) || !(T > 0) {
			T = calc.CelsiusToKelvin(20)
		}
		k.Temperature = T
		k.Capacitance = calc.SelfCapacitanceParts(c, w)
		k.ResonanceInductance = L
		if IsReceiver(c) {
			rec := calc.EvaluateReceiver(c, w, aEff, cr.RHot, L, T)
			k.Receiver = &rec
			k.SelfResonance, k.SelfCapacitance = rec.SelfResonance, rec.Capacitance
			k.AboveResonance = rec.AboveResonance
		} else {
			k.SelfCapacitance = k.Capacitance.Capacitance
			k.SelfResonance = calc.SelfResonance(L, k.SelfCapacitance)
		}
		if c.Frequency > 0 && c.Form != calc.Rectangle && c.Form != calc.Pair {
			ac := calc.ACResistance(c, w, cr.RHot, T, c.Frequency)
			k.AC = &ac
			if !IsReceiver(c) {
				k.AboveResonance = calc.AboveSelfResonance(c.Frequency, k.SelfResonance)
				k.ACPower = cr.Power // the heat balance takes R_ac (calc.OperatingPoint)
				k.DCPower = c.Duty * cr.Current * cr.Current * cr.RHot
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
// moment. The probes, the field at each coil's centre and at the origin get
// the core's pole-model field added.
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
					cr.AC = calc.AC(c, cr.Inductance, cr.RHot*calc.HeatingACFactor(c, cr.Winding, tm), tm, c.Frequency)
					cr.ACBounds = calc.ACBoundsFor(c.Drive, c.Frequency, cr.RHot, cr.AC.Reactance)
				}
			}
			if !math.IsNaN(k.Core.Mass) {
				cr.Mass += k.Core.Mass
			}
			for j, p := range out.Probes {
				out.Probes[j].B = p.B.Add(calc.CorePoleField(c, *k.Core, p.At))
			}
			// The field at the coil's own centre and at the origin: inside
			// or outside the rod, the pole model's (in the rod, μ0 (H + M)).
			if bc := calc.CorePoleField(c, *k.Core, c.Centre); !bc.IsNaN() {
				cr.FieldCentre = cr.FieldCentre.Add(bc)
			}
			if bo := calc.CorePoleField(c, *k.Core, calc.Vec{}); !bo.IsNaN() {
				out.FieldCentre = out.FieldCentre.Add(bo)
			}
		}
		total = total.Add(cr.Moment)
	}
	bg := d.Conditions.BackgroundField
	out.Moment = total
	out.Torque = calc.Torque(total, bg)
	out.TorqueMax = calc.TorqueMax(total, bg)
	out.TorqueAngle = calc.DesignAngle(total, d.Conditions)
	out.TorqueDesign = calc.TorqueAtAngle(total.Norm(), bg.Norm(), out.TorqueAngle)
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
	// at the a.c. peak, as calc.SwitchingFor
	I, Iw, V := calc.ACPeak(c, cr.Current, cr.SwitchOnCurrent, cr.Voltage, cr.RHot*calc.HeatingACFactor(c, cr.Winding, cr.Heat.Steady.Mean), cr.Inductance)
	return calc.SwitchingWorst(cr.Inductance, cr.RHot, rCold, I, Iw, V, c.SwitchOff, c.DriverRating, c.Drive == calc.VoltageDrive)
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

// coreStudy replaces the figures of a cored coil block with current (cs,
// results cr with the core) by the cored ones: the point-dipole distances
// (of the cored moment against the winding's field plus the core's), the
// on-axis profile and the map of |B| of winding and core together (the
// rod's field by its pole model, calc.CorePoleField), the map widened to
// take in the rod's ends (grid nodes along its longer side, 0: MapGrid).
// A pick-up coil (no current) keeps its figures.
func coreStudy(cs *CoilStudy, co calc.Coil, cr *calc.CoilResult, k *calc.CoreResult, grid int) {
	if k == nil || cr.Current == 0 || len(k.Charge) == 0 || co.Form == calc.Rectangle || co.Form == calc.Pair {
		return
	}
	w := cr.Winding
	cr.Dipole = calc.CoredDipoleDistances(co, w, cr.Current, *k)
	src := calc.NewCoilSource(co, w, cr.Current)
	fr := calc.CoilFrame(co.Axis)

	// On the axis: the winding and the rod's poles, as at a probe
	// (coredResults).
	cs.Axis = sampleAxis(co, *cr, math.Max(AxialSize(co), co.Core.Length/2), axisPoints, func(p calc.Vec) calc.Vec {
		return src.At(p).Add(calc.CorePoleField(co, *k, p))
	})

	// The map, over the winding and the rod's ends.
	old := cs.Map
	if old == nil {
		return
	}
	e := cs.Envelope
	xHalf := math.Max(old.XHalf, 1.6*e.R1)
	zHalf := math.Max(old.ZHalf, co.Core.Length/2+0.9*e.R1)
	nx, nz := mapNodes(xHalf, zHalf, grid)
	m := &MapData{Z: SymmetricSpace(zHalf, nz), X: SymmetricSpace(xHalf, nx), XHalf: xHalf, ZHalf: zHalf}
	g := calc.NewCoilSource(co, w, cr.Current).ForMaps().Map(m.X, m.Z)
	m.B = make([]float64, len(m.Z)*len(m.X))
	// The rod is a body of revolution about the axis: its field at −x is
	// that at x with the E1 component reversed, so each column at x ≥ 0 is
	// computed once and serves its mirror image (SymmetricSpace mirrors
	// exactly).
	var wg sync.WaitGroup
	rows := make(chan int)
	for range runtime.GOMAXPROCS(0) {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for ix := range rows {
				jx := nx - 1 - ix // the mirror column
				for iz, z := range m.Z {
					pt := co.Centre.Add(fr.E1.Scale(m.X[ix])).Add(fr.U.Scale(z))
					bc := fr.ToLocal(calc.CorePoleField(co, *k, pt)) // (E1, E2, U) components
					gk := iz*nx + ix
					m.B[ix*len(m.Z)+iz] = math.Hypot(g.BX[gk]+bc[0], g.BZ[gk]+bc[2])
					if jx != ix {
						gj := iz*nx + jx
						m.B[jx*len(m.Z)+iz] = math.Hypot(g.BX[gj]-bc[0], g.BZ[gj]+bc[2])
					}
				}
			}
		}()
	}
	for ix := range m.X {
		if m.X[ix] >= 0 {
			rows <- ix
		}
	}
	close(rows)
	wg.Wait()
	m.setPeak(ownNear(co, *cs), func(x, z float64) bool {
		return math.Abs(x) < co.Core.Diameter/2 && math.Abs(z) < co.Core.Length/2
	})
	cs.Map = m
}
