package units

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"strings"
	"unicode"
	"unicode/utf8"
)

// Quantity is a value converted to SI together with its dimension.
// Absolute temperatures are in kelvin, angles in radians, percentages are
// fractions (50 % is 0.5).
type Quantity struct {
	Value float64
	Dim   Dim
}

// Is reports whether q has dimension d.
func (q Quantity) Is(d Dim) bool { return q.Dim == d }

// String formats q in SI, e.g. "0.12 m", "4.5e-5 T", "0.2 A·m²".
func (q Quantity) String() string { return Format(q.Value, q.Dim) }

// Format writes an SI value with the SI unit of d, using up to six
// significant digits: Format(0.12, Length) is "0.12 m".
func Format(v float64, d Dim) string {
	n := FormatNumber(v)
	if s := d.Symbol(); s != "" {
		return n + " " + s
	}
	return n
}

// FormatNumber writes v with up to six significant digits and a compact
// exponent when one is needed: 0.12, 120, 1.7241e-8.
func FormatNumber(v float64) string {
	s := strconv.FormatFloat(v, 'g', 6, 64)
	i := strings.IndexByte(s, 'e')
	if i < 0 {
		return s
	}
	mant, exp := s[:i], s[i+1:]
	sign := ""
	if exp[0] == '-' {
		sign = "-"
	}
	exp = strings.TrimLeft(exp[1:], "0")
	if exp == "" {
		return mant
	}
	return mant + "e" + sign + exp
}

// maxLen bounds the text Parse looks at; values in a spec are short.
const maxLen = 200

// Parse reads a number optionally followed by a unit and returns it in SI.
// A bare number is a plain (dimensionless) quantity. Units may carry SI
// prefixes (p n u µ m c k M G), exponents (m2, m^2, m²; s-1, s^-1, s⁻¹),
// products (A m2, A·m², A*m^2, N.m) and quotients (A/mm2, W/m2K,
// W/(m2 K)). Everything after a "/" up to the next "/" or closing
// parenthesis is in the denominator, so W/m2 K is W/(m²·K).
//
// A temperature in degC or degF standing alone is an absolute temperature
// and is converted to kelvin (25 degC → 298.15); inside a compound unit
// such as W/(m2 degC) it is a temperature interval (same size as the
// kelvin).
func Parse(s string) (Quantity, error) {
	num, unit, err := Split(s)
	if err != nil {
		return Quantity{}, err
	}
	v, err := parseNumber(num)
	if err != nil {
		return Quantity{}, err
	}
	if unit == "" {
		return Quantity{Value: v, Dim: Dimensionless}, nil
	}
	u, err := parseUnit(unit)
	if err != nil {
		return Quantity{}, err
	}
	si := u.size.apply(v) + u.offset
	if math.IsInf(si, 0) || math.IsNaN(si) {
		return Quantity{}, fmt.Errorf("%s: value out of range", strings.TrimSpace(s))
	}
	if u.absolute && si < 0 {
		return Quantity{}, fmt.Errorf("%s is below absolute zero", strings.TrimSpace(s))
	}
	return Quantity{Value: si, Dim: u.dim}, nil
}

// ParseAs is Parse followed by a check that the value has dimension want.
// A bare number is accepted only when want is Dimensionless (so are "50 %"
// and units that cancel, such as mm/m). Messages name
// both dimensions: `120 mm is a length; want a current (A)`, `no unit
// given: 12 (expected a length such as mm)`.
func ParseAs(s string, want Dim) (Quantity, error) {
	q, err := Parse(s)
	var uu *unknownUnitError
	if errors.As(err, &uu) {
		_, unit, _ := Split(s)
		return q, uu.within(unit, want)
	}
	if err != nil {
		return q, err
	}
	if q.Dim == want {
		return q, nil
	}
	t := strings.TrimSpace(s)
	if _, unit, _ := Split(s); unit == "" {
		return q, fmt.Errorf("no unit given: %s (expected %s such as %s)", t, withArticle(want.Name()), want.Example())
	}
	if _, named := dimNames[q.Dim]; !named {
		return q, fmt.Errorf("%s has dimension %s; want %s", t, q.Dim.Symbol(), Describe(want))
	}
	return q, fmt.Errorf("%s is %s; want %s", t, withArticle(q.Dim.Name()), Describe(want))
}

func symbolNote(d Dim) string {
	if s := d.Symbol(); s != "" {
		return " (" + s + ")"
	}
	return ""
}

// Describe returns "a length (m)", "an angle (rad)": the phrase used in
// messages for a wanted dimension.
func Describe(d Dim) string { return withArticle(d.Name()) + symbolNote(d) }

// DimOf returns the dimension of a bare unit expression such as "A m2",
// "degC", "A/mm2", "N m" or "ohm".
func DimOf(unit string) (Dim, error) {
	unit = strings.TrimSpace(unit)
	if unit == "" {
		return Dim{}, errors.New("empty unit")
	}
	u, err := parseUnit(unit)
	if err != nil {
		return Dim{}, err
	}
	return u.dim, nil
}

// In converts an SI value to the given unit: In(0.12, "mm") is 120,
// In(293.15, "degC") is 20.
func In(si float64, unit string) (float64, error) {
	unit = strings.TrimSpace(unit)
	if unit == "" {
		return si, nil
	}
	u, err := parseUnit(unit)
	if err != nil {
		return 0, err
	}
	return u.size.invert(si - u.offset), nil
}

// Split separates the leading number of s from the unit that follows it:
// Split("12.5 mm") is "12.5", "mm". The unit is "" for a bare number.
func Split(s string) (number, unit string, err error) {
	s = strings.TrimSpace(s)
	if s == "" {
		return "", "", errors.New("empty value")
	}
	if len(s) > maxLen {
		return "", "", fmt.Errorf("value too long (%d characters)", len(s))
	}
	if !utf8.ValidString(s) {
		return "", "", errors.New("value is not valid UTF-8 text")
	}
	n := scanNumber(s)
	if n == 0 {
		if _, err := parseUnit(s); err == nil {
			return "", "", fmt.Errorf("missing number before unit %q", s)
		}
		return "", "", fmt.Errorf("not a number: %q", s)
	}
	return s[:n], strings.TrimSpace(s[n:]), nil
}

// scanNumber returns the length of the decimal number at the start of s:
// optional sign (+, -, or the minus sign U+2212), digits with an optional
// decimal point, an optional exponent. It returns 0 when there is none.
func scanNumber(s string) int {
	i := 0
	if strings.HasPrefix(s, "−") {
		i = len("−")
	} else if i < len(s) && (s[i] == '+' || s[i] == '-') {
		i++
	}
	digits := 0
	for i < len(s) && s[i] >= '0' && s[i] <= '9' {
		i++
		digits++
	}
	if i < len(s) && s[i] == '.' {
		j := i + 1
		frac := 0
		for j < len(s) && s[j] >= '0' && s[j] <= '9' {
			j++
			frac++
		}
		if digits+frac > 0 {
			i = j
			digits += frac
		}
	}
	if digits == 0 {
		return 0
	}
	if i < len(s) && (s[i] == 'e' || s[i] == 'E') {
		j := i + 1
		if j < len(s) && (s[j] == '+' || s[j] == '-') {
			j++
		}
		k := j
		for k < len(s) && s[k] >= '0' && s[k] <= '9' {
			k++
		}
		if k > j {
			i = k
		}
	}
	return i
}

func parseNumber(num string) (float64, error) {
	t := strings.Replace(num, "−", "-", 1)
	v, err := strconv.ParseFloat(t, 64)
	if err != nil || math.IsInf(v, 0) || math.IsNaN(v) {
		return 0, fmt.Errorf("number out of range: %s", num)
	}
	return v, nil
}

// Base-unit exponent positions.
const (
	iM = iota
	iKg
	iS
	iA
	iK
	iRad
	nBase
)

type exps [nBase]int

// maxExp bounds each base unit's exponent in a dimension: the bound on one
// factor's exponent, so that every dimension Parse accepts is one whose
// printed symbol (kg·m²·s⁻³…) Parse reads back.
const maxExp = 12

func (e exps) dim() (Dim, bool) {
	var d [nBase]int8
	for i, x := range e {
		if x > maxExp || x < -maxExp {
			return Dim{}, false
		}
		d[i] = int8(x)
	}
	return Dim{M: d[iM], Kg: d[iKg], S: d[iS], A: d[iA], K: d[iK], Rad: d[iRad]}, true
}

// unitDef is one unit symbol: its size is factor × 10^pow10 SI units.
// Keeping the power of ten apart lets 20 uT become 20/1e6 = 2e-5 exactly
// rounded rather than 20 × 1e-6 = 1.9999999999999998e-5.
type unitDef struct {
	factor float64
	pow10  int
	dim    exps
	prefix bool    // accepts SI prefixes
	offset float64 // affine units (degC, degF) standing alone: SI = v·size + offset
}

var (
	eLen   = exps{iM: 1}
	eMass  = exps{iKg: 1}
	eTime  = exps{iS: 1}
	eCur   = exps{iA: 1}
	eTemp  = exps{iK: 1}
	eAngle = exps{iRad: 1}
	eVolt  = exps{iM: 2, iKg: 1, iS: -3, iA: -1}
	eWatt  = exps{iM: 2, iKg: 1, iS: -3}
	eOhm   = exps{iM: 2, iKg: 1, iS: -3, iA: -2}
	eTesla = exps{iKg: 1, iS: -2, iA: -1}
	eHenry = exps{iM: 2, iKg: 1, iS: -2, iA: -2}
	eHertz = exps{iS: -1}
	eNewt  = exps{iM: 1, iKg: 1, iS: -2}
	eJoule = exps{iM: 2, iKg: 1, iS: -2}
	ePa    = exps{iM: -1, iKg: 1, iS: -2}
	eWeber = exps{iM: 2, iKg: 1, iS: -2, iA: -1}
)

// Conversion factors of the trade units are exact by definition: the inch
// is 25.4 mm exactly (international yard and pound agreement, 1959), the
// gauss is 1e-4 T, 0 °C is 273.15 K and a Fahrenheit degree is 5/9 K.
var unitTable = map[string]unitDef{
	"m":      {1, 0, eLen, true, 0},
	"g":      {1, -3, eMass, true, 0},
	"s":      {1, 0, eTime, true, 0},
	"min":    {60, 0, eTime, false, 0},
	"h":      {3600, 0, eTime, false, 0}, // hour (SI Brochure, 9th ed., Table 8)
	"A":      {1, 0, eCur, true, 0},
	"V":      {1, 0, eVolt, true, 0},
	"W":      {1, 0, eWatt, true, 0},
	"\u03a9": {1, 0, eOhm, true, 0}, // Greek capital omega
	"\u2126": {1, 0, eOhm, true, 0}, // ohm sign
	"ohm":    {1, 0, eOhm, true, 0},
	"T":      {1, 0, eTesla, true, 0},
	"G":      {1, -4, eTesla, true, 0},
	"gauss":  {1, -4, eTesla, true, 0},
	"H":      {1, 0, eHenry, true, 0},
	"Hz":     {1, 0, eHertz, true, 0},
	"N":      {1, 0, eNewt, true, 0},
	"J":      {1, 0, eJoule, true, 0},
	"Pa":     {1, 0, ePa, true, 0},
	"Wb":     {1, 0, eWeber, true, 0},
	"K":      {1, 0, eTemp, true, 0},
	"rad":    {1, 0, eAngle, true, 0},
	"deg":    {math.Pi / 180, 0, eAngle, false, 0},
	"°":      {math.Pi / 180, 0, eAngle, false, 0},
	"degC":   {1, 0, eTemp, false, 273.15},
	"°C":     {1, 0, eTemp, false, 273.15},
	"℃":      {1, 0, eTemp, false, 273.15},
	"degF":   {5.0 / 9.0, 0, eTemp, false, 273.15 - 32*5.0/9.0},
	"°F":     {5.0 / 9.0, 0, eTemp, false, 273.15 - 32*5.0/9.0},
	"℉":      {5.0 / 9.0, 0, eTemp, false, 273.15 - 32*5.0/9.0},
	"in":     {254, -4, eLen, false, 0},
	"inch":   {254, -4, eLen, false, 0},
	"mil":    {254, -7, eLen, false, 0},
	"thou":   {254, -7, eLen, false, 0},
	"ft":     {3048, -4, eLen, false, 0},
	"%":      {1, -2, exps{}, false, 0},
	"ppm":    {1, -6, exps{}, false, 0},
}

// prefixes gives each SI prefix's power of ten.
var prefixes = map[rune]int{
	'p':      -12,
	'n':      -9,
	'u':      -6,
	'\u00b5': -6, // micro sign
	'\u03bc': -6, // Greek small mu
	'm':      -3,
	'c':      -2,
	'k':      3,
	'M':      6,
	'G':      9,
}

// lookupAtom resolves one unit symbol, with or without an SI prefix.
func lookupAtom(name string) (unitDef, bool) {
	if d, ok := unitTable[name]; ok {
		return d, true
	}
	r, size := utf8.DecodeRuneInString(name)
	if p, ok := prefixes[r]; ok && size < len(name) {
		if d, ok := unitTable[name[size:]]; ok && d.prefix {
			d.pow10 += p
			d.prefix = false
			return d, true
		}
	}
	return unitDef{}, false
}

func unknownUnit(name string) error {
	switch name {
	case "C", "c":
		return fmt.Errorf("unknown unit %q (for degrees Celsius write degC or °C)", name)
	case "F":
		return fmt.Errorf("unknown unit %q (for degrees Fahrenheit write degF or °F)", name)
	case "AWG", "awg":
		return fmt.Errorf("unknown unit %q (a wire gauge is written AWG 24, not as a unit)", name)
	}
	if alt, ok := spelledUnits[strings.ToLower(name)]; ok {
		d, _ := lookupAtom(alt)
		return &unknownUnitError{name: name, alt: alt, altDim: d.dim}
	}
	for _, alt := range []string{strings.ToLower(name), strings.ToUpper(name)} {
		if alt != name {
			if d, ok := lookupAtom(alt); ok {
				return &unknownUnitError{name: name, alt: alt, altDim: d.dim}
			}
		}
	}
	return &unknownUnitError{name: name}
}

// spelledUnits are names and abbreviations written for a unit symbol,
// with the symbol suggested for them.
var spelledUnits = map[string]string{
	"sec": "s", "secs": "s", "second": "s", "seconds": "s",
	"mins": "min", "minute": "min", "minutes": "min",
	"hr": "h", "hrs": "h", "hour": "h", "hours": "h",
	"ohms": "ohm", "amp": "A", "amps": "A", "volt": "V", "volts": "V", "watt": "W", "watts": "W",
	"tesla": "T", "henry": "H", "hertz": "Hz", "metre": "m", "meter": "m", "metres": "m", "meters": "m",
}

// unknownUnitError is a unit symbol the table lacks, with the symbol of
// another case that it has (and that symbol's dimension), if any.
type unknownUnitError struct {
	name, alt string
	altDim    exps
}

func (e *unknownUnitError) Error() string {
	if e.alt != "" {
		return fmt.Sprintf("unknown unit %q; did you mean %q?", e.name, e.alt)
	}
	return fmt.Sprintf("unknown unit %q", e.name)
}

// within keeps a suggestion only when it could give a value of dimension
// want: a lone unit whose dimension is want's (for on-time = 2 h, a time
// is wanted and henry is no suggestion). Otherwise it names the wanted
// dimension and an example unit instead.
func (e *unknownUnitError) within(unit string, want Dim) error {
	if e.alt == "" {
		return e
	}
	if d, ok := e.altDim.dim(); ok && d == want && strings.TrimSpace(unit) == e.name {
		return e
	}
	if strings.TrimSpace(unit) != e.name {
		// inside a compound unit: is the whole, with the other case, of
		// the wanted dimension?
		if u, err := parseUnit(strings.Replace(unit, e.name, e.alt, 1)); err == nil && u.dim == want {
			return e
		}
	}
	if ex := want.Example(); ex != want.Symbol() {
		return fmt.Errorf("unknown unit %q; want %s, e.g. %s", e.name, Describe(want), ex)
	}
	return fmt.Errorf("unknown unit %q; want %s", e.name, Describe(want))
}

// size is f × 10^p.
type size struct {
	f float64
	p int
}

func (a size) mul(b size) size { return size{a.f * b.f, a.p + b.p} }
func (a size) div(b size) size { return size{a.f / b.f, a.p - b.p} }
func (a size) pow(n int) size  { return size{math.Pow(a.f, float64(n)), a.p * n} }

// apply returns v in SI: v·f·10^p, dividing by an exact power of ten for
// negative p so that 120 mm is exactly 0.12 m.
func (a size) apply(v float64) float64 {
	v *= a.f
	if a.p < 0 {
		return v / math.Pow10(-a.p)
	}
	return v * math.Pow10(a.p)
}

// invert returns the number of units in the SI value si.
func (a size) invert(si float64) float64 {
	if a.p < 0 {
		return si * math.Pow10(-a.p) / a.f
	}
	return si / math.Pow10(a.p) / a.f
}

func (a size) ok() bool {
	return a.f != 0 && !math.IsInf(a.f, 0) && !math.IsNaN(a.f) && a.p > -300 && a.p < 300
}

// parsedUnit is a unit expression reduced to a size (and offset) in SI.
type parsedUnit struct {
	size     size
	offset   float64
	dim      Dim
	absolute bool // a lone temperature unit: values below 0 K are refused
}

func parseUnit(unit string) (parsedUnit, error) {
	unit = strings.TrimSpace(unit)
	if len(unit) > maxLen {
		return parsedUnit{}, fmt.Errorf("unit too long (%d characters)", len(unit))
	}
	// A temperature unit standing alone reads as an absolute temperature.
	if d, ok := unitTable[unit]; ok && d.offset != 0 {
		return parsedUnit{size: size{d.factor, d.pow10}, offset: d.offset, dim: Temperature, absolute: true}, nil
	}
	p := &unitParser{src: unit, rs: []rune(unit)}
	f, e, err := p.expr()
	if err == nil && p.pos < len(p.rs) {
		if p.rs[p.pos] == ')' {
			err = p.errorf("unbalanced \")\"")
		} else {
			err = p.errorf("unexpected %q", string(p.rs[p.pos]))
		}
	}
	if err != nil {
		return parsedUnit{}, err
	}
	d, ok := e.dim()
	if !ok || !f.ok() {
		return parsedUnit{}, fmt.Errorf("unit %q is out of range", unit)
	}
	abs := p.atoms == 1 && d == Temperature
	return parsedUnit{size: f, dim: d, absolute: abs}, nil
}

type unitParser struct {
	src   string
	rs    []rune
	pos   int
	depth int
	atoms int
}

func (p *unitParser) errorf(format string, args ...any) error {
	return fmt.Errorf("bad unit %q: %s", p.src, fmt.Sprintf(format, args...))
}

func (p *unitParser) peek() rune {
	if p.pos < len(p.rs) {
		return p.rs[p.pos]
	}
	return 0
}

func (p *unitParser) skipSpace() {
	for p.pos < len(p.rs) && unicode.IsSpace(p.rs[p.pos]) {
		p.pos++
	}
}

// expr := product { "/" product }
func (p *unitParser) expr() (size, exps, error) {
	p.skipSpace()
	f, e, err := p.product(true)
	if err != nil {
		return size{}, e, err
	}
	for {
		p.skipSpace()
		if p.peek() != '/' {
			return f, e, nil
		}
		p.pos++
		p.skipSpace()
		g, d, err := p.product(false)
		if err != nil {
			return size{}, e, err
		}
		f = f.div(g)
		for i := range e {
			e[i] -= d[i]
		}
	}
}

func isSep(r rune) bool {
	return r == '·' || r == '⋅' || r == '*' || r == '.' || r == '×'
}

// product := factor { [sep] factor }, or the literal 1 before a "/".
func (p *unitParser) product(first bool) (size, exps, error) {
	var e exps
	if first && p.peek() == '1' {
		save := p.pos
		p.pos++
		p.skipSpace()
		if p.peek() == '/' {
			return size{1, 0}, e, nil
		}
		p.pos = save
	}
	f, e, err := p.factor()
	if err != nil {
		return size{}, e, err
	}
	for {
		save := p.pos
		p.skipSpace()
		sep := false
		if isSep(p.peek()) {
			p.pos++
			p.skipSpace()
			sep = true
		}
		r := p.peek()
		if r == 0 || r == '/' || r == ')' {
			if sep {
				return size{}, e, p.errorf("nothing after %q", string(p.rs[save:p.pos]))
			}
			p.pos = save
			return f, e, nil
		}
		g, d, err := p.factor()
		if err != nil {
			return size{}, e, err
		}
		f = f.mul(g)
		for i := range e {
			e[i] += d[i]
		}
	}
}

func isUnitLetter(r rune) bool {
	return unicode.IsLetter(r)
}

// factor := ( "(" expr ")" | atom ) [exponent]
func (p *unitParser) factor() (size, exps, error) {
	var e exps
	var f size
	r := p.peek()
	switch {
	case r == '(':
		p.depth++
		if p.depth > 8 {
			return size{}, e, p.errorf("too many parentheses")
		}
		p.pos++
		var err error
		f, e, err = p.expr()
		if err != nil {
			return size{}, e, err
		}
		p.skipSpace()
		if p.peek() != ')' {
			return size{}, e, p.errorf("missing \")\"")
		}
		p.pos++
		p.depth--
	case r == '°' || r == '%' || r == '℃' || r == '℉' || isUnitLetter(r):
		start := p.pos
		p.pos++
		if r == '°' {
			for p.pos < len(p.rs) && isUnitLetter(p.rs[p.pos]) {
				p.pos++
			}
		} else if r != '%' && r != '℃' && r != '℉' {
			for p.pos < len(p.rs) && isUnitLetter(p.rs[p.pos]) {
				p.pos++
			}
		}
		name := string(p.rs[start:p.pos])
		d, ok := lookupAtom(name)
		if !ok {
			return size{}, e, unknownUnit(name)
		}
		p.atoms++
		f, e = size{d.factor, d.pow10}, d.dim
	case r == 0:
		return size{}, e, p.errorf("unit missing")
	default:
		return size{}, e, p.errorf("unexpected %q", string(r))
	}
	n, err := p.exponent()
	if err != nil {
		return size{}, e, err
	}
	if n != 1 {
		p.atoms += 1 // a powered unit is no longer a lone temperature
		f = f.pow(n)
		for i := range e {
			e[i] *= n
		}
	}
	return f, e, nil
}

var superValue = map[rune]int{'⁰': 0, '¹': 1, '²': 2, '³': 3, '⁴': 4, '⁵': 5, '⁶': 6, '⁷': 7, '⁸': 8, '⁹': 9}

// exponent := "^" [sign] digits | [-] digits | [⁻] superscript digits
func (p *unitParser) exponent() (int, error) {
	r := p.peek()
	neg := false
	digits := func(super bool) (int, error) {
		n, count := 0, 0
		for p.pos < len(p.rs) {
			c := p.rs[p.pos]
			var v int
			if super {
				x, ok := superValue[c]
				if !ok {
					break
				}
				v = x
			} else {
				if c < '0' || c > '9' {
					break
				}
				v = int(c - '0')
			}
			n = n*10 + v
			count++
			p.pos++
			if count > 2 {
				return 0, p.errorf("exponent too large")
			}
		}
		if count == 0 {
			return 0, p.errorf("exponent missing")
		}
		if n > maxExp {
			return 0, p.errorf("exponent too large")
		}
		if n == 0 {
			return 0, p.errorf("exponent 0 (the unit would cancel)")
		}
		if neg {
			n = -n
		}
		return n, nil
	}
	switch {
	case r == '^':
		p.pos++
		switch p.peek() {
		case '-', '−':
			neg = true
			p.pos++
		case '+':
			p.pos++
		}
		return digits(false)
	case r == '-' || r == '−':
		if p.pos+1 < len(p.rs) && p.rs[p.pos+1] >= '0' && p.rs[p.pos+1] <= '9' {
			neg = true
			p.pos++
			return digits(false)
		}
		return 0, p.errorf("unexpected %q", string(r))
	case r >= '0' && r <= '9':
		return digits(false)
	case r == '⁻':
		neg = true
		p.pos++
		return digits(true)
	}
	if _, ok := superValue[r]; ok {
		return digits(true)
	}
	return 1, nil
}
