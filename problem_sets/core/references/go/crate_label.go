if name == nil || *name == "" {
	return "Crate #" + strconv.FormatInt(number, 10)
}
return *name + " #" + strconv.FormatInt(number, 10)
}
