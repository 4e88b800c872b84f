var g int64
for _, count := range counts {
	a, b := g, count
	for b != 0 {
		a, b = b, a%b
	}
	if a < 0 {
		a = -a
	}
	g = a
}
return g
}
