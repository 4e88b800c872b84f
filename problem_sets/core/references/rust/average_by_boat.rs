let mut totals: HashMap<String, (f64, i64)> = HashMap::new();
for (boat, weight) in catches {
    let entry = totals.entry(boat).or_insert((0.0, 0));
    entry.0 += weight;
    entry.1 += 1;
}
totals
    .into_iter()
    .map(|(boat, (sum, count))| (boat, sum / count as f64))
    .collect()
}
