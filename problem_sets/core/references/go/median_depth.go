if len(depths) == 0 {
	return nil
}
ordered := append([]float64(nil), depths...)
sort.Float64s(ordered)
mid := len(ordered) / 2
median := ordered[mid]
if len(ordered)%2 == 0 {
	median = (ordered[mid-1] + ordered[mid]) / 2
}
return &median
}
