// Command coilmemo turns a Markdown coil spec into a PDF calculation memo.
//
//	coilmemo build SPEC… [-o OUT] [--strict]   write the memo PDF(s)
//	coilmemo calc SPEC [--json] [--strict]     print the results
//	coilmemo diff OLD NEW                      what changed between revisions
//	coilmemo watch SPEC [-o OUT]               rebuild on save
//	coilmemo new [FILE]                        a starter spec
//
// Exit status: 0 done; 1 internal failure, or a failed requirement with
// --strict; 2 bad input, a bad path or usage; 128 + the signal when
// interrupted.
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
	"runtime/debug"
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
  coilmemo size SPEC [-o OUT.md]
  coilmemo help [COMMAND]

Commands:
  build   write a PDF calculation memo for each spec
  calc    print the results of a spec on the terminal, or as JSON
  diff    show the inputs and results that changed between two revisions
  watch   rebuild the memo each time the spec is saved
  new     write a starter spec
  size    choose the free keys of a spec's size block and write the spec back

Exit status: 0 done, 1 internal failure (or a failed requirement with
--strict), 2 bad input, a bad path or usage; 130 or 143 when interrupted
(no partial file is left). Run 'coilmemo help COMMAND' for details.
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

const helpHelp = `Usage: coilmemo help [COMMAND]

Without COMMAND, list the commands; with one, print its help (the same as
'coilmemo COMMAND --help').
`

var helps = map[string]string{"build": buildHelp, "calc": calcHelp, "diff": diffHelp, "watch": watchHelp, "new": newHelp, "size": sizeHelp, "help": helpHelp}

// commands is the dispatch table: one line a command.
var commands = map[string]func(args []string, stdout, stderr io.Writer) error{
	"build": build,
	"calc":  calcCmd,
	"diff":  diffCmd,
	"watch": watchCmd,
	"new":   newCmd,
	"size":  sizeCmd,
	"help":  helpCmd,
}

// exitError carries an exit status.
type exitError struct {
	code int
	msg  string
}

func (e *exitError) Error() string { return e.msg }

// gcPercent is the collector's target when GOGC is not set: a memo build
// is a short run whose live heap stays near 10 MB, so collecting at 5×
// instead of 2× the live heap saves most of the collector's work (about
// 8 ms of a 90 ms build) for some 15 MB more peak memory
// (docs/performance.md).
const gcPercent = 400

func main() {
	if os.Getenv("GOGC") == "" {
		debug.SetGCPercent(gcPercent)
	}
	stopOnSignal()
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
	case "-h", "-help", "--help":
		return helpCmd(args[1:], stdout, stderr)
	case "version", "--version":
		fmt.Fprintln(stdout, "coilmemo", memo.Version)
		return nil
	}
	if cmd, ok := commands[args[0]]; ok {
		return cmd(args[1:], stdout, stderr)
	}
	names := make([]string, 0, len(commands)+1)
	for n := range commands {
		names = append(names, n)
	}
	if s := nearest(args[0], append(names, "version")); s != "" {
		return usageErr("unknown command %q; did you mean %q?", args[0], s)
	}
	return usageErr("unknown command %q", args[0])
}

func helpCmd(args []string, stdout, stderr io.Writer) error {
	switch {
	case len(args) == 0:
		fmt.Fprintf(stdout, usage, memo.Version)
		return nil
	case len(args) > 1:
		return usageErr("help takes at most one command")
	}
	topic := args[0]
	if topic == "-h" || topic == "-help" || topic == "--help" {
		topic = "help"
	}
	if h, ok := helps[topic]; ok {
		fmt.Fprint(stdout, h)
		return nil
	}
	names := make([]string, 0, len(helps))
	for n := range helps {
		names = append(names, n)
	}
	if s := nearest(args[0], names); s != "" {
		return usageErr("no help for %q; did you mean %q?", args[0], s)
	}
	return usageErr("no help for %q", args[0])
}

// parseInterleaved parses flags that may stand before, between or after
// the positional arguments, and returns the positional ones. Everything
// after "--" is positional. An unknown flag is reported with the nearest
// defined one.
func parseInterleaved(fs *flag.FlagSet, args []string) ([]string, error) {
	var pos []string
	for {
		if err := fs.Parse(args); err != nil {
			return nil, unknownFlag(fs, err)
		}
		rest := fs.Args()
		if n := len(args) - len(rest); n > 0 && args[n-1] == "--" {
			return append(pos, rest...), nil
		}
		args = rest
		if len(args) == 0 {
			return pos, nil
		}
		pos = append(pos, args[0])
		args = args[1:]
	}
}

// unknownFlag rewrites the flag package's "flag provided but not
// defined: -jsn" as "unknown option --jsn; did you mean --json?".
func unknownFlag(fs *flag.FlagSet, err error) error {
	const prefix = "flag provided but not defined: "
	msg := err.Error()
	if !strings.HasPrefix(msg, prefix) {
		return err
	}
	name := strings.TrimLeft(strings.TrimPrefix(msg, prefix), "-")
	var names []string
	fs.VisitAll(func(f *flag.Flag) { names = append(names, f.Name) })
	names = append(names, "help")
	if s := nearest(name, names); s != "" {
		return fmt.Errorf("%s has no option %s; did you mean %s?", fs.Name(), dashes(name), dashes(s))
	}
	return fmt.Errorf("%s has no option %s", fs.Name(), dashes(name))
}

// dashes writes an option as the help texts do: -o, --json.
func dashes(name string) string {
	if len([]rune(name)) == 1 {
		return "-" + name
	}
	return "--" + name
}

// newFlagSet returns a flag set that prints nothing itself: flagErr prints
// the help (once) for -h/--help and a usage error otherwise.
func newFlagSet(name, help string, stdout io.Writer) *flag.FlagSet {
	fs := flag.NewFlagSet(name, flag.ContinueOnError)
	fs.SetOutput(io.Discard)
	fs.Usage = func() {}
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
	warnPlaceholders(path, src, stderr)
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
	for _, w := range job.Spec.Warnings {
		fmt.Fprintf(stderr, "%s:%d: warning: %s\n", w.File, w.Line, w.Msg)
	}
	sizeWarnings(job, path, stderr)
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
		_, err = stdout.Write(b)
	} else {
		err = memo.WriteSummary(stdout, job)
	}
	if err != nil {
		return &exitError{2, "coilmemo: writing the results: " + reason(err)}
	}
	if lf, cf := job.Failed(); *strict && lf+cf > 0 {
		return &exitError{1, "coilmemo: --strict: a requirement or check failed"}
	}
	return nil
}
