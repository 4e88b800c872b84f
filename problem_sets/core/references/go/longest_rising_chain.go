// tails[k] is the smallest last value of a strictly rising chain of length k + 1.
tails := []int64{}
for _, v := range values {
	k := sort.Search(len(tails), func(i int) bool { return tails[i] >= v })
	if k == len(tails) {
		tails = append(tails, v)
	} else {
		tails[k] = v
	}
}
return int64(len(tails))
}
