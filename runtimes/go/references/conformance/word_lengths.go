lengths := make(map[string]int64, len(words))
for _, word := range words {
	lengths[word] = int64(utf8.RuneCountInString(word))
}
return lengths
}
