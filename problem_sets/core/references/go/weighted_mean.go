var total, totalWeight float64
for i, v := range values {
	total += v * weights[i]
	totalWeight += weights[i]
}
if totalWeight == 0 {
	return nil
}
mean := total / totalWeight
return &mean
}
