if len(values) == 0 {
	return nil
}
low, high := values[0], values[0]
for _, v := range values[1:] {
	if v < low {
		low = v
	}
	if v > high {
		high = v
	}
}
return &Pair[int64, int64]{low, high}
}
