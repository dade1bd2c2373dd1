package main

import (
	_ "embed"
	"errors"
	"fmt"
	"io"
	"os"
)

//go:embed starter.md
var starter []byte

const newHelp = `Usage: coilmemo new [FILE]

Write a starter spec with every block and the common keys, to FILE or, with
no FILE, to standard output. An existing FILE is never overwritten.
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
