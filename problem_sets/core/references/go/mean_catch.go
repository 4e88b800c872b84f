if len(weights) == 0 {
	return nil
}
var sum float64
for _, w := range weights {
	sum += w
}
mean := sum / float64(len(weights))
return &mean
}
