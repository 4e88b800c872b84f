// Recursive descent. Go's integer division truncates toward zero, as required; a division by
// zero is noted and yields 0 so that the rest of the expression is still evaluated.
pos := 0
divisionByZero := false
peek := func() byte {
	for pos < len(expr) && expr[pos] == ' ' {
		pos++
	}
	if pos == len(expr) {
		return 0
	}
	return expr[pos]
}
var sum, product, unary, atom func() int64
sum = func() int64 {
	value := product()
	for op := peek(); op == '+' || op == '-'; op = peek() {
		pos++
		right := product()
		if op == '+' {
			value += right
		} else {
			value -= right
		}
	}
	return value
}
product = func() int64 {
	value := unary()
	for op := peek(); op == '*' || op == '/'; op = peek() {
		pos++
		right := unary()
		switch {
		case op == '*':
			value *= right
		case right == 0:
			divisionByZero = true
			value = 0
		default:
			value /= right
		}
	}
	return value
}
unary = func() int64 {
	if peek() == '-' {
		pos++
		return -unary()
	}
	return atom()
}
atom = func() int64 {
	if peek() == '(' {
		pos++
		value := sum()
		peek()
		pos++ // the closing parenthesis
		return value
	}
	begin := pos
	for pos < len(expr) && expr[pos] >= '0' && expr[pos] <= '9' {
		pos++
	}
	value, _ := strconv.ParseInt(expr[begin:pos], 10, 64)
	return value
}
value := sum()
if divisionByZero {
	return nil
}
return &value
}
