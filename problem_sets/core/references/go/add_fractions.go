gcd := func(x, y int64) int64 {
	for y != 0 {
		x, y = y, x%y
	}
	if x < 0 {
		return -x
	}
	return x
}
num, den := int64(0), int64(1)
for _, f := range fracs {
	p, q := f.First, f.Second
	if q < 0 {
		p, q = -p, -q
	}
	// Add over the least common denominator so the numbers stay small.
	g := gcd(den, q)
	num = num*(q/g) + p*(den/g)
	den = den / g * q
	g = gcd(num, den)
	num, den = num/g, den/g
}
return Pair[int64, int64]{num, den}
}
