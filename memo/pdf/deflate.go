package pdf

import (
	"bytes"
	"compress/zlib"
	"errors"
	"fmt"
	"runtime"
	"slices"
	"strconv"
	"sync"
)

// Page contents are deflated here rather than by fpdf. fpdf builds a new
// zlib writer for every stream it compresses, and a zlib writer holds
// about 1.2 MB of tables that are allocated and cleared each time — for a
// 15-page memo more work than the compression itself. The set pass's
// document is therefore written with fpdf's compression off; deflatePages
// then compresses every page content stream with reused writers, on every
// core, at the level fpdf uses (zlib.BestSpeed), writes the dictionary
// fpdf writes for a compressed page and moves the cross-reference table's
// offsets by what each stream shrank. The result is the file fpdf writes
// with compression on, byte for byte (TestDeflatePagesAsFpdf). Fonts and
// images are compressed by fpdf (or arrive compressed) either way.

// An uncompressed page content object as fpdf writes it:
// "<n> 0 obj\n<</Length <len>>>\nstream\n<data>\nendstream".
var (
	streamHead = []byte("<</Length ")
	streamMid  = []byte(">>\nstream\n")
	streamEnd  = []byte("\nendstream")
)

// deflatePages compresses the page content streams of an fpdf file
// written without compression (see above).
func deflatePages(in []byte) ([]byte, error) {
	xref, offsets, err := readXref(in)
	if err != nil {
		return nil, err
	}
	type job struct {
		from, data, end int // the dictionary's start, the data's start and end
		out             []byte
	}
	var jobs []job
	// a page's contents are the object after its page object
	var inOrder []int
	for i, o := range offsets {
		if o > 0 && o < xref && i+1 < len(offsets) && bytes.HasPrefix(in[o:], fmt.Appendf(nil, "%d 0 obj\n<</Type /Page\n", i+1)) {
			inOrder = append(inOrder, offsets[i+1])
		}
	}
	slices.Sort(inOrder)
	for _, o := range inOrder {
		if o <= 0 || o >= xref {
			continue
		}
		// "<n> 0 obj\n" then the dictionary
		nl := bytes.IndexByte(in[o:min(o+32, len(in))], '\n')
		if nl < 0 {
			continue
		}
		from := o + nl + 1
		if !bytes.HasPrefix(in[from:], streamHead) {
			return nil, fmt.Errorf("pdf: deflate: a page's contents at %d are not an uncompressed stream", o)
		}
		p := from + len(streamHead)
		q := p
		for q < len(in) && in[q] >= '0' && in[q] <= '9' {
			q++
		}
		if q == p || !bytes.HasPrefix(in[q:], streamMid) {
			return nil, fmt.Errorf("pdf: deflate: a page's contents at %d are not an uncompressed stream", o)
		}
		n, err := strconv.Atoi(string(in[p:q]))
		if err != nil {
			return nil, err
		}
		data := q + len(streamMid)
		if data+n > xref || !bytes.HasPrefix(in[data+n:], streamEnd) {
			return nil, fmt.Errorf("pdf: page stream at %d: length %d does not end at endstream", o, n)
		}
		jobs = append(jobs, job{from: from, data: data, end: data + n})
	}
	// compress on every core, each worker with its own reused writer
	workers := min(runtime.GOMAXPROCS(0), len(jobs))
	var wg sync.WaitGroup
	next := make(chan int, len(jobs))
	for i := range jobs {
		next <- i
	}
	close(next)
	errs := make([]error, workers)
	for w := range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			var zw *zlib.Writer
			for i := range next {
				var buf bytes.Buffer
				src := in[jobs[i].data:jobs[i].end]
				buf.Grow(len(src)/2 + 64)
				if zw == nil {
					var err error
					if zw, err = zlib.NewWriterLevel(&buf, zlib.BestSpeed); err != nil {
						errs[w] = err
						return
					}
				} else {
					zw.Reset(&buf)
				}
				if _, err := zw.Write(src); err != nil {
					errs[w] = err
					return
				}
				if err := zw.Close(); err != nil {
					errs[w] = err
					return
				}
				jobs[i].out = buf.Bytes()
			}
		}()
	}
	wg.Wait()
	if err := errors.Join(errs...); err != nil {
		return nil, fmt.Errorf("pdf: deflate: %w", err)
	}
	// the file with every stream replaced; shift[k] is how far the text
	// after job k's stream moved
	out := make([]byte, 0, len(in))
	at := 0
	starts := make([]int, len(jobs))
	shifts := make([]int, len(jobs))
	moved := 0
	for k, j := range jobs {
		out = append(out, in[at:j.from]...)
		out = append(out, "<</Filter /FlateDecode /Length "...)
		out = strconv.AppendInt(out, int64(len(j.out)), 10)
		out = append(out, streamMid...)
		out = append(out, j.out...)
		at = j.end
		moved = len(out) - at
		starts[k], shifts[k] = j.from, moved
	}
	newXref := xref + moved
	out = append(out, in[at:xref]...)
	// the cross-reference table: every entry moved by the streams before it
	tail := in[xref:]
	entries, err := xrefEntries(tail)
	if err != nil {
		return nil, err
	}
	head := entries[0]
	out = append(out, tail[:head]...)
	for i, o := range offsets {
		line := tail[head+20*i : head+20*i+20]
		if o <= 0 {
			out = append(out, line...)
			continue
		}
		// the last stream that starts before o decides its shift
		shift := 0
		if k, _ := slices.BinarySearch(starts, o); k > 0 {
			shift = shifts[k-1]
		}
		out = fmt.Appendf(out, "%010d", o+shift)
		out = append(out, line[10:]...)
	}
	rest := tail[head+20*len(offsets):]
	sx := bytes.LastIndex(rest, []byte("startxref\n"))
	if sx < 0 {
		return nil, errors.New("pdf: deflate: no startxref")
	}
	sx += len("startxref\n")
	out = append(out, rest[:sx]...)
	out = strconv.AppendInt(out, int64(newXref), 10)
	end := bytes.IndexByte(rest[sx:], '\n')
	if end < 0 {
		return nil, errors.New("pdf: deflate: startxref without its line")
	}
	out = append(out, rest[sx+end:]...)
	return out, nil
}

// readXref finds the cross-reference table of an fpdf file (one section
// from object 0) and returns its offset and the offsets of objects 1…n,
// in object order.
func readXref(in []byte) (int, []int, error) {
	sx := bytes.LastIndex(in, []byte("startxref\n"))
	if sx < 0 {
		return 0, nil, errors.New("pdf: deflate: no startxref")
	}
	p := sx + len("startxref\n")
	q := p
	for q < len(in) && in[q] >= '0' && in[q] <= '9' {
		q++
	}
	xref, err := strconv.Atoi(string(in[p:q]))
	if err != nil || xref <= 0 || xref >= sx {
		return 0, nil, fmt.Errorf("pdf: deflate: bad startxref %q", in[p:q])
	}
	tail := in[xref:]
	idx, err := xrefEntries(tail)
	if err != nil {
		return 0, nil, err
	}
	head, n := idx[0], idx[1]
	offsets := make([]int, 0, n-1)
	for i := 1; i < n; i++ {
		e := head + 20*(i-1)
		if e+20 > len(tail) {
			return 0, nil, errors.New("pdf: deflate: short cross-reference table")
		}
		o, err := strconv.Atoi(string(tail[e : e+10]))
		if err != nil {
			return 0, nil, fmt.Errorf("pdf: deflate: cross-reference entry %d: %w", i, err)
		}
		offsets = append(offsets, o)
	}
	return xref, offsets, nil
}

// xrefEntries reads the head of a cross-reference table ("xref\n0 <n>\n")
// and returns where object 1's entry starts in tail (after the free
// entry of object 0) and n.
func xrefEntries(tail []byte) ([2]int, error) {
	if !bytes.HasPrefix(tail, []byte("xref\n0 ")) {
		return [2]int{}, errors.New("pdf: deflate: no cross-reference table at startxref")
	}
	p := len("xref\n0 ")
	q := p
	for q < len(tail) && tail[q] >= '0' && tail[q] <= '9' {
		q++
	}
	n, err := strconv.Atoi(string(tail[p:q]))
	if err != nil || n < 1 || q >= len(tail) || tail[q] != '\n' {
		return [2]int{}, errors.New("pdf: deflate: bad cross-reference table head")
	}
	// object 0's free entry is 20 bytes
	return [2]int{q + 1 + 20, n}, nil
}
