package main

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"os/exec"
	"path/filepath"
	"strings"

	"coilmemo/analysis"
	"coilmemo/format"
)

const diffHelp = `Usage: coilmemo diff OLD NEW [--json]

Compare two revisions of a spec, coil by coil (the design as a whole
first): the headline results that moved, the requirements whose value or
verdict moved, then the inputs that changed. Values in engineering units;
temperatures change in kelvin, other results by their relative change.
The memo's "Changes since revision X" section lists the same.

  --json   the same changes as JSON, values in SI

Exit status 0 when no requirement went from PASS to FAIL, 1 when one did
(for CI), 2 when either spec has problems.
`

func diffCmd(args []string, stdout, stderr io.Writer) error {
	fs := newFlagSet("diff", diffHelp, stdout)
	asJSON := fs.Bool("json", false, "JSON output")
	pos, err := parseInterleaved(fs, args)
	if err != nil {
		return flagErr(err, diffHelp, stdout)
	}
	if len(pos) != 2 {
		return usageErr("diff takes two spec files: OLD NEW")
	}
	a, errA := load(pos[0], stderr)
	b, errB := load(pos[1], stderr)
	for _, e := range []error{errA, errB} {
		var ee *exitError
		if errors.As(e, &ee) {
			fmt.Fprintln(stderr, ee.msg)
		}
	}
	if errA != nil || errB != nil {
		return &exitError{code: 2}
	}
	ch := analysis.Compare(a, b)
	if *asJSON {
		if err := writeDiffJSON(stdout, pos[0], pos[1], ch); err != nil {
			return err
		}
	} else {
		writeDiff(stdout, pos[0], pos[1], ch)
	}
	if ch.Regressed {
		return &exitError{1, "coilmemo diff: a requirement met in " + pos[0] + " is not met in " + pos[1]}
	}
	return nil
}

// writeDiff prints the changes for a reader.
func writeDiff(w io.Writer, oldName, newName string, ch analysis.Changes) {
	fmt.Fprintf(w, "--- %s%s\n+++ %s%s\n", oldName, revNote(ch.From), newName, revNote(ch.To))
	if len(ch.Groups) == 0 {
		fmt.Fprintln(w, "\nno change")
		return
	}
	for _, g := range ch.Groups {
		if g.Coil == "" {
			fmt.Fprintln(w, "\nDesign as a whole")
		} else {
			fmt.Fprintf(w, "\nCoil %q\n", g.Coil)
		}
		for _, r := range g.Results {
			from, to, d := format.Change(r.Old, r.New, r.Unit)
			fmt.Fprintf(w, "  %s: %s → %s  (%s)\n", r.Quantity, from, to, d)
		}
		for _, l := range g.Limits {
			unit := format.Unit(l.Unit)
			req := "requirement " + l.Stated() + " " + format.Eng(display(l.Required, unit), unit, 3)
			if !l.InOld {
				_, to, _ := format.Change(l.New, l.New, unit)
				fmt.Fprintf(w, "  %s: (new) → %s %s\n", req, to, verdict(l.NewPass))
				continue
			}
			from, to, d := format.Change(l.Old, l.New, unit)
			note := d
			if l.OldPass != l.NewPass {
				note = verdict(l.OldPass) + " → " + verdict(l.NewPass)
			}
			fmt.Fprintf(w, "  %s: %s %s → %s %s  (%s)\n", req, from, verdict(l.OldPass), to, verdict(l.NewPass), note)
		}
		for _, in := range g.Inputs {
			from, to, change := in.Columns()
			fmt.Fprintf(w, "  input %s: %s: %s → %s  (%s)\n", in.Block, in.Key, from, to, change)
		}
	}
}

func revNote(rev string) string {
	if rev == "" {
		return ""
	}
	return "  (revision " + rev + ")"
}

func verdict(pass bool) string {
	if pass {
		return "PASS"
	}
	return "FAIL"
}

func display(v float64, unit string) float64 {
	if unit == "°C" {
		return format.Celsius(v)
	}
	return v
}

// diffJSON is `diff --json`: the changes in SI, temperatures in kelvin.
type diffJSON struct {
	Old       string      `json:"old"`
	New       string      `json:"new"`
	From      string      `json:"from_revision"`
	To        string      `json:"to_revision"`
	Regressed bool        `json:"regressed"`
	Groups    []groupJSON `json:"groups"`
}

type groupJSON struct {
	Coil    string       `json:"coil"`
	Results []resultJSON `json:"results"`
	Limits  []limitJSON  `json:"limits"`
	Inputs  []inputJSON  `json:"inputs"`
}

type resultJSON struct {
	Key      string   `json:"key"`
	Quantity string   `json:"quantity"`
	Unit     string   `json:"unit"`
	Old      float64  `json:"old"`
	New      float64  `json:"new"`
	Delta    float64  `json:"delta"`
	Relative *float64 `json:"relative"`
}

type limitJSON struct {
	Requirement string   `json:"requirement"`
	Required    float64  `json:"required"`
	Old         *float64 `json:"old"`
	New         float64  `json:"new"`
	OldPass     *bool    `json:"old_pass"`
	NewPass     bool     `json:"new_pass"`
}

type inputJSON struct {
	Block string `json:"block"`
	Key   string `json:"key"`
	Old   string `json:"old"`
	New   string `json:"new"`
	OldSI string `json:"old_si"`
	NewSI string `json:"new_si"`
	// For a value written as one number in both revisions: the numbers
	// in SI (kelvin for a temperature) and their unit.
	OldValue *float64 `json:"old_value,omitempty"`
	NewValue *float64 `json:"new_value,omitempty"`
	Unit     string   `json:"unit,omitempty"`
}

func writeDiffJSON(w io.Writer, oldName, newName string, ch analysis.Changes) error {
	out := diffJSON{Old: oldName, New: newName, From: ch.From, To: ch.To, Regressed: ch.Regressed, Groups: []groupJSON{}}
	finite := func(v float64) float64 {
		if v != v { // NaN has no JSON form
			return 0
		}
		return v
	}
	for _, g := range ch.Groups {
		gj := groupJSON{Coil: g.Coil, Results: []resultJSON{}, Limits: []limitJSON{}, Inputs: []inputJSON{}}
		for _, r := range g.Results {
			unit := r.Unit
			if unit == "°C" {
				unit = "K"
			}
			rj := resultJSON{Key: r.Key, Quantity: r.Quantity, Unit: unit, Old: finite(r.Old), New: finite(r.New), Delta: finite(r.Delta())}
			if rel := r.Relative(); rel == rel && r.Unit != "°C" {
				rj.Relative = &rel
			}
			gj.Results = append(gj.Results, rj)
		}
		for _, l := range g.Limits {
			lj := limitJSON{Requirement: l.Requirement, Required: finite(l.Required), New: finite(l.New), NewPass: l.NewPass}
			if l.InOld {
				old, pass := finite(l.Old), l.OldPass
				lj.Old, lj.OldPass = &old, &pass
			}
			gj.Limits = append(gj.Limits, lj)
		}
		for _, in := range g.Inputs {
			ij := inputJSON{Block: in.Block, Key: in.Key, Old: in.Old, New: in.New, OldSI: in.OldSI, NewSI: in.NewSI}
			if in.Numeric {
				o, n := finite(in.OldValue), finite(in.NewValue)
				ij.OldValue, ij.NewValue, ij.Unit = &o, &n, in.Unit
				if in.Unit == "°C" {
					ij.Unit = "K"
				}
			}
			gj.Inputs = append(gj.Inputs, ij)
		}
		out.Groups = append(out.Groups, gj)
	}
	// ≥ and ≤ as they are: no HTML escaping of <, > and & (\u003e).
	enc := json.NewEncoder(w)
	enc.SetEscapeHTML(false)
	enc.SetIndent("", "  ")
	return enc.Encode(out)
}

// previousReader reads the previous revision a spec at path names in its
// memo block: a path relative to the spec's folder, or git:REV for the
// spec's own file at git revision REV (git show REV:./file, run in the
// spec's folder).
func previousReader(path string) func(ref string) (string, []byte, error) {
	return func(ref string) (string, []byte, error) {
		dir, file := filepath.Split(path)
		if dir == "" {
			dir = "."
		}
		if rev, ok := strings.CutPrefix(ref, "git:"); ok {
			if strings.HasPrefix(rev, "-") {
				return "", nil, fmt.Errorf("git revision %q is not a revision name", rev)
			}
			inside := exec.Command("git", "-C", dir, "rev-parse", "--is-inside-work-tree")
			if outp, err := inside.Output(); err != nil || strings.TrimSpace(string(outp)) != "true" {
				return "", nil, fmt.Errorf("git:%s: %s is not in a git work tree", rev, path)
			}
			var stderr bytes.Buffer
			show := exec.Command("git", "-C", dir, "show", rev+":./"+file)
			show.Stderr = &stderr
			src, err := show.Output()
			if err != nil {
				msg := strings.TrimSpace(strings.SplitN(stderr.String(), "\n", 2)[0])
				if msg == "" {
					msg = err.Error()
				}
				return "", nil, fmt.Errorf("git show %s:%s: %s", rev, file, msg)
			}
			return file + "@" + rev, src, nil
		}
		p := ref
		if !filepath.IsAbs(p) {
			p = filepath.Join(dir, ref)
		}
		src, err := readSpec(p)
		if err != nil {
			var ee *exitError
			if errors.As(err, &ee) {
				return "", nil, errors.New(strings.TrimPrefix(ee.msg, "coilmemo: "))
			}
			return "", nil, err
		}
		return filepath.Base(p), src, nil
	}
}
