package main

import (
	"errors"
	"fmt"
	"io"
	"os"
	"time"
)

const watchHelp = `Usage: coilmemo watch SPEC [-o OUT]

Build the memo of SPEC, then rebuild it each time the file is saved, until
interrupted (Ctrl-C). A SPEC that does not exist, or is not a regular
file, is a usage error (exit status 2). Problems in the spec are printed and the previous memo
is left in place until the spec is sound again.
`

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
	if _, err := readSpec(pos[0]); err != nil {
		return err // a missing file, a folder or a device: nothing to watch
	}
	return watch(pos[0], *out, stdout, stderr, 300*time.Millisecond, nil)
}

// watch rebuilds path whenever its modification time or size changes,
// polling every interval, until stop is closed (never, from the command).
func watch(path, out string, stdout, stderr io.Writer, interval time.Duration, stop <-chan struct{}) error {
	var last os.FileInfo
	lastErr := ""
	fmt.Fprintf(stdout, "watching %s (Ctrl-C to stop)\n", path)
	for {
		fi, err := os.Stat(path)
		if err != nil {
			if err.Error() != lastErr { // once, not every poll
				fmt.Fprintln(stderr, "coilmemo:", err)
				lastErr = err.Error()
			}
			last = nil
		} else if last == nil || !fi.ModTime().Equal(last.ModTime()) || fi.Size() != last.Size() {
			last, lastErr = fi, ""
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
