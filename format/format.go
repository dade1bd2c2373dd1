// Package format writes numbers the way the memo, the terminal and the JSON
// labels show them: engineering notation with SI prefixes, significant
// figures, percentages, durations and degrees Celsius. It is a leaf: it
// imports nothing of the project.
package format

import (
	"coilmemo/calc"

	"math"
	"strconv"
	"strings"
)

// Eng formats an SI value in engineering notation with sig significant
// figures and an SI prefix on unit: Eng(0.00123, "T", 3) = "1.23 mT".
// A few units are shown the way the trade reads them rather than with a
// prefix: kg as g or kg, m² as mm² or m², A/m² as A/mm², and °C, %, ratios
// and material data (Ω·m, kg/m³, W/(m²·K)) plain.
func Eng(v float64, unit string, sig int) string {
	if math.IsNaN(v) {
		return "n/a"
	}
	if math.IsInf(v, 0) {
		if v > 0 {
			return "∞ " + unit
		}
		return "−∞ " + unit
	}
	switch unit {
	case "kg":
		if math.Abs(v) < 1 {
			return Eng(v*1e3, "g", sig)
		}
		return Sig(v, sig) + " kg"
	case "m²":
		if math.Abs(v) < 1e-2 {
			return Sig(v*1e6, sig) + " mm²"
		}
		return Sig(v, sig) + " m²"
	case "A/m²":
		return Sig(v/1e6, sig) + " A/mm²"
	case "Ω·m", "kg/m³", "W/(m²·K)", "J/(kg·K)", "W/(m·K)", "K/W":
		// material data read as handbooks print them, without a prefix
		return Sig(v, sig) + " " + unit
	case "°C", "%", "", "K", "°":
		s := Sig(v, sig)
		if unit == "" {
			return s
		}
		if unit == "%" || unit == "°" {
			return s + unit
		}
		return s + " " + unit
	}
	if math.Abs(v) < 1e-18 {
		// below atto-units a figure here is rounding noise (a component
		// that cancels by symmetry), not a result
		return "0 " + unit
	}
	exp := int(math.Floor(math.Log10(math.Abs(v))/3)) * 3
	if exp < -15 {
		exp = -15
	}
	if exp > 12 {
		exp = 12
	}
	m := v / math.Pow(10, float64(exp))
	// Rounding may carry into the next prefix: 999.96 → 1000 → 1.00 k.
	if r, _ := strconv.ParseFloat(Sig(m, sig), 64); math.Abs(r) >= 1000 && exp < 12 {
		exp += 3
		m = v / math.Pow(10, float64(exp))
	}
	return Sig(m, sig) + " " + prefix(exp) + unit
}

func prefix(exp int) string {
	switch exp {
	case -15:
		return "f"
	case -12:
		return "p"
	case -9:
		return "n"
	case -6:
		return "µ"
	case -3:
		return "m"
	case 3:
		return "k"
	case 6:
		return "M"
	case 9:
		return "G"
	case 12:
		return "T"
	}
	return ""
}

// Sig formats v with sig significant figures in plain decimal notation
// (scientific beyond 1e±7), keeping trailing zeros that are significant and
// using a true minus sign.
func Sig(v float64, sig int) string {
	if v == 0 {
		return "0"
	}
	if math.IsNaN(v) {
		return "n/a"
	}
	mag := int(math.Floor(math.Log10(math.Abs(v))))
	var s string
	if mag < -7 || mag > 7 {
		s = strconv.FormatFloat(v, 'e', sig-1, 64)
		mant, exp, _ := strings.Cut(s, "e")
		e, _ := strconv.Atoi(exp)
		s = mant + "×10" + superscript(strconv.Itoa(e))
	} else {
		dec := sig - 1 - mag
		if dec < 0 {
			// Round to the significant figures, print as an integer.
			p := math.Pow(10, float64(-dec))
			s = strconv.FormatFloat(math.Round(v/p)*p, 'f', 0, 64)
		} else {
			s = strconv.FormatFloat(v, 'f', dec, 64)
			// Rounding up may add a digit (9.996 → 10.00): drop one decimal.
			if digits := strings.TrimLeft(strings.ReplaceAll(strings.TrimPrefix(s, "-"), ".", ""), "0"); len(digits) > sig && dec > 0 {
				s = strconv.FormatFloat(v, 'f', dec-1, 64)
			}
		}
	}
	return strings.Replace(s, "-", "−", 1)
}

// Percent formats a ratio as a percentage to two significant figures,
// with a power of ten below 0.001 %: 0.0031 → "0.31 %", 1.6e-8 →
// "1.6×10⁻⁶ %". The verification table writes every relative difference
// and tolerance this one way.
func Percent(v float64) string {
	switch {
	case math.IsNaN(v):
		return "n/a"
	case v == 0:
		return "0 %"
	}
	p := 100 * v
	if math.Abs(p) >= 1e-3 {
		return Sig(p, 2) + " %"
	}
	return Sci(p, 2) + " %"
}

// Sci formats v in scientific notation with sig significant figures,
// "2.9×10⁶", for dimensionless numbers of any size (Rayleigh numbers).
func Sci(v float64, sig int) string {
	if math.IsNaN(v) {
		return "n/a"
	}
	if v == 0 {
		return "0"
	}
	s := strconv.FormatFloat(v, 'e', max(sig-1, 0), 64)
	mant, exp, _ := strings.Cut(s, "e")
	e, _ := strconv.Atoi(exp)
	if e == 0 {
		return strings.Replace(mant, "-", "−", 1)
	}
	return strings.Replace(mant, "-", "−", 1) + "×10" + superscript(strconv.Itoa(e))
}

// Duration formats a time in the unit a reader expects for its size:
// seconds up to two minutes, minutes up to two hours, then hours, to sig
// significant figures (below a second, engineering prefixes: 1.58 ms).
func Duration(v float64, sig int) string {
	switch a := math.Abs(v); {
	case math.IsNaN(v):
		return "n/a"
	case a < 1:
		return Eng(v, "s", sig)
	case a < 120:
		return Sig(v, sig) + " s"
	case a < 7200:
		return Sig(v/60, sig) + " min"
	}
	return Sig(v/3600, sig) + " h"
}

// Celsius converts kelvin to degrees Celsius.
func Celsius(k float64) float64 { return calc.KelvinToCelsius(k) }

// superscript writes an integer's digits and sign as Unicode superscripts.
func superscript(s string) string {
	const sup = "⁰¹²³⁴⁵⁶⁷⁸⁹"
	var b strings.Builder
	for _, r := range s {
		switch {
		case r == '-':
			b.WriteString("⁻")
		case r >= '0' && r <= '9':
			b.WriteString(string([]rune(sup)[r-'0']))
		}
	}
	return b.String()
}

// SignedPercent formats a relative change as a signed percentage to two
// significant figures: +6.3 %, −0.52 %; a change smaller than 0.001 % in
// size is "< 0.001 %" (never "−0.0 %" or a power of ten), and none is
// "0 %".
func SignedPercent(v float64) string {
	switch {
	case math.IsNaN(v):
		return "n/a"
	case v == 0:
		return "0 %"
	}
	p := 100 * v
	if math.Abs(p) < 1e-3 {
		return "< 0.001 %"
	}
	s := Sig(p, 2)
	if p > 0 {
		s = "+" + s
	}
	return s + " %"
}

// Change writes a value's move from old to new, both SI in unit, to four
// significant figures, with the difference: relative for most quantities
// ("+6.3 %"), in kelvin for a temperature (unit "°C", values in kelvin:
// "+3.2 K"), and absolute where the old value is zero.
func Change(old, new float64, unit string) (from, to, delta string) {
	if unit == "°C" || unit == "degC" {
		from, to = Eng(Celsius(old), "°C", 4), Eng(Celsius(new), "°C", 4)
		return from, to, Signed(new-old, "K", 2)
	}
	from, to = Eng(old, unit, 4), Eng(new, unit, 4)
	if old == 0 || math.IsNaN(old) || math.IsNaN(new) {
		return from, to, Signed(new-old, unit, 3)
	}
	return from, to, SignedPercent((new - old) / math.Abs(old))
}

// Signed is Eng with an explicit sign: "+3.2 K", "−12 mA".
func Signed(v float64, unit string, sig int) string {
	s := Eng(v, unit, sig)
	if v > 0 && !math.IsInf(v, 0) {
		return "+" + s
	}
	return s
}

// Unit writes a unit as spec.LimitQuantities names it ("A m2", "degC",
// "ohm") the way the memo prints it ("A·m²", "°C", "Ω").
func Unit(u string) string {
	switch u {
	case "A m2":
		return "A·m²"
	case "degC":
		return "°C"
	case "ohm":
		return "Ω"
	case "A/m2":
		return "A/m²"
	case "N m":
		return "N·m"
	}
	return u
}

// Count writes a whole number as a count: digits, grouped in threes by a
// thin space from 10 000 up ("9999", "50 167"), as SI style writes numbers.
func Count(n int) string {
	s := strconv.Itoa(n)
	neg := strings.HasPrefix(s, "-")
	s = strings.TrimPrefix(s, "-")
	if len(s) > 4 {
		var b strings.Builder
		for i, r := range s {
			if i > 0 && (len(s)-i)%3 == 0 {
				b.WriteRune('\u2009')
			}
			b.WriteRune(r)
		}
		s = b.String()
	}
	if neg {
		s = "−" + s
	}
	return s
}
