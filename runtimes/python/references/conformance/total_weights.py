return float(sum(sum(items.values()) for items in crates.values()))
