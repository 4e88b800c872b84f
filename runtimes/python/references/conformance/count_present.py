present = [r for r in readings if r is not None]
return (sum(present), len(readings) - len(present))
