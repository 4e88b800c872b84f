averages := []float64{}
for i := int(window) - 1; i < len(values); i++ {
	var sum float64
	for _, v := range values[i-int(window)+1 : i+1] {
		sum += v
	}
	averages = append(averages, sum/float64(window))
}
return averages
}
