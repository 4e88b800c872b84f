return [list(column) for column in zip(*grid)]
