package spec

import (
	"fmt"
	"strings"

	"coilmemo/calc"
	"coilmemo/calc/units"
)

// The coil keys of a soft-magnetic core and of a pick-up coil (receiver).
// A coil with a core-permeability is cored; a coil with neither current
// nor voltage but a frequency (or a band) is a receiver.
var coreKeys = []string{"core-permeability", "core-saturation", "core-length", "core-diameter",
	"core-density", "core-specific-heat", "core-remanence", "core-coercivity", "core-bh", "band", "load-capacitance"}

func init() { coilKeys = append(coilKeys, coreKeys...) }

// capacitance is F = A² s⁴ /(kg m²); the units parser has no farad, so the
// reader takes "<number> <prefix>F" itself (capacitanceValue).
var capacitance = units.Dim{M: -2, Kg: -1, S: 4, A: 2}

// coreValue reads one core or receiver key into ci. mine is false for a
// key that is not one of coreKeys.
func (p *parser) coreValue(ci *coilIn, e kv) (si string, ok, mine bool) {
	k := &ci.c.Core
	switch e.key {
	case "core-permeability":
		q, err := units.ParseAs(e.value, units.Dimensionless)
		if err != nil {
			p.errf(e.line, "%s: want a plain number (relative permeability μr): %v", e.key, err)
			return "", false, true
		}
		if !(q.Value >= 1) || q.Value > 1e7 {
			p.errf(e.line, "%s: %s must be at least 1 (relative permeability of a soft-magnetic core) and at most 1e7", e.key, e.value)
			return "", false, true
		}
		k.Permeability = q.Value
		return units.FormatNumber(q.Value), true, true
	case "core-saturation", "core-remanence":
		v, ok := p.positive(e, units.FluxDensity)
		if !ok {
			return "", false, true
		}
		if v > 5 {
			p.errf(e.line, "%s: %s is above 5 T, more than any soft-magnetic material saturates at", e.key, e.value)
			return "", false, true
		}
		if e.key == "core-saturation" {
			k.Saturation = v
		} else {
			k.Remanence = v
		}
		return units.Format(v, units.FluxDensity), true, true
	case "core-coercivity":
		v, ok := p.positive(e, units.FieldStrength)
		if !ok {
			return "", false, true
		}
		k.Coercivity = v
		return units.Format(v, units.FieldStrength), true, true
	case "core-length", "core-diameter":
		v, ok := p.positive(e, units.Length)
		if !ok {
			return "", false, true
		}
		if e.key == "core-length" {
			k.Length = v
		} else {
			k.Diameter = v
		}
		return units.Format(v, units.Length), true, true
	case "core-density":
		v, ok := p.positive(e, units.Density)
		if !ok {
			return "", false, true
		}
		k.Density = v
		return units.Format(v, units.Density), true, true
	case "core-specific-heat":
		v, ok := p.positive(e, units.SpecificHeat)
		if !ok {
			return "", false, true
		}
		k.SpecificHeat = v
		return units.Format(v, units.SpecificHeat), true, true
	case "core-bh":
		pts, err := parseBH(e.value)
		if err != nil {
			p.errf(e.line, "core-bh: %v", err)
			return "", false, true
		}
		k.Curve = pts
		var parts []string
		for _, q := range pts {
			parts = append(parts, units.Format(q.H, units.FieldStrength)+" "+units.Format(q.B, units.FluxDensity))
		}
		return strings.Join(parts, ", "), true, true
	case "band":
		lo, hi, err := parseBand(e.value)
		if err != nil {
			p.errf(e.line, "band: %v", err)
			return "", false, true
		}
		ci.c.BandLow, ci.c.BandHigh = lo, hi
		return units.Format(lo, units.Frequency) + " .. " + units.Format(hi, units.Frequency), true, true
	case "load-capacitance":
		v, err := capacitanceValue(e.value)
		if err != nil {
			p.errf(e.line, "load-capacitance: %v", err)
			return "", false, true
		}
		ci.c.LoadCapacitance = v
		return units.FormatNumber(v) + " F", true, true
	}
	return "", false, false
}

// parseBH reads a B–H curve: points "H B" separated by commas or
// semicolons, H ascending and positive, B ascending, e.g.
// "20 A/m 0.5 T, 100 A/m 1.1 T, 1000 A/m 1.5 T".
func parseBH(s string) ([]calc.BHPoint, error) {
	var pts []calc.BHPoint
	for i, part := range strings.FieldsFunc(s, func(r rune) bool { return r == ',' || r == ';' }) {
		f := strings.Fields(part)
		cut := -1
		for j := 1; j < len(f); j++ {
			if q, err := units.Parse(strings.Join(f[:j], " ")); err == nil && q.Is(units.FieldStrength) {
				cut = j
			}
		}
		if cut < 0 {
			return nil, fmt.Errorf("point %d %q: want a field strength and a flux density, e.g. 100 A/m 1.1 T", i+1, strings.TrimSpace(part))
		}
		h, _ := units.Parse(strings.Join(f[:cut], " "))
		b, err := units.ParseAs(strings.Join(f[cut:], " "), units.FluxDensity)
		if err != nil {
			return nil, fmt.Errorf("point %d: %v", i+1, err)
		}
		if !(h.Value > 0) || !(b.Value > 0) {
			return nil, fmt.Errorf("point %d: H and B must be greater than zero", i+1)
		}
		if n := len(pts); n > 0 && (h.Value <= pts[n-1].H || b.Value < pts[n-1].B) {
			return nil, fmt.Errorf("point %d: H must rise and B must not fall from point to point", i+1)
		}
		pts = append(pts, calc.BHPoint{H: h.Value, B: b.Value})
	}
	if len(pts) < 2 {
		return nil, fmt.Errorf("want at least two points \"H B\" separated by commas")
	}
	return pts, nil
}

// parseBand reads "lo .. hi" in Hz units, lo < hi.
func parseBand(s string) (lo, hi float64, err error) {
	a, b, found := strings.Cut(s, "..")
	if !found {
		return 0, 0, fmt.Errorf("want a range such as 1 Hz .. 10 kHz")
	}
	b = strings.TrimSpace(b)
	a = strings.TrimSpace(a)
	if _, u, e := units.Split(a); e == nil && u == "" {
		if _, ub, e := units.Split(b); e == nil {
			a += " " + ub
		}
	}
	ql, e1 := units.ParseAs(a, units.Frequency)
	qh, e2 := units.ParseAs(b, units.Frequency)
	switch {
	case e1 != nil:
		return 0, 0, e1
	case e2 != nil:
		return 0, 0, e2
	case !(ql.Value > 0) || !(qh.Value > ql.Value):
		return 0, 0, fmt.Errorf("%s: want 0 < low < high", s)
	}
	return ql.Value, qh.Value, nil
}

// capacitanceValue reads "<number> <prefix>F" (pF, nF, uF, µF, F), ≥ 0.
func capacitanceValue(s string) (float64, error) {
	num, unit, err := units.Split(s)
	if err != nil {
		return 0, err
	}
	scale := map[string]float64{"F": 1, "mF": 1e-3, "uF": 1e-6, "µF": 1e-6, "μF": 1e-6, "nF": 1e-9, "pF": 1e-12}[unit]
	if scale == 0 {
		return 0, fmt.Errorf("want a capacitance in pF, nF, uF or F, not %q", s)
	}
	q, err := units.ParseAs(num, units.Dimensionless)
	if err != nil {
		return 0, err
	}
	if !(q.Value >= 0) || q.Value*scale > 1 {
		return 0, fmt.Errorf("%s: want 0 .. 1 F", s)
	}
	return q.Value * scale, nil
}

// isReceiver says whether a coil block is a pick-up coil: no drive, and a
// frequency or a band.
func isReceiver(ci *coilIn) bool {
	has := func(k string) bool { _, ok := ci.lines[k]; return ok }
	return !has("current") && !has("voltage") && (has("frequency") || has("band"))
}

// checkCore applies the rules among the core and receiver keys: a core
// needs its permeability, length and diameter; it is modelled only in a
// single circular coil; a band or load capacitance belong to a receiver;
// remanence is below saturation.
func (p *parser) checkCore(ci *coilIn) {
	c := &ci.c
	has := func(k string) bool { _, ok := ci.lines[k]; return ok }
	ok := func(k string) bool { _, ok := ci.given[k]; return ok }
	where := fmt.Sprintf("coil %q", c.Name)
	first := 0
	for _, k := range []string{"core-permeability", "core-saturation", "core-length", "core-diameter",
		"core-density", "core-specific-heat", "core-remanence", "core-coercivity", "core-bh"} {
		if l, ok := ci.lines[k]; ok && (first == 0 || l < first) {
			first = l
		}
	}
	if first > 0 {
		for _, k := range []string{"core-permeability", "core-length", "core-diameter"} {
			if !has(k) {
				p.errf(first, "%s: a core needs core-permeability, core-length and core-diameter; %s is missing", where, k)
			}
		}
		if ci.formOK && c.Form != calc.Loop && c.Form != calc.Solenoid {
			p.errf(first, "%s: a core is modelled only in a loop or solenoid, not a %s", where, ci.given["form"].value)
		}
		if ok("core-specific-heat") && !has("core-density") {
			p.warnf(ci.lines["core-specific-heat"], "%s: core-specific-heat without core-density: the core's mass, and so its heat capacity, is unknown and left out of the warm-up", where)
		}
		if ok("core-remanence") && ok("core-saturation") && c.Core.Remanence >= c.Core.Saturation {
			p.errf(ci.lines["core-remanence"], "%s: core-remanence %s is not below core-saturation %s", where,
				ci.given["core-remanence"].value, ci.given["core-saturation"].value)
		}
		if ok("core-diameter") && ok("mean-diameter") && c.Core.Diameter >= c.MeanDiameter {
			p.errf(ci.lines["core-diameter"], "%s: core-diameter %s does not fit inside mean-diameter %s", where,
				ci.given["core-diameter"].value, ci.given["mean-diameter"].value)
		}
		if ok("core-diameter") && ok("inner-diameter") && c.Core.Diameter > c.InnerDiameter {
			p.errf(ci.lines["core-diameter"], "%s: core-diameter %s does not fit inside inner-diameter %s", where,
				ci.given["core-diameter"].value, ci.given["inner-diameter"].value)
		}
	}
	if !isReceiver(ci) {
		for _, k := range []string{"band", "load-capacitance"} {
			if has(k) {
				p.errf(ci.lines[k], "%s: %s belongs to a pick-up coil (one with neither current nor voltage but a frequency)", where, k)
			}
		}
	}
	if isReceiver(ci) {
		for _, k := range []string{"duty", "on-time", "switch-off", "driver-rating"} {
			if has(k) {
				p.errf(ci.lines[k], "%s: %s has no meaning for a pick-up coil (no current or voltage is given)", where, k)
			}
		}
	}
}
