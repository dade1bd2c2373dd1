package main

import (
	"fmt"
	"io"
	"path/filepath"
	"strings"

	"coilmemo/analysis"
	"coilmemo/format"
	"coilmemo/spec"
)

const sizeHelp = `Usage: coilmemo size SPEC [-o OUT.md]

Search the choices a spec's size block leaves free (turns, wire, numeric
coil keys) for the one that best meets its objective within every limit,
and write the spec back with that choice: the free keys set in the coil
block and a comment line at the top of the size block naming the
objective and its value. Without -o the spec goes to standard output; -o
may name the spec itself to update it in place. A summary goes to
standard error. When no choice meets every requirement the reason is
reported as file:line: message and nothing is written (exit status 2).

Options:
  -o OUT.md  write the sized spec to OUT.md
`

func sizeCmd(args []string, stdout, stderr io.Writer) error {
	fs := newFlagSet("size", sizeHelp, stdout)
	out := fs.String("o", "", "output spec")
	pos, err := parseInterleaved(fs, args)
	if err != nil {
		return flagErr(err, sizeHelp, stdout)
	}
	if len(pos) != 1 {
		return usageErr("size takes exactly one spec file")
	}
	path := pos[0]
	src, err := readSpec(path)
	if err != nil {
		return err
	}
	original, diags := spec.Parse(path, src)
	if len(diags) == 0 && original.Size == nil {
		return &exitError{2, fmt.Sprintf("%s:1: the spec has no size block: add one, e.g. a fenced block named size with turns = 50 .. 3000, wire = AWG 24 .. AWG 40 and objective = minimum power", path)}
	}
	st, err := load(path, stderr)
	if err != nil {
		return err
	}
	sz := st.Sizing
	values := map[string]map[string]string{}
	var picked []string
	for _, i := range sz.Size.Targets {
		co := st.Spec.Design.Coils[i]
		v := map[string]string{}
		for _, e := range original.Entries {
			if e.Sized && e.Coil == co.Name {
				v[e.Key] = analysis.SpecText(co, e.Key)
			}
		}
		values[co.Name] = v
		if len(picked) == 0 {
			for _, k := range []string{"wire", "turns"} {
				if t, ok := v[k]; ok {
					picked = append(picked, map[string]string{"wire": t, "turns": t + " turns"}[k])
				}
			}
			for _, r := range sz.Size.Ranges {
				picked = append(picked, r.Key+" "+v[r.Key])
			}
		}
	}
	comment := fmt.Sprintf("%s = %s with %s (%s choices, %s feasible)", sz.Objective, objectiveText(sz), strings.Join(picked, ", "),
		format.Digits(sz.Discrete), format.Digits(sz.Feasible))
	sized := spec.WriteChoice(src, original, values, comment)
	fmt.Fprintf(stderr, "%s: %s\n", filepath.Base(path), comment)
	if *out == "" {
		_, err := stdout.Write(sized)
		return err
	}
	if err := writeAtomic(*out, sized); err != nil {
		return &exitError{2, "coilmemo: " + err.Error()}
	}
	fmt.Fprintf(stderr, "%s → %s\n", path, *out)
	return nil
}

// objectiveText is the chosen design's objective value with its unit.
func objectiveText(sz *analysis.Sizing) string {
	unit := map[spec.Objective]string{spec.MinimumPower: "W", spec.MinimumMass: "kg", spec.MaximumMoment: "A·m²", spec.MaximumMomentPerPower: "A·m²/W"}[sz.Objective]
	if unit == "kg" {
		return format.Eng(sz.Chosen.Objective*1e3, "g", 4)
	}
	return format.Eng(sz.Chosen.Objective, unit, 4)
}

// sizeWarnings tells the author, on the terminal, which values the coil
// blocks state for keys the size block chooses, where they differ from
// the choice (run coilmemo size to write the choice in).
func sizeWarnings(job *analysis.Study, path string, stderr io.Writer) {
	if job.Sizing == nil {
		return
	}
	for _, s := range job.Sizing.Stated {
		var co string
		for _, c := range job.Spec.Design.Coils {
			if c.Name == s.Coil {
				co = analysis.ChoiceText(c, s.Key)
			}
		}
		fmt.Fprintf(stderr, "%s:%d: warning: coil %q: %s = %s is replaced by the size block's choice, %s (coilmemo size writes it in)\n",
			path, s.Line, s.Coil, s.Key, s.Raw, co)
	}
}
