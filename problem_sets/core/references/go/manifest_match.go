chars := []rune(text)
// matches[j]: the pattern read so far matches the first j characters of the text.
matches := make([]bool, len(chars)+1)
matches[0] = true
for _, p := range pattern {
	next := make([]bool, len(chars)+1)
	if p == '*' {
		seen := false
		for j := range next {
			seen = seen || matches[j]
			next[j] = seen
		}
	} else {
		for j := 1; j <= len(chars); j++ {
			next[j] = matches[j-1] && (p == '?' || p == chars[j-1])
		}
	}
	matches = next
}
return matches[len(chars)]
}
