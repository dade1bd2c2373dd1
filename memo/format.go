package memo

import "coilmemo/format"

// The memo writes every number through package format; these are its
// short names inside this package.
var (
	Eng      = format.Eng
	Sig      = format.Sig
	Percent  = format.Percent
	Sci      = format.Sci
	Duration = format.Duration
	Celsius  = format.Celsius
)
