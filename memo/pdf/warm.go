package pdf

import (
	"github.com/go-pdf/fpdf"
	"sync/atomic"

	"coilmemo/fonts"
)

// Documents prepared ahead. Registering an embedded TrueType face with
// fpdf parses the whole file and derives its id from the face's width
// table, about 4 ms a face; a memo sets five faces. Every document the set
// pass writes registers those five up front, in one order (commonFaces), so
// a document prepared on another core while the analysis runs (Warm) is
// the same as one made on the spot, and the bytes do not depend on which
// was used. A face beyond the five is registered when first set, as
// before.

// commonFaces are the faces every memo sets: body text, headings, emphasis
// and the mathematics.
var commonFaces = [][2]string{{"sans", ""}, {"sans", "B"}, {"sans", "I"}, {"serif", ""}, {"serif", "I"}}

// prepared is a new fpdf document with the common faces registered.
type prepared struct {
	pdf   *fpdf.Fpdf
	added map[string]bool
}

func prepare() prepared {
	p := prepared{pdf: fpdf.NewCustom(&fpdf.InitType{OrientationStr: "P", UnitStr: "pt", SizeStr: "A4"}), added: map[string]bool{}}
	for _, f := range commonFaces {
		s := fonts.Lookup(f[0], f[1])
		addFace(p.pdf, s)
		p.added[f[0]+"/"+f[1]] = true
	}
	return p
}

// ready holds documents prepared by Warm; pending counts the Warm calls
// whose document is being prepared or waits in ready.
var (
	ready   = make(chan prepared, maxWarm)
	pending atomic.Int32
)

// maxWarm bounds the documents prepared ahead.
const maxWarm = 4

// Warm starts preparing a document for the next Render on another
// goroutine, to be called when a Render will follow (before the analysis
// it waits on). A prepared document nobody takes is kept for a later
// Render; beyond maxWarm pending, Warm does nothing.
func Warm() {
	if pending.Add(1) > maxWarm {
		pending.Add(-1)
		return
	}
	go func() { ready <- prepare() }()
}

// takePrepared returns a document prepared by Warm — waiting for one
// being prepared rather than parsing the faces a second time (on a busy
// machine the Render can overtake its Warm) — or, with none pending,
// prepares one.
func takePrepared() prepared {
	for {
		n := pending.Load()
		if n <= 0 {
			return prepare()
		}
		if pending.CompareAndSwap(n, n-1) {
			return <-ready
		}
	}
}
