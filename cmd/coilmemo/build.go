package main

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"runtime"
	"runtime/debug"
	"strings"
	"syscall"

	"coilmemo/analysis"
	"coilmemo/format"
	"coilmemo/memo"
)

const buildHelp = `Usage: coilmemo build SPEC... [-o OUT] [--strict]

Write the PDF calculation memo of each spec. Without -o the memo goes next
to the spec with the extension .pdf (coil.md -> coil.pdf). With one spec,
-o names the output file, or a folder when OUT is an existing folder or
ends in a slash; with several, -o names a folder (created if need be).

Before anything is built the outputs are checked: two specs whose memos
would land on the same file, a memo that would land on one of the specs,
and an output that exists but is not a regular file (a folder, a device,
a FIFO, or a link to one) are usage errors, and nothing is written.

Several specs are built in parallel, one per processor; the messages come
in the order the specs were given. Each spec is built on its own: one with
problems does not stop the others. A spec with problems is reported as
file:line: message, every problem at once, and no file is written or
overwritten for it. A memo is written to a temporary file beside its
target, synced to disk and renamed into place, so an interrupted or failed
build never leaves a half-written memo.

Exit status: the worst over the specs — 1 for an internal failure; else 2
when any spec had problems or an output could not be written; else 1 with
--strict when a requirement or check failed; else 0.

Options:
  -o OUT     output file (one spec) or folder
  --strict   exit with status 1 when a requirement in the limits block fails
             or a verification check fails (the memo is still written)
`

// Outcomes of one spec's build, in rising order of severity.
const (
	builtOK     = iota
	builtFailed // written, but a requirement or check failed
	builtBad    // bad input, bad path or permission: exit status 2
	builtBug    // an internal failure: exit status 1
)

// renderPDF renders a memo, in one layout pass when onePass (the same
// bytes; see memo.PDFOnePass); a variable so that tests can stand in a
// failing renderer.
var renderPDF = func(st *analysis.Study, onePass bool) ([]byte, error) {
	if onePass {
		return memo.PDFOnePass(st)
	}
	return memo.PDF(st)
}

// buildJob is one spec of a batch: its target and, once built, its
// messages and outcome.
type buildJob struct {
	spec, target string // target: where the memo is written (a link resolved)
	shown        string // the target as the user named it
	stdout       bytes.Buffer
	stderr       bytes.Buffer
	outcome      int
	done         chan struct{}
	// onePass: render without the layout pass that lets figures be drawn
	// ahead on another core — when other specs of the batch, or a single
	// core, leave no core free for it.
	onePass bool
}

func build(args []string, stdout, stderr io.Writer) error {
	fs := newFlagSet("build", buildHelp, stdout)
	out := fs.String("o", "", "output file or folder")
	strict := fs.Bool("strict", false, "exit 1 on a failed requirement")
	specs, err := parseInterleaved(fs, args)
	if err != nil {
		return flagErr(err, buildHelp, stdout)
	}
	if len(specs) == 0 {
		return usageErr("build needs at least one spec file")
	}
	if _, _, err := sourceDateEpoch(os.Getenv("SOURCE_DATE_EPOCH")); err != nil {
		return err
	}
	jobs, problems := planOutputs(specs, *out)
	if len(problems) > 0 {
		for _, p := range problems[:len(problems)-1] {
			fmt.Fprintln(stderr, "coilmemo: "+p)
		}
		return usageErr("%s; nothing written", problems[len(problems)-1])
	}
	runJobs(jobs, runtime.GOMAXPROCS(0))
	worst := builtOK
	for _, j := range jobs {
		<-j.done
		stdout.Write(j.stdout.Bytes())
		stderr.Write(j.stderr.Bytes())
		worst = max(worst, j.outcome)
	}
	switch {
	case worst == builtBug:
		return &exitError{code: 1}
	case worst == builtBad:
		return &exitError{code: 2}
	case *strict && worst == builtFailed:
		return &exitError{1, "coilmemo: --strict: a requirement or check failed"}
	}
	return nil
}

// runJobs builds the jobs on at most n goroutines at once, starting them in
// order; each job's done channel is closed when it has finished.
func runJobs(jobs []*buildJob, n int) {
	for _, j := range jobs {
		j.onePass = len(jobs) > 1 || n < 2
	}
	sem := make(chan struct{}, max(1, n))
	go func() {
		for _, j := range jobs {
			sem <- struct{}{}
			go func() {
				defer func() { <-sem }()
				buildOne(j)
			}()
		}
	}()
}

// buildOne reads, evaluates, renders and writes one spec, recording its
// messages and outcome in the job. A panic is an internal failure of this
// spec alone.
func buildOne(j *buildJob) {
	defer close(j.done)
	defer func() {
		if r := recover(); r != nil {
			fmt.Fprintf(&j.stderr, "coilmemo: %s: internal error: %v; nothing written\n%s", j.spec, r, debug.Stack())
			j.outcome = builtBug
		}
	}()
	memo.WarmPDF() // the PDF writer's faces on another core while the spec is analysed
	job, err := load(j.spec, &j.stderr)
	if err != nil {
		var ee *exitError
		if errors.As(err, &ee) && ee.code == 2 {
			fmt.Fprintln(&j.stderr, ee.msg)
			j.outcome = builtBad
			return
		}
		fmt.Fprintf(&j.stderr, "coilmemo: %s: %v\n", j.spec, err)
		j.outcome = builtBug
		return
	}
	b, err := renderPDF(job, j.onePass)
	if err != nil {
		fmt.Fprintf(&j.stderr, "coilmemo: %s: internal error rendering the memo: %v; nothing written\n", j.spec, err)
		j.outcome = builtBug
		return
	}
	if err := writeAtomic(j.target, b); err != nil {
		fmt.Fprintf(&j.stderr, "coilmemo: cannot write %s: %s; nothing written\n", j.shown, reason(err))
		j.outcome = builtBad
		return
	}
	lf, cf := job.Failed()
	note := ""
	if lf+cf > 0 {
		j.outcome = builtFailed
		var failed []string
		if lf > 0 {
			failed = append(failed, format.Count(lf, "requirement", "requirements"))
		}
		if cf > 0 {
			failed = append(failed, format.Count(cf, "verification check", "verification checks"))
		}
		note = " (" + strings.Join(failed, " and ") + " FAILED)"
	}
	fmt.Fprintf(&j.stdout, "%s → %s, %d bytes%s\n", j.spec, j.shown, len(b), note)
}

// planOutputs decides where each spec's memo goes and checks the plan
// before anything is built: every target distinct, none of them a spec
// of the batch, none an existing file that is not a regular file, and the
// target's folder a folder. It returns one job per spec, or the problems.
func planOutputs(specs []string, out string) ([]*buildJob, []string) {
	var problems []string
	intoDir := len(specs) > 1 || strings.HasSuffix(out, "/") || strings.HasSuffix(out, string(filepath.Separator))
	if out != "" && !intoDir {
		if fi, err := os.Stat(out); err == nil && fi.IsDir() {
			intoDir = true
		}
	}
	if out != "" && intoDir {
		if fi, err := os.Stat(out); err == nil && !fi.IsDir() {
			return nil, []string{fmt.Sprintf("-o %s: with several specs -o names a folder, and %s is not a folder", out, out)}
		}
	}
	jobs := make([]*buildJob, len(specs))
	byTarget := map[string]int{}
	bySpec := map[string]int{}
	for i, sp := range specs {
		if k, ok := bySpec[canonical(sp)]; ok {
			problems = append(problems, fmt.Sprintf("%s is given twice (as argument %d and %d)", sp, k+1, i+1))
		} else {
			bySpec[canonical(sp)] = i
		}
	}
	for i, sp := range specs {
		shown := outputPath(sp, out, intoDir)
		target, problem := checkTarget(shown)
		jobs[i] = &buildJob{spec: sp, target: target, shown: shown, done: make(chan struct{})}
		if problem != "" {
			problems = append(problems, problem)
			continue
		}
		key := canonical(target)
		if k, ok := byTarget[key]; ok && specs[k] != sp {
			problems = append(problems, fmt.Sprintf("the memos of %s and %s would both be written to %s", specs[k], sp, shown))
		} else {
			byTarget[key] = i
		}
		for _, other := range specs {
			if canonical(other) == key || sameFile(other, target) {
				problems = append(problems, fmt.Sprintf("the memo of %s would be written over the spec %s", sp, other))
				break
			}
		}
	}
	return jobs, problems
}

// checkTarget checks that path may receive a memo: it does not exist, or is
// a regular file, or a link to one (then the file linked to is the
// target, and the link stays); and its folder is, or can be made, a
// folder. It returns the path to write, or a problem.
func checkTarget(path string) (string, string) {
	fi, err := os.Lstat(path)
	switch {
	case err == nil && fi.Mode()&fs.ModeSymlink != 0:
		real, err := filepath.EvalSymlinks(path)
		if err != nil {
			return path, fmt.Sprintf("the output %s is a link to nothing", path)
		}
		rfi, err := os.Stat(real)
		if err != nil || !rfi.Mode().IsRegular() {
			return path, fmt.Sprintf("the output %s links to %s, which is not a regular file", path, kindOf(rfi))
		}
		return real, ""
	case err == nil && !fi.Mode().IsRegular():
		return path, fmt.Sprintf("the output %s is %s, not a regular file", path, kindOf(fi))
	case err != nil && !errors.Is(err, fs.ErrNotExist) && !errors.Is(err, syscall.ENOTDIR):
		return path, fmt.Sprintf("the output %s: %s", path, reason(err))
	}
	// The nearest existing ancestor of the folder must be a folder.
	for dir := filepath.Dir(path); ; {
		fi, err := os.Stat(dir)
		if err == nil {
			if !fi.IsDir() {
				return path, fmt.Sprintf("the output %s: %s is not a folder", path, dir)
			}
			break
		}
		if !errors.Is(err, fs.ErrNotExist) {
			return path, fmt.Sprintf("the output %s: %s", path, reason(err))
		}
		up := filepath.Dir(dir)
		if up == dir {
			break
		}
		dir = up
	}
	return path, ""
}

// kindOf names a file's type for messages.
func kindOf(fi os.FileInfo) string {
	if fi == nil {
		return "missing"
	}
	m := fi.Mode()
	switch {
	case m.IsDir():
		return "a folder"
	case m&fs.ModeNamedPipe != 0:
		return "a FIFO"
	case m&fs.ModeSocket != 0:
		return "a socket"
	case m&fs.ModeDevice != 0:
		return "a device"
	case m.IsRegular():
		return "a regular file"
	}
	return "a special file"
}

// canonical is a path made absolute and clean, with the links in its
// folder resolved, for comparing outputs and specs.
func canonical(p string) string {
	abs, err := filepath.Abs(p)
	if err != nil {
		return filepath.Clean(p)
	}
	dir, base := filepath.Split(abs)
	if real, err := filepath.EvalSymlinks(dir); err == nil {
		return filepath.Join(real, base)
	}
	return abs
}

// outputPath is where a spec's memo goes: beside the spec, into the folder
// out, or out itself.
func outputPath(spec, out string, intoDir bool) string {
	base := strings.TrimSuffix(filepath.Base(spec), filepath.Ext(spec)) + ".pdf"
	switch {
	case out == "":
		return filepath.Join(filepath.Dir(spec), base)
	case intoDir:
		return filepath.Join(out, base)
	}
	return out
}

// sameFile reports whether two paths name the same existing file.
func sameFile(a, b string) bool {
	fa, errA := os.Stat(a)
	fb, errB := os.Stat(b)
	return errA == nil && errB == nil && os.SameFile(fa, fb)
}
