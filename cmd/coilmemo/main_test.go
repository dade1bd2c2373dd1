package main

import (
	"bytes"
	"encoding/json"
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"
)

func code(err error) int {
	if err == nil {
		return 0
	}
	var ee *exitError
	if errors.As(err, &ee) {
		return ee.code
	}
	return 1
}

const broken = "# Broken\n\n```coil\nform = loop\nmean-diamter = 80 mm\nturns = 10\nwire = AWG 30\ncurrent = 2 mm\n```\n"

// A broken spec: every problem reported as file:line, exit 2, and the
// existing output file is neither written nor overwritten.
func TestBuildBrokenSpecWritesNothing(t *testing.T) {
	dir := t.TempDir()
	spec := filepath.Join(dir, "bad.md")
	os.WriteFile(spec, []byte(broken), 0o644)
	out := filepath.Join(dir, "bad.pdf")
	os.WriteFile(out, []byte("previous memo"), 0o644)
	var stdout, stderr bytes.Buffer
	err := run([]string{"build", spec}, &stdout, &stderr)
	if code(err) != 2 {
		t.Fatalf("exit status %d, want 2 (err %v)", code(err), err)
	}
	msg := stderr.String()
	for _, want := range []string{spec + ":5:", "mean-diameter", spec + ":8:"} {
		if !strings.Contains(msg, want) {
			t.Errorf("stderr lacks %q:\n%s", want, msg)
		}
	}
	if b, _ := os.ReadFile(out); string(b) != "previous memo" {
		t.Error("the previous output was overwritten")
	}
	entries, _ := os.ReadDir(dir)
	if len(entries) != 2 {
		t.Errorf("stray files left in the output directory: %v", entries)
	}
}

func TestBuildWritesPDF(t *testing.T) {
	out := filepath.Join(t.TempDir(), "memo.pdf")
	var stdout, stderr bytes.Buffer
	if err := run([]string{"build", "../../examples/torque-coil.md", "-o", out}, &stdout, &stderr); err != nil {
		t.Fatalf("%v\n%s", err, stderr.String())
	}
	b, err := os.ReadFile(out)
	if err != nil || !bytes.HasPrefix(b, []byte("%PDF-")) {
		t.Fatalf("no PDF written: %v", err)
	}
}

// calc --json carries the documented contract keys.
func TestCalcJSONKeys(t *testing.T) {
	var stdout, stderr bytes.Buffer
	if err := run([]string{"calc", "--json", "../../examples/torque-coil.md"}, &stdout, &stderr); err != nil {
		t.Fatalf("%v\n%s", err, stderr.String())
	}
	var got map[string]any
	if err := json.Unmarshal(stdout.Bytes(), &got); err != nil {
		t.Fatal(err)
	}
	for _, k := range []string{"coils", "field_center_T", "probes", "torque_max_N_m", "limits", "checks"} {
		if _, ok := got[k]; !ok {
			t.Errorf("JSON lacks %q", k)
		}
	}
	coil := got["coils"].([]any)[0].(map[string]any)
	for _, k := range []string{"name", "moment_A_m2", "resistance_20C_ohm", "resistance_hot_ohm", "current_A",
		"voltage_V", "power_W", "wire_length_m", "inductance_H", "winding_temperature_C", "field_center_T"} {
		if _, ok := coil[k]; !ok {
			t.Errorf("coil JSON lacks %q", k)
		}
	}
	probe := got["probes"].([]any)[0].(map[string]any)
	for _, k := range []string{"name", "at_m", "B_T"} {
		if _, ok := probe[k]; !ok {
			t.Errorf("probe JSON lacks %q", k)
		}
	}
	limit := got["limits"].([]any)[0].(map[string]any)
	for _, k := range []string{"quantity", "relation", "required", "computed", "unit", "pass"} {
		if _, ok := limit[k]; !ok {
			t.Errorf("limit JSON lacks %q", k)
		}
	}
}

// A failed requirement exits 1 only with --strict.
func TestStrict(t *testing.T) {
	src, _ := os.ReadFile("../../examples/torque-coil.md")
	failing := strings.Replace(string(src), "moment      >= 0.15 A m2", "moment      >= 5 A m2", 1)
	if failing == string(src) {
		t.Fatal("example changed: the moment limit line was not found")
	}
	spec := filepath.Join(t.TempDir(), "f.md")
	os.WriteFile(spec, []byte(failing), 0o644)
	var o, e bytes.Buffer
	if err := run([]string{"calc", spec}, &o, &e); code(err) != 0 {
		t.Errorf("without --strict: exit %d", code(err))
	}
	if !strings.Contains(o.String(), "FAIL") {
		t.Errorf("summary does not show the failed requirement:\n%s", o.String())
	}
	if err := run([]string{"calc", "--strict", spec}, &o, &e); code(err) != 1 {
		t.Errorf("with --strict: exit %d, want 1", code(err))
	}
}

func TestUsage(t *testing.T) {
	var o, e bytes.Buffer
	if c := code(run(nil, &o, &e)); c != 2 {
		t.Errorf("no arguments: exit %d, want 2", c)
	}
	if c := code(run([]string{"frobnicate"}, &o, &e)); c != 2 {
		t.Errorf("unknown command: exit %d, want 2", c)
	}
	for _, cmd := range []string{"build", "calc"} {
		o.Reset()
		if err := run([]string{cmd, "--help"}, &o, &e); err != nil || !strings.Contains(o.String(), "Usage: coilmemo "+cmd) {
			t.Errorf("%s --help: %v\n%s", cmd, err, o.String())
		}
	}
	if c := code(run([]string{"calc"}, &o, &e)); c != 2 {
		t.Errorf("calc without a spec: exit %d, want 2", c)
	}
	if c := code(run([]string{"build", "no-such-file.md"}, &o, &e)); c != 2 {
		t.Errorf("missing spec file: exit %d, want 2", c)
	}
}

// The starter spec is a sound spec whose requirements are met, and new
// never overwrites a file.
func TestNew(t *testing.T) {
	path := filepath.Join(t.TempDir(), "s.md")
	var o, e bytes.Buffer
	if err := run([]string{"new", path}, &o, &e); err != nil {
		t.Fatal(err)
	}
	o.Reset()
	if err := run([]string{"calc", "--strict", path}, &o, &e); err != nil {
		t.Fatalf("starter spec: %v\n%s", err, e.String())
	}
	if c := code(run([]string{"new", path}, &o, &e)); c != 2 {
		t.Errorf("new over an existing file: exit %d, want 2", c)
	}
}

// watch builds at once and stops when told.
func TestWatchBuildsOnce(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "w.md")
	src, _ := os.ReadFile("../../examples/torque-coil.md")
	os.WriteFile(path, src, 0o644)
	stop := make(chan struct{})
	close(stop)
	var o, e bytes.Buffer
	if err := watch(path, "", &o, &e, time.Millisecond, stop); err != nil {
		t.Fatal(err)
	}
	if _, err := os.Stat(filepath.Join(dir, "w.pdf")); err != nil {
		t.Fatalf("no memo built: %v\n%s", err, o.String())
	}
}

// -o naming the spec itself is refused rather than overwriting the spec.
func TestBuildRefusesToOverwriteSpec(t *testing.T) {
	spec := filepath.Join(t.TempDir(), "s.md")
	src, _ := os.ReadFile("../../examples/torque-coil.md")
	os.WriteFile(spec, src, 0o644)
	var o, e bytes.Buffer
	if c := code(run([]string{"build", spec, "-o", spec}, &o, &e)); c != 2 {
		t.Errorf("exit %d, want 2", c)
	}
	if b, _ := os.ReadFile(spec); !bytes.Equal(b, src) {
		t.Error("the spec was overwritten")
	}
}
