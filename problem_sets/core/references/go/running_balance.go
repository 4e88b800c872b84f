balances := make([]int64, len(deltas))
var balance int64
for i, delta := range deltas {
	balance += delta
	balances[i] = balance
}
return balances
}
