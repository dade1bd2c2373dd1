package main

import (
	"bytes"
	"errors"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"sync"
	"syscall"
	"testing"
	"time"

	"coilmemo/analysis"
)

// The regression tests of the command line run the built binary, as a
// user does: exit status, messages and the files left behind.

// binaryDir holds the binary, built once on first use (fuzzing workers,
// which run no CLI test, never build it).
var (
	buildOnce sync.Once
	binaryDir string
	binary    string
	buildErr  error
)

func TestMain(m *testing.M) {
	code := m.Run()
	if binaryDir != "" {
		os.RemoveAll(binaryDir)
	}
	os.Exit(code)
}

// builtBinary builds the command once with go build.
func builtBinary(t *testing.T) string {
	t.Helper()
	buildOnce.Do(func() {
		binaryDir, buildErr = os.MkdirTemp("", "coilmemo-cli-")
		if buildErr != nil {
			return
		}
		binary = filepath.Join(binaryDir, "coilmemo")
		if out, err := exec.Command("go", "build", "-o", binary, ".").CombinedOutput(); err != nil {
			buildErr = fmt.Errorf("go build: %v\n%s", err, out)
		}
	})
	if buildErr != nil {
		t.Fatal(buildErr)
	}
	return binary
}

// small is a sound spec that builds quickly.
const small = "# Small loop\n\n```coil\nform = loop\nmean-diameter = 80 mm\nturns = 10\nwire = AWG 30\ncurrent = 0.2 A\n```\n"

type result struct {
	code           int
	stdout, stderr string
}

// cli runs the binary in dir with args.
func cli(t *testing.T, dir string, args ...string) result {
	t.Helper()
	cmd := exec.Command(builtBinary(t), args...)
	cmd.Dir = dir
	cmd.Env = append(os.Environ(), "SOURCE_DATE_EPOCH=")
	var o, e bytes.Buffer
	cmd.Stdout, cmd.Stderr = &o, &e
	err := cmd.Run()
	r := result{stdout: o.String(), stderr: e.String()}
	var xe *exec.ExitError
	switch {
	case errors.As(err, &xe):
		r.code = xe.ExitCode()
	case err != nil:
		t.Fatalf("running %v: %v", args, err)
	}
	return r
}

// expect checks the exit status and that stderr holds each message.
func (r result) expect(t *testing.T, code int, msgs ...string) {
	t.Helper()
	if r.code != code {
		t.Errorf("exit status %d, want %d\nstdout: %s\nstderr: %s", r.code, code, r.stdout, r.stderr)
	}
	for _, m := range msgs {
		if !strings.Contains(r.stderr, m) {
			t.Errorf("stderr lacks %q:\n%s", m, r.stderr)
		}
	}
}

func write(t *testing.T, path, content string) {
	t.Helper()
	if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(path, []byte(content), 0o644); err != nil {
		t.Fatal(err)
	}
}

func isPDF(t *testing.T, path string) bool {
	t.Helper()
	b, err := os.ReadFile(path)
	return err == nil && bytes.HasPrefix(b, []byte("%PDF-"))
}

// noTemps fails when a temporary file is left in dir or below.
func noTemps(t *testing.T, dir string) {
	t.Helper()
	filepath.WalkDir(dir, func(p string, d os.DirEntry, err error) error {
		if err == nil && strings.HasPrefix(d.Name(), ".coilmemo-") {
			t.Errorf("temporary file left behind: %s", p)
		}
		return nil
	})
}

// files lists the names in dir.
func files(t *testing.T, dir string) []string {
	t.Helper()
	es, _ := os.ReadDir(dir)
	var names []string
	for _, e := range es {
		names = append(names, e.Name())
	}
	return names
}

func TestCLISameBaseNameIntoOneFolder(t *testing.T) {
	dir := t.TempDir()
	write(t, filepath.Join(dir, "a", "x.md"), small)
	write(t, filepath.Join(dir, "b", "x.md"), small)
	os.Mkdir(filepath.Join(dir, "out"), 0o755)
	cli(t, dir, "build", "a/x.md", "b/x.md", "-o", "out").
		expect(t, 2, "coilmemo: the memos of a/x.md and b/x.md would both be written to out/x.pdf; nothing written")
	if n := files(t, filepath.Join(dir, "out")); len(n) != 0 {
		t.Errorf("written: %v", n)
	}
}

func TestCLIOutputIsAnotherSpec(t *testing.T) {
	dir := t.TempDir()
	write(t, filepath.Join(dir, "a.md"), small)
	write(t, filepath.Join(dir, "out", "a.pdf"), small) // a spec that happens to end in .pdf
	cli(t, dir, "build", "a.md", "out/a.pdf", "-o", "out").
		expect(t, 2, "coilmemo: the memo of a.md would be written over the spec out/a.pdf")
	if b, _ := os.ReadFile(filepath.Join(dir, "out", "a.pdf")); string(b) != small {
		t.Error("the second spec was overwritten")
	}
	// the spec itself as the output, by another spelling of its path
	cli(t, dir, "build", "a.md", "-o", "./out/../a.md").
		expect(t, 2, "the memo of a.md would be written over the spec a.md; nothing written")
	if b, _ := os.ReadFile(filepath.Join(dir, "a.md")); string(b) != small {
		t.Error("the spec was overwritten")
	}
	// the same spec twice
	cli(t, dir, "build", "a.md", "./a.md", "-o", "out2").
		expect(t, 2, "./a.md is given twice (as argument 1 and 2)")
	if _, err := os.Stat(filepath.Join(dir, "out2")); err == nil {
		t.Error("the output folder was made")
	}
	noTemps(t, dir)
}

func TestCLIOutputFolderWithAndWithoutSlash(t *testing.T) {
	dir := t.TempDir()
	write(t, filepath.Join(dir, "a.md"), small)
	for _, c := range []struct{ o, want string }{
		{"existing", "existing/a.pdf"}, {"existing/", "existing/a.pdf"}, {"fresh/", "fresh/a.pdf"}, {"memo.pdf", "memo.pdf"},
	} {
		os.Mkdir(filepath.Join(dir, "existing"), 0o755)
		r := cli(t, dir, "build", "a.md", "-o", c.o)
		r.expect(t, 0)
		if !isPDF(t, filepath.Join(dir, c.want)) {
			t.Errorf("-o %s: no PDF at %s\n%s", c.o, c.want, r.stderr)
		}
		if !strings.Contains(r.stdout, "a.md → "+c.want) {
			t.Errorf("-o %s: stdout %q", c.o, r.stdout)
		}
	}
	noTemps(t, dir)
}

// Only regular files are replaced: a FIFO, a device, a folder and a link
// to any of them are usage errors and stay as they were.
func TestCLIOnlyRegularFilesReplaced(t *testing.T) {
	dir := t.TempDir()
	write(t, filepath.Join(dir, "a.md"), small)
	if err := syscall.Mkfifo(filepath.Join(dir, "fifo.pdf"), 0o644); err != nil {
		t.Fatal(err)
	}
	os.Symlink("/dev/null", filepath.Join(dir, "null.pdf"))
	os.MkdirAll(filepath.Join(dir, "out", "a.pdf"), 0o755)
	os.Symlink("out", filepath.Join(dir, "dirlink.pdf"))
	os.Symlink("nowhere", filepath.Join(dir, "dangling.pdf"))
	for _, c := range []struct{ o, msg string }{
		{"fifo.pdf", "coilmemo: the output fifo.pdf is a FIFO, not a regular file; nothing written"},
		{"/dev/null", "coilmemo: the output /dev/null is a device, not a regular file; nothing written"},
		{"null.pdf", "coilmemo: the output null.pdf links to a device, which is not a regular file"},
		{"out", "coilmemo: the output out/a.pdf is a folder, not a regular file"},
		{"dangling.pdf", "coilmemo: the output dangling.pdf is a link to nothing"},
		{"a.md/x.pdf", "coilmemo: the output a.md/x.pdf: a.md is not a folder"},
	} {
		cli(t, dir, "build", "a.md", "-o", c.o).expect(t, 2, c.msg)
	}
	if fi, err := os.Lstat(filepath.Join(dir, "fifo.pdf")); err != nil || fi.Mode()&os.ModeNamedPipe == 0 {
		t.Error("the FIFO was replaced")
	}
	if fi, err := os.Lstat(filepath.Join(dir, "null.pdf")); err != nil || fi.Mode()&os.ModeSymlink == 0 {
		t.Error("the link was replaced")
	}
	noTemps(t, dir)
	// A link to a regular file: the file linked to gets the memo, the
	// link stays.
	write(t, filepath.Join(dir, "real", "memo.pdf"), "old")
	os.Symlink("real/memo.pdf", filepath.Join(dir, "link.pdf"))
	cli(t, dir, "build", "a.md", "-o", "link.pdf").expect(t, 0)
	if fi, err := os.Lstat(filepath.Join(dir, "link.pdf")); err != nil || fi.Mode()&os.ModeSymlink == 0 {
		t.Error("the link to a regular file was replaced by a file")
	}
	if !isPDF(t, filepath.Join(dir, "real", "memo.pdf")) {
		t.Error("the file linked to did not get the memo")
	}
}

// Each spec is built on its own; the exit status is the worst.
func TestCLIEachSpecIndependent(t *testing.T) {
	dir := t.TempDir()
	write(t, filepath.Join(dir, "bad.md"), broken)
	write(t, filepath.Join(dir, "good.md"), small)
	failing := strings.Replace(small, "current = 0.2 A\n```\n", "current = 0.2 A\n```\n\n```limits\nmoment >= 5 A m2\n```\n", 1)
	write(t, filepath.Join(dir, "fails.md"), failing)
	r := cli(t, dir, "build", "bad.md", "missing.md", "good.md", "fails.md", "--strict", "-o", "out")
	r.expect(t, 2, "bad.md:5:", "bad.md: 3 problems; nothing written", "coilmemo: stat missing.md: no such file or directory")
	if !isPDF(t, filepath.Join(dir, "out", "good.pdf")) || !isPDF(t, filepath.Join(dir, "out", "fails.pdf")) {
		t.Errorf("the sound specs were not built: %v", files(t, filepath.Join(dir, "out")))
	}
	if _, err := os.Stat(filepath.Join(dir, "out", "bad.pdf")); err == nil {
		t.Error("a memo was written for the broken spec")
	}
	want := "good.md → out/good.pdf"
	if !strings.HasPrefix(r.stdout, want) || !strings.Contains(r.stdout, "fails.md → out/fails.pdf") || !strings.Contains(r.stdout, "(1 requirement FAILED)") {
		t.Errorf("stdout:\n%s", r.stdout)
	}
	// the messages keep the order of the specs
	if i, j := strings.Index(r.stderr, "bad.md:5:"), strings.Index(r.stderr, "missing.md"); i < 0 || j < i {
		t.Errorf("messages out of order:\n%s", r.stderr)
	}
	// without the bad ones, --strict and a failed requirement exit 1
	cli(t, dir, "build", "good.md", "fails.md", "--strict", "-o", "out").expect(t, 1, "--strict: a requirement or check failed")
	cli(t, dir, "build", "good.md", "fails.md", "-o", "out").expect(t, 0)
	noTemps(t, dir)
}

// A render failure (a bug) of one spec does not stop the others and makes
// the exit status 1; a panic is caught the same way.
func TestBuildRenderFailureOfOne(t *testing.T) {
	dir := t.TempDir()
	write(t, filepath.Join(dir, "a.md"), small)
	write(t, filepath.Join(dir, "boom.md"), small)
	write(t, filepath.Join(dir, "panic.md"), small)
	write(t, filepath.Join(dir, "z.md"), small)
	defer func(f func(*analysis.Study, bool) ([]byte, error)) { renderPDF = f }(renderPDF)
	real := renderPDF
	renderPDF = func(st *analysis.Study, onePass bool) ([]byte, error) {
		switch st.Name {
		case "boom.md":
			return nil, errors.New("injected failure")
		case "panic.md":
			panic("injected panic")
		}
		return real(st, onePass)
	}
	var o, e bytes.Buffer
	err := run([]string{"build", filepath.Join(dir, "a.md"), filepath.Join(dir, "boom.md"), filepath.Join(dir, "panic.md"), filepath.Join(dir, "z.md")}, &o, &e)
	if code(err) != 1 {
		t.Errorf("exit %d, want 1", code(err))
	}
	for _, m := range []string{"boom.md: internal error rendering the memo: injected failure; nothing written", "panic.md: internal error: injected panic; nothing written"} {
		if !strings.Contains(e.String(), m) {
			t.Errorf("stderr lacks %q:\n%s", m, e.String())
		}
	}
	if !isPDF(t, filepath.Join(dir, "a.pdf")) || !isPDF(t, filepath.Join(dir, "z.pdf")) {
		t.Error("the other specs were not built")
	}
	for _, n := range []string{"boom.pdf", "panic.pdf"} {
		if _, err := os.Stat(filepath.Join(dir, n)); err == nil {
			t.Errorf("%s written", n)
		}
	}
	noTemps(t, dir)
}

// A full disk while writing: exit 2 with the cause, the previous memo
// intact, no temporary file left.
func TestBuildFullDisk(t *testing.T) {
	dir := t.TempDir()
	write(t, filepath.Join(dir, "a.md"), small)
	write(t, filepath.Join(dir, "a.pdf"), "previous memo")
	defer func(f func(*os.File, []byte) error) { writeData = f }(writeData)
	writeData = func(f *os.File, b []byte) error {
		f.Write(b[:len(b)/2])
		return &os.PathError{Op: "write", Path: f.Name(), Err: syscall.ENOSPC}
	}
	var o, e bytes.Buffer
	err := run([]string{"build", filepath.Join(dir, "a.md")}, &o, &e)
	if code(err) != 2 || !strings.Contains(e.String(), "cannot write "+filepath.Join(dir, "a.pdf")+": no space left on device; nothing written") {
		t.Errorf("exit %d\n%s", code(err), e.String())
	}
	if strings.Contains(e.String(), ".coilmemo-") {
		t.Errorf("the message names the temporary file: %s", e.String())
	}
	if b, _ := os.ReadFile(filepath.Join(dir, "a.pdf")); string(b) != "previous memo" {
		t.Error("the previous memo was touched")
	}
	noTemps(t, dir)

	// new on a full disk: no file, not even an empty one
	e.Reset()
	err = run([]string{"new", filepath.Join(dir, "s.md")}, &o, &e)
	if code(err) != 2 || !strings.Contains(err.Error(), "no space left on device; nothing written") {
		t.Errorf("new: exit %d, %v", code(err), err)
	}
	if _, err := os.Stat(filepath.Join(dir, "s.md")); err == nil {
		t.Error("new left a file on a full disk")
	}
	noTemps(t, dir)
}

// new to a full standard output (/dev/full) exits 2.
func TestCLINewFullDevice(t *testing.T) {
	f, err := os.OpenFile("/dev/full", os.O_WRONLY, 0)
	if err != nil {
		t.Skip("no /dev/full:", err)
	}
	defer f.Close()
	cmd := exec.Command(builtBinary(t), "new")
	cmd.Stdout = f
	var e bytes.Buffer
	cmd.Stderr = &e
	err = cmd.Run()
	var xe *exec.ExitError
	if !errors.As(err, &xe) || xe.ExitCode() != 2 || !strings.Contains(e.String(), "no space left on device") {
		t.Errorf("new > /dev/full: %v\n%s", err, e.String())
	}
	// new FILE into a folder that is not one: exit 2, nothing written
	dir := t.TempDir()
	write(t, filepath.Join(dir, "f"), "x")
	cli(t, dir, "new", "f/s.md").expect(t, 2, "coilmemo: cannot write f/s.md: not a directory; nothing written")
	write(t, filepath.Join(dir, "s.md"), "mine")
	cli(t, dir, "new", "s.md").expect(t, 2, "coilmemo: s.md exists; not overwritten")
	if b, _ := os.ReadFile(filepath.Join(dir, "s.md")); string(b) != "mine" {
		t.Error("new overwrote a file")
	}
}

// Bad paths and permissions are exit status 2, never 1.
func TestCLIBadPathsExit2(t *testing.T) {
	dir := t.TempDir()
	write(t, filepath.Join(dir, "a.md"), small)
	cli(t, dir, "build", "a.md", "-o", "/proc/coilmemo-no-such/a.pdf").expect(t, 2, "coilmemo: cannot write /proc/coilmemo-no-such/a.pdf:")
	cli(t, dir, "build", "nope.md").expect(t, 2, "coilmemo: stat nope.md: no such file or directory")
	cli(t, dir, "build", "a.md", "-o", "a.md/").expect(t, 2, "a.md is not a folder")
	cli(t, dir, "build", "a.md", "a.md", "-o", "a.md").expect(t, 2)
	cli(t, dir, "calc", ".").expect(t, 2, "coilmemo: . is not a regular file")
	noTemps(t, dir)
}

// Temporary files are removed on SIGINT and SIGTERM, and the exit status
// is 128 + the signal.
func TestCLISignalLeavesNoTemp(t *testing.T) {
	dir := t.TempDir()
	var args []string
	for i := range 8 {
		n := fmt.Sprintf("s%d.md", i)
		write(t, filepath.Join(dir, n), small)
		args = append(args, n)
	}
	for _, sig := range []syscall.Signal{syscall.SIGINT, syscall.SIGTERM} {
		cmd := exec.Command(builtBinary(t), append([]string{"build", "-o", "out"}, args...)...)
		cmd.Dir = dir
		var e bytes.Buffer
		cmd.Stderr = &e
		if err := cmd.Start(); err != nil {
			t.Fatal(err)
		}
		time.Sleep(300 * time.Millisecond)
		cmd.Process.Signal(sig)
		err := cmd.Wait()
		var xe *exec.ExitError
		if errors.As(err, &xe) {
			if xe.ExitCode() != 128+int(sig) || !strings.Contains(e.String(), "stopped, no partial file left") {
				t.Errorf("%v: exit %d\n%s", sig, xe.ExitCode(), e.String())
			}
		} // else it finished before the signal
		noTemps(t, dir)
		for _, n := range files(t, filepath.Join(dir, "out")) {
			if !isPDF(t, filepath.Join(dir, "out", n)) {
				t.Errorf("%v: a partial file %s", sig, n)
			}
		}
	}
}

// removeTemps (what a signal runs) removes the temporary files being
// written and refuses new ones.
func TestRemoveTemps(t *testing.T) {
	dir := t.TempDir()
	f, err := createTemp(dir)
	if err != nil {
		t.Fatal(err)
	}
	f.Close()
	defer func() { temps.Lock(); temps.closing = false; temps.Unlock() }()
	removeTemps()
	if _, err := os.Stat(f.Name()); err == nil {
		t.Error("the temporary file is still there")
	}
	if _, err := createTemp(dir); !errors.Is(err, errInterrupted) {
		t.Errorf("a temporary file was made after the signal: %v", err)
	}
	if err := writeAtomic(filepath.Join(dir, "x.pdf"), []byte("x")); err == nil {
		t.Error("writeAtomic wrote after the signal")
	}
	noTemps(t, dir)
}

// A batch is built in parallel with the messages in the order of the
// specs, the same as a build on one processor, and the same memos.
func TestCLIParallelDeterministic(t *testing.T) {
	dir := t.TempDir()
	names := []string{"torque-coil", "calibration-pair", "search-coil", "panel-coil"}
	var args []string
	for _, n := range names {
		src, err := os.ReadFile("../../examples/" + n + ".md")
		if err != nil {
			t.Fatal(err)
		}
		write(t, filepath.Join(dir, n+".md"), string(src))
		args = append(args, n+".md")
	}
	serial := exec.Command(builtBinary(t), append([]string{"build", "-o", "serial"}, args...)...)
	serial.Dir = dir
	serial.Env = append(os.Environ(), "GOMAXPROCS=1")
	so, err := serial.Output()
	if err != nil {
		t.Fatal(err)
	}
	r := cli(t, dir, append([]string{"build", "-o", "parallel"}, args...)...)
	r.expect(t, 0)
	if strings.ReplaceAll(string(so), "serial/", "") != strings.ReplaceAll(r.stdout, "parallel/", "") {
		t.Errorf("serial:\n%s\nparallel:\n%s", so, r.stdout)
	}
	lines := strings.Split(strings.TrimSpace(r.stdout), "\n")
	for i, n := range names {
		if i >= len(lines) || !strings.HasPrefix(lines[i], n+".md → parallel/"+n+".pdf") {
			t.Errorf("line %d: %q, want %s first", i, lines, n)
		}
		a, _ := os.ReadFile(filepath.Join(dir, "serial", n+".pdf"))
		b, _ := os.ReadFile(filepath.Join(dir, "parallel", n+".pdf"))
		if len(a) == 0 || !bytes.Equal(a, b) {
			t.Errorf("%s: the serial and parallel memos differ", n)
		}
	}
}

// Issue 15's command-line habits.
func TestCLIHabits(t *testing.T) {
	dir := t.TempDir()
	for _, cmd := range []string{"build", "calc", "diff", "watch", "new", "help"} {
		for _, h := range []string{"--help", "-h"} {
			r := cli(t, dir, cmd, h)
			r.expect(t, 0)
			if n := strings.Count(r.stdout, "Usage: coilmemo "+cmd); n != 1 {
				t.Errorf("%s %s: help printed %d times:\n%s", cmd, h, n, r.stdout)
			}
		}
		r := cli(t, dir, "help", cmd)
		if r.code != 0 || strings.Count(r.stdout, "Usage: coilmemo "+cmd) != 1 {
			t.Errorf("help %s: exit %d\n%s", cmd, r.code, r.stdout)
		}
	}
	cli(t, dir, "bild").expect(t, 2, `coilmemo: unknown command "bild"; did you mean "build"?`)
	cli(t, dir, "wach", "x.md").expect(t, 2, `did you mean "watch"?`)
	cli(t, dir, "frobnicate").expect(t, 2, `coilmemo: unknown command "frobnicate"`)
	if r := cli(t, dir, "frobnicate"); strings.Contains(r.stderr, "did you mean") {
		t.Errorf("a far name got a suggestion: %s", r.stderr)
	}
	cli(t, dir, "help", "bulid").expect(t, 2, `no help for "bulid"; did you mean "build"?`)
	cli(t, dir, "calc", "--jsn", "x.md").expect(t, 2, "coilmemo: calc has no option --jsn; did you mean --json?")
	cli(t, dir, "build", "--strct", "x.md").expect(t, 2, "coilmemo: build has no option --strct")
	cli(t, dir, "build", "--strct", "x.md").expect(t, 2, "did you mean --strict?")
	r := cli(t, dir, "calc", "--jsn", "x.md")
	if r.stdout != "" {
		t.Errorf("a flag error printed the help:\n%s", r.stdout)
	}

	// unit suggestions stay within the wanted dimension; the hour is a time
	spec := strings.Replace(small, "current = 0.2 A\n", "current = 0.2 A\nduty = 50 %\non-time = 2 h\n", 1)
	write(t, filepath.Join(dir, "h.md"), spec)
	cli(t, dir, "calc", "h.md").expect(t, 0, "")
	write(t, filepath.Join(dir, "v.md"), strings.Replace(spec, "on-time = 2 h", "on-time = 2 v", 1))
	r = cli(t, dir, "calc", "v.md")
	r.expect(t, 2, `v.md:10: on-time: unknown unit "v"; want a time (s)`)
	if strings.Contains(r.stderr, `"V"`) {
		t.Errorf("a time was told about the volt: %s", r.stderr)
	}

	// watch on a missing file is a usage error, at once
	start := time.Now()
	cli(t, dir, "watch", "missing.md").expect(t, 2, "coilmemo: stat missing.md: no such file or directory")
	if d := time.Since(start); d > 5*time.Second {
		t.Errorf("watch on a missing file took %v", d)
	}
	cli(t, dir, "watch", dir).expect(t, 2, "is not a regular file")
}

// new writes a starter with every block; building it unfilled warns about
// each placeholder on the terminal, and the starter builds.
func TestCLINewStarter(t *testing.T) {
	dir := t.TempDir()
	r := cli(t, dir, "new", "s.md")
	r.expect(t, 0)
	src, err := os.ReadFile(filepath.Join(dir, "s.md"))
	if err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{"```memo\n", "```coil\n", "```conditions\n", "```limits\n", "```probes\n",
		"```sweep\n", "```tolerances\n", "\nhistory ", "\nduty ", "\non-time "} {
		if !strings.Contains(string(src), want) {
			t.Errorf("the starter lacks %q", want)
		}
	}
	r = cli(t, dir, "build", "s.md")
	r.expect(t, 0, "s.md:9: warning: the placeholder <client> is not filled in", "s.md:1: warning: the placeholder <Coil name> is not filled in")
	if !isPDF(t, filepath.Join(dir, "s.pdf")) {
		t.Error("the starter did not build")
	}
	filled := placeholderRE.ReplaceAllString(string(src), "Filled")
	write(t, filepath.Join(dir, "f.md"), filled)
	if r := cli(t, dir, "calc", "f.md"); r.code != 0 || strings.Contains(r.stderr, "warning") {
		t.Errorf("a filled-in spec warns: exit %d\n%s", r.code, r.stderr)
	}
}

// A folder without write permission: exit 2 naming the output and the
// cause, nothing written. (As root, the binary is run as nobody.)
func TestCLIPermissionDenied(t *testing.T) {
	bin := builtBinary(t)
	var prefix []string
	if os.Geteuid() == 0 {
		sp, err := exec.LookPath("setpriv")
		if err != nil {
			t.Skip("root, and no setpriv to drop privileges")
		}
		prefix = []string{sp, "--reuid=65534", "--regid=65534", "--clear-groups"}
		os.Chmod(binaryDir, 0o755)
	}
	dir := t.TempDir()
	os.Chmod(dir, 0o755)
	write(t, filepath.Join(dir, "a.md"), small)
	os.Chmod(filepath.Join(dir, "a.md"), 0o644)
	ro := filepath.Join(dir, "ro")
	os.Mkdir(ro, 0o755)
	write(t, filepath.Join(ro, "a.pdf"), "previous")
	os.Chmod(ro, 0o555)
	defer os.Chmod(ro, 0o755)
	args := append(prefix, bin, "build", "a.md", "-o", "ro/a.pdf")
	cmd := exec.Command(args[0], args[1:]...)
	cmd.Dir = dir
	var e bytes.Buffer
	cmd.Stderr = &e
	err := cmd.Run()
	var xe *exec.ExitError
	if !errors.As(err, &xe) || xe.ExitCode() != 2 || !strings.Contains(e.String(), "coilmemo: cannot write ro/a.pdf: permission denied; nothing written") {
		t.Errorf("%v\n%s", err, e.String())
	}
	if b, _ := os.ReadFile(filepath.Join(ro, "a.pdf")); string(b) != "previous" {
		t.Error("the previous memo was replaced")
	}
	noTemps(t, dir)
}
