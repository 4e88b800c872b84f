if level, ok := stock[item]; ok {
	return &level
}
return nil
}
