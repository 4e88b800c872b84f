lines := []string{}
current, length := "", 0
for _, word := range words {
	size := utf8.RuneCountInString(word)
	switch {
	case current == "":
		current, length = word, size
	case int64(length+1+size) <= width:
		current += " " + word
		length += 1 + size
	default:
		lines = append(lines, current)
		current, length = word, size
	}
}
if current != "" {
	lines = append(lines, current)
}
return lines
}
