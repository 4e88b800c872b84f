return sum(readings) / len(readings) if readings else 0.0
