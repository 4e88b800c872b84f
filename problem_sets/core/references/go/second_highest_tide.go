var top, second int64
hasTop, hasSecond := false, false
for _, v := range values {
	switch {
	case !hasTop || v > top:
		if hasTop {
			second, hasSecond = top, true
		}
		top, hasTop = v, true
	case v < top && (!hasSecond || v > second):
		second, hasSecond = v, true
	}
}
if !hasSecond {
	return nil
}
return &second
}
