// Command coilmemo turns a Markdown coil spec into a PDF calculation memo.
//
//	coilmemo build SPEC… [-o OUT] [--strict]   write the memo PDF(s)
//	coilmemo calc SPEC [--json] [--strict]     print the results
//	coilmemo diff OLD NEW                      what changed between revisions
//	coilmemo watch SPEC [-o OUT]               rebuild on save
//	coilmemo new [FILE]                        a starter spec
//
// Exit status: 0 done; 1 internal failure, or a failed requirement with
// --strict; 2 bad input or usage.
package main

import (
	"coilmemo/analysis"
	"coilmemo/analysis/report"
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"

	"coilmemo/memo"
	"coilmemo/spec"
)

const usage = `coilmemo %s – coil calculation memos from Markdown specs

Usage:
  coilmemo build SPEC... [-o OUT] [--strict]
  coilmemo calc SPEC [--json] [--strict]
  coilmemo diff OLD NEW
  coilmemo watch SPEC [-o OUT]
  coilmemo new [FILE]
  coilmemo help [COMMAND]

Commands:
  build   write a PDF calculation memo for each spec
  calc    print the results of a spec on the terminal, or as JSON
  diff    show the inputs and results that changed between two revisions
  watch   rebuild the memo each time the spec is saved
  new     write a starter spec

Exit status: 0 done, 1 internal failure (or a failed requirement with
--strict), 2 bad input or usage. Run 'coilmemo help COMMAND' for details.
`

const buildHelp = `Usage: coilmemo build SPEC... [-o OUT] [--strict]

Write the PDF calculation memo of each spec. Without -o the memo goes next
to the spec with the extension .pdf (coil.md -> coil.pdf). With one spec,
-o names the output file; with several, -o names a directory.

A spec with problems is reported as file:line: message, every problem at
once, and no file is written or overwritten for it (exit status 2).

Options:
  -o OUT     output file (one spec) or directory (several specs)
  --strict   exit with status 1 when a requirement in the limits block fails
             or a verification check fails (the memo is still written)
`

const calcHelp = `Usage: coilmemo calc SPEC [--json] [--strict]

Evaluate a spec and print its results: per coil the moment, resistance,
current, voltage, power, temperature and field, the probes, the torque and
the requirement checks. With --json the results are printed as JSON in SI
units with the unit in each key's name (a stable interface: keys are only
ever added).

Options:
  --json     print JSON instead of a table
  --strict   exit with status 1 when a requirement or verification fails
`

var helps = map[string]string{"build": buildHelp, "calc": calcHelp, "diff": diffHelp, "watch": watchHelp, "new": newHelp}

// exitError carries an exit status.
type exitError struct {
	code int
	msg  string
}

func (e *exitError) Error() string { return e.msg }

func main() {
	err := run(os.Args[1:], os.Stdout, os.Stderr)
	if err == nil {
		return
	}
	var ee *exitError
	if errors.As(err, &ee) {
		if ee.msg != "" {
			fmt.Fprintln(os.Stderr, ee.msg)
		}
		os.Exit(ee.code)
	}
	fmt.Fprintln(os.Stderr, "coilmemo:", err)
	os.Exit(1)
}

func usageErr(format string, a ...any) error {
	return &exitError{2, "coilmemo: " + fmt.Sprintf(format, a...) + "\nRun 'coilmemo help' for usage."}
}

func run(args []string, stdout, stderr io.Writer) error {
	if len(args) == 0 {
		fmt.Fprintf(stderr, usage, memo.Version)
		return &exitError{code: 2}
	}
	switch args[0] {
	case "build":
		return build(args[1:], stdout, stderr)
	case "calc":
		return calcCmd(args[1:], stdout, stderr)
	case "diff":
		return diffCmd(args[1:], stdout, stderr)
	case "watch":
		return watchCmd(args[1:], stdout, stderr)
	case "new":
		return newCmd(args[1:], stdout)
	case "help", "-h", "-help", "--help":
		if len(args) > 1 {
			h, ok := helps[args[1]]
			if !ok {
				return usageErr("no help for %q", args[1])
			}
			fmt.Fprint(stdout, h)
			return nil
		}
		fmt.Fprintf(stdout, usage, memo.Version)
		return nil
	case "version", "--version":
		fmt.Fprintln(stdout, "coilmemo", memo.Version)
		return nil
	}
	return usageErr("unknown command %q", args[0])
}

// parseInterleaved parses flags that may stand before, between or after
// the positional arguments, and returns the positional ones.
func parseInterleaved(fs *flag.FlagSet, args []string) ([]string, error) {
	var pos []string
	for {
		if err := fs.Parse(args); err != nil {
			return nil, err
		}
		args = fs.Args()
		if len(args) == 0 {
			return pos, nil
		}
		pos = append(pos, args[0])
		args = args[1:]
	}
}

func newFlagSet(name, help string, stdout io.Writer) *flag.FlagSet {
	fs := flag.NewFlagSet(name, flag.ContinueOnError)
	fs.SetOutput(io.Discard)
	fs.Usage = func() { fmt.Fprint(stdout, help) }
	return fs
}

func flagErr(err error, help string, stdout io.Writer) error {
	if errors.Is(err, flag.ErrHelp) {
		fmt.Fprint(stdout, help)
		return nil
	}
	return usageErr("%v", err)
}

// load reads and evaluates one spec, turning diagnostics into exit status 2.
func load(path string, stderr io.Writer) (*analysis.Study, error) {
	src, err := readSpec(path)
	if err != nil {
		return nil, err
	}
	date, _, err := sourceDateEpoch(os.Getenv("SOURCE_DATE_EPOCH"))
	if err != nil {
		return nil, &exitError{2, err.Error()}
	}
	job, diags := analysis.Run(path, src, analysis.Options{Name: filepath.Base(path), Date: date, ReadPrevious: previousReader(path)})
	if len(diags) > 0 {
		for _, d := range diags {
			fmt.Fprintln(stderr, d.Error())
		}
		n := len(diags)
		s := "s"
		if n == 1 {
			s = ""
		}
		return nil, &exitError{2, fmt.Sprintf("%s: %d problem%s; nothing written", path, n, s)}
	}
	return job, nil
}

// readSpec reads a spec file: a regular file of at most spec.MaxSpecBytes
// (a device such as /dev/zero, a FIFO or a folder is refused before it is
// read, and an oversized file after reading one byte past the bound).
// Every failure is exit status 2.
func readSpec(path string) ([]byte, error) {
	fi, err := os.Stat(path)
	if err != nil {
		return nil, &exitError{2, "coilmemo: " + err.Error()}
	}
	if !fi.Mode().IsRegular() {
		return nil, &exitError{2, fmt.Sprintf("coilmemo: %s is not a regular file", path)}
	}
	f, err := os.Open(path)
	if err != nil {
		return nil, &exitError{2, "coilmemo: " + err.Error()}
	}
	defer f.Close()
	src, err := io.ReadAll(io.LimitReader(f, spec.MaxSpecBytes+1))
	if err != nil {
		return nil, &exitError{2, "coilmemo: " + err.Error()}
	}
	if len(src) > spec.MaxSpecBytes {
		return nil, &exitError{2, fmt.Sprintf("%s:1: the spec is more than %d bytes, the most a spec may have; nothing written", path, spec.MaxSpecBytes)}
	}
	return src, nil
}

func build(args []string, stdout, stderr io.Writer) error {
	fs := newFlagSet("build", buildHelp, stdout)
	out := fs.String("o", "", "output file or directory")
	strict := fs.Bool("strict", false, "exit 1 on a failed requirement")
	specs, err := parseInterleaved(fs, args)
	if err != nil {
		return flagErr(err, buildHelp, stdout)
	}
	if len(specs) == 0 {
		return usageErr("build needs at least one spec file")
	}
	var bad, failed int
	for _, path := range specs {
		job, err := load(path, stderr)
		if err != nil {
			var ee *exitError
			if errors.As(err, &ee) && ee.code == 2 {
				fmt.Fprintln(stderr, ee.msg)
				bad++
				continue
			}
			return err
		}
		target := outputPath(path, *out, len(specs) > 1)
		if sameFile(path, target) {
			fmt.Fprintf(stderr, "%s: the output %s is the spec itself; nothing written\n", path, target)
			bad++
			continue
		}
		b, err := memo.PDF(job)
		if err != nil {
			return fmt.Errorf("%s: rendering the memo: %w", path, err)
		}
		if err := writeAtomic(target, b); err != nil {
			return err
		}
		lf, cf := job.Failed()
		note := ""
		if lf+cf > 0 {
			failed++
			note = fmt.Sprintf(" (%d requirement(s) and %d check(s) FAILED)", lf, cf)
		}
		fmt.Fprintf(stdout, "%s → %s, %d bytes%s\n", path, target, len(b), note)
	}
	if bad > 0 {
		return &exitError{code: 2}
	}
	if *strict && failed > 0 {
		return &exitError{1, "coilmemo: --strict: a requirement or check failed"}
	}
	return nil
}

// outputPath is where a spec's memo goes.
func outputPath(spec, out string, several bool) string {
	base := strings.TrimSuffix(filepath.Base(spec), filepath.Ext(spec)) + ".pdf"
	switch {
	case out == "":
		return filepath.Join(filepath.Dir(spec), base)
	case several:
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

// writeAtomic writes b to a temporary file beside path and renames it into
// place, so a failed run never leaves a half-written memo.
func writeAtomic(path string, b []byte) error {
	dir := filepath.Dir(path)
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return err
	}
	f, err := os.CreateTemp(dir, ".coilmemo-*.tmp")
	if err != nil {
		return err
	}
	tmp := f.Name()
	if _, err := f.Write(b); err != nil {
		f.Close()
		os.Remove(tmp)
		return err
	}
	if err := f.Close(); err != nil {
		os.Remove(tmp)
		return err
	}
	if err := os.Chmod(tmp, 0o644); err != nil {
		os.Remove(tmp)
		return err
	}
	return os.Rename(tmp, path)
}

func calcCmd(args []string, stdout, stderr io.Writer) error {
	fs := newFlagSet("calc", calcHelp, stdout)
	asJSON := fs.Bool("json", false, "print JSON")
	strict := fs.Bool("strict", false, "exit 1 on a failed requirement")
	specs, err := parseInterleaved(fs, args)
	if err != nil {
		return flagErr(err, calcHelp, stdout)
	}
	if len(specs) != 1 {
		return usageErr("calc takes exactly one spec file")
	}
	job, err := load(specs[0], stderr)
	if err != nil {
		return err
	}
	if *asJSON {
		b, err := report.JSON(job)
		if err != nil {
			return err
		}
		stdout.Write(b)
	} else {
		memo.WriteSummary(stdout, job)
	}
	if lf, cf := job.Failed(); *strict && lf+cf > 0 {
		return &exitError{1, "coilmemo: --strict: a requirement or check failed"}
	}
	return nil
}
