package main

import (
	_ "embed"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"regexp"
	"strings"
)

//go:embed starter.md
var starter []byte

const newHelp = `Usage: coilmemo new [FILE]

Write a starter spec with every block (memo with its revision history,
coil with its duty cycle, conditions, limits, probes, sweep, tolerances)
to FILE or, with no FILE, to standard output. An existing FILE is never
overwritten. The <placeholders> are for you to fill in: build and calc
warn about each one left.
`

func newCmd(args []string, stdout, stderr io.Writer) error {
	fs := newFlagSet("new", newHelp, stdout)
	pos, err := parseInterleaved(fs, args)
	if err != nil {
		return flagErr(err, newHelp, stdout)
	}
	switch len(pos) {
	case 0:
		if _, err := stdout.Write(starter); err != nil {
			return &exitError{2, "coilmemo: writing the starter spec: " + reason(err)}
		}
		return nil
	case 1:
		return newFile(pos[0], stdout)
	}
	return usageErr("new takes at most one file name")
}

func newFile(path string, stdout io.Writer) error {
	err := writeNew(path, starter)
	if errors.Is(err, fs.ErrExist) {
		return &exitError{2, fmt.Sprintf("coilmemo: %s exists; not overwritten", path)}
	}
	if err != nil {
		return &exitError{2, fmt.Sprintf("coilmemo: cannot write %s: %s; nothing written", path, reason(err))}
	}
	fmt.Fprintf(stdout, "wrote %s; fill in the <placeholders>, then run: coilmemo build %s\n", path, path)
	return nil
}

// placeholders are the starter's <…> fields, each to be replaced by the
// author.
var placeholders = func() []string {
	seen := map[string]bool{}
	var list []string
	for _, m := range placeholderRE.FindAllString(string(starter), -1) {
		if !seen[m] {
			seen[m] = true
			list = append(list, m)
		}
	}
	return list
}()

var placeholderRE = regexp.MustCompile(`<[A-Za-z][A-Za-z' ]*>`)

// warnPlaceholders prints a warning for each line of src that still holds
// one of the starter's placeholders.
func warnPlaceholders(path string, src []byte, w io.Writer) {
	for i, line := range strings.Split(string(src), "\n") {
		if !strings.Contains(line, "<") {
			continue
		}
		for _, p := range placeholders {
			if strings.Contains(line, p) {
				fmt.Fprintf(w, "%s:%d: warning: the placeholder %s is not filled in\n", path, i+1, p)
			}
		}
	}
}
