shifted := make(map[int64]string, len(owners))
for berth, vessel := range owners {
	shifted[berth+offset] = vessel
}
return shifted
}
