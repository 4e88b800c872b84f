words := strings.FieldsFunc(text, func(r rune) bool {
	return r == ' ' || r == '\t' || r == '\n'
})
return strings.Join(words, " ")
}
