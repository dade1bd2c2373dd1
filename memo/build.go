// Package memo turns a parsed spec and its calculated results into the
// memo's document model, and runs the whole pipeline: spec text → parsed
// spec → calc results → document → PDF. The stages live in their own
// packages (memo/spec, calc, memo/doc, memo/pdf); this package composes them.
package memo

import (
	"crypto/sha256"
	"encoding/hex"
	"os"
	"strconv"
	"time"

	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/memo/pdf"
	"coilmemo/spec"
)

// Version is the tool version printed in every memo's record section.
const Version = "0.1.0"

// Job is one evaluated spec: everything the memo and the JSON report need.
type Job struct {
	Spec    *spec.Spec
	Results calc.Results
	Checks  []Check
	Sweep   []SweepStep // one per swept value, when the spec has a sweep
	SHA256  string      // of the spec bytes
	Created time.Time   // build date written into the memo
	Dated   bool        // Created came from the spec or SOURCE_DATE_EPOCH
	// DateSource says where Created came from: "SOURCE_DATE_EPOCH", "memo
	// date" or "" (not dated).
	DateSource string
}

// Evaluate parses and calculates a spec. Diagnostics are returned (and
// nothing else is) when the spec has problems.
func Evaluate(file string, src []byte) (*Job, spec.Diagnostics) {
	s, diags := spec.Parse(file, src)
	if len(diags) > 0 {
		return nil, diags
	}
	sum := sha256.Sum256(src)
	j := &Job{Spec: s, SHA256: hex.EncodeToString(sum[:])}
	j.Results = calc.Evaluate(s.Design)
	j.Checks = Verify(s.Design, j.Results)
	j.Sweep = RunSweep(s)
	j.Created, j.Dated = buildDate(s)
	j.DateSource = dateSource(s)
	return j, nil
}

// buildDate is SOURCE_DATE_EPOCH when set (the reproducible-builds
// convention), else the memo date of the spec, else the Unix epoch, so the
// same spec always yields the same bytes.
// dateSource names where buildDate takes the date from.
func dateSource(s *spec.Spec) string {
	if v := os.Getenv("SOURCE_DATE_EPOCH"); v != "" {
		if _, err := strconv.ParseInt(v, 10, 64); err == nil {
			return "SOURCE_DATE_EPOCH"
		}
	}
	if !s.Memo.DateValue.IsZero() {
		return "memo date"
	}
	return ""
}

func buildDate(s *spec.Spec) (time.Time, bool) {
	if v := os.Getenv("SOURCE_DATE_EPOCH"); v != "" {
		if sec, err := strconv.ParseInt(v, 10, 64); err == nil {
			return time.Unix(sec, 0).UTC(), true
		}
	}
	if !s.Memo.DateValue.IsZero() {
		return s.Memo.DateValue.UTC(), true
	}
	return time.Unix(0, 0).UTC(), false
}

// Document composes the memo's document model.
func (j *Job) Document() *doc.Document { return Compose(j) }

// PDF renders the memo.
func (j *Job) PDF() ([]byte, error) { return pdf.Render(j.Document()) }

// Failed reports whether any limit or verification check failed.
func (j *Job) Failed() (limits, checks int) {
	for _, l := range j.Results.Limits {
		if !l.Pass {
			limits++
		}
	}
	for _, c := range j.Checks {
		if !c.Pass {
			checks++
		}
	}
	return
}
