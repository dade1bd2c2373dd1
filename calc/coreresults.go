package calc

// CoreResult is everything computed for a cored coil block (EvaluateCore).
// Axial quantities are signed along the coil axis; NaN means unknown.
type CoreResult struct {
	// Problem says why the core could not be evaluated, or (with figures
	// still computed) what is doubtful about it; empty when all is well.
	Problem string

	AspectRatio float64 // γ = core length / core diameter
	// DemagMagnetometric and DemagFluxmetric are the core's factors Nm and
	// Nf at its initial permeability in a uniform applied field
	// (CylinderDemag); DemagEllipsoid is the prolate spheroid's of the same
	// ratio, the cross-check.
	DemagMagnetometric, DemagFluxmetric, DemagEllipsoid float64
	// ApparentPermeability is μr/(1 + Nm(μr − 1)), the whole-core value that
	// sets the moment; ApparentPermeabilityMid uses Nf (the mid-plane flux).
	ApparentPermeability, ApparentPermeabilityMid float64

	CoreMoment   float64 // A·m², the core's own moment at the current
	Moment       float64 // A·m², winding (I·ΣA) plus core
	MomentLinear float64 // A·m², the same for a core that never saturates

	FluxDensityPeak   float64 // T, largest |B| in the core at the current
	FluxDensityLinear float64 // T, the same for a core that never saturates
	// PeakH and PeakM are the field and magnetisation, A/m, of the slice
	// where that peak lies (FluxDensityPeak = μ0 |H + M|), signed so that
	// their sum is positive.
	PeakH, PeakM float64
	// SaturationMargin is 1 − B_linear/B_sat (negative past saturation; NaN
	// without a saturation flux density); SaturationCurrent is the current
	// at which the linear peak reaches B_sat.
	SaturationMargin  float64
	SaturationCurrent float64
	Saturated         bool

	// InductanceAdded is the core's share of the winding's inductance at
	// the current (flux linkage over current); InductanceAddedInitial at
	// vanishing current. The coil's inductance is the air-core value plus
	// this.
	InductanceAdded, InductanceAddedInitial float64
	// EffectiveArea is the flux linkage per tesla of a uniform axial field,
	// m² (reception; ΣA for an air core).
	EffectiveArea float64

	Mass   float64 // kg, the core (NaN without a density)
	Volume float64 // m³, the core's, π D²/4 · ℓ

	// ResidualMoment is the moment left after switch-off, A·m²;
	// ResidualBound is set when only the remanence was given, so the figure
	// is the upper bound Br V/μ0.
	ResidualMoment float64
	ResidualBound  bool

	// The pole model: the core's magnetisation as axial magnetic charges
	// Charge[p], A·m, at local z = Z[p], m; PoleStrength is the charge of
	// the upper half and PoleSeparation the distance between its centroid
	// and the lower half's (PoleStrength × PoleSeparation = CoreMoment).
	Z, Charge                    []float64
	PoleStrength, PoleSeparation float64

	// Converged is false when the saturating solution did not settle.
	Converged bool
}

// ACLoss is the a.c. resistance of a winding at a frequency (ACResistance).
type ACLoss struct {
	Frequency float64 // Hz
	SkinDepth float64 // m
	Layers    int     // layers taken by Dowell's method
	Porosity  float64 // η, conductor fraction of the layer width
	Delta     float64 // Δ, equivalent foil thickness over the skin depth
	Factor    float64 // R_ac/R_dc
	Rac       float64 // Ω
}

// ReceiverResult is a pick-up coil's figures (EvaluateReceiver).
type ReceiverResult struct {
	Frequency       float64 // Hz, the design frequency
	EffectiveArea   float64 // m², flux linkage per tesla
	Sensitivity     float64 // V/T at Frequency (open circuit, e.m.f.)
	Resistance      float64 // Ω, a.c. resistance at Frequency
	NoiseVoltage    float64 // V/√Hz, √(4kTR)
	NoiseField      float64 // T/√Hz at Frequency
	BandNoiseField  float64 // T rms over [BandLow, BandHigh] (NaN without a band)
	SelfCapacitance float64 // F, the winding alone
	Capacitance     float64 // F, with the load across the terminals
	SelfResonance   float64 // Hz, 1/(2π√(L C))
	AboveResonance  bool    // Frequency ≥ SelfResonance: the lumped model does not hold
	// WorkingBandTop is the frequency, Hz, up to which the terminal
	// sensitivity stays within WorkingBandTolerance of the induction law
	// 2π f A_eff, from the low end of Response up: the top of the coil's
	// working band. 0 when the response departs already at its lowest
	// frequency, +Inf when it stays within over all of Response, NaN
	// without a response.
	WorkingBandTop float64
	Response       []ResponsePoint
}

// ResponsePoint is one point of a pick-up coil's response.
type ResponsePoint struct {
	Frequency   float64 // Hz
	Sensitivity float64 // V/T at the terminals
	NoiseField  float64 // T/√Hz
}
