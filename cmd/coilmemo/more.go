package main

import (
	"coilmemo/analysis"
	"coilmemo/analysis/report"
	_ "embed"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"math"
	"os"
	"sort"
	"strings"
	"time"

	"coilmemo/spec"
)

//go:embed starter.md
var starter []byte

const newHelp = `Usage: coilmemo new [FILE]

Write a starter spec with every block and the common keys, to FILE or, with
no FILE, to standard output. An existing FILE is never overwritten.
`

const diffHelp = `Usage: coilmemo diff OLD NEW

Compare two revisions of a spec: the inputs that changed (as written) and
the results that changed (from the same figures as calc --json, with the
relative change). Exit status 0 whether or not they differ; 2 when either
spec has problems.
`

const watchHelp = `Usage: coilmemo watch SPEC [-o OUT]

Build the memo of SPEC, then rebuild it each time the file is saved, until
interrupted (Ctrl-C). Problems in the spec are printed and the previous memo
is left in place until the spec is sound again.
`

func newCmd(args []string, stdout io.Writer) error {
	fs := newFlagSet("new", newHelp, stdout)
	pos, err := parseInterleaved(fs, args)
	if err != nil {
		return flagErr(err, newHelp, stdout)
	}
	switch len(pos) {
	case 0:
		_, err := stdout.Write(starter)
		return err
	case 1:
		f, err := os.OpenFile(pos[0], os.O_WRONLY|os.O_CREATE|os.O_EXCL, 0o644)
		if errors.Is(err, os.ErrExist) {
			return &exitError{2, fmt.Sprintf("coilmemo: %s exists; not overwritten", pos[0])}
		}
		if err != nil {
			return &exitError{2, "coilmemo: " + err.Error()}
		}
		if _, err := f.Write(starter); err != nil {
			f.Close()
			return err
		}
		if err := f.Close(); err != nil {
			return err
		}
		fmt.Fprintf(stdout, "wrote %s; edit it, then run: coilmemo build %s\n", pos[0], pos[0])
		return nil
	}
	return usageErr("new takes at most one file name")
}

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

func watchCmd(args []string, stdout, stderr io.Writer) error {
	fs := newFlagSet("watch", watchHelp, stdout)
	out := fs.String("o", "", "output file")
	pos, err := parseInterleaved(fs, args)
	if err != nil {
		return flagErr(err, watchHelp, stdout)
	}
	if len(pos) != 1 {
		return usageErr("watch takes one spec file")
	}
	return watch(pos[0], *out, stdout, stderr, 300*time.Millisecond, nil)
}

// watch rebuilds path whenever its modification time or size changes,
// polling every interval, until stop is closed (never, from the command).
func watch(path, out string, stdout, stderr io.Writer, interval time.Duration, stop <-chan struct{}) error {
	var last os.FileInfo
	fmt.Fprintf(stdout, "watching %s (Ctrl-C to stop)\n", path)
	for {
		fi, err := os.Stat(path)
		if err != nil {
			fmt.Fprintln(stderr, "coilmemo:", err)
		} else if last == nil || !fi.ModTime().Equal(last.ModTime()) || fi.Size() != last.Size() {
			last = fi
			args := []string{path}
			if out != "" {
				args = append(args, "-o", out)
			}
			start := time.Now()
			if err := build(args, stdout, stderr); err != nil {
				var ee *exitError
				if !errors.As(err, &ee) || ee.code != 2 {
					return err
				}
			} else {
				fmt.Fprintf(stdout, "  built in %d ms\n", time.Since(start).Milliseconds())
			}
		}
		select {
		case <-stop:
			return nil
		case <-time.After(interval):
		}
	}
}
