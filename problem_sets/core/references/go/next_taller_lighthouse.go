result := make([]int64, len(heights))
// waiting holds the indices still looking for a taller lighthouse, heights non-increasing.
waiting := []int{}
for i, height := range heights {
	result[i] = -1
	for len(waiting) > 0 && heights[waiting[len(waiting)-1]] < height {
		result[waiting[len(waiting)-1]] = int64(i)
		waiting = waiting[:len(waiting)-1]
	}
	waiting = append(waiting, i)
}
return result
}
