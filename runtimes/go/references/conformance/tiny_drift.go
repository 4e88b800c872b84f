scaled := make([]float64, len(offsets))
for i, offset := range offsets {
	scaled[i] = offset * factor
}
return scaled
}
