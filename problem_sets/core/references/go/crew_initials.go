if fullName == "" {
	return ""
}
var initials strings.Builder
for _, word := range strings.Split(fullName, " ") {
	first, size := utf8.DecodeRuneInString(word)
	if first >= 'a' && first <= 'z' {
		initials.WriteRune(first - 'a' + 'A')
	} else {
		initials.WriteString(word[:size])
	}
}
return initials.String()
}
