package analysis

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"coilmemo/calc"
	"coilmemo/calc/units"
	"coilmemo/format"
	"coilmemo/spec"
)

// Changes is what moved between two revisions of a design: the inputs
// that changed, every headline result that moved and every requirement
// whose value or verdict moved, grouped by coil. The memo's "Changes since
// revision X" section and `coilmemo diff` both write it; neither compares
// on its own.
type Changes struct {
	From, To string // the revisions' marks (the memo block's revision), "" when not given
	Groups   []ChangeGroup
	// Regressed is set when a requirement met in the old revision is not
	// met in the new one.
	Regressed bool
}

// ChangeGroup is the changes of one coil, or of the design as a whole
// (Coil ""), headline results first, then requirements, then inputs.
type ChangeGroup struct {
	Coil    string
	Results []Change
	Limits  []LimitChange
	Inputs  []InputChange
}

// Change is one numeric result that moved, in SI. Unit is the SI unit of
// Old and New as the formatter takes it; a temperature is in kelvin and
// its Unit "°C" (Old and New in °C are Old−273.15 …; the difference is in
// kelvin either way).
type Change struct {
	Key      string // stable machine name, as in calc --json, e.g. "moment_A_m2"
	Quantity string // what it is, in words: "magnetic moment |m|"
	Unit     string
	Old, New float64
}

// Delta is the change New − Old (kelvin for a temperature).
func (c Change) Delta() float64 { return c.New - c.Old }

// Relative is the change as a fraction of |Old|; NaN when Old is 0.
func (c Change) Relative() float64 {
	if c.Old == 0 {
		return math.NaN()
	}
	return (c.New - c.Old) / math.Abs(c.Old)
}

// LimitChange is one requirement whose computed value or verdict moved.
type LimitChange struct {
	Requirement      string // quantity, subject and relation: "moment(torquer X) >="
	Quantity         string // the limit quantity's key
	OldRequired      float64
	Required         float64 // SI, as judged in the new revision
	Unit             string  // the quantity's unit as spec.LimitQuantities names it ("degC": values in kelvin)
	Old, New         float64
	OldPass, NewPass bool
	InOld            bool // false: the requirement is new in this revision
}

// Stated is the requirement with its relation as a sign: "moment(X) ≥".
func (l LimitChange) Stated() string {
	return strings.NewReplacer(" >=", " ≥", " <=", " ≤").Replace(l.Requirement)
}

// InputChange is one spec value that differs, as written.
//
// Numeric is set when both revisions write it as one number with a unit
// of the same dimension (a limit with the same relation before it): OldValue
// and NewValue are then those numbers in SI, Unit their SI unit as the
// formatter takes it ("°C" for a temperature written in degC or degF, the
// values in kelvin; "" for a plain number) and Relation the limit's "≤" or
// "≥" ("" for other keys).
type InputChange struct {
	Block, Key string
	Old, New   string // as written; "" when absent from that revision
	OldSI      string
	NewSI      string

	Numeric            bool
	OldValue, NewValue float64
	Unit, Relation     string
}

// Columns writes the change for a reader, as the memo's table and
// `coilmemo diff` both show it: the old and the new value (numbers in
// engineering units, to four significant figures like the results; text
// quoted as written; "(absent)" where a revision has none, "(default …)"
// for a value left to its default) and what the change was: the relative
// change or, for a temperature, its change in kelvin; "rewritten, same
// value" for one written differently; "added", "removed" or "replaced"
// for the others.
func (in InputChange) Columns() (from, to, change string) {
	switch {
	case in.Old == "":
		return "(absent)", in.shown(in.New, in.NewSI), "added"
	case in.New == "":
		return in.shown(in.Old, in.OldSI), "(absent)", "removed"
	case in.Numeric:
		from, to, change = format.Change(in.OldValue, in.NewValue, in.Unit)
		if in.Unit == "" {
			from, to = format.Sig(in.OldValue, 4), format.Sig(in.NewValue, 4)
			switch {
			case strings.Contains(in.Old, "%") || strings.Contains(in.New, "%"):
				from, to = format.Percent(in.OldValue), format.Percent(in.NewValue)
			case isWhole(in.OldValue) && isWhole(in.NewValue):
				from, to = format.Digits(int(in.OldValue)), format.Digits(int(in.NewValue))
			}
		}
		if !moved(in.OldValue, in.NewValue) {
			change = "rewritten, same value"
		}
		if in.Relation != "" {
			from, to = in.Relation+" "+from, in.Relation+" "+to
		}
		if in.Old == "(default)" {
			from = "(default) " + from
		}
		if in.New == "(default)" {
			to = "(default) " + to
		}
		return from, to, change
	}
	from, to = in.shown(in.Old, in.OldSI), in.shown(in.New, in.NewSI)
	if in.OldSI == in.NewSI && in.OldSI != "" {
		return from, to, "rewritten, same value"
	}
	return from, to, "replaced"
}

// shown is a value that is not one number: quoted as written, or the
// default's SI form.
func (in InputChange) shown(raw, si string) string {
	if raw == "(default)" {
		if si == "" {
			return "(default)"
		}
		return "(default " + si + ")"
	}
	return strconv.Quote(raw)
}

func isWhole(v float64) bool {
	return v == math.Trunc(v) && math.Abs(v) < 1e9
}

// numericInput fills in's Numeric fields when both revisions write the
// value as one number with a unit of one dimension.
func numericInput(in *InputChange) {
	if in.Old == "" || in.New == "" {
		return
	}
	// A default is read from its SI form's leading value: "0.000781706 m
	// (heavy-build estimate)", "293.15 K (20 °C)".
	value := func(raw, si string) string {
		if raw != "(default)" {
			return raw
		}
		if i := strings.Index(si, " ("); i >= 0 {
			si = si[:i]
		}
		if i := strings.Index(si, " = "); i >= 0 {
			si = si[:i]
		}
		return si
	}
	rel := func(s string) (string, string) {
		s = strings.TrimSpace(s)
		for _, r := range []struct{ op, sign string }{{"<=", "≤"}, {">=", "≥"}} {
			if rest, ok := strings.CutPrefix(s, r.op); ok {
				return r.sign, rest
			}
		}
		return "", s
	}
	ro, so := rel(value(in.Old, in.OldSI))
	rn, sn := rel(value(in.New, in.NewSI))
	if ro != rn {
		return
	}
	qo, err := units.Parse(so)
	if err != nil {
		return
	}
	qn, err := units.Parse(sn)
	if err != nil || qn.Dim != qo.Dim {
		return
	}
	temp := func(s string) bool {
		_, u, _ := units.Split(s)
		u = strings.TrimSpace(u)
		return u == "degC" || u == "degF" || u == "°C" || u == "°F"
	}
	unit := qo.Dim.Symbol()
	if qo.Dim == units.Temperature && (temp(so) || temp(sn)) {
		unit = "°C"
	}
	in.Numeric, in.OldValue, in.NewValue, in.Unit, in.Relation = true, qo.Value, qn.Value, unit, ro
}

// moved tells a real change from rounding noise (1 part in 10⁹).
func moved(a, b float64) bool {
	if math.IsNaN(a) || math.IsNaN(b) {
		return math.IsNaN(a) != math.IsNaN(b)
	}
	return math.Abs(a-b) > 1e-9*math.Max(math.Abs(a), math.Abs(b))
}

// headline is one headline result of a coil.
type headline struct {
	key, what, unit string
	get             func(cr calc.CoilResult) float64
}

var coilHeadlines = []headline{
	{"moment_A_m2", "magnetic moment |m|", "A·m²", func(cr calc.CoilResult) float64 { return cr.Moment.Norm() }},
	{"field_center_T", "field at own centre |B|", "T", func(cr calc.CoilResult) float64 { return cr.FieldCentre.Norm() }},
	{"gradient_T_per_m", "axial gradient at centre", "T/m", func(cr calc.CoilResult) float64 { return cr.Pair.Gradient }},
	{"current_A", "current", "A", func(cr calc.CoilResult) float64 { return cr.Current }},
	{"voltage_V", "voltage", "V", func(cr calc.CoilResult) float64 { return cr.Voltage }},
	{"power_W", "power", "W", func(cr calc.CoilResult) float64 { return cr.Power }},
	{"resistance_20C_ohm", "resistance at 20 °C", "Ω", func(cr calc.CoilResult) float64 { return cr.R20 }},
	{"resistance_hot_ohm", "resistance hot", "Ω", func(cr calc.CoilResult) float64 { return cr.RHot }},
	{"winding_temperature_C", "winding temperature, hottest point", "°C", func(cr calc.CoilResult) float64 { return cr.Temperature }},
	{"inductance_H", "inductance", "H", func(cr calc.CoilResult) float64 { return cr.Inductance }},
	{"wire_length_m", "wire length", "m", func(cr calc.CoilResult) float64 { return cr.Length }},
	{"mass_kg", "conductor mass", "kg", func(cr calc.CoilResult) float64 { return cr.Mass }},
}

// Compare lists what moved from the old study to the new one. Coils and
// probes are matched by name, inputs by block, coil and key, requirements
// by how the spec wrote them.
func Compare(old, cur *Study) Changes {
	ch := Changes{From: old.Spec.Memo.Revision, To: cur.Spec.Memo.Revision}
	groups := map[string]*ChangeGroup{"": {}}
	order := []string{""}
	group := func(coil string) *ChangeGroup {
		g, ok := groups[coil]
		if !ok {
			g = &ChangeGroup{Coil: coil}
			groups[coil] = g
			order = append(order, coil)
		}
		return g
	}
	for _, co := range cur.Spec.Design.Coils {
		group(co.Name)
	}

	// The design as a whole.
	d := groups[""]
	add := func(g *ChangeGroup, key, what, unit string, a, b float64) {
		if moved(a, b) {
			g.Results = append(g.Results, Change{Key: key, Quantity: what, Unit: unit, Old: a, New: b})
		}
	}
	if len(cur.Results.Coils) > 1 || len(old.Results.Coils) > 1 {
		add(d, "moment_A_m2", "all coils: magnetic moment |m|", "A·m²", old.Results.Moment.Norm(), cur.Results.Moment.Norm())
		add(d, "field_center_T", "all coils: |B| at the origin", "T", old.Results.FieldCentre.Norm(), cur.Results.FieldCentre.Norm())
	}
	add(d, "torque_max_N_m", "largest torque in the background field", "N·m", old.Results.TorqueMax, cur.Results.TorqueMax)
	for _, p := range cur.Results.Probes {
		for _, q := range old.Results.Probes {
			if q.Name == p.Name {
				add(d, "probes["+p.Name+"].B_T", "|B| at probe \""+p.Name+"\"", "T", q.B.Norm(), p.B.Norm())
			}
		}
	}

	// Each coil, matched by name.
	for i, cr := range cur.Results.Coils {
		for j, or := range old.Results.Coils {
			if or.Name != cr.Name {
				continue
			}
			g := group(cr.Name)
			for _, h := range coilHeadlines {
				a, b := h.get(or), h.get(cr)
				if h.key == "gradient_T_per_m" && !(isOpposingPair(old, j) || isOpposingPair(cur, i)) {
					continue
				}
				add(g, h.key, h.what, h.unit, a, b)
			}
		}
	}

	// Requirements, matched by how they are written.
	for _, l := range cur.Limits {
		lc := LimitChange{Requirement: requirementText(l), Quantity: l.Limit.Quantity,
			Unit: spec.LimitQuantities[l.Limit.Quantity].Unit, New: l.Computed, NewPass: l.Pass,
			Required: l.Limit.Required, OldRequired: math.NaN()}
		for _, m := range old.Limits {
			if requirementText(m) == lc.Requirement {
				lc.InOld, lc.Old, lc.OldPass, lc.OldRequired = true, m.Computed, m.Pass, m.Limit.Required
			}
		}
		if lc.InOld && !moved(lc.Old, lc.New) && lc.OldPass == lc.NewPass && !moved(lc.OldRequired, lc.Required) {
			continue
		}
		if lc.InOld && lc.OldPass && !lc.NewPass {
			ch.Regressed = true
		}
		coil := ""
		if l.On == OnCoil {
			coil = cur.Spec.Design.Coils[l.Coil].Name
		}
		g := group(coil)
		g.Limits = append(g.Limits, lc)
	}

	// Inputs, in the new spec's order, then those only in the old one.
	type ekey struct{ block, coil, key string }
	olds := map[ekey]spec.Entry{}
	for _, e := range old.Spec.Entries {
		olds[ekey{e.Block, e.Coil, e.Key}] = e
	}
	seen := map[ekey]bool{}
	shown := func(e spec.Entry) string {
		if e.Default {
			return "(default)"
		}
		return e.Raw
	}
	for _, e := range cur.Spec.Entries {
		k := ekey{e.Block, e.Coil, e.Key}
		if seen[k] || e.Block == "memo" {
			seen[k] = true
			continue
		}
		seen[k] = true
		o, ok := olds[k]
		switch {
		case !ok:
			group(e.Coil).Inputs = append(group(e.Coil).Inputs, InputChange{Block: e.Block, Key: e.Key, New: shown(e), NewSI: e.SI})
		case o.SI != e.SI || shown(o) != shown(e):
			in := InputChange{Block: e.Block, Key: e.Key, Old: shown(o), OldSI: o.SI, New: shown(e), NewSI: e.SI}
			numericInput(&in)
			group(e.Coil).Inputs = append(group(e.Coil).Inputs, in)
		}
	}
	for _, e := range old.Spec.Entries {
		k := ekey{e.Block, e.Coil, e.Key}
		if seen[k] || e.Block == "memo" {
			continue
		}
		seen[k] = true
		group(e.Coil).Inputs = append(group(e.Coil).Inputs, InputChange{Block: e.Block, Key: e.Key, Old: shown(e), OldSI: e.SI})
	}

	for _, k := range order {
		g := groups[k]
		if len(g.Results)+len(g.Limits)+len(g.Inputs) > 0 {
			ch.Groups = append(ch.Groups, *g)
		}
	}
	return ch
}

func isOpposingPair(st *Study, i int) bool {
	if i < 0 || i >= len(st.Spec.Design.Coils) {
		return false
	}
	c := st.Spec.Design.Coils[i]
	return c.Form == calc.Pair && c.Opposing
}

// requirementText names a requirement by its quantity, subject and
// relation: "moment(torquer X) >=".
func requirementText(l LimitResult) string {
	s := l.Limit.Quantity
	if l.Limit.Subject != "" {
		s += "(" + l.Limit.Subject + ")"
	}
	if l.Limit.Relation == calc.AtMost {
		return s + " <="
	}
	return s + " >="
}

// ComparePrevious reads the previous revision the memo block names
// (through o.ReadPrevious), analyses it and sets st.Changes. A previous
// revision that cannot be read, or has problems of its own, is a
// diagnostic at the `previous` line. Without a `previous` key or a reader
// it does nothing.
func ComparePrevious(st *Study, o Options) spec.Diagnostics {
	m := st.Spec.Memo
	if m.Previous == "" || o.ReadPrevious == nil {
		return nil
	}
	at := func(format string, a ...any) spec.Diagnostics {
		return spec.Diagnostics{{File: st.Spec.File, Line: m.PreviousLine, Msg: fmt.Sprintf(format, a...)}}
	}
	name, src, err := o.ReadPrevious(m.Previous)
	if err != nil {
		return at("previous: %v", err)
	}
	prev, diags := Run(name, src, Options{Name: name, Date: o.Date})
	if len(diags) > 0 {
		return at("previous: %s has %d problem(s), the first: %s", name, len(diags), diags[0].Error())
	}
	ch := Compare(prev, st)
	if ch.From == "" {
		ch.From = m.Previous
	}
	st.Changes = &ch
	return nil
}
