package spec

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"coilmemo/calc"
	"coilmemo/calc/units"
)

// ---- conditions ----

// maxAmbient is the hottest ambient a spec accepts, K (500 °C): above
// every insulation class, and within the range of the air properties.
const maxAmbient = 500 + zeroCelsius

// HandlingRoomC is the handling ambient, °C, taken for a coil that works in
// vacuum when none is stated: a room on the ground, where it is
// integrated and tested; 25 °C, a reporting choice of ours.
const HandlingRoomC = 25.0

// conditionsBlock reads the conditions block; b has no lines when the spec
// has none, and then only the defaults are set.
func (p *parser) conditionsBlock(b *rawBlock) {
	cond := &p.spec.Design.Conditions
	*cond = calc.Conditions{
		Ambient:     defaultAmbientC + zeroCelsius,
		DesignAngle: math.Pi / 2,
		Cooling:     calc.Cooling{H: stillAirH, Emissivity: defaultEmissivity},
	}
	given := map[string]bool{}
	vacuum, vacuumLine := false, 0
	hLine, stillAirEntry := 0, -1
	for _, e := range p.keyValues(b, false) {
		given[e.key] = true
		si := ""
		switch e.key {
		case "ambient":
			if q, err := units.ParseAs(e.value, units.Temperature); err != nil {
				p.errf(e.line, "ambient: %v", err)
			} else if q.Value > maxAmbient {
				p.errf(e.line, "ambient: %s is more than 500 degC, the most a spec accepts", e.value)
			} else {
				cond.Ambient = q.Value
				si = q.String()
			}
		case "handling-ambient":
			if q, err := units.ParseAs(e.value, units.Temperature); err != nil {
				p.errf(e.line, "handling-ambient: %v", err)
			} else if q.Value > maxAmbient {
				p.errf(e.line, "handling-ambient: %s is more than 500 degC, the most a spec accepts", e.value)
			} else {
				cond.HandlingAmbient = q.Value
				si = q.String()
			}
		case "background-field":
			v, err := parseField(e.value)
			if err != nil {
				p.errf(e.line, "background-field: %v", err)
			} else {
				cond.BackgroundField = v
				cond.BackgroundMagnitudeOnly = !strings.HasPrefix(strings.TrimSpace(e.value), "(")
				si = formatVec(v, units.FluxDensity)
			}
		case "design-angle":
			q, err := units.ParseAs(e.value, units.Angle)
			switch {
			case err != nil:
				p.errf(e.line, "design-angle: %v", err)
			case q.Value < 0 || q.Value > math.Pi*(1+1e-12):
				p.errf(e.line, "design-angle: %s is outside 0..180 deg", e.value)
			default:
				cond.DesignAngle, cond.DesignAngleStated = q.Value, true
				si = q.String()
			}
		case "cooling":
			v := strings.ToLower(strings.TrimSpace(e.value))
			switch {
			case v == "still-air":
				cond.Cooling.Vacuum = false
				si = "still-air"
				stillAirEntry = len(p.spec.Entries)
			case v == "vacuum":
				cond.Cooling.Vacuum, cond.Cooling.H = true, 0
				vacuum, vacuumLine = true, e.line
				si = "vacuum (radiation only)"
			case strings.HasPrefix(v, "h") && strings.HasPrefix(strings.TrimSpace(v[1:]), "="):
				// the inline form: cooling = h = 12 W/m2K
				if hLine != 0 {
					p.errf(e.line, "h given twice (first on line %d)", hLine)
					break
				}
				hLine = e.line
				rest := strings.TrimSpace(strings.TrimSpace(e.value)[1:])
				si = p.heatTransfer(kv{key: "cooling", value: strings.TrimSpace(rest[1:]), line: e.line}, cond)
			default:
				p.errf(e.line, "cooling = %s: want one of still-air, vacuum, h = <value> W/m2K", e.value)
			}
		case "h":
			if hLine != 0 {
				p.errf(e.line, "h given twice (first on line %d)", hLine)
				break
			}
			hLine = e.line
			si = p.heatTransfer(e, cond)
		case "field-gradient", "mount-resistance":
			want := units.FieldGradient
			if e.key == "mount-resistance" {
				want = units.ThermalResistance
			}
			if v, ok := p.positive(e, want); ok {
				if e.key == "field-gradient" {
					cond.FieldGradient = v
				} else {
					cond.MountResistance = v
				}
				si = units.Format(v, want)
			}
		case "orientation":
			switch v := strings.ToLower(strings.TrimSpace(e.value)); v {
			case "horizontal", "vertical":
				cond.AxisVertical = v == "vertical"
				si = "coil axes " + v
				p.orientationLine = e.line
			default:
				p.errf(e.line, "orientation = %s: want horizontal or vertical (the coil axes, for natural convection)", e.value)
			}
		case "enclosure":
			switch v := strings.ToLower(strings.TrimSpace(e.value)); v {
			case "open":
				cond.Cooling.Covered = false
				si = "open: free air round the coils"
			case "covered":
				cond.Cooling.Covered = true
				si = "covered: under or behind a surface people touch, no free convection"
			default:
				p.errf(e.line, "enclosure = %s: want open or covered (under or behind a surface people touch)", e.value)
			}
		case "up":
			a, err := parseAxis(e.value)
			if err != nil {
				p.errf(e.line, "up: %v (the upward direction, against gravity, in the design's axes)", err)
				break
			}
			cond.Up, p.upLine = a, e.line
			si = formatVec(a, units.Dimensionless) + " upward: each coil's axis within 45° of it is vertical"
		case "emissivity":
			q, err := units.ParseAs(e.value, units.Dimensionless)
			switch {
			case err != nil:
				p.errf(e.line, "emissivity: %v", err)
			case !(q.Value > 0 && q.Value <= 1):
				p.errf(e.line, "emissivity: %s is outside 0..1 (above 0, at most 1)", e.value)
			default:
				cond.Cooling.Emissivity = q.Value
				si = units.FormatNumber(q.Value)
			}
		default:
			p.unknownKey(e, blockConditions, conditionKeys)
			continue
		}
		p.entry(blockConditions, e, si)
	}
	if vacuum && hLine != 0 {
		p.errf(max(vacuumLine, hLine), "cooling = vacuum takes no convective coefficient h")
	}
	if vacuum {
		cond.Cooling.H, cond.Cooling.HGiven = 0, false
	}
	if stillAirEntry >= 0 && hLine == 0 {
		p.spec.Entries[stillAirEntry].SI = "still-air (natural convection, Churchill–Chu)"
	}
	add := func(key, si string) {
		if !given[key] {
			p.defaultEntry(blockConditions, key, si, b.fence, "")
		}
	}
	add("ambient", units.Format(cond.Ambient, units.Temperature)+" (20 °C)")
	if vacuum {
		add("handling-ambient", units.Format(calc.CelsiusToKelvin(HandlingRoomC), units.Temperature)+" (a room: the design works in vacuum, where no one touches it)")
	} else {
		add("handling-ambient", "the ambient (people touch the design where it works)")
	}
	add("background-field", "(0, 0, 0) T")
	if cond.BackgroundMagnitudeOnly || cond.BackgroundField.Norm() == 0 {
		add("design-angle", units.Format(cond.DesignAngle, units.Angle)+" (90°)")
	} else {
		add("design-angle", "as designed (the angle between the total moment and the field)")
	}
	if !given["cooling"] && hLine == 0 {
		add("cooling", "still-air (natural convection, Churchill–Chu)")
	}
	add("emissivity", units.FormatNumber(defaultEmissivity))
	if !vacuum && hLine == 0 && !given["up"] && !cond.Cooling.Covered {
		// orientation enters only the natural-convection correlation
		add("orientation", "coil axes horizontal")
	}
}

// checkOrientation holds a design-wide orientation to each coil's axis
// when the upward direction is given too: up decides each coil
// (calc.AxisIsVertical), and a statement that contradicts it for some
// coil is an error at the orientation line.
func (p *parser) checkOrientation() {
	cond := p.spec.Design.Conditions
	if p.orientationLine == 0 || p.upLine == 0 {
		return
	}
	for _, c := range p.spec.Design.Coils {
		if v := calc.AxisIsVertical(c, cond); v != cond.AxisVertical {
			state, is := "horizontal", "horizontal"
			if cond.AxisVertical {
				state = "vertical"
			}
			if v {
				is = "vertical"
			}
			p.errf(p.orientationLine, "orientation = %s, but with up on line %d the axis of coil %q is %s (within 45° of up counts as vertical); drop orientation and let up decide each coil", state, p.upLine, c.Name, is)
			return
		}
	}
}

func (p *parser) heatTransfer(e kv, cond *calc.Conditions) string {
	q, err := units.ParseAs(e.value, units.HeatTransfer)
	switch {
	case err != nil:
		p.errf(e.line, "%s: %v", e.key, err)
	case q.Value <= 0:
		p.errf(e.line, "%s: h = %s must be greater than zero", e.key, e.value)
	default:
		cond.Cooling.H, cond.Cooling.HGiven = q.Value, true
		return "h = " + q.String()
	}
	return ""
}

// parseField reads a background field: a magnitude along x ("50 uT") or a
// vector ("(20, 0, 45) uT").
func parseField(s string) (calc.Vec, error) {
	if strings.HasPrefix(strings.TrimSpace(s), "(") {
		return parseVector(s, units.FluxDensity)
	}
	q, err := units.ParseAs(s, units.FluxDensity)
	if err != nil {
		return calc.Vec{}, err
	}
	if q.Value < 0 {
		return calc.Vec{}, fmt.Errorf("magnitude %s is negative; give a vector such as (-50, 0, 0) uT for a direction", strings.TrimSpace(s))
	}
	return calc.Vec{q.Value, 0, 0}, nil
}

// ---- probes ----

func (p *parser) probesBlock(b *rawBlock) {
	for _, e := range p.keyValues(b, true) {
		si := ""
		v, err := parseVector(e.value, units.Length)
		if err != nil {
			p.errf(e.line, "probe %s: %v", e.key, err)
		} else {
			p.spec.Design.Probes = append(p.spec.Design.Probes, calc.Probe{Name: e.key, At: v})
			si = formatVec(v, units.Length)
		}
		p.entry(blockProbes, e, si)
	}
}

// ---- sweep ----

// sweepDims gives the dimension of each coil key a sweep may step.
var sweepDims = map[string]units.Dim{
	"mean-diameter": units.Length, "inner-diameter": units.Length, "outer-diameter": units.Length,
	"length": units.Length, "radial-build": units.Length, "width": units.Length, "height": units.Length,
	"spacing": units.Length, "wire-outer-diameter": units.Length,
	"turns": units.Dimensionless, "current": units.Current, "voltage": units.Voltage,
	"duty":    units.Dimensionless,
	"on-time": units.Time, "switch-off": units.Time, "frequency": units.Frequency,
}

func sweepKeys() []string {
	k := make([]string, 0, len(sweepDims))
	for _, c := range coilKeys {
		if _, ok := sweepDims[c]; ok {
			k = append(k, c)
		}
	}
	return k
}

// maxSweepSteps bounds a sweep: each step is a whole evaluation and a row
// of the memo's table, and a hundred rows is already more than a reader
// takes in.
const maxSweepSteps = 100

func (p *parser) sweepBlock(b *rawBlock, coils []*coilIn) {
	var sw *Sweep
	rejected := false
	coilName, coilLine := "", 0
	for _, e := range p.keyValues(b, false) {
		if e.key == "coil" {
			coilName, coilLine = e.value, e.line
			p.entry(blockSweep, e, e.value)
			continue
		}
		dim, ok := sweepDims[e.key]
		if !ok {
			if isCoilKey(e.key) {
				p.errf(e.line, "cannot sweep %q: a sweep steps one of %s", e.key, strings.Join(sweepKeys(), ", "))
			} else {
				p.unknownKey(e, blockSweep, append(sweepKeys(), "coil"))
			}
			continue
		}
		if sw != nil {
			p.errf(e.line, "a sweep steps one parameter; %q is a second one (the first, %q, is on line %d)", e.key, sw.Param, sw.Line)
			continue
		}
		s, err := parseRange(e.key, e.value, dim)
		if err != nil {
			p.errf(e.line, "sweep %s: %v", e.key, err)
			p.entry(blockSweep, e, "")
			sw, rejected = &Sweep{Param: e.key, Line: e.line}, true
			continue
		}
		s.Line = e.line
		sw = &s
		p.entry(blockSweep, e, fmt.Sprintf("%s .. %s step %s", units.Format(s.From, dim), units.Format(s.To, dim), units.Format(s.Step, dim)))
	}
	if sw == nil {
		p.errf(b.fence, "sweep block has no parameter line: write e.g. turns = 100 .. 400 step 50")
		return
	}
	if rejected {
		return
	}
	targets := coils
	if coilName != "" {
		targets = nil
		var names []string
		for _, c := range coils {
			names = append(names, strconv.Quote(c.c.Name))
			if c.c.Name == coilName {
				targets = append(targets, c)
			}
		}
		if len(targets) == 0 {
			p.errf(coilLine, "sweep: no coil named %q (coils: %s)", coilName, strings.Join(names, ", "))
			return
		}
		sw.Coil = coilName
	}
	for _, c := range targets {
		_, byCurrent := c.given["current"]
		_, byVoltage := c.given["voltage"]
		if (sw.Param == "current" && byVoltage && !byCurrent) || (sw.Param == "voltage" && byCurrent && !byVoltage) {
			drive := "voltage"
			if sw.Param == "voltage" {
				drive = "current"
			}
			p.errf(sw.Line, "sweep %s: coil %q is driven by %s", sw.Param, c.c.Name, drive)
			return
		}
	}
	if msg := sweepStepProblem(sw, targets); msg != "" {
		p.errf(sw.Line, "sweep %s: %s", sw.Param, msg)
		return
	}
	p.spec.Sweep = sw
}

// sweepStepProblem checks every value of a sweep as the coil block's own
// key would be checked: positive where the key must be, within the
// upper bound of its dimension (upperBounds, calc.MaxTurns), a duty within
// (0, 100 %], a spacing only on a pair, a wire's outer diameter above its
// bare one, a diameter that leaves a bore. It names the first bad step.
func sweepStepProblem(sw *Sweep, targets []*coilIn) string {
	for _, v := range sw.Values() {
		for _, ci := range targets {
			c := ci.c
			bad := ""
			switch {
			case math.IsNaN(v) || math.IsInf(v, 0):
				bad = "is not a number"
			case sw.Param == "duty" && !(v > 0 && v <= 1):
				bad = "is outside 0 .. 100 %"
			case sw.Param == "radial-build" && v < 0:
				bad = "is negative"
			case sw.Param != "duty" && sw.Param != "radial-build" && !(v > 0):
				bad = "is not above zero"
			case upperBounds[sweepDims[sw.Param]] > 0 && v > upperBounds[sweepDims[sw.Param]]:
				bad = fmt.Sprintf("is more than %s, the most a spec accepts", units.Format(upperBounds[sweepDims[sw.Param]], sweepDims[sw.Param]))
			case sw.Param == "turns" && v > calc.MaxTurns:
				bad = fmt.Sprintf("is more than %d turns, the most this tool lays out", calc.MaxTurns)
			case sw.Param == "spacing" && c.Form != calc.Pair:
				bad = fmt.Sprintf("spacing applies only to form = pair, and coil %q is not a pair", c.Name)
			case sw.Param == "wire-outer-diameter" && v <= c.Wire.Bare:
				bad = fmt.Sprintf("is not more than the bare diameter %s of coil %q", units.Format(c.Wire.Bare, units.Length), c.Name)
			case sw.Param == "outer-diameter" && v <= 2*c.RadialBuild:
				bad = fmt.Sprintf("leaves no bore inside the radial build %s of coil %q", units.Format(c.RadialBuild, units.Length), c.Name)
			case sw.Param == "radial-build" && c.MeanDiameter-c.RadialBuild+2*v <= 0:
				bad = "leaves no bore"
			}
			if bad != "" {
				if strings.Contains(bad, "coil") {
					return fmt.Sprintf("the step %s: %s", units.Format(v, sweepDims[sw.Param]), bad)
				}
				return fmt.Sprintf("the step %s %s (coil %q)", units.Format(v, sweepDims[sw.Param]), bad, c.Name)
			}
		}
	}
	return ""
}

// parseRange reads "<from> .. <to> step <step>". A bound or step written
// without a unit takes the unit of the others: 40 .. 80 mm step 5.
func parseRange(key, s string, dim units.Dim) (Sweep, error) {
	sw := Sweep{Param: key, Dim: dim}
	i := strings.Index(s, "..")
	if i < 0 {
		return sw, fmt.Errorf("bad range %q: want <from> .. <to> step <step>", s)
	}
	from, rest := strings.TrimSpace(s[:i]), strings.TrimSpace(s[i+2:])
	j := strings.Index(strings.ToLower(rest), "step")
	if j < 0 {
		return sw, fmt.Errorf("bad range %q: missing step (want <from> .. <to> step <step>)", s)
	}
	to, step := strings.TrimSpace(rest[:j]), strings.TrimSpace(rest[j+4:])
	parts := []string{from, to, step}
	unit := ""
	for _, x := range []string{to, from, step} {
		if _, u, err := units.Split(x); err == nil && u != "" {
			unit = u
			break
		}
	}
	var v [3]float64
	for k, x := range parts {
		if x == "" {
			return sw, fmt.Errorf("bad range %q: want <from> .. <to> step <step>", s)
		}
		if n, u, err := units.Split(x); err == nil && u == "" && unit != "" {
			x = n + " " + unit
		}
		var (
			q   units.Quantity
			err error
		)
		switch {
		case key != "duty":
			q, err = units.ParseAs(x, dim)
		case k < 2:
			q.Value, err = parsePercent(x)
		default: // a duty step is a difference of percentages
			if _, u, e := units.Split(x); e != nil || u != "%" {
				err = fmt.Errorf("step %s: want a percentage such as 10 %%", x)
			} else {
				q, err = units.Parse(x)
			}
		}
		if err != nil {
			return sw, err
		}
		v[k] = q.Value
	}
	sw.From, sw.To, sw.Step = v[0], v[1], v[2]
	switch {
	case !(sw.Step > 0):
		return sw, fmt.Errorf("step %s must be greater than zero", step)
	case !(sw.To > sw.From):
		return sw, fmt.Errorf("%s .. %s: the end must be greater than the start", from, to)
	case (sw.To-sw.From)/sw.Step > maxSweepSteps:
		return sw, fmt.Errorf("%s .. %s step %s is more than %d steps", from, to, step, maxSweepSteps)
	}
	if dim == units.Length && sw.From <= 0 {
		return sw, fmt.Errorf("start %s must be greater than zero", from)
	}
	if key == "current" || key == "voltage" {
		if sw.From <= 0 {
			return sw, fmt.Errorf("start %s must be greater than zero", from)
		}
	}
	if key == "turns" {
		for _, x := range v {
			if x != math.Trunc(x) {
				return sw, fmt.Errorf("turns must be whole numbers")
			}
		}
		if sw.From < 1 || sw.To > maxTurns {
			return sw, fmt.Errorf("turns must lie between 1 and %d", maxTurns)
		}
	}
	return sw, nil
}
