// Converting to uint64 keeps the two's complement bits; each step clears the lowest set bit.
bits := uint64(mask)
var count int64
for bits != 0 {
	bits &= bits - 1
	count++
}
return count
}
