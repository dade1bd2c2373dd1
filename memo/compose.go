package memo

import (
	"coilmemo/analysis"
	"coilmemo/spec"
	"fmt"
	"math"
	"slices"
	"strings"
	"time"

	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/format"
	"coilmemo/templates"
)

// composer is the memo's writer: sections add blocks to it, and it
// numbers the figures (equations are numbered by derive).
type composer struct {
	j        *analysis.Study
	title    string
	blocks   []doc.Block
	figure   int
	cautions []doc.Callout // worded once: page 1 lists them, the Safety section gives them
	// starts is the index into blocks where each section began.
	starts []int
	// mapped holds, for each field map already drawn, its coil and
	// figure number: a coil whose winding and current repeat an earlier
	// one's shares its map (analysis), and the memo refers back to it.
	mapped map[*analysis.MapData]drawnMap
	// parts are the coils' parts of the section being written, for
	// coilPart to find repeats (memo/twins.go).
	parts []coilPart
}

type drawnMap struct {
	coil   string
	figure int
}

// Section writes one part of the memo from the study its writer holds.
type Section interface {
	// Name identifies the section; its golden text files carry the name.
	Name() string
	write(c *composer)
}

type section struct {
	name string
	fn   func(*composer)
}

func (s section) Name() string      { return s.name }
func (s section) write(c *composer) { s.fn(c) }

// Sections are the memo's sections in their order: identification and
// answers on page 1, then purpose, inputs, assumptions, method and
// results, field, torque, inductance and switching, heating, sweep,
// verification, safety, record. A section with nothing to say for a
// design writes nothing.
var Sections = []Section{
	section{"summary", (*composer).titlePage},
	section{"contents", (*composer).contents},
	section{"changes", (*composer).changes},
	section{"purpose", (*composer).purpose},
	section{"inputs", (*composer).inputs},
	section{"assumptions", (*composer).assumptions},
	section{"selection", (*composer).selection},
	section{"method", (*composer).method},
	section{"field", driven((*composer).field)},   // not for pick-up coils alone (receiver.go)
	section{"torque", driven((*composer).torque)}, // not for pick-up coils alone (receiver.go)
	section{"core", (*composer).core},
	section{"electrical", driven((*composer).electrical)}, // not for pick-up coils alone (receiver.go)
	section{"receiver", (*composer).receiver},
	section{"heating", driven((*composer).heating)}, // not for pick-up coils alone (receiver.go)
	section{"sweep", (*composer).sweep},
	section{"worst-case", (*composer).worstCase},
	section{"verification", (*composer).verification},
	section{"safety", (*composer).safety},
	section{"record", (*composer).record},
}

func (c *composer) add(b ...doc.Block) { c.blocks = append(c.blocks, b...) }

func (c *composer) heading(level int, text string) { c.add(doc.Heading{Level: level, Text: text}) }

func (c *composer) para(text string) { c.add(doc.Text(text)) }

func (c *composer) fig(f doc.Figure) int {
	c.figure++
	f.Number = c.figure
	c.add(f)
	return c.figure
}

// Compose builds the memo's document model of a study, section by section
// in the order of Sections.
func Compose(j *analysis.Study) *doc.Document {
	d, _ := compose(j)
	return d
}

// ComposeSections is the memo's document model and, for each of Sections,
// the blocks it wrote.
func ComposeSections(j *analysis.Study) (*doc.Document, [][]doc.Block) {
	d, c := compose(j)
	parts := make([][]doc.Block, len(c.starts))
	for i, s := range c.starts {
		end := len(c.blocks)
		if i+1 < len(c.starts) {
			end = c.starts[i+1]
		}
		parts[i] = c.blocks[s:end]
	}
	return d, parts
}

func compose(j *analysis.Study) (*doc.Document, *composer) {
	s := j.Spec
	m := s.Memo
	title := m.Title
	if title == "" {
		title = "Coil calculation memo"
	}
	c := &composer{j: j, title: title, cautions: Cautions(j)}
	for _, sec := range Sections {
		c.starts = append(c.starts, len(c.blocks))
		c.parts = nil
		sec.write(c)
	}
	fillContents(c.blocks)
	var names []string
	for _, co := range s.Design.Coils {
		names = append(names, co.Name)
	}
	// An undated spec leaves the date out of the pages (the PDF backend
	// then writes a fixed date into the metadata, for reproducibility).
	var created time.Time
	if j.Dated {
		created = j.Created
	}
	return &doc.Document{
		Meta: doc.Meta{
			Title:    title,
			Subject:  "Coil calculation memo: " + strings.Join(names, ", "),
			Author:   m.Author,
			Keywords: strings.Join(append([]string{"coil", "calculation memo", m.Project, m.Client}, names...), ", "),
			DocID:    m.DocumentID,
			Revision: m.Revision,
			Created:  created,
		},
		Blocks: c.blocks,
	}, c
}

// approvedBy is the approver's name, "not named" on an issued memo that
// names none.
func approvedBy(m spec.Memo) string {
	if m.IsIssued() && m.Approver == "" {
		return "not named"
	}
	return m.Approver
}

// titlePage: identification, headline results, limits compliance.
func (c *composer) titlePage() {
	title := c.title
	m := c.j.Spec.Memo
	field := func(label, v string) [2]string {
		if v == "" {
			v = "—"
		}
		return [2]string{label, v}
	}
	c.add(doc.TitleBlock{Title: title, Fields: [][2]string{
		field("Client", m.Client), field("Project", m.Project),
		field("Document", m.DocumentID), field("Revision", m.Revision),
		field("Date", m.Date), field("Status", m.Status),
		field("Prepared by", m.Author), field("Checked by", m.Checker),
		field("Approved by", approvedBy(m)),
	}})
	c.heading(1, "Results summary")
	c.add(c.verdict())
	if p, ok := c.sizingSummary(); ok {
		c.add(p)
	}
	if !c.receiverOnly() {
		c.add(c.summaryTable())
		if t, ok := c.totalsTable(); ok {
			c.add(t)
		}
	}
	if c.anyReceiver() {
		c.add(c.receiverSummary()) // pick-up coils: receiver.go
	}
	if len(c.j.Limits) > 0 {
		c.add(c.limitsTable())
	}
	if list := c.cautionList(); len(list.Items) > 0 {
		c.add(doc.Paragraph{Spans: []doc.Span{{Text: "Cautions raised by this design", Strong: true},
			{Text: " (details, numbers and remedies in the Safety section):"}}}, list)
	}
	c.add(doc.PageBreak{FirstPageOnly: true}) // a summary that ran over goes on with the contents
}

// cautionList names the warnings and cautions (not the general notes) on
// page 1, most severe first.
func (c *composer) cautionList() doc.List {
	var l doc.List
	for _, sev := range []doc.Severity{doc.Warning, doc.Caution} {
		for _, co := range c.cautions {
			if co.Severity == sev {
				l.Items = append(l.Items, []doc.Block{doc.Paragraph{Spans: []doc.Span{
					{Text: sev.String() + " ", Strong: true}, {Text: co.Title}}}})
			}
		}
	}
	return l
}

// verdict is the one-paragraph answer at the top of page 1.
func (c *composer) verdict() doc.Paragraph {
	r := c.j.Results
	limits := c.j.Limits
	failedLimits, failedChecks := c.j.Failed()
	var s []doc.Span
	bandSaid := false
	switch {
	case len(limits) == 0:
		s = append(s, doc.Span{Text: "The design is not held to stated requirements; the results below are its calculated performance. "})
	default:
		v := requirementsVerdict(len(limits), failedLimits)
		if sf := c.bandShortfalls(); failedLimits == 0 && len(sf) > 0 {
			// a pick-up coil that meets its requirements but not its band:
			// the verdict must not read as a clean pass, so the shortfall
			// joins it (and is not said again below)
			v = strings.TrimSuffix(v, ".") + ", but c" + strings.TrimPrefix(strings.Join(sf, " "), "C")
			bandSaid = true
		}
		s = append(s, doc.Span{Text: v, Strong: true}, doc.Span{Text: " "})
	}
	if w := c.worstVerdict(); w != "" {
		s = append(s, doc.Span{Text: w})
	}
	if failedChecks > 0 {
		s = append(s, doc.Span{Text: format.Count(failedChecks, "verification check", "verification checks") + " failed: see the Verification section before relying on these results.", Strong: true}, doc.Span{Text: " "})
	} else if n := len(c.j.Checks); n > 0 {
		s = append(s, doc.Span{Text: checksVerdict(c.j.Checks)})
	}
	for i, co := range c.j.Spec.Design.Coils {
		if i < len(r.Coils) && i < len(c.j.Coils) {
			if t := underfillText(co, &c.j.Coils[i], c.j.Results.Coils[i].Winding.FillFactor); t != "" {
				s = append(s, doc.Span{Text: t + " "})
			}
		}
	}
	for _, co := range c.j.Spec.Design.Coils {
		if co.UnmodelledCore != "" { // a part in the bore left out of the model
			s = append(s, doc.Span{Text: fmt.Sprintf("Coil %q is calculated without its %s, which sits in its bore in service: its inductance, stored energy, switching times and field below are lower bounds for the assembly.", co.Name, co.UnmodelledCore)}, doc.Span{Text: " "})
		}
	}
	for _, t := range c.nestedTexts() { // nested.go
		s = append(s, doc.Span{Text: t}, doc.Span{Text: " "})
	}
	for _, t := range c.bandShortfalls() { // pick-up coils: receiver.go
		if !bandSaid {
			s = append(s, doc.Span{Text: t, Strong: true}, doc.Span{Text: " "})
		}
	}
	for _, cr := range r.Coils {
		switch {
		case cr.Verdict.AboveMelting:
			s = append(s, doc.Span{Text: fmt.Sprintf("Coil %q has no steady temperature below the melting point of its conductor (%s): the winding would be destroyed first.",
				cr.Name, Eng(Celsius(cr.Verdict.Melting), "°C", 4)), Strong: true}, doc.Span{Text: " "})
		case cr.Verdict.SettledAboveLimit:
			s = append(s, doc.Span{Text: fmt.Sprintf("Coil %q settles at %s, above what its insulation survives.", cr.Name, Eng(Celsius(cr.Temperature), "°C", 3)), Strong: true}, doc.Span{Text: " "})
		case cr.Runaway:
			s = append(s, doc.Span{Text: fmt.Sprintf("Coil %q has no steady temperature: thermal runaway.", cr.Name), Strong: true}, doc.Span{Text: " "})
		}
	}
	if len(c.cautionList().Items) == 0 {
		s = append(s, doc.Span{Text: "The design raises no safety warning; the general cautions are in the Safety section."})
	}
	return doc.Paragraph{Spans: s}
}

// checksVerdict is page 1's sentence on verification checks that all
// agree, in plain grammar for any count. With a core it says what they
// cover: the windings in air and the core's model (what of it), not the
// figures with the core at the operating point, which no check
// recomputes.
func checksVerdict(ks []analysis.Check) string {
	n := len(ks)
	var all string
	switch n {
	case 1:
		all = "The verification check agrees within tolerance"
	case 2:
		all = "Both verification checks agree within tolerance"
	default:
		all = fmt.Sprintf("All %d verification checks agree within tolerance", n)
	}
	core := coreChecks(ks)
	if core == 0 {
		return all + ". "
	}
	var what []string
	for _, part := range []string{"demagnetising factor", "reciprocity"} {
		if slices.ContainsFunc(ks, func(k analysis.Check) bool { return k.Core && strings.Contains(k.Name, part) }) {
			what = append(what, part)
		}
	}
	model := "the core's model (" + strings.Join(what, ", ") + ")"
	var parts []string
	// a pick-up coil's rows of the figures computed from the core's
	// inductance and effective area (analysis.receiverChecks)
	withCore := 0
	for _, k := range ks {
		if !k.Core && strings.Contains(k.Name, "with the core's") {
			withCore++
		}
	}
	if w := n - core - withCore; w > 0 {
		coils := map[string]bool{}
		for _, k := range ks {
			if !k.Core && !strings.Contains(k.Name, "with the core's") {
				coils[k.Coil] = true
			}
		}
		windings := "winding"
		if len(coils) > 1 {
			windings = "windings"
		}
		parts = append(parts, format.Digits(w)+" of the "+windings+" in air")
	}
	if withCore > 0 {
		parts = append(parts, format.Digits(withCore)+" of the pick-up figures computed from the core's inductance and effective area")
	}
	parts = append(parts, format.Digits(core)+" of "+model)
	cover := joinAnd(parts)
	if n == 1 {
		cover = "it is of " + model
	}
	return all + ": " + cover + ". The figures with the core rest on that model; no check recomputes them by an independent method. "
}

// coreChecks counts the checks of a core's model.
func coreChecks(ks []analysis.Check) int {
	n := 0
	for _, k := range ks {
		if k.Core {
			n++
		}
	}
	return n
}

// requirementsVerdict is page 1's sentence on n requirements of which
// failed are not met, in plain grammar for any count.
func requirementsVerdict(n, failed int) string {
	switch {
	case failed == 0 && n == 1:
		return "The stated requirement is met."
	case failed == 0 && n == 2:
		return "Both stated requirements are met."
	case failed == 0:
		return fmt.Sprintf("All %d stated requirements are met.", n)
	case n == 1:
		return "The stated requirement is NOT met."
	case failed == n && n == 2:
		return "Neither stated requirement is met."
	case failed == n:
		return fmt.Sprintf("None of the %d stated requirements is met.", n)
	case failed == 1:
		return fmt.Sprintf("1 of the %d stated requirements is NOT met.", n)
	}
	return fmt.Sprintf("%d of the %d stated requirements are NOT met.", failed, n)
}

// centreLabel names the headline row of |B| at each coil's own centre: a
// cored coil's centre lies in its core (the core is centred on the
// winding), where the figure is the flux density in the core, μ0 (H + M);
// an air coil's is the field at its centre.
func centreLabel(j *analysis.Study, idx []int) string {
	switch cored := coredCount(j, idx); {
	case cored == 0:
		return "Field at own centre |B|"
	case cored == len(idx):
		return "Flux density in the core, at its centre |B|"
	}
	return "Field at own centre |B| (a cored coil: flux density in its core)"
}

// judged is the significant figures of page 1's headline results that
// requirements judge (moment, field, current, power, temperature, mass): those
// of the requirements compliance table beside them, so that a figure a
// requirement just misses does not read as meeting it (60.0 mA·m² beside
// 59.99 mA·m² FAIL).
const judged = 4

// summaryTable is page 1's table of the driven coils (a pick-up coil has
// its own, receiverSummary): a column per driven coil block, the totals of
// all coils below. A cored coil's conductor and core masses are stated
// apart, with their total.
func (c *composer) summaryTable() doc.Table {
	r := c.j.Results
	d := c.j.Spec.Design
	idx := c.drivenCoils() // memo/receiver.go
	head := []string{"Result"}
	for _, i := range idx {
		head = append(head, r.Coils[i].Name)
	}
	row := func(name string, f func(i int, cr calc.CoilResult) string) []doc.Cell {
		cells := []doc.Cell{{Text: name}}
		for _, i := range idx {
			cells = append(cells, doc.Cell{Text: f(i, r.Coils[i])})
		}
		return cells
	}
	rows := [][]doc.Cell{
		row("Magnetic moment |m|", func(_ int, cr calc.CoilResult) string { return Eng(cr.Moment.Norm(), "A·m²", judged) }),
		row(centreLabel(c.j, idx), func(_ int, cr calc.CoilResult) string { return Eng(cr.FieldCentre.Norm(), "T", judged) }),
		row("Current", func(_ int, cr calc.CoilResult) string { return Eng(cr.Current, "A", judged) }),
		row("Voltage", func(i int, cr calc.CoilResult) string {
			// an a.c. drive needs |Z|·I, not the d.c. I·R (below the
			// self-resonance, where the impedance is quoted)
			if cr.AC.Frequency > 0 && !math.IsNaN(cr.AC.Voltage) && !c.j.Coils[i].Kinds.AboveResonance {
				return Eng(cr.AC.Voltage, "V", 3) + " rms at " + Eng(cr.AC.Frequency, "Hz", 3)
			}
			if cr.VoltagePeak > cr.Voltage*(1+1e-9) {
				// a current source must deliver the cycle's peak I·R
				return Eng(cr.Voltage, "V", 3) + " (" + Eng(cr.VoltagePeak, "V", 3) + " at the cycle's peak)"
			}
			return Eng(cr.Voltage, "V", 3)
		}),
		row(powerLabel(r), func(_ int, cr calc.CoilResult) string { return Eng(cr.Power, "W", judged) }),
		row("Resistance at 20 °C / hot", func(_ int, cr calc.CoilResult) string {
			s := Eng(cr.R20, "Ω", 3) + " / " + Eng(cr.RHot, "Ω", 3)
			if cr.AC.Resistance > cr.RHot*1.01 {
				s += " (a.c. " + Eng(cr.AC.Resistance, "Ω", 3) + ")"
			}
			return s
		}),
		row("Winding temperature, hottest point", func(i int, cr calc.CoilResult) string {
			if cr.Runaway && !cr.Verdict.SettledAboveLimit {
				return "runaway"
			}
			if cr.Verdict.AboveMelting {
				return "above melting"
			}
			t := Eng(Celsius(cr.Temperature), "°C", judged)
			if d.Coils[i].OnTime > 0 && cr.Temperature > cr.SteadyHotSpot*(1+1e-12) {
				// the cycle's peak, not the duty-averaged steady state
				t += " (cycle peak; " + Eng(Celsius(cr.SteadyHotSpot), "°C", 3) + " duty-averaged)"
			}
			return t
		}),
		row("Insulation", func(i int, cr calc.CoilResult) string {
			return format.InsulationClass(d.Coils[i].InsulationClass)
		}),
		row("Inductance", func(_ int, cr calc.CoilResult) string { return Eng(cr.Inductance, "H", 3) }),
		row("Wire length / conductor mass", func(i int, cr calc.CoilResult) string {
			return Eng(cr.Length, "m", 3) + " / " + Eng(c.j.Coils[i].Kinds.AirMass, "kg", judged)
		}),
	}
	anyCore := false
	for _, i := range idx {
		anyCore = anyCore || c.j.Coils[i].Kinds.Core != nil
	}
	if anyCore {
		rows = append(rows, row("Core mass / total mass (conductor and core)", func(i int, cr calc.CoilResult) string {
			k := c.j.Coils[i].Kinds.Core
			switch {
			case k == nil:
				return "—"
			case math.IsNaN(k.Mass):
				return "no core density stated"
			}
			return Eng(k.Mass, "kg", judged) + " / " + Eng(cr.Mass, "kg", judged)
		}))
	}
	rows = c.gradientRows(idx, rows, row)
	if len(idx) == 1 && d.Conditions.BackgroundField.Norm() > 0 { // with several coils: totalsTable
		rows = append(rows, []doc.Cell{{Text: "Torque in background field (max / design angle)"}, {Text: Eng(r.TorqueMax, "N·m", 3) + " / " + Eng(r.TorqueDesign, "N·m", 3)}})
	}
	align, widths := perCoilColumns(len(idx), 2.2, 1.5)
	caption := "Headline results at the steady operating point"
	if len(idx) < len(r.Coils) {
		caption += " (driven coils; the pick-up coils in the next table)"
	}
	return doc.Table{Caption: caption, Header: head, Rows: rows, Align: align, Widths: widths}
}

// totalsTable is page 1's results of a design of several coils as a
// whole — the moment and the field at the origin of all coils together,
// the torque in a stated background field — in a table of their own, so
// that no value of the whole sits in one coil's column; ok is false for a
// single coil, whose table holds them.
func (c *composer) totalsTable() (doc.Table, bool) {
	r := c.j.Results
	d := c.j.Spec.Design
	if len(c.drivenCoils()) < 2 {
		return doc.Table{}, false // one coil's results are its own (summaryTable)
	}
	rows := [][]doc.Cell{
		{{Text: "Moment |m| of all coils together"}, {Text: Eng(r.Moment.Norm(), "A·m²", judged), Strong: true}},
		{{Text: "|B| at the origin, all coils energised"}, {Text: Eng(r.FieldCentre.Norm(), "T", judged), Strong: true}},
	}
	if d.Conditions.BackgroundField.Norm() > 0 {
		rows = append(rows, []doc.Cell{{Text: "Torque in the background field (max / design angle)"}, {Text: Eng(r.TorqueMax, "N·m", 3) + " / " + Eng(r.TorqueDesign, "N·m", 3)}})
	}
	return doc.Table{Caption: "Results of the design as a whole", Header: []string{"Result", "Value"}, Rows: rows,
		Align: []doc.Align{doc.Left, doc.Right}, Widths: []float64{3, 1.5}}, true
}

// opposingPair reports whether coil block co is a gradient pair.
func opposingPair(co calc.Coil) bool { return co.Form == calc.Pair && co.Opposing }

// gradientRows puts a gradient pair's rows into page 1's table rows
// (moment first, centre field second, as summaryTable builds them). A
// gradient pair's purpose is its gradient: its moment and centre field
// are zero by design. When every column is such a pair, those two rows
// say nothing and give way to the gradient at the centre, its ±1 %
// linear region and the field at that region's edge on the axis; beside
// other coils the two rows stay and the pair's cells say why they are
// zero. The gradient's symbol is the pairs' axis's when they share one.
func (c *composer) gradientRows(idx []int, rows [][]doc.Cell, row func(string, func(int, calc.CoilResult) string) []doc.Cell) [][]doc.Cell {
	d := c.j.Spec.Design
	var label string
	all := len(idx) > 0
	for _, i := range idx {
		co := d.Coils[i]
		if !opposingPair(co) {
			all = false
			continue
		}
		switch {
		case label == "":
			label = "Axial gradient at centre " + gradientSymbol(co)
		case label != "Axial gradient at centre "+gradientSymbol(co):
			label = "Axial gradient at centre, along each pair's axis"
		}
	}
	if label == "" {
		return rows
	}
	pair := func(f func(k int, cr calc.CoilResult) string) func(int, calc.CoilResult) string {
		return func(k int, cr calc.CoilResult) string {
			if !opposingPair(d.Coils[k]) {
				return "—"
			}
			return f(k, cr)
		}
	}
	add := [][]doc.Cell{
		row(label, pair(func(_ int, cr calc.CoilResult) string { return Eng(cr.Pair.Gradient, "T/m", judged) })),
		row("Gradient within ±1 %: along the axis / radially", pair(func(_ int, cr calc.CoilResult) string {
			pm := func(v float64) string {
				if math.IsNaN(v) {
					return "n/a"
				}
				return "±" + Eng(v, "m", 3)
			}
			return pm(cr.Pair.LinearAxial) + " / " + pm(cr.Pair.LinearRadial)
		})),
		row("Field |B| on the axis at the edge of that region", pair(func(k int, _ calc.CoilResult) string {
			if pc := c.j.Coils[k].Pair; pc != nil {
				return Eng(pc.EdgeField, "T", 3)
			}
			return "n/a"
		})),
	}
	if all {
		return append(add, rows[2:]...)
	}
	zero := func(f func(int, calc.CoilResult) string) func(int, calc.CoilResult) string {
		return func(k int, cr calc.CoilResult) string {
			if opposingPair(d.Coils[k]) {
				return "0 (by design)"
			}
			return f(k, cr)
		}
	}
	moment := row(rows[0][0].Text, zero(func(_ int, cr calc.CoilResult) string { return Eng(cr.Moment.Norm(), "A·m²", 3) }))
	field := row(rows[1][0].Text, zero(func(_ int, cr calc.CoilResult) string { return Eng(cr.FieldCentre.Norm(), "T", 3) }))
	return append(append([][]doc.Cell{moment, field}, add...), rows[2:]...)
}

// powerLabel names the power row: averaged over the duty cycle only where
// some coil has one.
func powerLabel(r calc.Results) string {
	if anyDuty(r) {
		return "Power (averaged over the duty cycle)"
	}
	return "Power"
}

// anyDuty reports whether some coil of r runs on a duty cycle below 100 %.
func anyDuty(r calc.Results) bool {
	return slices.ContainsFunc(r.Coils, func(cr calc.CoilResult) bool { return cr.Duty < 1 })
}

// perCoilColumns lays out a table of a quantity column (relative width
// first, left-aligned) and one right-aligned column of width each per coil.
func perCoilColumns(coils int, first, each float64) ([]doc.Align, []float64) {
	align := []doc.Align{doc.Left}
	widths := []float64{first}
	for range coils {
		align = append(align, doc.Right)
		widths = append(widths, each)
	}
	return align, widths
}

func (c *composer) limitsTable() doc.Table {
	var rows [][]doc.Cell
	wc := c.j.WorstCase
	ratio := false // a margin written as a ratio, "×73"
	for i, l := range c.j.Limits {
		q := spec.LimitQuantities[l.Limit.Quantity]
		unit := displayUnit(q.Unit)
		rel := "≥"
		if l.Limit.Relation == calc.AtMost {
			rel = "≤"
		}
		req, got := l.Limit.Required, l.Computed
		nominal := got
		if wc != nil { // the margin at the worst corner
			got = wc.Limits[i].Worst
		}
		if unit == "°C" {
			req, got, nominal = Celsius(req), Celsius(got), Celsius(nominal)
		}
		margin := "n/a"
		switch {
		case math.IsNaN(got):
		case unit == "°C":
			// A temperature margin is a difference, not a ratio.
			mg := got - req
			if l.Limit.Relation == calc.AtMost {
				mg = -mg
			}
			margin = format.Margin(mg, "K")
		case req != 0:
			mg := (got - req) / math.Abs(req)
			if l.Limit.Relation == calc.AtMost {
				mg = -mg
			}
			margin = format.RelMargin(mg)
			ratio = ratio || mg >= format.RatioMargin
		}
		st := doc.Pass
		if !l.Pass {
			st = doc.Fail
		}
		if wc != nil {
			rows = append(rows, []doc.Cell{
				{Text: limitName(l) + ": " + testedOn(c.j, l, q)}, {Text: rel + " " + Eng(req, unit, 3)},
				{Text: Eng(nominal, unit, 4)}, {Text: Eng(got, unit, 4)}, {Text: cornerCode(wc, wc.Limits[i].Corner)},
				{Text: margin}, {Text: st.String(), Status: st, Strong: true}})
			continue
		}
		rows = append(rows, []doc.Cell{
			{Text: limitName(l) + ": " + testedOn(c.j, l, q)},
			{Text: rel + " " + Eng(req, unit, 3)},
			{Text: Eng(got, unit, 4)},
			{Text: margin},
			{Text: st.String(), Status: st, Strong: true},
		})
	}
	note, room := "", "positive means met with room to spare"
	if ratio {
		note, room = "; "+format.RatioMarginNote, "positive where met"
	}
	if wc != nil {
		return doc.Table{Caption: "Requirements compliance over the tolerances (worst: the corner closest to failing, signs as in the Worst case section; margin at that corner" + note + ")",
			Header: []string{"Requirement", "Required", "Nominal", "Worst", "Corner", "Margin", "Status"},
			Rows:   rows, Widths: []float64{2.3, 1.3, 1.25, 1.25, 0.85, 0.85, 0.75},
			Align: []doc.Align{doc.Left, doc.Right, doc.Right, doc.Right, doc.Center, doc.Right, doc.Center}}
	}
	return doc.Table{Caption: "Requirements compliance (margin: " + room + note + ")",
		Header: []string{"Requirement", "Required", "Computed", "Margin", "Status"},
		Rows:   rows, Widths: []float64{3.2, 1.4, 1.4, 1, 0.9},
		Align: []doc.Align{doc.Left, doc.Right, doc.Right, doc.Right, doc.Center}}
}

// limitName writes a limit's quantity as the spec wrote it.
func limitName(l analysis.LimitResult) string {
	var args []string
	if l.Limit.Subject != "" {
		args = append(args, l.Limit.Subject)
	}
	if l.Limit.Quantity == "uniform-radius" {
		args = append(args, Sig(100*l.Limit.Tolerance, 2)+" %")
	}
	if len(args) == 0 {
		return l.Limit.Quantity
	}
	return l.Limit.Quantity + "(" + strings.Join(args, ", ") + ")"
}

// testedOn says what a limit was judged on: the design as a whole, one
// coil block alone, or the field of all coils at a probe.
func testedOn(st *analysis.Study, l analysis.LimitResult, q spec.LimitQuantity) string {
	switch l.On {
	case analysis.OnCoil:
		co := st.Spec.Design.Coils[l.Coil]
		what := map[string]string{
			"moment": "magnetic moment", "field-center": "|B| at its own centre", "field": "|B| at its own centre",
			"gradient": "magnitude of the axial gradient |∂Bz/∂z| at its centre", "uniform-radius": fmt.Sprintf("radius within ±%s %% of its centre field", Sig(100*l.Limit.Tolerance, 2)),
			"power": "power, averaged over the duty cycle", "power-on": "power while energised", "temperature": "hottest winding temperature",
			"surface-temperature": "hottest surface temperature", "current": "current", "voltage": "voltage", "resistance": "hot resistance",
			"mass": "conductor mass", "wire-length": "wire length", "current-density": "current density", "inductance": "self-inductance",
			"time-constant": "time constant L/R", "switch-off-voltage": "voltage across the switch at switch-off, unsuppressed",
			"torque": "largest torque of its moment in the background field", "core-flux-density": "peak flux density in its core",
			"sensitivity": "sensitivity at its frequency", "band-noise": "noise-equivalent field, rms over its band",
			"self-resonance": "self-resonant frequency", "resistance-ac": "a.c. resistance at its frequency",
		}[l.Limit.Quantity]
		if l.Limit.Quantity == "power" && st.Results.Coils[l.Coil].Duty >= 1 {
			what = "power" // energised continuously: no duty cycle to average over
		}
		return fmt.Sprintf("%s of coil %q alone", what, co.Name)
	case analysis.OnProbe:
		return fmt.Sprintf("|B| of all coils at probe %q", st.Spec.Design.Probes[l.Probe].Name)
	}
	if l.Limit.Quantity == "moment" && len(st.Spec.Design.Coils) > 1 {
		return "magnitude of the vector sum of all coils' moments, all energised"
	}
	if l.Limit.Quantity == "power" && !anyDuty(st.Results) {
		return "total electrical power" // every coil energised continuously
	}
	return q.Description
}

// displayUnit maps a LimitQuantities unit to the unit Eng prints.
func displayUnit(u string) string { return format.Unit(u) }

func (c *composer) purpose() {
	c.heading(1, "Purpose and description")
	narrative := c.j.Spec.Narrative
	// Headings alone (a spec whose only prose is its title) describe
	// nothing: the memo says so rather than leave them on their own.
	prose := false
	for _, b := range narrative {
		if _, ok := b.(doc.Heading); !ok {
			prose = true
		}
	}
	if !prose {
		var coils []string
		for _, co := range c.j.Spec.Design.Coils {
			coils = append(coils, fmt.Sprintf("coil %q (%s, %s, %s)", co.Name, analysis.FormName(co), format.Count(co.Turns, "turn", "turns"), wireName(co.Wire)))
		}
		c.para(templates.Text("purpose-default", map[string]string{"Coils": joinAnd(coils)}))
		return
	}
	for i, b := range narrative {
		// The spec's own headings sit below the memo's section heading.
		if h, ok := b.(doc.Heading); ok {
			h.Level = min(h.Level+1, 3)
			b = h
		}
		if kind, ok := c.j.Spec.LeadIns[i]; ok {
			b = leadInPointer(b, kind)
		}
		c.add(b)
	}
}

// leadInPointer is narrative paragraph b, which a parameter block of kind
// followed in the spec, with a pointer to where the memo gives that
// block when b introduces it (ends "as follows." or "below.", or in a
// colon): the memo reproduces the prose, not the block.
func leadInPointer(b doc.Block, kind string) doc.Block {
	p, ok := b.(doc.Paragraph)
	if !ok || len(p.Spans) == 0 {
		return b
	}
	text := strings.TrimSpace(spanText(p.Spans))
	if !strings.HasSuffix(text, ":") && !strings.HasSuffix(text, "follows.") && !strings.HasSuffix(text, "below.") {
		return b
	}
	spans := slices.Clone(p.Spans)
	spans = append(spans, doc.Span{Text: fmt.Sprintf(" (The spec's %s block is given with every input in the Inputs section.)", kind)})
	return doc.Paragraph{Spans: spans}
}

// drivenOnlyDefaults are the keys whose defaults serve only a driven
// (heated, torque-making) coil: the insulation class and duty of a coil,
// the cooling of the design and the angle its torque is reported at.
var drivenOnlyDefaults = map[string]map[string]bool{
	"coil":       {"insulation-class": true, "duty": true},
	"conditions": {"cooling": true, "emissivity": true, "orientation": true, "design-angle": true},
}

// drivenOnlyDefault says whether default entry e serves only driven coils
// where none it concerns is driven: a pick-up coil's insulation class and
// duty, and the cooling of a design of pick-up coils only.
func (c *composer) drivenOnlyDefault(e spec.Entry) bool {
	if !drivenOnlyDefaults[e.Block][e.Key] {
		return false
	}
	if e.Block == "conditions" {
		return c.receiverOnly()
	}
	for _, co := range c.j.Spec.Design.Coils {
		if co.Name == e.Coil {
			return analysis.IsReceiver(co)
		}
	}
	return false
}

func (c *composer) inputs() {
	c.heading(1, "Inputs")
	c.para(templates.Text("inputs", map[string]string{"File": c.j.Name})) // the base name: the bytes do not depend on the path typed
	var rows [][]doc.Cell
	for _, e := range c.j.Spec.Entries {
		if e.Default && c.drivenOnlyDefault(e) {
			continue
		}
		raw, line, si := e.Raw, fmt.Sprint(e.Line), format.SIText(e.SI)
		if e.Default {
			// a default or a value derived from others: no digits of the
			// author's to keep, so engineering units to three figures,
			// as the memo writes the value where it uses it (the heavy-build
			// estimate of 237 µm in the Assumptions)
			raw, line, si = "(default)", "", format.SITextSig(e.SI, 3)
		}
		rows = append(rows, []doc.Cell{
			{Text: e.Block}, {Text: e.Key}, {Text: raw}, {Text: si}, {Text: line},
		})
	}
	c.add(doc.Table{Caption: "Spec parameters as written and in SI units",
		Header: []string{"Block", "Key", "As written", "In SI units", "Line"},
		Rows:   rows, Widths: []float64{1, 1.5, 2, 2.2, 0.5},
		Align: []doc.Align{doc.Left, doc.Left, doc.Left, doc.Left, doc.Right}})
}

// coredCount is how many of the coils idx have a core.
func coredCount(j *analysis.Study, idx []int) int {
	n := 0
	for _, i := range idx {
		if j.Coils[i].Kinds.Core != nil {
			n++
		}
	}
	return n
}
