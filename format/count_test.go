package format

import "testing"

func TestDigits(t *testing.T) {
	for n, want := range map[int]string{0: "0", 7: "7", 9999: "9999", 10000: "10\u2009000", 50167: "50\u2009167", 1234567: "1\u2009234\u2009567", -20000: "−20\u2009000"} {
		if got := Digits(n); got != want {
			t.Errorf("Digits(%d) = %q, want %q", n, got, want)
		}
	}
}
