package main

import (
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"math"
	"sort"
	"strings"

	"coilmemo/analysis"
	"coilmemo/analysis/report"
	"coilmemo/spec"
)

const diffHelp = `Usage: coilmemo diff OLD NEW

Compare two revisions of a spec: the inputs that changed (as written) and
the results that changed (from the same figures as calc --json, with the
relative change). Exit status 0 whether or not they differ; 2 when either
spec has problems.
`

func diffCmd(args []string, stdout, stderr io.Writer) error {
	fs := newFlagSet("diff", diffHelp, stdout)
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
	writeDiff(stdout, pos[0], pos[1], a, b)
	return nil
}

// entryKey identifies an input across revisions.
func entryKey(e spec.Entry) string {
	k := e.Block
	if e.Coil != "" {
		k += " " + e.Coil
	}
	return k + ": " + e.Key
}

func writeDiff(w io.Writer, oldName, newName string, a, b *analysis.Study) {
	fmt.Fprintf(w, "--- %s\n+++ %s\n", oldName, newName)
	show := func(e spec.Entry) string {
		if e.Default {
			return "(default " + e.SI + ")"
		}
		return e.Raw
	}
	olds := map[string]spec.Entry{}
	var order []string
	for _, e := range a.Spec.Entries {
		k := entryKey(e)
		if _, dup := olds[k]; !dup {
			order = append(order, k)
		}
		olds[k] = e
	}
	news := map[string]spec.Entry{}
	for _, e := range b.Spec.Entries {
		k := entryKey(e)
		if _, ok := olds[k]; !ok {
			if _, dup := news[k]; !dup {
				order = append(order, k)
			}
		}
		news[k] = e
	}
	fmt.Fprintln(w, "\nInputs")
	n := 0
	for _, k := range order {
		o, inOld := olds[k]
		nw, inNew := news[k]
		switch {
		case inOld && inNew && show(o) != show(nw):
			fmt.Fprintf(w, "  %s: %s → %s\n", k, show(o), show(nw))
		case inOld && !inNew:
			fmt.Fprintf(w, "  %s: %s → (removed)\n", k, show(o))
		case !inOld && inNew:
			fmt.Fprintf(w, "  %s: (new) → %s\n", k, show(nw))
		default:
			continue
		}
		n++
	}
	if n == 0 {
		fmt.Fprintln(w, "  no change")
	}
	fa, fb := flatten(report.Build(a)), flatten(report.Build(b))
	keys := map[string]bool{}
	for k := range fa {
		keys[k] = true
	}
	for k := range fb {
		keys[k] = true
	}
	var sorted []string
	for k := range keys {
		sorted = append(sorted, k)
	}
	sort.Strings(sorted)
	fmt.Fprintln(w, "\nResults")
	n = 0
	for _, k := range sorted {
		// Checks are reported by their outcome only; their figures
		// repeat the results above.
		if k == "spec" || k == "spec_sha256" || k == "tool" ||
			strings.HasPrefix(k, "checks[") && !strings.HasSuffix(k, ".pass") {
			continue
		}
		va, okA := fa[k]
		vb, okB := fb[k]
		if okA && okB && same(va, vb) {
			continue
		}
		line := fmt.Sprintf("  %s: %s → %s", k, valueText(va, okA), valueText(vb, okB))
		if x, ok := va.(float64); ok && okB {
			if y, ok := vb.(float64); ok && x != 0 {
				line += fmt.Sprintf("  (%+.3g %%)", 100*(y-x)/math.Abs(x))
			}
		}
		fmt.Fprintln(w, strings.Replace(line, "+-", "−", 1))
		n++
	}
	if n == 0 {
		fmt.Fprintln(w, "  no change")
	}
}

// same reports equal values, taking numbers that differ by rounding noise
// (1 part in 10⁹) as equal.
func same(a, b any) bool {
	x, okX := a.(float64)
	y, okY := b.(float64)
	if okX && okY {
		return x == y || math.Abs(x-y) <= 1e-9*math.Max(math.Abs(x), math.Abs(y))
	}
	return fmt.Sprint(a) == fmt.Sprint(b)
}

func valueText(v any, ok bool) string {
	if !ok {
		return "(absent)"
	}
	if v == nil {
		return "null"
	}
	if f, isNum := v.(float64); isNum {
		return fmt.Sprintf("%.6g", f)
	}
	return fmt.Sprint(v)
}

// flatten turns the JSON report into path → scalar, naming array elements
// by their "name" (or "quantity") field where they have one, so that the
// same coil or limit is compared across revisions.
func flatten(r report.Report) map[string]any {
	b, _ := json.Marshal(r)
	var v any
	json.Unmarshal(b, &v)
	out := map[string]any{}
	var walk func(prefix string, v any)
	walk = func(prefix string, v any) {
		switch t := v.(type) {
		case map[string]any:
			for k, x := range t {
				p := k
				if prefix != "" {
					p = prefix + "." + k
				}
				walk(p, x)
			}
		case []any:
			for i, x := range t {
				label := fmt.Sprint(i)
				if m, ok := x.(map[string]any); ok {
					for _, f := range []string{"name", "quantity"} {
						if s, ok := m[f].(string); ok {
							label = s
							if c, ok := m["coil"].(string); ok && c != "" {
								label = c + ": " + s
							}
							if rel, ok := m["relation"].(string); ok {
								label += " " + rel
							}
							break
						}
					}
				}
				walk(prefix+"["+label+"]", x)
			}
		default:
			out[prefix] = t
		}
	}
	walk("", v)
	return out
}
