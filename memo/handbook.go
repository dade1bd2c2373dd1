package memo

// nbsCopper20C is the resistance of annealed copper wire at 20 °C in ohms
// per 1000 ft by AWG size, from NBS Handbook 100, Copper Wire Tables (1966),
// Table 1. AWG 24 and 30 are as quoted in the project's requirements; the
// other entries are recalled from memory of that table and were
// cross-checked against the ASTM B258 diameter rule with the IEC 60028
// resistivity (they agree to the table's four figures).
var nbsCopper20C = map[int]float64{
	10: 0.9989,
	12: 1.588,
	14: 2.525,
	16: 4.016,
	18: 6.385,
	20: 10.15,
	22: 16.14,
	24: 25.67,
	26: 40.81,
	28: 64.90,
	30: 103.2,
	32: 164.1,
	34: 260.9,
	36: 414.8,
	38: 659.6,
	40: 1049,
}

const nbsSource = "NBS Handbook 100 (1966), Table 1"

// ohmsPer1000ftToSI converts Ω/1000 ft to Ω/m (1 ft = 0.3048 m exactly).
const ohmsPer1000ftToSI = 1 / 304.8
