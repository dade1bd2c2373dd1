package main

import (
	"bytes"
	"encoding/json"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
)

const (
	revA = "../../examples/revisions/survey-pair-a.md"
	revB = "../../examples/survey-pair.md"
)

// diff groups by coil (the design first), headline results before the
// inputs, in engineering units with temperatures as kelvin differences.
func TestDiffGroupsAndUnits(t *testing.T) {
	var o, e bytes.Buffer
	if err := run([]string{"diff", revA, revB}, &o, &e); err != nil {
		t.Fatalf("%v\n%s", err, e.String())
	}
	out := o.String()
	design, coil := strings.Index(out, "\nDesign as a whole\n"), strings.Index(out, "\nCoil \"Z pair\"\n")
	if design < 0 || coil < design {
		t.Fatalf("groups out of order:\n%s", out)
	}
	moment, turns := strings.Index(out, "magnetic moment |m|: 10.60 A·m² → 13.78 A·m²  (+30 %)"), strings.Index(out, "input coil: turns: 50 → 65")
	if moment < coil || turns < moment {
		t.Errorf("headline results not first in the coil's group:\n%s", out)
	}
	for _, want := range []string{
		"requirement field-center ≥ 500 µT: 449.6 µT FAIL → 584.5 µT PASS  (FAIL → PASS)",
		"winding temperature, hottest point: 40.82 °C → 44.00 °C  (+3.2 K)",
		"inductance: 4.143 mH → 6.709 mH",
		"input coil: length: 8.900 mm → 11.60 mm  (+30 %)",
		"input coil: turns: 50 → 65  (+30 %)",
	} {
		if !strings.Contains(out, want) {
			t.Errorf("diff lacks %q:\n%s", want, out)
		}
	}
	for _, bad := range []string{"mean-diameter", "spec_sha256", "_m2", "e-0"} {
		if strings.Contains(out, bad) {
			t.Errorf("diff shows %q:\n%s", bad, out)
		}
	}
	o.Reset()
	if err := run([]string{"diff", revB, revB}, &o, &e); err != nil || !strings.Contains(o.String(), "no change") {
		t.Errorf("a spec against itself: %v\n%s", err, o.String())
	}
}

// A requirement going from PASS to FAIL makes diff exit 1; the other way
// it exits 0.
func TestDiffExitStatus(t *testing.T) {
	var o, e bytes.Buffer
	if c := code(run([]string{"diff", revA, revB}, &o, &e)); c != 0 {
		t.Errorf("A → B (FAIL → PASS): exit %d, want 0", c)
	}
	if c := code(run([]string{"diff", revB, revA}, &o, &e)); c != 1 {
		t.Errorf("B → A (PASS → FAIL): exit %d, want 1", c)
	}
	if c := code(run([]string{"diff", revA}, &o, &e)); c != 2 {
		t.Errorf("one file: exit %d, want 2", c)
	}
}

func TestDiffJSON(t *testing.T) {
	var o, e bytes.Buffer
	c := code(run([]string{"diff", "--json", revB, revA}, &o, &e))
	var got diffJSON
	if err := json.Unmarshal(o.Bytes(), &got); err != nil {
		t.Fatalf("%v\n%s", err, o.String())
	}
	if c != 1 || !got.Regressed || got.From != "B" || got.To != "A" || len(got.Groups) != 2 || got.Groups[1].Coil != "Z pair" {
		t.Fatalf("exit %d, %+v", c, got)
	}
	for _, r := range got.Groups[1].Results {
		if r.Key == "winding_temperature_C" && (r.Unit != "K" || r.Relative != nil || !(r.Delta < 0)) {
			t.Errorf("temperature in JSON: %+v", r)
		}
		if r.Key == "field_center_T" && (r.Unit != "T" || r.Old < 5e-4 || r.New > 5e-4) {
			t.Errorf("field in JSON, want SI tesla: %+v", r)
		}
	}
}

// previous = path builds the changes section; previous = git:REV reads
// the spec from git, and outside a work tree it is a positioned error.
func TestPreviousRevision(t *testing.T) {
	dir := t.TempDir()
	a, _ := os.ReadFile(revA)
	b, _ := os.ReadFile(revB)
	os.WriteFile(filepath.Join(dir, "a.md"), a, 0o644)
	spec := strings.Replace(string(b), "previous      = revisions/survey-pair-a.md", "previous      = a.md", 1)
	os.WriteFile(filepath.Join(dir, "b.md"), []byte(spec), 0o644)
	st, err := load(filepath.Join(dir, "b.md"), &bytes.Buffer{})
	if err != nil || st.Changes == nil || st.Changes.From != "A" {
		t.Fatalf("previous = a.md: %v %+v", err, st)
	}

	gitSpec := strings.Replace(spec, "previous      = a.md", "previous      = git:HEAD", 1)
	os.WriteFile(filepath.Join(dir, "g.md"), []byte(gitSpec), 0o644)
	var e bytes.Buffer
	if _, err := load(filepath.Join(dir, "g.md"), &e); code(err) != 2 || !strings.Contains(e.String(), "g.md:25: previous: git:HEAD:") || !strings.Contains(e.String(), "not in a git work tree") {
		t.Errorf("git outside a work tree: %v\n%s", err, e.String())
	}

	if _, err := exec.LookPath("git"); err != nil {
		t.Skip("no git")
	}
	gitRun := func(args ...string) {
		t.Helper()
		cmd := exec.Command("git", append([]string{"-C", dir, "-c", "user.name=T", "-c", "user.email=t@example.invalid"}, args...)...)
		if out, err := cmd.CombinedOutput(); err != nil {
			t.Fatalf("git %v: %v\n%s", args, err, out)
		}
	}
	gitRun("init", "-q")
	os.WriteFile(filepath.Join(dir, "g.md"), a, 0o644)
	gitRun("add", "g.md")
	gitRun("commit", "-q", "-m", "A")
	os.WriteFile(filepath.Join(dir, "g.md"), []byte(gitSpec), 0o644)
	st, err = load(filepath.Join(dir, "g.md"), &e)
	if err != nil || st.Changes == nil || st.Changes.From != "A" || len(st.Changes.Groups) != 2 {
		t.Fatalf("previous = git:HEAD: %v\n%s", err, e.String())
	}
	e.Reset()
	bad := strings.Replace(gitSpec, "git:HEAD", "git:nosuchrev", 1)
	os.WriteFile(filepath.Join(dir, "g.md"), []byte(bad), 0o644)
	if _, err := load(filepath.Join(dir, "g.md"), &e); code(err) != 2 || !strings.Contains(e.String(), "g.md:25: previous: git show nosuchrev:g.md:") {
		t.Errorf("unknown revision: %v\n%s", err, e.String())
	}
}
