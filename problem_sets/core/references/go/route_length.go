var total float64
for i := 1; i < len(points); i++ {
	total += math.Hypot(points[i].First-points[i-1].First, points[i].Second-points[i-1].Second)
}
return total
}
