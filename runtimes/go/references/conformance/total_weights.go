total := 0.0
for _, items := range crates {
	for _, weight := range items {
		total += weight
	}
}
return total
}
