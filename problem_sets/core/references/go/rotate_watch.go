if len(crew) == 0 {
	return []string{}
}
r := k % int64(len(crew))
rotated := make([]string, 0, len(crew))
rotated = append(rotated, crew[r:]...)
return append(rotated, crew[:r]...)
}
