let mut merged = a;
for (ship, count) in b {
    *merged.entry(ship).or_insert(0) += count;
}
merged
}
