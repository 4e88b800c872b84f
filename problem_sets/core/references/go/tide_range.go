if len(readings) == 0 {
	return 0
}
low, high := readings[0], readings[0]
for _, r := range readings[1:] {
	if r < low {
		low = r
	}
	if r > high {
		high = r
	}
}
return high - low
}
