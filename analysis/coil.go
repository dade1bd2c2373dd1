package analysis

import (
	"math"

	"coilmemo/calc"
)

// CoilStudy is what the memo shows of one coil block beyond its
// calc.CoilResult: the geometry as laid out, the field as data, and the
// intermediate values of its derivations.
type CoilStudy struct {
	// Outer is the wire's outer diameter as used (the bare diameter when
	// no outer diameter is known), m.
	Outer float64
	// Bundle is the diameter of the round bundle of all turns,
	// hexagonally packed, m: the section of a thin coil or a rectangle.
	Bundle float64
	// Envelope is the winding's cross-section in its own frame, and
	// Placements the axial positions of the block's coils (two for a pair).
	Envelope   calc.Envelope
	Placements []float64
	// Laid is the cross-section the turns occupy as laid
	// (calc.LaidEnvelope): the Envelope, or its inner part when the turns
	// do not fill the stated radial build. Underfilled says they fill
	// less than UnderfillShare of it; LaidFill is the fill factor over
	// the laid section (the conductor's share of Laid's area; NaN for a
	// thin coil).
	Laid        calc.Envelope
	Underfilled bool
	LaidFill    float64
	// Depth is the winding's radial depth as laid out: the radial build,
	// the bundle of a thin coil, or one wire of a single layer, m.
	Depth float64
	// ConductorArea is the bare wire's cross-section, m².
	ConductorArea float64
	// Series is the number of coils in series in the block (2 for a pair).
	Series int
	// MeanRadius is the turn-weighted mean radius of the winding as laid
	// out, m (0 without turns).
	MeanRadius float64
	// MeanSquareRadius is the turn-weighted mean of the squared radius,
	// m²: Σπrᵢ² = N π ⟨r²⟩ (NaN without turns).
	MeanSquareRadius float64
	// CentreSum is Σ rᵢ²/(2 (rᵢ² + zᵢ²)^{3/2}) over every turn filament of
	// the block (both coils of a pair) at the block's own centre, m⁻¹: the
	// on-axis field there per μ0 I, with the senses of the currents (0
	// for a rectangle, whose turns are not circles).
	CentreSum float64

	Axis       AxisProfile
	Map        *MapData    // nil when the coil has no extent to map
	Pair       *PairCurves // nil unless a pair with a centre field or gradient
	Inductance InductanceParts
	Heat       HeatParts
	Kinds      CoilKinds // core, pick-up and a.c. figures (analysis/core.go)
	// SwitchOff is the unsuppressed switch-off spike of a driven coil
	// block, bounded by the switch's speed and by the winding's
	// self-capacitance (analysis/switchoff.go).
	SwitchOff SwitchOffParts
	// Suppression is the series resistor of the suggested suppression
	// sized over the tolerances' corners; nil without a tolerances block
	// or where no resistor is sized (analysis/switchoff.go).
	Suppression *Suppression
}

// StudyCoil is the CoilStudy of coil block co with results cr in the
// given conditions.
func StudyCoil(co calc.Coil, cr calc.CoilResult, cond calc.Conditions) CoilStudy {
	return studyCoil(co, cr, cond, nil, 0)
}

// studyCoil is StudyCoil taking the map from maps when an identical
// winding with the same current was mapped on the same grid before (nil:
// always computed), with its map's node count along the longer side
// (0: MapGrid; see Options.MapNodes).
func studyCoil(co calc.Coil, cr calc.CoilResult, cond calc.Conditions, maps mapCache, grid int) CoilStudy {
	w := cr.Winding
	cs := CoilStudy{Outer: calc.WireOuter(co), Series: calc.SeriesCoils(co), ConductorArea: calc.ConductorArea(co.Wire.Bare)}
	cs.Bundle = calc.BundleDiameter(cs.Outer, co.Turns)
	cs.MeanRadius = w.MeanTurnRadius()
	cs.MeanSquareRadius = math.NaN()
	if n := w.TurnCount(); n > 0 {
		cs.MeanSquareRadius = w.AreaSum / (math.Pi * float64(n))
	}
	cs.CentreSum = centreSum(co, w)
	cs.Envelope = calc.WindingEnvelope(co, w)
	cs.Laid = calc.LaidEnvelope(co, w)
	cs.LaidFill = math.NaN()
	if a := (cs.Laid.R1 - cs.Laid.R0) * (cs.Laid.Z1 - cs.Laid.Z0); !w.Thin && a > 0 {
		cs.LaidFill = float64(w.TurnCount()) * cs.ConductorArea / a
	}
	cs.Underfilled = co.RadialBuild > 0 && !w.Thin && cs.Laid.R1-cs.Laid.R0 < UnderfillShare*(cs.Envelope.R1-cs.Envelope.R0)
	cs.Placements = calc.Placements(co)
	cs.Depth = co.RadialBuild
	if cs.Depth == 0 {
		cs.Depth = co.Wire.Outer
		if co.Length == 0 {
			cs.Depth = cs.Bundle
		}
	}
	cs.Axis = profileOnAxis(co, cr, axisPoints)
	cs.Map = maps.coilMap(co, cr, cs, grid)
	cs.Pair = pairCurves(co, cr)
	cs.Inductance = inductanceParts(co, cr, cs.Outer, cs.MeanRadius, cs.Laid.R1-cs.Laid.R0)
	cs.Heat = heatParts(co, cr, cond, cs.Outer)
	return cs
}

// UnderfillShare is the share of the stated radial build below which a
// multilayer winding's turns count as not filling it.
const UnderfillShare = 0.95

// InductanceParts are the intermediate values of a coil block's
// self-inductance derivation. L1 is the self-inductance of one coil (the
// block's for all forms but a pair) and M the mutual inductance of a
// pair's two coils (L = 2 L1 ± 2 M). The single-layer terms are set for a
// single-layer solenoid and NaN otherwise; BundleRadius for a thin coil.
type InductanceParts struct {
	L1, M float64
	// Thin coil and rectangle: the bundle's radius, m.
	BundleRadius float64
	// Rectangle: the inductance of a single turn on the bundle's radius,
	// H (L = N² Turn).
	Turn float64
	// Multilayer: the turns' own inductances summed (the i = j terms of
	// the double sum), H; the pairs of distinct turns give L1 − SelfTerms.
	SelfTerms float64
	// Pair: the mutual inductance of a turn of one coil and a turn of the
	// other, the mean over the N² pairs of turns (M = N² MeanMutual), H;
	// and the rate of change of M with the spacing, ∂M/∂s, H/m, from the
	// force between the coils (F = I₁ I₂ ∂M/∂s).
	MeanMutual, Slope float64
	// Single layer: the elliptic parameter m = k² of the current sheet,
	// Nagaoka's coefficient, the sheet's inductance, Rosa's corrections A
	// and B, and Wheeler's formula as the cross-check.
	K2, Nagaoka, Sheet, RosaA, RosaB, Wheeler float64
	// Multilayer: whether the turns were grouped into cells, and
	// Wheeler's multilayer formula (NaN outside its range), on the
	// winding as laid: the turns' mean radius WheelerRadius and the depth
	// of their layers WheelerBuild, m (the stated ones when the turns fill
	// the stated build).
	WheelerRadius, WheelerBuild float64
	ByCells                     bool
	WheelerMultilayer           float64
}

// inductanceParts takes the turns' mean radius and the depth of their
// layers as laid, m, for the multilayer cross-check.
func inductanceParts(co calc.Coil, cr calc.CoilResult, outer, laidRadius, laidBuild float64) InductanceParts {
	n := math.NaN()
	ip := InductanceParts{L1: cr.Inductance, K2: n, Nagaoka: n, Sheet: n, RosaA: n, RosaB: n, Wheeler: n,
		BundleRadius: n, WheelerMultilayer: n, WheelerRadius: n, WheelerBuild: n, Turn: n, SelfTerms: n, MeanMutual: n, Slope: n}
	w := cr.Winding
	if math.IsNaN(cr.Inductance) || w.TurnCount() == 0 {
		return ip
	}
	if co.Form == calc.Pair {
		one := co
		one.Form = calc.Solenoid
		if w.Thin {
			one.Form = calc.Loop
		}
		ip.L1 = calc.CoilInductance(one, w)
		ip.M = (cr.Inductance - 2*ip.L1) / 2
		if co.Opposing {
			ip.M = -ip.M
		}
		if n := w.TurnCount(); n > 0 {
			ip.MeanMutual = ip.M / (float64(n) * float64(n))
		}
		if I := cr.Current; I != 0 && !math.IsNaN(cr.PairForce) {
			I2 := I
			if co.Opposing {
				I2 = -I
			}
			ip.Slope = cr.PairForce / (I * I2)
		}
	}
	a, l, N := co.MeanDiameter/2, co.Length, co.Turns
	switch {
	case co.Form == calc.Rectangle:
		ip.BundleRadius = calc.BundleDiameter(outer, w.TurnCount()) / 2
		ip.Turn = calc.RectangleInductance(co.Width, co.Height, ip.BundleRadius, 1)
	case w.Thin:
		ip.BundleRadius = calc.BundleDiameter(outer, N) / 2
	case w.LayerCount <= 1 && co.RadialBuild <= 0:
		ip.K2 = 4 * a * a / (4*a*a + l*l)
		ip.Nagaoka = calc.NagaokaCoefficient(a, l)
		ip.Sheet = calc.SolenoidInductance(a, l, N)
		ip.RosaA = calc.RosaA(l/float64(N), co.Wire.Bare)
		ip.RosaB = calc.RosaB(N)
		ip.Wheeler = calc.WheelerInductance(a, l, N)
	default:
		ip.ByCells = calc.MultilayerByCells(w)
		ip.SelfTerms = 0
		for _, ly := range w.Layers {
			ip.SelfTerms += float64(len(ly.Z)) * calc.TurnSelfInductance(ly.Radius, co.Wire.Bare/2)
		}
		// on the turns as laid: a winding that does not fill its stated
		// build sits nearer the bore and is shallower than stated
		ip.WheelerRadius, ip.WheelerBuild = a, co.RadialBuild
		if laidRadius > 0 && laidBuild > 0 {
			ip.WheelerRadius, ip.WheelerBuild = laidRadius, laidBuild
		}
		ip.WheelerMultilayer = calc.WheelerMultilayerInductance(ip.WheelerRadius, l, ip.WheelerBuild, N)
	}
	return ip
}

// centreSum is CoilStudy.CentreSum of coil block co with winding w.
func centreSum(co calc.Coil, w calc.Winding) float64 {
	if co.Form == calc.Rectangle {
		return 0
	}
	sum := 0.0
	for k, z0 := range calc.Placements(co) {
		sense := 1.0
		if k == 1 && co.Opposing {
			sense = -1
		}
		for _, ly := range w.Layers {
			for _, z := range ly.Z {
				sum += sense * calc.LoopFieldOnAxis(ly.Radius, 1, z0+z) / calc.Mu0
			}
		}
	}
	return sum
}

// HeatParts are the intermediate values of a coil block's heat balance
// that the derivation shows, and the states the cautions need.
type HeatParts struct {
	// RiseInner, RiseOuter and RiseLength are the geometry of the
	// conduction rise inside the winding (calc.RiseGeometry: the section
	// the turns occupy), m.
	RiseInner, RiseOuter, RiseLength float64
	// EndsCooled says the rise is the two-dimensional conduction of
	// calc.SectionRise (a multilayer winding cooled through its outer
	// cylinder and both end faces; calc.RiseEndsCooled), else the radial
	// conduction of calc.AnnulusRise.
	EndsCooled bool
	// RadialMax is the rise, K, of the hottest point above the surface
	// that radial conduction alone (calc.AnnulusRise, bore and ends
	// adiabatic) would give at the steady power: the long-winding limit
	// the memo compares with (NaN without a steady state).
	RadialMax float64
	// SeriesMax and SeriesMean are the sums, m², of calc.SectionRise's
	// series at the steady state: ΔT_max = (q/k)(ℓ²/8 − SeriesMax) and
	// ΔT_mean = (q/k)(ℓ²/12 − SeriesMean) (NaN unless EndsCooled).
	SeriesMax, SeriesMean float64
	// ShedInner, ShedOuter and ShedLength are the winding's outline as
	// stated (calc.WindingEnvelope), whose surface sheds the heat
	// (calc.Winding.SurfaceArea), m; a winding that does not fill its
	// stated build occupies less than this (RiseOuter < ShedOuter).
	ShedInner, ShedOuter, ShedLength float64
	// BundleDiameter is a thin coil's heat-shedding tube diameter, m.
	BundleDiameter float64
	// AxisVertical says the coil's axis counts as vertical for natural
	// convection (calc.AxisIsVertical: its own axis against the stated
	// upward direction, else the design-wide orientation).
	AxisVertical bool
	// AirViscosity (m²/s), AirConductivity (W/(m·K)) and AirPrandtl are
	// the air's properties at the film temperature (NaN without
	// convection).
	AirViscosity, AirConductivity, AirPrandtl float64
	// H is the convective coefficient at the steady surface temperature,
	// W/(m²·K).
	H float64
	// Continuous is the steady state energised continuously (duty 1);
	// equal to the steady state when the coil has no duty cycle.
	Continuous calc.ThermalState
	// ContinuousTau is the thermal time constant at that state, s (NaN
	// when it does not settle).
	ContinuousTau float64
	// LossSlope is d(Q_out − P̄)/dT at the steady state, the slope of the
	// linearised heat balance that gives the thermal time constant
	// (τ = C/LossSlope), W/K (NaN without a time constant).
	LossSlope float64
	// SurfaceMax is the hottest surface temperature: the steady one or at
	// the end of an on period of the duty cycle, K.
	SurfaceMax float64
	// WarmUp is the warm-up from cold, energised continuously and on the
	// duty cycle (nil when there is no heat capacity to warm).
	WarmUp *WarmUp
	// FormerSource names where the former material's data come from ("" when
	// none is used).
	FormerSource string
	// CoreMass (kg), CoreSpecificHeat (J/(kg·K)) and CoreHeatCapacity
	// (J/K) are a cored coil's rod as lumped with the winding in the
	// heat capacity (calc.CoreHeatCapacity; zeros without a core or a
	// core density); CoreSpecificHeatSource names where the specific heat
	// comes from ("" when stated). CoreLeftOut says a core is present but
	// left out, its density not being given.
	CoreMass, CoreSpecificHeat, CoreHeatCapacity float64
	CoreSpecificHeatSource                       string
	CoreLeftOut                                  bool
}

// WarmUp is the hottest winding temperature against time from cold, K.
type WarmUp struct {
	T, Hot           []float64 // energised continuously
	CycleT, CycleHot []float64 // on the duty cycle; nil when none or too many periods to draw
	// CycleReached reports that the cycle drawn runs on past the time it
	// takes to reach its periodic state (calc.Cycle.Periods).
	CycleReached bool
	End          float64 // s, the time plotted
}

// warmUpPeriodsMax is the most on/off periods a warm-up curve is drawn over.
const warmUpPeriodsMax = 150

func heatParts(co calc.Coil, cr calc.CoilResult, cond calc.Conditions, outer float64) HeatParts {
	n := math.NaN()
	h := cr.Heat
	tp := h.Problem
	st := h.Steady
	hp := HeatParts{AirViscosity: n, AirConductivity: n, AirPrandtl: n, H: n, ContinuousTau: n, LossSlope: n}
	w := cr.Winding
	hp.RiseInner, hp.RiseOuter, hp.RiseLength = calc.RiseGeometry(co, w)
	hp.EndsCooled = calc.RiseEndsCooled(co, w)
	hp.RadialMax, hp.SeriesMax, hp.SeriesMean = n, n, n
	if st.Settled {
		ri, ro, l := hp.RiseInner, hp.RiseOuter, hp.RiseLength
		k := h.Conductivity
		pc := st.Power / float64(calc.SeriesCoils(co)) // one coil's share
		_, radial := calc.AnnulusRise(ri, ro, l, k)
		hp.RadialMax = radial * pc
		if hp.EndsCooled {
			// k/q times the rises per watt: ℓ²/8 − S and ℓ²/12 − S̄.
			mean, max := calc.SectionRise(ri, ro, l, k)
			vk := math.Pi * (ro*ro - ri*ri) * l * k
			hp.SeriesMax, hp.SeriesMean = l*l/8-max*vk, l*l/12-mean*vk
		}
	}
	e := calc.WindingEnvelope(co, w)
	hp.ShedInner, hp.ShedOuter, hp.ShedLength = math.Max(e.R0, 0), e.R1, e.Z1-e.Z0
	hp.AxisVertical = calc.AxisIsVertical(co, cond)
	if w.Thin {
		hp.BundleDiameter = calc.BundleDiameter(outer, w.TurnCount())
	}
	if st.Settled && tp.Convection != nil {
		hp.AirViscosity, hp.AirConductivity, hp.AirPrandtl, _ = calc.AirProperties(st.Convection.Film)
	}
	if st.Settled {
		hp.H = tp.ConvectionCoefficient(st.Surface)
	}
	on := tp
	on.Duty = 1
	hp.Continuous = st
	if tp.Duty != 1 {
		hp.Continuous = on.Steady()
	}
	C := h.HeatCapacity
	if tau := cr.ThermalTau; tau > 0 && C > 0 {
		hp.LossSlope = C / tau // calc.ThermalProblem.ThermalTimeConstant: τ = C / slope
	}
	if hp.Continuous.Settled && C > 0 {
		hp.ContinuousTau = on.ThermalTimeConstant(C, hp.Continuous.Mean)
	}
	hp.SurfaceMax = surfaceMax(h)
	if m, ok := calc.FormerMaterialByName(co.Former.Material); ok && co.Former.HeatCapacity <= 0 && co.Former.Mass > 0 {
		hp.FormerSource = m.Source
	}
	if k := co.Core; k.Present() {
		hp.CoreMass, hp.CoreHeatCapacity, hp.CoreLeftOut = k.Mass(), calc.CoreHeatCapacity(co), !(k.Mass() > 0)
		if hp.CoreMass > 0 {
			hp.CoreSpecificHeat = k.SpecificHeatUsed()
			if !(k.SpecificHeat > 0) {
				hp.CoreSpecificHeatSource = calc.CoreSpecificHeatSource
			}
		}
	}
	hp.WarmUp = warmUp(co, h, on, hp.Continuous, hp.ContinuousTau)
	return hp
}

// warmUp integrates the warm-up from cold over a span that shows what
// matters: five thermal time constants, past the time the insulation
// class is reached, and for a duty cycle drawn one period past the time
// it takes to reach its periodic state.
func warmUp(co calc.Coil, h calc.HeatResult, on calc.ThermalProblem, steady calc.ThermalState, tau float64) *WarmUp {
	C := h.HeatCapacity
	if !(C > 0) {
		return nil
	}
	tEnd := 5 * tau
	if !math.IsNaN(h.TimeToLimit) {
		if math.IsNaN(tEnd) || tEnd < 1.3*h.TimeToLimit {
			tEnd = 1.3 * h.TimeToLimit
		}
		if steady.Settled {
			tEnd = math.Max(tEnd, math.Min(5*tau, 3*h.TimeToLimit))
		}
	}
	// A duty cycle drawn runs on until its periodic state is reached
	// (Periods, from cold) and one whole period beyond, so that the
	// periodic peak the memo quotes is seen.
	cy := h.Cycle
	drawCycle := cy.On > 0 && cy.Settled
	if drawCycle {
		period := cy.On + cy.Off
		if t := (math.Ceil(cy.Periods) + 1) * period; (math.IsNaN(tEnd) || t > tEnd) && t/period <= warmUpPeriodsMax {
			tEnd = t
		}
		drawCycle = tEnd/period <= warmUpPeriodsMax
	}
	if !(tEnd > 0) || math.IsInf(tEnd, 0) {
		return nil
	}
	wu := &WarmUp{End: tEnd}
	wu.T, _, wu.Hot = on.WarmUpCurve(C, tEnd, 0)
	if drawCycle {
		wu.CycleT, _, wu.CycleHot = h.Problem.WarmUpCurve(C, tEnd, cy.On)
		wu.CycleReached = tEnd >= (math.Ceil(cy.Periods)+1)*(cy.On+cy.Off)
	}
	return wu
}
