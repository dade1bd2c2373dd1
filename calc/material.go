package calc

import "strings"

// Material is a conductor's electrical and thermal data at 20 °C.
type Material struct {
	Name         string
	Rho20        float64 // Ω·m at 20 °C
	Alpha20      float64 // 1/K, temperature coefficient of resistance at 20 °C
	Density      float64 // kg/m³
	SpecificHeat float64 // J/(kg·K)
	Source       string  // where the figures come from
	// SpecificHeatSource is the published table SpecificHeat is taken
	// from, as the memo cites it.
	SpecificHeatSource string
}

// crcHeatCapacity is the table the conductors' specific heats come from
// (copper 0.385, aluminium 0.897 J/(g·K)).
const crcHeatCapacity = "CRC Handbook of Chemistry and Physics, 84th ed. (2003), section 4, Heat Capacity of the Elements at 25 °C"

// Copper returns annealed copper as standardised by IEC 60028:1925
// ("International standard of resistance for copper", the IACS basis):
// resistivity ρ20 = 1/58 Ω·mm²/m = 1.7241×10⁻⁸ Ω·m, temperature coefficient
// α20 = 0.00393 /K, density 8890 kg/m³ — all three figures of the standard.
// The specific heat c = 385 J/(kg·K) is the CRC Handbook's 0.385 J/(g·K)
// at 25 °C (crcHeatCapacity; recalled from memory and matched against
// reproductions of that table, not against a printed edition).
func Copper() Material {
	return Material{
		Name:               "copper",
		Rho20:              1.0 / 58 * 1e-6,
		Alpha20:            0.00393,
		Density:            8890,
		SpecificHeat:       385,
		SpecificHeatSource: crcHeatCapacity,
		Source:             "IEC 60028 (ρ20, α20, density); " + crcHeatCapacity + " (c)",
	}
}

// Aluminium returns electrical-conductor-grade (EC, 1350) aluminium as in
// IEC 60111 and IEC 60889 (hard-drawn wire): ρ20 = 0.028264 Ω·mm²/m
// (61 % IACS), α20 = 0.00403 /K, density 2703 kg/m³. The specific heat
// c = 897 J/(kg·K) is the CRC Handbook's 0.897 J/(g·K) at 25 °C
// (crcHeatCapacity; recalled from memory and matched against reproductions
// of that table, not against a printed edition).
func Aluminium() Material {
	return Material{
		Name:               "aluminium",
		Rho20:              0.028264e-6,
		Alpha20:            0.00403,
		Density:            2703,
		SpecificHeat:       897,
		SpecificHeatSource: crcHeatCapacity,
		Source:             "IEC 60111 / IEC 60889 (ρ20, α20, density); " + crcHeatCapacity + " (c)",
	}
}

// MaterialByName returns the conductor named "copper"/"cu" or
// "aluminium"/"aluminum"/"al" (case-insensitive), and false for any other
// name.
func MaterialByName(name string) (Material, bool) {
	switch strings.ToLower(strings.TrimSpace(name)) {
	case "copper", "cu":
		return Copper(), true
	case "aluminium", "aluminum", "al":
		return Aluminium(), true
	}
	return Material{}, false
}
