// best[r] is the largest worth that fits in r tonnes using the crates seen so far.
best := make([]int64, capacity+1)
for i, weight := range weights {
	for r := capacity; r >= weight; r-- {
		if loaded := best[r-weight] + values[i]; loaded > best[r] {
			best[r] = loaded
		}
	}
}
return best[capacity]
}
