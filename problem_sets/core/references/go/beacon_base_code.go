// FormatInt writes lowercase digits and a leading "-", and handles math.MinInt64.
return strconv.FormatInt(n, int(base))
}
