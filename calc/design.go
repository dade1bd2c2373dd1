package calc

// This file holds the input and output types of a whole evaluation. All
// values are SI: metres, amperes, volts, ohms, tesla, kelvin for absolute
// temperatures, watts, newton-metres. Fractions are 0..1.

// Form is a coil's geometric form.
type Form int

const (
	Loop     Form = iota // circular coil; thin unless Length/RadialBuild are set
	Solenoid             // circular coil wound along its axis over Length
	Rectangle
	Pair // two identical circular coils on a common axis
)

// Drive says which electrical quantity is imposed.
type Drive int

const (
	CurrentDrive Drive = iota
	VoltageDrive
)

// Vec is a Cartesian vector in metres, tesla, A·m² … as the context says.
type Vec [3]float64

// Wire is a round conductor.
type Wire struct {
	Gauge int     // AWG number, or NoGauge when a bare diameter was given
	Bare  float64 // bare conductor diameter, m
	Outer float64 // overall diameter over insulation, m
	// OuterEstimated is set when the spec gave no overall diameter and the
	// reader filled Outer with HeavyBuildOuter's estimate.
	OuterEstimated bool
	Material       Material
}

// NoGauge marks a wire given by diameter rather than AWG.
const NoGauge = -100

// Coil is one coil block in SI.
type Coil struct {
	Name string
	Form Form

	// Circular forms: MeanDiameter is always set by the reader (from
	// inner+outer when those were given). InnerDiameter/OuterDiameter are
	// zero unless given.
	MeanDiameter  float64
	InnerDiameter float64
	OuterDiameter float64
	Length        float64 // axial winding length; 0 for a thin coil
	RadialBuild   float64 // radial depth of the winding; 0 for one layer

	Width, Height float64 // Rectangle: outer dimensions of the mean turn

	Turns int // per coil (per coil of a pair)
	Wire  Wire

	Drive   Drive
	Current float64 // A, when Drive == CurrentDrive
	Voltage float64 // V, when Drive == VoltageDrive (across one coil; a pair's coils in series see 2× turns of wire)
	Duty    float64 // 0..1, 1 when not given

	InsulationClass float64 // K, absolute temperature limit of the insulation

	Spacing  float64 // Pair: distance between the two coil centres
	Opposing bool    // Pair: currents in opposite senses

	Axis   Vec // unit vector, default (0,0,1)
	Centre Vec // m

	// TestPlane is the distance, m, from the centre along the axis of the
	// plane over which a rectangle's field matters (a panel's test
	// surface), when HasTestPlane; otherwise the plane is found from the
	// probes.
	TestPlane    float64
	HasTestPlane bool

	// Switching and a.c. drive; zero means not given.
	SwitchOff    float64 // s, time in which the driver opens the circuit
	DriverRating float64 // V, voltage the driver's switch withstands
	Frequency    float64 // Hz, frequency of an a.c. drive

	// Heating; zero means not given.
	OnTime              float64 // s, one energised period of the duty cycle
	Former              Former  // former lumped with the winding's heat capacity
	WindingConductivity float64 // W/(m·K), effective across the layers (DefaultWindingConductivity when 0)

	// Core is a soft-magnetic rod in the winding's bore (zero: air core).
	Core Core
	// UnmodelledCore names a ferromagnetic part that sits in the winding's
	// bore in service but is not modelled (a plunger, an armature): the
	// figures are the coil's without it ("": none stated). It enters no
	// calculation.
	UnmodelledCore string
	// Receiver: the band over which a pick-up coil's noise is stated, Hz
	// (zero: not given), and the capacitance of the cable and amplifier
	// across its terminals, F.
	BandLow, BandHigh float64
	LoadCapacitance   float64
}

// Core is a soft-magnetic rod coaxial with a circular winding and centred
// on it; zero values mean not given.
type Core struct {
	Permeability float64   // relative initial permeability μr (0: no core)
	Saturation   float64   // T, saturation flux density (0: the core stays linear)
	Curve        []BHPoint // optional B–H curve, H ascending, all H > 0
	Remanence    float64   // T, Br
	Coercivity   float64   // A/m, Hc
	Density      float64   // kg/m³
	SpecificHeat float64   // J/(kg·K) (0: DefaultCoreSpecificHeat)
	Length       float64   // m
	Diameter     float64   // m
}

// BHPoint is one point of a B–H curve: field strength H, A/m, and flux
// density B, T.
type BHPoint struct{ H, B float64 }

// Present says whether the core is described well enough to compute with.
func (k Core) Present() bool {
	return k.Permeability >= 1 && k.Length > 0 && k.Diameter > 0
}

// Cooling describes how the winding sheds heat.
type Cooling struct {
	Vacuum     bool    // radiation only
	H          float64 // convective coefficient W/(m²·K); 0 in vacuum
	HGiven     bool    // true when the spec stated h; else still air by a natural-convection correlation
	Emissivity float64 // surface emissivity for radiation
	// Covered says the coils lie under or behind a surface that people
	// touch (a work surface, a panel, a housing wall), in air that cannot
	// rise freely past them: the free-convection correlations, which hold
	// for a surface in an extensive quiescent fluid (Incropera & DeWitt,
	// 6th ed., §9.1), do not apply, and without a stated h no convection
	// is counted (EffectiveCooling).
	Covered bool
}

// Conditions is the environment of the design.
type Conditions struct {
	Ambient         float64 // K
	BackgroundField Vec     // T, e.g. geomagnetic field in orbit
	// BackgroundMagnitudeOnly is set when the field was stated as a
	// magnitude: it is then held along x, and its direction against the
	// moment is the design angle's business, not a result.
	BackgroundMagnitudeOnly bool
	// DesignAngle is the angle between the moment and the background field
	// at which torque is reported, rad, when DesignAngleStated; else π/2,
	// and the angle used is the one as designed for a field given as a
	// vector (see the function DesignAngle).
	DesignAngle       float64
	DesignAngleStated bool
	Cooling           Cooling
	// HandlingAmbient is the temperature of the surroundings in which
	// people handle and touch the coil, K (0: not stated; the analysis
	// then takes its default, analysis.HandlingFor). Only the hot-surface
	// judgement uses it.
	HandlingAmbient float64
	// FieldGradient is a stated gradient of the background field, T/m: the
	// rate of change of the field component along a moment, per metre along
	// it (0: none).
	FieldGradient float64
	// MountResistance is the thermal resistance, K/W, from each coil's
	// winding to a mount held at the ambient temperature (0: no mount).
	MountResistance float64
	// AxisVertical says the coil axes are vertical (for natural
	// convection); false: horizontal. It is the design-wide statement,
	// used for every coil when Up is not given.
	AxisVertical bool
	// Up is the upward direction (against gravity) as a unit vector in
	// the design's axes, when given (zero: not given); each coil's own
	// axis then decides its orientation (see AxisIsVertical).
	Up Vec
}

// Probe is a named point where the field is reported.
type Probe struct {
	Name string
	At   Vec // m
}

// Relation of a limit.
type Relation int

const (
	AtLeast Relation = iota // >=
	AtMost                  // <=
)

// Limit is one requirement line: Quantity Relation Required (SI).
type Limit struct {
	Quantity string // a key of spec.LimitQuantities
	Relation Relation
	Required float64 // SI, in the unit the quantity is given in
	Line     int     // source line, for messages
	// Subject is the coil block or probe the limit is about ("" for the
	// design as a whole), and Tolerance the relative tolerance of a
	// uniform-radius limit (0 for other quantities).
	Subject   string
	Tolerance float64
}

// Design is everything calc needs.
type Design struct {
	Coils      []Coil
	Conditions Conditions
	Probes     []Probe
	Limits     []Limit
}
