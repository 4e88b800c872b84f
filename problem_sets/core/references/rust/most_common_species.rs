let mut counts: HashMap<&str, i64> = HashMap::new();
for name in &species {
    *counts.entry(name.as_str()).or_insert(0) += 1;
}
// The highest count wins; among equal counts the smallest name, and str order compares
// UTF-8 bytes, which is the same as comparing code points.
counts
    .into_iter()
    .max_by(|(name_a, count_a), (name_b, count_b)| {
        count_a.cmp(count_b).then_with(|| name_b.cmp(name_a))
    })
    .map(|(name, _)| name.to_string())
}
