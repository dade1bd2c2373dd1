package report

import (
	"coilmemo/analysis"
)

// SizingReport is the size block's search and its choice: the values
// chosen, how many choices were searched, evaluated and feasible, and the
// runners-up.
type SizingReport struct {
	Objective string `json:"objective"`
	// Value is the objective's value at the choice, SI (W, kg, A·m² or
	// A·m²/W).
	Value Num `json:"value"`
	// Coils are the coil blocks sized (all alike).
	Coils  []string        `json:"coils"`
	Chosen SizingCandidate `json:"chosen"`
	// RunnersUp are the best choices of other wires that meet every
	// requirement, best first.
	RunnersUp []SizingCandidate `json:"runners_up"`
	// Candidates counts the (turns, wire) choices; Evaluated the designs
	// whose cheap figures were computed (continuous steps included);
	// Feasible the choices meeting every constraint those figures decide;
	// FullEvaluations the choices evaluated in full.
	Candidates      int `json:"candidates"`
	Evaluated       int `json:"evaluated"`
	Feasible        int `json:"feasible"`
	FullEvaluations int `json:"full_evaluations"`
	// Binding is the constraint that excludes most of the choices better
	// than the chosen one; NextToBind the least margin at the choice
	// besides it ("" when none).
	Binding    string `json:"binding"`
	NextToBind string `json:"next_to_bind"`
	// MeritA2m4PerWkg is m²/(P·M) of the chosen air-core winding.
	MeritA2m4PerWkg Num `json:"merit_A2_m4_per_W_kg"`
}

// SizingCandidate is one choice.
type SizingCandidate struct {
	Turns int    `json:"turns"`
	Wire  string `json:"wire"`
	Bare  Num    `json:"wire_bare_m"`
	// Values are the free numeric keys chosen, SI, by key.
	Values    map[string]Num `json:"values"`
	Objective Num            `json:"objective"`
	Power     Num            `json:"power_W"`
	Mass      Num            `json:"mass_kg"`
	Moment    Num            `json:"moment_A_m2"`
	// Margins are the limits' relative margins, in spec order (positive:
	// met).
	Margins []Num `json:"margins"`
}

func addSizing(rep *Report, j *analysis.Study) {
	sz := j.Sizing
	if sz == nil {
		return
	}
	r := &SizingReport{
		Objective: sz.Objective.String(), Value: Num(sz.Chosen.Objective), Candidates: sz.Discrete, Evaluated: sz.Evaluated,
		Feasible: sz.Feasible, FullEvaluations: sz.Full, MeritA2m4PerWkg: Num(sz.Merit),
		Chosen: sizingCandidate(sz, sz.Chosen), RunnersUp: []SizingCandidate{},
	}
	for _, i := range sz.Size.Targets {
		r.Coils = append(r.Coils, j.Spec.Design.Coils[i].Name)
	}
	for _, c := range sz.RunnersUp {
		r.RunnersUp = append(r.RunnersUp, sizingCandidate(sz, c))
	}
	if sz.Binding >= 0 {
		r.Binding = sz.Constraints[sz.Binding].Name
	}
	if sz.Next >= 0 {
		r.NextToBind = sz.Constraints[sz.Next].Name
	}
	rep.Sizing = r
}

func sizingCandidate(sz *analysis.Sizing, c analysis.Candidate) SizingCandidate {
	out := SizingCandidate{Turns: c.Turns, Wire: c.Wire.Name(), Bare: Num(c.Wire.Bare), Values: map[string]Num{},
		Objective: Num(c.Objective), Power: Num(c.Power), Mass: Num(c.Mass), Moment: Num(c.Moment), Margins: []Num{}}
	for k, r := range sz.Size.Ranges {
		out.Values[r.Key] = Num(c.Values[k])
	}
	for _, m := range c.Margins {
		out.Margins = append(out.Margins, Num(m))
	}
	return out
}
