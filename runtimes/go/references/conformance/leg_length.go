for _, text := range in {
	if text == type_ {
		return end - from
	}
}
return default_
}
