package main

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"syscall"
	"testing"

	"coilmemo/spec"
)

// A device, a FIFO, a folder or an oversized file as the spec: exit 2 at
// once with a message, nothing written.
func TestReadSpecRefusesNonRegular(t *testing.T) {
	dir := t.TempDir()
	fifo := filepath.Join(dir, "pipe.md")
	if err := syscall.Mkfifo(fifo, 0o644); err != nil {
		t.Skip("no FIFO:", err)
	}
	big := filepath.Join(dir, "big.md")
	os.WriteFile(big, bytes.Repeat([]byte("a "), spec.MaxSpecBytes), 0o644)
	for _, c := range []struct{ path, msg string }{
		{"/dev/zero", "not a regular file"}, {fifo, "not a regular file"}, {dir, "not a regular file"},
		{big, "big.md:1: the spec is more than 256000 bytes"},
	} {
		var o, e bytes.Buffer
		err := run([]string{"build", c.path, "-o", filepath.Join(dir, "out.pdf")}, &o, &e)
		if code(err) != 2 || !strings.Contains(err.Error()+e.String(), c.msg) {
			t.Errorf("%s: exit %d, %v %s", c.path, code(err), err, e.String())
		}
	}
	if _, err := os.Stat(filepath.Join(dir, "out.pdf")); err == nil {
		t.Error("an output was written")
	}
}
