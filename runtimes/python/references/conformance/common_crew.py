return set(first) & set(second)
