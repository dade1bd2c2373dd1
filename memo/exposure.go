package memo

import (
	"fmt"

	"coilmemo/analysis"
	"coilmemo/doc"
)

// exposureCautions word the time-varying field of each a.c.-driven coil
// against the ICNIRP (2010) reference levels (analysis.ACExposure): a
// warning where the field at the winding's surface reaches the public
// level, a note where it stays below it.
func exposureCautions(j *analysis.Study) []doc.Callout {
	var out []doc.Callout
	// distances from a surface read as the implant caution's (two
	// figures, rounded up)
	reach := func(v float64) string { s, _ := reachLength(v); return s }
	for _, e := range j.Safety.Exposure {
		co, cr := j.Spec.Design.Coils[e.Coil], j.Results.Coils[e.Coil]
		name := fmt.Sprintf("coil %q", co.Name)
		levels := fmt.Sprintf("The field of %s alternates at %s. The ICNIRP (2010) reference levels for exposure to a time-varying magnetic field at that frequency are %s r.m.s. for the general public and %s for workers (Health Physics 99, 818–836, Tables 3 and 4)",
			name, Eng(e.Frequency, "Hz", 3), Eng(e.Public, "T", 3), Eng(e.Occupational, "T", 3))
		rf := ""
		if e.Frequency > 100e3 {
			rf = " Above 100 kHz the radio-frequency exposure guidelines apply as well."
		}
		if !(e.PublicDistance > 0) && e.Surface < e.Public {
			out = append(out, doc.Callout{Severity: doc.Note, Title: "Time-varying field, " + name,
				Spans: []doc.Span{{Text: levels + fmt.Sprintf("; at its %s r.m.s. current its field stays below the public level everywhere outside the winding (up to %s at its surface).%s", Eng(cr.Current, "A", 3), Eng(e.Surface, "T", 3), rf)}}})
			continue
		}
		occ := "stays below the occupational level outside the winding"
		if e.OccupationalDistance > 0 {
			occ = "exceeds the occupational level as far as " + reach(e.OccupationalDistance)
		}
		text := levels + fmt.Sprintf(". At its %s r.m.s. current its own field exceeds the public level as far as %s from the winding's outer surface (at the surface it reaches up to %s) and %s. Keep people who are not occupationally exposed farther than %s from the winding while it is energised; where people work closer, assess their exposure against the guidelines' basic restrictions, for which the reference levels are a conservative screen. Active implanted devices may be affected at lower levels: follow their makers' guidance.%s",
			Eng(cr.Current, "A", 3), reach(e.PublicDistance), Eng(e.Surface, "T", 3), occ, reach(e.PublicDistance), rf)
		out = append(out, doc.Callout{Severity: doc.Warning, Title: "Time-varying field: exposure of people, " + name, Spans: []doc.Span{{Text: text}}})
	}
	return out
}

// alternatingNote is the implant caution's word on a.c.-driven coils:
// the region is searched at the peak of their currents
// (analysis.ImplantReach.Peak), against the static-field figure; an
// implant may respond to a time-varying field at far lower levels, which
// the time-varying field caution takes up where the exposure guidelines
// cover the frequency. "" when no coil with current is driven at a
// frequency.
func alternatingNote(j *analysis.Study) string {
	if !j.Safety.Implant.Peak {
		return ""
	}
	var names []string
	for i, co := range j.Spec.Design.Coils {
		if i < len(j.Results.Coils) && co.Frequency > 0 && !analysis.IsReceiver(co) && j.Results.Coils[i].Current != 0 {
			names = append(names, fmt.Sprintf("%q", co.Name))
		}
	}
	if len(names) == 0 {
		return ""
	}
	what, inPhase := "coil "+names[0]+" alternates", ""
	if len(names) > 1 {
		what, inPhase = "coils "+joinAnd(names)+" alternate", ", the coils' fields taken in phase"
	}
	s := " The field of " + what + ". The region and the flux densities above are at the peak of the current, √2 times the r.m.s." + inPhase + ", against the static-field 0.5 mT."
	if len(j.Safety.Exposure) == 0 {
		return s
	}
	return s + " Implanted devices may respond to a time-varying field at far lower levels (see the time-varying field caution)."
}
