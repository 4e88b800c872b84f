// Trial division: n <= 10^12, so divisors stay below 10^6.
exponents := map[string]int64{}
for d := int64(2); d*d <= n; d++ {
	for n%d == 0 {
		exponents[strconv.FormatInt(d, 10)]++
		n /= d
	}
}
if n > 1 {
	exponents[strconv.FormatInt(n, 10)]++
}
return exponents
}
