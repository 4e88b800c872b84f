var count int64
for _, name := range names {
	if int64(utf8.RuneCountInString(name)) >= minLength {
		count++
	}
}
return count
}
