var total int64
for _, mark := range marks {
	total += mark
}
return Pair[int64, int64]{int64(utf8.RuneCountInString(entries)), total}
}
