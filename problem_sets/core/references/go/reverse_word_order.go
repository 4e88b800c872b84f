words := strings.FieldsFunc(line, func(r rune) bool { return r == ' ' })
for i, j := 0, len(words)-1; i < j; i, j = i+1, j-1 {
	words[i], words[j] = words[j], words[i]
}
return strings.Join(words, " ")
}
