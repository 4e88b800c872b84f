return sum(values)
