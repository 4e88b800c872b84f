letters := 0
for letters < len(code) && code[letters] >= 'A' && code[letters] <= 'Z' {
	letters++
}
digits := len(code) - letters
if letters == 0 || digits == 0 || digits > 18 {
	return nil
}
for i := letters; i < len(code); i++ {
	if code[i] < '0' || code[i] > '9' {
		return nil
	}
}
// At most 18 digits always fit in an int64.
number, _ := strconv.ParseInt(code[letters:], 10, 64)
return &Pair[string, int64]{code[:letters], number}
}
