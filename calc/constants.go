package calc

import "math"

// Physical constants and reference temperatures, SI.
const (
	// Mu0 is the vacuum magnetic permeability μ0 = 1.25663706212e-6 N/A²
	// (CODATA 2018 recommended value; no longer exactly 4π×10⁻⁷ since the
	// 2019 SI redefinition).
	Mu0 = 1.25663706212e-6

	// StefanBoltzmann is σ = 5.670374419e-8 W/(m²·K⁴) (CODATA 2018; exact
	// in the 2019 SI, being fixed by h, k and c).
	StefanBoltzmann = 5.670374419e-8

	// ZeroCelsius is 0 °C in kelvin (SI definition of the Celsius scale).
	ZeroCelsius = 273.15

	// T20 is the reference temperature of wire data, 20 °C, in kelvin
	// (IEC 60028 and NBS Handbook 100 both tabulate at 20 °C).
	T20 = ZeroCelsius + 20

	// Inch is 25.4 mm exactly (international yard and pound agreement, 1959).
	Inch = 0.0254

	// Foot is 0.3048 m exactly (same agreement).
	Foot = 0.3048
)

// hexPacking is π/(2√3) ≈ 0.9069, the area fraction of the densest packing
// of equal circles in the plane (Lagrange 1773; Thue 1910 for optimality).
var hexPacking = math.Pi / (2 * math.Sqrt(3))

// CelsiusToKelvin converts a Celsius temperature to kelvin: T = t + 273.15.
func CelsiusToKelvin(t float64) float64 { return t + ZeroCelsius }

// KelvinToCelsius converts a kelvin temperature to Celsius: t = T − 273.15.
func KelvinToCelsius(T float64) float64 { return T - ZeroCelsius }
