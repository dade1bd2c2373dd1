// Package units reads quantities written the way engineers type them —
// "12.5 mm", "45 µT", "0.2 A m2", "25 degC", "10 W/(m2 K)" — and converts
// them to SI. A Quantity carries its SI value and its dimension, the
// exponents of metre, kilogram, second, ampere and kelvin (plus a separate
// exponent for the radian so that angles can be told apart from plain
// numbers). The package is pure: no I/O, no global state beyond read-only
// tables.
package units

import (
	"strconv"
	"strings"
)

// Dim is a physical dimension: the exponent of each SI base unit the coil
// calculations use. Rad is the exponent of the radian; SI treats the radian
// as dimensionless, here it is kept so that "deg" is accepted only where an
// angle is wanted. Dim is comparable; two quantities have the same
// dimension when their Dims are ==.
type Dim struct {
	M, Kg, S, A, K, Rad int8
}

// Named dimensions.
var (
	Dimensionless  = Dim{}
	Angle          = Dim{Rad: 1}
	Length         = Dim{M: 1}
	Area           = Dim{M: 2}
	Volume         = Dim{M: 3}
	Mass           = Dim{Kg: 1}
	Time           = Dim{S: 1}
	Current        = Dim{A: 1}
	Temperature    = Dim{K: 1}
	Frequency      = Dim{S: -1}
	Force          = Dim{M: 1, Kg: 1, S: -2}
	Torque         = Dim{M: 2, Kg: 1, S: -2} // also energy
	Energy         = Torque
	Power          = Dim{M: 2, Kg: 1, S: -3}
	Voltage        = Dim{M: 2, Kg: 1, S: -3, A: -1}
	Resistance     = Dim{M: 2, Kg: 1, S: -3, A: -2}
	Inductance     = Dim{M: 2, Kg: 1, S: -2, A: -2}
	FluxDensity    = Dim{Kg: 1, S: -2, A: -1}
	MagneticFlux   = Dim{M: 2, Kg: 1, S: -2, A: -1}
	FieldStrength  = Dim{M: -1, A: 1}
	Moment         = Dim{M: 2, A: 1}
	CurrentDensity = Dim{M: -2, A: 1}
	HeatTransfer   = Dim{Kg: 1, S: -3, K: -1}
	Pressure       = Dim{M: -1, Kg: 1, S: -2}
	Resistivity    = Dim{M: 3, Kg: 1, S: -3, A: -2}
	Density        = Dim{M: -3, Kg: 1}
	SpecificHeat   = Dim{M: 2, S: -2, K: -1}
	Conductivity   = Dim{M: 1, Kg: 1, S: -3, K: -1} // thermal, W/(m·K)
	PerKelvin      = Dim{K: -1}
	// FieldGradient is a flux density per length, T/m.
	FieldGradient = Dim{M: -1, Kg: 1, S: -2, A: -1}
	// ThermalResistance is a temperature difference per heat flow, K/W.
	ThermalResistance = Dim{M: -2, Kg: -1, S: 3, K: 1}
	// HeatCapacity is heat per temperature difference, J/K.
	HeatCapacity = Dim{M: 2, Kg: 1, S: -2, K: -1}
)

type dimInfo struct {
	name    string // "length"
	symbol  string // SI unit used when printing, "m"
	example string // a unit to suggest in messages, "mm"
}

var dimNames = map[Dim]dimInfo{
	Dimensionless:  {"plain number", "", "%"},
	Angle:          {"angle", "rad", "deg"},
	Length:         {"length", "m", "mm"},
	Area:           {"area", "m²", "mm2"},
	Volume:         {"volume", "m³", "cm3"},
	Mass:           {"mass", "kg", "g"},
	Time:           {"time", "s", "s"},
	Current:        {"current", "A", "A"},
	Temperature:    {"temperature", "K", "degC"},
	Frequency:      {"frequency", "Hz", "Hz"},
	Force:          {"force", "N", "N"},
	Torque:         {"torque or energy", "N·m", "mN m"},
	Power:          {"power", "W", "W"},
	Voltage:        {"voltage", "V", "V"},
	Resistance:     {"resistance", "Ω", "ohm"},
	Inductance:     {"inductance", "H", "mH"},
	FluxDensity:    {"flux density", "T", "uT"},
	MagneticFlux:   {"magnetic flux", "Wb", "Wb"},
	FieldStrength:  {"field strength", "A/m", "A/m"},
	Moment:         {"magnetic moment", "A·m²", "A m2"},
	CurrentDensity: {"current density", "A/m²", "A/mm2"},
	HeatTransfer:   {"heat-transfer coefficient", "W/(m²·K)", "W/m2K"},
	Pressure:       {"pressure", "Pa", "kPa"},
	Resistivity:    {"resistivity", "Ω·m", "ohm m"},
	Density:        {"density", "kg/m³", "kg/m3"},
	SpecificHeat:   {"specific heat", "J/(kg·K)", "J/(kg K)"},
	Conductivity:   {"thermal conductivity", "W/(m·K)", "W/(m K)"},
	PerKelvin:      {"temperature coefficient", "1/K", "1/K"},

	FieldGradient:     {"field gradient", "T/m", "mT/m"},
	ThermalResistance: {"thermal resistance", "K/W", "K/W"},
	HeatCapacity:      {"heat capacity", "J/K", "J/K"},
}

// Named reports whether the dimension has a name and a unit of its own
// ("T", "A·m²"), rather than only a product of base units (V/T, a
// pick-up coil's sensitivity, is m²·s⁻¹ and has none).
func (d Dim) Named() bool {
	_, ok := dimNames[d]
	return ok
}

// Name returns the dimension's everyday name ("length", "flux density"),
// or its SI unit expression when it has none.
func (d Dim) Name() string {
	if i, ok := dimNames[d]; ok {
		return i.name
	}
	return "dimension " + d.Symbol()
}

// Symbol returns the SI unit of the dimension as printed in the memo:
// "m", "T", "A·m²", "W/(m²·K)", or a product of base units such as
// "kg·m·s⁻³" for dimensions without a name. The plain number's symbol is "".
func (d Dim) Symbol() string {
	if i, ok := dimNames[d]; ok {
		return i.symbol
	}
	var parts []string
	add := func(sym string, e int8) {
		if e == 0 {
			return
		}
		if e == 1 {
			parts = append(parts, sym)
			return
		}
		parts = append(parts, sym+superscript(int(e)))
	}
	add("kg", d.Kg)
	add("m", d.M)
	add("s", d.S)
	add("A", d.A)
	add("K", d.K)
	add("rad", d.Rad)
	return strings.Join(parts, "·")
}

// String is Symbol, or "1" for a plain number.
func (d Dim) String() string {
	if d == Dimensionless {
		return "1"
	}
	return d.Symbol()
}

// Example returns a unit to suggest when a value of dimension d is wanted:
// "mm" for a length, "uT" for a flux density.
func (d Dim) Example() string {
	if i, ok := dimNames[d]; ok {
		return i.example
	}
	return d.Symbol()
}

// withArticle returns "a length", "an angle", "an inductance".
func withArticle(s string) string {
	if s == "" {
		return s
	}
	switch s[0] {
	case 'a', 'e', 'i', 'o', 'u':
		return "an " + s
	}
	return "a " + s
}

var superDigits = []rune("⁰¹²³⁴⁵⁶⁷⁸⁹")

func superscript(n int) string {
	var b strings.Builder
	if n < 0 {
		b.WriteRune('⁻')
		n = -n
	}
	s := []byte(strconv.Itoa(n))
	for _, c := range s {
		b.WriteRune(superDigits[c-'0'])
	}
	return b.String()
}
