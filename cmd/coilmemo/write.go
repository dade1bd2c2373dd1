package main

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"os/signal"
	"path/filepath"
	"sync"
	"syscall"
)

// temps holds the temporary files being written, so that a signal can
// remove them before the process exits.
var temps = struct {
	sync.Mutex
	files   map[string]bool
	closing bool // set by a signal: no new temporary files
}{files: map[string]bool{}}

var errInterrupted = errors.New("interrupted")

// createTemp makes a temporary file in dir and registers it.
func createTemp(dir string) (*os.File, error) {
	temps.Lock()
	defer temps.Unlock()
	if temps.closing {
		return nil, errInterrupted
	}
	f, err := os.CreateTemp(dir, ".coilmemo-*.tmp")
	if err != nil {
		return nil, err
	}
	temps.files[f.Name()] = true
	return f, nil
}

// dropTemp removes a temporary file (if it is still there) and forgets it.
func dropTemp(name string) {
	temps.Lock()
	defer temps.Unlock()
	os.Remove(name)
	delete(temps.files, name)
}

// commitTemp moves a finished temporary file into place with place (a
// rename or a link) and forgets it; under the lock, so a signal sees the
// file either still temporary or already in place.
func commitTemp(name string, place func() error) error {
	temps.Lock()
	defer temps.Unlock()
	if temps.closing {
		return errInterrupted
	}
	err := place()
	if err == nil {
		delete(temps.files, name)
	}
	return err
}

// removeTemps removes every registered temporary file and refuses new
// ones; it is what a signal does before the process exits.
func removeTemps() {
	temps.Lock()
	defer temps.Unlock()
	temps.closing = true
	for name := range temps.files {
		os.Remove(name)
		delete(temps.files, name)
	}
}

// stopOnSignal makes SIGINT and SIGTERM remove the temporary files and
// exit with status 128 + the signal's number (130, 143), as shells expect.
func stopOnSignal() {
	ch := make(chan os.Signal, 1)
	signal.Notify(ch, syscall.SIGINT, syscall.SIGTERM)
	go func() {
		s := <-ch
		removeTemps()
		fmt.Fprintf(os.Stderr, "coilmemo: %v; stopped, no partial file left\n", s)
		n := 2
		if sig, ok := s.(syscall.Signal); ok {
			n = 128 + int(sig)
		}
		os.Exit(n)
	}()
}

// writeData writes b to f and syncs it to disk; a variable so that tests
// can stand in a full disk.
var writeData = func(f *os.File, b []byte) error {
	if _, err := f.Write(b); err != nil {
		return err
	}
	return f.Sync()
}

// writeTemp writes b into a new synced temporary file in dir, mode 0644,
// and returns its name; on failure nothing is left behind.
func writeTemp(dir string, b []byte) (string, error) {
	f, err := createTemp(dir)
	if err != nil {
		return "", err
	}
	name := f.Name()
	err = writeData(f, b)
	if cerr := f.Close(); err == nil {
		err = cerr
	}
	if err == nil {
		err = os.Chmod(name, 0o644)
	}
	if err != nil {
		dropTemp(name)
		return "", err
	}
	return name, nil
}

// writeAtomic writes b to a temporary file in path's folder, syncs it and
// renames it over path, so a failed or interrupted run never leaves a
// half-written file; the folder is made if need be, and synced after the
// rename.
func writeAtomic(path string, b []byte) error {
	dir := filepath.Dir(path)
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return err
	}
	tmp, err := writeTemp(dir, b)
	if err != nil {
		return err
	}
	if err := commitTemp(tmp, func() error { return os.Rename(tmp, path) }); err != nil {
		dropTemp(tmp)
		return err
	}
	syncDir(dir)
	return nil
}

// writeNew writes b to path, which must not exist, with the same
// guarantees as writeAtomic: the file appears whole or not at all (a hard
// link puts it in place without replacing a file made meanwhile).
func writeNew(path string, b []byte) error {
	if _, err := os.Lstat(path); err == nil {
		return fs.ErrExist
	}
	dir := filepath.Dir(path)
	tmp, err := writeTemp(dir, b)
	if err != nil {
		return err
	}
	defer dropTemp(tmp)
	err = commitTemp(tmp, func() error {
		err := os.Link(tmp, path)
		if err == nil {
			os.Remove(tmp)
		} else if !errors.Is(err, fs.ErrExist) {
			// a file system without hard links
			if _, serr := os.Lstat(path); serr == nil {
				return fs.ErrExist
			}
			err = os.Rename(tmp, path)
		}
		return err
	})
	if err != nil {
		return err
	}
	syncDir(dir)
	return nil
}

// syncDir syncs a folder so that a rename in it survives a crash; a file
// system that cannot sync folders is no error.
func syncDir(dir string) {
	if d, err := os.Open(dir); err == nil {
		d.Sync()
		d.Close()
	}
}

// reason is an error's cause without the path the os package prefixes
// (which may be a temporary file's): "permission denied", "no space left
// on device".
func reason(err error) string {
	var pe *fs.PathError
	var le *os.LinkError
	switch {
	case errors.As(err, &pe):
		return pe.Err.Error()
	case errors.As(err, &le):
		return le.Err.Error()
	}
	return err.Error()
}
