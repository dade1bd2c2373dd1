package spec

import (
	"fmt"
	"strconv"
	"strings"

	"coilmemo/calc"
	"coilmemo/calc/units"
)

// Objective is what a size block optimises.
type Objective int

// The objectives a size block may name.
const (
	MinimumPower Objective = iota
	MinimumMass
	MaximumMoment
	MaximumMomentPerPower
)

var objectiveNames = []string{"minimum power", "minimum mass", "maximum moment", "maximum moment per power"}

// String is the objective as a size block writes it.
func (o Objective) String() string {
	if o < 0 || int(o) >= len(objectiveNames) {
		return "?"
	}
	return objectiveNames[o]
}

// Maximise reports whether the objective is to be made as large as
// possible (moment, moment per power) rather than as small.
func (o Objective) Maximise() bool { return o == MaximumMoment || o == MaximumMomentPerPower }

// WireChoice is one wire a size block may choose: an AWG gauge, or a bare
// diameter (Gauge == calc.NoGauge).
type WireChoice struct {
	Gauge int
	Bare  float64 // m
}

// Name is the wire as a spec writes it: "AWG 30" or "0.25 mm".
func (w WireChoice) Name() string {
	if w.Gauge != calc.NoGauge {
		return gaugeName(w.Gauge)
	}
	return strconv.FormatFloat(w.Bare*1e3, 'g', 4, 64) + " mm"
}

// FreeRange is a numeric coil key a size block sets within [Lo, Hi], SI.
type FreeRange struct {
	Key    string
	Lo, Hi float64
	Dim    units.Dim
	Line   int
}

// Size is the size block: the coil keys left free, their ranges, and the
// objective. Sizing itself (the search) is the analysis stage's.
type Size struct {
	// Coil names the coil block sized; "" sizes every coil block alike
	// (the same turns, wire and values on each).
	Coil     string
	CoilLine int
	// TurnsLo … TurnsHi is the range of whole turn counts, TurnsLine its
	// line; 0 when the turns are not free.
	TurnsLo, TurnsHi, TurnsLine int
	// Wires are the wires to choose among, thickest first; WireLine their
	// line, 0 when the wire is not free.
	Wires    []WireChoice
	WireLine int
	// Ranges are the numeric coil keys left free, in the order written.
	Ranges []FreeRange
	// Objective and its line.
	Objective     Objective
	ObjectiveLine int
	Line          int // the block's opening fence
	// Targets are the indexes of the coil blocks sized.
	Targets []int
}

// Discrete is the number of (turns, wire) choices: every whole turn count
// of the range with every wire.
func (s *Size) Discrete() int {
	n := 1
	if s.TurnsLine > 0 {
		n = s.TurnsHi - s.TurnsLo + 1
	}
	if s.WireLine > 0 {
		n *= len(s.Wires)
	}
	return n
}

// Free reports whether key is left free by the size block.
func (s *Size) Free(key string) bool {
	switch key {
	case "turns":
		return s.TurnsLine > 0
	case "wire":
		return s.WireLine > 0
	}
	for _, r := range s.Ranges {
		if r.Key == key {
			return true
		}
	}
	return false
}

// MaxSizeCandidates bounds the (turns, wire) choices of a size block: each
// is laid out and its heat balance solved, a few microseconds apiece; 17
// gauges over 50 … 3000 turns are about 50 000.
const MaxSizeCandidates = 250_000

// maxSizeRanges bounds the numeric keys a size block leaves free besides
// turns and wire: each multiplies the search by its golden-section steps.
const maxSizeRanges = 2

var sizeKeys = []string{"coil", "turns", "wire", "objective"}

// sizeBlock reads a size block:
//
//	coil      = <name>                  (optional; default every coil)
//	turns     = 50 .. 3000
//	wire      = AWG 24 .. AWG 40        (or a list: AWG 28, AWG 30, 0.25 mm)
//	<coil key> = <lo> .. <hi>           (any numeric coil key)
//	objective = minimum power | minimum mass | maximum moment | maximum moment per power
//
// The checks that need the coils and limits are in checkSize.
func (p *parser) sizeBlock(b *rawBlock) *Size {
	s := &Size{Line: b.fence}
	for _, e := range p.keyValues(b, false) {
		switch e.key {
		case "coil":
			s.Coil, s.CoilLine = e.value, e.line
			p.entry(blockSize, e, e.value)
		case "objective":
			v := strings.Join(strings.Fields(strings.ToLower(e.value)), " ")
			found := false
			for i, n := range objectiveNames {
				if v == n {
					s.Objective, found = Objective(i), true
				}
			}
			if !found {
				if near := nearest(v, objectiveNames); near != "" {
					p.errf(e.line, "objective %q: did you mean %q?", e.value, near)
				} else {
					p.errf(e.line, "objective %q: want one of %s", e.value, strings.Join(objectiveNames, ", "))
				}
				continue
			}
			s.ObjectiveLine = e.line
			p.entry(blockSize, e, s.Objective.String())
		case "turns":
			lo, hi, err := turnsRange(e.value)
			if err != nil {
				p.errf(e.line, "size turns: %v", err)
				continue
			}
			s.TurnsLo, s.TurnsHi, s.TurnsLine = lo, hi, e.line
			p.entry(blockSize, e, fmt.Sprintf("%d .. %d", lo, hi))
		case "wire":
			w, err := wireChoices(e.value)
			if err != nil {
				p.errf(e.line, "size wire: %v", err)
				continue
			}
			s.Wires, s.WireLine = w, e.line
			p.entry(blockSize, e, fmt.Sprintf("%s .. %s (%d wires)", w[0].Name(), w[len(w)-1].Name(), len(w)))
		default:
			dim, ok := sweepDims[e.key]
			if !ok || e.key == "duty" {
				if isCoilKey(e.key) {
					p.errf(e.line, "size: %q cannot be left free: a size block sets turns, wire and the numeric coil keys (%s)", e.key, strings.Join(sizeRangeKeys(), ", "))
				} else {
					p.unknownKey(e, blockSize, append(append([]string(nil), sizeKeys...), sizeRangeKeys()...))
				}
				continue
			}
			if len(s.Ranges) == maxSizeRanges {
				p.errf(e.line, "size: at most %d numeric keys may be free besides turns and wire (each multiplies the search); fix %q in the coil block", maxSizeRanges, e.key)
				continue
			}
			lo, hi, err := valueRange(e.value, dim)
			if err != nil {
				p.errf(e.line, "size %s: %v", e.key, err)
				continue
			}
			switch {
			case !(hi > lo):
				p.errf(e.line, "size %s: the range %s is empty: want <low> .. <high> with high above low", e.key, e.value)
				continue
			case lo < 0 || (lo == 0 && e.key != "radial-build"):
				p.errf(e.line, "size %s: the range must lie above zero (%s)", e.key, e.value)
				continue
			}
			if top, ok := upperBounds[dim]; ok && hi > top {
				p.errf(e.line, "size %s: %s is more than %s, the most a spec accepts", e.key, e.value, units.Format(top, dim))
				continue
			}
			s.Ranges = append(s.Ranges, FreeRange{Key: e.key, Lo: lo, Hi: hi, Dim: dim, Line: e.line})
			p.entry(blockSize, e, units.Format(lo, dim)+" .. "+units.Format(hi, dim))
		}
	}
	if s.ObjectiveLine == 0 {
		p.errf(b.fence, "size block has no objective: write e.g. objective = minimum power (or minimum mass, maximum moment, maximum moment per power)")
	}
	if s.TurnsLine == 0 && s.WireLine == 0 && len(s.Ranges) == 0 {
		p.errf(b.fence, "size block leaves nothing free: write e.g. turns = 50 .. 3000 and wire = AWG 24 .. AWG 40")
	}
	if n := s.Discrete(); n > MaxSizeCandidates {
		p.errf(max(s.TurnsLine, s.WireLine), "size: %d turn counts × %d wires = %d candidates, more than the %d a size block may search; narrow the turns or the wires",
			s.TurnsHi-s.TurnsLo+1, max(len(s.Wires), 1), n, MaxSizeCandidates)
	}
	return s
}

// sizeRangeKeys are the numeric coil keys a size block may leave free.
func sizeRangeKeys() []string {
	var k []string
	for _, c := range coilKeys {
		if _, ok := sweepDims[c]; ok && c != "turns" && c != "duty" {
			k = append(k, c)
		}
	}
	return k
}

// turnsRange reads "<lo> .. <hi>" of whole turn counts.
func turnsRange(s string) (int, int, error) {
	i := strings.Index(s, "..")
	if i < 0 {
		return 0, 0, fmt.Errorf("bad range %q: want <low> .. <high>, e.g. 50 .. 3000", s)
	}
	var v [2]int
	for k, x := range []string{s[:i], s[i+2:]} {
		x = strings.TrimSpace(x)
		n, err := strconv.Atoi(x)
		if err != nil {
			return 0, 0, fmt.Errorf("%q is not a whole number of turns", x)
		}
		v[k] = n
	}
	switch {
	case v[0] < 1:
		return 0, 0, fmt.Errorf("the range %s starts below one turn", s)
	case v[1] <= v[0]:
		return 0, 0, fmt.Errorf("the range %s is empty: want <low> .. <high> with high above low", s)
	case v[1] > calc.MaxTurns:
		return 0, 0, fmt.Errorf("%d turns is more than the %d turns laid out one by one", v[1], calc.MaxTurns)
	}
	return v[0], v[1], nil
}

// wireChoices reads "AWG a .. AWG b" (every gauge between, either order)
// or a comma-separated list of wires (AWG gauges or bare diameters),
// returned thickest first.
func wireChoices(s string) ([]WireChoice, error) {
	if i := strings.Index(s, ".."); i >= 0 {
		a, b := strings.TrimSpace(s[:i]), strings.TrimSpace(s[i+2:])
		ga, _, err := parseWire(a)
		if err != nil {
			return nil, err
		}
		if _, _, e := units.Split(b); e == nil && !strings.HasPrefix(strings.ToUpper(b), "AWG") {
			if n, u, e := units.Split(b); e == nil && u == "" && ga != calc.NoGauge {
				b = "AWG " + n // "AWG 24 .. 40"
			}
		}
		gb, _, err := parseWire(b)
		if err != nil {
			return nil, err
		}
		if ga == calc.NoGauge || gb == calc.NoGauge {
			return nil, fmt.Errorf("a range of wires runs between two AWG gauges (%q); list bare diameters with commas: 0.2 mm, 0.25 mm", s)
		}
		if ga == gb {
			return nil, fmt.Errorf("the range %s is one gauge: write it in the coil block", s)
		}
		lo, hi := min(ga, gb), max(ga, gb)
		var out []WireChoice
		for g := lo; g <= hi; g++ {
			out = append(out, WireChoice{Gauge: g, Bare: calc.AWGDiameter(g)})
		}
		return out, nil
	}
	var out []WireChoice
	seen := map[float64]bool{}
	for _, x := range strings.Split(s, ",") {
		x = strings.TrimSpace(x)
		g, bare, err := parseWire(x)
		if err != nil {
			return nil, err
		}
		if seen[bare] {
			return nil, fmt.Errorf("%s is listed twice", x)
		}
		seen[bare] = true
		out = append(out, WireChoice{Gauge: g, Bare: bare})
	}
	if len(out) < 2 {
		return nil, fmt.Errorf("one wire is no choice: write it in the coil block, or list several (AWG 28, AWG 30) or a range (AWG 24 .. AWG 40)")
	}
	// thickest first
	for i := 1; i < len(out); i++ {
		for j := i; j > 0 && out[j].Bare > out[j-1].Bare; j-- {
			out[j], out[j-1] = out[j-1], out[j]
		}
	}
	return out, nil
}

// provisional is the value a sized coil block takes for a free key it does
// not state, so that its other rules can be checked: the lower end of the
// turns, the thickest wire, the upper end of a range.
func (s *Size) provisional(key string) (string, bool) {
	switch key {
	case "turns":
		return strconv.Itoa(s.TurnsLo), true
	case "wire":
		w := s.Wires[0]
		if w.Gauge != calc.NoGauge {
			return gaugeName(w.Gauge), true
		}
		return units.Format(w.Bare, units.Length), true
	}
	for _, r := range s.Ranges {
		if r.Key == key {
			return units.Format(r.Hi, r.Dim), true
		}
	}
	return "", false
}

// freeKeys are the keys the size block leaves free, in a fixed order.
func (s *Size) freeKeys() []string {
	var k []string
	if s.TurnsLine > 0 {
		k = append(k, "turns")
	}
	if s.WireLine > 0 {
		k = append(k, "wire")
	}
	for _, r := range s.Ranges {
		k = append(k, r.Key)
	}
	return k
}

func (s *Size) lineOf(key string) int {
	switch key {
	case "turns":
		return s.TurnsLine
	case "wire":
		return s.WireLine
	}
	for _, r := range s.Ranges {
		if r.Key == key {
			return r.Line
		}
	}
	return s.Line
}

// sizes reports whether the size block sizes the coil named name.
func (s *Size) sizes(name string) bool { return s != nil && (s.Coil == "" || s.Coil == name) }

// fillFree gives a sized coil block a provisional value for every free key
// it does not state (see provisional) and marks its entries of free keys
// as sized.
func (p *parser) fillFree(ci *coilIn) {
	s := p.size
	if !s.sizes(ci.c.Name) {
		return
	}
	ci.sized = true
	for _, k := range s.freeKeys() {
		if _, ok := ci.lines[k]; ok || mustState[k] {
			continue
		}
		ci.injected[k] = true
		v, _ := s.provisional(k)
		e := kv{key: k, value: v, line: s.lineOf(k)}
		ci.lines[k] = e.line
		si, ok := p.coilValue(ci, e)
		if ok {
			ci.given[k] = e
		} else {
			ci.bad[k] = true
			si = ""
		}
		p.entry(blockCoil, e, si)
		ci.entries = append(ci.entries, len(p.spec.Entries)-1)
	}
	for _, i := range ci.entries {
		if s.Free(p.spec.Entries[i].Key) {
			p.spec.Entries[i].Sized = true
		}
	}
}

// checkSize applies the rules of a size block that need the coils and the
// limits: the coil it names exists, every free key applies to every coil
// it sizes, and the objective means something under the limits.
func (p *parser) checkSize(coils []*coilIn) {
	s := p.size
	var names []string
	for i, ci := range coils {
		names = append(names, strconv.Quote(ci.c.Name))
		if s.sizes(ci.c.Name) {
			s.Targets = append(s.Targets, i)
		}
	}
	if len(s.Targets) == 0 {
		p.errf(s.CoilLine, "size: no coil named %q (coils: %s)", s.Coil, strings.Join(names, ", "))
		return
	}
	for _, i := range s.Targets {
		ci := coils[i]
		c := ci.c
		for _, r := range s.Ranges {
			if msg := freeKeyProblem(ci, r.Key); msg != "" {
				p.errf(r.Line, "size %s: coil %q %s", r.Key, c.Name, msg)
			}
		}
		if _, ok := ci.given["wire-outer-diameter"]; ok && s.WireLine > 0 {
			p.errf(ci.lines["wire-outer-diameter"], "coil %q: wire-outer-diameter cannot be stated when the size block chooses the wire: the outer diameter follows the wire chosen (heavy-build estimate); remove it", c.Name)
		}
		if s.ObjectiveLine > 0 && s.Objective.Maximise() && c.Form == calc.Pair && c.Opposing {
			p.errf(s.ObjectiveLine, "objective %s: coil %q is an opposing pair, whose moment is zero whatever its winding; size it for a field gradient with objective = minimum power and a gradient limit", s.Objective, c.Name)
		}
		if c.Core.Present() {
			p.errf(s.Line, "size: coil %q has a core, and the size search does not take cores yet: the core's model (its demagnetisation and B–H curve) takes 20 to 120 ms a choice, too slow to run over every choice; size the winding as an air coil for the share of the moment the core leaves it, or step the turns with a sweep block", c.Name)
		}
		if s.ObjectiveLine > 0 && isReceiver(ci) {
			p.errf(s.ObjectiveLine, "objective %s: coil %q is a pick-up coil (no drive): it carries no current, so it has no moment or power to size for", s.Objective, c.Name)
		}
	}
	if s.ObjectiveLine > 0 && !s.Objective.Maximise() {
		delivers := false
		for _, l := range p.spec.Design.Limits {
			delivers = delivers || (l.Relation == calc.AtLeast && deliveryQuantities[l.Quantity])
		}
		if !delivers {
			p.errf(s.ObjectiveLine, "objective %s with no requirement on what the coil delivers picks the coil that delivers nothing: add a limit such as moment >= 0.2 A m2 or field-center >= 1 mT", s.Objective)
		}
	}
}

// deliveryQuantities are the limit quantities that say what a coil must
// deliver: a minimum objective needs at least one of them as a lower bound.
var deliveryQuantities = map[string]bool{
	"moment": true, "field-center": true, "field": true, "gradient": true, "torque": true,
	"uniform-radius": true,
}

// mustState are the free keys a coil block must state itself: a
// diameter (the coil block fixes which of mean, inner and outer diameter
// it gives), and the keys whose absence means something (no stated
// switch-off time, on-time or frequency).
var mustState = map[string]bool{
	"mean-diameter": true, "inner-diameter": true, "outer-diameter": true,
	"wire-outer-diameter": true, "switch-off": true, "on-time": true, "frequency": true,
	"current": true, "voltage": true,
}

// freeKeyProblem says why a numeric key cannot be left free on a coil
// block, or "".
func freeKeyProblem(ci *coilIn, key string) string {
	c := ci.c
	_, given := ci.given[key]
	given = given && !ci.injected[key]
	switch key {
	case "width", "height":
		if c.Form != calc.Rectangle {
			return "is not a rectangle and has no " + key
		}
	case "mean-diameter", "inner-diameter", "outer-diameter":
		if c.Form == calc.Rectangle {
			return "is a rectangle and has no " + key + " (it has width and height)"
		}
	case "spacing":
		if c.Form != calc.Pair {
			return "is not a pair and has no spacing"
		}
	case "current":
		if c.Drive == calc.VoltageDrive {
			return "is driven by voltage; leave voltage free instead"
		}
	case "voltage":
		if c.Drive != calc.VoltageDrive {
			return "is driven by current; leave current free instead"
		}
	}
	if mustState[key] && !given {
		return "does not state " + key + "; leave free a key the coil block gives"
	}
	return ""
}
