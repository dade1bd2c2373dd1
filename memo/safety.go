package memo

import (
	"fmt"
	"math"
	"slices"
	"sort"
	"strings"

	"coilmemo/analysis"
	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/format"
	"coilmemo/templates"
)

// Cautions words the safety findings of the study: one caution per hazard
// naming the coils it applies to (mergeCautions), most severe first, the
// field's reach among them, always closing with the general cautions.
func Cautions(j *analysis.Study) []doc.Callout {
	d := j.Spec.Design
	r := j.Results
	var out []doc.Callout
	var rodEnds []analysis.Finding // worded in the implant caution where there is one
	for _, f := range j.Safety.Findings {
		co, cr := d.Coils[f.Coil], r.Coils[f.Coil]
		name := fmt.Sprintf("coil %q", co.Name)
		switch f.Kind {
		case analysis.Runaway:
			out = append(out, doc.Callout{Severity: doc.Warning, Title: "Thermal runaway, " + name,
				Spans: []doc.Span{{Text: runawayText(co, cr)}}})
		case analysis.ClassExceeded:
			out = append(out, doc.Callout{Severity: doc.Warning, Title: "Insulation class exceeded, " + name,
				Spans: []doc.Span{{Text: templates.Text("caution-class", map[string]string{
					"Temperature": hotText(cr, f.Value), "Class": format.InsulationClass(co.InsulationClass),
					"Time": classTimeText(cr)})}}})
		case analysis.ClassIfLeftOn:
			out = append(out, doc.Callout{Severity: severity(f.Severity), Title: "Insulation class if left energised, " + name,
				Spans: []doc.Span{{Text: leftOnText(co, cr, j.Coils[f.Coil].Heat.Continuous)}}})
		case analysis.HotSurfaceFound:
			out = append(out, doc.Callout{Severity: doc.Caution, Title: "Hot surface, " + name,
				Spans: []doc.Span{{Text: templates.Text(hotTemplate(j), map[string]string{"Temperature": hotSurfaceWords(j, f), "Where": handlingWhere(j, f)})}}})
		case analysis.HotInService:
			out = append(out, doc.Callout{Severity: doc.Note, Title: "Hot surface in service only, " + name,
				Spans: []doc.Span{{Text: hotInServiceText(j, f)}}})
		case analysis.HighDensity:
			out = append(out, doc.Callout{Severity: doc.Note, Title: "Current density above common practice, " + name,
				Spans: []doc.Span{{Text: templates.Text("caution-density", map[string]string{"Density": Eng(f.Value, "A/m²", 3), "Covered": densityCover(j.Cooling),
					"Temperature": hotText(cr, cr.Temperature)})}}})
		case analysis.HazardousVoltage:
			out = append(out, doc.Callout{Severity: doc.Warning, Title: "Hazardous voltage, " + name,
				Spans: []doc.Span{{Text: templates.Text("caution-voltage", map[string]string{"What": voltageWhat(co), "Voltage": Eng(f.Value, "V", 3)})}}})
		case analysis.SwitchOffVoltage:
			out = append(out, switchOffCaution(f, co, cr, j.Coils[f.Coil].SwitchOff, fittedOverOf(j, f.Coil), name))
		case analysis.RodNearField:
			rodEnds = append(rodEnds, f)
		default:
			out = append(out, kindCautions(j, f)...) // memo/core.go
		}
	}
	if ir := j.Safety.Implant; ir.Searched {
		if where, beyond := implantWhere(j); len(where) > 0 {
			// the field at a rod's ends is the same hazard: its figure
			// joins the region's description
			for _, f := range rodEnds {
				where = append(where, rodEndWords(j, f))
			}
			rodEnds = nil
			out = append(out, doc.Callout{Severity: doc.Warning, Title: "Field above 0.5 mT: implanted medical devices",
				Spans: []doc.Span{{Text: templates.Text("caution-implant", map[string]string{"Where": implantSentences(where), "Beyond": beyond, "Mark": implantMark(j.Cooling, severalCoils(j)), "Energised": energisedWords(j), "Unmodelled": unmodelledField(j), "Alternating": alternatingNote(j)})}}})
		} else {
			out = append(out, doc.Callout{Severity: doc.Note, Title: "Field near the winding",
				Spans: []doc.Span{{Text: templates.Text("caution-implant-none", nil)}}})
		}
	}
	for _, f := range rodEnds { // no implant caution to carry them
		out = append(out, kindCautions(j, f)...)
	}
	out = append(out, exposureCautions(j)...) // memo/exposure.go
	out = mergeCautions(out)
	coils := map[string]string{"Coil": "coil", "Is": "is", "Its": "its"}
	if severalCoils(j) {
		coils = map[string]string{"Coil": "coils", "Is": "are", "Its": "their"}
	}
	general := templates.Paragraphs("caution-general", coils)
	for i, p := range general {
		t := "Limits of this memo"
		if i > 0 {
			t = "Codes and licensed practice"
		}
		out = append(out, doc.Callout{Severity: doc.Note, Title: t, Spans: []doc.Span{{Text: p}}})
	}
	return out
}

// densityCover is the density caution's word on a covered coil
// (enclosure = covered): the still-air rule is for a coil the air can
// rise past; "" for any other.
func densityCover(cool calc.Cooling) string {
	if cool.Covered {
		return " This coil lies under or behind a surface, where the air cannot rise past it: it sheds less heat than the coils the rule is drawn from."
	}
	return ""
}

// unmodelledField is the implant caution's word on parts in the coils'
// bores that the memo leaves out (unmodelled-core): they gather the field,
// so the flux densities and the distances of the region are lower bounds
// for the assembly with them. "" when no coil names one.
func unmodelledField(j *analysis.Study) string {
	var parts []string
	for _, co := range j.Spec.Design.Coils {
		if co.UnmodelledCore != "" {
			parts = append(parts, fmt.Sprintf("the %s in the bore of coil %q", co.UnmodelledCore, co.Name))
		}
	}
	if len(parts) == 0 {
		return ""
	}
	return fmt.Sprintf(" The field is computed without %s, which is not modelled (unmodelled-core): a ferromagnetic part gathers the field, so the flux densities and distances above are lower bounds for the assembly with it.", joinAnd(parts))
}

// implantMark is the implant caution's instruction to mark the region,
// worded for where the design says the coil is energised: under a
// surface people touch (enclosure = covered), in vacuum (where no one is
// near it, so in integration and test), or in air where it is tested and
// installed.
func implantMark(cool calc.Cooling, several bool) string {
	switch {
	case cool.Covered && several:
		return "Mark the region on the surface that covers the coils and around it."
	case cool.Covered:
		return "Mark the region on the surface that covers the coil and around it."
	case cool.Vacuum && several:
		return "The coils work in vacuum, away from people; mark the region wherever they are energised with people near them, in integration and test."
	case cool.Vacuum:
		return "The coil works in vacuum, away from people; mark the region wherever it is energised with people near it, in integration and test."
	case several:
		return "Mark the region wherever the coils are energised with people near them, in test and where they are installed."
	}
	return "Mark the region wherever the coil is energised with people near it, in test and where it is installed."
}

// severalCoils says whether the design drives more than one coil (a pair
// counts as two): the safety wording then speaks of the coils.
func severalCoils(j *analysis.Study) bool {
	n := 0
	for i, co := range j.Spec.Design.Coils {
		if analysis.IsReceiver(co) {
			continue
		}
		n++
		if i < len(j.Coils) && j.Coils[i].Series > 1 {
			n++
		}
	}
	return n > 1
}

// energisedWords is when the implant caution's region holds: while the
// coil, or any of the coils, is energised.
func energisedWords(j *analysis.Study) string {
	if severalCoils(j) {
		return "any of the coils is"
	}
	return "the coil is"
}

// rodEndWords words a rod's near-field finding as part of the implant
// caution's region: the flux density on the axis beyond the core's end.
func rodEndWords(j *analysis.Study, f analysis.Finding) string {
	co := j.Spec.Design.Coils[f.Coil]
	return fmt.Sprintf("on the axis %s beyond each end face of the core of coil %q, where |B| = %s (the core gathers the field to its ends)",
		Eng(analysis.RodEndPoint*co.Core.Diameter, "m", 2), co.Name, Eng(f.Value, "T", 3))
}

// hotTemplate is the hot-surface caution's wording: of the winding's own
// surface, or, for coils under or behind a surface people touch
// (enclosure = covered), of that surface over the winding.
func hotTemplate(j *analysis.Study) string {
	if j.Cooling.Covered {
		return "caution-hot-covered"
	}
	return "caution-hot"
}

// hotSurfaceWords words the hottest surface of a hot-surface finding
// where people handle the coil (analysis.Handling): the temperature, over
// the on/off cycle where that gives it, and at the corner of the
// tolerances where one does, with the nominal figure.
func hotSurfaceWords(j *analysis.Study, f analysis.Finding) string {
	s := Eng(Celsius(f.Value), "°C", 3)
	if f.Cycle {
		s += " at the peak of its on/off cycle"
	}
	if wc := j.WorstCase; f.AtCorner && wc != nil {
		s += " at " + handlingCorner(j, f.Corner) + ", against " + Eng(Celsius(f.Nominal), "°C", 3) + " at nominal"
	}
	if f.Cycle && f.Coil < len(j.Coils) {
		// the duty cycle's peak is not the worst touch: a stuck driver
		// leaves the coil on (the insulation caution's fault)
		if st := j.Coils[f.Coil].Heat.Continuous; st.Settled && st.Surface > f.Value {
			s += "; energised continuously (a stuck driver) it would settle at " + Eng(Celsius(st.Surface), "°C", 3) + " where it works"
		}
	}
	return s
}

// handlingCorner names corner h of the tolerances as the hot surface
// is judged at it: by its code and values, or, with the ambient held at
// the handling ambient, by the values of the other tolerances.
func handlingCorner(j *analysis.Study, h int) string {
	wc := j.WorstCase
	if j.Safety.Handling.AmbientHeld {
		return fmt.Sprintf("the corner of the other tolerances (%s)", wc.CornerNameWithout(h, "ambient"))
	}
	return fmt.Sprintf("corner %s of the tolerances (%s)", cornerCode(wc, h), wc.CornerName(h))
}

// handlingWhere says at which ambient the hot surface was judged
// (analysis.Handling) and, where the coil runs hotter where it works, that
// figure, which the insulation meets.
func handlingWhere(j *analysis.Study, f analysis.Finding) string {
	hd := j.Safety.Handling
	amb := Eng(Celsius(hd.Ambient), "°C", 3)
	var s string
	switch {
	case hd.Service && j.WorstCase != nil && hasAmbientTolerance(j):
		s = "It is judged where the coil works, as people touch it there: at its ambient of " + amb + " and over the tolerances' ambient range."
	case hd.Service:
		s = "It is judged where the coil works, as people touch it there: at its ambient of " + amb + "."
	case hd.Stated:
		s = "It is judged where people handle the coil, at the handling ambient of " + amb + " (handling-ambient)" + heldWords(hd) + "."
	default:
		s = "It is judged where people handle the coil, in a room at " + amb + heldWords(hd) + ": the coil works in vacuum, where no one touches it. The cooling is kept as in vacuum, radiation alone, which in air, with convection besides, only overstates the surface."
	}
	if !hd.Service && f.Service > f.Value && !math.IsNaN(f.Service) {
		s += " Where it works the surface reaches " + serviceSurfaceWords(j, f) + "; no one touches it there."
	}
	return " " + s
}

// heldWords says the ambient tolerance is not applied where the coil is
// handled; "" without one.
func heldWords(hd analysis.Handling) string {
	if hd.AmbientHeld {
		return ", the ambient tolerance, which describes where the coil works, not applied"
	}
	return ""
}

// serviceSurfaceWords words the hottest surface where the coil works
// (Finding.Service): the temperature, at the corner of the tolerances
// where one gives it.
func serviceSurfaceWords(j *analysis.Study, f analysis.Finding) string {
	s := Eng(Celsius(f.Service), "°C", 3)
	if wc := j.WorstCase; f.ServiceCorner >= 0 && wc != nil {
		s += fmt.Sprintf(" at corner %s of the tolerances (%s)", cornerCode(wc, f.ServiceCorner), wc.CornerName(f.ServiceCorner))
	} else {
		s += " at its ambient of " + Eng(Celsius(j.Spec.Design.Conditions.Ambient), "°C", 3)
	}
	return s
}

// hasAmbientTolerance says the tolerances have an ambient line.
func hasAmbientTolerance(j *analysis.Study) bool {
	if j.WorstCase == nil || j.WorstCase.Tolerances == nil {
		return false
	}
	for _, t := range j.WorstCase.Tolerances.Items {
		if t.Key == "ambient" {
			return true
		}
	}
	return false
}

// hotInServiceText is the note of a coil whose surface passes the burn
// level only where it works, not where people handle it.
func hotInServiceText(j *analysis.Study, f analysis.Finding) string {
	hd := j.Safety.Handling
	where := "in a room at " + Eng(Celsius(hd.Ambient), "°C", 3) + " (it works in vacuum, where no one touches it; the cooling kept as in vacuum, which only overstates the surface)"
	if hd.Stated {
		where = "at the handling ambient of " + Eng(Celsius(hd.Ambient), "°C", 3) + " (handling-ambient)"
	}
	return fmt.Sprintf("Where the coil works its winding surface reaches %s, above the 60 °C at which brief contact can burn (common practice for touchable surfaces of equipment); no one touches it there. Where people handle it, %s, the surface reaches at most %s, below that level. After a run in its working environment, let it cool before handling it.",
		serviceSurfaceWords(j, f), where, hotSurfaceWords(j, f))
}

// implantSentences words the places implantWhere lists, one sentence
// each after the one that holds for every coil, so that no sentence of a
// caution runs on.
func implantSentences(where []string) string {
	s := "The flux density exceeds 0.5 mT everywhere close to the conductors."
	for _, w := range where {
		s += " It also exceeds 0.5 mT " + w + "."
	}
	return s
}

// implantWhere words where the field reaches 0.5 mT (analysis.ImplantReach):
// at the origin; along the axis, as far from the origin as it reaches and
// where that point lies against the nearest winding; outside the windings,
// as far from their outer surfaces as it reaches; at probes. beyond is the
// sentence that bounds the region by that distance ("" when the level is
// reached at no winding).
func implantWhere(j *analysis.Study) (where []string, beyond string) {
	d, r, ir := j.Spec.Design, j.Results, j.Safety.Implant
	name := func(i int) string { return fmt.Sprintf("coil %q", d.Coils[i].Name) }
	cored := func(i int) bool { return i >= 0 && i < len(j.Coils) && j.Coils[i].Kinds.Core != nil }
	if ir.Origin >= analysis.ImplantField && !ir.OriginInside {
		where = append(where, "at the origin, where |B| = "+Eng(ir.Origin, "T", 3))
	}
	along, _ := reachWords(ir.Axis, len(d.Coils))
	if ir.Axial > 0 {
		side, rest := axialSide(ir)
		s := along + " as far as " + axialLength(ir.Axial) + " from the origin" + side + rest
		// the note on the far end: "there" when one distance is given
		there, in := "there ", ""
		if rest != "" {
			there, in = "the farther point ", "the farther point "
		}
		switch k := ir.AxialCoil; {
		case k < 0:
		case ir.AxialBore:
			s += " (" + in + "inside the bore of " + name(k) + ")"
		case ir.AxialClear > 0 && ir.AxialEnd:
			beyond := "within 1 mm of"
			if l, under := reachLength(ir.AxialClear); !under {
				beyond = l + " beyond"
			}
			s += " (" + there + beyond + " the end of the " + windingWord(cored(k)) + " of " + name(k) + ", along its axis)"
		case ir.AxialClear > 0:
			s += " (" + there + strings.TrimPrefix(surfaceDistance(ir.AxialClear), "as far as ") + " the outer surface of the " + windingWord(cored(k)) + " of " + name(k) + ")"
		default:
			s += " (" + in + "within the " + windingWord(cored(k)) + " of " + name(k) + ")"
		}
		where = append(where, s)
	}
	type near struct {
		coil           int
		surface, words string
	}
	var nears []near
	anyCored := false
	for i, w := range ir.Windings {
		if w.Surface >= analysis.ImplantField || w.Distance > 0 {
			anyCored = anyCored || cored(i)
			nears = append(nears, near{i, Eng(w.Surface, "T", 3), surfaceDistance(w.Distance)})
		}
	}
	switch {
	case len(nears) == 1:
		n := nears[0]
		what, its := "the winding of "+name(n.coil), "its outer surface"
		if cored(n.coil) {
			what, its = "the winding and core of "+name(n.coil), "their outer surfaces (the rod's end faces included)"
		}
		where = append(where, fmt.Sprintf("outside %s %s %s, where |B| reaches up to %s", what, n.words, its, n.surface))
	case len(nears) > 1:
		var far, at []string
		for _, n := range nears {
			v, under := reachLength(ir.Windings[n.coil].Distance)
			if under {
				v = "less than 1 mm"
			}
			far = append(far, fmt.Sprintf("%s (%q)", v, d.Coils[n.coil].Name))
			at = append(at, n.surface)
		}
		what := "the windings"
		if anyCored {
			what = "the windings and cores"
		}
		where = append(where, fmt.Sprintf("outside %s as far as %s from their outer surfaces, where |B| at the surface reaches up to %s", what, joinAnd(far), joinAnd(at)))
	}
	if ir.Nearest >= 0 && ir.Distance > 0 {
		what := "every winding"
		if anyCored {
			what = "every winding and core"
		}
		far, _ := reachLength(ir.Distance)
		rects := slices.ContainsFunc(d.Coils, func(co calc.Coil) bool { return co.Form == calc.Rectangle })
		planes := "in two planes through its axis"
		switch {
		case rects && len(d.Coils) == 1:
			planes = "in five planes: two through its axis along its sides, two through its axis and its diagonals, and its own plane"
		case rects:
			planes += " (five for a rectangle: also through its diagonals, and its own plane)"
		}
		if ir.Sphere {
			planes += ", and along 162 directions spread over the sphere"
			if rects {
				planes += " from it and from each corner of a rectangle"
			}
		}
		turned := ""
		switch {
		case len(d.Coils) > 1:
			turned = " Where the coils' fields add, the lines were also turned off those planes."
		case rects:
			turned = " Toward the corners, the lines were also turned off those planes."
		}
		beyond = fmt.Sprintf(" Farther than %s from the outer surface of %s, its bore counted as part of it, the flux density stays below 0.5 mT. Within a bore it may exceed 0.5 mT anywhere. The search counted the field of all coils. It ran every 10° outward from the centre of each winding %s.%s It also ran along the axis from points round the ends of the conductors.", far, what, planes, turned)
	}
	var probes []string
	for n, k := range ir.Probes {
		b := r.Probes[k].B.Norm()
		if n < len(ir.ProbeField) {
			b = ir.ProbeField[n]
		}
		probes = append(probes, fmt.Sprintf("%q (%s)", r.Probes[k].Name, Eng(b, "T", 3)))
	}
	switch len(probes) {
	case 0:
	case 1:
		where = append(where, "at probe "+probes[0])
	default:
		where = append(where, "at probes "+joinAnd(probes))
	}
	return where, beyond
}

// surfaceDistance words a distance from a winding's outer surface: "as far
// as 24 mm from", or "only within 1 mm of" below a millimetre, where a
// figure in µm reads as false precision.
func surfaceDistance(v float64) string {
	l, under := reachLength(v)
	if under {
		return "only within 1 mm of"
	}
	return "as far as " + l + " from"
}

// reachLength is a reach from a winding's surface to three figures (two
// below 10 mm), rounded up — a keep-out distance rounded down would claim
// a field below the level where it is not —, or "1 mm" (under set) below a millimetre,
// where a figure in µm reads as false precision; every sentence of the
// caution words it so.
func reachLength(v float64) (s string, under bool) {
	if v < 1e-3 {
		return "1 mm", true
	}
	figs := 3 // to a tenth of a millimetre or finer, which a tape can set out
	if v < 0.01 {
		figs = 2
	}
	return Eng(roundUp(v, figs), "m", figs), false
}

// axialLength is the axial reach from the origin, to three figures
// rounded up as every reach of the caution is, so that the reach beyond a
// winding's end (reachLength) and the end's distance add up to it.
func axialLength(v float64) string { return Eng(roundUp(v, 3), "m", 3) }

// roundUp is v > 0 rounded up to figs significant figures.
func roundUp(v float64, figs int) float64 {
	if !(v > 0) || math.IsInf(v, 0) {
		return v
	}
	step := math.Pow(10, math.Floor(math.Log10(v))-float64(figs-1))
	return math.Ceil(v/step*(1-1e-12)) * step
}

// windingWord names what a coil's outer surface bounds.
func windingWord(cored bool) string {
	if cored {
		return "winding and core"
	}
	return "winding"
}

// severity is the callout severity of a finding's.
func severity(s analysis.Severity) doc.Severity {
	switch s {
	case analysis.Warning:
		return doc.Warning
	case analysis.Caution:
		return doc.Caution
	}
	return doc.Note
}

// mergeCautions gives one caution per hazard: the cautions of several
// coils with the same title before ", coil …" and the same severity become
// one whose title lists the coils. Where their words are the same they are
// given once; where they differ, the sentences that differ are given coil
// by coil ("Coil "a": …"), in the order of the text, and the sentences
// common to all of them (the consequence and the remedy) once after them.
// The result is ordered most severe first, hazards in the order they were
// found within a severity, so that page 1 lists them as the Safety section
// gives them.
func mergeCautions(in []doc.Callout) []doc.Callout {
	type group struct {
		c     doc.Callout
		base  string
		names []string
		texts []string
	}
	var groups []*group
	for _, c := range in {
		base, name, ok := strings.Cut(c.Title, ", coil ")
		if !ok {
			groups = append(groups, &group{c: c})
			continue
		}
		merged := false
		for _, g := range groups {
			if g.base == base && g.c.Severity == c.Severity {
				g.names = append(g.names, name)
				g.texts = append(g.texts, spanText(c.Spans))
				merged = true
				break
			}
		}
		if !merged {
			groups = append(groups, &group{c: c, base: base, names: []string{name}, texts: []string{spanText(c.Spans)}})
		}
	}
	out := make([]doc.Callout, 0, len(groups))
	for _, g := range groups {
		if len(g.names) > 1 {
			g.c.Title = g.base + ", coils " + joinAnd(g.names)
			g.c.Spans = mergedSpans(g.names, g.texts)
		}
		out = append(out, g.c)
	}
	sort.SliceStable(out, func(a, b int) bool { return out[a].Severity > out[b].Severity })
	return out
}

// mergedSpans words one hazard's texts for several coils (names quoted as
// in the titles): once when they are all the same; else the sentences that
// differ coil by coil, then those they share.
func mergedSpans(names, texts []string) []doc.Span {
	same := true
	for _, t := range texts[1:] {
		same = same && t == texts[0]
	}
	if same {
		return []doc.Span{{Text: eachCoil(texts[0])}}
	}
	split := make([][]string, len(texts))
	for i, t := range texts {
		split[i] = sentences(t)
	}
	shared := map[string]bool{}
	for _, s := range split[0] {
		in := true
		for _, o := range split[1:] {
			in = in && slices.Contains(o, s)
		}
		shared[s] = in
	}
	var spans []doc.Span
	for i, ss := range split {
		var own []string
		for _, s := range ss {
			if !shared[s] {
				own = append(own, s)
			}
		}
		if len(own) > 0 {
			spans = append(spans, doc.Span{Text: "Coil " + names[i] + ": ", Strong: true}, doc.Span{Text: strings.Join(own, " ") + " "})
		}
	}
	var common []string
	for _, s := range split[0] {
		if shared[s] {
			common = append(common, s)
		}
	}
	if len(common) > 0 {
		spans = append(spans, doc.Span{Text: eachCoil(strings.Join(common, " "))})
	}
	if n := len(spans) - 1; n >= 0 {
		spans[n].Text = strings.TrimRight(spans[n].Text, " ")
	}
	return spans
}

// eachCoil words a caution's text that several coils share for each of
// them: "The coil stores" becomes "Each coil stores", "across the coil"
// "across each coil".
func eachCoil(text string) string {
	text = strings.ReplaceAll(text, "The coil ", "Each coil ")
	text = strings.ReplaceAll(text, "The coil's ", "Each coil's ")
	for _, after := range []string{" ", ",", ".", "'s ", ";"} {
		text = strings.ReplaceAll(text, " the coil"+after, " each coil"+after)
	}
	return text
}

// sentences splits text at a full stop followed by a space and a capital
// letter or a digit (not after the abbreviations a.c., d.c., e.g., i.e.).
func sentences(text string) []string {
	var out []string
	start := 0
	for i := 0; i+2 < len(text); i++ {
		if text[i] != '.' || text[i+1] != ' ' {
			continue
		}
		next := text[i+2]
		if !(next >= 'A' && next <= 'Z' || next >= '0' && next <= '9') {
			continue
		}
		head := text[start : i+1]
		if strings.HasSuffix(head, "a.c.") || strings.HasSuffix(head, "d.c.") || strings.HasSuffix(head, "e.g.") || strings.HasSuffix(head, "i.e.") {
			continue
		}
		out = append(out, strings.TrimSpace(head))
		start = i + 2
	}
	if rest := strings.TrimSpace(text[start:]); rest != "" {
		out = append(out, rest)
	}
	return out
}

func spanText(ss []doc.Span) string {
	var b strings.Builder
	for _, s := range ss {
		b.WriteString(s.Text)
	}
	return b.String()
}

func (c *composer) safety() {
	c.heading(1, "Safety")
	intro := "The cautions below are raised by this design's results."
	if !slices.ContainsFunc(c.cautions, func(co doc.Callout) bool { return co.Severity != doc.Note }) {
		intro = "This design's results raise no warning or caution; the notes below record what was checked and the general precautions."
	}
	c.para(templates.Text("safety", map[string]string{"Intro": intro}))
	for _, co := range c.cautions {
		c.add(co)
	}
}

// hotText words a hot spot of T kelvin: as a temperature, or, above the
// conductor's melting point, as the melting point that it would pass.
func hotText(cr calc.CoilResult, T float64) string {
	if cr.Verdict.AboveMelting && T > cr.Verdict.Melting {
		return "more than " + Eng(Celsius(cr.Verdict.Melting), "°C", 4) + " (the melting point of its conductor)"
	}
	return Eng(Celsius(T), "°C", 3)
}

// reachWords name the line the implant reach is measured along and the
// plane across it: "along the z axis", "in the xy plane" for a principal
// axis; for an oblique one, the coils' axis by its direction.
// axialSide says on which side of the origin the axial reach of ir lies,
// for a reach that differs between the two sides (as printed): far is
// " on the +z side" (the side of ir.Axial) and rest " and 12 mm on the −z
// side" when the level is reached on the other side too (else ""); far is
// " on either side" when both read alike.
func axialSide(ir analysis.ImplantReach) (far, rest string) {
	up, down := axialLength(ir.AxialUp), axialLength(ir.AxialDown)
	if ir.AxialUp > 0 && ir.AxialDown > 0 && up == down {
		return " on either side", ""
	}
	far, near := sideNames(ir.Axis)
	nearReach, nearWords := ir.AxialDown, down
	if ir.AxialDown > ir.AxialUp {
		far, near = near, far
		nearReach, nearWords = ir.AxialUp, up
	}
	if nearReach > 0 {
		rest = " and " + nearWords + " " + near
	}
	return " " + far, rest
}

// sideNames words the two sides of the origin along the axis u: "on the
// +z side" and "on the −z side" for a coordinate axis, else "on the side
// the axis points to" and "on the other side".
func sideNames(u calc.Vec) (plus, minus string) {
	n := axisName(calc.Coil{Axis: u})
	for _, a := range []string{"x", "y", "z"} {
		switch n {
		case a:
			return "on the +" + a + " side", "on the −" + a + " side"
		case "−" + a:
			return "on the −" + a + " side", "on the +" + a + " side"
		}
	}
	return "on the side the axis points to", "on the other side"
}

func reachWords(u calc.Vec, coils int) (along, across string) {
	switch axisName(calc.Coil{Axis: u}) {
	case "x", "−x":
		return "along the x axis", "in the yz plane"
	case "y", "−y":
		return "along the y axis", "in the zx plane"
	case "z", "−z":
		return "along the z axis", "in the xy plane"
	}
	if coils == 1 {
		return "along the coil's axis " + axisName(calc.Coil{Axis: u}), "in the coil's plane through the origin"
	}
	return "along the coils' common axis " + axisName(calc.Coil{Axis: u}), "in the plane through the origin across it"
}

// voltageWhat names the coil's terminal voltage in the hazardous-voltage
// caution: the supply voltage under voltage drive, the voltage the current
// source must deliver (its compliance voltage) under current drive.
func voltageWhat(co calc.Coil) string {
	if co.Drive == calc.CurrentDrive {
		return "The voltage the current source must deliver across the coil (its compliance voltage)"
	}
	return "The supply voltage"
}
