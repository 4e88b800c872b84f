// Digits are peeled off without taking the absolute value first, which would overflow for
// math.MinInt64; Go's remainder has the sign of the dividend.
var total int64
for n != 0 {
	digit := n % 10
	if digit < 0 {
		digit = -digit
	}
	total += digit
	n /= 10
}
return total
}
