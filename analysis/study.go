// Package analysis runs the calculations once over a parsed spec and holds
// every number the memo, the JSON report and the checks use in a Study:
// the operating point and results of every coil (calc.Results), the
// layout as laid out, the field profiles and maps as data, the heat
// balance and its parts, switching, coupling, dipole distances, the safety
// findings (kind, severity, numbers — no wording), the sweep steps, the
// verification checks and the derivation's intermediate values.
//
// Data flows one way: spec text → spec.Spec → Study → memo's document →
// PDF. Later stages only read a Study; nothing here writes text for the
// reader beyond the short method names of the verification rows.
package analysis

import (
	"crypto/sha256"
	"encoding/hex"
	"time"

	"coilmemo/calc"
	"coilmemo/spec"
)

// Version is the tool version recorded in every memo and JSON report.
const Version = "0.1.0"

// Options are what the caller (the command line) knows and the spec does
// not: the name the memo shows for the spec, and the build date.
type Options struct {
	// Name is the spec as the memo names it (its base name), so the
	// memo's bytes do not depend on the path typed. "" keeps the path.
	Name string
	// Date is the build date from the environment (SOURCE_DATE_EPOCH),
	// read by the command line; zero means none was given, and the
	// spec's own date (or none) is used.
	Date time.Time
	// ReadPrevious, if set, reads the previous revision's spec that the
	// memo block's `previous` names (see ComparePrevious); the command
	// line supplies it, as the analysis does no I/O of its own.
	ReadPrevious func(ref string) (name string, src []byte, err error)
	// MapNodes, if set, is the node count along the longer side of every
	// field map (each coil's, the all-coils map), in place of MapGrid and
	// AllMapGrid: a coarse grid for the whole-pipeline fuzz target, which
	// keeps every map, figure and layout path at a fraction of the cost.
	// Zero, as in every build, keeps the memo's grids.
	MapNodes int
}

// Study is one evaluated spec: everything the memo and the JSON report
// need, each number computed once.
type Study struct {
	Spec    *spec.Spec
	Name    string // the spec as the memo names it
	SHA256  string // of the spec bytes
	Results calc.Results
	// Cooling is the cooling as used: the spec's, with the defaults filled
	// in (calc.EffectiveCooling).
	Cooling calc.Cooling
	Coils   []CoilStudy   // one per coil block, in spec order
	Limits  []LimitResult // every requirement judged, in spec order
	Checks  []Check
	Sweep   []SweepStep // one per swept value, when the spec has a sweep
	Safety  Safety
	// Design holds the figures of the design as a whole that the memo
	// plots or states: the torque curve and the all-coils map.
	Design DesignStudy
	// WorstCase is the design over its tolerances block; nil without one.
	WorstCase *WorstCase
	// Sizing is the size block's search and choice; nil without one. The
	// rest of the study is the chosen design's: Spec holds the choice.
	Sizing  *Sizing
	Created time.Time // build date written into the memo
	Dated   bool      // Created came from the environment or the spec
	// DateSource says where Created came from: "SOURCE_DATE_EPOCH", "memo
	// date" or "" (not dated).
	DateSource string
	// Changes is what moved since the previous revision the memo block
	// names; nil without one.
	Changes *Changes
}

// Run parses and analyses a spec. Diagnostics are returned (and nothing
// else is) when the spec has problems.
func Run(file string, src []byte, o Options) (*Study, spec.Diagnostics) {
	s, diags := spec.Parse(file, src)
	if len(diags) > 0 {
		return nil, diags
	}
	sum := sha256.Sum256(src)
	var sz *Sizing
	if s.Size != nil {
		var diags spec.Diagnostics
		if sz, s, diags = SizeDesign(s); len(diags) > 0 {
			return nil, diags
		}
	}
	st := Analyse(s, o)
	st.Sizing = sz
	st.SHA256 = hex.EncodeToString(sum[:])
	if diags := ComparePrevious(st, o); len(diags) > 0 {
		return nil, diags
	}
	return st, nil
}

// Analyse runs every calculation over a parsed spec.
func Analyse(s *spec.Spec, o Options) *Study {
	st := &Study{Spec: s, Name: o.Name}
	if st.Name == "" {
		st.Name = s.File
	}
	st.Results = calc.Evaluate(s.Design)
	air, kinds := st.Results, studyKinds(s.Design, st.Results) // cored and pick-up coils: analysis/core.go
	st.Results = coredResults(s.Design, air, kinds)
	st.Cooling = calc.EffectiveCooling(s.Design.Conditions.Cooling)
	st.Limits = JudgeLimits(s.Design, st.Results)
	maps := mapCache{}
	for i, c := range s.Design.Coils {
		st.Coils = append(st.Coils, studyCoil(c, air.Coils[i], s.Design.Conditions, maps, o.MapNodes)) // the winding alone; the core in Kinds
		st.Coils[i].Kinds = kinds[i]
		st.Coils[i].SwitchOff = switchOffParts(c, st.Results.Coils[i], kinds[i].SelfCapacitance)
		coreStudy(&st.Coils[i], c, &st.Results.Coils[i], kinds[i].Core, o.MapNodes) // the core in the field figures: analysis/core.go
	}
	st.Design = analyseDesign(s.Design, st.Results, o.MapNodes)
	st.Design.Nested = nestings(s.Design, st.Coils)
	st.Checks = append(Verify(s.Design, air), kindChecks(s.Design, air, kinds)...)
	st.Sweep = RunSweep(s)
	st.WorstCase = AnalyseWorstCase(s, st.Results, st.Limits)
	st.Safety = assessSafety(s.Design, st.Results, st.Coils, st.WorstCase) // the hot surface over the corners too
	st.Safety.Findings = kindFindings(s.Design, st.Results, kinds, st.Safety.Findings)
	st.WorstCase.fitSuppression(st.Results.Coils, st.Coils) // the series resistor that holds at every corner
	st.WorstCase.judge(st.Limits)                           // with tolerances, a limit passes only if met at every corner
	switch {
	case !o.Date.IsZero():
		st.Created, st.Dated, st.DateSource = o.Date.UTC(), true, "SOURCE_DATE_EPOCH"
	case !s.Memo.DateValue.IsZero():
		st.Created, st.Dated, st.DateSource = s.Memo.DateValue.UTC(), true, "memo date"
	default:
		st.Created = time.Unix(0, 0).UTC()
	}
	return st
}

// Failed counts the limits and verification checks that failed.
func (st *Study) Failed() (limits, checks int) {
	for _, l := range st.Limits {
		if !l.Pass {
			limits++
		}
	}
	for _, c := range st.Checks {
		if !c.Pass {
			checks++
		}
	}
	return
}

// FormName names a coil's form as the memo and the JSON write it.
func FormName(c calc.Coil) string {
	switch c.Form {
	case calc.Solenoid:
		return "solenoid"
	case calc.Rectangle:
		return "rectangle"
	case calc.Pair:
		if c.Opposing {
			return "pair, opposing"
		}
		return "pair, aiding"
	}
	return "loop"
}
