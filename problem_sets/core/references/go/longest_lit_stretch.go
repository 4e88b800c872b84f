var best, run int64
for _, lit := range states {
	if lit {
		run++
	} else {
		run = 0
	}
	if run > best {
		best = run
	}
}
return best
}
