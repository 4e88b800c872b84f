free := make(map[int64]struct{})
for berth := int64(1); berth <= count; berth++ {
	if _, ok := taken[berth]; !ok {
		free[berth] = struct{}{}
	}
}
return free
}
