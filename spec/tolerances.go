package spec

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"coilmemo/calc"
	"coilmemo/calc/units"
)

// ToleranceMode says how a tolerance line moves its parameter.
type ToleranceMode int

// How a tolerance moves its parameter between its two extremes.
const (
	// Relative: the nominal value times (1+Lo) .. (1+Hi); "±5 %".
	Relative ToleranceMode = iota
	// Offset: the nominal value plus Lo .. Hi, SI; "±0.3 mm", "±2" turns.
	Offset
	// Range: the value itself from Lo to Hi, SI; "-20 degC .. 60 degC".
	Range
	// Standard: the wire's published bare-diameter limits (WireTolerance).
	Standard
)

// Tolerance is one line of the tolerances block.
type Tolerance struct {
	// Key is supply, ambient, wire-diameter, resistivity, turns,
	// background-field or a numeric coil key.
	Key  string
	Raw  string // as written
	Line int
	Mode ToleranceMode
	// Lo and Hi bound the parameter as Mode says: fractions (Relative),
	// SI offsets (Offset) or SI values (Range); unused for Standard.
	Lo, Hi float64
	Dim    units.Dim // of Lo and Hi for Offset and Range
}

// Tolerances is the tolerances block: the stated spread of the design's
// inputs over which the worst case is taken, and the Monte Carlo sample
// count (0: no sampling).
type Tolerances struct {
	Items       []Tolerance // in source order
	Samples     int
	SamplesLine int
	Fence       int
}

// MaxToleranceLines bounds the corner analysis: every combination of the
// lines' extremes is evaluated, 2^n corners, so ten lines are 1024 full
// evaluations; a longer block is rejected rather than reduced.
const MaxToleranceLines = 10

// MaxSamples bounds the Monte Carlo sample count.
const MaxSamples = 100000

// toleranceKeys are the keys of the tolerances block besides the numeric
// coil keys (sweepDims, without current and voltage: those are "supply").
var toleranceKeys = []string{"supply", "ambient", "wire-diameter", "resistivity", "turns", "background-field", "samples"}

// WireSize is one row of the published bare copper magnet-wire
// dimensions: AWG size and the minimum and maximum bare diameter, m.
type WireSize struct {
	Gauge    int
	Min, Max float64
}

// WireToleranceSource names the table WireTolerances holds.
const WireToleranceSource = "ANSI/NEMA MW 1000 bare copper magnet wire, minimum and maximum bare diameter (AWG 6–36), as tabulated in a magnet-wire manufacturer's copper wire data table"

// WireTolerances are the minimum and maximum bare diameters of round
// copper magnet wire by AWG size, inches ×1e-4 (min, max) — the bare
// dimensions of ANSI/NEMA MW 1000 as reproduced in a manufacturer's copper
// magnet wire data table ("Copper Magnet Wire Data", bare copper
// diameter min/nom/max, inches).
var wireTolerances = map[int][2]float64{
	6: {1604, 1633}, 7: {1429, 1454}, 8: {1272, 1294}, 9: {1133, 1153}, 10: {1009, 1027},
	11: {898, 916}, 12: {800, 816}, 13: {713, 727}, 14: {635, 647}, 15: {565, 577},
	16: {503, 513}, 17: {448, 458}, 18: {399, 407}, 19: {355, 363}, 20: {317, 323},
	21: {282, 288}, 22: {250, 256}, 23: {224, 228}, 24: {199, 203}, 25: {177, 181},
	26: {157, 161}, 27: {141, 143}, 28: {125, 127}, 29: {112, 114}, 30: {99, 101},
	31: {88, 90}, 32: {79, 81}, 33: {70, 72}, 34: {62, 64}, 35: {55, 57}, 36: {49, 51},
}

// WireTolerance returns the minimum and maximum bare diameter, m, of AWG
// size n from the table WireToleranceSource names; ok is false for a size
// the table does not hold.
func WireTolerance(n int) (lo, hi float64, ok bool) {
	t, ok := wireTolerances[n]
	if !ok {
		return 0, 0, false
	}
	const inch = 0.0254
	return t[0] * 1e-4 * inch, t[1] * 1e-4 * inch, true
}

func wireToleranceRange() string { return "AWG 6 to AWG 36" }

// tolerancesBlock reads the tolerances block once the coils are known.
func (p *parser) tolerancesBlock(b *rawBlock, coils []*coilIn) {
	t := &Tolerances{Fence: b.fence}
	given := func(key string) bool {
		for _, c := range coils {
			if _, ok := c.given[key]; ok {
				return true
			}
		}
		return false
	}
	bad := false
	for _, e := range p.keyValues(b, false) {
		tol := Tolerance{Key: e.key, Raw: e.raw, Line: e.line}
		var err error
		si := ""
		switch e.key {
		case "samples":
			n, perr := strconv.Atoi(strings.TrimSpace(e.value))
			switch {
			case perr != nil:
				err = fmt.Errorf("%q is not a whole number of samples", e.value)
			case n < 1 || n > MaxSamples:
				err = fmt.Errorf("%d is outside 1..%d", n, MaxSamples)
			default:
				t.Samples, t.SamplesLine = n, e.line
				si = strconv.Itoa(n)
			}
			if err != nil {
				p.errf(e.line, "samples: %v", err)
				bad = true
			}
			p.entry(blockTolerances, e, si)
			continue
		case "supply", "resistivity":
			tol.Mode = Relative
			tol.Lo, tol.Hi, err = plusMinus(e.value, units.Dimensionless, true)
			if err == nil && tol.Lo <= -1 {
				err = fmt.Errorf("%s would make it zero or negative", e.value)
			}
			si = fmt.Sprintf("±%s %%", units.FormatNumber(tol.Hi*100))
		case "ambient":
			tol.Mode, tol.Dim = Range, units.Temperature
			tol.Lo, tol.Hi, err = valueRange(e.value, units.Temperature)
			if err == nil && tol.Hi > maxAmbient {
				err = fmt.Errorf("the range %s goes above 500 degC, the most a spec accepts", e.value)
			}
			if err == nil {
				amb := p.spec.Design.Conditions.Ambient
				if amb < tol.Lo-1e-9 || amb > tol.Hi+1e-9 {
					err = fmt.Errorf("the range %s does not hold the nominal ambient %s", e.value, units.Format(amb, units.Temperature))
				}
			}
			si = units.Format(tol.Lo, units.Temperature) + " .. " + units.Format(tol.Hi, units.Temperature)
		case "background-field":
			tol.Mode, tol.Dim = Range, units.FluxDensity
			tol.Lo, tol.Hi, err = valueRange(e.value, units.FluxDensity)
			if err == nil {
				b0 := p.spec.Design.Conditions.BackgroundField.Norm()
				switch {
				case tol.Lo < 0:
					err = fmt.Errorf("a field magnitude cannot be negative")
				case b0 == 0:
					err = fmt.Errorf("the conditions block gives no background-field to vary (its direction is needed)")
				case b0 < tol.Lo*(1-1e-9) || b0 > tol.Hi*(1+1e-9):
					err = fmt.Errorf("the range %s does not hold the nominal background-field %s", e.value, units.Format(b0, units.FluxDensity))
				}
			}
			si = units.Format(tol.Lo, units.FluxDensity) + " .. " + units.Format(tol.Hi, units.FluxDensity)
		case "wire-diameter":
			if strings.EqualFold(strings.TrimSpace(e.value), "standard") {
				tol.Mode = Standard
				si = "standard (" + WireToleranceSource + ")"
				for _, c := range coils {
					if c.c.Wire.Gauge == calc.NoGauge {
						err = fmt.Errorf("standard needs an AWG size, and coil %q gives its wire by diameter; write e.g. wire-diameter = ±0.005 mm", c.c.Name)
						break
					}
					if _, _, ok := WireTolerance(c.c.Wire.Gauge); !ok {
						err = fmt.Errorf("the published table covers %s, not coil %q's AWG %d; write e.g. wire-diameter = ±1 %%", wireToleranceRange(), c.c.Name, c.c.Wire.Gauge)
						break
					}
				}
				break
			}
			tol.Mode, tol.Dim, tol.Lo, tol.Hi, err = offsetOrRelative(e.value, units.Length)
			si = tolSI(tol)
		case "turns":
			tol.Mode, tol.Dim = Offset, units.Dimensionless
			tol.Lo, tol.Hi, err = plusMinus(e.value, units.Dimensionless, false)
			if err == nil && tol.Hi != math.Trunc(tol.Hi) {
				err = fmt.Errorf("a turns tolerance is a whole number of turns, e.g. ±2")
			}
			si = "±" + units.FormatNumber(tol.Hi) + " turns"
		default:
			dim, ok := sweepDims[e.key]
			if !ok || e.key == "current" || e.key == "voltage" {
				switch {
				case e.key == "current" || e.key == "voltage":
					p.errf(e.line, "%s: the drive's tolerance is written supply = ±x %%", e.key)
				case isCoilKey(e.key):
					p.errf(e.line, "cannot put a tolerance on %q: numeric coil keys are %s", e.key, strings.Join(tolCoilKeys(), ", "))
				default:
					p.unknownKey(e, blockTolerances, append(append([]string{}, toleranceKeys...), tolCoilKeys()...))
				}
				bad = true
				continue
			}
			if !given(e.key) {
				p.errf(e.line, "tolerance on %s, but no coil block gives %s", e.key, e.key)
				bad = true
				continue
			}
			tol.Mode, tol.Dim, tol.Lo, tol.Hi, err = offsetOrRelative(e.value, dim)
			si = tolSI(tol)
		}
		if err != nil {
			p.errf(e.line, "%s: %v", e.key, err)
			p.entry(blockTolerances, e, "")
			bad = true
			continue
		}
		for _, o := range t.Items {
			if o.Key == tol.Key {
				p.errf(e.line, "%s is already given on line %d", e.key, o.Line)
				bad = true
			}
		}
		p.entry(blockTolerances, e, si)
		t.Items = append(t.Items, tol)
	}
	if len(t.Items) > MaxToleranceLines {
		p.errf(t.Items[MaxToleranceLines].Line, "more than %d tolerance lines: the corner analysis evaluates every combination of extremes (2^n corners)", MaxToleranceLines)
		bad = true
	}
	if !bad && len(t.Items) == 0 {
		p.errf(b.fence, "tolerances block has no tolerance line: write e.g. supply = ±5 %%")
		return
	}
	if !bad {
		p.spec.Tolerances = t
	}
}

func isCoilKey(k string) bool {
	for _, c := range coilKeys {
		if c == k {
			return true
		}
	}
	return false
}

// tolCoilKeys are the coil keys a tolerance may name directly.
func tolCoilKeys() []string {
	var out []string
	for _, k := range sweepKeys() {
		if k != "current" && k != "voltage" && k != "turns" {
			out = append(out, k)
		}
	}
	return out
}

func tolSI(t Tolerance) string {
	if t.Mode == Relative {
		return fmt.Sprintf("±%s %%", units.FormatNumber(t.Hi*100))
	}
	return "±" + units.Format(t.Hi, t.Dim)
}

// offsetOrRelative reads "±x %" (Relative) or "±x unit" (Offset).
func offsetOrRelative(s string, dim units.Dim) (ToleranceMode, units.Dim, float64, float64, error) {
	if strings.HasSuffix(strings.TrimSpace(s), "%") {
		lo, hi, err := plusMinus(s, units.Dimensionless, true)
		if err == nil && lo <= -1 {
			err = fmt.Errorf("%s would make it zero or negative", s)
		}
		return Relative, units.Dimensionless, lo, hi, err
	}
	lo, hi, err := plusMinus(s, dim, false)
	return Offset, dim, lo, hi, err
}

// plusMinus reads a symmetric tolerance "±x unit" ("+-x" and "+/-x" are
// accepted too) and returns −x, +x in SI (a fraction for a percentage when
// percent is set; percent requires the % sign).
func plusMinus(s string, dim units.Dim, percent bool) (float64, float64, error) {
	v := strings.TrimSpace(s)
	rest, ok := "", false
	for _, pre := range []string{"±", "+/-", "+-"} {
		if strings.HasPrefix(v, pre) {
			rest, ok = strings.TrimSpace(v[len(pre):]), true
			break
		}
	}
	if !ok {
		return 0, 0, fmt.Errorf("%q has no sign: write a tolerance as ±%s", v, strings.TrimLeft(v, "+-"))
	}
	var q units.Quantity
	var err error
	switch {
	case percent:
		if _, u, e := units.Split(rest); e != nil || u != "%" {
			return 0, 0, fmt.Errorf("%s: want a percentage such as ±5 %%", v)
		}
		q, err = units.Parse(rest)
	case dim == units.Dimensionless:
		var x float64
		x, err = strconv.ParseFloat(rest, 64)
		q.Value = x
	default:
		q, err = units.ParseAs(rest, dim)
	}
	if err != nil {
		return 0, 0, err
	}
	if !(q.Value > 0) || math.IsInf(q.Value, 0) {
		return 0, 0, fmt.Errorf("%s: the tolerance must be greater than zero", v)
	}
	return -q.Value, q.Value, nil
}

// valueRange reads "<a> .. <b>" with a ≤ b; a bound without a unit takes
// the other's.
func valueRange(s string, dim units.Dim) (float64, float64, error) {
	i := strings.Index(s, "..")
	if i < 0 {
		return 0, 0, fmt.Errorf("bad range %q: want <low> .. <high>, e.g. %s .. %s", s, units.Format(0, dim), dim.Example())
	}
	a, b := strings.TrimSpace(s[:i]), strings.TrimSpace(s[i+2:])
	if a == "" || b == "" {
		return 0, 0, fmt.Errorf("bad range %q: want <low> .. <high>", s)
	}
	if n, u, err := units.Split(a); err == nil && u == "" {
		if _, ub, err := units.Split(b); err == nil && ub != "" {
			a = n + " " + ub
		}
	}
	qa, err := units.ParseAs(a, dim)
	if err != nil {
		return 0, 0, err
	}
	qb, err := units.ParseAs(b, dim)
	if err != nil {
		return 0, 0, err
	}
	if !(qb.Value > qa.Value) {
		return 0, 0, fmt.Errorf("%s .. %s is reversed or empty: the high end must be greater than the low end", a, b)
	}
	return qa.Value, qb.Value, nil
}

// CoilValue returns the value, SI, of the numeric coil key that
// SetCoilValue sets, and whether the key is one of them.
func CoilValue(c calc.Coil, key string) (float64, bool) {
	switch key {
	case "mean-diameter":
		return c.MeanDiameter, true
	case "inner-diameter":
		return c.InnerDiameter, true
	case "outer-diameter":
		return c.OuterDiameter, true
	case "length":
		return c.Length, true
	case "radial-build":
		return c.RadialBuild, true
	case "width":
		return c.Width, true
	case "height":
		return c.Height, true
	case "spacing":
		return c.Spacing, true
	case "wire-outer-diameter":
		return c.Wire.Outer, true
	case "turns":
		return float64(c.Turns), true
	case "current":
		return c.Current, true
	case "voltage":
		return c.Voltage, true
	case "duty":
		return c.Duty, true
	case "switch-off":
		return c.SwitchOff, true
	case "on-time":
		return c.OnTime, true
	case "driver-rating":
		return c.DriverRating, true
	case "frequency":
		return c.Frequency, true
	}
	return 0, false
}
