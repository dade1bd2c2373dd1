package spec

import (
	"fmt"
	"math"
	"strconv"
	"strings"
	"time"
	"unicode"
	"unicode/utf8"

	"coilmemo/calc"
	"coilmemo/calc/units"
	"coilmemo/format"
)

// kv is one "key = value" line of a parameter block.
type kv struct {
	key   string // lower case, except probe names
	value string // unquoted value
	raw   string // value as written
	line  int
}

// Keys of each block, in the order the reference documents them.
var (
	memoKeys = []string{"title", "client", "project", "document-id", "revision", "date", "author", "checker", "approver", "prepared-date", "checked-date", "approved-date", "previous", "status", "history"}
	coilKeys = []string{"name", "form", "mean-diameter", "inner-diameter", "outer-diameter", "length",
		"radial-build", "width", "height", "turns", "wire", "wire-outer-diameter", "conductor",
		"insulation-class", "current", "voltage", "duty", "spacing", "sense", "axis", "centre",
		"test-plane", "switch-off", "driver-rating", "frequency", "on-time", "former-mass", "former-material",
		"former-heat-capacity", "winding-conductivity", "unmodelled-core"}
	conditionKeys = []string{"ambient", "background-field", "design-angle", "cooling", "h", "emissivity",
		"field-gradient", "mount-resistance", "orientation", "up", "enclosure", "handling-ambient"}
)

// Defaults.
const (
	defaultAmbientC    = 20.0  // °C
	defaultInsulationC = 130.0 // °C, IEC 60085 thermal class 130 (B)
	// stillAirH and defaultEmissivity are calc's cooling defaults.
	stillAirH         = calc.StillAirH
	defaultEmissivity = calc.DefaultEmissivity
	zeroCelsius       = 273.15
)

// insulationClasses maps the IEC 60085 letter designations to their
// thermal class, °C.
var insulationClasses = map[string]float64{
	"Y": 90, "A": 105, "E": 120, "B": 130, "F": 155, "H": 180, "N": 200, "R": 220,
}

// thermalClasses are the IEC 60085 numeric thermal classes, °C; a bare
// number among them is accepted as an insulation class.
var thermalClasses = []float64{90, 105, 120, 130, 155, 180, 200, 220, 250}

// design turns the collected parameter blocks into the Spec's Design,
// Memo, Entries and Sweep.
func (p *parser) design() {
	first := map[string]int{}
	var coils []*coilIn
	// The size block is read first: the coil blocks it sizes need not
	// state the keys it leaves free.
	for _, b := range p.blocks {
		if b.kind == blockSize && p.size == nil {
			e0 := len(p.spec.Entries)
			p.size = p.sizeBlock(b)
			p.spec.Size = p.size
			p.spec.Entries = p.spec.Entries[:e0] // its entries are taken in source order below
		}
	}
	var sweepBlock *rawBlock
	seenConditions := false
	for _, b := range p.blocks {
		if b.kind == "" {
			continue
		}
		if b.kind != blockCoil {
			if l, ok := first[b.kind]; ok {
				p.errf(b.fence, "second %s block (the first is on line %d); give each %s parameter once, in one block", b.kind, l, b.kind)
				continue
			}
			first[b.kind] = b.fence
		}
		switch b.kind {
		case blockMemo:
			p.memoBlock(b)
		case blockCoil:
			coils = append(coils, p.coilBlock(b, len(coils)+1))
		case blockConditions:
			p.conditionsBlock(b)
			seenConditions = true
		case blockLimits:
			p.limitsBlock(b)
		case blockProbes:
			p.probesBlock(b)
		case blockSweep:
			sweepBlock = b
		case blockTolerances:
			defer func() { p.tolerancesBlock(b, coils) }() // once every coil and the conditions are read
		case blockSize:
			// read above; read again here only for its entries, in source
			// order (its problems were reported the first time)
			n := len(p.diags)
			p.sizeBlock(b)
			p.diags = p.diags[:n]
		}
	}
	if !seenConditions {
		p.conditionsBlock(&rawBlock{kind: blockConditions})
	}
	if len(coils) == 0 {
		p.errf(1, "no coil block: a spec needs at least one fenced block named coil")
	}
	names := map[string]int{}
	for _, c := range coils {
		if l, ok := names[c.c.Name]; ok {
			p.errf(c.nameLine, "coil name %q is already used by the coil block on line %d; give each coil its own name", c.c.Name, l)
		} else {
			names[c.c.Name] = c.fence
		}
		p.spec.Design.Coils = append(p.spec.Design.Coils, c.c)
		p.spec.CoilFences = append(p.spec.CoilFences, c.fence)
	}
	if p.checkWorkBounds(coils) {
		p.checkBuildable(coils) // pairs of coils: not over 300 of them
	}
	if sweepBlock != nil {
		p.sweepBlock(sweepBlock, coils)
	}
	p.checkLimitSubjects()
	p.checkOrientation()
	if p.size != nil {
		p.checkSize(coils)
	}
}

// keyValues splits a block's lines at the first "=", lower-cases keys
// (unless keepCase) and drops duplicates, reporting them.
func (p *parser) keyValues(b *rawBlock, keepCase bool) []kv {
	var out []kv
	seen := map[string]int{}
	for _, l := range b.lines {
		i := strings.IndexByte(l.text, '=')
		if i < 0 {
			p.errf(l.line, "malformed line %q in %s block: want key = value", l.text, b.kind)
			continue
		}
		key := strings.TrimSpace(l.text[:i])
		raw := strings.TrimSpace(l.text[i+1:])
		if key == "" {
			p.errf(l.line, "missing key before \"=\" in %s block", b.kind)
			continue
		}
		if !keepCase {
			key = strings.ToLower(key)
		}
		if raw == "" {
			p.errf(l.line, "%s: no value after \"=\"", key)
			continue
		}
		if prev, ok := seen[key]; ok && !(b.kind == blockMemo && key == "history") {
			p.errf(l.line, "duplicate key %q in %s block (first given on line %d)", key, b.kind, prev)
			continue
		}
		seen[key] = l.line
		out = append(out, kv{key: key, value: unquote(raw), raw: raw, line: l.line})
	}
	return out
}

func unquote(s string) string {
	if len(s) >= 2 && s[0] == '"' && s[len(s)-1] == '"' {
		return s[1 : len(s)-1]
	}
	return s
}

// unknownKey reports a key a block does not know, suggesting the nearest
// one, or the block it belongs in.
func (p *parser) unknownKey(e kv, block string, keys []string) {
	if s := nearest(e.key, keys); s != "" {
		p.errf(e.line, "unknown key %q in %s block; did you mean %q?", e.key, block, s)
		return
	}
	for _, other := range []struct {
		name string
		keys []string
	}{{blockMemo, memoKeys}, {blockCoil, coilKeys}, {blockConditions, conditionKeys}} {
		if other.name == block {
			continue
		}
		for _, k := range other.keys {
			if k == e.key {
				p.errf(e.line, "key %q belongs in the %s block, not the %s block", e.key, other.name, block)
				return
			}
		}
	}
	p.errf(e.line, "unknown key %q in %s block (known keys: %s)", e.key, block, strings.Join(keys, ", "))
}

func (p *parser) entry(block string, e kv, si string) *Entry {
	p.spec.Entries = append(p.spec.Entries, Entry{Block: block, Key: e.key, Raw: e.raw, Line: e.line, SI: si})
	return &p.spec.Entries[len(p.spec.Entries)-1]
}

func (p *parser) defaultEntry(block, key, si string, line int, coil string) {
	p.spec.Entries = append(p.spec.Entries, Entry{Block: block, Key: key, Line: line, SI: si, Coil: coil, Default: true})
}

// ---- memo ----

func (p *parser) memoBlock(b *rawBlock) {
	m := &p.spec.Memo
	lines := map[string]int{}
	for _, e := range p.keyValues(b, false) {
		lines[e.key] = e.line
		si := e.value
		switch e.key {
		case "title":
			m.Title = e.value
		case "client":
			m.Client = e.value
		case "project":
			m.Project = e.value
		case "document-id":
			m.DocumentID = e.value
		case "revision":
			m.Revision = e.value
		case "author":
			m.Author = e.value
		case "checker":
			m.Checker = e.value
		case "approver":
			m.Approver = e.value
		case "prepared-date", "checked-date", "approved-date":
			t, err := parseDate(e.value)
			if err != nil {
				p.errf(e.line, "%s: %q is not an ISO 8601 date; write YYYY-MM-DD, e.g. 2025-03-14", e.key, e.value)
				si = ""
				break
			}
			si = t.Format("2006-01-02")
			switch e.key {
			case "prepared-date":
				m.PreparedDate = si
			case "checked-date":
				m.CheckedDate = si
			default:
				m.ApprovedDate = si
			}
		case "previous":
			if strings.TrimSpace(e.value) == "" || strings.TrimSpace(e.value) == "git:" {
				p.errf(e.line, "previous: name the previous revision's spec, a path relative to this spec or git:REV")
				si = ""
				break
			}
			m.Previous, m.PreviousLine = strings.TrimSpace(e.value), e.line
		case "status":
			m.Status = e.value
		case "history":
			si = p.historyLine(e)
		case "date":
			m.Date = e.value
			t, err := parseDate(e.value)
			if err != nil {
				p.errf(e.line, "date: %q is not an ISO 8601 date; write YYYY-MM-DD, e.g. 2025-03-14", e.value)
				si = ""
			} else {
				m.DateValue = t
				si = t.Format("2006-01-02")
			}
		default:
			p.unknownKey(e, blockMemo, memoKeys)
			continue
		}
		p.entry(blockMemo, e, si)
	}
	p.checkHistory()
	p.checkApproval(lines)
}

// checkApproval warns of an approval record that does not hold together:
// a memo issued with no approver named, and a role's date after the
// memo's own date. The memo is still written and shows the gap (IsIssued,
// AfterDate); nothing is filled in for the author.
func (p *parser) checkApproval(lines map[string]int) {
	m := p.spec.Memo
	if m.IsIssued() && m.Approver == "" {
		p.warnf(lines["status"], "status = %s but no approver is named: the approval block shows the approver as not named (add approver = NAME once the memo is approved)", m.Status)
	}
	for _, r := range []struct{ key, date string }{{"prepared-date", m.PreparedDate}, {"checked-date", m.CheckedDate}, {"approved-date", m.ApprovedDate}} {
		if m.AfterDate(r.date) {
			p.warnf(lines[r.key], "%s %s is later than the memo's date %s: the approval block marks it", r.key, r.date, m.DateValue.Format("2006-01-02"))
		}
	}
}

func parseDate(s string) (time.Time, error) {
	if t, err := time.Parse("2006-01-02", s); err == nil {
		return t, nil
	}
	return time.Parse(time.RFC3339, s)
}

// ---- coil ----

// coilIn is a coil block being read.
type coilIn struct {
	c        calc.Coil
	fence    int
	nameLine int
	given    map[string]kv // keys present with a valid value
	lines    map[string]int
	bad      map[string]bool // keys present whose value was rejected
	formOK   bool
	entries  []int // indexes into Spec.Entries
	// sized is set when the size block sizes this coil; injected lists
	// the free keys the block did not state (given provisional values).
	sized    bool
	injected map[string]bool
}

var formNames = map[string]calc.Form{
	"loop": calc.Loop, "solenoid": calc.Solenoid, "rectangle": calc.Rectangle, "pair": calc.Pair,
}

func (p *parser) coilBlock(b *rawBlock, index int) *coilIn {
	ci := &coilIn{
		fence:    b.fence,
		nameLine: b.fence,
		given:    map[string]kv{},
		lines:    map[string]int{},
		bad:      map[string]bool{},
		injected: map[string]bool{},
		formOK:   true,
		c: calc.Coil{
			Name:            fmt.Sprintf("coil %d", index),
			Form:            calc.Loop,
			Duty:            1,
			InsulationClass: defaultInsulationC + zeroCelsius,
			Axis:            calc.Vec{0, 0, 1},
			Wire:            calc.Wire{Gauge: calc.NoGauge, Material: calc.Copper()},
		},
	}
	c := &ci.c
	for _, e := range p.keyValues(b, false) {
		known := false
		for _, k := range coilKeys {
			if k == e.key {
				known = true
			}
		}
		if !known {
			if e.key == "emissivity" {
				p.errf(e.line, "emissivity belongs in the conditions block (it applies to every winding)")
				continue
			}
			p.unknownKey(e, blockCoil, coilKeys)
			continue
		}
		ci.lines[e.key] = e.line
		si, ok := p.coilValue(ci, e)
		if ok {
			ci.given[e.key] = e
		} else {
			ci.bad[e.key] = true
			si = ""
		}
		p.entry(blockCoil, e, si)
		ci.entries = append(ci.entries, len(p.spec.Entries)-1)
	}
	if p.size != nil {
		p.fillFree(ci)
	}
	before := len(p.diags)
	p.checkCoil(ci)
	// Only a coil whose keys are all sound is laid out: do its turns fit?
	// (A sized coil's fit is the search's to find.)
	if len(p.diags) == before && len(ci.bad) == 0 && !ci.sized {
		if err := calc.CheckWinding(*c); err != nil {
			line := ci.lines["turns"]
			for _, k := range []string{"length", "radial-build"} {
				line = max(line, ci.lines[k])
			}
			p.errf(line, "coil %q: %v", c.Name, err)
		}
	}
	for _, i := range ci.entries {
		p.spec.Entries[i].Coil = c.Name
	}
	// defaults
	add := func(key, si string) {
		if _, ok := ci.lines[key]; !ok {
			p.defaultEntry(blockCoil, key, si, b.fence, c.Name)
		}
	}
	add("name", c.Name)
	add("form", "loop")
	if c.Wire.OuterEstimated {
		add("wire-outer-diameter", units.Format(c.Wire.Outer, units.Length)+" (heavy-build estimate)")
	}
	add("conductor", c.Wire.Material.Name)
	add("insulation-class", units.Format(c.InsulationClass, units.Temperature)+" (class 130, B)")
	add("duty", "1")
	if c.Form == calc.Pair {
		add("sense", "aiding")
	}
	add("axis", "(0, 0, 1)")
	add("centre", "(0, 0, 0) m")
	return ci
}

// coilValue reads one coil key into ci and returns its SI form.
func (p *parser) coilValue(ci *coilIn, e kv) (string, bool) {
	c := &ci.c
	switch e.key {
	case "name":
		c.Name = e.value
		ci.nameLine = e.line
		return e.value, true
	case "form":
		f, ok := formNames[strings.ToLower(e.value)]
		if !ok {
			p.errf(e.line, "form = %s: want one of loop, solenoid, rectangle, pair", e.value)
			ci.formOK = false
			return "", false
		}
		c.Form = f
		return strings.ToLower(e.value), true
	case "mean-diameter", "inner-diameter", "outer-diameter", "length", "radial-build",
		"width", "height", "spacing", "wire-outer-diameter":
		v, ok := p.positive(e, units.Length)
		if !ok {
			return "", false
		}
		SetCoilValue(c, e.key, v)
		return units.Format(v, units.Length), true
	case "turns":
		n, ok := p.turns(e)
		if !ok {
			return "", false
		}
		SetCoilValue(c, e.key, float64(n))
		return strconv.Itoa(n), true
	case "wire":
		gauge, bare, err := parseWire(e.value)
		if err != nil {
			p.errf(e.line, "wire: %v", err)
			return "", false
		}
		c.Wire.Gauge, c.Wire.Bare = gauge, bare
		if gauge != calc.NoGauge {
			return fmt.Sprintf("%s (bare %s mm)", gaugeName(gauge), strconv.FormatFloat(bare*1e3, 'g', 3, 64)), true
		}
		return units.Format(bare, units.Length), true
	case "conductor":
		m, ok := calc.MaterialByName(e.value)
		if !ok {
			p.errf(e.line, "conductor = %s: want copper or aluminium", e.value)
			return "", false
		}
		c.Wire.Material = m
		return m.Name, true
	case "insulation-class":
		t, label, err := parseInsulation(e.value)
		if err != nil {
			p.errf(e.line, "insulation-class: %v", err)
			return "", false
		}
		c.InsulationClass = t
		return units.Format(t, units.Temperature) + label, true
	case "current", "voltage":
		want := units.Current
		if e.key == "voltage" {
			want = units.Voltage
		}
		v, ok := p.positive(e, want)
		if !ok {
			return "", false
		}
		SetCoilValue(c, e.key, v)
		return units.Format(v, want), true
	case "duty":
		v, err := parsePercent(e.value)
		if err != nil {
			p.errf(e.line, "duty: %v", err)
			return "", false
		}
		SetCoilValue(c, e.key, v)
		return units.FormatNumber(v), true
	case "switch-off", "on-time", "driver-rating", "frequency", "former-mass", "former-heat-capacity", "winding-conductivity":
		want := map[string]units.Dim{"switch-off": units.Time, "on-time": units.Time, "driver-rating": units.Voltage,
			"frequency": units.Frequency, "former-mass": units.Mass, "former-heat-capacity": units.HeatCapacity,
			"winding-conductivity": units.Conductivity}[e.key]
		v, ok := p.positive(e, want)
		if !ok {
			return "", false
		}
		SetCoilValue(c, e.key, v)
		return units.Format(v, want), true
	case "unmodelled-core":
		return p.unmodelledCore(c, e)
	case "former-material":
		m, ok := calc.FormerMaterialByName(e.value)
		if !ok {
			var names []string
			for _, f := range calc.FormerMaterials {
				names = append(names, f.Name)
			}
			p.errf(e.line, "former-material = %s: want one of %s, or give former-heat-capacity", e.value, strings.Join(names, ", "))
			return "", false
		}
		c.Former.Material, c.Former.SpecificHeat = m.Name, m.SpecificHeat
		return fmt.Sprintf("%s (c = %s J/(kg·K))", m.Name, strconv.FormatFloat(m.SpecificHeat, 'f', -1, 64)), true
	case "sense":
		switch strings.ToLower(e.value) {
		case "aiding":
			c.Opposing = false
		case "opposing":
			c.Opposing = true
		default:
			p.errf(e.line, "sense = %s: want aiding or opposing", e.value)
			return "", false
		}
		return strings.ToLower(e.value), true
	case "axis":
		a, err := parseAxis(e.value)
		if err != nil {
			p.errf(e.line, "axis: %v", err)
			return "", false
		}
		c.Axis = a
		return formatVec(a, units.Dimensionless), true
	case "centre":
		v, err := parseVector(e.value, units.Length)
		if err != nil {
			p.errf(e.line, "centre: %v", err)
			return "", false
		}
		c.Centre = v
		return formatVec(v, units.Length), true
	case "test-plane":
		q, err := units.ParseAs(e.value, units.Length)
		if err != nil {
			p.errf(e.line, "test-plane: %v", err)
			return "", false
		}
		v := q.Value
		if top := upperBounds[units.Length]; !(math.Abs(v) <= top) {
			p.errf(e.line, "test-plane = %s: want a distance along the axis within %s of the coil", e.value, units.Format(top, units.Length))
			return "", false
		}
		c.TestPlane, c.HasTestPlane = v, true
		return units.Format(v, units.Length), true
	}
	if si, ok, mine := p.coreValue(ci, e); mine {
		return si, ok
	}
	return "", false
}

// checkCoil applies the rules that involve several keys of a coil block.
func (p *parser) checkCoil(ci *coilIn) {
	c := &ci.c
	has := func(k string) bool { _, ok := ci.lines[k]; return ok }
	ok := func(k string) bool { _, ok := ci.given[k]; return ok }
	later := func(a, b string) int { return max(ci.lines[a], ci.lines[b]) }
	where := fmt.Sprintf("coil %q", c.Name)

	// required keys
	if !has("turns") {
		p.errf(ci.fence, "%s: missing turns", where)
	}
	if !has("wire") {
		p.errf(ci.fence, "%s: missing wire (AWG n or a bare diameter such as 0.5 mm)", where)
	}
	switch {
	case has("current") && has("voltage"):
		p.errf(later("current", "voltage"), "%s: both current and voltage given; the drive is one of them", where)
	case !has("current") && !has("voltage") && !isReceiver(ci):
		p.errf(ci.fence, "%s: no drive: give current or voltage (or, for a pick-up coil, a frequency)", where)
	}
	p.checkCore(ci)
	if has("voltage") && !has("current") {
		c.Drive = calc.VoltageDrive
	}
	if ok("wire-outer-diameter") && ok("wire") && c.Wire.Outer <= c.Wire.Bare {
		p.errf(ci.lines["wire-outer-diameter"], "wire-outer-diameter %s is not more than the bare diameter %s",
			ci.given["wire-outer-diameter"].value, fmt.Sprintf("%.4g mm", c.Wire.Bare*1e3))
	}
	if c.Wire.Bare > 0 && c.Wire.Outer == 0 {
		c.Wire.Outer = calc.HeavyBuildOuter(c.Wire.Bare)
		c.Wire.OuterEstimated = true
	}
	p.checkHeating(ci)
	if !ci.formOK {
		return // the form-dependent rules would only add noise
	}

	circular := c.Form != calc.Rectangle
	formName := map[calc.Form]string{calc.Loop: "loop", calc.Solenoid: "solenoid", calc.Rectangle: "rectangle", calc.Pair: "pair"}[c.Form]
	if c.Form != calc.Pair {
		for _, k := range []string{"spacing", "sense"} {
			if has(k) {
				p.errf(ci.lines[k], "%s applies only to form = pair (this coil is a %s)", k, formName)
			}
		}
	} else if !has("spacing") {
		p.errf(ci.fence, "%s: a pair needs spacing (distance between the two coil centres)", where)
	}
	if c.Form == calc.Solenoid && !has("length") {
		p.errf(ci.fence, "%s: a solenoid needs length (axial winding length)", where)
	}

	if circular && has("test-plane") {
		p.errf(ci.lines["test-plane"], "test-plane applies only to form = rectangle (this coil is a %s); give probes to have a circular coil's field reported at points", formName)
	}
	if !circular {
		for _, k := range []string{"mean-diameter", "inner-diameter", "outer-diameter"} {
			if has(k) {
				p.errf(ci.lines[k], "%s does not apply to form = rectangle; give width and height", k)
			}
		}
		for _, k := range []string{"width", "height"} {
			if !has(k) {
				p.errf(ci.fence, "%s: a rectangle needs %s", where, k)
			}
		}
		if ok("radial-build") && ok("width") && ok("height") && c.RadialBuild >= min(c.Width, c.Height) {
			p.errf(ci.lines["radial-build"], "radial-build %s leaves no opening inside the %s × %s rectangle",
				ci.given["radial-build"].value, ci.given["width"].value, ci.given["height"].value)
		}
		return
	}

	for _, k := range []string{"width", "height"} {
		if has(k) {
			p.errf(ci.lines[k], "%s applies only to form = rectangle; a %s takes a diameter", k, formName)
		}
	}
	mean, inner, outer, rb := has("mean-diameter"), has("inner-diameter"), has("outer-diameter"), has("radial-build")
	switch {
	case mean && (inner || outer):
		k := "inner-diameter"
		if !inner {
			k = "outer-diameter"
		}
		p.errf(later("mean-diameter", k), "give either mean-diameter or inner-diameter + outer-diameter, not both")
	case mean:
		if ok("mean-diameter") && ok("radial-build") && c.RadialBuild >= c.MeanDiameter {
			p.errf(later("mean-diameter", "radial-build"), "radial-build %s is not less than mean-diameter %s: the inner diameter would be zero or less",
				ci.given["radial-build"].value, ci.given["mean-diameter"].value)
		}
	case inner && outer:
		if !ok("inner-diameter") || !ok("outer-diameter") {
			return
		}
		if c.InnerDiameter >= c.OuterDiameter {
			p.errf(later("inner-diameter", "outer-diameter"), "inner-diameter %s is not less than outer-diameter %s",
				ci.given["inner-diameter"].value, ci.given["outer-diameter"].value)
			return
		}
		c.MeanDiameter = (c.InnerDiameter + c.OuterDiameter) / 2
		build := (c.OuterDiameter - c.InnerDiameter) / 2
		p.derived(ci, "mean-diameter", c.MeanDiameter, "(inner-diameter + outer-diameter)/2")
		if ok("radial-build") {
			if math.Abs(c.RadialBuild-build) > 1e-9*build+1e-12 {
				p.errf(ci.lines["radial-build"], "radial-build %s disagrees with (outer-diameter − inner-diameter)/2 = %s; give two of the three",
					ci.given["radial-build"].value, units.Format(build, units.Length))
			}
		}
		if !rb {
			p.derived(ci, "radial-build", build, "(outer-diameter − inner-diameter)/2")
		}
		c.RadialBuild = build
	case inner || outer:
		k := "inner-diameter"
		if outer {
			k = "outer-diameter"
		}
		if !rb {
			p.errf(ci.lines[k], "%s alone does not fix the winding: add %s or radial-build",
				k, map[bool]string{true: "inner-diameter", false: "outer-diameter"}[outer])
			return
		}
		if !ok(k) || !ok("radial-build") {
			return
		}
		if inner {
			c.MeanDiameter = c.InnerDiameter + c.RadialBuild
			p.derived(ci, "mean-diameter", c.MeanDiameter, "inner-diameter + radial-build")
		} else if c.OuterDiameter > 2*c.RadialBuild {
			c.MeanDiameter = c.OuterDiameter - c.RadialBuild
			p.derived(ci, "mean-diameter", c.MeanDiameter, "outer-diameter − radial-build")
		} else {
			p.errf(later(k, "radial-build"), "radial-build %s leaves no opening inside outer-diameter %s",
				ci.given["radial-build"].value, ci.given[k].value)
		}
	default:
		p.errf(ci.fence, "%s: missing mean-diameter (or inner-diameter + outer-diameter)", where)
	}
}

// derived records a coil dimension the reader computed from others.
func (p *parser) derived(ci *coilIn, key string, v float64, from string) {
	p.defaultEntry(blockCoil, key, units.Format(v, units.Length)+" = "+from, ci.fence, ci.c.Name)
}

func (p *parser) positive(e kv, want units.Dim) (float64, bool) {
	q, err := units.ParseAs(e.value, want)
	if err != nil {
		p.errf(e.line, "%s: %v", e.key, err)
		return 0, false
	}
	if q.Value <= 0 {
		p.errf(e.line, "%s: %s must be greater than zero", e.key, e.value)
		return 0, false
	}
	if top, ok := upperBounds[want]; ok && q.Value > top {
		p.errf(e.line, "%s: %s is more than %s, the most a spec accepts", e.key, e.value, units.Format(top, want))
		return 0, false
	}
	return q.Value, true
}

// upperBounds are the largest values a spec accepts, by dimension: far
// beyond any coil this tool is for, and small enough that no search or
// sum over them overflows.
var upperBounds = map[units.Dim]float64{
	units.Length:    100,  // m
	units.Current:   1e5,  // A
	units.Voltage:   1e6,  // V
	units.Time:      1e7,  // s, about 116 days
	units.Frequency: 1e10, // Hz
}

// maxPosition bounds each coordinate of a coil centre or a probe, m.
const maxPosition = 1000

const maxTurns = 10_000_000

func (p *parser) turns(e kv) (int, bool) {
	num, unit, err := units.Split(e.value)
	if err != nil {
		p.errf(e.line, "turns: want a whole number: %v", err)
		return 0, false
	}
	if unit != "" {
		p.errf(e.line, "turns: want a whole number without a unit, not %q", e.value)
		return 0, false
	}
	v, err := strconv.ParseFloat(strings.Replace(num, "−", "-", 1), 64)
	switch {
	case err != nil || math.IsInf(v, 0):
		p.errf(e.line, "turns: %s is out of range", e.value)
	case v != math.Trunc(v):
		p.errf(e.line, "turns: %s is not a whole number", e.value)
	case v < 1:
		p.errf(e.line, "turns: %s must be at least 1", e.value)
	case v > maxTurns:
		p.errf(e.line, "turns: %s is more than %d", e.value, maxTurns)
	default:
		return int(v), true
	}
	return 0, false
}

// parseWire reads "AWG 24", "AWG 4/0", "AWG 0000", "24 AWG" or a bare
// diameter with a unit.
func parseWire(s string) (gauge int, bare float64, err error) {
	f := strings.Fields(strings.ReplaceAll(s, "#", " "))
	var g string
	switch {
	case len(f) >= 1 && strings.HasPrefix(strings.ToUpper(f[0]), "AWG"):
		g = strings.Join(append([]string{f[0][3:]}, f[1:]...), "")
	case len(f) >= 2 && strings.EqualFold(f[len(f)-1], "AWG"):
		g = strings.Join(f[:len(f)-1], "")
	}
	if g != "" || (len(f) >= 1 && strings.EqualFold(f[0], "AWG")) {
		n, ok := gaugeNumber(g)
		if !ok {
			return 0, 0, fmt.Errorf("%q is not an AWG gauge: want AWG 4/0 … AWG 56 (4/0 may be written 0000)", s)
		}
		if !calc.AWGValid(n) {
			return 0, 0, fmt.Errorf("AWG %s is outside the gauge range AWG 4/0 … AWG 56", g)
		}
		return n, calc.AWGDiameter(n), nil
	}
	q, err := units.ParseAs(s, units.Length)
	if err != nil {
		if _, unit, e := units.Split(s); e == nil && unit == "" {
			return 0, 0, fmt.Errorf("%v; for a gauge write AWG %s", err, strings.TrimSpace(s))
		}
		return 0, 0, err
	}
	if q.Value <= 0 {
		return 0, 0, fmt.Errorf("bare diameter %s must be greater than zero", s)
	}
	return calc.NoGauge, q.Value, nil
}

// gaugeNumber reads an AWG designation: "24", "0", "00", "000", "0000",
// "1/0" … "4/0". The aughts are numbered 0, −1, −2, −3.
func gaugeNumber(g string) (int, bool) {
	switch g {
	case "0", "1/0":
		return 0, true
	case "00", "2/0":
		return -1, true
	case "000", "3/0":
		return -2, true
	case "0000", "4/0":
		return -3, true
	}
	if g == "" || len(g) > 3 || g[0] == '0' {
		return 0, false
	}
	n, err := strconv.Atoi(g)
	if err != nil || n < 0 {
		return 0, false
	}
	return n, true
}

func gaugeName(n int) string {
	if n <= 0 {
		return fmt.Sprintf("AWG %d/0", 1-n)
	}
	return fmt.Sprintf("AWG %d", n)
}

// parseInsulation reads a temperature ("155 degC"), an IEC 60085 letter
// ("F", "class F") or a bare IEC 60085 thermal class number ("155").
// It returns the class temperature in kelvin and a label for the entry.
func parseInsulation(s string) (float64, string, error) {
	t := strings.TrimSpace(s)
	if len(t) > 6 && strings.EqualFold(t[:6], "class ") {
		t = strings.TrimSpace(t[6:])
	}
	if c, ok := insulationClasses[strings.ToUpper(t)]; ok {
		return c + zeroCelsius, " = " + format.InsulationClass(c+zeroCelsius), nil
	}
	_, unit, err := units.Split(t)
	if err != nil {
		return 0, "", fmt.Errorf("%q: want a temperature such as 155 degC, or a class letter Y, A, E, B, F, H, N or R", t)
	}
	if unit == "" {
		v, _ := strconv.ParseFloat(t, 64)
		for _, c := range thermalClasses {
			if v == c {
				return c + zeroCelsius, " = " + format.InsulationClass(c+zeroCelsius), nil
			}
		}
		return 0, "", fmt.Errorf("no unit given: %s (expected a temperature such as 155 degC, a thermal class 90, 105, 120, 130, 155, 180, 200, 220 or 250, or a class letter Y, A, E, B, F, H, N, R)", t)
	}
	q, err := units.ParseAs(t, units.Temperature)
	if err != nil {
		return 0, "", err
	}
	return q.Value, "", nil
}

// parsePercent reads a duty or other fraction written in percent.
func parsePercent(s string) (float64, error) {
	_, unit, err := units.Split(s)
	if err != nil {
		return 0, err
	}
	if unit != "%" {
		if unit == "" {
			return 0, fmt.Errorf("no unit given: %s (expected a percentage such as 50 %%)", strings.TrimSpace(s))
		}
		return 0, fmt.Errorf("%s is not a percentage (write e.g. 50 %%)", strings.TrimSpace(s))
	}
	q, err := units.Parse(s)
	if err != nil {
		return 0, err
	}
	if q.Value <= 0 || q.Value > 1 {
		return 0, fmt.Errorf("%s is outside 0..100 %% (must be above 0 %% and at most 100 %%)", strings.TrimSpace(s))
	}
	return q.Value, nil
}

// parseAxis reads x, y, z (with an optional sign) or a direction vector
// (x, y, z) of plain numbers, and returns a unit vector.
func parseAxis(s string) (calc.Vec, error) {
	switch strings.ToLower(strings.TrimSpace(s)) {
	case "x", "+x":
		return calc.Vec{1, 0, 0}, nil
	case "y", "+y":
		return calc.Vec{0, 1, 0}, nil
	case "z", "+z":
		return calc.Vec{0, 0, 1}, nil
	case "-x":
		return calc.Vec{-1, 0, 0}, nil
	case "-y":
		return calc.Vec{0, -1, 0}, nil
	case "-z":
		return calc.Vec{0, 0, -1}, nil
	}
	if !strings.HasPrefix(strings.TrimSpace(s), "(") {
		return calc.Vec{}, fmt.Errorf("%q: want x, y, z (optionally signed, e.g. -z) or a direction (x, y, z)", s)
	}
	v, err := parseVector(s, units.Dimensionless)
	if err != nil {
		return v, err
	}
	n := math.Sqrt(v[0]*v[0] + v[1]*v[1] + v[2]*v[2])
	if !(n > 0) || math.IsInf(n, 0) {
		return calc.Vec{}, fmt.Errorf("%s has no direction", strings.TrimSpace(s))
	}
	return calc.Vec{v[0] / n, v[1] / n, v[2] / n}, nil
}

// parseVector reads "(x, y, z) unit" or "(x unit, y unit, z unit)". A
// vector of zeros needs no unit.
func parseVector(s string, want units.Dim) (calc.Vec, error) {
	var v calc.Vec
	t := strings.TrimSpace(s)
	open, close := strings.IndexByte(t, '('), strings.LastIndexByte(t, ')')
	if open != 0 || close < 0 {
		return v, fmt.Errorf("bad vector %q: want (x, y, z) followed by a unit, e.g. (0, 0, 120) mm", s)
	}
	unit := strings.TrimSpace(t[close+1:])
	parts := strings.Split(t[1:close], ",")
	if len(parts) != 3 {
		return v, fmt.Errorf("bad vector %q: want three components (x, y, z), found %d", s, len(parts))
	}
	for i, c := range parts {
		c = strings.TrimSpace(c)
		num, cu, err := units.Split(c)
		if err != nil {
			return v, fmt.Errorf("bad vector %q: component %d: %v", s, i+1, err)
		}
		switch {
		case cu != "" && unit != "":
			return v, fmt.Errorf("bad vector %q: give the unit once after the parentheses or on each component, not both", s)
		case cu == "" && unit != "":
			c = num + " " + unit
		}
		q, err := units.Parse(c)
		if err != nil {
			return v, fmt.Errorf("bad vector %q: %v", s, err)
		}
		if cu == "" && unit == "" {
			if want == units.Dimensionless || q.Value == 0 {
				v[i] = q.Value
				continue
			}
			return v, fmt.Errorf("no unit given: %s (expected %s such as %s)", t, article(want.Name()), want.Example())
		}
		if !q.Is(want) {
			return v, fmt.Errorf("%s is %s; want %s", t, article(q.Dim.Name()), units.Describe(want))
		}
		if want == units.Length && !(math.Abs(q.Value) <= maxPosition) {
			return v, fmt.Errorf("%s: component %d is more than %d m from the origin, the most a spec accepts", t, i+1, maxPosition)
		}
		v[i] = q.Value
	}
	return v, nil
}

func article(s string) string {
	if s != "" && strings.ContainsRune("aeiou", rune(s[0])) {
		return "an " + s
	}
	return "a " + s
}

func formatVec(v calc.Vec, d units.Dim) string {
	s := fmt.Sprintf("(%s, %s, %s)", units.FormatNumber(v[0]), units.FormatNumber(v[1]), units.FormatNumber(v[2]))
	if sym := d.Symbol(); sym != "" {
		s += " " + sym
	}
	return s
}

// checkHeating applies the rules among the switching and heating keys of a
// coil block: on-time needs a duty below 100 %; a former is a mass with a
// material or a heat capacity, not both; a driver rating must exceed a
// stated supply voltage.
func (p *parser) checkHeating(ci *coilIn) {
	c := &ci.c
	has := func(k string) bool { _, ok := ci.lines[k]; return ok }
	ok := func(k string) bool { _, ok := ci.given[k]; return ok }
	where := fmt.Sprintf("coil %q", c.Name)
	if ok("on-time") && !(ok("duty") && c.Duty < 1) && !ci.bad["duty"] {
		p.errf(ci.lines["on-time"], "%s: on-time needs a duty below 100 %% (the coil is off for on-time × (1/duty − 1) each cycle)", where)
	}
	switch {
	case has("former-heat-capacity") && (has("former-mass") || has("former-material")):
		k := "former-mass"
		if !has(k) {
			k = "former-material"
		}
		p.errf(max(ci.lines["former-heat-capacity"], ci.lines[k]), "%s: give former-heat-capacity or former-mass + former-material, not both", where)
	case has("former-mass") && !has("former-material"):
		p.errf(ci.lines["former-mass"], "%s: former-mass needs former-material (or give former-heat-capacity instead)", where)
	case has("former-material") && !has("former-mass"):
		p.errf(ci.lines["former-material"], "%s: former-material needs former-mass", where)
	}
	if ok("driver-rating") && ok("voltage") && c.DriverRating <= c.Voltage {
		p.errf(ci.lines["driver-rating"], "%s: driver-rating %s is not above the supply voltage %s", where,
			ci.given["driver-rating"].value, ci.given["voltage"].value)
	}
}

// SetCoilKey sets a numeric coil key on c as a sweep step or a size
// choice does, keeping the dimensions the coil block gave and re-deriving
// the mean diameter where it follows from them: a new inner or outer
// diameter moves the winding with its radial build unchanged; a new radial
// build keeps the bore and grows the winding outward, unless the block
// gives the outer diameter and not the inner one (an envelope), where the
// outside stays and the winding grows inward. A new wire-outer-diameter is
// no longer an estimate.
func SetCoilKey(c *calc.Coil, key string, v float64) {
	switch key {
	case "inner-diameter":
		c.MeanDiameter = v + c.RadialBuild
		if c.OuterDiameter > 0 {
			c.OuterDiameter = v + 2*c.RadialBuild
		}
	case "outer-diameter":
		c.MeanDiameter = v - c.RadialBuild
		if c.InnerDiameter > 0 {
			c.InnerDiameter = v - 2*c.RadialBuild
		}
	case "radial-build":
		if c.OuterDiameter > 0 && !(c.InnerDiameter > 0) {
			c.MeanDiameter = c.OuterDiameter - v
			break
		}
		inner := c.MeanDiameter - c.RadialBuild
		c.MeanDiameter = inner + v
		if c.InnerDiameter > 0 {
			c.InnerDiameter = inner
		}
		if c.OuterDiameter > 0 {
			c.OuterDiameter = inner + 2*v
		}
	case "wire-outer-diameter":
		c.Wire.OuterEstimated = false
	}
	SetCoilValue(c, key, v)
}

// SetCoilValue sets the coil field that a numeric coil key names to v, in
// SI (a count for turns, a fraction for duty), and reports whether the key
// is one of them. It assigns only that field: dimensions that follow from
// others (the mean diameter from inner + outer) are derived by the caller.
// The spec reader and the parameter sweep both set coil values through it.
func SetCoilValue(c *calc.Coil, key string, v float64) bool {
	switch key {
	case "mean-diameter":
		c.MeanDiameter = v
	case "inner-diameter":
		c.InnerDiameter = v
	case "outer-diameter":
		c.OuterDiameter = v
	case "length":
		c.Length = v
	case "radial-build":
		c.RadialBuild = v
	case "width":
		c.Width = v
	case "height":
		c.Height = v
	case "spacing":
		c.Spacing = v
	case "wire-outer-diameter":
		c.Wire.Outer = v
	case "turns":
		c.Turns = int(math.Round(v))
	case "current":
		c.Current = v
	case "voltage":
		c.Voltage = v
	case "duty":
		c.Duty = v
	case "switch-off":
		c.SwitchOff = v
	case "on-time":
		c.OnTime = v
	case "driver-rating":
		c.DriverRating = v
	case "frequency":
		c.Frequency = v
	case "former-mass":
		c.Former.Mass = v
	case "former-heat-capacity":
		c.Former.HeatCapacity = v
	case "winding-conductivity":
		c.WindingConductivity = v
	default:
		return false
	}
	return true
}

// maxPartName is the longest name unmodelled-core takes, in characters:
// the memo's cautions quote it.
const maxPartName = 60

// unmodelledCore reads unmodelled-core: the free-text name of a
// ferromagnetic part in the bore that the memo does not model (a
// plunger). A number is taken as a mistaken core figure.
func (p *parser) unmodelledCore(c *calc.Coil, e kv) (string, bool) {
	v := strings.TrimSpace(e.value)
	if _, err := strconv.ParseFloat(strings.Fields(v)[0], 64); err == nil {
		p.errf(e.line, "unmodelled-core = %s: name the part that sits in the bore unmodelled (e.g. plunger), not a figure; a core to model takes core-permeability, core-length and core-diameter", e.value)
		return "", false
	}
	if n := utf8.RuneCountInString(v); n > maxPartName {
		p.errf(e.line, "unmodelled-core: the part's name is %d characters long; give at most %d (the cautions quote it)", n, maxPartName)
		return "", false
	}
	for _, r := range v {
		if unicode.IsControl(r) || r == utf8.RuneError {
			p.errf(e.line, "unmodelled-core: the part's name holds a control or invalid character %q", r)
			return "", false
		}
	}
	c.UnmodelledCore = v
	return v, true
}
