package calc

// Material is a conductor's electrical and thermal data at 20 °C.
type Material struct {
	Name         string
	Rho20        float64 // Ω·m at 20 °C
	Alpha20      float64 // 1/K, temperature coefficient of resistance at 20 °C
	Density      float64 // kg/m³
	SpecificHeat float64 // J/(kg·K)
	Source       string  // where the figures come from
}
