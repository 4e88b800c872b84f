chars := []rune(text)
var out strings.Builder
for i := 0; i < len(chars); {
	j := i
	for j < len(chars) && chars[j] == chars[i] {
		j++
	}
	out.WriteString(strconv.Itoa(j - i))
	out.WriteRune(chars[i])
	i = j
}
return out.String()
}
