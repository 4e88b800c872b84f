var total int64
for _, value := range values {
	total += value
}
return total
}
