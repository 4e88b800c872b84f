if len(readings) == 0 {
	return 0.0
}
total := 0.0
for _, reading := range readings {
	total += reading
}
return total / float64(len(readings))
}
