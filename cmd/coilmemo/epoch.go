package main

import (
	"strconv"
	"strings"
	"time"
)

// Years a PDF date (D:YYYYMMDDHHmmSS) can hold, and so the range a
// SOURCE_DATE_EPOCH may name.
var (
	minEpoch = time.Date(1970, 1, 1, 0, 0, 0, 0, time.UTC).Unix()
	maxEpoch = time.Date(9999, 12, 31, 23, 59, 59, 0, time.UTC).Unix()
)

// sourceDateEpoch reads the reproducible-builds date from the value of
// SOURCE_DATE_EPOCH (seconds since 1970-01-01 UTC, a decimal integer). An
// empty value means not set (ok false, no error); any other value that is
// not a whole number of seconds from 1970 to the end of 9999 is a usage
// error (exit status 2) naming the variable and the range.
func sourceDateEpoch(v string) (t time.Time, ok bool, err error) {
	if v == "" {
		return time.Time{}, false, nil
	}
	sec, perr := strconv.ParseInt(strings.TrimSpace(v), 10, 64)
	if perr != nil || strings.TrimSpace(v) != v {
		return time.Time{}, false, usageErr("SOURCE_DATE_EPOCH=%q is not a whole number of seconds since 1970-01-01 UTC", v)
	}
	if sec < minEpoch || sec > maxEpoch {
		return time.Time{}, false, usageErr("SOURCE_DATE_EPOCH=%s is outside %d … %d (1970-01-01 to 9999-12-31, the dates a PDF can hold)", v, minEpoch, maxEpoch)
	}
	return time.Unix(sec, 0).UTC(), true, nil
}
