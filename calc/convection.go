package calc

import "math"

// Natural convection from a coil in still air, by the correlations of
// Churchill and Chu (1975) with the air's properties at the film
// temperature (the mean of surface and ambient), as recommended in
// Incropera & DeWitt, Fundamentals of Heat and Mass Transfer (6th ed.,
// §9.6), with the buoyancy coefficient of an ideal gas, β = 1/T_film.
//
// The Rayleigh number on a characteristic length L is
//
//	Ra_L = g β (T_s − T_a) L³ / (ν α),  α = ν / Pr
//
// and the mean heat-transfer coefficient is h = Nu_L k / L.

// StandardGravity is g_n = 9.80665 m/s², the standard acceleration of
// gravity (3rd CGPM, 1901).
const StandardGravity = 9.80665

// ConvectionShape says which correlation describes a coil's outer shape.
type ConvectionShape int

const (
	// HorizontalCylinder: a long horizontal cylinder of diameter L
	// (a coil with its axis horizontal, or the tube of a thin ring).
	HorizontalCylinder ConvectionShape = iota
	// VerticalSurface: a vertical plate (or a vertical cylinder thick enough
	// to be one) of height L.
	VerticalSurface
)

// String names the shape as the memo does.
func (s ConvectionShape) String() string {
	if s == VerticalSurface {
		return "vertical surface"
	}
	return "horizontal cylinder"
}

// RayleighMax is the upper end of the Rayleigh-number range of both
// Churchill–Chu correlations as given by Incropera & DeWitt (eqs. 9.26 and
// 9.34): Ra ≲ 10¹². The vertical-plate correlation is stated for the whole
// laminar and turbulent range; the horizontal-cylinder one for
// Ra_D ≲ 10¹².
const RayleighMax = 1e12

// airTable is air at atmospheric pressure from Incropera & DeWitt,
// Fundamentals of Heat and Mass Transfer, 6th ed., Table A.4 (values
// recalled from memory): temperature K, kinematic viscosity ν (m²/s),
// thermal conductivity k (W/(m·K)), Prandtl number Pr.
var airTable = [][4]float64{
	{200, 7.590e-6, 18.1e-3, 0.737},
	{250, 11.44e-6, 22.3e-3, 0.720},
	{300, 15.89e-6, 26.3e-3, 0.707},
	{350, 20.92e-6, 30.0e-3, 0.700},
	{400, 26.41e-6, 33.8e-3, 0.690},
	{450, 32.39e-6, 37.3e-3, 0.686},
	{500, 38.79e-6, 40.7e-3, 0.684},
	{550, 45.57e-6, 43.9e-3, 0.683},
	{600, 52.69e-6, 46.9e-3, 0.685},
	{650, 60.21e-6, 49.7e-3, 0.690},
	{700, 68.10e-6, 52.4e-3, 0.695},
	{750, 76.37e-6, 54.9e-3, 0.702},
	{800, 84.93e-6, 57.3e-3, 0.709},
}

// AirTableSource names the table of AirProperties.
const AirTableSource = "Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed., Table A.4 (air at 1 atm)"

// AirProperties returns the kinematic viscosity ν (m²/s), thermal
// conductivity k (W/(m·K)) and Prandtl number of air at atmospheric
// pressure at temperature T (K), interpolated linearly in airTable. Outside
// the table (200–800 K) the end values are returned and inTable is false.
func AirProperties(T float64) (nu, k, pr float64, inTable bool) {
	t := airTable
	switch {
	case math.IsNaN(T):
		return math.NaN(), math.NaN(), math.NaN(), false
	case T <= t[0][0]:
		return t[0][1], t[0][2], t[0][3], T == t[0][0]
	case T >= t[len(t)-1][0]:
		e := t[len(t)-1]
		return e[1], e[2], e[3], T == e[0]
	}
	i := 1
	for t[i][0] < T {
		i++
	}
	a, b := t[i-1], t[i]
	f := (T - a[0]) / (b[0] - a[0])
	lerp := func(j int) float64 { return a[j] + f*(b[j]-a[j]) }
	return lerp(1), lerp(2), lerp(3), true
}

// ChurchillChuCylinder returns the mean Nusselt number of a long
// horizontal cylinder in free convection (Churchill & Chu, "Correlating
// equations for laminar and turbulent free convection from a horizontal
// cylinder", Int. J. Heat Mass Transfer 18 (1975) 1049; Incropera &
// DeWitt eq. 9.34), for Ra_D ≲ 10¹²:
//
//	Nu_D = {0.60 + 0.387 Ra_D^(1/6) / [1 + (0.559/Pr)^(9/16)]^(8/27)}²
func ChurchillChuCylinder(ra, pr float64) float64 {
	f := 0.60 + 0.387*sixthRoot(math.Max(ra, 0))/prandtlFactor(0.559/pr)
	return f * f
}

// sixthRoot is x^(1/6) = √∛x (roots rather than math.Pow: the heat
// balance evaluates the correlations many times per solve).
func sixthRoot(x float64) float64 { return math.Sqrt(math.Cbrt(x)) }

// prandtlFactor is [1 + x^(9/16)]^(8/27), by roots: x^(1/16) is four
// square roots, and y^(8/27) = ∛∛∛(y⁸).
func prandtlFactor(x float64) float64 {
	r := math.Sqrt(math.Sqrt(math.Sqrt(math.Sqrt(x)))) // x^(1/16)
	r3 := r * r * r
	y := 1 + r3*r3*r3 // 1 + x^(9/16)
	y2 := y * y
	y4 := y2 * y2
	return math.Cbrt(math.Cbrt(math.Cbrt(y4 * y4)))
}

// ChurchillChuPlate returns the mean Nusselt number of a vertical plate in
// free convection over its whole height (Churchill & Chu, "Correlating
// equations for laminar and turbulent free convection from a vertical
// plate", Int. J. Heat Mass Transfer 18 (1975) 1323; Incropera & DeWitt
// eq. 9.26), for the whole laminar and turbulent range:
//
//	Nu_L = {0.825 + 0.387 Ra_L^(1/6) / [1 + (0.492/Pr)^(9/16)]^(8/27)}²
func ChurchillChuPlate(ra, pr float64) float64 {
	f := 0.825 + 0.387*sixthRoot(math.Max(ra, 0))/prandtlFactor(0.492/pr)
	return f * f
}

// NaturalConvection is the free-convection model of one coil's outer
// surface: the correlation of its shape on characteristic length Length
// (m): the diameter of a horizontal cylinder, the height of a vertical
// surface.
type NaturalConvection struct {
	Shape  ConvectionShape
	Length float64
	// Ring is set when the cylinder is the section of a ring-shaped
	// winding (a tube bent round the coil's axis), not the coil's outside.
	Ring bool
}

// ConvectionState is the convection at one surface temperature.
type ConvectionState struct {
	H       float64 // W/(m²·K), mean coefficient
	Ra, Nu  float64
	Film    float64 // K, film temperature (T_s + T_a)/2
	InRange bool    // Ra within the correlation's range and the film temperature within the air table
}

// At returns the convection of surface temperature Ts in air at Ta (K).
// The coefficient is taken on |Ts − Ta| (a surface colder than the air
// loses heat to it by the same law, reversed).
func (nc NaturalConvection) At(Ts, Ta float64) ConvectionState {
	L := nc.Length
	tf := (Ts + Ta) / 2
	nu, k, pr, ok := AirProperties(tf)
	if !(L > 0) || !(tf > 0) {
		return ConvectionState{H: math.NaN(), Ra: math.NaN(), Nu: math.NaN(), Film: tf}
	}
	alpha := nu / pr
	ra := StandardGravity / tf * math.Abs(Ts-Ta) * L * L * L / (nu * alpha)
	var n float64
	if nc.Shape == VerticalSurface {
		n = ChurchillChuPlate(ra, pr)
	} else {
		n = ChurchillChuCylinder(ra, pr)
	}
	return ConvectionState{H: n * k / L, Ra: ra, Nu: n, Film: tf, InRange: ok && ra <= RayleighMax}
}
