if len(values) == 0 {
	return 0.0
}
n := float64(len(values))
var sum float64
for _, v := range values {
	sum += v
}
mean := sum / n
var squares float64
for _, v := range values {
	squares += (v - mean) * (v - mean)
}
return math.Sqrt(squares / n)
}
