left, right := []rune(a), []rune(b)
if len(left) != len(right) {
	return nil
}
var differ int64
for i := range left {
	if left[i] != right[i] {
		differ++
	}
}
return &differ
}
