package spec

import (
	"sort"
	"strings"

	"coilmemo/calc"
	"coilmemo/calc/units"
	"coilmemo/format"
)

// LimitQuantity describes a quantity a requirement line may constrain.
type LimitQuantity struct {
	Unit        string // SI unit as the units parser reads it, e.g. "A m2"
	Description string // what the quantity is, for the whole design
	// Subjects says what the quantity may be said of: coils, probes, or
	// both; Design that it needs no subject (a line without one is about
	// the whole design).
	Coils, Probes, Design bool
}

// LimitQuantities lists the names a `limits` block accepts. Without a
// subject, totals are over all coils (moment is the magnitude of the
// vector sum; power the sum; temperature the hottest winding); with a
// coil's name in parentheses the quantity is that coil block's alone; with
// a probe's name, the field there.
var LimitQuantities = map[string]LimitQuantity{
	"moment":              {"A m2", "magnitude of the total magnetic moment", true, false, true},
	"field-center":        {"T", "|B| at the origin", true, false, true},
	"field":               {"T", "|B| of all coils together", true, true, true},
	"gradient":            {"T/m", "axial field gradient at the centre of an opposing pair", true, false, true},
	"uniform-radius":      {"m", "radius of the region about a coil's centre within which the field stays within the tolerance of its centre value", true, false, true},
	"power":               {"W", "total electrical power, averaged over the duty cycle", true, false, true},
	"power-on":            {"W", "total electrical power while energised", true, false, true},
	"temperature":         {"degC", "hottest winding temperature", true, false, true},
	"surface-temperature": {"degC", "hottest winding surface temperature", true, false, true},
	"current":             {"A", "largest coil current", true, false, true},
	"voltage":             {"V", "largest coil voltage", true, false, true},
	"resistance":          {"ohm", "largest hot coil resistance", true, false, true},
	"mass":                {"kg", "total conductor mass", true, false, true},
	"wire-length":         {"m", "longest coil wire length", true, false, true},
	"current-density":     {"A/m2", "largest current density in a conductor", true, false, true},
	"inductance":          {"H", "largest coil self-inductance", true, false, true},
	"time-constant":       {"s", "largest electrical time constant L/R", true, false, true},
	"switch-off-voltage":  {"V", "largest voltage across the switch at switch-off", true, false, true},
	"torque":              {"N m", "largest torque in the background field", true, false, true},
	"core-flux-density":   {"T", "largest peak flux density in a core", true, false, true},
	"sensitivity":         {"V/T", "smallest pick-up coil sensitivity at its frequency", true, false, true},
	"band-noise":          {"T", "largest noise-equivalent field of a pick-up coil, rms over its band", true, false, true},
	"self-resonance":      {"Hz", "lowest self-resonant frequency of a winding", true, false, true},
	"resistance-ac":       {"ohm", "largest a.c. resistance of a winding at its frequency", true, false, true},
}

func limitNames() []string {
	names := make([]string, 0, len(LimitQuantities))
	for k := range LimitQuantities {
		names = append(names, k)
	}
	sort.Strings(names)
	return names
}

var relations = []struct {
	text string
	rel  calc.Relation
}{{"<=", calc.AtMost}, {">=", calc.AtLeast}, {"≤", calc.AtMost}, {"≥", calc.AtLeast}}

// defaultUniformTolerance is the tolerance of a uniform-radius limit that
// names none: 1 %.
const defaultUniformTolerance = 0.01

// limitsBlock reads one requirement a line:
//
//	<quantity>[(<subject>)] <= | >= <value with unit>
//
// The subject is a coil block's or a probe's name; uniform-radius takes a
// tolerance in its parentheses too, e.g. uniform-radius(pair, 0.1 %).
// Subjects are checked once every coil and probe is known
// (checkLimitSubjects).
func (p *parser) limitsBlock(b *rawBlock) {
	seen := map[string]int{}
	for _, l := range b.lines {
		i, rel, relText := -1, calc.AtLeast, ""
		for _, r := range relations {
			if j := strings.Index(l.text, r.text); j >= 0 && (i < 0 || j < i) {
				i, rel, relText = j, r.rel, r.text
			}
		}
		if i < 0 {
			if j := strings.IndexAny(l.text, "<>="); j >= 0 {
				op := l.text[j : j+1]
				if j+1 < len(l.text) && strings.ContainsRune("<>=", rune(l.text[j+1])) {
					op = l.text[j : j+2]
				}
				p.errf(l.line, "bad relation %q in %q: want <= (at most) or >= (at least)", op, l.text)
			} else {
				p.errf(l.line, "malformed limit %q: want <quantity> <= or >= <value with unit>, e.g. moment >= 0.2 A m2", l.text)
			}
			continue
		}
		head := strings.TrimSpace(l.text[:i])
		value := strings.TrimSpace(l.text[i+len(relText):])
		name, args, ok := splitSubject(head)
		if !ok {
			p.errf(l.line, "malformed limit %q: write the subject in parentheses after the quantity, e.g. moment(torquer X) >= 100 mA m2", l.text)
			continue
		}
		name = strings.ToLower(name)
		e := kv{key: head, value: value, raw: relText + " " + value, line: l.line}
		if name == "" {
			p.errf(l.line, "limit %q names no quantity", l.text)
			continue
		}
		lq, ok := LimitQuantities[name]
		if !ok {
			names := limitNames()
			if s := nearest(name, names); s != "" {
				p.errf(l.line, "unknown limit quantity %q; did you mean %q?", name, s)
			} else {
				p.errf(l.line, "unknown limit quantity %q (known: %s)", name, strings.Join(names, ", "))
			}
			continue
		}
		lim := calc.Limit{Quantity: name, Relation: rel, Line: l.line}
		if name == "uniform-radius" {
			lim.Tolerance = defaultUniformTolerance
		}
		bad := false
		for _, a := range args {
			if name == "uniform-radius" && strings.HasSuffix(a, "%") {
				v, err := parsePercent(a)
				if err != nil || !(v > 0 && v < 1) {
					p.errf(l.line, "limit %s: tolerance %q: want a percentage between 0 and 100, e.g. 1 %%", name, a)
					bad = true
				}
				lim.Tolerance = v
				continue
			}
			if lim.Subject != "" {
				p.errf(l.line, "limit %s: two subjects, %q and %q; give one coil or probe", name, lim.Subject, a)
				bad = true
			}
			lim.Subject = a
		}
		if bad {
			continue
		}
		key := name + "(" + lim.Subject + ")" + relString(rel)
		if prev, ok := seen[key]; ok {
			p.errf(l.line, "duplicate limit %s %s (first given on line %d)", head, relString(rel), prev)
			continue
		}
		seen[key] = l.line
		si := ""
		want, err := units.DimOf(lq.Unit)
		if err != nil {
			// a unit of the table that the units parser cannot read
			p.errf(l.line, "limit %s: internal: unit %q of the quantity is unreadable: %v", name, lq.Unit, err)
			continue
		}
		if value == "" {
			p.errf(l.line, "limit %s: no value after %s", name, relText)
		} else if q, err := units.ParseAs(value, want); err != nil {
			p.errf(l.line, "limit %s: %v", name, err)
		} else if q.Value < 0 && lq.Unit != "degC" {
			p.errf(l.line, "limit %s: %s is negative; limits bound magnitudes", name, value)
		} else {
			lim.Required = q.Value
			p.spec.Design.Limits = append(p.spec.Design.Limits, lim)
			si = relString(rel) + " " + q.String()
			if !want.Named() {
				// a unit with no name of its own (V/T is m²·s⁻¹): in the
				// unit the quantity is known in, not as base units
				si = relString(rel) + " " + units.FormatNumber(q.Value) + " " + format.Unit(lq.Unit)
			}
		}
		p.entry(blockLimits, e, si)
	}
}

// splitSubject splits "moment(torquer X)" into the quantity and the
// comma-separated arguments in its parentheses; ok is false for
// unbalanced or empty parentheses.
func splitSubject(head string) (name string, args []string, ok bool) {
	open := strings.IndexByte(head, '(')
	if open < 0 {
		return head, nil, !strings.ContainsRune(head, ')')
	}
	if !strings.HasSuffix(head, ")") || strings.Count(head, "(") != 1 || strings.Count(head, ")") != 1 {
		return "", nil, false
	}
	name = strings.TrimSpace(head[:open])
	for _, a := range strings.Split(head[open+1:len(head)-1], ",") {
		a = unquote(strings.TrimSpace(a))
		if a == "" {
			return "", nil, false
		}
		args = append(args, a)
	}
	return name, args, true
}

// checkLimitSubjects checks every limit's subject against the coils and
// probes of the spec, and that quantities that need one coil (gradient,
// uniform-radius) have one.
func (p *parser) checkLimitSubjects() {
	d := p.spec.Design
	coils := map[string]calc.Coil{}
	var names []string
	for _, c := range d.Coils {
		coils[c.Name] = c
		names = append(names, c.Name)
	}
	probes := map[string]bool{}
	for _, pr := range d.Probes {
		probes[pr.Name] = true
		names = append(names, pr.Name)
	}
	for _, l := range d.Limits {
		lq := LimitQuantities[l.Quantity]
		if l.Subject == "" {
			if (l.Quantity == "gradient" || l.Quantity == "uniform-radius") && len(d.Coils) > 1 {
				p.errf(l.Line, "limit %s: name the coil it is about, e.g. %s(%s); the spec has %d coil blocks", l.Quantity, l.Quantity, d.Coils[0].Name, len(d.Coils))
			}
			continue
		}
		c, isCoil := coils[l.Subject]
		switch {
		case isCoil && lq.Coils:
			if l.Quantity == "gradient" && !(c.Form == calc.Pair && c.Opposing) {
				p.errf(l.Line, "limit gradient(%s): coil %q is not an opposing pair; the centre gradient is a requirement of a gradient pair", l.Subject, l.Subject)
			}
		case probes[l.Subject] && lq.Probes:
		case isCoil || probes[l.Subject]:
			what := "coil"
			if probes[l.Subject] {
				what = "probe"
			}
			p.errf(l.Line, "limit %s(%s): %s is not said of a %s", l.Quantity, l.Subject, l.Quantity, what)
		default:
			if s := nearest(l.Subject, names); s != "" {
				p.errf(l.Line, "limit %s: unknown subject %q; did you mean %q?", l.Quantity, l.Subject, s)
			} else {
				p.errf(l.Line, "limit %s: unknown subject %q (coils and probes: %s)", l.Quantity, l.Subject, strings.Join(names, ", "))
			}
		}
	}
}

func relString(r calc.Relation) string {
	if r == calc.AtMost {
		return "<="
	}
	return ">="
}
