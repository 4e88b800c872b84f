limited := make([]int64, len(values))
for i, v := range values {
	if low != nil && v < *low {
		v = *low
	}
	if high != nil && v > *high {
		v = *high
	}
	limited[i] = v
}
return limited
}
