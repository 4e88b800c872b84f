patched := make([]float64, len(readings))
for i, reading := range readings {
	if math.IsNaN(reading) {
		patched[i] = fill
	} else {
		patched[i] = reading
	}
}
return patched
}
