package calc

import "math"

// HomogeneityTolerance is the relative deviation from the centre field
// that bounds a pair's homogeneous region in CoilResult.
const HomogeneityTolerance = 0.01

// Evaluate computes every result of design d. For each coil block: the
// winding (LayOut), the steady operating point (OperatingPoint: resistance,
// current, voltage, power, temperature, runaway), current density, mass and
// wire length of the block, inductance (CoilInductance), moment
// (MagneticMoment) and its mean-area cross-check, field at its own centre, L/R,
// stored energy, thermal time constant, insulation margin, dipole range and
// the force between a pair's coils and its 1 % homogeneous region.
// Then the totals: field at the origin, total moment, torque in the
// background field (τ = m × B; maximum |m||B|; |m||B| sin θ at the angle
// DesignAngle gives: the stated design angle, else the angle as designed for
// a field given as a vector, else π/2), the field at every probe, and every limit checked
// (see CheckLimits). Unknown quantities are NaN. Evaluate does not panic on
// degenerate input (no coils, no turns, no current, no wire): it returns NaN
// or zero as the case is.
func Evaluate(d Design) Results {
	var res Results
	fm := &FieldModel{}
	for _, c := range d.Coils {
		cr := evaluateCoil(c, d.Conditions)
		res.Coils = append(res.Coils, cr)
		fm.Coils = append(fm.Coils, c)
		fm.Windings = append(fm.Windings, cr.Winding)
		fm.Currents = append(fm.Currents, cr.Current)
		res.Moment = res.Moment.Add(cr.Moment)
	}
	res.FieldCentre = fm.At(Vec{})
	bg := d.Conditions.BackgroundField
	res.Torque = Torque(res.Moment, bg)
	res.TorqueMax = TorqueMax(res.Moment, bg)
	res.TorqueAngle = DesignAngle(res.Moment, d.Conditions)
	res.TorqueDesign = TorqueAtAngle(res.Moment.Norm(), bg.Norm(), res.TorqueAngle)
	for _, p := range d.Probes {
		res.Probes = append(res.Probes, ProbeResult{Name: p.Name, At: p.At, B: fm.At(p.At)})
	}
	var selfL []float64
	for _, cr := range res.Coils {
		selfL = append(selfL, cr.Inductance)
	}
	res.Couplings = Couplings(fm.Coils, fm.Windings, fm.Currents, selfL)
	res.GradientForce = GradientForce(res.Moment.Norm(), d.Conditions.FieldGradient)
	return res
}

// evaluateCoil computes the CoilResult of one coil block.
func evaluateCoil(c Coil, cond Conditions) CoilResult {
	w := LayOut(c)
	op := OperatingPoint(c, w, cond)
	n := float64(SeriesCoils(c))
	cr := CoilResult{
		Name:        c.Name,
		Winding:     w,
		R20:         op.R20,
		RHot:        op.RHot,
		Current:     op.Current,
		Voltage:     op.Voltage,
		Power:       op.Power,
		PowerOn:     op.PowerOn,
		Duty:        op.Thermal.Duty,
		Mass:        w.Mass * n,
		Length:      w.WireLength * n,
		Temperature: op.Temperature,
		Runaway:     op.Runaway,
		ColdCurrent: op.ColdCurrent,
	}
	area := ConductorArea(c.Wire.Bare)
	cr.Density = math.NaN()
	if area > 0 {
		cr.Density = op.Current / area
	}
	cr.Inductance = coilInductance(c, w)
	cr.Moment = MagneticMoment(c, w, op.Current)
	cr.MomentMeanArea = MomentMeanArea(c, op.Current)
	cr.FieldCentre = CoilField(c, w, op.Current, c.Centre)
	cr.TimeConstant = cr.Inductance / op.RHot
	if op.RHot == 0 {
		cr.TimeConstant = math.NaN()
	}
	cr.Energy = cr.Inductance * op.Current * op.Current / 2
	cr.Heat = Heating(c, w, op)
	cr.ThermalTau = op.Thermal.ThermalTimeConstant(cr.Heat.HeatCapacity, op.State.Mean)
	cr.Verdict = op.Verdict
	cr.SteadyHotSpot = op.State.HotSpot
	if cy := cr.Heat.Cycle; c.OnTime > 0 && cy.On > 0 && (cy.Settled || cy.NoSolution) {
		// An on/off cycle of stated on-time: its peak is the hottest state.
		// The cycle swings about the duty-averaged steady state, which it
		// approaches for periods short against every time constant, so its
		// peak lies at or above that state's hot spot; where the lumped
		// model puts it a little below (the convexity of the losses), the
		// steady hot spot is kept.
		cr.Temperature = cy.PeakHot
		if cy.Settled && op.State.Settled {
			cr.Temperature = math.Max(cy.PeakHot, op.State.HotSpot)
		}
		cr.Verdict = Judge(ThermalLimit(c), cr.Temperature, cy.Settled, cy.NoSolution).WithMelting(c.Wire.Material, cr.Temperature)
		cr.Runaway = cr.Verdict.Runaway
	}
	cr.VoltagePeak = cr.Voltage
	if cy := cr.Heat.Cycle; c.Drive == CurrentDrive && !(c.Frequency > 0) && c.OnTime > 0 && cy.Settled && cy.PeakMean > op.State.Mean {
		cr.VoltagePeak = math.Abs(op.Current) * ResistanceAt(op.R20, op.Thermal.Alpha20, cy.PeakMean)
	}
	cr.SwitchOnCurrent = op.SwitchOnCurrent
	sw := op
	sw.Voltage = math.Max(op.Voltage, cr.VoltagePeak) // the source's compliance at its highest
	cr.Switch = SwitchingFor(c, cond, cr.Inductance, sw)
	cr.Reactance = op.Reactance
	cr.ACBounds = ACBoundsFor(c.Drive, c.Frequency, op.RHot, 2*math.Pi*c.Frequency*cr.Inductance)
	// the impedance takes R_ac, the resistance the heat balance and a
	// voltage drive's current were solved at (OperatingPoint)
	cr.AC = AC(c, cr.Inductance, op.RHot*op.Thermal.acFactor(), op.State.Mean, c.Frequency)
	cr.GradientForce = GradientForce(cr.Moment.Norm(), cond.FieldGradient)
	cr.InsulationMargin = math.NaN()
	if c.InsulationClass > 0 {
		cr.InsulationMargin = c.InsulationClass - cr.Temperature
	}
	cr.Dipole = dipoleDistances(c, w, op.Current)
	cr.Pair = AnalysePair(c, w, op.Current)
	cr.PairForce = PairForce(c, w, op.Current)
	cr.HomogeneityAxial, cr.HomogeneityRadial = math.NaN(), math.NaN()
	if c.Form == Pair {
		cr.HomogeneityAxial, cr.HomogeneityRadial = cr.Pair.Axial1, cr.Pair.Radial1
	}
	return cr
}

// SwitchingFor returns the switching figures of coil block c of
// inductance L at its operating point op: SwitchingWorst with the worst
// current the switch may open the switch-on current (for a voltage drive
// the cold one, the winding then at the cold resistance).
//
// An a.c. drive (a frequency, r.m.s. current and voltage) may be
// interrupted at the peak of its sine: the currents are then √2 times
// the r.m.s. ones, and the supply is the drive's peak voltage √2·I·|Z|,
// |Z| = √(R_ac² + (2πfL)²) (√2 times the stated voltage under voltage
// drive), so the stored energy ½ L I_pk² and the spike L·I_pk/t_off are
// the worst the switch can meet.
func SwitchingFor(c Coil, cond Conditions, L float64, op Operating) SwitchResult {
	Rcold := ResistanceAt(op.R20, op.Thermal.Alpha20, ColdTemperature(cond))
	if c.Drive == CurrentDrive {
		Rcold = op.RHot
	}
	I, Iw, V := ACPeak(c, op.Current, op.SwitchOnCurrent, op.Voltage, op.RHot*op.Thermal.acFactor(), L)
	return SwitchingWorst(L, op.RHot, Rcold, I, Iw, V, c.SwitchOff, c.DriverRating, c.Drive == VoltageDrive)
}

// ACPeak returns the currents I, Iw (A) and supply V (V) a switch meets
// when it opens coil block c at the peak of an a.c. drive: √2 times the
// r.m.s. currents, and the drive's peak voltage, √2 times the stated one
// under voltage drive or I_pk·|Z|, |Z| = √(R_ac² + (2πfL)²), under
// current drive (R_ac Ω, L H). Without a frequency they are returned as
// given (d.c.).
func ACPeak(c Coil, I, Iw, V, rac, L float64) (float64, float64, float64) {
	if !(c.Frequency > 0) || math.IsInf(c.Frequency, 0) {
		return I, Iw, V
	}
	I, Iw = math.Sqrt2*I, math.Sqrt2*Iw
	if c.Drive == VoltageDrive {
		return I, Iw, math.Sqrt2 * c.Voltage
	}
	return I, Iw, I * math.Hypot(rac, 2*math.Pi*c.Frequency*L)
}
