package report

import (
	"math"

	"coilmemo/analysis"
)

// CoilKindsReport holds the keys of cored and pick-up coils and of a.c.
// windings (embedded in CoilReport; null where they do not apply):
// the core's magnetometric demagnetising factor, apparent permeability and
// peak flux density at the current, a pick-up coil's sensitivity and
// noise-equivalent field at its frequency, the winding's self-capacitance
// (with a pick-up coil's load) and self-resonance, and the a.c.
// resistance at the frequency (Dowell).
type CoilKindsReport struct {
	CoreDemag         Num  `json:"core_demagnetising_factor"`
	CorePermeability  Num  `json:"core_apparent_permeability"`
	CoreFluxDensity   Num  `json:"core_flux_density_T"`
	CoreMass          Num  `json:"core_mass_kg"`
	Sensitivity       Num  `json:"sensitivity_V_per_T"`
	NoiseField        Num  `json:"noise_T_per_rtHz"`
	SelfCapacitance   Num  `json:"self_capacitance_F"`
	SelfResonance     Num  `json:"self_resonance_Hz"`
	ResistanceAC      Num  `json:"resistance_ac_ohm"`
	AboveSelfResonant bool `json:"above_self_resonance"`
}

// coilKinds fills the kinds' keys of coil block i and, above the
// self-resonance, withdraws the impedance (the series model does not hold
// there). The conductor mass stays the conductor's; the core's is its own
// key.
func coilKinds(j *analysis.Study, i int, c *CoilReport) {
	n := Num(math.NaN())
	k := j.Coils[i].Kinds
	r := CoilKindsReport{CoreDemag: n, CorePermeability: n, CoreFluxDensity: n, CoreMass: n, Sensitivity: n,
		NoiseField: n, SelfCapacitance: Num(k.SelfCapacitance), SelfResonance: Num(k.SelfResonance), ResistanceAC: n,
		AboveSelfResonant: k.AboveResonance}
	if k.Core != nil {
		r.CoreDemag, r.CorePermeability = Num(k.Core.DemagMagnetometric), Num(k.Core.ApparentPermeability)
		r.CoreFluxDensity, r.CoreMass = Num(k.Core.FluxDensityPeak), Num(k.Core.Mass)
		c.ConductorMass = Num(k.AirMass)
	}
	if rc := k.Receiver; rc != nil {
		r.Sensitivity, r.NoiseField = Num(rc.Sensitivity), Num(rc.NoiseField)
	}
	if k.AC != nil {
		r.ResistanceAC = Num(k.AC.Rac)
	}
	if k.AboveResonance {
		c.Impedance, c.CurrentAC = n, n
	}
	c.CoilKindsReport = r
}
