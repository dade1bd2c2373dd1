// Package format writes numbers the way the memo, the terminal and the JSON
// labels show them: engineering notation with SI prefixes, significant
// figures, percentages, durations and degrees Celsius. It is a leaf: it
// imports nothing of the project.
package format

import (
	"coilmemo/calc"

	"math"
	"regexp"
	"strconv"
	"strings"
)

// Eng formats an SI value in engineering notation with sig significant
// figures and an SI prefix on unit: Eng(0.00123, "T", 3) = "1.23 mT".
// A few units are shown the way the trade reads them rather than with a
// prefix: kg as g or kg, m² as mm² or m², m³ as cm³ or m³, A/m² as A/mm², and °C, %, ratios
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
	case "m³":
		// a prefix on a cubed unit would cube too (1 mm³ = 10⁻⁹ m³): small
		// volumes in cm³, as the trade reads them
		if math.Abs(v) < 1e-3 {
			return Sig(v*1e6, sig) + " cm³"
		}
		return Sig(v, sig) + " m³"
	case "A/m²":
		return Sig(v/1e6, sig) + " A/mm²"
	case "Ω·m", "kg/m³", "W/(m²·K)", "J/(kg·K)", "W/(m·K)", "K/W":
		// material data read as handbooks print them, without a prefix
		return Sig(v, sig) + " " + unit
	case "°C", "%", "", "K", "°":
		s := Sig(v, sig)
		if unit == "°C" {
			s = celsius(v, sig)
		}
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

// celsius writes a temperature on the Celsius scale to sig significant
// figures but never finer than sig − 2 decimals: the scale's zero is
// arbitrary, so a temperature near it has no more resolution than one of
// 10 °C or 100 °C (0.5967 °C to four figures is "0.60 °C", as 37.72 °C).
func celsius(v float64, sig int) string {
	dec := max(sig-2, 0)
	if v != 0 && !math.IsInf(v, 0) {
		mag := int(math.Floor(math.Log10(math.Abs(v))))
		dec = min(dec, max(sig-1-mag, 0))
	}
	if mag := math.Abs(v); mag >= 1e7 {
		return Sig(v, sig)
	}
	s := strconv.FormatFloat(v, 'f', dec, 64)
	if strings.Trim(s, "-0.") == "" {
		s = strings.TrimPrefix(s, "-") // no signed zero
	}
	if dec > 0 {
		// rounding up may add a digit (9.996 → 10.00): keep sig figures
		if digits := strings.TrimLeft(strings.ReplaceAll(strings.TrimPrefix(s, "-"), ".", ""), "0"); len(digits) > sig {
			s = strconv.FormatFloat(v, 'f', dec-1, 64)
		}
	} else if v != 0 {
		// no decimals: round to the significant figures (1234.5 to 3 is 1230)
		mag := int(math.Floor(math.Log10(math.Abs(v))))
		if sig-1-mag < 0 {
			p := math.Pow(10, float64(mag+1-sig))
			s = strconv.FormatFloat(math.Round(v/p)*p, 'f', 0, 64)
		}
	}
	return strings.Replace(s, "-", "−", 1)
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

// Percent formats a ratio as a percentage to two significant figures;
// below 0.001 % in size it is "< 0.001 %", never a power of ten or a
// signed zero: 0.0031 → "0.31 %", 1.6e-8 → "< 0.001 %". The verification
// table writes every relative difference and tolerance this one way.
func Percent(v float64) string {
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
	return Sig(p, 2) + " %"
}

// Margin formats a signed margin to one decimal, "+12.5 %" or "−3.1 K":
// a margin that rounds to zero is "0.0" without a sign, and one of 10⁴ or
// more (a requirement met many times over) is given to three significant
// figures, "+4.30×10¹⁰ %".
func Margin(v float64, unit string) string {
	if math.IsNaN(v) {
		return "n/a"
	}
	if math.Abs(v) >= 1e4 && !math.IsInf(v, 0) {
		s := Sci(v, 3)
		if v > 0 {
			s = "+" + s
		}
		return s + " " + unit
	}
	s := strconv.FormatFloat(v, 'f', 1, 64)
	switch {
	case s == "0.0" || s == "-0.0":
		s = "0.0"
	case v > 0:
		s = "+" + s
	}
	return strings.Replace(s, "-", "−", 1) + " " + unit
}

// RelMargin writes the margin of a requirement as a fraction m of the
// required value (positive: met with room to spare), the one form every
// table of margins uses: a signed percent to three significant figures,
// "+12.5 %", "−3.10 %", "+0.164 %", "+0.0500 %", whatever its size down
// to 0.001 %; a margin smaller than that in size "< +0.001 %" (met) or
// "> −0.001 %" (missed), so that the sign is never lost and never a bare
// "0.0 %"; none at all, exactly at the requirement, "0 %"; and a value
// that exceeds an at-least requirement tenfold or more as the ratio of
// the two to two significant figures, "×73", since a percentage of
// thousands says nothing more. Every table with such a margin says so
// (RatioMarginNote).
func RelMargin(m float64) string {
	p := 100 * m
	switch {
	case math.IsNaN(m):
		return "n/a"
	case math.IsInf(m, 1):
		return "∞"
	case m >= RatioMargin:
		return "×" + Sci(1+m, 2)
	case m == 0:
		return "0 %"
	case p > 0 && p < 1e-3:
		return "< +0.001 %"
	case p < 0 && p > -1e-3:
		return "> −0.001 %"
	}
	s := Sig(p, 3) + " %"
	if m > 0 {
		s = "+" + s
	}
	return s
}

// RatioMargin is the relative margin from which RelMargin writes the
// ratio of value to requirement rather than a percentage: a value ten
// times an at-least requirement.
const RatioMargin = 9

// RatioMarginNote is the words a table or text with a margin written as a
// ratio ("×73") adds to say what it is.
const RatioMarginNote = "×n: n times the requirement"

// InsulationClass writes an insulation thermal class, given in kelvin,
// the one way the memo names it: "class F (155 °C)" for a class of IEC
// 60085 with a letter, "class 250 (250 °C)" for one without, and a
// temperature that is no class of the standard as "class 170 °C".
func InsulationClass(k float64) string {
	c := Celsius(k)
	t := Eng(c, "°C", 3)
	for _, cl := range IECClasses {
		if math.Abs(c-cl.Celsius) < 0.005 {
			if cl.Letter == "" {
				return "class " + strconv.FormatFloat(cl.Celsius, 'f', -1, 64) + " (" + t + ")"
			}
			return "class " + cl.Letter + " (" + t + ")"
		}
	}
	return "class " + t
}

// IECClasses are the thermal classes of IEC 60085:2007 (Table 1), °C,
// with their letter designations where the standard gives one.
var IECClasses = []struct {
	Celsius float64
	Letter  string
}{{90, "Y"}, {105, "A"}, {120, "E"}, {130, "B"}, {155, "F"}, {180, "H"}, {200, "N"}, {220, "R"}, {250, ""}}

// Count writes "n things" with the noun in the singular for one:
// Count(1, "check", "checks") = "1 check".
func Count(n int, one, many string) string {
	if n == 1 {
		return "1 " + one
	}
	return Digits(n) + " " + many
}

// EngTrim writes an SI value with an engineering prefix and no more
// digits than it has, up to sig significant figures, trailing zeros
// dropped: EngTrim(0.000237217, "m", 6) = "237.217 µm", EngTrim(2e-6, "s",
// 6) = "2 µs", EngTrim(0.12, "m", 6) = "120 mm".
func EngTrim(v float64, unit string, sig int) string {
	if v == 0 || math.IsNaN(v) || math.IsInf(v, 0) {
		return Eng(v, unit, sig)
	}
	return trimmed(v, engExp(v), sig) + " " + prefix(engExp(v)) + unit
}

// engExp is the engineering exponent (a multiple of 3, −15 … 12) of v.
func engExp(v float64) int {
	if v == 0 {
		return 0
	}
	exp := int(math.Floor(math.Log10(math.Abs(v))/3)) * 3
	return min(max(exp, -15), 12)
}

// trimmed writes v/10^exp to sig significant figures without trailing
// zeros, with a true minus sign.
func trimmed(v float64, exp, sig int) string {
	m := v / math.Pow(10, float64(exp))
	if m == 0 {
		return "0"
	}
	mag := int(math.Floor(math.Log10(math.Abs(m))))
	p := math.Pow(10, float64(sig-1-mag))
	m = math.Round(m*p) / p
	s := strconv.FormatFloat(m, 'f', -1, 64)
	if strings.Contains(s, "e") {
		s = Sig(m, sig)
	}
	return strings.Replace(s, "-", "−", 1)
}

// engUnits are the units SIText rewrites with a prefix.
var engUnits = map[string]bool{"m": true, "A": true, "V": true, "T": true, "Hz": true, "F": true, "H": true,
	"s": true, "W": true, "Ω": true, "ohm": true, "T/m": true, "A/m": true, "N": true, "N·m": true, "A·m²": true}

var (
	siScalar = regexp.MustCompile(`^(-?[0-9.]+(?:e[-+]?[0-9]+)?) (\S+)(.*)$`)
	siVector = regexp.MustCompile(`^\((-?[0-9.e+-]+), (-?[0-9.e+-]+), (-?[0-9.e+-]+)\) (\S+)(.*)$`)
	siRange  = regexp.MustCompile(`^(-?[0-9.]+(?:e[-+]?[0-9]+)?) (\S+) \.\. (-?[0-9.]+(?:e[-+]?[0-9]+)?) (\S+)(.*)$`)
	siStep   = regexp.MustCompile(`^ step (-?[0-9.]+(?:e[-+]?[0-9]+)?) (\S+)(.*)$`)
	siBare   = regexp.MustCompile(`^(.*)\(bare ([0-9.]+) mm\)(.*)$`)
)

// SIText rewrites a value as the spec reader states it in SI ("0.000237217
// m (heavy-build estimate)", "2e-06 s", "(0, 3e-05, 0) T", "10 Hz .. 10000
// Hz") in engineering units, keeping every digit it has (up to 6) and
// any remark after it: "237.217 µm (heavy-build estimate)", "2 µs",
// "(0, 30, 0) µT", "10 Hz .. 10 kHz". A vector's components share one
// prefix; an angle in radians takes none. A position or length of zero is
// in mm, as every other ("(0, 0, 0) mm"); a mass below 1 kg in grams; a
// range's step in the range's prefix ("100 mA … 1 A step 100 mA"); a
// gauge's bare diameter in engineering units ("AWG 28 (bare 321 µm)"); a
// range without a unit with the same "…" ("20 … 60 step 20"). Anything
// else (kelvin, counts, dates) is returned as it is.
func SIText(s string) string { return SITextSig(s, 6) }

// SITextSig is SIText to at most sig significant figures, trailing zeros
// dropped: the inputs table writes a value the reader derived or a default
// ("0.00109122 m (heavy-build estimate)") to 4, "1.091 mm (heavy-build
// estimate)". Kelvin is left as it is: it is the exact conversion of a
// temperature in °C ("293.15 K (20 °C)").
func SITextSig(s string, sig int) string {
	for _, rel := range []string{"<= ", ">= "} {
		if rest, ok := strings.CutPrefix(s, rel); ok {
			return rel + SITextSig(rest, sig)
		}
	}
	if m := siRange.FindStringSubmatch(s); m != nil && m[2] == m[4] {
		a, errA := strconv.ParseFloat(m[1], 64)
		b, errB := strconv.ParseFloat(m[3], 64)
		switch {
		case errA != nil || errB != nil:
		case engUnits[m[2]]:
			rest := m[5]
			if st := siStep.FindStringSubmatch(rest); st != nil && st[2] == m[2] {
				if v, err := strconv.ParseFloat(st[1], 64); err == nil {
					rest = " step " + EngTrim(v, m[2], sig) + st[3]
				}
			}
			return rangeText(a, b, m[2], sig) + rest
		default: // kelvin and the rest as they are, the unit once
			return strings.Replace(m[1], "-", "−", 1) + " … " + strings.Replace(m[3], "-", "−", 1) + " " + m[2] + m[5]
		}
	}
	if m := siVector.FindStringSubmatch(s); m != nil && engUnits[m[4]] {
		var v [3]float64
		big := 0.0
		for i := range v {
			x, err := strconv.ParseFloat(m[i+1], 64)
			if err != nil {
				return s
			}
			v[i] = x
			big = max(big, math.Abs(x))
		}
		exp := engExp(big)
		if big == 0 && m[4] == "m" {
			exp = -3 // a position at the origin in mm, as every position
		}
		parts := make([]string, 3)
		for i, x := range v {
			parts[i] = trimmed(x, exp, sig)
		}
		return "(" + strings.Join(parts, ", ") + ") " + prefix(exp) + m[4] + m[5]
	}
	if m := siBare.FindStringSubmatch(s); m != nil {
		// a gauge with its bare diameter, which the reader gives in mm
		if v, err := strconv.ParseFloat(m[2], 64); err == nil {
			return m[1] + "(bare " + EngTrim(v*1e-3, "m", sig) + ")" + m[3]
		}
	}
	if m := siScalar.FindStringSubmatch(s); m != nil && m[2] == "kg" {
		if v, err := strconv.ParseFloat(m[1], 64); err == nil && v != 0 && math.Abs(v) < 1 {
			return trimmed(v*1e3, 0, sig) + " g" + m[3]
		}
	}
	if m := siScalar.FindStringSubmatch(s); m != nil && (engUnits[m[2]] || m[2] == "rad") {
		if v, err := strconv.ParseFloat(m[1], 64); err == nil {
			if v == 0 && m[2] == "m" {
				return "0 mm" + m[3]
			}
			if m[2] == "rad" {
				if v == 0 {
					return "0 rad" + m[3]
				}
				return trimmed(v, 0, sig) + " rad" + m[3]
			}
			return EngTrim(v, m[2], sig) + m[3]
		}
	}
	if a, b, ok := strings.Cut(s, " .. "); ok {
		return a + " … " + b // a range without a unit (turns, gauges) as every range
	}
	return s
}

// rangeText writes a range from a to b in unit: with one prefix and the
// unit once where both ends take the same prefix or one end is zero, "0 …
// 12 mm"; each end with its own otherwise, "10 Hz …
// 10 kHz".
func rangeText(a, b float64, unit string, sig int) string {
	ea, eb := engExp(a), engExp(b)
	switch {
	case a == 0:
		ea = eb
	case b == 0:
		eb = ea
	}
	if ea == eb {
		return trimmed(a, ea, sig) + " … " + trimmed(b, eb, sig) + " " + prefix(ea) + unit
	}
	return EngTrim(a, unit, sig) + " … " + EngTrim(b, unit, sig)
}

// Sci formats a dimensionless number of any size (a Rayleigh number) to
// sig significant figures: in scientific notation from 10⁴ up and below
// 0.01, "2.9×10⁶", "7.6×10⁻³"; plainly between, "14", "910", "0.076"
// (never "1.4×10¹").
func Sci(v float64, sig int) string {
	if math.IsNaN(v) {
		return "n/a"
	}
	if v == 0 {
		return "0"
	}
	if a := math.Abs(v); a >= 0.01 && a < 1e4 {
		if r, _ := strconv.ParseFloat(strings.Replace(Sig(v, sig), "−", "-", 1), 64); math.Abs(r) < 1e4 {
			return Sig(v, sig)
		}
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
	s := Percent(v)
	if v > 0 && 100*v >= 1e-3 {
		return "+" + s
	}
	return s
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

// Digits writes a whole number: digits, grouped in threes by a thin space
// from 10 000 up ("9999", "50 167"), as SI style writes numbers.
func Digits(n int) string {
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

// Tolerance is a relative tolerance, the one form every tolerance of the
// verification takes: to at most two significant figures with no
// trailing zeros and never a power of ten; as a percentage from 0.001 %
// up, "1 %", "0.2 %", "0.017 %", "0.001 %", and below that in parts per
// million, "0.01 ppm", "4.3 ppm". A tolerance the checks compute is
// rounded up to two figures before it is applied (analysis.newCheck), so
// the figure printed is the one applied.
func Tolerance(v float64) string {
	switch {
	case math.IsNaN(v):
		return "n/a"
	case !(v > 0):
		return "0 %"
	}
	if perMillion(v) {
		return decimalText(RoundSig(1e6*v, 2)) + " ppm"
	}
	return decimalText(RoundSig(100*v, 2)) + " %"
}

// perMillion reports whether a relative tolerance is written in parts per
// million: below 0.001 % once rounded to two figures.
func perMillion(tol float64) bool { return RoundSig(100*tol, 2) < 1e-3 }

// RoundSig rounds v to sig significant figures.
func RoundSig(v float64, sig int) float64 {
	if v == 0 || math.IsNaN(v) || math.IsInf(v, 0) {
		return v
	}
	p := math.Pow(10, float64(sig-1-int(math.Floor(math.Log10(math.Abs(v))))))
	return math.Round(v*p) / p
}

// CeilSig rounds v > 0 up to sig significant figures (a value that has
// them already, to within 10⁻⁹ of itself, is kept).
func CeilSig(v float64, sig int) float64 {
	if !(v > 0) || math.IsInf(v, 0) {
		return v
	}
	p := math.Pow(10, float64(sig-1-int(math.Floor(math.Log10(v)))))
	if r := math.Round(v * p); math.Abs(v*p-r) <= 1e-9*r {
		return r / p
	}
	return math.Ceil(v*p) / p
}

// decimalText writes a positive figure in plain decimals without
// trailing zeros: "0.017", "12.5", "0.0001".
func decimalText(p float64) string {
	return strconv.FormatFloat(p, 'f', -1, 64)
}

// CheckDiff writes a check's relative difference d against its relative
// tolerance tol so that the verdict can be read from the two figures, in
// the unit of the tolerance (Tolerance: per cent, or parts per million
// below 0.001 %): at a resolution at least ten times finer than the
// tolerance, and at least two significant figures ("0.48 %" against
// 0.5 %, "12.0 %" against 1 %); a difference below that resolution, none
// included, as "< x" with x the resolution — 0.001 % at most, a tenth of
// the tolerance or less ("< 0.001 %" against 1 %, "< 0.0001 %" against
// 0.001 %, "< 0.001 ppm" against 0.01 ppm). Plain decimals, never a power
// of ten, "0 %" nor a signed zero.
func CheckDiff(d, tol float64) string {
	if math.IsNaN(d) || math.IsNaN(tol) || !(tol > 0) {
		return Percent(d)
	}
	scale, unit, floor := 100.0, " %", 1e-3
	if perMillion(tol) {
		scale, unit, floor = 1e6, " ppm", math.Inf(1)
	}
	d, T := math.Abs(d)*scale, RoundSig(scale*tol, 2)
	res := math.Pow(10, math.Floor(math.Log10(T))-1) // ≤ T/10
	floor = math.Min(res, floor)
	if d < floor {
		return "< " + decimalText(floor) + unit
	}
	if math.IsInf(d, 0) {
		return "∞" + unit
	}
	// significant figures enough for the resolution, two at least
	sig := max(2, int(math.Floor(math.Log10(d)))-int(math.Round(math.Log10(res)))+1)
	r := RoundSig(d, sig)
	dec := max(0, sig-1-int(math.Floor(math.Log10(r))))
	return strconv.FormatFloat(r, 'f', dec, 64) + unit
}

// EngColumn writes the values of one table column (or of the components
// of one vector) in one unit: the engineering prefix of the largest in
// size, each to sig significant figures, a zero (or rounding noise below
// 10⁻¹⁸) as "0" in that unit: {0, 92.53e-9, 433.0e-6} T to 4 is "0 µT",
// "0.09253 µT", "433.0 µT". A column of zeros takes the prefix of ref, the
// value it stands beside (the magnitude of the vector), or none.
func EngColumn(vals []float64, ref float64, unit string, sig int) []string {
	big := 0.0
	for _, v := range vals {
		if !math.IsNaN(v) && !math.IsInf(v, 0) && math.Abs(v) >= 1e-18 {
			big = math.Max(big, math.Abs(v))
		}
	}
	if big == 0 && math.Abs(ref) >= 1e-18 && !math.IsInf(ref, 0) {
		big = math.Abs(ref)
	}
	exp := 0
	if big > 0 {
		exp = engExp(big)
		if r, _ := strconv.ParseFloat(Sig(big/math.Pow(10, float64(exp)), sig), 64); r >= 1000 && exp < 12 {
			exp += 3 // rounding carries into the next prefix: 999.96 → 1.000 k
		}
	}
	out := make([]string, len(vals))
	for i, v := range vals {
		switch {
		case math.IsNaN(v):
			out[i] = "n/a"
		case math.IsInf(v, 0):
			out[i] = Eng(v, unit, sig)
		case math.Abs(v) < 1e-18:
			out[i] = "0 " + prefix(exp) + unit
		default:
			out[i] = Sig(v/math.Pow(10, float64(exp)), sig) + " " + prefix(exp) + unit
		}
	}
	return out
}
