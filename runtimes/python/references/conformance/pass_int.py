return value
