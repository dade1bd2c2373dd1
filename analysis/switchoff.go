package analysis

import (
	"math"

	"coilmemo/calc"
)

// SwitchOffParts is the unsuppressed switch-off spike of a driven coil
// block at the largest current the switch may open (calc.SwitchResult's
// WorstCurrent, or the operating current where that is larger), bounded
// two ways: by how fast the switch opens, the ramp estimate L·I/t_off on
// top of the supply (calc.SwitchOffSpike), and, however fast it opens, by
// the winding's self-capacitance taking up the stored energy, I·√(L/C_s)
// on top of the supply (calc.RingingPeak). The smaller governs. NaN where
// a figure is unknown (no current, no inductance, a form whose
// self-capacitance is not modelled).
type SwitchOffParts struct {
	// Current is the current the switch opens, A, and Capacitance the
	// winding's self-capacitance C_s, F (CoilKinds.SelfCapacitance).
	Current, Capacitance float64
	// Ringing is the capacitance-limited peak across the winding,
	// I √(L/C_s), V, and RingingSwitch the switch's, Supply + Ringing.
	Ringing, RingingSwitch float64
	// Crossover is √(L C_s), s: a switch that opens faster is held to
	// RingingSwitch (calc.RingingCrossover).
	Crossover float64
	// SwitchOff is the switch-off time the ramp is taken at, s: the stated
	// one, or AssumedSwitchOff when none is stated (Assumed).
	SwitchOff float64
	Assumed   bool
	// Ramp is L I/t_off + Supply at SwitchOff, V (switchVoltage).
	Ramp float64
	// Peak is the spike across the switch the memo and the safety finding
	// quote, V: the smaller of Ramp and RingingSwitch, Ramp where the
	// capacitance is unknown; Bounded says the capacitance governs
	// (RingingSwitch < Ramp).
	Peak    float64
	Bounded bool
}

// switchOffParts is the SwitchOffParts of coil block c with (cored)
// results cr and winding self-capacitance cs, F.
func switchOffParts(c calc.Coil, cr calc.CoilResult, cs float64) SwitchOffParts {
	n := math.NaN()
	s := cr.Switch
	p := SwitchOffParts{Current: n, Capacitance: n, Ringing: n, RingingSwitch: n, Crossover: n, SwitchOff: s.SwitchOff, Ramp: n, Peak: n}
	I := math.Max(math.Abs(cr.Current), math.Abs(s.WorstCurrent))
	if !(I > 0) || math.IsNaN(cr.Inductance) {
		return p
	}
	p.Current, p.Capacitance = I, cs
	if !(p.SwitchOff > 0) {
		p.SwitchOff, p.Assumed = AssumedSwitchOff, true
	}
	p.Ramp = switchVoltage(cr)
	p.Ringing = calc.RingingPeak(cr.Inductance, cs, I)
	p.RingingSwitch = s.Supply + p.Ringing
	p.Crossover = calc.RingingCrossover(cr.Inductance, cs)
	p.Peak = p.Ramp
	if p.RingingSwitch < p.Ramp {
		p.Peak, p.Bounded = p.RingingSwitch, true
	}
	return p
}

// SwitchOffAt is what the switch of one coil block opens at one corner of
// the tolerances: the supply, V, and the largest current, A
// (calc.SwitchResult's Supply and WorstCurrent there).
type SwitchOffAt struct{ Supply, Current float64 }

// Suppression is the series resistor of a coil block's resistor–diode
// suppression sized over its tolerances. The switch sees V_s + I_w·R_s
// when it opens the largest current I_w (calc.SwitchResult), and both V_s
// and I_w move from corner to corner — a cold corner's winding draws more
// current —, so the resistor fitted is the E12 value at or below the
// smallest (V_max − V_s)/I_w over the nominal design and every corner,
// V_max the nominal design's clamp (the driver rating, or twice the stated
// supply). The switch voltage with it is then within V_max at every
// corner (up to the monotonicity the corners assume).
type Suppression struct {
	// ResistorMax is that smallest largest resistor, Ω, reached at
	// MaxCorner (an index into WorstCase.Corners, −1: the nominal design).
	ResistorMax float64
	MaxCorner   int
	// MaxAt is what the switch opens at MaxCorner.
	MaxAt SwitchOffAt
	// Nominal is the E12 value the nominal design alone fits (at or below
	// its own largest resistor), Ω, and NominalWorst the largest switch
	// voltage it would give over the corners, V, at NominalCorner.
	Nominal, NominalWorst float64
	NominalCorner         int
	// Resistor is the E12 value fitted, at or below ResistorMax, Ω; NaN
	// when some corner leaves no room above its supply (a bare
	// freewheeling diode then).
	Resistor float64
	// SwitchVoltage is the largest V_s + I_w·R_s with Resistor (V_s alone
	// without one) over the nominal design and the corners, V, at Corner,
	// where the switch opens Current, A, from Supply, V.
	SwitchVoltage, Current, Supply float64
	Corner                         int
	// Clamp is V_max, V, ClampFromRating says it is the driver rating,
	// and Margin is Clamp − SwitchVoltage, V; Within says SwitchVoltage ≤
	// Clamp.
	Clamp           float64
	ClampFromRating bool
	Margin          float64
	Within          bool
	// CornerMax is each corner's largest resistor, (Clamp − V_s)/I_w, Ω,
	// against the nominal design's Clamp (the driver's limit does not move
	// with the supply's tolerance).
	CornerMax []float64
}

// suppressionOver sizes coil block k's series resistor over the nominal
// switching s and the corners' (Corner.SwitchOff); nil where the nominal
// design sizes no resistor.
func suppressionOver(k int, s calc.SwitchResult, corners []Corner) *Suppression {
	if math.IsNaN(s.Resistor) || !(s.Clamp > 0) {
		return nil
	}
	p := &Suppression{ResistorMax: s.ResistorMax, MaxCorner: -1, Nominal: s.Resistor, NominalCorner: -1, Corner: -1,
		Clamp: s.Clamp, ClampFromRating: s.ClampFromRating}
	at := func(h int) SwitchOffAt {
		if h < 0 {
			return SwitchOffAt{s.Supply, s.WorstCurrent}
		}
		return corners[h].SwitchOff[k]
	}
	p.CornerMax = make([]float64, len(corners))
	for h := range corners {
		a := at(h)
		m := (s.Clamp - a.Supply) / a.Current
		p.CornerMax[h] = m
		if m < p.ResistorMax || math.IsNaN(m) {
			p.ResistorMax, p.MaxCorner = m, h
		}
	}
	p.MaxAt = at(p.MaxCorner)
	p.Resistor = calc.E12AtOrBelow(p.ResistorMax)
	voltage := func(a SwitchOffAt, rs float64) float64 {
		if math.IsNaN(rs) {
			return a.Supply
		}
		return a.Supply + a.Current*rs
	}
	p.NominalWorst, p.SwitchVoltage = voltage(at(-1), p.Nominal), voltage(at(-1), p.Resistor)
	for h := range corners {
		if v := voltage(at(h), p.Nominal); v > p.NominalWorst {
			p.NominalWorst, p.NominalCorner = v, h
		}
		if v := voltage(at(h), p.Resistor); v > p.SwitchVoltage {
			p.SwitchVoltage, p.Corner = v, h
		}
	}
	a := at(p.Corner)
	p.Current, p.Supply = a.Current, a.Supply
	p.Margin = p.Clamp - p.SwitchVoltage
	p.Within = p.SwitchVoltage <= p.Clamp
	return p
}

// fitSuppression sizes every coil block's series resistor over the
// corners (Suppression, kept in the coil studies) and fits it in the
// switching of the results coils — the nominal design's, and the derived
// corner's —, so the memo and the report give the switch voltage, decay
// and energy with the resistor that holds at every corner. Nothing
// happens without a worst case.
func (wc *WorstCase) fitSuppression(coils []calc.CoilResult, studies []CoilStudy) {
	if wc == nil {
		return
	}
	wc.Suppression = make([]*Suppression, len(coils))
	for k := range coils {
		wc.Suppression[k] = suppressionOver(k, coils[k].Switch, wc.Corners)
		if k < len(studies) {
			studies[k].Suppression = wc.Suppression[k]
		}
	}
	wc.fitted(coils)
}

// fitted puts the resistors sized over the corners into the switching of
// coils.
func (wc *WorstCase) fitted(coils []calc.CoilResult) {
	for k, p := range wc.Suppression {
		if p != nil && k < len(coils) {
			cr := &coils[k]
			cr.Switch = cr.Switch.WithResistor(cr.Inductance, cr.RHot, p.Resistor)
		}
	}
}
