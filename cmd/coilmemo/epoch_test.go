package main

import (
	"strings"
	"testing"
	"time"
)

func TestSourceDateEpoch(t *testing.T) {
	good := map[string]time.Time{
		"0":            time.Date(1970, 1, 1, 0, 0, 0, 0, time.UTC),
		"1764547200":   time.Date(2025, 12, 1, 0, 0, 0, 0, time.UTC), // date -u -d 2025-12-01 +%s
		"253402300799": time.Date(9999, 12, 31, 23, 59, 59, 0, time.UTC),
	}
	for v, want := range good {
		got, ok, err := sourceDateEpoch(v)
		if err != nil || !ok || !got.Equal(want) {
			t.Errorf("%q: %v %v %v, want %v", v, got, ok, err, want)
		}
	}
	if _, ok, err := sourceDateEpoch(""); ok || err != nil {
		t.Errorf("unset: ok %v err %v", ok, err)
	}
	for _, v := range []string{"-1", "253402300800", "1e9", "12.5", " 5", "abc", "99999999999999999999"} {
		_, ok, err := sourceDateEpoch(v)
		if ok || code(err) != 2 || !strings.Contains(err.Error(), "SOURCE_DATE_EPOCH") {
			t.Errorf("%q: ok %v, exit %d, %v", v, ok, code(err), err)
		}
	}
}
