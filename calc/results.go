package calc

// Layer is one layer of a winding: all its turns share one radius.
type Layer struct {
	Radius float64   // m, radius of the wire centres
	Z      []float64 // m, axial position of each turn's centre, coil-local
}

// Winding is the laid-out winding of one coil (one coil of a pair).
type Winding struct {
	Layers        []Layer
	TurnsPerLayer int     // turns that fit along Length (1 for a thin coil)
	LayerCount    int     // layers that fit in RadialBuild (1 for one layer)
	Thin          bool    // all turns treated on the mean diameter
	MeanTurn      float64 // m, mean length of one turn
	WireLength    float64 // m, per coil
	AreaSum       float64 // m², Σ of the area enclosed by every turn
	FillFactor    float64 // conductor area / winding cross-section (NaN for thin)
	SurfaceArea   float64 // m², area shedding heat (see thermal model)
	Mass          float64 // kg, conductor only, per coil

	// Overfull is set when the turns do not fit in the length or radial
	// build given; Problem then says why (see LayOut, CheckWinding).
	Overfull bool
	Problem  string
}

// CoilResult is every figure computed for one coil block.
type CoilResult struct {
	Name    string
	Winding Winding

	R20     float64 // Ω at 20 °C, whole coil block (both coils of a pair in series)
	RHot    float64 // Ω at the steady winding temperature
	Current float64 // A at the steady state
	Voltage float64 // V across the coil block at the steady state
	// VoltagePeak is the most a current source must deliver across the
	// block, V: I·R at the on/off cycle's peak mean temperature, where the
	// resistance is highest (d.c. current drive with on-time); else
	// Voltage.
	VoltagePeak float64
	Power       float64 // W dissipated at the steady state (× duty for the average)
	Density     float64 // A/m², current density in the conductor
	Mass        float64 // kg, conductor of the coil block
	Length      float64 // m, wire length of the coil block
	Inductance  float64 // H, NaN when no method applies to the form

	Moment         Vec     // A·m², m = I·ΣA along the axis (a pair: sum of both, 0 when opposing)
	MomentMeanArea float64 // A·m², N·I·π·R_mean² per coil, the cross-check

	Temperature float64 // K, hottest winding temperature: steady hot spot, or the peak of an on/off cycle
	Runaway     bool    // no steady temperature exists (under current drive: none at or below the insulation class)
	ColdCurrent float64 // A, current at 20 °C resistance (voltage drive: the moment lost to heating shows here)

	FieldCentre Vec // T, field of this coil block alone at its own centre

	PowerOn          float64 // W while energised (Power = duty × PowerOn)
	Duty             float64 // 0..1 as used (1 when not given)
	InsulationMargin float64 // K, InsulationClass − Temperature (NaN when no class given or runaway)
	TimeConstant     float64 // s, electrical L/R at the hot resistance
	Energy           float64 // J, stored magnetic energy L I²/2
	ThermalTau       float64 // s, time constant of the warm-up (linearised)
	PairForce        float64 // N, axial force between the coils of a pair (+ apart, − together; 0 for other forms)
	// HomogeneityAxial and HomogeneityRadial are the distances from a
	// pair's centre, along its axis and in its mid-plane, within which the
	// field stays within 1 % of the centre field (NaN for other forms).
	HomogeneityAxial, HomogeneityRadial float64

	// Heat is the thermal detail (surface and hot-spot temperatures, heat
	// flows, warm-up, duty cycle); Temperature above is its hot spot.
	Heat HeatResult
	// Switch is the switching detail (rise time, switch-off voltage,
	// suppression); AC the figures at a drive frequency.
	Switch SwitchResult
	AC     ACResult
	// GradientForce is |m| × Conditions.FieldGradient, N (NaN when no
	// gradient is stated).
	GradientForce float64
	// Dipole holds the distances beyond which the point-dipole field is
	// within 1 % and 0.1 % of the exact field, on the axis and in the
	// coil's plane (DipoleDistances).
	Dipole DipoleReach
	// Pair is a pair's homogeneous region (aiding) or centre gradient and
	// its linear region (opposing); NaN for other forms (AnalysePair).
	Pair PairRegion

	// Thermal verdict, switching at the worst current and a.c. bounds.
	//
	// Verdict is the runaway judgement for either drive (runaway.go):
	// Runaway above equals Verdict.Runaway; Verdict.NoSolution and
	// Verdict.SettledAboveLimit tell "no steady state" from "settled above
	// the class". It judges the on/off cycle's peak when one is computed.
	Verdict ThermalVerdict
	// SteadyHotSpot is the hot spot of the duty-averaged steady state, K
	// (NaN when it has none); a cycle's peak is never reported below it.
	SteadyHotSpot float64
	// SwitchOnCurrent is the largest current the block carries, A: the
	// cold switch-on current under voltage drive (Operating).
	SwitchOnCurrent float64
	// Reactance is ωL, Ω, at which an a.c. voltage drive's heat balance was
	// solved (0: d.c., or current drive); ACBounds says how d.c. and
	// computed a.c. figures bound the true ones.
	Reactance float64
	ACBounds  ACBounds
}

// ProbeResult is the field at one probe, all coils summed.
type ProbeResult struct {
	Name string
	At   Vec
	B    Vec
}

// LimitResult is one requirement checked.
type LimitResult struct {
	Limit    Limit
	Computed float64 // SI
	Pass     bool
}

// Results is the evaluation of a whole design.
type Results struct {
	Coils       []CoilResult
	FieldCentre Vec // T, all coils at the origin
	Moment      Vec // A·m², total
	Torque      Vec // N·m, m × B_background with m as designed
	TorqueMax   float64
	// TorqueDesign is |τ| at TorqueAngle between m and B.
	TorqueDesign float64
	// TorqueAngle is that angle, rad (DesignAngle).
	TorqueAngle float64
	Probes      []ProbeResult
	// Couplings holds the mutual inductance and force of every pair of coil
	// blocks; GradientForce is |m| × Conditions.FieldGradient for the total
	// moment, N (NaN when no gradient is stated).
	Couplings     []Coupling
	GradientForce float64
}
